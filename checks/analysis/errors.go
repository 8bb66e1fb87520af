package analysis

import (
	"errors"
	"fmt"
)

// SingularError reports an unstable structure (a mechanism or a missing support): the
// stiffness has no resistance at the named degree of freedom.
type SingularError struct {
	Node int
	DOF  DOF
}

func (e *SingularError) Error() string {
	return fmt.Sprintf("analysis: structure is unstable: no stiffness at node %d %v (mechanism or missing support)", e.Node, e.DOF)
}

// CheckError reports a solve that failed its self-check.
type CheckError struct {
	Case     string
	Residual float64 // relative residual ‖Ku − F‖/‖F‖
	Balance  float64 // relative out-of-balance of reactions and applied loads
}

func (e *CheckError) Error() string {
	return fmt.Sprintf("analysis: case %q failed its self-check: relative residual %.3g, out-of-balance %.3g (limit %g)",
		e.Case, e.Residual, e.Balance, checkTol)
}

// ErrNoCases is returned when Solve is given no load cases.
var ErrNoCases = errors.New("analysis: no load cases")

// ErrTensionOnlyNoConvergence is returned when the tension-only iteration does not settle.
var ErrTensionOnlyNoConvergence = errors.New("analysis: tension-only iteration did not converge")

// checkTol is the limit on the relative residual and out-of-balance of every solve.
const checkTol = 1e-9

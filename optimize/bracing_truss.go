package optimize

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/analysis"
)

// bayForces are one tension-only solve of a bracing bay (N; struts and
// chords positive in compression, diagonals positive in tension).
type bayForces struct {
	diagonalN []float64 // per diagonal, 0 when slack
	slack     []bool    // per diagonal
	strutN    []float64 // per strut (panel point), compression positive
	// reaction is the support reaction [along the chords, across] at
	// each support node (force on the bay, N): roof bay at the two eaves
	// of chord A; wall bay at the two column bases.
	reaction [2][2]float64
}

// maxDiagonalN is the largest diagonal tension.
func (f bayForces) maxDiagonalN() float64 {
	var m float64
	for _, n := range f.diagonalN {
		m = math.Max(m, n)
	}
	return m
}

// bayLoads are nodal loads across a bay (N, along +y: from chord A towards
// chord B) at each panel point of chord A and of chord B.
type bayLoads struct {
	chordA, chordB []float64
}

// trussSection is the axial stiffness of a pin-ended bracing member.
func trussSection(s catalog.Section, fallbackAreaMM2 float64) analysis.Section {
	a := s.AreaMM2
	if !(a > 0) {
		a = fallbackAreaMM2
	}
	return analysis.Section{E: steelE, A: a}
}

// solveBay builds a bracing bay and solves it with the tension-only truss
// (checks/analysis SolveTensionOnly). The bay is statically determinate
// once one diagonal of each panel is slack, so its forces do not depend on
// the diagonal's section: every candidate strap or rod is checked against
// one solve.
func solveBay(spec analysis.BracingBaySpec, loads bayLoads, name string) (bayForces, error) {
	b, err := newBaySolver(spec)
	if err != nil {
		return bayForces{}, err
	}
	return b.solve(loads, name)
}

// baySolver solves one bracing bay under one load after another: the bay
// is built once and the solver's workspace reused.
type baySolver struct {
	bay *analysis.BracingBay
	ws  analysis.Workspace
}

func newBaySolver(spec analysis.BracingBaySpec) (*baySolver, error) {
	bay, err := analysis.NewBracingBay(spec)
	if err != nil {
		return nil, err
	}
	return &baySolver{bay: bay}, nil
}

// solve solves the bay under loads, as solveBay.
func (b *baySolver) solve(loads bayLoads, name string) (bayForces, error) {
	bay := b.bay
	lc := analysis.LoadCase{Name: name}
	for k, l := range [2][]float64{loads.chordA, loads.chordB} {
		for i, fy := range l {
			if fy != 0 {
				lc.Nodal = append(lc.Nodal, analysis.NodalLoad{Node: bay.Chords[k][i], Fy: fy})
			}
		}
	}
	sol, err := b.ws.SolveTensionOnly(&bay.Frame, lc)
	if err != nil {
		return bayForces{}, fmt.Errorf("bracing bay %s: %w", name, err)
	}
	comb := analysis.Primary(0)
	out := bayForces{diagonalN: make([]float64, len(bay.Diagonals)), slack: make([]bool, len(bay.Diagonals)),
		strutN: make([]float64, len(bay.Struts))}
	for i, m := range bay.Diagonals {
		out.slack[i] = !sol.Active(m)
		if !out.slack[i] {
			out.diagonalN[i] = math.Max(sol.AxialForce(comb, m), 0)
		}
	}
	for i, m := range bay.Struts {
		out.strutN[i] = -sol.AxialForce(comb, m)
	}
	n := bay.Spec.Panels
	supports := [2]int{bay.Chords[0][0], bay.Chords[0][n]}
	if bay.Spec.Support == analysis.CantileverBay {
		supports = [2]int{bay.Chords[0][0], bay.Chords[1][0]}
	}
	for k, node := range supports {
		r := sol.Reaction(comb, node)
		out.reaction[k] = [2]float64{r[0], r[1]}
	}
	return out, nil
}

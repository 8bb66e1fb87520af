package coldformed

import (
	"errors"
	"fmt"
	"math"
	"strings"
)

// ErrInput is wrapped by every bad-input error of the package.
var ErrInput = errors.New("coldformed: bad input")

// InputError lists every bad field found in one pass.
type InputError struct {
	Problems []string
}

func (e *InputError) Error() string {
	return "coldformed: bad input: " + strings.Join(e.Problems, "; ")
}

// Unwrap lets errors.Is(err, ErrInput) succeed.
func (e *InputError) Unwrap() error { return ErrInput }

// validator collects field problems.
type validator struct{ problems []string }

func (v *validator) add(format string, args ...any) {
	v.problems = append(v.problems, fmt.Sprintf(format, args...))
}

// positive requires a finite value > 0.
func (v *validator) positive(field string, x float64) {
	if math.IsNaN(x) || math.IsInf(x, 0) || x <= 0 {
		v.add("%s = %g, want a finite value > 0", field, x)
	}
}

// nonNegative requires a finite value ≥ 0.
func (v *validator) nonNegative(field string, x float64) {
	if math.IsNaN(x) || math.IsInf(x, 0) || x < 0 {
		v.add("%s = %g, want a finite value ≥ 0", field, x)
	}
}

// finite requires a finite value.
func (v *validator) finite(field string, x float64) {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		v.add("%s = %g, want a finite value", field, x)
	}
}

func (v *validator) err() error {
	if len(v.problems) == 0 {
		return nil
	}
	return &InputError{Problems: v.problems}
}

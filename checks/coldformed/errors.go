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
	if !isPositive(x) {
		v.add("%s = %g, want a finite value > 0", field, x)
	}
}

// positiveIn is positive for the field path+field, whose name is built
// only for a problem (checks run in inner loops).
func (v *validator) positiveIn(path, field string, x float64) {
	if !isPositive(x) {
		v.positive(path+field, x)
	}
}

// nonNegative requires a finite value ≥ 0.
func (v *validator) nonNegative(field string, x float64) {
	if !isNonNegative(x) {
		v.add("%s = %g, want a finite value ≥ 0", field, x)
	}
}

// nonNegativeIn is nonNegative for the field path+field (see positiveIn).
func (v *validator) nonNegativeIn(path, field string, x float64) {
	if !isNonNegative(x) {
		v.nonNegative(path+field, x)
	}
}

func isPositive(x float64) bool    { return !math.IsNaN(x) && !math.IsInf(x, 0) && x > 0 }
func isNonNegative(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) && x >= 0 }

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

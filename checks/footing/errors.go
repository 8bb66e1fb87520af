package footing

import (
	"errors"
	"fmt"
	"strings"
)

// ErrNoSolution is wrapped by NoSolutionError: no candidate within the
// options' limits passes every check.
var ErrNoSolution = errors.New("footing: no passing candidate")

// ErrInvalid is wrapped by every input validation error.
var ErrInvalid = errors.New("footing: invalid input")

// NoSolutionError reports that no pad (or bolt group) within the limits
// passes, and which check governs the largest candidate tried.
type NoSolutionError struct {
	Base      string
	What      string // "pad" or "bolts"
	Largest   string // the largest candidate tried, e.g. "3.00 m x 1.50 m"
	Governing Check
}

func (e *NoSolutionError) Error() string {
	g := e.Governing
	return fmt.Sprintf("base %s: no %s passes up to %s: %s (%s %s, %s, %s) utilisation %.3g",
		e.Base, e.What, e.Largest, g.Name, g.Standard, g.Clause, g.LimitState, g.Combination, g.Utilisation)
}

// Unwrap lets errors.Is(err, ErrNoSolution) hold.
func (e *NoSolutionError) Unwrap() error { return ErrNoSolution }

// FieldError is one bad input field: its path, its value and what is allowed.
type FieldError struct {
	Field   string
	Value   string
	Allowed string
}

func (e FieldError) Error() string {
	return fmt.Sprintf("%s = %s: want %s", e.Field, e.Value, e.Allowed)
}

// fieldErrors collects every bad field so a user fixes them in one go.
type fieldErrors []FieldError

func (fe *fieldErrors) add(field, value, allowed string) {
	*fe = append(*fe, FieldError{Field: field, Value: value, Allowed: allowed})
}

// err returns nil when empty, else one error wrapping ErrInvalid that lists
// every field, prefixed by ctx.
func (fe fieldErrors) err(ctx string) error {
	if len(fe) == 0 {
		return nil
	}
	msgs := make([]string, len(fe))
	for i, e := range fe {
		msgs[i] = e.Error()
	}
	return fmt.Errorf("%s: %w: %s", ctx, ErrInvalid, strings.Join(msgs, "; "))
}

// Status is the outcome of a sizing.
type Status int

const (
	// OK: a passing candidate was found.
	OK Status = iota
	// NoSolution: no candidate within the limits passes.
	NoSolution
)

func (s Status) String() string {
	switch s {
	case OK:
		return "ok"
	case NoSolution:
		return "no_solution"
	}
	return fmt.Sprintf("Status(%d)", int(s))
}

// MarshalText writes the status as "ok" or "no_solution".
func (s Status) MarshalText() ([]byte, error) { return []byte(s.String()), nil }

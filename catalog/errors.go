package catalog

import (
	"errors"
	"fmt"
	"strconv"
	"strings"
)

// ErrEmpty is returned when a catalogue has no sections.
var ErrEmpty = errors.New("catalog: no sections")

// Problem is one bad value: where it is, what it holds and what is allowed.
type Problem struct {
	Line   int    // 1-based line in the catalogue file; 0 when not read from a file
	Column string // the catalogue column, e.g. "thickness_mm"
	Value  string // the value as written
	Reason string // what is wrong and the allowed range
}

func (p Problem) String() string {
	var b strings.Builder
	if p.Line > 0 {
		fmt.Fprintf(&b, "line %d: ", p.Line)
	}
	if p.Column != "" {
		fmt.Fprintf(&b, "%s = %q: ", p.Column, p.Value)
	}
	b.WriteString(p.Reason)
	return b.String()
}

// ValidationError lists every problem found in a catalogue (or one
// section's data), so a user can fix a file in one pass.
type ValidationError struct {
	File     string // the catalogue's name or path
	Problems []Problem
}

func (e *ValidationError) Error() string {
	var b strings.Builder
	fmt.Fprintf(&b, "catalog %s: %d problem", e.File, len(e.Problems))
	if len(e.Problems) != 1 {
		b.WriteString("s")
	}
	for _, p := range e.Problems {
		fmt.Fprintf(&b, "\n  %s: %s", e.File, p)
	}
	return b.String()
}

// problemf is a Problem about a numeric value.
func problemf(column string, v float64, format string, args ...any) Problem {
	return Problem{Column: column, Value: num(v), Reason: fmt.Sprintf(format, args...)}
}

// num formats a number as briefly as it round-trips.
func num(v float64) string { return strconv.FormatFloat(v, 'g', -1, 64) }

// limit formats a computed bound to four significant figures.
func limit(v float64) string { return strconv.FormatFloat(v, 'g', 4, 64) }

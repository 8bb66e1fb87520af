package grids

import (
	"fmt"
	"strings"
)

// Problem is one thing wrong with a grid file.
type Problem struct {
	File    string // file name as given to Parse
	Line    int    // 1-based line of the key; 0 when the key is missing from the file
	Key     string // dotted key path, e.g. "geometry.span_m" or "wind.site[1].region"
	Value   string // the offending value as written (TOML syntax), or "" when missing
	Allowed string // what is allowed, or what went wrong
}

// String formats the problem as "file:line: key = value: allowed ...".
func (p Problem) String() string {
	var b strings.Builder
	b.WriteString(p.File)
	if p.Line > 0 {
		fmt.Fprintf(&b, ":%d", p.Line)
	}
	b.WriteString(": ")
	b.WriteString(p.Key)
	if p.Value != "" {
		b.WriteString(" = ")
		b.WriteString(p.Value)
	}
	b.WriteString(": ")
	b.WriteString(p.Allowed)
	return b.String()
}

// ValidationError lists every problem found in a grid file, in file order.
type ValidationError struct {
	Problems []Problem
}

// Error returns one problem per line.
func (e *ValidationError) Error() string {
	lines := make([]string, len(e.Problems))
	for i, p := range e.Problems {
		lines[i] = p.String()
	}
	return strings.Join(lines, "\n")
}

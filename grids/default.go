package grids

import _ "embed"

// defaultTOML is the embedded default grid: the standard range of Ridgeline
// Sheds Pty Ltd, a fictional maker (illustrative dimensions only).
//
//go:embed default.toml
var defaultTOML []byte

// DefaultFile is the name the embedded default grid carries in problems and outputs.
const DefaultFile = "default.toml (embedded)"

// Default returns the embedded default grid.
func Default() (*Grid, error) { return Parse(defaultTOML, DefaultFile) }

// DefaultTOML returns a copy of the embedded default grid file, e.g. to
// write it out as a starting point for a maker's own range.
func DefaultTOML() []byte { return append([]byte(nil), defaultTOML...) }

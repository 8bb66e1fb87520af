// Package grids reads a product-range grid file, validates it and enumerates
// its design cases in a deterministic order, one building and site at a time.
//
// A grid file is TOML. It lists (or gives as from/to/step ranges) the spans,
// lengths, eaves heights and roof pitches of a shed maker's range, the wind
// conditions (AS 4055 housing classes or AS/NZS 1170.2 site conditions), the
// base fixities and hoist loads, and the options shared by every case:
// cladding, serviceability limits, member families, an optional dominant
// opening and optional costs. KeyReference returns the documentation of every
// key with its unit, default and the default's source; it is also kept as
// testdata/examples/GRID-KEYS.md.
//
// Units: m for building geometry, degrees for roof pitch, kN for loads, kPa
// for distributed dead loads, serviceability limits as the denominator of a
// ratio (150 means span/150), costs in the maker's currency unit. Every field
// carries its unit in its name.
//
// Validation reports every problem of a file in one pass (ValidationError),
// each naming the file, line, key, value and what is allowed. Unknown keys are
// problems too, so typing mistakes are caught.
//
// Cases are enumerated with wind condition outermost, then eaves height, span,
// length (bay spacing, then bay count), roof pitch, base fixity and hoist load,
// so that the cases of one span table (one wind condition and eaves height)
// are contiguous. A Shard selects a contiguous block of that order.
package grids

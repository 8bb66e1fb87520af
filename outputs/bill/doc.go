// Package bill answers an estimator's question from a solved dataset: which
// solved case covers a customer's building, and what it takes to build it
// (member schedule, fly braces, bridging, bracing, footings, holding-down
// bolts, steel mass).
//
// # Rounding
//
// Lookup never rounds down. In each dimension it uses the next solved size
// at or above the one asked: span, eaves height, bay spacing (when asked),
// length, and a bay count at least ceil(length / bay spacing asked); roof
// pitch at or above the one asked (lowest solved pitch when none is asked);
// the base fixity asked (any, pinned preferred, when none is asked); the
// lowest solved hoist load. The wind condition must be at least as severe:
// its ultimate and serviceability design pressures, at the solved building,
// at least those of the site asked, and cyclonic if the site is cyclonic
// (AS 4055-2021 classes C1–C4; AS/NZS 1170.2:2021 regions C and D). Among
// covering cases the smallest is chosen in the order span, eaves height, bay
// spacing, length, ultimate wind pressure, pitch, hoist, base, case index.
// Cases with status no_solution are never chosen; the answer says when one
// fitted better.
//
// # Units
//
// m for building geometry, kPa for wind pressures, m³ for concrete, kg for
// mass, kg/m² for mass per floor area; every field and JSON key names its
// unit.
package bill

package actions

import (
	"fmt"
	"math"
)

// Roof imposed actions for non-trafficable roofs, AS/NZS 1170.1:2002
// Table 3.2 (R2 other roofs). Values from memory of the table
// (REFERENCE-VALUES §4), except the cladding point load (confirmed: S15).
const (
	RoofLiveMinKPa        = 0.25 // floor on the distributed value; governs from A = 14.4 m²
	RoofPointCladdingKN   = 1.1  // concentrated, roof cladding
	RoofPointStructuralKN = 1.4  // concentrated, structural elements (from memory)
	roofLiveConstantKPa   = 0.12
	roofLiveAreaTermKPaM2 = 1.8
)

// RoofLiveKPa returns the distributed roof live load Q = 0.12 + 1.8/A kPa,
// not less than 0.25 kPa, for a structural element supporting a plan area
// A in m² (AS/NZS 1170.1:2002 Table 3.2, from memory).
func RoofLiveKPa(planAreaM2 float64) (float64, error) {
	if !(planAreaM2 > 0) || math.IsInf(planAreaM2, 0) {
		return 0, fmt.Errorf("roof live load: supported plan area %g m²: must be positive", planAreaM2)
	}
	return math.Max(roofLiveConstantKPa+roofLiveAreaTermKPaM2/planAreaM2, RoofLiveMinKPa), nil
}

// Hoist is an optional point load on a rafter, e.g. a chain block for
// lifting an engine in a workshop, treated as an imposed action Q
// (AS/NZS 1170.0:2002 cl. 4.2.2 factor 1.5; an assumption: the standard has
// no specific hoist rule, and AS/NZS 1170.1 does not cover it).
type Hoist struct {
	LoadKN float64 // rated load including the hoist's own weight
	// PositionM is the horizontal distance from the left column centreline
	// to the load along the rafter's plan, 0 ≤ x ≤ span.
	PositionM float64
}

// Validate checks the hoist against the span.
func (h Hoist) Validate(spanM float64) error {
	if !(h.LoadKN > 0) {
		return fmt.Errorf("hoist load %g kN: must be positive", h.LoadKN)
	}
	if !(h.PositionM >= 0 && h.PositionM <= spanM) {
		return fmt.Errorf("hoist position %g m: allowed 0 to the span %g m", h.PositionM, spanM)
	}
	return nil
}

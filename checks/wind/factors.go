package wind

import "math"

// surfaceKaRow selects a row of AS/NZS 1170.2:2021 Table 5.4.
type kaRow int

const (
	kaRoofOrSide kaRow = iota // roofs and side walls: 1.0 / 0.9 / 0.8 at 10 / 25 / 100 m²
	kaWindward                // windward wall, h < 25 m: 1.0 / 0.95 / 0.9
	kaLeeward                 // leeward wall, h < 25 m: 1.0 / 1.0 / 0.95
	kaNone                    // K_a = 1
)

// AreaReductionFactor returns K_a of AS/NZS 1170.2:2021 Table 5.4 for a
// tributary area (m²) on a roof or side wall (windward false, leeward false),
// a windward wall, or a leeward wall; interpolated linearly, 1.0 at or
// below 10 m². Confirmed against independent transcriptions (S1, S2, S3).
func AreaReductionFactor(areaM2 float64, windward, leeward bool) float64 {
	row := kaRoofOrSide
	switch {
	case windward:
		row = kaWindward
	case leeward:
		row = kaLeeward
	}
	return areaReduction(row, areaM2)
}

func areaReduction(row kaRow, areaM2 float64) float64 {
	areas := []float64{10, 25, 100}
	switch row {
	case kaRoofOrSide:
		return interp(areas, []float64{1.0, 0.9, 0.8}, areaM2)
	case kaWindward:
		return interp(areas, []float64{1.0, 0.95, 0.9}, areaM2)
	case kaLeeward:
		return interp(areas, []float64{1.0, 1.0, 0.95}, areaM2)
	}
	return 1
}

// Combination factors K_c of AS/NZS 1170.2:2021 Table 5.5 for a portal frame
// loaded by its walls and roof: K_c,e = 0.8 always; K_c,i = 0.8 when the
// internal pressure is an effective surface, else 1.0 (cases a–d, confirmed:
// S2). A surface counts as effective when |C_p,i| ≥ 0.2 (confirmed: S5 for
// the 2011 edition; S2 uses 0.4, unverified).
const (
	PortalKce                 = 0.8
	effectiveInternalMinimum  = 0.2
	minAreaCombinationProduct = 0.8 // K_a·K_c ≥ 0.8, cl. 5.4.3 (from memory)
)

// PortalKci returns K_c,i for a portal frame with internal coefficient cpi.
func PortalKci(cpi float64) float64 {
	if math.Abs(cpi) >= effectiveInternalMinimum-1e-12 {
		return 0.8
	}
	return 1.0
}

// frameKaKc returns K_a·K_c,e for a frame, floored at 0.8 (cl. 5.4.3).
func frameKaKc(ka float64) float64 { return math.Max(ka*PortalKce, minAreaCombinationProduct) }

// Local pressure factors K_l of AS/NZS 1170.2:2021 Table 5.6 used for
// purlins and girts (confirmed: S2): RA1 roof edges and SA1 side walls
// (h/min(b,d) ≤ 1) within a of the edge, 1.5; SA4 (h/min(b,d) > 1) 2.0.
// K_l applies to suctions; K_l·C_p,e ≥ −3.0 (cl. 5.4.4, confirmed: S2).
const (
	RoofEdgeKl     = 1.5
	minKlCpe       = -3.0
	sideEdgeKl     = 1.5
	sideEdgeKlTall = 2.0
)

// localCpe applies K_l to a suction coefficient with the −3.0 floor.
func localCpe(kl, cpe float64) float64 {
	if cpe >= 0 {
		return cpe
	}
	return math.Max(kl*cpe, minKlCpe)
}

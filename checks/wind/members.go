package wind

import "math"

// DesignPressure is one net pressure at both limit states (kPa, inward
// positive).
type DesignPressure struct {
	ULSKPa, SLSKPa float64
}

func pressureOf(cfig float64, s Speeds) DesignPressure {
	return DesignPressure{ULSKPa: cfig * s.QULSKPa, SLSKPa: cfig * s.QSLSKPa}
}

// MemberPressures is the envelope of net pressures over every wind case for
// purlins (roof) or girts (walls), as immediate supports of cladding:
// K_a = 1 and K_c = 1 (conservative for the small tributary areas of
// purlins and girts), so C_fig = K_l·C_p,e − C_p,i.
type MemberPressures struct {
	// GeneralInward is the largest inward net pressure anywhere (positive).
	GeneralInward DesignPressure
	// GeneralOutward is the largest outward net pressure anywhere (negative).
	GeneralOutward DesignPressure
	// EdgeOutward is the largest outward net pressure within EdgeWidthM of a
	// roof edge (purlins: every eave, gable and ridge edge, RA1) or of a
	// side wall's windward edge (girts: SA1 or SA4), with EdgeKl. It takes
	// the most negative C_p,e of the surface, so it applies wherever the
	// member's tributary area is within the local-pressure area (≤ a²).
	EdgeOutward DesignPressure
	EdgeKl      float64
	EdgeWidthM  float64
}

func memberPressures(l Loads) (purlins, girts MemberPressures) {
	b := l.Building
	h := b.ReferenceHeightM()
	sideKl := sideEdgeKl // SA1: h/min(b,d) ≤ 1
	if h/min(b.SpanM, b.LengthM) > 1 {
		sideKl = sideEdgeKlTall // SA4
	}
	purlins.EdgeKl, purlins.EdgeWidthM = RoofEdgeKl, l.LocalDimensionRoofM
	girts.EdgeKl, girts.EdgeWidthM = sideKl, l.LocalDimensionWallM
	var rIn, rOut, rEdge, wIn, wOut, wEdge float64
	for _, c := range l.Cases {
		cpi := c.Internal.Cpi
		for _, s := range c.Surfaces {
			minCpe := math.Inf(1)
			for _, z := range s.Zones {
				minCpe = math.Min(minCpe, z.Cpe)
				if s.Kind.IsRoof() {
					rIn, rOut = math.Max(rIn, z.CfigMember), math.Min(rOut, z.CfigMember)
				} else {
					wIn, wOut = math.Max(wIn, z.CfigMember), math.Min(wOut, z.CfigMember)
				}
			}
			switch {
			case s.Kind.IsRoof():
				rEdge = math.Min(rEdge, localCpe(RoofEdgeKl, minCpe)-cpi)
			case s.Kind == SideWalls:
				wEdge = math.Min(wEdge, localCpe(sideKl, s.Zones[0].Cpe)-cpi)
			}
		}
	}
	sp := l.Speeds
	purlins.GeneralInward, purlins.GeneralOutward, purlins.EdgeOutward = pressureOf(rIn, sp), pressureOf(rOut, sp), pressureOf(rEdge, sp)
	girts.GeneralInward, girts.GeneralOutward, girts.EdgeOutward = pressureOf(wIn, sp), pressureOf(wOut, sp), pressureOf(wEdge, sp)
	return purlins, girts
}

package catalog

import (
	"fmt"
	"math"
)

// leg is one straight element of a roll-formed profile's sharp-corner
// centreline: its length and Σ tan(θ/2) over its bends, so its flat width is
// length − rc·bends for a centreline corner radius rc.
type leg struct {
	column string // the catalogue column that sets it
	name   string
	length float64
	bends  float64
}

// profileLegs are the legs of a C, Z or (each channel of a) 2C, from the
// outside dimensions. A lip at angle φ to its flange moves the flange's and
// the lip's centreline vertex in by (t/2)·tan(φ/2) from the outside corner.
func profileLegs(shape Shape, g Geometry) []leg {
	t := g.ThicknessMM
	phi := shape.LipAngleDeg() * math.Pi / 180
	lipBend, lipCut := 0.0, 0.5*t // free flange edge: only the web's half thickness
	if g.LipMM > 0 {
		lipBend, lipCut = math.Tan(phi/2), 0.5*t*(1+math.Tan(phi/2))
	}
	legs := []leg{
		{"depth_mm", "web", g.DepthMM - t, 2},
		{"flange_mm", "flange", g.FlangeMM - lipCut, 1 + lipBend},
	}
	if shape == ShapeZ {
		legs = append(legs, leg{"flange2_mm", "second flange", g.Flange2MM - lipCut, 1 + lipBend})
	}
	if g.LipMM > 0 {
		legs = append(legs, leg{"lip_mm", "lip", g.LipMM - 0.5*t*lipBend, lipBend})
	}
	return legs
}

// flatMM is a leg's flat width between its bends.
func (l leg) flatMM(innerRadiusMM, t float64) float64 {
	return l.length - (innerRadiusMM+t/2)*l.bends
}

// maxInnerRadiusMM is the largest inside radius that leaves every leg a flat
// of positive width, and the leg that sets it.
func maxInnerRadiusMM(legs []leg, t float64) (float64, string) {
	r, name := math.Inf(1), ""
	for _, l := range legs {
		if rl := l.length/l.bends - t/2; l.bends > 0 && rl < r {
			r, name = rl, l.name
		}
	}
	return r, name
}

// profilePoints is the sharp-corner centreline of one lipped C or Z, from
// the top lip's tip to the bottom lip's tip, web centreline on x = 0, flanges
// at y = ±a/2, the C's flanges and the Z's top flange towards +x. A vertex
// at mid-web (index returned) lets a 2C join its two channels there.
func profilePoints(shape Shape, g Geometry) ([]vec, int) {
	legs := profileLegs(shape, g)
	a, b1, b2 := legs[0].length, legs[1].length, legs[1].length
	if shape == ShapeZ {
		b2 = legs[2].length
	}
	phi := shape.LipAngleDeg() * math.Pi / 180
	top := vec{b1, a / 2}
	bottom := vec{b2, -a / 2}
	bottomLip := vec{math.Cos(phi), math.Sin(phi)}
	if shape == ShapeZ {
		bottom = vec{-b2, -a / 2}
		bottomLip = vec{-math.Cos(phi), math.Sin(phi)}
	}
	pts := []vec{top, {0, a / 2}, {0, 0}, {0, -a / 2}, bottom}
	mid := 2
	if g.LipMM > 0 {
		c := legs[len(legs)-1].length
		topTip := top.add(vec{math.Cos(phi), -math.Sin(phi)}.scale(c))
		pts = append([]vec{topTip}, pts...)
		pts = append(pts, bottom.add(bottomLip.scale(c)))
		mid++
	}
	return pts, mid
}

// profileCentreline builds the centreline of a C, Z or 2C, with corners
// rounded on radius r + t/2, or sharp (the elementary formulas' model).
// A 2C is two channels back to back, webs touching, joined at mid-web by a
// strip of no thickness: they warp together, as connected webs make them.
func profileCentreline(shape Shape, g Geometry, sharp bool) *centreline {
	t := g.ThicknessMM
	rc := g.InnerRadiusMM + t/2
	if sharp {
		rc = 0
	}
	c := &centreline{}
	if shape != Shape2C {
		pts, _ := profilePoints(shape, g)
		c.addPolyline(pts, rc, t)
		return c
	}
	pts, mid := profilePoints(ShapeC, g)
	right := make([]vec, len(pts))
	left := make([]vec, len(pts))
	for k, p := range pts {
		right[k] = p.add(vec{t / 2, 0})
		left[k] = p.mirrorX().add(vec{-t / 2, 0})
	}
	r := c.addPolyline(right, rc, t)
	l := c.addPolyline(left, rc, t)
	c.addStrip(r[mid], l[mid], 0)
	return c
}

// profileProblems checks a thin-walled profile's dimensions: positive
// thickness, every flat of positive width, the lip no longer than the flange.
func profileProblems(shape Shape, g Geometry) []Problem {
	var ps []Problem
	t := g.ThicknessMM
	if maxLip := math.Min(g.FlangeMM, flange2(shape, g)); g.LipMM > maxLip {
		ps = append(ps, problemf("lip_mm", g.LipMM, "lip longer than the flange; allowed 0 ≤ lip ≤ %s mm", limit(maxLip)))
	}
	legs := profileLegs(shape, g)
	for _, l := range legs {
		if l.length <= 0 {
			ps = append(ps, problemf(l.column, value(l.column, g), "%s too short for thickness %s mm; allowed > %s mm",
				l.name, num(t), limit(value(l.column, g)-l.length)))
		}
	}
	if len(ps) > 0 {
		return ps
	}
	if rMax, name := maxInnerRadiusMM(legs, t); g.InnerRadiusMM >= rMax {
		ps = append(ps, problemf("inner_radius_mm", g.InnerRadiusMM,
			"radius too large for the flat widths (the %s's flat vanishes); allowed 0 ≤ r < %s mm", name, limit(rMax)))
	}
	return ps
}

func flange2(shape Shape, g Geometry) float64 {
	if shape == ShapeZ {
		return g.Flange2MM
	}
	return g.FlangeMM
}

// value is the geometry's value for a column, for messages.
func value(column string, g Geometry) float64 {
	switch column {
	case "depth_mm":
		return g.DepthMM
	case "flange_mm":
		return g.FlangeMM
	case "flange2_mm":
		return g.Flange2MM
	case "lip_mm":
		return g.LipMM
	case "thickness_mm":
		return g.ThicknessMM
	case "inner_radius_mm":
		return g.InnerRadiusMM
	}
	panic(fmt.Sprintf("catalog: no geometry column %q", column))
}

package catalog

import (
	"math"
	"strings"
)

// Plausible ranges, mm and MPa: wide enough for any roll-formed or bar
// product, narrow enough to catch a unit slip (m for mm, kPa for MPa).
const (
	maxDepthMM     = 1000
	maxThicknessMM = 10
	maxStrengthMPa = 1500
)

// geometryProblems checks a section's dimensions for its shape.
func geometryProblems(shape Shape, g Geometry) []Problem {
	var ps []Problem
	inRange := func(column string, v, lo, hi float64, loOpen bool) {
		if math.IsNaN(v) || math.IsInf(v, 0) || v > hi || v < lo || loOpen && v == lo {
			op := "≤"
			if loOpen {
				op = "<"
			}
			ps = append(ps, problemf(column, v, "allowed %s %s value ≤ %s mm", num(lo), op, num(hi)))
		}
	}
	unused := func(column string, v float64) {
		if v != 0 {
			ps = append(ps, problemf(column, v, "not used for a %s; leave it empty or 0", shape))
		}
	}
	switch shape {
	case ShapeC, ShapeZ, Shape2C:
		inRange("depth_mm", g.DepthMM, 0, maxDepthMM, true)
		inRange("flange_mm", g.FlangeMM, 0, maxDepthMM, true)
		if shape == ShapeZ {
			inRange("flange2_mm", g.Flange2MM, 0, maxDepthMM, true)
		}
		inRange("lip_mm", g.LipMM, 0, maxDepthMM, false)
		inRange("thickness_mm", g.ThicknessMM, 0, maxThicknessMM, true)
		inRange("inner_radius_mm", g.InnerRadiusMM, 0, maxDepthMM, false)
		if len(ps) == 0 {
			ps = profileProblems(shape, g)
		}
	case ShapeStrap:
		inRange("depth_mm", g.DepthMM, 0, maxDepthMM, true)
		inRange("thickness_mm", g.ThicknessMM, 0, maxThicknessMM, true)
		if len(ps) == 0 && g.ThicknessMM > g.DepthMM {
			ps = append(ps, problemf("thickness_mm", g.ThicknessMM, "thicker than the strap is wide; allowed 0 < t ≤ %s mm", num(g.DepthMM)))
		}
		unused("flange_mm", g.FlangeMM)
		unused("lip_mm", g.LipMM)
		unused("inner_radius_mm", g.InnerRadiusMM)
	case ShapeRod:
		if _, ok := TensileStressAreaMM2(g.DepthMM); !ok {
			ps = append(ps, problemf("depth_mm", g.DepthMM, "rod diameter must be a metric coarse-thread size; allowed %s mm", rodDiameterList()))
		}
		unused("flange_mm", g.FlangeMM)
		unused("lip_mm", g.LipMM)
		unused("thickness_mm", g.ThicknessMM)
		unused("inner_radius_mm", g.InnerRadiusMM)
	default:
		ps = append(ps, Problem{Column: "shape", Value: shape.String(), Reason: "unknown shape; allowed " + ShapeList()})
	}
	return ps
}

// strengthProblems checks yield and tensile strength: 0 < fy ≤ fu ≤ 1500 MPa.
func strengthProblems(fy, fu float64) []Problem {
	var ps []Problem
	finite := func(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
	if !finite(fy) || fy <= 0 || fy > maxStrengthMPa {
		ps = append(ps, problemf("fy_mpa", fy, "allowed 0 < fy ≤ %d MPa", maxStrengthMPa))
	}
	if !finite(fu) || fu <= 0 || fu > maxStrengthMPa {
		ps = append(ps, problemf("fu_mpa", fu, "allowed 0 < fu ≤ %d MPa", maxStrengthMPa))
	} else if finite(fy) && fu < fy {
		ps = append(ps, problemf("fu_mpa", fu, "below fy = %s MPa; allowed fy ≤ fu ≤ %d MPa", num(fy), maxStrengthMPa))
	}
	return ps
}

func rodDiameterList() string {
	var s []string
	for _, d := range rodDiameters() {
		s = append(s, num(d))
	}
	return strings.Join(s, ", ")
}

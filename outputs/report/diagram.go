package report

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/optimize"
)

// diagramTable gives a force diagram's values at its stations.
func diagramTable(d optimize.MemberDiagram) *table {
	t := newTable("Station (m)", "Axial N (kN)", "Shear V (kN)", "Moment M (kN·m)")
	for i, x := range d.StationsM {
		t.row(num(x, 3), num(at(d.AxialKN, i), 2), num(at(d.ShearKN, i), 2), num(at(d.MomentKNm, i), 2))
	}
	return t
}

// at returns v[i], or NaN when the diagram is short of values.
func at(v []float64, i int) float64 {
	if i < len(v) {
		return v[i]
	}
	return math.NaN()
}

// extremes states the largest positive and negative moments and where.
func extremes(d optimize.MemberDiagram) string {
	hi, lo := momentExtremes(d)
	if hi < 0 {
		return "No moment values."
	}
	return fmt.Sprintf("Largest moment %s kN·m at %s m; smallest %s kN·m at %s m.",
		num(d.MomentKNm[hi], 2), num(d.StationsM[hi], 3), num(d.MomentKNm[lo], 2), num(d.StationsM[lo], 3))
}

// momentExtremes returns the stations of the largest and smallest moment,
// or -1, -1 for an empty diagram.
func momentExtremes(d optimize.MemberDiagram) (hi, lo int) {
	hi, lo = -1, -1
	n := min(len(d.StationsM), len(d.MomentKNm))
	for i := range n {
		if hi < 0 || d.MomentKNm[i] > d.MomentKNm[hi] {
			hi = i
		}
		if lo < 0 || d.MomentKNm[i] < d.MomentKNm[lo] {
			lo = i
		}
	}
	return hi, lo
}

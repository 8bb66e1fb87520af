package optimize

import (
	"math"
)

// Bracing arrangement rules, each stated in the report.
const (
	// bracingBaysPer is one braced bay for every this many bays, with at
	// least both end bays braced (common practice, no source).
	bracingBaysPer = 5
	// restraintFraction is the out-of-plane restraint force a bracing
	// system takes from each frame it restrains, as a fraction of the
	// frame's largest flange force: 2.5 % (from memory of AS 4100:2020
	// cl. 6.6.2, restraint of a compression flange; AS/NZS 4600 has no
	// equivalent rule and the AS 4100 figure is common practice for
	// cold-formed portals).
	restraintFraction = 0.025
	// boltHoleMM is the hole a strap's end bolt takes: one M12 bolt in a
	// 14 mm hole (hole = bolt + 2 mm, from memory of AS 4100:2020
	// cl. 14.3.5.2, standard holes).
	boltHoleMM = 14.0
)

// bracingLayout is the arrangement of the roof and side-wall bracing bays.
type bracingLayout struct {
	bracedBays      int     // bays braced (roof and both side walls)
	framesPerBay    int     // frames each braced bay restrains
	roofPanels      int     // panels across the unfolded roof, even (apex is a panel point)
	slopeM          float64 // one rafter's slope length
	wallPanels      int     // panels up a side wall
	bayM, eavesM    float64
	spanM, pitchRad float64
}

// layoutBracing lays out the bracing of the case: panels chosen so the
// diagonals sit near 45° to the chords (between about 35° and 55°: common
// practice, no source).
func (d *designer) layoutBracing() bracingLayout {
	c := d.c
	pitch := c.RoofPitchDeg * math.Pi / 180
	slope := c.SpanM / 2 / math.Cos(pitch)
	nb := 1
	if c.Bays > 1 {
		nb = min(c.Bays, max(2, int(math.Ceil(float64(c.Bays)/bracingBaysPer))))
	}
	frames := c.Bays + 1
	return bracingLayout{
		bracedBays:   nb,
		framesPerBay: int(math.Ceil(float64(frames) / float64(nb))),
		roofPanels:   2 * max(1, int(math.Round(slope/c.BaySpacingM))),
		slopeM:       slope,
		wallPanels:   max(1, int(math.Round(c.EavesHeightM/c.BaySpacingM))),
		bayM:         c.BaySpacingM, eavesM: c.EavesHeightM, spanM: c.SpanM, pitchRad: pitch,
	}
}

// gableHeightM is the end wall's height at plan distance u (m) from one eave.
func (l bracingLayout) gableHeightM(u float64) float64 {
	return l.eavesM + math.Min(u, l.spanM-u)*math.Tan(l.pitchRad)
}

// gableAreaM2 is the area of one end wall: the rectangle below the eaves
// and the triangle of the gable.
func (l bracingLayout) gableAreaM2() float64 {
	return l.spanM*l.eavesM + l.spanM*l.spanM*math.Tan(l.pitchRad)/4
}

// roofPanelShares returns the fraction of the end wall's area whose top
// half reaction lands at each roof panel point (i = 0 … roofPanels), by
// tributary plan width: the wall spans from the base to the rafter, so
// half of the load of each strip goes to the rafter above it. The
// fractions sum to 1; exact for the piecewise-linear gable outline.
func (l bracingLayout) roofPanelShares() []float64 {
	n := l.roofPanels
	du := l.spanM / float64(n)
	out := make([]float64, n+1)
	area := l.gableAreaM2()
	for i := range out {
		u := float64(i) * du
		lo, hi := math.Max(u-du/2, 0), math.Min(u+du/2, l.spanM)
		// h is linear on each half-panel (the apex is a panel point).
		out[i] = ((u-lo)*(l.gableHeightM(lo)+l.gableHeightM(u)) + (hi-u)*(l.gableHeightM(u)+l.gableHeightM(hi))) / 2 / area
	}
	return out
}

// roofDiagonalM and wallDiagonalM are the diagonals' lengths.
func (l bracingLayout) roofDiagonalM() float64 {
	return math.Hypot(2*l.slopeM/float64(l.roofPanels), l.bayM)
}

func (l bracingLayout) wallDiagonalM() float64 {
	return math.Hypot(l.eavesM/float64(l.wallPanels), l.bayM)
}

// roofDiagonals and wallDiagonals count the diagonals in the building.
func (l bracingLayout) roofDiagonals() int { return 2 * l.roofPanels * l.bracedBays }
func (l bracingLayout) wallDiagonals() int { return 2 * l.wallPanels * 2 * l.bracedBays }

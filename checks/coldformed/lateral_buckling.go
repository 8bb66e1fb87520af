package coldformed

import (
	"math"

	"github.com/spansweep/spansweep/catalog"
)

// MomentGradientCb is C_b = 12.5 M_max/(2.5 M_max + 3M_3 + 4M_4 + 3M_5) from
// the absolute moments at the segment's quarter points (M_3, M_4 = centre,
// M_5) and its largest absolute moment M_max.
// AS/NZS 4600:2018 cl. 3.3.3.2.1 (confirmed: S3). A zero M_max returns 1.
func MomentGradientCb(mMax, m3, m4, m5 float64) float64 {
	mMax, m3, m4, m5 = math.Abs(mMax), math.Abs(m3), math.Abs(m4), math.Abs(m5)
	if mMax == 0 {
		return 1
	}
	return 12.5 * mMax / (2.5*mMax + 3*m3 + 4*m4 + 3*m5)
}

// ElasticLTBMoment is M_o for bending about the major axis with lateral and
// torsional effective lengths ley, lez (mm), AS/NZS 4600:2018 cl. 3.3.3.2.1
// (confirmed: S3): M_o = C_b A r_o1 √(f_oy f_oz), f_oy = π²E/(l_ey/r_y)²,
// f_oz = (GJ + π²E I_w/l_ez²)/(A r_o1²). For a Z (point-symmetric) the
// factor 0.5 applies (from memory: cl. 3.3.3.2.1(b), AISI C3.1.2.1).
// A back-to-back 2C is doubly symmetric; the catalogue's r_o1 is used as is.
func ElasticLTBMoment(sec *catalog.Section, ley, lez, cb float64) float64 {
	p := sec.Properties
	ry := p.RyMM
	foy := math.Pi * math.Pi * E / ((ley / ry) * (ley / ry))
	foz := (G*p.JMM4 + math.Pi*math.Pi*E*p.IwMM6/(lez*lez)) / (p.AreaMM2 * p.RO1MM * p.RO1MM)
	mo := cb * p.AreaMM2 * p.RO1MM * math.Sqrt(foy*foz)
	if sec.Shape == catalog.ShapeZ {
		mo *= 0.5
	}
	return mo
}

// CriticalMoment is M_c from M_o and M_y = Z_f f_y, AS/NZS 4600:2018
// cl. 3.3.3.2.1 (confirmed: S3): M_o ≥ 2.78M_y: M_y; 0.56M_y < M_o <
// 2.78M_y: (10/9)M_y(1 − 10M_y/(36M_o)); M_o ≤ 0.56M_y: M_o.
func CriticalMoment(my, mo float64) float64 {
	switch {
	case mo >= 2.78*my:
		return my
	case mo > 0.56*my:
		return 10.0 / 9 * my * (1 - 10*my/(36*mo))
	default:
		return mo
	}
}

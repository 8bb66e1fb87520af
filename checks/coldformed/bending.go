package coldformed

import "math"

// MemberMoment is the nominal member moment capacity M_b about the major axis
// of a segment with lateral and torsional effective lengths ley, lez (mm) and
// moment-gradient factor cb, AS/NZS 4600:2018 cl. 3.3.3.2.1 (2005 form
// retained; from memory: REFERENCE-VALUES §5.4): M_b = Z_c f_c with
// f_c = M_c/Z_f and Z_c the effective modulus at f_c, never above M_s. It
// also returns M_o. Straps and rods return zeros.
func (c *Capacities) MemberMoment(ley, lez, cb float64, topInCompression bool) (mb, mo float64) {
	if !isFlexural(c.Section.Shape) {
		return 0, 0
	}
	sec := &c.Section
	zf := sec.ZxMM3
	my := zf * sec.FyMPa
	mo = ElasticLTBMoment(sec, ley, lez, cb)
	mc := CriticalMoment(my, mo)
	fc := mc / zf
	mb = c.effectiveModulusAt(fc, topInCompression) * fc
	return math.Min(mb, c.sectionMoment(topInCompression)), mo
}

func (c *Capacities) sectionMoment(topInCompression bool) float64 {
	if topInCompression {
		return c.MsTop
	}
	return c.MsBot
}

func (c *Capacities) distortionalMoment(topInCompression bool) float64 {
	if topInCompression {
		return c.MbdTop
	}
	return c.MbdBot
}

// flangeNames qualify check names by the compression flange: index 1 is
// the top flange (Geometry.FlangeMM; a purlin's fastened flange).
var flangeNames = [2][3]string{
	{"section moment capacity, major axis, bottom flange in compression",
		"member moment capacity, lateral-torsional buckling, bottom flange in compression",
		"member moment capacity, distortional buckling, bottom flange in compression"},
	{"section moment capacity, major axis, top flange in compression",
		"member moment capacity, lateral-torsional buckling, top flange in compression",
		"member moment capacity, distortional buckling, top flange in compression"},
}

func flangeIndex(top bool) int {
	if top {
		return 1
	}
	return 0
}

// sectionMomentCheck is cl. 3.3.2: φM_s = φZ_e f_y.
func (c *Capacities) sectionMomentCheck(mStar float64, top bool) Check {
	ms := c.sectionMoment(top)
	return newCheck("3.3.2", flangeNames[flangeIndex(top)][0], LimitStrength, mStar, PhiBending*ms, "N·mm",
		Input{InZe, ms / c.Section.FyMPa})
}

// ltbCheck is cl. 3.3.3.2 for the segment.
func (c *Capacities) ltbCheck(mStar float64, seg Segment, top bool) Check {
	ley, lez, cb := seg.lengths()
	mb, mo := c.MemberMoment(ley, lez, cb, top)
	return newCheck("3.3.3.2", flangeNames[flangeIndex(top)][1], LimitStability, mStar, PhiBending*mb, "N·mm",
		Input{InLey, ley}, Input{InLez, lez}, Input{InCb, cb}, Input{InMo, mo})
}

// distortionalCheck is cl. 3.3.3.3.
func (c *Capacities) distortionalCheck(mStar float64, top bool) Check {
	return newCheck("3.3.3.3", flangeNames[flangeIndex(top)][2], LimitStability, mStar,
		PhiBending*c.distortionalMoment(top), "N·mm", Input{InFod, c.fodBeam(top)})
}

func (c *Capacities) fodBeam(top bool) float64 {
	if top {
		return c.FodBeamTop
	}
	return c.FodBeamBot
}

// Segment is a length of member between lateral-torsional restraints for
// bending. Zero values take the defaults stated on each field.
type Segment struct {
	Length float64 // mm between restraints; required, > 0
	// K is the effective length factor applied to Length for both l_ey and
	// l_ez (AS/NZS 4600:2018 cl. 3.3.3.2.1); default 1.
	K float64
	// Cb is the moment-gradient factor; default 1 (uniform moment, the
	// conservative value). Use MomentGradientCb with the segment's
	// quarter-point moments.
	Cb float64
}

func (s Segment) lengths() (ley, lez, cb float64) {
	k, cb := s.K, s.Cb
	if k == 0 {
		k = 1
	}
	if cb == 0 {
		cb = 1
	}
	return k * s.Length, k * s.Length, cb
}

func (s Segment) validate(v *validator, path string) {
	v.positiveIn(path, ".Length", s.Length)
	v.nonNegativeIn(path, ".K", s.K)
	v.nonNegativeIn(path, ".Cb", s.Cb)
	if s.Cb > 2.3 {
		v.add("%s.Cb = %g, want ≤ 2.3", path, s.Cb)
	}
}

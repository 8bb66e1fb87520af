package coldformed

import "math"

// appendShearChecks appends shear (cl. 3.3.4) and combined bending and shear for
// unstiffened webs (cl. 3.3.5): (M*/φ_b M_s)² + (V*/φ_v V_v)² ≤ 1
// (confirmed: S3, 7.2.3.5). mAtV is the moment coincident with V*; M_s is
// the lesser of the two flange senses (conservative where the caller does
// not say which flange the coincident moment compresses).
func (c *Capacities) appendShearChecks(dst []Check, vStar, mAtV float64) []Check {
	ms := math.Min(c.MsTop, c.MsBot)
	// x*x, not math.Pow(x, 2): the same value (Pow squares the mantissa
	// and rescales exactly) without the call.
	mr, vr := mAtV/(PhiBending*ms), vStar/(PhiShear*c.Vv)
	sum := mr*mr + vr*vr
	return append(dst,
		newCheck("3.3.4", "shear capacity of web", LimitStrength, vStar, PhiShear*c.Vv, "N", Input{InD1, c.WebFlat}),
		newInteraction("3.3.5", "combined bending and shear", sum, Input{InM, mAtV}, Input{InV, vStar}))
}

package optimize

import "github.com/spansweep/spansweep/checks/coldformed"

// fastUtilisation is the beam-column utilisation of a segment in
// compression (or with no axial force) when there is no in-plane
// amplification (λc = ∞, l_ex → 0): the largest of AS/NZS 4600:2018
// cl. 3.5.1 N*/φN_c + M*/φM_bx (the (a) form with α_nx = 1, which also
// covers (b) since N_c ≤ N_s, and every single-action check it contains),
// cl. 3.3.4 V*/φV_v and cl. 3.3.5 (M*/φM_s)² + (V*/φV_v)². It equals what
// coldformed.CheckBeamColumn returns for these inputs (checked by
// TestFastUtilisationMatchesCheck) at a fraction of the cost, and bounds
// the utilisation under any finite λc from below. ok is false for tension
// or a finite λc, where the full check is needed.
func (s *memberSpec) fastUtilisation(in partInputs, mStar, length, cb float64, outer bool) (float64, bool) {
	if in.n < 0 || in.lex != lexFloor {
		return 0, false
	}
	c := s.cap
	if s.phiNc0 == 0 {
		nc, _ := c.MemberCompression(coldformed.EffectiveLengths{Lex: lexFloor, Ley: s.ley, Lez: s.ley})
		s.phiNc0 = coldformed.PhiCompression * min(nc, c.Ncd)
	}
	u := in.n / s.phiNc0
	if mStar > 0 {
		u += momentRatio(c, mStar, max(length, 1), cb, outer)
	}
	if in.v > 0 || in.mAtV > 0 {
		vr := in.v / (coldformed.PhiShear * c.Vv)
		mr := in.mAtV / (coldformed.PhiBending * min(c.MsTop, c.MsBot))
		u = max(u, max(vr, mr*mr+vr*vr))
	}
	return u, true
}

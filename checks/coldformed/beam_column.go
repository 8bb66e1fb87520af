package coldformed

import (
	"fmt"
	"math"
)

// BeamColumn is a rafter, column or strut: a C, Z or 2C member under axial
// force and bending about both axes.
type BeamColumn struct {
	// Compression gives the effective lengths for cl. 3.4 and for the
	// elastic buckling loads N_e of the amplification factors; Lex is the
	// in-plane length from the frame's buckling load factor.
	Compression EffectiveLengths
	// Bending is the major-axis segment between lateral-torsional restraints
	// (fly braces, girts or purlins on the compression flange).
	Bending Segment
	// Tension describes the connections where N* is tensile.
	Tension TensionMember
}

// BeamColumnActions are one combination's design actions (N, N·mm).
type BeamColumnActions struct {
	N  float64 // axial force: + compression, − tension
	Mx float64 // major-axis moment: + compresses the top flange (Geometry.FlangeMM), − the bottom
	My float64 // minor-axis moment (magnitude)
	// Cmx and Cmy are the moment factors C_m = 0.6 − 0.4M1/M2 of
	// cl. 3.5.1 for members not subject to sway; default 1 (conservative,
	// and the value for a member that sways).
	Cmx, Cmy         float64
	V, MomentAtShear float64 // largest shear and its coincident moment (magnitudes)
}

func (a BeamColumnActions) validate(v *validator) {
	v.finite("BeamColumnActions.N", a.N)
	v.finite("BeamColumnActions.Mx", a.Mx)
	v.finite("BeamColumnActions.My", a.My)
	v.nonNegative("BeamColumnActions.Cmx", a.Cmx)
	v.nonNegative("BeamColumnActions.Cmy", a.Cmy)
	v.nonNegative("BeamColumnActions.V", a.V)
	v.nonNegative("BeamColumnActions.MomentAtShear", a.MomentAtShear)
}

// CheckBeamColumn checks a member under combined axial force and bending:
// compression and bending with cl. 3.5.1, or tension and bending with
// cl. 3.5.2, plus shear (cl. 3.3.4, 3.3.5) where V > 0.
func CheckBeamColumn(c *Capacities, m BeamColumn, a BeamColumnActions) (MemberResult, error) {
	return CheckBeamColumnInto(make([]Check, 0, 12), c, m, a)
}

// CheckBeamColumnInto is CheckBeamColumn with the result's checks stored in
// buf's storage (from buf[:0], growing it if needed), for callers that
// check many segments and keep few results: the result is valid until buf
// is reused. The checks are the same as CheckBeamColumn's.
func CheckBeamColumnInto(buf []Check, c *Capacities, m BeamColumn, a BeamColumnActions) (MemberResult, error) {
	r := MemberResult{Designation: c.Section.Designation}
	var v validator
	if !isFlexural(c.Section.Shape) {
		v.add("section %s is a %s, which carries tension only; use CheckTension", c.Section.Designation, shapeName(c.Section.Shape))
	}
	m.Compression.validate(&v, "BeamColumn.Compression")
	m.Bending.validate(&v, "BeamColumn.Bending")
	a.validate(&v)
	if err := v.err(); err != nil {
		return r, fmt.Errorf("beam-column %s: %w", c.Section.Designation, err)
	}
	top := a.Mx >= 0
	mx, my := math.Abs(a.Mx), math.Abs(a.My)
	r.Checks = buf[:0]
	ltb, dist := c.ltbCheck(mx, m.Bending, top), c.distortionalCheck(mx, top)
	r.Checks = append(r.Checks, c.sectionMomentCheck(mx, top), ltb, dist)
	mbx := math.Min(ltb.CapacityValue, dist.CapacityValue) // φM_bx
	mby := PhiBending * c.MsY                              // φM_by
	r.Checks = append(r.Checks, newCheck("3.3.2", "section moment capacity, minor axis", LimitStrength, my, mby, "N·mm",
		Input{InZey, c.ZeY}))
	if a.N >= 0 {
		r.Checks = c.appendCompressionInteraction(r.Checks, a, m.Compression, mx, my, mbx, mby)
	} else {
		tc, err := c.tensionChecks(-a.N, m.Tension)
		if err != nil {
			return r, fmt.Errorf("beam-column %s: %w", c.Section.Designation, err)
		}
		r.Checks = append(r.Checks, tc[:]...)
		r.Checks = c.appendTensionInteraction(r.Checks, -a.N, math.Min(tc[0].CapacityValue, tc[1].CapacityValue), mx, my, mbx, mby)
	}
	if a.V > 0 || a.MomentAtShear > 0 {
		r.Checks = c.appendShearChecks(r.Checks, a.V, a.MomentAtShear)
	}
	return r, nil
}

// appendCompressionInteraction appends the compression checks and AS/NZS
// 4600:2018 cl. 3.5.1 (2005 form; from memory: REFERENCE-VALUES §5.9), with
// φ in every capacity:
// N*/φN_c ≤ 0.15: N*/φN_c + M*x/φM_bx + M*y/φM_by ≤ 1; otherwise both
// (a) N*/φN_c + C_mx M*x/(φM_bx α_nx) + C_my M*y/(φM_by α_ny) ≤ 1 with
// α_n = 1 − N*/N_e, N_e = π²EI/l_e², and (b) N*/φN_s + M*x/φM_bx + M*y/φM_by ≤ 1.
func (c *Capacities) appendCompressionInteraction(dst []Check, a BeamColumnActions, l EffectiveLengths, mx, my, mbx, mby float64) []Check {
	n := a.N
	cc, nc := c.compressionChecks(n, l)
	phiNc, phiNs := PhiCompression*nc, PhiCompression*c.Ns
	out := append(dst,
		newCheck("3.4.1", "section compression capacity", LimitStrength, n, phiNs, "N", Input{InAe, c.AeFy}),
		cc[0], cc[1])
	bend := ratio(mx, mbx) + ratio(my, mby)
	if ratio(n, phiNc) <= 0.15 {
		return append(out, newInteraction("3.5.1", "combined compression and bending (N*/φNc ≤ 0.15)",
			ratio(n, phiNc)+bend, Input{InN, n}, Input{InPhiNc, phiNc}))
	}
	p := c.Section.Properties
	nex := math.Pi * math.Pi * E * p.IxMM4 / (l.Lex * l.Lex)
	ney := math.Pi * math.Pi * E * p.IyMM4 / (l.Ley * l.Ley)
	cmx, cmy := orOne(a.Cmx), orOne(a.Cmy)
	ax, ay := 1-n/nex, 1-n/ney
	amplified := math.Inf(1) // α_n ≤ 0: the member buckles elastically under N*
	if ax > 0 && ay > 0 {
		amplified = ratio(n, phiNc) + cmx*ratio(mx, mbx)/ax + cmy*ratio(my, mby)/ay
	}
	return append(out,
		newInteraction("3.5.1(a)", "combined compression and bending, member stability", amplified,
			Input{InAlphaNx, ax}, Input{InAlphaNy, ay}, Input{InCmx, cmx}, Input{InCmy, cmy}, Input{InPhiNc, phiNc}),
		newInteraction("3.5.1(b)", "combined compression and bending, section strength", ratio(n, phiNs)+bend,
			Input{InPhiNs, phiNs}))
}

// appendTensionInteraction appends AS/NZS 4600:2018 cl. 3.5.2 (confirmed:
// S3, 7.2.5): (a) M*x/φM_bx + M*y/φM_by − N*/φN_t ≤ 1 and (b) N*/φN_t + M*x/φM_sxf +
// M*y/φM_syf ≤ 1 with M_sf = Z_f f_y of the full section.
func (c *Capacities) appendTensionInteraction(dst []Check, n, phiNt, mx, my, mbx, mby float64) []Check {
	sec := &c.Section
	msxf, msyf := PhiBending*sec.ZxMM3*sec.FyMPa, PhiBending*sec.ZyMM3*sec.FyMPa
	return append(dst,
		newInteraction("3.5.2(a)", "combined tension and bending, compression flange", ratio(mx, mbx)+ratio(my, mby)-ratio(n, phiNt),
			Input{InPhiNt, phiNt}),
		newInteraction("3.5.2(b)", "combined tension and bending, tension flange", ratio(n, phiNt)+ratio(mx, msxf)+ratio(my, msyf),
			Input{InPhiNt, phiNt}))
}

func orOne(x float64) float64 {
	if x == 0 {
		return 1
	}
	return x
}

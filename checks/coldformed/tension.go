package coldformed

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/catalog"
)

// TensionMember describes the connections of a strap, rod or any member in
// tension. Zero values take the stated defaults.
type TensionMember struct {
	// NetArea is A_n at the connection (mm²); default the gross area (no
	// holes). Ignored for rods, which use the tensile stress area.
	NetArea float64
	// Kt is the correction factor for the distribution of forces,
	// AS/NZS 4600:2018 cl. 3.2.2 (Table 3.2); default 1.
	Kt float64
}

// tensionChecks are the design tension checks, φN_t in N: gross yield and
// net-section (or, for a rod, threaded) fracture.
func (c *Capacities) tensionChecks(nStar float64, m TensionMember) ([2]Check, error) {
	sec := &c.Section
	var v validator
	v.nonNegative("NetArea", m.NetArea)
	v.nonNegative("Kt", m.Kt)
	if m.NetArea > sec.AreaMM2 {
		v.add("NetArea = %g, want ≤ gross area %g", m.NetArea, sec.AreaMM2)
	}
	if m.Kt > 1 {
		v.add("Kt = %g, want ≤ 1", m.Kt)
	}
	if sec.Shape == catalog.ShapeRod && !(sec.TensileStressAreaMM2 > 0) {
		v.add("section %s: TensileStressAreaMM2 = %g, want > 0 for a rod", sec.Designation, sec.TensileStressAreaMM2)
	}
	if err := v.err(); err != nil {
		return [2]Check{}, err
	}
	ag := sec.AreaMM2
	// Gross yield, AS/NZS 4600:2018 cl. 3.2.2(a): φ_t A_g f_y, φ_t = 0.9 (confirmed: S3).
	gross := newCheck("3.2.2(a)", "tension capacity, gross yield", LimitStrength, nStar, PhiTensionGross*ag*sec.FyMPa, "N",
		Input{InAg, ag})
	if sec.Shape == catalog.ShapeRod {
		// Threaded part: fracture on the tensile stress area A_s f_u with the
		// bolt-tension φ = 0.8 (AS/NZS 4600:2018 cl. 5.3.5, from memory).
		as := sec.TensileStressAreaMM2
		return [2]Check{gross, newCheck("5.3.5", "tension capacity, threaded rod fracture", LimitStrength, nStar,
			PhiRodThread*as*sec.FuMPa, "N", Input{InAs, as})}, nil
	}
	an, kt := m.NetArea, m.Kt
	if an == 0 {
		an = ag
	}
	if kt == 0 {
		kt = 1
	}
	// Net-section fracture, AS/NZS 4600:2018 cl. 3.2.2(b): φ_t 0.85 k_t A_n f_u
	// (formula confirmed: S3; φ_t = 0.9, see PhiTensionNet).
	net := newCheck("3.2.2(b)", "tension capacity, net-section fracture", LimitStrength, nStar,
		PhiTensionNet*0.85*kt*an*sec.FuMPa, "N", Input{InAn, an}, Input{InKt, kt})
	return [2]Check{gross, net}, nil
}

// CheckTension checks a strap, rod or other member under axial tension
// nStar (N, > 0 in tension). Straps and rods carry tension only.
func CheckTension(c *Capacities, m TensionMember, nStar float64) (MemberResult, error) {
	r := MemberResult{Designation: c.Section.Designation}
	if math.IsNaN(nStar) || math.IsInf(nStar, 0) || nStar < 0 {
		return r, fmt.Errorf("section %s: tension: N* = %g, want a finite tension ≥ 0: %w", c.Section.Designation, nStar, ErrInput)
	}
	checks, err := c.tensionChecks(nStar, m)
	if err != nil {
		return r, fmt.Errorf("section %s: tension: %w", c.Section.Designation, err)
	}
	r.Checks = append(make([]Check, 0, 2), checks[:]...)
	return r, nil
}

package report

import (
	"fmt"

	"github.com/spansweep/spansweep/checks/wind"
)

// windDerivation shows the speeds and multipliers, ULS beside SLS.
func (r Report) windDerivation(s *section) {
	c := r.calc()
	if c == nil {
		s.para(notRecorded)
		return
	}
	sp := c.Wind.Speeds
	s.para("Source: " + sp.Source + ".")
	t := newTable("Quantity", "Reference", "ULS", "SLS").
		row("Reference height h, average roof height (m)", "AS/NZS 1170.2:2021 cl. 2.5", num(sp.ReferenceHeightM, 3), num(sp.ReferenceHeightM, 3)).
		row("Annual probability of exceedance", "AS/NZS 1170.0:2002 Table F2", oneIn(sp.AnnualProbabilityULS), oneIn(sp.AnnualProbabilitySLS))
	if isSite(sp) {
		same := func(name, ref string, v float64) { t.row(name, ref, num(v, 4), num(v, 4)) }
		t.row("Regional gust speed V_R (m/s)", "AS/NZS 1170.2:2021 Table 3.1(A)", num(sp.VRULSMS, 1), num(sp.VRSLSMS, 1))
		same("Climate change multiplier M_c", "AS/NZS 1170.2:2021 cl. 3.4", sp.Mc)
		same("Direction multiplier M_d", "AS/NZS 1170.2:2021 cl. 3.3", sp.Md)
		same("Terrain/height multiplier M_z,cat", "AS/NZS 1170.2:2021 Table 4.1", sp.Mzcat)
		same("Shielding multiplier M_s", "AS/NZS 1170.2:2021 cl. 4.3", sp.Ms)
		same("Topographic multiplier M_t", "AS/NZS 1170.2:2021 cl. 4.4", sp.Mt)
		t.row("Site speed V_sit = V_R·M_c·M_d·M_z,cat·M_s·M_t (m/s)", "AS/NZS 1170.2:2021 cl. 2.2", num(sp.VSitULSMS, 2), num(sp.VSitSLSMS, 2))
	} else {
		t.row("Site speed V_sit, the class speed (m/s)", "AS 4055-2021 Table 2.1", num(sp.VSitULSMS, 2), num(sp.VSitSLSMS, 2))
	}
	t.row("Design speed V_des (ULS ≥ 30 m/s) (m/s)", "AS/NZS 1170.2:2021 cl. 2.3", num(sp.VDesULSMS, 2), num(sp.VDesSLSMS, 2)).
		row("Dynamic pressure q = 0.6·V_des²/1000, C_dyn = 1 (kPa)", "AS/NZS 1170.2:2021 cl. 2.4", num(sp.QULSKPa, 4), num(sp.QSLSKPa, 4))
	s.add(t)
	if !isSite(sp) {
		s.para("A housing wind class gives the site speed directly: terrain, shielding and topography are included in the class, so V_R and the multipliers do not apply.")
	}
	s.add(newTable("Local pressure dimension a (AS/NZS 1170.2:2021 cl. 5.4.4)", "m").
		row("Walls", num(c.Wind.LocalDimensionWallM, 3)).
		row("Roof", num(c.Wind.LocalDimensionRoofM, 3)))
}

// isSite reports whether the speeds come from a region and site (not a
// housing class, whose multipliers are reported as 0).
func isSite(sp wind.Speeds) bool { return sp.Mzcat > 0 }

// pressures gives every wind case's zones and the purlin and girt design
// pressures.
func (r Report) pressures(s *section) {
	c := r.calc()
	if c == nil {
		s.para(notRecorded)
		return
	}
	s.para("Net pressures, external minus internal, inward positive. Zones run from the windward edge in the wind direction (m, plan distance). Frame pressures use C_fig = C_p,e·K_a·K_c,e − C_p,i·K_c,i (AS/NZS 1170.2:2021 cl. 5.2, 5.4); purlins and girts use C_p,e − C_p,i with K_a = K_c = 1.")
	for _, wc := range c.Wind.Cases {
		s.add(&subheading{text: fmt.Sprintf("%s (C_p,i %s, K_c,i %s)", wc.Name, signed(wc.Internal.Cpi, 2), num(wc.Kci, 2))})
		t := newTable("Surface", "K_a", "K_a·K_c,e", "From (m)", "To (m)", "C_p,e", "C_fig frame", "C_fig member", "p ULS (kPa)", "p SLS (kPa)")
		for _, sf := range wc.Surfaces {
			for _, z := range sf.Zones {
				t.row(sf.Kind.String(), num(sf.Ka, 3), num(sf.KaKce, 2), num(z.FromM, 2), num(z.ToM, 2),
					signed(z.Cpe, 3), signed(z.CfigFrame, 3), signed(z.CfigMember, 3), signed(z.PressureULSKPa, 3), signed(z.PressureSLSKPa, 3))
			}
		}
		s.add(t)
	}
	s.add(&subheading{text: "Purlin and girt design pressures (envelope of every case)"})
	t := newTable("Members", "Inward ULS (kPa)", "Inward SLS (kPa)", "Outward ULS (kPa)", "Outward SLS (kPa)", "Edge K_l", "Edge width (m)", "Edge outward ULS (kPa)", "Edge outward SLS (kPa)")
	for _, m := range []struct {
		name string
		p    wind.MemberPressures
	}{{"purlins", c.Wind.Purlins}, {"girts", c.Wind.Girts}} {
		p := m.p
		t.row(m.name, signed(p.GeneralInward.ULSKPa, 3), signed(p.GeneralInward.SLSKPa, 3),
			signed(p.GeneralOutward.ULSKPa, 3), signed(p.GeneralOutward.SLSKPa, 3),
			num(p.EdgeKl, 1), num(p.EdgeWidthM, 2), signed(p.EdgeOutward.ULSKPa, 3), signed(p.EdgeOutward.SLSKPa, 3))
	}
	s.add(t)
}

package report

import (
	"fmt"
	"strings"

	"github.com/spansweep/spansweep/checks/actions"
)

// loadCases lists the primary cases and the named combinations.
func (r Report) loadCases(s *section) {
	c := r.calc()
	if c == nil {
		s.para(notRecorded)
		return
	}
	prim := newTable("Primary case", "Action", "Value").
		row(string(actions.G), "Dead: roof cladding and services, on the sloping roof (kPa)", num(c.Dead.RoofKPa, 3)).
		row(string(actions.G), "Dead: wall cladding (kPa)", num(c.Dead.WallKPa, 3)).
		row(string(actions.G), "Dead: member self weight", "from the sections chosen").
		row(string(actions.Q), "Roof live, distributed on a frame's tributary plan area, AS/NZS 1170.1:2002 Table 3.2 (kPa)", num(c.RoofLiveKPa, 3)).
		row(string(actions.Q), "Roof live, concentrated: cladding / structure, AS/NZS 1170.1:2002 Table 3.2 (kN)",
			fmt.Sprintf("%s / %s", short(actions.RoofPointCladdingKN), short(actions.RoofPointStructuralKN)))
	if c.Hoist.LoadKN > 0 {
		prim.row(string(actions.H), "Hoist point load on the rafter (kN), at x from the left column (m)",
			fmt.Sprintf("%s at %s", num(c.Hoist.LoadKN, 2), num(c.Hoist.PositionM, 2)))
	}
	for _, wc := range c.Wind.Cases {
		prim.row(string(actions.WindPrimary(wc.Name)), "Wind, at the ULS pressures of its zones", "section 4")
	}
	s.add(&subheading{text: "Primary load cases"}, prim)
	comb := newTable("Combination", "Limit state", "Factors")
	for _, cb := range c.Combinations {
		comb.row(cb.Name, cb.LimitState.String(), factorText(cb))
	}
	s.add(&subheading{text: "Combinations (AS/NZS 1170.0:2002 cl. 4.2)"}, comb)
	s.para(fmt.Sprintf("Roof ψ factors (AS/NZS 1170.0:2002 Table 4.1): ψ_s = %s, ψ_c = %s. Wind primaries carry ULS pressures; SLS wind combinations scale them by q_s/q_u.",
		short(actions.PsiSRoof), short(actions.PsiCRoof)))
}

// factorText writes a combination as "1.2 × G + 1.5 × Q".
func factorText(c actions.Combination) string {
	terms := make([]string, len(c.Factors))
	for i, f := range c.Factors {
		terms[i] = fmt.Sprintf("%s × %s", short(f.Factor), f.Case)
	}
	return strings.Join(terms, " + ")
}

package optimize

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/coldformed"
	"github.com/spansweep/spansweep/checks/wind"
)

// strutAction is one combination on a purlin acting as a bracing strut:
// its axial force from the bracing (N, compression positive) and its line
// load normal to the roof (N/mm = kN/m, inward positive).
type strutAction struct {
	solve  *bracingSolve
	term   strutTerm
	axialN float64
	wNmm   float64
}

// strutTerm is which bending a strut action pairs with its solve.
type strutTerm int

const (
	strutGravity  strutTerm = iota // 1.2G+1.5Q with the restraint forces alone
	strutSuction                   // roof suction with 0.9G
	strutPressure                  // roof pressure with 1.2G
)

// combination names the action for check lines; it is built only when a
// check line or a reason needs it.
func (a strutAction) combination() string {
	switch a.term {
	case strutSuction:
		return a.solve.label() + ", roof suction with 0.9G"
	case strutPressure:
		return a.solve.labelWith("1.2G") + ", roof pressure with 1.2G"
	}
	return a.solve.label()
}

// roofStrutN is the largest strut compression of a solve (N): interior
// purlins from the roof bay alone; the eave purlin adds the side-wall
// bay's top strut force, since it is the top strut of both bays.
func (s bracingSolve) roofStrutN() float64 {
	n := len(s.roof.strutN) - 1
	eave := math.Max(s.roof.strutN[0], s.roof.strutN[n]) + math.Max(s.wall.strutN[len(s.wall.strutN)-1], 0)
	worst := eave
	for _, f := range s.roof.strutN[1:n] {
		worst = math.Max(worst, f)
	}
	return worst
}

// strutActions pairs each solve's strut force with the purlin's bending in
// the same combination: roof wind pressure of the case over the end bay
// (the most adverse roof zone within one bay of the windward end, C_fig of
// a member: K_a = K_c = 1) with 0.9G or 1.2G; the gravity case with
// 1.2G+1.5Q (AS/NZS 1170.1:2002 Table 3.2 on the purlin's plan area).
func (d *designer) strutActions(solves []bracingSolve, sec catalog.Section) []strutAction {
	return d.strutActionsOn(d.strutLoads(solves), sec, nil)
}

// strutLoad is what strutActions takes from one solve, the same for every
// section: the strut force and, for a wind case, the end bay's lowest and
// highest roof C_fig.
type strutLoad struct {
	solve          *bracingSolve
	axialN         float64
	cfigLo, cfigHi float64
}

func (d *designer) strutLoads(solves []bracingSolve) []strutLoad {
	out := make([]strutLoad, len(solves))
	for i := range solves {
		sv := &solves[i]
		out[i] = strutLoad{solve: sv, axialN: sv.roofStrutN()}
		if sv.cas.windCase >= 0 {
			out[i].cfigLo, out[i].cfigHi = d.endBayRoofCfig(&d.act.Wind.Cases[sv.cas.windCase])
		}
	}
	return out
}

// strutActionsOn is strutActions from the solves' loads, appended to buf.
func (d *designer) strutActionsOn(loads []strutLoad, sec catalog.Section, buf []strutAction) []strutAction {
	cosA := math.Cos(d.c.RoofPitchDeg * math.Pi / 180)
	s := d.purlin.SpacingM
	g := (d.act.Dead.RoofKPa*s + sec.MassKgPerM*9.80665e-3) * cosA // kN/m normal to the roof
	q, _ := actions.RoofLiveKPa(s * cosA * d.c.BaySpacingM)
	qu := d.act.Wind.Speeds.QULSKPa
	out := buf
	for _, l := range loads {
		if l.solve.cas.windCase < 0 {
			out = append(out, strutAction{solve: l.solve, term: strutGravity, axialN: l.axialN, wNmm: 1.2*g + 1.5*q*s*cosA*cosA})
			continue
		}
		out = append(out,
			strutAction{solve: l.solve, term: strutSuction, axialN: l.axialN, wNmm: 0.9*g + l.cfigLo*qu*s},
			strutAction{solve: l.solve, term: strutPressure, axialN: l.axialN, wNmm: 1.2*g + l.cfigHi*qu*s})
	}
	return out
}

// endBayRoofCfig returns the lowest and highest member C_fig of the roof
// zones within one bay of the windward end.
func (d *designer) endBayRoofCfig(c *wind.WindCase) (lo, hi float64) {
	lo, hi = math.Inf(1), math.Inf(-1)
	for _, s := range c.Surfaces {
		if !s.Kind.IsRoof() {
			continue
		}
		for _, z := range s.Zones {
			if z.FromM < d.c.BaySpacingM {
				lo, hi = math.Min(lo, z.CfigMember), math.Max(hi, z.CfigMember)
			}
		}
	}
	if math.IsInf(lo, 0) {
		return 0, 0
	}
	return lo, hi
}

// strutVerdict is a purlin section's checks as a strut.
type strutVerdict struct {
	governing Governing
	checks    []CheckLine
}

// checkStrut checks a purlin section as a simply supported beam-column over
// one bay (conservative for continuous and lapped lines): compression with
// l_ex = bay and l_ey = l_ez = bay / (bridging rows + 1); bending M* = wL²/8
// with the compressed flange's segment between bridging rows (the
// sheeting's restraint ignored: conservative); combined actions
// AS/NZS 4600:2018 cl. 3.5.1 (compression) or 3.5.2 (tension).
func (d *designer) checkStrut(sec catalog.Section, acts []strutAction, bridging int, keep bool) strutVerdict {
	var v strutVerdict
	caps, err := capacitiesFor(d.cat).of(sec)
	if err != nil || caps == nil {
		v.governing = Governing{Check: fmt.Sprintf("section %s could not be assessed: %v", sec.Designation, err), Utilisation: math.Inf(1)}
		return v
	}
	L := d.c.BaySpacingM * 1e3
	seg := L / float64(bridging+1)
	m := coldformed.BeamColumn{Compression: coldformed.EffectiveLengths{Lex: L, Ley: seg, Lez: seg},
		Bending: coldformed.Segment{Length: seg}}
	gov := -1 // the governing action, named at the end
	named := func() strutVerdict {
		if gov >= 0 {
			v.governing.Combination = acts[gov].combination()
		}
		return v
	}
	for i, a := range acts {
		act := coldformed.BeamColumnActions{N: a.axialN, Mx: a.wNmm * L * L / 8, V: math.Abs(a.wNmm) * L / 2}
		res, err := coldformed.CheckBeamColumn(caps, m, act)
		if err != nil {
			v.governing = Governing{Check: err.Error(), Utilisation: math.Inf(1)}
			return v
		}
		if keep {
			res.SetCombination(a.combination())
		}
		if g := governingOf(res.Governing()); g.Utilisation > v.governing.Utilisation || v.governing.Check == "" {
			v.governing, gov = g, i
		}
		if keep {
			for _, c := range res.Checks {
				v.checks = append(v.checks, checkLineOf("purlin strut "+sec.Designation, c))
			}
		} else if v.governing.Utilisation > 1 {
			return named() // fails: the other combinations need not be checked
		}
	}
	return named()
}

// strutChoice is the section the braced bays' purlins take as struts.
type strutChoice struct {
	sec      catalog.Section
	verdict  strutVerdict
	bridging int     // bridging rows per span in the braced bays
	extraKg  float64 // mass added over the chosen purlins and their bridging
	// extraObjective is the upgrade in the purlin search's objective:
	// extraKg, or its cost with a price table (upgradeObjective).
	extraObjective float64
	searched       int
}

// designStruts checks the chosen purlin as a strut; where it fails, the
// braced bays' purlins are upgraded to the lightest section of the purlin
// families, at least as heavy as the purlin, that passes both as a strut
// and (being heavier and of the same families) as a purlin, which is
// checked as a strut only: stated. With a price table a section must also
// be at least as dear per metre: one cheaper per metre fails as a purlin
// in this arrangement, or the purlin search would have chosen it. So an
// upgrade never lowers the objective. ok is false when none passes (none
// below d.strutBudget, where frameAndBracing sets one for a trial that
// only that could make the choice).
func (d *designer) designStruts(solves []bracingSolve, l bracingLayout) (strutChoice, bool) {
	budget := d.strutBudget
	if budget == 0 {
		budget = math.Inf(1)
	}
	best, closest, ok := d.strutUpgrade(solves, l, budget)
	if !ok {
		g := closest.governing
		d.fail(RoleRoofBracing, fmt.Sprintf("no purlin section passes as a bracing strut (purlin %s and heavier of families %v); closest at utilisation %.2f, failing %s (%s %s, %s)",
			d.purlin.Section.Designation, d.c.Options.Members.PurlinFamilies, g.Utilisation, g.Check, g.Standard, g.Clause, g.Combination))
		return strutChoice{}, false
	}
	// The check lines are kept for a recorded calculation only; the
	// governing check is the same either way.
	best.verdict = d.checkStrut(best.sec, d.strutActions(solves, best.sec), best.bridging, d.r.Calculation != nil)
	return best, true
}

// strutUpgrade returns the least upgrade of designStruts whose objective
// is below budget, the failure closest to passing, and false when no
// upgrade below budget passes. Upgrades at or above budget are not checked
// (not even with Settings.Exhaustive: the budget is the caller's bound).
func (d *designer) strutUpgrade(solves []bracingSolve, l bracingLayout, budget float64) (strutChoice, strutVerdict, bool) {
	p := d.purlin.Section
	secs := d.lineSections(d.c.Options.Members.PurlinFamilies)
	cands := make([]catalog.Section, 1, 1+len(secs))
	cands[0] = p // the chosen purlin first, then heavier sections of its families
	for _, sec := range secs {
		if sec.MassKgPerM >= p.MassKgPerM && sec.Designation != p.Designation &&
			d.pricePerKg(sec.Designation)*sec.MassKgPerM >= d.pricePerKg(p.Designation)*p.MassKgPerM {
			cands = append(cands, sec)
		}
	}
	// The braced bays may also take more bridging rows than the rest of the
	// roof: each (rows, section) pair is priced by what it adds to the
	// purlin search's objective, so the upgrade is the lightest (or
	// cheapest) of heavier struts and more bridging. The candidates are in
	// the order of that price, so those below budget are a prefix.
	loads := d.strutLoads(solves)
	var acts []strutAction
	var best *strutChoice
	var closest strutVerdict
	searched := 0
	for rows := d.purlin.Bridging; rows <= maxBridgingRows; rows++ {
		n := 0
		for n < len(cands) {
			if _, obj := d.upgradeObjective(l, cands[n], rows); !(obj < budget) {
				break
			}
			n++
		}
		if n == 0 {
			break // more rows cost more still
		}
		sec, cl, k := lightestPassing(cands[:n], d.s != nil && d.s.Exhaustive,
			func(sec catalog.Section) strutVerdict {
				acts = d.strutActionsOn(loads, sec, acts[:0])
				return d.checkStrut(sec, acts, rows, false)
			})
		searched += k
		if closest.governing.Check == "" || (cl.governing.Check != "" && cl.governing.Utilisation < closest.governing.Utilisation) {
			closest = cl
		}
		if sec == nil {
			continue
		}
		kg, obj := d.upgradeObjective(l, *sec, rows)
		if best == nil || obj < best.extraObjective {
			best = &strutChoice{sec: *sec, bridging: rows, extraKg: kg, extraObjective: obj}
		}
	}
	if best == nil {
		return strutChoice{}, closest, false
	}
	best.searched = searched
	return *best, closest, true
}

// upgradeObjective returns the steel that struts of sec with rows bridging
// rows in the braced bays add over the chosen purlins, and the same in the
// purlin search's objective (lineObjective): that mass, or with a price
// table the steel priced by family and each added bridging row of a line
// in a bay at the table's price per row.
func (d *designer) upgradeObjective(l bracingLayout, sec catalog.Section, rows int) (kg, objective float64) {
	p := d.purlin
	struts := float64((l.roofPanels + 1) * l.bracedBays)
	bridgingPieces := float64(2 * max(len(p.PositionsM)-1, 1) * l.bracedBays) // per row, both slopes
	added := float64(rows - p.Bridging)
	kg = (sec.MassKgPerM-p.Section.MassKgPerM)*l.bayM*struts + added*bridgingPieces*p.SpacingM*bridgingKgPerM
	costs := d.c.Options.Costs
	if costs == nil {
		return kg, kg
	}
	steel := (sec.MassKgPerM*costs.PerKg[familyOf(sec.Designation)] - p.Section.MassKgPerM*costs.PerKg[familyOf(p.Section.Designation)]) * l.bayM * struts
	return kg, steel + added*float64(2*len(p.PositionsM)*l.bracedBays)*costs.PerBridgingRow
}

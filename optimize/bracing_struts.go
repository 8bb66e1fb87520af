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
	combination string
	axialN      float64
	wNmm        float64
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
	cosA := math.Cos(d.c.RoofPitchDeg * math.Pi / 180)
	s := d.purlin.SpacingM
	g := (d.act.Dead.RoofKPa*s + sec.MassKgPerM*9.80665e-3) * cosA // kN/m normal to the roof
	var out []strutAction
	for _, sv := range solves {
		n := sv.roofStrutN()
		if sv.cas.windCase < 0 {
			q, _ := actions.RoofLiveKPa(s * cosA * d.c.BaySpacingM)
			out = append(out, strutAction{combination: sv.label(), axialN: n, wNmm: 1.2*g + 1.5*q*s*cosA*cosA})
			continue
		}
		lo, hi := d.endBayRoofCfig(&d.act.Wind.Cases[sv.cas.windCase])
		qu := d.act.Wind.Speeds.QULSKPa
		out = append(out,
			strutAction{combination: sv.label() + ", roof suction with 0.9G", axialN: n, wNmm: 0.9*g + lo*qu*s},
			strutAction{combination: sv.labelWith("1.2G") + ", roof pressure with 1.2G", axialN: n, wNmm: 1.2*g + hi*qu*s})
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
	for _, a := range acts {
		act := coldformed.BeamColumnActions{N: a.axialN, Mx: a.wNmm * L * L / 8, V: math.Abs(a.wNmm) * L / 2}
		res, err := coldformed.CheckBeamColumn(caps, m, act)
		if err != nil {
			v.governing = Governing{Check: err.Error(), Utilisation: math.Inf(1)}
			return v
		}
		res.SetCombination(a.combination)
		if g := governingOf(res.Governing()); g.Utilisation > v.governing.Utilisation || v.governing.Check == "" {
			v.governing = g
		}
		if keep {
			for _, c := range res.Checks {
				v.checks = append(v.checks, checkLineOf("purlin strut "+sec.Designation, c))
			}
		}
	}
	return v
}

// strutChoice is the section the braced bays' purlins take as struts.
type strutChoice struct {
	sec      catalog.Section
	verdict  strutVerdict
	bridging int     // bridging rows per span in the braced bays
	extraKg  float64 // mass added over the chosen purlins and their bridging
	searched int
}

// designStruts checks the chosen purlin as a strut; where it fails, the
// braced bays' purlins are upgraded to the lightest section of the purlin
// families, at least as heavy as the purlin, that passes both as a strut
// and (being heavier and of the same families) as a purlin, which is
// checked as a strut only: stated. ok is false when none passes.
func (d *designer) designStruts(solves []bracingSolve, l bracingLayout) (strutChoice, bool) {
	p := d.purlin.Section
	cands := []catalog.Section{p} // the chosen purlin first, then heavier sections of its families
	for _, sec := range d.lineSections(d.c.Options.Members.PurlinFamilies) {
		if sec.MassKgPerM >= p.MassKgPerM && sec.Designation != p.Designation {
			cands = append(cands, sec)
		}
	}
	// The braced bays may also take more bridging rows than the rest of the
	// roof: each (rows, section) pair is priced by the steel it adds, so the
	// upgrade is the lightest of heavier struts and more bridging.
	struts := float64((l.roofPanels + 1) * l.bracedBays)
	bridgingPieces := float64(2 * max(len(d.purlin.PositionsM)-1, 1) * l.bracedBays) // per row, both slopes
	var best *strutChoice
	var closest strutVerdict
	searched := 0
	for rows := d.purlin.Bridging; rows <= maxBridgingRows; rows++ {
		sec, cl, n := lightestPassing(cands, d.s != nil && d.s.Exhaustive,
			func(sec catalog.Section) strutVerdict {
				return d.checkStrut(sec, d.strutActions(solves, sec), rows, false)
			})
		searched += n
		if closest.governing.Check == "" || (cl.governing.Check != "" && cl.governing.Utilisation < closest.governing.Utilisation) {
			closest = cl
		}
		if sec == nil {
			continue
		}
		extra := (sec.MassKgPerM-p.MassKgPerM)*l.bayM*struts +
			float64(rows-d.purlin.Bridging)*bridgingPieces*d.purlin.SpacingM*bridgingKgPerM
		if best == nil || extra < best.extraKg {
			best = &strutChoice{sec: *sec, bridging: rows, extraKg: extra}
		}
	}
	if best == nil {
		g := closest.governing
		d.fail(RoleRoofBracing, fmt.Sprintf("no purlin section passes as a bracing strut (purlin %s and heavier of families %v); closest at utilisation %.2f, failing %s (%s %s, %s)",
			p.Designation, d.c.Options.Members.PurlinFamilies, g.Utilisation, g.Check, g.Standard, g.Clause, g.Combination))
		return strutChoice{}, false
	}
	best.searched = searched
	best.verdict = d.checkStrut(best.sec, d.strutActions(solves, best.sec), best.bridging, true)
	return *best, true
}

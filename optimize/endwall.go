package optimize

import (
	"fmt"
	"math"
	"slices"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/coldformed"
)

// endWallColumnMaxSpacingM is the largest spacing of end-wall columns
// (mullions) across a gable: a gable of span L has ceil(L/3) − 1 of them,
// equally spaced (common practice, no source; the grid has no option yet).
const endWallColumnMaxSpacingM = 3.0

// endWallLayout places the mullions of one end wall.
type endWallLayout struct {
	spacingM  float64   // between mullions (and the corner columns)
	positions []float64 // plan distance from one eave, m
	heightsM  []float64 // base to rafter at each mullion
}

func (d *designer) layoutEndWall(l bracingLayout) endWallLayout {
	n := max(0, int(math.Ceil(l.spanM/endWallColumnMaxSpacingM-1e-9))-1)
	e := endWallLayout{spacingM: l.spanM / float64(n+1)}
	for i := 1; i <= n; i++ {
		u := float64(i) * e.spacingM
		e.positions = append(e.positions, u)
		e.heightsM = append(e.heightsM, l.gableHeightM(u))
	}
	return e
}

// tallestM is the tallest mullion's height.
func (e endWallLayout) tallestM() float64 {
	var h float64
	for _, x := range e.heightsM {
		h = math.Max(h, x)
	}
	return h
}

// endWalls designs the end-wall columns and girts. The end frames are the
// same section as the interior frames (the default, stated in the report).
func (d *designer) endWalls() bool {
	l := d.layoutBracing()
	e := d.layoutEndWall(l)
	girtSpacing := d.endWallGirtSpacingM()
	if len(e.heightsM) > 0 && !d.designMullions(e, girtSpacing) {
		return false
	}
	return d.designEndWallGirts(l, e, girtSpacing)
}

// endWallGirtSpacingM is the side-wall girts' spacing, or the cladding's
// largest girt spacing when the side walls have none.
func (d *designer) endWallGirtSpacingM() float64 {
	if d.girt.SpacingM > 0 {
		return d.girt.SpacingM
	}
	return d.c.Options.Cladding.MaxGirtSpacingM
}

// mullionAction is one combination on the tallest mullion: the line load
// normal to the wall (N/mm, inward positive) and the axial force (N).
type mullionAction struct {
	name   string
	sls    bool
	wNmm   float64
	axialN float64
}

// mullionActions are the wall wind envelopes on the mullion's tributary
// width: the girts' member pressures (every wall of every wind case, both
// end walls' windward and leeward values included; K_a = K_c = 1,
// conservative for a mullion's larger area), inward and outward, with
// 1.2G or 0.9G of the wall cladding and the mullion's weight as axial
// force (AS/NZS 1170.0:2002 cl. 4.2.2).
func (d *designer) mullionActions(e endWallLayout, sec catalog.Section) []mullionAction {
	h := e.tallestM()
	g := (d.act.Dead.WallKPa*e.spacingM*h + sec.MassKgPerM*9.80665e-3*h) * 1e3 // N
	p := d.act.Wind.Girts
	s := e.spacingM
	return []mullionAction{
		{name: "ULS 1.2G+Wu inward", wNmm: p.GeneralInward.ULSKPa * s, axialN: 1.2 * g},
		{name: "ULS 0.9G+Wu outward", wNmm: p.GeneralOutward.ULSKPa * s, axialN: 0.9 * g},
		{name: "SLS G+Ws inward", sls: true, wNmm: p.GeneralInward.SLSKPa * s},
		{name: "SLS G+Ws outward", sls: true, wNmm: p.GeneralOutward.SLSKPa * s},
	}
}

// checkMullion checks the tallest mullion as a simply supported
// beam-column, base pinned and top held by the end rafter and the roof
// bracing: M* = wH²/8, V* = wH/2, l_ex = H, l_ey = l_ez = girt spacing.
// Inward wind compresses the outer flange, held by the girts (segment =
// girt spacing); outward wind the inner flange, free over the height (no
// fly braces: conservative). Combined actions AS/NZS 4600:2018 cl. 3.5.1;
// deflection H/(girt deflection ratio of the grid) at SLS, 5wH⁴/384EI.
func (d *designer) checkMullion(e endWallLayout, sec catalog.Section, girtSpacingM float64, keep bool) strutVerdict {
	var v strutVerdict
	caps, err := capacitiesFor(d.cat).of(sec)
	if err != nil || caps == nil {
		v.governing = Governing{Check: fmt.Sprintf("section %s could not be assessed: %v", sec.Designation, err), Utilisation: math.Inf(1)}
		return v
	}
	H := e.tallestM() * 1e3
	sg := math.Min(girtSpacingM*1e3, H)
	take := func(g Governing, lines ...CheckLine) {
		if g.Utilisation > v.governing.Utilisation || v.governing.Check == "" {
			v.governing = g
		}
		if keep {
			v.checks = append(v.checks, lines...)
		}
	}
	for _, a := range d.mullionActions(e, sec) {
		if a.sls {
			ratio := d.c.Options.Limits.GirtDeflectionRatio
			delta := 5 * math.Abs(a.wNmm) * math.Pow(H, 4) / (384 * steelE * sec.IxMM4)
			g := Governing{Check: fmt.Sprintf("deflection, height/%g", ratio), Standard: "AS/NZS 1170.0:2002",
				Clause: "cl. 4.3, Appendix C (limit from the grid's girt ratio)", LimitState: "SLS", Combination: a.name,
				Utilisation: delta / (H / ratio)}
			take(g, CheckLine{Member: "end-wall column " + sec.Designation, Name: g.Check, Standard: g.Standard, Clause: g.Clause,
				LimitState: "SLS", Combination: a.name, Demand: delta, Capacity: H / ratio, Unit: "mm", Utilisation: g.Utilisation})
			continue
		}
		seg := H
		if a.wNmm >= 0 {
			seg = sg
		}
		m := coldformed.BeamColumn{Compression: coldformed.EffectiveLengths{Lex: H, Ley: sg, Lez: sg},
			Bending: coldformed.Segment{Length: seg}}
		res, err := coldformed.CheckBeamColumnInto(d.checkBuf, caps, m, coldformed.BeamColumnActions{N: a.axialN, Mx: a.wNmm * H * H / 8,
			V: math.Abs(a.wNmm) * H / 2})
		if err != nil {
			v.governing = Governing{Check: err.Error(), Utilisation: math.Inf(1)}
			return v
		}
		d.checkBuf = res.Checks
		res.SetCombination(a.name)
		take(governingOf(res.Governing()), keptLines(keep, "end-wall column "+sec.Designation, res)...)
	}
	return v
}

// mullionSections are the C and back-to-back C sections, lightest first.
func (d *designer) mullionSections() []catalog.Section {
	out := append(d.byShape(catalog.ShapeC), d.byShape(catalog.Shape2C)...)
	slices.SortStableFunc(out, func(a, b catalog.Section) int { return cmpFloat(a.MassKgPerM, b.MassKgPerM) })
	return out
}

// designMullions picks the lightest passing mullion section; every mullion
// of both end walls takes the tallest one's section.
func (d *designer) designMullions(e endWallLayout, girtSpacingM float64) bool {
	best, closest, searched := lightestPassing(d.mullionSections(), d.s != nil && d.s.Exhaustive,
		func(sec catalog.Section) strutVerdict { return d.checkMullion(e, sec, girtSpacingM, false) })
	if best == nil {
		g := closest.governing
		d.fail(RoleEndWallColumn, fmt.Sprintf("no C or 2C section passes as a %.2f m end-wall column at %.2f m spacing; closest at utilisation %.2f, failing %s (%s %s, %s)",
			e.tallestM(), e.spacingM, g.Utilisation, g.Check, g.Standard, g.Clause, g.Combination))
		return false
	}
	v := d.checkMullion(e, *best, girtSpacingM, true)
	var total float64
	for _, h := range e.heightsM {
		total += h
	}
	d.set(MemberGroup{Role: RoleEndWallColumn, Designation: best.Designation, SpacingM: e.spacingM, Count: 2 * len(e.heightsM),
		LengthEachM: e.tallestM(), MassKg: 2 * total * best.MassKgPerM, Governing: v.governing, DeflectionRatio: deflectionOf(v.checks)})
	d.record(GroupCalculation{Role: RoleEndWallColumn, Designation: best.Designation, Checks: v.checks, Searched: searched,
		Notes: []string{
			fmt.Sprintf("%d end-wall columns per end wall at %.2f m (at most %.1f m: common practice, no source); tallest %.2f m designed, all take its section; length each is the tallest",
				len(e.heightsM), e.spacingM, endWallColumnMaxSpacingM, e.tallestM()),
			"base pinned, top held by the end rafter and the roof bracing (slotted for the rafter's deflection): simply supported beam-column",
			"end frames are the same section as the interior frames (the default); they carry no mullion vertical load",
			"wind: the girts' wall pressure envelope (every wind case; K_a = K_c = 1)",
		}})
	return true
}

// deflectionOf is the largest SLS ratio among recorded check lines.
func deflectionOf(lines []CheckLine) float64 {
	var r float64
	for _, c := range lines {
		if c.LimitState == "SLS" {
			r = math.Max(r, c.Utilisation)
		}
	}
	return r
}

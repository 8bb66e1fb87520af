package optimize

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/coldformed"
)

// endWallGirtRun is the end-wall girts of one end wall: line heights and
// the pieces between supports (corner columns and mullions).
type endWallGirtRun struct {
	lines   int
	pieces  int
	lengthM float64 // total length of girt in one end wall
}

// endWallGirtRuns places girt lines at the side-wall girt spacing from the
// base up to the gable's apex (common practice, no source) and cuts them at
// every support: each piece spans between two supports.
func endWallGirtRuns(l bracingLayout, e endWallLayout, spacingM float64) endWallGirtRun {
	var run endWallGirtRun
	ridge := l.gableHeightM(l.spanM / 2)
	supports := append(append([]float64{0}, e.positions...), l.spanM)
	for y := spacingM; y < ridge-1e-6; y += spacingM {
		x0 := 0.0
		if y > l.eavesM {
			x0 = (y - l.eavesM) / math.Tan(l.pitchRad)
		}
		run.lines++
		for i := 1; i < len(supports); i++ {
			a, b := math.Max(supports[i-1], x0), math.Min(supports[i], l.spanM-x0)
			if b-a > 0.05 {
				run.pieces++
				run.lengthM += b - a
			}
		}
	}
	return run
}

// checkEndWallGirt checks a section as a simply supported girt spanning
// between end-wall supports, no bridging (AS/NZS 4600:2018 cl. 3.3 through
// CheckPurlin, one flange through-fastened), under the girts' member
// pressures with K_l where the tributary area is within a² (AS/NZS
// 1170.2:2021 cl. 5.4.4), and the grid's girt deflection limit at SLS.
func (d *designer) checkEndWallGirt(sec catalog.Section, spanM, spacingM float64, keep bool) strutVerdict {
	var v strutVerdict
	caps, err := capacitiesFor(d.cat).of(sec)
	if err != nil || caps == nil {
		v.governing = Governing{Check: fmt.Sprintf("section %s could not be assessed: %v", sec.Designation, err), Utilisation: math.Inf(1)}
		return v
	}
	L := spanM * 1e3
	p := d.act.Wind.Girts
	out := p.GeneralOutward
	if spanM*spacingM <= sq(d.act.Wind.LocalDimensionWallM) {
		out = p.EdgeOutward
	}
	member := coldformed.Purlin{Span: L, SpanType: coldformed.SpanSimple, EndBearing: cleatBearing, InteriorBearing: cleatBearing}
	name := "end-wall girt " + sec.Designation
	take := func(g Governing, lines ...CheckLine) {
		if g.Utilisation > v.governing.Utilisation || v.governing.Check == "" {
			v.governing = g
		}
		if keep {
			v.checks = append(v.checks, lines...)
		}
	}
	for _, a := range []struct {
		name string
		w    float64 // N/mm, inward positive
	}{{"ULS Wu inward", p.GeneralInward.ULSKPa * spacingM}, {"ULS Wu outward", out.ULSKPa * spacingM}} {
		m := math.Abs(a.w) * L * L / 8
		act := coldformed.PurlinActions{Shear: math.Abs(a.w) * L / 2, FreeFlangeCb: 1} // C_b = 1: conservative
		if a.w >= 0 {
			act.FastenedFlangeMoment = m
		} else {
			act.FreeFlangeMoment, act.Outward = m, true
		}
		res, err := coldformed.CheckPurlinInto(d.checkBuf, caps, member, act)
		if err != nil {
			v.governing = Governing{Check: err.Error(), Utilisation: math.Inf(1)}
			return v
		}
		d.checkBuf = res.Checks
		res.SetCombination(a.name)
		take(governingOf(res.Governing()), keptLines(keep, name, res)...)
	}
	ratio := d.c.Options.Limits.GirtDeflectionRatio
	for _, a := range []struct {
		name string
		kPa  float64
	}{{"SLS Ws inward", p.GeneralInward.SLSKPa}, {"SLS Ws outward", out.SLSKPa}} {
		delta := 5 * math.Abs(a.kPa*spacingM) * math.Pow(L, 4) / (384 * steelE * sec.IxMM4)
		g := Governing{Check: fmt.Sprintf("deflection, span/%g", ratio), Standard: "AS/NZS 1170.0:2002",
			Clause: "cl. 4.3, Appendix C (limit from the grid)", LimitState: "SLS", Combination: a.name, Utilisation: delta / (L / ratio)}
		take(g, CheckLine{Member: name, Name: g.Check, Standard: g.Standard, Clause: g.Clause, LimitState: "SLS",
			Combination: a.name, Demand: delta, Capacity: L / ratio, Unit: "mm", Utilisation: g.Utilisation})
	}
	return v
}

// designEndWallGirts picks the lightest girt section of the grid's girt
// families for the end walls.
func (d *designer) designEndWallGirts(l bracingLayout, e endWallLayout, spacingM float64) bool {
	run := endWallGirtRuns(l, e, spacingM)
	if run.pieces == 0 {
		return true
	}
	best, closest, searched := lightestPassing(d.lineSections(d.c.Options.Members.GirtFamilies), d.s != nil && d.s.Exhaustive,
		func(sec catalog.Section) strutVerdict { return d.checkEndWallGirt(sec, e.spacingM, spacingM, false) })
	if best == nil {
		g := closest.governing
		d.fail(RoleEndWallGirt, fmt.Sprintf("no girt section of families %v spans %.2f m at %.2f m spacing; closest at utilisation %.2f, failing %s (%s %s, %s)",
			d.c.Options.Members.GirtFamilies, e.spacingM, spacingM, g.Utilisation, g.Check, g.Standard, g.Clause, g.Combination))
		return false
	}
	v := d.checkEndWallGirt(*best, e.spacingM, spacingM, true)
	d.set(MemberGroup{Role: RoleEndWallGirt, Designation: best.Designation, SpacingM: spacingM, SpanType: "simple",
		Lines: 2 * run.lines, Count: 2 * run.pieces, LengthEachM: e.spacingM, MassKg: 2 * run.lengthM * best.MassKgPerM,
		Governing: v.governing, DeflectionRatio: deflectionOf(v.checks)})
	d.record(GroupCalculation{Role: RoleEndWallGirt, Designation: best.Designation, Checks: v.checks, Searched: searched,
		Notes: []string{
			fmt.Sprintf("%d lines per end wall at %.2f m (the side-wall girt spacing) up to the apex, simple spans of %.2f m between the corner columns and end-wall columns",
				run.lines, spacingM, e.spacingM),
			"bolted through the web to cleats: web bearing does not apply; no bridging",
		}})
	return true
}

// keptLines is a member check's report lines when they are kept, else none
// (building them for every candidate tried would be wasted).
func keptLines(keep bool, member string, res coldformed.MemberResult) []CheckLine {
	if !keep {
		return nil
	}
	lines := make([]CheckLine, 0, len(res.Checks))
	for _, c := range res.Checks {
		lines = append(lines, checkLineOf(member, c))
	}
	return lines
}

package optimize

import (
	"fmt"
	"math"
	"slices"

	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/checks/coldformed"
)

// acceptedFrame is the chosen frame checked in full: everything the frame
// step hands on, apart from counts that depend on the number of frames.
type acceptedFrame struct {
	cd                   frameCandidate
	o                    frameOutcome
	rafterGov, columnGov Governing
	frm                  frameChoice
}

// accept re-evaluates the chosen candidate with exact governing checks and
// stores the frame's member groups, reactions and (when recording) its
// calculation. It reports the analyses it spent since spent (the count
// when the search began) to the memo, if any, under key.
func (m *frameModel) accept(best searchResult, memo *Memo, key memoKey, spent int) bool {
	var store func(memoKey, frameMemo)
	if memo != nil {
		store = memo.storeFrame
	}
	return m.acceptInto(best, store, key, spent)
}

// acceptInto is accept with the memo's store given as a function (nil:
// none), so that a frame re-check keeps its own table.
func (m *frameModel) acceptInto(best searchResult, store func(memoKey, frameMemo), key memoKey, spent int) bool {
	a, ok := m.finalise(best)
	if !ok {
		return false
	}
	if store != nil {
		store(key, frameMemo{accepted: a, analyses: m.d.r.Analyses - spent})
	}
	m.publish(&a)
	if m.d.r.Calculation != nil {
		m.recordFrame(&a.o, a.cd.rafter.Designation, a.cd.column.Designation, best.checked)
	}
	return true
}

// finalise checks the search's choice in full.
func (m *frameModel) finalise(best searchResult) (acceptedFrame, bool) {
	cd := best.cd
	// The search reorders the combinations (failedFirst); the full check
	// starts from the grid's order so that it depends on the choice alone,
	// not on the search that found it (a Memo replays it).
	m.order = slices.Clone(m.uls)
	t := m.plain
	if cd.braced {
		var err error
		if t, err = m.newTopology(best.o.knee, *cd.rafter, *cd.column); err != nil {
			m.d.fail(RoleRafter, fmt.Sprintf("frame analysis: %v", err))
			return acceptedFrame{}, false
		}
		t.setBrace(best.o.brace)
	}
	o, err := m.evaluate(&cd, t, true)
	if err != nil || !o.pass {
		m.d.fail(RoleRafter, fmt.Sprintf("frame re-check of rafter %s, column %s: pass %v, error %v", cd.rafter.Designation, cd.column.Designation, o.pass, err))
		return acceptedFrame{}, false
	}
	o.brace, o.braceLenMM, o.braceUtil = best.o.brace, best.o.braceLenMM, best.o.braceUtil
	a := acceptedFrame{cd: cd, o: o,
		rafterGov: m.memberGoverning(o.rafter, o.apex), columnGov: m.memberGoverning(o.column, o.drift),
		frm: frameChoice{Rafter: *cd.rafter, Column: *cd.column}}
	a.frm.RafterMomentKNm, a.frm.ColumnMomentKNm = m.largestMomentKNm(rafterKind), m.largestMomentKNm(columnKind)
	a.frm.Left, a.frm.Right = m.baseReactions()
	return a, true
}

// publish stores an accepted frame's member groups and choice in the
// result, counted for the case's number of frames.
func (m *frameModel) publish(a *acceptedFrame) {
	cd, o := &a.cd, &a.o
	d, g := m.d, &m.g
	frames := d.c.Bays + 1
	d.r.Frames = frames
	group := func(role Role, sec string, count int, lengthM, kgPerM float64) MemberGroup {
		return MemberGroup{Role: role, Designation: sec, Count: count, LengthEachM: lengthM,
			MassKg: float64(count) * lengthM * kgPerM}
	}
	raf := group(RoleRafter, cd.rafter.Designation, 2*frames, g.rafterMM/1e3, cd.rafter.MassKgPerM)
	raf.Governing, raf.DeflectionRatio = a.rafterGov, o.apex.ratio
	col := group(RoleColumn, cd.column.Designation, 2*frames, g.heightMM/1e3, cd.column.MassKgPerM)
	col.Governing, col.DeflectionRatio = a.columnGov, o.drift.ratio
	d.set(raf)
	d.set(col)
	if o.knee != nil {
		kb := group(RoleKneeBrace, o.brace.Designation, 2*frames, o.braceLenMM/1e3, o.brace.MassKgPerM)
		kb.Governing = Governing{Check: "knee brace, axial (pin-ended strut and tie)", Standard: coldformed.Standard,
			Clause: "cl. 3.4.1, 3.2", LimitState: "ULS", Utilisation: o.braceUtil}
		d.set(kb)
		d.r.KneeBraceColumnM, d.r.KneeBraceRafterM = o.knee.ColumnMM/1e3, o.knee.RafterMM/1e3
	}
	nr, nc := len(o.rafter.fly), len(o.column.fly)
	d.r.FlyBracesPerFrame = 2 * (nr + nc)
	if d.r.FlyBracesPerFrame > 0 {
		kg := float64(frames) * 2 * (float64(nr)*m.flyBraceKg(*cd.rafter) + float64(nc)*m.flyBraceKg(*cd.column))
		d.set(MemberGroup{Role: RoleFlyBrace, Designation: m.brace0.Designation, Count: d.r.FlyBracesPerFrame * frames,
			LengthEachM: math.Sqrt2 * math.Max(cd.rafter.DepthMM, cd.column.DepthMM) / 1e3, MassKg: kg})
	}
	d.frm = a.frm
}

// memberGoverning returns the member's governing check: its worst ULS
// check or its SLS deflection ratio, whichever is higher.
func (m *frameModel) memberGoverning(mo memberOutcome, sls serviceability) Governing {
	if sls.ratio > mo.util {
		return m.slsGoverning(sls)
	}
	return m.checkGoverning(mo.gov)
}

func (m *frameModel) slsGoverning(s serviceability) Governing {
	return Governing{Check: s.nameCheck, Standard: "AS/NZS 1170.0:2002", Clause: "App. C (limit from the grid)",
		LimitState: "SLS", Combination: m.d.act.Combinations[s.comb].Name, Utilisation: s.ratio}
}

func (m *frameModel) checkGoverning(cs checkedSegment) Governing {
	c := cs.res.Governing()
	return Governing{Check: fmt.Sprintf("%s, %s", c.Name, partFlange(cs)), Standard: c.Standard, Clause: "cl. " + c.Clause,
		LimitState: "ULS", Combination: m.d.act.Combinations[cs.comb].Name, Utilisation: c.Utilisation}
}

// partFlange names a checked segment's part and compression flange.
func partFlange(cs checkedSegment) string {
	f := "inner flange"
	if cs.outer {
		f = "outer flange"
	}
	return fmt.Sprintf("%v, %s", mainParts[cs.part], f)
}

// governing is the candidate's overall governing check, for reasons.
func (o *frameOutcome) governing(m *frameModel) Governing {
	var best Governing
	consider := func(g Governing) {
		if g.Utilisation > best.Utilisation || best.Check == "" {
			best = g
		}
	}
	if o.drift.comb >= 0 {
		consider(m.slsGoverning(o.drift))
	}
	if o.apex.comb >= 0 {
		consider(m.slsGoverning(o.apex))
	}
	for _, mo := range []memberOutcome{o.rafter, o.column} {
		if mo.gov.res.Checks != nil {
			consider(m.checkGoverning(mo.gov))
		}
	}
	return best
}

// largestMomentKNm is a member's largest ULS moment magnitude on either
// side in the last solve (exact: the station forces give the extremes).
func (m *frameModel) largestMomentKNm(kind memberKind) float64 {
	var big float64
	for _, c := range m.uls {
		for _, k := range kind.parts() {
			st := m.top.stations[k]
			sg := m.segmentOf(k, m.combine(k, c), st[0].along, st[len(st)-1].along)
			big = math.Max(big, math.Max(sg.sag, sg.hog))
		}
	}
	return big / 1e6
}

// baseReactions returns each base's forces on its footing under every
// combination (kN, kN·m): the forces the frame puts on the footing,
// vertical positive down, horizontal positive outward, moment positive in
// the sense that turns the column's top outward. Wind blows from the left; the right base's values are the left
// base's under wind from the right.
func (m *frameModel) baseReactions() (left, right []BaseReaction) {
	p := m.top.p
	for i, c := range m.d.act.Combinations {
		ls := "ULS"
		if c.LimitState == actions.SLS {
			ls = "SLS"
		}
		for side, n := range p.Bases {
			r := m.sol.Reaction(m.combs[i], n) // on the structure
			br := BaseReaction{Combination: c.Name, LimitState: ls, VerticalKN: r[1] / 1e3}
			// The frame pushes on its footing with −r; outward is −X at the
			// left base (turning counter-clockwise) and +X at the right.
			if side == 0 {
				br.ShearKN, br.MomentKNm = r[0]/1e3, -r[2]/1e6
				left = append(left, br)
			} else {
				br.ShearKN, br.MomentKNm = -r[0]/1e3, r[2]/1e6
				right = append(right, br)
			}
		}
	}
	return left, right
}

// recordFrame keeps the frame's working for the report.
func (m *frameModel) recordFrame(o *frameOutcome, rafter, column string, searched int) {
	d := m.d
	name := func(c int) string {
		if c < 0 {
			return ""
		}
		return d.act.Combinations[c].Name
	}
	fc := &FrameCalculation{BucklingFactor: o.lambdaMin, BucklingCombination: name(o.lambdaComb)}
	var dg analysis.Diagram
	for _, c := range uniqueInts(o.rafter.gov.comb, o.column.gov.comb) {
		for _, pt := range mainParts {
			m.top.p.Diagram(m.sol, m.combs[c], pt, 11, &dg)
			md := MemberDiagram{Part: pt.String(), Combination: name(c)}
			for i := range dg.X {
				md.StationsM = append(md.StationsM, dg.X[i]/1e3)
				md.AxialKN = append(md.AxialKN, dg.N[i]/1e3)
				md.ShearKN = append(md.ShearKN, dg.V[i]/1e3)
				md.MomentKNm = append(md.MomentKNm, dg.M[i]/1e6)
			}
			fc.Diagrams = append(fc.Diagrams, md)
		}
	}
	for _, s := range []serviceability{o.drift, o.apex} {
		if s.comb >= 0 {
			fc.Deflections = append(fc.Deflections, CheckLine{Member: "frame", Name: s.nameCheck, Standard: "AS/NZS 1170.0:2002",
				Clause: "App. C", LimitState: "SLS", Combination: name(s.comb), Demand: s.deflMM, Capacity: s.limitMM, Unit: "mm", Utilisation: s.ratio})
		}
	}
	d.r.Calculation.Frame = fc
	notes := []string{
		fmt.Sprintf("interior frame designed for a %.3g m tributary width; end frames take the same sections", m.g.tributaryM),
		fmt.Sprintf("in-plane effective lengths from the elastic buckling factor of each combination (lowest λc = %.3g)", o.lambdaMin),
		"outer flange restrained at every purlin and girt; inner flange at the ends and at fly braces",
	}
	d.record(GroupCalculation{Role: RoleRafter, Designation: rafter, Notes: append(notes,
		fmt.Sprintf("%d fly braces per rafter", len(o.rafter.fly))), Checks: m.checkLines(o.rafter.all, "rafter"), Searched: searched})
	d.record(GroupCalculation{Role: RoleColumn, Designation: column, Notes: append(notes,
		fmt.Sprintf("%d fly braces per column", len(o.column.fly))), Checks: m.checkLines(o.column.all, "column"), Searched: searched})
}

// checkLines converts every recorded check to report lines (kN, kN·m).
func (m *frameModel) checkLines(all []checkedSegment, member string) []CheckLine {
	var out []CheckLine
	for _, cs := range all {
		for _, c := range cs.res.Checks {
			dem, capy, unit := c.DemandValue, c.CapacityValue, c.Unit
			switch unit {
			case "N":
				dem, capy, unit = dem/1e3, capy/1e3, "kN"
			case "N·mm":
				dem, capy, unit = dem/1e6, capy/1e6, "kN·m"
			}
			out = append(out, CheckLine{Member: fmt.Sprintf("%s, %s", member, partFlange(cs)), Name: c.Name,
				Standard: c.Standard, Clause: "cl. " + c.Clause, LimitState: "ULS", Combination: m.d.act.Combinations[cs.comb].Name,
				Demand: dem, Capacity: capy, Unit: unit, Utilisation: c.Utilisation})
		}
	}
	return out
}

func uniqueInts(a, b int) []int {
	if a == b {
		return []int{a}
	}
	return []int{a, b}
}

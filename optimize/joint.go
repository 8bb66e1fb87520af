package optimize

import (
	"container/heap"
	"fmt"
	"math"
	"slices"
)

// frameAndBracing designs the frame and the bracing, choosing the purlin
// arrangement and the braced bays' strut upgrade together (issue 6).
//
// The purlin search alone finds the lightest arrangement as a purlin; the
// bracing step then makes the braced bays' purlins good enough as struts
// (designStruts: heavier struts or more bridging rows there), and what
// that adds depends on the arrangement: a section without bridging, the
// lightest as a purlin, can need a dear upgrade where a bridged one needs
// a cheap one. The choice is made exactly over the purlin options: every
// arrangement of the purlin search (spacing, span type, bridging rows)
// with its lightest passing section. Stated assumption: a heavier section
// over the whole roof in the same arrangement is not an option, since the
// upgrade offers it in the braced bays, where the struts need it, for less.
//
// The objective is, in the purlin search's terms (mass, or cost with a
// price table), the purlins, the strut upgrade and the bracing diagonals,
// which follow the frame's moments (optionValue). An option whose frame
// needs more knee or fly bracing than the first option's (frameBraces) is
// passed over: no option then gives a heavier building than the steps in
// order would.
//
// The dependencies: the upgrade needs the strut forces, which need the
// frame's restraint forces (its largest moments and its members' depths),
// and the frame carries the purlins (their lines restrain it, their weight
// is part of its dead load). The first option, the purlin search's choice,
// is designed as the steps always have: its frame by the frame step, then
// its bracing. Any other option is designed on a copy of the design so
// far, with the first option's frame checked again in full under its own
// purlins (recheckFrame: their lines and weight, the fewest fly braces,
// the frame step's acceptance check), then its own bracing from that
// frame's moments. Nothing of the first design is assumed for another
// option, but the frame's sections are kept without a new search. Stated
// assumptions: a lighter frame that other purlins might allow is not
// sought, and an option under whose purlins the frame fails is passed
// over (the options' purlins differ in weight by little against the
// frame's load; a frame search per option about doubled the default
// sweep's time when tried).
//
// One rule keeps the search exact without designing every option: the
// diagonals and struts of every other option are checked under the first
// option's bracing solves (its frame's restraint forces) as well as under
// their own (stated; conservative, and nearly the same forces, as the
// frames differ only through the purlins they carry). An option's least
// upgrade passing under the first option's solves alone, and by mass the
// first option's diagonals, then bound its value from below without its
// frame (jointSearch.bound); where an option's lines and purlin weight are
// the first option's, the frame step reads nothing else of the purlins
// (frame_loads.go, frame_bounds.go), so its frame and solves are the first
// option's and the bound is its value. The options are visited best
// first: in order of purlin objective until bounded, then of bound; only
// an option whose bound is below the best value found is designed, and
// the search stops when nothing left can beat that value. An option whose
// frame or bracing fails is passed over; when every one fails, the first
// option's failure is reported. Ties go to the option earlier in purlin
// objective order (the first option before any other). With
// Settings.Exhaustive every option is designed, without bounds, in purlin
// objective order; the choice is the same.
func (d *designer) frameAndBracing() bool {
	exhaustive := d.s != nil && d.s.Exhaustive
	first := d.roofTrial(d.purlinLines.best, d.s, nil, 0, nil)
	j := jointSearch{d: d, first: first, best: first, bestIdx: -1, spent: d.r.Analyses, analyses: first.r.Analyses}
	if first.ok {
		j.restLB = first.restLowerBound()
	}
	if exhaustive || !first.ok || first.value > first.opt.objective+j.restLB {
		j.search(exhaustive)
	}
	d.adoptTrial(j.best, first)
	d.r.Analyses = j.analyses
	return j.best.ok
}

// jointSearch is frameAndBracing's search over the purlin options.
type jointSearch struct {
	d           *designer
	first, best *roofTrial
	bestIdx     int // the best's index in opts; −1 for the first option
	opts        []lineCandidate
	lower       []bracingSolve // the first option's solves, nil if its frame failed
	// restLB bounds from below the value of any option's diagonals
	// (restLowerBound).
	restLB       float64
	trials       *Settings
	spent        int // analyses before the step
	analyses     int // analyses of every trial
	boundedQueue boundQueue
}

// search visits the options after the first (see frameAndBracing).
func (j *jointSearch) search(exhaustive bool) {
	d := j.d
	limit := math.Inf(1)
	if j.first.ok && !exhaustive {
		limit = j.first.value - loose(j.restLB) // an option at or above it cannot beat the first
	}
	// Options that differ from an earlier one only in span type (the same
	// lines, section and bridging) have the same frame, bracing and strut
	// upgrade, which read nothing else of the purlins, and so a value
	// higher by their purlin objective or equal to it: the earlier one is
	// chosen before them. The search passes them over; the exhaustive
	// search designs them too.
	opts := d.lineOptions(d.purlinLines.problem, d.purlinLines.cands, &d.purlinLines.scan, limit)
	seen := map[strutProblem]bool{problemOf(j.first.opt): true}
	for _, o := range opts {
		if sameLineCandidate(o, j.first.opt) || (!exhaustive && seen[problemOf(o)]) {
			continue
		}
		seen[problemOf(o)] = true
		j.opts = append(j.opts, o)
	}
	j.lower = j.first.lowerSolves()
	if exhaustive || j.lower == nil {
		for i, o := range j.opts {
			if !exhaustive && !j.canBeat(loose(o.objective+j.restLB), i) {
				break
			}
			j.design(i)
		}
		return
	}
	next := 0 // the next option not yet bounded
	for {
		bounded := len(j.boundedQueue) > 0
		fromQueue := bounded && (next >= len(j.opts) || j.boundedQueue.before(0, loose(j.opts[next].objective+j.restLB), next))
		var key float64
		var idx int
		switch {
		case fromQueue:
			key, idx = j.boundedQueue[0].key, j.boundedQueue[0].idx
		case next < len(j.opts):
			key, idx = loose(j.opts[next].objective+j.restLB), next
		default:
			return
		}
		if !j.canBeat(key, idx) {
			return
		}
		if fromQueue {
			heap.Pop(&j.boundedQueue)
			j.design(idx)
			continue
		}
		next++
		if lb, ok := j.bound(idx); ok {
			heap.Push(&j.boundedQueue, boundEntry{key: lb, idx: idx})
		}
	}
}

// canBeat reports whether an option at index idx whose value is at least
// key could still be chosen over the best found.
func (j *jointSearch) canBeat(key float64, idx int) bool {
	return !j.best.ok || key < j.best.value || (key == j.best.value && idx < j.bestIdx)
}

// budget is the strut upgrade objective below which option idx could be
// chosen when the rest of its value is at least rest, widened as loose
// lowers a bound; +Inf while nothing has passed.
func (j *jointSearch) budget(idx int, rest float64) float64 {
	if !j.best.ok {
		return math.Inf(1)
	}
	return j.best.value - loose(j.opts[idx].objective+rest) + 1e-12*math.Abs(j.best.value)
}

// design designs option idx (roofTrial, with the first option's frame
// re-checked when it passed) and keeps it if it is the best.
func (j *jointSearch) design(idx int) {
	if j.trials == nil {
		j.trials = j.d.trialSettings()
	}
	budget := 0.0 // no limit
	if !(j.d.s != nil && j.d.s.Exhaustive) && j.best.ok {
		budget = j.budget(idx, j.restLB)
	}
	var recheck *frameChoice
	if j.lower != nil {
		recheck = &j.first.d.frm
	}
	t := j.d.roofTrial(j.opts[idx], j.trials, j.lower, budget, recheck)
	j.analyses += t.r.Analyses - j.spent
	if t.ok && j.canBeat(t.value, idx) && (!j.first.ok || t.braces <= j.first.braces) {
		j.best, j.bestIdx = t, idx
	}
}

// strutProblem is what an option's frame, bracing and strut check depend
// on besides the case: its lines, section and bridging rows. Options that
// differ only in span type share it.
type strutProblem struct {
	gaps, bridging int
	section        string
}

func problemOf(o lineCandidate) strutProblem {
	return strutProblem{gaps: o.arr.gaps, bridging: o.arr.bridging, section: o.sec.Designation}
}

// bound returns a lower bound on option idx's value: its purlin
// objective, its least strut upgrade under the first option's solves alone
// (a lower bound on its upgrade under those and its own) and restLB; or,
// where its lines and purlin weight are the first option's, its value, the
// first option's diagonals in place of restLB. It returns false when no
// upgrade makes the option's value below the best's.
func (j *jointSearch) bound(idx int) (float64, bool) {
	o, first := j.opts[idx], j.first
	rest := j.restLB
	if o.arr.gaps == first.opt.arr.gaps && o.sec.MassKgPerM == first.opt.sec.MassKgPerM {
		rest = first.value - first.opt.objective - first.d.strut.extraObjective
	}
	budget := j.budget(idx, rest)
	f := first.d
	f.purlin = lineChoiceOf(f.purlinLines.problem, o)
	up, _, found := f.strutUpgrade(f.braceSolves, f.braceLayout, budget)
	if !found {
		return 0, false
	}
	return loose(o.objective + up.extraObjective + rest), true
}

// loose lowers a bound by a few parts in 10¹², so that rounding in sums
// taken in another order never lifts a bound above the value it bounds.
func loose(x float64) float64 { return x - 1e-12*math.Abs(x) - 1e-12 }

// boundEntry is a bounded option in the queue: its bound on the option's
// value and its index.
type boundEntry struct {
	key float64
	idx int
}

// boundQueue orders bounded options by bound, then index.
type boundQueue []boundEntry

func (q boundQueue) before(i int, key float64, idx int) bool {
	return q[i].key < key || (q[i].key == key && q[i].idx < idx)
}
func (q boundQueue) Len() int           { return len(q) }
func (q boundQueue) Less(a, b int) bool { return q.before(a, q[b].key, q[b].idx) }
func (q boundQueue) Swap(a, b int)      { q[a], q[b] = q[b], q[a] }
func (q *boundQueue) Push(x any)        { *q = append(*q, x.(boundEntry)) }
func (q *boundQueue) Pop() any {
	old := *q
	e := old[len(old)-1]
	*q = old[:len(old)-1]
	return e
}

// roofTrial is the frame and bracing designed for one purlin option, on a
// copy of the design so far.
type roofTrial struct {
	opt       lineCandidate
	d         designer
	r         Result
	ok        bool
	value     float64 // optionValue, when ok
	braces    float64 // frameBraces, when ok
	rechecked bool    // the frame is another option's, checked again
}

// roofTrial designs the frame and the bracing for purlin option o with
// settings s, its diagonals and struts also checked under the solves lower
// and its upgrade kept below budget (0: no limit; a trial whose upgrade
// would reach it fails). With recheck the frame is that frame checked
// again under o's purlins (recheckFrame), and the trial fails where it
// does not pass; without, the frame step designs it.
func (d *designer) roofTrial(o lineCandidate, s *Settings, lower []bracingSolve, budget float64, recheck *frameChoice) *roofTrial {
	t := d.newTrial(o, s, lower, budget)
	framed := false
	if recheck != nil {
		t.rechecked = true
		var err error
		if framed, err = t.d.recheckFrame(*recheck); err != nil {
			t.d.fail(RoleRafter, err.Error())
		} else if !framed {
			t.d.fail(RoleRafter, fmt.Sprintf("the frame of rafter %s and column %s does not pass under purlins %s",
				recheck.Rafter.Designation, recheck.Column.Designation, o.sec.Designation))
		}
	} else {
		framed = t.d.frame()
	}
	t.ok = framed && t.d.bracing()
	if t.ok {
		t.value, t.braces = t.d.optionValue(), t.d.frameBraces()
	}
	t.d.alsoSolves, t.d.strutBudget = nil, 0
	return t
}

// optionValue is the joint choice's objective for the designer's purlin
// option, in the purlin search's terms (lineObjective): the purlins and
// the strut upgrade (their objective) and the bracing diagonals, by mass,
// or with a price table at the table's price per kg of their family.
func (d *designer) optionValue() float64 {
	v := d.purlinLines.best.objective + d.strut.extraObjective
	for _, role := range []Role{RoleRoofBracing, RoleWallBracing} {
		m := d.r.Member(role)
		kg := m.MassKg
		if role == RoleRoofBracing {
			kg -= d.strut.extraKg // the upgrade is counted above
		}
		v += kg * d.pricePerKg(m.Designation)
	}
	return v
}

// frameBraces is the frame's knee and fly braces in the terms of
// optionValue, with a price table's price per fly brace.
func (d *designer) frameBraces() float64 {
	var v float64
	for _, role := range []Role{RoleKneeBrace, RoleFlyBrace} {
		m := d.r.Member(role)
		v += m.MassKg * d.pricePerKg(m.Designation)
	}
	if costs := d.c.Options.Costs; costs != nil {
		v += float64(d.r.FlyBracesPerFrame*d.r.Frames) * costs.PerFlyBrace
	}
	return v
}

// restLowerBound bounds from below the part of optionValue that any other
// option's diagonals add: by mass, they are checked under this trial's
// solves too (frameAndBracing), so they are at least this trial's. With a
// price table it is 0: the straps' and rods' prices need not follow their
// mass.
func (t *roofTrial) restLowerBound() float64 {
	if t.d.c.Options.Costs != nil {
		return 0
	}
	return t.value - t.opt.objective - t.d.strut.extraObjective
}

// newTrial is a copy of the design so far with purlin option o.
func (d *designer) newTrial(o lineCandidate, s *Settings, lower []bracingSolve, budget float64) *roofTrial {
	t := &roofTrial{opt: o, d: *d, r: cloneResult(d.r)}
	t.d.r, t.d.s = &t.r, s
	t.d.braceSolves, t.d.strut, t.d.alsoSolves, t.d.strutBudget = nil, strutChoice{}, lower, budget
	t.d.purlin = lineChoiceOf(d.purlinLines.problem, o)
	t.d.purlinLines.best = t.opt
	return t
}

// lowerSolves returns the trial's bracing solves for the other options'
// diagonal and strut checks, marked as such, or nil when its frame failed
// or its bracing could not be solved.
func (t *roofTrial) lowerSolves() []bracingSolve {
	if t.d.braceSolves == nil {
		return nil
	}
	out := slices.Clone(t.d.braceSolves)
	for i := range out {
		out[i].basis = "restraint forces of the frame for purlins " + t.opt.sec.Designation
	}
	return out
}

// trialSettings are the settings for the options after the first: the
// same without the sweep's memo, which keeps to the one frame look-up per
// case that the frame step makes (a frame designed without it is the same);
// their frame re-checks still go through its own table (recheckFrame).
func (d *designer) trialSettings() *Settings {
	var s Settings
	if d.s != nil {
		s = *d.s
	}
	s.recheckMemo, s.Memo = s.memo(), nil
	return &s
}

// adoptTrial takes the chosen trial's design as the case's, with its
// purlins in place of the purlin search's choice when they differ.
func (d *designer) adoptTrial(t, first *roofTrial) {
	r, s, lines := d.r, d.s, d.purlinLines
	*d, *r = t.d, t.r
	d.r, d.s = r, s
	if sameLineCandidate(t.opt, first.opt) {
		return
	}
	d.purlin = d.adoptLine(lines.problem, t.opt, lines.searched)
	unit := "kg"
	if d.c.Options.Costs != nil {
		unit = "in cost"
	}
	f := first.opt
	d.note(RolePurlin, fmt.Sprintf("chosen with the braced bays' strut upgrade: these purlins, the upgrade and the bracing diagonals come to %.1f %s, against %.1f with the lightest purlins as purlins (%s, %s, %d bridging row(s), %.3f m)",
		t.value, unit, first.value, f.sec.Designation, f.arr.spanType, f.arr.bridging, f.arr.spacingM))
	frame := fmt.Sprintf("the frame designed for the lightest purlins (%s), checked again in full under these purlins: not searched again", f.sec.Designation)
	if !t.rechecked {
		frame = fmt.Sprintf("designed for these purlins: the lightest purlins (%s) have no passing frame", f.sec.Designation)
	}
	d.note(RoleRafter, frame)
	d.note(RoleColumn, frame)
}

// note adds a statement to a recorded group's working.
func (d *designer) note(role Role, note string) {
	if d.r.Calculation == nil {
		return
	}
	for i := range d.r.Calculation.Groups {
		if g := &d.r.Calculation.Groups[i]; g.Role == role {
			g.Notes = append(slices.Clip(g.Notes), note)
		}
	}
}

// sameLineCandidate reports whether two candidates are the same section in
// the same arrangement.
func sameLineCandidate(a, b lineCandidate) bool {
	return a.arr == b.arr && a.sec.Designation == b.sec.Designation
}

// cloneResult copies a result so that a trial's steps can change it.
func cloneResult(r *Result) Result {
	out := *r
	out.Members = slices.Clone(r.Members)
	if r.Calculation != nil {
		c := *r.Calculation
		c.Groups = slices.Clone(c.Groups)
		out.Calculation = &c
	}
	return out
}

// rerecord keeps a group's working, in place of an earlier record for the
// same role, when the calculation is being recorded.
func (d *designer) rerecord(g GroupCalculation) {
	if d.r.Calculation == nil {
		return
	}
	for i := range d.r.Calculation.Groups {
		if d.r.Calculation.Groups[i].Role == g.Role {
			d.r.Calculation.Groups[i] = g
			return
		}
	}
	d.record(g)
}

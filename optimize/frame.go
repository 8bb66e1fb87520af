package optimize

import (
	"fmt"
	"math"
	"slices"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/checks/coldformed"
	"github.com/spansweep/spansweep/grids"
)

// frame designs the portal frame: the lightest passing rafter and column
// (C or 2C, the same or not as the grid allows), with knee braces where a
// pair fails without them, and the fewest fly braces. The interior frame
// is designed and every frame takes its sections (end frames carry half
// the width; stated default). Candidates are evaluated in order of a
// lower bound on their mass (members and the least knee brace, no fly
// braces); the search stops when the next bound exceeds the lightest
// passing mass found, and skips candidates that fail the statics bound of
// boundPasses. With Settings.Exhaustive every candidate is evaluated.
func (d *designer) frame() bool {
	m, err := d.newFrameModel()
	defer m.release()
	if err != nil {
		d.fail(RoleRafter, fmt.Sprintf("frame model: %v", err))
		return false
	}
	memo, key := d.s.memo(), memoKey{}
	if memo != nil {
		key = m.frameKey()
		if f, ok := memo.frame(key); ok {
			d.r.Analyses += f.analyses
			m.publish(&f.accepted)
			return true
		}
	}
	cands := m.candidates()
	if len(cands) == 0 {
		d.fail(RoleRafter, fmt.Sprintf("no C or 2C sections in catalogue %s for frame families %v", d.cat.Name, d.c.Options.Members.FrameFamilies))
		return false
	}
	spent := d.r.Analyses
	if err := m.prepareBounds(); err != nil {
		d.fail(RoleRafter, fmt.Sprintf("frame model: %v", err))
		return false
	}
	best, ok, err := m.search(cands)
	if err != nil {
		d.fail(RoleRafter, fmt.Sprintf("frame analysis: %v", err))
		return false
	}
	if !ok {
		d.fail(best.role(), best.reason(m))
		return false
	}
	return m.accept(best, memo, key, spent)
}

// newFrameModel prepares the frame search of the designer's case.
func (d *designer) newFrameModel() (*frameModel, error) {
	m := &frameModel{d: d, g: d.newFrameGeometry(), combs: d.combinations(), caps: capacitiesFor(d.cat),
		ws: workspaces.Get().(*analysis.Workspace)}
	for i := range d.act.Primaries {
		m.prim = append(m.prim, analysis.Primary(i))
	}
	for i, c := range d.act.Combinations {
		w := false
		for _, f := range c.Factors {
			w = w || (f.Case != actions.G && f.Case != actions.Q && f.Case != actions.H)
		}
		m.hasW = append(m.hasW, w)
		if c.LimitState == actions.ULS {
			m.uls = append(m.uls, i)
		} else {
			m.sls = append(m.sls, i)
		}
	}
	m.order = slices.Clone(m.uls)
	cs := d.byShape(catalog.ShapeC)
	if len(cs) == 0 {
		return nil, fmt.Errorf("catalogue %s has no C section for knee and fly braces", d.cat.Name)
	}
	m.brace0, m.heaviestC = cs[0], cs[len(cs)-1]
	var err error
	m.plain, err = m.newTopology(nil, cs[0], cs[0])
	return m, err
}

// prepareBounds builds the statics bounds' mechanisms (one analysis) for
// a pitched roof, unless the search is exhaustive.
func (m *frameModel) prepareBounds() error {
	if m.g.pitchRad <= 1e-3 || (m.d.s != nil && m.d.s.Exhaustive) {
		return nil
	}
	var err error
	m.mech, err = m.newMechanisms()
	return err
}

// frameShapes are the catalogue shapes of the grid's frame families.
func frameShapes(families []string) []catalog.Shape {
	var out []catalog.Shape
	for _, f := range families {
		switch f {
		case grids.FamilyC:
			out = append(out, catalog.ShapeC)
		case grids.FamilyBackToC:
			out = append(out, catalog.Shape2C)
		}
	}
	return out
}

// candidates lists every rafter and column pair (and its knee-braced
// variant) in enumeration order, each with the lower bound on its mass per
// frame; search visits them in order of that bound (candidateQueue).
func (m *frameModel) candidates() []frameCandidate {
	var secs []catalog.Section
	var caps []*coldformed.Capacities
	for _, s := range frameShapes(m.d.c.Options.Members.FrameFamilies) {
		for _, sec := range m.d.byShape(s) {
			if c, err := m.caps.of(sec); err == nil {
				secs, caps = append(secs, sec), append(caps, c)
			}
		}
	}
	minBrace := m.minKneeBraceKg()
	variants := 1
	if m.d.c.Options.Members.KneeBraces {
		variants = 2
	}
	out := make([]frameCandidate, 0, variants*len(secs)*len(secs))
	pair := 0
	for i := range secs {
		for j := range secs {
			r, c := &secs[i], &secs[j]
			if m.d.c.Options.Members.SameRafterAndColumn && r.Designation != c.Designation {
				continue
			}
			pair++
			out = m.appendPair(out, r, c, caps[i], caps[j], pair, variants == 2, minBrace)
		}
	}
	return out
}

// appendPair appends the candidates of one rafter and column pair: the
// unbraced one and, if braced is set, the knee-braced one (minBraceKg more
// in its bound).
func (m *frameModel) appendPair(out []frameCandidate, r, c *catalog.Section, rCap, cCap *coldformed.Capacities,
	pair int, braced bool, minBraceKg float64) []frameCandidate {
	g := &m.g
	cd := frameCandidate{rafter: r, column: c, rCap: rCap, cCap: cCap, pair: pair,
		massLB: 2*g.rafterMM/1e3*r.MassKgPerM + 2*g.heightMM/1e3*c.MassKgPerM}
	out = append(out, cd)
	if braced {
		cd.braced, cd.massLB = true, cd.massLB+minBraceKg
		out = append(out, cd)
	}
	return out
}

// minKneeBraceKg is the least knee-brace steel of a frame (both braces,
// the lightest C at the shortest placement): the braced candidates' bound.
func (m *frameModel) minKneeBraceKg() float64 {
	g := &m.g
	return 2 * m.brace0.MassKgPerM * m.kneeBraceLengthMM(analysis.KneeBrace{
		ColumnMM: kneeColumnMin * g.heightMM, RafterMM: kneeRafterMin * g.rafterMM}) / 1e3
}

// candidateQueue yields candidates in order of their mass lower bound, ties
// in enumeration order (pair, then unbraced first: the index in the
// candidates list), a total order, so the sequence is the same as a full
// sort's. It is a binary heap of indices: the search usually stops after a
// small part of the list, which is then never ordered.
type candidateQueue struct {
	cands []frameCandidate
	heap  []int32
}

func newCandidateQueue(cands []frameCandidate) *candidateQueue {
	q := &candidateQueue{cands: cands, heap: make([]int32, len(cands))}
	for i := range q.heap {
		q.heap[i] = int32(i)
	}
	for i := len(q.heap)/2 - 1; i >= 0; i-- {
		q.down(i)
	}
	return q
}

// less orders candidates a and b (indices) by bound, then index.
func (q *candidateQueue) less(a, b int32) bool {
	la, lb := q.cands[a].massLB, q.cands[b].massLB
	return la < lb || (la == lb && a < b)
}

func (q *candidateQueue) down(i int) {
	h := q.heap
	for {
		l := 2*i + 1
		if l >= len(h) {
			return
		}
		c := l
		if r := l + 1; r < len(h) && q.less(h[r], h[l]) {
			c = r
		}
		if !q.less(h[c], h[i]) {
			return
		}
		h[i], h[c] = h[c], h[i]
		i = c
	}
}

// next returns the next candidate in order, or false when none is left.
func (q *candidateQueue) next() (*frameCandidate, bool) {
	n := len(q.heap)
	if n == 0 {
		return nil, false
	}
	top := q.heap[0]
	q.heap[0] = q.heap[n-1]
	q.heap = q.heap[:n-1]
	q.down(0)
	return &q.cands[top], true
}

// searchResult is the outcome of the search: the chosen candidate, or the
// best failing one for the reason.
type searchResult struct {
	cd      frameCandidate
	o       frameOutcome
	bounded bool // failed the statics bound (no analysis)
	ratio   float64
	checked int
}

// search evaluates candidates in mass order. A knee-braced variant is
// evaluated only when its pair fails without braces.
func (m *frameModel) search(cands []frameCandidate) (searchResult, bool, error) {
	exhaustive := m.d.s != nil && m.d.s.Exhaustive
	failed := make([]bool, len(cands)+1) // by pair (numbered from 1): fails unbraced
	var best, bestFail searchResult
	found := false
	bestFail.ratio = math.Inf(1)
	q := newCandidateQueue(cands)
	for {
		next, ok := q.next()
		if !ok {
			break
		}
		cd := *next
		if found && !exhaustive && cd.massLB > best.o.massKg {
			break
		}
		if cd.braced && !failed[cd.pair] {
			continue
		}
		if !exhaustive {
			if ok, ratio := m.boundPasses(&cd, m.boundNeed(found, &bestFail)); !ok {
				failed[cd.pair] = true
				if !found && ratio < bestFail.ratio && (bestFail.bounded || bestFail.checked == 0) {
					bestFail = searchResult{cd: cd, bounded: true, ratio: ratio}
				}
				continue
			}
		}
		o, err := m.evaluateCandidate(&cd, false)
		if err != nil {
			return best, false, fmt.Errorf("rafter %s, column %s: %w", cd.rafter.Designation, cd.column.Designation, err)
		}
		best.checked++
		if !o.pass {
			failed[cd.pair] = true
			if bestFail.bounded || bestFail.checked == 0 || o.util < bestFail.o.util {
				bestFail = searchResult{cd: cd, o: o, ratio: o.util, checked: 1}
			}
			continue
		}
		if !found || o.massKg < best.o.massKg {
			best, found = searchResult{cd: cd, o: o, checked: best.checked}, true
		}
	}
	if !found {
		if !bestFail.bounded && bestFail.checked > 0 {
			// Re-check the best failing candidate in full for its failing check.
			o, err := m.evaluateCandidate(&bestFail.cd, true)
			if err != nil {
				return bestFail, false, err
			}
			bestFail.o = o
		}
		return bestFail, false, nil
	}
	return best, true, nil
}

// boundNeed is the statics bound ratio below which search needs its exact
// value: a bound failure replaces the best failure only while nothing has
// passed, no candidate has been analysed and failed, and its ratio is
// lower. Above it boundPasses may stop at the verdict (-Inf: verdict only).
func (m *frameModel) boundNeed(found bool, bestFail *searchResult) float64 {
	if !found && (bestFail.bounded || bestFail.checked == 0) {
		return bestFail.ratio
	}
	return math.Inf(-1)
}

// evaluateCandidate evaluates a candidate and totals its mass per frame.
func (m *frameModel) evaluateCandidate(cd *frameCandidate, full bool) (frameOutcome, error) {
	var o frameOutcome
	var err error
	if cd.braced {
		o, err = m.evaluateBraced(cd, full)
	} else {
		o, err = m.evaluate(cd, m.plain, full)
	}
	if err != nil {
		return o, err
	}
	g := &m.g
	o.massKg = 2*g.rafterMM/1e3*cd.rafter.MassKgPerM + 2*g.heightMM/1e3*cd.column.MassKgPerM +
		2*o.braceLenMM/1e3*o.brace.MassKgPerM +
		2*float64(len(o.rafter.fly))*m.flyBraceKg(*cd.rafter) + 2*float64(len(o.column.fly))*m.flyBraceKg(*cd.column)
	return o, nil
}

// flyBraceKg is one fly brace: the catalogue's lightest C (m.brace0) as a
// representative item, at 45° from the member's inner flange to the purlin
// or girt, so √2 times the member's depth long. A stated representative:
// fly braces are usually small angles, which the catalogue does not list.
func (m *frameModel) flyBraceKg(member catalog.Section) float64 {
	return m.brace0.MassKgPerM * math.Sqrt2 * member.DepthMM / 1e3
}

// role names the member group a failure is reported against.
func (r searchResult) role() Role {
	if !r.bounded && r.o.column.util > r.o.rafter.util {
		return RoleColumn
	}
	return RoleRafter
}

// reason states the best failing candidate, its utilisation and check.
func (r searchResult) reason(m *frameModel) string {
	pair := fmt.Sprintf("rafter %s with column %s", r.cd.rafter.Designation, r.cd.column.Designation)
	if r.cd.braced {
		pair += " and knee braces"
	}
	if r.bounded {
		return fmt.Sprintf("no section pair can pass: best %s needs %.2f times its section moment capacity (or column compression capacity) in a collapse mechanism under ULS loads (AS/NZS 4600:2018 cl. 3.3.2, 3.5.1)",
			pair, r.ratio)
	}
	gov := r.o.governing(m)
	if gov.Check == "" {
		return fmt.Sprintf("no section pair passes: best %s at utilisation %.2f with fly braces at every line (%s)", pair, r.o.util, r.o.stage)
	}
	return fmt.Sprintf("no section pair passes: best %s at utilisation %.2f, failing %s (%s %s) under %s",
		pair, r.o.util, gov.Check, gov.Standard, gov.Clause, gov.Combination)
}

package optimize

import (
	"math"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/checks/coldformed"
)

// frameCandidate is one rafter and column pair, with or without knee braces.
type frameCandidate struct {
	rafter, column *catalog.Section
	rCap, cCap     *coldformed.Capacities
	braced         bool
	pair           int     // index of the section pair
	massLB         float64 // kg per frame, a lower bound (no braces beyond the least)
}

// serviceability is a frame's SLS deflection against its limit.
type serviceability struct {
	ratio     float64 // deflection over the limit
	deflMM    float64
	limitMM   float64
	comb      int
	nameCheck string
}

// frameOutcome is the full evaluation of one candidate.
type frameOutcome struct {
	pass           bool
	util           float64 // governing: member checks and SLS ratios
	rafter, column memberOutcome
	drift, apex    serviceability
	knee           *analysis.KneeBrace
	brace          catalog.Section
	braceUtil      float64
	braceLenMM     float64
	massKg         float64 // per frame
	lambdaMin      float64
	lambdaComb     int
	stage          string // what decided a failure, for reasons
}

// specs returns the member specs of a candidate.
func (m *frameModel) specs(cd *frameCandidate) (memberSpec, memberSpec) {
	return newMemberSpec(rafterKind, *cd.rafter, cd.rCap, m.g.rafterMM, m.g.purlinsMM),
		newMemberSpec(columnKind, *cd.column, cd.cCap, m.g.heightMM, m.g.girtsMM)
}

// serviceabilityChecks returns the eaves drift under SLS wind (h /
// EavesDriftRatio) and the apex deflection under every SLS combination
// (span / ApexDeflectionRatio); limits from the grid (common practice).
func (m *frameModel) serviceabilityChecks() (drift, apex serviceability) {
	lim := m.d.c.Options.Limits
	dr, ar := orDefault(lim.EavesDriftRatio, 150), orDefault(lim.ApexDeflectionRatio, 180)
	p := m.top.p
	drift = serviceability{limitMM: m.g.heightMM / dr, comb: -1, nameCheck: "eaves drift under SLS wind"}
	apex = serviceability{limitMM: m.g.spanMM / ar, comb: -1, nameCheck: "apex vertical deflection under SLS actions"}
	for _, c := range m.sls {
		a := m.sol.Displacement(m.combs[c], p.Apex)
		if v := math.Abs(a[1]); v > apex.deflMM || apex.comb < 0 {
			apex.deflMM, apex.comb = v, c
		}
		if !m.hasW[c] {
			continue
		}
		for _, n := range p.Knees {
			if v := math.Abs(m.sol.Displacement(m.combs[c], n)[0]); v > drift.deflMM || drift.comb < 0 {
				drift.deflMM, drift.comb = v, c
			}
		}
	}
	drift.ratio, apex.ratio = drift.deflMM/drift.limitMM, apex.deflMM/apex.limitMM
	return drift, apex
}

func orDefault(v, d float64) float64 {
	if v > 0 {
		return v
	}
	return d
}

// evaluate analyses the candidate on topology t (sections set here) and
// decides it exactly: SLS first, then the member checks with λc = ∞ (a
// lower bound on every utilisation: a failure there is final, and no
// buckling analysis is spent), then with λc exact for the most compressed
// combination and bounded for the others, exact wherever a check fails.
// With full set the governing utilisations are made exact for the report.
func (m *frameModel) evaluate(cd *frameCandidate, t *frameTopology, full bool) (frameOutcome, error) {
	var o frameOutcome
	t.setSections(*cd.rafter, *cd.column)
	if err := m.screen(t); err != nil {
		return o, err
	}
	o.knee = t.knee
	o.drift, o.apex = m.serviceabilityChecks()
	o.util = math.Max(o.drift.ratio, o.apex.ratio)
	if o.util > 1 && !full {
		o.stage = "serviceability"
		return o, nil
	}
	if err := m.complete(); err != nil {
		return o, err
	}
	m.tabulate()
	rs, cs := m.specs(cd)
	var l lambdas
	l.reset(len(m.combs))
	for i := range l.exact {
		l.exact[i] = true // λc = ∞ bounds every utilisation from below: failures are final
	}
	if !full {
		m.fast = true
		ok, err := m.members(&o, &rs, &cs, &l, false)
		m.fast = false
		if err != nil || !ok {
			o.stage = "members without in-plane amplification"
			return o, err
		}
	}
	if err := m.boundLambdas(&l); err != nil {
		return o, err
	}
	ok, err := m.members(&o, &rs, &cs, &l, full)
	if err != nil {
		return o, err
	}
	if full {
		if err := m.exactGoverning(&o, &rs, &cs, &l, m.d.r.Calculation != nil); err != nil {
			return o, err
		}
	}
	o.lambdaMin, o.lambdaComb = math.Inf(1), -1
	for _, c := range m.uls {
		if l.exact[c] && l.value[c] < o.lambdaMin {
			o.lambdaMin, o.lambdaComb = l.value[c], c
		}
	}
	o.pass = ok && o.util <= 1
	return o, nil
}

// members checks the rafter and column and folds them into o. For a
// verdict (record unset) it stops at the first member that fails, trying
// first the member that failed the last candidate (m.columnFirst): the
// other's utilisation is then left at 0, a lower bound like every
// utilisation of a failing verdict.
func (m *frameModel) members(o *frameOutcome, rs, cs *memberSpec, l *lambdas, record bool) (bool, error) {
	specs, outs := [2]*memberSpec{rs, cs}, [2]*memberOutcome{&o.rafter, &o.column}
	if m.columnFirst && !record {
		specs[0], specs[1], outs[0], outs[1] = cs, rs, &o.column, &o.rafter
	}
	*outs[0], *outs[1] = memberOutcome{}, memberOutcome{}
	pass := true
	for i := range specs {
		mo, err := m.evaluateMember(specs[i], l, flyGreedy, nil, record, stopUnless(record))
		if err != nil {
			return false, err
		}
		*outs[i] = mo
		if !mo.pass {
			pass = false
			if !record {
				m.columnFirst = specs[i] == cs
				break
			}
		}
	}
	o.util = math.Max(math.Max(o.drift.ratio, o.apex.ratio), math.Max(o.rafter.util, o.column.util))
	return pass, nil
}

// exactGoverning makes each member's reported governing check exact: λc
// is computed for every combination whose bounded utilisation in a member
// exceeds the largest exact one of that member (its own deflection ratio
// included), and for all of them with all set. A bounded utilisation is
// never below the exact one, so the member's governing value is then the
// exact maximum whatever order the checks ran in. Fly braces stay as found.
func (m *frameModel) exactGoverning(o *frameOutcome, rs, cs *memberSpec, l *lambdas, all bool) error {
	for {
		r, err := m.evaluateMember(rs, l, flyGiven, o.rafter.fly, true, math.Inf(1))
		if err != nil {
			return err
		}
		c, err := m.evaluateMember(cs, l, flyGiven, o.column.fly, true, math.Inf(1))
		if err != nil {
			return err
		}
		o.rafter, o.column = r, c
		o.util = math.Max(math.Max(o.drift.ratio, o.apex.ratio), math.Max(r.util, c.util))
		more := false
		for _, mo := range []struct {
			checks []checkedSegment
			sls    float64
		}{{r.all, o.apex.ratio}, {c.all, o.drift.ratio}} {
			exactMax := mo.sls
			for _, cs := range mo.checks {
				if l.exact[cs.comb] {
					exactMax = math.Max(exactMax, cs.util)
				}
			}
			for _, cs := range mo.checks {
				if !l.exact[cs.comb] && (all || cs.util > exactMax) {
					if err := m.exactLambda(l, cs.comb); err != nil {
						return err
					}
					more = true
				}
			}
		}
		if !more {
			return nil
		}
	}
}

// stopUnless is the member evaluation's early stop: at the first failure
// for a verdict, never when recording.
func stopUnless(record bool) float64 {
	if record {
		return math.Inf(1)
	}
	return 1
}

// objective is the knee-brace placement objective: the governing
// utilisation with fly braces at every line and λc = ∞ (no buckling
// analysis per trial; the placement found is then checked in full).
// Above stopAbove it may return early with a lower bound above stopAbove.
func (m *frameModel) objective(cd *frameCandidate, t *frameTopology, stopAbove float64) (float64, error) {
	t.setSections(*cd.rafter, *cd.column)
	if err := m.solve(t); err != nil {
		return 0, err
	}
	drift, apex := m.serviceabilityChecks()
	u := math.Max(drift.ratio, apex.ratio)
	if u > stopAbove {
		return u, nil
	}
	m.tabulate()
	rs, cs := m.specs(cd)
	m.fast = true
	defer func() { m.fast = false }()
	var l lambdas
	l.reset(len(m.combs))
	for i := range l.exact {
		l.exact[i] = true
	}
	for _, s := range []*memberSpec{&rs, &cs} {
		if u > stopAbove {
			return u, nil
		}
		mo, err := m.evaluateMember(s, &l, flyEvery, nil, false, stopAbove)
		if err != nil {
			return 0, err
		}
		u = math.Max(u, mo.util)
	}
	return u, nil
}

package optimize

import (
	"math"
	"slices"
)

// memberOutcome is the check of a rafter or column pair: its governing
// segment check over every ULS combination and both sides, and its fly
// braces.
type memberOutcome struct {
	pass bool
	util float64
	gov  checkedSegment
	fly  []float64 // canonical positions, one side
	// all holds every combination's governing outer- and inner-flange
	// checks, kept only when recording.
	all []checkedSegment
}

// flyMode says how fly braces are placed for a member evaluation.
type flyMode int

const (
	flyGreedy flyMode = iota // the fewest that pass
	flyEvery                 // at every purlin or girt (the knee-brace objective)
	flyGiven                 // keep the given positions
)

// evaluateMember checks member s under every ULS combination. A check that
// fails under a λc that is only a bound is repeated with the exact λc, so
// the verdict is exact; utilisations under bounds are conservative.
// It returns at the first check above stopAbove (+Inf: never) with the
// utilisation so far, a lower bound; at stopAbove = 1 the verdict is then
// final. The combination that stopped the last member is tried first.
func (m *frameModel) evaluateMember(s *memberSpec, l *lambdas, mode flyMode, given []float64, record bool, stopAbove float64) (memberOutcome, error) {
	out := memberOutcome{pass: true}
	switch mode {
	case flyGreedy:
		fly, ok, err := m.greedyFlyBraces(s, l)
		if err != nil {
			return out, err
		}
		out.fly = fly
		if !ok {
			out.fly, out.pass = s.fly, false
			if stopAbove <= 1 {
				out.util = math.Max(out.util, 1+1e-9)
				return out, nil
			}
		}
	case flyEvery:
		out.fly = s.fly
	case flyGiven:
		out.fly = given
	}
	inner := append(append([]float64{0}, out.fly...), s.length)
	haveGov := false
	for _, c := range m.order {
		for _, k := range s.kind.parts() {
			for {
				in := m.inputs(s, k, c, l.value[c])
				f := m.combine(k, c)
				o, err := m.worstSegment(s, k, c, in, f, s.outer, true)
				if err != nil {
					return out, err
				}
				i, err := m.worstSegment(s, k, c, in, f, inner, false)
				if err != nil {
					return out, err
				}
				if (o.util > 1 || i.util > 1) && !l.exact[c] {
					if err := m.exactLambda(l, c); err != nil {
						return out, err
					}
					continue
				}
				for _, cs := range [2]checkedSegment{o, i} {
					gov := cs.util > out.util || !haveGov
					if gov || record {
						cs = cs.kept(gov && record || m.d.r.Calculation != nil)
					}
					if gov {
						out.util, out.gov, haveGov = cs.util, cs, true
					}
					if record {
						out.all = append(out.all, cs)
					}
				}
				break
			}
			if out.util > stopAbove {
				m.failedFirst(c)
				out.pass = out.util <= 1
				return out, nil
			}
		}
	}
	if out.util > 1 {
		out.pass = false
	}
	return out, nil
}

// failedFirst moves combination c to the front of the check order: the
// combination that failed one candidate most often fails the next.
func (m *frameModel) failedFirst(c int) {
	i := slices.Index(m.order, c)
	if i > 0 {
		copy(m.order[1:i+1], m.order[:i])
		m.order[0] = c
	}
}

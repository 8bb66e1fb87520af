package optimize

// Fly braces restrain the inner flange of a rafter or column at a purlin
// (girt) line, shortening the segment the inner flange buckles over where
// it is in compression (hogging at the knee under gravity, sagging under
// uplift). They go at purlin and girt points only, the same on both sides
// of the symmetric frame.

import "github.com/spansweep/spansweep/checks/coldformed"

// greedyFlyBraces returns the fewest fly braces (canonical positions) that
// make every inner-flange segment of the member pass under every ULS
// combination on both sides: from the base or knee, each segment is
// extended to the farthest line at which it still passes. Greedy reach is
// optimal for covering a line when a segment inside a passing one passes
// too (a shorter segment never has a lower capacity; the moment-gradient
// factor can make this not strictly so, which is accepted). ok is false
// when even a brace at every line leaves a failing segment.
func (m *frameModel) greedyFlyBraces(s *memberSpec, l *lambdas) (fly []float64, ok bool, err error) {
	pos := 0.0
	for {
		pass, err := m.innerPasses(s, l, pos, s.length)
		if err != nil || pass {
			return fly, pass, err
		}
		reach := -1.0
		for _, q := range s.fly {
			if q <= pos {
				continue
			}
			pass, err := m.innerPasses(s, l, pos, q)
			if err != nil {
				return fly, false, err
			}
			if !pass {
				break
			}
			reach = q
		}
		if reach < 0 {
			return fly, false, nil
		}
		fly = append(fly, reach)
		pos = reach
	}
}

// innerPasses reports whether the inner-flange segment [a, b] (canonical)
// passes under every ULS combination on both sides. A failure under a λc
// that is only a bound is confirmed with the exact λc.
func (m *frameModel) innerPasses(s *memberSpec, l *lambdas, a, b float64) (bool, error) {
	for _, c := range m.order {
		for _, k := range s.kind.parts() {
			pa, pb := s.toPart(k, a, b)
			f := m.combine(k, c)
			sg := m.segmentOf(k, f, pa, pb)
			if sg.hog <= 0 {
				continue
			}
			for {
				u, err := m.innerVerdictUtilisation(s, m.inputs(s, k, c, l.value[c]), sg.hog, pb-pa, sg.cbPos)
				if err != nil {
					return false, err
				}
				if u <= 1 {
					break
				}
				if l.exact[c] {
					m.failedFirst(c)
					return false, nil
				}
				if err := m.exactLambda(l, c); err != nil {
					return false, err
				}
			}
		}
	}
	return true, nil
}

// noAmplificationMargin is how far above 1 the utilisation without in-plane
// amplification must be to decide a failure without the full check: ten
// times the agreement of fastUtilisation with coldformed.CheckBeamColumn
// that TestFastUtilisationMatchesCheck requires (1e-6 relative), so that
// rounding can never turn the verdict.
const noAmplificationMargin = 1e-5

// innerVerdictUtilisation is the utilisation of an inner-flange segment for
// a pass or fail verdict (≤ 1 passes): exact where it passes, and on a
// failure possibly only a value above 1. Under a finite λc the utilisation
// never falls below its value at λc = ∞ (a longer l_ex lowers φN_c and
// α_nx), so when that (fastUtilisation) exceeds 1 by noAmplificationMargin
// the full check is not needed.
func (m *frameModel) innerVerdictUtilisation(s *memberSpec, in partInputs, mStar, length, cb float64) (float64, error) {
	if m.fast {
		if u, ok := s.fastUtilisation(in, mStar, length, cb, false); ok {
			return u, nil
		}
	} else {
		noAmp := in
		noAmp.lex = lexFloor
		if u, ok := s.fastUtilisation(noAmp, mStar, length, cb, false); ok && u > 1+noAmplificationMargin {
			return u, nil
		}
	}
	var buf [12]coldformed.Check // on the stack: only the utilisation is kept
	res, err := s.checkInto(buf[:0], in, mStar, length, cb, false)
	if err != nil {
		return 0, err
	}
	return res.Utilisation(), nil
}

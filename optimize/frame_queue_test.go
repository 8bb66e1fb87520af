package optimize

import (
	"cmp"
	"math/rand/v2"
	"slices"
	"testing"
)

// TestCandidateQueueOrder: the lazy heap visits candidates in exactly the
// order of a full sort by (mass bound, pair, unbraced first), the order the
// search is defined by, including ties in the bound (many pairs share a
// bound when sections repeat masses) and an empty list.
func TestCandidateQueueOrder(t *testing.T) {
	r := rand.New(rand.NewPCG(1, 2))
	for _, n := range []int{0, 1, 2, 7, 64, 501} {
		var cands []frameCandidate
		for p := range n {
			lb := float64(r.IntN(20)) // few distinct values: many ties
			cands = append(cands, frameCandidate{pair: p + 1, massLB: lb})
			if r.IntN(2) == 0 {
				cands = append(cands, frameCandidate{pair: p + 1, braced: true, massLB: lb + 0.5*float64(r.IntN(3))})
			}
		}
		want := slices.Clone(cands)
		slices.SortStableFunc(want, func(a, b frameCandidate) int {
			return cmp.Or(cmp.Compare(a.massLB, b.massLB), cmp.Compare(a.pair, b.pair), boolOrder(a.braced)-boolOrder(b.braced))
		})
		q := newCandidateQueue(cands)
		for i := range want {
			got, ok := q.next()
			if !ok {
				t.Fatalf("n=%d: queue ended after %d of %d candidates", n, i, len(want))
			}
			if got.pair != want[i].pair || got.braced != want[i].braced {
				t.Fatalf("n=%d, position %d: got pair %d braced %v (bound %g), want pair %d braced %v (bound %g)",
					n, i, got.pair, got.braced, got.massLB, want[i].pair, want[i].braced, want[i].massLB)
			}
		}
		if _, ok := q.next(); ok {
			t.Errorf("n=%d: queue yields more than %d candidates", n, len(want))
		}
	}
}

func boolOrder(b bool) int {
	if b {
		return 1
	}
	return 0
}

package footing

import (
	"math/rand/v2"
	"testing"
)

// The bisection over widths finds the same pad as scanning every width ×
// depth candidate in volume order (the definition of the lightest pad),
// over 300 random bases with uplift, bearing, shear and moment.
func TestBisectionEqualsScan(t *testing.T) {
	rng := rand.New(rand.NewPCG(7, 11))
	o, err := (*Options)(nil).resolved()
	if err != nil {
		t.Fatal(err)
	}
	for k := range 300 {
		b := Base{Name: "random",
			ULS: []Reaction{
				{Combination: "uplift", VerticalKN: -150 * rng.Float64(), ShearKN: 30 * rng.Float64(), MomentKNm: 20 * rng.Float64()},
				{Combination: "down", VerticalKN: 200 * rng.Float64(), ShearKN: 10 * rng.Float64()},
			},
			SLS: []Reaction{{Combination: "service", VerticalKN: 150 * rng.Float64(), MomentKNm: 10 * rng.Float64()}},
		}
		var scan pad
		scanned := false
		for _, p := range candidates(o) {
			if allPass(p.checks(b)) {
				scan, scanned = p, true
				break
			}
		}
		got, ok := smallestPassing(b, o)
		if ok != scanned || (ok && (got.b != scan.b || got.d != scan.d)) {
			t.Fatalf("base %d %+v: bisection %v %.2f×%.2f, scan %v %.2f×%.2f", k, b, ok, got.b, got.d, scanned, scan.b, scan.d)
		}
	}
}

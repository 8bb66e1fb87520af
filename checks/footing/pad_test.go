package footing

import (
	"encoding/json"
	"errors"
	"math"
	"strings"
	"testing"
)

// approx reports whether got is within rel (relative) of want.
func approx(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Max(1, math.Abs(want))
}

func base(name string, uls, sls []Reaction) Base { return Base{Name: name, ULS: uls, SLS: sls} }

// TestSizePadByHand sizes two pads by hand with the default options
// (γc = 24 kN/m³, 0.9G, q_a = 100 kPa, widths 0.45–3.0 step 0.05 m, depths
// 0.6–1.5 step 0.1 m, no soil).
func TestSizePadByHand(t *testing.T) {
	tests := []struct {
		name          string
		uplift, down  float64 // ULS uplift (kN), SLS downward load (kN)
		wantB, wantD  float64
		wantGoverning string
		wantUtil      float64
	}{
		{
			// Uplift: 0.9·24·B²D ≥ 20 → B²D ≥ 0.92593 m³. Smallest B per depth
			// (B² ≥ 0.92593/D, B on the 0.05 grid) and its volume:
			//   D 0.6: B² ≥ 1.5432 → B 1.25 (1.5625) → 0.9375
			//   D 0.7: B² ≥ 1.3228 → B 1.20 (1.15² = 1.3225 is short) → 1.0080
			//   D 0.8: B² ≥ 1.1574 → B 1.10 → 0.9680
			//   D 0.9: B² ≥ 1.0288 → B 1.05 → 0.99225
			//   D 1.0: B² ≥ 0.92593 → B 1.00 → 1.0000
			//   D 1.1: B² ≥ 0.84175 → B 0.95 → 0.99275
			//   D 1.2: B² ≥ 0.77161 → B 0.90 → 0.9720
			//   D 1.3: B² ≥ 0.71225 → B 0.85 → 0.93925
			//   D 1.4: B² ≥ 0.66138 → B 0.85 → 1.0115
			//   D 1.5: B² ≥ 0.61728 → B 0.80 → 0.9600
			// Lightest: 1.25 × 0.6 (0.9375 m³), just under 0.85 × 1.3.
			// Uplift utilisation 20/(0.9·24·0.9375) = 20/20.25 = 0.98765.
			// Bearing: 30/1.5625 + 24·0.6 = 19.2 + 14.4 = 33.6 kPa ≤ 100: passes.
			name: "uplift governs", uplift: 20, down: 30,
			wantB: 1.25, wantD: 0.6, wantGoverning: "uplift", wantUtil: 20.0 / 20.25,
		},
		{
			// Bearing: 150/B² + 24D ≤ 100. The weight term grows with D, so
			// D = 0.6 is best for every B: 150/B² ≤ 85.6 → B² ≥ 1.75234 →
			// B ≥ 1.3238 → B 1.35 (1.8225 m²), 1.0935 m³.
			// q = 150/1.8225 + 14.4 = 82.305 + 14.4 = 96.705 kPa → 0.96705.
			// Uplift: 2 kN against 0.9·24·1.0935 = 23.62 kN: passes.
			name: "bearing governs", uplift: 2, down: 150,
			wantB: 1.35, wantD: 0.6, wantGoverning: "bearing", wantUtil: 0.96705,
		},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			b := base(tc.name,
				[]Reaction{{Combination: "0.9G+Wu", VerticalKN: -tc.uplift}},
				[]Reaction{{Combination: "G+psi_s Q", VerticalKN: tc.down}})
			p, err := SizePad(b, nil)
			if err != nil {
				t.Fatal(err)
			}
			if !approx(p.WidthM, tc.wantB, 1e-9) || !approx(p.DepthM, tc.wantD, 1e-9) {
				t.Errorf("pad = %g m x %g m, want %g m x %g m", p.WidthM, p.DepthM, tc.wantB, tc.wantD)
			}
			if want := tc.wantB * tc.wantB * tc.wantD; !approx(p.ConcreteVolumeM3, want, 1e-9) {
				t.Errorf("volume = %g m³, want %g m³", p.ConcreteVolumeM3, want)
			}
			if !strings.Contains(p.Governing.Name, tc.wantGoverning) || !approx(p.Governing.Utilisation, tc.wantUtil, 1e-4) {
				t.Errorf("governing = %q at %.5f, want %q at %.5f", p.Governing.Name, p.Governing.Utilisation, tc.wantGoverning, tc.wantUtil)
			}
			if p.Status != OK {
				t.Errorf("status = %v, want ok", p.Status)
			}
		})
	}
}

// TestPadChecksByHand checks each check's demand and capacity on a
// 1.0 m × 0.6 m pad (weight 24·0.6 = 14.4 kN, 0.9G = 12.96 kN), by hand.
func TestPadChecksByHand(t *testing.T) {
	o := DefaultOptions()
	p := pad{b: 1.0, d: 0.6, o: &o}
	passive := o
	passive.IncludePassive = true
	soil := o
	soil.IncludeSoil, soil.SoilCoverM = true, 0.3
	tests := []struct {
		name                string
		got                 Check
		wantDemand, wantCap float64
	}{
		// P = 50 + 14.4 = 64.4 kN, e = 10/64.4 = 0.15528 m ≤ B/6 = 0.16667:
		// q = 64.4/1 · (1 + 6·0.15528) = 64.4 + 60 = 124.4 kPa.
		{"bearing within kern", p.bearing(Reaction{Combination: "s", VerticalKN: 50, MomentKNm: 10}), 124.4, 100},
		// e = 20/64.4 = 0.31056 m > B/6: q = 2·64.4/(3·1·(0.5 − 0.31056))
		// = 128.8/0.56832 = 226.63 kPa.
		{"bearing partial contact", p.bearing(Reaction{Combination: "s", VerticalKN: 50, MomentKNm: 20}), 226.63, 100},
		// H = 5 kN at 0.6 m above the underside: M = 3 kNm, e = 0.046584 m:
		// q = 64.4 + 6·3/1 = 82.4 kPa.
		{"bearing from shear", p.bearing(Reaction{Combination: "s", VerticalKN: 50, ShearKN: -5}), 82.4, 100},
		// Uplift 10 kN against 0.9·14.4 = 12.96 kN.
		{"uplift", p.uplift(Reaction{Combination: "u", VerticalKN: -10}), 10, 12.96},
		// Soil 0.3 m over a 1.1 × 0.6 pad: 0.9(24·0.726 + 18·1.21·0.3)
		// = 0.9(17.424 + 6.534) = 21.5622 kN.
		{"uplift with soil", pad{b: 1.1, d: 0.6, o: &soil}.uplift(Reaction{Combination: "u", VerticalKN: -10}), 10, 21.5622},
		// N = 10 + 12.96 = 22.96 kN, 0.3·22.96 = 6.888 kN.
		{"sliding", p.sliding(Reaction{Combination: "u", VerticalKN: 10, ShearKN: 8}), 8, 6.888},
		// Rankine Kp = (1 + sin 30°)/(1 − sin 30°) = 3; ½·3·18·0.6²·1 = 9.72 kN,
		// × 0.5 = 4.86 kN; 6.888 + 4.86 = 11.748 kN.
		{"sliding with passive", pad{b: 1, d: 0.6, o: &passive}.sliding(Reaction{Combination: "u", VerticalKN: 10, ShearKN: 8}), 8, 11.748},
		// M = 5 + 2·0.6 = 6.2 kNm against 22.96·0.5 = 11.48 kNm.
		{"overturning", p.overturning(Reaction{Combination: "u", VerticalKN: 10, ShearKN: 2, MomentKNm: -5}), 6.2, 11.48},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if !approx(tc.got.Demand, tc.wantDemand, 1e-4) || !approx(tc.got.Capacity, tc.wantCap, 1e-4) {
				t.Errorf("demand/capacity = %.5g/%.5g, want %.5g/%.5g", tc.got.Demand, tc.got.Capacity, tc.wantDemand, tc.wantCap)
			}
			if want := tc.wantDemand / tc.wantCap; !approx(tc.got.Utilisation, want, 1e-4) {
				t.Errorf("utilisation = %.5g, want %.5g", tc.got.Utilisation, want)
			}
		})
	}
}

// TestLightAndHeavyShed: illustrative reactions (not from a real design).
// A light 6 m shed in a high wind lifts off; a heavy 18 m workshop with a
// hoist in a low wind presses down. The uplift combinations carry little
// shear here: with shear under net uplift, friction μ(V + 0.9W) needs
// 0.9W well above the uplift and sliding governs instead (see
// TestSlidingUnderUplift).
func TestLightAndHeavyShed(t *testing.T) {
	light := base("light shed, region C",
		[]Reaction{
			{Combination: "1.2G+1.5Q", VerticalKN: 8, ShearKN: 1},
			{Combination: "0.9G+Wu cross", VerticalKN: -28},
		},
		[]Reaction{
			{Combination: "G+psi_s Q", VerticalKN: 5},
			{Combination: "G+Ws", VerticalKN: -10, ShearKN: 2},
		})
	heavy := base("heavy workshop, region A",
		[]Reaction{
			{Combination: "1.2G+1.5Q", VerticalKN: 140, ShearKN: 12},
			{Combination: "0.9G+Wu cross", VerticalKN: -4, ShearKN: 2},
		},
		[]Reaction{
			{Combination: "G+psi_s Q", VerticalKN: 95, ShearKN: 4},
			{Combination: "G+Ws", VerticalKN: 40, ShearKN: 3},
		})
	for _, tc := range []struct {
		b        Base
		wantName string
		wantLS   string
	}{{light, "uplift", ULS}, {heavy, "bearing", SLS}} {
		p, err := SizePad(tc.b, nil)
		if err != nil {
			t.Fatalf("%s: %v", tc.b.Name, err)
		}
		if !strings.Contains(p.Governing.Name, tc.wantName) || p.Governing.LimitState != tc.wantLS {
			t.Errorf("%s: governing %q (%s), want %q (%s)", tc.b.Name, p.Governing.Name, p.Governing.LimitState, tc.wantName, tc.wantLS)
		}
		if !allPass(p.Checks) {
			t.Errorf("%s: returned pad fails a check: %+v", tc.b.Name, p.Checks)
		}
	}
}

// TestMoreUpliftNeverSmaller: the lightest passing pad's volume does not
// fall as the ULS uplift grows (every ULS check gets harder with uplift),
// and once no pad passes, none passes for more uplift.
func TestMoreUpliftNeverSmaller(t *testing.T) {
	prev, failed := 0.0, false
	for u := 0.0; u <= 320; u += 5 {
		b := base("mono",
			[]Reaction{{Combination: "0.9G+Wu", VerticalKN: -u, ShearKN: 0.1 * u, MomentKNm: 0.02 * u}},
			[]Reaction{{Combination: "G", VerticalKN: 20}})
		p, err := SizePad(b, nil)
		switch {
		case errors.Is(err, ErrNoSolution):
			failed = true
			continue
		case err != nil:
			t.Fatal(err)
		case failed:
			t.Fatalf("uplift %g kN passes after a smaller uplift had no solution", u)
		}
		if p.ConcreteVolumeM3 < prev-1e-12 {
			t.Errorf("uplift %g kN: volume %g m³ < %g m³ for less uplift", u, p.ConcreteVolumeM3, prev)
		}
		prev = p.ConcreteVolumeM3
	}
	if !failed {
		t.Error("sweep never reached no solution; raise the top uplift")
	}
}

// TestNoSolution: 500 kN uplift exceeds the largest pad,
// 0.9·24·3²·1.5 = 291.6 kN.
func TestNoSolution(t *testing.T) {
	b := base("huge uplift",
		[]Reaction{{Combination: "0.9G+Wu", VerticalKN: -500}},
		[]Reaction{{Combination: "G", VerticalKN: 10}})
	p, err := SizePad(b, nil)
	var ns *NoSolutionError
	if !errors.As(err, &ns) || !errors.Is(err, ErrNoSolution) {
		t.Fatalf("err = %v, want a *NoSolutionError", err)
	}
	if !strings.Contains(ns.Governing.Name, "uplift") || !approx(ns.Governing.Capacity, 291.6, 1e-9) {
		t.Errorf("governing = %q capacity %g, want uplift at 291.6 kN", ns.Governing.Name, ns.Governing.Capacity)
	}
	if p.Status != NoSolution || p.Status.String() != "no_solution" || p.WidthM != 3 || p.DepthM != 1.5 {
		t.Errorf("pad = %v %g x %g, want no_solution 3 x 1.5", p.Status, p.WidthM, p.DepthM)
	}
}

// TestSlidingUnderUplift: 20 kN uplift with 3 kN shear. Uplift alone needs
// 0.9W ≥ 20 kN; sliding needs 0.3(0.9W − 20) ≥ 3 → 0.9W ≥ 30 kN, so the
// lightest pad is set by sliding, and its 0.9W is at least 30 kN (hand
// calculation from the friction rule of this package).
func TestSlidingUnderUplift(t *testing.T) {
	b := base("uplift with shear",
		[]Reaction{{Combination: "0.9G+Wu", VerticalKN: -20, ShearKN: 3}},
		[]Reaction{{Combination: "G", VerticalKN: 10}})
	p, err := SizePad(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(p.Governing.Name, "sliding") {
		t.Errorf("governing = %q, want sliding", p.Governing.Name)
	}
	if w := 0.9 * 24 * p.ConcreteVolumeM3; w < 30-1e-9 {
		t.Errorf("0.9W = %.4g kN, want ≥ 30 kN", w)
	}
}

// TestResultEncodesAsJSON: a resultant outside every pad (moment 200 kNm
// on a 5 kN load) gives capped, finite utilisations that JSON can encode.
func TestResultEncodesAsJSON(t *testing.T) {
	b := base("tipping",
		[]Reaction{{Combination: "1.2G+Wu", VerticalKN: 5, MomentKNm: 200}},
		[]Reaction{{Combination: "G+Ws", VerticalKN: 5, MomentKNm: 200}})
	f, err := Design(b, nil, nil)
	if !errors.Is(err, ErrNoSolution) {
		t.Fatalf("err = %v, want ErrNoSolution", err)
	}
	js, err := json.Marshal(f)
	if err != nil {
		t.Fatalf("json: %v", err)
	}
	if !strings.Contains(string(js), `"status":"no_solution"`) {
		t.Errorf("json lacks the no_solution status: %s", js)
	}
}

func BenchmarkSizePad(b *testing.B) {
	base := base("bench",
		[]Reaction{{Combination: "0.9G+Wu", VerticalKN: -60, ShearKN: 4, MomentKNm: 3}},
		[]Reaction{{Combination: "G", VerticalKN: 40}})
	for b.Loop() {
		if _, err := SizePad(base, nil); err != nil {
			b.Fatal(err)
		}
	}
}

package footing

import (
	"errors"
	"strings"
	"testing"
)

// TestBoltCapacitiesByHand: AS 4100:2020 cl. 9.3.2.1 and 9.3.2.2 with
// φ = 0.8, f_uf = 400 MPa, k_r = 1, one shear plane, worked by hand:
//
//	φVf = 0.8·0.62·400·Ac = 198.4·Ac N (threads in the plane)
//	  M12: 198.4·76.2 = 15 118 N;  M16: 198.4·144 = 28 570 N
//	  M20: 198.4·225 = 44 640 N;   M24: 198.4·324 = 64 282 N
//	  M20 shank: 198.4·π·20²/4 = 198.4·314.16 = 62 329 N
//	φNtf = 0.8·400·As = 320·As N
//	  M12: 320·84.3 = 26 976 N;    M16: 320·157 = 50 240 N
//	  M20: 320·245 = 78 400 N;     M24: 320·353 = 112 960 N
func TestBoltCapacitiesByHand(t *testing.T) {
	tests := []struct {
		size         int // index in BoltSizes
		threads      bool
		wantV, wantN float64
	}{
		{0, true, 15.118, 26.976},
		{1, true, 28.570, 50.240},
		{2, true, 44.640, 78.400},
		{3, true, 64.282, 112.960},
		{2, false, 62.329, 78.400},
	}
	for _, tc := range tests {
		s := BoltSizes[tc.size]
		if got := ShearCapacityKN(s, tc.threads); !approx(got, tc.wantV, 1e-4) {
			t.Errorf("%s threads=%v: φVf = %.4f kN, want %.4f kN", s.Name, tc.threads, got, tc.wantV)
		}
		if got := TensionCapacityKN(s); !approx(got, tc.wantN, 1e-4) {
			t.Errorf("%s: φNtf = %.4f kN, want %.4f kN", s.Name, got, tc.wantN)
		}
	}
}

// TestSizeBoltsByHand: the smallest size, then the fewest bolts, passing
// AS 4100:2020 cl. 9.3.2.3, (V*/φVf)² + (N*/φNtf)² ≤ 1, capacities above.
func TestSizeBoltsByHand(t *testing.T) {
	tests := []struct {
		name      string
		r         Reaction
		wantSize  string
		wantCount int
		wantUtil  float64 // governing utilisation
	}{
		// 2×M12: N* = 20, V* = 5: combined (5/15.118)² + (20/26.976)²
		// = 0.1094 + 0.5497 = 0.6591; tension alone 20/26.976 = 0.7414 governs.
		{"light uplift", Reaction{Combination: "u", VerticalKN: -40, ShearKN: 10}, "M12", 2, 0.7414},
		// 2×M12: N* = 30 > 26.976 fails. 4×M12: N* = 15, V* = 2.5:
		// tension 15/26.976 = 0.5560 governs (combined 0.0273 + 0.3092 = 0.3365).
		{"four small bolts before larger", Reaction{Combination: "u", VerticalKN: -60, ShearKN: 10}, "M12", 4, 0.5560},
		// 4×M12: V* 7.5, N* 25: 0.2461 + 0.8589 = 1.105 fails.
		// 2×M16: V* 15, N* 50: 0.2757 + 0.9904 = 1.266 fails.
		// 4×M16: V* 7.5, N* 25: 0.0689 + 0.2476 = 0.3165; tension 25/50.24 = 0.4976 governs.
		{"combined action", Reaction{Combination: "u", VerticalKN: -100, ShearKN: 30}, "M16", 4, 0.4976},
		// Moment 10 kNm, rows 0.15 m apart: couple 10/0.15 = 66.67 kN per row.
		// 2 bolts: 66.67 kN each (> M16 50.24, < M20 78.40); 4 bolts: 33.33 kN
		// (> M12 26.976, < M16 50.24). Order: M12×2, M12×4, M16×2 fail; M16×4
		// passes at 33.33/50.24 = 0.6635.
		{"base moment", Reaction{Combination: "w", MomentKNm: 10}, "M16", 4, 0.6635},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			b := base(tc.name, []Reaction{tc.r}, []Reaction{{Combination: "G", VerticalKN: 5}})
			got, err := SizeBolts(b, nil)
			if err != nil {
				t.Fatal(err)
			}
			if got.Size != tc.wantSize || got.Count != tc.wantCount {
				t.Errorf("bolts = %d x %s, want %d x %s", got.Count, got.Size, tc.wantCount, tc.wantSize)
			}
			if !approx(got.Governing.Utilisation, tc.wantUtil, 1e-3) {
				t.Errorf("governing %q utilisation = %.4f, want %.4f", got.Governing.Name, got.Governing.Utilisation, tc.wantUtil)
			}
			if len(got.Notes) == 0 || !strings.Contains(got.Notes[0], "NOT checked") {
				t.Errorf("notes = %q, want the concrete breakout warning first", got.Notes)
			}
		})
	}
}

// TestSizeBoltsNoSolution: 500 kN uplift over 4×M24 is 125 kN per bolt
// > φNtf 112.96 kN.
func TestSizeBoltsNoSolution(t *testing.T) {
	b := base("x", []Reaction{{Combination: "u", VerticalKN: -500}}, []Reaction{{Combination: "G", VerticalKN: 5}})
	got, err := SizeBolts(b, nil)
	var ns *NoSolutionError
	if !errors.As(err, &ns) || got.Status != NoSolution {
		t.Fatalf("err = %v, status %v; want *NoSolutionError, no_solution", err, got.Status)
	}
	if got.Size != "M24" || got.Count != 4 || ns.Governing.Utilisation <= 1 {
		t.Errorf("got %d x %s governing %.3g, want 4 x M24 failing", got.Count, got.Size, ns.Governing.Utilisation)
	}
}

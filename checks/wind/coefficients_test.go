package wind

import "testing"

// TestLeewardWall checks Table 5.2(B) of AS/NZS 1170.2:2021 and its
// interpolation values quoted in REFERENCE-VALUES §1.6 (confirmed: S1, S2).
func TestLeewardWall(t *testing.T) {
	cases := []struct {
		name          string
		pitch, dOverB float64
		want          float64
	}{
		{"flat d/b 0.3", 0, 0.3, -0.5},
		{"flat d/b 1.5", 5, 1.5, -0.40},
		{"flat d/b 3", 0, 3, -0.25},
		{"flat d/b 6 holds ≥4", 0, 6, -0.2},
		{"10°", 10, 3, -0.3},
		{"17.5° midway −0.3 / −0.4", 17.5, 1, -0.35},
		{"25° d/b ≤0.1", 25, 0.1, -0.75},
		{"30° d/b 2", 30, 2, -0.5},
		{"22.5° midway −0.4 / −0.75", 22.5, 0.1, -0.575},
	}
	for _, c := range cases {
		if got := leewardWallCpe(c.pitch, c.dOverB); !near(got, c.want, 1e-12) {
			t.Errorf("%s: got %g, want %g", c.name, got, c.want)
		}
	}
}

// TestRoofCoefficients checks Tables 5.3(A), (B), (C) of AS/NZS 1170.2:2021
// (REFERENCE-VALUES §1.6, confirmed: S1, S2) at table points and midway.
func TestRoofCoefficients(t *testing.T) {
	a := roofABands(0.5)
	if a[0].lo != -0.9 || a[0].hi != -0.4 || a[2].lo != -0.5 || a[4].hi != 0.2 {
		t.Errorf("Table 5.3(A) h/d ≤ 0.5: got %+v", a)
	}
	a = roofABands(1.0)
	if a[0].lo != -1.3 || a[0].hi != -0.6 || a[3].lo != -0.7 || a[3].hi != -0.3 {
		t.Errorf("Table 5.3(A) h/d ≥ 1: got %+v", a)
	}
	// h/d = 0.75, first band: midway −0.9/−1.3 and −0.4/−0.6.
	a = roofABands(0.75)
	if !near(a[0].lo, -1.1, 1e-12) || !near(a[0].hi, -0.5, 1e-12) {
		t.Errorf("Table 5.3(A) h/d 0.75 band 0: got %g, %g; want −1.1, −0.5", a[0].lo, a[0].hi)
	}
	ups := []struct {
		name           string
		pitch, hd      float64
		wantLo, wantHi float64
	}{
		{"10° h/d 0.25", 10, 0.25, -0.7, -0.3},
		{"15° h/d 0.5", 15, 0.5, -0.7, -0.3},
		{"30° h/d 1", 30, 1, -0.3, 0.2},
		{"35° h/d 0.1 holds 0.25", 35, 0.1, 0, 0.5},
		{"12.5° h/d 0.25 midway", 12.5, 0.25, -0.6, -0.15},
		{"20° h/d 0.375 midway", 20, 0.375, -0.35, 0.1},
	}
	for _, c := range ups {
		lo, hi := upwindSlopeCpe(c.pitch, c.hd)
		if !near(lo, c.wantLo, 1e-12) || !near(hi, c.wantHi, 1e-12) {
			t.Errorf("Table 5.3(B) %s: got %g, %g; want %g, %g", c.name, lo, hi, c.wantLo, c.wantHi)
		}
	}
	downs := []struct {
		name          string
		pitch, hd, bd float64
		want          float64
	}{
		{"10° h/d 0.25", 10, 0.25, 2, -0.3},
		{"10° h/d 1", 10, 1, 2, -0.7},
		{"15° h/d 0.5", 15, 0.5, 2, -0.5},
		{"25° b/d 2", 25, 0.3, 2, -0.6},
		{"30° b/d 5: −0.06·12", 30, 0.3, 5, -0.72},
		{"35° b/d 10", 35, 0.3, 10, -0.9},
	}
	for _, c := range downs {
		if got := downwindSlopeCpe(c.pitch, c.hd, c.bd); !near(got, c.want, 1e-12) {
			t.Errorf("Table 5.3(C) %s: got %g, want %g", c.name, got, c.want)
		}
	}
}

// TestAreaReduction checks Table 5.4 (confirmed: S1, S2, S3), including S1's
// check value 40 m² on a roof gives 0.88.
func TestAreaReduction(t *testing.T) {
	cases := []struct {
		name              string
		area              float64
		windward, leeward bool
		want              float64
	}{
		{"roof 5 m²", 5, false, false, 1.0},
		{"roof 25 m²", 25, false, false, 0.9},
		{"roof 40 m²", 40, false, false, 0.88},
		{"roof 200 m²", 200, false, false, 0.8},
		{"windward 25 m²", 25, true, false, 0.95},
		{"windward 100 m²", 100, true, false, 0.9},
		{"leeward 25 m²", 25, false, true, 1.0},
		{"leeward 100 m²", 100, false, true, 0.95},
	}
	for _, c := range cases {
		if got := AreaReductionFactor(c.area, c.windward, c.leeward); !near(got, c.want, 1e-12) {
			t.Errorf("K_a %s: got %g, want %g", c.name, got, c.want)
		}
	}
}

// TestInternalDominant checks Table 5.1(B) (confirmed: S1 cpi_t5b 2021 and
// its tests) and K_v (cl. 5.3.4; confirmed: S1, S3).
func TestInternalDominant(t *testing.T) {
	cases := []struct {
		name  string
		role  openingRole
		ratio float64
		cpe   float64
		want  []float64
	}{
		{"windward ratio 0.5", openingWindward, 0.5, 0.7, []float64{-0.3, 0.0}},
		{"windward ratio 1", openingWindward, 1, 0.7, []float64{-0.1, 0.2}},
		{"windward ratio 2: 0.7·Cpe", openingWindward, 2, 0.7, []float64{0.49}},
		// S1 test: ratio 3 with C_p,e·K_a = 0.8·0.95: 0.85·0.76 = 0.646.
		{"windward ratio 3 (S1)", openingWindward, 3, 0.8 * 0.95, []float64{0.646}},
		{"windward ratio 8 holds 1.0·Cpe", openingWindward, 8, 0.7, []float64{0.7}},
		// S1 test: ratio 1.5 on the roof, C_p,e = 0.72: 0.5(−0.3 + 0.72), 0.5(0 + 0.72).
		{"other ratio 1.5 (S1)", openingSide, 1.5, 0.72, []float64{0.21, 0.36}},
		{"leeward ratio 2", openingLeeward, 2, -0.5, []float64{-0.5}},
	}
	for _, c := range cases {
		got := dominantCpi(c.role, c.ratio, c.cpe, 1)
		if len(got) != len(c.want) {
			t.Errorf("%s: got %v, want %v", c.name, got, c.want)
			continue
		}
		for i := range got {
			if !near(got[i], c.want[i], 1e-12) {
				t.Errorf("%s: got %v, want %v", c.name, got, c.want)
			}
		}
	}
	// K_v = 1.01 + 0.15·log10(100·A^1.5/V): A = 2, V = 1000 gives
	// α_v = 0.28284 and K_v = 1.01 − 0.15·0.54846 = 0.92773 (derived); A = 10, V = 1000 gives
	// α_v = 3.16 > 3, so 1.085; A = 0.1 gives α_v = 0.0032 < 0.09, so 0.85.
	for _, c := range []struct{ a, v, want float64 }{{2, 1000, 0.927731}, {10, 1000, 1.085}, {0.1, 1000, 0.85}, {0, 1000, 1}} {
		if got := openAreaFactor(c.a, c.v); !near(got, c.want, 1e-6) {
			t.Errorf("K_v A=%g V=%g: got %g, want %g", c.a, c.v, got, c.want)
		}
	}
}

// TestLocalDimension checks a of cl. 5.4.4 (confirmed: S2's reading).
func TestLocalDimension(t *testing.T) {
	// 12 × 30 m, eaves 4 m, 5°: h = 4.2625; walls min(2.4, 6, 4.26) = 2.4;
	// roof: h/b = 0.36 ≥ 0.2, so min(2.4, 6) = 2.4.
	wall, roof := Building{SpanM: 12, LengthM: 30, EaveHeightM: 4, PitchDeg: 5}.LocalPressureDimensionM()
	if !near(wall, 2.4, 1e-12) || !near(roof, 2.4, 1e-12) {
		t.Errorf("a 12×30×4: got wall %g, roof %g; want 2.4, 2.4", wall, roof)
	}
	// 60 × 100 m, eaves 3 m, 0°: h/d = 0.05, h/b = 0.03 < 0.2: roof a = 2h = 6; wall min(12, 20, 3) = 3.
	wall, roof = Building{SpanM: 60, LengthM: 100, EaveHeightM: 3}.LocalPressureDimensionM()
	if !near(wall, 3, 1e-12) || !near(roof, 6, 1e-12) {
		t.Errorf("a 60×100×3: got wall %g, roof %g; want 3, 6", wall, roof)
	}
}

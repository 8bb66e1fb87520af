package wind

import (
	"math"
	"testing"
)

func near(got, want, tol float64) bool { return math.Abs(got-want) <= tol }

// TestRegionalSpeed checks V_R against AS/NZS 1170.2:2021 Table 3.1(A) as
// tabulated in REFERENCE-VALUES §1.2 (confirmed against independent
// transcriptions S1, S2, S3, S4), before M_c.
func TestRegionalSpeed(t *testing.T) {
	rows := []struct {
		regions []string
		v       [4]float64 // R = 25, 100, 500, 1000
	}{
		{[]string{"A0", "A1", "A2", "A3", "A4", "A5"}, [4]float64{37, 41, 45, 46}},
		{[]string{"B1", "B2"}, [4]float64{39, 48, 57, 60}},
		{[]string{"C"}, [4]float64{47, 56, 66, 70}},
		{[]string{"D"}, [4]float64{53, 66, 80, 85}},
		{[]string{"NZ1", "NZ2"}, [4]float64{39, 42, 45, 46}},
		{[]string{"NZ3"}, [4]float64{46, 50, 53, 54}},
		{[]string{"NZ4"}, [4]float64{45, 47, 50, 50}},
	}
	for _, row := range rows {
		for _, reg := range row.regions {
			for i, R := range []float64{25, 100, 500, 1000} {
				got, err := RegionalSpeedMS(reg, R)
				if err != nil {
					t.Fatalf("%s R=%g: %v", reg, R, err)
				}
				if got != row.v[i] {
					t.Errorf("V_R %s R=%g: got %g, want %g", reg, R, got, row.v[i])
				}
			}
		}
	}
}

// TestRegionalSpeedShortReturn checks the R < 5 trap: V_1 is tabulated
// (A 30, B 26, C 23, D 23; confirmed: S1), not the formula (which gives 26
// for A and 14 for B).
func TestRegionalSpeedShortReturn(t *testing.T) {
	for reg, want := range map[string]float64{"A1": 30, "B1": 26, "B2": 26, "C": 23, "D": 23} {
		got, err := RegionalSpeedMS(reg, 1)
		if err != nil || got != want {
			t.Errorf("V_1 %s: got %g (%v), want %g", reg, got, err, want)
		}
	}
	for _, R := range []float64{2, 4.9, 0} {
		if _, err := RegionalSpeedMS("A1", R); err == nil {
			t.Errorf("V_R A1 R=%g: want an error (formula valid for R ≥ 5 only)", R)
		}
	}
	if _, err := RegionalSpeedMS("E", 500); err == nil {
		t.Error("region E: want an error")
	}
}

// TestClimateMultiplier: AS/NZS 1170.2:2021 M_c (confirmed: S1, S2, S3).
func TestClimateMultiplier(t *testing.T) {
	for reg, want := range map[string]float64{"A0": 1, "A4": 1, "B1": 1, "B2": 1.05, "C": 1.05, "D": 1.05, "NZ3": 1} {
		if got, _ := ClimateMultiplier(reg); got != want {
			t.Errorf("M_c %s: got %g, want %g", reg, got, want)
		}
	}
}

// TestTableF2 checks AS/NZS 1170.0:2002 Table F2 (confirmed: S2, S3).
func TestTableF2(t *testing.T) {
	cases := []struct {
		name     string
		il, life int
		cyclonic bool
		wantR    float64
	}{
		{"IL1 50yr non-cyclonic", 1, 50, false, 100},
		{"IL1 50yr cyclonic", 1, 50, true, 200},
		{"IL2 50yr", 2, 50, false, 500},
		{"IL2 50yr cyclonic", 2, 50, true, 500},
		{"IL3 50yr", 3, 50, false, 1000},
		{"IL4 50yr", 4, 50, false, 2500},
		{"IL2 25yr", 2, 25, false, 200},
		{"IL4 25yr", 4, 25, false, 1000},
		{"IL1 5yr", 1, 5, false, 25},
		{"IL3 5yr", 3, 5, false, 100},
		{"IL2 100yr", 2, 100, false, 1000},
		{"IL3 100yr", 3, 100, false, 2500},
		{"IL2 30yr takes the 50yr row", 2, 30, false, 500},
	}
	for _, c := range cases {
		p, err := ULSAnnualProbability(c.il, c.life, c.cyclonic)
		if err != nil {
			t.Errorf("%s: %v", c.name, err)
			continue
		}
		if !near(1/p, c.wantR, 1e-9) {
			t.Errorf("%s: got 1/%g, want 1/%g", c.name, 1/p, c.wantR)
		}
	}
	for _, bad := range [][2]int{{0, 50}, {5, 50}, {4, 100}, {2, 0}} {
		if _, err := ULSAnnualProbability(bad[0], bad[1], false); err == nil {
			t.Errorf("IL%d life %d: want an error", bad[0], bad[1])
		}
	}
}

// TestTerrainHeightMultiplier checks AS/NZS 1170.2:2021 Table 4.1 rows
// (REFERENCE-VALUES §1.4, confirmed: S1, S2, S3) and linear interpolation
// between them (derived from the same rows).
func TestTerrainHeightMultiplier(t *testing.T) {
	table := map[float64][]float64{
		1:   {0.97, 1.01, 1.08, 1.12, 1.14, 1.18},
		2:   {0.91, 0.91, 1.00, 1.05, 1.08, 1.12},
		2.5: {0.87, 0.87, 0.92, 0.97, 1.01, 1.06},
		3:   {0.83, 0.83, 0.83, 0.89, 0.94, 1.00},
		4:   {0.75, 0.75, 0.75, 0.75, 0.75, 0.80},
	}
	for tc, row := range table {
		for i, z := range []float64{3, 5, 10, 15, 20, 30} {
			got, err := TerrainHeightMultiplier(tc, z)
			if err != nil || !near(got, row[i], 1e-12) {
				t.Errorf("M_z,cat TC%g z=%g: got %g (%v), want %g", tc, z, got, err, row[i])
			}
		}
	}
	interps := []struct {
		name      string
		tc, z     float64
		want, tol float64
	}{
		{"TC2 7.5 m, midway 0.91–1.00", 2, 7.5, 0.955, 1e-12},
		{"TC2.5 12.5 m, midway 0.92–0.97", 2.5, 12.5, 0.945, 1e-12},
		{"TC3 12 m, 0.83 + 0.4·0.06", 3, 12, 0.854, 1e-12},
		{"TC1 4 m, midway 0.97–1.01", 1, 4, 0.99, 1e-12},
		{"TC2 below 3 m holds 0.91", 2, 2, 0.91, 1e-12},
	}
	for _, c := range interps {
		got, err := TerrainHeightMultiplier(c.tc, c.z)
		if err != nil || !near(got, c.want, c.tol) {
			t.Errorf("%s: got %g (%v), want %g", c.name, got, err, c.want)
		}
	}
	for _, tc := range []float64{0, 1.5, 5} {
		if _, err := TerrainHeightMultiplier(tc, 5); err == nil {
			t.Errorf("TC%g: want an error", tc)
		}
	}
}

// TestHousingClass checks AS 4055 Table 2.1 speeds (ULS confirmed: S6; SLS
// from memory of AS 4055-2012 Table 2.1) and q_u = 0.6V² against the
// table's printed q_u (confirmed: S6) to 0.01 kPa.
func TestHousingClass(t *testing.T) {
	cases := []struct {
		class      string
		vu, vs, qu float64
	}{
		{"N1", 34, 26, 0.69}, {"N2", 40, 26, 0.96}, {"N3", 50, 32, 1.50},
		{"n4", 61, 39, 2.23}, {"N5", 74, 47, 3.29}, {"N6", 86, 55, 4.44},
		{"C1", 50, 32, 1.50}, {"C2", 61, 39, 2.23}, {"C3", 74, 47, 3.29}, {"C4", 86, 55, 4.44},
	}
	for _, c := range cases {
		hc, err := ParseHousingClass(c.class)
		if err != nil {
			t.Fatal(err)
		}
		s, err := hc.Speeds(4)
		if err != nil {
			t.Fatal(err)
		}
		if s.VDesULSMS != c.vu || s.VDesSLSMS != c.vs || !near(s.QULSKPa, c.qu, 0.005) {
			t.Errorf("%s: got V_u %g, V_s %g, q_u %.3f; want %g, %g, %.2f", c.class, s.VDesULSMS, s.VDesSLSMS, s.QULSKPa, c.vu, c.vs, c.qu)
		}
	}
	if _, err := ParseHousingClass("N7"); err == nil {
		t.Error("class N7: want an error")
	}
}

// TestSiteSpeeds checks V_sit = V_R·M_c·M_d·M_z,cat·M_s·M_t
// (AS/NZS 1170.2:2021 cl. 2.2) with V_R rounded before M_c
// (REFERENCE-VALUES §1.2: 57 × 1.05 = 59.85 for B2 at R = 500).
func TestSiteSpeeds(t *testing.T) {
	cases := []struct {
		name      string
		site      Site
		z         float64
		wantP     float64
		wantVu    float64
		wantVs    float64
		wantVDesU float64
		tolerance float64
	}{
		// B2, IL2, 50 yr: 1/500 (Table F2); V500 = 57, V25 = 39; TC2 at 10 m: 1.00.
		{"B2 TC2 10m", Site{Region: "B2", TerrainCategory: 2, ImportanceLevel: 2, DesignLifeYears: 50}, 10, 1.0 / 500, 57 * 1.05, 39 * 1.05, 57 * 1.05, 1e-9},
		// D, IL1, 50 yr cyclonic: 1/200; V200 = round(156 − 142·200^−0.1) = round(156 − 142·0.58870) = round(72.40) = 72.
		{"D IL1 cyclonic", Site{Region: "D", TerrainCategory: 2, ImportanceLevel: 1, DesignLifeYears: 50}, 10, 1.0 / 200, 72 * 1.05, 53 * 1.05, 72 * 1.05, 1e-9},
		// A2 TC3 at 5 m: 0.83; M_s = 0.9 set: V = 45·0.83·0.9 = 33.615; SLS 37·0.747 = 27.639.
		{"A2 TC3 shielded", Site{Region: "A2", TerrainCategory: 3, ImportanceLevel: 2, DesignLifeYears: 50, Ms: 0.9}, 5, 1.0 / 500, 33.615, 27.639, 33.615, 1e-9},
		// A1 TC4, IL1, 5 yr: 1/25; V25 = 37·0.75 = 27.75 < 30, floored at 30 m/s (cl. 2.3).
		{"A1 floor 30", Site{Region: "A1", TerrainCategory: 4, ImportanceLevel: 1, DesignLifeYears: 5}, 4, 1.0 / 25, 27.75, 27.75, 30, 1e-9},
	}
	for _, c := range cases {
		s, err := c.site.Speeds(c.z)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if !near(s.AnnualProbabilityULS, c.wantP, 1e-12) || !near(s.VSitULSMS, c.wantVu, c.tolerance) ||
			!near(s.VSitSLSMS, c.wantVs, c.tolerance) || !near(s.VDesULSMS, c.wantVDesU, c.tolerance) {
			t.Errorf("%s: got P %g, V_sit,u %g, V_sit,s %g, V_des,u %g; want %g, %g, %g, %g",
				c.name, s.AnnualProbabilityULS, s.VSitULSMS, s.VSitSLSMS, s.VDesULSMS, c.wantP, c.wantVu, c.wantVs, c.wantVDesU)
		}
		if want := 0.6 * s.VDesULSMS * s.VDesULSMS / 1000; !near(s.QULSKPa, want, 1e-12) {
			t.Errorf("%s: q_u got %g, want 0.6V² = %g", c.name, s.QULSKPa, want)
		}
	}
}

func TestSiteValidateReportsEveryField(t *testing.T) {
	err := Site{Region: "Q", TerrainCategory: 5, ImportanceLevel: 0, DesignLifeYears: 0, Md: -1}.Validate()
	if err == nil {
		t.Fatal("want an error")
	}
	for _, w := range []string{`"Q"`, "terrain category 5", "importance level 0", "design working life 0", "M_d -1"} {
		if !contains(err.Error(), w) {
			t.Errorf("error %q does not name %q", err, w)
		}
	}
}

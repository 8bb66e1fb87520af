package actions

import (
	"math"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/checks/wind"
)

// TestRoofLive checks Q = 0.12 + 1.8/A ≥ 0.25 kPa (AS/NZS 1170.1:2002
// Table 3.2, from memory; check values derived in REFERENCE-VALUES §4).
func TestRoofLive(t *testing.T) {
	cases := []struct {
		name string
		area float64
		want float64
	}{
		{"5 m²", 5, 0.48},
		{"10 m²", 10, 0.30},
		{"14.4 m²: 0.245 raised to the floor", 14.4, 0.25},
		{"72 m² frame", 72, 0.25},
		{"1 m²", 1, 1.92},
	}
	for _, c := range cases {
		got, err := RoofLiveKPa(c.area)
		if err != nil || math.Abs(got-c.want) > 1e-12 {
			t.Errorf("%s: got %g (%v), want %g", c.name, got, err, c.want)
		}
	}
	if _, err := RoofLiveKPa(0); err == nil {
		t.Error("area 0: want an error")
	}
	// Concentrated loads: 1.1 kN cladding (confirmed: S15), 1.4 kN
	// structural elements (from memory of AS/NZS 1170.1:2002 Table 3.2).
	if RoofPointCladdingKN != 1.1 || RoofPointStructuralKN != 1.4 {
		t.Errorf("point loads: got %g, %g; want 1.1, 1.4", RoofPointCladdingKN, RoofPointStructuralKN)
	}
}

func TestDeadDefaults(t *testing.T) {
	d, err := Dead{}.Resolved()
	if err != nil || d.RoofKPa != 0.10 || d.WallKPa != 0.10 {
		t.Errorf("defaults: got %+v (%v), want 0.10 / 0.10 (common practice, no source)", d, err)
	}
	d, _ = Dead{RoofKPa: 0.15}.Resolved()
	if d.RoofKPa != 0.15 || d.WallKPa != 0.10 {
		t.Errorf("set roof: got %+v", d)
	}
	if _, err := (Dead{WallKPa: -1}).Resolved(); err == nil {
		t.Error("negative wall dead load: want an error")
	}
}

func TestHoistValidate(t *testing.T) {
	if err := (Hoist{LoadKN: 10, PositionM: 6}).Validate(12); err != nil {
		t.Errorf("valid hoist: %v", err)
	}
	for _, h := range []Hoist{{LoadKN: 0, PositionM: 1}, {LoadKN: 5, PositionM: 13}, {LoadKN: 5, PositionM: -1}} {
		if err := h.Validate(12); err == nil {
			t.Errorf("%+v on a 12 m span: want an error", h)
		}
	}
}

func loads(t *testing.T) wind.Loads {
	t.Helper()
	sp, err := wind.N3.Speeds(4.5)
	if err != nil {
		t.Fatal(err)
	}
	l, err := wind.Derive(wind.Building{SpanM: 12, LengthM: 30, EaveHeightM: 4, PitchDeg: 10, BaySpacingM: 6}, wind.Enclosure{}, sp)
	if err != nil {
		t.Fatal(err)
	}
	return l
}

// TestCombinations checks the factors of AS/NZS 1170.0:2002 cl. 4.2.1 and
// 4.2.2 (REFERENCE-VALUES §3.2, §3.3, confirmed: S3) and the SLS wind factor
// q_s/q_u = (32/50)² for class N3 (AS 4055 speeds).
func TestCombinations(t *testing.T) {
	w := loads(t)
	combos := Combinations(w, true)
	byName := map[string]Combination{}
	for _, c := range combos {
		if _, dup := byName[c.Name]; dup {
			t.Errorf("duplicate combination name %q", c.Name)
		}
		byName[c.Name] = c
	}
	wc := w.Cases[0].Name
	wp := WindPrimary(wc)
	want := []struct {
		name string
		ls   LimitState
		f    map[PrimaryID]float64
	}{
		{"ULS 1.35G", ULS, map[PrimaryID]float64{G: 1.35}},
		{"ULS 1.2G+1.5Q", ULS, map[PrimaryID]float64{G: 1.2, Q: 1.5}},
		{"ULS 1.2G+1.5H", ULS, map[PrimaryID]float64{G: 1.2, H: 1.5}},
		{"ULS 1.2G+Wu " + wc, ULS, map[PrimaryID]float64{G: 1.2, wp: 1, Q: 0}},
		{"ULS 0.9G+Wu " + wc, ULS, map[PrimaryID]float64{G: 0.9, wp: 1, Q: 0}},
		{"SLS G+0.7Q", SLS, map[PrimaryID]float64{G: 1, Q: 0.7}},
		{"SLS G+H", SLS, map[PrimaryID]float64{G: 1, H: 1}},
		{"SLS G+Ws " + wc, SLS, map[PrimaryID]float64{G: 1, wp: 32.0 * 32 / (50 * 50)}},
	}
	for _, c := range want {
		got, ok := byName[c.name]
		if !ok {
			t.Errorf("combination %q missing", c.name)
			continue
		}
		if got.LimitState != c.ls {
			t.Errorf("%s: limit state %s, want %s", c.name, got.LimitState, c.ls)
		}
		for id, f := range c.f {
			if g := got.FactorOn(id); math.Abs(g-f) > 1e-12 {
				t.Errorf("%s: factor on %s got %g, want %g", c.name, id, g, f)
			}
		}
	}
	if n, wantN := len(combos), 3+2*len(w.Cases)+3+len(w.Cases); n != wantN {
		t.Errorf("count: got %d, want %d", n, wantN)
	}
	for _, c := range Combinations(w, false) {
		if c.FactorOn(H) != 0 || strings.HasSuffix(c.Name, "H") {
			t.Errorf("no hoist: combination %q uses H", c.Name)
		}
	}
	prims := Primaries(w, false)
	if len(prims) != 2+len(w.Cases) || prims[0] != G || prims[1] != Q {
		t.Errorf("primaries: got %v", prims)
	}
}

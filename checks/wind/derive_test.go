package wind

import (
	"math"
	"testing"
)

// exampleShed is an illustrative building (Ridgeline Sheds demo size):
// 12 m span, 30 m long, 4 m eaves, 5° pitch, 6 m bays.
var exampleShed = Building{SpanM: 12, LengthM: 30, EaveHeightM: 4, PitchDeg: 5, BaySpacingM: 6}

func exampleSite() Site {
	return Site{Region: "A2", TerrainCategory: 2.5, ImportanceLevel: 2, DesignLifeYears: 50}
}

// TestWorkedExample derives one building's pressures end to end by hand.
//
// Site: region A2, TC 2.5, IL2, 50 years.
//   - Annual probability 1/500 (AS/NZS 1170.0:2002 Table F2).
//   - V_500 = 67 − 41·500^−0.1 = 44.98 → 45 m/s; V_25 = 37.28 → 37 m/s
//     (AS/NZS 1170.2:2021 Table 3.1(A)); M_c = 1 (cl. 3.4).
//   - h = 4 + (6·tan 5°)/2 = 4 + 0.52494/2 = 4.26247 m (average roof height).
//   - M_z,cat(TC2.5, 4.26 m) = 0.87 (Table 4.1: 0.87 at 3 and 5 m).
//   - V_u = 45·0.87 = 39.15 m/s; q_u = 0.6·39.15² = 919.63 Pa = 0.91963 kPa.
//   - V_s = 37·0.87 = 32.19 m/s; q_s = 0.6·32.19² = 621.72 Pa = 0.62172 kPa.
//
// Crosswind (d = 12, b = 30): h/d = 0.3552 ≤ 0.5, so Table 5.3(A) first row;
// zones 0–0.5h and 0.5h–1h both −0.9/−0.4, so one zone 0–4.262 m; 1h–2h
// (4.262–8.525 m) −0.5/0.0, split at the ridge (6 m); 2h–3h (8.525–12.787,
// clipped to 12 m) −0.3/+0.1.
//
// Frame factors: roof K_a (72 m², Table 5.4) = 0.9 − 0.1·47/75 = 0.83733;
// K_a·K_c,e = 0.66987 < 0.8, so 0.8 (cl. 5.4.3). K_c,i = 1.0 for
// C_p,i = 0.0 and 0.8 for −0.2 (Table 5.5, |C_p,i| ≥ 0.2 effective).
//
// Case "crosswind, roof max suction, sealed Cpi +0.00":
//   - roof 0–4.262: C_fig = −0.9·0.8 = −0.72; p_u = −0.72·0.91963 = −0.66213 kPa;
//     p_s = −0.72·0.62172 = −0.44764 kPa.
//   - windward wall: 0.7·0.8 = 0.56; p_u = 0.51499 kPa.
//   - leeward wall: d/b = 0.4, α < 10°: −0.5 (Table 5.2(B)); −0.4·0.91963 = −0.36785 kPa.
//
// Case "crosswind, roof max suction, sealed Cpi -0.20": roof 0–4.262:
// −0.72 − (−0.2)(0.8) = −0.56; p_u = −0.51499 kPa.
//
// Purlins (K_a = K_c = 1): largest outward −0.9 − 0.0 = −0.9 → −0.82767 kPa;
// edge (K_l = 1.5): −1.35 → −1.24150 kPa; largest inward +0.2 (longitudinal,
// beyond 3h = 12.79 m < 30 m) − (−0.2) = 0.4 → 0.36785 kPa.
// Girts: largest outward side-wall −0.65 − 0.0 → −0.59776 kPa; edge
// K_l = 1.5 (SA1, h/12 ≤ 1): −0.975 → −0.89664 kPa; inward windward wall
// 0.7 + 0.2 = 0.9 → 0.82767 kPa.
func TestWorkedExample(t *testing.T) {
	h := exampleShed.ReferenceHeightM()
	if !near(h, 4.26247, 1e-5) {
		t.Fatalf("h: got %g, want 4.26247", h)
	}
	sp, err := exampleSite().Speeds(h)
	if err != nil {
		t.Fatal(err)
	}
	if sp.VRULSMS != 45 || sp.VRSLSMS != 37 || !near(sp.Mzcat, 0.87, 1e-12) || !near(sp.QULSKPa, 0.91963, 1e-5) || !near(sp.QSLSKPa, 0.62172, 1e-5) {
		t.Fatalf("speeds: got V_R %g/%g, M_z,cat %g, q %g/%g; want 45/37, 0.87, 0.91963/0.62172", sp.VRULSMS, sp.VRSLSMS, sp.Mzcat, sp.QULSKPa, sp.QSLSKPa)
	}
	l, err := Derive(exampleShed, Enclosure{}, sp)
	if err != nil {
		t.Fatal(err)
	}
	c := findCase(t, l, "crosswind, roof max suction, sealed Cpi +0.00")
	up := c.Surface(RoofUpwind)
	checks := []struct {
		name      string
		got, want float64
	}{
		{"roof K_a", up.Ka, 0.837333},
		{"roof K_a·K_c,e", up.KaKce, 0.8},
		{"zone 0 to", up.Zones[0].ToM, 4.26247},
		{"zone 0 C_p,e", up.Zones[0].Cpe, -0.9},
		{"zone 0 p_u", up.Zones[0].PressureULSKPa, -0.66213},
		{"zone 0 p_s", up.Zones[0].PressureSLSKPa, -0.44764},
		{"zone 1 C_p,e (to ridge)", up.Zones[1].Cpe, -0.5},
		{"zone 1 to", up.Zones[1].ToM, 6},
		{"downwind zone 1 from", c.Surface(RoofDownwind).Zones[1].FromM, 8.52494},
		{"downwind zone 1 C_p,e", c.Surface(RoofDownwind).Zones[1].Cpe, -0.3},
		{"windward wall p_u", c.Surface(WindwardWall).Zones[0].PressureULSKPa, 0.51499},
		{"leeward wall p_u", c.Surface(LeewardWall).Zones[0].PressureULSKPa, -0.36785},
		{"internal −0.2 roof p_u", findCase(t, l, "crosswind, roof max suction, sealed Cpi -0.20").Surface(RoofUpwind).Zones[0].PressureULSKPa, -0.51499},
		{"purlin outward", l.Purlins.GeneralOutward.ULSKPa, -0.82767},
		{"purlin edge outward", l.Purlins.EdgeOutward.ULSKPa, -1.24150},
		{"purlin inward", l.Purlins.GeneralInward.ULSKPa, 0.36785},
		{"purlin outward SLS", l.Purlins.GeneralOutward.SLSKPa, -0.9 * 0.62172},
		{"girt outward", l.Girts.GeneralOutward.ULSKPa, -0.59776},
		{"girt edge outward", l.Girts.EdgeOutward.ULSKPa, -0.89664},
		{"girt inward", l.Girts.GeneralInward.ULSKPa, 0.82767},
	}
	for _, ch := range checks {
		if !near(ch.got, ch.want, 2e-5) {
			t.Errorf("%s: got %.6g, want %.6g", ch.name, ch.got, ch.want)
		}
	}
	if n := len(l.Cases); n != 8 {
		t.Errorf("cases: got %d, want 8 (2 directions × 2 roof cases × 2 internal)", n)
	}
}

func findCase(t *testing.T, l Loads, name string) *WindCase {
	t.Helper()
	for i := range l.Cases {
		if l.Cases[i].Name == name {
			return &l.Cases[i]
		}
	}
	names := make([]string, len(l.Cases))
	for i, c := range l.Cases {
		names[i] = c.Name
	}
	t.Fatalf("case %q not found; have %q", name, names)
	return nil
}

// TestZonesCoverSurfaces: every surface's zones run from its FromM to its
// ToM without gaps or overlaps, over a range of shapes and pitches.
func TestZonesCoverSurfaces(t *testing.T) {
	sp, _ := N3.Speeds(5)
	opening := &DominantOpening{Wall: EndWall, AreaRatio: 2.5}
	for _, pitch := range []float64{0, 3, 9.9, 10, 12.5, 17, 22, 25, 30, 35} {
		for _, dims := range [][3]float64{{6, 6, 2.4}, {12, 30, 4}, {20, 60, 6}, {8, 8, 8}, {30, 12, 5}} {
			b := Building{SpanM: dims[0], LengthM: dims[1], EaveHeightM: dims[2], PitchDeg: pitch, BaySpacingM: dims[1] / 4}
			l, err := Derive(b, Enclosure{Opening: opening}, sp)
			if err != nil {
				t.Fatalf("%+v: %v", b, err)
			}
			for _, c := range l.Cases {
				for _, s := range c.Surfaces {
					checkCover(t, c.Name, s)
				}
			}
		}
	}
}

func checkCover(t *testing.T, name string, s Surface) {
	t.Helper()
	if len(s.Zones) == 0 {
		t.Errorf("%s %s: no zones", name, s.Kind)
		return
	}
	at := s.FromM
	for _, z := range s.Zones {
		if math.Abs(z.FromM-at) > 1e-9 || !(z.ToM > z.FromM) {
			t.Errorf("%s %s: zone %g–%g after %g (gap, overlap or empty)", name, s.Kind, z.FromM, z.ToM, at)
		}
		at = z.ToM
	}
	if math.Abs(at-s.ToM) > 1e-9 {
		t.Errorf("%s %s: zones end at %g, surface at %g", name, s.Kind, at, s.ToM)
	}
}

// TestDominantWindwardOpeningRaisesInternalPressure: Table 5.1(B) with the
// opening windward gives C_p,i > the sealed values of Table 5.1(A), and the
// roof net uplift grows.
func TestDominantWindwardOpeningRaisesInternalPressure(t *testing.T) {
	sp, _ := N3.Speeds(5)
	sealed, _ := Derive(exampleShed, Enclosure{}, sp)
	door, err := Derive(exampleShed, Enclosure{Opening: &DominantOpening{Wall: EndWall, AreaRatio: 3}}, sp)
	if err != nil {
		t.Fatal(err)
	}
	// Ratio 3, windward: 0.85·0.7 = 0.595 (Table 5.1(B)).
	c := findCase(t, door, "longitudinal, roof max suction, dominant opening windward (end wall, ratio 3) Cpi +0.59")
	if !near(c.Internal.Cpi, 0.595, 1e-12) {
		t.Errorf("C_p,i: got %g, want 0.595", c.Internal.Cpi)
	}
	for _, sc := range sealed.Cases {
		if sc.Internal.Cpi >= c.Internal.Cpi {
			t.Errorf("sealed case %s has C_p,i %g ≥ windward opening %g", sc.Name, sc.Internal.Cpi, c.Internal.Cpi)
		}
	}
	if !(door.Purlins.GeneralOutward.ULSKPa < sealed.Purlins.GeneralOutward.ULSKPa) {
		t.Errorf("purlin uplift: door %g kPa not more than sealed %g kPa", door.Purlins.GeneralOutward.ULSKPa, sealed.Purlins.GeneralOutward.ULSKPa)
	}
}

// TestUpliftLargestAtWindwardEdge: under Table 5.3(A) (pitch < 10°
// crosswind, and longitudinal wind), the roof's net uplift never grows with
// distance from the windward edge.
func TestUpliftLargestAtWindwardEdge(t *testing.T) {
	sp, _ := N3.Speeds(5)
	for _, b := range []Building{exampleShed, {SpanM: 9, LengthM: 9, EaveHeightM: 6, PitchDeg: 2}, {SpanM: 15, LengthM: 40, EaveHeightM: 4, PitchDeg: 22}} {
		l, err := Derive(b, Enclosure{}, sp)
		if err != nil {
			t.Fatal(err)
		}
		for _, c := range l.Cases {
			if c.Direction == Crosswind && b.PitchDeg >= 10 {
				continue // Table 5.3(B)/(C): the downwind slope can be worse
			}
			var zones []Zone
			for _, s := range c.Surfaces {
				if s.Kind.IsRoof() {
					zones = append(zones, s.Zones...)
				}
			}
			for i := 1; i < len(zones); i++ {
				if zones[i].PressureULSKPa < zones[i-1].PressureULSKPa-1e-12 {
					t.Errorf("%+v %s: zone at %g m (%g kPa) sucks more than zone at %g m (%g kPa)",
						b, c.Name, zones[i].FromM, zones[i].PressureULSKPa, zones[i-1].FromM, zones[i-1].PressureULSKPa)
				}
			}
			if last := zones[len(zones)-1]; c.Roof == RoofMaxSuction && !(zones[0].PressureULSKPa < last.PressureULSKPa) {
				t.Errorf("%+v %s: windward zone %g kPa is not the largest uplift (last zone %g kPa)", b, c.Name, zones[0].PressureULSKPa, last.PressureULSKPa)
			}
		}
	}
}

func TestDeriveRejectsBadInput(t *testing.T) {
	sp, _ := N3.Speeds(5)
	cases := []struct {
		name string
		b    Building
		e    Enclosure
		want string
	}{
		{"pitch 40", Building{SpanM: 12, LengthM: 30, EaveHeightM: 4, PitchDeg: 40}, Enclosure{}, "roof pitch 40"},
		{"negative span", Building{SpanM: -1, LengthM: 30, EaveHeightM: 4}, Enclosure{}, "span -1"},
		{"zero height", Building{SpanM: 12, LengthM: 30}, Enclosure{}, "eave height 0"},
		{"bad opening", exampleShed, Enclosure{Opening: &DominantOpening{Wall: EndWall}}, "area ratio"},
		{"bad permeability", exampleShed, Enclosure{Permeability: 7}, "permeability 7"},
	}
	for _, c := range cases {
		_, err := Derive(c.b, c.e, sp)
		if err == nil || !contains(err.Error(), c.want) {
			t.Errorf("%s: got %v, want an error naming %q", c.name, err, c.want)
		}
	}
}

func BenchmarkDerive(b *testing.B) {
	site := exampleSite()
	e := Enclosure{Opening: &DominantOpening{Wall: EndWall, AreaRatio: 3, AreaM2: 12}}
	for b.Loop() {
		sp, err := site.Speeds(exampleShed.ReferenceHeightM())
		if err != nil {
			b.Fatal(err)
		}
		if _, err := Derive(exampleShed, e, sp); err != nil {
			b.Fatal(err)
		}
	}
}

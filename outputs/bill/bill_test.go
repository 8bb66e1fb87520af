package bill

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"math"
	"strconv"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// handBuilding is one building whose counts are worked by hand here.
// Illustrative figures only (made-up sections and kg/m, stated as such).
//
// Span 12 m, length 24 m = 4 bays × 6 m, eaves 3.6 m, pitch 10°, pinned.
//   - frames: 4 bays + 1 = 5 (end frames included)
//   - rafters: 2 per frame × 5 = 10, each (12/2)/cos 10° = 6/0.98481 = 6.0926 m
//   - columns: 2 per frame × 5 = 10, each 3.6 m
//   - purlins: slope 6.0926 m at ≤ 1.2 m spacing: ceil(6.0926/1.2) = 6 spaces,
//     7 lines a slope, 14 lines; one 6 m piece per line per bay: 14 × 4 = 56
//   - girts: 3.6 m wall at ≤ 1.5 m: ceil(3.6/1.5) = 3 lines a side wall,
//     2 walls × 3 lines × 4 bays = 24 pieces of 6 m
//   - fly braces: 4 per frame × 5 frames = 20 pieces of 0.6 m
//   - footings: one pad per column, 10 pads. One braced bay: its 2 frames'
//     4 bases take 0.8 × 0.8 × 1.0 m = 0.64 m³ pads (2.56 m³) with 6 bolts
//     each (24); the other 6 take 0.6 × 0.6 × 0.8 m = 0.288 m³ (1.728 m³)
//     with 4 bolts each (24). Concrete 4.288 m³, 48 bolts in all.
//
// Masses at the made-up kg/m: purlins 56 × 6 × 3.5 = 1176; girts 24 × 6 × 3.5
// = 504; rafters 10 × 6.0926 × 7 = 426.48; columns 10 × 3.6 × 7 = 252; fly
// braces 20 × 0.6 × 1.5 = 18; roof bracing 4 × 8.5 × 1 = 34; wall bracing
// 4 × 7 × 1 = 28; end-wall columns 4 × 4.5 × 5 = 90; end-wall girts
// 12 × 6 × 3.5 = 252. Total 2780.48 kg over 12 × 24 = 288 m²: 9.6544 kg/m².
func handBuilding() dataset.Row {
	r := dataset.NewRow()
	r.CaseID, r.Status, r.WindClass, r.WindCondition, r.QULSKPa, r.QSLSKPa = "hand-1", "ok", "N2", "N2", 0.96, 0.4056
	r.SpanM, r.LengthM, r.Bays, r.BaySpacingM, r.EavesHeightM, r.RoofPitchDeg, r.Base = 12, 24, 4, 6, 3.6, 10, "pinned"
	r.Frames, r.FlyBracesPerFrame = 5, 4
	r.FootingCount, r.FootingWidthM, r.FootingDepthM, r.ConcreteM3, r.BoltSize, r.BoltsPerBase = 6, 0.6, 0.8, 6*0.288, "M16 4.6/S", 4
	r.BracedFootingCount, r.BracedFootingWidthM, r.BracedFootingDepthM, r.BracedConcreteM3 = 4, 0.8, 1.0, 4*0.64
	r.BracedBoltSize, r.BracedBoltsPerBase = "M20 4.6/S", 6
	set := func(role optimize.Role, des string, count int, each, kgPerM float64, bridging int) {
		for i, ro := range optimize.Roles {
			if ro == role {
				r.Members[i] = dataset.Member{Designation: des, Count: count, LengthEachM: each, BridgingRows: bridging,
					MassKg: float64(count) * each * kgPerM}
				r.SteelMassKg += r.Members[i].MassKg
			}
		}
	}
	set(optimize.RolePurlin, "Z150x1.5", 56, 6, 3.5, 1)
	set(optimize.RoleGirt, "Z150x1.5", 24, 6, 3.5, 1)
	set(optimize.RoleRafter, "C250x2.4", 10, 6/math.Cos(10*math.Pi/180), 7, 0)
	set(optimize.RoleColumn, "C250x2.4", 10, 3.6, 7, 0)
	set(optimize.RoleFlyBrace, "L50x50x3", 20, 0.6, 1.5, 0)
	set(optimize.RoleRoofBracing, "strap 30x1.0", 4, 8.5, 1, 0)
	set(optimize.RoleWallBracing, "strap 30x1.0", 4, 7, 1, 0)
	set(optimize.RoleEndWallColumn, "C150x1.9", 4, 4.5, 5, 0)
	set(optimize.RoleEndWallGirt, "Z150x1.5", 12, 6, 3.5, 0)
	r.MassPerFloorKgM2 = r.SteelMassKg / 288
	return r
}

func near(got, want, tol float64) bool { return math.Abs(got-want) <= tol }

func TestBillCountsByHand(t *testing.T) {
	r := handBuilding()
	b, err := New(&r)
	if err != nil {
		t.Fatal(err)
	}
	lines := map[string]Line{}
	for _, l := range b.Members {
		lines[l.Role] = l
	}
	for _, tc := range []struct {
		role   string
		count  int
		totalM float64 // count × length each, from the comment above
	}{
		{"purlin", 56, 336}, {"girt", 24, 144}, {"rafter", 10, 60.926}, {"column", 10, 36}, {"fly_brace", 20, 12},
		{"endwall_girt", 12, 72},
	} {
		l := lines[tc.role]
		if l.Count != tc.count || !near(l.TotalLengthM, tc.totalM, 1e-3) {
			t.Errorf("%s: got %d pieces, %.4f m; want %d, %.3f m", tc.role, l.Count, l.TotalLengthM, tc.count, tc.totalM)
		}
	}
	if _, ok := lines["knee_brace"]; ok {
		t.Error("knee_brace: the building has none, want no line")
	}
	if b.Frames != 5 || b.FlyBraces.PerFrame*b.FlyBraces.Frames != 20 || b.FlyBraces.Pieces != 20 {
		t.Errorf("frames %d, fly braces %+v: want 5 frames, 4 × 5 = 20", b.Frames, b.FlyBraces)
	}
	if len(b.Bridging) != 2 || b.Bridging[0].RowsTotal != 4 {
		t.Errorf("bridging %+v: want purlin and girt, 1 row × 4 spans = 4", b.Bridging)
	}
	if len(b.Bracing) != 2 || b.Bracing[0].Role != "roof_bracing" {
		t.Errorf("bracing %+v: want roof and wall bracing", b.Bracing)
	}
	if len(b.Footings) != 2 || b.Footings[0].Count+b.Footings[1].Count != 10 || b.BoltsTotal != 48 || !near(b.ConcreteM3, 4.288, 1e-9) {
		t.Errorf("footings %+v, %d bolts, %g m³: want 6 + 4 = 10 pads, 48 bolts, 4.288 m³", b.Footings, b.BoltsTotal, b.ConcreteM3)
	}
	if f := b.Footings[1]; f.Bases != "braced bays" || f.BoltsTotal != 24 || !near(f.ConcreteM3, 2.56, 1e-9) {
		t.Errorf("braced-bay pads %+v: want 24 bolts, 2.56 m³", f)
	}
	if !near(b.SteelMassKg, 2780.48, 1e-3) || !near(b.MassPerFloorKgM2, 9.6544, 1e-4) {
		t.Errorf("got %.3f kg, %.4f kg/m²; want 2780.48 kg, 9.6544 kg/m²", b.SteelMassKg, b.MassPerFloorKgM2)
	}
}

func TestBillMassEqualsDataset(t *testing.T) {
	dir := t.TempDir()
	if err := writeRows(dir, []dataset.Row{handBuilding()}); err != nil {
		t.Fatal(err)
	}
	d, err := dataset.Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer d.Close()
	m, err := Lookup(d, Query{SpanM: 11, LengthM: 20, EavesHeightM: 3.5, Wind: class("N2")}, Settings{})
	if err != nil {
		t.Fatal(err)
	}
	b, err := New(&m.Row)
	if err != nil {
		t.Fatal(err)
	}
	if b.SteelMassKg != m.Row.SteelMassKg {
		t.Errorf("bill %.6f kg, dataset steel_mass_kg %.6f kg: want equal", b.SteelMassKg, m.Row.SteelMassKg)
	}
	bad := m.Row.Clone()
	bad.SteelMassKg += 5
	if _, err := New(&bad); err == nil || !strings.Contains(err.Error(), "steel_mass_kg") {
		t.Errorf("inconsistent row: got %v, want a mass mismatch error", err)
	}
}

func handAnswer(t *testing.T) Answer {
	r := handBuilding()
	b, err := New(&r)
	if err != nil {
		t.Fatal(err)
	}
	q := Query{SpanM: 11, LengthM: 20, EavesHeightM: 3.5, Wind: class("N2")}
	return NewAnswer(&Match{Row: r, Dimensions: q.explain(&r, Settings{})}, b, "CAUTION: test")
}

func TestAnswerJSONShape(t *testing.T) {
	var buf bytes.Buffer
	if err := handAnswer(t).WriteJSON(&buf); err != nil {
		t.Fatal(err)
	}
	var got map[string]any
	if err := json.Unmarshal(buf.Bytes(), &got); err != nil {
		t.Fatal(err)
	}
	for _, k := range []string{"caution", "case_id", "rounding", "skipped_no_solution", "bill"} {
		if _, ok := got[k]; !ok {
			t.Errorf("JSON has no key %q", k)
		}
	}
	bill := got["bill"].(map[string]any)
	for _, k := range []string{"members", "fly_braces", "bridging", "bracing", "footings", "concrete_m3", "bolts_total", "steel_mass_kg", "mass_per_floor_kg_m2"} {
		if _, ok := bill[k]; !ok {
			t.Errorf("JSON bill has no key %q", k)
		}
	}
	if n := len(bill["members"].([]any)); n != 9 {
		t.Errorf("JSON members: got %d lines, want 9 (every role but knee_brace)", n)
	}
	span := got["rounding"].([]any)[0].(map[string]any)
	if span["asked"] != "11 m" || span["used"] != "12 m" {
		t.Errorf("rounding[0]: got %v, want span 11 m → 12 m", span)
	}
}

func TestAnswerCSVShape(t *testing.T) {
	var buf bytes.Buffer
	if err := handAnswer(t).WriteCSV(&buf); err != nil {
		t.Fatal(err)
	}
	recs, err := csv.NewReader(&buf).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if strings.Join(recs[0], ",") != strings.Join(CSVHeader, ",") {
		t.Errorf("header: got %v, want %v", recs[0], CSVHeader)
	}
	sections := map[string]int{}
	for _, r := range recs[1:] {
		sections[r[0]]++
		if v, _ := strconv.ParseFloat(r[6], 64); r[0] == "total" && r[1] == "steel" && !near(v, 2780.48, 1e-3) {
			t.Errorf("total mass: got %q, want 2780.48 (hand sum above)", r[6])
		}
	}
	// 8 rounding dimensions; 9 member lines; purlin and girt bridging.
	// Two pad types, each a footing and a bolt row; totals of concrete, bolts, steel.
	for s, n := range map[string]int{"rounding": 8, "member": 9, "fly_brace": 1, "bridging": 2, "footing": 2, "bolt": 2, "total": 3, "caution": 1} {
		if sections[s] != n {
			t.Errorf("section %s: got %d rows, want %d", s, sections[s], n)
		}
	}
}

func TestAnswerTextCarriesCaution(t *testing.T) {
	var buf bytes.Buffer
	if err := handAnswer(t).WriteText(&buf); err != nil {
		t.Fatal(err)
	}
	out := buf.String()
	for _, want := range []string{"hand-1", "11 m", "12 m", "Z150x1.5", "48 in all", "2780.5 kg", "CAUTION: test"} {
		if !strings.Contains(out, want) {
			t.Errorf("text output lacks %q:\n%s", want, out)
		}
	}
}

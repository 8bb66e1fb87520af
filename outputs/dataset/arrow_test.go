package dataset

import (
	"context"
	"fmt"
	"path/filepath"
	"testing"

	"github.com/apache/arrow-go/v18/arrow"
	"github.com/apache/arrow-go/v18/arrow/array"
	"github.com/apache/arrow-go/v18/arrow/memory"
	"github.com/apache/arrow-go/v18/parquet/file"
	"github.com/apache/arrow-go/v18/parquet/pqarrow"

	"github.com/spansweep/spansweep/optimize"
)

// expectedColumns spells out, independently of columns.go, what each column
// must hold for a result: the dataset contract as the README documents it.
func expectedColumns(r optimize.Result, meta Meta) map[string]any {
	c := r.Case
	e := map[string]any{
		"case_id": c.ID, "case_index": int64(c.Index), "wind_condition": c.WindCondition(),
		"wind_class": c.Wind.HousingClass, "region": c.Wind.Region, "terrain_category": c.Wind.TerrainCategory,
		"importance_level": int64(c.Wind.ImportanceLevel), "design_life_years": int64(c.Wind.DesignLifeYears),
		"span_m": c.SpanM, "length_m": c.LengthM, "bays": int64(c.Bays), "bay_spacing_m": c.BaySpacingM,
		"eaves_height_m": c.EavesHeightM, "roof_pitch_deg": c.RoofPitchDeg, "base": c.Base, "hoist_kn": c.HoistKN,
		"v_uls_ms": r.VUltimateMS, "v_sls_ms": r.VServiceMS, "q_uls_kpa": r.QUltimateKPa, "q_sls_kpa": r.QServiceKPa,
		"frames": int64(r.Frames), "knee_brace_column_m": r.KneeBraceColumnM, "knee_brace_rafter_m": r.KneeBraceRafterM,
		"fly_braces_per_frame": int64(r.FlyBracesPerFrame),
		"footing_width_m":      r.Footing.WidthM, "footing_depth_m": r.Footing.DepthM, "footing_count": int64(r.Footing.Count),
		"concrete_m3": r.Footing.ConcreteM3, "bolt_size": r.Footing.BoltSize, "bolts_per_base": int64(r.Footing.BoltsPerBase),
		"footing_check": r.Footing.Governing.Check, "footing_clause": r.Footing.Governing.Clause,
		"footing_utilisation":    r.Footing.Governing.Utilisation,
		"braced_footing_width_m": r.BracedFooting.WidthM, "braced_footing_depth_m": r.BracedFooting.DepthM,
		"braced_footing_count": int64(r.BracedFooting.Count), "braced_concrete_m3": r.BracedFooting.ConcreteM3,
		"braced_bolt_size": r.BracedFooting.BoltSize, "braced_bolts_per_base": int64(r.BracedFooting.BoltsPerBase),
		"braced_footing_check": r.BracedFooting.Governing.Check, "braced_footing_clause": r.BracedFooting.Governing.Clause,
		"braced_footing_utilisation": r.BracedFooting.Governing.Utilisation,
		"steel_mass_kg":              r.SteelMassKg, "mass_per_floor_kg_m2": r.MassPerFloorKgM2, "cost": r.Cost,
		"analyses": int64(r.Analyses), "status": r.Status.String(), "reason": r.Reason,
		"grid_sha256": meta.GridSHA256, "catalog_sha256": meta.CatalogSHA256, "program_version": meta.ProgramVersion,
	}
	for _, role := range optimize.Roles {
		m, p := r.Member(role), string(role)+"_"
		e[p+"designation"], e[p+"spacing_m"], e[p+"span_type"] = m.Designation, m.SpacingM, m.SpanType
		e[p+"lines"] = int64(m.Lines)
		e[p+"bridging_rows"], e[p+"count"], e[p+"length_each_m"] = int64(m.Bridging), int64(m.Count), m.LengthEachM
		e[p+"mass_kg"], e[p+"utilisation"], e[p+"check"] = m.MassKg, m.Governing.Utilisation, m.Governing.Check
		e[p+"standard"], e[p+"clause"], e[p+"limit_state"] = m.Governing.Standard, m.Governing.Clause, m.Governing.LimitState
		e[p+"combination"], e[p+"deflection_ratio"] = m.Governing.Combination, m.DeflectionRatio
	}
	return e
}

// readWithArrow reads a part file with Apache Arrow's Parquet reader, an
// implementation independent of parquet-go, into column name → values.
func readWithArrow(t *testing.T, path string) (map[string][]any, func(string) string) {
	t.Helper()
	rdr, err := file.OpenParquetFile(path, false)
	if err != nil {
		t.Fatalf("arrow open %s: %v", path, err)
	}
	defer rdr.Close()
	fr, err := pqarrow.NewFileReader(rdr, pqarrow.ArrowReadProperties{}, memory.DefaultAllocator)
	if err != nil {
		t.Fatal(err)
	}
	tbl, err := fr.ReadTable(context.Background())
	if err != nil {
		t.Fatalf("arrow read table: %v", err)
	}
	defer tbl.Release()
	cols := map[string][]any{}
	for i := range int(tbl.NumCols()) {
		name := tbl.Schema().Field(i).Name
		for _, chunk := range tbl.Column(i).Data().Chunks() {
			cols[name] = append(cols[name], arrowValues(t, name, chunk)...)
		}
	}
	md := rdr.MetaData()
	for g := range md.NumRowGroups() {
		sc := md.RowGroup(g).SortingColumns()
		caseIndex := tbl.Schema().FieldIndices("case_index")
		if len(sc) != 1 || len(caseIndex) != 1 || int(sc[0].ColumnIdx) != caseIndex[0] || sc[0].Descending {
			t.Errorf("row group %d: sorting columns %+v, want case_index ascending", g, sc)
		}
	}
	kv := md.KeyValueMetadata()
	return cols, func(k string) string {
		if v := kv.FindValue(k); v != nil {
			return *v
		}
		return ""
	}
}

func arrowValues(t *testing.T, name string, a arrow.Array) []any {
	out := make([]any, a.Len())
	for j := range a.Len() {
		switch x := a.(type) {
		case *array.String:
			out[j] = x.Value(j)
		case *array.Float64:
			out[j] = x.Value(j)
		case *array.Int64:
			out[j] = x.Value(j)
		case *array.Dictionary:
			out[j] = x.Dictionary().(*array.String).Value(x.GetValueIndex(j))
		default:
			t.Fatalf("column %s: unexpected Arrow type %s", name, a.DataType())
		}
	}
	return out
}

func TestArrowReadsWhatWasWritten(t *testing.T) {
	dir := t.TempDir()
	results := sampleResults(RowGroupRows + 17) // two row groups, the last partial
	if err := writeAll(dir, testMeta, results); err != nil {
		t.Fatal(err)
	}
	cols, kv := readWithArrow(t, filepath.Join(dir, "part-00001-of-00001-piece-00001.parquet"))
	for k, want := range map[string]string{KeyProgramVersion: "test-1", KeyGridSHA256: "aa11", KeyCatalogSHA256: "bb22",
		KeySchemaVersion: SchemaVersion, KeyShard: "1/1", KeyComplete: "true"} {
		if got := kv(k); got != want {
			t.Errorf("metadata %s: got %q, want %q", k, got, want)
		}
	}
	want0 := expectedColumns(results[0], testMeta)
	if len(cols) != len(want0) {
		t.Errorf("got %d columns, want %d", len(cols), len(want0))
	}
	for i, r := range results {
		for name, want := range expectedColumns(r, testMeta) {
			vals, ok := cols[name]
			if !ok {
				t.Fatalf("column %s missing", name)
			}
			if len(vals) != len(results) {
				t.Fatalf("column %s: got %d rows, want %d", name, len(vals), len(results))
			}
			if got := vals[i]; fmt.Sprint(got) != fmt.Sprint(want) || got != want {
				t.Fatalf("row %d column %s: got %v (%T), want %v (%T)", i, name, got, got, want, want)
			}
		}
	}
}

func TestColumnOrderIsDeclared(t *testing.T) {
	names := ColumnNames()
	// First and last columns as the README's schema lists them.
	if names[0] != "case_id" || names[len(names)-1] != "program_version" {
		t.Errorf("got first %q last %q, want case_id and program_version", names[0], names[len(names)-1])
	}
	// 20 case columns, 15 per role, 31 after the members.
	if want := 20 + 15*len(optimize.Roles) + 31; len(names) != want {
		t.Errorf("got %d columns, want %d", len(names), want)
	}
	leaves := Schema().Columns()
	for i, n := range names {
		if len(leaves[i]) != 1 || leaves[i][0] != n {
			t.Fatalf("schema leaf %d: got %v, want %s", i, leaves[i], n)
		}
	}
}

func TestEveryColumnDocumented(t *testing.T) {
	for _, c := range Columns() {
		if c.Doc == "" || c.Type == "" {
			t.Errorf("column %s: doc %q, type %q; want both", c.Name, c.Doc, c.Type)
		}
	}
}

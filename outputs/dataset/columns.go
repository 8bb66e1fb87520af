package dataset

import (
	"fmt"
	"reflect"

	"github.com/parquet-go/parquet-go"

	"github.com/spansweep/spansweep/optimize"
)

// SchemaVersion is stored in every part's metadata; a reader refuses parts of
// another version. Bump it whenever a column is added, removed, renamed or
// changes meaning.
const SchemaVersion = "1"

// column is one flat column: its name (with its unit) and where its value
// lives in a Row. ref returns a *string, *float64 or *int; the column's
// Parquet type follows from it.
type column struct {
	name string
	ref  func(*Row) any
}

// memberField is one per-role column, without its role prefix.
type memberField struct {
	name string
	ref  func(*Member) any
}

// memberFields lists the columns every role carries, in file order.
var memberFields = []memberField{
	{"designation", func(m *Member) any { return &m.Designation }},
	{"spacing_m", func(m *Member) any { return &m.SpacingM }},
	{"span_type", func(m *Member) any { return &m.SpanType }},
	{"bridging_rows", func(m *Member) any { return &m.BridgingRows }},
	{"lines", func(m *Member) any { return &m.Lines }},
	{"count", func(m *Member) any { return &m.Count }},
	{"length_each_m", func(m *Member) any { return &m.LengthEachM }},
	{"mass_kg", func(m *Member) any { return &m.MassKg }},
	{"utilisation", func(m *Member) any { return &m.Utilisation }},
	{"check", func(m *Member) any { return &m.Check }},
	{"standard", func(m *Member) any { return &m.Standard }},
	{"clause", func(m *Member) any { return &m.Clause }},
	{"limit_state", func(m *Member) any { return &m.LimitState }},
	{"combination", func(m *Member) any { return &m.Combination }},
	{"deflection_ratio", func(m *Member) any { return &m.DeflectionRatio }},
}

// caseColumns come before the member columns.
var caseColumns = []column{
	{"case_id", func(r *Row) any { return &r.CaseID }},
	{"case_index", func(r *Row) any { return &r.CaseIndex }},
	{"wind_condition", func(r *Row) any { return &r.WindCondition }},
	{"wind_class", func(r *Row) any { return &r.WindClass }},
	{"region", func(r *Row) any { return &r.Region }},
	{"terrain_category", func(r *Row) any { return &r.TerrainCategory }},
	{"importance_level", func(r *Row) any { return &r.ImportanceLevel }},
	{"design_life_years", func(r *Row) any { return &r.DesignLifeYears }},
	{"span_m", func(r *Row) any { return &r.SpanM }},
	{"length_m", func(r *Row) any { return &r.LengthM }},
	{"bays", func(r *Row) any { return &r.Bays }},
	{"bay_spacing_m", func(r *Row) any { return &r.BaySpacingM }},
	{"eaves_height_m", func(r *Row) any { return &r.EavesHeightM }},
	{"roof_pitch_deg", func(r *Row) any { return &r.RoofPitchDeg }},
	{"base", func(r *Row) any { return &r.Base }},
	{"hoist_kn", func(r *Row) any { return &r.HoistKN }},
	{"v_uls_ms", func(r *Row) any { return &r.VULSMS }},
	{"v_sls_ms", func(r *Row) any { return &r.VSLSMS }},
	{"q_uls_kpa", func(r *Row) any { return &r.QULSKPa }},
	{"q_sls_kpa", func(r *Row) any { return &r.QSLSKPa }},
}

// tailColumns come after the member columns.
var tailColumns = []column{
	{"frames", func(r *Row) any { return &r.Frames }},
	{"knee_brace_column_m", func(r *Row) any { return &r.KneeBraceColumnM }},
	{"knee_brace_rafter_m", func(r *Row) any { return &r.KneeBraceRafterM }},
	{"fly_braces_per_frame", func(r *Row) any { return &r.FlyBracesPerFrame }},
	{"footing_width_m", func(r *Row) any { return &r.FootingWidthM }},
	{"footing_depth_m", func(r *Row) any { return &r.FootingDepthM }},
	{"footing_count", func(r *Row) any { return &r.FootingCount }},
	{"concrete_m3", func(r *Row) any { return &r.ConcreteM3 }},
	{"bolt_size", func(r *Row) any { return &r.BoltSize }},
	{"bolts_per_base", func(r *Row) any { return &r.BoltsPerBase }},
	{"footing_check", func(r *Row) any { return &r.FootingCheck }},
	{"footing_clause", func(r *Row) any { return &r.FootingClause }},
	{"footing_utilisation", func(r *Row) any { return &r.FootingUtilisation }},
	{"braced_footing_width_m", func(r *Row) any { return &r.BracedFootingWidthM }},
	{"braced_footing_depth_m", func(r *Row) any { return &r.BracedFootingDepthM }},
	{"braced_footing_count", func(r *Row) any { return &r.BracedFootingCount }},
	{"braced_concrete_m3", func(r *Row) any { return &r.BracedConcreteM3 }},
	{"braced_bolt_size", func(r *Row) any { return &r.BracedBoltSize }},
	{"braced_bolts_per_base", func(r *Row) any { return &r.BracedBoltsPerBase }},
	{"braced_footing_check", func(r *Row) any { return &r.BracedFootingCheck }},
	{"braced_footing_clause", func(r *Row) any { return &r.BracedFootingClause }},
	{"braced_footing_utilisation", func(r *Row) any { return &r.BracedFootingUtilisation }},
	{"steel_mass_kg", func(r *Row) any { return &r.SteelMassKg }},
	{"mass_per_floor_kg_m2", func(r *Row) any { return &r.MassPerFloorKgM2 }},
	{"cost", func(r *Row) any { return &r.Cost }},
	{"analyses", func(r *Row) any { return &r.Analyses }},
	{"status", func(r *Row) any { return &r.Status }},
	{"reason", func(r *Row) any { return &r.Reason }},
	{"grid_sha256", func(r *Row) any { return &r.GridSHA256 }},
	{"catalog_sha256", func(r *Row) any { return &r.CatalogSHA256 }},
	{"program_version", func(r *Row) any { return &r.ProgramVersion }},
}

// columns is the whole table in file order: the case, then each role's
// fields in optimize.Roles order, then the frame, footing, totals and
// provenance.
var columns = buildColumns()

// columnByName maps a column name to its index in columns.
var columnByName = func() map[string]int {
	m := make(map[string]int, len(columns))
	for i, c := range columns {
		m[c.name] = i
	}
	return m
}()

func buildColumns() []column {
	cols := append([]column(nil), caseColumns...)
	for i, role := range optimize.Roles {
		for _, f := range memberFields {
			cols = append(cols, column{
				name: string(role) + "_" + f.name,
				ref:  func(r *Row) any { return f.ref(&r.Members[i]) },
			})
		}
	}
	return append(cols, tailColumns...)
}

// ColumnNames returns every column name in file order.
func ColumnNames() []string {
	names := make([]string, len(columns))
	for i, c := range columns {
		names[i] = c.name
	}
	return names
}

// Schema returns the Parquet schema of a part file: every column required,
// strings dictionary-encoded UTF-8, reals DOUBLE, counts INT64, in the order
// of ColumnNames.
func Schema() *parquet.Schema { return schema }

var schema = buildSchema()

// buildSchema derives the schema from the column table through a generated
// Go struct, which keeps the declared column order (a parquet.Group would
// sort its fields by name).
func buildSchema() *parquet.Schema {
	probe := NewRow()
	fields := make([]reflect.StructField, len(columns))
	for i, c := range columns {
		tag := c.name
		var t reflect.Type
		switch c.ref(&probe).(type) {
		case *string:
			t, tag = reflect.TypeFor[string](), tag+",dict"
		case *float64:
			t = reflect.TypeFor[float64]()
		case *int:
			t = reflect.TypeFor[int64]()
		default:
			panic(fmt.Sprintf("dataset: column %s has an unsupported Go type", c.name))
		}
		fields[i] = reflect.StructField{
			Name: fmt.Sprintf("C%03d", i),
			Type: t,
			Tag:  reflect.StructTag(`parquet:"` + tag + `"`),
		}
	}
	return parquet.SchemaOf(reflect.New(reflect.StructOf(fields)).Interface())
}

// encode appends r's values to dst in column order.
func encode(dst parquet.Row, r *Row) parquet.Row {
	if len(r.Members) != len(optimize.Roles) {
		panic(fmt.Sprintf("dataset: row %s has %d member groups, want %d (use NewRow)", r.CaseID, len(r.Members), len(optimize.Roles)))
	}
	for i, c := range columns {
		var v parquet.Value
		switch p := c.ref(r).(type) {
		case *string:
			v = parquet.ByteArrayValue([]byte(*p))
		case *float64:
			v = parquet.DoubleValue(*p)
		case *int:
			v = parquet.Int64Value(int64(*p))
		}
		dst = append(dst, v.Level(0, 0, i))
	}
	return dst
}

// decode sets r from a row read from a file whose leaf column k holds our
// column fileToOurs[k] (-1: a column this version does not know).
func decode(r *Row, values parquet.Row, fileToOurs []int) {
	if len(r.Members) != len(optimize.Roles) {
		r.Members = make([]Member, len(optimize.Roles))
	}
	for _, v := range values {
		k := v.Column()
		if k < 0 || k >= len(fileToOurs) || fileToOurs[k] < 0 {
			continue
		}
		setValue(r, fileToOurs[k], v)
	}
}

// setValue sets column c of r from v, copying byte arrays.
func setValue(r *Row, c int, v parquet.Value) {
	switch p := columns[c].ref(r).(type) {
	case *string:
		*p = string(v.ByteArray())
	case *float64:
		*p = v.Double()
	case *int:
		*p = int(v.Int64())
	}
}

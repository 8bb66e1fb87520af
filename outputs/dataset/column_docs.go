package dataset

import (
	"strings"

	"github.com/spansweep/spansweep/optimize"
)

// ColumnInfo describes one column for the README's schema table.
type ColumnInfo struct {
	Name string
	Type string // Parquet physical type: "BYTE_ARRAY (UTF8)", "DOUBLE" or "INT64"
	Doc  string
}

// columnDocs documents the case and tail columns; memberDocs the per-role
// fields (prefixed by the role in the file).
var columnDocs = map[string]string{
	"case_id":                    "stable id of the case, from its canonical inputs",
	"case_index":                 "position in the grid's enumeration, from 0; rows are sorted by it",
	"wind_condition":             "wind condition key used by the span tables, e.g. N3",
	"wind_class":                 "AS 4055 housing wind class, or empty for a region site",
	"region":                     "AS/NZS 1170.2 wind region, or empty for a housing class",
	"terrain_category":           "AS/NZS 1170.2 terrain category (0 for a housing class)",
	"importance_level":           "AS/NZS 1170.0 importance level (0 for a housing class)",
	"design_life_years":          "design working life, years (0 for a housing class)",
	"span_m":                     "span between column centrelines, m",
	"length_m":                   "building length = bays × bay_spacing_m, m",
	"bays":                       "number of bays",
	"bay_spacing_m":              "frame spacing, m",
	"eaves_height_m":             "eaves height, m",
	"roof_pitch_deg":             "roof pitch, degrees",
	"base":                       "column base fixity: pinned or fixed",
	"hoist_kn":                   "hoist point load on a rafter, kN (0 = none)",
	"v_uls_ms":                   "ultimate design gust wind speed at the building, m/s",
	"v_sls_ms":                   "serviceability design gust wind speed, m/s",
	"q_uls_kpa":                  "ultimate design wind pressure 0.6·V², kPa",
	"q_sls_kpa":                  "serviceability design wind pressure, kPa",
	"frames":                     "portal frames, end frames included",
	"knee_brace_column_m":        "knee brace position down the column from the eaves, m (0 = none)",
	"knee_brace_rafter_m":        "knee brace position along the rafter from the eaves, m (0 = none)",
	"fly_braces_per_frame":       "fly braces per portal frame",
	"footing_width_m":            "square pad side at the other column bases (all of them when none is braced apart), m",
	"footing_depth_m":            "pad footing depth, m",
	"footing_count":              "pads of this type in the building",
	"concrete_m3":                "concrete in all pads of this type, m³",
	"bolt_size":                  "holding-down bolt size and grade",
	"bolts_per_base":             "holding-down bolts per column base",
	"footing_check":              "check that governs the footing",
	"footing_clause":             "standard clause of the footing check",
	"footing_utilisation":        "footing demand over capacity",
	"braced_footing_width_m":     "square pad side at the braced bays' column bases, m (0 = none of its own)",
	"braced_footing_depth_m":     "braced-bay pad depth, m",
	"braced_footing_count":       "braced-bay pads in the building",
	"braced_concrete_m3":         "concrete in all braced-bay pads, m³ (building total: concrete_m3 + this)",
	"braced_bolt_size":           "holding-down bolt size and grade at braced-bay bases",
	"braced_bolts_per_base":      "holding-down bolts per braced-bay base",
	"braced_footing_check":       "check that governs the braced-bay footing",
	"braced_footing_clause":      "standard clause of the braced-bay footing check",
	"braced_footing_utilisation": "braced-bay footing demand over capacity",
	"steel_mass_kg":              "steel mass of every member group, kg",
	"mass_per_floor_kg_m2":       "steel mass over span × length, kg/m²",
	"cost":                       "cost from the grid's price table (0 without one)",
	"analyses":                   "frame analyses the search ran (a frame the memo replays counts those of the search replayed)",
	"status":                     "ok or no_solution",
	"reason":                     "why there is no solution (empty when ok)",
	"grid_sha256":                "SHA-256 of the grid file's content",
	"catalog_sha256":             "SHA-256 of the section catalogue's content",
	"program_version":            "spansweep version that wrote the row",
}

var memberDocs = map[string]string{
	"designation":      "section designation, e.g. Z200x1.9 (empty if the building has none)",
	"spacing_m":        "centre-to-centre spacing, m (purlins and girts; 0 otherwise)",
	"span_type":        "simple, continuous or lapped (purlins and girts)",
	"bridging_rows":    "bridging rows per span (purlins and girts)",
	"lines":            "runs along the building, both slopes or walls (purlins and girts)",
	"count":            "pieces in the building",
	"length_each_m":    "cut length of one piece, m",
	"mass_kg":          "mass of all pieces, laps included, kg",
	"utilisation":      "governing demand over capacity",
	"check":            "governing check",
	"standard":         "standard of the governing check",
	"clause":           "clause of the governing check",
	"limit_state":      "ULS or SLS",
	"combination":      "load combination of the governing check",
	"deflection_ratio": "governing SLS deflection over its limit (0 where none applies)",
}

// Columns describes every column in file order.
func Columns() []ColumnInfo {
	probe := NewRow()
	out := make([]ColumnInfo, len(columns))
	for i, c := range columns {
		info := ColumnInfo{Name: c.name, Doc: columnDocs[c.name]}
		for _, r := range optimize.Roles {
			if f, ok := strings.CutPrefix(c.name, string(r)+"_"); ok && memberDocs[f] != "" {
				info.Doc = string(r) + ": " + memberDocs[f]
			}
		}
		switch c.ref(&probe).(type) {
		case *string:
			info.Type = "BYTE_ARRAY (UTF8)"
		case *float64:
			info.Type = "DOUBLE"
		case *int:
			info.Type = "INT64"
		}
		out[i] = info
	}
	return out
}

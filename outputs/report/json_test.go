package report

import (
	"encoding/json"
	"math"
	"strings"
	"testing"
)

// unitSuffixes end every key of a quantity with units (DESIGN.md §3).
var unitSuffixes = []string{"_m", "_m2", "_m3", "_mm", "_kn", "_knm", "_kpa", "_ms", "_kg", "_kg_m2", "_deg", "_years", "_currency", "_in_unit"}

// dimensionless are the keys of pure numbers: counts, coefficients,
// multipliers, factors, probabilities and utilisations.
var dimensionless = map[string]bool{
	"bays": true, "lines": true, "count": true, "frames": true, "fly_braces_per_frame": true, "bridging_rows": true,
	"bolts_per_base": true, "frame_analyses": true, "candidates_searched": true, "importance_level": true,
	"terrain_category": true, "utilisation": true, "deflection_over_limit": true, "buckling_factor": true, "factor": true,
	"ka": true, "ka_kc_e": true, "cpe": true, "cpi": true, "kc_i": true, "cfig_frame": true, "cfig_member": true, "edge_kl": true,
	"m_c": true, "m_d": true, "m_z_cat": true, "m_s": true, "m_t": true, "ms": true, "mt": true, "md": true,
	"annual_probability_uls": true, "annual_probability_sls": true,
}

// TestJSONKeysCarryUnits walks the JSON of the hand-built result: every
// numeric key names a unit or is a known pure number. The options object
// is grids.Options' own JSON, checked by package grids, and is skipped.
func TestJSONKeysCarryUnits(t *testing.T) {
	data, err := json.Marshal(NewJSON(fixtureResult(t)))
	if err != nil {
		t.Fatal(err)
	}
	var doc map[string]any
	if err := json.Unmarshal(data, &doc); err != nil {
		t.Fatal(err)
	}
	var walk func(path string, v any)
	walk = func(path string, v any) {
		switch x := v.(type) {
		case map[string]any:
			for k, e := range x {
				if k == "options" {
					continue
				}
				if _, isNum := e.(float64); isNum && !hasUnit(k) {
					t.Errorf("%s.%s: numeric key without a unit", path, k)
				}
				if arr, ok := e.([]any); ok && len(arr) > 0 {
					if _, isNum := arr[0].(float64); isNum && !hasUnit(k) {
						t.Errorf("%s.%s: numeric array without a unit", path, k)
					}
				}
				walk(path+"."+k, e)
			}
		case []any:
			for _, e := range x {
				walk(path+"[]", e)
			}
		}
	}
	walk("", doc)
}

func hasUnit(key string) bool {
	if dimensionless[key] {
		return true
	}
	for _, s := range unitSuffixes {
		if strings.HasSuffix(key, s) {
			return true
		}
	}
	return false
}

// TestJSONCarriesTheResult checks the JSON against the result it came from.
func TestJSONCarriesTheResult(t *testing.T) {
	res := fixtureResult(t)
	var got struct {
		Caution     string  `json:"caution"`
		Status      string  `json:"status"`
		SteelMassKg float64 `json:"steel_mass_kg"`
		Case        struct {
			SpanM   float64 `json:"span_m"`
			Options struct {
				Cladding struct {
					RoofDeadKPa float64 `json:"roof_dead_kpa"`
				} `json:"cladding"`
			} `json:"options"`
		} `json:"case"`
		Members []struct {
			Role   string  `json:"role"`
			MassKg float64 `json:"mass_kg"`
		} `json:"members"`
		Calculation struct {
			Wind struct {
				Cases []struct {
					Surfaces []struct {
						Zones []struct {
							PressureULSKPa float64 `json:"pressure_uls_kpa"`
						} `json:"zones"`
					} `json:"surfaces"`
				} `json:"cases"`
			} `json:"wind"`
			Groups []struct {
				Checks []struct{} `json:"checks"`
			} `json:"groups"`
			Frame struct {
				Diagrams []struct {
					MomentKNm []float64 `json:"moment_knm"`
				} `json:"diagrams"`
			} `json:"frame"`
		} `json:"calculation"`
	}
	data, err := json.Marshal(NewJSON(res))
	if err != nil {
		t.Fatal(err)
	}
	if err := json.Unmarshal(data, &got); err != nil {
		t.Fatal(err)
	}
	var sum float64
	for _, m := range got.Members {
		sum += m.MassKg
	}
	calc := res.Calculation
	for _, tc := range []struct {
		what      string
		got, want float64
	}{
		{"steel_mass_kg", got.SteelMassKg, res.SteelMassKg},
		{"sum of members' mass_kg", sum, res.SteelMassKg},
		{"members", float64(len(got.Members)), float64(len(res.Members))},
		{"span_m", got.Case.SpanM, 12},
		{"roof_dead_kpa", got.Case.Options.Cladding.RoofDeadKPa, res.Case.Options.Cladding.RoofDeadKPa},
		{"zone pressure", got.Calculation.Wind.Cases[0].Surfaces[1].Zones[0].PressureULSKPa, calc.Wind.Cases[0].Surfaces[1].Zones[0].PressureULSKPa},
		{"purlin checks", float64(len(got.Calculation.Groups[0].Checks)), float64(len(calc.Groups[0].Checks))},
		{"rafter moment at the knee", got.Calculation.Frame.Diagrams[1].MomentKNm[0], -18.4},
	} {
		if math.Abs(tc.got-tc.want) > 1e-9*math.Max(1, math.Abs(tc.want)) {
			t.Errorf("%s: got %g, want %g", tc.what, tc.got, tc.want)
		}
	}
	if got.Caution != Caution || got.Status != "ok" {
		t.Errorf("caution %q, status %q", got.Caution, got.Status)
	}
}

package grids

import (
	"fmt"
	"strings"
)

// Wind is one wind condition: either an AS 4055 housing class, or an
// AS/NZS 1170.2 site (region, terrain category, importance level, design
// working life and site multipliers). Exactly one form is set.
type Wind struct {
	HousingClass string `json:"housing_class,omitempty"` // "N1" … "N6", "C1" … "C4"; empty for a site condition

	Region          string  `json:"region,omitempty"`            // AS/NZS 1170.2:2021 region, e.g. "B2"
	TerrainCategory float64 `json:"terrain_category,omitempty"`  // 1, 2, 2.5, 3 or 4
	ImportanceLevel int     `json:"importance_level,omitempty"`  // 1 … 4 (AS/NZS 1170.0 Table 3.1)
	DesignLifeYears int     `json:"design_life_years,omitempty"` // 5, 25, 50 or 100 (AS/NZS 1170.0 Table F2 rows)
	Ms              float64 `json:"ms,omitempty"`                // shielding multiplier M_s; 1 = no shielding
	Mt              float64 `json:"mt,omitempty"`                // topographic multiplier M_t; 1 = flat ground
	Md              float64 `json:"md,omitempty"`                // direction multiplier M_d; 0 = the region's value per AS/NZS 1170.2:2021 Cl 3.3
}

// IsHousingClass reports whether the condition is given by a housing class.
func (w Wind) IsHousingClass() bool { return w.HousingClass != "" }

// Key names the condition for tables and file names: "N3", or
// "B2 TC2.5 IL2 50y", followed by any site multiplier that is not 1 (or, for
// M_d, not unset), e.g. "A2 TC3 IL2 50y Ms0.85".
func (w Wind) Key() string {
	if w.IsHousingClass() {
		return w.HousingClass
	}
	s := fmt.Sprintf("%s TC%s IL%d %dy", w.Region, fmtNum(w.TerrainCategory), w.ImportanceLevel, w.DesignLifeYears)
	if w.Ms != 1 {
		s += " Ms" + fmtNum(w.Ms)
	}
	if w.Mt != 1 {
		s += " Mt" + fmtNum(w.Mt)
	}
	if w.Md != 0 {
		s += " Md" + fmtNum(w.Md)
	}
	return s
}

// Housing classes of AS 4055:2021 Table 2.1, and the regions of
// AS/NZS 1170.2:2021 Section 3.
var (
	housingClasses   = []string{"N1", "N2", "N3", "N4", "N5", "N6", "C1", "C2", "C3", "C4"}
	windRegions      = []string{"A0", "A1", "A2", "A3", "A4", "A5", "B1", "B2", "C", "D", "NZ1", "NZ2", "NZ3", "NZ4"}
	terrainCats      = []float64{1, 2, 2.5, 3, 4} // AS/NZS 1170.2:2021 Cl 4.2.1
	importanceLevels = []int{1, 2, 3, 4}          // AS/NZS 1170.0:2002 Table 3.1
	designLives      = []int{5, 25, 50, 100}      // AS/NZS 1170.0:2002 Table F2 rows
)

// readWind reads the [wind] table: housing classes and [[wind.site]] tables.
func (r *reader) readWind(doc map[string]any) []Wind {
	w, ok := r.table(doc, "", "wind")
	if !ok {
		r.missing("wind.housing_classes")
		return nil
	}
	var out []Wind
	for _, c := range r.strs(w, "wind", "housing_classes", nil, housingClasses) {
		out = append(out, Wind{HousingClass: c})
	}
	for i, s := range r.siteTables(w) {
		path := fmt.Sprintf("wind.site[%d]", i)
		r.checkKeys(s, path)
		out = r.appendUnique(out, r.readSite(s, path), path)
	}
	if w["housing_classes"] == nil && w["site"] == nil {
		r.add("wind", nil, "no wind condition; give housing_classes or at least one [[wind.site]] table")
	}
	return out
}

// siteTables accepts [[wind.site]] tables or an inline array of tables.
func (r *reader) siteTables(w map[string]any) []map[string]any {
	switch x := w["site"].(type) {
	case nil:
		return nil
	case []map[string]any:
		return x
	case []any:
		var out []map[string]any
		for _, e := range x {
			if t, ok := e.(map[string]any); ok {
				out = append(out, t)
			} else {
				r.add("wind.site", e, "each site must be a table: [[wind.site]]")
			}
		}
		return out
	default:
		r.add("wind.site", x, "must be [[wind.site]] tables")
		return nil
	}
}

func (r *reader) readSite(s map[string]any, path string) Wind {
	w := Wind{
		Region:          r.str(s, path, "region", "", true, windRegions),
		TerrainCategory: r.number(s, path, "terrain_category", 0, true),
		ImportanceLevel: r.integer(s, path, "importance_level", 2, importanceLevels),
		DesignLifeYears: r.integer(s, path, "design_life_years", 50, designLives),
		Ms:              r.number(s, path, "ms", 1, false),
		Mt:              r.number(s, path, "mt", 1, false),
		Md:              r.number(s, path, "md", 0, false),
	}
	if _, ok := s["terrain_category"]; ok && !containsFloat(terrainCats, w.TerrainCategory) {
		r.add(path+".terrain_category", s["terrain_category"], "allowed "+specFor(path+".terrain_category").allowed())
	}
	// AS/NZS 1170.0:2002 Table F2: IL4 with a 100-year life calls for a risk analysis.
	if w.ImportanceLevel == 4 && w.DesignLifeYears == 100 {
		r.add(path+".design_life_years", s["design_life_years"], "importance level 4 with 100 years is not tabulated in AS/NZS 1170.0 Table F2; allowed 5, 25, 50")
	}
	return w
}

// appendUnique appends w unless the same condition is already listed.
func (r *reader) appendUnique(list []Wind, w Wind, path string) []Wind {
	for _, x := range list {
		if x == w && w.Region != "" {
			r.add(path, nil, "duplicate wind condition "+w.Key()+"; give each condition once")
			return list
		}
	}
	return append(list, w)
}

func containsFloat(list []float64, v float64) bool {
	for _, x := range list {
		if x == v {
			return true
		}
	}
	return false
}

// windPrefix is the wind key as it appears in a case id: no spaces.
func windPrefix(w Wind) string { return strings.ReplaceAll(w.Key(), " ", "-") }

package report

import (
	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/optimize"
)

// JSON shape of the recorded working (optimize.Calculation).
type (
	// CalculationJSON is the case's actions, checks and frame analysis.
	CalculationJSON struct {
		Wind         WindJSON          `json:"wind"`
		DeadRoofKPa  float64           `json:"dead_roof_kpa"`
		DeadWallKPa  float64           `json:"dead_wall_kpa"`
		RoofLiveKPa  float64           `json:"roof_live_kpa"`
		HoistKN      float64           `json:"hoist_kn"`
		HoistAtM     float64           `json:"hoist_position_m"`
		Combinations []CombinationJSON `json:"combinations"`
		Groups       []GroupJSON       `json:"groups"`
		Frame        *FrameJSON        `json:"frame,omitempty"`
	}

	// CombinationJSON is one named AS/NZS 1170.0 combination.
	CombinationJSON struct {
		Name       string       `json:"name"`
		LimitState string       `json:"limit_state"`
		Factors    []FactorJSON `json:"factors"`
	}

	// FactorJSON is one primary case and its load factor.
	FactorJSON struct {
		Case   string  `json:"case"`
		Factor float64 `json:"factor"`
	}

	// GroupJSON is one member group's checks.
	GroupJSON struct {
		Role        string      `json:"role"`
		Designation string      `json:"designation"`
		Notes       []string    `json:"notes"`
		Searched    int         `json:"candidates_searched"`
		Checks      []CheckJSON `json:"checks"`
	}

	// CheckJSON is one check. Demand and capacity are in the unit named by
	// the unit key (e.g. "kN·m", "kN", "mm").
	CheckJSON struct {
		Member      string  `json:"member"`
		Name        string  `json:"name"`
		Standard    string  `json:"standard"`
		Clause      string  `json:"clause"`
		LimitState  string  `json:"limit_state"`
		Combination string  `json:"combination"`
		Demand      float64 `json:"demand_in_unit"`
		Capacity    float64 `json:"capacity_in_unit"`
		Unit        string  `json:"unit"`
		Utilisation float64 `json:"utilisation"`
	}

	// FrameJSON is the frame analysis.
	FrameJSON struct {
		BucklingFactor      float64       `json:"buckling_factor"`
		BucklingCombination string        `json:"buckling_combination"`
		Diagrams            []DiagramJSON `json:"diagrams"`
		Deflections         []CheckJSON   `json:"deflections"`
	}

	// DiagramJSON is one frame part's internal forces at its stations.
	DiagramJSON struct {
		Part        string    `json:"part"`
		Combination string    `json:"combination"`
		StationsM   []float64 `json:"stations_m"`
		AxialKN     []float64 `json:"axial_kn"`
		ShearKN     []float64 `json:"shear_kn"`
		MomentKNm   []float64 `json:"moment_knm"`
	}
)

func calculationJSON(c *optimize.Calculation) CalculationJSON {
	out := CalculationJSON{Wind: windJSON(c.Wind), DeadRoofKPa: c.Dead.RoofKPa, DeadWallKPa: c.Dead.WallKPa,
		RoofLiveKPa: c.RoofLiveKPa, HoistKN: c.Hoist.LoadKN, HoistAtM: c.Hoist.PositionM,
		Combinations: combinationsJSON(c.Combinations), Groups: []GroupJSON{}}
	for _, g := range c.Groups {
		out.Groups = append(out.Groups, GroupJSON{Role: string(g.Role), Designation: g.Designation, Notes: g.Notes,
			Searched: g.Searched, Checks: checksJSON(g.Checks)})
	}
	if f := c.Frame; f != nil {
		fj := FrameJSON{BucklingFactor: f.BucklingFactor, BucklingCombination: f.BucklingCombination,
			Diagrams: []DiagramJSON{}, Deflections: checksJSON(f.Deflections)}
		for _, d := range f.Diagrams {
			fj.Diagrams = append(fj.Diagrams, DiagramJSON(d))
		}
		out.Frame = &fj
	}
	return out
}

func combinationsJSON(cs []actions.Combination) []CombinationJSON {
	out := make([]CombinationJSON, 0, len(cs))
	for _, c := range cs {
		cj := CombinationJSON{Name: c.Name, LimitState: c.LimitState.String(), Factors: make([]FactorJSON, 0, len(c.Factors))}
		for _, f := range c.Factors {
			cj.Factors = append(cj.Factors, FactorJSON{Case: string(f.Case), Factor: f.Factor})
		}
		out = append(out, cj)
	}
	return out
}

func checksJSON(lines []optimize.CheckLine) []CheckJSON {
	out := make([]CheckJSON, 0, len(lines))
	for _, l := range lines {
		out = append(out, CheckJSON(l))
	}
	return out
}

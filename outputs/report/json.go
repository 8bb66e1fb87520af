package report

import (
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// JSON shape of one designed case. Every key carries its unit (DESIGN.md
// §3); counts, ratios, coefficients and utilisations are dimensionless.
type (
	// ResultJSON is the full optimize.Result.
	ResultJSON struct {
		Caution           string           `json:"caution"`
		Case              CaseJSON         `json:"case"`
		Status            string           `json:"status"` // "ok" or "no_solution"
		Reason            string           `json:"reason,omitempty"`
		VUltimateMS       float64          `json:"v_ultimate_ms"`
		VServiceMS        float64          `json:"v_service_ms"`
		QUltimateKPa      float64          `json:"q_ultimate_kpa"`
		QServiceKPa       float64          `json:"q_service_kpa"`
		Members           []MemberJSON     `json:"members"`
		Frames            int              `json:"frames"`
		KneeBraceColumnM  float64          `json:"knee_brace_column_m"`
		KneeBraceRafterM  float64          `json:"knee_brace_rafter_m"`
		FlyBracesPerFrame int              `json:"fly_braces_per_frame"`
		Footing           FootingJSON      `json:"footing"`
		BracedFooting     FootingJSON      `json:"braced_footing"`
		SteelMassKg       float64          `json:"steel_mass_kg"`
		MassPerFloorKgM2  float64          `json:"mass_per_floor_kg_m2"`
		CostCurrency      float64          `json:"cost_currency"`
		FrameAnalyses     int              `json:"frame_analyses"`
		Calculation       *CalculationJSON `json:"calculation,omitempty"`
	}

	// CaseJSON is the case's inputs and the options it shares with its grid.
	CaseJSON struct {
		ID            string         `json:"id"`
		SpanM         float64        `json:"span_m"`
		LengthM       float64        `json:"length_m"`
		Bays          int            `json:"bays"`
		BaySpacingM   float64        `json:"bay_spacing_m"`
		EavesHeightM  float64        `json:"eaves_height_m"`
		RoofPitchDeg  float64        `json:"roof_pitch_deg"`
		WindCondition string         `json:"wind_condition"`
		Wind          grids.Wind     `json:"wind"`
		Base          string         `json:"base"`
		HoistKN       float64        `json:"hoist_kn"`
		Options       *grids.Options `json:"options,omitempty"`
	}

	// MemberJSON is one member group of the schedule.
	MemberJSON struct {
		Role                string        `json:"role"`
		Designation         string        `json:"designation"`
		SpacingM            float64       `json:"spacing_m"`
		SpanType            string        `json:"span_type"`
		BridgingRows        int           `json:"bridging_rows"`
		Lines               int           `json:"lines"`
		Count               int           `json:"count"`
		LengthEachM         float64       `json:"length_each_m"`
		MassKg              float64       `json:"mass_kg"`
		DeflectionOverLimit float64       `json:"deflection_over_limit"`
		Governing           GoverningJSON `json:"governing"`
	}

	// GoverningJSON names the check that decides a section.
	GoverningJSON struct {
		Check       string  `json:"check"`
		Standard    string  `json:"standard"`
		Clause      string  `json:"clause"`
		LimitState  string  `json:"limit_state"`
		Combination string  `json:"combination"`
		Utilisation float64 `json:"utilisation"`
	}

	// FootingJSON is the pad footing at each column base.
	FootingJSON struct {
		Bases        string        `json:"bases"`
		WidthM       float64       `json:"width_m"`
		DepthM       float64       `json:"depth_m"`
		Count        int           `json:"count"`
		ConcreteM3   float64       `json:"concrete_m3"`
		BoltSize     string        `json:"bolt_size"`
		BoltsPerBase int           `json:"bolts_per_base"`
		Governing    GoverningJSON `json:"governing"`
	}
)

// NewJSON converts a result to its JSON shape, the calculation included
// when it was recorded.
func NewJSON(r *optimize.Result) ResultJSON {
	c := r.Case
	out := ResultJSON{
		Caution: Caution,
		Case: CaseJSON{ID: c.ID, SpanM: c.SpanM, LengthM: c.LengthM, Bays: c.Bays, BaySpacingM: c.BaySpacingM,
			EavesHeightM: c.EavesHeightM, RoofPitchDeg: c.RoofPitchDeg, WindCondition: c.WindCondition(), Wind: c.Wind,
			Base: c.Base, HoistKN: c.HoistKN, Options: c.Options},
		Status: r.Status.String(), Reason: r.Reason,
		VUltimateMS: r.VUltimateMS, VServiceMS: r.VServiceMS, QUltimateKPa: r.QUltimateKPa, QServiceKPa: r.QServiceKPa,
		Members:          make([]MemberJSON, 0, len(r.Members)),
		Frames:           r.Frames,
		KneeBraceColumnM: r.KneeBraceColumnM, KneeBraceRafterM: r.KneeBraceRafterM, FlyBracesPerFrame: r.FlyBracesPerFrame,
		Footing:       footingJSON(r.Footing),
		BracedFooting: footingJSON(r.BracedFooting),
		SteelMassKg:   r.SteelMassKg, MassPerFloorKgM2: r.MassPerFloorKgM2, CostCurrency: r.Cost, FrameAnalyses: r.Analyses,
	}
	for _, m := range r.Members {
		out.Members = append(out.Members, MemberJSON{Role: string(m.Role), Designation: m.Designation, SpacingM: m.SpacingM,
			SpanType: m.SpanType, BridgingRows: m.Bridging, Lines: m.Lines, Count: m.Count, LengthEachM: m.LengthEachM,
			MassKg: m.MassKg, DeflectionOverLimit: m.DeflectionRatio, Governing: governingJSON(m.Governing)})
	}
	if r.Calculation != nil {
		cj := calculationJSON(r.Calculation)
		out.Calculation = &cj
	}
	return out
}

func governingJSON(g optimize.Governing) GoverningJSON {
	return GoverningJSON{Check: g.Check, Standard: g.Standard, Clause: g.Clause, LimitState: g.LimitState,
		Combination: g.Combination, Utilisation: g.Utilisation}
}

func footingJSON(f optimize.Footing) FootingJSON {
	return FootingJSON{Bases: f.Bases, WidthM: f.WidthM, DepthM: f.DepthM, Count: f.Count,
		ConcreteM3: f.ConcreteM3, BoltSize: f.BoltSize, BoltsPerBase: f.BoltsPerBase,
		Governing: governingJSON(f.Governing)}
}

package grids

// Options are the inputs shared by every case of a grid: cladding,
// serviceability limits, member choices, the dominant opening and costs.
type Options struct {
	Cladding Cladding `json:"cladding"`
	Limits   Limits   `json:"limits"`
	Members  Members  `json:"members"`
	Opening  *Opening `json:"dominant_opening,omitempty"` // nil: no dominant opening
	Costs    *Costs   `json:"costs,omitempty"`            // nil: minimise steel mass only
}

// Cladding gives the cladding dead loads and the spacing limits of the purlins
// and girts that carry it.
type Cladding struct {
	RoofDeadKPa       float64 `json:"roof_dead_kpa"`        // roof sheeting and fixings, on plan slope; default 0.10
	WallDeadKPa       float64 `json:"wall_dead_kpa"`        // wall sheeting and fixings; default 0.10
	MaxPurlinSpacingM float64 `json:"max_purlin_spacing_m"` // largest purlin spacing the roof sheeting spans; default 1.2
	MaxGirtSpacingM   float64 `json:"max_girt_spacing_m"`   // largest girt spacing the wall sheeting spans; default 1.5
	SpacingStepM      float64 `json:"spacing_step_m"`       // purlin and girt spacings are tried in steps of this; default 0.1
}

// Limits are serviceability limits, each the denominator of a ratio:
// 150 means the deflection may not exceed span/150.
type Limits struct {
	PurlinDeflectionRatio float64 `json:"purlin_deflection_ratio"` // purlin span / mid-span deflection under SLS wind; default 150
	GirtDeflectionRatio   float64 `json:"girt_deflection_ratio"`   // girt span / mid-span deflection under SLS wind; default 150
	EavesDriftRatio       float64 `json:"eaves_drift_ratio"`       // eaves height / eaves sway under SLS wind; default 150
	ApexDeflectionRatio   float64 `json:"apex_deflection_ratio"`   // frame span / apex vertical deflection under SLS actions; default 180
}

// Section families and span types named in grid files.
const (
	FamilyZ       = "Z"  // lipped Z section
	FamilyC       = "C"  // lipped C section
	FamilyBackToC = "2C" // two lipped C sections back to back

	SpanSimple     = "simple"
	SpanContinuous = "continuous"
	SpanLapped     = "lapped"
)

// Members restricts the sections and arrangements the search may choose.
type Members struct {
	PurlinFamilies      []string `json:"purlin_families"`        // from FamilyZ, FamilyC; default both
	GirtFamilies        []string `json:"girt_families"`          // from FamilyZ, FamilyC; default both
	FrameFamilies       []string `json:"frame_families"`         // rafters and columns, from FamilyC, FamilyBackToC; default both
	SameRafterAndColumn bool     `json:"same_rafter_and_column"` // rafter and column must be the same section; default false
	KneeBraces          bool     `json:"knee_braces"`            // knee braces may be added; default true
	SpanTypes           []string `json:"span_types"`             // purlin and girt span types allowed; default all three
}

// Walls on which a dominant opening may be placed.
const (
	WallSide = "side" // a long wall, parallel to the ridge
	WallEnd  = "end"  // a gable end wall
)

// Opening is a dominant opening (a roller door) on one wall, giving the
// internal pressure cases of AS/NZS 1170.2:2021 Cl 5.3.
type Opening struct {
	Wall    string  `json:"wall"`     // WallSide or WallEnd
	WidthM  float64 `json:"width_m"`  // door width
	HeightM float64 `json:"height_m"` // door height
}

// Costs price the steel and the items that are counted, in the maker's
// currency unit. When a grid gives costs the search minimises cost.
type Costs struct {
	PerKg          map[string]float64 `json:"per_kg"`           // price per kg of steel, by family (Z, C, 2C)
	PerFlyBrace    float64            `json:"per_fly_brace"`    // price per fly brace fitted; default 0
	PerBridgingRow float64            `json:"per_bridging_row"` // price per row of purlin or girt bridging per bay; default 0
}

// defaultOptions returns the options a grid file gets for every key it omits.
// The source of each default is in the key reference (keys.go).
func defaultOptions() Options {
	return Options{
		Cladding: Cladding{RoofDeadKPa: 0.10, WallDeadKPa: 0.10, MaxPurlinSpacingM: 1.2, MaxGirtSpacingM: 1.5, SpacingStepM: 0.1},
		Limits:   Limits{PurlinDeflectionRatio: 150, GirtDeflectionRatio: 150, EavesDriftRatio: 150, ApexDeflectionRatio: 180},
		Members: Members{
			PurlinFamilies: []string{FamilyZ, FamilyC},
			GirtFamilies:   []string{FamilyZ, FamilyC},
			FrameFamilies:  []string{FamilyC, FamilyBackToC},
			KneeBraces:     true,
			SpanTypes:      []string{SpanSimple, SpanContinuous, SpanLapped},
		},
	}
}

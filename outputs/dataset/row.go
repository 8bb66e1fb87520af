package dataset

import (
	"github.com/spansweep/spansweep/optimize"
)

// Row is one case of the dataset, flat as it is stored: the case's inputs,
// its wind, every member group, the footing, masses, status and provenance.
// Members holds one Member per role, in optimize.Roles order.
type Row struct {
	CaseID          string
	CaseIndex       int
	WindCondition   string // stable key of the wind condition, from grids
	WindClass       string // AS 4055 housing wind class, or "" for a region
	Region          string // AS/NZS 1170.2 wind region, or "" for a class
	TerrainCategory float64
	ImportanceLevel int
	DesignLifeYears int

	SpanM        float64
	LengthM      float64
	Bays         int
	BaySpacingM  float64
	EavesHeightM float64
	RoofPitchDeg float64
	Base         string // "pinned" or "fixed"
	HoistKN      float64

	VULSMS  float64 // ultimate design gust speed
	VSLSMS  float64 // serviceability design gust speed
	QULSKPa float64 // ultimate design wind pressure 0.6·V²
	QSLSKPa float64 // serviceability design wind pressure

	Members []Member // one per optimize.Roles entry, in that order

	Frames            int
	KneeBraceColumnM  float64
	KneeBraceRafterM  float64
	FlyBracesPerFrame int

	FootingWidthM      float64
	FootingDepthM      float64
	FootingCount       int
	ConcreteM3         float64
	BoltSize           string
	BoltsPerBase       int
	FootingCheck       string
	FootingClause      string
	FootingUtilisation float64

	// The pads at the braced bays' column bases (zero when every base is
	// braced alike); the building's concrete is ConcreteM3 + BracedConcreteM3.
	BracedFootingWidthM      float64
	BracedFootingDepthM      float64
	BracedFootingCount       int
	BracedConcreteM3         float64
	BracedBoltSize           string
	BracedBoltsPerBase       int
	BracedFootingCheck       string
	BracedFootingClause      string
	BracedFootingUtilisation float64

	SteelMassKg      float64
	MassPerFloorKgM2 float64
	Cost             float64
	Analyses         int
	Status           string // "ok" or "no_solution"
	Reason           string

	GridSHA256     string
	CatalogSHA256  string
	ProgramVersion string
}

// Member is one member group's columns (prefixed by the role in the file,
// e.g. purlin_designation).
type Member struct {
	Designation     string
	SpacingM        float64
	SpanType        string
	BridgingRows    int
	Lines           int // purlins and girts: runs along the building
	Count           int
	LengthEachM     float64
	MassKg          float64
	Utilisation     float64
	Check           string
	Standard        string
	Clause          string
	LimitState      string
	Combination     string
	DeflectionRatio float64
}

// NewRow returns a zero Row with its Members slice sized for every role.
func NewRow() Row {
	return Row{Members: make([]Member, len(optimize.Roles))}
}

// Member returns the columns of the given role, or a zero Member for a role
// the schema does not know.
func (r *Row) Member(role optimize.Role) Member {
	for i, ro := range optimize.Roles {
		if ro == role && i < len(r.Members) {
			return r.Members[i]
		}
	}
	return Member{}
}

// OK reports whether the case has a passing design.
func (r *Row) OK() bool { return r.Status == optimize.OK.String() }

// FloorAreaM2 is the plan area span × length.
func (r *Row) FloorAreaM2() float64 { return r.SpanM * r.LengthM }

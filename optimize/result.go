package optimize

import (
	"github.com/spansweep/spansweep/grids"
)

// Status is the outcome of designing one case.
type Status int

const (
	// OK means every member group has a passing section.
	OK Status = iota
	// NoSolution means at least one member group has no passing candidate;
	// Result.Reason names the group, the best candidate, its utilisation and
	// the check that fails it.
	NoSolution
)

// String returns the dataset spelling: "ok" or "no_solution".
func (s Status) String() string {
	switch s {
	case OK:
		return "ok"
	case NoSolution:
		return "no_solution"
	}
	return "unknown"
}

// Governing names the check that decides a member group's section: the
// same fields on every path, so tables, reports and the dataset agree.
type Governing struct {
	Check       string  // e.g. "member moment capacity (lateral-torsional)"
	Standard    string  // e.g. "AS/NZS 4600:2018"
	Clause      string  // e.g. "cl. 3.3.3.2"
	LimitState  string  // "ULS" or "SLS"
	Combination string  // e.g. "ULS 0.9G+Wu crosswind, internal pressure"
	Utilisation float64 // demand over capacity (or deflection over its limit)
}

// Role names a member group of the building.
type Role string

// The member groups of DESIGN.md §4.5, in schedule order.
const (
	RolePurlin        Role = "purlin"
	RoleGirt          Role = "girt"
	RoleRafter        Role = "rafter"
	RoleColumn        Role = "column"
	RoleKneeBrace     Role = "knee_brace"
	RoleFlyBrace      Role = "fly_brace"
	RoleRoofBracing   Role = "roof_bracing"
	RoleWallBracing   Role = "wall_bracing"
	RoleEndWallColumn Role = "endwall_column"
	RoleEndWallGirt   Role = "endwall_girt"
)

// Roles lists every role in schedule order.
var Roles = []Role{RolePurlin, RoleGirt, RoleRafter, RoleColumn, RoleKneeBrace,
	RoleFlyBrace, RoleRoofBracing, RoleWallBracing, RoleEndWallColumn, RoleEndWallGirt}

// MemberGroup is one chosen member group: its section and how many pieces
// the building takes. A group the building does not have (no knee braces,
// say) has an empty Designation and zero Count.
type MemberGroup struct {
	Role        Role
	Designation string  // catalogue designation, e.g. "Z200x1.9"
	SpacingM    float64 // purlins and girts: centre-to-centre spacing; 0 otherwise
	SpanType    string  // purlins and girts: "simple", "continuous" or "lapped"
	Bridging    int     // purlins and girts: bridging rows per span
	Lines       int     // purlins and girts: runs along the building (both slopes or walls)
	Count       int     // pieces in the building
	LengthEachM float64 // cut length of one piece
	MassKg      float64 // mass of all pieces (laps included)
	Governing   Governing
	// DeflectionRatio is the governing SLS deflection over its limit
	// (0 where no deflection limit applies).
	DeflectionRatio float64
}

// Footing is the pad chosen for each column base, and its holding-down bolts.
type Footing struct {
	Bases        string  // which column bases: "frame bases" or "braced-bay bases"
	WidthM       float64 // square pad side
	DepthM       float64
	Count        int     // pads of this type in the building
	ConcreteM3   float64 // all pads of this type
	BoltSize     string  // e.g. "M16 4.6/S"
	BoltsPerBase int
	Governing    Governing
}

// Result is the design of one case.
type Result struct {
	Case   grids.Case
	Status Status
	Reason string // empty when Status is OK

	// Wind at the building, for tabulation and the estimator's ordering.
	VUltimateMS  float64
	VServiceMS   float64
	QUltimateKPa float64
	QServiceKPa  float64

	Members []MemberGroup // one per Role, in Roles order
	Frames  int           // portal frames, end frames included
	// Knee brace positions, measured down the column from the eaves and
	// along the rafter from the eaves; zero without knee braces.
	KneeBraceColumnM  float64
	KneeBraceRafterM  float64
	FlyBracesPerFrame int

	// Footing is the pad at the column bases outside the braced bays (at
	// every base when all of them are in braced bays); BracedFooting is the
	// pad at the braced bays' column bases, which also carry the wall
	// bracing's uplift and shear (zero when every base is braced). The
	// building's concrete is Footing.ConcreteM3 + BracedFooting.ConcreteM3.
	Footing       Footing
	BracedFooting Footing

	SteelMassKg      float64 // every member group
	MassPerFloorKgM2 float64 // steel mass over span × length
	Cost             float64 // from the grid's price table; 0 without one
	Analyses         int     // frame analyses the search ran (a memo replay counts those of the search replayed)

	// Calculation is the full working, kept only with Settings.Record.
	Calculation *Calculation
}

// Footings returns the footing types the building has (frame bases, then
// braced-bay bases), skipping a type with no pads.
func (r *Result) Footings() []Footing {
	var out []Footing
	for _, f := range []Footing{r.Footing, r.BracedFooting} {
		if f.Count > 0 {
			out = append(out, f)
		}
	}
	return out
}

// ConcreteM3 is the concrete of every footing in the building.
func (r *Result) ConcreteM3() float64 { return r.Footing.ConcreteM3 + r.BracedFooting.ConcreteM3 }

// Member returns the group with the given role, or a zero group.
func (r *Result) Member(role Role) MemberGroup {
	for _, m := range r.Members {
		if m.Role == role {
			return m
		}
	}
	return MemberGroup{Role: role}
}

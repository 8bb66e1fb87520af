package optimize

import (
	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/wind"
)

// Calculation is the full working of one case, kept when Settings.Record
// is set, for the single-case calculation report (DESIGN.md §6).
type Calculation struct {
	Wind         wind.Loads // speeds, multipliers, every wind case's zones
	Dead         actions.Dead
	RoofLiveKPa  float64 // on a frame's tributary plan area
	Hoist        actions.Hoist
	Combinations []actions.Combination
	Groups       []GroupCalculation // one per designed member group, in Roles order
	Frame        *FrameCalculation  // nil until the frame is designed
}

// GroupCalculation is the working of one member group: what was chosen,
// the design actions, and every check of the chosen section.
type GroupCalculation struct {
	Role        Role
	Designation string
	// Notes are short statements of the arrangement and its assumptions,
	// e.g. "4 lines per slope at 1.15 m, lapped, 1 row of bridging per span".
	Notes  []string
	Checks []CheckLine
	// Searched is how many candidates the search evaluated for this group.
	Searched int
}

// CheckLine is one check of a chosen member, in the form every report and
// table prints: the same fields whichever package made the check.
type CheckLine struct {
	Member      string // e.g. "rafter", "purlin, edge zone", "footing, left base"
	Name        string // e.g. "member moment capacity (lateral-torsional)"
	Standard    string
	Clause      string
	LimitState  string // "ULS" or "SLS"
	Combination string
	Demand      float64
	Capacity    float64
	Unit        string
	Utilisation float64
}

// FrameCalculation is the frame analysis kept for the report.
type FrameCalculation struct {
	BucklingFactor      float64 // lowest elastic buckling factor λc over the ULS combinations
	BucklingCombination string
	// Diagrams are the internal force diagrams of each frame part under the
	// combinations that govern the rafter and the column.
	Diagrams []MemberDiagram
	// Deflections are the SLS frame deflections against their limits.
	Deflections []CheckLine
}

// MemberDiagram is one frame part's internal forces along its length under
// one combination, sampled at stations (m from the part's start).
type MemberDiagram struct {
	Part        string // e.g. "left column", "left rafter"
	Combination string
	StationsM   []float64
	AxialKN     []float64 // tension positive
	ShearKN     []float64
	MomentKNm   []float64 // positive: tension on the inside face
}

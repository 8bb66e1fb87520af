package footing

// Check is one design check of a footing or its bolts: what was checked,
// under which standard, clause, limit state and combination, and how close
// it came. Utilisation is Demand/Capacity; above 1 the check fails.
type Check struct {
	Standard    string  `json:"standard"`
	Clause      string  `json:"clause"`
	Name        string  `json:"name"`
	LimitState  string  `json:"limit_state"`
	Combination string  `json:"combination"`
	Demand      float64 `json:"demand"`
	Capacity    float64 `json:"capacity"`
	Unit        string  `json:"unit"`
	Utilisation float64 `json:"utilisation"`
}

// Passes reports whether the check's utilisation is at most 1 (with a
// relative tolerance of 1e-9 so a hand-sized exact fit passes).
func (c Check) Passes() bool { return c.Utilisation <= 1+1e-9 }

// Limit-state labels used in Check.LimitState.
const (
	ULS = "ULS"
	SLS = "SLS"
)

// NoCapacityUtilisation is the utilisation reported when a positive demand
// meets no capacity at all (a finite stand-in for infinity, so results stay
// encodable as JSON).
const NoCapacityUtilisation = 1e6

// utilisation returns demand/capacity, NoCapacityUtilisation when a positive
// demand meets no capacity and 0 when there is no demand.
func utilisation(demand, capacity float64) float64 {
	switch {
	case demand <= 0:
		return 0
	case capacity <= 0:
		return NoCapacityUtilisation
	default:
		return min(demand/capacity, NoCapacityUtilisation)
	}
}

// governing returns the check with the largest utilisation (the first one
// on ties, so the order of checks is the tie-break).
func governing(checks []Check) Check {
	var g Check
	for i, c := range checks {
		if i == 0 || c.Utilisation > g.Utilisation {
			g = c
		}
	}
	return g
}

// allPass reports whether every check passes.
func allPass(checks []Check) bool {
	for _, c := range checks {
		if !c.Passes() {
			return false
		}
	}
	return true
}

package coldformed

import (
	"fmt"
	"math"
)

// Standard is the edition every check cites.
const Standard = "AS/NZS 4600:2018"

// LimitState names the kind of failure a check guards against.
type LimitState string

// Limit states used by the checks.
const (
	LimitStrength  LimitState = "ULS strength"
	LimitStability LimitState = "ULS stability"
)

// MaxInputs is how many deciding inputs a Check records.
const MaxInputs = 6

// Input is one named input that decided a check (an effective length in mm,
// a moment-gradient factor, a slenderness...).
type Input struct {
	Name  InputName
	Value float64
}

// Check is one clause's verdict for one member under one combination. The
// same struct is used on every path so reports and the dataset read alike.
type Check struct {
	Standard    string
	Clause      string
	Name        string
	LimitState  LimitState
	Combination string // filled by the caller (the optimiser)

	DemandValue   float64
	CapacityValue float64 // design capacity φR, same unit as DemandValue
	Unit          string  // "N", "N·mm" or "" for an interaction sum
	Utilisation   float64 // demand / capacity; ≤ 1 passes

	Inputs  [MaxInputs]Input
	NInputs int
}

// DecidingInputs returns the inputs recorded on the check.
func (c Check) DecidingInputs() []Input { return c.Inputs[:c.NInputs] }

// Input returns the value of the named input and whether it was recorded.
func (c Check) Input(name InputName) (float64, bool) {
	for _, in := range c.DecidingInputs() {
		if in.Name == name {
			return in.Value, true
		}
	}
	return 0, false
}

// Passes reports whether the utilisation is at most 1.
func (c Check) Passes() bool { return c.Utilisation <= 1 }

func (c Check) String() string {
	return fmt.Sprintf("%s cl. %s %s: %.4g/%.4g %s, utilisation %.3f", c.Standard, c.Clause, c.Name, c.DemandValue, c.CapacityValue, c.Unit, c.Utilisation)
}

// newCheck builds a check with utilisation demand/capacity; a capacity at or
// below zero gives +Inf (a failing check, never a silent pass).
func newCheck(clause, name string, ls LimitState, demand, capacity float64, unit string, inputs ...Input) Check {
	c := Check{Standard: Standard, Clause: clause, Name: name, LimitState: ls,
		DemandValue: demand, CapacityValue: capacity, Unit: unit}
	c.Utilisation = ratio(demand, capacity)
	c.NInputs = copy(c.Inputs[:], inputs)
	return c
}

// newInteraction builds a check whose demand is an interaction sum against 1.
func newInteraction(clause, name string, sum float64, inputs ...Input) Check {
	return newCheck(clause, name, LimitStrength, sum, 1, "", inputs...)
}

func ratio(demand, capacity float64) float64 {
	if demand == 0 {
		return 0
	}
	if capacity <= 0 {
		return math.Inf(1)
	}
	return demand / capacity
}

// MemberResult lists every check of one member under one combination.
type MemberResult struct {
	Designation string
	Checks      []Check
}

// Governing returns the check with the highest utilisation (the first of
// equals); the zero Check if there are none.
func (r MemberResult) Governing() Check {
	var g Check
	for i, c := range r.Checks {
		if i == 0 || c.Utilisation > g.Utilisation {
			g = c
		}
	}
	return g
}

// Utilisation is the governing check's utilisation.
func (r MemberResult) Utilisation() float64 { return r.Governing().Utilisation }

// Passes reports whether every check passes.
func (r MemberResult) Passes() bool { return r.Governing().Passes() }

// SetCombination names the load combination on every check.
func (r *MemberResult) SetCombination(name string) {
	for i := range r.Checks {
		r.Checks[i].Combination = name
	}
}

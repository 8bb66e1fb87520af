package plots

import (
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// Point is one case as the plots read it.
type Point struct {
	Case             grids.Case
	Wind             string // wind condition label
	Solved           bool
	SteelMassKg      float64
	MassPerFloorKgM2 float64
	// Governing holds each role's governing check, indexed as
	// optimize.Roles; Heaviest is the index of the heaviest group.
	Governing [numRoles]string
	Heaviest  int
}

const numRoles = 10

// Collector keeps one small Point per case as results stream in.
type Collector struct {
	windLabel func(grids.Case) string
	points    []Point
}

// NewCollector returns an empty collector. windLabel names a case's wind
// condition; nil means the case's own label.
func NewCollector(windLabel func(grids.Case) string) *Collector {
	if windLabel == nil {
		windLabel = grids.Case.WindCondition
	}
	return &Collector{windLabel: windLabel}
}

// Add takes one result.
func (c *Collector) Add(r *optimize.Result) {
	p := Point{
		Case:             r.Case,
		Wind:             c.windLabel(r.Case),
		Solved:           r.Status == optimize.OK,
		SteelMassKg:      r.SteelMassKg,
		MassPerFloorKgM2: r.MassPerFloorKgM2,
		Heaviest:         -1,
	}
	var heaviest float64
	for _, g := range r.Members {
		i := roleIndex(g.Role)
		if i < 0 {
			continue
		}
		p.Governing[i] = g.Governing.Check
		if g.MassKg > heaviest {
			heaviest, p.Heaviest = g.MassKg, i
		}
	}
	c.points = append(c.points, p)
}

// Points returns the collected points in arrival order.
func (c *Collector) Points() []Point { return c.points }

func roleIndex(r optimize.Role) int {
	for i, x := range optimize.Roles {
		if x == r && i < numRoles {
			return i
		}
	}
	return -1
}

// governing is the check shown for a point: the given role's, or the
// heaviest group's where role is empty.
func (p *Point) governing(role optimize.Role) string {
	if role == "" {
		if p.Heaviest < 0 {
			return ""
		}
		return p.Governing[p.Heaviest]
	}
	if i := roleIndex(role); i >= 0 {
		return p.Governing[i]
	}
	return ""
}

// AtSize selects the cases of one eaves height and length, for a plot of
// total mass (which otherwise mixes building sizes).
func AtSize(eavesHeightM, lengthM float64) func(grids.Case) bool {
	return func(c grids.Case) bool { return c.EavesHeightM == eavesHeightM && c.LengthM == lengthM }
}

// windOrder lists the wind conditions of pts in the grid's order (lowest
// case index first), so the order does not depend on arrival.
func windOrder(pts []Point) []string {
	first := map[string]int{}
	for _, p := range pts {
		if f, ok := first[p.Wind]; !ok || p.Case.Index < f {
			first[p.Wind] = p.Case.Index
		}
	}
	return keysByValue(first)
}

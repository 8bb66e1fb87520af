package plots

import (
	"io"

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

// Collector keeps one small Point per case as results arrive, in any
// order, and draws any chart of them afterwards. A sweep, whose results
// come in grid order and are too many to keep, builds its charts as they
// arrive instead (MassChart, GoverningChart), drawn byte for byte alike.
type Collector struct {
	windLabel func(grids.Case) string
	points    []Point
}

// NewCollector returns an empty collector. windLabel names a case's wind
// condition; nil means the case's own label.
func NewCollector(windLabel func(grids.Case) string) *Collector {
	return &Collector{windLabel: orWindCondition(windLabel)}
}

func orWindCondition(windLabel func(grids.Case) string) func(grids.Case) string {
	if windLabel == nil {
		return grids.Case.WindCondition
	}
	return windLabel
}

// Add takes one result.
func (c *Collector) Add(r *optimize.Result) { c.points = append(c.points, pointOf(r, c.windLabel)) }

// pointOf is what the plots read of one result.
func pointOf(r *optimize.Result, windLabel func(grids.Case) string) Point {
	p := Point{
		Case:             r.Case,
		Wind:             windLabel(r.Case),
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
	return p
}

// Points returns the collected points in arrival order.
func (c *Collector) Points() []Point { return c.points }

// MassAgainstSpan writes the chart: one line per wind condition through
// the mean value at each span, and that condition's trend value = A·span^B
// fitted to every plotted case. It returns the trends in legend order
// (the grid's order of wind conditions). Unsolved cases are left out.
func (c *Collector) MassAgainstSpan(w io.Writer, p MassPlot) ([]WindFit, error) {
	m := newMassChart(c.windLabel, p, false)
	for i := range c.points {
		m.add(&c.points[i]) // a chart that keeps every value takes any order
	}
	return m.WriteSVG(w)
}

// GoverningCheckMap writes a grid of span (columns) against wind condition
// or length (rows), each cell coloured by its governing check. Where
// several cases fall on one cell (other dimensions vary), the cell shows
// an unsolved case if there is one, else the heaviest. It returns the
// legend's categories, most frequent first.
func (c *Collector) GoverningCheckMap(w io.Writer, m GoverningMap) ([]Category, error) {
	g, err := NewGoverningChart(c.windLabel, m)
	if err != nil {
		return nil, err
	}
	for i := range c.points {
		g.add(&c.points[i])
	}
	return g.WriteSVG(w)
}

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

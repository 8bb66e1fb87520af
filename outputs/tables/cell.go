package tables

import (
	"github.com/spansweep/spansweep/optimize"
)

// Member is one member group as a table cell shows it.
type Member struct {
	Designation string  // e.g. "2C250x2.4"; empty where the group is absent
	KgPerM      float64 // mass per metre of the section
	SpacingM    float64 // purlins: centre-to-centre spacing; 0 otherwise
	MassKg      float64 // the group's mass in the building
	Raised      bool    // the envelope replaced the design's section
}

// Cell is one building size in a table.
type Cell struct {
	CaseID string
	Index  int // the case's position in the grid
	Status optimize.Status
	Reason string // why no section passes; empty when Status is OK

	Rafter Member
	Column Member
	Purlin Member

	SteelMassKg float64 // total steel mass (all member groups)
	// Governing is the governing check of the heaviest member group,
	// e.g. "member moment capacity (lateral-torsional), AS/NZS 4600:2018 cl. 3.3.3.2".
	Governing string

	// Cases is how many results fell on this cell; more than one means
	// the grid varies something the table key does not name, and the
	// cell shows the heaviest of them.
	Cases int
}

// Enveloped reports whether the envelope raised any section of the cell.
func (c *Cell) Enveloped() bool {
	return c.Rafter.Raised || c.Column.Raised || c.Purlin.Raised
}

// Frame is the frame entry "rafter / column", or the one section where
// both are the same.
func (c *Cell) Frame() string {
	if c.Rafter.Designation == c.Column.Designation {
		return c.Rafter.Designation
	}
	return c.Rafter.Designation + " / " + c.Column.Designation
}

// KgPerMFunc returns a section's mass per metre by designation, and false
// when the designation is unknown (catalog.Default().Find serves).
type KgPerMFunc func(designation string) (kgPerM float64, ok bool)

// newCell takes what a table shows from one result.
func newCell(r *optimize.Result, kgPerM KgPerMFunc) Cell {
	c := Cell{
		CaseID:      r.Case.ID,
		Index:       r.Case.Index,
		Status:      r.Status,
		Reason:      r.Reason,
		SteelMassKg: r.SteelMassKg,
		Cases:       1,
	}
	if r.Status != optimize.OK {
		return c
	}
	c.Rafter = newMember(r.Member(optimize.RoleRafter), kgPerM)
	c.Column = newMember(r.Member(optimize.RoleColumn), kgPerM)
	c.Purlin = newMember(r.Member(optimize.RolePurlin), kgPerM)
	c.Governing = heaviestGoverning(r)
	return c
}

func newMember(g optimize.MemberGroup, kgPerM KgPerMFunc) Member {
	m := Member{Designation: g.Designation, SpacingM: g.SpacingM, MassKg: g.MassKg}
	if kgPerM != nil {
		if v, ok := kgPerM(g.Designation); ok {
			m.KgPerM = v
			return m
		}
	}
	// Without a catalogue: the group's mass over its cut length, which
	// counts laps and so reads slightly high; it only orders sections.
	if length := float64(g.Count) * g.LengthEachM; length > 0 {
		m.KgPerM = g.MassKg / length
	}
	return m
}

// heaviestGoverning names the governing check of the heaviest member group.
func heaviestGoverning(r *optimize.Result) string {
	var best optimize.MemberGroup
	for _, g := range r.Members {
		if g.MassKg > best.MassKg {
			best = g
		}
	}
	if best.Governing.Check == "" {
		return ""
	}
	s := best.Governing.Check
	if best.Governing.Standard != "" {
		s += ", " + best.Governing.Standard
	}
	if best.Governing.Clause != "" {
		s += " " + best.Governing.Clause
	}
	return s
}

// heavier reports whether cell c should replace cell o when both fall on
// the same place: the heavier design wins, and a no_solution beats any
// design, because the table must not show a size as solved when one of
// its variants is not.
func (c *Cell) heavier(o *Cell) bool {
	if (c.Status != optimize.OK) != (o.Status != optimize.OK) {
		return c.Status != optimize.OK
	}
	if c.SteelMassKg != o.SteelMassKg {
		return c.SteelMassKg > o.SteelMassKg
	}
	return c.Index < o.Index
}

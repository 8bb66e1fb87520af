package tables

import "github.com/spansweep/spansweep/optimize"

// Envelope raises, in place, each solved cell's rafter, column and purlin
// to the heaviest section (by mass per metre) found in any solved cell at
// or above it in the table (no larger span) and at or left of it (no
// longer length), so sections never get lighter as a building grows.
//
// A raised purlin takes the closer of its own spacing and the spacing the
// heavier section was designed at. A raised group's mass is scaled from
// the design by the ratio of masses per metre (and, for purlins, by the
// inverse ratio of spacings, since closer purlins mean more lines), and the
// cell's total steel mass changes by the same amount. The raised set is
// not re-checked: a heavier section is not proof of capacity, so enveloped
// cells are marked for the engineer. Cells without a solution stay so and
// pass nothing on.
func Envelope(t *Table) {
	envelopeRole(t, func(c *Cell) *Member { return &c.Rafter })
	envelopeRole(t, func(c *Cell) *Member { return &c.Column })
	envelopeRole(t, func(c *Cell) *Member { return &c.Purlin })
}

// envelopeRole runs the two-way running maximum for one member group:
// best[i][j] is the heaviest design section over rows ≤ i, columns ≤ j.
func envelopeRole(t *Table, member func(*Cell) *Member) {
	best := make([][]Member, len(t.SpansM))
	for i := range t.SpansM {
		best[i] = make([]Member, len(t.Columns))
		for j := range t.Columns {
			var b Member
			c := t.Cells[i][j]
			if c != nil && c.Status == optimize.OK {
				b = *member(c)
			}
			if i > 0 && heavierSection(best[i-1][j], b) {
				b = best[i-1][j]
			}
			if j > 0 && heavierSection(best[i][j-1], b) {
				b = best[i][j-1]
			}
			best[i][j] = b
			if c != nil && c.Status == optimize.OK {
				raise(c, member(c), b)
			}
		}
	}
}

// heavierSection orders sections by mass per metre; a tie keeps the
// incumbent, so the result does not depend on scan direction.
func heavierSection(m, incumbent Member) bool {
	return m.Designation != "" && m.KgPerM > incumbent.KgPerM
}

// raise replaces own with the heavier design section b, if b is heavier,
// and carries the change in mass into the cell's total.
func raise(c *Cell, own *Member, b Member) {
	if b.Designation == "" || b.Designation == own.Designation || b.KgPerM <= own.KgPerM {
		return
	}
	raised := Member{Designation: b.Designation, KgPerM: b.KgPerM, SpacingM: own.SpacingM, Raised: true}
	scale := 1.0
	if own.KgPerM > 0 {
		scale = b.KgPerM / own.KgPerM
	}
	if own.SpacingM > 0 && b.SpacingM > 0 && b.SpacingM < own.SpacingM {
		raised.SpacingM = b.SpacingM
		scale *= own.SpacingM / b.SpacingM
	}
	raised.MassKg = own.MassKg * scale
	c.SteelMassKg += raised.MassKg - own.MassKg
	*own = raised
}

package tables

import (
	"fmt"
	"strings"

	"github.com/spansweep/spansweep/optimize"
)

// varying is what a page's titles depend on across its whole set of
// tables: which key fields differ between them. It is gathered one table
// at a time, so a Stream knows it without holding the tables.
type varying struct {
	tables             int
	first              Key // the fields not varying are those of every table
	pitch, base, hoist bool
}

// note takes one more table's key.
func (v *varying) note(k Key) {
	if v.tables == 0 {
		v.first = k
	}
	v.tables++
	v.pitch = v.pitch || k.RoofPitchDeg != v.first.RoofPitchDeg
	v.base = v.base || k.Base != v.first.Base
	v.hoist = v.hoist || k.HoistKN != v.first.HoistKN
}

// title names a table by its wind condition, eaves height and whichever of
// pitch, base and hoist vary across the set.
func (v varying) title(k Key) string {
	parts := []string{"Wind " + k.Wind, fmt.Sprintf("eaves height %.2f m", k.EavesHeightM)}
	if v.pitch {
		parts = append(parts, pitchText(k.RoofPitchDeg))
	}
	if v.base {
		parts = append(parts, baseText(k.Base))
	}
	if v.hoist {
		parts = append(parts, hoistText(k.HoistKN))
	}
	return strings.Join(parts, ", ")
}

// fixed lists the key fields shared by every table, for the page header.
func (v varying) fixed() []string {
	if v.tables == 0 {
		return nil
	}
	var out []string
	if !v.pitch {
		out = append(out, pitchText(v.first.RoofPitchDeg))
	}
	if !v.base {
		out = append(out, baseText(v.first.Base))
	}
	if !v.hoist {
		out = append(out, hoistText(v.first.HoistKN))
	}
	return out
}

// marks is which cell marks a page uses, so its notes explain only those.
type marks struct {
	unsolved  bool // a cell has no solution
	merged    bool // a cell covers more than one case
	enveloped bool // the envelope was applied
}

// note takes one more table's cells.
func (m *marks) note(t *Table) {
	for _, row := range t.Cells {
		for _, c := range row {
			if c == nil {
				continue
			}
			m.unsolved = m.unsolved || c.Status != optimize.OK
			m.merged = m.merged || c.Cases > 1
		}
	}
}

// standardNotes are the reading notes every page carries after the
// caller's assumptions: what a cell shows, what the marks mean.
func standardNotes(v varying, m marks) []string {
	notes := []string{
		"Each cell gives the portal frame sections as rafter / column (one name where both are the same), the purlin section at its centre-to-centre spacing, and the total steel mass of the building (frames, purlins, girts, bracing and end walls; fasteners, cladding and footings excluded).",
		"Span is measured between column centrelines; length is bays × bay spacing between end-frame centrelines.",
		"Sections are the lightest passing set found over the catalogue for that size and wind condition; the governing check of each case is in the CSV and the dataset.",
	}
	if m.unsolved {
		notes = append(notes, fmt.Sprintf("%s marks a size for which no set of catalogue sections passes; the reason is listed under the table.", markNoSolution))
	}
	if m.merged {
		notes = append(notes, fmt.Sprintf("%s marks a cell that covers more than one case of the grid (a dimension the table does not name varies); it shows the heaviest of them.", markMerged))
	}
	if m.enveloped {
		notes = append(notes, fmt.Sprintf("%s marks an enveloped cell: its rafter, column or purlin is raised to the heaviest section of any smaller size in the same table (shorter span or length), so sections never get lighter as the building grows. The raised set is not re-checked and its mass is scaled from the design.", markEnveloped))
	}
	if fixed := v.fixed(); len(fixed) > 0 {
		notes = append(notes, "Every table: "+strings.Join(fixed, "; ")+".")
	}
	return notes
}

func pitchText(deg float64) string { return fmt.Sprintf("roof pitch %g°", deg) }
func baseText(base string) string  { return base + " column bases" }

func hoistText(kN float64) string {
	if kN == 0 {
		return "no hoist load"
	}
	return fmt.Sprintf("hoist load %g kN", kN)
}

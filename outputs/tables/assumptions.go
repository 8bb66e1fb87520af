package tables

import (
	"fmt"

	"github.com/spansweep/spansweep/optimize"
)

// Caution is printed at the top and bottom of every table page.
const Caution = "CAUTION: spansweep is a design aid. Verify every design for its site with a qualified structural engineer; local codes and licensed practice govern."

// Assumptions is the header text of a table page, supplied by the caller
// (the grid and catalogue know it; this package does not). Empty fields
// and lists are left out.
type Assumptions struct {
	Title     string // page title, e.g. "Ridgeline Sheds Pty Ltd: gable sheds (illustrative)"
	Maker     string // e.g. "Ridgeline Sheds Pty Ltd (fictional)"
	Generated string // a date or run label; passed in so output stays reproducible
	Version   string // program version
	Grid      string // grid file name and content hash
	Catalogue string // catalogue name and content hash

	Standards   []string // standards and editions, e.g. "AS/NZS 1170.2:2021 Wind actions"
	Defaults    []string // e.g. "roof cladding 0.05 kPa", "purlin spacing at most 1.5 m"
	LimitStates []string // e.g. "rafter deflection under G+Ws ≤ span/150"
	Notes       []string // anything else the page must say
}

// StandardNotes are the reading notes every page carries after the
// caller's assumptions: what a cell shows, what the marks mean.
func (s *Set) StandardNotes() []string {
	notes := []string{
		"Each cell gives the portal frame sections as rafter / column (one name where both are the same), the purlin section at its centre-to-centre spacing, and the total steel mass of the building (frames, purlins, girts, bracing and end walls; fasteners, cladding and footings excluded).",
		"Span is measured between column centrelines; length is bays × bay spacing between end-frame centrelines.",
		"Sections are the lightest passing set found over the catalogue for that size and wind condition; the governing check of each case is in the CSV and the dataset.",
	}
	unsolved, merged := s.marksUsed()
	if unsolved {
		notes = append(notes, fmt.Sprintf("%s marks a size for which no set of catalogue sections passes; the reason is listed under the table.", markNoSolution))
	}
	if merged {
		notes = append(notes, fmt.Sprintf("%s marks a cell that covers more than one case of the grid (a dimension the table does not name varies); it shows the heaviest of them.", markMerged))
	}
	if s.Enveloped {
		notes = append(notes, fmt.Sprintf("%s marks an enveloped cell: its rafter, column or purlin is raised to the heaviest section of any smaller size in the same table (shorter span or length), so sections never get lighter as the building grows. The raised set is not re-checked and its mass is scaled from the design.", markEnveloped))
	}
	if fixed := s.Fixed(); len(fixed) > 0 {
		notes = append(notes, "Every table: "+joinList(fixed)+".")
	}
	return notes
}

func joinList(items []string) string {
	out := ""
	for i, it := range items {
		if i > 0 {
			out += "; "
		}
		out += it
	}
	return out
}

// marksUsed reports whether any cell has no solution, and whether any cell
// covers more than one case, so the notes explain only marks in use.
func (s *Set) marksUsed() (unsolved, merged bool) {
	for _, t := range s.Tables {
		for _, row := range t.Cells {
			for _, c := range row {
				if c == nil {
					continue
				}
				unsolved = unsolved || c.Status != optimize.OK
				merged = merged || c.Cases > 1
			}
		}
	}
	return unsolved, merged
}

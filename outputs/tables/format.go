package tables

import (
	"fmt"
	"strconv"

	"github.com/spansweep/spansweep/optimize"
)

// The cell marks, defined once for every writer.
const (
	markNoSolution = "✕"
	markEnveloped  = "†"
	markMerged     = "‡"
)

// cellLines is what a cell shows, one entry per line, for the Markdown and
// HTML writers; note is the footnote number of a no_solution cell.
func cellLines(c *Cell, note int) []string {
	if c == nil {
		return []string{"–"}
	}
	if c.Status != optimize.OK {
		return []string{fmt.Sprintf("%s no solution [%d]", markNoSolution, note)}
	}
	frame, purlin := c.Frame(), purlinText(c.Purlin)
	if c.Rafter.Raised || c.Column.Raised {
		frame += markEnveloped
	}
	if c.Cases > 1 {
		frame += markMerged
	}
	if c.Purlin.Raised {
		purlin += markEnveloped
	}
	return []string{frame, purlin, massText(c.SteelMassKg)}
}

func purlinText(p Member) string {
	if p.Designation == "" {
		return ""
	}
	return fmt.Sprintf("%s @ %.2f m", p.Designation, p.SpacingM)
}

// massText rounds to the nearest kilogram and groups thousands with a
// comma, e.g. "12,345 kg".
func massText(kg float64) string {
	s := strconv.FormatFloat(kg, 'f', 0, 64)
	var out []byte
	for i := range len(s) {
		if i > 0 && (len(s)-i)%3 == 0 && s[i-1] != '-' {
			out = append(out, ',')
		}
		out = append(out, s[i])
	}
	return string(out) + " kg"
}

func spanText(m float64) string { return fmt.Sprintf("%.1f m", m) }

// note is one no_solution footnote under a table.
type note struct {
	N      int
	Where  string
	Reason string
}

// notes numbers the no_solution cells of a table row by row and returns
// their footnotes; numbers[i][j] is the cell's number, 0 for solved cells.
func notes(t *Table) (numbers [][]int, list []note) {
	numbers = make([][]int, len(t.Cells))
	for i, row := range t.Cells {
		numbers[i] = make([]int, len(row))
		for j, c := range row {
			if c == nil || c.Status == optimize.OK {
				continue
			}
			n := len(list) + 1
			numbers[i][j] = n
			reason := c.Reason
			if reason == "" {
				reason = "no reason recorded"
			}
			list = append(list, note{N: n, Where: fmt.Sprintf("span %s × length %s (case %s)", spanText(t.SpansM[i]), t.Columns[j].Label(), c.CaseID), Reason: reason})
		}
	}
	return numbers, list
}

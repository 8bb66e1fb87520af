package tables

import (
	"fmt"
	"strings"
)

// Table is one span table: rows of span, columns of length.
type Table struct {
	Key     Key
	SpansM  []float64 // row headings, ascending
	Columns []Column  // column headings, ascending length
	// Cells[i][j] is the building of span SpansM[i] and Columns[j]; nil
	// where the grid has no such size.
	Cells [][]*Cell
}

// Set is every table of a sweep, ready to write.
type Set struct {
	Tables    []Table
	Enveloped bool // the envelope was applied
	// Which key fields differ between tables; titles name only those,
	// and the page header states the fixed ones once.
	VariesPitch, VariesBase, VariesHoist bool
}

func (s *Set) noteVarying() {
	if len(s.Tables) == 0 {
		return
	}
	first := s.Tables[0].Key
	for _, t := range s.Tables[1:] {
		s.VariesPitch = s.VariesPitch || t.Key.RoofPitchDeg != first.RoofPitchDeg
		s.VariesBase = s.VariesBase || t.Key.Base != first.Base
		s.VariesHoist = s.VariesHoist || t.Key.HoistKN != first.HoistKN
	}
}

// Title names a table by its wind condition, eaves height and whichever of
// pitch, base and hoist vary across the set.
func (s *Set) Title(t *Table) string {
	parts := []string{"Wind " + t.Key.Wind, fmt.Sprintf("eaves height %.2f m", t.Key.EavesHeightM)}
	if s.VariesPitch {
		parts = append(parts, pitchText(t.Key.RoofPitchDeg))
	}
	if s.VariesBase {
		parts = append(parts, baseText(t.Key.Base))
	}
	if s.VariesHoist {
		parts = append(parts, hoistText(t.Key.HoistKN))
	}
	return strings.Join(parts, ", ")
}

// Fixed lists the key fields shared by every table, for the page header.
func (s *Set) Fixed() []string {
	if len(s.Tables) == 0 {
		return nil
	}
	k := s.Tables[0].Key
	var out []string
	if !s.VariesPitch {
		out = append(out, pitchText(k.RoofPitchDeg))
	}
	if !s.VariesBase {
		out = append(out, baseText(k.Base))
	}
	if !s.VariesHoist {
		out = append(out, hoistText(k.HoistKN))
	}
	return out
}

func pitchText(deg float64) string { return fmt.Sprintf("roof pitch %g°", deg) }
func baseText(base string) string  { return base + " column bases" }

func hoistText(kN float64) string {
	if kN == 0 {
		return "no hoist load"
	}
	return fmt.Sprintf("hoist load %g kN", kN)
}

package tables

import (
	"io"
	"strconv"
)

// CSVHeader is the header row of WriteCSV: one long table, the table key
// in the leading columns, one row per cell that has a case.
var CSVHeader = []string{
	"wind", "eaves_height_m", "roof_pitch_deg", "base", "hoist_kn",
	"span_m", "length_m", "bays", "bay_spacing_m", "case_id", "status",
	"rafter", "rafter_kg_per_m", "column", "column_kg_per_m",
	"purlin", "purlin_kg_per_m", "purlin_spacing_m", "steel_mass_kg",
	"enveloped", "cases", "governing", "reason",
}

// WriteCSV writes every table as one long CSV (header CSVHeader), tables
// in Set order, rows by span, then columns by length. Analysts filter on
// the key columns; a spreadsheet pivots span against length.
func (s *Set) WriteCSV(w io.Writer) error { return writeCSVPage(w, s.bodies()) }

func csvRecord(t *Table, spanM float64, col Column, c *Cell) []string {
	k := t.Key
	return []string{
		k.Wind, num(k.EavesHeightM), num(k.RoofPitchDeg), k.Base, num(k.HoistKN),
		num(spanM), num(col.LengthM), strconv.Itoa(col.Bays), num(col.BaySpacingM),
		c.CaseID, c.Status.String(),
		c.Rafter.Designation, fixed(c.Rafter.KgPerM, 3), c.Column.Designation, fixed(c.Column.KgPerM, 3),
		c.Purlin.Designation, fixed(c.Purlin.KgPerM, 3), num(c.Purlin.SpacingM), fixed(c.SteelMassKg, 1),
		strconv.FormatBool(c.Enveloped()), strconv.Itoa(c.Cases), c.Governing, c.Reason,
	}
}

// num writes a dimension as the shortest decimal that reads back exactly.
func num(v float64) string { return strconv.FormatFloat(v, 'f', -1, 64) }

func fixed(v float64, places int) string { return strconv.FormatFloat(v, 'f', places, 64) }

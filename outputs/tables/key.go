package tables

import (
	"fmt"

	"github.com/spansweep/spansweep/grids"
)

// Key identifies one table: the wind condition and the building
// dimensions that are held fixed across its rows and columns.
type Key struct {
	Wind         string // wind condition label, e.g. "N3" or "A TC2 IL2"
	EavesHeightM float64
	RoofPitchDeg float64
	Base         string // column base fixity, e.g. "pinned"
	HoistKN      float64
}

// Column identifies one column of a table: a building length made of
// Bays equal bays of BaySpacingM.
type Column struct {
	LengthM     float64
	Bays        int
	BaySpacingM float64
}

// Label is the column heading, e.g. "30.0 m (5 × 6.00)".
func (c Column) Label() string {
	return fmt.Sprintf("%.1f m (%d × %.2f)", c.LengthM, c.Bays, c.BaySpacingM)
}

// less orders columns by length, then by bay count.
func (c Column) less(o Column) bool {
	if c.LengthM != o.LengthM {
		return c.LengthM < o.LengthM
	}
	if c.Bays != o.Bays {
		return c.Bays < o.Bays
	}
	return c.BaySpacingM < o.BaySpacingM
}

// caseKey, caseColumn and windLabel are the only places that read
// grids.Case, so a change there touches this file alone.
func caseKey(c grids.Case, wind func(grids.Case) string) Key {
	return Key{
		Wind:         wind(c),
		EavesHeightM: c.EavesHeightM,
		RoofPitchDeg: c.RoofPitchDeg,
		Base:         c.Base,
		HoistKN:      c.HoistKN,
	}
}

func caseColumn(c grids.Case) Column {
	return Column{LengthM: c.LengthM, Bays: c.Bays, BaySpacingM: c.BaySpacingM}
}

// windLabel is the default wind condition label: the case's own.
func windLabel(c grids.Case) string { return c.WindCondition() }

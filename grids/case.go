package grids

import (
	"crypto/sha256"
	"encoding/hex"
	"fmt"
	"iter"
)

// Case is the canonical input of one design: one building on one site.
type Case struct {
	Index int    // position in the grid's enumeration, from 0
	ID    string // stable id from the inputs below; see CaseID

	SpanM        float64 // column centreline to centreline
	LengthM      float64 // Bays × BaySpacingM
	Bays         int
	BaySpacingM  float64
	EavesHeightM float64
	RoofPitchDeg float64
	Wind         Wind
	Base         string  // BasePinned or BaseFixed
	HoistKN      float64 // hoist point load on a rafter; 0 = none

	Options *Options // shared by every case of the grid; do not modify
}

// WindCondition is the case's wind key for tabulation, e.g. "N3".
func (c Case) WindCondition() string { return c.Wind.Key() }

// canonical is the case's inputs written in one fixed form; CaseID hashes it.
func (c Case) canonical() string {
	w := c.Wind
	return fmt.Sprintf("span_m=%s;length_m=%s;bays=%d;bay_spacing_m=%s;eaves_height_m=%s;roof_pitch_deg=%s;"+
		"housing_class=%s;region=%s;terrain_category=%s;importance_level=%d;design_life_years=%d;ms=%s;mt=%s;md=%s;"+
		"base=%s;hoist_kn=%s",
		fmtNum(c.SpanM), fmtNum(c.LengthM), c.Bays, fmtNum(c.BaySpacingM), fmtNum(c.EavesHeightM), fmtNum(c.RoofPitchDeg),
		w.HousingClass, w.Region, fmtNum(w.TerrainCategory), w.ImportanceLevel, w.DesignLifeYears, fmtNum(w.Ms), fmtNum(w.Mt), fmtNum(w.Md),
		c.Base, fmtNum(c.HoistKN))
}

// CaseID returns the stable id of a case's building and site: a readable
// prefix and the first 12 hex digits of the sha256 of its canonical inputs,
// e.g. "s12-l24x4-h3.6-p10-N3-pinned-1f0c9a7e52b4" (k<kN> is added for a
// hoist). The id does not depend on the grid file, the case's index or the
// shared options; the dataset records the grid's hash for those.
func CaseID(c Case) string {
	sum := sha256.Sum256([]byte(c.canonical()))
	prefix := fmt.Sprintf("s%s-l%sx%d-h%s-p%s-%s-%s", fmtNum(c.SpanM), fmtNum(c.LengthM), c.Bays,
		fmtNum(c.EavesHeightM), fmtNum(c.RoofPitchDeg), windPrefix(c.Wind), c.Base)
	if c.HoistKN != 0 {
		prefix += "-k" + fmtNum(c.HoistKN)
	}
	return prefix + "-" + hex.EncodeToString(sum[:6])
}

// Count returns the number of cases in the grid.
func (g *Grid) Count() int { return int(g.count()) }

// Case returns the case at index i of the enumeration, 0 ≤ i < Count. The
// index is read as a mixed-radix number whose digits are, outermost first:
// wind condition, eaves height, span, length, roof pitch, base, hoist.
func (g *Grid) Case(i int) Case {
	if i < 0 || i >= g.Count() {
		panic(fmt.Sprintf("grids: case index %d out of range [0, %d)", i, g.Count()))
	}
	sizes := g.sizes()
	var d [7]int
	rest := i
	for k := len(sizes) - 1; k >= 0; k-- {
		d[k], rest = rest%sizes[k], rest/sizes[k]
	}
	l := g.Lengths[d[3]]
	c := Case{
		Index:        i,
		Wind:         g.Winds[d[0]],
		EavesHeightM: g.EavesHeightsM[d[1]],
		SpanM:        g.SpansM[d[2]],
		LengthM:      l.LengthM,
		Bays:         l.Bays,
		BaySpacingM:  l.BaySpacingM,
		RoofPitchDeg: g.RoofPitchesDeg[d[4]],
		Base:         g.Bases[d[5]],
		HoistKN:      g.HoistsKN[d[6]],
		Options:      &g.Options,
	}
	c.ID = CaseID(c)
	return c
}

// Cases yields every case in enumeration order, one at a time.
func (g *Grid) Cases() iter.Seq[Case] { return g.ShardCases(Shard{}) }

// ShardCases yields the cases of one shard in enumeration order.
func (g *Grid) ShardCases(s Shard) iter.Seq[Case] {
	lo, hi := s.Range(g.Count())
	return func(yield func(Case) bool) {
		for i := lo; i < hi; i++ {
			if !yield(g.Case(i)) {
				return
			}
		}
	}
}

package tables

import (
	"fmt"
	"math"
	"sort"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// Options configures an Accumulator. The zero value is the defaults.
type Options struct {
	// Envelope raises sections so that no larger size lists a lighter
	// section than a smaller one (see Envelope). Default false.
	Envelope bool
	// KgPerM gives a section's mass per metre by designation. Default nil:
	// the member group's mass over its cut length.
	KgPerM KgPerMFunc
	// WindLabel names a case's wind condition. Default nil: the case's
	// own wind condition label.
	WindLabel func(grids.Case) string
}

// Accumulator collects results, in any order, into span tables. It keeps
// one small Cell per case and nothing else of the results; a Stream, which
// takes results in grid order, keeps only the tables being filled.
type Accumulator struct {
	opt       Options
	tables    map[Key]map[position]*Cell
	windFirst map[string]int // lowest case index per wind condition
}

type position struct {
	SpanM  float64
	Column Column
}

// NewAccumulator returns an empty accumulator.
func NewAccumulator(opt Options) *Accumulator {
	if opt.WindLabel == nil {
		opt.WindLabel = windLabel
	}
	return &Accumulator{
		opt:       opt,
		tables:    map[Key]map[position]*Cell{},
		windFirst: map[string]int{},
	}
}

// Add takes one result. A second result on the same table cell (a grid
// that varies something the key does not name) keeps the heavier design
// and counts both.
func (a *Accumulator) Add(r *optimize.Result) error {
	c := r.Case
	if err := checkDimensions(c); err != nil {
		return fmt.Errorf("span tables: case %s: %w", c.ID, err)
	}
	key := caseKey(c, a.opt.WindLabel)
	if first, ok := a.windFirst[key.Wind]; !ok || c.Index < first {
		a.windFirst[key.Wind] = c.Index
	}
	cells := a.tables[key]
	if cells == nil {
		cells = map[position]*Cell{}
		a.tables[key] = cells
	}
	pos := position{SpanM: c.SpanM, Column: caseColumn(c)}
	cell := newCell(r, a.opt.KgPerM)
	if old := cells[pos]; old != nil {
		cell.Cases += old.Cases
		if old.heavier(&cell) {
			old.Cases = cell.Cases
			return nil
		}
	}
	cells[pos] = &cell
	return nil
}

func checkDimensions(c grids.Case) error {
	for _, f := range []struct {
		name  string
		value float64
	}{{"span_m", c.SpanM}, {"length_m", c.LengthM}, {"eaves_height_m", c.EavesHeightM}} {
		if math.IsNaN(f.value) || math.IsInf(f.value, 0) || f.value <= 0 {
			return fmt.Errorf("%s = %v: want a positive finite length", f.name, f.value)
		}
	}
	return nil
}

// Set returns the tables built so far, sorted by wind condition (in the
// order the grid first lists them), eaves height, pitch, base and hoist;
// rows by span and columns by length. With Options.Envelope the sections
// are enveloped. The accumulator is unchanged and may take more results.
func (a *Accumulator) Set() *Set {
	s := &Set{Tables: a.build(), Enveloped: a.opt.Envelope}
	s.noteVarying()
	return s
}

// build lays out (and envelopes) every table, in Set order.
func (a *Accumulator) build() []Table {
	out := make([]Table, 0, len(a.tables))
	for key, cells := range a.tables {
		t := buildTable(key, cells)
		if a.opt.Envelope {
			Envelope(&t)
		}
		out = append(out, t)
	}
	sort.Slice(out, func(i, j int) bool { return keyLess(a.windFirst, out[i].Key, out[j].Key) })
	return out
}

// cells counts the cells the accumulator holds.
func (a *Accumulator) cells() int {
	n := 0
	for _, cells := range a.tables {
		n += len(cells)
	}
	return n
}

// keyLess orders tables by wind condition (lowest case index first, from
// windFirst), then eaves height, pitch, base and hoist.
func keyLess(windFirst map[string]int, k, o Key) bool {
	switch {
	case k.Wind != o.Wind:
		if windFirst[k.Wind] != windFirst[o.Wind] {
			return windFirst[k.Wind] < windFirst[o.Wind]
		}
		return k.Wind < o.Wind
	case k.EavesHeightM != o.EavesHeightM:
		return k.EavesHeightM < o.EavesHeightM
	case k.RoofPitchDeg != o.RoofPitchDeg:
		return k.RoofPitchDeg < o.RoofPitchDeg
	case k.Base != o.Base:
		return k.Base < o.Base
	}
	return k.HoistKN < o.HoistKN
}

// buildTable lays the cells of one key out on rows of span and columns of
// length. Cells are copied, so enveloping a table leaves the accumulator's
// cells as designed.
func buildTable(key Key, cells map[position]*Cell) Table {
	spans := map[float64]bool{}
	cols := map[Column]bool{}
	for p := range cells {
		spans[p.SpanM] = true
		cols[p.Column] = true
	}
	t := Table{Key: key}
	for s := range spans {
		t.SpansM = append(t.SpansM, s)
	}
	sort.Float64s(t.SpansM)
	for c := range cols {
		t.Columns = append(t.Columns, c)
	}
	sort.Slice(t.Columns, func(i, j int) bool { return t.Columns[i].less(t.Columns[j]) })
	t.Cells = make([][]*Cell, len(t.SpansM))
	for i, s := range t.SpansM {
		t.Cells[i] = make([]*Cell, len(t.Columns))
		for j, c := range t.Columns {
			if cell := cells[position{SpanM: s, Column: c}]; cell != nil {
				cp := *cell
				t.Cells[i][j] = &cp
			}
		}
	}
	return t
}

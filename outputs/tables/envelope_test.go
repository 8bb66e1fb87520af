package tables

import (
	"fmt"
	"math"
	"math/rand/v2"
	"testing"

	"github.com/spansweep/spansweep/optimize"
)

func TestEnvelopeRaisesLighterLargerSize(t *testing.T) {
	s := accumulate(t, Options{Envelope: true, KgPerM: lookup}, sampleDesigns())
	tb := s.Tables[2] // N3, 3 m: span 9 × 12 m has rafter C250x2.4, span 9 × 18 m C200x1.9
	c := tb.Cells[0][1]
	if c.Rafter.Designation != "C250x2.4" || !c.Rafter.Raised || !c.Enveloped() {
		t.Fatalf("span 9 × 18 m rafter: got %s raised %v, want C250x2.4 raised", c.Rafter.Designation, c.Rafter.Raised)
	}
	if c.Column.Raised || c.Purlin.Raised {
		t.Errorf("span 9 × 18 m: column raised %v, purlin raised %v; want neither", c.Column.Raised, c.Purlin.Raised)
	}
	// Rafter group: 8 rafters of 4.5 m (4 frames); the design mass
	// 8·4.5·5.05 = 181.8 kg becomes 8·4.5·8.05 = 289.8 kg, so the total
	// 800 + 40·9 + 20·18 + 100·3 = 1820 kg rises by 108 kg.
	if got, want := c.SteelMassKg, 1928.0; math.Abs(got-want) > 1e-9 {
		t.Errorf("enveloped mass: got %g kg, want %g kg", got, want)
	}
	if d := tb.Cells[1][0]; d.Enveloped() {
		t.Errorf("span 12 × 12 m already heavier: got enveloped, want as designed")
	}
	plain := accumulate(t, Options{KgPerM: lookup}, sampleDesigns())
	if plain.Tables[2].Cells[0][1].Rafter.Designation != "C200x1.9" {
		t.Errorf("without the envelope the design section must stand")
	}
}

func TestEnvelopePurlinTakesCloserSpacing(t *testing.T) {
	tb := Table{SpansM: []float64{9, 12}, Columns: []Column{{LengthM: 12, Bays: 2, BaySpacingM: 6}}}
	small := &Cell{Status: optimize.OK, SteelMassKg: 1000, Purlin: Member{Designation: "Z200x1.9", KgPerM: 5.15, SpacingM: 1.2, MassKg: 100}}
	large := &Cell{Status: optimize.OK, SteelMassKg: 1200, Purlin: Member{Designation: "Z150x1.5", KgPerM: 3.15, SpacingM: 1.5, MassKg: 80}}
	tb.Cells = [][]*Cell{{small}, {large}}
	Envelope(&tb)
	p := large.Purlin
	// 80 kg · (5.15/3.15) · (1.5/1.2): heavier section, 1.25 times the lines.
	want := 80 * 5.15 / 3.15 * 1.5 / 1.2
	if p.Designation != "Z200x1.9" || p.SpacingM != 1.2 || math.Abs(p.MassKg-want) > 1e-9 {
		t.Errorf("got %s @ %g m, %g kg; want Z200x1.9 @ 1.2 m, %g kg", p.Designation, p.SpacingM, p.MassKg, want)
	}
	if got := large.SteelMassKg; math.Abs(got-(1200+want-80)) > 1e-9 {
		t.Errorf("total: got %g kg, want %g kg", got, 1200+want-80)
	}
}

// TestEnvelopeIsMonotone checks the envelope's promise on random tables
// with holes and unsolved cells: no cell lists a section lighter than any
// solved cell above or left of it.
func TestEnvelopeIsMonotone(t *testing.T) {
	rng := rand.New(rand.NewPCG(7, 11))
	names := []string{"C150x1.5", "C200x1.9", "C250x2.4", "2C250x2.4", "C300x3.0", "2C300x3.0"}
	for trial := range 50 {
		rows, cols := 1+rng.IntN(6), 1+rng.IntN(6)
		tb := Table{SpansM: make([]float64, rows), Columns: make([]Column, cols), Cells: make([][]*Cell, rows)}
		for i := range rows {
			tb.Cells[i] = make([]*Cell, cols)
			for j := range cols {
				switch rng.IntN(8) {
				case 0: // no such size
				case 1:
					tb.Cells[i][j] = &Cell{Status: optimize.NoSolution}
				default:
					n := names[rng.IntN(len(names))]
					m := Member{Designation: n, KgPerM: testKgPerM[n], MassKg: 100}
					tb.Cells[i][j] = &Cell{Status: optimize.OK, Rafter: m, Column: m, Purlin: m}
				}
			}
		}
		Envelope(&tb)
		if err := checkMonotone(&tb); err != nil {
			t.Fatalf("trial %d: %v", trial, err)
		}
	}
}

func checkMonotone(tb *Table) error {
	for i, row := range tb.Cells {
		for j, c := range row {
			if c == nil || c.Status != optimize.OK {
				continue
			}
			for k := 0; k <= i; k++ {
				for l := 0; l <= j; l++ {
					o := tb.Cells[k][l]
					if o == nil || o.Status != optimize.OK {
						continue
					}
					if c.Rafter.KgPerM < o.Rafter.KgPerM {
						return fmt.Errorf("cell (%d,%d) rafter %s lighter than (%d,%d) %s", i, j, c.Rafter.Designation, k, l, o.Rafter.Designation)
					}
				}
			}
		}
	}
	return nil
}

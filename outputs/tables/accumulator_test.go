package tables

import (
	"bytes"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/optimize"
)

func TestSetLayout(t *testing.T) {
	s := accumulate(t, Options{KgPerM: lookup}, sampleDesigns())
	// 2 wind classes × 2 heights, each 2 spans × 2 lengths (sampleDesigns).
	if len(s.Tables) != 4 {
		t.Fatalf("got %d tables, want 4", len(s.Tables))
	}
	wantOrder := []Key{
		{Wind: "N2", EavesHeightM: 3}, {Wind: "N2", EavesHeightM: 3.6},
		{Wind: "N3", EavesHeightM: 3}, {Wind: "N3", EavesHeightM: 3.6},
	}
	for i, tb := range s.Tables {
		if tb.Key.Wind != wantOrder[i].Wind || tb.Key.EavesHeightM != wantOrder[i].EavesHeightM {
			t.Errorf("table %d: got key %+v, want wind %s height %g", i, tb.Key, wantOrder[i].Wind, wantOrder[i].EavesHeightM)
		}
		if len(tb.SpansM) != 2 || tb.SpansM[0] != 9 || tb.SpansM[1] != 12 {
			t.Errorf("table %d: got spans %v, want [9 12]", i, tb.SpansM)
		}
		if len(tb.Columns) != 2 || tb.Columns[0].LengthM != 12 || tb.Columns[1].Bays != 3 {
			t.Errorf("table %d: got columns %+v, want 12 m (2 bays), 18 m (3 bays)", i, tb.Columns)
		}
	}
	c := s.Tables[0].Cells[1][0] // N2, 3 m, span 12, length 12
	if got, want := c.Frame(), "2C250x2.4 / C250x2.4"; got != want {
		t.Errorf("frame: got %q, want %q", got, want)
	}
	if got, want := purlinText(c.Purlin), "Z150x1.5 @ 1.20 m"; got != want {
		t.Errorf("purlin: got %q, want %q", got, want)
	}
	// 800 + 40·12 + 20·12 + 100·3, the sample's mass rule.
	if got, want := c.SteelMassKg, 1820.0; got != want {
		t.Errorf("mass: got %g, want %g", got, want)
	}
	if got := s.Tables[3].Cells[1][1].Status; got != optimize.NoSolution {
		t.Errorf("N3 3.6 m 12×18: got status %v, want no_solution", got)
	}
	if s.VariesPitch || s.VariesBase || s.VariesHoist {
		t.Errorf("got varying pitch/base/hoist %v/%v/%v, want none", s.VariesPitch, s.VariesBase, s.VariesHoist)
	}
}

func TestWindOrderFollowsGrid(t *testing.T) {
	ds := sampleDesigns()
	for i := range ds { // N3 cases now come first in the grid
		if ds[i].wind == "N3" {
			ds[i].index -= 100
		}
	}
	s := accumulate(t, Options{}, ds)
	if got := s.Tables[0].Key.Wind; got != "N3" {
		t.Errorf("first table: got wind %s, want N3 (lowest case index)", got)
	}
}

// writeAll renders every format into one buffer.
func writeAll(t *testing.T, s *Set) []byte {
	t.Helper()
	var b bytes.Buffer
	if err := s.WriteCSV(&b); err != nil {
		t.Fatal(err)
	}
	if err := s.WriteMarkdown(&b, testAssumptions()); err != nil {
		t.Fatal(err)
	}
	if err := s.WriteHTML(&b, testAssumptions(), A3); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}

func TestDeterministic(t *testing.T) {
	ds := sampleDesigns()
	for _, env := range []bool{false, true} {
		opt := Options{Envelope: env, KgPerM: lookup}
		first := writeAll(t, accumulate(t, opt, ds))
		second := writeAll(t, accumulate(t, opt, ds))
		if !bytes.Equal(first, second) {
			t.Errorf("envelope %v: same results gave different bytes:\n%s", env, lineDiff(string(first), string(second)))
		}
		shuffled := append([]design(nil), ds...)
		rand.New(rand.NewPCG(1, 2)).Shuffle(len(shuffled), func(i, j int) { shuffled[i], shuffled[j] = shuffled[j], shuffled[i] })
		if third := writeAll(t, accumulate(t, opt, shuffled)); !bytes.Equal(first, third) {
			t.Errorf("envelope %v: arrival order changed the bytes:\n%s", env, lineDiff(string(first), string(third)))
		}
	}
}

func TestDuplicateCellKeepsHeavier(t *testing.T) {
	ds := sampleDesigns()[:1]
	heavy := ds[0]
	heavy.index, heavy.massKg, heavy.rafter = 50, ds[0].massKg+500, "C250x2.4"
	for _, order := range [][]design{{ds[0], heavy}, {heavy, ds[0]}} {
		c := accumulate(t, Options{}, order).Tables[0].Cells[0][0]
		if c.SteelMassKg != heavy.massKg || c.Cases != 2 || c.Rafter.Designation != "C250x2.4" {
			t.Errorf("got mass %g, cases %d, rafter %s; want %g, 2, C250x2.4", c.SteelMassKg, c.Cases, c.Rafter.Designation, heavy.massKg)
		}
	}
	failed := ds[0]
	failed.index, failed.reason = 60, "purlin: no passing section"
	c := accumulate(t, Options{}, []design{ds[0], failed}).Tables[0].Cells[0][0]
	if c.Status != optimize.NoSolution {
		t.Errorf("a variant without a solution: got status %v, want no_solution", c.Status)
	}
}

func TestAddRejectsBadDimensions(t *testing.T) {
	for _, tc := range []struct {
		name  string
		edit  func(*design)
		field string
	}{
		{"zero span", func(d *design) { d.spanM = 0 }, "span_m"},
		{"NaN length", func(d *design) { d.lengthM = math.NaN() }, "length_m"},
		{"negative height", func(d *design) { d.heightM = -3 }, "eaves_height_m"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			d := sampleDesigns()[0]
			tc.edit(&d)
			err := NewAccumulator(Options{}).Add(d.result())
			if err == nil || !strings.Contains(err.Error(), tc.field) {
				t.Errorf("got error %v, want one naming %s", err, tc.field)
			}
		})
	}
}

func TestNoSolutionFootnote(t *testing.T) {
	s := accumulate(t, Options{}, sampleDesigns())
	var b bytes.Buffer
	if err := s.WriteMarkdownTable(&b, &s.Tables[3]); err != nil {
		t.Fatal(err)
	}
	md := b.String()
	for _, want := range []string{markNoSolution + " no solution [1]", "1. " + markNoSolution + " span 12.0 m × length 18.0 m (3 × 6.00) (case t015): rafter: no passing section", Caution} {
		if !strings.Contains(md, want) {
			t.Errorf("markdown table lacks %q:\n%s", want, md)
		}
	}
}

func TestCautionTopAndBottom(t *testing.T) {
	s := accumulate(t, Options{}, sampleDesigns())
	for _, f := range []struct {
		name  string
		write func(*bytes.Buffer) error
	}{
		{"markdown", func(b *bytes.Buffer) error { return s.WriteMarkdown(b, Assumptions{}) }},
		{"html", func(b *bytes.Buffer) error { return s.WriteHTML(b, Assumptions{}, "") }},
	} {
		var b bytes.Buffer
		if err := f.write(&b); err != nil {
			t.Fatal(err)
		}
		if n := strings.Count(b.String(), Caution); n != 2 {
			t.Errorf("%s: caution appears %d times, want 2 (top and bottom)", f.name, n)
		}
	}
}

func TestHTMLRejectsUnknownPaper(t *testing.T) {
	s := accumulate(t, Options{}, sampleDesigns())
	err := s.WriteHTML(&bytes.Buffer{}, Assumptions{}, "Letter")
	if err == nil || !strings.Contains(err.Error(), `"Letter"`) {
		t.Errorf("got %v, want an error naming paper \"Letter\"", err)
	}
}

func TestGolden(t *testing.T) {
	for _, env := range []bool{false, true} {
		s := accumulate(t, Options{Envelope: env, KgPerM: lookup}, sampleDesigns())
		suffix := ""
		if env {
			suffix = "_envelope"
		}
		var csvOut, md, html bytes.Buffer
		if err := s.WriteCSV(&csvOut); err != nil {
			t.Fatal(err)
		}
		if err := s.WriteMarkdown(&md, testAssumptions()); err != nil {
			t.Fatal(err)
		}
		if err := s.WriteHTML(&html, testAssumptions(), A4); err != nil {
			t.Fatal(err)
		}
		golden(t, "tables"+suffix+".csv", csvOut.Bytes())
		golden(t, "tables"+suffix+".md", md.Bytes())
		golden(t, "tables"+suffix+".html", html.Bytes())
	}
}

func TestTitlesNameWhatVaries(t *testing.T) {
	ds := sampleDesigns()
	for i := range ds[:8] { // the N2 cases get a second roof pitch
		ds[i].index += 1000
	}
	a := NewAccumulator(Options{})
	for i, d := range ds {
		r := d.result()
		if i < 8 {
			r.Case.RoofPitchDeg = 15
		}
		if err := a.Add(r); err != nil {
			t.Fatal(err)
		}
	}
	s := a.Set()
	if !s.VariesPitch || s.VariesBase || s.VariesHoist {
		t.Fatalf("got varying pitch/base/hoist %v/%v/%v, want pitch only", s.VariesPitch, s.VariesBase, s.VariesHoist)
	}
	if got, want := s.Title(&s.Tables[0]), "Wind N3, eaves height 3.00 m, roof pitch 10°"; got != want {
		t.Errorf("got title %q, want %q", got, want)
	}
	if got := s.Fixed(); len(got) != 2 || got[0] != "pinned column bases" {
		t.Errorf("got fixed %q, want base and hoist", got)
	}
}

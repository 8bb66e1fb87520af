package tables

import (
	"bytes"
	"os"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// streamAll streams results in the given order and renders every format
// as writeAll does for a Set.
func streamAll(t *testing.T, opt Options, rs []*optimize.Result) []byte {
	t.Helper()
	dir := t.TempDir()
	s, err := NewStream(opt, dir)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range rs {
		if err := s.Add(r); err != nil {
			t.Fatalf("Add(%s): %v", r.Case.ID, err)
		}
	}
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
	if err := s.Close(); err != nil {
		t.Fatal(err)
	}
	if left, _ := os.ReadDir(dir); len(left) != 0 {
		t.Errorf("after Close: got %d files in the spool directory, want none", len(left))
	}
	return b.Bytes()
}

func results(ds []design) []*optimize.Result {
	out := make([]*optimize.Result, len(ds))
	for i, d := range ds {
		out[i] = d.result()
	}
	return out
}

// TestStreamMatchesGolden: streamed in grid order, the sample gives the
// golden files the Accumulator's Set gives (testdata, hand-checked).
func TestStreamMatchesGolden(t *testing.T) {
	for _, env := range []bool{false, true} {
		suffix := ""
		if env {
			suffix = "_envelope"
		}
		s, err := NewStream(Options{Envelope: env, KgPerM: lookup}, t.TempDir())
		if err != nil {
			t.Fatal(err)
		}
		for _, r := range results(sampleDesigns()) {
			if err := s.Add(r); err != nil {
				t.Fatal(err)
			}
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
		if err := s.Close(); err != nil {
			t.Fatal(err)
		}
	}
}

// gridResults enumerates a grid as grids.Grid.Case does (wind, eaves
// height, span, length, pitch, base, hoist; outermost first), with eaves
// heights listed out of order and one size without a solution, so pitch,
// base and hoist vary within each group and the table order differs
// from the arrival order.
func gridResults(winds []string, heightsM []float64) []*optimize.Result {
	var out []*optimize.Result
	i := 0
	for _, w := range winds {
		for _, h := range heightsM {
			for _, span := range []float64{12, 9} {
				for _, ln := range []struct {
					m    float64
					bays int
				}{{12, 2}, {18, 3}} {
					for _, pitch := range []float64{15, 10} {
						for _, base := range []string{grids.BasePinned, grids.BaseFixed} {
							d := design{index: i, wind: w, spanM: span, lengthM: ln.m, bays: ln.bays, heightM: h,
								rafter: "C200x1.9", column: "C200x1.9", purlin: "Z150x1.5", spacingM: 1.2,
								massKg: 800 + 40*span + 20*ln.m + 100*h + 10*pitch}
							if span == 9 && pitch == 15 {
								d.rafter = "C250x2.4" // heavier than the larger span: the envelope raises
							}
							if w == "N3" && span == 12 && ln.m == 18 && base == grids.BaseFixed {
								d.reason = "column: no passing section"
							}
							r := d.result()
							r.Case.RoofPitchDeg, r.Case.Base, r.Case.HoistKN = pitch, base, 5
							out = append(out, r)
							i++
						}
					}
				}
			}
		}
	}
	return out
}

// TestStreamEqualsAccumulator: the Accumulator, which holds every case, is
// the reference; the stream must give the same bytes in every format.
func TestStreamEqualsAccumulator(t *testing.T) {
	rs := gridResults([]string{"N3", "C1", "N2"}, []float64{3.6, 3, 4.2})
	for _, env := range []bool{false, true} {
		opt := Options{Envelope: env, KgPerM: lookup}
		a := NewAccumulator(opt)
		for _, r := range rs {
			if err := a.Add(r); err != nil {
				t.Fatal(err)
			}
		}
		want := writeAll(t, a.Set())
		if got := streamAll(t, opt, rs); !bytes.Equal(got, want) {
			t.Errorf("envelope %v: stream differs from the accumulator:\n%s", env, lineDiff(string(want), string(got)))
		}
	}
}

// TestStreamHoldsOneGroup guards the memory bound: however many cases
// stream through, the cells held are at most one group's (2 spans × 2
// lengths × 2 pitches × 2 bases = 16, gridResults), and the finished
// tables are spooled, not kept.
func TestStreamHoldsOneGroup(t *testing.T) {
	const perGroup = 16
	for _, groups := range []int{2, 60} {
		heights := make([]float64, groups/2)
		for k := range heights {
			heights[k] = 2.4 + 0.1*float64(k)
		}
		rs := gridResults([]string{"N2", "N3"}, heights)
		s, err := NewStream(Options{}, t.TempDir())
		if err != nil {
			t.Fatal(err)
		}
		most := 0
		for _, r := range rs {
			if err := s.Add(r); err != nil {
				t.Fatal(err)
			}
			most = max(most, s.heldCells())
		}
		if most != perGroup {
			t.Errorf("%d groups (%d cases): at most %d cells held, want %d (one group)", groups, len(rs), most, perGroup)
		}
		if err := s.WriteCSV(&bytes.Buffer{}); err != nil {
			t.Fatal(err)
		}
		// 4 tables per group: 2 pitches × 2 bases.
		if s.heldCells() != 0 || s.Tables() != 4*groups {
			t.Errorf("%d groups: after writing, %d cells held and %d tables spooled; want 0 and %d", groups, s.heldCells(), s.Tables(), 4*groups)
		}
		s.Close()
	}
}

func TestStreamRejectsAFinishedGroup(t *testing.T) {
	rs := gridResults([]string{"N2", "N3"}, []float64{3})
	s, err := NewStream(Options{}, t.TempDir())
	if err != nil {
		t.Fatal(err)
	}
	defer s.Close()
	for _, r := range rs {
		if err := s.Add(r); err != nil {
			t.Fatal(err)
		}
	}
	err = s.Add(rs[0]) // N2 at 3 m finished when N3 began
	if err == nil || !strings.Contains(err.Error(), "wind N2, eaves height 3 m") {
		t.Errorf("got %v, want an error naming the finished group (wind N2, eaves height 3 m)", err)
	}
}

func TestStreamRejectsBadDimensions(t *testing.T) {
	s, err := NewStream(Options{}, t.TempDir())
	if err != nil {
		t.Fatal(err)
	}
	defer s.Close()
	r := sampleDesigns()[0].result()
	r.Case.EavesHeightM = -3
	if err := s.Add(r); err == nil || !strings.Contains(err.Error(), "eaves_height_m") {
		t.Errorf("got %v, want an error naming eaves_height_m", err)
	}
}

package plots

import (
	"bytes"
	"fmt"
	"math"
	"reflect"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// TestChartsEqualCollector: fed in grid order, the charts built as results
// arrive draw the same bytes, and return the same fits and categories, as
// the Collector that keeps every point (the reference; its charts are the
// golden files).
func TestChartsEqualCollector(t *testing.T) {
	rs := testResults()
	col := collect(rs)
	for _, p := range []MassPlot{{Select: AtSize(3.6, 24)}, {PerFloorArea: true}, {Title: "every size"}} {
		var want, got bytes.Buffer
		wantFits, err := col.MassAgainstSpan(&want, p)
		if err != nil {
			t.Fatal(err)
		}
		m := NewMassChart(nil, p)
		for _, r := range rs {
			if err := m.Add(r); err != nil {
				t.Fatal(err)
			}
		}
		gotFits, err := m.WriteSVG(&got)
		if err != nil {
			t.Fatal(err)
		}
		if !bytes.Equal(got.Bytes(), want.Bytes()) || !reflect.DeepEqual(gotFits, wantFits) {
			t.Errorf("%+v: mass chart differs from the collector's:\n%s", p, lineDiff(want.String(), got.String()))
		}
	}
	for _, gm := range []GoverningMap{{}, {Role: optimize.RoleColumn, Rows: RowsLength}} {
		var want, got bytes.Buffer
		wantCats, err := col.GoverningCheckMap(&want, gm)
		if err != nil {
			t.Fatal(err)
		}
		g, err := NewGoverningChart(nil, gm)
		if err != nil {
			t.Fatal(err)
		}
		for _, r := range rs {
			g.Add(r)
		}
		gotCats, err := g.WriteSVG(&got)
		if err != nil {
			t.Fatal(err)
		}
		if !bytes.Equal(got.Bytes(), want.Bytes()) || !reflect.DeepEqual(gotCats, wantCats) {
			t.Errorf("%+v: governing chart differs from the collector's:\n%s", gm, lineDiff(want.String(), got.String()))
		}
	}
}

// manyResults is testResults' mass rule over the first winds of the
// housing classes and lengths 24, 30, … m, in grid order (wind outermost):
// every case solved.
func manyResults(winds, lengths int) []*optimize.Result {
	classes := []string{"N1", "N2", "N3", "N4", "N5", "N6", "C1", "C2", "C3", "C4"}
	var out []*optimize.Result
	for _, w := range classes[:winds] {
		for _, span := range testSpansM {
			for k := range lengths {
				length := 24 + 6*float64(k)
				mass := 10 * math.Pow(span, 1.6) * length / 24
				i := len(out)
				c := grids.Case{Index: i, ID: fmt.Sprintf("m%04d", i), SpanM: span, LengthM: length,
					Bays: int(length / 6), BaySpacingM: 6, EavesHeightM: 3.6, RoofPitchDeg: 10,
					Wind: grids.Wind{HousingClass: w}, Base: grids.BasePinned}
				out = append(out, &optimize.Result{Case: c, SteelMassKg: mass, MassPerFloorKgM2: mass / (span * length),
					Members: []optimize.MemberGroup{{Role: optimize.RoleRafter, MassKg: mass, Governing: optimize.Governing{Check: "combined axial and bending"}}}})
			}
		}
	}
	return out
}

// TestChartsHoldBoundedState guards the memory bound: the mass chart holds
// the values of one wind condition at most (5 spans × lengths), however
// many conditions stream through, and the map one case per cell (winds ×
// 5 spans), however many lengths fall on each.
func TestChartsHoldBoundedState(t *testing.T) {
	for _, tc := range []struct{ winds, lengths int }{{2, 3}, {10, 3}, {10, 12}} {
		rs := manyResults(tc.winds, tc.lengths)
		m := NewMassChart(nil, MassPlot{PerFloorArea: true})
		g, err := NewGoverningChart(nil, GoverningMap{})
		if err != nil {
			t.Fatal(err)
		}
		most := 0
		for _, r := range rs {
			if err := m.Add(r); err != nil {
				t.Fatal(err)
			}
			g.Add(r)
			most = max(most, m.held())
		}
		if perWind := len(testSpansM) * tc.lengths; most != perWind {
			t.Errorf("%d winds × %d lengths: the mass chart held up to %d values, want %d (one wind condition's)", tc.winds, tc.lengths, most, perWind)
		}
		if cells := tc.winds * len(testSpansM); len(g.best) != cells {
			t.Errorf("%d winds × %d lengths: the map holds %d cases, want %d (one per cell)", tc.winds, tc.lengths, len(g.best), cells)
		}
		fits, err := m.WriteSVG(&bytes.Buffer{})
		if err != nil {
			t.Fatal(err)
		}
		// mass / floor area = (10/24)·span^0.6 exactly (manyResults).
		for _, f := range fits {
			if f.Fit == nil || math.Abs(f.Fit.B-0.6) > 1e-6 || math.Abs(f.Fit.A-10.0/24)/(10.0/24) > 1e-6 {
				t.Errorf("%s: got fit %+v, want a = %g, b = 0.6", f.Wind, f.Fit, 10.0/24)
			}
		}
		if m.held() != 0 {
			t.Errorf("after writing: %d values held, want 0", m.held())
		}
	}
}

func TestMassChartRejectsAFittedWind(t *testing.T) {
	rs := manyResults(2, 1)
	m := NewMassChart(nil, MassPlot{})
	for _, r := range rs {
		if err := m.Add(r); err != nil {
			t.Fatal(err)
		}
	}
	err := m.Add(rs[0]) // N1 was fitted when N2 began
	if err == nil || !strings.Contains(err.Error(), "wind N1") {
		t.Errorf("got %v, want an error naming wind N1", err)
	}
}

package plots

import (
	"bytes"
	"math"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
)

func TestMassAgainstSpan(t *testing.T) {
	c := collect(testResults())
	var b bytes.Buffer
	fits, err := c.MassAgainstSpan(&b, MassPlot{Select: AtSize(3.6, 24)})
	if err != nil {
		t.Fatal(err)
	}
	if len(fits) != len(testTrends) {
		t.Fatalf("got %d fits, want %d", len(fits), len(testTrends))
	}
	for i, tr := range testTrends {
		f := fits[i]
		if f.Wind != tr.wind || f.Fit == nil {
			t.Fatalf("fit %d: got wind %s, fit %v; want %s with a fit", i, f.Wind, f.Fit, tr.wind)
		}
		// At 24 m the synthetic mass is exactly a·span^b (testResults).
		if math.Abs(f.Fit.A-tr.a)/tr.a > 1e-6 || math.Abs(f.Fit.B-tr.b)/tr.b > 1e-6 {
			t.Errorf("%s: got a = %.9g, b = %.9g; want %g, %g", tr.wind, f.Fit.A, f.Fit.B, tr.a, tr.b)
		}
		if f.Points != len(testSpansM) {
			t.Errorf("%s: got %d points, want %d", tr.wind, f.Points, len(testSpansM))
		}
	}
	byName, byClass := elementCounts(t, b.Bytes())
	if byName["path"] != len(testTrends) || byClass["series"] != len(testTrends) {
		t.Errorf("got %d paths (%d series), want one per wind condition (%d)", byName["path"], byClass["series"], len(testTrends))
	}
	if byClass["trend"] != len(testTrends) {
		t.Errorf("got %d trend lines, want %d", byClass["trend"], len(testTrends))
	}
	svg := b.String()
	for _, want := range []string{"Span (m)", "Total steel mass (kg)", Caution, "N3", "b = 1.600"} {
		if !strings.Contains(svg, want) {
			t.Errorf("chart lacks %q", want)
		}
	}
	golden(t, "mass_span.svg", b.Bytes())
}

func TestMassPerFloorAreaAcrossAll(t *testing.T) {
	c := collect(testResults())
	var b bytes.Buffer
	fits, err := c.MassAgainstSpan(&b, MassPlot{PerFloorArea: true})
	if err != nil {
		t.Fatal(err)
	}
	// Per floor area the synthetic rule is a·span^(b−1)/24 at any length
	// (mass ∝ length), so the fit over both lengths is exact.
	for i, tr := range testTrends {
		f := fits[i].Fit
		if math.Abs(f.A-tr.a/24)/(tr.a/24) > 1e-6 || math.Abs(f.B-(tr.b-1))/(tr.b-1) > 1e-6 {
			t.Errorf("%s: got a = %.9g, b = %.9g; want %g, %g", tr.wind, f.A, f.B, tr.a/24, tr.b-1)
		}
	}
	// C2 loses its unsolved case: 5 spans × 2 lengths − 1.
	if got := fits[2].Points; got != 9 {
		t.Errorf("C2: got %d points, want 9 (unsolved case left out)", got)
	}
	if !strings.Contains(b.String(), "kg/m²") {
		t.Errorf("chart lacks the kg/m² axis unit")
	}
	golden(t, "mass_per_area_span.svg", b.Bytes())
}

func TestMassPlotDeterministic(t *testing.T) {
	var first, second bytes.Buffer
	if _, err := collect(testResults()).MassAgainstSpan(&first, MassPlot{}); err != nil {
		t.Fatal(err)
	}
	rs := testResults()
	for i, j := 0, len(rs)-1; i < j; i, j = i+1, j-1 { // arrival order reversed
		rs[i], rs[j] = rs[j], rs[i]
	}
	if _, err := collect(rs).MassAgainstSpan(&second, MassPlot{}); err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(first.Bytes(), second.Bytes()) {
		t.Errorf("same results gave different SVG:\n%s", lineDiff(first.String(), second.String()))
	}
}

func TestMassPlotOneSpanHasNoTrend(t *testing.T) {
	c := collect(testResults())
	fits, err := c.MassAgainstSpan(&bytes.Buffer{}, MassPlot{Select: func(cs grids.Case) bool { return cs.SpanM == 12 }})
	if err != nil {
		t.Fatal(err)
	}
	for _, f := range fits {
		if f.Fit != nil {
			t.Errorf("%s: got a trend from one span, want none", f.Wind)
		}
	}
}

func TestMassPlotNothingSelected(t *testing.T) {
	_, err := collect(testResults()).MassAgainstSpan(&bytes.Buffer{}, MassPlot{Select: AtSize(99, 99)})
	if err == nil || !strings.Contains(err.Error(), "no solved case selected") {
		t.Errorf("got %v, want an error saying no case was selected", err)
	}
}

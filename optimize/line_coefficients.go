package optimize

import (
	"fmt"
	"math"
	"sync"

	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/grids"
)

// lapFraction is the lap length each side of an interior support of a
// lapped line, as a fraction of the span. Common practice, no source: laps
// of about a tenth of the span each side, which also meets the R-factor
// method's lap ≥ 1.5 d for the catalogue's depths at usual spans
// (AS/NZS 4600:2018 cl. 3.3.3.4, from memory).
const lapFraction = 0.1

// lineCoefficients is a purlin or girt line's response to a uniform load w
// on every span L of a line of constant E·I (doubled over laps), as
// multiples of wL², wL and wL⁴/EI. Moments are magnitudes on one section:
// over a lap the two sections share the support moment equally.
type lineCoefficients struct {
	Sag, Hog                      float64 // × wL²: largest span and support moments
	Shear                         float64 // × wL: largest shear on one section
	EndReaction, InteriorReaction float64 // × wL
	Deflection                    float64 // × wL⁴/EI: largest span deflection
}

// simpleSpan is the single span: wL²/8, wL/2, 5wL⁴/384EI
// (AISC beam formulas, REFERENCE-VALUES §7.7, confirmed: S12).
var simpleSpan = lineCoefficients{Sag: 1.0 / 8, Shear: 0.5, EndReaction: 0.5, Deflection: 5.0 / 384}

// pieceSpans returns how many spans one analysed line has for a span type:
// continuous lines are two-span pieces, lapped lines run over every frame.
func pieceSpans(spanType string, bays int) int {
	switch spanType {
	case grids.SpanContinuous:
		return 2
	case grids.SpanLapped:
		return bays
	}
	return 1
}

type coefficientKey struct {
	spans  int
	lapped bool
}

var coefficientCache sync.Map // coefficientKey → lineCoefficients

// coefficientsFor returns the line coefficients of a span type over a
// number of bays, solving the line once per shape and caching it. A
// continuous line of an odd number of bays has one single-span piece per
// line, so it takes the envelope with the simple span.
func coefficientsFor(spanType string, bays int) (lineCoefficients, error) {
	n := pieceSpans(spanType, bays)
	if n == 1 {
		return simpleSpan, nil
	}
	if spanType == grids.SpanContinuous && bays < 2 {
		return lineCoefficients{}, fmt.Errorf("continuous span type needs at least 2 bays, got %d", bays)
	}
	key := coefficientKey{spans: n, lapped: spanType == grids.SpanLapped}
	if c, ok := coefficientCache.Load(key); ok {
		return envelopeOdd(c.(lineCoefficients), spanType, bays), nil
	}
	c, err := solveLine(key)
	if err != nil {
		return lineCoefficients{}, err
	}
	coefficientCache.Store(key, c)
	return envelopeOdd(c, spanType, bays), nil
}

func envelopeOdd(c lineCoefficients, spanType string, bays int) lineCoefficients {
	if spanType != grids.SpanContinuous || bays%2 == 0 {
		return c
	}
	c.Sag = math.Max(c.Sag, simpleSpan.Sag)
	c.Deflection = math.Max(c.Deflection, simpleSpan.Deflection)
	c.EndReaction = math.Max(c.EndReaction, simpleSpan.EndReaction)
	return c
}

// solveLine analyses a unit line built by analysis.NewPurlinLine: spans of
// 1000 mm under 1 N/mm, with E·I doubled over the laps of a lapped line.
func solveLine(k coefficientKey) (lineCoefficients, error) {
	const (
		L = 1000.0 // mm
		E = 200000.0
		I = 1e6
		w = 1.0 // N/mm, toward the supports
	)
	spec := analysis.PurlinLineSpec{Spans: k.spans, SpanMM: L, Type: analysis.ContinuousSpans,
		Section: analysis.Section{E: E, A: 1e4, I: I}}
	if k.lapped {
		spec.Type, spec.LapMM = analysis.LappedSpans, lapFraction*L
	}
	pl, err := analysis.NewPurlinLine(spec)
	if err != nil {
		return lineCoefficients{}, err
	}
	var lc analysis.LoadCase
	pl.Uniform(&lc, w)
	var ws analysis.Workspace
	sol, err := ws.Solve(&pl.Frame, []analysis.LoadCase{lc})
	if err != nil {
		return lineCoefficients{}, fmt.Errorf("line of %d spans: %w", k.spans, err)
	}
	comb := analysis.Primary(0)
	var c lineCoefficients
	for m, mem := range pl.Frame.Members {
		share := 1.0
		if mem.I > I {
			share = 0.5 // two sections share the moment and shear over a lap
		}
		e := sol.Extremes(comb, m)
		c.Sag = math.Max(c.Sag, e.MaxM.Value/(w*L*L))
		c.Hog = math.Max(c.Hog, -e.MinM.Value*share/(w*L*L))
		c.Shear = math.Max(c.Shear, math.Max(e.MaxV.Value, -e.MinV.Value)*share/(w*L))
		d, _ := sol.MaxDeflection(comb, m)
		c.Deflection = math.Max(c.Deflection, math.Abs(d)*E*I/(w*L*L*L*L))
	}
	for i, n := range pl.Supports {
		r := sol.Reaction(comb, n)[1] / (w * L)
		if i == 0 || i == len(pl.Supports)-1 {
			c.EndReaction = math.Max(c.EndReaction, r)
		} else {
			c.InteriorReaction = math.Max(c.InteriorReaction, r)
		}
	}
	return c, nil
}

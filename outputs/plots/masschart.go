package plots

import (
	"fmt"
	"math"
	"sort"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// MassChart builds one mass-against-span chart as results arrive, in
// memory bounded by the wind conditions and spans, not the cases: per wind
// condition it keeps the sum and count at each span (the mean line) and,
// only until the next wind condition begins, the plotted values its trend
// is fitted to (16 bytes a case of one wind condition). Results must come
// grouped by wind condition, as a grid enumerates them (wind outermost);
// Collector.MassAgainstSpan takes any order and draws the same bytes.
type MassChart struct {
	plot      MassPlot
	windLabel func(grids.Case) string
	seal      bool // fit and drop a wind condition's values when another begins
	series    map[string]*windSeries
	open      *windSeries // the condition taking values
	seen      int         // results added
	solved    int         // cases plotted
	// Axis ranges over every plotted case.
	minSpanM, maxSpanM, maxValue float64
}

// windSeries is one wind condition's share of a MassChart.
type windSeries struct {
	wind        string
	first       int // lowest case index, for the legend order
	points      int
	sums        map[float64]*spanSum
	spans, vals []float64 // every plotted case, in arrival order, until sealed
	sealed      bool
	fit         *PowerFit
	err         error // fitting failed
}

// spanSum is the running sum, in arrival order, and count at one span.
type spanSum struct {
	sum float64
	n   int
}

// NewMassChart returns an empty chart of plot p. windLabel names a case's
// wind condition; nil means the case's own label.
func NewMassChart(windLabel func(grids.Case) string, p MassPlot) *MassChart {
	return newMassChart(orWindCondition(windLabel), p, true)
}

func newMassChart(windLabel func(grids.Case) string, p MassPlot, seal bool) *MassChart {
	return &MassChart{plot: p, windLabel: windLabel, seal: seal, series: map[string]*windSeries{},
		minSpanM: math.Inf(1), maxSpanM: math.Inf(-1), maxValue: math.Inf(-1)}
}

// Add takes one result. A solved, selected case of a wind condition whose
// values were already fitted (another condition came in between) is an
// error.
func (m *MassChart) Add(r *optimize.Result) error {
	p := pointOf(r, m.windLabel)
	return m.add(&p)
}

// Solved returns the number of cases plotted so far.
func (m *MassChart) Solved() int { return m.solved }

func (m *MassChart) add(p *Point) error {
	m.seen++
	if !p.Solved || (m.plot.Select != nil && !m.plot.Select(p.Case)) {
		return nil
	}
	ws := m.series[p.Wind]
	if ws == nil {
		ws = &windSeries{wind: p.Wind, first: p.Case.Index, sums: map[float64]*spanSum{}}
		m.series[p.Wind] = ws
	}
	if ws.sealed {
		return fmt.Errorf("plots: mass against span: case %s: wind %s was already fitted when it arrived; "+
			"a MassChart takes results grouped by wind condition, as the grid enumerates them (a Collector takes any order)", p.Case.ID, p.Wind)
	}
	if m.seal && m.open != nil && m.open != ws {
		m.open.sealSeries()
	}
	m.open = ws
	v := p.SteelMassKg
	if m.plot.PerFloorArea {
		v = p.MassPerFloorKgM2
	}
	ws.first = min(ws.first, p.Case.Index)
	ws.points++
	sum := ws.sums[p.Case.SpanM]
	if sum == nil {
		sum = &spanSum{}
		ws.sums[p.Case.SpanM] = sum
	}
	sum.sum += v
	sum.n++
	ws.spans, ws.vals = append(ws.spans, p.Case.SpanM), append(ws.vals, v)
	m.solved++
	m.minSpanM, m.maxSpanM = math.Min(m.minSpanM, p.Case.SpanM), math.Max(m.maxSpanM, p.Case.SpanM)
	m.maxValue = math.Max(m.maxValue, v)
	return nil
}

// sealSeries fits the condition's trend to its values and drops them.
func (ws *windSeries) sealSeries() {
	if ws.sealed {
		return
	}
	ws.sealed = true
	if len(ws.sums) >= 2 {
		f, err := FitPower(ws.spans, ws.vals)
		if err != nil {
			ws.err = fmt.Errorf("plots: mass against span: wind %s: %w", ws.wind, err)
		} else {
			ws.fit = &f
		}
	}
	ws.spans, ws.vals = nil, nil
}

// lines fits every condition not yet fitted and returns the lines in the
// grid's order of wind conditions (lowest case index first).
func (m *MassChart) lines() ([]series, error) {
	if m.solved == 0 {
		return nil, fmt.Errorf("plots: mass against span: no solved case selected (of %d collected)", m.seen)
	}
	first := make(map[string]int, len(m.series))
	for w, ws := range m.series {
		first[w] = ws.first
	}
	var out []series
	for _, w := range keysByValue(first) {
		ws := m.series[w]
		ws.sealSeries()
		if ws.err != nil {
			return nil, ws.err
		}
		sr := series{wind: w, points: ws.points, fit: ws.fit}
		for x := range ws.sums {
			sr.meanX = append(sr.meanX, x)
		}
		sort.Float64s(sr.meanX)
		sr.meanY = make([]float64, len(sr.meanX))
		for k, x := range sr.meanX {
			sr.meanY[k] = ws.sums[x].sum / float64(ws.sums[x].n)
		}
		out = append(out, sr)
	}
	m.open = nil
	return out, nil
}

// held counts the plotted values the chart holds for fitting; the tests
// check it stays within one wind condition's.
func (m *MassChart) held() int {
	n := 0
	for _, ws := range m.series {
		n += len(ws.vals)
	}
	return n
}

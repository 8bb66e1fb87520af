package plots

import (
	"fmt"
	"io"
	"math"
	"strings"

	"github.com/spansweep/spansweep/grids"
)

// MassPlot configures a mass chart (MassChart, Collector.MassAgainstSpan);
// the zero value plots the total
// steel mass of every solved case.
type MassPlot struct {
	// Select keeps the cases to plot; nil keeps all. Total mass mixes
	// building sizes unless Select fixes them (see AtSize).
	Select func(grids.Case) bool
	// PerFloorArea plots steel mass per floor area (kg/m²) instead of
	// total steel mass (kg).
	PerFloorArea bool
	// Title heads the chart; "" gives a title naming the quantity.
	Title string
}

// WindFit is the trend of one wind condition. Fit is nil when the
// condition has fewer than two distinct spans among the plotted cases.
type WindFit struct {
	Wind   string
	Points int // solved cases plotted
	Fit    *PowerFit
}

// series is one wind condition's line as drawn.
type series struct {
	wind         string
	points       int       // solved cases plotted
	meanX, meanY []float64 // mean per span, ascending span
	fit          *PowerFit
}

// WriteSVG writes the chart: one line per wind condition through the mean
// value at each span, and that condition's trend value = A·span^B fitted to
// every plotted case. It returns the trends in legend order (the grid's
// order of wind conditions). Unsolved cases are left out. It ends the
// chart: it takes no more results.
func (m *MassChart) WriteSVG(w io.Writer) ([]WindFit, error) {
	all, err := m.lines()
	if err != nil {
		return nil, err
	}
	fits := make([]WindFit, len(all))
	for i := range all {
		fits[i] = WindFit{Wind: all[i].wind, Points: all[i].points, Fit: all[i].fit}
	}
	ch := massChart
	// The legend runs down the right; a long one makes the page taller.
	ch.height = math.Max(ch.height, ch.top+34+32*float64(len(all))+60)
	ax := axes{c: ch, xTicks: niceTicks(m.minSpanM, m.maxSpanM, 6), yTicks: niceTicks(0, m.maxValue, 6)}
	p := m.plot
	title, yTitle := "Total steel mass against span", "Total steel mass (kg)"
	if p.PerFloorArea {
		title, yTitle = "Steel mass per floor area against span", "Steel mass per floor area (kg/m²)"
	}
	if p.Title != "" {
		title = p.Title
	}
	s := newSVG(ch.width, ch.height)
	heading(s, ch, title)
	ax.draw(s, "Span (m)", yTitle)
	for i := range all {
		drawSeries(s, ax, i, &all[i])
	}
	drawMassLegend(s, ch, all, p.PerFloorArea)
	if err := s.finish(w); err != nil {
		return nil, fmt.Errorf("plots: mass against span: %w", err)
	}
	return fits, nil
}

// drawSeries writes the condition's data line (the one path per
// condition), its markers and its trend (a polyline).
func drawSeries(s *svg, ax axes, i int, sr *series) {
	colour, dash := windStyle(i)
	s.open("g", "class", "wind", "data-wind", sr.wind)
	if sr.fit != nil {
		lo, hi := sr.meanX[0], sr.meanX[len(sr.meanX)-1]
		const n = 40
		xs, ys := make([]float64, n+1), make([]float64, n+1)
		for k := range xs {
			x := lo + (hi-lo)*float64(k)/n
			xs[k], ys[k] = ax.x(x), ax.y(sr.fit.At(x))
		}
		s.elem("polyline", "class", "trend", "points", pointsAttr(xs, ys), "fill", "none",
			"stroke", colour, "stroke-width", "1", "stroke-dasharray", "2 3", "opacity", "0.8")
	}
	px, py := make([]float64, len(sr.meanX)), make([]float64, len(sr.meanX))
	for k := range sr.meanX {
		px[k], py[k] = ax.x(sr.meanX[k]), ax.y(sr.meanY[k])
	}
	attrs := []string{"class", "series", "d", pathData(px, py), "fill", "none", "stroke", colour, "stroke-width", "2"}
	if dash != "" {
		attrs = append(attrs, "stroke-dasharray", dash)
	}
	s.elem("path", attrs...)
	for k := range px {
		s.elem("circle", "cx", f2(px[k]), "cy", f2(py[k]), "r", "3", "fill", colour)
	}
	s.close("g")
}

func drawMassLegend(s *svg, ch chart, all []series, perArea bool) {
	x, y := ch.right+24, ch.top+4
	unit := "kg"
	if perArea {
		unit = "kg/m²"
	}
	s.open("g", "class", "legend", "font-size", "11", "fill", "#1d2327")
	s.text(x, y, "Wind condition (line: mean per span)", "font-weight", "bold")
	s.text(x, y+14, "dotted: trend "+unit+" = a·span^b", "font-size", "9.5")
	y += 34
	for i := range all {
		colour, dash := windStyle(i)
		attrs := []string{"x1", f2(x), "y1", f2(y - 4), "x2", f2(x + 22), "y2", f2(y - 4), "stroke", colour, "stroke-width", "2"}
		if dash != "" {
			attrs = append(attrs, "stroke-dasharray", dash)
		}
		s.elem("line", attrs...)
		s.text(x+28, y, all[i].wind)
		if f := all[i].fit; f != nil {
			s.text(x+28, y+13, fmt.Sprintf("a = %s, b = %.3f, R² = %.3f", sig4(f.A), f.B, f.R2), "font-size", "9.5", "fill", "#44525b")
		} else {
			s.text(x+28, y+13, "one span: no trend", "font-size", "9.5", "fill", "#44525b")
		}
		y += 32
	}
	s.close("g")
}

// sig4 writes v to four significant figures.
func sig4(v float64) string { return strings.TrimSuffix(fmt.Sprintf("%.4g", v), ".") }

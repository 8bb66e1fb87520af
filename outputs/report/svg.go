package report

import (
	"fmt"
	"html"
	"math"
	"strings"

	"github.com/spansweep/spansweep/optimize"
)

// Size of a force diagram figure, in SVG user units (px).
const (
	svgWidth   = 520
	svgHeight  = 220
	svgMarginL = 56
	svgMarginR = 16
	svgMarginT = 16
	svgMarginB = 36
)

// momentSVG draws a part's bending moment along its length: the moment
// curve over the part's axis, filled to the axis, positive (tension on the
// inside face) plotted up, with the extreme values labelled.
func momentSVG(d optimize.MemberDiagram, title string) string {
	n := min(len(d.StationsM), len(d.MomentKNm))
	var b strings.Builder
	fmt.Fprintf(&b, `<svg xmlns="http://www.w3.org/2000/svg" class="diagram" width="%d" height="%d" viewBox="0 0 %d %d" role="img">`,
		svgWidth, svgHeight, svgWidth, svgHeight)
	fmt.Fprintf(&b, `<title>%s</title><g font-family="Arial, sans-serif" font-size="10" fill="#1d2327">`, html.EscapeString(title))
	if n < 2 {
		fmt.Fprintf(&b, `<text x="%d" y="%d">no values</text></g></svg>`, svgMarginL, svgHeight/2)
		return b.String()
	}
	sc := newScale(d.StationsM[:n], d.MomentKNm[:n])
	x0, y0 := sc.x(d.StationsM[0]), sc.y(0)
	// Filled area between the axis and the curve.
	pts := []string{pt(x0, y0)}
	for i := range n {
		pts = append(pts, pt(sc.x(d.StationsM[i]), sc.y(d.MomentKNm[i])))
	}
	pts = append(pts, pt(sc.x(d.StationsM[n-1]), y0))
	fmt.Fprintf(&b, `<polygon points="%s" fill="#b9d3e4" stroke="none"/>`, strings.Join(pts, " "))
	fmt.Fprintf(&b, `<polyline points="%s" fill="none" stroke="#1f5d86" stroke-width="1.5"/>`, strings.Join(pts[1:len(pts)-1], " "))
	fmt.Fprintf(&b, `<line x1="%s" y1="%s" x2="%s" y2="%s" stroke="#1d2327" stroke-width="1"/>`, f1(x0), f1(y0), f1(sc.x(d.StationsM[n-1])), f1(y0))
	// Frame of the plot area and its labels.
	fmt.Fprintf(&b, `<rect x="%d" y="%d" width="%d" height="%d" fill="none" stroke="#8a9aa5" stroke-width="0.5"/>`, svgMarginL, svgMarginT,
		svgWidth-svgMarginL-svgMarginR, svgHeight-svgMarginT-svgMarginB)
	fmt.Fprintf(&b, `<text x="%d" y="%d" text-anchor="middle">station (m), 0 to %s</text>`,
		(svgWidth+svgMarginL-svgMarginR)/2, svgHeight-10, num(d.StationsM[n-1], 2))
	fmt.Fprintf(&b, `<text x="14" y="%d" transform="rotate(-90 14 %d)" text-anchor="middle">M (kN·m)</text>`,
		(svgHeight+svgMarginT-svgMarginB)/2, (svgHeight+svgMarginT-svgMarginB)/2)
	hi, lo := momentExtremes(d)
	for _, i := range []int{hi, lo} {
		x, y := sc.x(d.StationsM[i]), sc.y(d.MomentKNm[i])
		dy := -4.0
		if d.MomentKNm[i] < 0 {
			dy = 12
		}
		fmt.Fprintf(&b, `<circle cx="%s" cy="%s" r="2.5" fill="#a33a1f"/><text x="%s" y="%s" text-anchor="%s">%s</text>`,
			f1(x), f1(y), f1(x), f1(y+dy), anchorAt(x), num(d.MomentKNm[i], 2))
	}
	fmt.Fprintf(&b, `<text x="%d" y="%s" text-anchor="end">0</text>`, svgMarginL-4, f1(y0+3))
	b.WriteString("</g></svg>")
	return b.String()
}

// anchorAt keeps a value label inside the figure near its edges.
func anchorAt(x float64) string {
	switch {
	case x < svgMarginL+40:
		return "start"
	case x > svgWidth-svgMarginR-40:
		return "end"
	}
	return "middle"
}

// scale maps stations and moments to the plot area.
type scale struct {
	xMax, yLo, yHi float64
}

func newScale(xs, ys []float64) scale {
	s := scale{xMax: xs[len(xs)-1]}
	for _, y := range ys {
		s.yLo, s.yHi = math.Min(s.yLo, y), math.Max(s.yHi, y)
	}
	pad := 0.12 * (s.yHi - s.yLo)
	if pad == 0 {
		pad = 1
	}
	s.yLo, s.yHi = s.yLo-pad, s.yHi+pad
	if !(s.xMax > 0) {
		s.xMax = 1
	}
	return s
}

func (s scale) x(v float64) float64 {
	return svgMarginL + v/s.xMax*float64(svgWidth-svgMarginL-svgMarginR)
}

func (s scale) y(v float64) float64 {
	h := float64(svgHeight - svgMarginT - svgMarginB)
	return svgMarginT + (s.yHi-v)/(s.yHi-s.yLo)*h
}

func f1(v float64) string    { return num(v, 1) }
func pt(x, y float64) string { return f1(x) + "," + f1(y) }

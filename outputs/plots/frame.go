package plots

import "strconv"

// chart is the page geometry shared by the charts, in px.
type chart struct {
	width, height          float64
	left, right, top, base float64 // plot area edges
}

var massChart = chart{width: 920, height: 560, left: 80, right: 620, top: 60, base: 460}

// axes maps data to pixels over the given tick ranges.
type axes struct {
	c              chart
	xTicks, yTicks []float64
}

func (a axes) x(v float64) float64 {
	lo, hi := a.xTicks[0], a.xTicks[len(a.xTicks)-1]
	return a.c.left + (v-lo)/(hi-lo)*(a.c.right-a.c.left)
}

func (a axes) y(v float64) float64 {
	lo, hi := a.yTicks[0], a.yTicks[len(a.yTicks)-1]
	return a.c.base - (v-lo)/(hi-lo)*(a.c.base-a.c.top)
}

// drawAxes writes the grid lines, ticks, tick labels and axis titles.
func (a axes) draw(s *svg, xTitle, yTitle string) {
	c := a.c
	s.open("g", "class", "axes", "font-size", "11", "fill", "#333333")
	for _, v := range a.yTicks {
		y := a.y(v)
		s.elem("line", "x1", f2(c.left), "y1", f2(y), "x2", f2(c.right), "y2", f2(y), "stroke", "#e3e6e8")
		s.text(c.left-6, y+4, tickLabel(v), "text-anchor", "end")
	}
	for _, v := range a.xTicks {
		x := a.x(v)
		s.elem("line", "x1", f2(x), "y1", f2(c.base), "x2", f2(x), "y2", f2(c.base+5), "stroke", "#333333")
		s.text(x, c.base+18, tickLabel(v), "text-anchor", "middle")
	}
	s.elem("line", "x1", f2(c.left), "y1", f2(c.base), "x2", f2(c.right), "y2", f2(c.base), "stroke", "#333333")
	s.elem("line", "x1", f2(c.left), "y1", f2(c.top), "x2", f2(c.left), "y2", f2(c.base), "stroke", "#333333")
	s.text((c.left+c.right)/2, c.base+40, xTitle, "text-anchor", "middle", "font-size", "12")
	mid := (c.top + c.base) / 2
	s.text(c.left-58, mid, yTitle, "text-anchor", "middle", "font-size", "12",
		"transform", "rotate(-90 "+f2(c.left-58)+" "+f2(mid)+")")
	s.close("g")
}

// heading writes the title at the top and the caution at the foot.
func heading(s *svg, c chart, title string) {
	s.text(c.left, 30, title, "font-size", "16", "font-weight", "bold", "fill", "#1d2327")
	s.text(16, c.height-14, Caution, "font-size", "9", "fill", "#7a3020")
}

func itoa(i int) string { return strconv.Itoa(i) }

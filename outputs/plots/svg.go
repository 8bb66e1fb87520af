package plots

import (
	"bytes"
	"encoding/xml"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"
)

// Caution is the footnote of every chart.
const Caution = "CAUTION: spansweep is a design aid. Verify every design for its site with a qualified structural engineer; local codes and licensed practice govern."

// svg accumulates one SVG document. Numbers are written with two decimals
// and every string is XML-escaped, so output is exact and well formed.
type svg struct {
	b bytes.Buffer
}

func newSVG(width, height float64) *svg {
	s := &svg{}
	fmt.Fprintf(&s.b, `<?xml version="1.0" encoding="UTF-8"?>`+"\n"+
		`<svg xmlns="http://www.w3.org/2000/svg" width="%s" height="%s" viewBox="0 0 %s %s" font-family="Helvetica, Arial, sans-serif">`+"\n",
		f2(width), f2(height), f2(width), f2(height))
	return s
}

// elem writes a self-closed element; attrs are name, value pairs.
func (s *svg) elem(name string, attrs ...string) {
	s.b.WriteString("<" + name)
	s.attrs(attrs)
	s.b.WriteString("/>\n")
}

// text writes a text element holding body.
func (s *svg) text(x, y float64, body string, attrs ...string) {
	s.b.WriteString("<text")
	s.attrs(append([]string{"x", f2(x), "y", f2(y)}, attrs...))
	s.b.WriteString(">")
	xml.EscapeText(&s.b, []byte(body))
	s.b.WriteString("</text>\n")
}

// titled writes an element whose only child is a tooltip title.
func (s *svg) titled(name, title string, attrs ...string) {
	s.b.WriteString("<" + name)
	s.attrs(attrs)
	s.b.WriteString("><title>")
	xml.EscapeText(&s.b, []byte(title))
	s.b.WriteString("</title></" + name + ">\n")
}

func (s *svg) open(name string, attrs ...string) {
	s.b.WriteString("<" + name)
	s.attrs(attrs)
	s.b.WriteString(">\n")
}

func (s *svg) close(name string) { s.b.WriteString("</" + name + ">\n") }

func (s *svg) attrs(attrs []string) {
	if len(attrs)%2 != 0 {
		panic("plots: odd attribute list")
	}
	for i := 0; i < len(attrs); i += 2 {
		s.b.WriteString(" " + attrs[i] + `="`)
		xml.EscapeText(&s.b, []byte(attrs[i+1]))
		s.b.WriteString(`"`)
	}
}

func (s *svg) finish(w io.Writer) error {
	s.b.WriteString("</svg>\n")
	_, err := w.Write(s.b.Bytes())
	return err
}

func f2(v float64) string { return strconv.FormatFloat(v, 'f', 2, 64) }

// pathData is the "d" of a polyline through xs, ys (already in pixels).
func pathData(xs, ys []float64) string {
	var b strings.Builder
	for i := range xs {
		if i == 0 {
			b.WriteString("M")
		} else {
			b.WriteString(" L")
		}
		b.WriteString(f2(xs[i]) + " " + f2(ys[i]))
	}
	return b.String()
}

// pointsAttr is the "points" of a polyline through xs, ys.
func pointsAttr(xs, ys []float64) string {
	parts := make([]string, len(xs))
	for i := range xs {
		parts[i] = f2(xs[i]) + "," + f2(ys[i])
	}
	return strings.Join(parts, " ")
}

// niceTicks returns round tick values covering [lo, hi], about n of them,
// at steps of 1, 2 or 5 times a power of ten.
func niceTicks(lo, hi float64, n int) []float64 {
	if hi <= lo {
		hi = lo + 1
	}
	raw := (hi - lo) / float64(n)
	mag := math.Pow(10, math.Floor(math.Log10(raw)))
	step := 10 * mag
	for _, m := range []float64{1, 2, 5} {
		if m*mag >= raw {
			step = m * mag
			break
		}
	}
	var out []float64
	for v := math.Floor(lo/step) * step; v <= hi+step*1e-9; v += step {
		out = append(out, math.Round(v/step)*step)
	}
	if out[len(out)-1] < hi {
		out = append(out, out[len(out)-1]+step)
	}
	return out
}

// tickLabel writes a tick value without trailing noise.
func tickLabel(v float64) string {
	return strconv.FormatFloat(math.Round(v*1e6)/1e6, 'f', -1, 64)
}

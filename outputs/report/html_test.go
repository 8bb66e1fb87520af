package report

import (
	"encoding/xml"
	"errors"
	"fmt"
	"io"
	"strings"
	"testing"

	"golang.org/x/net/html"
)

// TestHTMLWellFormed reads the page twice: with encoding/xml in strict mode,
// which fails on any unclosed or misnested element or bad entity, and with
// the HTML5 parser of golang.org/x/net/html, counting what it finds.
func TestHTMLWellFormed(t *testing.T) {
	r := fixtureReport(t)
	page := render(t, r, HTML)

	dec := xml.NewDecoder(strings.NewReader(page))
	dec.Strict = true
	var depth, maxDepth int
	for {
		tok, err := dec.Token()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			t.Fatalf("XML parse: %v", err)
		}
		switch tok.(type) {
		case xml.StartElement:
			depth++
			maxDepth = max(maxDepth, depth)
		case xml.EndElement:
			depth--
		}
	}
	if depth != 0 || maxDepth < 3 {
		t.Errorf("element depth at the end %d (want 0), deepest %d (want ≥ 3)", depth, maxDepth)
	}

	doc, err := html.Parse(strings.NewReader(page))
	if err != nil {
		t.Fatalf("HTML parse: %v", err)
	}
	counts := map[string]int{}
	governing := 0
	var walk func(*html.Node)
	walk = func(n *html.Node) {
		if n.Type == html.ElementNode {
			counts[n.Data]++
			for _, a := range n.Attr {
				if n.Data == "tr" && a.Key == "class" && a.Val == "governing" {
					governing++
				}
			}
		}
		for c := n.FirstChild; c != nil; c = c.NextSibling {
			walk(c)
		}
	}
	walk(doc)
	calc := r.Result.Calculation
	for _, tc := range []struct {
		what      string
		got, want int
	}{
		{"sections", counts["section"], len(SectionHeadings)},
		{"svg figures", counts["svg"], len(calc.Frame.Diagrams)},
		{"governing rows", governing, len(calc.Groups)},
		{"caution paragraphs", strings.Count(page, `<p class="caution">`), 2},
	} {
		if tc.got != tc.want {
			t.Errorf("%s: got %d, want %d", tc.what, tc.got, tc.want)
		}
	}
}

// TestMomentSVG checks the figure's geometry: every point inside the view
// box, the zero line between the extremes, the extremes labelled.
func TestMomentSVG(t *testing.T) {
	d := fixtureResult(t).Calculation.Frame.Diagrams[1] // left rafter: −18.4 to +7.8 kN·m
	svg := momentSVG(d, "test")
	var s struct {
		Polyline struct {
			Points string `xml:"points,attr"`
		} `xml:"g>polyline"`
		Line struct {
			Y1 float64 `xml:"y1,attr"`
		} `xml:"g>line"`
		Texts []string `xml:"g>text"`
	}
	if err := xml.Unmarshal([]byte(svg), &s); err != nil {
		t.Fatalf("SVG: %v\n%s", err, svg)
	}
	pts := strings.Fields(s.Polyline.Points)
	if len(pts) != len(d.StationsM) {
		t.Fatalf("curve has %d points, want %d", len(pts), len(d.StationsM))
	}
	var ys []float64
	for _, p := range pts {
		var x, y float64
		if _, err := fmtSscan(p, &x, &y); err != nil {
			t.Fatalf("point %q: %v", p, err)
		}
		if x < 0 || x > svgWidth || y < 0 || y > svgHeight {
			t.Errorf("point %q outside the %d×%d view box", p, svgWidth, svgHeight)
		}
		ys = append(ys, y)
	}
	// Moment up: the largest moment (+7.8 at station 3) is highest on the
	// page (smallest y), the smallest (−18.4 at station 0) lowest.
	if !(ys[3] < s.Line.Y1 && s.Line.Y1 < ys[0]) {
		t.Errorf("zero line y %.1f not between the +7.8 point (y %.1f) and the −18.4 point (y %.1f)", s.Line.Y1, ys[3], ys[0])
	}
	joined := strings.Join(s.Texts, " ")
	for _, want := range []string{"7.80", "-18.40"} {
		if !strings.Contains(joined, want) {
			t.Errorf("labels %q lack %s", joined, want)
		}
	}
}

// fmtSscan reads an SVG point "x,y".
func fmtSscan(p string, x, y *float64) (int, error) {
	return fmt.Sscanf(p, "%g,%g", x, y)
}

package report

import (
	"fmt"
	"html"
	"io"
)

// style is the report's print-friendly stylesheet. It holds no '<' or '&',
// so the page stays readable by an XML parser.
const style = `
body { font-family: "Helvetica Neue", Arial, sans-serif; font-size: 10pt; color: #1d2327; margin: 0 auto; max-width: 1100px; padding: 0 12px; }
h1 { font-size: 16pt; margin: 12pt 0 4pt; }
h2 { font-size: 12pt; margin: 16pt 0 4pt; border-bottom: 1.5pt solid #3b6e8f; }
h3 { font-size: 10pt; margin: 10pt 0 3pt; }
.caution { border: 1.5pt solid #a33a1f; background: #fbefe9; padding: 4pt 8pt; font-weight: bold; margin: 8pt 0; }
nav ol { columns: 3; font-size: 9pt; }
table { border-collapse: collapse; font-size: 8.5pt; margin: 3pt 0 6pt; }
th, td { border: 0.5pt solid #8a9aa5; padding: 2pt 4pt; vertical-align: top; text-align: left; }
thead th { background: #dde7ee; }
tr.governing td { background: #f6e7b4; font-weight: bold; }
figure { margin: 6pt 0 10pt; break-inside: avoid; }
figcaption { font-size: 9pt; margin-bottom: 2pt; }
details { font-size: 8.5pt; }
@media print { nav { display: none; } h2, h3 { break-after: avoid; } }
`

// WriteHTML writes the report as one self-contained XHTML-style page: the
// caution, a contents list, every section, each force diagram as an inline
// SVG figure with its values, and the caution again.
func (r Report) WriteHTML(w io.Writer) error {
	d, err := r.build()
	if err != nil {
		return err
	}
	p := &printer{w: w}
	p.printf("<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n<meta charset=\"utf-8\"/>\n<title>%s</title>\n<style>%s</style>\n</head>\n<body>\n",
		esc(d.title), style)
	p.printf("<h1>%s</h1>\n<p class=\"caution\">%s</p>\n<nav>\n<ol>\n", esc(d.title), esc(Caution))
	for _, s := range d.sections {
		p.printf("<li><a href=\"#%s\">%s</a></li>\n", s.id, esc(s.heading))
	}
	p.printf("</ol>\n</nav>\n")
	for _, s := range d.sections {
		p.printf("<section id=\"%s\">\n<h2>%s</h2>\n", s.id, esc(s.heading))
		for _, b := range s.blocks {
			htmlBlock(p, b)
		}
		p.printf("</section>\n")
	}
	p.printf("<p class=\"caution\">%s</p>\n</body>\n</html>\n", esc(Caution))
	if p.err != nil {
		return fmt.Errorf("report: html: %w", p.err)
	}
	return nil
}

func htmlBlock(p *printer, b block) {
	switch b := b.(type) {
	case *para:
		p.printf("<p>%s</p>\n", esc(b.text))
	case *subheading:
		p.printf("<h3>%s</h3>\n", esc(b.text))
	case *list:
		p.printf("<ul>\n")
		for _, it := range b.items {
			p.printf("<li>%s</li>\n", esc(it))
		}
		p.printf("</ul>\n")
	case *table:
		htmlTable(p, b)
	case *figure:
		p.printf("<figure>\n<figcaption>Bending moment: %s. %s</figcaption>\n%s\n<details>\n<summary>Values: axial force, shear, moment</summary>\n",
			esc(b.caption), esc(extremes(b.diagram)), momentSVG(b.diagram, "Bending moment, "+b.caption))
		htmlTable(p, diagramTable(b.diagram))
		p.printf("</details>\n</figure>\n")
	}
}

func htmlTable(p *printer, t *table) {
	p.printf("<table>\n<thead><tr>")
	for _, h := range t.head {
		p.printf("<th>%s</th>", esc(h))
	}
	p.printf("</tr></thead>\n<tbody>\n")
	for _, r := range t.rows {
		if r.highlight {
			p.printf("<tr class=\"governing\">")
		} else {
			p.printf("<tr>")
		}
		for _, c := range r.cells {
			p.printf("<td>%s</td>", esc(c))
		}
		p.printf("</tr>\n")
	}
	p.printf("</tbody>\n</table>\n")
}

func esc(s string) string { return html.EscapeString(s) }

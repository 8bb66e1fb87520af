package tables

import (
	_ "embed"
	"html/template"
	"io"

	"github.com/spansweep/spansweep/optimize"
)

// Paper is the printed sheet size of the HTML page, landscape.
type Paper string

// The sheet sizes the print style supports.
const (
	A4 Paper = "A4"
	A3 Paper = "A3"
)

//go:embed page.html.tmpl
var pageSource string

var pageTemplate = template.Must(template.New("page").Parse(pageSource))

// htmlTable is one table's body as the template reads it; the title is
// written separately (table-title), as only the whole set knows it.
type htmlTable struct {
	Columns []string
	Rows    []htmlRow
	Notes   []note
}

type htmlRow struct {
	Span  string
	Cells []htmlCell
}

type htmlCell struct {
	Lines []string
	Class string // "ok", "enveloped", "none" (no such size), "nosolution"
}

// WriteHTML writes one printable page: the caution, the assumptions, a
// table per wind condition and height, and the caution again. paper is
// A4 or A3; an empty paper means A4.
func (s *Set) WriteHTML(w io.Writer, a Assumptions, paper Paper) error {
	return writeHTMLPage(w, a, paper, s.varying(), s.marks(), s.bodies())
}

func htmlTableOf(t *Table) htmlTable {
	numbers, list := notes(t)
	ht := htmlTable{Notes: list}
	for _, c := range t.Columns {
		ht.Columns = append(ht.Columns, c.Label())
	}
	for i, row := range t.Cells {
		hr := htmlRow{Span: spanText(t.SpansM[i])}
		for j, c := range row {
			hr.Cells = append(hr.Cells, htmlCell{Lines: cellLines(c, numbers[i][j]), Class: cellClass(c)})
		}
		ht.Rows = append(ht.Rows, hr)
	}
	return ht
}

func cellClass(c *Cell) string {
	switch {
	case c == nil:
		return "none"
	case c.Status != optimize.OK:
		return "nosolution"
	case c.Enveloped():
		return "enveloped"
	}
	return "ok"
}

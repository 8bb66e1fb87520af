package report

import "github.com/spansweep/spansweep/optimize"

// Caution opens and closes every report and is the first key of the JSON.
const Caution = "CAUTION: spansweep is a design aid. Verify every design for its site with a qualified structural engineer; local codes and licensed practice govern."

// document is the report before it is rendered: a title and its sections.
type document struct {
	title    string
	sections []section
}

// section is one numbered part of the report. id is its HTML anchor.
type section struct {
	id, heading string
	blocks      []block
}

// block is one piece of a section: *para, *list, *table, *subheading or
// *figure.
type block interface{ isBlock() }

type para struct{ text string }

type list struct{ items []string }

type subheading struct{ text string }

// table is a captioned table; a row with highlight set is the governing one.
type table struct {
	head []string
	rows []row
}

type row struct {
	cells     []string
	highlight bool
}

// figure is one internal force diagram: an SVG chart of the moment in the
// HTML and a table of values in both formats.
type figure struct {
	caption string
	diagram optimize.MemberDiagram
}

func (*para) isBlock()       {}
func (*list) isBlock()       {}
func (*subheading) isBlock() {}
func (*table) isBlock()      {}
func (*figure) isBlock()     {}

// add appends blocks to the section and returns it, for chained building.
func (s *section) add(b ...block) *section {
	s.blocks = append(s.blocks, b...)
	return s
}

func (s *section) para(text string) *section { return s.add(&para{text: text}) }

// newTable starts a table with the given column heads.
func newTable(head ...string) *table { return &table{head: head} }

// row appends a row of cells.
func (t *table) row(cells ...string) *table {
	t.rows = append(t.rows, row{cells: cells})
	return t
}

// governingRow appends a highlighted row.
func (t *table) governingRow(cells ...string) *table {
	t.rows = append(t.rows, row{cells: cells, highlight: true})
	return t
}

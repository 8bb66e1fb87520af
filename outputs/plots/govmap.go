package plots

import (
	"fmt"
	"io"
	"math"
	"sort"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// MapRows chooses the rows of the governing-check map.
type MapRows int

const (
	RowsWind   MapRows = iota // one row per wind condition (default)
	RowsLength                // one row per building length
)

// GoverningMap configures GoverningCheckMap; the zero value maps span
// against wind condition, coloured by the heaviest member group's
// governing check, over every case.
type GoverningMap struct {
	Select func(grids.Case) bool // nil keeps every case
	// Role colours by that member group's governing check; "" by the
	// check governing each building's heaviest group.
	Role  optimize.Role
	Rows  MapRows
	Title string // "" gives a title naming the role
}

// Category is one colour of the map's legend.
type Category struct {
	Check  string // governing check, "other checks", "no solution" or "not recorded"
	Colour string // fill, "#rrggbb"
	Cells  int    // map cells of this colour
}

// Labels of the categories that are not a check.
const (
	labelNoSolution = "no solution"
	labelOther      = "other checks"
	labelUnknown    = "not recorded"
)

// mapCell is one drawn cell: its representative point.
type mapCell struct {
	row, col int
	check    string
	caseID   string
}

// GoverningChart builds the governing-check map as results arrive, in any
// order, keeping one representative case per map cell (row × span), so its
// memory is bounded by the cells, not the cases.
type GoverningChart struct {
	m         GoverningMap
	windLabel func(grids.Case) string
	seen      int                // results added
	selected  int                // results the map shows
	rowFirst  map[string]int     // RowsWind: lowest case index per wind condition
	lengths   map[float64]bool   // RowsLength: the lengths
	spans     map[float64]bool   // the columns
	best      map[cellKey]*Point // each cell's representative
}

// cellKey is a map cell: a wind condition (RowsWind) or a length
// (RowsLength), and a span.
type cellKey struct {
	wind           string
	lengthM, spanM float64
}

// NewGoverningChart returns an empty map configured by m. windLabel names
// a case's wind condition; nil means the case's own label.
func NewGoverningChart(windLabel func(grids.Case) string, m GoverningMap) (*GoverningChart, error) {
	if m.Rows != RowsWind && m.Rows != RowsLength {
		return nil, fmt.Errorf("plots: governing map: rows %d: want RowsWind (0) or RowsLength (1)", m.Rows)
	}
	if m.Role != "" && roleIndex(m.Role) < 0 {
		return nil, fmt.Errorf("plots: governing map: role %q: want one of %v or empty", m.Role, optimize.Roles)
	}
	return &GoverningChart{m: m, windLabel: orWindCondition(windLabel), rowFirst: map[string]int{},
		lengths: map[float64]bool{}, spans: map[float64]bool{}, best: map[cellKey]*Point{}}, nil
}

// Add takes one result.
func (g *GoverningChart) Add(r *optimize.Result) {
	p := pointOf(r, g.windLabel)
	g.add(&p)
}

func (g *GoverningChart) add(p *Point) {
	g.seen++
	if g.m.Select != nil && !g.m.Select(p.Case) {
		return
	}
	g.selected++
	k := cellKey{spanM: p.Case.SpanM}
	if g.m.Rows == RowsWind {
		k.wind = p.Wind
		if f, ok := g.rowFirst[p.Wind]; !ok || p.Case.Index < f {
			g.rowFirst[p.Wind] = p.Case.Index
		}
	} else {
		k.lengthM = p.Case.LengthM
		g.lengths[p.Case.LengthM] = true
	}
	g.spans[p.Case.SpanM] = true
	if b := g.best[k]; b == nil || representsBetter(p, b) {
		cp := *p
		g.best[k] = &cp
	}
}

// WriteSVG writes a grid of span (columns) against wind condition or
// length (rows), each cell coloured by its governing check. Where several
// cases fall on one cell (other dimensions vary), the cell shows an
// unsolved case if there is one, else the heaviest. It returns the
// legend's categories, most frequent first.
func (g *GoverningChart) WriteSVG(w io.Writer) ([]Category, error) {
	if g.selected == 0 {
		return nil, fmt.Errorf("plots: governing map: no case selected (of %d collected)", g.seen)
	}
	rows, rowOf := g.rows()
	cols := sortedKeys(g.spans)
	cells := make([]mapCell, 0, len(g.best))
	for k, p := range g.best {
		check := labelNoSolution
		if p.Solved {
			if check = p.governing(g.m.Role); check == "" {
				check = labelUnknown
			}
		}
		cells = append(cells, mapCell{row: rowOf(k), col: sort.SearchFloat64s(cols, k.spanM), check: check, caseID: p.Case.ID})
	}
	sort.Slice(cells, func(i, j int) bool {
		if cells[i].row != cells[j].row {
			return cells[i].row < cells[j].row
		}
		return cells[i].col < cells[j].col
	})
	cats, colourOf := categories(cells)
	title := "Governing check of the heaviest member group"
	if g.m.Role != "" {
		title = "Governing check of the " + string(g.m.Role) + " group"
	}
	if g.m.Title != "" {
		title = g.m.Title
	}
	if err := drawMap(w, title, rows, cols, cells, cats, colourOf, g.m.Rows); err != nil {
		return nil, fmt.Errorf("plots: governing map: %w", err)
	}
	return cats, nil
}

// rows returns the row labels and each cell's row: wind conditions in the
// grid's order, or lengths ascending.
func (g *GoverningChart) rows() ([]string, func(cellKey) int) {
	if g.m.Rows == RowsWind {
		labels := keysByValue(g.rowFirst)
		idx := map[string]int{}
		for i, l := range labels {
			idx[l] = i
		}
		return labels, func(k cellKey) int { return idx[k.wind] }
	}
	vals := sortedKeys(g.lengths)
	labels := make([]string, len(vals))
	for i, v := range vals {
		labels[i] = tickLabel(v) + " m"
	}
	return labels, func(k cellKey) int { return sort.SearchFloat64s(vals, k.lengthM) }
}

// representsBetter orders a cell's cases: unsolved first, then the
// heaviest, then the lowest case index.
func representsBetter(p, b *Point) bool {
	if p.Solved != b.Solved {
		return !p.Solved
	}
	if p.SteelMassKg != b.SteelMassKg {
		return p.SteelMassKg > b.SteelMassKg
	}
	return p.Case.Index < b.Case.Index
}

// categories counts the checks and gives each a colour, most frequent
// first; beyond the palette they share "other checks".
func categories(cells []mapCell) ([]Category, func(string) string) {
	count := map[string]int{}
	for _, c := range cells {
		count[c.check]++
	}
	names := make([]string, 0, len(count))
	for n := range count {
		names = append(names, n)
	}
	sort.Slice(names, func(i, j int) bool {
		if count[names[i]] != count[names[j]] {
			return count[names[i]] > count[names[j]]
		}
		return names[i] < names[j]
	})
	colour := map[string]string{}
	var cats []Category
	other := Category{Check: labelOther, Colour: otherColour}
	next := 0
	for _, n := range names {
		switch {
		case n == labelNoSolution:
			colour[n] = noSolutionColour
			cats = append(cats, Category{Check: n, Colour: noSolutionColour, Cells: count[n]})
		case next < len(checkColours):
			colour[n] = checkColours[next]
			cats = append(cats, Category{Check: n, Colour: checkColours[next], Cells: count[n]})
			next++
		default:
			colour[n] = otherColour
			other.Cells += count[n]
		}
	}
	if other.Cells > 0 {
		cats = append(cats, other)
	}
	return cats, func(n string) string { return colour[n] }
}

// drawMap lays out the grid, its labels and the legend below it.
func drawMap(w io.Writer, title string, rows []string, cols []float64, cells []mapCell,
	cats []Category, colourOf func(string) string, rowKind MapRows) error {
	const labelW, cellH, top = 170.0, 24.0, 64.0
	cellW := math.Max(18, math.Min(48, 600/float64(len(cols))))
	gridW, gridH := cellW*float64(len(cols)), cellH*float64(len(rows))
	width := math.Max(760, labelW+gridW+40)
	legendTop := top + gridH + 64
	height := legendTop + 18*float64(len(cats)) + 40
	c := chart{width: width, height: height, left: labelW, right: labelW + gridW, top: top, base: top + gridH}

	s := newSVG(width, height)
	heading(s, c, title)
	rowTitle := "Wind condition"
	if rowKind == RowsLength {
		rowTitle = "Length"
	}
	s.open("g", "class", "labels", "font-size", "11", "fill", "#1d2327")
	s.text(labelW-8, top-8, rowTitle, "text-anchor", "end", "font-weight", "bold")
	for i, r := range rows {
		s.text(labelW-8, top+cellH*float64(i)+cellH/2+4, r, "text-anchor", "end")
	}
	step := int(math.Ceil(28 / cellW)) // label every column that has room
	for j, v := range cols {
		if j%step == 0 {
			s.text(labelW+cellW*(float64(j)+0.5), c.base+16, tickLabel(v), "text-anchor", "middle")
		}
	}
	s.text((c.left+c.right)/2, c.base+36, "Span (m)", "text-anchor", "middle", "font-size", "12")
	s.close("g")
	s.open("g", "class", "cells", "stroke", "#ffffff", "stroke-width", "1")
	for _, cl := range cells {
		s.titled("rect", fmt.Sprintf("span %s m, %s: %s (case %s)", tickLabel(cols[cl.col]), rows[cl.row], cl.check, cl.caseID),
			"class", "cell", "x", f2(labelW+cellW*float64(cl.col)), "y", f2(top+cellH*float64(cl.row)),
			"width", f2(cellW), "height", f2(cellH), "fill", colourOf(cl.check))
	}
	s.close("g")
	s.open("g", "class", "legend", "font-size", "11", "fill", "#1d2327")
	s.text(labelW, legendTop-10, "Governing check (cells)", "font-weight", "bold")
	for i, cat := range cats {
		y := legendTop + 18*float64(i)
		s.elem("rect", "x", f2(labelW), "y", f2(y), "width", "14", "height", "12", "fill", cat.Colour, "stroke", "#8a9aa5")
		s.text(labelW+22, y+10, fmt.Sprintf("%s (%d)", cat.Check, cat.Cells))
	}
	s.close("g")
	return s.finish(w)
}

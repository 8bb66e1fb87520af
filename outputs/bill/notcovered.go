package bill

import (
	"fmt"
	"maps"
	"math"
	"slices"
	"strings"

	"github.com/spansweep/spansweep/outputs/dataset"
)

// Uncovered reports one dimension of a request no solved case covers.
type Uncovered struct {
	Name    string `json:"name"`
	Asked   string `json:"asked"`
	Largest string `json:"largest_solved"`
	Nearest string `json:"nearest_at_or_above"` // "" when no solved value is at or above
}

// NotCoveredError says that no ok case covers a request: per dimension the
// largest solved size and the nearest covering one that exists.
type NotCoveredError struct {
	Query      Query
	Dimensions []Uncovered
	// NoSolution names a covering case that exists but has no passing design.
	NoSolution string
	// NoneOK is true when no case of the dataset has a passing design.
	NoneOK bool
}

func (e *NotCoveredError) Error() string {
	var b strings.Builder
	b.WriteString("no solved case covers the request (lookup never rounds down)")
	if e.NoneOK {
		b.WriteString(": the dataset has no case with a passing design (every case is no_solution)")
	}
	blocked := false
	for _, u := range e.Dimensions {
		fmt.Fprintf(&b, "\n  %s: asked %s; largest solved %s; ", u.Name, u.Asked, u.Largest)
		if u.Nearest == "" {
			b.WriteString("none solved at or above")
			blocked = true
		} else {
			b.WriteString("nearest solved at or above " + u.Nearest)
		}
	}
	if !blocked && len(e.Dimensions) > 0 {
		b.WriteString("\n  each dimension has a solved size at or above, but no solved case meets them all together")
	}
	if e.NoSolution != "" {
		b.WriteString("\n  covering case skipped: " + e.NoSolution)
	}
	return b.String()
}

// extent tracks the largest value and the smallest value at or above the
// asked one over the ok rows.
type extent struct {
	asked, largest, nearest float64
}

func newExtent(asked float64) *extent {
	return &extent{asked: asked, largest: math.Inf(-1), nearest: math.Inf(1)}
}

func (x *extent) add(v float64) {
	x.largest = max(x.largest, v)
	if v >= x.asked {
		x.nearest = min(x.nearest, v)
	}
}

func (x *extent) report(name, asked string, format func(float64) string) Uncovered {
	u := Uncovered{Name: name, Asked: asked, Largest: format(x.largest)}
	if !math.IsInf(x.nearest, 1) {
		u.Nearest = format(x.nearest)
	}
	return u
}

// notCovered scans the key columns of every ok row to report the solved
// extents. It is the failure path, so reading every row group is acceptable.
func notCovered(d *dataset.Dataset, q Query, s Settings, noSolution *dataset.Row) error {
	span, height, length := newExtent(q.SpanM), newExtent(q.EavesHeightM), newExtent(q.LengthM)
	bay, pitch := newExtent(q.BaySpacingM), newExtent(q.RoofPitchDeg)
	windMax, windCover := "", ""
	bases := map[string]bool{}
	qMax, qCover := math.Inf(-1), math.Inf(1)
	_, err := d.ScanColumns(dataset.Filter{dataset.Equal("status", "ok")}, keyColumns, func(r *dataset.Row, _ dataset.RowRef) error {
		span.add(r.SpanM)
		height.add(r.EavesHeightM)
		length.add(r.LengthM)
		bay.add(r.BaySpacingM)
		pitch.add(r.RoofPitchDeg)
		bases[r.Base] = true
		if r.QULSKPa > qMax {
			qMax, windMax = r.QULSKPa, rowWind(r).String()
		}
		if ok, err := q.covers(r, s); err == nil && ok && r.QULSKPa < qCover {
			qCover, windCover = r.QULSKPa, rowWind(r).String()
		}
		return nil
	})
	if err != nil {
		return fmt.Errorf("lookup: %w", err)
	}
	if math.IsInf(span.largest, -1) {
		e := &NotCoveredError{Query: q, NoneOK: true}
		if noSolution != nil {
			e.NoSolution = fmt.Sprintf("%s has no passing design (%s)", noSolution.CaseID, noSolution.Reason)
		}
		return e
	}
	e := &NotCoveredError{Query: q, Dimensions: []Uncovered{
		span.report("span", metres(q.SpanM), metres),
		height.report("eaves height", metres(q.EavesHeightM), metres),
		length.report("length", metres(q.LengthM), metres),
	}}
	if q.BaySpacingM > 0 {
		e.Dimensions = append(e.Dimensions, bay.report("bay spacing", metres(q.BaySpacingM), metres))
	}
	if q.RoofPitchDeg > 0 {
		e.Dimensions = append(e.Dimensions, pitch.report("roof pitch", degrees(q.RoofPitchDeg), degrees))
	}
	if q.Base != "" {
		u := Uncovered{Name: "base", Asked: q.Base, Largest: strings.Join(slices.Sorted(maps.Keys(bases)), ", ")}
		if bases[q.Base] {
			u.Nearest = q.Base
		}
		e.Dimensions = append(e.Dimensions, u)
	}
	e.Dimensions = append(e.Dimensions, Uncovered{Name: "wind", Asked: q.Wind.String(), Largest: windMax, Nearest: windCover})
	if noSolution != nil {
		e.NoSolution = fmt.Sprintf("%s has no passing design (%s)", noSolution.CaseID, noSolution.Reason)
	}
	return e
}

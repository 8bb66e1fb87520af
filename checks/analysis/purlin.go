package analysis

import (
	"errors"
	"fmt"
	"math"
)

// SpanType is how a purlin or girt line is made continuous over its supports.
type SpanType uint8

// Span types.
const (
	SimpleSpans     SpanType = iota // each span a simple beam
	ContinuousSpans                 // one member continuous over all supports
	LappedSpans                     // continuous, with the section doubled over each lap
)

func (t SpanType) String() string {
	switch t {
	case SimpleSpans:
		return "simple"
	case ContinuousSpans:
		return "continuous"
	case LappedSpans:
		return "lapped"
	}
	return fmt.Sprintf("SpanType(%d)", uint8(t))
}

// PurlinLineSpec describes a purlin or girt line of Spans equal spans of SpanMM (the bay
// spacing) on knife-edge supports (rafters or columns).
type PurlinLineSpec struct {
	Spans   int
	SpanMM  float64
	Type    SpanType
	Section Section
	// LapMM is the lap length each side of every interior support (LappedSpans only); over it
	// I, A and mass are multiplied by LapFactor.
	LapMM float64
	// LapFactor multiplies the section over a lap; default 2 (two sections nested).
	LapFactor float64
}

// PurlinLine is a built purlin or girt line.
type PurlinLine struct {
	Spec     PurlinLineSpec
	Frame    Frame
	Supports []int   // node of each support, left to right
	Spans    [][]int // members of each span, left to right
}

// NewPurlinLine builds the line of spec along X, supports on Y rollers (the first pinned).
func NewPurlinLine(spec PurlinLineSpec) (*PurlinLine, error) {
	if spec.LapFactor == 0 {
		spec.LapFactor = 2
	}
	var errs []error
	if spec.Spans < 1 {
		errs = append(errs, fmt.Errorf("purlin line: Spans = %d, want ≥ 1", spec.Spans))
	}
	if !(spec.SpanMM > 0) {
		errs = append(errs, fmt.Errorf("purlin line: SpanMM = %g, want > 0", spec.SpanMM))
	}
	if spec.Type == LappedSpans && !(spec.LapMM > 0 && 2*spec.LapMM < spec.SpanMM) {
		errs = append(errs, fmt.Errorf("purlin line: LapMM = %g, want in (0, %g)", spec.LapMM, spec.SpanMM/2))
	}
	if !(spec.LapFactor >= 1) {
		errs = append(errs, fmt.Errorf("purlin line: LapFactor = %g, want ≥ 1", spec.LapFactor))
	}
	if err := errors.Join(errs...); err != nil {
		return nil, err
	}
	pl := &PurlinLine{Spec: spec}
	f := &pl.Frame
	node := func(x float64) int {
		f.Nodes = append(f.Nodes, Node{X: x})
		return len(f.Nodes) - 1
	}
	pl.Supports = append(pl.Supports, node(0))
	for i := range spec.Spans {
		x0 := float64(i) * spec.SpanMM
		var cuts []float64 // interior lap ends, relative to the span start
		if spec.Type == LappedSpans && spec.Spans > 1 {
			if i > 0 {
				cuts = append(cuts, spec.LapMM)
			}
			if i < spec.Spans-1 {
				cuts = append(cuts, spec.SpanMM-spec.LapMM)
			}
		}
		prev, from := pl.Supports[i], 0.0
		var span []int
		for j := 0; j <= len(cuts); j++ {
			to := spec.SpanMM
			if j < len(cuts) {
				to = cuts[j]
			}
			end := node(x0 + to)
			if j == len(cuts) {
				pl.Supports = append(pl.Supports, end)
			}
			sec := spec.Section
			lap := spec.Type == LappedSpans && ((i > 0 && from == 0) || (i < spec.Spans-1 && to == spec.SpanMM))
			if lap {
				sec.A, sec.I, sec.MassKgPerM = sec.A*spec.LapFactor, sec.I*spec.LapFactor, sec.MassKgPerM*spec.LapFactor
			}
			m := Member{Name: fmt.Sprintf("span %d.%d", i+1, j+1), Start: prev, End: end,
				E: sec.E, A: sec.A, I: sec.I, MassKgPerM: sec.MassKgPerM}
			if spec.Type == SimpleSpans {
				m.Release = Pinned
			}
			f.Members = append(f.Members, m)
			span = append(span, len(f.Members)-1)
			prev, from = end, to
		}
		pl.Spans = append(pl.Spans, span)
	}
	f.Supports = append(f.Supports, PinnedSupport(pl.Supports[0]))
	for _, n := range pl.Supports[1:] {
		f.Supports = append(f.Supports, RollerX(n))
	}
	return pl, nil
}

// Uniform adds to c a uniform line load w (N/mm) over the whole line, positive toward the
// supports (−Y: gravity on a purlin, inward pressure on a girt), negative for uplift/suction.
func (pl *PurlinLine) Uniform(c *LoadCase, w float64) {
	for m := range pl.Frame.Members {
		c.Members = append(c.Members, UniformLoad(m, GlobalAxes, 0, -w))
	}
}

// SpanResult holds one span's extremes; positions are mm from the span's left support.
// Moments are sagging positive (N·mm), deflection is positive toward the supports (mm).
type SpanResult struct {
	MaxMoment, MinMoment Extreme
	MaxShear             Extreme // largest |V|, signed
	Deflection           Extreme // largest deflection toward the supports (negative: away)
}

// Results returns each span's extremes and each support's reaction (N, positive resisting a
// positive load) under comb.
func (pl *PurlinLine) Results(s *Solution, comb Combination) ([]SpanResult, []float64) {
	out := make([]SpanResult, len(pl.Spans))
	for i, span := range pl.Spans {
		r := &out[i]
		first := true
		x0 := float64(i) * pl.Spec.SpanMM
		for _, m := range span {
			from := pl.Frame.Nodes[pl.Frame.Members[m].Start].X - x0
			e := s.Extremes(comb, m)
			if first || e.MaxM.Value > r.MaxMoment.Value {
				r.MaxMoment = Extreme{e.MaxM.Value, e.MaxM.X + from}
			}
			if first || e.MinM.Value < r.MinMoment.Value {
				r.MinMoment = Extreme{e.MinM.Value, e.MinM.X + from}
			}
			for _, v := range []Extreme{e.MaxV, e.MinV} {
				if first || math.Abs(v.Value) > math.Abs(r.MaxShear.Value) {
					r.MaxShear = Extreme{v.Value, v.X + from}
				}
				first = false
			}
		}
		r.Deflection = pl.maxDeflection(s, comb, span, x0)
	}
	reac := make([]float64, len(pl.Supports))
	for i, n := range pl.Supports {
		reac[i] = s.Reaction(comb, n)[1]
	}
	return out, reac
}

// maxDeflection samples the span's exact deflection curve at 400 points and refines the peak
// by a parabola through its neighbours.
func (pl *PurlinLine) maxDeflection(s *Solution, comb Combination, span []int, x0 float64) Extreme {
	const n = 400
	L := pl.Spec.SpanMM
	at := func(x float64) float64 {
		for _, m := range span {
			mem := pl.Frame.Members[m]
			a, b := pl.Frame.Nodes[mem.Start].X-x0, pl.Frame.Nodes[mem.End].X-x0
			if x <= b || m == span[len(span)-1] {
				return -s.DeflectionAt(comb, m, math.Min(math.Max(x-a, 0), b-a)).Uy
			}
		}
		return 0
	}
	best, bi := 0.0, 0
	for i := 0; i <= n; i++ {
		if v := at(L * float64(i) / n); math.Abs(v) > math.Abs(best) {
			best, bi = v, i
		}
	}
	x := L * float64(bi) / n
	if bi > 0 && bi < n {
		h := L / n
		ym, yp := at(x-h), at(x+h)
		if den := ym - 2*best + yp; den != 0 {
			dx := h * (ym - yp) / (2 * den)
			if v := at(x + dx); math.Abs(v) >= math.Abs(best) {
				best, x = v, x+dx
			}
		}
	}
	return Extreme{best, x}
}

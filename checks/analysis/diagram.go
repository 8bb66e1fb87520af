package analysis

import "slices"

// Diagram is a member's internal force diagram: N, V, M at stations X (mm from Start). At a
// point load X repeats, with the values just before and just after it.
type Diagram struct {
	X, N, V, M []float64
}

// Diagram fills d with member m's internal forces under comb at stations equally spaced
// stations (at least 2) plus every load discontinuity, reusing d's slices.
func (s *Solution) Diagram(comb Combination, m, stations int, d *Diagram) {
	stations = max(stations, 2)
	L := s.w.geo[m].L
	xs := s.breakpoints(comb, m)
	for i := range stations {
		xs = append(xs, L*float64(i)/float64(stations-1))
	}
	slices.Sort(xs)
	xs = slices.Compact(xs)
	s.w.brk = xs
	d.X, d.N, d.V, d.M = d.X[:0], d.N[:0], d.V[:0], d.M[:0]
	for _, x := range xs {
		left := s.At(comb, m, x, false)
		d.append(x, left)
		if s.isPoint(comb, m, x) {
			d.append(x, s.At(comb, m, x, true))
		}
	}
}

func (d *Diagram) append(x float64, f Forces) {
	d.X = append(d.X, x)
	d.N = append(d.N, f.N)
	d.V = append(d.V, f.V)
	d.M = append(d.M, f.M)
}

// breakpoints returns 0, L and every load start and end on member m in comb, unsorted, in the
// workspace's scratch buffer.
func (s *Solution) breakpoints(comb Combination, m int) []float64 {
	xs := append(s.w.brk[:0], 0, s.w.geo[m].L)
	for _, t := range comb {
		for _, l := range s.w.memberLoads(t.Case, m) {
			xs = append(xs, l.a)
			if !l.point {
				xs = append(xs, l.b)
			}
		}
	}
	return xs
}

func (s *Solution) isPoint(comb Combination, m int, x float64) bool {
	for _, t := range comb {
		for _, l := range s.w.memberLoads(t.Case, m) {
			if l.point && l.a == x && x > 0 && x < s.w.geo[m].L {
				return true
			}
		}
	}
	return false
}

// Extreme is a signed extreme value and its position, mm from the member's Start node.
type Extreme struct {
	Value, X float64
}

// Extremes are the largest and smallest internal forces along a member.
type Extremes struct {
	MaxN, MinN Extreme // N
	MaxV, MinV Extreme // N
	MaxM, MinM Extreme // N·mm
}

// Extremes returns the exact extremes of member m's internal forces under comb: values at every
// load discontinuity, both sides of point loads, and the moment where the shear changes sign.
func (s *Solution) Extremes(comb Combination, m int) Extremes {
	xs := s.breakpoints(comb, m)
	slices.Sort(xs)
	xs = slices.Compact(xs)
	s.w.brk = xs
	f0 := s.At(comb, m, 0, true)
	e := Extremes{
		MaxN: Extreme{f0.N, 0}, MinN: Extreme{f0.N, 0},
		MaxV: Extreme{f0.V, 0}, MinV: Extreme{f0.V, 0},
		MaxM: Extreme{f0.M, 0}, MinM: Extreme{f0.M, 0},
	}
	for i := 0; i+1 < len(xs); i++ {
		x0, x1 := xs[i], xs[i+1]
		a, b := s.At(comb, m, x0, true), s.At(comb, m, x1, false)
		e.take(x0, a)
		e.take(x1, b)
		if (a.V > 0 && b.V < 0) || (a.V < 0 && b.V > 0) {
			// V is linear between discontinuities, so M is stationary where V = 0.
			xr := x0 + (x1-x0)*a.V/(a.V-b.V)
			e.take(xr, s.At(comb, m, xr, false))
		}
	}
	return e
}

func (e *Extremes) take(x float64, f Forces) {
	up := func(hi, lo *Extreme, v float64) {
		if v > hi.Value {
			*hi = Extreme{v, x}
		}
		if v < lo.Value {
			*lo = Extreme{v, x}
		}
	}
	up(&e.MaxN, &e.MinN, f.N)
	up(&e.MaxV, &e.MinV, f.V)
	up(&e.MaxM, &e.MinM, f.M)
}

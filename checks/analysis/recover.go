package analysis

import (
	"math"

	"gonum.org/v1/gonum/blas"
	"gonum.org/v1/gonum/blas/blas64"
)

// recoverDisplacements copies every case's solved unknowns into w.disp.
func (w *Workspace) recoverDisplacements() {
	nd := 3 * w.nn
	w.disp = grow(w.disp, w.nc*nd)
	var x blas64.General
	if w.n > 0 {
		x = w.x.RawMatrix()
	}
	for c := range w.nc {
		d := w.disp[c*nd : (c+1)*nd]
		for i, e := range w.eq {
			if e >= 0 && w.n > 0 {
				d[i] = x.Data[e*x.Stride+c]
			}
		}
	}
}

// recoverForces computes every case's member end forces and reactions from
// w.disp.
func (w *Workspace) recoverForces(cases []LoadCase) {
	f := w.frame
	nd := 3 * w.nn
	w.react = grow(w.react, w.nc*nd)
	w.endF = grow(w.endF, w.nc*w.nm)
	for c := range w.nc {
		d := w.disp[c*nd : (c+1)*nd]
		r := w.react[c*nd : (c+1)*nd]
		for m := range f.Members {
			if !w.active[m] {
				continue
			}
			fl := w.endForce(c, m)
			w.endF[c*w.nm+m] = fl
			g := &w.geo[m]
			fg := fromLocal(&fl, g.c, g.s)
			mem := &f.Members[m]
			for k := range 3 {
				r[3*mem.Start+k] += fg[k]
				r[3*mem.End+k] += fg[3+k]
			}
		}
		for _, l := range cases[c].Nodal {
			r[3*l.Node] -= l.Fx
			r[3*l.Node+1] -= l.Fy
			r[3*l.Node+2] -= l.Mz
		}
		// Only supported degrees of freedom carry reactions; elsewhere r is the nodal
		// out-of-balance, which the residual check covers.
		for i, e := range w.eq {
			if e != restrained {
				r[i] = 0
			}
		}
		for _, s := range f.Supports {
			for k := range 3 {
				if s.Spring[k] > 0 && !s.Fix[k] {
					r[3*s.Node+k] = -s.Spring[k] * d[3*s.Node+k]
				}
			}
		}
	}
}

// endForce returns the local end forces of member m in case c: k·u + fixed-end forces.
func (w *Workspace) endForce(c, m int) [6]float64 {
	mem := &w.frame.Members[m]
	g := &w.geo[m]
	d := w.disp[c*3*w.nn:]
	ug := [6]float64{d[3*mem.Start], d[3*mem.Start+1], d[3*mem.Start+2], d[3*mem.End], d[3*mem.End+1], d[3*mem.End+2]}
	ul := toLocal(&ug, g.c, g.s)
	f := w.fixed[c*w.nm+m]
	for i := range 6 {
		for j := range 6 {
			f[i] += w.kl[m][i][j] * ul[j]
		}
	}
	return f
}

// residuals fills w.res with the normwise backward error ‖K x − b‖ / (‖K‖‖x‖ + ‖b‖) of every
// case (Higham, Accuracy and Stability of Numerical Algorithms, §7.1), ‖K‖ taken as the
// largest diagonal term, a lower bound on its 2-norm.
func (w *Workspace) residuals() {
	w.res = grow(w.res, w.nc)
	if w.n == 0 {
		return
	}
	n, nc := w.n, w.nc
	w.rbuf = grow(w.rbuf, n*nc)
	r := blas64.General{Rows: n, Cols: nc, Stride: nc, Data: w.rbuf}
	copy(w.rbuf, w.rhs.RawMatrix().Data[:n*nc])
	raw := w.k.RawSymmetric()
	blas64.Symm(blas.Left, 1, raw, w.x.RawMatrix(), -1, r)
	kmax := 0.0
	for i := range n {
		kmax = math.Max(kmax, raw.Data[i*raw.Stride+i])
	}
	b, x := w.rhs.RawMatrix(), w.x.RawMatrix()
	for c := range nc {
		var rr, bb, xx float64
		for i := range n {
			rr += w.rbuf[i*nc+c] * w.rbuf[i*nc+c]
			bb += b.Data[i*b.Stride+c] * b.Data[i*b.Stride+c]
			xx += x.Data[i*x.Stride+c] * x.Data[i*x.Stride+c]
		}
		if den := kmax*math.Sqrt(xx) + math.Sqrt(bb); den > 0 {
			w.res[c] = math.Sqrt(rr) / den
		}
	}
}

// balance returns the relative out-of-balance between applied loads and reactions in case c:
// the largest of |ΣFx|, |ΣFy| and |ΣM|/span divided by the sum of absolute applied loads.
func (w *Workspace) balance(cases []LoadCase, c int) float64 {
	f := w.frame
	span := w.span()
	var fx, fy, mz, scale float64
	add := func(x, y, px, py, m float64) {
		fx += px
		fy += py
		mz += m + x*py - y*px
		scale += math.Abs(px) + math.Abs(py) + math.Abs(m)/span
	}
	for _, l := range cases[c].Nodal {
		n := f.Nodes[l.Node]
		add(n.X, n.Y, l.Fx, l.Fy, l.Mz)
	}
	for m := range f.Members {
		g := &w.geo[m]
		s := f.Nodes[f.Members[m].Start]
		for _, l := range w.memberLoads(c, m) {
			lx, ly, xc := l.px, l.py, l.a
			if !l.point {
				lx, ly, xc = lx*(l.b-l.a), ly*(l.b-l.a), (l.a+l.b)/2
			}
			add(s.X+g.c*xc, s.Y+g.s*xc, g.c*lx-g.s*ly, g.s*lx+g.c*ly, 0)
		}
	}
	applied := scale
	r := w.react[c*3*w.nn:]
	for i, n := range f.Nodes {
		add(n.X, n.Y, r[3*i], r[3*i+1], r[3*i+2])
	}
	if applied == 0 {
		return 0
	}
	return math.Max(math.Abs(fx), math.Max(math.Abs(fy), math.Abs(mz)/span)) / applied
}

// span is the larger side of the frame's bounding box, at least 1 mm.
func (w *Workspace) span() float64 {
	f := w.frame
	x0, x1, y0, y1 := math.Inf(1), math.Inf(-1), math.Inf(1), math.Inf(-1)
	for _, n := range f.Nodes {
		x0, x1 = math.Min(x0, n.X), math.Max(x1, n.X)
		y0, y1 = math.Min(y0, n.Y), math.Max(y1, n.Y)
	}
	return math.Max(1, math.Max(x1-x0, y1-y0))
}

package analysis

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/blas"
	"gonum.org/v1/gonum/blas/blas64"
	"gonum.org/v1/gonum/lapack/lapack64"
	"gonum.org/v1/gonum/mat"
)

// Equation numbers for degrees of freedom that are not unknowns.
const (
	restrained = -1 // fixed by a support
	unused     = -2 // a rotation no member or support resists (all members hinged there)
)

// Workspace holds the buffers of a solve so that repeated solves of frames of the same size
// allocate nothing. The zero value is ready to use. A Workspace is not safe for concurrent
// use; give each goroutine its own.
type Workspace struct {
	frame      *Frame
	nn, nm, nc int
	n          int // number of unknowns
	eq         []int
	geo        []geom
	kl         [][6][6]float64
	active     []bool

	k    *mat.SymDense
	u    blas64.Triangular // Cholesky factor K = UᵀU (lapack64.Potrf, as mat.Cholesky uses)
	uDat []float64
	rhs  *mat.Dense
	x    *mat.Dense

	names   []string
	loads   []localLoad
	loadOff []int
	disp    []float64
	react   []float64
	endF    [][6]float64
	fixed   [][6]float64

	diag []float64 // singularity diagnosis scratch
	null []float64
	res  []float64
	fill []int
	seg  Diagram // Portal.Diagram scratch
	rbuf []float64
	buck buckleScratch
	sol  Solution
	brk  []float64
	one  [1]LoadCase

	factorErr error // the last solveDisplacements' assembly or factor error
}

// Solve analyses frame f under the primary load cases. The returned Solution belongs to the
// workspace and stays valid until its next Solve.
func (w *Workspace) Solve(f *Frame, cases []LoadCase) (*Solution, error) {
	if err := validate(f, cases); err != nil {
		return nil, err
	}
	w.setup(f, len(cases))
	for i := range w.active {
		w.active[i] = true
	}
	return w.solve(cases)
}

func validate(f *Frame, cases []LoadCase) error {
	if len(cases) == 0 {
		return ErrNoCases
	}
	if err := f.Validate(); err != nil {
		return fmt.Errorf("analysis: %w", err)
	}
	for i := range cases {
		if err := cases[i].Validate(f); err != nil {
			return fmt.Errorf("analysis: %w", err)
		}
	}
	return nil
}

// setup sizes the buffers for frame f and nc cases and computes member geometry.
func (w *Workspace) setup(f *Frame, nc int) {
	w.frame = f
	w.nn, w.nm, w.nc = len(f.Nodes), len(f.Members), nc
	w.eq = grow(w.eq, 3*w.nn)
	w.geo = grow(w.geo, w.nm)
	w.kl = grow(w.kl, w.nm)
	w.active = grow(w.active, w.nm)
	for i := range f.Members {
		m := &f.Members[i]
		w.geo[i] = memberGeom(f, m)
		w.kl[i] = localStiffness(m, w.geo[i].L)
	}
}

// solve numbers the unknowns, assembles, factors and solves all cases, then checks itself.
func (w *Workspace) solve(cases []LoadCase) (*Solution, error) {
	w.solveDisplacements(cases)
	if err := w.factorErr; err != nil {
		return nil, err
	}
	return w.complete(cases)
}

// SolveDisplacements is the first half of Solve: it analyses frame f under
// the primary load cases as far as the nodal displacements, skipping the
// member forces, reactions and self-check. Displacement then gives exactly
// Solve's values (the same assembly, factor and load vectors); Complete
// finishes the solve. It serves screens that reject most candidates on a
// deflection alone. The Solution belongs to the workspace as Solve's does.
func (w *Workspace) SolveDisplacements(f *Frame, cases []LoadCase) (*Solution, error) {
	if err := validate(f, cases); err != nil {
		return nil, err
	}
	w.setup(f, len(cases))
	for i := range w.active {
		w.active[i] = true
	}
	w.solveDisplacements(cases)
	if err := w.factorErr; err != nil {
		return nil, err
	}
	w.sol = Solution{w: w, pending: cases}
	return &w.sol, nil
}

// Complete recovers the member forces and reactions of a Solution from
// SolveDisplacements and runs Solve's self-check; on a Solution from Solve
// it does nothing. After an error the Solution must not be used.
func (s *Solution) Complete() error {
	if s.pending == nil {
		return nil
	}
	_, err := s.w.complete(s.pending)
	return err
}

// solveDisplacements numbers, assembles, factors (an error is left in
// w.factorErr) and solves every case for the nodal displacements.
func (w *Workspace) solveDisplacements(cases []LoadCase) {
	w.number()
	if w.factorErr = w.assembleAndFactor(); w.factorErr != nil {
		return
	}
	w.compileLoads(cases)
	w.loadVectors(cases)
	if w.n > 0 {
		w.x.Copy(w.rhs)
		lapack64.Potrs(w.u, w.x.RawMatrix())
	}
	w.recoverDisplacements()
}

// complete recovers forces and reactions and checks the solve.
func (w *Workspace) complete(cases []LoadCase) (*Solution, error) {
	w.recoverForces(cases)
	w.residuals()
	for c := range w.nc {
		res, bal := w.res[c], w.balance(cases, c)
		if !(res < checkTol) || !(bal < checkTol) {
			return nil, &CheckError{Case: cases[c].Name, Residual: res, Balance: bal}
		}
	}
	w.sol = Solution{w: w}
	return &w.sol, nil
}

// number assigns equation numbers to the free degrees of freedom.
func (w *Workspace) number() {
	f := w.frame
	for i := range w.eq {
		w.eq[i] = unused
	}
	for i := range f.Members {
		if !w.active[i] {
			continue
		}
		m := &f.Members[i]
		w.eq[3*m.Start], w.eq[3*m.Start+1] = 0, 0
		w.eq[3*m.End], w.eq[3*m.End+1] = 0, 0
		if m.Release&ReleaseStart == 0 {
			w.eq[3*m.Start+2] = 0
		}
		if m.Release&ReleaseEnd == 0 {
			w.eq[3*m.End+2] = 0
		}
	}
	for _, s := range f.Supports {
		for d := range 3 {
			j := 3*s.Node + d
			if d < 2 {
				w.eq[j] = 0 // a lone node's translations stay unknowns, so a missing member shows as singular
			}
			if s.Spring[d] > 0 && w.eq[j] == unused {
				w.eq[j] = 0
			}
		}
	}
	for _, s := range f.Supports {
		for d := range 3 {
			if s.Fix[d] {
				w.eq[3*s.Node+d] = restrained
			}
		}
	}
	w.n = 0
	for i := range w.eq {
		if w.eq[i] == 0 {
			w.eq[i] = w.n
			w.n++
		}
	}
}

// assembleAndFactor builds the global stiffness of the active members and factors it.
func (w *Workspace) assembleAndFactor() error {
	f := w.frame
	n := w.n
	if n == 0 {
		w.u = blas64.Triangular{}
		return nil
	}
	w.k = reuseSym(w.k, n)
	for i := range f.Members {
		if !w.active[i] {
			continue
		}
		m := &f.Members[i]
		g := &w.geo[i]
		kg := toGlobal(&w.kl[i], g.c, g.s)
		w.scatter(&kg, m.Start, m.End)
	}
	for _, s := range f.Supports {
		for d := range 3 {
			if j := w.eq[3*s.Node+d]; j >= 0 && s.Spring[d] > 0 {
				w.k.SetSym(j, j, w.k.At(j, j)+s.Spring[d])
			}
		}
	}
	return w.factor()
}

// factor computes the Cholesky factor of the stiffness with lapack64.Potrf, the routine
// behind mat.Cholesky, on workspace storage so that a warm factorisation allocates nothing.
// A failed factorisation, or a pivot below 1e-12 of its diagonal term (a near-mechanism),
// is diagnosed into a SingularError.
func (w *Workspace) factor() error {
	n := w.n
	raw := w.k.RawSymmetric()
	w.uDat = grow(w.uDat, n*n)
	for i := range n {
		copy(w.uDat[i*n+i:(i+1)*n], raw.Data[i*raw.Stride+i:i*raw.Stride+n])
	}
	u, ok := lapack64.Potrf(blas64.Symmetric{Uplo: blas.Upper, N: n, Stride: n, Data: w.uDat})
	for i := 0; ok && i < n; i++ {
		d := u.Data[i*n+i]
		ok = d*d > 1e-12*raw.Data[i*raw.Stride+i]
	}
	if !ok {
		w.u = blas64.Triangular{}
		if err := w.diagnose(); err != nil {
			return err
		}
		return fmt.Errorf("analysis: stiffness matrix is not positive definite")
	}
	w.u = u
	return nil
}

// scatter adds a global element matrix into the stiffness.
func (w *Workspace) scatter(kg *[6][6]float64, a, b int) {
	var dofs [6]int
	for d := range 3 {
		dofs[d], dofs[3+d] = w.eq[3*a+d], w.eq[3*b+d]
	}
	raw := w.k.RawSymmetric()
	for i, ei := range dofs {
		if ei < 0 {
			continue
		}
		for j, ej := range dofs {
			if ej < ei {
				continue
			}
			raw.Data[ei*raw.Stride+ej] += kg[i][j]
		}
	}
}

// diagnose finds the first degree of freedom without stiffness by Gaussian elimination in
// equation order; it returns nil when every pivot is healthy.
func (w *Workspace) diagnose() error {
	n := w.n
	w.diag = grow(w.diag, n*n)
	a := w.diag
	raw := w.k.RawSymmetric()
	scale := 0.0
	for i := range n {
		for j := range n {
			if j >= i {
				a[i*n+j] = raw.Data[i*raw.Stride+j]
			} else {
				a[i*n+j] = raw.Data[j*raw.Stride+i]
			}
		}
		scale = math.Max(scale, math.Abs(a[i*n+i]))
	}
	for p := range n {
		piv := a[p*n+p]
		if !(piv > 1e-11*scale) {
			return w.singularAt(w.mechanism(p))
		}
		for i := p + 1; i < n; i++ {
			l := a[i*n+p] / piv
			if l == 0 {
				continue
			}
			for j := p; j < n; j++ {
				a[i*n+j] -= l * a[p*n+j]
			}
		}
	}
	return nil
}

// mechanism returns the equation with the largest movement in the null vector found at zero
// pivot p of the eliminated matrix, preferring translations: the degree of freedom that moves
// most in the mechanism.
func (w *Workspace) mechanism(p int) int {
	n, a := w.n, w.diag
	x := w.null[:0]
	for range p + 1 {
		x = append(x, 0)
	}
	x[p] = 1
	for i := p - 1; i >= 0; i-- {
		s := a[i*n+p]
		for j := i + 1; j < p; j++ {
			s += a[i*n+j] * x[j]
		}
		x[i] = -s / a[i*n+i]
	}
	w.null = x
	best, big := p, 0.0
	for i, e := range w.eq {
		if e >= 0 && e <= p && i%3 != 2 && math.Abs(x[e]) > big*(1+1e-9) {
			best, big = e, math.Abs(x[e])
		}
	}
	return best
}

func (w *Workspace) singularAt(eq int) error {
	for i, e := range w.eq {
		if e == eq {
			return &SingularError{Node: i / 3, DOF: DOF(i % 3)}
		}
	}
	return &SingularError{Node: -1}
}

// compileLoads resolves every case's member loads into local components, grouped by member
// (a counting sort, so the cost is linear in the number of loads).
func (w *Workspace) compileLoads(cases []LoadCase) {
	f := w.frame
	nm := w.nm
	w.loadOff = grow(w.loadOff, w.nc*nm+1)
	w.names = grow(w.names, w.nc)
	total := 0
	for c := range cases {
		w.names[c] = cases[c].Name
		off := w.loadOff[c*nm : (c+1)*nm]
		if sw := cases[c].SelfWeight; sw != 0 {
			for m := range f.Members {
				if hasSelfWeight(&f.Members[m]) {
					off[m]++
				}
			}
		}
		for _, l := range cases[c].Members {
			off[l.Member]++
		}
		for m := range off {
			off[m], total = total, total+off[m]
		}
	}
	w.loadOff[w.nc*nm] = total
	w.loads = grow(w.loads, total)
	w.fill = grow(w.fill, w.nc*nm)
	copy(w.fill, w.loadOff[:w.nc*nm])
	for c := range cases {
		fill := w.fill[c*nm : (c+1)*nm]
		if sw := cases[c].SelfWeight; sw != 0 {
			for m := range f.Members {
				if hasSelfWeight(&f.Members[m]) {
					w.loads[fill[m]] = selfWeight(&f.Members[m], &w.geo[m], sw)
					fill[m]++
				}
			}
		}
		for _, l := range cases[c].Members {
			w.loads[fill[l.Member]] = resolve(l, &w.geo[l.Member])
			fill[l.Member]++
		}
	}
}

// hasSelfWeight reports whether member m carries its self weight as a member load. A
// tension-only member does not (it may go slack); give its weight as nodal loads if it matters.
func hasSelfWeight(m *Member) bool { return m.MassKgPerM > 0 && !m.TensionOnly }

// memberLoads returns the compiled loads of case c on member m.
func (w *Workspace) memberLoads(c, m int) []localLoad {
	i := c*w.nm + m
	return w.loads[w.loadOff[i]:w.loadOff[i+1]]
}

// loadVectors builds the right-hand sides: nodal loads less the equivalent fixed-end forces.
func (w *Workspace) loadVectors(cases []LoadCase) {
	f := w.frame
	w.rhs = reuseDense(w.rhs, w.n, w.nc)
	w.x = reuseDense(w.x, w.n, w.nc)
	w.fixed = grow(w.fixed, w.nc*w.nm)
	for c := range cases {
		for _, l := range cases[c].Nodal {
			w.addLoad(3*l.Node, c, l.Fx)
			w.addLoad(3*l.Node+1, c, l.Fy)
			w.addLoad(3*l.Node+2, c, l.Mz)
		}
		for m := range f.Members {
			fe := &w.fixed[c*w.nm+m]
			*fe = [6]float64{}
			loads := w.memberLoads(c, m)
			if len(loads) == 0 || !w.active[m] {
				continue
			}
			g := &w.geo[m]
			for i := range loads {
				loads[i].fixedEnd(g.L, fe)
			}
			condensedFixedEnd(&f.Members[m], g.L, fe)
			fg := fromLocal(fe, g.c, g.s)
			mem := &f.Members[m]
			for d := range 3 {
				w.addLoad(3*mem.Start+d, c, -fg[d])
				w.addLoad(3*mem.End+d, c, -fg[3+d])
			}
		}
	}
}

func (w *Workspace) addLoad(dof, c int, v float64) {
	if j := w.eq[dof]; j >= 0 && v != 0 {
		rhs := w.rhs.RawMatrix()
		rhs.Data[j*rhs.Stride+c] += v
	}
}

func grow[T any](s []T, n int) []T {
	if cap(s) < n {
		return make([]T, n)
	}
	s = s[:n]
	clear(s)
	return s
}

// reuseSym returns a zero n×n symmetric matrix, in s's storage when it is
// large enough (frames of different sizes share one workspace).
func reuseSym(s *mat.SymDense, n int) *mat.SymDense {
	switch {
	case s == nil:
		return mat.NewSymDense(n, nil)
	case s.SymmetricDim() != n:
		s.Reset()
		s.ReuseAsSym(n) // zeroed
		return s
	}
	s.Zero()
	return s
}

func reuseDense(d *mat.Dense, r, c int) *mat.Dense {
	if r == 0 {
		return d
	}
	if d == nil {
		return mat.NewDense(r, c, nil)
	}
	if rr, cc := d.Dims(); rr != r || cc != c {
		d.Reset()
		d.ReuseAs(r, c)
	}
	d.Zero()
	return d
}

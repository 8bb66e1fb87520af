package analysis

import (
	"errors"
	"math"

	"gonum.org/v1/gonum/blas"
	"gonum.org/v1/gonum/blas/blas64"
	"gonum.org/v1/gonum/lapack"
	"gonum.org/v1/gonum/lapack/lapack64"
	"gonum.org/v1/gonum/mat"
)

// Buckling is the result of a linear elastic buckling analysis: the lowest positive load
// factor λc by which the combination's loads must be multiplied to buckle the frame in its
// plane, and its mode. Factor is +Inf when no member is in compression.
type Buckling struct {
	Factor float64
	mode   []float64 // full nodal vector, 3 per node, largest translation 1
}

// Mode returns node n's mode shape [DX DY RZ], scaled so the largest translation is 1.
func (b *Buckling) Mode(n int) [3]float64 {
	if b.mode == nil {
		return [3]float64{}
	}
	return [3]float64{b.mode[3*n], b.mode[3*n+1], b.mode[3*n+2]}
}

type buckleScratch struct {
	ws     *Workspace // refined model
	frame  Frame
	parent []int
	axial  []float64
	vals   []float64
	x      []float64
	g      *mat.SymDense
	y      *mat.Dense
	a      *mat.SymDense
	eig    mat.EigenSym
	vecs   mat.Dense
	mode   []float64
	work   []float64 // dsyev work, sized for workN equations
	workN  int
}

// ErrNotFactored is returned by Buckle when the solution has no stiffness to buckle.
var ErrNotFactored = errors.New("analysis: stiffness not factored; solve first")

// BuckleSettings tunes Buckle. The zero value (or nil) gives the defaults.
type BuckleSettings struct {
	// Subdivisions is the number of elements each bending member is split into for the
	// eigenproblem (the static solve needs none). Default 2, which put the sway factors of
	// the test portals within 0.4 % of the converged value (4: 0.1 %, at five times the cost;
	// 1: up to 6 % high on fixed bases).
	Subdivisions int
	// Mode asks for the buckling mode as well as the factor (default false: the factor
	// alone is about twice as fast).
	Mode bool
}

// Buckle returns the lowest positive elastic buckling load factor of the frame under the axial
// forces of comb, solving (K + λ·Kg) φ = 0 as a symmetric eigenproblem through the Cholesky
// factor K = UᵀU: U⁻ᵀ(−Kg)U⁻¹ y = (1/λ) y. Kg is the consistent geometric stiffness of each
// element (Przemieniecki, Theory of Matrix Structural Analysis, eq. 15.7, from memory) from the
// exact axial force at the element's mid-length. Bending members are subdivided (see
// BuckleSettings), since one cubic element per member overestimates λ by several percent.
// The mode is reused by the next Buckle.
func (s *Solution) Buckle(comb Combination, set *BuckleSettings) (Buckling, error) {
	w := s.w
	nsub, mode := 2, false
	if set != nil {
		if set.Subdivisions > 0 {
			nsub = set.Subdivisions
		}
		mode = set.Mode
	}
	bs := &w.buck
	if bs.ws == nil {
		bs.ws = &Workspace{}
	}
	rf := s.refine(comb, nsub, &bs.frame)
	r := bs.ws
	r.setup(rf, 0)
	for i := range r.active {
		r.active[i] = w.active[bs.parent[i]]
	}
	r.number()
	if err := r.assembleAndFactor(); err != nil {
		return Buckling{}, err
	}
	if r.n == 0 || r.u.N == 0 {
		return Buckling{}, ErrNotFactored
	}
	n := r.n
	bs.g = reuseSym(bs.g, n)
	saved := r.k
	r.k = bs.g
	for m := range rf.Members {
		if N := bs.axial[m]; N != 0 && r.active[m] {
			kgl := geometricStiffness(&rf.Members[m], r.geo[m].L, N)
			kg := toGlobal(&kgl, r.geo[m].c, r.geo[m].s)
			r.scatter(&kg, rf.Members[m].Start, rf.Members[m].End)
		}
	}
	r.k = saved
	return bs.solveEigen(r, w.nn, mode)
}

// refine returns frame w.frame with each bending member split into nsub elements, recording
// each element's parent member and axial force under comb.
func (s *Solution) refine(comb Combination, nsub int, rf *Frame) *Frame {
	w := s.w
	f := w.frame
	bs := &w.buck
	rf.Nodes = append(rf.Nodes[:0], f.Nodes...)
	rf.Supports = append(rf.Supports[:0], f.Supports...)
	rf.Members = rf.Members[:0]
	bs.parent, bs.axial = bs.parent[:0], bs.axial[:0]
	for m := range f.Members {
		mem := f.Members[m]
		L := w.geo[m].L
		k := nsub
		if mem.Release == Pinned {
			k = 1
		}
		a, b := f.Nodes[mem.Start], f.Nodes[mem.End]
		prev := mem.Start
		for i := range k {
			e := mem
			e.Release = 0
			if i == 0 {
				e.Release |= mem.Release & ReleaseStart
			}
			if i == k-1 {
				e.Release |= mem.Release & ReleaseEnd
				e.End = mem.End
			} else {
				t := float64(i+1) / float64(k)
				rf.Nodes = append(rf.Nodes, Node{X: a.X + t*(b.X-a.X), Y: a.Y + t*(b.Y-a.Y)})
				e.End = len(rf.Nodes) - 1
			}
			if mem.Release == Pinned {
				e.Release = Pinned
			}
			e.Start = prev
			prev = e.End
			rf.Members = append(rf.Members, e)
			bs.parent = append(bs.parent, m)
			bs.axial = append(bs.axial, s.At(comb, m, L*(float64(i)+0.5)/float64(k), false).N)
		}
	}
	return rf
}

// solveEigen finds the largest positive eigenvalue of U⁻ᵀ G U⁻¹ with G = −Kg held in bs.g and
// the Cholesky factor in r, and the mode on the first nn nodes.
func (bs *buckleScratch) solveEigen(r *Workspace, nn int, mode bool) (Buckling, error) {
	n := r.n
	bs.y = reuseDense(bs.y, n, n)
	y := bs.y.RawMatrix()
	g := bs.g.RawSymmetric() // upper triangle
	for i := range n {
		for j := range n {
			if i <= j {
				y.Data[i*y.Stride+j] = -g.Data[i*g.Stride+j]
			} else {
				y.Data[i*y.Stride+j] = -g.Data[j*g.Stride+i]
			}
		}
	}
	u := r.u
	blas64.Trsm(blas.Left, blas.Trans, 1, u, y)
	blas64.Trsm(blas.Right, blas.NoTrans, 1, u, y)
	bs.a = reuseSym(bs.a, n)
	a := bs.a.RawSymmetric()
	for i := range n {
		for j := i; j < n; j++ {
			a.Data[i*a.Stride+j] = (y.Data[i*y.Stride+j] + y.Data[j*y.Stride+i]) / 2
		}
	}
	if err := bs.eigenvalues(n, mode); err != nil {
		return Buckling{}, err
	}
	mu := bs.vals[n-1]
	if !(mu > 1e-9*math.Max(mu, -bs.vals[0])) { // rounding-level positive values mean no compression
		return Buckling{Factor: math.Inf(1)}, nil
	}
	if !mode {
		return Buckling{Factor: 1 / mu}, nil
	}
	if r, _ := bs.vecs.Dims(); r != n {
		bs.vecs.Reset()
	}
	bs.eig.VectorsTo(&bs.vecs)
	bs.x = grow(bs.x, n)
	for i := range n {
		bs.x[i] = bs.vecs.At(i, n-1)
	}
	blas64.Trsv(blas.NoTrans, u, blas64.Vector{N: n, Data: bs.x, Inc: 1})
	bs.mode = grow(bs.mode, 3*nn)
	big := 0.0
	for i, e := range r.eq[:3*nn] {
		if e >= 0 {
			bs.mode[i] = bs.x[e]
			if i%3 != 2 && math.Abs(bs.x[e]) > math.Abs(big) {
				big = bs.x[e]
			}
		}
	}
	if big != 0 {
		for i := range bs.mode {
			bs.mode[i] /= big
		}
	}
	return Buckling{Factor: 1 / mu, mode: bs.mode}, nil
}

// eigenvalues puts the eigenvalues of bs.a in bs.vals, ascending, keeping
// the vectors in bs.eig when mode is set. Without the mode it calls LAPACK's
// dsyev as mat.EigenSym does (same work size, so the same values) but in
// reused storage; bs.a is overwritten.
func (bs *buckleScratch) eigenvalues(n int, mode bool) error {
	bs.vals = grow(bs.vals, n)
	if mode {
		if !bs.eig.Factorize(bs.a, true) {
			return errEigen
		}
		bs.eig.Values(bs.vals)
		return nil
	}
	a := bs.a.RawSymmetric()
	if bs.workN != n {
		q := []float64{0}
		lapack64.Syev(lapack.EVNone, a, bs.vals, q, -1)
		bs.work, bs.workN = grow(bs.work, int(q[0])), n
	}
	if !lapack64.Syev(lapack.EVNone, a, bs.vals, bs.work, len(bs.work)) {
		return errEigen
	}
	return nil
}

var errEigen = errors.New("analysis: buckling eigenproblem did not converge")

// geometricStiffness returns the local geometric stiffness of member m under axial force N
// (tension positive). Released ends follow the condensed (hinged) shape functions.
func geometricStiffness(m *Member, L, N float64) [6][6]float64 {
	var kg [6][6]float64
	if m.Release == Pinned {
		t := N / L
		kg[1][1], kg[4][4], kg[1][4], kg[4][1] = t, t, -t, -t
		return kg
	}
	t := N / L
	b := [4][4]float64{
		{6.0 / 5, L / 10, -6.0 / 5, L / 10},
		{L / 10, 2 * L * L / 15, -L / 10, -L * L / 30},
		{-6.0 / 5, -L / 10, 6.0 / 5, -L / 10},
		{L / 10, -L * L / 30, -L / 10, 2 * L * L / 15},
	}
	idx := [4]int{1, 2, 4, 5}
	for i := range 4 {
		for j := range 4 {
			kg[idx[i]][idx[j]] = t * b[i][j]
		}
	}
	if m.Release == 0 {
		return kg
	}
	r := 2
	if m.Release == ReleaseEnd {
		r = 5
	}
	k := fullBending(m, L)
	// u_r = −Σ k_rj u_j / k_rr: the released rotation follows the others.
	var c [6][6]float64
	for i := range 6 {
		c[i][i] = 1
	}
	c[r][r] = 0
	for j := range 6 {
		if j != r {
			c[r][j] = -k[r][j] / k[r][r]
		}
	}
	var kc, out [6][6]float64
	for i := range 6 {
		for j := range 6 {
			for p := range 6 {
				kc[i][j] += kg[i][p] * c[p][j]
			}
		}
	}
	for i := range 6 {
		for j := range 6 {
			for p := range 6 {
				out[i][j] += c[p][i] * kc[p][j]
			}
		}
	}
	return out
}

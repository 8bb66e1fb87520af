package analysis

// Term is one primary case in a combination, scaled by Factor.
type Term struct {
	Case   int
	Factor float64
}

// Combination is a linear sum of primary-case results, e.g. 1.2G + 1.5Q is
// Combination{{G, 1.2}, {Q, 1.5}}. Linear superposition holds for Solve; it does not hold
// across tension-only solves.
type Combination []Term

// Primary returns the combination of case i alone.
func Primary(i int) Combination { return Combination{{Case: i, Factor: 1}} }

// Solution holds the results of a Solve. It belongs to its Workspace.
type Solution struct {
	w *Workspace
	// pending holds the cases of a SolveDisplacements whose forces are not
	// yet recovered (Complete); nil once complete.
	pending []LoadCase
}

// Cases returns the number of primary cases.
func (s *Solution) Cases() int { return s.w.nc }

// CaseName returns the name of primary case i.
func (s *Solution) CaseName(i int) string { return s.w.names[i] }

// Frame returns the frame solved.
func (s *Solution) Frame() *Frame { return s.w.frame }

// Active reports whether member m took part in the solve (false for a tension-only member
// that went slack).
func (s *Solution) Active(m int) bool { return s.w.active[m] }

// Displacement returns node n's global displacement [DX DY RZ] (mm, mm, rad) under comb. The
// rotation of a node where every member is hinged is reported as 0.
func (s *Solution) Displacement(comb Combination, n int) [3]float64 {
	return s.sum3(s.w.disp, comb, n)
}

// Reaction returns the support reaction [Fx Fy Mz] (N, N, N·mm, global, force on the
// structure) at node n under comb; zero at unsupported degrees of freedom.
func (s *Solution) Reaction(comb Combination, n int) [3]float64 {
	return s.sum3(s.w.react, comb, n)
}

func (s *Solution) sum3(v []float64, comb Combination, n int) [3]float64 {
	var r [3]float64
	nd := 3 * s.w.nn
	for _, t := range comb {
		for d := range 3 {
			r[d] += t.Factor * v[t.Case*nd+3*n+d]
		}
	}
	return r
}

// EndForces returns member m's local end forces [N1 V1 M1 N2 V2 M2] (forces of the nodes on
// the member) under comb.
func (s *Solution) EndForces(comb Combination, m int) [6]float64 {
	var r [6]float64
	for _, t := range comb {
		f := &s.w.endF[t.Case*s.w.nm+m]
		for i := range 6 {
			r[i] += t.Factor * f[i]
		}
	}
	return r
}

// AxialForce returns member m's axial force at mid-length (N, tension positive) under comb.
func (s *Solution) AxialForce(comb Combination, m int) float64 {
	return s.At(comb, m, s.w.geo[m].L/2, false).N
}

// Length returns member m's length, mm.
func (s *Solution) Length(m int) float64 { return s.w.geo[m].L }

// Forces are the internal forces at a section: N (N, tension +), V (N), M (N·mm, + tension
// on the local −y face).
type Forces struct {
	N, V, M float64
}

// At returns the internal forces of member m at x mm from its Start node under comb. At a
// point load, right selects the value just past x instead of just before it.
func (s *Solution) At(comb Combination, m int, x float64, right bool) Forces {
	var r Forces
	for _, t := range comb {
		f := &s.w.endF[t.Case*s.w.nm+m]
		q := Forces{N: -f[0], V: f[1], M: -f[2] + f[1]*x}
		for _, l := range s.w.memberLoads(t.Case, m) {
			if l.point {
				h := step(x, l.a, right)
				q.N -= l.px * h
				q.V += l.py * h
				q.M += l.py * pos(x-l.a)
				continue
			}
			d1, d2 := pos(x-l.a), pos(x-l.b)
			q.N -= l.px * (d1 - d2)
			q.V += l.py * (d1 - d2)
			q.M += l.py * (d1*d1 - d2*d2) / 2
		}
		r.N += t.Factor * q.N
		r.V += t.Factor * q.V
		r.M += t.Factor * q.M
	}
	return r
}

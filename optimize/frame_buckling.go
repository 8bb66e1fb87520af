package optimize

import (
	"math"

	"github.com/spansweep/spansweep/checks/analysis"
)

// bucklingSubdivisions splits each frame member into this many elements for
// the elastic buckling eigenproblem (analysis.BuckleSettings); 2 puts λc
// within about 1 % of the converged value for these frames (checked by
// TestBucklingSubdivisionsConverged) at a fifth of the cost of 4.
const bucklingSubdivisions = 2

// lambdas holds each combination's in-plane elastic buckling factor λc for
// the current solve: exact where computed, otherwise a proven lower bound,
// which is conservative because every check's utilisation falls as λc
// rises (shorter l_ex, larger N_ex).
type lambdas struct {
	value []float64
	exact []bool
	ref   int // combination whose exact λc bounds the others; -1 before any
}

func (l *lambdas) reset(n int) {
	l.value = fgrow(l.value, n)
	l.exact = fgrow(l.exact, n)
	for i := range l.value {
		l.value[i] = math.Inf(1)
	}
	l.ref = -1
}

func fgrow[T any](s []T, n int) []T {
	if cap(s) < n {
		return make([]T, n)
	}
	s = s[:n]
	clear(s)
	return s
}

// tabulateElementAxial records the axial force of every buckling element
// (each member split as analysis.Solution.Buckle splits it) per primary.
func (m *frameModel) tabulateElementAxial() {
	f := m.sol.Frame()
	np := len(m.prim)
	if cap(m.elemN) < np {
		m.elemN = make([][]float64, np)
	}
	m.elemN = m.elemN[:np]
	for i := range np {
		row := m.elemN[i][:0]
		for e := range f.Members {
			k := bucklingSubdivisions
			if f.Members[e].Release == analysis.Pinned {
				k = 1
			}
			L := m.sol.Length(e)
			for j := range k {
				row = append(row, m.sol.At(m.prim[i], e, L*(float64(j)+0.5)/float64(k), false).N)
			}
		}
		m.elemN[i] = row
	}
}

// compression returns comb's compression (positive) in buckling element e.
func (m *frameModel) compression(comb, e int) float64 {
	var n float64
	for _, t := range m.combs[comb] {
		n -= t.Factor * m.elemN[t.Case][e]
	}
	return n
}

// exactLambda computes comb's λc by the eigen-analysis; one analysis.
func (m *frameModel) exactLambda(l *lambdas, comb int) error {
	if l.exact[comb] {
		return nil
	}
	m.d.r.Analyses++
	b, err := m.sol.Buckle(m.combs[comb], &analysis.BuckleSettings{Subdivisions: bucklingSubdivisions})
	if err != nil {
		return err
	}
	l.value[comb], l.exact[comb] = b.Factor, true
	return nil
}

// boundLambdas sets every combination's λc: the reference combination (the
// ULS combination with the most compression) exactly, and each other one
// by the bound λc ≥ λref/t where t is the least factor with
// N*c,e ≤ t·N*ref,e in every element e (compression positive). The
// geometric stiffness is linear in the element forces and each element's
// matrix per unit force is positive semi-definite, so −Kg,c ≼ t·(−Kg,ref)
// in the Loewner order and the largest eigenvalue of K⁻¹(−Kg) scales by at
// most t (Rayleigh quotient). Where no such t exists λc is computed.
func (m *frameModel) boundLambdas(l *lambdas) error {
	l.reset(len(m.combs))
	ne := len(m.elemN[0])
	best, ref := -1.0, -1
	for _, c := range m.uls {
		var sum float64
		for e := range ne {
			sum += math.Max(m.compression(c, e), 0)
		}
		if sum > best {
			best, ref = sum, c
		}
	}
	if err := m.exactLambda(l, ref); err != nil {
		return err
	}
	l.ref = ref
	for _, c := range m.uls {
		if c == ref {
			continue
		}
		if t, ok := m.loewnerFactor(c, ref); ok {
			l.value[c] = l.value[ref] / t // +Inf when t = 0: no compression anywhere
			continue
		}
		if err := m.exactLambda(l, c); err != nil {
			return err
		}
	}
	return nil
}

// loewnerFactor returns the least t ≥ 0 with N*c,e ≤ t·N*ref,e for every
// element, and false if there is none.
func (m *frameModel) loewnerFactor(c, ref int) (float64, bool) {
	ne := len(m.elemN[0])
	var scale float64
	for e := range ne {
		scale = math.Max(scale, math.Abs(m.compression(ref, e)))
	}
	tol := 1e-9 * scale
	lo, hi := 0.0, math.Inf(1)
	for e := range ne {
		nc, nr := m.compression(c, e), m.compression(ref, e)
		switch {
		case nr > tol:
			lo = math.Max(lo, nc/nr)
		case nr < -tol:
			hi = math.Min(hi, nc/nr)
		case nc > tol:
			return 0, false
		}
	}
	if lo > hi {
		return 0, false
	}
	return lo, true
}

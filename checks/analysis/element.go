package analysis

// geom is a member's length and direction cosines.
type geom struct {
	L, c, s float64
}

func memberGeom(f *Frame, m *Member) geom {
	a, b := f.Nodes[m.Start], f.Nodes[m.End]
	L := length(a, b)
	return geom{L: L, c: (b.X - a.X) / L, s: (b.Y - a.Y) / L}
}

// localStiffness returns the 6×6 local stiffness of an Euler–Bernoulli beam with the
// released end moments condensed out (their rows and columns are zero).
// Stiffness coefficients: Przemieniecki, Theory of Matrix Structural Analysis, eq. 5.72
// (from memory); static condensation after Cook et al., Concepts and Applications of FEA §2.11.
func localStiffness(m *Member, L float64) [6][6]float64 {
	var k [6][6]float64
	ea := m.E * m.A / L
	k[0][0], k[3][3], k[0][3], k[3][0] = ea, ea, -ea, -ea
	if m.Release == Pinned {
		return k
	}
	ei := m.E * m.I
	a, b, c, d := 12*ei/(L*L*L), 6*ei/(L*L), 4*ei/L, 2*ei/L
	bend := [4][4]float64{{a, b, -a, b}, {b, c, -b, d}, {-a, -b, a, -b}, {b, d, -b, c}}
	idx := [4]int{1, 2, 4, 5}
	for i := range 4 {
		for j := range 4 {
			k[idx[i]][idx[j]] = bend[i][j]
		}
	}
	if m.Release&ReleaseStart != 0 {
		condense(&k, nil, 2)
	}
	if m.Release&ReleaseEnd != 0 {
		condense(&k, nil, 5)
	}
	return k
}

// condense removes degree of freedom r from k (and from the fixed-end forces f if not nil)
// by static condensation, leaving row and column r zero.
func condense(k *[6][6]float64, f *[6]float64, r int) {
	krr := k[r][r]
	if krr == 0 {
		return
	}
	for i := range 6 {
		if i == r {
			continue
		}
		kir := k[i][r] / krr
		if f != nil {
			f[i] -= kir * f[r]
		}
		for j := range 6 {
			if j != r {
				k[i][j] -= kir * k[r][j]
			}
		}
	}
	for i := range 6 {
		k[i][r], k[r][i] = 0, 0
	}
	if f != nil {
		f[r] = 0
	}
}

// condensedFixedEnd condenses fixed-end forces f of member m for its releases.
func condensedFixedEnd(m *Member, L float64, f *[6]float64) {
	if m.Release == 0 {
		return
	}
	if m.Release == Pinned {
		// A pin-ended member carries transverse load as a simple beam.
		v1 := f[1] - (f[2]+f[5])/L
		v2 := f[4] + (f[2]+f[5])/L
		f[1], f[2], f[4], f[5] = v1, 0, v2, 0
		return
	}
	k := fullBending(m, L)
	if m.Release&ReleaseStart != 0 {
		condense(&k, f, 2)
	}
	if m.Release&ReleaseEnd != 0 {
		condense(&k, f, 5)
	}
}

// fullBending returns the unreleased local stiffness of m.
func fullBending(m *Member, L float64) [6][6]float64 {
	mm := *m
	mm.Release = 0
	return localStiffness(&mm, L)
}

// toGlobal returns Tᵀ k T for direction cosines (c, s), block by block: each 3×3 block
// becomes Rᵀ k_IJ R with R the nodal rotation [[c s 0] [−s c 0] [0 0 1]].
func toGlobal(k *[6][6]float64, c, s float64) [6][6]float64 {
	var g [6][6]float64
	for _, I := range [2]int{0, 3} {
		for _, J := range [2]int{0, 3} {
			var t [3][3]float64 // k_IJ R
			for a := range 3 {
				ka := &k[I+a]
				t[a][0] = ka[J]*c - ka[J+1]*s
				t[a][1] = ka[J]*s + ka[J+1]*c
				t[a][2] = ka[J+2]
			}
			for b := range 3 {
				g[I][J+b] = c*t[0][b] - s*t[1][b]
				g[I+1][J+b] = s*t[0][b] + c*t[1][b]
				g[I+2][J+b] = t[2][b]
			}
		}
	}
	return g
}

// toLocal rotates a global end vector [X1 Y1 R1 X2 Y2 R2] into local axes.
func toLocal(u *[6]float64, c, s float64) [6]float64 {
	return [6]float64{c*u[0] + s*u[1], -s*u[0] + c*u[1], u[2], c*u[3] + s*u[4], -s*u[3] + c*u[4], u[5]}
}

// fromLocal rotates a local end vector into global axes.
func fromLocal(f *[6]float64, c, s float64) [6]float64 {
	return [6]float64{c*f[0] - s*f[1], s*f[0] + c*f[1], f[2], c*f[3] - s*f[4], s*f[3] + c*f[4], f[5]}
}

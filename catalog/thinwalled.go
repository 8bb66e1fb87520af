package catalog

import "math"

// moments are the centreline integrals about the centroid, mm units.
type moments struct {
	area, cx, cy  float64 // area and centroid
	ixx, iyy, ixy float64 // ∫y² dA, ∫x² dA, ∫xy dA
	j             float64 // Σ l t³/3
	x0, y0        float64 // shear centre relative to the centroid
	iw            float64 // ∫ω² dA, ω the normalised sectorial coordinate about the shear centre
	betaX, betaY  float64 // AS/NZS 4600 monosymmetry constants (before zeroing for symmetry)
	xMin, xMax    float64 // extreme fibres relative to the centroid, including the thickness
	yMin, yMax    float64
}

// integrate computes the thin-walled properties of c. Formulas: the
// centreline ("linear") method of the AISI Cold-Formed Steel Design Manual,
// Part I, and the sectorial-coordinate theory of Vlasov as set out in Yu &
// LaBoube, Cold-Formed Steel Design, App. B (from memory of both texts).
func (c *centreline) integrate() moments {
	var m moments
	for _, s := range c.strips {
		l := c.length(s)
		m.area += l * s.t
		m.cx += l * s.t * (c.x[s.i] + c.x[s.j]) / 2
		m.cy += l * s.t * (c.y[s.i] + c.y[s.j]) / 2
		m.j += l * s.t * s.t * s.t / 3
	}
	m.cx /= m.area
	m.cy /= m.area
	x := make([]float64, len(c.x))
	y := make([]float64, len(c.y))
	for k := range c.x {
		x[k], y[k] = c.x[k]-m.cx, c.y[k]-m.cy
	}
	m.ixx = c.sum(func(i, j int) (float64, float64, float64) { return prod(y, y, i, j) })
	m.iyy = c.sum(func(i, j int) (float64, float64, float64) { return prod(x, x, i, j) })
	m.ixy = c.sum(func(i, j int) (float64, float64, float64) { return prod(x, y, i, j) })
	m.shearCentre(c, x, y)
	m.monosymmetry(c, x, y)
	m.extremes(c, x, y)
	return m
}

// shearCentre finds the shear centre from the sectorial coordinate about the
// centroid, then the warping constant about it (Vlasov; Yu & LaBoube App. B).
func (m *moments) shearCentre(c *centreline, x, y []float64) {
	w := c.sectorial(x, y)
	iwx := c.sum(func(i, j int) (float64, float64, float64) { return prod(w, x, i, j) })
	iwy := c.sum(func(i, j int) (float64, float64, float64) { return prod(w, y, i, j) })
	det := m.ixx*m.iyy - m.ixy*m.ixy
	m.x0 = (m.iyy*iwy - m.ixy*iwx) / det
	m.y0 = -(m.ixx*iwx - m.ixy*iwy) / det
	// ω about the shear centre: ω_S = ω_G − x0·y + y0·x, then normalised so ∫ω dA = 0.
	for k := range w {
		w[k] += -m.x0*y[k] + m.y0*x[k]
	}
	mean := c.sum(func(i, j int) (float64, float64, float64) {
		return w[i], (w[i] + w[j]) / 2, w[j]
	}) / m.area
	for k := range w {
		w[k] -= mean
	}
	m.iw = c.sum(func(i, j int) (float64, float64, float64) { return prod(w, w, i, j) })
}

// monosymmetry computes βx = (∫y³ dA + ∫x²y dA)/Ix − 2y0 and
// βy = (∫x³ dA + ∫xy² dA)/Iy − 2x0 (AS/NZS 4600:2018 cl. 3.3.3.2.1).
func (m *moments) monosymmetry(c *centreline, x, y []float64) {
	cube := func(u, v []float64) float64 {
		return c.sum(func(i, j int) (float64, float64, float64) {
			um, vm := (u[i]+u[j])/2, (v[i]+v[j])/2
			return u[i] * (u[i]*u[i] + v[i]*v[i]), um * (um*um + vm*vm), u[j] * (u[j]*u[j] + v[j]*v[j])
		})
	}
	m.betaX = cube(y, x)/m.ixx - 2*m.y0
	m.betaY = cube(x, y)/m.iyy - 2*m.x0
}

// extremes finds the outermost fibres: the corners of every strip's rectangle.
func (m *moments) extremes(c *centreline, x, y []float64) {
	m.xMin, m.xMax, m.yMin, m.yMax = math.Inf(1), math.Inf(-1), math.Inf(1), math.Inf(-1)
	for _, s := range c.strips {
		if s.t == 0 {
			continue
		}
		d := vec{x[s.j] - x[s.i], y[s.j] - y[s.i]}.unit()
		n := vec{-d.y, d.x}.scale(s.t / 2)
		for _, k := range []int{s.i, s.j} {
			for _, sg := range []float64{-1, 1} {
				px, py := x[k]+sg*n.x, y[k]+sg*n.y
				m.xMin, m.xMax = math.Min(m.xMin, px), math.Max(m.xMax, px)
				m.yMin, m.yMax = math.Min(m.yMin, py), math.Max(m.yMax, py)
			}
		}
	}
}

// sectorial returns ω at every node with the pole at the origin of x, y and
// ω = 0 at node 0, walking the strips outwards from node 0 (dω = x dy − y dx).
func (c *centreline) sectorial(x, y []float64) []float64 {
	w := make([]float64, len(x))
	done := make([]bool, len(x))
	done[0] = true
	adj := make([][]int, len(x))
	for k, s := range c.strips {
		adj[s.i] = append(adj[s.i], k)
		adj[s.j] = append(adj[s.j], k)
	}
	queue := []int{0}
	for len(queue) > 0 {
		a := queue[0]
		queue = queue[1:]
		for _, k := range adj[a] {
			s := c.strips[k]
			b := s.i + s.j - a
			if done[b] {
				continue
			}
			w[b] = w[a] + x[a]*y[b] - x[b]*y[a]
			done[b] = true
			queue = append(queue, b)
		}
	}
	return w
}

// sum integrates over all strips a field given at a strip's start, middle and end.
func (c *centreline) sum(f func(i, j int) (fi, fm, fj float64)) float64 {
	var total float64
	for _, s := range c.strips {
		fi, fm, fj := f(s.i, s.j)
		total += simpson(c.length(s), s.t, fi, fm, fj)
	}
	return total
}

func (c *centreline) length(s strip) float64 { return math.Hypot(c.x[s.j]-c.x[s.i], c.y[s.j]-c.y[s.i]) }

// prod gives u·v at a strip's ends and middle for linearly varying u and v.
func prod(u, v []float64, i, j int) (float64, float64, float64) {
	return u[i] * v[i], (u[i] + u[j]) * (v[i] + v[j]) / 4, u[j] * v[j]
}

package analysis

// Deflection is the displacement of a point on a member: global Ux, Uy (mm); Axial and
// Transverse along local x and y (mm); Chord is the transverse displacement relative to the
// straight line joining the displaced ends (mm), the usual span deflection.
type Deflection struct {
	Ux, Uy            float64
	Axial, Transverse float64
	Chord             float64
}

// DeflectionAt returns the exact displacement of member m at x mm from its Start node under
// comb, from the member's end displacements and its loads: EI v″ = M(x), EA u′ = N(x), with
// the start slope fixed by the end displacement (valid for hinged ends too).
func (s *Solution) DeflectionAt(comb Combination, m int, x float64) Deflection {
	w := s.w
	mem := &w.frame.Members[m]
	g := &w.geo[m]
	var d Deflection
	for _, t := range comb {
		dd := w.disp[t.Case*3*w.nn:]
		ug := [6]float64{dd[3*mem.Start], dd[3*mem.Start+1], 0, dd[3*mem.End], dd[3*mem.End+1], 0}
		ul := toLocal(&ug, g.c, g.s)
		f := &w.endF[t.Case*w.nm+m]
		loads := w.memberLoads(t.Case, m)
		u := ul[0] + axialIntegral(f, loads, x)/(mem.E*mem.A)
		var v, chord float64
		if mem.I > 0 && (mem.Release != Pinned || hasTransverse(loads)) {
			phiL := bendingIntegral(f, loads, g.L)
			theta := (ul[4] - ul[1] - phiL/(mem.E*mem.I)) / g.L
			v = ul[1] + theta*x + bendingIntegral(f, loads, x)/(mem.E*mem.I)
		} else {
			v = ul[1] + (ul[4]-ul[1])*x/g.L
		}
		chord = v - (ul[1] + (ul[4]-ul[1])*x/g.L)
		d.Axial += t.Factor * u
		d.Transverse += t.Factor * v
		d.Chord += t.Factor * chord
	}
	d.Ux = g.c*d.Axial - g.s*d.Transverse
	d.Uy = g.s*d.Axial + g.c*d.Transverse
	return d
}

func hasTransverse(loads []localLoad) bool {
	for _, l := range loads {
		if l.py != 0 {
			return true
		}
	}
	return false
}

// bendingIntegral returns ∫₀ˣ (x − ξ) M(ξ) dξ for end forces f and loads (Macaulay brackets).
func bendingIntegral(f *[6]float64, loads []localLoad, x float64) float64 {
	r := -f[2]*x*x/2 + f[1]*x*x*x/6
	for _, l := range loads {
		d1 := pos(x - l.a)
		if l.point {
			r += l.py * d1 * d1 * d1 / 6
			continue
		}
		d2 := pos(x - l.b)
		r += l.py * (d1*d1*d1*d1 - d2*d2*d2*d2) / 24
	}
	return r
}

// axialIntegral returns ∫₀ˣ N(ξ) dξ.
func axialIntegral(f *[6]float64, loads []localLoad, x float64) float64 {
	r := -f[0] * x
	for _, l := range loads {
		d1 := pos(x - l.a)
		if l.point {
			r -= l.px * d1
			continue
		}
		d2 := pos(x - l.b)
		r -= l.px * (d1*d1 - d2*d2) / 2
	}
	return r
}

// MaxDeflection returns the largest |Chord| deflection of member m under comb and its
// position, searched on 200 stations and refined by golden-section search.
func (s *Solution) MaxDeflection(comb Combination, m int) (chord, x float64) {
	L := s.w.geo[m].L
	const n = 200
	best, bx := 0.0, 0.0
	for i := 0; i <= n; i++ {
		xi := L * float64(i) / n
		if v := s.DeflectionAt(comb, m, xi).Chord; abs(v) > abs(best) {
			best, bx = v, xi
		}
	}
	a, b := max(0, bx-L/n), min(L, bx+L/n)
	const gr = 0.6180339887498949
	for range 40 {
		c1, c2 := b-gr*(b-a), a+gr*(b-a)
		if abs(s.DeflectionAt(comb, m, c1).Chord) > abs(s.DeflectionAt(comb, m, c2).Chord) {
			b = c2
		} else {
			a = c1
		}
	}
	if v := s.DeflectionAt(comb, m, (a+b)/2).Chord; abs(v) > abs(best) {
		best, bx = v, (a+b)/2
	}
	return best, bx
}

func abs(v float64) float64 {
	if v < 0 {
		return -v
	}
	return v
}

package analysis

import (
	"errors"
	"fmt"
	"math"
)

// Gravity is standard gravity, m/s²; self weight per length is MassKgPerM · Gravity / 1000 N/mm.
const Gravity = 9.80665

// Axes says in which axes a member load's components are given.
type Axes uint8

// Load axes.
const (
	LocalAxes  Axes = iota // Qx along the member, Qy along local y
	GlobalAxes             // Qx along global X, Qy along global Y
)

// MemberLoad is a load on a member: uniform over [A, B] (N/mm) or a point load at A (N).
// A and B are distances from the member's Start node in mm; B is clamped to the member's
// length, so math.Inf(1) means "to the end". A global uniform load with Projected set is given
// per length projected normal to the load direction (e.g. roof live load per horizontal mm);
// otherwise per true length.
type MemberLoad struct {
	Member    int
	Point     bool
	A, B      float64
	Qx, Qy    float64
	Axes      Axes
	Projected bool
}

// UniformLoad returns a uniform load over the whole member.
func UniformLoad(member int, axes Axes, qx, qy float64) MemberLoad {
	return MemberLoad{Member: member, A: 0, B: math.Inf(1), Qx: qx, Qy: qy, Axes: axes}
}

// PartialLoad returns a uniform load over [a, b] mm from the member's Start node.
func PartialLoad(member int, a, b float64, axes Axes, qx, qy float64) MemberLoad {
	return MemberLoad{Member: member, A: a, B: b, Qx: qx, Qy: qy, Axes: axes}
}

// PointLoad returns a point load (N) at a mm from the member's Start node.
func PointLoad(member int, a float64, axes Axes, px, py float64) MemberLoad {
	return MemberLoad{Member: member, Point: true, A: a, Qx: px, Qy: py, Axes: axes}
}

// NodalLoad is a force (N) and moment (N·mm) applied at a node, global axes.
type NodalLoad struct {
	Node       int
	Fx, Fy, Mz float64
}

// LoadCase is a primary load case. SelfWeight multiplies the members' self weight
// (1 = gravity on all members with MassKgPerM > 0, 0 = none).
type LoadCase struct {
	Name       string
	Nodal      []NodalLoad
	Members    []MemberLoad
	SelfWeight float64
}

// Validate reports every bad load of the case against frame f in one error.
func (c *LoadCase) Validate(f *Frame) error {
	var errs []error
	for i, n := range c.Nodal {
		if n.Node < 0 || n.Node >= len(f.Nodes) {
			errs = append(errs, fmt.Errorf("case %q: nodal[%d]: node %d must be in [0, %d)", c.Name, i, n.Node, len(f.Nodes)))
		}
		if !finite(n.Fx) || !finite(n.Fy) || !finite(n.Mz) {
			errs = append(errs, fmt.Errorf("case %q: nodal[%d]: load must be finite", c.Name, i))
		}
	}
	for i, l := range c.Members {
		p := memberLoadPath{c.Name, i}
		if l.Member < 0 || l.Member >= len(f.Members) {
			errs = append(errs, fmt.Errorf("%s: member %d must be in [0, %d)", p, l.Member, len(f.Members)))
			continue
		}
		m := f.Members[l.Member]
		if m.TensionOnly {
			errs = append(errs, fmt.Errorf("%s: member %q is tension-only; apply loads at its nodes", p, m.Name))
		}
		L := length(f.Nodes[m.Start], f.Nodes[m.End])
		if !finite(l.Qx) || !finite(l.Qy) {
			errs = append(errs, fmt.Errorf("%s: components (%g, %g) must be finite", p, l.Qx, l.Qy))
		}
		if l.A < 0 || l.A > L*(1+1e-12) || math.IsNaN(l.A) {
			errs = append(errs, fmt.Errorf("%s: A = %g mm, want within [0, %g]", p, l.A, L))
		}
		if !l.Point && !(l.B > l.A) {
			errs = append(errs, fmt.Errorf("%s: B = %g mm, want > A = %g", p, l.B, l.A))
		}
	}
	if !finite(c.SelfWeight) {
		errs = append(errs, fmt.Errorf("case %q: SelfWeight = %g, want finite", c.Name, c.SelfWeight))
	}
	return errors.Join(errs...)
}

// memberLoadPath names a member load in errors; formatted only when an error is made.
type memberLoadPath struct {
	name string
	i    int
}

func (p memberLoadPath) String() string { return fmt.Sprintf("case %q: members[%d]", p.name, p.i) }

// localLoad is a member load resolved into local components per true length.
type localLoad struct {
	a, b   float64 // mm from Start; b == a for a point load
	px, py float64 // N/mm, or N for a point load
	point  bool
}

// resolve turns l into local components on member geometry g.
func resolve(l MemberLoad, g *geom) localLoad {
	qx, qy := l.Qx, l.Qy
	if l.Axes == GlobalAxes {
		if l.Projected && !l.Point {
			// Per projected length: the intensity per true length is scaled by
			// |e × d| where e is the member direction and d the load direction.
			if q := math.Hypot(qx, qy); q > 0 {
				f := math.Abs(g.c*qy-g.s*qx) / q
				qx, qy = qx*f, qy*f
			}
		}
		qx, qy = g.c*qx+g.s*qy, -g.s*qx+g.c*qy
	}
	b := math.Min(l.B, g.L)
	a := math.Min(l.A, g.L)
	if l.Point {
		b = a
	}
	return localLoad{a: a, b: b, px: qx, py: qy, point: l.Point}
}

// selfWeight returns the local load of member m's self weight times factor.
func selfWeight(m *Member, g *geom, factor float64) localLoad {
	w := -m.MassKgPerM * Gravity * 1e-3 * factor
	return localLoad{a: 0, b: g.L, px: g.s * w, py: g.c * w}
}

// pos returns max(x, 0).
func pos(x float64) float64 {
	if x > 0 {
		return x
	}
	return 0
}

// step returns 1 past a point load at a (right-hand value at x == a when right is set).
func step(x, a float64, right bool) float64 {
	if x > a || (right && x == a) {
		return 1
	}
	return 0
}

// fixedEnd adds the fixed-end forces (forces on the member from fully fixed ends) of load l on
// a member of length L to f, in local axes [N1 V1 M1 N2 V2 M2].
func (l *localLoad) fixedEnd(L float64, f *[6]float64) {
	if l.point {
		pointFixedEnd(L, l.a, l.px, l.py, 1, f)
		return
	}
	// The point-load formulas are cubic in the load position, so 2-point Gauss–Legendre
	// quadrature over [a, b] integrates them exactly.
	h := (l.b - l.a) / 2
	mid := (l.a + l.b) / 2
	g := h / math.Sqrt(3)
	pointFixedEnd(L, mid-g, l.px, l.py, h, f)
	pointFixedEnd(L, mid+g, l.px, l.py, h, f)
}

// pointFixedEnd adds w times the fixed-end forces of a point load (px, py) at a.
// Fixed-end forces of a point load: Roark's Formulas for Stress and Strain, Table 8.1 case 1d
// (from memory), written for the force on the member.
func pointFixedEnd(L, a, px, py, w float64, f *[6]float64) {
	b := L - a
	L2, L3 := L*L, L*L*L
	f[0] -= w * px * b / L
	f[3] -= w * px * a / L
	f[1] -= w * py * b * b * (L + 2*a) / L3
	f[2] -= w * py * a * b * b / L2
	f[4] -= w * py * a * a * (L + 2*b) / L3
	f[5] += w * py * a * a * b / L2
}

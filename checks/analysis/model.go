package analysis

import (
	"errors"
	"fmt"
	"math"
)

// Node is a joint of the frame at (X, Y) mm.
type Node struct {
	X, Y float64
}

// Release marks member ends whose bending moment is released (a hinge at that end).
type Release uint8

// Moment releases; combine with |.
const (
	ReleaseStart Release = 1 << iota // hinge at the Start node
	ReleaseEnd                       // hinge at the End node
)

// Pinned reports both ends released: the member carries axial force only.
const Pinned = ReleaseStart | ReleaseEnd

// Member is a prismatic beam between two nodes.
type Member struct {
	Name        string
	Start, End  int     // node indices
	E           float64 // MPa
	A           float64 // mm²
	I           float64 // mm⁴, in-plane second moment of area
	MassKgPerM  float64 // mass per metre, for self weight (ignored on tension-only members)
	Release     Release // moment releases (hinges)
	TensionOnly bool    // strap or rod: removed when in compression (see SolveTensionOnly)
}

// DOF names a nodal degree of freedom.
type DOF uint8

// Nodal degrees of freedom.
const (
	DX DOF = iota // translation along global X
	DY            // translation along global Y
	RZ            // rotation about Z, counter-clockwise positive
)

func (d DOF) String() string {
	switch d {
	case DX:
		return "DX"
	case DY:
		return "DY"
	case RZ:
		return "RZ"
	}
	return fmt.Sprintf("DOF(%d)", uint8(d))
}

// Support restrains a node. Fix[d] restrains degree of freedom d rigidly; Spring[d] adds a
// spring of stiffness N/mm (DX, DY) or N·mm/rad (RZ) to a free degree of freedom.
type Support struct {
	Node   int
	Fix    [3]bool
	Spring [3]float64
}

// FixedSupport restrains all three degrees of freedom of node n.
func FixedSupport(n int) Support { return Support{Node: n, Fix: [3]bool{true, true, true}} }

// PinnedSupport restrains both translations of node n.
func PinnedSupport(n int) Support { return Support{Node: n, Fix: [3]bool{true, true, false}} }

// RollerX lets node n move along X and restrains Y (a roller on a horizontal surface).
func RollerX(n int) Support { return Support{Node: n, Fix: [3]bool{false, true, false}} }

// RollerY lets node n move along Y and restrains X (a roller on a vertical surface).
func RollerY(n int) Support { return Support{Node: n, Fix: [3]bool{true, false, false}} }

// Frame is the structure: nodes, members and supports.
type Frame struct {
	Nodes    []Node
	Members  []Member
	Supports []Support
}

// Validate reports every bad field of the frame in one error.
func (f *Frame) Validate() error {
	var errs []error
	nn := len(f.Nodes)
	for i, n := range f.Nodes {
		if !finite(n.X) || !finite(n.Y) {
			errs = append(errs, fmt.Errorf("nodes[%d]: coordinates (%g, %g) must be finite", i, n.X, n.Y))
		}
	}
	for i, m := range f.Members {
		p := memberPath{i, m.Name}
		if m.Start < 0 || m.Start >= nn || m.End < 0 || m.End >= nn {
			errs = append(errs, fmt.Errorf("%s: nodes %d, %d must be in [0, %d)", p, m.Start, m.End, nn))
			continue
		}
		if m.Start == m.End {
			errs = append(errs, fmt.Errorf("%s: Start and End are both node %d", p, m.Start))
		} else if l := length(f.Nodes[m.Start], f.Nodes[m.End]); l <= 0 {
			errs = append(errs, fmt.Errorf("%s: length %g mm, want > 0", p, l))
		}
		if !(m.E > 0) || !finite(m.E) {
			errs = append(errs, fmt.Errorf("%s: E = %g MPa, want > 0", p, m.E))
		}
		if !(m.A > 0) || !finite(m.A) {
			errs = append(errs, fmt.Errorf("%s: A = %g mm², want > 0", p, m.A))
		}
		if m.Release != Pinned && (!(m.I > 0) || !finite(m.I)) {
			errs = append(errs, fmt.Errorf("%s: I = %g mm⁴, want > 0 (or release both ends)", p, m.I))
		}
		if m.MassKgPerM < 0 || !finite(m.MassKgPerM) {
			errs = append(errs, fmt.Errorf("%s: MassKgPerM = %g, want ≥ 0", p, m.MassKgPerM))
		}
	}
	for i, s := range f.Supports {
		if s.Node < 0 || s.Node >= nn {
			errs = append(errs, fmt.Errorf("supports[%d]: node %d must be in [0, %d)", i, s.Node, nn))
		}
		for d, k := range s.Spring {
			if k < 0 || !finite(k) {
				errs = append(errs, fmt.Errorf("supports[%d]: Spring[%v] = %g, want ≥ 0", i, DOF(d), k))
			}
		}
	}
	return errors.Join(errs...)
}

// memberPath names a member in errors; formatted only when an error is made.
type memberPath struct {
	i    int
	name string
}

func (p memberPath) String() string { return fmt.Sprintf("members[%d] %q", p.i, p.name) }

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

func length(a, b Node) float64 { return math.Hypot(b.X-a.X, b.Y-a.Y) }

package analysis

import (
	"errors"
	"math"
	"testing"
)

// column builds a vertical column of n elements, base at node 0.
func column(L float64, n int, rel Release) *Frame {
	f := &Frame{}
	for i := 0; i <= n; i++ {
		f.Nodes = append(f.Nodes, Node{Y: L * float64(i) / float64(n)})
	}
	for i := range n {
		f.Members = append(f.Members, Member{Start: i, End: i + 1, E: tE, A: tA, I: tI})
	}
	f.Members[0].Release = rel
	return f
}

// TestEulerBuckling checks λc·P against the Euler load π²EI/(kL)² (Timoshenko & Gere, Theory
// of Elastic Stability, §2.1–2.3): pinned–pinned k = 1, cantilever k = 2.
func TestEulerBuckling(t *testing.T) {
	const P = 1000.0
	for _, tc := range []struct {
		name     string
		rel      Release
		supports func(n int) []Support
		k        float64
	}{
		{"pinned strut", 0, func(n int) []Support { return []Support{PinnedSupport(0), RollerY(n)} }, 1},
		{"pinned strut, hinge released at base member", ReleaseStart, func(n int) []Support { return []Support{PinnedSupport(0), RollerY(n)} }, 1},
		{"cantilever", 0, func(n int) []Support { return []Support{FixedSupport(0)} }, 2},
	} {
		t.Run(tc.name, func(t *testing.T) {
			const n = 8
			f := column(tL, n, tc.rel)
			f.Supports = tc.supports(n)
			var ws Workspace
			s, err := ws.Solve(f, []LoadCase{{Name: "P", Nodal: []NodalLoad{{Node: n, Fy: -P}}}})
			if err != nil {
				t.Fatal(err)
			}
			b, err := s.Buckle(Primary(0), &BuckleSettings{Mode: true})
			if err != nil {
				t.Fatal(err)
			}
			pcr := math.Pi * math.Pi * tE * tI / (tc.k * tL * tc.k * tL)
			near(t, "λc·P", b.Factor*P, pcr, 1e-3)
			if m := b.Mode(n / 2); math.Abs(m[0]) < 0.1 {
				t.Errorf("mode at mid-height: got DX %g, want a sway", m[0])
			}
		})
	}
}

func TestBucklingTensionOnlyIsInfinite(t *testing.T) {
	f := column(tL, 4, 0)
	f.Supports = []Support{PinnedSupport(0), RollerY(4)}
	var ws Workspace
	s, err := ws.Solve(f, []LoadCase{{Name: "T", Nodal: []NodalLoad{{Node: 4, Fy: 1000}}}})
	if err != nil {
		t.Fatal(err)
	}
	b, err := s.Buckle(Primary(0), &BuckleSettings{Mode: true})
	if err != nil || !math.IsInf(b.Factor, 1) {
		t.Errorf("column in tension: got λ = %g, err %v; want +Inf, nil", b.Factor, err)
	}
}

func TestSingularStructure(t *testing.T) {
	for _, tc := range []struct {
		name string
		f    func() *Frame
		node int
	}{
		{"beam on two rollers slides in X", func() *Frame {
			f := beamLine(tL, 2)
			f.Supports = []Support{RollerX(0), RollerX(2)}
			return f
		}, -1},
		{"hinged beam with a mechanism", func() *Frame {
			f := beamLine(tL, 2)
			f.Members[0].Release = ReleaseEnd
			f.Members[1].Release = ReleaseStart
			f.Supports = []Support{PinnedSupport(0), RollerX(2)}
			return f
		}, 1},
		{"cantilever with no support", func() *Frame { return beamLine(tL, 2) }, -1},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var ws Workspace
			_, err := ws.Solve(tc.f(), []LoadCase{{Name: "w", Members: []MemberLoad{UniformLoad(0, GlobalAxes, 0, -1)}}})
			var se *SingularError
			if !errors.As(err, &se) {
				t.Fatalf("got error %v, want a SingularError", err)
			}
			if tc.node >= 0 && se.Node != tc.node {
				t.Errorf("got free node %d %v, want node %d", se.Node, se.DOF, tc.node)
			}
		})
	}
}

// TestMaxwellBetti checks reciprocity (Maxwell–Betti reciprocal theorem, any structural
// analysis text): the X displacement at the left knee from a unit Y load at a rafter node equals
// the Y displacement there from a unit X load at the knee.
func TestMaxwellBetti(t *testing.T) {
	p := kneePortal(PinnedBase)
	r := p.Parts[LeftRafter][1].Member
	j := p.Frame.Members[r].Start
	cases := []LoadCase{
		{Name: "Fy at j", Nodal: []NodalLoad{{Node: j, Fy: 1000}}},
		{Name: "Fx at knee", Nodal: []NodalLoad{{Node: p.Knees[Left], Fx: 1000}}},
	}
	var ws Workspace
	s, err := ws.Solve(&p.Frame, cases)
	if err != nil {
		t.Fatal(err)
	}
	a := s.Displacement(Primary(0), p.Knees[Left])[0]
	b := s.Displacement(Primary(1), j)[1]
	near(t, "δ_knee,x(Fy at j) vs δ_j,y(Fx at knee)", a, b, 1e-9)
}

// TestSelfCheckRejectsLostLoad: a moment on a node where every member is hinged has no load
// path; the balance check must refuse the solve.
func TestSelfCheckRejectsLostLoad(t *testing.T) {
	f := beamLine(tL, 2)
	f.Members[0].Release = ReleaseEnd
	f.Members[1].Release = ReleaseStart
	f.Supports = []Support{FixedSupport(0), FixedSupport(2)}
	var ws Workspace
	_, err := ws.Solve(f, []LoadCase{{Name: "M", Nodal: []NodalLoad{{Node: 1, Mz: 1e6}}}})
	var ce *CheckError
	if !errors.As(err, &ce) {
		t.Fatalf("got %v, want a CheckError", err)
	}
}

func TestCombinationIsLinear(t *testing.T) {
	p := kneePortal(FixedBase)
	g := LoadCase{Name: "G", SelfWeight: 1}
	wl := LoadCase{Name: "W"}
	p.RoofPressure(&wl, 0, 2000, -0.9)
	p.RoofPressure(&wl, 2000, 12000, -0.5)
	p.WallPressure(&wl, Left, 0, 4000, 0.7)
	both := LoadCase{Name: "1.2G+1.5W", SelfWeight: 1.2}
	for _, l := range wl.Members {
		l.Qx, l.Qy = 1.5*l.Qx, 1.5*l.Qy
		both.Members = append(both.Members, l)
	}
	var ws Workspace
	s, err := ws.Solve(&p.Frame, []LoadCase{g, wl, both})
	if err != nil {
		t.Fatal(err)
	}
	comb := Combination{{0, 1.2}, {1, 1.5}}
	for pt := LeftColumn; pt <= RightColumn; pt++ {
		a, b := p.Extremes(s, comb, pt), p.Extremes(s, Primary(2), pt)
		near(t, pt.String()+" max M", a.MaxM.Value, b.MaxM.Value, 1e-9)
		near(t, pt.String()+" min M", a.MinM.Value, b.MinM.Value, 1e-9)
	}
	near(t, "apex DY", s.Displacement(comb, p.Apex)[1], s.Displacement(Primary(2), p.Apex)[1], 1e-9)
}

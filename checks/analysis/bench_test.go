package analysis

import (
	"testing"

	"gonum.org/v1/gonum/lapack/lapack64"
)

// eightCases returns eight illustrative primary cases on portal p: dead, live, and six wind
// cases (crosswind both ways, with and without internal pressure, and two uplift cases).
func eightCases(p *Portal) []LoadCase {
	cs := []LoadCase{gravityCase(p), {Name: "Q"}}
	p.RoofGravity(&cs[1], 0, p.Spec.SpanMM, 1.5)
	for i := range 6 {
		c := crosswindCase(p)
		c.Name = "W" + string(rune('1'+i))
		f := 1 + 0.1*float64(i)
		for j := range c.Members {
			c.Members[j].Qx *= f
			c.Members[j].Qy *= f
		}
		cs = append(cs, c)
	}
	return cs
}

func TestSolveAllocatesNothingWhenWarm(t *testing.T) {
	p := kneePortal(PinnedBase)
	cases := eightCases(p)
	var ws Workspace
	if _, err := ws.Solve(&p.Frame, cases); err != nil {
		t.Fatal(err)
	}
	allocs := testing.AllocsPerRun(20, func() {
		if _, err := ws.Solve(&p.Frame, cases); err != nil {
			t.Fatal(err)
		}
	})
	if allocs != 0 {
		t.Errorf("warm Solve of 8 cases: got %g allocations, want 0", allocs)
	}
}

func BenchmarkPortalBuild(b *testing.B) {
	spec := kneePortal(PinnedBase).Spec
	b.ReportAllocs()
	for b.Loop() {
		if _, err := NewPortal(spec); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkSolve8 times assembly, factorisation and the solve of 8 primary cases with all
// self-checks, on a warm workspace (knee- and apex-braced portal, 11 nodes).
func BenchmarkSolve8(b *testing.B) {
	p := kneePortal(PinnedBase)
	cases := eightCases(p)
	var ws Workspace
	if _, err := ws.Solve(&p.Frame, cases); err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := ws.Solve(&p.Frame, cases); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkDiagrams times the extremes and 21-station diagrams of all seven parts for one
// combination.
func BenchmarkDiagrams(b *testing.B) {
	p := kneePortal(PinnedBase)
	var ws Workspace
	s, err := ws.Solve(&p.Frame, eightCases(p))
	if err != nil {
		b.Fatal(err)
	}
	comb := Combination{{0, 1.2}, {2, 1}}
	var d Diagram
	b.ReportAllocs()
	for b.Loop() {
		for pt := LeftColumn; pt < numParts; pt++ {
			_ = p.Extremes(s, comb, pt)
			p.Diagram(s, comb, pt, 21, &d)
		}
	}
}

func BenchmarkBuckle(b *testing.B) {
	for _, sub := range []int{1, 2, 4} {
		b.Run("subdivisions="+string(rune('0'+sub)), func(b *testing.B) {
			p := kneePortal(FixedBase)
			var ws Workspace
			s, err := ws.Solve(&p.Frame, eightCases(p))
			if err != nil {
				b.Fatal(err)
			}
			set := &BuckleSettings{Subdivisions: sub}
			b.ReportAllocs()
			for b.Loop() {
				if _, err := s.Buckle(Primary(0), set); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkFactorSolve8 times the Cholesky factorisation of an assembled knee-braced portal
// stiffness and the solve of its 8 right-hand sides, the part the brief's 20 µs target names.
func BenchmarkFactorSolve8(b *testing.B) {
	p := kneePortal(PinnedBase)
	var ws Workspace
	if _, err := ws.Solve(&p.Frame, eightCases(p)); err != nil {
		b.Fatal(err)
	}
	b.ReportAllocs()
	for b.Loop() {
		if err := ws.factor(); err != nil {
			b.Fatal(err)
		}
		ws.x.Copy(ws.rhs)
		lapack64.Potrs(ws.u, ws.x.RawMatrix())
	}
	b.ReportMetric(float64(ws.n), "unknowns")
}

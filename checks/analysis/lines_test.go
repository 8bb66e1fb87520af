package analysis

import (
	"math"
	"testing"
)

var purlinSec = Section{E: 200000, A: 600, I: 2.5e6, MassKgPerM: 0} // illustrative C-section

func TestPurlinLines(t *testing.T) {
	const w, L = 1.2, 6000.0
	one := Primary(0)
	for _, tc := range []struct {
		name      string
		spans     int
		typ       SpanType
		reactions []float64 // × wL
		mMax      float64   // end span sagging × wL²
		mSupport  float64   // × wL² (0 for simple spans)
		defl      float64   // end span × wL⁴/EI
		tolDefl   float64
	}{
		// AISC beam formulas (S12): simple beam M = wL²/8, δ = 5wL⁴/384EI.
		{"simple ×3", 3, SimpleSpans, []float64{0.5, 1, 1, 0.5}, 1.0 / 8, 0, 5.0 / 384, 1e-6},
		// REFERENCE-VALUES §7.6 (textbook tables from memory; 3-span confirmed S12).
		{"continuous ×2", 2, ContinuousSpans, []float64{0.375, 1.25, 0.375}, 9.0 / 128, -0.125, 0.00542, 2e-3},
		{"continuous ×3", 3, ContinuousSpans, []float64{0.4, 1.1, 1.1, 0.4}, 0.08, -0.1, 0.0069, 5e-3},
	} {
		t.Run(tc.name, func(t *testing.T) {
			pl, err := NewPurlinLine(PurlinLineSpec{Spans: tc.spans, SpanMM: L, Type: tc.typ, Section: purlinSec})
			if err != nil {
				t.Fatal(err)
			}
			c := LoadCase{Name: "w"}
			pl.Uniform(&c, w)
			var ws Workspace
			s, err := ws.Solve(&pl.Frame, []LoadCase{c})
			if err != nil {
				t.Fatal(err)
			}
			spans, reac := pl.Results(s, one)
			for i, r := range tc.reactions {
				near(t, "reaction", reac[i], r*w*L, 1e-9)
			}
			near(t, "end span max M", spans[0].MaxMoment.Value, tc.mMax*w*L*L, 1e-9)
			if tc.mSupport != 0 {
				near(t, "support M", spans[0].MinMoment.Value, tc.mSupport*w*L*L, 1e-9)
			}
			near(t, "end span deflection", spans[0].Deflection.Value, tc.defl*w*L*L*L*L/(purlinSec.E*purlinSec.I), tc.tolDefl)
		})
	}
}

// TestLappedTwoSpan checks a lapped two-span line against compatibility by virtual work with
// the stepped EI (any structural analysis text, e.g. Hibbeler, Structural Analysis, ch. 10):
// by symmetry the interior support has zero slope, so each span is a propped cantilever; the
// end reaction R satisfies R∫x²/EI = (w/2)∫x³/EI over the span, with EI doubled over the lap.
func TestLappedTwoSpan(t *testing.T) {
	const w, L, lap = 1.2, 6000.0, 600.0
	pl, err := NewPurlinLine(PurlinLineSpec{Spans: 2, SpanMM: L, Type: LappedSpans, LapMM: lap, Section: purlinSec})
	if err != nil {
		t.Fatal(err)
	}
	c := LoadCase{Name: "w"}
	pl.Uniform(&c, w)
	var ws Workspace
	s, err := ws.Solve(&pl.Frame, []LoadCase{c})
	if err != nil {
		t.Fatal(err)
	}
	integral := func(n float64) float64 { // ∫₀ᴸ xⁿ/EI(x) dx × EI
		a := L - lap
		return (math.Pow(a, n+1) + (math.Pow(L, n+1)-math.Pow(a, n+1))/2) / (n + 1)
	}
	R := w / 2 * integral(3) / integral(2)
	spans, reac := pl.Results(s, Primary(0))
	near(t, "end reaction", reac[0], R, 1e-9)
	near(t, "interior reaction", reac[1], 2*(w*L-R), 1e-9)
	near(t, "support moment", spans[0].MinMoment.Value, R*L-w*L*L/2, 1e-9)
	near(t, "span moment", spans[0].MaxMoment.Value, R*R/(2*w), 1e-9)
	near(t, "position of span moment", spans[0].MaxMoment.X, R/w, 1e-9)
}

// TestTensionOnlyBracing: one square panel of a wall bay (L = W = 3 m), pinned at both base
// nodes, horizontal P at the top of chord A. Method of joints, with only diagonal A0–B1 acting:
// joint A1: strut A1–B1 = −P (compression), chord A1–A0 = 0; joint B1: diagonal = +P·d/W
// (tension), chord B1–B0 = −P·L/W. Reversing P makes A0–B1 slack; joint A1 then gives
// B0–A1 = +P·d/W, chord A1–A0 = −P·L/W and the strut A1–B1 = 0.
func TestTensionOnlyBracing(t *testing.T) {
	const L, W, P = 3000.0, 3000.0, 10000.0
	sec := Section{E: 200000, A: 800, I: 1e6}
	rod := Section{E: 200000, A: 78.5} // illustrative 10 mm rod
	b, err := NewBracingBay(BracingBaySpec{LengthMM: L, WidthMM: W, Panels: 1, Chord: sec, Strut: sec, Diagonal: rod, Support: CantileverBay})
	if err != nil {
		t.Fatal(err)
	}
	d := math.Hypot(L, W)
	top := b.Chords[0][1]
	var ws Workspace
	for _, tc := range []struct {
		name          string
		p             float64
		acting, slack int     // diagonal index
		strut         float64 // top strut force, N
	}{
		{"load +Y", P, 0, 1, -P},
		{"load −Y", -P, 1, 0, 0},
	} {
		t.Run(tc.name, func(t *testing.T) {
			s, err := ws.SolveTensionOnly(&b.Frame, LoadCase{Name: tc.name, Nodal: []NodalLoad{{Node: top, Fy: tc.p}}})
			if err != nil {
				t.Fatal(err)
			}
			on, off := b.Diagonals[tc.acting], b.Diagonals[tc.slack]
			if !s.Active(on) || s.Active(off) {
				t.Fatalf("active: %s %v, %s %v; want only %s", b.Frame.Members[on].Name, s.Active(on), b.Frame.Members[off].Name, s.Active(off), b.Frame.Members[on].Name)
			}
			one := Primary(0)
			near(t, "acting diagonal", s.AxialForce(one, on), P*d/W, 1e-9)
			if n := s.AxialForce(one, off); n != 0 {
				t.Errorf("slack diagonal: got %g N, want 0", n)
			}
			if got := s.AxialForce(one, b.Struts[1]); math.Abs(got-tc.strut) > 1e-9*P {
				t.Errorf("top strut: got %g N, want %g", got, tc.strut)
			}
		})
	}
}

// TestRoofBracingBay: a 4-panel spanning roof bay with equal panel loads P on chord A is a
// simply supported truss: end reactions 2P each; by symmetry each half's diagonals in tension
// carry the shear of their panel (method of sections): |N| = V·d/W with V = 1.5P in the end
// panels and 0.5P in the middle ones.
func TestRoofBracingBay(t *testing.T) {
	const L, W, P = 12000.0, 6000.0, 5000.0
	sec := Section{E: 200000, A: 1500, I: 5e6}
	b, err := NewBracingBay(BracingBaySpec{LengthMM: L, WidthMM: W, Panels: 4, Chord: sec, Strut: sec, Diagonal: Section{E: 200000, A: 113}})
	if err != nil {
		t.Fatal(err)
	}
	c := LoadCase{Name: "end wall wind"}
	for i := 1; i < 4; i++ {
		c.Nodal = append(c.Nodal, NodalLoad{Node: b.Chords[0][i], Fy: P})
	}
	c.Nodal = append(c.Nodal, NodalLoad{Node: b.Chords[0][0], Fy: P / 2}, NodalLoad{Node: b.Chords[0][4], Fy: P / 2})
	var ws Workspace
	s, err := ws.SolveTensionOnly(&b.Frame, c)
	if err != nil {
		t.Fatal(err)
	}
	one := Primary(0)
	near(t, "left reaction", s.Reaction(one, b.Chords[0][0])[1], -2*P, 1e-9)
	d := math.Hypot(L/4, W)
	for i, v := range []float64{1.5, 0.5, 0.5, 1.5} {
		n := math.Max(s.AxialForce(one, b.Diagonals[2*i]), s.AxialForce(one, b.Diagonals[2*i+1]))
		near(t, "panel diagonal", n, v*P*d/W, 1e-9)
	}
}

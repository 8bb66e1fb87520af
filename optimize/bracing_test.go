package optimize

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/analysis"
)

func near(got, want, tol float64) bool { return math.Abs(got-want) <= tol*math.Max(1, math.Abs(want)) }

// TestBracingBayMethodOfJoints solves two bays by hand with the method of
// joints and compares the tension-only truss (checks/analysis) forces; when
// the load reverses, the other diagonal of each panel takes it and the
// first goes slack.
//
// Wall bay, one panel, height h = 3 m, width b = 6 m, bases pinned, load P
// along +y at the top of chord A (the end column). Joint B-top: the top
// strut pushes it with P (+y); only the "/" diagonal (A-base → B-top) meets
// it, so T·b/L = P, T = P·L/b = 10·6.7082/6 = 11.180 kN, and chord B takes
// T·h/L = P·h/b = 5 kN in compression. Joint A-top: the strut's
// compression is P. The "\" diagonal would be in compression: slack. The
// base of A is pulled up by T·h/L = 5 kN (uplift, reaction −5 kN along
// the column) and along by T·b/L = P (shear 10 kN); B's base is pushed down
// 5 kN. Reversed (−P at A-top): "\" (B-base → A-top) takes T = 11.180 kN
// directly, the strut carries nothing, A's base is pushed down 5 kN and B
// takes the uplift and the shear.
//
// Roof bay, two panels of a = 6 m, width b = 6 m, pinned at A0 and on a
// roller at A2, P = 10 kN along +y at A0, A1 and A2. Reactions 1.5P = 15 kN
// each (−y). Cut panel 1: the left part carries P − 1.5P = −0.5P, so the
// "/" diagonal takes T·b/L = 0.5P, T = 0.5P·√2 = 7.071 kN; panel 2's "\"
// likewise. Joint B0: strut 0 meets only the slack diagonal and chord B: 0.
// Joint B1: both diagonals pull it with 0.5P each towards chord A, so strut
// 1 is in compression P = 10 kN. Reversed (−P), the left part carries
// +0.5P, which only panel 1's "\" diagonal (B0 → A1) can take in tension,
// T = 7.071 kN again; it pulls B0 towards chord A with 0.5P, so strut 0 is
// in compression 0.5P = 5 kN (and strut 2 by symmetry) while joint B1 now
// meets no diagonal: strut 1 carries nothing.
func TestBracingBayMethodOfJoints(t *testing.T) {
	sec := analysis.Section{E: 200000, A: 500}
	diag := analysis.Section{E: 200000, A: 100}
	const P = 10e3 // N
	wall := analysis.BracingBaySpec{LengthMM: 3000, WidthMM: 6000, Panels: 1, Chord: sec, Strut: sec, Diagonal: diag,
		Support: analysis.CantileverBay}
	roof := analysis.BracingBaySpec{LengthMM: 12000, WidthMM: 6000, Panels: 2, Chord: sec, Strut: sec, Diagonal: diag,
		Support: analysis.SpanningBay}
	L := math.Hypot(3000, 6000)
	tests := []struct {
		name      string
		spec      analysis.BracingBaySpec
		loads     bayLoads
		diagonalN []float64 // by hand, above
		slack     []bool
		strutN    []float64 // compression positive
		reaction  [2][2]float64
		tolerance float64
	}{
		{"wall, load +y", wall, bayLoads{chordA: []float64{0, P}, chordB: []float64{0, 0}},
			[]float64{P * L / 6000, 0}, []bool{false, true}, []float64{0, P},
			[2][2]float64{{-P * 3000 / 6000, -P}, {P * 3000 / 6000, 0}}, 1e-9},
		{"wall, load reversed", wall, bayLoads{chordA: []float64{0, -P}, chordB: []float64{0, 0}},
			[]float64{0, P * L / 6000}, []bool{true, false}, []float64{0, 0},
			[2][2]float64{{P * 3000 / 6000, 0}, {-P * 3000 / 6000, P}}, 1e-9},
		{"roof, load +y", roof, bayLoads{chordA: []float64{P, P, P}, chordB: []float64{0, 0, 0}},
			[]float64{0.5 * P * math.Sqrt2, 0, 0, 0.5 * P * math.Sqrt2}, []bool{false, true, true, false}, []float64{0, P, 0},
			[2][2]float64{{0, -1.5 * P}, {0, -1.5 * P}}, 1e-9},
		{"roof, load reversed", roof, bayLoads{chordA: []float64{-P, -P, -P}, chordB: []float64{0, 0, 0}},
			[]float64{0, 0.5 * P * math.Sqrt2, 0.5 * P * math.Sqrt2, 0}, []bool{true, false, false, true}, []float64{0.5 * P, 0, 0.5 * P},
			[2][2]float64{{0, 1.5 * P}, {0, 1.5 * P}}, 1e-9},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			f, err := solveBay(tc.spec, tc.loads, tc.name)
			if err != nil {
				t.Fatal(err)
			}
			for i, want := range tc.diagonalN {
				if !near(f.diagonalN[i], want, tc.tolerance) || f.slack[i] != tc.slack[i] {
					t.Errorf("diagonal %d: got %.6g N (slack %v), want %.6g N (slack %v)", i, f.diagonalN[i], f.slack[i], want, tc.slack[i])
				}
			}
			for i, want := range tc.strutN {
				if !near(f.strutN[i], want, tc.tolerance) {
					t.Errorf("strut %d: got %.6g N compression, want %.6g", i, f.strutN[i], want)
				}
			}
			for k := range 2 {
				for j := range 2 {
					if !near(f.reaction[k][j], tc.reaction[k][j], tc.tolerance) {
						t.Errorf("support %d component %d: got %.6g N, want %.6g", k, j, f.reaction[k][j], tc.reaction[k][j])
					}
				}
			}
		})
	}
}

// The end wall's top reactions sum to half its wind load: the shares of
// roofPanelShares add to 1, and the apex share follows from the gable
// outline by hand. Span 12 m, eaves 3 m, 10°, slope 6.093 m and bay 6 m
// give one panel per slope (diagonals near 45°): panel points at u = 0, 6,
// 12 m; area = 12·3 + 12²·tan10°/4 = 42.348 m². Apex share = ∫ over
// [3, 9] m of h du / area = 2·3·(h(3) + h(6))/2 / area = 2·3·(3.5290 +
// 4.0580)/2 / 42.348 = 0.53748.
func TestBracingRoofPanelShares(t *testing.T) {
	c := bracingTestCase(t, 12, 4, 6, 3, "N2")
	d := &designer{c: c}
	l := d.layoutBracing()
	if l.roofPanels != 2 {
		t.Fatalf("got %d roof panels, want 2 (round(6.093/6) = 1 per slope)", l.roofPanels)
	}
	shares := l.roofPanelShares()
	var sum float64
	for _, s := range shares {
		sum += s
	}
	if !near(sum, 1, 1e-12) {
		t.Errorf("shares sum to %.12g, want 1", sum)
	}
	tan := math.Tan(10 * math.Pi / 180)
	area := 12*3 + 144*tan/4
	h3, h6 := 3+3*tan, 3+6*tan
	want := 2 * 3 * (h3 + h6) / 2 / area
	if !near(shares[1], want, 1e-12) || !near(l.gableAreaM2(), area, 1e-12) {
		t.Errorf("apex share %.6g, area %.6g: want %.6g, %.6g", shares[1], l.gableAreaM2(), want, area)
	}
}

// TestBracingStepForces runs the bracing step on a real case (purlins and
// girts by their steps, a hand-built frame) and checks the wall diagonal's
// design force against the hand path: the roof bay is symmetric, so each
// eave takes half of the end wall's top force and the roof restraint
// force, (p·A/2 + R_roof)/2; the wall bay's "/" diagonal then carries
// (that + R_wall)·L/b (method of joints above).
func TestBracingStepForces(t *testing.T) {
	c := bracingTestCase(t, 12, 6, 6, 3.6, "N3")
	d := bracingTestDesigner(t, c, &Settings{Record: true})
	if !d.bracing() {
		t.Fatalf("bracing failed: %s", d.r.Reason)
	}
	l := d.layoutBracing()
	if l.bracedBays != 2 || l.framesPerBay != 4 {
		t.Errorf("got %d braced bays restraining %d frames each, want 2 and ceil(7/2) = 4", l.bracedBays, l.framesPerBay)
	}
	var pMax float64
	for _, bc := range d.bracingCases() {
		pMax = math.Max(pMax, bc.gableKPa)
	}
	roofR, wallR := d.restraintForcesN(l)
	top := (pMax*l.gableAreaM2()/2*1e3 + roofR) / 2
	wantT := (top + wallR) * l.wallDiagonalM() / l.bayM
	solves, err := d.solveBracing(l)
	if err != nil {
		t.Fatal(err)
	}
	var gotT float64
	for _, s := range solves {
		gotT = math.Max(gotT, s.wall.maxDiagonalN())
	}
	if !near(gotT, wantT, 1e-9) {
		t.Errorf("wall diagonal tension: got %.6g N, want %.6g N by hand", gotT, wantT)
	}
	for _, role := range []Role{RoleRoofBracing, RoleWallBracing} {
		m := d.r.Member(role)
		if m.Designation == "" || !(m.MassKg > 0) || m.Count == 0 || m.Governing.Utilisation > 1 || !(m.Governing.Utilisation > 0) {
			t.Errorf("%s: got %+v, want a chosen strap or rod with 0 < utilisation ≤ 1", role, m)
		}
	}
	if m := d.r.Member(RoleWallBracing); m.Count != 2*l.wallPanels*2*2 {
		t.Errorf("wall diagonals: got %d, want 2 per panel × %d panels × 2 walls × 2 bays", m.Count, l.wallPanels)
	}
}

// TestBracingMissingSupport: with no strap or rod in the catalogue the
// building has no longitudinal support, a reasoned no_solution.
func TestBracingMissingSupport(t *testing.T) {
	def := catalog.Default()
	cat := &catalog.Catalogue{Name: "no tension members"}
	for _, s := range def.Sections {
		if s.Shape != catalog.ShapeStrap && s.Shape != catalog.ShapeRod {
			cat.Sections = append(cat.Sections, s)
		}
	}
	c := bracingTestCase(t, 12, 4, 6, 3, "N2")
	d := bracingTestDesigner(t, c, &Settings{Catalogue: cat})
	if d.bracing() {
		t.Fatal("bracing passed with no strap or rod in the catalogue")
	}
	if d.r.Status != NoSolution || !strings.Contains(d.r.Reason, "roof_bracing") || !strings.Contains(d.r.Reason, "no strap or rod") {
		t.Errorf("got status %v, reason %q; want no_solution naming the roof bracing and the missing straps and rods", d.r.Status, d.r.Reason)
	}
}

// The lightest-first searches give the same answer as evaluating every
// candidate (DESIGN.md §5.2).
func TestBracingExhaustiveAgrees(t *testing.T) {
	for _, w := range []string{"N2", "C2"} {
		c := bracingTestCase(t, 15, 5, 6, 4.2, w)
		var got [2][]string
		for i, ex := range []bool{false, true} {
			d := bracingTestDesigner(t, c, &Settings{Exhaustive: ex})
			if !d.bracing() || !d.endWalls() {
				t.Fatalf("%s exhaustive=%v: %s", w, ex, d.r.Reason)
			}
			for _, role := range []Role{RoleRoofBracing, RoleWallBracing, RoleEndWallColumn, RoleEndWallGirt} {
				m := d.r.Member(role)
				got[i] = append(got[i], fmt.Sprintf("%s %.6f kg", m.Designation, m.MassKg))
			}
		}
		if strings.Join(got[0], "; ") != strings.Join(got[1], "; ") {
			t.Errorf("%s: first-pass search got %v, exhaustive %v", w, got[0], got[1])
		}
	}
}

// BenchmarkBracingEndWallsFootings times the three steps of one case with
// hand-built frame reactions.
func BenchmarkBracingEndWallsFootings(b *testing.B) {
	c := bracingTestCase(b, 15, 6, 6, 4.2, "N3")
	d := bracingTestDesigner(b, c, nil)
	rs := framePrimaryReactions(d, 10, 8, -12)
	d.frm.Left, d.frm.Right = rs, rs
	for b.Loop() {
		d.r.Status, d.r.Reason = OK, ""
		if !d.bracing() || !d.endWalls() || !d.footings() {
			b.Fatal(d.r.Reason)
		}
	}
}

// The purlin strut's check lines carry the bracing's strut compression and
// the purlin's bending by hand: for the governing wind solve, N* = the
// largest strut force (roof bay, plus the wall bay's top strut at the
// eave), M* = wL²/8 with w = 0.9G normal to the roof + C_fig·q_u·spacing
// (simply supported over one bay).
func TestBracingStrutActionsByHand(t *testing.T) {
	c := bracingTestCase(t, 12, 6, 6, 3.6, "N3")
	d := bracingTestDesigner(t, c, &Settings{Record: true})
	l := d.layoutBracing()
	solves, err := d.solveBracing(l)
	if err != nil {
		t.Fatal(err)
	}
	sec := d.purlin.Section
	acts := d.strutActions(solves, sec)
	s0 := solves[0] // first longitudinal wind case, inward
	n := len(s0.roof.strutN) - 1
	wantN := math.Max(s0.roof.strutN[0], s0.roof.strutN[n]) + math.Max(s0.wall.strutN[l.wallPanels], 0)
	for _, f := range s0.roof.strutN[1:n] {
		wantN = math.Max(wantN, f)
	}
	cosA := math.Cos(10 * math.Pi / 180)
	g := (d.act.Dead.RoofKPa*d.purlin.SpacingM + sec.MassKgPerM*9.80665e-3) * cosA
	lo, _ := d.endBayRoofCfig(&d.act.Wind.Cases[s0.cas.windCase])
	w := 0.9*g + lo*d.act.Wind.Speeds.QULSKPa*d.purlin.SpacingM
	if a := acts[0]; !near(a.axialN, wantN, 1e-12) || !near(a.wNmm, w, 1e-12) || !(wantN > 0) {
		t.Errorf("got N* %.6g N, w %.6g kN/m; want %.6g N (> 0), %.6g kN/m", a.axialN, a.wNmm, wantN, w)
	}
	v := d.checkStrut(sec, acts[:1], d.purlin.Bridging, true)
	matched := 0
	for _, line := range v.checks {
		switch line.Name {
		case "section compression capacity":
			matched++
			endWallCheck(t, "strut N* kN", line.Demand, wantN/1e3)
		case "section moment capacity, major axis, bottom flange in compression": // suction: w < 0
			matched++
			endWallCheck(t, "strut M* kN·m", line.Demand, math.Abs(w)*36/8)
		}
	}
	if matched != 2 {
		t.Errorf("matched %d of the 2 strut check lines (compression, bottom-flange moment)", matched)
	}
}

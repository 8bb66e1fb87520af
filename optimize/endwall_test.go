package optimize

import (
	"math"
	"strings"
	"testing"
)

// TestEndWallColumnByHand checks the tallest end-wall column of a 12 m
// gable by hand. Layout: ceil(12/3) − 1 = 3 columns at 3.0 m; the middle one
// stands at the apex, H = 3.0 + 6·tan 10° = 4.0580 m. Inward wind on its
// 3.0 m tributary width: w = p_in·3.0 (p_in the girts' general inward ULS
// pressure), M* = wH²/8, V* = wH/2 (simply supported beam). Axial N* =
// 1.2(0.10 kPa·3.0 m·H + m·g·H) for the wall cladding and its own weight.
// SLS deflection 5w_sH⁴/(384EI) against H/150 (E = 200 000 MPa).
// The chosen section passes; the next lighter C fails (lightest first).
func TestEndWallColumnByHand(t *testing.T) {
	c := bracingTestCase(t, 12, 4, 6, 3, "N2")
	d := bracingTestDesigner(t, c, &Settings{Record: true})
	if !d.endWalls() {
		t.Fatalf("end walls failed: %s", d.r.Reason)
	}
	e := d.layoutEndWall(d.layoutBracing())
	H := 3 + 6*math.Tan(10*math.Pi/180)
	if len(e.heightsM) != 3 || !near(e.spacingM, 3, 1e-12) || !near(e.tallestM(), H, 1e-12) {
		t.Fatalf("got %d columns at %.4g m, tallest %.6g m; want 3 at 3 m, tallest %.6g m", len(e.heightsM), e.spacingM, e.tallestM(), H)
	}
	m := d.r.Member(RoleEndWallColumn)
	sec, ok := d.cat.Find(m.Designation)
	if !ok || m.Count != 6 || m.Governing.Utilisation > 1 {
		t.Fatalf("got %+v, want 6 passing columns of a catalogue section", m)
	}
	p := d.act.Wind.Girts
	w := p.GeneralInward.ULSKPa * 3 // kN/m
	wantM, wantV := w*H*H/8, w*H/2
	wantN := 1.2 * (0.10*3*H + sec.MassKgPerM*9.80665e-3*H)
	ws := p.GeneralInward.SLSKPa * 3
	wantDelta := 5 * ws * math.Pow(H*1e3, 4) / (384 * 200000 * sec.IxMM4)
	found := map[string]bool{}
	for _, g := range d.r.Calculation.Groups {
		if g.Role != RoleEndWallColumn {
			continue
		}
		for _, l := range g.Checks {
			switch {
			case l.Combination == "ULS 1.2G+Wu inward" && l.Name == "section moment capacity, major axis, top flange in compression":
				found["M"] = endWallCheck(t, "M* kN·m", l.Demand, wantM)
			case l.Combination == "ULS 1.2G+Wu inward" && strings.HasPrefix(l.Name, "shear capacity"):
				found["V"] = endWallCheck(t, "V* kN", l.Demand, wantV)
			case l.Combination == "ULS 1.2G+Wu inward" && l.Name == "section compression capacity":
				found["N"] = endWallCheck(t, "N* kN", l.Demand, wantN)
			case l.Combination == "SLS G+Ws inward":
				found["delta"] = endWallCheck(t, "deflection mm", l.Demand, wantDelta) && endWallCheck(t, "limit mm", l.Capacity, H*1e3/150)
			}
		}
	}
	if len(found) != 4 {
		var names []string
		for _, g := range d.r.Calculation.Groups {
			if g.Role == RoleEndWallColumn {
				for _, l := range g.Checks {
					names = append(names, l.Combination+": "+l.Name)
				}
			}
		}
		t.Errorf("found checks %v of M, V, N, delta; lines %v", found, names)
	}
	// Lightest first: the C or 2C just lighter than the chosen one fails.
	secs := d.mullionSections()
	for i, s := range secs {
		if s.Designation == sec.Designation && i > 0 {
			if v := d.checkMullion(e, secs[i-1], d.endWallGirtSpacingM(), false); v.governing.Utilisation <= 1 {
				t.Errorf("lighter %s passes at %.3f, so %s is not the lightest", secs[i-1].Designation, v.governing.Utilisation, sec.Designation)
			}
		}
	}
}

func endWallCheck(t *testing.T, name string, got, want float64) bool {
	t.Helper()
	if !near(got, want, 1e-9) {
		t.Errorf("%s: got %.6g, want %.6g by hand", name, got, want)
	}
	return true
}

// End-wall girts: lines at the girt spacing up to the apex, cut at each
// column. Span 12 m, eaves 3 m, 10° (ridge 4.058 m), columns at 3, 6, 9 m,
// spacing 1.5 m: lines at 1.5 and 3.0 m run the full 12 m in 4 pieces
// each; none at 4.5 m (above the ridge). 2 lines, 8 pieces, 24 m per wall.
func TestEndWallGirtRuns(t *testing.T) {
	c := bracingTestCase(t, 12, 4, 6, 3, "N2")
	d := &designer{c: c}
	l := d.layoutBracing()
	run := endWallGirtRuns(l, d.layoutEndWall(l), 1.5)
	if run.lines != 2 || run.pieces != 8 || !near(run.lengthM, 24, 1e-9) {
		t.Errorf("got %d lines, %d pieces, %.4g m; want 2, 8, 24 m", run.lines, run.pieces, run.lengthM)
	}
	// At 0.9 m spacing the line at 3.6 m sits in the gable, from
	// x0 = 0.6/tan 10° = 3.4028 m to 12 − x0: pieces [3.40, 6] and [6, 8.60].
	run = endWallGirtRuns(l, d.layoutEndWall(l), 0.9)
	x0 := 0.6 / math.Tan(10*math.Pi/180)
	want := 3*12 + (12 - 2*x0)
	if run.lines != 4 || run.pieces != 14 || !near(run.lengthM, want, 1e-9) {
		t.Errorf("got %d lines, %d pieces, %.6g m; want 4, 14, %.6g m", run.lines, run.pieces, run.lengthM, want)
	}
}

package optimize

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
)

// designFrame runs the frame step alone and returns the frame's mass per
// frame (kg) and the designer, or ok false.
func designFrame(t testing.TB, c grids.Case, cat *catalog.Catalogue, exhaustive bool) (float64, *designer, bool) {
	t.Helper()
	d := testFrameDesigner(t, c, cat, exhaustive)
	if !d.frame() {
		return 0, d, false
	}
	var kg float64
	for _, r := range []Role{RoleRafter, RoleColumn, RoleKneeBrace, RoleFlyBrace} {
		kg += d.r.Member(r).MassKg
	}
	return kg / float64(d.r.Frames), d, true
}

// varied returns n varied cases: spans, eaves, winds and bases, with knee
// braces allowed in every fourth (they cost a Nelder–Mead search per pair).
func variedFrameCases(t testing.TB, n int) []grids.Case {
	withKnee, without := frameOptions(t, true), frameOptions(t, false)
	spans := []float64{6, 7.5, 9, 10.5, 12}
	eaves := []float64{2.7, 3.3, 3.9, 4.5}
	winds := []string{"N1", "N2", "N3", "C1"}
	bases := []string{grids.BasePinned, grids.BaseFixed}
	var out []grids.Case
	for i := 0; len(out) < n; i++ {
		o := without
		if i%4 == 3 {
			o = withKnee
		}
		out = append(out, frameCase(o, spans[i%5], eaves[(i/5)%4], winds[(i/2)%4], bases[(i/3)%2]))
	}
	return out
}

// The search finds the same lightest frame as evaluating every candidate
// (DESIGN.md §5.2), on a reduced catalogue over 52 varied cases, and never
// runs more analyses.
func TestFrameSearchMatchesExhaustive(t *testing.T) {
	cat := reducedCatalogue(t)
	var searchN, exhaustN int
	for _, c := range variedFrameCases(t, 52) {
		ms, ds, oks := designFrame(t, c, cat, false)
		me, de, oke := designFrame(t, c, cat, true)
		searchN, exhaustN = searchN+ds.r.Analyses, exhaustN+de.r.Analyses
		if oks != oke || math.Abs(ms-me) > 1e-9 {
			t.Errorf("%s: search %v %.3f kg/frame (%s / %s), exhaustive %v %.3f kg/frame (%s / %s)", c.ID,
				oks, ms, ds.r.Member(RoleRafter).Designation, ds.r.Member(RoleColumn).Designation,
				oke, me, de.r.Member(RoleRafter).Designation, de.r.Member(RoleColumn).Designation)
		}
	}
	t.Logf("analyses: search %d, exhaustive %d", searchN, exhaustN)
	if searchN > exhaustN {
		t.Errorf("search ran %d analyses, more than the exhaustive %d", searchN, exhaustN)
	}
}

// A milder case never needs a heavier frame: stronger wind, a larger span
// or a taller eave, the rest equal, never gives a lighter frame (issue 6).
func TestFrameMassMonotone(t *testing.T) {
	cat := reducedCatalogue(t)
	o := frameOptions(t, false)
	type step struct {
		name       string
		mild, hard grids.Case
	}
	var steps []step
	for _, w := range [][2]string{{"N1", "N2"}, {"N2", "N3"}, {"N3", "C1"}} {
		steps = append(steps, step{"wind " + w[0] + "→" + w[1], frameCase(o, 9, 3.3, w[0], grids.BasePinned), frameCase(o, 9, 3.3, w[1], grids.BasePinned)})
	}
	for _, s := range [][2]float64{{6, 7.5}, {7.5, 9}, {9, 10.5}} {
		steps = append(steps, step{fmt.Sprintf("span %g→%g", s[0], s[1]), frameCase(o, s[0], 3.3, "N2", grids.BasePinned), frameCase(o, s[1], 3.3, "N2", grids.BasePinned)})
	}
	for _, h := range [][2]float64{{2.7, 3.3}, {3.3, 3.9}, {3.9, 4.5}} {
		steps = append(steps, step{fmt.Sprintf("eaves %g→%g", h[0], h[1]), frameCase(o, 9, h[0], "N2", grids.BaseFixed), frameCase(o, 9, h[1], "N2", grids.BaseFixed)})
	}
	for _, s := range steps {
		mm, _, okm := designFrame(t, s.mild, cat, false)
		mh, _, okh := designFrame(t, s.hard, cat, false)
		if !okm {
			t.Errorf("%s: the milder case has no frame on the reduced catalogue", s.name)
		}
		if okm && okh && mh < mm-1e-9 {
			t.Errorf("%s: harder case %.2f kg/frame, lighter than the milder %.2f", s.name, mh, mm)
		}
	}
}

// On the default catalogue, with the default options (knee braces
// allowed), the search finds the exhaustive enumeration's frame with at
// most a tenth of its analyses (issue 6).
func TestFrameSearchAnalysesDefaultCatalogue(t *testing.T) {
	if testing.Short() {
		t.Skip("exhaustive enumeration of the default catalogue")
	}
	c := frameCase(frameOptions(t, true), 12, 3.6, "N3", grids.BasePinned)
	ms, ds, oks := designFrame(t, c, nil, false)
	me, de, oke := designFrame(t, c, nil, true)
	if oks != oke || math.Abs(ms-me) > 1e-9 {
		t.Errorf("search %v %.3f kg/frame, exhaustive %v %.3f kg/frame", oks, ms, oke, me)
	}
	t.Logf("analyses: search %d, exhaustive %d", ds.r.Analyses, de.r.Analyses)
	if 10*ds.r.Analyses > de.r.Analyses {
		t.Errorf("search ran %d analyses, more than a tenth of the exhaustive %d", ds.r.Analyses, de.r.Analyses)
	}
}

// A span far beyond the catalogue has no frame, and the reason names the
// member group, the best candidate, its utilisation or bound, and a check.
func TestFrameNoSolution(t *testing.T) {
	o := frameOptions(t, true)
	c := frameCase(o, 40, 4.5, "C1", grids.BasePinned)
	_, d, ok := designFrame(t, c, reducedCatalogue(t), false)
	if ok {
		t.Fatalf("40 m span with the reduced catalogue: got a frame %s / %s, want no solution",
			d.r.Member(RoleRafter).Designation, d.r.Member(RoleColumn).Designation)
	}
	t.Logf("reason: %s", d.r.Reason)
	if d.r.Status != NoSolution {
		t.Errorf("status %v, want no_solution", d.r.Status)
	}
	for _, want := range []string{"rafter", "2C300x2.4", "AS/NZS 4600:2018"} {
		if !strings.Contains(d.r.Reason, want) {
			t.Errorf("reason %q does not name %q", d.r.Reason, want)
		}
	}
}

// The frame step fills the choice the footing and bracing steps read: both
// bases' reactions under every combination, and under ULS 1.2G+1.5Q the
// vertical reactions carry half the frame's vertical load each (statics).
func TestFrameReactions(t *testing.T) {
	_, d, ok := designFrame(t, frameCase(frameOptions(t, false), 9, 3.3, "N2", grids.BasePinned), reducedCatalogue(t), false)
	if !ok {
		t.Fatal(d.r.Reason)
	}
	if !(d.frm.RafterMomentKNm > 0 && d.frm.ColumnMomentKNm > 0) {
		t.Errorf("largest moments: rafter %g, column %g kN·m, want both positive", d.frm.RafterMomentKNm, d.frm.ColumnMomentKNm)
	}
	n := len(d.act.Combinations)
	if len(d.frm.Left) != n || len(d.frm.Right) != n {
		t.Fatalf("reactions: %d left, %d right, want %d each", len(d.frm.Left), len(d.frm.Right), n)
	}
	for i, c := range d.act.Combinations {
		l, r := d.frm.Left[i], d.frm.Right[i]
		if c.Name != "ULS 1.2G+1.5Q" {
			continue
		}
		if math.Abs(l.VerticalKN-r.VerticalKN) > 1e-6*math.Abs(l.VerticalKN) || l.VerticalKN <= 0 {
			t.Errorf("%s: vertical %g and %g kN, want equal and downward", c.Name, l.VerticalKN, r.VerticalKN)
		}
		if math.Abs(l.ShearKN-r.ShearKN) > 1e-6*math.Abs(l.ShearKN)+1e-9 {
			t.Errorf("%s: horizontal %g and %g kN, want equal (symmetric load)", c.Name, l.ShearKN, r.ShearKN)
		}
		// Live load alone on plan: 1.5 × q × bay × span / 2 per base, plus the dead share.
		live := 1.5 * d.act.RoofLiveKPa * d.c.BaySpacingM * d.c.SpanM / 2
		if l.VerticalKN < live {
			t.Errorf("%s: vertical %g kN below the live share %g kN", c.Name, l.VerticalKN, live)
		}
	}
}

// Recording fills the frame calculation and both groups' checks.
func TestFrameRecord(t *testing.T) {
	d := testFrameDesigner(t, frameCase(frameOptions(t, false), 9, 3.3, "N2", grids.BasePinned), reducedCatalogue(t), false)
	d.r.Calculation = &Calculation{}
	if !d.frame() {
		t.Fatal(d.r.Reason)
	}
	fc := d.r.Calculation.Frame
	if fc == nil || !(fc.BucklingFactor > 1) || len(fc.Diagrams) < 4 || len(fc.Deflections) != 2 {
		t.Fatalf("frame calculation incomplete: %+v", fc)
	}
	var gov float64
	for _, g := range d.r.Calculation.Groups {
		if g.Role != RoleRafter {
			continue
		}
		for _, l := range g.Checks {
			gov = math.Max(gov, l.Utilisation)
		}
	}
	if want := d.r.Member(RoleRafter).Governing.Utilisation; math.Abs(gov-want) > 1e-9 && d.r.Member(RoleRafter).Governing.LimitState == "ULS" {
		t.Errorf("largest recorded rafter check %.4f, governing %.4f", gov, want)
	}
}

// The whole design runs with the frame step between the lead's purlin and
// girt steps and the later steps, and the frame groups are filled.
func TestFrameInDesign(t *testing.T) {
	r := Design(frameCase(frameOptions(t, false), 9, 3.3, "N2", grids.BasePinned), nil)
	if r.Status != OK {
		t.Fatalf("design: %v: %s", r.Status, r.Reason)
	}
	for _, role := range []Role{RoleRafter, RoleColumn} {
		m := r.Member(role)
		if m.Designation == "" || m.Count != 2*r.Frames || !(m.MassKg > 0) || !(m.Governing.Utilisation > 0 && m.Governing.Utilisation <= 1) {
			t.Errorf("%s group: %+v", role, m)
		}
	}
	if r.Frames != 6 {
		t.Errorf("frames: got %d, want bays + 1 = 6", r.Frames)
	}
}

// BenchmarkFrameSearch times one frame search per case on the default
// catalogue (target from issue 6: under 5 ms per case on one core).
func BenchmarkFrameSearch(b *testing.B) {
	for _, knee := range []bool{false, true} {
		b.Run(fmt.Sprintf("knee_braces=%v", knee), func(b *testing.B) {
			c := frameCase(frameOptions(b, knee), 12, 3.6, "N3", grids.BasePinned)
			var analyses int
			for b.Loop() {
				d := testFrameDesigner(b, c, nil, false)
				if !d.frame() {
					b.Fatal(d.r.Reason)
				}
				analyses = d.r.Analyses
			}
			b.ReportMetric(float64(analyses), "analyses/case")
		})
	}
}

// fastUtilisation is coldformed.CheckBeamColumn's utilisation for
// compression without in-plane amplification (its stated identity), over
// every frame section and a spread of actions and segments.
func TestFastUtilisationMatchesCheck(t *testing.T) {
	caps := capacitiesFor(catalog.Default())
	for _, shape := range []catalog.Shape{catalog.ShapeC, catalog.Shape2C} {
		for i, sec := range catalog.Default().ByShape(shape) {
			c, err := caps.of(sec)
			if err != nil {
				t.Fatal(err)
			}
			s := newMemberSpec(rafterKind, sec, c, 6000, []float64{1200, 2400, 3600, 4800})
			for j, a := range []struct{ nFrac, mFrac, vFrac, length, cb float64 }{
				{0, 0.5, 0.1, 1200, 1}, {0.05, 0.6, 0.3, 2400, 1.75}, {0.3, 0.3, 0.6, 6000, 1.1}, {0.6, 0.1, 0.05, 3000, 2.3},
			} {
				in := partInputs{n: a.nFrac * c.Ns, lex: lexFloor, v: a.vFrac * c.Vv, mAtV: 0.3 * a.mFrac * c.MsTop}
				m := a.mFrac * c.MsTop
				for _, outer := range []bool{true, false} {
					fast, ok := s.fastUtilisation(in, m, a.length, a.cb, outer)
					res, err := s.check(in, m, a.length, a.cb, outer)
					if err != nil || !ok {
						t.Fatalf("%s case %d: ok %v, %v", sec.Designation, j, ok, err)
					}
					if want := res.Utilisation(); math.Abs(fast-want) > 1e-6*want {
						t.Errorf("%s (%d) case %d outer %v: fast %.9f, CheckBeamColumn %.9f (%s)", sec.Designation, i, j, outer, fast, want, res.Governing().Clause)
					}
				}
			}
		}
	}
}

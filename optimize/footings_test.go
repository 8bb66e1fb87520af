package optimize

import (
	"math"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/checks/actions"
)

// TestFootingsHandSized sizes a pad by hand through the footings step:
// ULS uplift 30 kN and SLS 40 kN down at every base, checks/footing's
// defaults (0.9 × 24 kN/m³ against uplift, AS/NZS 1170.0:2002 cl. 4.2.1(b);
// 100 kPa allowable bearing, common practice; widths from 0.45 m in 0.05 m
// steps, depths 0.6–1.5 m in 0.1 m steps, smallest volume first).
// Uplift needs B²D ≥ 30/(0.9·24) = 1.389 m³. The smallest grid volume at or
// above it, depth by depth: D 0.6 → B 1.55 (1.442); 0.7 → 1.45 (1.472);
// 0.8 → 1.35 (1.458); 0.9 → 1.25 (1.406); 1.0 → 1.20 (1.440); 1.1 → 1.15
// (1.455); 1.2 → 1.10 (1.452); 1.3 → 1.05 (1.433); 1.4 → 1.00 (1.400);
// 1.5 → 1.00 (1.500). So B = 1.00 m, D = 1.40 m, 1.4 m³; bearing (40 +
// 24·1.4)/1.0² = 73.6 kPa ≤ 100. Uplift utilisation 30/(0.9·24·1.4) =
// 0.992. Bolts: φN_tf = 0.8·84.3 mm²·400 MPa = 26.98 kN per M12 class 4.6
// (AS 4100:2020 cl. 9.3.2.2, A_s of M12 from memory of AS 1275), so two
// M12 carry the 30 kN uplift.
func TestFootingsHandSized(t *testing.T) {
	c := bracingTestCase(t, 12, 4, 6, 3, "N2")
	d := bracingTestDesigner(t, c, nil)
	rs := []BaseReaction{
		{Combination: "ULS hand uplift", LimitState: "ULS", VerticalKN: -30},
		{Combination: "SLS hand down", LimitState: "SLS", VerticalKN: 40},
	}
	d.frm.Left, d.frm.Right = rs, rs
	if !d.footings() {
		t.Fatalf("footings failed: %s", d.r.Reason)
	}
	// 5 frames; both end bays braced (4 frames): 2 bases outside the
	// braced bays, 8 inside. The hand combinations carry no bracing
	// reactions, so both types take the same pad.
	f, b := d.r.Footing, d.r.BracedFooting
	for _, x := range []struct {
		name      string
		got, want float64
	}{
		{"width m", f.WidthM, 1.0},
		{"depth m", f.DepthM, 1.4},
		{"count", float64(f.Count), 2},
		{"concrete m³", f.ConcreteM3, 2 * 1.4},
		{"braced count", float64(b.Count), 8},
		{"braced concrete m³", b.ConcreteM3, 8 * 1.4},
		{"uplift utilisation", f.Governing.Utilisation, 30 / (0.9 * 24 * 1.4)},
		{"bolts per base", float64(f.BoltsPerBase), 2},
	} {
		if !near(x.got, x.want, 1e-6) {
			t.Errorf("%s: got %.6g, want %.6g", x.name, x.got, x.want)
		}
	}
	if !strings.Contains(f.Governing.Check, "uplift") || f.BoltSize != "M12 4.6" {
		t.Errorf("got governing %q and bolts %q, want uplift and M12 4.6", f.Governing.Check, f.BoltSize)
	}
}

// framePrimaryReactions builds a frame's base reactions for every
// combination of the case from primary values (kN, down positive): g for
// G, q for Q and w for each wind primary at ULS pressures, so each
// combination's reaction is its linear sum (AS/NZS 1170.0 combination
// factors from checks/actions).
func framePrimaryReactions(d *designer, g, q, w float64) []BaseReaction {
	var out []BaseReaction
	for _, comb := range d.act.Combinations {
		v := 0.0
		for _, f := range comb.Factors {
			switch f.Case {
			case actions.G:
				v += f.Factor * g
			case actions.Q:
				v += f.Factor * q
			default:
				v += f.Factor * w
			}
		}
		out = append(out, BaseReaction{Combination: comb.Name, LimitState: comb.LimitState.String(), VerticalKN: v})
	}
	return out
}

// A light shed in a high wind is held down by its footings' weight (uplift
// governs); a heavy one in a low wind is sized by bearing. The wall
// bracing's reactions are added at the braced bays' bases, whose pads are
// therefore at least as large.
func TestFootingsUpliftOrBearingGoverns(t *testing.T) {
	tests := []struct {
		name      string
		wind      string
		g, q, w   float64 // kN per base: dead, roof live, each wind case (ULS, uplift negative)
		governing string
	}{
		{"light shed, high wind", "C2", 4, 3, -30, "uplift"},
		{"heavy shed, low wind", "N1", 60, 25, -3, "bearing"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			c := bracingTestCase(t, 12, 4, 6, 3, tc.wind)
			d := bracingTestDesigner(t, c, nil)
			rs := framePrimaryReactions(d, tc.g, tc.q, tc.w)
			d.frm.Left, d.frm.Right = rs, rs
			if !d.footings() {
				t.Fatalf("footings failed: %s", d.r.Reason)
			}
			if f := d.r.Footing; !strings.Contains(f.Governing.Check, tc.governing) || f.Governing.Utilisation > 1 {
				t.Errorf("got governing %q at %.3f (%s), want %s", f.Governing.Check, f.Governing.Utilisation, f.Governing.Combination, tc.governing)
			}
			f, b := d.r.Footing, d.r.BracedFooting
			if b.Count == 0 || b.ConcreteM3/float64(b.Count) < f.ConcreteM3/float64(f.Count) {
				t.Errorf("braced bay pads %+v smaller than frame base pads %+v", b, f)
			}
		})
	}
}

// The wall bracing's reactions balance its loads (statics of the bay):
// vertical reactions equal and opposite, their couple over the bay width
// equal to the overturning of the top forces over the eaves height, the
// shears summing to the top forces.
func TestFootingsBracingReactionsBalance(t *testing.T) {
	c := bracingTestCase(t, 12, 4, 6, 3.6, "N3")
	d := bracingTestDesigner(t, c, nil)
	l := d.layoutBracing()
	solves, err := d.solveBracing(l)
	if err != nil {
		t.Fatal(err)
	}
	_, wallR := d.restraintForcesN(l)
	for _, s := range solves {
		top := -s.roof.reaction[0][1]
		if r := -s.roof.reaction[1][1]; math.Abs(r) > math.Abs(top) {
			top = r
		}
		h := top + s.direction*wallR // both top forces, N
		r := s.wall.reaction
		if !near(r[0][0]+r[1][0], 0, 1e-9) || !near(math.Abs(r[0][0])*l.bayM, math.Abs(h)*l.eavesM, 1e-9) ||
			!near(r[0][1]+r[1][1], -h, 1e-9) {
			t.Errorf("%s: reactions %v do not balance top forces %.6g N", s.label(), r, h)
		}
	}
	extras, err := d.bracedBaseExtras()
	if err != nil {
		t.Fatal(err)
	}
	for _, comb := range d.act.Combinations {
		want := strings.Contains(comb.Name, "longitudinal") || comb.Name == gravityBracingCase
		if got := len(extras[comb.Name]) > 0; got != want {
			t.Errorf("%s: bracing reactions present %v, want %v", comb.Name, got, want)
		}
	}
}

package coldformed

import (
	"math"
	"testing"

	"github.com/spansweep/spansweep/catalog"
)

func TestRFactorTable(t *testing.T) {
	// AS/NZS 4600:2005 Table 3.3.3.4 / AISI S100 I6.2.1 R values (from memory:
	// REFERENCE-VALUES §5.8).
	z := aisi8ZS() // d = 203 mm, d/t 136, d/b 3.56, b/t 38
	c250 := sharpC(250, 75, 18, 2.4, 5, 450, 480)
	c150 := sharpC(150, 50, 15, 1.5, 5, 450, 480)
	deep := sharpC(300, 75, 20, 2.4, 5, 450, 480)
	cases := []struct {
		name string
		sec  catalog.Section
		st   SpanType
		want float64
	}{
		{"Z 203 simple", z, SpanSimple, 0.65},
		{"Z 203 lapped", z, SpanLapped, 0.70},
		{"C 250 simple", c250, SpanSimple, 0.40},
		{"C 250 continuous", c250, SpanContinuous, 0.60},
		{"C 150 simple", c150, SpanSimple, 0.70},
		{"C 300 outside the clause", deep, SpanSimple, 0},
	}
	for _, c := range cases {
		if got := RFactor(&c.sec, 6000, c.st); got != c.want {
			t.Errorf("%s: R = %g, want %g", c.name, got, c.want)
		}
	}
}

func TestZPurlinUnderUplift(t *testing.T) {
	// AISI 8ZS2.25x059 (published properties, §8.2) as a simple-span purlin,
	// 6 m, no bridging, outward load: the R-factor method governs the free
	// flange with R = 0.65 (from memory of AISI S100 I6.2.1 / AS/NZS 4600
	// Table 3.3.3.4) and φM_b = 0.65 × 0.9 × Z_e f_y; over a 6 m unbraced
	// length the lateral-torsional capacity is far lower.
	c := mustCaps(t, aisi8ZS())
	p := Purlin{Span: 6000, SpanType: SpanSimple}
	r, err := CheckPurlin(c, p, PurlinActions{FreeFlangeMoment: 4e6, Outward: true, FreeFlangeCb: 1.136})
	if err != nil {
		t.Fatal(err)
	}
	g := r.Governing()
	want := 0.65 * PhiBending * c.ZeBot * c.Section.FyMPa
	if g.Clause != "3.3.3.4" || !within(g.CapacityValue, want, 1e-12) {
		t.Fatalf("governing %v, want cl. 3.3.3.4 with φM_b = %.5g N·mm", g, want)
	}
	if R, _ := g.Input(InR); R != 0.65 {
		t.Errorf("R = %g, want 0.65", R)
	}
	mb, _ := c.MemberMoment(6000, 6000, 1.136, false)
	if PhiBending*mb >= want {
		t.Errorf("LTB φM_b = %.4g over 6 m, want below the R-method %.4g", PhiBending*mb, want)
	}
	// Bridging never lowers the outward capacity.
	prev := 0.0
	for rows := 0; rows <= 4; rows++ {
		p.BridgingRows = rows
		r, err := CheckPurlin(c, p, PurlinActions{FreeFlangeMoment: 4e6, Outward: true})
		if err != nil {
			t.Fatal(err)
		}
		capacity := r.Checks[3].CapacityValue
		if capacity < prev {
			t.Errorf("%d bridging rows: capacity %.5g below %.5g with fewer", rows, capacity, prev)
		}
		prev = capacity
	}
	// Inward load: the fastened flange is restrained, so section or
	// distortional capacity governs, never lateral-torsional buckling.
	r, err = CheckPurlin(c, p, PurlinActions{FastenedFlangeMoment: 4e6})
	if err != nil {
		t.Fatal(err)
	}
	in := math.Min(c.MsTop, c.MbdTop) * PhiBending
	if g := r.Governing(); !within(g.CapacityValue, in, 1e-12) {
		t.Errorf("inward governing %v, want capacity min(φM_s, φM_bd) = %.5g", g, in)
	}
}

func TestPurlinFullCheckSet(t *testing.T) {
	c := mustCaps(t, sharpC(200, 75, 18, 1.9, 5, 450, 480))
	b := Bearing{Length: 50, Fastened: true}
	p := Purlin{Span: 7000, SpanType: SpanLapped, BridgingRows: 1, EndBearing: b, InteriorBearing: b}
	a := PurlinActions{FastenedFlangeMoment: 5e6, FreeFlangeMoment: 6e6, Outward: true, Shear: 8000,
		MomentAtShear: 5e6, EndReaction: 7000, InteriorReaction: 15000}
	r, err := CheckPurlin(c, p, a)
	if err != nil {
		t.Fatal(err)
	}
	clauses := map[string]bool{}
	for _, ch := range r.Checks {
		clauses[ch.Clause] = true
		if math.IsNaN(ch.Utilisation) || ch.Utilisation < 0 {
			t.Errorf("%v: utilisation %g", ch, ch.Utilisation)
		}
	}
	for _, want := range []string{"3.3.2", "3.3.3.3", "3.3.4", "3.3.5", "3.3.6"} {
		if !clauses[want] {
			t.Errorf("no check of cl. %s in %v", want, clauses)
		}
	}
	// Governing is the largest utilisation.
	g := r.Governing()
	for _, ch := range r.Checks {
		if ch.Utilisation > g.Utilisation {
			t.Errorf("governing %v but %v is higher", g, ch)
		}
	}
	// Web bearing: an end reaction (4 in C) is weaker than an interior one (13 in C),
	// Table §5.7 (confirmed: S8).
	end, _ := c.WebBearing(Bearing{Length: 50, Fastened: true})
	mid, _ := c.WebBearing(Bearing{Length: 50, Fastened: true, Interior: true})
	if !(end > 0 && mid > end) {
		t.Errorf("web bearing end %.4g N, interior %.4g N; want 0 < end < interior", end, mid)
	}
}

package coldformed

import (
	"math"
	"testing"
)

func TestSharpCHelperMatchesReference(t *testing.T) {
	// REFERENCE-VALUES §8.4, lipped C 200 × 75 × 15 × 2.0, sharp corners
	// (derived; no published source): the test helper must reproduce it.
	s := sharpC(200, 75, 15, 2, 5, 450, 480)
	m := s.ShearCentreXMM + s.CentroidXMM // x0 = −(x̄ + m)
	cases := []struct {
		name      string
		got, want float64
	}{
		{"A", s.AreaMM2, 744.0}, {"Ix", s.IxMM4, 4.6305e6}, {"Zx", s.ZxMM3, 46305},
		{"Iy", s.IyMM4, 5.248e5}, {"J", s.JMM4, 992}, {"Cw", s.IwMM6, 3.947e9}, {"m", -m, 31.2},
	}
	for _, c := range cases {
		if !within(c.got, c.want, 2e-3) {
			t.Errorf("%s = %.5g, want %.5g", c.name, c.got, c.want)
		}
	}
}

func TestEffectiveModulusBracketedByPublishedValues(t *testing.T) {
	// 9CS2.5x059 at f_y = 55 ksi: the effective-width Z_e must lie between
	// the DSM local capacity M_nl/f_y = 93.6/55 in³ (AISI Manual II-1B, S10
	// confirmed) and the published gross S_x = 2.29 in³ (§8.1, S10) scaled
	// to this model's gross Z_x (sharp corners).
	sec := aisi9CS()
	c := mustCaps(t, sec)
	ratio := c.ZeTop / sec.ZxMM3
	lo, hi := 93.6/55/2.29, 1.0
	if !(ratio > lo && ratio < hi) {
		t.Errorf("Z_e/Z_x = %.3f, want in (%.3f, %.3f)", ratio, lo, hi)
	}
	// Same for the column: A_e f_y between the DSM P_nl = 19.403 kip
	// (DSM Guide 8.1-4, S9) and P_y = 48.42 kip.
	py := 48.42 * 4448.222
	if ns := c.Ns * (0.88036 * inch * inch) / sec.AreaMM2; !(ns > 19.403*4448.222 && ns < py) {
		t.Errorf("A_e f_y = %.4g kip, want between 19.40 and 48.42 kip", ns/4448.222)
	}
}

func TestStockyMemberReachesSectionCapacity(t *testing.T) {
	// A fully restrained (very short) segment: M_o ≥ 2.78M_y so M_b = M_s
	// (cl. 3.3.3.2.1); a very short column: f_n → f_y so N_c → A_e f_y = N_s.
	for _, sec := range []func() sectionT{aisi9CS, aisi8ZS, func() sectionT { return sharpC(200, 75, 18, 2.4, 5, 450, 480) }} {
		s := sec()
		c := mustCaps(t, s)
		if mb, _ := c.MemberMoment(10, 10, 1, true); !within(mb, c.MsTop, 1e-9) {
			t.Errorf("%s: M_b(10 mm) = %.5g, want M_s = %.5g", s.Designation, mb, c.MsTop)
		}
		if nc, _ := c.MemberCompression(EffectiveLengths{10, 10, 10}); !within(nc, c.Ns, 1e-3) {
			t.Errorf("%s: N_c(10 mm) = %.5g, want N_s = %.5g", s.Designation, nc, c.Ns)
		}
	}
}

func TestSlenderMemberApproachesElasticBuckling(t *testing.T) {
	// Very long segments: M_o ≤ 0.56M_y gives M_c = M_o, and at that low
	// stress the section is fully effective, so M_b = M_o (cl. 3.3.3.2.1).
	// Columns: f_n = 0.877 f_oc (cl. 3.4.1) with A_e = A, so N_c/(A f_oc) = 0.877.
	s := sharpC(200, 75, 18, 2.0, 5, 450, 480)
	c := mustCaps(t, s)
	mb, mo := c.MemberMoment(30000, 30000, 1, true)
	if !within(mb, mo, 0.01) {
		t.Errorf("M_b(30 m) = %.5g, want → M_o = %.5g", mb, mo)
	}
	nc, foc := c.MemberCompression(EffectiveLengths{40000, 40000, 40000})
	if got := nc / (s.AreaMM2 * foc); !within(got, 0.877, 0.01) {
		t.Errorf("N_c/(A f_oc) at 40 m = %.4f, want 0.877", got)
	}
}

func TestMonotonicInLength(t *testing.T) {
	for _, sec := range []sectionT{aisi9CS(), aisi8ZS(), sharpC(250, 75, 18, 2.4, 5, 450, 480)} {
		c := mustCaps(t, sec)
		prevM, prevN := math.Inf(1), math.Inf(1)
		for l := 200.0; l <= 20000; l *= 1.07 {
			mb, _ := c.MemberMoment(l, l, 1, false)
			nc, _ := c.MemberCompression(EffectiveLengths{l, l, l})
			if mb > prevM*(1+1e-12) || nc > prevN*(1+1e-12) {
				t.Fatalf("%s at %.0f mm: M_b %.5g (prev %.5g), N_c %.5g (prev %.5g): capacity rose with length", sec.Designation, l, mb, prevM, nc, prevN)
			}
			prevM, prevN = mb, nc
		}
	}
}

func TestMonotonicInThickness(t *testing.T) {
	// Same depth, flange and lip; thicker never weaker, over a range of
	// segment lengths.
	for _, l := range []float64{500, 1500, 3000, 6000, 12000} {
		var prev [5]float64
		for th := 1.0; th <= 3.01; th += 0.1 {
			c := mustCaps(t, sharpC(200, 75, 18, th, 5, 450, 480))
			mb, _ := c.MemberMoment(l, l, 1.13, true)
			nc, _ := c.MemberCompression(EffectiveLengths{l, l, l})
			now := [5]float64{mb, nc, c.MsTop, c.Vv, math.Min(c.MbdTop, c.Ncd)}
			for i := range now {
				if now[i] < prev[i]*(1-1e-9) {
					t.Errorf("L = %.0f mm, t = %.1f mm: capacity %d fell from %.5g to %.5g", l, th, i, prev[i], now[i])
				}
			}
			prev = now
		}
	}
}

func TestBackToBackDoublesSectionMoment(t *testing.T) {
	// A 2C's effective modulus is twice its channel's (the webs act
	// together; same effective-width reductions), so M_s doubles exactly.
	c1 := sharpC(200, 75, 18, 2.0, 5, 450, 480)
	c2 := c1
	c2.Shape = shape2C
	c2.AreaMM2 *= 2
	c2.ZxMM3 *= 2
	c2.IxMM4 *= 2
	c2.JMM4 *= 2
	c2.IwMM6 *= 2
	c2.IyMM4 = 2 * (c1.IyMM4 + c1.AreaMM2*math.Pow(c1.CentroidXMM+1, 2))
	c2.ShearCentreXMM = 0
	c2.RyMM = math.Sqrt(c2.IyMM4 / c2.AreaMM2)
	c2.ZyMM3 = c2.IyMM4 / 75
	c2.RO1MM = math.Hypot(c2.RxMM, c2.RyMM)
	a, b := mustCaps(t, c1), mustCaps(t, c2)
	if !within(b.MsTop, 2*a.MsTop, 1e-12) || !within(b.Ns, 2*a.Ns, 1e-12) || !within(b.Vv, 2*a.Vv, 1e-12) {
		t.Errorf("2C: M_s %.5g, N_s %.5g, V_v %.5g; want twice %.5g, %.5g, %.5g", b.MsTop, b.Ns, b.Vv, a.MsTop, a.Ns, a.Vv)
	}
}

func TestZcTableMatchesIteration(t *testing.T) {
	// The interpolated Z_c is within 0.1% of the neutral-axis iteration.
	for _, s := range []sectionT{aisi9CS(), aisi8ZS(), sharpC(200, 75, 18, 1.5, 5, 450, 480)} {
		c := mustCaps(t, s)
		for fc := 5.0; fc < s.FyMPa; fc += 7.3 {
			for _, top := range []bool{true, false} {
				got, want := c.effectiveModulusAt(fc, top), c.effectiveModulusIterated(fc, top)
				if !within(got, want, 1e-3) {
					t.Errorf("%s f_c = %.1f top %v: Z_c %.5g, iterated %.5g", s.Designation, fc, top, got, want)
				}
			}
		}
	}
}

package coldformed

import (
	"math"
	"testing"
)

func TestElasticLTBMatchesClassicalFormula(t *testing.T) {
	// Doubly symmetric section, uniform moment: M_o = A r_o1 √(f_oy f_oz)
	// reduces to the classical M_cr = (π/L)√(EI_y(GJ + π²EI_w/L²))
	// (Timoshenko and Gere, Theory of Elastic Stability, 2nd ed., §6.2).
	s := sharpC(200, 75, 18, 2.0, 5, 450, 480)
	s.Shape = shape2C
	s.ShearCentreXMM = 0
	s.RO1MM = math.Hypot(s.RxMM, s.RyMM)
	for _, l := range []float64{1000, 3000, 8000} {
		got := ElasticLTBMoment(&s, l, l, 1)
		want := math.Pi / l * math.Sqrt(E*s.IyMM4*(G*s.JMM4+math.Pi*math.Pi*E*s.IwMM6/(l*l)))
		if !within(got, want, 1e-12) {
			t.Errorf("L = %.0f: M_o = %.6g, classical %.6g", l, got, want)
		}
	}
	// The Z factor 0.5 (cl. 3.3.3.2.1(b), from memory).
	z := aisi8ZS()
	zs := z
	zs.Shape = shape2C
	if got, full := ElasticLTBMoment(&z, 3000, 3000, 1), ElasticLTBMoment(&zs, 3000, 3000, 1); !within(got, 0.5*full, 1e-12) {
		t.Errorf("Z: M_o = %.6g, want half of %.6g", got, full)
	}
}

func TestFlexuralTorsionalBelowItsParts(t *testing.T) {
	// f_oxz of a monosymmetric C lies below both f_ox and f_oz, the root
	// of the cubic's coupled pair (Timoshenko and Gere §5.4; S3 formula).
	s := aisi9CS()
	for _, l := range []float64{1000, 2500, 5000} {
		p := s.Properties
		fox := math.Pi * math.Pi * E / math.Pow(l/p.RxMM, 2)
		foz := (G*p.JMM4 + math.Pi*math.Pi*E*p.IwMM6/(l*l)) / (p.AreaMM2 * p.RO1MM * p.RO1MM)
		big := EffectiveLengths{Lex: l, Ley: 1e-3, Lez: l} // suppress minor-axis flexure
		if foc := ElasticBucklingStress(&s, big); !(foc < fox && foc < foz) {
			t.Errorf("L = %.0f: f_oxz %.4g, want below f_ox %.4g and f_oz %.4g", l, foc, fox, foz)
		}
	}
}

func TestShearAndWebBearingHandChecks(t *testing.T) {
	// Web 200 × 75 × 18 × 1.9 C, r_i 5, G450: d1 = 200 − 2(5 + 1.9) = 186.2.
	c := mustCaps(t, sharpC(200, 75, 18, 1.9, 5, 450, 480))
	d1, tt, fy := 186.2, 1.9, 450.0
	if !within(c.WebFlat, d1, 1e-12) {
		t.Fatalf("d1 = %.4f, want %.4f", c.WebFlat, d1)
	}
	// Shear, cl. 7.2.3.2 (confirmed: S3): V_y = 0.6 d1 t f_y = 95 521 N;
	// V_cr = 5.34π²E d1 t/(12(1−ν²)(d1/t)²) = 35 557 N; λ_v = 1.639 > 1.227 → V_v = V_cr.
	vy := 0.6 * d1 * tt * fy
	vcr := 5.34 * math.Pi * math.Pi * E * d1 * tt / (12 * (1 - Nu*Nu) * (d1 / tt) * (d1 / tt))
	if lv := math.Sqrt(vy / vcr); lv <= 1.227 {
		t.Fatalf("λ_v = %.3f, the hand case expects > 1.227", lv)
	}
	if !within(c.Vv, vcr, 1e-12) {
		t.Errorf("V_v = %.5g N, want V_cr = %.5g N", c.Vv, vcr)
	}
	// Web bearing, unified equation with the fastened one-flange interior row
	// (C 13, C_R 0.23, C_N 0.14, C_h 0.01, φ 0.90; confirmed: S8), l_b = 50.
	want := 0.90 * 13 * tt * tt * fy * (1 - 0.23*math.Sqrt(5/tt)) * (1 + 0.14*math.Sqrt(50/tt)) * (1 - 0.01*math.Sqrt(d1/tt))
	got, err := c.WebBearing(Bearing{Length: 50, Fastened: true, Interior: true})
	if err != nil || !within(got, want, 1e-12) {
		t.Errorf("φR_b = %.5g N (%v), want %.5g N", got, err, want)
	}
}

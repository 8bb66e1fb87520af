package coldformed

import (
	"math"
	"testing"
)

func TestRhoLimitAndFormula(t *testing.T) {
	for _, lam := range []float64{0.1, 0.5, 0.673} {
		if got := Rho(lam); got != 1 {
			t.Errorf("Rho(%g) = %g, want 1 at and below λ = 0.673 (AS/NZS 4600:2018 cl. 2.2.1.2)", lam, got)
		}
	}
	for _, lam := range []float64{0.7, 1.0, 1.5, 3.0} {
		want := (1 - 0.22/lam) / lam // cl. 2.2.1.2, confirmed: S1
		if got := Rho(lam); math.Abs(got-want) > 1e-12 {
			t.Errorf("Rho(%g) = %g, want %g", lam, got, want)
		}
	}
	// Continuity at the limit: (1 − 0.22/0.673)/0.673 = 0.9998, so ρ barely moves.
	if d := Rho(0.673) - Rho(0.674); d < 0 || d > 2e-3 {
		t.Errorf("ρ jumps by %g across λ = 0.673", d)
	}
}

func TestEffectiveWidthCheckValue(t *testing.T) {
	// REFERENCE-VALUES §5.3 check value (derived): b = 65, t = 1.5,
	// f* = 450 MPa, k = 4 → f_cr = 385.1 MPa, λ = 1.081, ρ = 0.7367, b_e = 47.9 mm.
	lam := plateSlenderness(65, 1.5, 450, 4)
	if !within(lam, 1.081, 1e-3) {
		t.Errorf("λ = %.4f, want 1.081", lam)
	}
	if got := EffectiveWidth(65, 1.5, 450, 4); math.Abs(got-47.9) > 0.05 {
		t.Errorf("b_e = %.3f mm, want 47.9 mm", got)
	}
	// The 1.052 form of cl. 2.2.1.2 (from memory) gives the same λ.
	alt := 1.052 / math.Sqrt(4) * (65 / 1.5) * math.Sqrt(450/E)
	if !within(lam, alt, 2e-3) {
		t.Errorf("λ = %.4f, the 1.052 form gives %.4f", lam, alt)
	}
}

func TestWebUnderStressGradient(t *testing.T) {
	// A stocky web is fully effective; a slender one is not, and its
	// effective parts sum to less than its compression depth (cl. 2.2.3.2).
	if _, _, _, full := webWidths(100, 2, 300, -300); !full {
		t.Errorf("web 100 × 2 at ±300 MPa: not fully effective, want fully effective (d1/t = 50)")
	}
	b1, b2, comp, full := webWidths(280, 1.0, 450, -450)
	if full {
		t.Fatalf("web 280 × 1.0 at ±450 MPa: fully effective, want reduced (d1/t = 280)")
	}
	if comp != 140 || b1+b2 >= comp || b2 <= b1 {
		t.Errorf("b1 = %.2f, b2 = %.2f, compression depth %.2f: want b1 + b2 < 140 and b2 = b_e/2 > b1 = b_e/4 for ψ = −1", b1, b2, comp)
	}
}

func TestEdgeStiffenerLipReducesFlange(t *testing.T) {
	// cl. 2.4.2: a flange with an adequate lip is more effective than the
	// same flange with a short lip, and never less than an unstiffened one.
	b, tt, f := 70.0, 1.5, 450.0
	long := edgeStiffenedFlange(b, 18, tt, f, 1)
	short := edgeStiffenedFlange(b, 6, tt, f, 1)
	unst := EffectiveWidth(b, tt, f, kUnstiffened)
	if !(long.FlangeEff >= short.FlangeEff && short.FlangeEff >= unst) {
		t.Errorf("b_e: long lip %.2f, short lip %.2f, unstiffened %.2f; want non-increasing", long.FlangeEff, short.FlangeEff, unst)
	}
	if long.K > 4 || short.K < 0.43 {
		t.Errorf("k = %.3f, %.3f; want within [0.43, 4]", long.K, short.K)
	}
}

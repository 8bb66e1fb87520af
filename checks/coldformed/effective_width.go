package coldformed

import "math"

// Plate slenderness, effective-width factor and the element rules of
// AS/NZS 4600:2018 Section 2 (the 2005 forms the 2018 edition retains).

// plateSlenderness is λ = √(f*/f_cr), f_cr = kπ²E/(12(1−ν²))(t/b)².
// AS/NZS 4600:2018 cl. 2.2.1.2 (confirmed: S1; the 1.052/√k form is the same).
func plateSlenderness(b, t, fStar, k float64) float64 {
	if fStar <= 0 || b <= 0 {
		return 0
	}
	fcr := k * math.Pi * math.Pi * E / (12 * (1 - Nu*Nu)) * (t / b) * (t / b)
	return math.Sqrt(fStar / fcr)
}

// Rho is the effective-width factor ρ = (1 − 0.22/λ)/λ ≤ 1, and 1 for
// λ ≤ 0.673. AS/NZS 4600:2018 cl. 2.2.1.2 (confirmed: S1).
func Rho(lambda float64) float64 {
	if lambda <= 0.673 {
		return 1
	}
	return math.Min(1, (1-0.22/lambda)/lambda)
}

// EffectiveWidth is b_e = ρb for a flat element of width b and thickness t
// under compressive stress fStar with plate buckling coefficient k.
// AS/NZS 4600:2018 cl. 2.2.1.2 (stiffened, k = 4) and cl. 2.3.1
// (unstiffened, k = 0.43).
func EffectiveWidth(b, t, fStar, k float64) float64 {
	return Rho(plateSlenderness(b, t, fStar, k)) * b
}

// Plate buckling coefficients (REFERENCE-VALUES §5.3, from memory).
const (
	kStiffened   = 4.0  // cl. 2.2.1.2
	kUnstiffened = 0.43 // cl. 2.3.1
)

// webWidths gives the effective widths b1 (from the compression edge) and b2
// (next to the neutral axis) of a web flat of depth d1 under a stress
// gradient, with f1 the compressive stress at the compression edge and f2 the
// stress at the other edge (compression positive, so f2 < 0 in bending).
// AS/NZS 4600:2018 cl. 2.2.3.2 (2005 form; from memory: REFERENCE-VALUES §5.3):
// ψ = f2/f1, k = 4 + 2(1−ψ)³ + 2(1−ψ), b_e from cl. 2.2.1.2 at f1,
// b1 = b_e/(3−ψ), b2 = b_e/2 for ψ ≤ −0.236 else b_e − b1.
// It also returns the compression depth of the flat, and whether b1 + b2
// covers it (fully effective).
func webWidths(d1, t, f1, f2 float64) (b1, b2, compDepth float64, full bool) {
	if f1 <= 0 {
		return 0, 0, 0, true
	}
	psi := f2 / f1
	k := 4 + 2*math.Pow(1-psi, 3) + 2*(1-psi)
	be := EffectiveWidth(d1, t, f1, k)
	b1 = be / (3 - psi)
	if psi <= -0.236 {
		b2 = be / 2
	} else {
		b2 = be - b1
	}
	if psi >= 0 {
		compDepth = d1
	} else {
		compDepth = d1 / (1 - psi)
	}
	return b1, b2, compDepth, b1+b2 >= compDepth
}

// edgeStiffened is the effective flange and lip of a flange flat b with a
// simple lip flat d at angle θ to the flange (40° ≤ θ ≤ 140°), both thickness t, at compressive stress fStar.
type edgeStiffened struct {
	FlangeEff float64 // effective width of the flange flat
	LipEff    float64 // effective length of the lip flat, from the corner
	K         float64 // the flange's plate buckling coefficient
}

// edgeStiffenedFlange applies AS/NZS 4600:2018 cl. 2.4.2 (2005 form after
// AISI 2001 B4.2; from memory: REFERENCE-VALUES §5.3). The lip's own
// effective length d_s′ is that of an unstiffened element (cl. 2.3.1) at
// fStar (conservative: the lip's stress is below the flange's), reduced to
// d_s = d_s′(I_s/I_a).
func edgeStiffenedFlange(b, d, t, fStar, sinTheta float64) edgeStiffened {
	dsPrime := EffectiveWidth(d, t, fStar, kUnstiffened)
	if fStar <= 0 {
		return edgeStiffened{FlangeEff: b, LipEff: d, K: kStiffened}
	}
	S := 1.28 * math.Sqrt(E/fStar)
	bt := b / t
	if bt <= 0.328*S {
		return edgeStiffened{FlangeEff: b, LipEff: dsPrime, K: kStiffened}
	}
	t4 := t * t * t * t
	Ia := math.Min(399*t4*math.Pow(bt/S-0.328, 3), t4*(115*bt/S+5))
	Is := d * d * d * t * sinTheta * sinTheta / 12 // cl. 2.4.2: I_s = d³t sin²θ/12
	ri := math.Min(1, Is/Ia)
	n := math.Max(1.0/3, 0.582-bt/(4*S))
	var k float64
	switch dOverB := d / b; {
	case dOverB <= 0.25:
		k = 3.57*math.Pow(ri, n) + 0.43
	case dOverB <= 0.8:
		k = (4.82-5*dOverB)*math.Pow(ri, n) + 0.43
	default:
		// Outside the clause's range (d/b > 0.8): treat the flange as
		// unstiffened, the conservative bound.
		k = kUnstiffened
	}
	k = math.Min(k, kStiffened)
	return edgeStiffened{FlangeEff: EffectiveWidth(b, t, fStar, k), LipEff: dsPrime * ri, K: k}
}

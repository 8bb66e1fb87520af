package coldformed

import "math"

// Elastic distortional buckling stress f_od of a lipped flange by the
// Lau–Hancock closed form of AS/NZS 4600:2018 Appendix D (D2 for columns,
// D3 for flexural members; from memory, REFERENCE-VALUES §5.5). Dimensions
// are centreline: flange b, lip d (90°), web bw, thickness t. The flange's
// axes: x along the flange from the web junction, y along the lip.
type flangeLip struct {
	A, xbar, ybar, J, Ix, Iy, Ixy float64
}

func newFlangeLip(b, d, t float64) flangeLip {
	f := flangeLip{A: (b + d) * t}
	f.xbar = (b*b + 2*b*d) / (2 * (b + d))
	f.ybar = d * d / (2 * (b + d))
	f.J = t * t * t * (b + d) / 3
	f.Ix = b*t*t*t/12 + t*d*d*d/12 + b*t*f.ybar*f.ybar + d*t*(d/2-f.ybar)*(d/2-f.ybar)
	f.Iy = t*b*b*b/12 + d*t*t*t/12 + d*t*(b-f.xbar)*(b-f.xbar) + b*t*(f.xbar-b/2)*(f.xbar-b/2)
	f.Ixy = b*t*(b/2-f.xbar)*(-f.ybar) + d*t*(d/2-f.ybar)*(b-f.xbar)
	return f
}

// fod solves the rotational-restraint eigenproblem for half-wavelength lam
// and web restraint kPhi (N·mm/mm/rad).
func (f flangeLip) fod(b, lam, kPhi float64) float64 {
	beta1 := f.xbar*f.xbar + (f.Ix+f.Iy)/f.A
	eta := (math.Pi / lam) * (math.Pi / lam)
	a1 := eta/beta1*(f.Ix*b*b+0.039*f.J*lam*lam) + kPhi/(beta1*eta*E)
	a2 := eta * (f.Iy + 2/beta1*f.ybar*b*f.Ixy)
	a3 := eta * (a1*f.Iy - eta/beta1*f.Ixy*f.Ixy*b*b)
	disc := (a1+a2)*(a1+a2) - 4*a3
	return E / (2 * f.A) * ((a1 + a2) - math.Sqrt(math.Max(disc, 0)))
}

// DistortionalStressColumn is f_od of a lipped channel or Z in uniform
// compression, AS/NZS 4600:2018 Appendix D2 (from memory).
func DistortionalStressColumn(b, d, bw, t float64) float64 {
	f := newFlangeLip(b, d, t)
	lam := 4.80 * math.Pow(f.Ix*b*b*bw/(t*t*t), 0.25)
	free := f.fod(b, lam, 0) // f′_od, the flange without web restraint
	kPhi := E * t * t * t / (5.46 * (bw + 0.06*lam)) *
		(1 - 1.11*free/(E*t*t)*math.Pow(bw*bw*lam/(bw*bw+lam*lam), 2))
	return f.fod(b, lam, kPhi)
}

// DistortionalStressBeam is f_od of the compression flange of a lipped
// channel or Z in major-axis bending, AS/NZS 4600:2018 Appendix D3 (from
// memory): the web's restraint is that of a web under a stress gradient.
func DistortionalStressBeam(b, d, bw, t float64) float64 {
	f := newFlangeLip(b, d, t)
	lam := 4.80 * math.Pow(f.Ix*b*b*bw/(2*t*t*t), 0.25)
	free := f.fod(b, lam, 0)
	bw4, l2 := bw*bw*bw*bw, lam*lam
	kPhi := 2 * E * t * t * t / (5.46 * (bw + 0.06*lam)) *
		(1 - 1.11*free/(E*t*t)*bw4*l2/(12.56*l2*l2+2.192*bw4+13.39*l2*bw*bw))
	return f.fod(b, lam, kPhi)
}

// DistortionalBeamCapacity is the nominal M_b for distortional buckling,
// AS/NZS 4600:2018 cl. 3.3.3.3 in the DSM form of cl. 7.2.2.4 (λ_d =
// √(M_y/M_od); λ_d ≤ 0.673: M_y; else [1 − 0.22(M_od/M_y)^0.5](M_od/M_y)^0.5
// M_y; confirmed: S8, check value 31.47, 28.47 → 23.67).
func DistortionalBeamCapacity(my, mod float64) float64 {
	if mod <= 0 {
		return 0
	}
	if math.Sqrt(my/mod) <= 0.673 {
		return my
	}
	r := math.Sqrt(mod / my)
	return (1 - 0.22*r) * r * my
}

// DistortionalColumnCapacity is the nominal N_c for distortional buckling,
// AS/NZS 4600:2018 cl. 3.4.6 in the DSM form of cl. 7.2.1.4 (λ_d =
// √(N_y/N_od); λ_d ≤ 0.561: N_y; else [1 − 0.25(N_od/N_y)^0.6](N_od/N_y)^0.6
// N_y; confirmed: S3, S9).
func DistortionalColumnCapacity(ny, nod float64) float64 {
	if nod <= 0 {
		return 0
	}
	if math.Sqrt(ny/nod) <= 0.561 {
		return ny
	}
	r := math.Pow(nod/ny, 0.6)
	return (1 - 0.25*r) * r * ny
}

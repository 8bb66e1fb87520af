package catalog

import (
	"math"
	"sort"
)

// coarsePitchMM is the ISO 261 coarse thread pitch for each metric diameter
// (also AS 1275), mm. from memory of ISO 261:1998 Table 1.
var coarsePitchMM = map[float64]float64{
	6: 1.0, 8: 1.25, 10: 1.5, 12: 1.75, 14: 2.0, 16: 2.0, 18: 2.5, 20: 2.5,
	22: 2.5, 24: 3.0, 27: 3.0, 30: 3.5, 33: 3.5, 36: 4.0,
}

// rodDiameters lists the diameters with a coarse pitch, ascending.
func rodDiameters() []float64 {
	ds := make([]float64, 0, len(coarsePitchMM))
	for d := range coarsePitchMM {
		ds = append(ds, d)
	}
	sort.Float64s(ds)
	return ds
}

// TensileStressAreaMM2 is the tensile stress area of a metric coarse thread
// of nominal diameter d: As = (π/4)·((d2 + d3)/2)², d2 = d − 0.649519P,
// d3 = d − 1.226869P (ISO 898-1:2013 cl. 9.1.6.1; AS 1111.1 uses the same
// area). It reports false for a diameter without an ISO 261 coarse pitch.
func TensileStressAreaMM2(diameterMM float64) (float64, bool) {
	p, ok := coarsePitchMM[diameterMM]
	if !ok {
		return 0, false
	}
	d2 := diameterMM - 0.649519*p
	d3 := diameterMM - 1.226869*p
	return math.Pi / 4 * math.Pow((d2+d3)/2, 2), true
}

// rodProperties are a solid round bar's gross properties, diameter d; the
// threaded ends' stress area goes in TensileStressAreaMM2. Elementary
// formulas (any strength-of-materials text).
func rodProperties(d float64) Properties {
	a := math.Pi * d * d / 4
	i := math.Pi * math.Pow(d, 4) / 64
	as, _ := TensileStressAreaMM2(d)
	return Properties{
		AreaMM2: a, IxMM4: i, IyMM4: i, I1MM4: i, I2MM4: i,
		ZxMM3: i / (d / 2), ZyMM3: i / (d / 2), RxMM: d / 4, RyMM: d / 4,
		JMM4: 2 * i, RO1MM: d / 4 * math.Sqrt2, TensileStressAreaMM2: as,
	}
}

// strapProperties are a flat strap's, width b (DepthMM) and thickness t: x is
// the major axis (bending in the strap's plane). J = bt³[1/3 − 0.21(t/b)(1 −
// (t/b)⁴/12)], from memory of Roark's Formulas for Stress and Strain (7th
// ed.), Table 10.7 case 4; a flat's warping constant is negligible and taken
// as zero, as on the thin-walled centreline model.
func strapProperties(b, t float64) Properties {
	a := b * t
	ix := t * b * b * b / 12
	iy := b * t * t * t / 12
	q := t / b
	return Properties{
		AreaMM2: a, IxMM4: ix, IyMM4: iy, I1MM4: ix, I2MM4: iy,
		ZxMM3: ix / (b / 2), ZyMM3: iy / (t / 2), RxMM: math.Sqrt(ix / a), RyMM: math.Sqrt(iy / a),
		JMM4:  b * t * t * t * (1.0/3 - 0.21*q*(1-q*q*q*q/12)),
		RO1MM: math.Sqrt((ix + iy) / a), TensileStressAreaMM2: a,
	}
}

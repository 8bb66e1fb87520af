package coldformed

import (
	"math"
	"testing"

	"github.com/spansweep/spansweep/catalog"
)

// Test sections are built here, not from the catalogue, so these tests
// stand on their own: lipped channels from the sharp-corner centreline closed
// forms of REFERENCE-VALUES §8.3 (from memory of Yu, Cold-Formed Steel
// Design, App. B / AISI Manual; derived checks there), and the AISI 8ZS
// lipped Z from its published properties (§8.2, confirmed: S10, S11).

const inch = 25.4    // mm
const ksi = 6.894757 // MPa

// sharpC is a lipped channel D×B×L×t (outside, mm) with inner radius r used
// only for the effective-width flats; properties on the sharp-corner
// centreline model.
func sharpC(d, b, l, t, r, fy, fu float64) catalog.Section {
	a, bb, c := d-t, b-t, l-t/2
	A := t * (a + 2*bb + 2*c)
	ix := t * (a*a*a/12 + bb*a*a/2 + c*c*c/6 + c*(a-c)*(a-c)/2)
	xbar := t * (bb*bb + 2*bb*c) / A
	iy := t * (a*xbar*xbar + 2*(bb*bb*bb/12+bb*(bb/2-xbar)*(bb/2-xbar)) + 2*c*(bb-xbar)*(bb-xbar))
	m := bb * t / (12 * ix) * (6*c*a*a + 3*bb*a*a - 8*c*c*c)
	cw := a * a * bb * bb * t / 12 *
		(2*a*a*a*bb + 3*a*a*bb*bb + 48*c*c*c*c + 112*bb*c*c*c + 8*a*c*c*c + 48*a*bb*c*c + 12*a*a*c*c + 12*a*a*bb*c + 6*a*a*a*c) /
		(6*a*a*bb + math.Pow(a+2*c, 3) - 24*a*c*c)
	x0 := -(xbar + m)
	rx, ry := math.Sqrt(ix/A), math.Sqrt(iy/A)
	p := catalog.Properties{
		AreaMM2: A, IxMM4: ix, IyMM4: iy, I1MM4: ix, I2MM4: iy,
		CentroidXMM: xbar,
		ZxMM3:       ix / (d / 2), ZyMM3: iy / math.Max(xbar+t/2, bb-xbar+t/2),
		RxMM: rx, RyMM: ry, JMM4: t * t * t * (a + 2*bb + 2*c) / 3, IwMM6: cw,
		ShearCentreXMM: x0, RO1MM: math.Sqrt(rx*rx + ry*ry + x0*x0),
		TensileStressAreaMM2: A,
	}
	return catalog.Section{Designation: "test C", Shape: catalog.ShapeC,
		Geometry: catalog.Geometry{DepthMM: d, FlangeMM: b, Flange2MM: b, LipMM: l, ThicknessMM: t, InnerRadiusMM: r},
		FyMPa:    fy, FuMPa: fu, Properties: p}
}

// aisi9CS is AISI 9CS2.5x059 (REFERENCE-VALUES §8.1): D 9, B 2.5, lip
// 0.773, t 0.059, R 0.1875 in; f_y 55 ksi (f_u 70 ksi assumed).
func aisi9CS() catalog.Section {
	s := sharpC(9*inch, 2.5*inch, 0.773*inch, 0.059*inch, 0.1875*inch, 55*ksi, 70*ksi)
	s.Designation = "9CS2.5x059"
	return s
}

// aisi8ZS is AISI 8ZS2.25x059 with its published properties (§8.2,
// confirmed: S10, S11): D 8, B 2.25, lip 0.910 at 50°, t 0.059, R 0.1875 in.
func aisi8ZS() catalog.Section {
	in2, in4, in6 := inch*inch, math.Pow(inch, 4), math.Pow(inch, 6)
	A, ix, iy, ixy := 0.822*in2, 7.76*in4, 1.08*in4, 2.08*in4
	avg, dif := (ix+iy)/2, math.Hypot((ix-iy)/2, ixy)
	rx, ry := math.Sqrt(ix/A), math.Sqrt(iy/A)
	d, t := 8*inch, 0.059*inch
	p := catalog.Properties{
		AreaMM2: A, IxMM4: ix, IyMM4: iy, IxyMM4: ixy, I1MM4: avg + dif, I2MM4: avg - dif,
		ZxMM3: ix / (d / 2), ZyMM3: iy / (2.25 * inch), RxMM: rx, RyMM: ry,
		JMM4: 0.000954 * in4, IwMM6: 12.7 * in6, RO1MM: math.Sqrt(rx*rx + ry*ry),
		TensileStressAreaMM2: A,
	}
	return catalog.Section{Designation: "8ZS2.25x059", Shape: catalog.ShapeZ,
		Geometry: catalog.Geometry{DepthMM: d, FlangeMM: 2.25 * inch, Flange2MM: 2.25 * inch, LipMM: 0.910 * inch, ThicknessMM: t, InnerRadiusMM: 0.1875 * inch},
		FyMPa:    55 * ksi, FuMPa: 70 * ksi, Properties: p}
}

func mustCaps(t testing.TB, s catalog.Section) *Capacities {
	t.Helper()
	c, err := SectionCapacities(s)
	if err != nil {
		t.Fatalf("SectionCapacities(%s): %v", s.Designation, err)
	}
	return &c
}

func within(got, want, relTol float64) bool {
	return math.Abs(got-want) <= relTol*math.Abs(want)
}

type sectionT = catalog.Section

const shape2C = catalog.Shape2C

const (
	shapeStrap = catalog.ShapeStrap
	shapeRod   = catalog.ShapeRod
)

package catalog

import (
	"math"
	"strings"
	"testing"
)

// TestTwoChannelsAreTwiceOne: a 2C's area, Ix and J are twice its channel's
// (the back-to-back pair shares the channel's y coordinates exactly), its Iy
// is twice the channel's about its own centroid plus the parallel-axis term
// 2A(x̄ + t/2)², and it is doubly symmetric (shear centre at the centroid).
func TestTwoChannelsAreTwiceOne(t *testing.T) {
	for _, sec := range Default().ByShape(Shape2C) {
		c, err := ComputeProperties(ShapeC, sec.Geometry)
		if err != nil {
			t.Fatal(err)
		}
		d := c.CentroidXMM + sec.ThicknessMM/2
		cases := []struct {
			name      string
			got, want float64
		}{
			{"A", sec.AreaMM2, 2 * c.AreaMM2},
			{"Ix", sec.IxMM4, 2 * c.IxMM4},
			{"J", sec.JMM4, 2 * c.JMM4},
			{"Iy", sec.IyMM4, 2 * (c.IyMM4 + c.AreaMM2*d*d)},
			{"mass", sec.MassKgPerM, 2 * c.MassKgPerM},
		}
		for _, k := range cases {
			if !within(k.got, k.want, 1e-9) {
				t.Errorf("%s %s: got %.9g, want %.9g (twice the channel)", sec.Designation, k.name, k.got, k.want)
			}
		}
		if sec.ShearCentreXMM != 0 || sec.ShearCentreYMM != 0 || sec.IxyMM4 != 0 {
			t.Errorf("%s: shear centre (%g, %g), Ixy %g; want all 0 for a doubly symmetric section",
				sec.Designation, sec.ShearCentreXMM, sec.ShearCentreYMM, sec.IxyMM4)
		}
	}
}

// TestSymmetryInvariants over the default catalogue: a C has Ixy = 0, its
// shear centre behind the web (x0 < −x̄) and principal axes x, y; a Z has
// Ixy ≠ 0 and principal moments bracketing Ix and Iy with I1 + I2 = Ix + Iy.
func TestSymmetryInvariants(t *testing.T) {
	for _, s := range Default().ByShape(ShapeC) {
		if s.IxyMM4 != 0 || s.I1MM4 != s.IxMM4 || s.I2MM4 != s.IyMM4 || s.PrincipalAngleRad != 0 {
			t.Errorf("%s: Ixy %g, I1 %g, I2 %g, angle %g; want 0, Ix, Iy, 0", s.Designation, s.IxyMM4, s.I1MM4, s.I2MM4, s.PrincipalAngleRad)
		}
		if s.CentroidXMM+s.ShearCentreXMM >= 0 {
			t.Errorf("%s: shear centre at x = %g from the web; want behind it (< 0)", s.Designation, s.CentroidXMM+s.ShearCentreXMM)
		}
	}
	for _, s := range Default().ByShape(ShapeZ) {
		if s.IxyMM4 <= 0 {
			t.Errorf("%s: Ixy = %g; want > 0 (top flange to +x)", s.Designation, s.IxyMM4)
		}
		if s.I1MM4 < math.Max(s.IxMM4, s.IyMM4) || s.I2MM4 > math.Min(s.IxMM4, s.IyMM4) {
			t.Errorf("%s: I1 %g, I2 %g do not bracket Ix %g, Iy %g", s.Designation, s.I1MM4, s.I2MM4, s.IxMM4, s.IyMM4)
		}
		if !within(s.I1MM4+s.I2MM4, s.IxMM4+s.IyMM4, 1e-12) {
			t.Errorf("%s: I1 + I2 = %g; want Ix + Iy = %g", s.Designation, s.I1MM4+s.I2MM4, s.IxMM4+s.IyMM4)
		}
		// The major axis is rotated from x towards the bottom flange's side.
		if s.PrincipalAngleRad >= 0 || s.PrincipalAngleRad < -math.Pi/4 {
			t.Errorf("%s: principal angle %g rad; want in [−π/4, 0)", s.Designation, s.PrincipalAngleRad)
		}
	}
}

// TestFlatWidths: the web's flat is D − 2(r + t) for square bends, the
// elementary result (AS/NZS 4600 practice), and every flat is positive.
func TestFlatWidths(t *testing.T) {
	for _, s := range Default().Sections {
		if !s.Shape.thinWalled() {
			continue
		}
		f := s.FlatWidths()
		want := s.DepthMM - 2*(s.InnerRadiusMM+s.ThicknessMM)
		if !within(f.WebMM, want, 1e-12) {
			t.Errorf("%s: web flat %g; want %g", s.Designation, f.WebMM, want)
		}
		if f.FlangeMM <= 0 || f.Flange2MM <= 0 || f.LipMM <= 0 {
			t.Errorf("%s: flats %+v; want all > 0", s.Designation, f)
		}
		if s.Shape == ShapeC && !within(f.FlangeMM, s.FlangeMM-2*(s.InnerRadiusMM+s.ThicknessMM), 1e-12) {
			t.Errorf("%s: flange flat %g; want B − 2(r + t)", s.Designation, f.FlangeMM)
		}
	}
}

// TestSolidShapes: straps and rods against the elementary formulas, and the
// rods' tensile stress areas against the tabulated ISO 898-1:2013 Table 4
// values (from memory of ISO 898-1: M10 58.0, M12 84.3, M16 157, M20 245,
// M24 353, M30 561 mm²).
func TestSolidShapes(t *testing.T) {
	stress := map[float64]float64{10: 58.0, 12: 84.3, 16: 157, 20: 245, 24: 353, 30: 561}
	for d, want := range stress {
		got, ok := TensileStressAreaMM2(d)
		if !ok || !within(got, want, 0.003) {
			t.Errorf("M%g: tensile stress area %g (ok %v); want %g mm² (ISO 898-1)", d, got, ok, want)
		}
	}
	if _, ok := TensileStressAreaMM2(13); ok {
		t.Error("M13: got a stress area; want none (no ISO 261 coarse pitch)")
	}
	for _, s := range Default().ByShape(ShapeRod) {
		d := s.DepthMM
		if !within(s.AreaMM2, math.Pi*d*d/4, 1e-12) || !within(s.JMM4, math.Pi*math.Pow(d, 4)/32, 1e-12) ||
			s.TensileStressAreaMM2 >= s.AreaMM2 || s.TensileStressAreaMM2 < 0.6*s.AreaMM2 {
			t.Errorf("%s: A %g, J %g, As %g; want πd²/4, πd⁴/32 and 0.6A < As < A", s.Designation, s.AreaMM2, s.JMM4, s.TensileStressAreaMM2)
		}
	}
	for _, s := range Default().ByShape(ShapeStrap) {
		b, tt := s.DepthMM, s.ThicknessMM
		if !within(s.AreaMM2, b*tt, 1e-12) || !within(s.IxMM4, tt*b*b*b/12, 1e-12) || !within(s.IyMM4, b*tt*tt*tt/12, 1e-12) {
			t.Errorf("%s: A %g, Ix %g, Iy %g; want bt, tb³/12, bt³/12", s.Designation, s.AreaMM2, s.IxMM4, s.IyMM4)
		}
		if want := rectangleJ(b, tt); !within(s.JMM4, want, 0.001) {
			t.Errorf("%s: J %g; want %g (exact series, tolerance 0.1 %%)", s.Designation, s.JMM4, want)
		}
	}
}

// TestGrades: AS/NZS 4600:2018 Table 1.5 design values of the AS 1397
// grades (REFERENCE-VALUES §5.1, confirmed: S3).
func TestGrades(t *testing.T) {
	cases := []struct {
		grade  string
		tMM    float64
		fy, fu float64
	}{
		{"G250", 1.0, 250, 320},
		{"G300", 1.0, 300, 340},
		{"G350", 1.0, 350, 420},
		{"G450", 1.5, 450, 480},
		{"G500", 1.0, 500, 520},
		{"G550", 0.9, 550, 550},
		{"g550", 0.75, 495, 495},
		{"G550", 0.55, 413, 413},
	}
	for _, c := range cases {
		g, err := GradeFor(c.grade, c.tMM)
		if err != nil || g.FyMPa != c.fy || g.FuMPa != c.fu {
			t.Errorf("%s at %g mm: got %g/%g (%v); want %g/%g MPa", c.grade, c.tMM, g.FyMPa, g.FuMPa, err, c.fy, c.fu)
		}
	}
	if _, err := GradeFor("G400", 1); err == nil || !strings.Contains(err.Error(), "G450") {
		t.Errorf("G400: got %v; want an error listing the allowed grades", err)
	}
}

// rectangleJ is the exact St Venant constant of a b × t rectangle by its
// series, J = (bt³/3)[1 − (192/π⁵)(t/b) Σ_{n odd} tanh(nπb/2t)/n⁵] (from
// memory of Timoshenko & Goodier, Theory of Elasticity, §109).
func rectangleJ(b, t float64) float64 {
	var sum float64
	for n := 1.0; n < 200; n += 2 {
		sum += math.Tanh(n*math.Pi*b/(2*t)) / math.Pow(n, 5)
	}
	return b * t * t * t / 3 * (1 - 192/math.Pow(math.Pi, 5)*t/b*sum)
}

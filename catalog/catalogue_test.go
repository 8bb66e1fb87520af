package catalog

import (
	"crypto/sha256"
	"encoding/hex"
	"strings"
	"testing"
)

// TestDefaultCatalogue: the embedded RS series meets the scope
// (≥ 40 C and ≥ 30 Z, depths 100–400 mm, thickness 1.0–3.0 mm, 2Cs, straps,
// rods), says it is illustrative, and every section's steel is an AS 1397
// design value (AS/NZS 4600:2018 Table 1.5) or the stated rod bar.
func TestDefaultCatalogue(t *testing.T) {
	cat := Default()
	if cat != Default() {
		t.Error("Default returned a new catalogue on the second call; want the one parsed once")
	}
	count := map[Shape]int{}
	for _, s := range cat.Sections {
		count[s.Shape]++
		if s.Shape == ShapeC || s.Shape == ShapeZ {
			if s.DepthMM < 100 || s.DepthMM > 400 || s.ThicknessMM < 1.0 || s.ThicknessMM > 3.0 {
				t.Errorf("%s: depth %g, t %g; want 100–400 and 1.0–3.0 mm", s.Designation, s.DepthMM, s.ThicknessMM)
			}
			if !strings.HasPrefix(s.Designation, s.Shape.String()+strings.TrimSuffix(num(s.DepthMM), ".0")+"x") {
				t.Errorf("%s: designation does not spell shape and depth", s.Designation)
			}
		}
		if s.Shape != ShapeRod {
			g, err := GradeFor(gradeOf(s.FyMPa), s.ThicknessMM)
			if err != nil || g.FyMPa != s.FyMPa || g.FuMPa != s.FuMPa {
				t.Errorf("%s: fy/fu %g/%g is not an AS 1397 grade's value at t = %g mm", s.Designation, s.FyMPa, s.FuMPa, s.ThicknessMM)
			}
		}
	}
	if count[ShapeC] < 40 || count[ShapeZ] < 30 || count[Shape2C] == 0 || count[ShapeStrap] == 0 || count[ShapeRod] == 0 {
		t.Errorf("counts %v; want ≥ 40 C, ≥ 30 Z and some 2C, strap and rod", count)
	}
	sum := sha256.Sum256(DefaultCSV())
	if cat.HashSHA256 != hex.EncodeToString(sum[:]) {
		t.Errorf("hash %s; want the SHA-256 of the embedded bytes", cat.HashSHA256)
	}
	head := string(DefaultCSV()[:600])
	for _, w := range []string{"ILLUSTRATIVE", "Ridgeline Sheds", "Replace this file"} {
		if !strings.Contains(head, w) {
			t.Errorf("header does not say %q", w)
		}
	}
}

// gradeOf names the grade whose nominal yield is fy (G550's reduced values
// map back to G550).
func gradeOf(fy float64) string {
	switch fy {
	case 413, 495:
		return "G550"
	}
	return "G" + num(fy)
}

func TestByShapeSortedByMass(t *testing.T) {
	for _, shape := range Shapes() {
		secs := Default().ByShape(shape)
		for i := 1; i < len(secs); i++ {
			if secs[i].MassKgPerM < secs[i-1].MassKgPerM {
				t.Errorf("%s: %s (%g kg/m) after %s (%g kg/m); want ascending mass", shape, secs[i].Designation,
					secs[i].MassKgPerM, secs[i-1].Designation, secs[i-1].MassKgPerM)
			}
			if secs[i].Shape != shape {
				t.Errorf("ByShape(%s) returned %s of shape %s", shape, secs[i].Designation, secs[i].Shape)
			}
		}
	}
	if _, ok := Default().Find("NOPE"); ok {
		t.Error("Find(NOPE): found a section")
	}
}

func TestParseShape(t *testing.T) {
	for _, s := range Shapes() {
		got, err := ParseShape(strings.ToUpper(s.String()))
		if err != nil || got != s {
			t.Errorf("ParseShape(%q) = %v, %v; want %v", strings.ToUpper(s.String()), got, err, s)
		}
	}
	if _, err := ParseShape("I"); err == nil || !strings.Contains(err.Error(), "C, Z, 2C, strap, rod") {
		t.Errorf("ParseShape(I): %v; want an error listing the shapes", err)
	}
}

func BenchmarkDefault(b *testing.B) {
	for b.Loop() {
		Default()
	}
}

func BenchmarkParseDefaultCSV(b *testing.B) {
	for b.Loop() {
		if _, err := parse(defaultCSV, DefaultName); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkComputeZ(b *testing.B) {
	g := Geometry{DepthMM: 250, FlangeMM: 83, Flange2MM: 77, LipMM: 21, ThicknessMM: 2.4, InnerRadiusMM: 6}
	for b.Loop() {
		if _, err := ComputeProperties(ShapeZ, g); err != nil {
			b.Fatal(err)
		}
	}
}

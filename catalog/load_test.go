package catalog

import (
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

const header = "designation,shape,depth_mm,flange_mm,flange2_mm,lip_mm,thickness_mm,inner_radius_mm,fy_mpa,fu_mpa\n"

// goodRows are valid rows of every shape, lines 3 to 7 of the test file.
const goodRows = `C200x75x1.9,C,200,75,,18,1.9,4.75,450,480
Z200x1.9,Z,200,78,72,19,1.9,4.75,450,480
2C300x2.4,2C,300,90,,22,2.4,6,450,480
STRAP30x1.0,strap,30,,,,1.0,,550,550
ROD12,rod,12,,,,,,250,410
`

func TestLoadGood(t *testing.T) {
	cat, err := Load(strings.NewReader("# a comment\n"+header+goodRows), "good.csv")
	if err != nil {
		t.Fatal(err)
	}
	if len(cat.Sections) != 5 || cat.Name != "good.csv" || len(cat.HashSHA256) != 64 {
		t.Fatalf("got %d sections, name %q, hash %q; want 5, good.csv, 64 hex digits", len(cat.Sections), cat.Name, cat.HashSHA256)
	}
	z, ok := cat.Find("z200x1.9")
	if !ok || z.Shape != ShapeZ || z.Flange2MM != 72 || z.FyMPa != 450 {
		t.Errorf("Find(z200x1.9) = %+v, %v; want the Z with flange2 72, fy 450", z, ok)
	}
	if c, _ := cat.Find("C200x75x1.9"); c.Flange2MM != c.FlangeMM {
		t.Errorf("C flange2 = %g; want the flange, %g", c.Flange2MM, c.FlangeMM)
	}
}

// TestLoadBadRows: each bad row is an error naming the file, the line, the
// column and what is allowed, and nothing is loaded.
func TestLoadBadRows(t *testing.T) {
	cases := []struct {
		name string
		row  string
		want []string // substrings of the error
	}{
		{"missing column", "C1,C,200,75,,18,1.9,4.75,450", []string{"line 8", "has 9 columns; want 10"}},
		{"extra column", "C1,C,200,75,,18,1.9,4.75,450,480,9", []string{"line 8", "has 11 columns"}},
		{"non-numeric", "C1,C,200,seventy,,18,1.9,4.75,450,480", []string{"line 8", `flange_mm = "seventy"`, "not a finite number"}},
		{"NaN", "C1,C,200,75,,18,NaN,4.75,450,480", []string{"line 8", "thickness_mm", "not a finite number"}},
		{"Inf", "C1,C,200,75,,18,1.9,4.75,+Inf,480", []string{"line 8", "fy_mpa", "not a finite number"}},
		{"empty required", "C1,C,,75,,18,1.9,4.75,450,480", []string{"line 8", "depth_mm", "a number is required"}},
		{"zero thickness", "C1,C,200,75,,18,0,4.75,450,480", []string{"line 8", `thickness_mm = "0"`, "allowed 0 < value ≤ 10 mm"}},
		{"negative thickness", "S1,strap,30,,,,-1,,550,550", []string{"line 8", `thickness_mm = "-1"`, "allowed 0 <"}},
		{"lip longer than flange", "C1,C,200,75,,80,1.9,4.75,450,480", []string{"line 8", "lip_mm", "lip longer than the flange; allowed 0 ≤ lip ≤ 75 mm"}},
		{"Z lip longer than narrow flange", "Z1,Z,200,78,40,45,1.9,4.75,450,480", []string{"line 8", "lip_mm", "≤ 40 mm"}},
		{"radius too large", "C1,C,200,75,,18,1.9,40,450,480", []string{"line 8", "inner_radius_mm", "radius too large for the flat widths", "allowed 0 ≤ r < 16.1 mm"}},
		{"duplicate designation", "c200x75x1.9,C,200,75,,18,1.9,4.75,450,480", []string{"line 8", "duplicate designation (first on line 3)"}},
		{"unknown shape", "I1,I,200,75,,18,1.9,4.75,450,480", []string{"line 8", `shape = "I"`, "allowed C, Z, 2C, strap, rod"}},
		{"Z without second flange", "Z1,Z,200,78,,19,1.9,4.75,450,480", []string{"line 8", "flange2_mm", "required"}},
		{"fu below fy", "C1,C,200,75,,18,1.9,4.75,450,400,", []string{"line 8", "has 11 columns"}},
		{"fu below fy, right columns", "C1,C,200,75,,18,1.9,4.75,450,400", []string{"line 8", "fu_mpa", "below fy"}},
		{"rod off the thread series", "R1,rod,13,,,,,,250,410", []string{"line 8", "depth_mm", "coarse-thread size"}},
		{"strap with a lip", "S1,strap,30,,,5,1.0,,550,550", []string{"line 8", "lip_mm", "not used for a strap"}},
		{"web too shallow", "C1,C,1.5,75,,18,1.9,0,450,480", []string{"line 8", "depth_mm", "too short"}},
		{"second flange on a C", "C1,C,200,75,70,18,1.9,4.75,450,480", []string{"line 8", "flange2_mm", "only a Z"}},
		{"radius too large for a lip", "C1,C,200,75,,8,1.9,6.5,450,480", []string{"line 8", "inner_radius_mm", "lip's flat vanishes", "r < 6.1 mm"}},
		{"empty designation", ",C,200,75,,18,1.9,4.75,450,480", []string{"line 8", "designation", "unique name"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			cat, err := Load(strings.NewReader("# test\n"+header+goodRows+c.row+"\n"), "bad.csv")
			var verr *ValidationError
			if cat != nil || !errors.As(err, &verr) {
				t.Fatalf("got catalogue %v, error %v; want no catalogue and a *ValidationError", cat != nil, err)
			}
			msg := err.Error()
			for _, w := range append([]string{"bad.csv"}, c.want...) {
				if !strings.Contains(msg, w) {
					t.Errorf("error %q does not contain %q", msg, w)
				}
			}
			if len(verr.Problems) != 1 || verr.Problems[0].Line != 8 {
				t.Errorf("problems %v; want exactly one, on line 8", verr.Problems)
			}
		})
	}
}

// TestLoadReportsAllRows: three bad rows give three problems in one error.
func TestLoadReportsAllRows(t *testing.T) {
	rows := "C1,C,200,75,,18,0,4.75,450,480\nC2,C,200,75,,18,1.9,4.75,x,480\nC3,Q,200,75,,18,1.9,4.75,450,480\n"
	_, err := Load(strings.NewReader(header+goodRows+rows), "three.csv")
	var verr *ValidationError
	if !errors.As(err, &verr) || len(verr.Problems) != 3 {
		t.Fatalf("got %v; want a *ValidationError with 3 problems", err)
	}
	for i, line := range []int{7, 8, 9} {
		if verr.Problems[i].Line != line {
			t.Errorf("problem %d on line %d; want line %d", i, verr.Problems[i].Line, line)
		}
	}
}

func TestLoadBadFiles(t *testing.T) {
	cases := []struct {
		name, data, want string
	}{
		{"wrong header", "designation,shape,depth\nC1,C,200\n", "columns must be exactly"},
		{"header only", header, "no sections"},
		{"empty", "", "no sections"},
		{"unbalanced quote", header + "\"C1,C,200,75,,18,1.9,4.75,450,480\n", "unreadable CSV"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			cat, err := Load(strings.NewReader(c.data), "f.csv")
			if cat != nil || err == nil || !strings.Contains(err.Error(), c.want) || !strings.Contains(err.Error(), "f.csv") {
				t.Errorf("got %v; want an error naming f.csv containing %q", err, c.want)
			}
		})
	}
}

func TestLoadFile(t *testing.T) {
	path := filepath.Join(t.TempDir(), "mine.csv")
	if err := os.WriteFile(path, []byte(header+goodRows), 0o644); err != nil {
		t.Fatal(err)
	}
	cat, err := LoadFile(path)
	if err != nil || len(cat.Sections) != 5 || cat.Name != path {
		t.Fatalf("LoadFile: %v; want 5 sections named %s", err, path)
	}
	if _, err := LoadFile(path + ".missing"); err == nil {
		t.Error("LoadFile of a missing file: got no error")
	}
}

package grids

import (
	"flag"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

var update = flag.Bool("update", false, "rewrite testdata/examples/GRID-KEYS.md from KeyReference")

const examplesDir = "../testdata/examples"

func TestDefaultGrid(t *testing.T) {
	g, err := Default()
	if err != nil {
		t.Fatal(err)
	}
	// Issue 8: the default range has about 1,000 to 3,000 cases.
	if n := g.Count(); n < 1000 || n > 3000 {
		t.Errorf("default grid has %d cases, want 1000–3000", n)
	}
	// The housing classes apply within AS 4055:2021's limits (width ≤ 16 m,
	// eaves ≤ 6 m, pitch ≤ 35°; REFERENCE-VALUES.md §2), so every default case must lie within them.
	for c := range g.Cases() {
		if c.SpanM > 16 || c.EavesHeightM > 6 || c.RoofPitchDeg > 35 || c.LengthM > 5*c.SpanM {
			t.Fatalf("case %s lies outside the AS 4055 limits", c.ID)
		}
	}
	if string(DefaultTOML()) != string(defaultTOML) {
		t.Error("DefaultTOML differs from the embedded file")
	}
}

func TestExampleFilesParse(t *testing.T) {
	files, err := filepath.Glob(filepath.Join(examplesDir, "*.toml"))
	if err != nil || len(files) < 2 {
		t.Fatalf("got example files %v (%v), want at least two", files, err)
	}
	for _, f := range files {
		g, err := LoadFile(f)
		if err != nil {
			t.Errorf("%s: %v", f, err)
			continue
		}
		if g.Count() == 0 {
			t.Errorf("%s: no cases", f)
		}
	}
}

// TestFullExampleUsesEveryKey keeps ridgeline-range.toml a complete example:
// every key of the reference is written in it.
func TestFullExampleUsesEveryKey(t *testing.T) {
	data, err := os.ReadFile(filepath.Join(examplesDir, "ridgeline-range.toml"))
	if err != nil {
		t.Fatal(err)
	}
	lines := keyLines(data)
	written := map[string]bool{}
	for k := range lines {
		written[specPath(k)] = true
	}
	for _, s := range keySpecs {
		// length_m and bays/bay_spacing_m exclude each other; the small example has the latter.
		if s.Key == "geometry.bays" || s.Key == "geometry.bay_spacing_m" {
			continue
		}
		if !written[s.Key] {
			t.Errorf("ridgeline-range.toml lacks key %s", s.Key)
		}
	}
}

func TestKeyReferenceGolden(t *testing.T) {
	path := filepath.Join(examplesDir, "GRID-KEYS.md")
	got := "# Grid file keys\n\n" + KeyReference()
	if *update {
		if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test ./grids -run KeyReference -update)", err)
	}
	if got != string(want) {
		t.Errorf("%s is out of date; run go test ./grids -run KeyReference -update", path)
	}
	for _, s := range keySpecs {
		if !strings.Contains(got, "`"+s.Key+"`") {
			t.Errorf("reference lacks %s", s.Key)
		}
		if s.Default == "" || s.allowed() == "" || s.Unit == "" || s.Source == "" {
			t.Errorf("key %s: default, allowed, unit or source is empty", s.Key)
		}
	}
}

package main

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// Bad grid files (issue 8's list) each exit 2 naming the file and line, and
// write nothing: neither --out nor anything beside the grid file.
func TestSweepBadGridFiles(t *testing.T) {
	replace := func(old, new string) string { return strings.Replace(sweepGridText, old, new, 1) }
	// Allowed ranges from the grid key reference (grids.KeyReference).
	tests := []struct {
		name  string
		grid  string
		args  []string
		wants []string
	}{
		{"unknown key", replace("bays = [3]", "bayz = [3]"), nil, []string{"grid.toml:4: geometry.bayz", "unknown key", "nothing was written"}},
		{"wrong type", replace("[6.0, 7.5, 9.0]", `"six"`), nil, []string{`grid.toml:3: geometry.span_m = "six"`}},
		{"negative span", replace("[6.0, 7.5, 9.0]", "[-6.0, 7.5]"), nil, []string{"grid.toml:3: geometry.span_m = -6: allowed 3 ≤ value ≤ 40"}},
		{"empty list", replace("roof_pitch_deg = [10]", "roof_pitch_deg = []"), nil, []string{"grid.toml:7: geometry.roof_pitch_deg = []: must not be empty"}},
		{"two problems", replace("bays = [3]", "bays = [0]\ncolour = 1"), nil, []string{"2 problem(s)", "grid.toml:4:", "grid.toml:5: geometry.colour"}},
		{"shard 4/3", sweepGridText, []string{"--shard", "4/3"}, []string{"--shard", "4/3", "1 ≤ K ≤ N"}},
		{"shard 0/3", sweepGridText, []string{"--shard", "0/3"}, []string{"--shard", "0/3"}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			dir := t.TempDir()
			grid := filepath.Join(dir, "grid.toml")
			if err := os.WriteFile(grid, []byte(tt.grid), 0o644); err != nil {
				t.Fatal(err)
			}
			out := filepath.Join(dir, "out")
			var so, se bytes.Buffer
			code := run(append([]string{"sweep", "--grid", grid, "--out", out}, tt.args...), &so, &se)
			if code != exitUsage {
				t.Fatalf("got exit %d, want 2; stderr:\n%s", code, se.String())
			}
			for _, w := range tt.wants {
				if !strings.Contains(se.String(), w) {
					t.Errorf("stderr lacks %q:\n%s", w, se.String())
				}
			}
			if entries, _ := os.ReadDir(dir); len(entries) != 1 {
				t.Errorf("got %d entries beside the grid file, want none", len(entries)-1)
			}
		})
	}
}

// Other bad input exits 2 with the flag and value named, and writes nothing.
func TestSweepBadInput(t *testing.T) {
	f := newSweepFixture(t)
	file := filepath.Join(f.dir, "a-file")
	badCat := filepath.Join(f.dir, "bad.csv")
	for p, text := range map[string]string{file: "x", badCat: "designation,shape\nC1,Q\n"} {
		if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	tests := []struct {
		name  string
		args  []string
		wants []string
	}{
		{"workers 0", []string{"--workers", "0"}, []string{"--workers 0", "1 or more"}},
		{"workers not a number", []string{"--workers", "two"}, []string{"two"}},
		{"bad catalogue", []string{"--catalog", badCat}, []string{"--catalog", "bad.csv"}},
		{"missing catalogue", []string{"--catalog", filepath.Join(f.dir, "none.csv")}, []string{"--catalog", "none.csv"}},
		{"missing grid", []string{"--grid", filepath.Join(f.dir, "none.toml")}, []string{"none.toml"}},
		{"out parent missing", []string{"--out", filepath.Join(f.dir, "no", "such", "out")}, []string{"parent directory", "does not exist"}},
		{"out is a file", []string{"--out", file}, []string{"is not a directory"}},
		{"out under a file", []string{"--out", filepath.Join(file, "out")}, []string{"not a directory"}},
		{"cpuprofile directory missing", []string{"--cpuprofile", filepath.Join(f.dir, "no", "cpu.pprof")}, []string{"--cpuprofile", "does not exist"}},
		{"tables-only with shard", []string{"--tables-only", "--shard", "1/2"}, []string{"--tables-only"}},
		{"tables-only without a dataset", []string{"--tables-only"}, []string{"dataset", "run the sweep"}},
		{"stray argument", []string{"now"}, []string{`"now"`}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			f.sweep("out", tt.args...).wantRefused(t, tt.wants)
			if entries, _ := os.ReadDir(f.dir); len(entries) != 4 {
				t.Errorf("got %d entries in the test directory, want the grid, the catalogue and two input files", len(entries))
			}
		})
	}
}

// An output directory the sweep cannot write in is refused before any work.
// /proc takes no new files even for root; a read-only directory is tried
// when the test does not run as root (root writes anywhere).
func TestSweepUnwritableOutDir(t *testing.T) {
	f := newSweepFixture(t)
	dirs := []string{}
	if st, err := os.Stat("/proc/self"); err == nil && st.IsDir() {
		dirs = append(dirs, "/proc/spansweep-out")
	}
	if os.Geteuid() != 0 {
		ro := filepath.Join(f.dir, "read-only")
		if err := os.Mkdir(ro, 0o555); err != nil {
			t.Fatal(err)
		}
		dirs = append(dirs, ro, filepath.Join(ro, "out"))
	}
	if len(dirs) == 0 {
		t.Skip("no unwritable directory on this system: not Linux and running as root")
	}
	for _, out := range dirs {
		var so, se bytes.Buffer
		code := run([]string{"sweep", "--grid", f.grid, "--out", out}, &so, &se)
		if code != exitUsage || !strings.Contains(se.String(), "cannot write in") {
			t.Errorf("--out %s: got exit %d, want 2 with \"cannot write in\":\n%s", out, code, se.String())
		}
	}
}

// --help prints the synopsis, every flag and the caution, and exits 0.
func TestSweepHelp(t *testing.T) {
	var so, se bytes.Buffer
	if code := run([]string{"sweep", "--help"}, &so, &se); code != exitOK {
		t.Fatalf("got exit %d, want 0; stderr:\n%s", code, se.String())
	}
	for _, w := range []string{"Usage: spansweep sweep", "--grid", "--catalog", "--out", "--workers", "--shard", "--resume",
		"--envelope", "--tables-only", "--cpuprofile", "--memprofile", "--quiet", "summary.json", caution} {
		if !strings.Contains(so.String(), w) {
			t.Errorf("--help lacks %q", w)
		}
	}
}

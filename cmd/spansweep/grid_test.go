package main

import (
	"bytes"
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

const goodGrid = `[geometry]
span_m = [6.0, 9.0]
bays = [3]
bay_spacing_m = [3.0, 3.6]
eaves_height_m = [3.0]
roof_pitch_deg = [10]
[wind]
housing_classes = ["N2", "C1"]
`

// writeGrid writes a grid file in a fresh directory and returns its path.
func writeGrid(t *testing.T, text string) string {
	t.Helper()
	path := filepath.Join(t.TempDir(), "grid.toml")
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	return path
}

func TestGridCommandBadFiles(t *testing.T) {
	replace := func(old, new string) string { return strings.Replace(goodGrid, old, new, 1) }
	// Allowed sets: AS 4055:2021 Table 2.1 classes; AS/NZS 1170.2:2021 Cl 4.2.1 terrain categories.
	tests := []struct {
		name  string
		grid  string
		args  []string
		wants []string // substrings of stderr
	}{
		{"unknown key", replace("span_m", "spam_m"), nil, []string{"grid.toml:2: geometry.spam_m = [6, 9]: unknown key"}},
		{"wrong type", replace("[6.0, 9.0]", `"six"`), nil, []string{`grid.toml:2: geometry.span_m = "six": must be a list`}},
		{"negative span", replace("[6.0, 9.0]", "[-6.0, 9.0]"), nil, []string{"grid.toml:2: geometry.span_m = -6: allowed 3 ≤ value ≤ 40"}},
		{"empty list", replace("eaves_height_m = [3.0]", "eaves_height_m = []"), nil, []string{"grid.toml:5: geometry.eaves_height_m = []: must not be empty"}},
		{"unknown class", replace(`"C1"`, `"C9"`), nil, []string{`grid.toml:8: wind.housing_classes = "C9": allowed N1`}},
		{"terrain 5", goodGrid + "[[wind.site]]\nregion = \"B2\"\nterrain_category = 5\n", nil, []string{"grid.toml:11: wind.site[0].terrain_category = 5: allowed 1, 2, 2.5, 3, 4"}},
		{"two problems", replace("[6.0, 9.0]", "[-6.0, 9.0]\ncolour = 1"), nil, []string{"2 problem(s)", "grid.toml:2:", "grid.toml:3: geometry.colour"}},
		{"bad shard", goodGrid, []string{"--shard", "4/3"}, []string{"shard 4/3", "1 ≤ K ≤ N"}},
		{"shard not a number", goodGrid, []string{"--shard", "x"}, []string{`shard "x"`}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			path := writeGrid(t, tt.grid)
			var out, errb bytes.Buffer
			code := run(append([]string{"grid", "--grid", path}, tt.args...), &out, &errb)
			if code != exitUsage {
				t.Fatalf("got exit %d, want %d; stderr:\n%s", code, exitUsage, errb.String())
			}
			for _, w := range tt.wants {
				if !strings.Contains(errb.String(), w) {
					t.Errorf("stderr lacks %q:\n%s", w, errb.String())
				}
			}
			if entries, _ := os.ReadDir(filepath.Dir(path)); len(entries) != 1 {
				t.Errorf("got %d files in the grid's directory, want only the grid file", len(entries))
			}
		})
	}
}

func TestGridCommandMissingFile(t *testing.T) {
	var out, errb bytes.Buffer
	if code := run([]string{"grid", "--grid", filepath.Join(t.TempDir(), "none.toml")}, &out, &errb); code != exitUsage {
		t.Errorf("got exit %d, want %d", code, exitUsage)
	}
	if !strings.Contains(errb.String(), "none.toml") {
		t.Errorf("stderr does not name the file: %s", errb.String())
	}
}

func TestGridCommandText(t *testing.T) {
	var out, errb bytes.Buffer
	if code := run([]string{"grid", "--grid", writeGrid(t, goodGrid), "--preview", "3"}, &out, &errb); code != exitOK {
		t.Fatalf("got exit %d; stderr: %s", code, errb.String())
	}
	text := out.String()
	// 2 classes × 1 eaves × 2 spans × 2 lengths × 1 pitch × 1 base × 1 hoist = 8.
	for _, w := range []string{"Cases:  8", "N2, C1", "9 (3×3), 10.8 (3×3.6)", "First 3 case(s)", "s6-l9x3-h3-p10-N2-pinned-", caution} {
		if !strings.Contains(text, w) {
			t.Errorf("output lacks %q:\n%s", w, text)
		}
	}
}

func TestGridCommandJSON(t *testing.T) {
	for _, shard := range []string{"1/2", "2/2"} {
		var out, errb bytes.Buffer
		code := run([]string{"grid", "--grid", writeGrid(t, goodGrid), "--json", "--shard", shard, "--preview", "100"}, &out, &errb)
		if code != exitOK {
			t.Fatalf("got exit %d; stderr: %s", code, errb.String())
		}
		var got gridJSON
		if err := json.Unmarshal(out.Bytes(), &got); err != nil {
			t.Fatal(err)
		}
		// 8 cases split in contiguous halves: indexes 0–3 and 4–7.
		first := map[string]int{"1/2": 0, "2/2": 4}[shard]
		if got.Cases != 8 || got.ShardCases != 4 || len(got.Preview) != 4 || got.Preview[0].Index != first {
			t.Errorf("shard %s: got cases %d, shard cases %d, preview %d from %v; want 8, 4, 4 from %d",
				shard, got.Cases, got.ShardCases, len(got.Preview), got.Preview, first)
		}
		if len(got.SHA256) != 64 || fmt.Sprint(got.WindConditions) != "[N2 C1]" {
			t.Errorf("got sha256 %q winds %v", got.SHA256, got.WindConditions)
		}
	}
}

func TestGridCommandDefault(t *testing.T) {
	var out, errb bytes.Buffer
	if code := run([]string{"grid", "--json", "--preview", "0"}, &out, &errb); code != exitOK {
		t.Fatalf("got exit %d; stderr: %s", code, errb.String())
	}
	var got gridJSON
	if err := json.Unmarshal(out.Bytes(), &got); err != nil {
		t.Fatal(err)
	}
	if got.Cases < 1000 || got.Cases > 3000 || !strings.Contains(got.Name, "Ridgeline") {
		t.Errorf("default grid: got %d cases named %q, want 1000–3000, Ridgeline", got.Cases, got.Name)
	}
}

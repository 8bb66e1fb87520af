package main

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/catalog"
)

// requiredSectionKeys are the keys issue 2 requires in the CSV and JSON.
var requiredSectionKeys = []string{"designation", "shape", "depth_mm", "flange_mm", "lip_mm", "thickness_mm",
	"area_mm2", "mass_kg_m", "ix_mm4", "iy_mm4", "zx_mm3", "zy_mm3", "j_mm4", "iw_mm6", "fy_mpa", "fu_mpa"}

func runSectionsCmd(args ...string) (code int, stdout, stderr string) {
	var out, errb bytes.Buffer
	code = run(append([]string{"sections"}, args...), &out, &errb)
	return code, out.String(), errb.String()
}

func TestSectionsTable(t *testing.T) {
	code, out, errs := runSectionsCmd()
	if code != exitOK {
		t.Fatalf("exit %d, stderr %q; want 0", code, errs)
	}
	for _, w := range []string{"C100x50x1.0", "Z400x3.0", "2C400x3.0", "STRAP50x1.6", "ROD20", "Ix mm⁴", caution, catalog.Default().HashSHA256} {
		if !strings.Contains(out, w) {
			t.Errorf("table does not contain %q", w)
		}
	}
	if !strings.HasSuffix(strings.TrimSpace(out), caution) {
		t.Error("table does not end with the caution")
	}
}

func TestSectionsCSV(t *testing.T) {
	code, out, errs := runSectionsCmd("--format", "csv", "--shape", "z")
	if code != exitOK {
		t.Fatalf("exit %d, stderr %q; want 0", code, errs)
	}
	recs, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if want := len(catalog.Default().ByShape(catalog.ShapeZ)) + 1; len(recs) != want {
		t.Fatalf("got %d CSV records; want %d (header and every Z)", len(recs), want)
	}
	col := map[string]int{}
	for i, k := range recs[0] {
		col[k] = i
	}
	for _, k := range requiredSectionKeys {
		if _, ok := col[k]; !ok {
			t.Errorf("CSV header lacks %q", k)
		}
	}
	for _, r := range recs[1:] {
		if r[col["shape"]] != "Z" {
			t.Errorf("%s: shape %q; want only Z", r[0], r[col["shape"]])
		}
	}
}

func TestSectionsJSON(t *testing.T) {
	code, out, errs := runSectionsCmd("--format=json", "--shape", "2C")
	if code != exitOK {
		t.Fatalf("exit %d, stderr %q; want 0", code, errs)
	}
	var doc struct {
		SHA256   string           `json:"catalogue_sha256"`
		Sections []map[string]any `json:"sections"`
	}
	if err := json.Unmarshal([]byte(out), &doc); err != nil {
		t.Fatal(err)
	}
	want := catalog.Default().ByShape(catalog.Shape2C)
	if len(doc.Sections) != len(want) || doc.SHA256 != catalog.Default().HashSHA256 {
		t.Fatalf("got %d sections, hash %s; want %d and the catalogue's hash", len(doc.Sections), doc.SHA256, len(want))
	}
	for _, k := range requiredSectionKeys {
		if _, ok := doc.Sections[0][k]; !ok {
			t.Errorf("JSON section lacks %q", k)
		}
	}
	// Six significant figures of the catalogue's own value.
	if got, w := doc.Sections[0]["ix_mm4"].(float64), want[0].IxMM4; got < w*(1-1e-5) || got > w*(1+1e-5) {
		t.Errorf("%s ix_mm4 = %g; want %g", want[0].Designation, got, w)
	}
}

func TestSectionsUserCatalogue(t *testing.T) {
	dir := t.TempDir()
	good := filepath.Join(dir, "good.csv")
	bad := filepath.Join(dir, "bad.csv")
	hdr := strings.Join(catalog.Columns, ",") + "\n"
	os.WriteFile(good, []byte(hdr+"C150x60x1.5,C,150,60,,15,1.5,3.75,450,480\n"), 0o644)
	os.WriteFile(bad, []byte(hdr+"C150x60x1.5,C,150,60,,15,0,3.75,450,480\n"), 0o644)
	code, out, _ := runSectionsCmd("--catalog", good, "--format", "csv")
	if code != exitOK || strings.Count(out, "\n") != 2 || !strings.Contains(out, "C150x60x1.5") {
		t.Errorf("good catalogue: exit %d, output %q; want 0 and one section", code, out)
	}
	cases := []struct {
		name string
		args []string
		want []string
	}{
		{"bad catalogue row", []string{"--catalog", bad}, []string{bad, "line 2", "thickness_mm", "allowed"}},
		{"missing catalogue", []string{"--catalog", filepath.Join(dir, "none.csv")}, []string{"none.csv"}},
		{"bad shape", []string{"--shape", "I"}, []string{"--shape", `"I"`, "C, Z, 2C, strap, rod"}},
		{"bad format", []string{"--format", "xml"}, []string{"--format", `"xml"`, "table, csv, json"}},
		{"unknown flag", []string{"--colour"}, []string{"colour"}},
		{"stray argument", []string{"C200"}, []string{"C200"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			code, _, errs := runSectionsCmd(c.args...)
			if code != exitUsage {
				t.Errorf("exit %d; want %d", code, exitUsage)
			}
			for _, w := range c.want {
				if !strings.Contains(errs, w) {
					t.Errorf("stderr %q does not contain %q", errs, w)
				}
			}
		})
	}
}

func TestSectionsHelp(t *testing.T) {
	code, out, _ := runSectionsCmd("--help")
	if code != exitOK || !strings.Contains(out, "--catalog") || !strings.Contains(out, caution) {
		t.Errorf("--help: exit %d, output %q; want 0, the flags and the caution", code, out)
	}
}

package main

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"errors"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/parquet-go/parquet-go"
	"github.com/spf13/pflag"

	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/bill"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// lookupClasses are the AS 4055-2021 Table 2.1 ultimate and serviceability
// speeds (m/s) of the classes in the test dataset (REFERENCE-VALUES §2);
// q = 0.6·V²/1000 kPa.
var lookupClasses = []struct {
	class  string
	vu, vs float64
}{{"N2", 40, 26}, {"N3", 50, 32}}

// lookupDataset writes a made-up 8-case dataset (2 classes × spans 9, 12 m ×
// eaves 3, 3.6 m; 3 bays of 6 m; 10° pitch) and returns its directory. The
// rows are test inputs, not designs.
func lookupDataset(t *testing.T) string {
	t.Helper()
	dir := filepath.Join(t.TempDir(), "dataset")
	w, err := dataset.Create(dir, dataset.Meta{ProgramVersion: programVersion, GridSHA256: "g", CatalogSHA256: "c"})
	if err != nil {
		t.Fatal(err)
	}
	i := 0
	for _, c := range lookupClasses {
		for _, h := range []float64{3, 3.6} {
			for _, s := range []float64{9, 12} {
				r := dataset.NewRow()
				r.CaseIndex, r.CaseID, r.Status = i, fmt.Sprintf("s%g-h%g-%s", s, h, c.class), "ok"
				r.WindClass, r.WindCondition = c.class, c.class
				r.QULSKPa, r.QSLSKPa = 0.6*c.vu*c.vu/1000, 0.6*c.vs*c.vs/1000
				r.SpanM, r.EavesHeightM, r.Bays, r.BaySpacingM, r.LengthM, r.RoofPitchDeg, r.Base = s, h, 3, 6, 18, 10, "pinned"
				r.Frames, r.FootingCount, r.BoltsPerBase, r.BoltSize = 4, 8, 4, "M16"
				for k := range optimize.Roles {
					r.Members[k] = dataset.Member{Designation: "C150x1.5", Count: 8, LengthEachM: 6, MassKg: 8 * 6 * 3.1}
					r.SteelMassKg += r.Members[k].MassKg
				}
				if err := w.Write(r); err != nil {
					t.Fatal(err)
				}
				i++
			}
		}
	}
	if err := w.Close(); err != nil {
		t.Fatal(err)
	}
	return dir
}

func runCmd(args ...string) (int, string, string) {
	var so, se bytes.Buffer
	code := run(args, &so, &se)
	return code, so.String(), se.String()
}

func TestLookupCommandText(t *testing.T) {
	dir := lookupDataset(t)
	code, out, errs := runCmd("lookup", "--data", dir, "--span", "10", "--length", "15", "--height", "3", "--wind-class", "N2")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errs)
	}
	t.Log("\n" + out)
	// 10 m rounds up to the 12 m span; 3 m eaves is exact; N2 is exact.
	for _, want := range []string{"s12-h3-N2", "10 m", "12 m", "exact condition", caution} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q:\n%s", want, out)
		}
	}
}

func TestLookupCommandJSONAndCSV(t *testing.T) {
	dir := lookupDataset(t)
	args := []string{"lookup", "--data", dir, "--span", "9", "--length", "18", "--height", "3.2", "--bay", "6", "--wind-class", "N3"}
	code, out, errs := runCmd(append(args, "--json")...)
	if code != 0 {
		t.Fatalf("--json: exit %d: %s", code, errs)
	}
	var ans bill.Answer
	if err := json.Unmarshal([]byte(out), &ans); err != nil {
		t.Fatalf("--json output is not JSON: %v\n%s", err, out)
	}
	// 3.2 m eaves rounds up to 3.6 m.
	if ans.CaseID != "s9-h3.6-N3" || ans.Caution != caution || math.Abs(ans.Bill.SteelMassKg-10*8*6*3.1) > 1e-9 {
		t.Errorf("got case %s, mass %g, caution %q; want s9-h3.6-N3, %g", ans.CaseID, ans.Bill.SteelMassKg, ans.Caution, 10*8*6*3.1)
	}
	code, out, errs = runCmd(append(args, "--csv")...)
	if code != 0 {
		t.Fatalf("--csv: exit %d: %s", code, errs)
	}
	recs, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	if err != nil || len(recs) < 2 || strings.Join(recs[0], ",") != strings.Join(bill.CSVHeader, ",") {
		t.Errorf("--csv: got %v (err %v), want rows under %v", recs, err, bill.CSVHeader)
	}
}

func TestLookupCommandRegionUsesSiteWind(t *testing.T) {
	dir := lookupDataset(t)
	code, out, errs := runCmd("lookup", "--data", dir, "--span", "9", "--length", "18", "--height", "3",
		"--region", "A2", "--terrain", "3", "--importance", "2", "--json")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var ans bill.Answer
	if err := json.Unmarshal([]byte(out), &ans); err != nil {
		t.Fatal(err)
	}
	// The least severe class whose q_uls and q_sls at the solved 9 m × 3 m
	// building are at least the site's, per checks/wind (AS/NZS 1170.2:2021).
	at := dataset.Row{SpanM: 9, EavesHeightM: 3, RoofPitchDeg: 10}
	p, err := siteWind(bill.WindRequest{Region: "A2", TerrainCategory: 3, ImportanceLevel: 2, DesignLifeYears: 50}, &at)
	if err != nil {
		t.Fatal(err)
	}
	want := ""
	for _, c := range lookupClasses {
		if 0.6*c.vu*c.vu/1000 >= p.QULSKPa && 0.6*c.vs*c.vs/1000 >= p.QSLSKPa {
			want = "s9-h3-" + c.class
			break
		}
	}
	if ans.CaseID != want {
		t.Errorf("got %s, want %s (site q_uls %.3f, q_sls %.3f kPa)", ans.CaseID, want, p.QULSKPa, p.QSLSKPa)
	}
}

func TestLookupCommandErrors(t *testing.T) {
	dir := lookupDataset(t)
	corrupt := t.TempDir()
	os.WriteFile(filepath.Join(corrupt, "part-00001-of-00001.parquet"), []byte("garbage"), 0o644)
	oldVersion := t.TempDir()
	if f, err := os.Create(filepath.Join(oldVersion, "part-00001-of-00001.parquet")); err == nil {
		pw := parquet.NewWriter(f, dataset.Schema(), parquet.KeyValueMetadata(dataset.KeySchemaVersion, "0"))
		pw.Close()
		f.Close()
	}
	base := []string{"--span", "9", "--length", "18", "--height", "3", "--wind-class", "N2"}
	for _, tc := range []struct {
		name string
		args []string
		code int
		want string
	}{
		{"missing dataset", append([]string{"--data", filepath.Join(dir, "nope")}, base...), 2, "no dataset there"},
		{"corrupt dataset", append([]string{"--data", corrupt}, base...), 1, "not a readable Parquet file"},
		{"other schema version", append([]string{"--data", oldVersion}, base...), 1, `schema_version "0"`},
		{"not covered", []string{"--data", dir, "--span", "20", "--length", "18", "--height", "3", "--wind-class", "N2"}, 2, "largest solved 12 m"},
		{"cyclonic", []string{"--data", dir, "--span", "9", "--length", "18", "--height", "3", "--wind-class", "C1"}, 2, "no solved case covers"},
		{"missing span", []string{"--data", dir, "--length", "18", "--height", "3", "--wind-class", "N2"}, 2, "--span"},
		{"json and csv", append([]string{"--data", dir, "--json", "--csv"}, base...), 2, "at most one"},
		{"bad terrain", []string{"--data", dir, "--span", "9", "--length", "18", "--height", "3", "--region", "B2", "--terrain", "7", "--importance", "2"}, 2, "--terrain 7"},
		{"no wind", []string{"--data", dir, "--span", "9", "--length", "18", "--height", "3"}, 2, "--wind-class"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			code, _, errs := runCmd(append([]string{"lookup"}, tc.args...)...)
			if code != tc.code || !strings.Contains(errs, tc.want) {
				t.Errorf("got exit %d, stderr %q; want exit %d mentioning %q", code, errs, tc.code, tc.want)
			}
		})
	}
}

// FuzzLookupQuery feeds arbitrary command lines to the lookup flag parser:
// it must never panic, every rejection must be a usage error (exit 2), and
// every accepted query must be valid.
func FuzzLookupQuery(f *testing.F) {
	for _, s := range []string{
		"--span 12 --length 24 --height 3.6 --wind-class N3",
		"--span 12 --length 24 --height 3.6 --bay 6 --pitch 10 --base fixed --region B2 --terrain 2.5 --importance 2 --life 50",
		"--span -1 --length 24 --height 3 --wind-class N3",
		"--span NaN --length Inf --height 0 --wind-class N9",
		"--span 1e308 --length 1e308 --height 1e-308 --region C --terrain 1 --importance 4 --json",
		"--span 12 --length 6 --bay 7 --height 3 --wind-class C4 --csv --json",
		"--data /nonexistent --span 12 --length 24 --height 3 --wind-class N1 extra",
		"--help",
	} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		var out bytes.Buffer
		a, err := parseLookupArgs(strings.Fields(s), &out)
		if err != nil {
			var ue *usageError
			if !errors.As(err, &ue) && !errors.Is(err, pflag.ErrHelp) {
				t.Fatalf("%q: error %v is not a usage error", s, err)
			}
			return
		}
		if verr := a.query.Validate(); verr != nil {
			t.Fatalf("%q: accepted an invalid query: %v", s, verr)
		}
		if !(a.query.SpanM > 0 && a.query.LengthM > 0 && a.query.EavesHeightM > 0) {
			t.Fatalf("%q: accepted non-positive sizes %+v", s, a.query)
		}
	})
}

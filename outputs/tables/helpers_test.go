package tables

import (
	"bytes"
	"flag"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata")

// Illustrative masses per metre of the fictional "RS" sections the tests
// use (test inputs, not catalogue values).
var testKgPerM = map[string]float64{
	"C150x1.5": 3.10, "C200x1.9": 5.05, "C250x2.4": 8.05, "2C250x2.4": 16.10,
	"C300x3.0": 12.40, "2C300x3.0": 24.80, "Z150x1.5": 3.15, "Z200x1.9": 5.15, "Z250x2.4": 8.20,
}

func lookup(d string) (float64, bool) {
	v, ok := testKgPerM[d]
	return v, ok
}

// design is a hand-made case and its chosen sections.
type design struct {
	index          int
	wind           string
	spanM, lengthM float64
	bays           int
	heightM        float64
	rafter, column string
	purlin         string
	spacingM       float64
	massKg         float64
	reason         string // non-empty: no_solution
}

func (d design) result() *optimize.Result {
	c := grids.Case{
		ID: fmt.Sprintf("t%03d", d.index), Index: d.index,
		SpanM: d.spanM, LengthM: d.lengthM, Bays: d.bays, BaySpacingM: d.lengthM / float64(d.bays),
		EavesHeightM: d.heightM, RoofPitchDeg: 10, Wind: grids.Wind{HousingClass: d.wind},
		Base: grids.BasePinned,
	}
	r := &optimize.Result{Case: c, SteelMassKg: d.massKg}
	if d.reason != "" {
		r.Status, r.Reason = optimize.NoSolution, d.reason
		return r
	}
	group := func(role optimize.Role, des string, spacing float64, count int, lengthEach float64) optimize.MemberGroup {
		return optimize.MemberGroup{Role: role, Designation: des, SpacingM: spacing, Count: count,
			LengthEachM: lengthEach, MassKg: testKgPerM[des] * float64(count) * lengthEach,
			Governing: optimize.Governing{Check: "combined bending and shear", Standard: "AS/NZS 4600:2018", Clause: "cl. 3.3.5"}}
	}
	frames := d.bays + 1
	r.Members = []optimize.MemberGroup{
		group(optimize.RolePurlin, d.purlin, d.spacingM, 2*int(d.spanM/2/d.spacingM+1), d.lengthM),
		group(optimize.RoleRafter, d.rafter, 0, 2*frames, d.spanM/2),
		group(optimize.RoleColumn, d.column, 0, 2*frames, d.heightM),
	}
	return r
}

// sampleDesigns is a small range: two wind classes, two heights, spans
// 9 and 12 m, lengths 12 and 18 m, with one size that has no solution and
// one smaller size heavier than a larger one (so the envelope has work).
func sampleDesigns() []design {
	var out []design
	i := 0
	for _, wind := range []string{"N2", "N3"} {
		for _, h := range []float64{3, 3.6} {
			for _, span := range []float64{9, 12} {
				for _, ln := range []struct {
					m    float64
					bays int
				}{{12, 2}, {18, 3}} {
					d := design{index: i, wind: wind, spanM: span, lengthM: ln.m, bays: ln.bays, heightM: h,
						rafter: "C200x1.9", column: "C200x1.9", purlin: "Z150x1.5", spacingM: 1.2,
						massKg: 800 + 40*span + 20*ln.m + 100*h}
					if span == 12 {
						d.rafter, d.column = "2C250x2.4", "C250x2.4"
					}
					if wind == "N3" {
						d.purlin, d.spacingM = "Z200x1.9", 1.5
						if span == 9 && ln.m == 12 {
							d.rafter = "C250x2.4" // heavier than its larger neighbour
						}
					}
					if wind == "N3" && h == 3.6 && span == 12 && ln.m == 18 {
						d.reason = "rafter: no passing section; best 2C300x3.0 at utilisation 1.08 (member moment capacity)"
					}
					out = append(out, d)
					i++
				}
			}
		}
	}
	return out
}

func accumulate(t *testing.T, opt Options, ds []design) *Set {
	t.Helper()
	a := NewAccumulator(opt)
	for _, d := range ds {
		if err := a.Add(d.result()); err != nil {
			t.Fatalf("Add(%s): %v", d.result().Case.ID, err)
		}
	}
	return a.Set()
}

func testAssumptions() Assumptions {
	return Assumptions{
		Title:       "Ridgeline Sheds Pty Ltd: gable sheds (illustrative range)",
		Maker:       "Ridgeline Sheds Pty Ltd (fictional)",
		Generated:   "test run",
		Version:     "test",
		Standards:   []string{"AS/NZS 1170.0:2002 Structural design actions, general principles", "AS/NZS 4600:2018 Cold-formed steel structures"},
		Defaults:    []string{"roof and wall cladding 0.05 kPa (illustrative)"},
		LimitStates: []string{"rafter deflection under G+Ws at most span/150 (common practice, no source)"},
	}
}

// golden compares got with testdata/name.golden, or rewrites it with -update.
func golden(t *testing.T, name string, got []byte) {
	t.Helper()
	path := filepath.Join("testdata", name+".golden")
	if *update {
		if err := os.WriteFile(path, got, 0o644); err != nil {
			t.Fatal(err)
		}
		return
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test -update to create it)", err)
	}
	if !bytes.Equal(got, want) {
		t.Errorf("%s differs from golden file (go test -update rewrites it):\n%s", name, lineDiff(string(want), string(got)))
	}
}

// lineDiff shows the first differing lines of want and got with context.
func lineDiff(want, got string) string {
	w, g := strings.Split(want, "\n"), strings.Split(got, "\n")
	for i := 0; i < len(w) || i < len(g); i++ {
		if i < len(w) && i < len(g) && w[i] == g[i] {
			continue
		}
		var b strings.Builder
		for k := max(0, i-2); k < i+3; k++ {
			if k < len(w) {
				fmt.Fprintf(&b, "-%4d %s\n", k+1, w[k])
			}
			if k < len(g) {
				fmt.Fprintf(&b, "+%4d %s\n", k+1, g[k])
			}
		}
		return b.String()
	}
	return "(no line differs; check line endings)"
}

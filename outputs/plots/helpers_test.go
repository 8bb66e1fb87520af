package plots

import (
	"bytes"
	"encoding/xml"
	"flag"
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata")

// trend is the known mass rule of one synthetic wind condition.
type trend struct {
	wind string
	a, b float64 // total mass = a·span^b·(length/24)
}

var testTrends = []trend{{"N2", 9.5, 1.55}, {"N3", 11, 1.6}, {"C2", 14, 1.7}}

var testSpansM = []float64{6, 9, 12, 15, 18}

// testResults makes one result per wind, span and length (24 and 36 m),
// in grid order; the 18 m span in C2 at 36 m has no solution. The heaviest
// group is the rafter for spans over 9 m and the purlin otherwise.
func testResults() []*optimize.Result {
	var out []*optimize.Result
	i := 0
	for _, tr := range testTrends {
		for _, span := range testSpansM {
			for _, length := range []float64{24, 36} {
				mass := tr.a * math.Pow(span, tr.b) * length / 24
				c := grids.Case{Index: i, ID: fmt.Sprintf("p%03d", i), SpanM: span, LengthM: length,
					Bays: int(length / 6), BaySpacingM: 6, EavesHeightM: 3.6, RoofPitchDeg: 10,
					Wind: grids.Wind{HousingClass: tr.wind}, Base: grids.BasePinned}
				r := &optimize.Result{Case: c, SteelMassKg: mass, MassPerFloorKgM2: mass / (span * length)}
				if tr.wind == "C2" && span == 18 && length == 36 {
					r.Status, r.Reason = optimize.NoSolution, "rafter: no passing section"
				}
				rafterShare := 0.3
				if span > 9 {
					rafterShare = 0.5
				}
				r.Members = []optimize.MemberGroup{
					{Role: optimize.RolePurlin, MassKg: 0.4 * mass, Governing: optimize.Governing{Check: "purlin bending with through-fastened flange (uplift)"}},
					{Role: optimize.RoleRafter, MassKg: rafterShare * mass, Governing: optimize.Governing{Check: "combined axial and bending"}},
					{Role: optimize.RoleColumn, MassKg: 0.1 * mass, Governing: optimize.Governing{Check: "column deflection (SLS)"}},
				}
				out = append(out, r)
				i++
			}
		}
	}
	return out
}

func collect(results []*optimize.Result) *Collector {
	c := NewCollector(nil)
	for _, r := range results {
		c.Add(r)
	}
	return c
}

// elementCounts parses an SVG with encoding/xml (failing on malformed XML)
// and counts elements by name, and elements by class attribute.
func elementCounts(t *testing.T, doc []byte) (byName, byClass map[string]int) {
	t.Helper()
	byName, byClass = map[string]int{}, map[string]int{}
	d := xml.NewDecoder(bytes.NewReader(doc))
	for {
		tok, err := d.Token()
		if err == io.EOF {
			break
		}
		if err != nil {
			t.Fatalf("SVG is not well-formed XML: %v", err)
		}
		if se, ok := tok.(xml.StartElement); ok {
			byName[se.Name.Local]++
			for _, a := range se.Attr {
				if a.Name.Local == "class" {
					byClass[a.Value]++
				}
			}
		}
	}
	return byName, byClass
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

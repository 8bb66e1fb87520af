package report

import (
	"bytes"
	"flag"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/optimize"
)

var update = flag.Bool("update", false, "rewrite testdata/*.golden from the current output")

// render writes the report in one format.
func render(t *testing.T, r Report, f Format) string {
	t.Helper()
	var buf bytes.Buffer
	if err := r.Write(&buf, f); err != nil {
		t.Fatalf("%v: %v", f, err)
	}
	return buf.String()
}

// TestGolden compares both formats of the hand-built report with
// testdata/*.golden (go test ./outputs/report -update rewrites them).
func TestGolden(t *testing.T) {
	r := fixtureReport(t)
	for _, tc := range []struct {
		format Format
		file   string
	}{{Markdown, "report.md.golden"}, {HTML, "report.html.golden"}} {
		t.Run(tc.format.String(), func(t *testing.T) {
			got := render(t, r, tc.format)
			path := filepath.Join("testdata", tc.file)
			if *update {
				if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(path)
			if err != nil {
				t.Fatalf("%v (run with -update to create it)", err)
			}
			if d := lineDiff(string(want), got); d != "" {
				t.Errorf("%s differs from the golden file (run with -update if the change is intended):\n%s", tc.file, d)
			}
		})
	}
}

// lineDiff reports the first lines where got departs from want, with a
// little context; "" when they are equal.
func lineDiff(want, got string) string {
	if want == got {
		return ""
	}
	w, g := strings.Split(want, "\n"), strings.Split(got, "\n")
	i := 0
	for i < len(w) && i < len(g) && w[i] == g[i] {
		i++
	}
	var b strings.Builder
	for k := max(0, i-2); k < i; k++ {
		b.WriteString("  " + w[k] + "\n")
	}
	for k := i; k < min(i+4, len(w)); k++ {
		b.WriteString("- " + w[k] + "\n")
	}
	for k := i; k < min(i+4, len(g)); k++ {
		b.WriteString("+ " + g[k] + "\n")
	}
	b.WriteString("(line " + strconv.Itoa(i+1) + ")")
	return b.String()
}

// TestEverySectionAndCautionTwice checks that each format has every
// section heading, in order, and the caution at the top and at the end.
func TestEverySectionAndCautionTwice(t *testing.T) {
	full := fixtureReport(t)
	bare := fixtureReport(t)
	bare.Result.Calculation = nil
	for _, r := range []struct {
		name string
		rep  Report
	}{{"with calculation", full}, {"without calculation", bare}} {
		for _, f := range []Format{Markdown, HTML} {
			out := render(t, r.rep, f)
			if n := strings.Count(out, Caution); n != 2 {
				t.Errorf("%s, %v: caution appears %d times, want 2", r.name, f, n)
			}
			first, last := strings.Index(out, Caution), strings.LastIndex(out, Caution)
			pos := 0
			for i, h := range SectionHeadings {
				k := strings.Index(out[pos:], h)
				if k < 0 {
					t.Errorf("%s, %v: section %d %q missing or out of order", r.name, f, i+1, h)
					continue
				}
				pos += k
				if pos < first || pos > last {
					t.Errorf("%s, %v: section %q is not between the two cautions", r.name, f, h)
				}
			}
			if r.rep.Result.Calculation == nil && !strings.Contains(out, "Not recorded") {
				t.Errorf("%s, %v: no statement that the working was not recorded", r.name, f)
			}
		}
	}
}

// TestGoverningMarked checks one marked line per group of checks: the one
// the group's Governing names, or else the line of highest utilisation.
func TestGoverningMarked(t *testing.T) {
	md := render(t, fixtureReport(t), Markdown)
	var marked []string
	for _, l := range strings.Split(md, "\n") {
		if strings.Contains(l, "**governs**") {
			marked = append(marked, l)
		}
	}
	if len(marked) != 3 {
		t.Fatalf("got %d governing lines, want 3 (one per group):\n%s", len(marked), strings.Join(marked, "\n"))
	}
	for i, want := range []string{"**member moment capacity, lateral-torsional buckling**", "**combined compression and bending**", "**uplift**"} {
		if !strings.Contains(marked[i], want) {
			t.Errorf("group %d: governing line %q, want the line of %s", i+1, marked[i], want)
		}
	}
}

// TestReportCarriesTheInputs spot-checks that values of the result reach
// the report as written: a pressure, a combination's factors, a moment
// extreme, a check's capacity, the total mass and the hoist.
func TestReportCarriesTheInputs(t *testing.T) {
	r := fixtureReport(t)
	md := render(t, r, Markdown)
	for _, want := range []string{
		"| roof upwind slope | 0.837 | 0.80 | 0.00 | 4.13 | -0.900 | -0.480 | -0.600 | -0.441 | -0.298 |", // -0.48 × 0.9196, × 0.6217
		"| 0.9 × G + 1 × W crosswind, roof max suction, permeable Cpi -0.30 |",
		"Largest moment 7.80 kN·m at 4.570 m; smallest -18.40 kN·m at 0.000 m.",
		"| **5.100** | **5.592** | **kN·m** | **0.912** | **governs** |",
		"| Total steel mass (kg) | 2500.4 |", // 1182.7 + 489.6 + 488.2 + 288.4 + 29.9 + 21.6
		"5 kN at mid-span (apex)",
		"| Site speed V_sit = V_R·M_c·M_d·M_z,cat·M_s·M_t (m/s) | AS/NZS 1170.2:2021 cl. 2.2 | 39.15 | 32.19 |",
		"Fly braces: 4 per frame, 20 in the building.",
		"AS 4100", // not named by the fixture: must not appear
	} {
		has := strings.Contains(md, want)
		if want == "AS 4100" {
			if has {
				t.Errorf("standards list names %q, which no check used", want)
			}
			continue
		}
		if !has {
			t.Errorf("report lacks %q", want)
		}
	}
	if !strings.Contains(md, "(a &lt; b & c | d)") {
		t.Errorf("note with < not escaped for Markdown")
	}
}

func TestNoResult(t *testing.T) {
	var buf bytes.Buffer
	if err := (Report{}).WriteMarkdown(&buf); err == nil {
		t.Errorf("a report without a result: got no error")
	}
}

// TestNoSolutionReport: a failed design states its status and reason, says
// the sections are not a design, and explains the missing frame analysis.
func TestNoSolutionReport(t *testing.T) {
	r := fixtureReport(t)
	res := r.Result
	res.Status = optimize.NoSolution
	res.Reason = "rafter: best candidate 2C300x3.0 at utilisation 1.27, combined compression and bending (AS/NZS 4600:2018 cl. 3.5.1)"
	res.Calculation.Frame = nil
	md := render(t, r, Markdown)
	for _, want := range []string{
		"| Status | no_solution |",
		"| Reason | " + res.Reason + " |",
		"they are not a design",
		"Groups chosen before the search stopped (not a design) |  |  |  |  | 2500.4 |",
		"The frame was not analysed: the search stopped at " + res.Reason + ".",
	} {
		if !strings.Contains(md, want) {
			t.Errorf("report lacks %q", want)
		}
	}
}

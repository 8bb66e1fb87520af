package main

import (
	"bytes"
	"flag"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/dataset"
	"github.com/spansweep/spansweep/outputs/tables"
)

var updateReadme = flag.Bool("update-readme", false, "rewrite the README's generated blocks from a real run")

const readmePath = "../../README.md"

// readmeBlock returns the text between <!-- begin name --> and
// <!-- end name --> in doc, and where it lies.
func readmeBlock(t *testing.T, doc, name string) (text string, lo, hi int) {
	t.Helper()
	begin, end := "<!-- begin "+name+" -->\n", "<!-- end "+name+" -->"
	lo = strings.Index(doc, begin)
	hi = strings.Index(doc, end)
	if lo < 0 || hi < lo {
		t.Fatalf("README lacks the %s block", name)
	}
	lo += len(begin)
	return doc[lo:hi], lo, hi
}

// readmeExcerpt runs the sweep on the small example grid and returns the
// README's generated blocks: the first span table and the summary line.
func readmeExcerpt(t *testing.T) (excerpt, summaryLine string) {
	t.Helper()
	out := filepath.Join(t.TempDir(), "out")
	small := filepath.Join(examplesDir, "small.toml")
	var so, se bytes.Buffer
	if code := run([]string{"sweep", "--grid", small, "--out", out, "--workers", "2", "--quiet"}, &so, &se); code != exitOK {
		t.Fatalf("sweep of small.toml: exit %d:\n%s", code, se.String())
	}
	s, err := parseSweep([]string{"--grid", small, "--out", out, "--tables-only"}, &so)
	if err != nil {
		t.Fatal(err)
	}
	d, err := s.openDataset()
	if err != nil {
		t.Fatal(err)
	}
	defer d.Close()
	// The sweep streams its tables to files; the excerpt needs one table
	// as a value, which an Accumulator over the same rows gives.
	acc := tables.NewAccumulator(tables.Options{Envelope: s.flags.envelope, KgPerM: s.kgPerM})
	if err := s.eachResult(d, 0, s.grid.Count(), acc.Add); err != nil {
		t.Fatal(err)
	}
	set := acc.Set()
	var b bytes.Buffer
	if err := set.WriteMarkdownTable(&b, &set.Tables[0]); err != nil {
		t.Fatal(err)
	}
	line, _, _ := strings.Cut(se.String(), "\n")
	return b.String(), "```\n" + line + "\n```\n"
}

// The README's copies of the grid key reference and the small example grid
// are current and its schema names every dataset column. With
// -update-readme the generated blocks are rewritten, the span-table excerpt
// and summary line from a real run of small.toml.
func TestReadme(t *testing.T) {
	raw, err := os.ReadFile(readmePath)
	if err != nil {
		t.Fatal(err)
	}
	doc := string(raw)
	small, err := os.ReadFile(filepath.Join(examplesDir, "small.toml"))
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]string{
		"grid-keys":  grids.KeyReference(),
		"small-grid": "```toml\n" + string(small) + "```\n",
	}
	if *updateReadme {
		want["span-table-excerpt"], want["summary-line"] = readmeExcerpt(t)
		for _, name := range []string{"summary-line", "span-table-excerpt", "small-grid", "grid-keys"} {
			_, lo, hi := readmeBlock(t, doc, name)
			doc = doc[:lo] + want[name] + doc[hi:]
		}
		if err := os.WriteFile(readmePath, []byte(doc), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	for _, name := range []string{"grid-keys", "small-grid"} {
		if got, _, _ := readmeBlock(t, doc, name); got != want[name] {
			t.Errorf("README %s block is out of date; run go test ./cmd/spansweep -run Readme -update-readme", name)
		}
	}
	// The excerpt and the summary line come from a real run (-update-readme);
	// their numbers follow the engineering, so only their form is checked.
	if got, _, _ := readmeBlock(t, doc, "span-table-excerpt"); !strings.HasPrefix(got, "**Wind N2, eaves height 3.00 m**") || !strings.Contains(got, caution) {
		t.Errorf("README span-table excerpt %q: want small.toml's first table and the caution; run with -update-readme", got)
	}
	if got, _, _ := readmeBlock(t, doc, "summary-line"); !regexp.MustCompile(`spansweep sweep: 8 cases \(\d+ ok, \d+ no_solution\)`).MatchString(got) {
		t.Errorf("README summary line %q is not a summary of small.toml's 8 cases", got)
	}
	checkSchemaDocumented(t, doc)
}

// checkSchemaDocumented checks that the README's schema names every column
// of outputs/dataset: member columns as <role>_<field> with the role listed.
func checkSchemaDocumented(t *testing.T, doc string) {
	t.Helper()
	schema, _, _ := readmeBlock(t, doc, "dataset-schema")
	for _, col := range dataset.ColumnNames() {
		if strings.Contains(schema, "`"+col+"`") {
			continue
		}
		documented := false
		for _, role := range optimize.Roles {
			if field, ok := strings.CutPrefix(col, string(role)+"_"); ok {
				documented = strings.Contains(schema, "`"+string(role)+"`") && strings.Contains(schema, "`<role>_"+field+"`")
				break
			}
		}
		if !documented {
			t.Errorf("README schema lacks column %s", col)
		}
	}
}

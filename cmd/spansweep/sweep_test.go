package main

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"reflect"
	"slices"
	"strings"
	"sync"
	"testing"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// sweepGridText is a 24-case grid: 2 classes × 2 eaves × 3 spans × 2 lengths.
// Illustrative sizes only.
const sweepGridText = `name = "sweep test grid (illustrative)"
[geometry]
span_m = [6.0, 7.5, 9.0]
bays = [3]
bay_spacing_m = [3.0, 3.6]
eaves_height_m = [3.0, 3.6]
roof_pitch_deg = [10]
[wind]
housing_classes = ["N2", "C1"]
`

const sweepGridCases = 24

// sweepFixture is one test's grid file, a small catalogue and a place for
// output directories.
type sweepFixture struct {
	t         *testing.T
	grid, cat string
	dir       string
}

func newSweepFixture(t *testing.T) *sweepFixture {
	t.Helper()
	dir := t.TempDir()
	f := &sweepFixture{t: t, grid: filepath.Join(dir, "grid.toml"), cat: filepath.Join(dir, "sections.csv"), dir: dir}
	if err := os.WriteFile(f.grid, []byte(sweepGridText), 0o644); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(f.cat, smallCatalogue(), 0o644); err != nil {
		t.Fatal(err)
	}
	designCase = cachedDesign
	t.Cleanup(func() { designCase = optimize.Design })
	return f
}

// smallCatalogue is every sixth section of each shape of the embedded RS
// series, and the heaviest: fewer candidates, so a case designs quickly.
func smallCatalogue() []byte {
	var out []string
	kept := map[string]int{}
	lines := strings.Split(strings.TrimSpace(string(catalog.DefaultCSV())), "\n")
	for i, line := range lines {
		fields := strings.Split(line, ",")
		if strings.HasPrefix(line, "#") || len(fields) < 2 || fields[0] == "designation" {
			out = append(out, line)
			continue
		}
		shape := fields[1]
		last := i+1 == len(lines) || strings.Split(lines[i+1], ",")[1] != shape
		if kept[shape]%6 == 0 || last {
			out = append(out, line)
		}
		kept[shape]++
	}
	return []byte(strings.Join(out, "\n") + "\n")
}

// designCache holds optimize.Design's result per case and catalogue, so
// the many sweeps of one grid in these tests design each case once: the
// results are the real design's, and a sweep's pipeline (engine, dataset,
// tables) still runs in full every time.
var designCache sync.Map

func cachedDesign(c grids.Case, s *optimize.Settings) optimize.Result {
	key := c.ID + "|" + s.Catalogue.HashSHA256
	if r, ok := designCache.Load(key); ok {
		res := r.(optimize.Result)
		res.Case = c
		return res
	}
	r := optimize.Design(c, s)
	designCache.Store(key, r)
	return r
}

// sweepResult is one run of the command.
type sweepResult struct {
	code         int
	stdout, errs string
}

// wantRefused requires a bad-input exit (status 2) whose standard error
// holds every one of wants; a wrong status ends the test.
func (r sweepResult) wantRefused(t *testing.T, wants []string) {
	t.Helper()
	if r.code != exitUsage {
		t.Fatalf("got exit %d, want 2; stderr:\n%s", r.code, r.errs)
	}
	for _, w := range wants {
		if !strings.Contains(r.errs, w) {
			t.Errorf("stderr lacks %q:\n%s", w, r.errs)
		}
	}
}

// sweep runs "spansweep sweep --grid <fixture> --out <dir/out> args...".
func (f *sweepFixture) sweep(out string, args ...string) sweepResult {
	f.t.Helper()
	var so, se bytes.Buffer
	all := append([]string{"sweep", "--grid", f.grid, "--catalog", f.cat, "--out", filepath.Join(f.dir, out)}, args...)
	code := run(all, &so, &se)
	return sweepResult{code, so.String(), se.String()}
}

// mustSweep runs the sweep and fails the test unless it exits 0.
func (f *sweepFixture) mustSweep(out string, args ...string) sweepResult {
	f.t.Helper()
	r := f.sweep(out, args...)
	if r.code != exitOK {
		f.t.Fatalf("sweep %v: got exit %d, want 0; stderr:\n%s", args, r.code, r.errs)
	}
	return r
}

// rows reads every row of out's dataset with the dataset package's reader.
func (f *sweepFixture) rows(out string) []dataset.Row {
	f.t.Helper()
	d, err := dataset.Open(filepath.Join(f.dir, out, "dataset"))
	if err != nil {
		f.t.Fatal(err)
	}
	defer d.Close()
	var rows []dataset.Row
	if err := d.Each(func(r *dataset.Row) error { rows = append(rows, r.Clone()); return nil }); err != nil {
		f.t.Fatal(err)
	}
	return rows
}

// derivedFiles reads the tables and plots of out, by relative path.
func (f *sweepFixture) derivedFiles(out string) map[string][]byte {
	f.t.Helper()
	files := map[string][]byte{}
	for _, sub := range []string{"tables", "plots"} {
		entries, err := os.ReadDir(filepath.Join(f.dir, out, sub))
		if err != nil {
			f.t.Fatal(err)
		}
		for _, e := range entries {
			b, err := os.ReadFile(filepath.Join(f.dir, out, sub, e.Name()))
			if err != nil {
				f.t.Fatal(err)
			}
			files[sub+"/"+e.Name()] = b
		}
	}
	return files
}

func (f *sweepFixture) summary(path string) sweepSummary {
	f.t.Helper()
	b, err := os.ReadFile(filepath.Join(f.dir, path))
	if err != nil {
		f.t.Fatal(err)
	}
	var s sweepSummary
	if err := json.Unmarshal(b, &s); err != nil {
		f.t.Fatal(err)
	}
	return s
}

// sameRows fails the test unless got and want hold equal rows in order.
func sameRows(t *testing.T, what string, got, want []dataset.Row) {
	t.Helper()
	if len(got) != len(want) {
		t.Fatalf("%s: got %d rows, want %d", what, len(got), len(want))
	}
	for i := range got {
		if !reflect.DeepEqual(got[i], want[i]) {
			t.Fatalf("%s: row %d differs:\n got %+v\nwant %+v", what, i, got[i], want[i])
		}
	}
}

// sameFiles fails the test unless got and want hold byte-identical files.
func sameFiles(t *testing.T, what string, got, want map[string][]byte) {
	t.Helper()
	names := func(m map[string][]byte) []string {
		var n []string
		for k := range m {
			n = append(n, k)
		}
		slices.Sort(n)
		return n
	}
	if !slices.Equal(names(got), names(want)) {
		t.Fatalf("%s: got files %v, want %v", what, names(got), names(want))
	}
	for name := range want {
		if !bytes.Equal(got[name], want[name]) {
			t.Errorf("%s: %s differs (%d bytes, want %d)", what, name, len(got[name]), len(want[name]))
		}
	}
}

// The layout of DESIGN.md §6 as the README documents it, one row per case in
// case order, and a summary that counts every case once.
func TestSweepWritesLayout(t *testing.T) {
	f := newSweepFixture(t)
	r := f.mustSweep("out", "--workers", "2")
	for _, p := range []string{
		"dataset/" + dataset.PieceName(dataShard(grids.Shard{K: 1, N: 1}), 1),
		"tables/span-tables.csv", "tables/span-tables.md", "tables/span-tables.html",
		"plots/governing-checks.svg", "summary.json",
	} {
		if _, err := os.Stat(filepath.Join(f.dir, "out", p)); err != nil {
			t.Errorf("missing %s: %v", p, err)
		}
		if !strings.Contains(r.stdout, filepath.Join("out", p)) {
			t.Errorf("stdout does not list %s:\n%s", p, r.stdout)
		}
	}
	rows := f.rows("out")
	if len(rows) != sweepGridCases {
		t.Fatalf("got %d rows, want %d", len(rows), sweepGridCases)
	}
	for i, row := range rows {
		if row.CaseIndex != i || row.ProgramVersion != programVersion {
			t.Errorf("row %d: case_index %d, program_version %q", i, row.CaseIndex, row.ProgramVersion)
		}
	}
	s := f.summary("out/summary.json")
	if s.Cases != sweepGridCases || s.OK+s.NoSolution != s.Cases || s.DesignedCases != sweepGridCases || s.Shard != "1/1" {
		t.Errorf("summary: got cases %d = %d ok + %d no_solution, designed %d, shard %s; want %d cases, all designed, 1/1",
			s.Cases, s.OK, s.NoSolution, s.DesignedCases, s.Shard, sweepGridCases)
	}
	if s.Grid.SHA256 != rows[0].GridSHA256 || s.Catalog.SHA256 != rows[0].CatalogSHA256 {
		t.Errorf("summary hashes %s, %s differ from the dataset's %s, %s", s.Grid.SHA256, s.Catalog.SHA256, rows[0].GridSHA256, rows[0].CatalogSHA256)
	}
	// One summary line, then the caution; no progress line off a terminal.
	if !strings.Contains(r.errs, "spansweep sweep: 24 cases (") || !strings.Contains(r.errs, caution) || strings.Contains(r.errs, "\r") {
		t.Errorf("stderr: got\n%q\nwant the summary line and caution, no carriage returns", r.errs)
	}
	for _, name := range []string{"span-tables.md", "span-tables.html"} {
		b, _ := os.ReadFile(filepath.Join(f.dir, "out", "tables", name))
		if !bytes.Contains(b, []byte("verify")) && !bytes.Contains(b, []byte("Verify")) {
			t.Errorf("%s carries no caution", name)
		}
	}
}

// STYLE.md: serial and parallel runs produce the same output.
func TestSweepWorkersGiveIdenticalOutputs(t *testing.T) {
	f := newSweepFixture(t)
	f.mustSweep("w1", "--workers", "1")
	f.mustSweep("w4", "--workers", "4")
	sameRows(t, "--workers 4 against 1", f.rows("w4"), f.rows("w1"))
	sameFiles(t, "--workers 4 against 1", f.derivedFiles("w4"), f.derivedFiles("w1"))
}

// The parts of --shard 1/3, 2/3 and 3/3, written into one shared --out as a
// batch scheduler's jobs would, read as one dataset equal to the whole run;
// --tables-only then writes tables identical to the whole run's.
func TestSweepShardsUnionEqualsWhole(t *testing.T) {
	f := newSweepFixture(t)
	f.mustSweep("whole")
	for k := 1; k <= 3; k++ {
		shard := grids.Shard{K: k, N: 3}
		r := f.mustSweep("sharded", "--shard", shard.String())
		if !strings.Contains(r.errs, "--tables-only") {
			t.Errorf("shard %s: stderr does not say how to build the tables:\n%s", shard, r.errs)
		}
		lo, hi := shard.Range(sweepGridCases)
		s := f.summary(outLayout{"sharded"}.summaryPath(shard))
		if s.Cases != hi-lo || s.Shard != shard.String() {
			t.Errorf("shard %s summary: got %d cases, shard %s; want %d", shard, s.Cases, s.Shard, hi-lo)
		}
		if k < 3 {
			// A final pass before every shard has finished names the missing shard.
			r := f.sweep("sharded", "--tables-only")
			if r.code != exitUsage || !strings.Contains(r.errs, "3/3") {
				t.Errorf("--tables-only after shard %s: got exit %d, want 2 naming shard 3/3:\n%s", shard, r.code, r.errs)
			}
		}
	}
	if _, err := os.Stat(filepath.Join(f.dir, "sharded", "tables")); err == nil {
		t.Errorf("a sharded run wrote tables; want them only from --tables-only")
	}
	sameRows(t, "shards 1/3+2/3+3/3 against the whole run", f.rows("sharded"), f.rows("whole"))
	f.mustSweep("sharded", "--tables-only")
	sameFiles(t, "--tables-only over shards against the whole run", f.derivedFiles("sharded"), f.derivedFiles("whole"))
	if s := f.summary("sharded/summary.json"); s.Cases != sweepGridCases {
		t.Errorf("--tables-only summary: got %d cases, want %d", s.Cases, sweepGridCases)
	}
}

// The tables rebuild results from dataset rows; nothing the dataset holds
// may be lost on the way: FromResult(resultOf(row)) is the row again.
func TestResultOfRoundTrip(t *testing.T) {
	f := newSweepFixture(t)
	f.mustSweep("out")
	g, err := grids.LoadFile(f.grid)
	if err != nil {
		t.Fatal(err)
	}
	for _, row := range f.rows("out") {
		res, err := resultOf(g, &row)
		if err != nil {
			t.Fatal(err)
		}
		meta := dataset.Meta{ProgramVersion: row.ProgramVersion, GridSHA256: row.GridSHA256, CatalogSHA256: row.CatalogSHA256}
		if back := dataset.FromResult(res, meta); !reflect.DeepEqual(back, row) {
			t.Fatalf("case %s: round trip differs:\n got %+v\nwant %+v", row.CaseID, back, row)
		}
	}
	bad := f.rows("out")[3]
	bad.CaseID = "not-this-case"
	if _, err := resultOf(g, &bad); err == nil || !strings.Contains(err.Error(), "not-this-case") {
		t.Errorf("a row whose id is not the grid's case: got %v, want an error naming it", err)
	}
}

// --cpuprofile and --memprofile write gzip-compressed pprof profiles.
func TestSweepProfiles(t *testing.T) {
	f := newSweepFixture(t)
	cpu, mem := filepath.Join(f.dir, "cpu.pprof"), filepath.Join(f.dir, "mem.pprof")
	f.mustSweep("out", "--cpuprofile", cpu, "--memprofile", mem)
	for _, p := range []string{cpu, mem} {
		b, err := os.ReadFile(p)
		if err != nil {
			t.Fatal(err)
		}
		// pprof's format is a gzip-compressed protocol buffer (magic 1f 8b).
		if len(b) < 2 || b[0] != 0x1f || b[1] != 0x8b {
			t.Errorf("%s: got %d bytes starting % x, want a gzip stream", p, len(b), b[:min(len(b), 2)])
		}
	}
}

// With no --grid, --catalog or --out the embedded grid and catalogue run into
// ./out (one small shard of it, to keep the test short).
func TestSweepDefaultsIntoDotOut(t *testing.T) {
	t.Chdir(t.TempDir())
	var so, se bytes.Buffer
	if code := run([]string{"sweep", "--shard", "1/1680", "--quiet"}, &so, &se); code != exitOK {
		t.Fatalf("got exit %d; stderr:\n%s", code, se.String())
	}
	if so.Len() != 0 {
		t.Errorf("--quiet: got stdout %q, want none", so.String())
	}
	b, err := os.ReadFile(filepath.Join("out", "shards", "summary-00001-of-01680.json"))
	if err != nil {
		t.Fatal(err)
	}
	var s sweepSummary
	if err := json.Unmarshal(b, &s); err != nil {
		t.Fatal(err)
	}
	g, err := grids.Default()
	if err != nil {
		t.Fatal(err)
	}
	lo, hi := grids.Shard{K: 1, N: 1680}.Range(g.Count())
	if s.Grid.SHA256 != g.HashSHA256 || s.Cases != hi-lo || !strings.HasPrefix(s.Catalog.File, "embedded:") {
		t.Errorf("got grid %s with %d cases, catalogue %s; want the embedded grid %s with %d cases and the embedded catalogue",
			s.Grid.SHA256, s.Cases, s.Catalog.File, g.HashSHA256, hi-lo)
	}
}

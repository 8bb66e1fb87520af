package main

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"os/exec"
	"path/filepath"
	"reflect"
	"slices"
	"strings"
	"syscall"
	"testing"
	"time"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// killGridText is a 240-case grid: 2 classes × 3 eaves × 4 spans × 10
// lengths. Illustrative sizes only.
const killGridText = `name = "kill test grid (illustrative)"
[geometry]
span_m = [6.0, 7.5, 9.0, 10.5]
bays = { from = 3, to = 7, step = 1 }
bay_spacing_m = [3.0, 3.6]
eaves_height_m = [2.7, 3.3, 3.9]
roof_pitch_deg = [10]
[wind]
housing_classes = ["N2", "C1"]
`

const killGridCases = 240

// The rig's binary cuts the dataset into pieces of killPieceGroups row
// groups of killGroupRows rows, so the kills land in the middle of pieces
// and on their boundaries: 240 / 48 = 5 pieces, the last one full.
const (
	killGroupRows   = 24
	killPieceGroups = 2
	killPieces      = 5
)

// killCatalogue is the embedded catalogue's Z sections only. The test
// exercises the sweep's files, not the design: with no C or 2C section the
// frame step finds no candidate at once, so every case is a no_solution
// row carrying its purlin and girt designs, made in milliseconds rather
// than the seconds a full frame search takes.
func killCatalogue() []byte {
	var b strings.Builder
	for _, line := range strings.Split(string(catalog.DefaultCSV()), "\n") {
		fields := strings.Split(line, ",")
		if strings.HasPrefix(line, "#") || fields[0] == "designation" || (len(fields) > 1 && fields[1] == "Z") {
			b.WriteString(line + "\n")
		}
	}
	return []byte(b.String())
}

// killRig is a spansweep binary built for the test, a grid file and the
// rows of an uninterrupted run.
type killRig struct {
	t         *testing.T
	bin, grid string
	cat       string // catalogue file
	dir       string
	want      []dataset.Row
	took      time.Duration // wall time of the uninterrupted run
}

func newKillRig(t *testing.T) *killRig {
	t.Helper()
	dir := t.TempDir()
	r := &killRig{t: t, dir: dir, bin: filepath.Join(dir, "spansweep"), grid: filepath.Join(dir, "grid.toml"), cat: filepath.Join(dir, "z-only.csv")}
	layout := fmt.Sprintf("-X main.pieceLayout=%d/%d", killGroupRows, killPieceGroups)
	if out, err := exec.Command("go", "build", "-ldflags", layout, "-o", r.bin, ".").CombinedOutput(); err != nil {
		t.Fatalf("go build: %v\n%s", err, out)
	}
	if err := os.WriteFile(r.grid, []byte(killGridText), 0o644); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(r.cat, killCatalogue(), 0o644); err != nil {
		t.Fatal(err)
	}
	start := time.Now()
	r.mustRun("straight")
	r.took = time.Since(start)
	r.want = r.rows("straight")
	if len(r.want) != killGridCases {
		t.Fatalf("uninterrupted run: got %d rows, want %d", len(r.want), killGridCases)
	}
	return r
}

// command is "spansweep sweep" on the rig's grid into dir/out.
func (r *killRig) command(out string, extra ...string) *exec.Cmd {
	args := append([]string{"sweep", "--grid", r.grid, "--catalog", r.cat, "--out", filepath.Join(r.dir, out), "--workers", "2", "--quiet"}, extra...)
	return exec.Command(r.bin, args...)
}

func (r *killRig) mustRun(out string, extra ...string) {
	r.t.Helper()
	if b, err := r.command(out, extra...).CombinedOutput(); err != nil {
		r.t.Fatalf("sweep --out %s %v: %v\n%s", out, extra, err, b)
	}
}

func (r *killRig) datasetDir(out string) string { return filepath.Join(r.dir, out, "dataset") }

// rows reads out's dataset with the outputs/dataset reader.
func (r *killRig) rows(out string) []dataset.Row {
	r.t.Helper()
	d, err := dataset.Open(r.datasetDir(out))
	if err != nil {
		r.t.Fatal(err)
	}
	defer d.Close()
	var rows []dataset.Row
	if err := d.Each(func(row *dataset.Row) error { rows = append(rows, row.Clone()); return nil }); err != nil {
		r.t.Fatal(err)
	}
	return rows
}

// stop starts a sweep into out, waits until its dataset directory holds a
// file (the temporary part: the run has begun) and then for delay, and
// sends sig. It reports whether sig stopped the run (rather than the run
// finishing first).
func (r *killRig) stop(out string, delay time.Duration, sig os.Signal, extra ...string) bool {
	r.t.Helper()
	cmd := r.command(out, extra...)
	if err := cmd.Start(); err != nil {
		r.t.Fatal(err)
	}
	exited := make(chan error, 1)
	go func() { exited <- cmd.Wait() }()
	deadline := time.Now().Add(20 * time.Second)
	for time.Now().Before(deadline) {
		if entries, _ := os.ReadDir(r.datasetDir(out)); len(entries) > 0 {
			break
		}
		time.Sleep(2 * time.Millisecond)
	}
	time.Sleep(delay)
	_ = cmd.Process.Signal(sig) // fails harmlessly if the run has finished
	err := <-exited
	var ee *exec.ExitError
	if errors.As(err, &ee) {
		ws, ok := ee.Sys().(syscall.WaitStatus)
		if sig == syscall.SIGKILL {
			return ok && ws.Signaled() && ws.Signal() == syscall.SIGKILL
		}
		return ee.ExitCode() == exitFail // SIGINT: the run kept its finished cases and exited 1
	}
	if err != nil {
		r.t.Fatalf("sweep --out %s: %v", out, err)
	}
	return false
}

// checkKilledState checks what a killed run left: no dataset (only a
// hidden temporary part, which no reader picks up), or a complete part
// equal to the uninterrupted run's.
func (r *killRig) checkKilledState(out string) {
	r.t.Helper()
	d, err := dataset.Open(r.datasetDir(out))
	if errors.Is(err, dataset.ErrNoParts) || errors.Is(err, fs.ErrNotExist) {
		return
	}
	if err != nil {
		r.t.Fatalf("after SIGKILL the dataset cannot be read: %v", err)
	}
	d.Close()
	r.sameRows("dataset left by the killed run", r.rows(out))
}

// checkResumed checks that --resume completed out to the uninterrupted
// rows and left nothing of the interrupted runs behind.
func (r *killRig) checkResumed(out string) {
	r.t.Helper()
	r.sameRows("resumed after SIGKILL", r.rows(out))
	entries, err := os.ReadDir(r.datasetDir(out))
	if err != nil {
		r.t.Fatal(err)
	}
	var names []string
	for _, e := range entries {
		names = append(names, e.Name())
	}
	var want []string
	for p := 1; p <= killPieces; p++ {
		want = append(want, dataset.PieceName(dataShard(grids.Shard{K: 1, N: 1}), p))
	}
	if !slices.Equal(names, want) {
		r.t.Errorf("dataset directory after --resume holds %q, want only %q", names, want)
	}
}

// partialPieces reads the partial pieces in out's dataset directory: file
// name to content.
func (r *killRig) partialPieces(out string) map[string][]byte {
	r.t.Helper()
	entries, _ := os.ReadDir(r.datasetDir(out))
	kept := map[string][]byte{}
	for _, e := range entries {
		if f, ok := dataset.ParseFileName(e.Name()); ok && f.Partial {
			b, err := os.ReadFile(filepath.Join(r.datasetDir(out), e.Name()))
			if err != nil {
				r.t.Fatal(err)
			}
			kept[e.Name()] = b
		}
	}
	return kept
}

func (r *killRig) sameRows(what string, got []dataset.Row) {
	r.t.Helper()
	if len(got) != len(r.want) {
		r.t.Fatalf("%s: got %d rows, want %d", what, len(got), len(r.want))
	}
	for i := range got {
		if !reflect.DeepEqual(got[i], r.want[i]) {
			r.t.Fatalf("%s: row %d (case %s) differs from the uninterrupted run's (case %s)", what, i, got[i].CaseID, r.want[i].CaseID)
		}
	}
}

// killDelays are the waits after the run starts writing before the signal,
// as fractions of the uninterrupted run's wall time (which includes start-up).
var killDelays = []float64{0.1, 0.35, 0.6}

// A sweep killed with SIGKILL (no chance to clean up) leaves either no
// dataset or a complete one, and "sweep --resume" then gives the rows of an
// uninterrupted run (DESIGN.md §6: written as it streams, finalized
// atomically). Real child processes are killed mid-run.
func TestSweepSIGKILL(t *testing.T) {
	if testing.Short() {
		t.Skip("builds spansweep and runs it a dozen times")
	}
	r := newKillRig(t)
	t.Run("mid-run", func(t *testing.T) { r.t = t; r.killThenResume() })
	t.Run("during resume", func(t *testing.T) { r.t = t; r.killDuringResume() })
}

// killThenResume kills fresh runs at each delay, checks what they left and
// resumes them.
func (r *killRig) killThenResume() {
	midRun := 0
	for i, f := range killDelays {
		out := fmt.Sprintf("killed-%d", i)
		if r.stop(out, time.Duration(f*float64(r.took)), syscall.SIGKILL) {
			midRun++
		}
		r.checkKilledState(out)
		r.mustRun(out, "--resume")
		r.checkResumed(out)
	}
	if midRun == 0 {
		r.t.Errorf("every run finished before SIGKILL reached it (uninterrupted run %v); the test killed nothing mid-run", r.took)
	}
	r.t.Logf("%d of %d runs killed mid-run (uninterrupted run %v)", midRun, len(killDelays), r.took)
}

// killDuringResume interrupts a run with SIGINT so it keeps partial
// pieces, kills the resumed run with SIGKILL, and checks that no kept case
// was lost: every piece but the last kept is unchanged (under its partial
// name, or its final one if the resumed run got as far as renaming it), the
// last is there (the resumed run may have completed it), and a second
// --resume completes to the uninterrupted rows.
func (r *killRig) killDuringResume() {
	const out = "interrupted"
	var before map[string][]byte
	for _, f := range killDelays {
		if r.stop(out, time.Duration(f*float64(r.took)), os.Interrupt) {
			if before = r.partialPieces(out); len(before) > 0 {
				break
			}
		}
		os.RemoveAll(filepath.Join(r.dir, out)) // finished first or kept nothing: try another delay
	}
	if len(before) == 0 {
		r.t.Fatalf("no partial piece after SIGINT at any of the delays %v of %v", killDelays, r.took)
	}
	last := ""
	for name := range before {
		last = max(last, name)
	}
	if !r.stop(out, r.took/4, syscall.SIGKILL, "--resume") {
		r.t.Logf("the resumed run finished before SIGKILL (uninterrupted run %v)", r.took)
	} else {
		for name, b := range before {
			after, err := os.ReadFile(filepath.Join(r.datasetDir(out), name))
			if errors.Is(err, fs.ErrNotExist) {
				after, err = os.ReadFile(filepath.Join(r.datasetDir(out), strings.TrimPrefix(name, dataset.PartialPrefix)))
			}
			switch {
			case err != nil:
				r.t.Errorf("SIGKILL during --resume removed %s: %v", name, err)
			case name != last && !slices.Equal(after, b):
				r.t.Errorf("SIGKILL during --resume changed %s, a finished piece", name)
			}
		}
	}
	r.mustRun(out, "--resume")
	r.checkResumed(out)
}

package main

import (
	"bytes"
	"context"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"sync"
	"syscall"
	"testing"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// interruptAfter makes the next sweep receive a real SIGINT once rows rows
// are written, as Ctrl-C would; the hook waits until the sweep has seen it.
// Cases from rows+3 on wait for the signal before they are designed, so the
// workers (which may run up to the engine's window ahead of the rows
// written) cannot finish the grid first.
func interruptAfter(t *testing.T, rows int) {
	t.Helper()
	var once sync.Once
	signalled := make(chan struct{})
	design, chunk := designCase, sweepChunk
	sweepChunk = 1 // else the workers take every case of the small grid in two chunks
	designCase = func(c grids.Case, s *optimize.Settings) optimize.Result {
		if c.Index >= rows+3 {
			<-signalled
		}
		return design(c, s)
	}
	sweepCaseHook = func(ctx context.Context, n int) {
		if n < rows {
			return
		}
		once.Do(func() {
			defer close(signalled)
			if err := syscall.Kill(os.Getpid(), syscall.SIGINT); err != nil {
				t.Errorf("send SIGINT: %v", err)
				return
			}
			<-ctx.Done()
		})
	}
	t.Cleanup(func() { sweepCaseHook, designCase, sweepChunk = nil, design, chunk })
}

// An interrupted run keeps its finished cases, says how to resume and exits
// 1; the same command with --resume then gives the rows and tables of an
// uninterrupted run.
func TestSweepInterruptThenResume(t *testing.T) {
	f := newSweepFixture(t)
	f.mustSweep("straight", "--workers", "2")

	interruptAfter(t, 5)
	r := f.sweep("out", "--workers", "2")
	sweepCaseHook = nil
	if r.code != exitFail || !strings.Contains(r.errs, "--resume") || !strings.Contains(r.errs, "interrupted") {
		t.Fatalf("interrupted run: got exit %d, want 1 with a message naming --resume:\n%s", r.code, r.errs)
	}
	shard := grids.Shard{K: 1, N: 1}
	data := filepath.Join(f.dir, "out", "dataset")
	if _, err := os.Stat(filepath.Join(data, dataset.PartialName(dataShard(shard), 1))); err != nil {
		t.Fatalf("no partial part after the interrupt: %v", err)
	}
	for _, p := range []string{filepath.Join(data, dataset.PieceName(dataShard(shard), 1)), filepath.Join(f.dir, "out", "tables")} {
		if _, err := os.Stat(p); err == nil {
			t.Errorf("%s exists after an interrupt; want only the partial part", p)
		}
	}

	// Without --resume the interrupted run is kept, not overwritten.
	if r := f.sweep("out"); r.code != exitUsage || !strings.Contains(r.errs, "--resume") {
		t.Errorf("rerun without --resume: got exit %d, want 2 suggesting --resume:\n%s", r.code, r.errs)
	}

	r = f.mustSweep("out", "--resume", "--workers", "1")
	sameRows(t, "resumed against uninterrupted", f.rows("out"), f.rows("straight"))
	sameFiles(t, "resumed against uninterrupted", f.derivedFiles("out"), f.derivedFiles("straight"))
	s := f.summary("out/summary.json")
	// The hook fires at 5 rows; the engine then finishes the cases in flight.
	if s.ResumedCases < 5 || s.ResumedCases >= sweepGridCases || s.ResumedCases+s.DesignedCases != sweepGridCases {
		t.Errorf("resumed summary: got %d resumed + %d designed, want 5 to %d resumed, %d in all",
			s.ResumedCases, s.DesignedCases, sweepGridCases-1, sweepGridCases)
	}
	if _, err := os.Stat(filepath.Join(data, dataset.PartialName(dataShard(shard), 1))); err == nil {
		t.Errorf("the partial part is still there after the resumed run finished")
	}
}

// A finished run is never overwritten: without --resume the sweep refuses;
// with --resume it keeps the rows and rebuilds the tables; a dataset of
// another sharding or another grid is refused, and its files left as they
// were.
func TestSweepExistingOutput(t *testing.T) {
	f := newSweepFixture(t)
	f.mustSweep("out")
	part := filepath.Join(f.dir, "out", "dataset", dataset.PieceName(dataShard(grids.Shard{K: 1, N: 1}), 1))
	before, err := os.ReadFile(part)
	if err != nil {
		t.Fatal(err)
	}
	rows := f.rows("out")

	other := writeGrid(t, strings.Replace(sweepGridText, `"N2", "C1"`, `"N3"`, 1))
	tests := []struct {
		name  string
		args  []string
		wants []string
	}{
		{"again", nil, []string{"a finished run", "--resume", "nothing was overwritten"}},
		{"other sharding", []string{"--shard", "1/2"}, []string{"sharded 1 ways", "shard 1/2"}},
		{"other sharding resumed", []string{"--shard", "2/2", "--resume"}, []string{"sharded 1 ways"}},
		{"other grid resumed", []string{"--resume", "--grid", other}, []string{"grid_sha256"}},
		{"other grid tables", []string{"--tables-only", "--grid", other}, []string{"grid_sha256"}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			f.sweep("out", tt.args...).wantRefused(t, tt.wants)
			if after, _ := os.ReadFile(part); !bytes.Equal(after, before) {
				t.Errorf("the finished part changed")
			}
			if entries, _ := os.ReadDir(filepath.Dir(part)); len(entries) != 1 {
				t.Errorf("got %d files in the dataset directory, want the one part", len(entries))
			}
		})
	}
	if err := os.Remove(filepath.Join(f.dir, "out", "tables", "span-tables.csv")); err != nil {
		t.Fatal(err)
	}
	f.mustSweep("out", "--resume")
	sameRows(t, "--resume on a finished run", f.rows("out"), rows)
	if _, err := os.Stat(filepath.Join(f.dir, "out", "tables", "span-tables.csv")); err != nil {
		t.Errorf("--resume on a finished run did not rebuild the tables: %v", err)
	}
	// --tables-only redoes the tables of a finished run, here enveloped.
	before, _ = os.ReadFile(part)
	f.mustSweep("out", "--tables-only", "--envelope")
	if s := f.summary("out/summary.json"); !s.Envelope || s.Cases != sweepGridCases || s.DesignedCases != 0 {
		t.Errorf("--tables-only --envelope: got envelope %v, %d cases, %d designed; want true, %d, 0", s.Envelope, s.Cases, s.DesignedCases, sweepGridCases)
	}
	if after, _ := os.ReadFile(part); !bytes.Equal(after, before) {
		t.Errorf("--tables-only changed the dataset part")
	}
}

// With the dataset cut into pieces of 4 rows (2 row groups of 2), a run
// interrupted inside a piece and resumed across piece boundaries, and a
// sharded run whose shards hold 3 pieces each, give the rows and the
// tables of a one-piece run: the pieces read as one dataset, in case order.
func TestSweepResumeAcrossPieces(t *testing.T) {
	f := newSweepFixture(t)
	f.mustSweep("whole") // the default layout: 24 rows in one piece
	datasetOptions = []dataset.Option{dataset.GroupRows(2), dataset.PieceGroups(2)}
	t.Cleanup(func() { datasetOptions = nil })
	whole := f.rows("whole")

	interruptAfter(t, 6) // inside piece 2 (rows 4 … 7)
	r := f.sweep("out", "--workers", "2")
	sweepCaseHook = nil
	if r.code != exitFail || !strings.Contains(r.errs, "--resume") {
		t.Fatalf("interrupted run: got exit %d, want 1 naming --resume:\n%s", r.code, r.errs)
	}
	data := filepath.Join(f.dir, "out", "dataset")
	shard := dataShard(grids.Shard{K: 1, N: 1})
	first := filepath.Join(data, dataset.PartialName(shard, 1))
	if !strings.Contains(r.errs, first) || !strings.Contains(r.errs, "pieces") {
		t.Errorf("the interrupt message does not name the kept pieces from %s:\n%s", first, r.errs)
	}
	entries, _ := os.ReadDir(data)
	for _, e := range entries {
		if fn, ok := dataset.ParseFileName(e.Name()); ok && !fn.Partial {
			t.Errorf("%s is under a final name after the interrupt", e.Name())
		}
	}
	f.mustSweep("out", "--resume", "--workers", "1")
	sameRows(t, "resumed in pieces against one piece", f.rows("out"), whole)
	sameFiles(t, "resumed in pieces against one piece", f.derivedFiles("out"), f.derivedFiles("whole"))
	var got []string
	entries, _ = os.ReadDir(data)
	for _, e := range entries {
		got = append(got, e.Name())
	}
	var want []string
	for p := 1; p <= sweepGridCases/4; p++ {
		want = append(want, dataset.PieceName(shard, p))
	}
	if !slices.Equal(got, want) {
		t.Errorf("dataset after the resumed run: got %v, want %v", got, want)
	}

	for k := 1; k <= 2; k++ {
		f.mustSweep("sharded", "--shard", grids.Shard{K: k, N: 2}.String())
	}
	f.mustSweep("sharded", "--tables-only")
	sameRows(t, "2 shards of 3 pieces against one piece", f.rows("sharded"), whole)
	sameFiles(t, "2 shards of 3 pieces against one piece", f.derivedFiles("sharded"), f.derivedFiles("whole"))
}

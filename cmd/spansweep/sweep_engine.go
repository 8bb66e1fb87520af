package main

import (
	"context"
	"errors"
	"fmt"
	"io"
	"iter"
	"os"
	"path/filepath"
	"time"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// designCase designs one case; tests may wrap it (to design each case once
// however often a grid is swept).
var designCase = optimize.Design

// datasetOptions cut the dataset into row groups and pieces; empty (the
// package defaults) but in tests, which make them small to cross piece
// boundaries with few cases. A test binary of the command sets them at link
// time through pieceLayout.
var datasetOptions []dataset.Option

// pieceLayout, set only by a test's build (-ldflags "-X
// main.pieceLayout=ROWS/GROUPS"), is the rows per row group and row groups
// per piece of the dataset.
var pieceLayout string

func init() {
	var rows, groups int
	if _, err := fmt.Sscanf(pieceLayout, "%d/%d", &rows, &groups); err == nil {
		datasetOptions = []dataset.Option{dataset.GroupRows(rows), dataset.PieceGroups(groups)}
	}
}

// sweepCaseHook, when set (by tests only), is called after each dataset
// row is written with the run's context and the rows written so far.
var sweepCaseHook func(ctx context.Context, rows int)

// sweep designs the shard's cases into its dataset part, then writes the
// summary and, for a whole-grid run, the tables and plots.
func (s *sweepRun) sweep(ctx context.Context, stdout, stderr io.Writer) error {
	w, err := s.openPart(stderr)
	if err != nil {
		return err
	}
	var stats runStats
	ran := false
	err = s.withProfiles(func() error {
		ran = true
		var err error
		stats, err = s.design(ctx, w, stderr)
		return err
	})
	if !ran {
		w.Abort() // the CPU profile could not start: keep any resumed rows as a partial part
	}
	if err != nil {
		return err
	}
	return s.finish(stats, stdout, stderr)
}

// openPart starts the shard's dataset part, or with --resume continues the
// one an earlier run left. --resume with nothing to resume starts afresh, so
// a batch scheduler can give every attempt the same command.
func (s *sweepRun) openPart(stderr io.Writer) (*dataset.Writer, error) {
	dir := s.layout.datasetDir()
	if s.flags.resume {
		w, err := dataset.Resume(dir, s.meta(), datasetOptions...)
		var mm *dataset.MismatchError
		var ve *dataset.VersionError
		switch {
		case err == nil:
			return w, nil
		case errors.As(err, &mm), errors.As(err, &ve):
			return nil, usagef("--resume: %v", err)
		case !errors.Is(err, dataset.ErrNothingToResume):
			return nil, fmt.Errorf("resume: %w", err)
		}
		if !s.flags.quiet {
			fmt.Fprintf(stderr, "spansweep sweep: --resume: no earlier run of shard %s in %s; starting afresh\n", s.shard, dir)
		}
	}
	w, err := dataset.Create(dir, s.meta(), datasetOptions...)
	if err != nil {
		return nil, fmt.Errorf("dataset: %w", err)
	}
	return w, nil
}

// runStats is what the design loop measured.
type runStats struct {
	resumed  int // rows carried over from an earlier run
	designed int // cases designed by this run
	wall     time.Duration
	files    []string // the shard's dataset pieces
}

// sweepChunk is the run of consecutive cases each worker designs in turn,
// so that the cases sharing a memo entry (a frame's every bay count) are
// mostly solved by one worker, one after another (optimize.Engine.Chunk).
// A variable for the interrupt tests, which need cases left untaken.
var sweepChunk = 16

// design runs the engine over the shard's cases not yet in w and closes the
// part. On a signal it keeps the finished cases as a partial part and
// returns an error that says how to resume.
func (s *sweepRun) design(ctx context.Context, w *dataset.Writer, stderr io.Writer) (runStats, error) {
	lo, hi := s.shard.Range(s.grid.Count())
	total := hi - lo
	stats := runStats{resumed: w.Rows()}
	// One memo for the run: cases that pose a member group the same
	// problem (the same frame for every number of bays, say) reuse its
	// choice; the rows are the same as without it (optimize.Memo).
	settings := &optimize.Settings{Catalogue: s.cat, Memo: &optimize.Memo{}}
	eng := optimize.Engine{
		Workers: s.flags.workers,
		Chunk:   sweepChunk,
		Design:  func(c grids.Case) optimize.Result { return designCase(c, settings) },
	}
	var prog *progress
	if !s.flags.quiet && isTerminal(stderr) {
		prog = newProgress(stderr, total, w.Rows(), time.Now)
	}
	todo, err := remaining(s.grid, s.shard, w)
	if err != nil {
		w.Abort()
		return stats, err
	}
	start := time.Now()
	err = eng.Run(ctx, todo, func(r optimize.Result) error {
		if err := w.WriteResult(r); err != nil {
			return err
		}
		prog.update(w.Rows())
		if sweepCaseHook != nil {
			sweepCaseHook(ctx, w.Rows())
		}
		return nil
	})
	prog.finish()
	stats.wall = time.Since(start)
	stats.designed = w.Rows() - stats.resumed
	if err != nil && !(ctx.Err() != nil && w.Rows() == total) {
		return stats, s.stopped(ctx, w, total, err)
	}
	if err := w.Close(); err != nil {
		return stats, fmt.Errorf("dataset: %w", err)
	}
	stats.files = w.Files()
	return stats, nil
}

// stopped finalizes an interrupted or failed run's part as a partial one.
func (s *sweepRun) stopped(ctx context.Context, w *dataset.Writer, total int, cause error) error {
	rows := w.Rows()
	if err := w.Abort(); err != nil {
		return fmt.Errorf("%w; and keeping the %d finished cases failed: %v", cause, rows, err)
	}
	if ctx.Err() == nil || !errors.Is(cause, ctx.Err()) {
		return fmt.Errorf("stopped after %d of %d cases: %w", rows, total, cause)
	}
	if rows == 0 {
		return fmt.Errorf("interrupted before any case finished; nothing was kept")
	}
	return fmt.Errorf("interrupted: %d of %d cases of shard %s finished and are kept in %s; run the same command with --resume to continue",
		rows, total, s.shard, keptIn(w.Files()))
}

// keptIn names the files an interrupted run kept: the one, or the first and
// last of several.
func keptIn(files []string) string {
	switch len(files) {
	case 0:
		return "no file"
	case 1:
		return files[0]
	}
	return fmt.Sprintf("%d pieces, %s to %s", len(files), files[0], filepath.Base(files[len(files)-1]))
}

// keptRows is what a resumed dataset part holds, as *dataset.Writer tells it.
type keptRows interface {
	Rows() int
	FirstIndex() int
	LastIndex() int
	LastCaseID() string
}

// remaining yields the shard's cases after those the resumed part keeps. An
// interrupted run keeps an unbroken prefix of its shard, in case order, and
// the writer takes rows only in strictly ascending case_index, so the part
// is that prefix exactly when its first and last indices are the shard's
// first and its rows-th; the last case's id must also be the grid's. The
// check reads four numbers, not a record per case, so resuming a large
// shard costs no memory.
func remaining(g *grids.Grid, sh grids.Shard, kept keptRows) (iter.Seq[grids.Case], error) {
	lo, hi := sh.Range(g.Count())
	done := kept.Rows()
	if done > 0 {
		first, last := kept.FirstIndex(), kept.LastIndex()
		if first != lo || last != lo+done-1 || last >= hi {
			return nil, fmt.Errorf("resume: the dataset part holds %d cases with case_index %d to %d; shard %s has cases %d to %d, so the part is not a prefix of the shard",
				done, first, last, sh, lo, hi-1)
		}
		if want := g.Case(last).ID; kept.LastCaseID() != want {
			return nil, fmt.Errorf("resume: the dataset part's last case (index %d) is %s, but the grid's case %d is %s; the part is not a prefix of the shard",
				last, kept.LastCaseID(), last, want)
		}
	}
	return func(yield func(grids.Case) bool) {
		for i := lo + done; i < hi; i++ {
			if !yield(g.Case(i)) {
				return
			}
		}
	}, nil
}

// withProfiles runs fn under the CPU profile and writes the heap profile
// after it, as the flags ask.
func (s *sweepRun) withProfiles(fn func() error) error {
	stop, err := startCPUProfile(s.flags.cpuProfile)
	if err != nil {
		return err
	}
	runErr := fn()
	if err := stop(); err != nil && runErr == nil {
		runErr = err
	}
	if err := writeHeapProfile(s.flags.memProfile); err != nil && runErr == nil {
		runErr = err
	}
	return runErr
}

// isTerminal reports whether w is a terminal, where progress is drawn.
func isTerminal(w io.Writer) bool {
	f, ok := w.(*os.File)
	return ok && termIsTerminal(int(f.Fd()))
}

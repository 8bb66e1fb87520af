package optimize

import (
	"context"
	"iter"
	"runtime"

	"golang.org/x/sync/errgroup"

	"github.com/spansweep/spansweep/grids"
)

// Engine designs a stream of cases on a bounded pool of workers and hands
// the results on in case order (DESIGN.md §2, §8).
//
// Memory is bounded by the worker count, not the grid size: at most
// 32×Workers cases are in flight or waiting in the reorder buffer (a few
// kilobytes each). The window is that wide because case times differ by a
// factor of 30 (a memo hit against a full frame search): with a narrow one
// a slow case holds the other workers idle until it is emitted.
type Engine struct {
	// Workers is the number of cases designed at once; 0 means runtime.NumCPU().
	Workers int
	// Design designs one case. It must be safe for concurrent use.
	Design func(grids.Case) Result
	// Progress, if set, is called from the emitting goroutine after each
	// result is emitted, with the count emitted so far.
	Progress func(done int)
	// Chunk is the number of consecutive cases one worker designs in a
	// row; 0 means 1. Neighbouring cases of a grid often share sub-problems
	// (the frame of every bay count, through a Memo): one worker solving
	// them in turn replays what it found, where workers taking one case
	// each would search the same problem side by side. At most 32 cases
	// per worker.
	Chunk int
}

// windowPerWorker is the reorder window per worker (see Engine).
const windowPerWorker = 32

type job struct {
	seq   int // of cases[0]
	cases []grids.Case
}

type done struct {
	seq int
	r   Result
}

// Run designs every case of cases and calls emit with each result in the
// order the cases came. When ctx is cancelled Run stops taking cases,
// finishes those in flight, emits the unbroken run of results that follows
// the last one emitted, drops the rest and returns ctx.Err(). An error from
// emit stops the run and is returned.
func (e *Engine) Run(ctx context.Context, cases iter.Seq[grids.Case], emit func(Result) error) error {
	workers := e.Workers
	if workers <= 0 {
		workers = runtime.NumCPU()
	}
	window := windowPerWorker * workers
	slots := make(chan struct{}, window) // one token per case in flight or buffered
	jobs := make(chan job)
	results := make(chan done, window)

	var g errgroup.Group
	stop := make(chan struct{}) // closed when emitting fails
	chunk := min(max(e.Chunk, 1), windowPerWorker)
	g.Go(func() error {
		defer close(jobs)
		seq := 0
		var batch []grids.Case
		send := func() {
			if len(batch) > 0 {
				jobs <- job{seq - len(batch), batch}
				batch = nil
			}
		}
		defer send() // a batch already holding slots is designed, even when stopping
		for c := range cases {
			select {
			case slots <- struct{}{}:
			case <-ctx.Done():
				return nil
			case <-stop:
				return nil
			}
			batch = append(batch, c)
			seq++
			if len(batch) == chunk {
				send()
			}
		}
		return nil
	})
	for range workers {
		g.Go(func() error {
			for j := range jobs {
				for i, c := range j.cases {
					results <- done{j.seq + i, e.Design(c)}
				}
			}
			return nil
		})
	}
	go func() { _ = g.Wait(); close(results) }()

	pending := make(map[int]Result, window)
	next, emitted := 0, 0
	var emitErr error
	for d := range results {
		pending[d.seq] = d.r
		for emitErr == nil {
			r, ok := pending[next]
			if !ok {
				break
			}
			delete(pending, next)
			next++
			if emitErr = emit(r); emitErr != nil {
				close(stop)
				break
			}
			emitted++
			if e.Progress != nil {
				e.Progress(emitted)
			}
			<-slots
		}
		// After an emit error the loop keeps draining so workers finish.
	}
	if emitErr != nil {
		return emitErr
	}
	return ctx.Err()
}

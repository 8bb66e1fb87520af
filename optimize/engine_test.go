package optimize

import (
	"context"
	"errors"
	"iter"
	"testing"
	"time"

	"github.com/spansweep/spansweep/grids"
)

// numberedCases yields n cases whose Index is their position.
func numberedCases(n int) iter.Seq[grids.Case] {
	return func(yield func(grids.Case) bool) {
		for i := range n {
			if !yield(grids.Case{Index: i}) {
				return
			}
		}
	}
}

// jitterDesign takes longer for some cases so workers finish out of order.
func jitterDesign(c grids.Case) Result {
	if c.Index%7 == 3 {
		time.Sleep(200 * time.Microsecond)
	}
	return Result{Case: c, SteelMassKg: float64(c.Index) * 1.5}
}

func collect(t *testing.T, workers, n int) []Result {
	t.Helper()
	e := Engine{Workers: workers, Design: jitterDesign}
	var got []Result
	err := e.Run(context.Background(), numberedCases(n), func(r Result) error {
		got = append(got, r)
		return nil
	})
	if err != nil {
		t.Fatalf("workers %d: %v", workers, err)
	}
	return got
}

// The engine releases results in input order whatever the worker count,
// as gofmt releases parallel work in input order (STYLE.md, Tests).
func TestEngineOrderIndependentOfWorkers(t *testing.T) {
	const n = 500
	serial := collect(t, 1, n)
	parallel := collect(t, 4, n)
	if len(serial) != n || len(parallel) != n {
		t.Fatalf("got %d and %d results, want %d each", len(serial), len(parallel), n)
	}
	for i := range serial {
		if serial[i].Case.Index != i || parallel[i].Case.Index != i {
			t.Fatalf("result %d: got case %d (serial) and %d (parallel), want %d",
				i, serial[i].Case.Index, parallel[i].Case.Index, i)
		}
		if serial[i].SteelMassKg != parallel[i].SteelMassKg {
			t.Fatalf("result %d differs between 1 and 4 workers", i)
		}
	}
}

// Cancelling stops taking cases but emits every case already taken, as an
// unbroken prefix of the input.
func TestEngineCancelEmitsPrefix(t *testing.T) {
	for _, chunk := range []int{1, 8} {
		cancelEmitsPrefix(t, chunk)
	}
}

func cancelEmitsPrefix(t *testing.T, chunk int) {
	ctx, cancel := context.WithCancel(context.Background())
	defer cancel()
	e := Engine{Workers: 3, Design: jitterDesign, Chunk: chunk}
	var got []int
	err := e.Run(ctx, numberedCases(100000), func(r Result) error {
		got = append(got, r.Case.Index)
		if len(got) == 50 {
			cancel()
		}
		return nil
	})
	if !errors.Is(err, context.Canceled) {
		t.Fatalf("got error %v, want context.Canceled", err)
	}
	if w := windowPerWorker * 3; len(got) < 50 || len(got) > 50+w {
		t.Fatalf("got %d results after cancelling at 50, want 50 to %d", len(got), 50+w)
	}
	for i, idx := range got {
		if idx != i {
			t.Fatalf("result %d is case %d: not a prefix", i, idx)
		}
	}
}

// An error from emit stops the run and is returned.
func TestEngineEmitErrorStops(t *testing.T) {
	boom := errors.New("disk full")
	e := Engine{Workers: 2, Design: jitterDesign}
	count := 0
	err := e.Run(context.Background(), numberedCases(10000), func(Result) error {
		count++
		if count == 10 {
			return boom
		}
		return nil
	})
	if !errors.Is(err, boom) {
		t.Fatalf("got error %v, want %v", err, boom)
	}
	if count != 10 {
		t.Fatalf("emit called %d times, want 10", count)
	}
}

// Chunks of consecutive cases go to one worker each, and the results still
// come out in input order, every case once, for chunk sizes that divide the
// input and that do not, and one larger than the window allows.
func TestEngineChunksKeepOrder(t *testing.T) {
	const n = 333
	for _, chunk := range []int{2, 8, 7, 1000} {
		for _, workers := range []int{1, 3} {
			e := Engine{Workers: workers, Design: jitterDesign, Chunk: chunk}
			var got []int
			err := e.Run(context.Background(), numberedCases(n), func(r Result) error {
				got = append(got, r.Case.Index)
				return nil
			})
			if err != nil {
				t.Fatalf("chunk %d, %d workers: %v", chunk, workers, err)
			}
			if len(got) != n {
				t.Fatalf("chunk %d, %d workers: %d results, want %d", chunk, workers, len(got), n)
			}
			for i, idx := range got {
				if idx != i {
					t.Fatalf("chunk %d, %d workers: result %d is case %d", chunk, workers, i, idx)
				}
			}
		}
	}
}

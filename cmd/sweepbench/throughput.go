package main

import (
	"context"
	"os"
	"runtime/debug"
	"slices"
	"sort"
	"strings"
	"sync"
	"time"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// workerRun is one timed pass over a grid.
type workerRun struct {
	Workers   int     `json:"workers"`
	Cases     int     `json:"cases"`
	WallS     float64 `json:"wall_s"`
	CasesPerS float64 `json:"cases_per_s"`
}

// caseTimes summarises the time one case takes on one worker.
type caseTimes struct {
	MedianMS float64 `json:"median_ms"`
	P95MS    float64 `json:"p95_ms"`
	MaxMS    float64 `json:"max_ms"`
}

// designState records what Design returned over the grid, so a figure can
// be read against the state of the design code when it was measured.
type designState struct {
	OK         int `json:"ok"`
	NoSolution int `json:"no_solution"`
	// Memo counts the memo's look-ups (zero without --memo).
	Memo     optimize.MemoStats `json:"memo"`
	FailedAt map[string]int     `json:"failed_at"` // no-solution cases by the member group named first in the reason
}

// sweepGC sets the garbage collector as spansweep sweep does (its tuneGC:
// GOGC 200 and a 200 MB soft limit unless GOGC or GOMEMLIMIT is set), so the
// figures are the sweep's.
func sweepGC() {
	if os.Getenv("GOGC") == "" {
		debug.SetGCPercent(200)
	}
	if os.Getenv("GOMEMLIMIT") == "" {
		debug.SetMemoryLimit(200 << 20)
	}
}

// timeCases designs cases through the engine with the given worker count,
// as sweep does (with a fresh optimize.Memo when memo is set), and returns
// the wall time and each case's time.
func timeCases(cases []grids.Case, cat *catalog.Catalogue, workers int, memo bool) (workerRun, []time.Duration, designState) {
	settings := &optimize.Settings{Catalogue: cat}
	if memo {
		settings.Memo = &optimize.Memo{}
	}
	times := make([]time.Duration, len(cases))
	slot := make(map[int]int, len(cases)) // case index → position in cases
	for i, c := range cases {
		slot[c.Index] = i
	}
	state := designState{FailedAt: map[string]int{}}
	var mu sync.Mutex
	eng := optimize.Engine{
		Workers: workers,
		Chunk:   16, // as spansweep sweep
		Design: func(c grids.Case) optimize.Result {
			t0 := time.Now()
			r := optimize.Design(c, settings)
			times[slot[c.Index]] = time.Since(t0) // each worker writes its own cases' slots; slot is read-only
			return r
		},
	}
	start := time.Now()
	_ = eng.Run(context.Background(), slices.Values(cases), func(r optimize.Result) error {
		mu.Lock()
		defer mu.Unlock()
		state.add(r)
		return nil
	})
	wall := time.Since(start)
	if settings.Memo != nil {
		state.Memo = settings.Memo.Stats()
	}
	return workerRun{Workers: workers, Cases: len(times), WallS: wall.Seconds(),
		CasesPerS: float64(len(times)) / wall.Seconds()}, times, state
}

func (s *designState) add(r optimize.Result) {
	if r.Status == optimize.OK {
		s.OK++
		return
	}
	s.NoSolution++
	group, _, _ := strings.Cut(r.Reason, ":")
	s.FailedAt[group]++
}

// summarise returns the median, 95th percentile and maximum of times
// (nearest-rank percentiles).
func summarise(times []time.Duration) caseTimes {
	if len(times) == 0 {
		return caseTimes{}
	}
	s := slices.Clone(times)
	slices.Sort(s)
	ms := func(d time.Duration) float64 { return float64(d) / float64(time.Millisecond) }
	return caseTimes{MedianMS: ms(percentile(s, 50)), P95MS: ms(percentile(s, 95)), MaxMS: ms(s[len(s)-1])}
}

// percentile is the nearest-rank p-th percentile of sorted, non-empty s.
func percentile(s []time.Duration, p float64) time.Duration {
	rank := int(p/100*float64(len(s)) + 0.999999999)
	return s[min(max(rank, 1), len(s))-1]
}

// failedAtKeys lists the groups of FailedAt in name order.
func (s designState) failedAtKeys() []string {
	keys := make([]string, 0, len(s.FailedAt))
	for k := range s.FailedAt {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	return keys
}

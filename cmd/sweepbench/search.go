package main

import (
	"context"
	"fmt"
	"math"
	"slices"
	"time"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// searchComparison sets the search (sorted candidates, early exit, bounds)
// against exhaustive enumeration on the same sample of cases (DESIGN.md
// §5.2, §5.3).
type searchComparison struct {
	SampleCases int `json:"sample_cases"`
	// Analyses per case: frame analyses as Result.Analyses counts them.
	SearchAnalysesPerCase     float64 `json:"search_analyses_per_case"`
	ExhaustiveAnalysesPerCase float64 `json:"exhaustive_analyses_per_case"`
	// AnalysesRatio is search over exhaustive analyses (0 when exhaustive ran none).
	AnalysesRatio    float64 `json:"analyses_ratio"`
	SearchMSPerCase  float64 `json:"search_ms_per_case"`
	ExhaustiveMSCase float64 `json:"exhaustive_ms_per_case"`
	// IdenticalMasses: every case has the same status and total steel mass
	// (to 1e-9 relative) both ways.
	IdenticalMasses bool `json:"identical_masses"`
	// IdenticalSections: every member group has the same designation too
	// (two sections of equal mass may tie, so this may be false while the
	// masses agree).
	IdenticalSections bool     `json:"identical_sections"`
	Mismatches        []string `json:"mismatches,omitempty"`
}

// sampleCases returns n cases evenly spaced over g, the first and last included.
func sampleCases(g *grids.Grid, n int) []grids.Case {
	total := g.Count()
	n = min(n, total)
	cases := make([]grids.Case, 0, n)
	for i := range n {
		idx := 0
		if n > 1 {
			idx = i * (total - 1) / (n - 1)
		}
		cases = append(cases, g.Case(idx))
	}
	return cases
}

// compareSearch designs a sample of g both ways on the given workers.
func compareSearch(g *grids.Grid, cat *catalog.Catalogue, n, workers int) searchComparison {
	cases := sampleCases(g, n)
	fast, fastWall := designAll(cases, &optimize.Settings{Catalogue: cat}, workers)
	full, fullWall := designAll(cases, &optimize.Settings{Catalogue: cat, Exhaustive: true}, workers)
	c := searchComparison{SampleCases: len(cases), IdenticalMasses: true, IdenticalSections: true}
	if len(cases) == 0 {
		return c
	}
	var a, b int
	for i := range cases {
		a += fast[i].Analyses
		b += full[i].Analyses
		c.check(fast[i], full[i])
	}
	k := float64(len(cases))
	c.SearchAnalysesPerCase, c.ExhaustiveAnalysesPerCase = float64(a)/k, float64(b)/k
	if b > 0 {
		c.AnalysesRatio = float64(a) / float64(b)
	}
	c.SearchMSPerCase = fastWall.Seconds() * 1000 / k * float64(workers)
	c.ExhaustiveMSCase = fullWall.Seconds() * 1000 / k * float64(workers)
	return c
}

// check records how the search's result for a case differs from the
// exhaustive one.
func (c *searchComparison) check(fast, full optimize.Result) {
	id := fast.Case.ID
	if fast.Status != full.Status || !sameMass(fast.SteelMassKg, full.SteelMassKg) {
		c.IdenticalMasses, c.IdenticalSections = false, false
		c.Mismatches = append(c.Mismatches, fmt.Sprintf("%s: search %s %.4g kg, exhaustive %s %.4g kg",
			id, fast.Status, fast.SteelMassKg, full.Status, full.SteelMassKg))
		return
	}
	for _, role := range optimize.Roles {
		a, b := fast.Member(role).Designation, full.Member(role).Designation
		if a != b {
			c.IdenticalSections = false
			c.Mismatches = append(c.Mismatches, fmt.Sprintf("%s: %s search %q, exhaustive %q (same total mass)", id, role, a, b))
		}
	}
}

func sameMass(a, b float64) bool {
	return math.Abs(a-b) <= 1e-9*math.Max(math.Abs(a), math.Abs(b))
}

// designAll designs cases on the engine and returns the results in order
// and the wall time.
func designAll(cases []grids.Case, s *optimize.Settings, workers int) ([]optimize.Result, time.Duration) {
	eng := optimize.Engine{Workers: workers, Design: func(c grids.Case) optimize.Result { return optimize.Design(c, s) }}
	out := make([]optimize.Result, 0, len(cases))
	start := time.Now()
	_ = eng.Run(context.Background(), slices.Values(cases), func(r optimize.Result) error {
		out = append(out, r)
		return nil
	})
	return out, time.Since(start)
}

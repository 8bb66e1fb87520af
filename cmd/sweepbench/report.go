package main

import (
	"encoding/json"
	"fmt"
	"io"
)

// report is everything one sweepbench run measured.
type report struct {
	DateUTC   string `json:"date_utc"`
	GoVersion string `json:"go_version"`
	CPUs      int    `json:"cpus"`

	Grid       string            `json:"grid,omitempty"`
	Cases      int               `json:"cases,omitempty"` // cases timed
	GridCases  int               `json:"grid_cases,omitempty"`
	Memo       bool              `json:"memo"` // sub-searches with equal inputs reused, as sweep does
	Design     designState       `json:"design"`
	Throughput []workerRun       `json:"throughput,omitempty"`
	Speedup    float64           `json:"speedup,omitempty"` // cases/s of the last worker count over the first
	PerCase    caseTimes         `json:"per_case_one_worker"`
	Search     *searchComparison `json:"search,omitempty"`
	PeakRSSMB  float64           `json:"peak_rss_mb,omitempty"`
	Large      []largeRun        `json:"large,omitempty"`
	// LargeCatalogue names the catalogue of the --large runs.
	LargeCatalogue string `json:"large_catalogue,omitempty"`
	// LargePeakRatio is the peak memory of the last --large run over that
	// of the first (the grids come smallest first): 1 when the memory does
	// not grow with the grid.
	LargePeakRatio float64 `json:"large_peak_ratio,omitempty"`
	// LargeCasesRatio is the cases of the last --large grid over those of
	// the first.
	LargeCasesRatio float64 `json:"large_cases_ratio,omitempty"`
}

// largePeakRatio sets LargePeakRatio and LargeCasesRatio from the first and
// last --large runs.
func (r *report) largePeakRatio() {
	n := len(r.Large)
	if n < 2 || r.Large[0].PeakRSSMB <= 0 || r.Large[0].Cases == 0 {
		return
	}
	first, last := r.Large[0], r.Large[n-1]
	r.LargePeakRatio = last.PeakRSSMB / first.PeakRSSMB
	r.LargeCasesRatio = float64(last.Cases) / float64(first.Cases)
}

// speedup sets Speedup from the first and last throughput runs.
func (r *report) speedup() {
	if n := len(r.Throughput); n >= 2 && r.Throughput[0].CasesPerS > 0 {
		r.Speedup = r.Throughput[n-1].CasesPerS / r.Throughput[0].CasesPerS
	}
}

func (r *report) writeJSON(w io.Writer) error {
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(r)
}

// writeText prints one figure per line: name, value, unit.
func (r *report) writeText(w io.Writer) {
	line := func(name string, format string, args ...any) {
		fmt.Fprintf(w, "%-44s "+format+"\n", append([]any{name}, args...)...)
	}
	line("date", "%s", r.DateUTC)
	line("go, cpus", "%s, %d", r.GoVersion, r.CPUs)
	if r.Grid != "" {
		line("grid", "%s", r.Grid)
		line("cases timed", "%d of the grid's %d (evenly spaced)", r.Cases, r.GridCases)
		if r.Memo {
			line("memo", "on: sub-searches with inputs equal to an earlier case's replayed, as sweep runs")
			m := r.Design.Memo
			line("memo: frames replayed", "%d of %d", m.FrameHits, m.FrameHits+m.FrameMisses)
			line("memo: frame re-checks replayed", "%d of %d (the joint purlin choice's other purlins)", m.RecheckHits, m.RecheckHits+m.RecheckMisses)
			line("memo: pad designs replayed", "%d of %d", m.FootingHits, m.FootingHits+m.FootingMisses)
		} else {
			line("memo", "off: every search run in full")
		}
		line("design: ok cases", "%d", r.Design.OK)
		line("design: no_solution cases", "%d", r.Design.NoSolution)
		for _, k := range r.Design.failedAtKeys() {
			line("design: no_solution first failing at "+k, "%d", r.Design.FailedAt[k])
		}
	}
	for _, t := range r.Throughput {
		line(fmt.Sprintf("cases/s, %d workers", t.Workers), "%.1f cases/s (%d cases in %.2f s)", t.CasesPerS, t.Cases, t.WallS)
	}
	if len(r.Throughput) >= 2 {
		line(fmt.Sprintf("speedup, %d to %d workers", r.Throughput[0].Workers, r.Throughput[len(r.Throughput)-1].Workers), "%.2f", r.Speedup)
	}
	if len(r.Throughput) > 0 {
		line("time per case, median (1st worker count)", "%.3f ms", r.PerCase.MedianMS)
		line("time per case, 95th percentile", "%.3f ms", r.PerCase.P95MS)
		line("time per case, maximum", "%.3f ms", r.PerCase.MaxMS)
	}
	if s := r.Search; s != nil {
		s.writeText(line)
	}
	if r.PeakRSSMB > 0 {
		line("peak resident memory (VmHWM)", "%.1f MB", r.PeakRSSMB)
	}
	if r.LargeCatalogue != "" {
		line("large: catalogue", "%s", r.LargeCatalogue)
	}
	for _, l := range r.Large {
		line("large: grid", "%s", l.Grid)
		line("large: cases", "%d", l.Cases)
		line("large: wall time", "%.1f s (%d workers)", l.WallS, l.Workers)
		line("large: cases/s", "%.1f cases/s", l.CasesPerS)
		line("large: peak resident memory (ru_maxrss)", "%.1f MB", l.PeakRSSMB)
		line("large: dataset rows", "%d", l.Rows)
		line("large: dataset files", "%d", l.Files)
		line("large: dataset size", "%.1f MB", l.DatasetMB)
	}
	if r.LargePeakRatio > 0 {
		line("large: peak memory, last grid over first", "%.3f (at %.2f times the cases)", r.LargePeakRatio, r.LargeCasesRatio)
	}
	fmt.Fprintln(w, caution)
}

func (s *searchComparison) writeText(line func(string, string, ...any)) {
	line("search sample", "%d cases, evenly spaced", s.SampleCases)
	line("analyses per case, search", "%.2f", s.SearchAnalysesPerCase)
	line("analyses per case, exhaustive", "%.2f", s.ExhaustiveAnalysesPerCase)
	if s.ExhaustiveAnalysesPerCase > 0 {
		line("analyses, search over exhaustive", "%.4f", s.AnalysesRatio)
	} else {
		line("analyses, search over exhaustive", "n/a (exhaustive ran no frame analyses)")
	}
	line("time per case, search", "%.3f ms", s.SearchMSPerCase)
	line("time per case, exhaustive", "%.3f ms", s.ExhaustiveMSCase)
	line("search and exhaustive: identical masses", "%t", s.IdenticalMasses)
	line("search and exhaustive: identical sections", "%t", s.IdenticalSections)
	for _, m := range s.Mismatches {
		line("  mismatch", "%s", m)
	}
}

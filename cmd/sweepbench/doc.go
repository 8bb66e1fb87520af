// Command sweepbench measures how fast and how lean spansweep designs a
// range: cases per second on 1 and 2 workers and the speedup, the median and
// 95th-percentile time per case, the frame analyses the search runs against
// exhaustive enumeration on a sample of cases (and whether both reach the
// same masses), and the peak resident memory (DESIGN.md §5.3, §8).
//
// Usage:
//
//	go run ./cmd/sweepbench [--grid FILE] [--workers 1,2] [--limit N] [--sample N] [--json]
//	go run ./cmd/sweepbench --large [--pipeline-only] [--large-grids F1,F2] [--spansweep BIN]
//	go run ./cmd/sweepbench --compare DIR1 DIR2
//
// With no flags it measures the embedded default grid; --limit N times
// only N evenly spaced cases of it when a full pass would take too long.
// --large builds the spansweep command (or uses --spansweep BIN) and runs "spansweep sweep" on
// each grid of --large-grids (default testdata/examples/large-250k.toml and
// large-1m.toml, relative to the repository root) to show that the peak
// resident memory does not grow with the grid size. --pipeline-only gives
// those sweeps a catalogue of straps and rods only, so every case stops at
// the purlin step in microseconds: the run then measures the sweep's
// streaming, dataset writing and tables, not the design. --compare reads two
// dataset directories with outputs/dataset and exits 0 when they hold the
// same rows in the same order (1 when they differ), as the Slurm job-array
// check (.ci/job-array) needs.
//
// Output is plain text, one figure per line with its unit, or JSON with
// --json; keys and fields carry their units (_s, _ms, _mb, _per_s).
// Timings depend on what else the machine runs: quote them with the date
// and the state of the design code, as the report does.
package main

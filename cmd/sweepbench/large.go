package main

import (
	"bytes"
	"fmt"
	"io"
	"os"
	"os/exec"
	"path/filepath"
	"strconv"
	"strings"
	"syscall"
	"time"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// largeRun is one whole-grid run of "spansweep sweep" in its own process.
type largeRun struct {
	Grid      string  `json:"grid"`
	Cases     int     `json:"cases"`
	Workers   int     `json:"workers"`
	WallS     float64 `json:"wall_s"`
	CasesPerS float64 `json:"cases_per_s"`
	PeakRSSMB float64 `json:"peak_rss_mb"` // the child's ru_maxrss
	Rows      int64   `json:"rows"`        // rows in the dataset it wrote
	Files     int     `json:"files"`       // its part files (pieces)
	DatasetMB float64 `json:"dataset_mb"`  // size of its part files
}

// measureLarge runs every --large-grids file through the spansweep binary.
func measureLarge(o *options, rep *report, progress io.Writer) error {
	tmp, err := os.MkdirTemp("", "sweepbench-large-")
	if err != nil {
		return err
	}
	defer os.RemoveAll(tmp)
	bin := o.spansweep
	if bin == "" {
		if bin, err = buildSpansweep(tmp); err != nil {
			return err
		}
	}
	workers := maxOf(o.workers)
	cat := ""
	rep.LargeCatalogue = "embedded"
	if o.pipelineOnly {
		if cat, err = writeTensionOnlyCatalogue(tmp); err != nil {
			return err
		}
		rep.LargeCatalogue = "embedded straps and rods only (--pipeline-only: every case stops at the purlin step)"
	}
	for i, file := range o.largeGrids {
		g, err := grids.LoadFile(file)
		if err != nil {
			return usagef("--large-grids: %v", err)
		}
		fmt.Fprintf(progress, "sweepbench: sweeping %s (%d cases, %d workers) ...\n", file, g.Count(), workers)
		r, err := sweepChild(bin, file, cat, filepath.Join(tmp, "out"+strconv.Itoa(i)), workers)
		if err != nil {
			return err
		}
		r.Grid, r.Cases = file, g.Count()
		r.CasesPerS = float64(r.Cases) / r.WallS
		if r.Rows != int64(r.Cases) {
			return fmt.Errorf("%s: the dataset holds %d rows; the grid has %d cases", file, r.Rows, r.Cases)
		}
		fmt.Fprintf(progress, "sweepbench: %s: %.0f s, peak RSS %.1f MB\n", file, r.WallS, r.PeakRSSMB)
		rep.Large = append(rep.Large, r)
	}
	rep.largePeakRatio()
	return nil
}

// buildSpansweep builds the spansweep command into dir and returns its path.
func buildSpansweep(dir string) (string, error) {
	bin := filepath.Join(dir, "spansweep")
	cmd := exec.Command("go", "build", "-o", bin, "github.com/spansweep/spansweep/cmd/spansweep")
	if out, err := cmd.CombinedOutput(); err != nil {
		return "", fmt.Errorf("go build spansweep (run sweepbench inside the repository, or give --spansweep BIN): %v\n%s", err, out)
	}
	return bin, nil
}

// sweepChild runs one sweep into out, then reads back what it wrote and
// removes it.
func sweepChild(bin, grid, cat, out string, workers int) (largeRun, error) {
	var stderr bytes.Buffer
	args := []string{"sweep", "--grid", grid, "--out", out, "--workers", strconv.Itoa(workers), "--quiet"}
	if cat != "" {
		args = append(args, "--catalog", cat)
	}
	cmd := exec.Command(bin, args...)
	cmd.Stdout, cmd.Stderr = io.Discard, &stderr
	start := time.Now()
	err := cmd.Run()
	r := largeRun{Workers: workers, WallS: time.Since(start).Seconds()}
	if err != nil {
		return r, fmt.Errorf("spansweep sweep --grid %s: %v\n%s", grid, err, tail(stderr.String(), 4000))
	}
	if ru, ok := cmd.ProcessState.SysUsage().(*syscall.Rusage); ok {
		r.PeakRSSMB = maxRSSMB(ru)
	}
	defer os.RemoveAll(out)
	dir := filepath.Join(out, "dataset")
	d, err := dataset.Open(dir)
	if err != nil {
		return r, err
	}
	defer d.Close()
	r.Rows = d.NumRows()
	r.Files = len(d.Parts())
	for _, p := range d.Parts() {
		if st, err := os.Stat(p); err == nil {
			r.DatasetMB += float64(st.Size()) / 1e6
		}
	}
	return r, nil
}

// tail returns the last n bytes of s.
func tail(s string, n int) string {
	if len(s) <= n {
		return s
	}
	return "..." + s[len(s)-n:]
}

// writeTensionOnlyCatalogue writes the embedded catalogue's header, straps
// and rods into dir. No purlin family is in it, so Design stops at the
// purlin step at once and a sweep measures its own streaming and memory.
func writeTensionOnlyCatalogue(dir string) (string, error) {
	var b strings.Builder
	for i, line := range strings.Split(string(catalog.DefaultCSV()), "\n") {
		fields := strings.Split(line, ",")
		if i == 0 || strings.HasPrefix(line, "#") || fields[0] == "designation" ||
			(len(fields) > 1 && (fields[1] == "strap" || fields[1] == "rod")) {
			b.WriteString(line + "\n")
		}
	}
	path := filepath.Join(dir, "tension-only.csv")
	return path, os.WriteFile(path, []byte(b.String()), 0o644)
}

package main

import (
	"os"
	"path/filepath"
	"testing"
	"time"
)

// Nearest-rank percentiles: the p-th percentile of n sorted values is the
// value at rank ⌈p/100 · n⌉ (the nearest-rank definition, e.g. NIST/SEMATECH
// e-Handbook of Statistical Methods §7.2.6.2, from memory).
func TestSummarise(t *testing.T) {
	ms := func(xs ...int) []time.Duration {
		out := make([]time.Duration, len(xs))
		for i, x := range xs {
			out[i] = time.Duration(x) * time.Millisecond
		}
		return out
	}
	tests := []struct {
		name             string
		times            []time.Duration
		median, p95, max float64
	}{
		// 20 values 1…20 ms, shuffled: rank ⌈10⌉ = 10, ⌈19⌉ = 19.
		{"twenty", ms(20, 3, 1, 2, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19), 10, 19, 20},
		// 5 values: rank ⌈2.5⌉ = 3, ⌈4.75⌉ = 5.
		{"five", ms(50, 10, 40, 20, 30), 30, 50, 50},
		{"one", ms(7), 7, 7, 7},
	}
	for _, tt := range tests {
		got := summarise(tt.times)
		if got.MedianMS != tt.median || got.P95MS != tt.p95 || got.MaxMS != tt.max {
			t.Errorf("%s: got median %g, p95 %g, max %g ms; want %g, %g, %g", tt.name, got.MedianMS, got.P95MS, got.MaxMS, tt.median, tt.p95, tt.max)
		}
	}
}

// vmHWMKB reads the peak RSS line in the format of proc(5) /proc/pid/status.
func TestVmHWM(t *testing.T) {
	path := filepath.Join(t.TempDir(), "status")
	status := "Name:\tsweepbench\nVmPeak:\t  900000 kB\nVmHWM:\t   51234 kB\nVmRSS:\t   40000 kB\n"
	if err := os.WriteFile(path, []byte(status), 0o644); err != nil {
		t.Fatal(err)
	}
	if kb, ok := vmHWMKB(path); !ok || kb != 51234 {
		t.Errorf("got %d, %v; want 51234 kB", kb, ok)
	}
	if _, ok := vmHWMKB(filepath.Join(t.TempDir(), "missing")); ok {
		t.Errorf("a missing file read as ok")
	}
	if mb := peakRSSMB(); !(mb > 1) {
		t.Errorf("this process's peak RSS = %g MB, want more than 1 MB", mb)
	}
}

// The flatness line divides the last --large run's peak by the first's:
// 180 MB at 1,049,600 cases over 90 MB at 262,400 is 2 (memory grew with
// the grid) at 4 times the cases (arithmetic by hand); one run gives no
// ratio.
func TestLargePeakRatio(t *testing.T) {
	r := report{Large: []largeRun{{Cases: 262_400, PeakRSSMB: 90}, {Cases: 1_049_600, PeakRSSMB: 180}}}
	r.largePeakRatio()
	if r.LargePeakRatio != 2 || r.LargeCasesRatio != 4 {
		t.Errorf("got peak ratio %g at cases ratio %g, want 2 at 4", r.LargePeakRatio, r.LargeCasesRatio)
	}
	one := report{Large: []largeRun{{Cases: 262_400, PeakRSSMB: 90}}}
	one.largePeakRatio()
	if one.LargePeakRatio != 0 {
		t.Errorf("one run: got peak ratio %g, want none (0)", one.LargePeakRatio)
	}
}

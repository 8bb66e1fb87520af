package main

import (
	"bufio"
	"os"
	"strconv"
	"strings"
	"syscall"
)

// peakRSSMB returns this process's peak resident set size in MB (10⁶
// bytes): VmHWM from /proc/self/status, or getrusage's ru_maxrss where
// /proc is missing. 0 if neither is available.
func peakRSSMB() float64 {
	if kb, ok := vmHWMKB("/proc/self/status"); ok {
		return float64(kb) * 1024 / 1e6
	}
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err == nil {
		return maxRSSMB(&ru)
	}
	return 0
}

// maxRSSMB converts ru_maxrss (kB on Linux) to MB.
func maxRSSMB(ru *syscall.Rusage) float64 { return float64(ru.Maxrss) * 1024 / 1e6 }

// vmHWMKB reads the "VmHWM:   1234 kB" line of a /proc status file.
func vmHWMKB(path string) (int64, bool) {
	f, err := os.Open(path)
	if err != nil {
		return 0, false
	}
	defer f.Close()
	sc := bufio.NewScanner(f)
	for sc.Scan() {
		rest, ok := strings.CutPrefix(sc.Text(), "VmHWM:")
		if !ok {
			continue
		}
		kb, err := strconv.ParseInt(strings.TrimSuffix(strings.TrimSpace(rest), " kB"), 10, 64)
		return kb, err == nil
	}
	return 0, false
}

package main

import (
	"bytes"
	"strings"
	"testing"
	"time"
)

// fakeClock advances by step on every reading.
func fakeClock(step time.Duration) func() time.Time {
	t := time.Date(2026, 1, 1, 0, 0, 0, 0, time.UTC)
	return func() time.Time { t = t.Add(step); return t }
}

func TestProgressLine(t *testing.T) {
	// Hand arithmetic: 50 designed in 10 s is 5 cases/s; 50 left take 10 s.
	tests := []struct {
		name                  string
		done, total, designed int
		elapsed               time.Duration
		want                  string
	}{
		{"half", 50, 100, 50, 10 * time.Second, "50/100 cases   50%  5.0 cases/s  10s left"},
		// Resumed: 60 of 100 were done before; 20 designed in 4 s is 5 cases/s, 20 left take 4 s.
		{"resumed", 80, 100, 20, 4 * time.Second, "80/100 cases   80%  5.0 cases/s  4s left"},
		{"nothing yet", 0, 100, 0, 0, "0/100 cases    0%"},
		{"last", 99, 100, 99, 99 * time.Second, "99/100 cases   99%  1.0 cases/s  1s left"},
		{"long", 10, 1000, 10, 10 * time.Second, "10/1000 cases    1%  1.0 cases/s  16m30s left"},
	}
	for _, tt := range tests {
		if got := progressLine(tt.done, tt.total, tt.designed, tt.elapsed); got != tt.want {
			t.Errorf("%s: got %q, want %q", tt.name, got, tt.want)
		}
	}
}

// At most one redraw per progressInterval, and always the last one; each
// redraw starts with a carriage return and finish blanks the line.
func TestProgressThrottles(t *testing.T) {
	var b bytes.Buffer
	const n = 100
	p := newProgress(&b, n, 0, fakeClock(10*time.Millisecond)) // 100 updates over 1 s
	for i := 1; i <= n; i++ {
		p.update(i)
	}
	draws := strings.Count(b.String(), "\r")
	// 1 s of updates at one redraw per 200 ms: 1 first + at most 5 more + the last.
	if draws < 2 || draws > 7 {
		t.Errorf("got %d redraws for 100 updates over 1 s, want 2 to 7", draws)
	}
	last := b.String()[strings.LastIndex(b.String(), "\r")+1:]
	if !strings.HasPrefix(last, "100/100 cases  100%") {
		t.Errorf("last redraw %q does not show 100/100", last)
	}
	p.finish()
	if tail := b.String()[strings.LastIndex(b.String()[:b.Len()-1], "\r"):]; strings.TrimSpace(tail) != "" {
		t.Errorf("finish left %q, want a blanked line", tail)
	}
	var nilp *progress
	nilp.update(1) // a nil progress draws nothing and does not panic
	nilp.finish()
}

package main

import (
	"fmt"
	"io"
	"time"

	"golang.org/x/term"
)

// termIsTerminal reports whether the file descriptor is a terminal.
var termIsTerminal = term.IsTerminal

// progressInterval is the least time between two redraws of the progress
// line: at most five a second, so drawing never slows the sweep.
const progressInterval = 200 * time.Millisecond

// progress draws one status line on a terminal, rewritten in place with a
// carriage return: cases done of the total, the rate and the time left. A
// nil *progress draws nothing, so callers need not check.
type progress struct {
	w           io.Writer
	total       int // cases of the run, resumed ones included
	first       int // cases already done when the run began (resumed)
	now         func() time.Time
	began, last time.Time
	width       int // length of the last line drawn, to blank it out
}

// newProgress returns a progress line for total cases of which done are
// already finished; now is the clock (time.Now outside tests).
func newProgress(w io.Writer, total, done int, now func() time.Time) *progress {
	t := now()
	return &progress{w: w, total: total, first: done, now: now, began: t}
}

// update redraws the line for done cases if the last redraw is old enough
// or the run is complete.
func (p *progress) update(done int) {
	if p == nil {
		return
	}
	t := p.now()
	if done < p.total && !p.last.IsZero() && t.Sub(p.last) < progressInterval {
		return
	}
	p.last = t
	line := progressLine(done, p.total, done-p.first, t.Sub(p.began))
	pad := max(p.width-len(line), 0)
	fmt.Fprintf(p.w, "\r%s%*s", line, pad, "")
	p.width = len(line)
}

// finish blanks the line so the summary that follows starts clean.
func (p *progress) finish() {
	if p == nil || p.width == 0 {
		return
	}
	fmt.Fprintf(p.w, "\r%*s\r", p.width, "")
	p.width = 0
}

// progressLine is e.g. "  812/1680 cases  48%  136.2 cases/s  6s left":
// the rate and time left count only the cases designed by this run.
func progressLine(done, total, designed int, elapsed time.Duration) string {
	pct := 100.0
	if total > 0 {
		pct = 100 * float64(done) / float64(total)
	}
	line := fmt.Sprintf("%d/%d cases  %3.0f%%", done, total, pct)
	if designed <= 0 || elapsed <= 0 {
		return line
	}
	rate := float64(designed) / elapsed.Seconds()
	left := time.Duration(float64(total-done) / rate * float64(time.Second))
	return fmt.Sprintf("%s  %.1f cases/s  %s left", line, rate, roundLeft(left))
}

// roundLeft rounds a time left to whole seconds ("<1s" below one).
func roundLeft(d time.Duration) string {
	if d < time.Second {
		return "<1s"
	}
	return d.Round(time.Second).String()
}

package report

import (
	"fmt"

	"github.com/spansweep/spansweep/optimize"
)

// frameAnalysis gives the buckling factor and the internal force diagrams.
func (r Report) frameAnalysis(s *section) {
	c := r.calc()
	if c == nil {
		s.para(notRecorded)
		return
	}
	f := c.Frame
	if f == nil {
		s.para("The frame was not analysed" + stoppedBecause(r.Result) + ".")
		return
	}
	s.add(newTable("Result", "Value").
		row("Lowest elastic buckling load factor λ_c over the ULS combinations", num(f.BucklingFactor, 3)).
		row("Combination giving λ_c", orDash(f.BucklingCombination)))
	s.para("In-plane effective lengths of the rafter and column follow from λ_c, the frame's elastic buckling load. Diagrams: stations in m from the start of each part; axial force tension positive; moment positive with tension on the inside face.")
	for _, d := range f.Diagrams {
		s.add(&figure{caption: fmt.Sprintf("%s under %s", d.Part, d.Combination), diagram: d})
	}
}

// stoppedBecause explains a missing step from the result's reason.
func stoppedBecause(res *optimize.Result) string {
	if res.Reason == "" {
		return ""
	}
	return ": the search stopped at " + res.Reason
}

// deflections compares every SLS deflection with its limit: the frame's
// and the serviceability checks of the member groups.
func (r Report) deflections(s *section) {
	c := r.calc()
	if c == nil {
		s.para(notRecorded)
		return
	}
	var lines []optimize.CheckLine
	if c.Frame != nil {
		lines = append(lines, c.Frame.Deflections...)
	}
	for _, g := range c.Groups {
		for _, l := range g.Checks {
			if l.LimitState == "SLS" {
				lines = append(lines, l)
			}
		}
	}
	if len(lines) == 0 {
		s.para("No deflection was checked" + stoppedBecause(r.Result) + ".")
		return
	}
	t := newTable("Member", "Check", "Standard", "Clause", "Combination", "Deflection", "Limit", "Unit", "Ratio")
	for _, l := range lines {
		t.row(orDash(l.Member), l.Name, orDash(l.Standard), orDash(l.Clause), orDash(l.Combination), num(l.Demand, 2), num(l.Capacity, 2), orDash(l.Unit), util(l.Utilisation))
	}
	s.add(t)
	s.para("Limits are those of the options (section 2); a ratio of 1.000 or less passes.")
}

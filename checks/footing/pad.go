package footing

import (
	"cmp"
	"fmt"
	"slices"
	"sort"
)

// Pad is a sized square pad footing for one column base.
type Pad struct {
	Base             string  `json:"base"`
	Status           Status  `json:"status"`
	WidthM           float64 `json:"width_m"`
	DepthM           float64 `json:"depth_m"`
	ConcreteVolumeM3 float64 `json:"concrete_volume_m3"`
	// Governing is the check with the highest utilisation.
	Governing Check `json:"governing"`
	// Checks holds, per kind of check, the worst combination's result.
	Checks []Check `json:"checks"`
	// Notes are the assumptions an engineer must confirm.
	Notes []string `json:"notes"`
}

// Notes common to every pad result.
var padNotes = []string{
	"allowable bearing pressure must be confirmed by a site investigation and site classification (AS 2870, AS 1726)",
	"pad reinforcement, punching and concrete strength are not checked",
	"design aid only; verify for the site with a qualified structural engineer; local codes and licensed practice govern",
}

// SizePad returns the lightest (smallest concrete volume) square pad over
// the options' width and depth grid that passes every check for base b.
// A nil opt means DefaultOptions. Bad input gives an error wrapping
// ErrInvalid; when no pad passes, the returned Pad (Status NoSolution)
// holds the largest pad's checks and the error is a *NoSolutionError.
func SizePad(b Base, opt *Options) (Pad, error) {
	o, err := opt.resolved()
	if err != nil {
		return Pad{}, err
	}
	if err := b.Validate(); err != nil {
		return Pad{}, err
	}
	if p, ok := smallestPassing(b, o); ok {
		return newPad(b.Name, OK, p, p.checks(b)), nil
	}
	largest := pad{b: o.maxWidth(), d: o.maxDepth(), o: &o}
	res := newPad(b.Name, NoSolution, largest, largest.checks(b))
	return res, &NoSolutionError{Base: b.Name, What: "pad",
		Largest: fmt.Sprintf("%.2f m wide x %.2f m deep", largest.b, largest.d), Governing: res.Governing}
}

func newPad(name string, s Status, p pad, cs []Check) Pad {
	return Pad{Base: name, Status: s, WidthM: p.b, DepthM: p.d, ConcreteVolumeM3: p.volume(),
		Governing: governing(cs), Checks: cs, Notes: padNotes}
}

// smallestPassing returns the least-volume pad of the grid that passes
// (ties: shallower, then narrower), the same pad a scan of candidates in
// that order finds. Every check improves with width at a given depth (more
// weight, more area, less eccentricity), so each depth's narrowest passing
// width is found by bisection over the width steps.
func smallestPassing(b Base, o Options) (pad, bool) {
	widths := steps(o.MinWidthM, o.MaxWidthM, o.WidthStepM)
	var best pad
	found := false
	for _, d := range steps(o.MinDepthM, o.MaxDepthM, o.DepthStepM) {
		// Depths come shallowest first, so at this depth only a pad of
		// less volume than the best so far can replace it: search those
		// widths alone.
		n := len(widths)
		if found {
			n = sort.Search(n, func(i int) bool { return !(pad{b: widths[i], d: d, o: &o}.volume() < best.volume()) })
		}
		i := sort.Search(n, func(i int) bool { return pad{b: widths[i], d: d, o: &o}.passes(b) })
		if i == n {
			continue
		}
		p := pad{b: widths[i], d: d, o: &o}
		if !found || p.volume() < best.volume() {
			best, found = p, true
		}
	}
	return best, found
}

// candidates lists every width × depth pad of the grid, lightest first
// (ties: shallower, then narrower).
func candidates(o Options) []pad {
	var ps []pad
	for _, b := range steps(o.MinWidthM, o.MaxWidthM, o.WidthStepM) {
		for _, d := range steps(o.MinDepthM, o.MaxDepthM, o.DepthStepM) {
			ps = append(ps, pad{b: b, d: d, o: &o})
		}
	}
	slices.SortFunc(ps, func(p, q pad) int {
		return cmp.Or(cmp.Compare(p.volume(), q.volume()), cmp.Compare(p.d, q.d), cmp.Compare(p.b, q.b))
	})
	return ps
}

// maxWidth is the largest width of the grid (MaxWidthM rounded down to
// a whole number of steps from MinWidthM).
func (o Options) maxWidth() float64 {
	w := steps(o.MinWidthM, o.MaxWidthM, o.WidthStepM)
	return w[len(w)-1]
}

// maxDepth is the largest depth of the grid.
func (o Options) maxDepth() float64 {
	d := steps(o.MinDepthM, o.MaxDepthM, o.DepthStepM)
	return d[len(d)-1]
}

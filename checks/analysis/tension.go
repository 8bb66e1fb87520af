package analysis

import (
	"errors"
	"fmt"
	"math"
)

// SolveTensionOnly solves one load case with the tension-only members (Member.TensionOnly)
// acting only while in tension: starting with all members, it removes those in compression and
// restores slack ones that would stretch, until the set no longer changes (the usual
// active-set iteration for strap and rod bracing). Solution.Active reports which members act.
// Results of different tension-only solves must not be superposed: combine the loads into one
// case instead.
func (w *Workspace) SolveTensionOnly(f *Frame, c LoadCase) (*Solution, error) {
	w.one[0] = c
	cases := w.one[:]
	if err := validate(f, cases); err != nil {
		return nil, err
	}
	w.setup(f, 1)
	for i := range w.active {
		w.active[i] = true
	}
	for iter := 0; iter < 2*len(f.Members)+4; iter++ {
		s, err := w.solve(cases)
		if err != nil {
			var se *SingularError
			if errors.As(err, &se) {
				return nil, fmt.Errorf("analysis: case %q with slack tension-only members: %w", c.Name, err)
			}
			return nil, err
		}
		if !w.updateActive() {
			return s, nil
		}
	}
	return nil, fmt.Errorf("case %q: %w", c.Name, ErrTensionOnlyNoConvergence)
}

// updateActive switches tension-only members in or out; it reports whether any changed.
func (w *Workspace) updateActive() bool {
	f := w.frame
	scale := 0.0
	for m := range f.Members {
		scale = math.Max(scale, math.Abs(w.endF[m][0]))
	}
	tol := 1e-9 * scale
	changed := false
	for m := range f.Members {
		if !f.Members[m].TensionOnly {
			continue
		}
		if w.active[m] {
			if n := -w.endF[m][0]; n < -tol { // N = −N1, tension positive
				w.active[m] = false
				changed = true
			}
			continue
		}
		if w.elongation(m) > tol*w.geo[m].L/(f.Members[m].E*f.Members[m].A) {
			w.active[m] = true
			changed = true
		}
	}
	return changed
}

// elongation returns the change of length of member m from its end displacements (case 0).
func (w *Workspace) elongation(m int) float64 {
	mem := &w.frame.Members[m]
	g := &w.geo[m]
	d := w.disp
	return g.c*(d[3*mem.End]-d[3*mem.Start]) + g.s*(d[3*mem.End+1]-d[3*mem.Start+1])
}

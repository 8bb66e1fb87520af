package optimize

import (
	"fmt"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/coldformed"
	"github.com/spansweep/spansweep/grids"
)

// Settings control Design. A nil *Settings means the defaults.
type Settings struct {
	// Catalogue supplies the candidate sections; nil means catalog.Default().
	Catalogue *catalog.Catalogue
	// Exhaustive evaluates every candidate instead of stopping at the first
	// pass and skipping by bounds; for tests of the search's exactness.
	// Default false.
	Exhaustive bool
	// Record keeps the full calculation (Result.Calculation) for a report.
	// Default false: the sweep keeps only the summary.
	Record bool
	// Memo, if set, replays sub-searches already solved for an earlier
	// case with exactly the same inputs (see Memo); one Memo serves one
	// catalogue. It is not used with Exhaustive or Record. Default nil.
	Memo *Memo

	// recheckMemo is the memo a trial of the joint purlin choice, which
	// runs without Memo, keeps its frame re-checks in (trialSettings).
	recheckMemo *Memo
}

// rechecks returns the Memo for frame re-checks, or nil.
func (s *Settings) rechecks() *Memo {
	if s != nil && s.recheckMemo != nil {
		return s.recheckMemo
	}
	return s.memo()
}

// memo returns the Memo to use, or nil.
func (s *Settings) memo() *Memo {
	if s == nil || s.Exhaustive || s.Record {
		return nil
	}
	return s.Memo
}

func (s *Settings) catalogue() *catalog.Catalogue {
	if s == nil || s.Catalogue == nil {
		return catalog.Default()
	}
	return s.Catalogue
}

// Design returns the lightest passing member set for one case. It never
// panics on a bad case: the problem is reported as NoSolution with a reason.
func Design(c grids.Case, s *Settings) (r Result) {
	r = Result{Case: c, Members: make([]MemberGroup, len(Roles))}
	for i, role := range Roles {
		r.Members[i].Role = role
	}
	defer func() {
		if p := recover(); p != nil {
			r.Status, r.Reason = NoSolution, fmt.Sprintf("internal error designing case %s: %v", c.ID, p)
		}
	}()
	act, err := deriveActions(c)
	if err != nil {
		r.Status, r.Reason = NoSolution, fmt.Sprintf("actions: %v", err)
		return r
	}
	r.VUltimateMS, r.VServiceMS = act.Wind.Speeds.VDesULSMS, act.Wind.Speeds.VDesSLSMS
	r.QUltimateKPa, r.QServiceKPa = act.Wind.Speeds.QULSKPa, act.Wind.Speeds.QSLSKPa
	d := designer{c: c, s: s, cat: s.catalogue(), act: act, r: &r}
	if s != nil && s.Record {
		r.Calculation = &Calculation{Wind: act.Wind, Dead: act.Dead, RoofLiveKPa: act.RoofLiveKPa,
			Hoist: act.Hoist, Combinations: act.Combinations}
	}
	d.run()
	return r
}

// designer carries one case through the member searches in order: each
// step reads what the earlier ones chose (girts and purlins load the frame,
// the frame's reactions load the footings).
type designer struct {
	c   grids.Case
	s   *Settings
	cat *catalog.Catalogue
	act *caseActions
	r   *Result

	// What earlier steps chose, for the later ones.
	purlin, girt lineChoice
	frm          frameChoice
	// checkBuf is the reused check list of member checks whose results are
	// read at once and not kept (CheckPurlinInto, CheckBeamColumnInto).
	checkBuf []coldformed.Check
	// The bracing bays' solves and the layout they are for (solveBracing).
	braceSolves []bracingSolve
	braceLayout bracingLayout

	// The purlin search, whose other arrangements the joint choice of the
	// purlins and the braced bays' struts visits (joint.go); the strut
	// upgrade the bracing step chose; the further solves the diagonals and
	// struts are checked under (nil for none) and the objective an upgrade
	// must stay below (0 for no limit), both set by frameAndBracing.
	purlinLines lineDesign
	strut       strutChoice
	alsoSolves  []bracingSolve
	strutBudget float64
}

// fail records the first failing member group and stops the design.
func (d *designer) fail(role Role, reason string) {
	if d.r.Status == OK {
		d.r.Status = NoSolution
		d.r.Reason = fmt.Sprintf("%s: %s", role, reason)
	}
}

// record keeps a group's working when the calculation is being recorded.
func (d *designer) record(g GroupCalculation) {
	if d.r.Calculation != nil {
		d.r.Calculation.Groups = append(d.r.Calculation.Groups, g)
	}
}

// set stores a chosen member group in the result.
func (d *designer) set(g MemberGroup) {
	for i := range d.r.Members {
		if d.r.Members[i].Role == g.Role {
			d.r.Members[i] = g
		}
	}
}

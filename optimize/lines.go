package optimize

import (
	"fmt"
	"math"
	"slices"
	"strings"
	"sync"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/coldformed"
	"github.com/spansweep/spansweep/checks/wind"
	"github.com/spansweep/spansweep/grids"
)

// Purlins and girts are independent sub-problems (DESIGN.md §5.3): for
// every arrangement (spacing, span type, bridging rows) the candidates are
// scanned lightest first and the first that passes is that arrangement's
// answer; an arrangement is abandoned as soon as its next candidate cannot
// beat the best found. The lightest arrangement wins.

// Assumptions of the line design, each stated in the report.
const (
	// steelE is the elastic modulus for deflections, AS/NZS 4600:2018
	// cl. 1.5.2 (from memory: 200 000 MPa).
	steelE = 200000.0
	// bridgingKgPerM is the mass of a bridging piece between adjacent lines
	// (a light channel); common practice, no source.
	bridgingKgPerM = 1.5
	// maxBridgingRows is the most bridging rows per span the search tries.
	maxBridgingRows = 2
	// spacingFloorFraction: spacings are tried from the cladding's maximum
	// down to this fraction of it, in the grid's steps.
	spacingFloorFraction = 0.5
)

// lineProblem is a purlin or girt design problem.
type lineProblem struct {
	role      Role
	families  []string
	sideM     float64 // rafter slope length (purlins) or eaves height (girts)
	sides     int     // roof slopes or side walls
	positions func(gaps int) []float64
	// gapsFor returns the gaps between lines on one side for a spacing
	// (purlin lines = gaps + 1 from eave to ridge; girt lines = gaps − 1
	// between the slab and the eave strut).
	gapsFor         func(spacingM float64) int
	linesFor        func(gaps int) int
	deadKPa         float64 // cladding on the lines
	gravityNormal   float64 // fraction of gravity normal to the cladding: cos α for a roof, 0 for a wall
	live            bool    // roof live load applies
	pressures       wind.MemberPressures
	localAreaM2     float64 // a²: K_l applies when a line's tributary area is within it
	maxSpacingM     float64
	stepM           float64
	deflectionRatio float64
}

// arrangement is one way of laying out the lines.
type arrangement struct {
	gaps      int
	spacingM  float64
	spanType  string
	bridging  int
	linesSide int
}

// lineCandidate is one section in one arrangement, with its objective.
type lineCandidate struct {
	arr       arrangement
	sec       catalog.Section
	massKg    float64
	objective float64
}

// lineVerdict is a candidate's checks: the governing one and whether all pass.
type lineVerdict struct {
	governing  Governing
	deflection float64 // governing SLS deflection over its limit
	checks     []CheckLine
}

func (v lineVerdict) passes() bool { return v.governing.Utilisation <= 1 }

// purlins designs the roof purlins.
func (d *designer) purlins() bool {
	c := d.c
	pitch := c.RoofPitchDeg * math.Pi / 180
	slope := c.SpanM / 2 / math.Cos(pitch)
	p := lineProblem{
		role: RolePurlin, families: c.Options.Members.PurlinFamilies, sideM: slope, sides: 2,
		// Purlin lines run from the eave to the ridge, equally spaced.
		gapsFor:  func(s float64) int { return max(1, int(math.Ceil(slope/s-1e-9))) },
		linesFor: func(g int) int { return g + 1 },
		positions: func(g int) []float64 {
			out := make([]float64, g+1)
			for i := range out {
				out[i] = slope * float64(i) / float64(g)
			}
			return out
		},
		deadKPa: d.act.Dead.RoofKPa, gravityNormal: math.Cos(pitch), live: true,
		pressures: d.act.Wind.Purlins, localAreaM2: sq(d.act.Wind.LocalDimensionRoofM),
		maxSpacingM: c.Options.Cladding.MaxPurlinSpacingM, stepM: c.Options.Cladding.SpacingStepM,
		deflectionRatio: c.Options.Limits.PurlinDeflectionRatio,
	}
	ld, ok := d.designLines(p)
	d.purlin, d.purlinLines = ld.choice, ld
	return ok
}

// girts designs the side-wall girts.
func (d *designer) girts() bool {
	c := d.c
	h := c.EavesHeightM
	p := lineProblem{
		role: RoleGirt, families: c.Options.Members.GirtFamilies, sideM: h, sides: 2,
		// Girts sit between the slab and the eave purlin, equally spaced.
		gapsFor:  func(s float64) int { return max(2, int(math.Ceil(h/s-1e-9))) },
		linesFor: func(g int) int { return g - 1 },
		positions: func(g int) []float64 {
			out := make([]float64, g-1)
			for i := range out {
				out[i] = h * float64(i+1) / float64(g)
			}
			return out
		},
		// Wall cladding weight acts in the wall's plane, about the girt's
		// minor axis, and is carried by the bridging to the eave: not in
		// the girt's major-axis design (stated assumption).
		deadKPa: d.act.Dead.WallKPa, gravityNormal: 0,
		pressures: d.act.Wind.Girts, localAreaM2: sq(d.act.Wind.LocalDimensionWallM),
		maxSpacingM: c.Options.Cladding.MaxGirtSpacingM, stepM: c.Options.Cladding.SpacingStepM,
		deflectionRatio: c.Options.Limits.GirtDeflectionRatio,
	}
	ld, ok := d.designLines(p)
	d.girt = ld.choice
	return ok
}

func sq(x float64) float64 { return x * x }

// lineDesign is a line search's outcome: the problem, its candidates, the
// chosen candidate and arrangement, and how many candidates it checked.
type lineDesign struct {
	problem  lineProblem
	cands    []catalog.Section
	best     lineCandidate
	choice   lineChoice
	searched int
	scan     lineScan
}

// designLines searches a line problem and records the chosen group.
func (d *designer) designLines(p lineProblem) (lineDesign, bool) {
	ld := lineDesign{problem: p, cands: d.lineSections(p.families)}
	if len(ld.cands) == 0 {
		d.fail(p.role, fmt.Sprintf("the catalogue has no section of the allowed families %v", p.families))
		return ld, false
	}
	best, bestFail, searched, scan, err := d.searchLines(p, ld.cands)
	if err != nil {
		d.fail(p.role, err.Error())
		return ld, false
	}
	if best == nil {
		d.fail(p.role, failReason(bestFail))
		return ld, false
	}
	ld.best, ld.searched, ld.scan = *best, searched, scan
	ld.choice = d.adoptLine(p, ld.best, searched)
	return ld, true
}

// lineChoiceOf is the arrangement a candidate lays out, for later steps.
func lineChoiceOf(p lineProblem, c lineCandidate) lineChoice {
	return lineChoice{Section: c.sec, SpacingM: c.arr.spacingM, PositionsM: p.positions(c.arr.gaps),
		SpanType: c.arr.spanType, Bridging: c.arr.bridging}
}

// adoptLine stores a chosen candidate's member group and its working (in
// place of an earlier choice for the same role) and returns its choice.
func (d *designer) adoptLine(p lineProblem, best lineCandidate, searched int) lineChoice {
	v := d.checkLine(p, best.arr, best.sec, true)
	pieces, lengthEach := linePieces(best.arr.spanType, d.c.Bays, d.c.BaySpacingM)
	lines := p.sides * best.arr.linesSide
	d.set(MemberGroup{
		Role: p.role, Designation: best.sec.Designation, SpacingM: best.arr.spacingM,
		SpanType: best.arr.spanType, Bridging: best.arr.bridging, Lines: lines,
		Count: lines * pieces, LengthEachM: lengthEach, MassKg: best.massKg,
		Governing: v.governing, DeflectionRatio: v.deflection,
	})
	d.rerecord(GroupCalculation{
		Role: p.role, Designation: best.sec.Designation, Checks: v.checks, Searched: searched,
		Notes: lineNotes(p, best.arr, lines, pieces, lengthEach),
	})
	return lineChoiceOf(p, best)
}

// failReason names the best failing candidate and the check that fails it.
func failReason(f *lineFailure) string {
	if f == nil {
		return "no arrangement could be checked"
	}
	g := f.verdict.governing
	return fmt.Sprintf("no passing section; best candidate %s (%s, spacing %.2f m) at utilisation %.2f, failing %s (%s %s, %s)",
		f.sec.Designation, f.arr.spanType, f.arr.spacingM, g.Utilisation, g.Check, g.Standard, g.Clause, g.Combination)
}

// lineFailure is the failing candidate closest to passing.
type lineFailure struct {
	arr     arrangement
	sec     catalog.Section
	verdict lineVerdict
}

// searchLines returns the lightest passing candidate over every
// arrangement, the closest failure, how many candidates it checked, and
// how far it went in each arrangement (for lineOptions).
func (d *designer) searchLines(p lineProblem, cands []catalog.Section) (*lineCandidate, *lineFailure, int, lineScan, error) {
	var best *lineCandidate
	var closest *lineFailure
	searched := 0
	exhaustive := d.s != nil && d.s.Exhaustive
	scan := newLineScan(d.arrangements(p))
	for i, arr := range scan.arrs {
		n := scan.next(d, p, i, cands, func(cand lineCandidate) bool {
			return !exhaustive && best != nil && cand.objective >= best.objective // every later candidate of this arrangement is heavier
		}, func(cand lineCandidate, v lineVerdict) {
			if closest == nil || v.governing.Utilisation < closest.verdict.governing.Utilisation {
				closest = &lineFailure{arr: arr, sec: cand.sec, verdict: v}
			}
		})
		searched += n
		if a := scan.answer[i]; a != nil && (best == nil || a.objective < best.objective) {
			best = a
		}
	}
	return best, closest, searched, scan, nil
}

// lineScan is how far a line search went in each arrangement: the next
// candidate to check and the lightest passing one once found, so that a
// later search of the same problem (lineOptions) goes on from there.
type lineScan struct {
	arrs   []arrangement
	from   []int
	answer []*lineCandidate
}

func newLineScan(arrs []arrangement) lineScan {
	return lineScan{arrs: arrs, from: make([]int, len(arrs)), answer: make([]*lineCandidate, len(arrs))}
}

// next goes on checking arrangement i's candidates, lightest first, until
// one passes (with Settings.Exhaustive, through every candidate, keeping
// the lightest passing) or stop says the next need not be checked, calling
// failed for each that fails. It returns how many it checked.
func (s *lineScan) next(d *designer, p lineProblem, i int, cands []catalog.Section,
	stop func(lineCandidate) bool, failed func(lineCandidate, lineVerdict)) int {
	exhaustive := d.s != nil && d.s.Exhaustive
	searched := 0
	for ; s.from[i] < len(cands); s.from[i]++ {
		if s.answer[i] != nil && !exhaustive {
			break
		}
		cand := d.lineObjective(p, s.arrs[i], cands[s.from[i]])
		if stop(cand) {
			break
		}
		searched++
		v := d.checkLine(p, s.arrs[i], cand.sec, false)
		if !v.passes() {
			failed(cand, v)
			continue
		}
		if s.answer[i] == nil || cand.objective < s.answer[i].objective {
			s.answer[i] = &cand
		}
	}
	return searched
}

// lineOptions goes on with a line search (scan) and lists every
// arrangement's answer, its lightest passing section, whose objective is
// below limit, lightest first (ties in arrangement order, as searchLines
// breaks them). With Settings.Exhaustive the search has checked every
// candidate and limit is not applied.
func (d *designer) lineOptions(p lineProblem, cands []catalog.Section, scan *lineScan, limit float64) []lineCandidate {
	exhaustive := d.s != nil && d.s.Exhaustive
	var out []lineCandidate
	for i := range scan.arrs {
		scan.next(d, p, i, cands, func(cand lineCandidate) bool {
			return !exhaustive && cand.objective >= limit // every later candidate of this arrangement is heavier
		}, func(lineCandidate, lineVerdict) {})
		if a := scan.answer[i]; a != nil && (exhaustive || a.objective < limit) {
			out = append(out, *a)
		}
	}
	slices.SortStableFunc(out, func(a, b lineCandidate) int { return cmpFloat(a.objective, b.objective) })
	return out
}

// arrangements lists the layouts to try: spacings from the cladding's
// maximum down in the grid's steps (distinct line counts only), each span
// type the grid allows, and 0 to maxBridgingRows bridging rows.
func (d *designer) arrangements(p lineProblem) []arrangement {
	var out []arrangement
	seen := map[int]bool{}
	step := p.stepM
	if !(step > 0) {
		step = 0.1
	}
	for s := p.maxSpacingM; s >= spacingFloorFraction*p.maxSpacingM-1e-9; s -= step {
		gaps := p.gapsFor(s)
		if seen[gaps] || p.linesFor(gaps) < 1 {
			continue
		}
		seen[gaps] = true
		for _, st := range d.c.Options.Members.SpanTypes {
			if st != grids.SpanSimple && d.c.Bays < 2 {
				continue // a single bay has no continuity
			}
			for b := 0; b <= maxBridgingRows; b++ {
				out = append(out, arrangement{gaps: gaps, spacingM: p.sideM / float64(gaps),
					spanType: st, bridging: b, linesSide: p.linesFor(gaps)})
			}
		}
	}
	return out
}

type lineSectionsKey struct {
	cat      *catalog.Catalogue
	families string
	costs    *grids.Costs
}

var lineSectionsCache sync.Map // lineSectionsKey → []catalog.Section

// lineSections returns the candidate sections of the allowed families,
// cheapest first (lightest first without a price table), built once per
// catalogue, family list and price table.
func (d *designer) lineSections(families []string) []catalog.Section {
	key := lineSectionsKey{cat: d.cat, families: strings.Join(families, ","), costs: d.c.Options.Costs}
	if v, ok := lineSectionsCache.Load(key); ok {
		return v.([]catalog.Section)
	}
	out := d.sortedLineSections(families)
	lineSectionsCache.Store(key, out)
	return out
}

func (d *designer) sortedLineSections(families []string) []catalog.Section {
	var out []catalog.Section
	for _, f := range families {
		switch f {
		case grids.FamilyZ:
			out = append(out, d.cat.ByShape(catalog.ShapeZ)...)
		case grids.FamilyC:
			out = append(out, d.cat.ByShape(catalog.ShapeC)...)
		}
	}
	slices.SortStableFunc(out, func(a, b catalog.Section) int {
		return cmpFloat(d.pricePerKg(a.Designation)*a.MassKgPerM, d.pricePerKg(b.Designation)*b.MassKgPerM)
	})
	return out
}

func cmpFloat(a, b float64) int {
	switch {
	case a < b:
		return -1
	case a > b:
		return 1
	}
	return 0
}

// pricePerKg is the grid's steel price for a section's family, or 1 when
// the objective is mass.
func (d *designer) pricePerKg(designation string) float64 {
	if costs := d.c.Options.Costs; costs != nil {
		return costs.PerKg[familyOf(designation)]
	}
	return 1
}

// linePieces returns pieces per line and the length of each (m): simple
// spans are cut at every frame; continuous lines are two-span pieces;
// lapped lines have one piece per bay, lengthened by the laps.
func linePieces(spanType string, bays int, bayM float64) (pieces int, lengthEachM float64) {
	switch spanType {
	case grids.SpanContinuous:
		return (bays + 1) / 2, 2 * bayM
	case grids.SpanLapped:
		return bays, bayM * (1 + 2*lapFraction)
	}
	return bays, bayM
}

// lineObjective returns a candidate's mass (lines, laps and bridging) and
// the search objective (mass, or cost with a price table).
func (d *designer) lineObjective(p lineProblem, arr arrangement, sec catalog.Section) lineCandidate {
	lines := float64(p.sides * arr.linesSide)
	run := d.c.LengthM
	if arr.spanType == grids.SpanLapped {
		run += float64(d.c.Bays-1) * 2 * lapFraction * d.c.BaySpacingM
	}
	steel := lines * run * sec.MassKgPerM
	bridgingPieces := float64(arr.bridging * d.c.Bays * p.sides * max(arr.linesSide-1, 1))
	bridging := bridgingPieces * arr.spacingM * bridgingKgPerM
	cand := lineCandidate{arr: arr, sec: sec, massKg: steel + bridging, objective: steel + bridging}
	if costs := d.c.Options.Costs; costs != nil {
		cand.objective = steel*costs.PerKg[familyOf(sec.Designation)] +
			float64(arr.bridging*d.c.Bays*p.sides*arr.linesSide)*costs.PerBridgingRow
	}
	return cand
}

// lineAction is one combination's uniform load on a line (N/mm = kN/m,
// inward positive) and its point load (N, inward).
type lineAction struct {
	name       string
	limitState actions.LimitState
	wNmm       float64
	pointN     float64
}

// lineActions lists the combinations for one arrangement and section, per
// AS/NZS 1170.0:2002 cl. 4.2.2 (ULS) and 4.3 (SLS).
func (d *designer) lineActions(p lineProblem, arr arrangement, sec catalog.Section) []lineAction {
	s := arr.spacingM
	g := (p.deadKPa*s + sec.MassKgPerM*9.80665e-3) * p.gravityNormal // kN/m normal to the cladding
	win := p.pressures.GeneralInward
	wout := p.pressures.GeneralOutward
	// K_l applies to members whose tributary area is within the local
	// pressure area, AS/NZS 1170.2:2021 cl. 5.4.4 and Table 5.6.
	if s*d.c.BaySpacingM <= p.localAreaM2 {
		wout = p.pressures.EdgeOutward
	}
	out := make([]lineAction, 0, 8)
	if p.gravityNormal > 0 {
		out = append(out, lineAction{name: "ULS 1.35G", limitState: actions.ULS, wNmm: 1.35 * g})
	}
	if p.live {
		// AS/NZS 1170.1:2002 Table 3.2: Q on the plan area the purlin
		// supports, normal component; and the 1.4 kN concentrated load.
		q, _ := actions.RoofLiveKPa(s * p.gravityNormal * d.c.BaySpacingM)
		ql := q * s * p.gravityNormal * p.gravityNormal
		out = append(out,
			lineAction{name: "ULS 1.2G+1.5Q", limitState: actions.ULS, wNmm: 1.2*g + 1.5*ql},
			lineAction{name: "ULS 1.2G+1.5Q (concentrated)", limitState: actions.ULS, wNmm: 1.2 * g,
				pointN: 1.5 * actions.RoofPointStructuralKN * 1000 * p.gravityNormal},
			lineAction{name: "SLS G+0.7Q", limitState: actions.SLS, wNmm: g + actions.PsiSRoof*ql})
	}
	// On a wall the cladding's weight does not load the girt's major axis,
	// so the wind combinations carry no G term and are named so.
	names := &roofWindNames
	if p.gravityNormal == 0 {
		names = &wallWindNames
	}
	out = append(out,
		lineAction{name: names[0], limitState: actions.ULS, wNmm: 1.2*g + win.ULSKPa*s},
		lineAction{name: names[1], limitState: actions.ULS, wNmm: 0.9*g + wout.ULSKPa*s},
		lineAction{name: names[2], limitState: actions.SLS, wNmm: g + win.SLSKPa*s},
		lineAction{name: names[3], limitState: actions.SLS, wNmm: g + wout.SLSKPa*s})
	return out
}

// The wind combinations' names on a roof and on a wall (no G term there).
var (
	roofWindNames = [4]string{"ULS 1.2G+Wu inward", "ULS 0.9G+Wu outward", "SLS G+Ws inward", "SLS G+Ws outward"}
	wallWindNames = [4]string{"ULS Wu inward", "ULS Wu outward", "SLS Ws inward", "SLS Ws outward"}
)

// checkLine checks one section in one arrangement under every combination.
// With keep it also returns every check for the report.
func (d *designer) checkLine(p lineProblem, arr arrangement, sec catalog.Section, keep bool) lineVerdict {
	var v lineVerdict
	coef, err := coefficientsFor(arr.spanType, d.c.Bays)
	caps, cerr := capacitiesFor(d.cat).of(sec)
	if err != nil || cerr != nil || caps == nil {
		v.governing = Governing{Check: fmt.Sprintf("section could not be assessed: %v %v", err, cerr), Utilisation: math.Inf(1)}
		return v
	}
	L := d.c.BaySpacingM * 1000 // mm
	member := coldformed.Purlin{Span: L, SpanType: spanTypeOf(arr.spanType), BridgingRows: arr.bridging,
		EndBearing: cleatBearing, InteriorBearing: cleatBearing}
	continuous := arr.spanType != grids.SpanSimple
	take := func(g Governing) {
		if g.Utilisation > v.governing.Utilisation || v.governing.Check == "" {
			v.governing = g
		}
	}
	acts := d.lineActions(p, arr, sec)
	if !keep {
		// The deflection checks are the cheapest: try them first.
		slices.SortStableFunc(acts, func(x, y lineAction) int { return int(y.limitState) - int(x.limitState) })
	}
	for _, a := range acts {
		w := math.Abs(a.wNmm)
		if a.limitState == actions.SLS {
			delta := coef.Deflection*w*L*L*L*L/(steelE*sec.IxMM4) + a.pointN*L*L*L/(48*steelE*sec.IxMM4)
			ratio := delta / (L / p.deflectionRatio)
			v.deflection = math.Max(v.deflection, ratio)
			g := Governing{Check: deflectionCheckName, Standard: "AS/NZS 1170.0:2002",
				Clause: "cl. 4.3, Appendix C (limit from the grid)", LimitState: "SLS", Combination: a.name, Utilisation: ratio}
			take(g)
			if keep {
				v.checks = append(v.checks, CheckLine{Member: string(p.role), Name: g.Check, Standard: g.Standard, Clause: g.Clause,
					LimitState: "SLS", Combination: a.name, Demand: delta, Capacity: L / p.deflectionRatio, Unit: "mm", Utilisation: ratio})
			}
			if !keep && v.governing.Utilisation > 1 {
				return v
			}
			continue
		}
		sag := coef.Sag*w*L*L + 0.25*a.pointN*L
		hog := coef.Hog * w * L * L
		if continuous {
			hog += 0.094 * a.pointN * L // two-span, point load mid-span of one span: 3PL/32 (beam tables)
		}
		act := coldformed.PurlinActions{Shear: coef.Shear*w*L + a.pointN, FreeFlangeCb: 1}
		if a.wNmm >= 0 {
			act.FastenedFlangeMoment, act.FreeFlangeMoment = sag, hog
		} else {
			act.FastenedFlangeMoment, act.FreeFlangeMoment, act.Outward = hog, sag, true
		}
		if continuous {
			act.MomentAtShear = hog
		}
		if !keep {
			// Section capacity bounds every member capacity of the same
			// flange (AS/NZS 4600:2018 cl. 3.3.2 ≥ cl. 3.3.3): a section
			// failing it fails, with no need for the full check set.
			u := math.Max(act.FastenedFlangeMoment/(coldformed.PhiBending*caps.MsTop),
				act.FreeFlangeMoment/(coldformed.PhiBending*caps.MsBot))
			if u > 1 {
				v.governing = Governing{Check: "section moment capacity", Standard: coldformed.Standard, Clause: "cl. 3.3.2",
					LimitState: "ULS", Combination: a.name, Utilisation: u}
				return v
			}
		}
		res, err := coldformed.CheckPurlin(caps, member, act)
		if err != nil {
			v.governing = Governing{Check: err.Error(), Utilisation: math.Inf(1)}
			return v
		}
		res.SetCombination(a.name)
		take(governingOf(res.Governing()))
		if keep {
			for _, ch := range res.Checks {
				v.checks = append(v.checks, checkLineOf(string(p.role), ch))
			}
		} else if v.governing.Utilisation > 1 {
			return v
		}
	}
	return v
}

// deflectionCheckName names the line deflection check; its limit is the
// grid's span/deflection ratio, printed beside it in the report.
const deflectionCheckName = "deflection (limit span over the grid's ratio)"

// cleatBearing: purlins and girts are bolted through the web to cleats, so
// the reaction does not bear on a flange and web bearing (AS/NZS 4600:2018
// cl. 3.3.6) does not govern; the reactions are passed as zero.
var cleatBearing = coldformed.Bearing{Length: 50, Fastened: true}

func spanTypeOf(s string) coldformed.SpanType {
	switch s {
	case grids.SpanContinuous:
		return coldformed.SpanContinuous
	case grids.SpanLapped:
		return coldformed.SpanLapped
	}
	return coldformed.SpanSimple
}

// governingOf turns a coldformed check into the result's Governing.
func governingOf(c coldformed.Check) Governing {
	return Governing{Check: c.Name, Standard: c.Standard, Clause: "cl. " + c.Clause,
		LimitState: limitStateOf(c.LimitState), Combination: c.Combination, Utilisation: c.Utilisation}
}

// checkLineOf turns a coldformed check into a report line (kN, kN·m).
func checkLineOf(member string, c coldformed.Check) CheckLine {
	demand, capacity, unit := c.DemandValue, c.CapacityValue, c.Unit
	switch unit {
	case "N":
		demand, capacity, unit = demand/1e3, capacity/1e3, "kN"
	case "N·mm":
		demand, capacity, unit = demand/1e6, capacity/1e6, "kN·m"
	}
	return CheckLine{Member: member, Name: c.Name, Standard: c.Standard, Clause: "cl. " + c.Clause,
		LimitState: limitStateOf(c.LimitState), Combination: c.Combination,
		Demand: demand, Capacity: capacity, Unit: unit, Utilisation: c.Utilisation}
}

func limitStateOf(l coldformed.LimitState) string {
	if len(l) >= 3 {
		return string(l[:3])
	}
	return string(l)
}

// lineNotes states the chosen arrangement for the report.
func lineNotes(p lineProblem, arr arrangement, lines, pieces int, lengthEachM float64) []string {
	notes := []string{
		fmt.Sprintf("%d lines per side at %.3f m (cladding maximum %.2f m), %d lines in all",
			arr.linesSide, arr.spacingM, p.maxSpacingM, lines),
		fmt.Sprintf("%s, %d piece(s) per line of %.2f m, %d bridging row(s) per span", arr.spanType, pieces, lengthEachM, arr.bridging),
		"bolted through the web to cleats: web bearing does not apply",
		fmt.Sprintf("local pressure factor K_l %.2g applied where the tributary area is within a² = %.2f m² (AS/NZS 1170.2:2021 cl. 5.4.4)",
			p.pressures.EdgeKl, p.localAreaM2),
	}
	if arr.spanType == grids.SpanLapped {
		notes = append(notes, fmt.Sprintf("laps of %.0f%% of the span each side of interior frames (common practice, no source)", 100*lapFraction))
	}
	if p.gravityNormal == 0 {
		notes = append(notes, "wall cladding weight is carried in the wall's plane by the bridging; not in the girt's major-axis design")
	}
	return notes
}

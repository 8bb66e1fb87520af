package optimize

import (
	"math"

	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/grids"
)

// Hinges of a frame mechanism, in order along the frame: left base, left
// side hinge (knee, or the rafter at the knee brace), apex, right side
// hinge, right base.
const (
	hLB = iota
	hBL
	hC
	hBR
	hRB
	nHinges
)

// mechanismPlace is the pair of frame mechanisms with side hinges at plan
// distance xb from each eave: the gable spreading (side parts turn outward
// about the bases, apex drops) and the sway (side parts turn the same way,
// the middle part translates and turns). For each, the hinges' relative
// rotations per unit side rotation, and the work each primary case's loads
// do, from any equilibrium state of those loads: the virtual work equation
// W = Σ M_h·Δθ_h holds whatever the stiffness (the plain frame's elastic
// moments serve as the state; a knee brace carrying no force leaves them
// in equilibrium in the braced frame).
type mechanismPlace struct {
	xb float64
	// column marks the braced frame's column sway: side hinges in the
	// columns at the knee brace (the knee triangles and rafters move as one
	// body), sway only; capacities are the column's.
	column  bool
	dth     [2][nHinges]float64
	work    [2][]float64 // per primary, self weight excluded
	rafterW [2]float64   // per kg/m of rafter self weight
	columnW [2]float64   // per kg/m of column self weight
	// Candidate-independent parts of placeRatio, summed in its order:
	// ulsW[i] is the work of ULS combination m.uls[i] without self weight,
	// coef[k][h] the rotation |a·Δθ_spread,h + b·Δθ_sway,h| of hinge h in
	// mix k of mechanismCombos.
	ulsW [][2]float64
	coef [nMixes][nHinges]float64
}

// nMixes is len(mechanismCombos).
const nMixes = 8

// mechanismCombos are the mixes (spreading, sway) tried for the bound.
var mechanismCombos = [nMixes][2]float64{{1, 0}, {0, 1}, {1, 0.5}, {1, -0.5}, {1, 1}, {1, -1}, {1, 2}, {1, -2}}

// newMechanisms solves the plain frame once under every primary case
// without self weight and under unit rafter and column self weights, and
// tabulates the mechanisms' work at the knee (index 0) and at 17 knee-brace
// positions over the placement range. One analysis.
func (m *frameModel) newMechanisms() ([]mechanismPlace, error) {
	t := m.plain
	p := t.p
	g := &m.g
	cases := make([]analysis.LoadCase, 0, len(t.cases)+2)
	for _, c := range t.cases {
		c.SelfWeight = 0
		cases = append(cases, c)
	}
	unit := -analysis.Gravity * 1e-3 // N/mm per kg/m
	var raf, col analysis.LoadCase
	for _, pt := range []analysis.Part{analysis.LeftRafter, analysis.RightRafter} {
		p.PartLoad(&raf, pt, 0, p.Lengths[pt], analysis.GlobalAxes, 0, unit, false)
	}
	for _, pt := range []analysis.Part{analysis.LeftColumn, analysis.RightColumn} {
		p.PartLoad(&col, pt, 0, p.Lengths[pt], analysis.GlobalAxes, 0, unit, false)
	}
	raf.Name, col.Name = "unit rafter self weight", "unit column self weight"
	cases = append(cases, raf, col)
	m.d.r.Analyses++
	sol, err := m.ws.Solve(&p.Frame, cases)
	if err != nil {
		return nil, err
	}
	cos, tan := math.Cos(g.pitchRad), math.Tan(g.pitchRad)
	s := p.Lengths[analysis.LeftRafter]
	alongs := []float64{0}
	for i := 0; i <= 16; i++ {
		alongs = append(alongs, (kneeRafterMin+(kneeRafterMax-kneeRafterMin)*float64(i)/16)*g.rafterMM)
	}
	var out []mechanismPlace
	for _, a := range alongs {
		mp := mechanismPlace{xb: a * cos}
		hb, lx := g.heightMM+mp.xb*tan, g.spanMM/2-mp.xb
		r := hb / (tan * lx)
		mp.dth[0] = [nHinges]float64{1, -r - 1, 2 * r, -1 - r, 1}
		tc := -2 * mp.xb / (g.spanMM - 2*mp.xb)
		mp.dth[1] = [nHinges]float64{1, tc - 1, 0, 1 - tc, -1}
		at := [nHinges]struct {
			pt    analysis.Part
			along float64
		}{{analysis.LeftColumn, 0}, {analysis.LeftRafter, a}, {analysis.LeftRafter, s},
			{analysis.RightRafter, s - a}, {analysis.RightColumn, g.heightMM}}
		for k := range cases {
			var w [2]float64
			for h := range nHinges {
				mh := p.ForcesAt(sol, analysis.Primary(k), at[h].pt, at[h].along).M
				for j := range 2 {
					w[j] += mh * mp.dth[j][h]
				}
			}
			for j := range 2 {
				switch k {
				case len(cases) - 2:
					mp.rafterW[j] = w[j]
				case len(cases) - 1:
					mp.columnW[j] = w[j]
				default:
					mp.work[j] = append(mp.work[j], w[j])
				}
			}
		}
		out = append(out, mp)
	}
	for i := 0; i <= 16; i++ {
		c := (kneeColumnMin + (kneeColumnMax-kneeColumnMin)*float64(i)/16) * g.heightMM
		mp := mechanismPlace{column: true}
		mp.dth[1] = [nHinges]float64{1, -1, 0, 1, -1}
		at := [nHinges]struct {
			pt    analysis.Part
			along float64
		}{{analysis.LeftColumn, 0}, {analysis.LeftColumn, g.heightMM - c}, {analysis.LeftRafter, s},
			{analysis.RightColumn, c}, {analysis.RightColumn, g.heightMM}}
		for k := range cases {
			var w float64
			for h := range nHinges {
				w += p.ForcesAt(sol, analysis.Primary(k), at[h].pt, at[h].along).M * mp.dth[1][h]
			}
			switch k {
			case len(cases) - 2:
				mp.rafterW[1] = w
			case len(cases) - 1:
				mp.columnW[1] = w
			default:
				mp.work[0] = append(mp.work[0], 0)
				mp.work[1] = append(mp.work[1], w)
			}
		}
		out = append(out, mp)
	}
	m.tabulateMechanisms(out)
	return out, nil
}

// tabulateMechanisms fills the candidate-independent terms of placeRatio
// (each ULS combination's work without self weight, the hinges' rotations
// per mix) and the model's ULS dead-load factors and mix weights.
func (m *frameModel) tabulateMechanisms(places []mechanismPlace) {
	m.ulsFG = make([]float64, len(m.uls))
	for i, c := range m.uls {
		m.ulsFG[i] = m.d.act.Combinations[c].FactorOn(actions.G)
	}
	for k, ab := range mechanismCombos {
		m.mixAbs[k] = math.Abs(ab[0]) + math.Abs(ab[1])
	}
	for p := range places {
		mp := &places[p]
		mp.ulsW = make([][2]float64, len(m.uls))
		for i, c := range m.uls {
			for j := range 2 {
				for _, t := range m.combs[c] {
					mp.ulsW[i][j] += t.Factor * mp.work[j][t.Case]
				}
			}
		}
		for k, ab := range mechanismCombos {
			for h := range nHinges {
				mp.coef[k][h] = math.Abs(ab[0]*mp.dth[0][h] + ab[1]*mp.dth[1][h])
			}
		}
	}
}

// placeRatio returns the largest ratio of load work to hinge capacity
// over the ULS combinations and mechanism mixes at one place: above 1, no
// moment field within the capacities φM_s (cl. 3.3.2) can carry the loads.
// Side hinges are at the knee (the weaker of rafter and column) or on the
// rafter at the knee brace; bases are hinges only when fixed. With a knee
// brace its own weight (at most braceN per brace, at plan xb/2 on the side
// parts) is taken off the work. It may return early with a value at or
// above stopAt once the ratio is known to reach it (+Inf: never).
// The candidate-independent terms come from tabulateMechanisms, in the
// same order of operations, so the ratio does not depend on the tables.
func (m *frameModel) placeRatio(mp *mechanismPlace, cd *frameCandidate, braceN, stopAt float64) float64 {
	msR, msC := sectionMoment(cd.rCap), sectionMoment(cd.cCap)
	var capH [nHinges]float64
	capH[hC] = msR
	capH[hBL], capH[hBR] = math.Min(msR, msC), math.Min(msR, msC)
	if cd.braced {
		capH[hBL], capH[hBR] = msR, msR
	}
	if mp.column {
		capH[hBL], capH[hBR], capH[hC] = msC, msC, 0
	}
	if m.d.c.Base == grids.BaseFixed {
		capH[hLB], capH[hRB] = msC, msC
	}
	var capacity [nMixes]float64
	for k := range nMixes {
		for h := range nHinges {
			capacity[k] += capH[h] * mp.coef[k][h]
		}
	}
	rKg, cKg := cd.rafter.MassKgPerM, cd.column.MassKgPerM
	sw := [2]float64{rKg*mp.rafterW[0] + cKg*mp.columnW[0], rKg*mp.rafterW[1] + cKg*mp.columnW[1]}
	// The combinations are tried from the one that gave the last largest
	// ratio (the maximum does not depend on the order; an early stop comes
	// sooner).
	worst := 0.0
	n := len(m.ulsFG)
	start := m.placeComb % max(n, 1)
	for step := range n {
		i := start + step
		if i >= n {
			i -= n
		}
		fg := m.ulsFG[i]
		w0 := mp.ulsW[i][0] + fg*sw[0]
		w1 := mp.ulsW[i][1] + fg*sw[1]
		brace := fg * braceN * mp.xb
		before := worst
		for k := range nMixes {
			if capacity[k] > 0 {
				ab := &mechanismCombos[k]
				work := math.Abs(ab[0]*w0+ab[1]*w1) - brace*m.mixAbs[k]
				worst = max(worst, work/capacity[k])
			}
		}
		if worst > before {
			m.placeComb = i
		}
		if worst >= stopAt {
			return worst
		}
	}
	return worst
}

// mechanismBound is the candidate's mechanism ratio: at the knee without
// knee braces; with them, at the most favourable of the tabulated brace
// positions, with a 1 % margin for positions between them. Each minimum
// starts from the place that gave the last candidate's (a low first value
// lets placeRatio stop early at the others; the minimum is the same).
// The ratio is exact below stop (> 1, +Inf: always); at or above it, it
// may be a lower bound at or above stop.
func (m *frameModel) mechanismBound(cd *frameCandidate, stop float64) float64 {
	if len(m.mech) == 0 {
		return 0
	}
	// A braced place ratio at or above failAtBraced gives a bound at or
	// above stop after the 1 % margin (1.02/1.01 > 1 leaves room for
	// rounding).
	failAt, failAtBraced := stop, stop*1.02
	if !cd.braced {
		return m.placeRatio(&m.mech[0], cd, 0, failAt)
	}
	braceN := m.heaviestC.MassKgPerM * analysis.Gravity * 1e-3 * math.Hypot(m.g.heightMM, m.g.rafterMM)
	// The rafter and column hinge places are independent: the brace's
	// rafter end sets one, its column end the other.
	rafter := m.leastPlaceRatio(cd, braceN, false, &m.bestPlace[0], failAtBraced)
	if rafter >= failAtBraced {
		return rafter / 1.01
	}
	column := m.leastPlaceRatio(cd, braceN, true, &m.bestPlace[1], failAtBraced)
	return math.Max(rafter, column) / 1.01
}

// leastPlaceRatio is the least placeRatio over the knee-brace places of one
// kind (column sway places or rafter places), trying *first first and
// leaving there the place of the least. A place is abandoned once its
// ratio reaches the least so far or failAt: the least is exact when below
// failAt, and otherwise at least failAt.
func (m *frameModel) leastPlaceRatio(cd *frameCandidate, braceN float64, column bool, first *int, failAt float64) float64 {
	least := math.Inf(1)
	try := func(i int) {
		if mp := &m.mech[i]; mp.column == column {
			if r := m.placeRatio(mp, cd, braceN, min(least, failAt)); r < least {
				least, *first = r, i
			}
		}
	}
	start := *first
	if start >= 1 && start < len(m.mech) {
		try(start)
	}
	for i := 1; i < len(m.mech); i++ {
		if i != start {
			try(i)
		}
	}
	return least
}

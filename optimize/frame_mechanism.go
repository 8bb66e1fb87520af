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
}

// mechanismCombos are the mixes (spreading, sway) tried for the bound.
var mechanismCombos = [][2]float64{{1, 0}, {0, 1}, {1, 0.5}, {1, -0.5}, {1, 1}, {1, -1}, {1, 2}, {1, -2}}

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
	return out, nil
}

// mechanismRatio returns the largest ratio of load work to hinge capacity
// over the ULS combinations and mechanism mixes at one place: above 1, no
// moment field within the capacities φM_s (cl. 3.3.2) can carry the loads.
// Side hinges are at the knee (the weaker of rafter and column) or on the
// rafter at the knee brace; bases are hinges only when fixed. With a knee
// brace its own weight (at most braceN per brace, at plan xb/2 on the side
// parts) is taken off the work.
func (m *frameModel) placeRatio(mp *mechanismPlace, cd *frameCandidate, braceN float64) float64 {
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
	worst := 0.0
	for _, c := range m.uls {
		fg := m.d.act.Combinations[c].FactorOn(actions.G)
		var w [2]float64
		for j := range 2 {
			for _, t := range m.combs[c] {
				w[j] += t.Factor * mp.work[j][t.Case]
			}
			w[j] += fg * (cd.rafter.MassKgPerM*mp.rafterW[j] + cd.column.MassKgPerM*mp.columnW[j])
		}
		for _, ab := range mechanismCombos {
			work := math.Abs(ab[0]*w[0]+ab[1]*w[1]) - fg*braceN*mp.xb*(math.Abs(ab[0])+math.Abs(ab[1]))
			var capacity float64
			for h := range nHinges {
				capacity += capH[h] * math.Abs(ab[0]*mp.dth[0][h]+ab[1]*mp.dth[1][h])
			}
			if capacity > 0 {
				worst = math.Max(worst, work/capacity)
			}
		}
	}
	return worst
}

// mechanismBound is the candidate's mechanism ratio: at the knee without
// knee braces; with them, at the most favourable of the tabulated brace
// positions, with a 1 % margin for positions between them.
func (m *frameModel) mechanismBound(cd *frameCandidate) float64 {
	if len(m.mech) == 0 {
		return 0
	}
	if !cd.braced {
		return m.placeRatio(&m.mech[0], cd, 0)
	}
	braceN := m.heaviestC.MassKgPerM * analysis.Gravity * 1e-3 * math.Hypot(m.g.heightMM, m.g.rafterMM)
	// The rafter and column hinge places are independent: the brace's
	// rafter end sets one, its column end the other.
	rafter, column := math.Inf(1), math.Inf(1)
	for i := 1; i < len(m.mech); i++ {
		mp := &m.mech[i]
		if mp.column {
			column = math.Min(column, m.placeRatio(mp, cd, braceN))
		} else {
			rafter = math.Min(rafter, m.placeRatio(mp, cd, braceN))
		}
	}
	return math.Max(rafter, column) / 1.01
}

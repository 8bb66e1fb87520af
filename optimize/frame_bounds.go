package optimize

import (
	"math"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/checks/coldformed"
	"github.com/spansweep/spansweep/grids"
)

// gravityLoad is one symmetric ULS gravity combination on the frame, in
// N and mm: what the stiffness-independent bounds need.
type gravityLoad struct {
	wPlan     float64   // uniform on plan over the span, without the rafters' own weight, N/mm
	rafterSW  float64   // factor on the rafters' own weight
	columnSW  float64   // factor on the columns' own weight
	purlinN   float64   // each purlin's point load, N
	purlinsX  []float64 // purlin plan positions from the left eave, left half
	apexN     float64   // point load at the apex (a hoist at mid-span), N
	columnN   float64   // load down each column besides its own weight (wall, girts), N
	hoistOffC bool      // the hoist is not at the apex (no bound then)
}

// gravityLoads returns the ULS combinations without wind as gravityLoads.
func (m *frameModel) gravityLoads() []gravityLoad {
	d, g := m.d, &m.g
	cos := math.Cos(g.pitchRad)
	t := g.tributaryM
	var out []gravityLoad
	for i, c := range d.act.Combinations {
		if c.LimitState != actions.ULS || m.hasW[i] {
			continue
		}
		fg, fq, fh := c.FactorOn(actions.G), c.FactorOn(actions.Q), c.FactorOn(actions.H)
		gl := gravityLoad{
			wPlan:    fg*d.act.Dead.RoofKPa*t/cos + fq*d.act.RoofLiveKPa*t,
			rafterSW: fg, columnSW: fg,
			purlinN: fg * d.purlin.Section.MassKgPerM * analysis.Gravity * t,
			columnN: fg * (d.act.Dead.WallKPa*t*g.heightMM + d.girt.Section.MassKgPerM*analysis.Gravity*t*float64(len(g.girtsMM))),
		}
		for _, p := range g.purlinsMM {
			gl.purlinsX = append(gl.purlinsX, p*cos)
		}
		if fh != 0 {
			gl.apexN = fh * d.act.Hoist.LoadKN * 1e3
			gl.hoistOffC = math.Abs(d.act.Hoist.PositionM*1e3-g.spanMM/2) > 1
		}
		out = append(out, gl)
	}
	return out
}

// mechanismWork returns, for the gable spreading mechanism with rafter
// hinges at plan distance xb from each eave and at the apex (the bases
// pinned or hinged, the parts outside the hinges rigid and turning about
// the bases at unit rate), the work of the loads and the hinge rotations:
// at each side hinge, at the apex (both rafters together) and at each base.
// By virtue of the virtual work equation Σ|M_i|θ_i ≥ W holds for the
// frame's actual moments whatever its stiffness (a statically admissible
// field need not be the elastic one): with xb = 0 and pinned bases it is
// max(|M_knee|, |M_ridge|) ≥ (wL²/8)/(1 + (h+f)/h) for a uniform w.
func (m *frameModel) mechanismWork(gl gravityLoad, xb, rafterKgPerM, braceN float64) (w, thB, thC, thBase float64) {
	g := &m.g
	tan := g.tanPitch
	half := g.spanMM / 2
	hb := g.heightMM + xb*tan
	lx := half - xb
	delta := hb/tan - xb           // apex drop
	v := func(x float64) float64 { // downward speed on plan at x ≤ L/2
		if x <= xb {
			return -x
		}
		return -xb + (delta+xb)*(x-xb)/lx
	}
	wp := gl.wPlan + gl.rafterSW*rafterKgPerM*analysis.Gravity*1e-3/g.cosPitch
	side := -wp*xb*xb/2 + wp*lx*(delta-xb)/2 - braceN*xb/2
	for _, x := range gl.purlinsX {
		side += gl.purlinN * v(x)
	}
	w = 2*side + gl.apexN*delta
	thB = hb/(tan*lx) + 1
	thC = 2 * hb / (tan * lx)
	return w, thB, thC, 1
}

// sectionMoment is φM_s, the larger of the two flanges' (cl. 3.3.2).
func sectionMoment(c *coldformed.Capacities) float64 {
	return coldformed.PhiBending * math.Max(c.MsTop, c.MsBot)
}

// boundPasses reports whether a candidate can pass at all, from statics
// alone (no analysis): under each ULS gravity combination the columns'
// base compression V = half the vertical load must not exceed the column's
// compression capacity with l_ex → 0 (an upper bound on φN_c, cl. 3.4.1,
// 3.4.6), and the mechanism's hinge capacities (φM_s, reduced at column
// hinges by N*/φN_s as cl. 3.5.1(b) requires) must do the loads' work.
// With knee braces the side hinge is on the rafter at the brace, taken at
// the most favourable of 17 positions over the placement range with a 1 %
// margin for positions between them. The ratio returned is the work over
// the hinge capacity (> 1 fails). The ratio is exact when at most 1 or
// below need; otherwise it may be a lower bound at or above both (the
// search needs the value only to rank failures below the best so far).
func (m *frameModel) boundPasses(cd *frameCandidate, need float64) (bool, float64) {
	g := &m.g
	if g.pitchRad < 1e-3 {
		return true, 0
	}
	cc := cd.cCap
	phiN := m.columnPhiNBound(cd)
	phiNs := coldformed.PhiCompression * cc.Ns
	msR, msC := sectionMoment(cd.rCap), sectionMoment(cc)
	if m.gravity == nil {
		m.gravity = m.gravityLoads()
	}
	stop := max(need, math.Nextafter(1, 2)) // at or above: the verdict and the rank are known
	worst := 0.0
	for _, gl := range m.gravity {
		if gl.hoistOffC {
			continue
		}
		colSW := gl.columnSW * cd.column.MassKgPerM * analysis.Gravity * 1e-3 * g.heightMM
		rafSW := gl.rafterSW * cd.rafter.MassKgPerM * analysis.Gravity * 1e-3 * g.rafterMM
		roof := gl.wPlan*g.spanMM/2 + rafSW + gl.purlinN*float64(len(gl.purlinsX)) + gl.apexN/2
		var braceN float64
		if cd.braced {
			braceN = gl.rafterSW * m.heaviestC.MassKgPerM * analysis.Gravity * 1e-3 *
				math.Hypot(g.heightMM, g.rafterMM) // no brace is longer than this
		}
		nBase := roof + gl.columnN + colSW + braceN
		nKnee := roof
		worst = math.Max(worst, nBase/phiN)
		reduce := func(n float64) float64 { return msC * math.Max(0, 1-n/phiNs) }
		ratio := math.Inf(1)
		if !cd.braced {
			ratio = m.mechanismRatio(gl, 0, cd, math.Min(msR, reduce(nKnee)), msR, reduce(nBase), 0)
		} else {
			for i := 0; i <= 16; i++ {
				a := (kneeRafterMin + (kneeRafterMax-kneeRafterMin)*float64(i)/16) * g.rafterMM
				ratio = math.Min(ratio, m.mechanismRatio(gl, a*g.cosPitch, cd, msR, msR, reduce(nBase), braceN)/1.01)
			}
		}
		worst = math.Max(worst, ratio)
		if worst >= stop {
			return false, worst
		}
	}
	worst = math.Max(worst, m.mechanismBound(cd, stop))
	return worst <= 1, worst
}

// columnPhiNBound is the column's φN_c with l_ex → 0 (cl. 3.4.1, 3.4.6),
// at most φN_cd, computed once per column section and case.
func (m *frameModel) columnPhiNBound(cd *frameCandidate) float64 {
	cc := cd.cCap
	if phiN, ok := m.phiNBound[cc]; ok {
		return phiN
	}
	if m.phiNBound == nil {
		m.phiNBound = map[*coldformed.Capacities]float64{}
		m.columnLey = newMemberSpec(columnKind, *cd.column, cc, m.g.heightMM, m.g.girtsMM).ley
	}
	ley := m.columnLey // the girt spacing: the same for every column section
	nc, _ := cc.MemberCompression(coldformed.EffectiveLengths{Lex: lexFloor, Ley: ley, Lez: ley})
	phiN := coldformed.PhiCompression * math.Min(nc, cc.Ncd)
	m.phiNBound[cc] = phiN
	return phiN
}

// mechanismRatio is the loads' work over the hinges' capacity.
func (m *frameModel) mechanismRatio(gl gravityLoad, xb float64, cd *frameCandidate, mB, mC, mBase, braceN float64) float64 {
	w, thB, thC, thBase := m.mechanismWork(gl, xb, cd.rafter.MassKgPerM, braceN)
	capacity := 2*mB*thB + mC*thC
	if m.d.c.Base == grids.BaseFixed {
		capacity += 2 * mBase * thBase
	}
	if capacity <= 0 {
		return math.Inf(1)
	}
	return w / capacity
}

// heaviestOf returns the heaviest section of a shape (for conservative
// brace weights in bounds).
func heaviestOf(cat *catalog.Catalogue, s catalog.Shape) catalog.Section {
	list := capacitiesFor(cat).byShape(s)
	if len(list) == 0 {
		return catalog.Section{}
	}
	return list[len(list)-1]
}

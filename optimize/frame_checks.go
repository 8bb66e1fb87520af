package optimize

import (
	"math"
	"slices"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/checks/coldformed"
)

// memberKind is the rafter pair or the column pair of a frame.
type memberKind int

const (
	rafterKind memberKind = iota
	columnKind
)

// parts returns the mainParts indices of a kind: the left part (measured
// from the knee or base as the canonical coordinate) and the right part
// (whose own coordinate runs the other way).
func (k memberKind) parts() [2]int {
	if k == rafterKind {
		return [2]int{1, 2}
	}
	return [2]int{0, 3}
}

// memberSpec is a rafter or column under check: its section, length and
// flange restraints in canonical coordinates (rafter: from the knee along
// the slope; column: from the base), mm.
type memberSpec struct {
	kind   memberKind
	sec    catalog.Section
	cap    *coldformed.Capacities
	length float64
	outer  []float64 // purlins or girts with both ends: the outer flange's restraints
	fly    []float64 // purlins or girts where a fly brace may restrain the inner flange
	ley    float64   // out-of-plane and torsional length for compression: the largest outer spacing
	phiNc0 float64   // φN_c with l_ex → 0, computed on first use by fastUtilisation
}

// newMemberSpec restrains the outer flange at lines (purlins or girts) and
// at both ends (base, knee and apex are taken as restrained on both
// flanges: the footing, the knee and apex connections with the eaves and
// ridge lines; stated assumption).
func newMemberSpec(kind memberKind, sec catalog.Section, cap *coldformed.Capacities, length float64, lines []float64) memberSpec {
	s := memberSpec{kind: kind, sec: sec, cap: cap, length: length, outer: []float64{0}}
	for _, x := range lines {
		if x > 1 && x < length-1 {
			s.outer = append(s.outer, x)
			s.fly = append(s.fly, x)
		}
	}
	s.outer = append(s.outer, length)
	for i := 1; i < len(s.outer); i++ {
		s.ley = max(s.ley, s.outer[i]-s.outer[i-1])
	}
	return s
}

// partInputs are one part's combination-wide inputs to the beam-column
// check: the largest compression (negative: the least tension), in-plane
// effective length from λc, and the largest shear with its moment.
type partInputs struct {
	n, lex, v, mAtV float64
}

// maxCb is the cap on the moment-gradient factor.
const maxCb = 2.3

// lexFloor stands for "no in-plane buckling" (λc = ∞ or no compression):
// a 1 mm effective length makes f_ox and N_ex effectively infinite.
const lexFloor = 1.0

// inputs computes part k's inputs under comb with buckling factor lambda.
func (m *frameModel) inputs(s *memberSpec, k, comb int, lambda float64) partInputs {
	f := m.combine(k, comb)
	in := partInputs{n: math.Inf(-1), lex: lexFloor}
	for _, x := range f {
		in.n = max(in.n, -x.N)
		if v := math.Abs(x.V); v > in.v {
			in.v, in.mAtV = v, math.Abs(x.M)
		}
	}
	if in.n > 0 && !math.IsInf(lambda, 1) && lambda > 0 {
		in.lex = max(lexFloor, math.Pi*math.Sqrt(coldformed.E*s.sec.IxMM4/(lambda*in.n)))
	}
	return in
}

// segment is a length between restraints of one flange: its extreme
// moments of each sign and the moment-gradient factor, on one part.
type segment struct {
	from, to     float64 // part coordinate, mm
	sag, hog     float64 // largest positive and largest negative (as magnitude) moment
	cbPos, cbNeg float64
}

// toPart maps a canonical interval onto part k's coordinate.
func (s *memberSpec) toPart(k int, a, b float64) (float64, float64) {
	if k == 3 || k == 2 { // right column runs knee to base, right rafter apex to knee
		return s.length - b, s.length - a
	}
	return a, b
}

// segmentOf returns the exact extreme moments of part k's current
// combination forces f over [a, b] (part coordinate): between stations the
// shear is linear, so the moment's stationary point and value follow.
func (m *frameModel) segmentOf(k int, f []analysis.Forces, a, b float64) segment {
	st := m.top.stations[k]
	sg := segment{from: a, to: b}
	const tol = 1e-6
	take := func(v float64) {
		sg.sag = max(sg.sag, v)
		sg.hog = max(sg.hog, -v)
	}
	j0 := firstStation(st, func(along float64) bool { return along >= a-tol })
	for j := j0; j < len(st); j++ {
		x := st[j].along
		if x > b+tol {
			break
		}
		take(f[j].M)
		if j+1 < len(st) && st[j+1].along > x+tol && st[j+1].along <= b+tol {
			v0, v1 := f[j].V, f[j+1].V
			if (v0 > 0 && v1 < 0) || (v0 < 0 && v1 > 0) {
				dx := (st[j+1].along - x) * v0 / (v0 - v1)
				take(f[j].M + v0*dx/2)
			}
		}
	}
	mq := [3]float64{}
	for i := range mq {
		mq[i] = m.momentAt(k, f, a+(b-a)*float64(i+1)/4)
	}
	// Capped at 2.3, the largest C_b that coldformed.Segment accepts (the
	// usual cap on the cl. 3.3.3.2.1 factor).
	sg.cbPos = min(maxCb, coldformed.MomentGradientCb(max(sg.sag, sg.hog), mq[0], mq[1], mq[2]))
	sg.cbNeg = sg.cbPos
	return sg
}

// momentAt is the exact moment at x on part k from the station forces.
func (m *frameModel) momentAt(k int, f []analysis.Forces, x float64) float64 {
	st := m.top.stations[k]
	i := firstStation(st, func(along float64) bool { return along > x })
	switch {
	case i == 0:
		return f[0].M
	case i == len(st):
		return f[len(f)-1].M
	}
	j := i - 1 // the last station at or before x: the value just past a point load there
	x0, x1 := st[j].along, st[i].along
	dx := x - x0
	return f[j].M + f[j].V*dx + (f[i].V-f[j].V)/(x1-x0)*dx*dx/2
}

// firstStation is sort.Search over the stations' positions: the first
// index whose position satisfies the monotone test, len(st) if none. A
// plain loop the compiler inlines with its test.
func firstStation(st []station, test func(along float64) bool) int {
	lo, hi := 0, len(st)
	for lo < hi {
		h := int(uint(lo+hi) >> 1)
		if test(st[h].along) {
			hi = h
		} else {
			lo = h + 1
		}
	}
	return lo
}

// momentRatio is M*/φM_b of a segment for the outer (top) or inner flange
// in compression: the quantity that ranks segments of one part under one
// combination, whose other check inputs are shared.
func momentRatio(c *coldformed.Capacities, mStar, length, cb float64, outer bool) float64 {
	if mStar <= 0 {
		return 0
	}
	mb, _ := c.MemberMoment(length, length, cb, outer)
	mbd := c.MbdBot
	if outer {
		mbd = c.MbdTop
	}
	return mStar / (coldformed.PhiBending * min(mb, mbd))
}

// check runs the AS/NZS 4600:2018 cl. 3.5 beam-column check of one
// segment: the outer flange (Geometry.FlangeMM, "top") in compression for
// sagging (tension inside), the inner for hogging.
func (s *memberSpec) check(in partInputs, mStar, length, cb float64, outer bool) (coldformed.MemberResult, error) {
	return s.checkInto(make([]coldformed.Check, 0, 12), in, mStar, length, cb, outer)
}

// checkInto is check with the result's checks in buf's storage (valid
// until buf is reused).
func (s *memberSpec) checkInto(buf []coldformed.Check, in partInputs, mStar, length, cb float64, outer bool) (coldformed.MemberResult, error) {
	mx := mStar
	if !outer {
		mx = -mStar
	}
	return coldformed.CheckBeamColumnInto(buf, s.cap, coldformed.BeamColumn{
		Compression: coldformed.EffectiveLengths{Lex: in.lex, Ley: s.ley, Lez: s.ley},
		Bending:     coldformed.Segment{Length: max(length, 1), Cb: cb},
	}, coldformed.BeamColumnActions{N: in.n, Mx: mx, V: in.v, MomentAtShear: in.mAtV})
}

// checkedSegment is a governing segment check of one part under one
// combination.
type checkedSegment struct {
	comb, part int
	outer      bool
	res        coldformed.MemberResult
	util       float64
}

// worstSegment checks the most critical segment between the given
// restraints (canonical) of part k under comb for one flange; ok is false
// when no segment has that flange in compression (and, for the outer
// flange, none is checked). The result's check list is in m.checkBuf's
// storage for that flange, valid until the next worstSegment of the flange
// (keep it with checkedSegment.kept).
func (m *frameModel) worstSegment(s *memberSpec, k, comb int, in partInputs, f []analysis.Forces, restraints []float64, outer bool) (checkedSegment, error) {
	best, bestRatio := segment{}, -1.0
	for i := 1; i < len(restraints); i++ {
		a, b := s.toPart(k, restraints[i-1], restraints[i])
		sg := m.segmentOf(k, f, a, b)
		mStar := sg.hog
		if outer {
			mStar = sg.sag
		}
		if r := momentRatio(s.cap, mStar, b-a, sg.cbPos, outer); r > bestRatio {
			best, bestRatio = sg, r
		}
	}
	mStar := best.hog
	if outer {
		mStar = best.sag
	}
	if m.fast {
		if u, ok := s.fastUtilisation(in, mStar, best.to-best.from, best.cbPos, outer); ok {
			return checkedSegment{comb: comb, part: k, outer: outer, util: u}, nil
		}
	}
	buf := &m.checkBuf[flangeIndex(outer)]
	res, err := s.checkInto(*buf, in, mStar, best.to-best.from, best.cbPos, outer)
	if err != nil {
		return checkedSegment{}, err
	}
	*buf = res.Checks
	return checkedSegment{comb: comb, part: k, outer: outer, res: res, util: res.Utilisation()}, nil
}

// flangeIndex numbers the inner (0) and outer (1) flange.
func flangeIndex(outer bool) int {
	if outer {
		return 1
	}
	return 0
}

// kept returns cs with its own copy of the check list (worstSegment's is
// in a reused buffer): the whole list when all is set (a member's
// governing segment in a full check, and every segment of a recorded
// calculation), else the governing check alone, which is all a verdict,
// a utilisation or a failure's reason reads.
func (cs checkedSegment) kept(all bool) checkedSegment {
	switch {
	case cs.res.Checks == nil:
	case all:
		cs.res.Checks = slices.Clone(cs.res.Checks)
	default:
		cs.res.Checks = []coldformed.Check{cs.res.Governing()}
	}
	return cs
}

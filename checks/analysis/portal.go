package analysis

import (
	"errors"
	"fmt"
	"math"
)

// Section holds the properties of a member's section: E (MPa), A (mm²), I (mm⁴, in-plane)
// and mass per metre (kg/m, for self weight).
type Section struct {
	E, A, I    float64
	MassKgPerM float64
}

// Base is the fixity of a portal frame's column bases.
type Base uint8

// Column base fixities.
const (
	PinnedBase Base = iota
	FixedBase
)

func (b Base) String() string {
	if b == FixedBase {
		return "fixed"
	}
	return "pinned"
}

// KneeBrace places a pin-ended knee brace from the column, ColumnMM below the knee, to the
// rafter, RafterMM along the rafter slope from the knee.
type KneeBrace struct {
	ColumnMM, RafterMM float64
}

// PortalSpec describes a symmetric gable portal frame.
type PortalSpec struct {
	SpanMM        float64 // column centreline to centreline
	EavesHeightMM float64 // base to knee
	PitchDeg      float64 // roof pitch, degrees (0 for a flat portal)
	Base          Base
	Column        Section
	Rafter        Section
	KneeBrace     *KneeBrace // nil for none
	KneeBraceSect Section
	// BracesRigid joins knee and apex braces rigidly instead of with pins (the default).
	BracesRigid bool
	// ApexBraceMM places a pin-ended horizontal tie between the rafters, ApexBraceMM along
	// each rafter slope from the apex; 0 for none.
	ApexBraceMM   float64
	ApexBraceSect Section
	PurlinsMM     []float64 // purlin positions along each rafter slope from its eave
	GirtsMM       []float64 // girt heights above the base, on both columns
}

// Part names a physical member of a portal frame, which may span several analysis members.
type Part uint8

// Portal frame parts. Positions along a part run from its start: the left column from its
// base, the left rafter from the left knee, the right rafter from the apex, the right column
// from the right knee. Local y points out of the frame on columns and rafters, so positive
// moment is tension on the inside face.
const (
	LeftColumn Part = iota
	LeftRafter
	RightRafter
	RightColumn
	LeftKneeBrace
	RightKneeBrace
	ApexBrace
	numParts
)

var partNames = [numParts]string{"left column", "left rafter", "right rafter", "right column",
	"left knee brace", "right knee brace", "apex brace"}

func (p Part) String() string {
	if p < numParts {
		return partNames[p]
	}
	return fmt.Sprintf("Part(%d)", uint8(p))
}

// Side is the left or right side of a frame.
type Side uint8

// Frame sides.
const (
	Left Side = iota
	Right
)

// Segment is one analysis member of a part; FromMM is the position of its Start node along
// the part.
type Segment struct {
	Member int
	FromMM float64
}

// Restraint is a purlin or girt position: on Part at AlongMM from the part's start, which is
// AtMM from the Start node of analysis member Member.
type Restraint struct {
	Part    Part
	AlongMM float64
	Member  int
	AtMM    float64
}

// Portal is a built portal frame: the frame, its parts and the restraint positions.
type Portal struct {
	Spec     PortalSpec
	Frame    Frame
	Parts    [numParts][]Segment
	Lengths  [numParts]float64 // mm
	Purlins  []Restraint       // left rafter then right rafter
	Girts    []Restraint       // left column then right column
	Apex     int               // node indices
	Knees    [2]int
	Bases    [2]int
	rise     float64
	cosPitch float64
}

// NewPortal builds the portal frame of spec. Nodes lie only at bases, knees, the apex and
// brace ends; purlins and girts are positions for member loads and restraints.
func NewPortal(spec PortalSpec) (*Portal, error) {
	if err := spec.validate(); err != nil {
		return nil, err
	}
	L, h := spec.SpanMM, spec.EavesHeightMM
	a := spec.PitchDeg * math.Pi / 180
	p := &Portal{Spec: spec, rise: L / 2 * math.Tan(a), cosPitch: math.Cos(a)}
	s := L / 2 / p.cosPitch
	f := &p.Frame
	node := func(x, y float64) int {
		f.Nodes = append(f.Nodes, Node{X: x, Y: y})
		return len(f.Nodes) - 1
	}
	p.Bases = [2]int{node(0, 0), node(L, 0)}
	p.Knees = [2]int{node(0, h), node(L, h)}
	p.Apex = node(L/2, h+p.rise)
	// Intermediate nodes of each part, as positions along the part.
	var colStops, rafStops []float64
	kb := spec.KneeBrace
	if kb != nil {
		colStops = append(colStops, h-kb.ColumnMM)
		rafStops = append(rafStops, kb.RafterMM)
	}
	if spec.ApexBraceMM > 0 {
		rafStops = append(rafStops, s-spec.ApexBraceMM)
	}
	onRafter := func(side Side, d float64) (float64, float64) { // d along the slope from the eave
		x := d * p.cosPitch
		if side == Right {
			x = L - x
		}
		return x, h + d*math.Sin(a)
	}
	var kbCol, kbRaf, abNode [2]int
	braceRel := Pinned
	if spec.BracesRigid {
		braceRel = 0
	}
	for side := Left; side <= Right; side++ {
		x := 0.0
		if side == Right {
			x = L
		}
		col := []int{p.Bases[side]}
		if kb != nil {
			kbCol[side] = node(x, colStops[0])
			col = append(col, kbCol[side])
		}
		col = append(col, p.Knees[side])
		raf := []int{p.Knees[side]}
		for i, d := range rafStops {
			n := node(onRafter(side, d))
			raf = append(raf, n)
			if kb != nil && i == 0 {
				kbRaf[side] = n
			} else {
				abNode[side] = n
			}
		}
		raf = append(raf, p.Apex)
		colPart, rafPart := LeftColumn, LeftRafter
		if side == Right {
			colPart, rafPart = RightColumn, RightRafter
			reverse(col)
			reverse(raf)
		}
		p.chain(colPart, col, spec.Column, 0)
		p.chain(rafPart, raf, spec.Rafter, 0)
		if kb != nil {
			p.chain(LeftKneeBrace+Part(side), []int{kbCol[side], kbRaf[side]}, spec.KneeBraceSect, braceRel)
		}
	}
	if spec.ApexBraceMM > 0 {
		p.chain(ApexBrace, []int{abNode[Left], abNode[Right]}, spec.ApexBraceSect, braceRel)
	}
	sup := PinnedSupport
	if spec.Base == FixedBase {
		sup = FixedSupport
	}
	f.Supports = []Support{sup(p.Bases[Left]), sup(p.Bases[Right])}
	p.restraints()
	return p, nil
}

// chain adds members along nodes as part pt.
func (p *Portal) chain(pt Part, nodes []int, sec Section, rel Release) {
	f := &p.Frame
	along := 0.0
	for i := 0; i+1 < len(nodes); i++ {
		f.Members = append(f.Members, Member{
			Name: fmt.Sprintf("%v %d", pt, i+1), Start: nodes[i], End: nodes[i+1],
			E: sec.E, A: sec.A, I: sec.I, MassKgPerM: sec.MassKgPerM, Release: rel,
		})
		p.Parts[pt] = append(p.Parts[pt], Segment{Member: len(f.Members) - 1, FromMM: along})
		along += length(f.Nodes[nodes[i]], f.Nodes[nodes[i+1]])
	}
	p.Lengths[pt] = along
}

func reverse(s []int) {
	for i, j := 0, len(s)-1; i < j; i, j = i+1, j-1 {
		s[i], s[j] = s[j], s[i]
	}
}

func (p *Portal) restraints() {
	s := p.Lengths[LeftRafter]
	h := p.Spec.EavesHeightMM
	for _, d := range p.Spec.PurlinsMM {
		p.Purlins = append(p.Purlins, p.Restraint(LeftRafter, d))
	}
	for _, d := range p.Spec.PurlinsMM {
		p.Purlins = append(p.Purlins, p.Restraint(RightRafter, s-d))
	}
	for _, y := range p.Spec.GirtsMM {
		p.Girts = append(p.Girts, p.Restraint(LeftColumn, y))
	}
	for _, y := range p.Spec.GirtsMM {
		p.Girts = append(p.Girts, p.Restraint(RightColumn, h-y))
	}
}

// Restraint locates the point AlongMM along part pt on its analysis member.
func (p *Portal) Restraint(pt Part, along float64) Restraint {
	segs := p.Parts[pt]
	i := len(segs) - 1
	for i > 0 && along < segs[i].FromMM {
		i--
	}
	return Restraint{Part: pt, AlongMM: along, Member: segs[i].Member, AtMM: along - segs[i].FromMM}
}

// PartLoad adds to c a uniform load over [from, to] mm along part pt, split over its members.
func (p *Portal) PartLoad(c *LoadCase, pt Part, from, to float64, axes Axes, qx, qy float64, projected bool) {
	from, to = math.Min(from, to), math.Max(from, to)
	segs := p.Parts[pt]
	for i, sg := range segs {
		end := p.Lengths[pt]
		if i+1 < len(segs) {
			end = segs[i+1].FromMM
		}
		a, b := math.Max(from, sg.FromMM), math.Min(to, end)
		if b-a <= 1e-9*p.Lengths[pt] {
			continue
		}
		l := PartialLoad(sg.Member, a-sg.FromMM, b-sg.FromMM, axes, qx, qy)
		l.Projected = projected
		c.Members = append(c.Members, l)
	}
}

// rafterRange maps a horizontal range [x0, x1] from the left eave onto the rafters, calling
// fn with each rafter's part and range along its slope.
func (p *Portal) rafterRange(x0, x1 float64, fn func(pt Part, from, to float64)) {
	x0, x1 = math.Min(x0, x1), math.Max(x0, x1)
	half := p.Spec.SpanMM / 2
	if a, b := math.Max(x0, 0), math.Min(x1, half); b > a {
		fn(LeftRafter, a/p.cosPitch, b/p.cosPitch)
	}
	if a, b := math.Max(x0, half), math.Min(x1, 2*half); b > a {
		fn(RightRafter, (a-half)/p.cosPitch, (b-half)/p.cosPitch)
	}
}

// RoofPressure adds to c a line load q (N/mm, pressure × frame spacing) normal to the roof,
// positive toward the roof surface (downward), over the horizontal range [x0, x1] mm from
// the left eave. Use it for wind zones; give x measured from the windward eave by mirroring
// (x → Span − x) for wind from the right.
func (p *Portal) RoofPressure(c *LoadCase, x0, x1, q float64) {
	p.rafterRange(x0, x1, func(pt Part, a, b float64) { p.PartLoad(c, pt, a, b, LocalAxes, 0, -q, false) })
}

// RoofGravity adds to c a vertical line load w (N/mm per horizontal mm, positive downward)
// over the horizontal range [x0, x1] mm from the left eave.
func (p *Portal) RoofGravity(c *LoadCase, x0, x1, w float64) {
	p.rafterRange(x0, x1, func(pt Part, a, b float64) { p.PartLoad(c, pt, a, b, GlobalAxes, 0, -w, true) })
}

// WallPressure adds to c a horizontal line load q (N/mm) on the column of side, positive
// toward the wall surface (inward), over heights [y0, y1] mm above the base.
func (p *Portal) WallPressure(c *LoadCase, side Side, y0, y1, q float64) {
	if side == Left {
		p.PartLoad(c, LeftColumn, y0, y1, LocalAxes, 0, -q, false)
		return
	}
	h := p.Spec.EavesHeightMM
	p.PartLoad(c, RightColumn, h-y1, h-y0, LocalAxes, 0, -q, false)
}

// PointLoadAt adds to c a point load (px, py) N in axes at restraint r (a purlin or girt).
func (p *Portal) PointLoadAt(c *LoadCase, r Restraint, axes Axes, px, py float64) {
	c.Members = append(c.Members, PointLoad(r.Member, r.AtMM, axes, px, py))
}

// Extremes returns the extremes of part pt's internal forces under comb; positions are along
// the part.
func (p *Portal) Extremes(s *Solution, comb Combination, pt Part) Extremes {
	var e Extremes
	for i, sg := range p.Parts[pt] {
		se := s.Extremes(comb, sg.Member)
		for _, x := range [...]*Extreme{&se.MaxN, &se.MinN, &se.MaxV, &se.MinV, &se.MaxM, &se.MinM} {
			x.X += sg.FromMM
		}
		if i == 0 {
			e = se
			continue
		}
		keep := func(hi, lo *Extreme, h, l Extreme) {
			if h.Value > hi.Value {
				*hi = h
			}
			if l.Value < lo.Value {
				*lo = l
			}
		}
		keep(&e.MaxN, &e.MinN, se.MaxN, se.MinN)
		keep(&e.MaxV, &e.MinV, se.MaxV, se.MinV)
		keep(&e.MaxM, &e.MinM, se.MaxM, se.MinM)
	}
	return e
}

// Diagram fills d with part pt's internal force diagram under comb, positions along the part,
// with about stations stations per analysis member. At a joint both members' values appear.
func (p *Portal) Diagram(s *Solution, comb Combination, pt Part, stations int, d *Diagram) {
	d.X, d.N, d.V, d.M = d.X[:0], d.N[:0], d.V[:0], d.M[:0]
	seg := &s.w.seg
	for _, sg := range p.Parts[pt] {
		s.Diagram(comb, sg.Member, stations, seg)
		for i, x := range seg.X {
			d.append(x+sg.FromMM, Forces{N: seg.N[i], V: seg.V[i], M: seg.M[i]})
		}
	}
}

// ForcesAt returns part pt's internal forces at along mm from its start under comb.
func (p *Portal) ForcesAt(s *Solution, comb Combination, pt Part, along float64) Forces {
	r := p.Restraint(pt, along)
	return s.At(comb, r.Member, r.AtMM, false)
}

func (spec *PortalSpec) validate() error {
	var errs []error
	bad := func(field string, v float64, want string) {
		errs = append(errs, fmt.Errorf("portal: %s = %g, want %s", field, v, want))
	}
	if !(spec.SpanMM > 0) {
		bad("SpanMM", spec.SpanMM, "> 0")
	}
	if !(spec.EavesHeightMM > 0) {
		bad("EavesHeightMM", spec.EavesHeightMM, "> 0")
	}
	if !(spec.PitchDeg >= 0 && spec.PitchDeg < 60) {
		bad("PitchDeg", spec.PitchDeg, "in [0, 60)")
	}
	s := spec.SpanMM / 2 / math.Cos(spec.PitchDeg*math.Pi/180)
	if kb := spec.KneeBrace; kb != nil {
		if !(kb.ColumnMM > 0 && kb.ColumnMM < spec.EavesHeightMM) {
			bad("KneeBrace.ColumnMM", kb.ColumnMM, fmt.Sprintf("in (0, %g)", spec.EavesHeightMM))
		}
		if !(kb.RafterMM > 0 && kb.RafterMM < s-spec.ApexBraceMM) {
			bad("KneeBrace.RafterMM", kb.RafterMM, fmt.Sprintf("in (0, %g)", s-spec.ApexBraceMM))
		}
	}
	if !(spec.ApexBraceMM >= 0 && spec.ApexBraceMM < s) {
		bad("ApexBraceMM", spec.ApexBraceMM, fmt.Sprintf("in [0, %g)", s))
	}
	for i, d := range spec.PurlinsMM {
		if !(d >= 0 && d <= s) {
			bad(fmt.Sprintf("PurlinsMM[%d]", i), d, fmt.Sprintf("in [0, %g]", s))
		}
	}
	for i, y := range spec.GirtsMM {
		if !(y >= 0 && y <= spec.EavesHeightMM) {
			bad(fmt.Sprintf("GirtsMM[%d]", i), y, fmt.Sprintf("in [0, %g]", spec.EavesHeightMM))
		}
	}
	return errors.Join(errs...)
}

// DeflectionAt returns part pt's displacement at along mm from its start under comb.
func (p *Portal) DeflectionAt(s *Solution, comb Combination, pt Part, along float64) Deflection {
	r := p.Restraint(pt, along)
	return s.DeflectionAt(comb, r.Member, r.AtMM)
}

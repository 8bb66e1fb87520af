package coldformed

import (
	"fmt"

	"github.com/spansweep/spansweep/catalog"
)

// SpanType is how a purlin or girt line spans between frames.
type SpanType int

// Span types.
const (
	SpanSimple     SpanType = iota + 1 // single spans
	SpanContinuous                     // continuous over supports
	SpanLapped                         // lapped over supports (continuous for the R factor)
)

func (s SpanType) String() string {
	switch s {
	case SpanSimple:
		return "simple"
	case SpanContinuous:
		return "continuous"
	case SpanLapped:
		return "lapped"
	}
	return fmt.Sprintf("SpanType(%d)", int(s))
}

// Purlin is a purlin or girt with its top flange (Geometry.FlangeMM)
// through-fastened to sheeting. The fastened flange is restrained laterally
// and rotationally by the sheeting; the free flange is restrained only at
// supports and at bridging rows.
//
// Bridging: for outward load the capacity is the larger of the R-factor
// method (cl. 3.3.3.4, which applies over the span irrespective of bridging)
// and lateral-torsional buckling (cl. 3.3.3.2) between restraints spaced
// Span/(BridgingRows+1), capped by distortional buckling (cl. 3.3.3.3). The
// LTB alternative ignores the sheeting's restraint, a conservative bound.
type Purlin struct {
	Span         float64 // mm between support centres, > 0
	SpanType     SpanType
	BridgingRows int // rows per span, equally spaced, ≥ 0
	// EndBearing and InteriorBearing describe the supports for web
	// bearing; their Length must be > 0 where the matching reaction is.
	EndBearing, InteriorBearing Bearing
}

// PurlinActions are one combination's design actions on a purlin line,
// magnitudes in N and N·mm.
type PurlinActions struct {
	// FastenedFlangeMoment is the largest moment compressing the fastened
	// flange (sagging under inward load, hogging at supports under outward).
	FastenedFlangeMoment float64
	// FreeFlangeMoment is the largest moment compressing the free flange.
	FreeFlangeMoment float64
	// FreeFlangeCb is C_b of the free flange's critical segment; default 1.
	FreeFlangeCb float64
	// Outward says the load is outward (uplift/suction), so the R-factor
	// method of cl. 3.3.3.4 applies to the free flange.
	Outward bool
	// Shear is the largest shear and MomentAtShear the moment coincident
	// with it (for cl. 3.3.5); the default of MomentAtShear is zero.
	Shear, MomentAtShear float64
	// EndReaction and InteriorReaction are the largest support reactions.
	EndReaction, InteriorReaction float64
}

func (p Purlin) validate(v *validator) {
	v.positive("Purlin.Span", p.Span)
	if p.SpanType < SpanSimple || p.SpanType > SpanLapped {
		v.add("Purlin.SpanType = %d, want simple, continuous or lapped", int(p.SpanType))
	}
	if p.BridgingRows < 0 {
		v.add("Purlin.BridgingRows = %d, want ≥ 0", p.BridgingRows)
	}
}

func (a PurlinActions) validate(v *validator) {
	v.nonNegative("PurlinActions.FastenedFlangeMoment", a.FastenedFlangeMoment)
	v.nonNegative("PurlinActions.FreeFlangeMoment", a.FreeFlangeMoment)
	v.nonNegative("PurlinActions.FreeFlangeCb", a.FreeFlangeCb)
	v.nonNegative("PurlinActions.Shear", a.Shear)
	v.nonNegative("PurlinActions.MomentAtShear", a.MomentAtShear)
	v.nonNegative("PurlinActions.EndReaction", a.EndReaction)
	v.nonNegative("PurlinActions.InteriorReaction", a.InteriorReaction)
}

// RFactor is the reduction factor R of AS/NZS 4600:2018 cl. 3.3.3.4 for a
// C or Z purlin with one flange through-fastened, or 0 where the clause does
// not apply (from memory: REFERENCE-VALUES §5.8, low confidence on the
// limits): d ≤ 292 mm, 60 ≤ d/t ≤ 170, 2.8 ≤ d/b ≤ 4.5 (b the flange's
// outside width), 16 ≤ w/t ≤ 43 (w the flange's flat width), lipped
// flanges, span ≤ 10 m.
func RFactor(sec *catalog.Section, span float64, st SpanType) float64 {
	g := sec.Geometry
	d, t, b := g.DepthMM, g.ThicknessMM, g.FlangeMM
	if sec.Shape != catalog.ShapeC && sec.Shape != catalog.ShapeZ {
		return 0
	}
	inRange := func(x, lo, hi float64) bool { return x >= lo && x <= hi }
	if g.LipMM <= 0 || d > 292 || span > 10000 || !inRange(d/t, 60, 170) || !inRange(d/b, 2.8, 4.5) {
		return 0
	}
	if f, err := newFlats(g, sec.Shape); err != nil || !inRange(f.top/t, 16, 43) {
		return 0
	}
	isZ := sec.Shape == catalog.ShapeZ
	if st != SpanSimple {
		if isZ {
			return 0.70
		}
		return 0.60
	}
	switch {
	case d <= 165:
		return 0.70
	case d <= 216:
		return 0.65
	case isZ:
		return 0.50
	default:
		return 0.40
	}
}

// CheckPurlin checks a purlin or girt with one flange through-fastened under
// one combination's actions.
func CheckPurlin(c *Capacities, p Purlin, a PurlinActions) (MemberResult, error) {
	return CheckPurlinInto(make([]Check, 0, 9), c, p, a)
}

// CheckPurlinInto is CheckPurlin with the result's checks stored in buf's
// storage (from buf[:0], growing it if needed), for searches that check
// many candidates and keep few results: the result is valid until buf is
// reused. The checks are the same as CheckPurlin's.
func CheckPurlinInto(buf []Check, c *Capacities, p Purlin, a PurlinActions) (MemberResult, error) {
	r := MemberResult{Designation: c.Section.Designation}
	var v validator
	if !isFlexural(c.Section.Shape) {
		v.add("section %s is a %s, which carries tension only", c.Section.Designation, shapeName(c.Section.Shape))
	}
	p.validate(&v)
	a.validate(&v)
	if err := v.err(); err != nil {
		return r, fmt.Errorf("purlin %s: %w", c.Section.Designation, err)
	}
	r.Checks = buf[:0]
	// Fastened (top) flange in compression: restrained by the sheeting, so
	// section capacity (cl. 3.3.2) and distortional buckling (cl. 3.3.3.3).
	r.Checks = append(r.Checks, c.sectionMomentCheck(a.FastenedFlangeMoment, true),
		c.distortionalCheck(a.FastenedFlangeMoment, true))
	// Free (bottom) flange in compression.
	seg := Segment{Length: p.Span / float64(p.BridgingRows+1), Cb: a.FreeFlangeCb}
	r.Checks = append(r.Checks, c.sectionMomentCheck(a.FreeFlangeMoment, false))
	member := c.ltbCheck(a.FreeFlangeMoment, seg, false)
	if d := c.distortionalCheck(a.FreeFlangeMoment, false); d.CapacityValue < member.CapacityValue {
		member = d // LTB capped by distortional buckling
	}
	if R := RFactor(&c.Section, p.Span, p.SpanType); a.Outward && R > 0 && R*PhiBending*c.MsBot > member.CapacityValue {
		// AS/NZS 4600:2018 cl. 3.3.3.4: M_b = R Z_e f_y (from memory).
		member = newCheck("3.3.3.4", "member moment capacity, through-fastened purlin (R factor), bottom flange in compression",
			LimitStability, a.FreeFlangeMoment, R*PhiBending*c.MsBot, "N·mm", Input{InR, R}, Input{InSpan, p.Span},
			Input{InBridgingRows, float64(p.BridgingRows)})
	}
	r.Checks = append(r.Checks, member)
	r.Checks = c.appendShearChecks(r.Checks, a.Shear, a.MomentAtShear)
	for _, s := range []struct {
		reaction float64
		b        Bearing
		interior bool
	}{{a.EndReaction, p.EndBearing, false}, {a.InteriorReaction, p.InteriorBearing, true}} {
		if s.reaction == 0 {
			continue
		}
		s.b.Interior = s.interior
		ch, err := c.webBearingCheck(s.reaction, s.b)
		if err != nil {
			return r, fmt.Errorf("purlin %s: %w", c.Section.Designation, err)
		}
		r.Checks = append(r.Checks, ch)
	}
	return r, nil
}

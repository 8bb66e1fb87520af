package coldformed

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/catalog"
)

// Bearing describes a support or concentrated load on a web for web
// bearing (web crippling), AS/NZS 4600:2018 cl. 3.3.6.
type Bearing struct {
	Length    float64 // bearing length l_b (mm), > 0
	Interior  bool    // interior (else end) reaction or load
	TwoFlange bool    // load on both flanges (else one flange)
	Fastened  bool    // flanges fastened to the support
}

type crippling struct{ C, CR, CN, Ch, Phi float64 }

type bearingKey struct{ fastened, twoFlange, interior bool }

// Unified web-crippling coefficients, single-web C-sections with stiffened
// flanges (REFERENCE-VALUES §5.7; confirmed: S8, AISI S100-16 Table G5-2,
// which AS/NZS 4600 adopts — from memory).
var cripplingC = map[bearingKey]crippling{
	{true, false, false}:  {4, 0.14, 0.35, 0.02, 0.85},
	{true, false, true}:   {13, 0.23, 0.14, 0.01, 0.90},
	{true, true, false}:   {7.5, 0.08, 0.12, 0.048, 0.85},
	{true, true, true}:    {20, 0.10, 0.08, 0.031, 0.85},
	{false, false, false}: {4, 0.14, 0.35, 0.02, 0.80},
	{false, false, true}:  {13, 0.23, 0.14, 0.01, 0.90},
}

// Z-sections differ in three rows (confirmed: S8, Table G5-3).
var cripplingZ = map[bearingKey]crippling{
	{true, true, false}:   {9, 0.05, 0.16, 0.052, 0.85},
	{true, true, true}:    {24, 0.07, 0.07, 0.04, 0.80},
	{false, false, false}: {5, 0.09, 0.02, 0.001, 0.85},
}

func cripplingCoefficients(shape catalog.Shape, b Bearing) (crippling, bool) {
	k := bearingKey{b.Fastened, b.TwoFlange, b.Interior}
	if shape == catalog.ShapeZ {
		if co, ok := cripplingZ[k]; ok {
			return co, true
		}
	}
	co, ok := cripplingC[k]
	return co, ok
}

// WebBearing is the design capacity φ_w R_b (N) of the section's webs:
// R_b = C t² f_y sin θ (1 − C_R√(r_i/t))(1 + C_N√(l_b/t))(1 − C_h√(d1/t)),
// θ = 90°, AS/NZS 4600:2018 cl. 3.3.6 (from memory; REFERENCE-VALUES §5.7).
// A 2C counts two webs, each as a single C (a simplification, not the
// standard's built-up-section row).
func (c *Capacities) WebBearing(b Bearing) (float64, error) {
	if !isFlexural(c.Section.Shape) {
		return 0, fmt.Errorf("web bearing: section %s is a %s: %w", c.Section.Designation, shapeName(c.Section.Shape), ErrInput)
	}
	var v validator
	v.positive("Bearing.Length", b.Length)
	if err := v.err(); err != nil {
		return 0, err
	}
	co, ok := cripplingCoefficients(c.Section.Shape, b)
	if !ok {
		return 0, fmt.Errorf("web bearing: no coefficients for an unfastened two-flange load: %w", ErrInput)
	}
	g := c.Section.Geometry
	t := g.ThicknessMM
	rb := co.C * t * t * c.Section.FyMPa *
		(1 - co.CR*math.Sqrt(g.InnerRadiusMM/t)) *
		(1 + co.CN*math.Sqrt(b.Length/t)) *
		(1 - co.Ch*math.Sqrt(c.WebFlat/t))
	return co.Phi * math.Max(rb, 0) * c.Webs, nil
}

func (c *Capacities) webBearingCheck(rStar float64, b Bearing) (Check, error) {
	cap, err := c.WebBearing(b)
	if err != nil {
		return Check{}, err
	}
	name := "web bearing, end"
	if b.Interior {
		name = "web bearing, interior"
	}
	return newCheck("3.3.6", name, LimitStrength, rStar, cap, "N",
		Input{InLb, b.Length}, Input{InD1, c.WebFlat}), nil
}

// CheckWebBearing checks a support reaction or concentrated load rStar (N)
// on the section's webs, AS/NZS 4600:2018 cl. 3.3.6 (for example a hoist
// load on a rafter).
func CheckWebBearing(c *Capacities, b Bearing, rStar float64) (Check, error) {
	var v validator
	v.nonNegative("reaction R*", rStar)
	if err := v.err(); err != nil {
		return Check{}, fmt.Errorf("web bearing %s: %w", c.Section.Designation, err)
	}
	ch, err := c.webBearingCheck(rStar, b)
	if err != nil {
		return Check{}, fmt.Errorf("web bearing %s: %w", c.Section.Designation, err)
	}
	return ch, nil
}

package footing

import (
	"fmt"
	"math"
)

// Options are the pad sizing settings. A nil *Options, or a zero field,
// means the documented default of that field.
type Options struct {
	// MinWidthM is the smallest pad width tried. Default 0.45 m (common practice, no source).
	MinWidthM float64
	// MaxWidthM is the largest pad width tried; beyond it the base has no
	// solution. Default 3.0 m (common practice, no source).
	MaxWidthM float64
	// WidthStepM is the width increment. Default 0.05 m.
	WidthStepM float64
	// MinDepthM is the shallowest concrete depth tried. Default 0.6 m (common practice, no source).
	MinDepthM float64
	// MaxDepthM is the deepest concrete depth tried. Default 1.5 m (common practice, no source).
	MaxDepthM float64
	// DepthStepM is the depth increment. Default 0.1 m.
	DepthStepM float64

	// ConcreteUnitWeightKNm3 is the pad's unit weight. Default 24 kN/m³
	// (reinforced concrete, from memory of AS/NZS 1170.1:2002 Appendix A).
	ConcreteUnitWeightKNm3 float64

	// IncludeSoil counts the soil prism over the pad against uplift,
	// sliding and overturning. Default false. Soil over the pad always
	// loads the bearing check, whatever this says.
	IncludeSoil bool
	// SoilUnitWeightKNm3 is the backfill's unit weight. Default 18 kN/m³
	// (common practice, no source).
	SoilUnitWeightKNm3 float64

	slidingName string // set by resolved
	// SoilCoverM is the depth of soil over the top of the pad. Default 0
	// (pad cast to ground level).
	SoilCoverM float64

	// AllowableBearingKPa is the allowable gross bearing pressure at SLS.
	// Default 100 kPa (common practice, no source); a site investigation
	// (AS 2870 / AS 1726 site classification) must confirm it.
	AllowableBearingKPa float64

	// FrictionCoefficient μ between pad and soil for sliding. Default 0.3
	// (common practice, no source).
	FrictionCoefficient float64
	// IncludePassive adds the passive resistance of the soil against the
	// pad's face to sliding. Default false (ignored).
	IncludePassive bool
	// SoilFrictionAngleDeg φ' for the Rankine passive coefficient. Default
	// 30° (common practice, no source).
	SoilFrictionAngleDeg float64
	// PassiveFactor reduces the full Rankine passive force for the movement
	// it needs. Default 0.5 (common practice, no source).
	PassiveFactor float64
}

// DefaultOptions returns the documented defaults.
func DefaultOptions() Options {
	return Options{
		MinWidthM: 0.45, MaxWidthM: 3.0, WidthStepM: 0.05,
		MinDepthM: 0.6, MaxDepthM: 1.5, DepthStepM: 0.1,
		ConcreteUnitWeightKNm3: 24,
		SoilUnitWeightKNm3:     18,
		AllowableBearingKPa:    100,
		FrictionCoefficient:    0.3,
		SoilFrictionAngleDeg:   30,
		PassiveFactor:          0.5,
	}
}

// resolved returns o with zero fields replaced by defaults, after checking
// every field; a nil o is all defaults.
func (o *Options) resolved() (Options, error) {
	d := DefaultOptions()
	if o == nil {
		d.slidingName = slidingName(d)
		return d, nil
	}
	r := *o
	var errs fieldErrors
	for _, f := range []struct {
		name    string
		v       *float64
		def     float64
		allowed string
	}{
		{"MinWidthM", &r.MinWidthM, d.MinWidthM, "a width > 0 m"},
		{"MaxWidthM", &r.MaxWidthM, d.MaxWidthM, "a width > 0 m"},
		{"WidthStepM", &r.WidthStepM, d.WidthStepM, "a step > 0 m"},
		{"MinDepthM", &r.MinDepthM, d.MinDepthM, "a depth > 0 m"},
		{"MaxDepthM", &r.MaxDepthM, d.MaxDepthM, "a depth > 0 m"},
		{"DepthStepM", &r.DepthStepM, d.DepthStepM, "a step > 0 m"},
		{"ConcreteUnitWeightKNm3", &r.ConcreteUnitWeightKNm3, d.ConcreteUnitWeightKNm3, "a unit weight > 0 kN/m³"},
		{"SoilUnitWeightKNm3", &r.SoilUnitWeightKNm3, d.SoilUnitWeightKNm3, "a unit weight > 0 kN/m³"},
		{"SoilCoverM", &r.SoilCoverM, 0, "a depth ≥ 0 m"},
		{"AllowableBearingKPa", &r.AllowableBearingKPa, d.AllowableBearingKPa, "a pressure > 0 kPa"},
		{"FrictionCoefficient", &r.FrictionCoefficient, d.FrictionCoefficient, "a coefficient in (0, 1.5]"},
		{"SoilFrictionAngleDeg", &r.SoilFrictionAngleDeg, d.SoilFrictionAngleDeg, "an angle in (0°, 50°]"},
		{"PassiveFactor", &r.PassiveFactor, d.PassiveFactor, "a factor in (0, 1]"},
	} {
		if math.IsNaN(*f.v) || math.IsInf(*f.v, 0) || *f.v < 0 {
			errs.add("Options."+f.name, fmt.Sprint(*f.v), f.allowed)
			continue
		}
		if *f.v == 0 {
			*f.v = f.def
		}
	}
	if len(errs) == 0 {
		r.checkRanges(&errs)
	}
	r.slidingName = slidingName(r)
	return r, errs.err("footing options")
}

// slidingName names the sliding check once per options, off the search's
// hot path.
func slidingName(o Options) string {
	name := fmt.Sprintf("sliding (friction mu=%.3g, common practice)", o.FrictionCoefficient)
	if o.IncludePassive {
		name += " + passive"
	}
	return name
}

// checkRanges reports bounds that are individually valid but inconsistent.
func (r Options) checkRanges(errs *fieldErrors) {
	if r.MaxWidthM < r.MinWidthM {
		errs.add("Options.MaxWidthM", fmt.Sprint(r.MaxWidthM), fmt.Sprintf("≥ MinWidthM (%g m)", r.MinWidthM))
	}
	if r.MaxDepthM < r.MinDepthM {
		errs.add("Options.MaxDepthM", fmt.Sprint(r.MaxDepthM), fmt.Sprintf("≥ MinDepthM (%g m)", r.MinDepthM))
	}
	if r.FrictionCoefficient > 1.5 {
		errs.add("Options.FrictionCoefficient", fmt.Sprint(r.FrictionCoefficient), "a coefficient in (0, 1.5]")
	}
	if r.SoilFrictionAngleDeg > 50 {
		errs.add("Options.SoilFrictionAngleDeg", fmt.Sprint(r.SoilFrictionAngleDeg), "an angle in (0°, 50°]")
	}
	if r.PassiveFactor > 1 {
		errs.add("Options.PassiveFactor", fmt.Sprint(r.PassiveFactor), "a factor in (0, 1]")
	}
}

// steps returns lo, lo+step, ... ≤ hi, computed by index so the values do
// not drift, rounded to 1 µm.
func steps(lo, hi, step float64) []float64 {
	n := int(math.Floor((hi-lo)/step + 1e-9))
	out := make([]float64, 0, n+1)
	for i := 0; i <= n; i++ {
		out = append(out, math.Round((lo+float64(i)*step)*1e6)/1e6)
	}
	return out
}

package footing

import (
	"fmt"
	"math"
)

// Reaction is one named load combination's reaction at a column base, as
// the column applies it to the footing.
type Reaction struct {
	// Combination names the load combination, e.g. "0.9G+Wu (cross, Cpi+0.2)".
	Combination string
	// VerticalKN is positive DOWN (compression onto the pad); negative is uplift.
	VerticalKN float64
	// ShearKN is the horizontal force at the base; either sign.
	ShearKN float64
	// MomentKNm is the base moment (fixed bases); either sign; 0 for pins.
	MomentKNm float64
}

// Base is one column base with its reaction envelopes: the ULS
// combinations for uplift, sliding, overturning and bolts, and the SLS
// combinations for bearing.
type Base struct {
	Name string
	ULS  []Reaction
	SLS  []Reaction
}

// Validate reports every bad field of b in one error (nil when b is usable).
func (b Base) Validate() error {
	var errs fieldErrors
	if len(b.ULS) == 0 {
		errs.add("ULS", "none", "at least one ULS combination")
	}
	if len(b.SLS) == 0 {
		errs.add("SLS", "none", "at least one SLS combination")
	}
	for i, r := range b.ULS {
		r.validate(fmt.Sprintf("ULS[%d]", i), &errs)
	}
	for i, r := range b.SLS {
		r.validate(fmt.Sprintf("SLS[%d]", i), &errs)
	}
	return errs.err("base " + b.Name)
}

func (r Reaction) validate(path string, errs *fieldErrors) {
	if r.Combination == "" {
		errs.add(path+".Combination", `""`, "a combination name")
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"VerticalKN", r.VerticalKN}, {"ShearKN", r.ShearKN}, {"MomentKNm", r.MomentKNm}} {
		if math.IsNaN(f.v) || math.IsInf(f.v, 0) {
			errs.add(path+"."+f.name, fmt.Sprint(f.v), "a finite number")
		}
	}
}

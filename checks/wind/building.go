package wind

import (
	"errors"
	"fmt"
	"math"
)

// MaxPitchDeg is the steepest roof pitch the coefficient tables here cover
// (AS/NZS 1170.2:2021 Tables 5.2(B), 5.3(B), 5.3(C) rows up to 35°).
const MaxPitchDeg = 35

// Building is an enclosed, symmetric gable (duopitch) shed.
type Building struct {
	SpanM       float64 // across the ridge, column centrelines
	LengthM     float64 // along the ridge
	EaveHeightM float64
	PitchDeg    float64 // roof pitch, 0 ≤ α ≤ 35°
	BaySpacingM float64 // frame spacing for the frame's tributary area (K_a); 0 means K_a = 1
}

// Validate reports every bad field of the building in one error.
func (b Building) Validate() error {
	var errs []error
	pos := func(name string, v float64) {
		if !(v > 0) || math.IsInf(v, 0) {
			errs = append(errs, fmt.Errorf("%s %g m: must be positive", name, v))
		}
	}
	pos("span", b.SpanM)
	pos("length", b.LengthM)
	pos("eave height", b.EaveHeightM)
	if !(b.PitchDeg >= 0 && b.PitchDeg <= MaxPitchDeg) {
		errs = append(errs, fmt.Errorf("roof pitch %g°: allowed 0–%d° (range of AS/NZS 1170.2:2021 Tables 5.3(A)–(C) implemented)", b.PitchDeg, MaxPitchDeg))
	}
	if !(b.BaySpacingM >= 0) || b.BaySpacingM > b.LengthM {
		errs = append(errs, fmt.Errorf("bay spacing %g m: allowed 0 (K_a = 1) up to the length", b.BaySpacingM))
	}
	if len(errs) == 0 && b.ReferenceHeightM() > MaxReferenceHeightM {
		errs = append(errs, fmt.Errorf("average roof height %.2f m: allowed ≤ %d m", b.ReferenceHeightM(), MaxReferenceHeightM))
	}
	return errors.Join(errs...)
}

// RiseM is the ridge height above the eaves.
func (b Building) RiseM() float64 {
	return b.SpanM / 2 * math.Tan(b.PitchDeg*math.Pi/180)
}

// ReferenceHeightM is h, the average roof height: eaves plus half the rise.
// AS/NZS 1170.2:2021 Section 2 (cl. 2.5, Figure 2.1; clause number from
// memory) takes h as the average roof height and allows the eaves height for
// pitches below 10°; the average height is used for every pitch, which is
// never lower and so never unconservative. The same h is the height z for
// M_z,cat and the h of the h/d ratios and zone widths of Section 5.
func (b Building) ReferenceHeightM() float64 { return b.EaveHeightM + b.RiseM()/2 }

// volumeM3 is the enclosed volume, for K_v.
func (b Building) volumeM3() float64 {
	return b.SpanM * b.LengthM * (b.EaveHeightM + b.RiseM()/2)
}

// LocalPressureDimensionM returns the dimension a of AS/NZS 1170.2:2021
// cl. 5.4.4 for walls, a = min(0.2b, 0.2d, h), and for roofs,
// a = min(0.2b, 0.2d) where h/b or h/d ≥ 0.2, else 2h (confirmed: S2's
// reading of the 2021 edition; unverified). b and d are the plan sides, so a
// does not depend on the wind direction.
func (b Building) LocalPressureDimensionM() (wallM, roofM float64) {
	h := b.ReferenceHeightM()
	short := min(b.SpanM, b.LengthM)
	wallM = min(0.2*short, h)
	roofM = 0.2 * short
	if h/b.SpanM < 0.2 && h/b.LengthM < 0.2 {
		roofM = 2 * h
	}
	return wallM, roofM
}

package wind_test

import (
	"fmt"

	"github.com/spansweep/spansweep/checks/wind"
)

// Example derives the wind on an illustrative 12 × 30 m shed, 4 m eaves,
// 5° pitch, 6 m bays, in AS 4055 class N3, and reads the crosswind roof
// zones a frame loader would apply (plan distance from the windward eave).
func Example() {
	b := wind.Building{SpanM: 12, LengthM: 30, EaveHeightM: 4, PitchDeg: 5, BaySpacingM: 6}
	sp, err := wind.N3.Speeds(b.ReferenceHeightM())
	if err != nil {
		fmt.Println(err)
		return
	}
	l, err := wind.Derive(b, wind.Enclosure{}, sp)
	if err != nil {
		fmt.Println(err)
		return
	}
	c := l.Cases[1] // crosswind, roof max suction, sealed C_p,i 0.0
	fmt.Println(c.Name)
	for _, k := range []wind.SurfaceKind{wind.RoofUpwind, wind.RoofDownwind} {
		for _, z := range c.Surface(k).Zones {
			fmt.Printf("%s %.4g–%.4g m: Cpe %.4g, %.4g kPa\n", k, z.FromM, z.ToM, z.Cpe, z.PressureULSKPa)
		}
	}
	fmt.Printf("purlins: outward %.4g kPa, edge %.4g kPa\n", l.Purlins.GeneralOutward.ULSKPa, l.Purlins.EdgeOutward.ULSKPa)
	// Output:
	// crosswind, roof max suction, sealed Cpi +0.00
	// roof upwind slope 0–4.262 m: Cpe -0.9, -1.08 kPa
	// roof upwind slope 4.262–6 m: Cpe -0.5, -0.6 kPa
	// roof downwind slope 6–8.525 m: Cpe -0.5, -0.6 kPa
	// roof downwind slope 8.525–12 m: Cpe -0.3, -0.36 kPa
	// purlins: outward -1.35 kPa, edge -2.025 kPa
}

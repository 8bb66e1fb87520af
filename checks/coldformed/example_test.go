package coldformed

import "fmt"

// A lapped C200 purlin (illustrative dimensions, 200 × 75 × 18 × 1.9 mm,
// G450) under one outward combination: capacities once, checks per case.
func ExampleCheckPurlin() {
	caps, err := SectionCapacities(sharpC(200, 75, 18, 1.9, 5, 450, 480))
	if err != nil {
		fmt.Println(err)
		return
	}
	p := Purlin{Span: 6000, SpanType: SpanLapped, BridgingRows: 1,
		EndBearing: Bearing{Length: 50, Fastened: true}, InteriorBearing: Bearing{Length: 50, Fastened: true}}
	a := PurlinActions{FreeFlangeMoment: 5.5e6, FastenedFlangeMoment: 4e6, Outward: true,
		Shear: 6000, MomentAtShear: 4e6, EndReaction: 5000, InteriorReaction: 11000}
	r, err := CheckPurlin(&caps, p, a)
	if err != nil {
		fmt.Println(err)
		return
	}
	r.SetCombination("0.9G+Wu")
	g := r.Governing()
	fmt.Printf("%d checks; governing %s cl. %s, %s: utilisation %.4g\n", len(r.Checks), g.Combination, g.Clause, g.Name, g.Utilisation)
	// Output:
	// 8 checks; governing 0.9G+Wu cl. 3.3.3.2, member moment capacity, lateral-torsional buckling, bottom flange in compression: utilisation 0.6093
}

package grids_test

import (
	"fmt"

	"github.com/spansweep/spansweep/grids"
)

func ExampleParse() {
	file := `[geometry]
span_m = {from = 6.0, to = 9.0, step = 3.0}
bays = [3]
bay_spacing_m = [3.0]
eaves_height_m = [3.0]
roof_pitch_deg = [10]
[wind]
housing_classes = ["N2"]
`
	g, err := grids.Parse([]byte(file), "example.toml")
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(g.Count(), "cases")
	for c := range g.Cases() {
		fmt.Printf("%d %s span %.4g m length %.4g m\n", c.Index, c.WindCondition(), c.SpanM, c.LengthM)
	}
	// Output:
	// 2 cases
	// 0 N2 span 6 m length 9 m
	// 1 N2 span 9 m length 9 m
}

func ExampleValidationError() {
	file := `[geometry]
span_m = [-6.0]
length_m = [12.0]
eaves_height_m = [3.0]
roof_pitch_deg = [10]
[wind]
housing_classes = ["N9"]
`
	_, err := grids.Parse([]byte(file), "bad.toml")
	if ve, ok := err.(*grids.ValidationError); ok {
		for _, p := range ve.Problems {
			fmt.Println(p)
		}
	}
	// Output:
	// bad.toml:2: geometry.span_m = -6: allowed 3 ≤ value ≤ 40
	// bad.toml:7: wind.housing_classes = "N9": allowed N1 … N6, C1 … C4
}

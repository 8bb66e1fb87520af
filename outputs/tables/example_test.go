package tables_test

import (
	"fmt"
	"os"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/tables"
)

// Build a one-cell table from a hand-made result and print it as the
// README excerpt. The sections and masses are illustrative.
func ExampleAccumulator() {
	acc := tables.NewAccumulator(tables.Options{})
	r := &optimize.Result{
		Case: grids.Case{ID: "demo", SpanM: 12, LengthM: 24, Bays: 4, BaySpacingM: 6,
			EavesHeightM: 3.6, RoofPitchDeg: 10, Wind: grids.Wind{HousingClass: "N3"}, Base: grids.BasePinned},
		SteelMassKg: 2345.6,
		Members: []optimize.MemberGroup{
			{Role: optimize.RolePurlin, Designation: "Z200x1.9", SpacingM: 1.2},
			{Role: optimize.RoleRafter, Designation: "2C250x2.4"},
			{Role: optimize.RoleColumn, Designation: "C250x2.4"},
		},
	}
	if err := acc.Add(r); err != nil {
		fmt.Println(err)
		return
	}
	set := acc.Set()
	if err := set.WriteMarkdownTable(os.Stdout, &set.Tables[0]); err != nil {
		fmt.Println(err)
	}
	// Output:
	// **Wind N3, eaves height 3.60 m**
	//
	// | Span \ Length | 24.0 m (4 × 6.00) |
	// |---|---|
	// | **12.0 m** | 2C250x2.4 / C250x2.4<br>Z200x1.9 @ 1.20 m<br>2,346 kg |
	//
	// > CAUTION: spansweep is a design aid. Verify every design for its site with a qualified structural engineer; local codes and licensed practice govern.
}

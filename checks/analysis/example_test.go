package analysis_test

import (
	"fmt"

	"github.com/spansweep/spansweep/checks/analysis"
)

// A knee-braced portal (illustrative dimensions) under dead load and a crosswind zone pattern,
// combined as 1.2G + 1.0W; reads the left rafter's moment extremes and the buckling factor.
func Example() {
	col := analysis.Section{E: 200000, A: 1800, I: 9e6, MassKgPerM: 14}
	raf := analysis.Section{E: 200000, A: 1500, I: 6e6, MassKgPerM: 12}
	p, err := analysis.NewPortal(analysis.PortalSpec{
		SpanMM: 12000, EavesHeightMM: 4000, PitchDeg: 10, Base: analysis.PinnedBase,
		Column: col, Rafter: raf,
		KneeBrace: &analysis.KneeBrace{ColumnMM: 800, RafterMM: 1200}, KneeBraceSect: analysis.Section{E: 200000, A: 600},
		PurlinsMM: []float64{150, 1300, 2450, 3600, 4750, 5900},
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	g := analysis.LoadCase{Name: "G", SelfWeight: 1}
	p.RoofGravity(&g, 0, 12000, 0.6) // N/mm per horizontal mm
	for _, r := range p.Purlins {
		p.PointLoadAt(&g, r, analysis.GlobalAxes, 0, -900) // purlin reactions, N
	}
	w := analysis.LoadCase{Name: "W"}
	p.WallPressure(&w, analysis.Left, 0, 4000, 4.2)
	p.WallPressure(&w, analysis.Right, 0, 4000, -3)
	p.RoofPressure(&w, 0, 4000, -5.4) // zone from the windward eave, N/mm normal to the roof
	p.RoofPressure(&w, 4000, 12000, -3)

	var ws analysis.Workspace
	s, err := ws.Solve(&p.Frame, []analysis.LoadCase{g, w})
	if err != nil {
		fmt.Println(err)
		return
	}
	uls := analysis.Combination{{Case: 0, Factor: 1.2}, {Case: 1, Factor: 1}}
	e := p.Extremes(s, uls, analysis.LeftRafter)
	fmt.Printf("left rafter M: %.4g to %.4g kNm\n", e.MinM.Value/1e6, e.MaxM.Value/1e6)
	b, err := s.Buckle(analysis.Primary(0), nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("gravity buckling factor: %.4g\n", b.Factor)
	// Output:
	// left rafter M: -9.546 to 24.78 kNm
	// gravity buckling factor: 13.34
}

package dataset

import (
	"fmt"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// testMeta is the provenance stamped on the test parts (made-up hashes).
var testMeta = Meta{ProgramVersion: "test-1", GridSHA256: "aa11", CatalogSHA256: "bb22"}

// sampleResults returns n made-up results in enumeration order. They are
// test inputs, not designs: values vary with i so that a column swap or an
// off-by-one row shows. Every seventh case is a no_solution, and cases with
// odd i have no knee braces (an empty member group).
func sampleResults(n int) []optimize.Result {
	out := make([]optimize.Result, n)
	for i := range out {
		c := grids.Case{
			Index: i, SpanM: 6 + float64(i%5)*3, Bays: 2 + i%3, BaySpacingM: 3 + float64(i%2)*1.5,
			EavesHeightM: 2.4 + float64(i%4)*0.6, RoofPitchDeg: 10, Base: "pinned", HoistKN: float64(i % 2),
			Wind: grids.Wind{HousingClass: []string{"N1", "N2", "N3"}[i%3]},
		}
		if i%4 == 3 {
			c.Wind = grids.Wind{Region: "B2", TerrainCategory: 2.5, ImportanceLevel: 2, DesignLifeYears: 50}
		}
		c.LengthM = float64(c.Bays) * c.BaySpacingM
		c.ID = fmt.Sprintf("case-%05d", i)
		out[i] = sampleResult(c, i)
	}
	return out
}

func sampleResult(c grids.Case, i int) optimize.Result {
	f := float64(i)
	r := optimize.Result{
		Case: c, VUltimateMS: 40 + f/10, VServiceMS: 30 + f/20, QUltimateKPa: 0.96 + f/1000, QServiceKPa: 0.54 + f/2000,
		Frames: c.Bays + 1, KneeBraceColumnM: 0.6, KneeBraceRafterM: 0.9, FlyBracesPerFrame: 2 * (i % 3),
		Footing: optimize.Footing{WidthM: 0.6 + f/100, DepthM: 0.7, Count: 2 * (c.Bays + 1), ConcreteM3: 0.25 * float64(2*(c.Bays+1)),
			BoltSize: "M16 4.6/S", BoltsPerBase: 4, Governing: optimize.Governing{Check: "uplift", Clause: "cl. 4.1", Utilisation: 0.8}},
		Cost: 1000 + f, Analyses: 10 + i,
		BracedFooting: optimize.Footing{WidthM: 0.9, DepthM: 0.9 + f/1000, Count: 4, ConcreteM3: 4 * 0.729, BoltSize: "M20 4.6/S",
			BoltsPerBase: 4 + i%2, Governing: optimize.Governing{Check: "bracing uplift", Clause: "cl. 4.2", Utilisation: 0.7}},
	}
	for k, role := range optimize.Roles {
		m := optimize.MemberGroup{
			Role: role, Designation: fmt.Sprintf("C%dx%d", 100+25*k, i%7), Count: 2 + k + i%5,
			LengthEachM: 3 + float64(k)/10, MassKg: 50 + float64(k) + f/3, DeflectionRatio: 0.5 + float64(k)/100,
			Governing: optimize.Governing{Check: "bending " + string(role), Standard: "AS/NZS 4600:2018",
				Clause: fmt.Sprintf("cl. 3.3.%d", k), LimitState: "ULS", Combination: "1.2G+Wu", Utilisation: 0.9 - float64(k)/50},
		}
		if role == optimize.RolePurlin || role == optimize.RoleGirt {
			m.SpacingM, m.SpanType, m.Bridging, m.Lines = 1.2, "lapped", 1, 10+i%3
		}
		if role == optimize.RoleKneeBrace && i%2 == 1 {
			m = optimize.MemberGroup{Role: role}
		}
		r.Members = append(r.Members, m)
		r.SteelMassKg += m.MassKg
	}
	r.MassPerFloorKgM2 = r.SteelMassKg / (c.SpanM * c.LengthM)
	if i%7 == 6 {
		r.Status, r.Reason = optimize.NoSolution, "rafter: no passing section"
	}
	return r
}

// writeAll writes results into a new part in dir and closes it.
func writeAll(dir string, meta Meta, results []optimize.Result) error {
	w, err := Create(dir, meta)
	if err != nil {
		return err
	}
	for _, r := range results {
		if err := w.WriteResult(r); err != nil {
			w.Abort()
			return err
		}
	}
	return w.Close()
}

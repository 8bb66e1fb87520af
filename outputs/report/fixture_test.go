package report

import (
	"testing"

	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/wind"
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// The result below is a test input built by hand: illustrative numbers of
// the right kind and size for a 12 m × 24 m shed, chosen so that every
// section of the report has something to print. They are not a design and
// are not checked against any standard here; the report must only carry
// them faithfully.

// fixtureOptions parses a minimal grid so the case carries the grid's own
// default options (and a dominant opening and price table, to print them).
func fixtureOptions(t *testing.T) *grids.Options {
	t.Helper()
	const src = `
[geometry]
span_m = [12]
bays = [4]
bay_spacing_m = [6]
eaves_height_m = [3.6]
roof_pitch_deg = [10]
[wind]
[[wind.site]]
region = "A2"
terrain_category = 2.5
[dominant_opening]
wall = "end"
width_m = 3
height_m = 3
[costs]
per_kg = { Z = 3.1, C = 3.2, "2C" = 3.4 }
per_fly_brace = 12
`
	g, err := grids.Parse([]byte(src), "fixture.toml")
	if err != nil {
		t.Fatalf("fixture grid: %v", err)
	}
	return &g.Options
}

func fixtureWind() wind.Loads {
	sp := wind.Speeds{Source: "AS/NZS 1170.2:2021 region A2, TC2.5, IL2, 50 years",
		ReferenceHeightM: 4.129, AnnualProbabilityULS: 1.0 / 500, AnnualProbabilitySLS: 1.0 / 25,
		VRULSMS: 45, VRSLSMS: 37, Mc: 1, Md: 1, Mzcat: 0.87, Ms: 1, Mt: 1,
		VSitULSMS: 39.15, VSitSLSMS: 32.19, VDesULSMS: 39.15, VDesSLSMS: 32.19, QULSKPa: 0.9196, QSLSKPa: 0.6217}
	zone := func(from, to, cpe, cfig float64) wind.Zone {
		return wind.Zone{FromM: from, ToM: to, Cpe: cpe, CfigFrame: cfig, CfigMember: cfig / 0.8,
			PressureULSKPa: cfig * sp.QULSKPa, PressureSLSKPa: cfig * sp.QSLSKPa}
	}
	cross := wind.WindCase{Name: "crosswind, roof max suction, permeable Cpi -0.30", Direction: wind.Crosswind,
		Roof: wind.RoofMaxSuction, Internal: wind.InternalCase{Name: "permeable", Cpi: -0.3}, Kci: 0.8,
		Surfaces: []wind.Surface{
			{Kind: wind.WindwardWall, FromM: 0, ToM: 24, Ka: 0.961, KaKce: 0.8, Zones: []wind.Zone{zone(0, 24, 0.7, 0.8)}},
			{Kind: wind.RoofUpwind, FromM: 0, ToM: 6, Ka: 0.837, KaKce: 0.8, Zones: []wind.Zone{zone(0, 4.13, -0.9, -0.48), zone(4.13, 6, -0.5, -0.16)}},
		}}
	long := wind.WindCase{Name: "longitudinal, roof max suction, permeable Cpi +0.00", Direction: wind.Longitudinal,
		Roof: wind.RoofMaxSuction, Internal: wind.InternalCase{Name: "permeable", Cpi: 0}, Kci: 1,
		Surfaces: []wind.Surface{
			{Kind: wind.Roof, FromM: 0, ToM: 24, Ka: 0.837, KaKce: 0.8, Zones: []wind.Zone{zone(0, 4.13, -0.9, -0.72), zone(4.13, 24, -0.3, -0.24)}},
		}}
	mp := func(in, out, edge float64) wind.MemberPressures {
		return wind.MemberPressures{GeneralInward: wind.DesignPressure{ULSKPa: in, SLSKPa: in * 0.676},
			GeneralOutward: wind.DesignPressure{ULSKPa: out, SLSKPa: out * 0.676},
			EdgeOutward:    wind.DesignPressure{ULSKPa: edge, SLSKPa: edge * 0.676}, EdgeKl: 1.5, EdgeWidthM: 1.2}
	}
	return wind.Loads{Speeds: sp, LocalDimensionWallM: 1.2, LocalDimensionRoofM: 1.2,
		Cases: []wind.WindCase{cross, long}, Purlins: mp(0.92, -1.10, -1.52), Girts: mp(0.92, -0.87, -1.30)}
}

func fixtureCombinations(w wind.Loads) []actions.Combination {
	wp := actions.WindPrimary(w.Cases[0].Name)
	return []actions.Combination{
		{Name: "ULS 1.2G+1.5Q", LimitState: actions.ULS, Factors: []actions.Factor{{Case: actions.G, Factor: 1.2}, {Case: actions.Q, Factor: 1.5}}},
		{Name: "ULS 0.9G+Wu " + w.Cases[0].Name, LimitState: actions.ULS, Factors: []actions.Factor{{Case: actions.G, Factor: 0.9}, {Case: wp, Factor: 1}}},
		{Name: "SLS G+Ws " + w.Cases[0].Name, LimitState: actions.SLS, Factors: []actions.Factor{{Case: actions.G, Factor: 1}, {Case: wp, Factor: 0.676}}},
	}
}

const (
	fxStd   = "AS/NZS 4600:2018"
	fxUplft = "ULS 0.9G+Wu crosswind, roof max suction, permeable Cpi -0.30"
	fxSLS   = "SLS G+Ws crosswind, roof max suction, permeable Cpi -0.30"
)

// fixtureResult is an OK design with every part of the calculation.
func fixtureResult(t *testing.T) *optimize.Result {
	t.Helper()
	w := fixtureWind()
	c := grids.Case{SpanM: 12, LengthM: 24, Bays: 4, BaySpacingM: 6, EavesHeightM: 3.6, RoofPitchDeg: 10,
		Wind: grids.Wind{Region: "A2", TerrainCategory: 2.5, ImportanceLevel: 2, DesignLifeYears: 50, Ms: 1, Mt: 1},
		Base: grids.BasePinned, HoistKN: 5, Options: fixtureOptions(t)}
	c.ID = grids.CaseID(c)
	purlinGov := optimize.Governing{Check: "member moment capacity, lateral-torsional buckling", Standard: fxStd, Clause: "cl. 3.3.3.2",
		LimitState: "ULS", Combination: fxUplft, Utilisation: 0.912}
	rafterGov := optimize.Governing{Check: "combined compression and bending", Standard: fxStd, Clause: "cl. 3.5.1", LimitState: "ULS",
		Combination: "ULS 1.2G+1.5Q", Utilisation: 0.874}
	members := []optimize.MemberGroup{
		{Role: optimize.RolePurlin, Designation: "Z200x1.9", SpacingM: 1.1, SpanType: "lapped", Bridging: 1, Lines: 14, Count: 56,
			LengthEachM: 6.6, MassKg: 1182.7, Governing: purlinGov, DeflectionRatio: 0.61},
		{Role: optimize.RoleGirt, Designation: "C150x60x1.5", SpacingM: 1.2, SpanType: "continuous", Lines: 6, Count: 24,
			LengthEachM: 6, MassKg: 489.6, Governing: optimize.Governing{Check: "deflection", Standard: "AS/NZS 1170.0:2002", Clause: "Appendix C",
				LimitState: "SLS", Combination: "SLS G+Ws", Utilisation: 0.95}, DeflectionRatio: 0.95},
		{Role: optimize.RoleRafter, Designation: "C250x75x2.4", Count: 10, LengthEachM: 6.093, MassKg: 488.2, Governing: rafterGov},
		{Role: optimize.RoleColumn, Designation: "C250x75x2.4", Count: 10, LengthEachM: 3.6, MassKg: 288.4,
			Governing: optimize.Governing{Check: "combined compression and bending", Standard: fxStd, Clause: "cl. 3.5.1", LimitState: "ULS", Combination: fxUplft, Utilisation: 0.71}},
		{Role: optimize.RoleKneeBrace, Designation: "C100x50x1.5", Count: 10, LengthEachM: 1.1, MassKg: 29.9},
		{Role: optimize.RoleFlyBrace, Designation: "L40x40x3", Count: 20, LengthEachM: 0.6, MassKg: 21.6},
		{Role: optimize.RoleRoofBracing}, {Role: optimize.RoleWallBracing}, {Role: optimize.RoleEndWallColumn}, {Role: optimize.RoleEndWallGirt},
	}
	var mass float64
	for _, m := range members {
		mass += m.MassKg
	}
	line := func(member, name, clause, ls, comb string, d, cap float64, unit string) optimize.CheckLine {
		return optimize.CheckLine{Member: member, Name: name, Standard: fxStd, Clause: clause, LimitState: ls, Combination: comb,
			Demand: d, Capacity: cap, Unit: unit, Utilisation: d / cap}
	}
	calc := &optimize.Calculation{Wind: w, Dead: actions.Dead{RoofKPa: 0.1, WallKPa: 0.1}, RoofLiveKPa: 0.25,
		Hoist: actions.Hoist{LoadKN: 5, PositionM: 6}, Combinations: fixtureCombinations(w),
		Groups: []optimize.GroupCalculation{
			{Role: optimize.RolePurlin, Designation: "Z200x1.9", Searched: 37,
				Notes: []string{"7 lines per slope at 1.10 m, lapped, 1 row of bridging per span", "edge zone: K_l 1.5 within 1.2 m (a < b & c | d)"},
				Checks: []optimize.CheckLine{
					line("purlin", "section moment capacity", "cl. 3.3.2", "ULS", fxUplft, 5.10, 8.02, "kN·m"),
					line("purlin", "member moment capacity, lateral-torsional buckling", "cl. 3.3.3.2", "ULS", fxUplft, 5.10, 5.592, "kN·m"),
					line("purlin", "shear capacity of web", "cl. 3.3.4", "ULS", fxUplft, 4.6, 21.3, "kN"),
					{Member: "purlin", Name: "deflection", Standard: "AS/NZS 1170.0:2002", Clause: "Appendix C", LimitState: "SLS",
						Combination: fxSLS, Demand: 26.8, Capacity: 44, Unit: "mm", Utilisation: 0.61},
				}},
			{Role: optimize.RoleRafter, Designation: "C250x75x2.4", Searched: 12,
				// Governing names a combination no line has: the report falls
				// back to marking the line of highest utilisation.
				Checks: []optimize.CheckLine{
					line("rafter, knee", "combined compression and bending", "cl. 3.5.1", "ULS", "ULS 1.2G+1.5Q (other)", 0.874, 1, "—"),
					line("rafter, apex", "section moment capacity", "cl. 3.3.2", "ULS", "ULS 1.2G+1.5Q", 12.1, 21.8, "kN·m"),
				}},
			{Role: "footing", Designation: "pad 0.60x0.60x0.75 m, 2 x M16 4.6/S",
				Checks: []optimize.CheckLine{
					{Member: "footing, left base", Name: "bearing", Standard: "AS/NZS 1170.0:2002", Clause: "cl. 4.2.1", LimitState: "ULS",
						Combination: "ULS 1.2G+1.5Q", Demand: 90, Capacity: 100, Unit: "kPa", Utilisation: 0.90}, // higher than the governing line the result names: the name wins
					{Member: "footing, left base", Name: "uplift", Standard: "AS/NZS 1170.0:2002", Clause: "cl. 4.2.1(b)", LimitState: "ULS",
						Combination: fxUplft, Demand: 8.3, Capacity: 10, Unit: "kN", Utilisation: 0.83},
				}},
		},
		Frame: &optimize.FrameCalculation{BucklingFactor: 7.42, BucklingCombination: "ULS 1.2G+1.5Q",
			Diagrams: []optimize.MemberDiagram{
				{Part: "left column", Combination: "ULS 1.2G+1.5Q", StationsM: []float64{0, 0.9, 1.8, 2.7, 3.6},
					AxialKN: []float64{-14.2, -14.0, -13.8, -13.6, -13.4}, ShearKN: []float64{-5.1, -5.1, -5.1, -5.1, -5.1},
					MomentKNm: []float64{0, -4.6, -9.2, -13.8, -18.4}},
				{Part: "left rafter", Combination: "ULS 1.2G+1.5Q", StationsM: []float64{0, 1.523, 3.047, 4.570, 6.093},
					AxialKN: []float64{-6.2, -5.9, -5.6, -5.3, -5.0}, ShearKN: []float64{12.8, 8.1, 3.4, -1.3, -6.0},
					MomentKNm: []float64{-18.4, -2.5, 6.2, 7.8, 2.1}},
			},
			Deflections: []optimize.CheckLine{
				{Member: "frame, eaves", Name: "eaves sway", Standard: "AS/NZS 1170.0:2002", Clause: "Appendix C", LimitState: "SLS", Combination: fxSLS,
					Demand: 14.1, Capacity: 24, Unit: "mm", Utilisation: 14.1 / 24},
			}},
	}
	return &optimize.Result{Case: c, Status: optimize.OK, VUltimateMS: 39.15, VServiceMS: 32.19, QUltimateKPa: 0.9196, QServiceKPa: 0.6217,
		Members: members, Frames: 5, KneeBraceColumnM: 0.8, KneeBraceRafterM: 1.2, FlyBracesPerFrame: 4,
		Footing: optimize.Footing{Bases: "frame bases", WidthM: 0.6, DepthM: 0.75, Count: 10, ConcreteM3: 2.7, BoltSize: "M16 4.6/S", BoltsPerBase: 2,
			Governing: optimize.Governing{Check: "uplift", Standard: "AS/NZS 1170.0:2002", Clause: "cl. 4.2.1(b)", LimitState: "ULS", Combination: fxUplft, Utilisation: 0.83}},
		SteelMassKg: mass, MassPerFloorKgM2: mass / (12 * 24), Cost: 8123.4, Analyses: 64, Calculation: calc}
}

// fixtureReport wraps the fixture with fixed provenance.
func fixtureReport(t *testing.T) Report {
	return Report{Result: fixtureResult(t), Title: "Ridgeline Sheds Pty Ltd (fictional): calculation report",
		Catalogue: "embedded:rs_sections.csv (sha256 0123456789ab)", OptionsSource: "fixture.toml", Version: "test"}
}

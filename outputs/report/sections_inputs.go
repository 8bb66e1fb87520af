package report

import (
	"fmt"
	"sort"
	"strings"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// summary states the outcome: status, reason, masses and counts.
func (r Report) summary(s *section) {
	res := r.Result
	t := newTable("Item", "Value").
		row("Case", res.Case.ID).
		row("Status", res.Status.String())
	if res.Reason != "" {
		t.row("Reason", res.Reason)
	}
	if res.Status == optimize.OK {
		t.row("Total steel mass (kg)", num(res.SteelMassKg, 1)).
			row("Steel mass per floor area (kg/m²)", num(res.MassPerFloorKgM2, 2))
	}
	t.row("Portal frames (end frames included)", countOrDash(res.Frames)).
		row("Fly braces per frame", fmt.Sprint(res.FlyBracesPerFrame))
	if res.Cost != 0 {
		t.row("Cost (grid price table, currency units)", num(res.Cost, 2))
	}
	t.row("Frame analyses run by the search", fmt.Sprint(res.Analyses))
	s.add(t)
	if res.Status != optimize.OK {
		s.para("No passing set of catalogue sections was found for this case. The sections below show what was chosen before the search stopped; they are not a design.")
	}
}

// inputs lists the building, the site and the shared options.
func (r Report) inputs(s *section) {
	c := r.Result.Case
	base := c.Base
	hoist := "none"
	if c.HoistKN > 0 {
		hoist = fmt.Sprintf("%s kN at mid-span (apex), imposed action", short(c.HoistKN))
	}
	s.add(&subheading{text: "Building and site"}, newTable("Input", "Value").
		row("Span, column centrelines (m)", short(c.SpanM)).
		row("Length (m)", fmt.Sprintf("%s = %d bays × %s", short(c.LengthM), c.Bays, short(c.BaySpacingM))).
		row("Eaves height (m)", short(c.EavesHeightM)).
		row("Roof pitch (°)", short(c.RoofPitchDeg)).
		row("Column bases", base).
		row("Hoist", hoist).
		row("Wind condition", windInput(c.Wind)))
	prov := newTable("Input", "Value").
		row("Section catalogue", orDash(r.Catalogue)).
		row("Shared options", orDash(r.OptionsSource))
	if r.Version != "" {
		prov.row("Program version", r.Version)
	}
	s.add(&subheading{text: "Sources"}, prov)
	if c.Options != nil {
		s.add(&subheading{text: "Options"}, optionsTable(c.Options))
	}
}

// windInput spells a wind condition out in full.
func windInput(w grids.Wind) string {
	if w.IsHousingClass() {
		return "AS 4055-2021 housing wind class " + w.HousingClass
	}
	md := "region's any-direction value"
	if w.Md != 0 {
		md = short(w.Md)
	}
	return fmt.Sprintf("AS/NZS 1170.2:2021 region %s, terrain category %s, importance level %d, design working life %d years, M_s %s, M_t %s, M_d %s",
		w.Region, short(w.TerrainCategory), w.ImportanceLevel, w.DesignLifeYears, short(w.Ms), short(w.Mt), md)
}

// optionsTable lists cladding, limits, member choices, opening and costs.
func optionsTable(o *grids.Options) *table {
	cl, lim, m := o.Cladding, o.Limits, o.Members
	t := newTable("Option", "Value").
		row("Roof cladding dead load (kPa)", short(cl.RoofDeadKPa)).
		row("Wall cladding dead load (kPa)", short(cl.WallDeadKPa)).
		row("Largest purlin spacing (m)", short(cl.MaxPurlinSpacingM)).
		row("Largest girt spacing (m)", short(cl.MaxGirtSpacingM)).
		row("Spacing step (m)", short(cl.SpacingStepM)).
		row("Purlin deflection limit (SLS wind)", "span/"+short(lim.PurlinDeflectionRatio)).
		row("Girt deflection limit (SLS wind)", "span/"+short(lim.GirtDeflectionRatio)).
		row("Eaves drift limit (SLS wind)", "height/"+short(lim.EavesDriftRatio)).
		row("Apex deflection limit (SLS)", "span/"+short(lim.ApexDeflectionRatio)).
		row("Purlin families", strings.Join(m.PurlinFamilies, ", ")).
		row("Girt families", strings.Join(m.GirtFamilies, ", ")).
		row("Frame families", strings.Join(m.FrameFamilies, ", ")).
		row("Same rafter and column", yesNo(m.SameRafterAndColumn)).
		row("Knee braces allowed", yesNo(m.KneeBraces)).
		row("Span types", strings.Join(m.SpanTypes, ", "))
	if op := o.Opening; op != nil {
		t.row("Dominant opening", fmt.Sprintf("%s wall, %s m wide × %s m high", op.Wall, short(op.WidthM), short(op.HeightM)))
	} else {
		t.row("Dominant opening", "none")
	}
	if c := o.Costs; c != nil {
		fams := make([]string, 0, len(c.PerKg))
		for f := range c.PerKg {
			fams = append(fams, f)
		}
		sort.Strings(fams)
		prices := make([]string, len(fams))
		for i, f := range fams {
			prices[i] = fmt.Sprintf("%s %s/kg", f, short(c.PerKg[f]))
		}
		t.row("Steel prices", strings.Join(prices, ", ")).
			row("Price per fly brace", short(c.PerFlyBrace)).
			row("Price per bridging row", short(c.PerBridgingRow))
	} else {
		t.row("Objective", "least steel mass (no price table)")
	}
	return t
}

func yesNo(b bool) string {
	if b {
		return "yes"
	}
	return "no"
}

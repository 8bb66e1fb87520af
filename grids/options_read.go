package grids

import (
	"maps"
	"slices"
	"strings"
)

// readOptions reads cladding, limits, members, the dominant opening and costs.
func (r *reader) readOptions(doc map[string]any, g *Grid) {
	o := &g.Options
	c, _ := r.table(doc, "", "cladding")
	o.Cladding = Cladding{
		RoofDeadKPa:       r.number(c, "cladding", "roof_dead_kpa", o.Cladding.RoofDeadKPa, false),
		WallDeadKPa:       r.number(c, "cladding", "wall_dead_kpa", o.Cladding.WallDeadKPa, false),
		MaxPurlinSpacingM: r.number(c, "cladding", "max_purlin_spacing_m", o.Cladding.MaxPurlinSpacingM, false),
		MaxGirtSpacingM:   r.number(c, "cladding", "max_girt_spacing_m", o.Cladding.MaxGirtSpacingM, false),
		SpacingStepM:      r.number(c, "cladding", "spacing_step_m", o.Cladding.SpacingStepM, false),
	}
	l, _ := r.table(doc, "", "limits")
	o.Limits = Limits{
		PurlinDeflectionRatio: r.number(l, "limits", "purlin_deflection_ratio", o.Limits.PurlinDeflectionRatio, false),
		GirtDeflectionRatio:   r.number(l, "limits", "girt_deflection_ratio", o.Limits.GirtDeflectionRatio, false),
		EavesDriftRatio:       r.number(l, "limits", "eaves_drift_ratio", o.Limits.EavesDriftRatio, false),
		ApexDeflectionRatio:   r.number(l, "limits", "apex_deflection_ratio", o.Limits.ApexDeflectionRatio, false),
	}
	m, _ := r.table(doc, "", "members")
	d := o.Members
	o.Members = Members{
		PurlinFamilies:      r.strs(m, "members", "purlin_families", d.PurlinFamilies, []string{FamilyZ, FamilyC}),
		GirtFamilies:        r.strs(m, "members", "girt_families", d.GirtFamilies, []string{FamilyZ, FamilyC}),
		FrameFamilies:       r.strs(m, "members", "frame_families", d.FrameFamilies, []string{FamilyC, FamilyBackToC}),
		SameRafterAndColumn: r.boolean(m, "members", "same_rafter_and_column", d.SameRafterAndColumn),
		KneeBraces:          r.boolean(m, "members", "knee_braces", d.KneeBraces),
		SpanTypes:           r.strs(m, "members", "span_types", d.SpanTypes, []string{SpanSimple, SpanContinuous, SpanLapped}),
	}
	o.Opening = r.readOpening(doc, g)
	o.Costs = r.readCosts(doc, o.Members)
}

// readOpening reads the optional [dominant_opening] and checks the door fits
// the smallest building of the grid.
func (r *reader) readOpening(doc map[string]any, g *Grid) *Opening {
	t, ok := r.table(doc, "", "dominant_opening")
	if !ok {
		return nil
	}
	p := "dominant_opening"
	o := &Opening{
		Wall:    r.str(t, p, "wall", "", true, []string{WallSide, WallEnd}),
		WidthM:  r.number(t, p, "width_m", 0, true),
		HeightM: r.number(t, p, "height_m", 0, true),
	}
	if h := minOf(g.EavesHeightsM); h > 0 && o.HeightM >= h {
		r.add(p+".height_m", o.HeightM, "allowed below the smallest eaves height, "+fmtNum(h)+" m")
	}
	limit, what := minOf(g.SpansM), "smallest span"
	if o.Wall == WallSide {
		limit, what = 0, "smallest bay spacing"
		for _, l := range g.Lengths {
			if limit == 0 || l.BaySpacingM < limit {
				limit = l.BaySpacingM
			}
		}
	}
	if limit > 0 && o.WidthM >= limit {
		r.add(p+".width_m", o.WidthM, "allowed below the "+what+", "+fmtNum(limit)+" m")
	}
	return o
}

// readCosts reads the optional [costs]; every family the members may use needs a price.
func (r *reader) readCosts(doc map[string]any, m Members) *Costs {
	t, ok := r.table(doc, "", "costs")
	if !ok {
		return nil
	}
	c := &Costs{
		PerKg:          map[string]float64{},
		PerFlyBrace:    r.number(t, "costs", "per_fly_brace", 0, false),
		PerBridgingRow: r.number(t, "costs", "per_bridging_row", 0, false),
	}
	families := []string{FamilyZ, FamilyC, FamilyBackToC}
	switch pk := t["per_kg"].(type) {
	case nil:
		r.missing("costs.per_kg")
	case map[string]any:
		b := specFor("costs.per_kg").Bounds
		for _, f := range slices.Sorted(maps.Keys(pk)) {
			price, isNum := toFloat(pk[f])
			switch {
			case !slices.Contains(families, f):
				r.add("costs.per_kg."+f, pk[f], "unknown family; allowed "+strings.Join(families, ", "))
			case !isNum || !b.contains(price):
				r.add("costs.per_kg."+f, pk[f], "must be a number; allowed "+b.String())
			default:
				c.PerKg[f] = price
			}
		}
	default:
		r.add("costs.per_kg", pk, "must be a table of family = price, e.g. {Z = 3.2, C = 3.0, \"2C\" = 3.1}")
	}
	for _, f := range families {
		used := slices.Contains(m.PurlinFamilies, f) || slices.Contains(m.GirtFamilies, f) || slices.Contains(m.FrameFamilies, f)
		if _, priced := c.PerKg[f]; used && !priced && t["per_kg"] != nil {
			r.add("costs.per_kg", t["per_kg"], "no price for family "+f+", which members allow; give every allowed family a price")
		}
	}
	return c
}

func minOf(v []float64) float64 {
	if len(v) == 0 {
		return 0
	}
	return slices.Min(v)
}

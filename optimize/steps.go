package optimize

// run designs the member groups in dependency order and totals the masses.
// Each step returns false when its group has no passing candidate; the
// design stops there with the reason recorded by fail. The frame and the
// bracing are one step: the purlins may change with the braced bays'
// struts (frameAndBracing).
func (d *designer) run() {
	steps := []func() bool{d.purlins, d.girts, d.frameAndBracing, d.endWalls, d.footings}
	for _, step := range steps {
		if !step() {
			return
		}
	}
	d.totals()
}

// totals sums the steel of every member group and the price if a price
// table is given.
func (d *designer) totals() {
	var mass float64
	for _, m := range d.r.Members {
		mass += m.MassKg
	}
	d.r.SteelMassKg = mass
	d.r.MassPerFloorKgM2 = mass / (d.c.SpanM * d.c.LengthM)
	d.r.Cost = d.cost()
}

// cost prices the building from the grid's table: steel per kg by family,
// fly braces and bridging rows counted. Zero without a price table.
func (d *designer) cost() float64 {
	costs := d.c.Options.Costs
	if costs == nil {
		return 0
	}
	var total float64
	for _, m := range d.r.Members {
		total += m.MassKg * costs.PerKg[familyOf(m.Designation)]
		if m.Role == RolePurlin || m.Role == RoleGirt || m.Role == RoleEndWallGirt {
			total += float64(m.Bridging*m.Lines*d.c.Bays) * costs.PerBridgingRow
		}
	}
	total += float64(d.r.FlyBracesPerFrame*d.r.Frames) * costs.PerFlyBrace
	return total
}

// familyOf returns a designation's family prefix: "2C", "C" or "Z".
func familyOf(designation string) string {
	switch {
	case len(designation) >= 2 && designation[:2] == "2C":
		return "2C"
	case len(designation) >= 1:
		return designation[:1]
	}
	return ""
}

package optimize

import (
	"fmt"
	"slices"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/coldformed"
)

// bracing designs the roof and side-wall bracing of the braced bays:
// tension-only straps or rods (the lightest passing per system) with the
// rafters and columns as chords and the purlins as struts (checked for
// compression with their bending from roof pressure, upgraded where they
// fail). Longitudinal wind on the end walls and the frames' restraint
// forces go through the roof bays to the eaves and down the wall bays to
// the column bases.
func (d *designer) bracing() bool {
	l := d.layoutBracing()
	solves, err := d.solveBracing(l)
	if err != nil {
		d.fail(RoleRoofBracing, err.Error())
		return false
	}
	cands := d.tensionCandidates()
	if len(cands) == 0 {
		d.fail(RoleRoofBracing, "the catalogue has no strap or rod section, so no tension-only bracing can be chosen: "+
			"the building has no support against longitudinal wind")
		return false
	}
	// The members are also checked under any further solves the joint
	// choice of the purlins gives (frameAndBracing); the footings take the
	// case's own solves only.
	checked := append(slices.Clip(solves), d.alsoSolves...)
	roof, ok := d.chooseDiagonal(RoleRoofBracing, cands, checked, func(s bracingSolve) bayForces { return s.roof })
	if !ok {
		return false
	}
	wall, ok := d.chooseDiagonal(RoleWallBracing, cands, checked, func(s bracingSolve) bayForces { return s.wall })
	if !ok {
		return false
	}
	strut, ok := d.designStruts(checked, l)
	if !ok {
		return false
	}
	d.strut = strut
	d.setBracingGroups(l, roof, wall, strut)
	return true
}

// diagonalChoice is a bracing system's chosen strap or rod.
type diagonalChoice struct {
	sec      catalog.Section
	result   coldformed.MemberResult
	searched int
}

// tensionCandidates are the catalogue's straps and rods, lightest per
// metre first.
func (d *designer) tensionCandidates() []catalog.Section {
	out := append(d.cat.ByShape(catalog.ShapeStrap), d.cat.ByShape(catalog.ShapeRod)...)
	slices.SortStableFunc(out, func(a, b catalog.Section) int { return cmpFloat(a.MassKgPerM, b.MassKgPerM) })
	return out
}

// tensionMember describes a diagonal's end connection: a strap has one
// bolt hole (net area (b − d_h)·t, k_t = 1 for a flat member,
// AS/NZS 4600:2018 cl. 3.2.2, from memory); a rod is checked on its
// threaded stress area. ok is false for a strap too narrow for the hole.
func tensionMember(s catalog.Section) (coldformed.TensionMember, bool) {
	if s.Shape != catalog.ShapeStrap {
		return coldformed.TensionMember{}, true
	}
	net := (s.DepthMM - boltHoleMM) * s.ThicknessMM
	return coldformed.TensionMember{NetArea: net, Kt: 1}, net > 0
}

// chooseDiagonal picks the lightest strap or rod that carries the system's
// largest diagonal tension over every solve.
func (d *designer) chooseDiagonal(role Role, cands []catalog.Section, solves []bracingSolve, bay func(bracingSolve) bayForces) (diagonalChoice, bool) {
	var demand float64
	var comb string
	for _, s := range solves {
		if n := bay(s).maxDiagonalN(); n > demand || comb == "" {
			demand, comb = n, s.label()
		}
	}
	exhaustive := d.s != nil && d.s.Exhaustive
	var best *diagonalChoice
	var closest coldformed.MemberResult
	searched := 0
	for _, sec := range cands {
		tm, fits := tensionMember(sec)
		caps, err := capacitiesFor(d.cat).of(sec)
		if !fits || err != nil || caps == nil {
			continue
		}
		searched++
		res, err := coldformed.CheckTension(caps, tm, demand)
		if err != nil {
			d.fail(role, err.Error())
			return diagonalChoice{}, false
		}
		res.SetCombination(comb)
		if res.Passes() {
			if best == nil || sec.MassKgPerM < best.sec.MassKgPerM {
				best = &diagonalChoice{sec: sec, result: res}
			}
			if !exhaustive {
				break
			}
			continue
		}
		if closest.Designation == "" || res.Utilisation() < closest.Utilisation() {
			closest = res
		}
	}
	if best == nil {
		g := closest.Governing()
		d.fail(role, fmt.Sprintf("no strap or rod carries the diagonal tension %.1f kN (%s); strongest %s at utilisation %.2f, failing %s (%s cl. %s)",
			demand/1e3, comb, closest.Designation, g.Utilisation, g.Name, g.Standard, g.Clause))
		return diagonalChoice{}, false
	}
	best.searched = searched
	return *best, true
}

// setBracingGroups stores the roof and wall bracing groups and their working.
func (d *designer) setBracingGroups(l bracingLayout, roof, wall diagonalChoice, strut strutChoice) {
	roofG := governingOf(roof.result.Governing())
	if sg := strut.verdict.governing; sg.Utilisation > roofG.Utilisation {
		sg.Check = "purlin strut " + strut.sec.Designation + ": " + sg.Check
		roofG = sg
	}
	rl, wl := l.roofDiagonalM(), l.wallDiagonalM()
	d.set(MemberGroup{Role: RoleRoofBracing, Designation: roof.sec.Designation, Count: l.roofDiagonals(), LengthEachM: rl,
		MassKg: float64(l.roofDiagonals())*rl*roof.sec.MassKgPerM + strut.extraKg, Governing: roofG})
	d.set(MemberGroup{Role: RoleWallBracing, Designation: wall.sec.Designation, Count: l.wallDiagonals(), LengthEachM: wl,
		MassKg: float64(l.wallDiagonals()) * wl * wall.sec.MassKgPerM, Governing: governingOf(wall.result.Governing())})
	if d.r.Calculation == nil {
		return
	}
	roofR, wallR := d.restraintForcesN(l)
	common := []string{
		fmt.Sprintf("%d braced bay(s): both end bays and one per %d bays (common practice, no source)", l.bracedBays, bracingBaysPer),
		fmt.Sprintf("end wall %.2f m² per end; half of its wind load goes to the roof line by tributary width, half to the base", l.gableAreaM2()),
		fmt.Sprintf("restraint forces %.1f %% of the flange force of each of %d frames per braced bay (from memory of AS 4100:2020 cl. 6.6.2): roof %.2f kN, wall %.2f kN",
			100*restraintFraction, l.framesPerBay, roofR/1e3, wallR/1e3),
		"tension-only diagonals (checks/analysis SolveTensionOnly), every longitudinal wind case in both directions; frictional drag (AS/NZS 1170.2:2021 cl. 5.5) not included",
		fmt.Sprintf("strap ends: one M12 bolt in a %.0f mm hole; rods: threaded ends", boltHoleMM),
	}
	var roofChecks []CheckLine
	for _, c := range roof.result.Checks {
		roofChecks = append(roofChecks, checkLineOf("roof bracing diagonal", c))
	}
	roofChecks = append(roofChecks, strut.verdict.checks...)
	strutNote := fmt.Sprintf("purlins act as struts (%s), checked as simply supported beam-columns over one bay", strut.sec.Designation)
	if len(d.alsoSolves) > 0 {
		strutNote += "; struts and diagonals also checked under the bracing solves of the frame as it carries the lightest purlins (its restraint forces): the purlins are chosen with the strut upgrade, and this conservative extra check keeps that choice exact without designing every option"
	}
	if strut.extraKg > 0 {
		strutNote += fmt.Sprintf("; upgraded from %s with %d bridging row(s) to %s with %d in the braced bays, %.1f kg added to this group",
			d.purlin.Section.Designation, d.purlin.Bridging, strut.sec.Designation, strut.bridging, strut.extraKg)
	}
	d.record(GroupCalculation{Role: RoleRoofBracing, Designation: roof.sec.Designation, Searched: roof.searched + strut.searched, Checks: roofChecks,
		Notes: append(slices.Clone(common),
			fmt.Sprintf("%d panels across the unfolded roof (%.2f m along the slope), rafters as chords; panel points taken evenly spaced, at the nearest purlin lines", l.roofPanels, 2*l.slopeM/float64(l.roofPanels)),
			strutNote,
			"bracing axial forces in the rafters (chords) are not added to the frame's checks")})
	var wallChecks []CheckLine
	for _, c := range wall.result.Checks {
		wallChecks = append(wallChecks, checkLineOf("wall bracing diagonal", c))
	}
	d.record(GroupCalculation{Role: RoleWallBracing, Designation: wall.sec.Designation, Searched: wall.searched, Checks: wallChecks,
		Notes: append(slices.Clone(common),
			fmt.Sprintf("%d panel(s) up each side wall of the braced bays, columns as chords, the eave purlin as the top strut", l.wallPanels),
			"girts at intermediate panel points (more than one panel) act as struts: their axial force is not checked")})
}

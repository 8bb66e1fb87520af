package report

import (
	"fmt"
	"strings"

	"github.com/spansweep/spansweep/optimize"
)

// present returns the member groups the building has, in schedule order,
// and the roles it does not have.
func present(res *optimize.Result) (have []optimize.MemberGroup, absent []string) {
	for _, m := range res.Members {
		if m.Designation == "" && m.Count == 0 {
			absent = append(absent, roleName(m.Role))
			continue
		}
		have = append(have, m)
	}
	return have, absent
}

// roleName spells a role for people: "knee_brace" → "knee brace".
func roleName(r optimize.Role) string { return strings.ReplaceAll(string(r), "_", " ") }

// schedule lists the chosen member groups with their governing checks.
func (r Report) schedule(s *section) {
	res := r.Result
	have, absent := present(res)
	t := newTable("Member", "Section", "Spacing (m)", "Span type", "Bridging rows", "Lines", "Count", "Length each (m)", "Mass (kg)",
		"Utilisation", "Deflection / limit", "Governing check", "Clause", "Limit state", "Combination")
	for _, m := range have {
		g := m.Governing
		defl := "—"
		if m.DeflectionRatio > 0 {
			defl = util(m.DeflectionRatio)
		}
		t.row(roleName(m.Role), orDash(m.Designation), lenOrDash(m.SpacingM), orDash(m.SpanType), countOrDash(m.Bridging),
			countOrDash(m.Lines), countOrDash(m.Count), lenOrDash(m.LengthEachM), num(m.MassKg, 1),
			util(g.Utilisation), defl, orDash(g.Check), clauseOf(g.Standard, g.Clause), orDash(g.LimitState), orDash(g.Combination))
	}
	if len(have) == 0 {
		s.para("No member group was chosen.")
	} else {
		s.add(t)
	}
	if len(absent) > 0 {
		s.para("Not in this building: " + strings.Join(absent, ", ") + ".")
	}
	items := []string{fmt.Sprintf("Fly braces: %d per frame, %d in the building.", res.FlyBracesPerFrame, res.FlyBracesPerFrame*res.Frames)}
	if res.KneeBraceColumnM > 0 || res.KneeBraceRafterM > 0 {
		items = append(items, fmt.Sprintf("Knee braces: from %s m down the column to %s m along the rafter, both measured from the eaves.",
			num(res.KneeBraceColumnM, 3), num(res.KneeBraceRafterM, 3)))
	} else {
		items = append(items, "Knee braces: none.")
	}
	s.add(&list{items: items})
}

// clauseOf joins a standard and its clause, e.g. "AS/NZS 4600:2018 cl. 3.3.2".
func clauseOf(standard, clause string) string {
	switch {
	case standard == "" && clause == "":
		return "—"
	case standard == "":
		return clause
	case clause == "":
		return standard
	}
	return standard + " " + clause
}

// footings gives each footing type's pad, its bolts and its governing check.
func (r Report) footings(s *section) {
	fts := r.Result.Footings()
	if len(fts) == 0 {
		s.para("No footing was designed.")
		return
	}
	t := newTable("Item")
	for _, f := range fts {
		t.head = append(t.head, orDash(f.Bases))
	}
	row := func(name string, value func(optimize.Footing) string) {
		cells := []string{name}
		for _, f := range fts {
			cells = append(cells, value(f))
		}
		t.row(cells...)
	}
	row("Pads", func(f optimize.Footing) string { return fmt.Sprint(f.Count) })
	row("Square pad side (m)", func(f optimize.Footing) string { return num(f.WidthM, 3) })
	row("Pad depth (m)", func(f optimize.Footing) string { return num(f.DepthM, 3) })
	row("Concrete, all pads (m³)", func(f optimize.Footing) string { return num(f.ConcreteM3, 3) })
	row("Holding-down bolts", func(f optimize.Footing) string {
		return fmt.Sprintf("%d × %s per base", f.BoltsPerBase, orDash(f.BoltSize))
	})
	row("Governing check", func(f optimize.Footing) string {
		g := f.Governing
		return fmt.Sprintf("%s, %s, %s, %s", orDash(g.Check), clauseOf(g.Standard, g.Clause), orDash(g.LimitState), orDash(g.Combination))
	})
	row("Utilisation", func(f optimize.Footing) string { return util(f.Governing.Utilisation) })
	s.add(t)
	if r.calc() != nil {
		s.para("Every footing and holding-down check is listed with the member checks (section 8).")
	}
}

// bill totals the steel by member group.
func (r Report) bill(s *section) {
	res := r.Result
	have, _ := present(res)
	t := newTable("Member", "Section", "Count", "Length each (m)", "Total length (m)", "Mass (kg)")
	for _, m := range have {
		t.row(roleName(m.Role), orDash(m.Designation), countOrDash(m.Count), lenOrDash(m.LengthEachM),
			lenOrDash(float64(m.Count)*m.LengthEachM), num(m.MassKg, 1))
	}
	if res.Status == optimize.OK {
		t.row("Total steel", "", "", "", "", num(res.SteelMassKg, 1))
	} else {
		var sum float64
		for _, m := range have {
			sum += m.MassKg
		}
		t.row("Groups chosen before the search stopped (not a design)", "", "", "", "", num(sum, 1))
	}
	s.add(t)
	var items []string
	if res.Status == optimize.OK {
		items = append(items, fmt.Sprintf("Steel mass per floor area: %s kg/m² over %s m × %s m.", num(res.MassPerFloorKgM2, 2), short(res.Case.SpanM), short(res.Case.LengthM)))
	}
	items = append(items, fmt.Sprintf("Fly braces: %d.", res.FlyBracesPerFrame*res.Frames))
	for _, f := range res.Footings() {
		items = append(items, fmt.Sprintf("Footings at %s: %d pads, %s m³ of concrete; %d holding-down bolts %s.",
			orDash(f.Bases), f.Count, num(f.ConcreteM3, 3), f.Count*f.BoltsPerBase, orDash(f.BoltSize)))
	}
	if res.Cost != 0 {
		items = append(items, fmt.Sprintf("Cost from the grid's price table: %s (currency units).", num(res.Cost, 2)))
	}
	items = append(items, "Length each is the cut length of one piece; laps are included in the masses; fasteners, cladding and footing concrete are not in the steel mass.")
	s.add(&list{items: items})
}

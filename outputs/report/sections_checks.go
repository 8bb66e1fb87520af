package report

import (
	"fmt"

	"github.com/spansweep/spansweep/optimize"
)

// checkHead is the column heads of a table of checks.
var checkHead = []string{"Member", "Check", "Standard", "Clause", "Limit state", "Combination", "Demand", "Capacity", "Unit", "Utilisation", "Governs"}

// checks lists every check of every chosen member group, the governing one
// highlighted.
func (r Report) checks(s *section) {
	c := r.calc()
	if c == nil {
		s.para(notRecorded)
		return
	}
	if len(c.Groups) == 0 {
		s.para("No member group was checked.")
		return
	}
	s.para("Utilisation is demand over capacity; a check passes at 1.000 or less. The governing check of each group, the one named in the schedule, is marked.")
	for _, g := range c.Groups {
		head := roleName(g.Role)
		if g.Designation != "" {
			head += ": " + g.Designation
		}
		s.add(&subheading{text: head})
		items := append([]string(nil), g.Notes...)
		if g.Searched > 0 {
			items = append(items, fmt.Sprintf("Candidates evaluated by the search: %d.", g.Searched))
		}
		if len(items) > 0 {
			s.add(&list{items: items})
		}
		if len(g.Checks) == 0 {
			s.para("No checks recorded.")
			continue
		}
		s.add(checkTable(g.Checks, governingIndex(g.Checks, r.governingOf(g.Role))))
	}
}

// roleFooting is the role under which the footing's working is recorded;
// its governing check is Result.Footing's.
const roleFooting optimize.Role = "footing"

// governingOf returns the governing check the result names for a role.
func (r Report) governingOf(role optimize.Role) optimize.Governing {
	if role == roleFooting {
		return r.Result.Footing.Governing
	}
	return r.Result.Member(role).Governing
}

// checkTable writes check lines, highlighting the line at gov (-1: none).
func checkTable(lines []optimize.CheckLine, gov int) *table {
	t := newTable(checkHead...)
	for i, l := range lines {
		cells := []string{orDash(l.Member), l.Name, orDash(l.Standard), orDash(l.Clause), orDash(l.LimitState), orDash(l.Combination),
			num(l.Demand, 3), num(l.Capacity, 3), orDash(l.Unit), util(l.Utilisation), ""}
		if i == gov {
			cells[len(cells)-1] = "governs"
			t.governingRow(cells...)
			continue
		}
		t.row(cells...)
	}
	return t
}

// governingIndex finds the line the group's Governing names (check,
// clause and combination); failing that, the line of highest utilisation.
func governingIndex(lines []optimize.CheckLine, g optimize.Governing) int {
	for i, l := range lines {
		if g.Check != "" && l.Name == g.Check && l.Clause == g.Clause && l.Combination == g.Combination {
			return i
		}
	}
	best := -1
	for i, l := range lines {
		if best < 0 || l.Utilisation > lines[best].Utilisation {
			best = i
		}
	}
	return best
}

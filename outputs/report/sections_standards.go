package report

import "sort"

// baseStandards are the standards every design uses, with their titles.
var baseStandards = []struct{ code, title string }{
	{"AS/NZS 1170.0:2002", "Structural design actions, Part 0: General principles (combinations, annual probabilities of exceedance)"},
	{"AS/NZS 1170.1:2002", "Structural design actions, Part 1: Permanent, imposed and other actions (roof live load)"},
	{"AS/NZS 1170.2:2021", "Structural design actions, Part 2: Wind actions"},
	{"AS/NZS 4600:2018", "Cold-formed steel structures"},
}

// housingStandard is added when the wind is a housing class.
const housingStandard = "AS 4055-2021"

// standards lists the standards and editions the design used: the base
// list, the housing wind standard for a class, and every other standard a
// check names.
func (r Report) standards(s *section) {
	items := make([]string, 0, len(baseStandards)+2)
	known := map[string]bool{}
	for _, b := range baseStandards {
		items = append(items, b.code+": "+b.title)
		known[b.code] = true
	}
	if r.Result.Case.Wind.IsHousingClass() {
		items = append(items, housingStandard+": Wind loads for housing (wind class speeds)")
		known[housingStandard] = true
	}
	var extra []string
	add := func(std string) {
		if std != "" && !known[std] {
			known[std] = true
			extra = append(extra, std)
		}
	}
	for _, m := range r.Result.Members {
		add(m.Governing.Standard)
	}
	add(r.Result.Footing.Governing.Standard)
	if c := r.calc(); c != nil {
		for _, g := range c.Groups {
			for _, l := range g.Checks {
				add(l.Standard)
			}
		}
		if c.Frame != nil {
			for _, l := range c.Frame.Deflections {
				add(l.Standard)
			}
		}
	}
	sort.Strings(extra)
	for _, e := range extra {
		items = append(items, e+": named by the checks above")
	}
	s.add(&list{items: items})
	s.para("Deflection limits are serviceability choices, not rules of these standards: their defaults and sources are in the grid key reference (testdata/examples/GRID-KEYS.md).")
}

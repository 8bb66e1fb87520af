package optimize

import (
	"testing"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
)

// bracingTestCase is an illustrative shed: span, bays × bay spacing, eaves
// height, 10° pitch, pinned bases, in a housing wind class.
func bracingTestCase(t testing.TB, spanM float64, bays int, bayM, eavesM float64, windClass string) grids.Case {
	t.Helper()
	g, err := grids.Default()
	if err != nil {
		t.Fatal(err)
	}
	c := grids.Case{SpanM: spanM, Bays: bays, BaySpacingM: bayM, LengthM: float64(bays) * bayM, EavesHeightM: eavesM,
		RoofPitchDeg: 10, Wind: grids.Wind{HousingClass: windClass}, Base: "pinned", Options: &g.Options}
	c.ID = grids.CaseID(c)
	return c
}

// bracingTestDesigner derives the case's actions, designs its purlins and
// girts with the real steps and hand-builds the frame: rafter and column
// sections from catalog.Default(), no reactions (tests add their own).
func bracingTestDesigner(t testing.TB, c grids.Case, s *Settings) *designer {
	t.Helper()
	act, err := deriveActions(c)
	if err != nil {
		t.Fatal(err)
	}
	r := Result{Case: c, Members: make([]MemberGroup, len(Roles))}
	for i, role := range Roles {
		r.Members[i].Role = role
	}
	if s != nil && s.Record {
		r.Calculation = &Calculation{}
	}
	d := &designer{c: c, s: s, cat: s.catalogue(), act: act, r: &r}
	if !d.purlins() || !d.girts() {
		t.Fatalf("purlins or girts: %s", r.Reason)
	}
	rafter := mustSection(t, d.cat, "C250x80x2.4")
	d.frm = frameChoice{Rafter: rafter, Column: rafter}
	return d
}

// mustSection finds a catalogue section by designation.
func mustSection(t testing.TB, cat *catalog.Catalogue, designation string) catalog.Section {
	t.Helper()
	s, ok := cat.Find(designation)
	if !ok {
		t.Fatalf("no section %q in the catalogue", designation)
	}
	return s
}

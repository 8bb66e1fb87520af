package optimize

import (
	"testing"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
)

// frameOptions returns the default grid's options with knee braces allowed
// or not (a copy: grid options are shared by their cases).
func frameOptions(t testing.TB, kneeBraces bool) *grids.Options {
	t.Helper()
	g, err := grids.Default()
	if err != nil {
		t.Fatal(err)
	}
	o := g.Options
	o.Members.KneeBraces = kneeBraces
	return &o
}

// frameCase is an illustrative shed: 5 bays of 3.6 m, 10° pitch.
func frameCase(o *grids.Options, spanM, eavesM float64, wind, base string) grids.Case {
	c := grids.Case{SpanM: spanM, LengthM: 18, Bays: 5, BaySpacingM: 3.6, EavesHeightM: eavesM, RoofPitchDeg: 10,
		Wind: grids.Wind{HousingClass: wind}, Base: base, Options: o}
	c.ID = grids.CaseID(c)
	return c
}

// testFrameDesigner prepares a designer at the frame step: actions derived,
// purlins and girts set by hand (Z200x1.9 at the grid's largest spacings,
// placed evenly by newFrameGeometry) since the frame step only reads them.
func testFrameDesigner(t testing.TB, c grids.Case, cat *catalog.Catalogue, exhaustive bool) *designer {
	t.Helper()
	act, err := deriveActions(c)
	if err != nil {
		t.Fatal(err)
	}
	r := &Result{Case: c, Members: make([]MemberGroup, len(Roles))}
	for i, role := range Roles {
		r.Members[i].Role = role
	}
	s := &Settings{Catalogue: cat, Exhaustive: exhaustive}
	d := &designer{c: c, s: s, cat: s.catalogue(), act: act, r: r}
	z, ok := catalog.Default().Find("Z200x1.9")
	if !ok {
		t.Fatal("Z200x1.9 missing from the default catalogue")
	}
	d.purlin = lineChoice{Section: z, SpacingM: c.Options.Cladding.MaxPurlinSpacingM}
	d.girt = lineChoice{Section: z, SpacingM: c.Options.Cladding.MaxGirtSpacingM}
	return d
}

// reducedCatalogue is a handful of C and 2C sections from the default
// catalogue (the lightest C stays in as the brace item).
func reducedCatalogue(t testing.TB) *catalog.Catalogue {
	t.Helper()
	cat := &catalog.Catalogue{Name: "reduced"}
	for _, d := range []string{"C100x50x1.0", "C150x60x1.5", "C200x75x1.9", "C250x80x2.4", "C300x90x2.4", "2C250x1.9", "2C300x2.4"} {
		s, ok := catalog.Default().Find(d)
		if !ok {
			t.Fatalf("%s missing from the default catalogue", d)
		}
		cat.Sections = append(cat.Sections, s)
	}
	return cat
}

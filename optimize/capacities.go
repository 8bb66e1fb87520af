package optimize

import (
	"slices"
	"sync"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/coldformed"
)

// capacityTable holds every flexural section's stress-independent
// capacities (coldformed.SectionCapacities), computed once per catalogue
// and shared read-only by every worker.
type capacityTable struct {
	bySection map[string]*coldformed.Capacities
	errs      map[string]error
	shapes    map[catalog.Shape][]catalog.Section // catalog.Catalogue.ByShape, once
}

var capacityTables sync.Map // *catalog.Catalogue → func() *capacityTable

// capacitiesFor returns the catalogue's capacity table, computing it on
// first use. Straps and rods are included: their capacities serve the
// tension checks.
func capacitiesFor(cat *catalog.Catalogue) *capacityTable {
	f, _ := capacityTables.LoadOrStore(cat, sync.OnceValue(func() *capacityTable {
		t := &capacityTable{bySection: map[string]*coldformed.Capacities{}, errs: map[string]error{},
			shapes: map[catalog.Shape][]catalog.Section{}}
		for _, s := range cat.Sections {
			if _, ok := t.shapes[s.Shape]; !ok {
				t.shapes[s.Shape] = slices.Clip(cat.ByShape(s.Shape))
			}
			c, err := coldformed.SectionCapacities(s)
			if err != nil {
				t.errs[s.Designation] = err
				continue
			}
			t.bySection[s.Designation] = &c
		}
		return t
	}))
	return f.(func() *capacityTable)()
}

// byShape is the catalogue's sections of shape s, lightest first
// (catalog.Catalogue.ByShape), shared: callers must not modify it; an
// append copies it (its capacity is its length).
func (t *capacityTable) byShape(s catalog.Shape) []catalog.Section { return t.shapes[s] }

// byShape is capacitiesFor(d.cat).byShape.
func (d *designer) byShape(s catalog.Shape) []catalog.Section { return capacitiesFor(d.cat).byShape(s) }

// of returns a section's capacities, or nil with the reason they could not
// be computed.
func (t *capacityTable) of(s catalog.Section) (*coldformed.Capacities, error) {
	if c, ok := t.bySection[s.Designation]; ok {
		return c, nil
	}
	return nil, t.errs[s.Designation]
}

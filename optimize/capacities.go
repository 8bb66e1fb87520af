package optimize

import (
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
}

var capacityTables sync.Map // *catalog.Catalogue → func() *capacityTable

// capacitiesFor returns the catalogue's capacity table, computing it on
// first use. Straps and rods are included: their capacities serve the
// tension checks.
func capacitiesFor(cat *catalog.Catalogue) *capacityTable {
	f, _ := capacityTables.LoadOrStore(cat, sync.OnceValue(func() *capacityTable {
		t := &capacityTable{bySection: map[string]*coldformed.Capacities{}, errs: map[string]error{}}
		for _, s := range cat.Sections {
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

// of returns a section's capacities, or nil with the reason they could not
// be computed.
func (t *capacityTable) of(s catalog.Section) (*coldformed.Capacities, error) {
	if c, ok := t.bySection[s.Designation]; ok {
		return c, nil
	}
	return nil, t.errs[s.Designation]
}

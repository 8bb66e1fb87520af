package optimize

import "github.com/spansweep/spansweep/catalog"

// lightestPassing scans sections lightest first and returns the first that
// passes check — with exhaustive, every section is checked and the
// lightest passing one is kept, which must be the same section (the
// exactness tests compare the two). It also returns the failure closest to
// passing, for a no_solution reason, and how many sections it checked.
func lightestPassing(secs []catalog.Section, exhaustive bool, check func(catalog.Section) strutVerdict) (best *catalog.Section, closest strutVerdict, searched int) {
	for _, sec := range secs {
		searched++
		v := check(sec)
		if v.governing.Utilisation <= 1 {
			if best == nil || sec.MassKgPerM < best.MassKgPerM {
				best = &sec
			}
			if !exhaustive {
				break
			}
			continue
		}
		if closest.governing.Check == "" || v.governing.Utilisation < closest.governing.Utilisation {
			closest = v
		}
	}
	return best, closest, searched
}

package bill

import (
	"cmp"
	"fmt"

	"github.com/spansweep/spansweep/outputs/dataset"
)

// Pressures are a site's design wind pressures at one building.
type Pressures struct {
	QULSKPa, QSLSKPa float64
}

// SiteWind returns the design pressures of the site asked at a solved
// building (its span, eaves height and pitch set the reference height), so
// that they compare with the row's own q_uls_kpa and q_sls_kpa. Only the
// row's size, wind and status fields are set when SiteWind is called.
type SiteWind func(w WindRequest, at *dataset.Row) (Pressures, error)

// Settings tune Lookup. The zero value is the default.
type Settings struct {
	// Wind computes the asked site's pressures. Nil: only rows whose wind
	// condition is exactly the one asked cover the request (no ordering by
	// pressure across conditions).
	Wind SiteWind
}

// pressureTolerance absorbs rounding between pressures computed by the
// optimiser and by SiteWind (kPa).
const pressureTolerance = 1e-6

// Dimension says how one dimension of the request was met.
type Dimension struct {
	Name  string `json:"name"`
	Asked string `json:"asked"`
	Used  string `json:"used"`
	Why   string `json:"why"`
}

// Match is the solved case chosen for a query and why.
type Match struct {
	Row        dataset.Row
	Dimensions []Dimension
	// Passed names no_solution cases that would have fitted better; they
	// were skipped because they have no passing design.
	Passed []string
	// Scan sums Lookup's scans (the exact condition's and, with a SiteWind,
	// the pressure scan's), so RowGroupsRead may exceed RowGroups.
	Scan dataset.ScanStats
}

// Lookup finds the smallest ok case of d that covers q (package doc). It
// returns a *NotCoveredError when none does.
func Lookup(d *dataset.Dataset, q Query, s Settings) (*Match, error) {
	if q.Wind.Class == "" && q.Wind.DesignLifeYears == 0 {
		q.Wind.DesignLifeYears = DefaultDesignLifeYears
	}
	if err := q.Validate(); err != nil {
		return nil, err
	}
	var c chooser
	for _, f := range q.filters(s) {
		st, err := d.ScanColumns(f, keyColumns, func(r *dataset.Row, ref dataset.RowRef) error { return c.offer(q, s, r, ref) })
		c.scan.RowGroups = st.RowGroups
		c.scan.RowGroupsRead += st.RowGroupsRead
		c.scan.RowsMatched += st.RowsMatched
		if err != nil {
			return nil, fmt.Errorf("lookup: %w", err)
		}
	}
	var skipped *dataset.Row
	if c.bestAny != nil && !c.bestAny.OK() && (c.best == nil || less(c.bestAny, c.best)) {
		r, err := d.ReadRow(c.bestAnyRef)
		if err != nil {
			return nil, fmt.Errorf("lookup: %w", err)
		}
		skipped = &r
	}
	if c.best == nil {
		return nil, notCovered(d, q, s, skipped)
	}
	var passed []string
	if skipped != nil {
		passed = append(passed, fmt.Sprintf("%s (no_solution: %s)", skipped.CaseID, skipped.Reason))
	}
	row, err := d.ReadRow(c.bestRef)
	if err != nil {
		return nil, fmt.Errorf("lookup: %w", err)
	}
	return &Match{Row: row, Dimensions: q.explain(&row, s), Passed: passed, Scan: c.scan}, nil
}

// chooser keeps the smallest covering row, ok and of any status.
type chooser struct {
	best, bestAny       *dataset.Row
	bestRef, bestAnyRef dataset.RowRef
	scan                dataset.ScanStats
}

// keyColumns are the columns Lookup decodes to choose a case: sizes, wind,
// status. The chosen row is then read whole.
var keyColumns = []string{"case_index", "wind_class", "region", "terrain_category", "importance_level",
	"design_life_years", "span_m", "length_m", "bays", "bay_spacing_m", "eaves_height_m", "roof_pitch_deg", "base",
	"hoist_kn", "q_uls_kpa", "q_sls_kpa", "status"}

func (c *chooser) offer(q Query, s Settings, r *dataset.Row, ref dataset.RowRef) error {
	ok, err := q.covers(r, s)
	if err != nil {
		return fmt.Errorf("wind of the site asked: %w", err)
	}
	if !ok {
		return nil
	}
	if c.bestAny == nil || less(r, c.bestAny) {
		k := r.Clone()
		c.bestAny, c.bestAnyRef = &k, ref
	}
	if r.OK() && (c.best == nil || less(r, c.best)) {
		k := r.Clone()
		c.best, c.bestRef = &k, ref
	}
	return nil
}

// filters are the parts of the covering rule that row-group statistics
// can test: every solved size at or above the one asked, and either the
// exact wind condition asked or, with a SiteWind, an ultimate pressure at
// least the site's at the asked building (a lower bound: pressures grow with
// the reference height, and every covering building is at least as tall).
func (q Query) filters(s Settings) []dataset.Filter {
	f := dataset.Filter{
		dataset.AtLeast("span_m", q.SpanM),
		dataset.AtLeast("eaves_height_m", q.EavesHeightM),
		dataset.AtLeast("length_m", q.LengthM),
	}
	if q.BaySpacingM > 0 {
		f = append(f, dataset.AtLeast("bay_spacing_m", q.BaySpacingM), dataset.AtLeast("bays", float64(q.baysNeeded())))
	}
	if q.RoofPitchDeg > 0 {
		f = append(f, dataset.AtLeast("roof_pitch_deg", q.RoofPitchDeg))
	}
	if q.Base != "" {
		f = append(f, dataset.Equal("base", q.Base))
	}
	exact := append(f[:len(f):len(f)], dataset.Equal("wind_class", q.Wind.Class))
	if q.Wind.Class == "" {
		exact = append(exact, dataset.Equal("region", q.Wind.Region))
	}
	out := []dataset.Filter{exact}
	if s.Wind != nil {
		asked := dataset.Row{SpanM: q.SpanM, EavesHeightM: q.EavesHeightM, RoofPitchDeg: q.RoofPitchDeg}
		if p, err := s.Wind(q.Wind, &asked); err == nil {
			out = append(out, append(f, dataset.AtLeast("q_uls_kpa", p.QULSKPa-pressureTolerance)))
		} else {
			out = append(out, f)
		}
	}
	return out
}

// covers reports whether row r covers the query in wind (the sizes are
// already met: Scan applied the filter to each row).
func (q Query) covers(r *dataset.Row, s Settings) (bool, error) {
	if q.Wind.sameCondition(r) {
		return true, nil
	}
	if s.Wind == nil || (q.Wind.Cyclonic() && !rowWind(r).Cyclonic()) {
		return false, nil
	}
	p, err := s.Wind(q.Wind, r)
	if err != nil {
		return false, err
	}
	return r.QULSKPa >= p.QULSKPa-pressureTolerance && r.QSLSKPa >= p.QSLSKPa-pressureTolerance, nil
}

// less orders covering rows: the smallest building first, then the least
// severe wind, then the rest (package doc).
func less(a, b *dataset.Row) bool {
	c := cmp.Or(
		cmp.Compare(a.SpanM, b.SpanM),
		cmp.Compare(a.EavesHeightM, b.EavesHeightM),
		cmp.Compare(a.BaySpacingM, b.BaySpacingM),
		cmp.Compare(a.LengthM, b.LengthM),
		cmp.Compare(a.QULSKPa, b.QULSKPa),
		cmp.Compare(a.RoofPitchDeg, b.RoofPitchDeg),
		cmp.Compare(a.HoistKN, b.HoistKN),
		cmp.Compare(baseRank(a.Base), baseRank(b.Base)),
		cmp.Compare(a.CaseIndex, b.CaseIndex),
	)
	return c < 0
}

// baseRank prefers pinned bases when none is asked: the usual shed base.
func baseRank(b string) int {
	if b == "pinned" {
		return 0
	}
	return 1
}

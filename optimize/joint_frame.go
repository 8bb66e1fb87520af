package optimize

import "fmt"

// recheckFrame gives the designer, whose purlins differ from those frame f
// was designed for, the frame f checked again in full under its own
// purlins' positions and weight: f's rafter and column with the fewest fly
// braces that pass, accepted as the frame step accepts its choice (the
// full check of frameModel.accept). Where the grid allows knee braces the
// pair is searched unbraced and braced first, as the frame step searches
// it. It returns false, leaving the designer to be discarded, when the
// pair no longer passes; err is an analysis error.
func (d *designer) recheckFrame(f frameChoice) (bool, error) {
	m, err := d.newFrameModel()
	defer m.release()
	if err != nil {
		return false, fmt.Errorf("frame model: %w", err)
	}
	// The pair's candidates as the frame step lists them (frameModel.candidates).
	r, c := f.Rafter, f.Column
	rCap, err1 := m.caps.of(r)
	cCap, err2 := m.caps.of(c)
	if err1 != nil || err2 != nil || rCap == nil || cCap == nil {
		return false, nil
	}
	memo, key := d.s.rechecks(), memoKey{}
	if memo != nil {
		key = m.recheckKey(r.Designation, c.Designation)
		if f, ok := memo.recheck(key); ok {
			d.r.Analyses += f.analyses
			m.publish(&f.accepted)
			return true, nil
		}
	}
	pair := m.appendPair(nil, &r, &c, rCap, cCap, 1, d.c.Options.Members.KneeBraces, m.minKneeBraceKg())
	spent := d.r.Analyses
	best := searchResult{cd: pair[0]}
	if len(pair) > 1 {
		var ok bool
		if best, ok, err = m.search(pair); err != nil || !ok {
			return false, err
		}
	}
	return m.acceptInto(best, memo.recheckStore(), key, spent), nil
}

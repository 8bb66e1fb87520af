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
	var pair []frameCandidate
	for _, cd := range m.candidates() {
		if cd.rafter.Designation == f.Rafter.Designation && cd.column.Designation == f.Column.Designation {
			pair = append(pair, cd)
		}
	}
	if len(pair) == 0 {
		return false, nil
	}
	spent := d.r.Analyses
	best := searchResult{cd: pair[0]}
	if len(pair) > 1 {
		var ok bool
		if best, ok, err = m.search(pair); err != nil || !ok {
			return false, err
		}
	}
	return m.accept(best, nil, memoKey{}, spent), nil
}

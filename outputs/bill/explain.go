package bill

import (
	"fmt"
	"strconv"

	"github.com/spansweep/spansweep/outputs/dataset"
)

// metres formats a length the way the answer prints it.
func metres(v float64) string { return strconv.FormatFloat(v, 'f', -1, 64) + " m" }

func degrees(v float64) string { return strconv.FormatFloat(v, 'f', -1, 64) + "°" }

// roundedUp says why a solved value was used for an asked one.
func roundedUp(asked, used float64) string {
	if asked == used {
		return "exact"
	}
	return "rounded up to the smallest covering solved size"
}

// explain lists, dimension by dimension, what was asked and what was used.
func (q Query) explain(r *dataset.Row, s Settings) []Dimension {
	dims := []Dimension{
		{"span", metres(q.SpanM), metres(r.SpanM), roundedUp(q.SpanM, r.SpanM)},
		{"eaves height", metres(q.EavesHeightM), metres(r.EavesHeightM), roundedUp(q.EavesHeightM, r.EavesHeightM)},
		q.explainBay(r),
		q.explainLength(r),
		q.explainPitch(r),
		q.explainBase(r),
		q.explainWind(r, s),
	}
	hoist := Dimension{"hoist load", "none", strconv.FormatFloat(r.HoistKN, 'f', -1, 64) + " kN", "no hoist solved; lowest hoist load solved"}
	if r.HoistKN == 0 {
		hoist.Why = "exact"
	}
	return append(dims, hoist)
}

func (q Query) explainBay(r *dataset.Row) Dimension {
	d := Dimension{"bay spacing", metres(q.BaySpacingM), metres(r.BaySpacingM), roundedUp(q.BaySpacingM, r.BaySpacingM)}
	if q.BaySpacingM == 0 {
		d.Asked, d.Why = "any", "not asked; smallest covering solved spacing"
	}
	return d
}

func (q Query) explainLength(r *dataset.Row) Dimension {
	d := Dimension{"length", metres(q.LengthM), fmt.Sprintf("%s (%d bays of %s)", metres(r.LengthM), r.Bays, metres(r.BaySpacingM)),
		roundedUp(q.LengthM, r.LengthM)}
	if n := q.baysNeeded(); n > 0 {
		d.Asked = fmt.Sprintf("%s (at least %d bays of %s)", metres(q.LengthM), n, metres(q.BaySpacingM))
	}
	return d
}

func (q Query) explainPitch(r *dataset.Row) Dimension {
	d := Dimension{"roof pitch", degrees(q.RoofPitchDeg), degrees(r.RoofPitchDeg), roundedUp(q.RoofPitchDeg, r.RoofPitchDeg)}
	if q.RoofPitchDeg == 0 {
		d.Asked, d.Why = "any", "not asked; lowest covering solved pitch"
	}
	return d
}

func (q Query) explainBase(r *dataset.Row) Dimension {
	if q.Base == "" {
		return Dimension{"base", "any", r.Base, "not asked; pinned preferred"}
	}
	return Dimension{"base", q.Base, r.Base, "exact"}
}

func (q Query) explainWind(r *dataset.Row, s Settings) Dimension {
	used := fmt.Sprintf("%s (q_uls %.3g kPa, q_sls %.3g kPa)", rowWind(r), r.QULSKPa, r.QSLSKPa)
	d := Dimension{"wind", q.Wind.String(), used, "exact condition"}
	if q.Wind.sameCondition(r) || s.Wind == nil {
		return d
	}
	if p, err := s.Wind(q.Wind, r); err == nil {
		d.Asked = fmt.Sprintf("%s (q_uls %.3g kPa, q_sls %.3g kPa at this building)", q.Wind, p.QULSKPa, p.QSLSKPa)
	}
	d.Why = "least severe solved condition at least as severe as the site's"
	return d
}

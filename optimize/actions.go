package optimize

import (
	"fmt"

	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/wind"
	"github.com/spansweep/spansweep/grids"
)

// caseActions is everything the member searches take from a case's
// actions: the wind derivation, dead and live loads, the hoist and the
// AS/NZS 1170.0 combinations over the primary cases.
type caseActions struct {
	Building     wind.Building
	Enclosure    wind.Enclosure
	Wind         wind.Loads
	Dead         actions.Dead
	Hoist        actions.Hoist
	RoofLiveKPa  float64 // on a frame's tributary plan area, span × bay
	Primaries    []actions.PrimaryID
	Combinations []actions.Combination
}

// dominantOpeningAreaRatio is the area ratio taken for a grid's roller door:
// the other walls and roof are taken as effectively sealed, so the door
// dominates (ratio ≥ 6, AS/NZS 1170.2:2021 Table 5.1(B) last row; the most
// severe internal pressure of the table). Conservative, no source needed.
const dominantOpeningAreaRatio = 6

// deriveActions derives the actions of one case.
func deriveActions(c grids.Case) (*caseActions, error) {
	b := wind.Building{SpanM: c.SpanM, LengthM: c.LengthM, EaveHeightM: c.EavesHeightM,
		PitchDeg: c.RoofPitchDeg, BaySpacingM: c.BaySpacingM}
	if err := b.Validate(); err != nil {
		return nil, fmt.Errorf("building: %w", err)
	}
	speeds, err := siteSpeeds(c.Wind, b.ReferenceHeightM())
	if err != nil {
		return nil, fmt.Errorf("wind %s: %w", c.WindCondition(), err)
	}
	// Sheds' walls are taken as equally permeable (Table 5.1(A): −0.3 or 0.0):
	// sheeted walls with flashings and doors are not effectively sealed.
	enc := wind.Enclosure{Permeability: wind.AllWallsPermeable}
	if o := c.Options.Opening; o != nil {
		w := wind.EaveWall
		if o.Wall == grids.WallEnd {
			w = wind.EndWall
		}
		enc.Opening = &wind.DominantOpening{Wall: w, AreaRatio: dominantOpeningAreaRatio, AreaM2: o.WidthM * o.HeightM}
	}
	wl, err := wind.Derive(b, enc, speeds)
	if err != nil {
		return nil, err
	}
	dead, err := actions.Dead{RoofKPa: c.Options.Cladding.RoofDeadKPa, WallKPa: c.Options.Cladding.WallDeadKPa}.Resolved()
	if err != nil {
		return nil, fmt.Errorf("dead: %w", err)
	}
	live, err := actions.RoofLiveKPa(c.SpanM * c.BaySpacingM)
	if err != nil {
		return nil, fmt.Errorf("roof live: %w", err)
	}
	// The hoist hangs from the rafter at mid-span (the apex), the most
	// severe position for the rafter and the frame: stated assumption.
	hoist := actions.Hoist{LoadKN: c.HoistKN, PositionM: c.SpanM / 2}
	hasHoist := c.HoistKN > 0
	if hasHoist {
		if err := hoist.Validate(c.SpanM); err != nil {
			return nil, fmt.Errorf("hoist: %w", err)
		}
	}
	return &caseActions{
		Building: b, Enclosure: enc, Wind: wl, Dead: dead, Hoist: hoist, RoofLiveKPa: live,
		Primaries:    actions.Primaries(wl, hasHoist),
		Combinations: actions.Combinations(wl, hasHoist),
	}, nil
}

// siteSpeeds returns the design speeds of a housing class or a site.
func siteSpeeds(w grids.Wind, referenceHeightM float64) (wind.Speeds, error) {
	if w.IsHousingClass() {
		hc, err := wind.ParseHousingClass(w.HousingClass)
		if err != nil {
			return wind.Speeds{}, err
		}
		return hc.Speeds(referenceHeightM)
	}
	s := wind.Site{Region: w.Region, TerrainCategory: w.TerrainCategory, ImportanceLevel: w.ImportanceLevel,
		DesignLifeYears: w.DesignLifeYears, Ms: w.Ms, Mt: w.Mt, Md: w.Md}
	return s.Speeds(referenceHeightM)
}

// DesignPressures returns the ultimate and serviceability design dynamic
// pressures (kPa) of a wind condition at a building's reference height,
// the same derivation Design uses; the estimator's lookup orders wind
// conditions by them.
func DesignPressures(w grids.Wind, spanM, eavesHeightM, roofPitchDeg float64) (qULSKPa, qSLSKPa float64, err error) {
	b := wind.Building{SpanM: spanM, EaveHeightM: eavesHeightM, PitchDeg: roofPitchDeg}
	s, err := siteSpeeds(w, b.ReferenceHeightM())
	if err != nil {
		return 0, 0, err
	}
	return s.QULSKPa, s.QSLSKPa, nil
}

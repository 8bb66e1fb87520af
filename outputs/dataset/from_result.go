package dataset

import (
	"github.com/spansweep/spansweep/optimize"
)

// FromResult flattens one design result into a Row stamped with meta's
// provenance. Members are matched to columns by role, so a Result may list
// them in any order or omit a role the building does not have.
func FromResult(res optimize.Result, meta Meta) Row {
	c := res.Case
	r := NewRow()
	r.CaseID, r.CaseIndex, r.WindCondition = c.ID, c.Index, c.WindCondition()
	r.WindClass, r.Region = c.Wind.HousingClass, c.Wind.Region
	r.TerrainCategory, r.ImportanceLevel, r.DesignLifeYears = c.Wind.TerrainCategory, c.Wind.ImportanceLevel, c.Wind.DesignLifeYears
	r.SpanM, r.LengthM, r.Bays, r.BaySpacingM = c.SpanM, c.LengthM, c.Bays, c.BaySpacingM
	r.EavesHeightM, r.RoofPitchDeg, r.Base, r.HoistKN = c.EavesHeightM, c.RoofPitchDeg, c.Base, c.HoistKN
	r.VULSMS, r.VSLSMS, r.QULSKPa, r.QSLSKPa = res.VUltimateMS, res.VServiceMS, res.QUltimateKPa, res.QServiceKPa
	for i, role := range optimize.Roles {
		r.Members[i] = memberOf(res.Member(role))
	}
	r.Frames, r.FlyBracesPerFrame = res.Frames, res.FlyBracesPerFrame
	r.KneeBraceColumnM, r.KneeBraceRafterM = res.KneeBraceColumnM, res.KneeBraceRafterM
	f := res.Footing
	r.FootingWidthM, r.FootingDepthM, r.FootingCount, r.ConcreteM3 = f.WidthM, f.DepthM, f.Count, f.ConcreteM3
	r.BoltSize, r.BoltsPerBase = f.BoltSize, f.BoltsPerBase
	r.FootingCheck, r.FootingClause, r.FootingUtilisation = f.Governing.Check, f.Governing.Clause, f.Governing.Utilisation
	bf := res.BracedFooting
	r.BracedFootingWidthM, r.BracedFootingDepthM, r.BracedFootingCount, r.BracedConcreteM3 = bf.WidthM, bf.DepthM, bf.Count, bf.ConcreteM3
	r.BracedBoltSize, r.BracedBoltsPerBase = bf.BoltSize, bf.BoltsPerBase
	r.BracedFootingCheck, r.BracedFootingClause, r.BracedFootingUtilisation = bf.Governing.Check, bf.Governing.Clause, bf.Governing.Utilisation
	r.SteelMassKg, r.MassPerFloorKgM2, r.Cost, r.Analyses = res.SteelMassKg, res.MassPerFloorKgM2, res.Cost, res.Analyses
	r.Status, r.Reason = res.Status.String(), res.Reason
	r.GridSHA256, r.CatalogSHA256, r.ProgramVersion = meta.GridSHA256, meta.CatalogSHA256, meta.ProgramVersion
	return r
}

func memberOf(m optimize.MemberGroup) Member {
	g := m.Governing
	return Member{
		Designation: m.Designation, SpacingM: m.SpacingM, SpanType: m.SpanType,
		BridgingRows: m.Bridging, Lines: m.Lines, Count: m.Count, LengthEachM: m.LengthEachM, MassKg: m.MassKg,
		Utilisation: g.Utilisation, Check: g.Check, Standard: g.Standard, Clause: g.Clause,
		LimitState: g.LimitState, Combination: g.Combination, DeflectionRatio: m.DeflectionRatio,
	}
}

// WriteResult flattens res with the Writer's Meta and writes it.
func (w *Writer) WriteResult(res optimize.Result) error {
	return w.Write(FromResult(res, w.meta))
}

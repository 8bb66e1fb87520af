package bill

import (
	"fmt"

	"github.com/spansweep/spansweep/optimize"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// testCondition is a wind condition of a generated dataset. Pressures of
// the housing classes are 0.6·V² with the AS 4055-2021 Table 2.1 speeds
// (REFERENCE-VALUES §2: N1 34/26, N2 40/26, N3 50/32 m/s, C1 50/32); the
// region's pressures are made up, growing with eaves height as M_z,cat does.
type testCondition struct {
	wind   WindRequest
	quKPa  func(h float64) float64
	qsKPa  func(h float64) float64
	noSoln func(r *dataset.Row) bool // nil: every case solves
}

func classCondition(class string, vu, vs float64) testCondition {
	return testCondition{wind: WindRequest{Class: class},
		quKPa: func(float64) float64 { return 0.6 * vu * vu / 1000 },
		qsKPa: func(float64) float64 { return 0.6 * vs * vs / 1000 }}
}

var (
	condN1 = classCondition("N1", 34, 26)
	condN2 = classCondition("N2", 40, 26)
	condN3 = classCondition("N3", 50, 32)
	condC1 = classCondition("C1", 50, 32)
	// The other AS 4055-2021 Table 2.1 classes (REFERENCE-VALUES §2), for the benchmark.
	condN4 = classCondition("N4", 61, 39)
	condN5 = classCondition("N5", 74, 47)
	condN6 = classCondition("N6", 86, 55)
	condC2 = classCondition("C2", 61, 39)
	condC3 = classCondition("C3", 74, 47)
	condB2 = testCondition{wind: WindRequest{Region: "B2", TerrainCategory: 2.5, ImportanceLevel: 2, DesignLifeYears: 50},
		quKPa: func(h float64) float64 { return 1.0 + 0.05*h },
		qsKPa: func(h float64) float64 { return 0.5 + 0.02*h }}
)

// testLength is one length of the grid: a number of bays of one spacing.
type testLength struct {
	bays    int
	spacing float64
}

// testGrid is the Cartesian product the generator enumerates, outermost
// first, as grids enumerates: wind, eaves height, span, length, pitch, base.
type testGrid struct {
	winds   []testCondition
	heights []float64
	spans   []float64
	lengths []testLength
	pitches []float64
	bases   []string
}

// rows enumerates the grid into made-up solved rows (test inputs, not
// designs). Counts follow simple rules so that a bill can be checked: frames
// = bays + 1, member masses = count × length × 5 kg/m, and the steel mass is
// their sum.
func (g testGrid) rows() []dataset.Row {
	var out []dataset.Row
	for _, w := range g.winds {
		for _, h := range g.heights {
			for _, s := range g.spans {
				for _, l := range g.lengths {
					for _, p := range g.pitches {
						for _, b := range g.bases {
							out = append(out, makeRow(len(out), w, h, s, l, p, b))
						}
					}
				}
			}
		}
	}
	return out
}

func makeRow(i int, w testCondition, h, span float64, l testLength, pitch float64, base string) dataset.Row {
	r := dataset.NewRow()
	r.CaseIndex = i
	r.WindClass, r.Region, r.TerrainCategory = w.wind.Class, w.wind.Region, w.wind.TerrainCategory
	r.ImportanceLevel, r.DesignLifeYears = w.wind.ImportanceLevel, w.wind.DesignLifeYears
	r.WindCondition = w.wind.Class
	if r.WindCondition == "" {
		r.WindCondition = fmt.Sprintf("%s-TC%g-IL%d", w.wind.Region, w.wind.TerrainCategory, w.wind.ImportanceLevel)
	}
	r.EavesHeightM, r.SpanM, r.Bays, r.BaySpacingM = h, span, l.bays, l.spacing
	r.LengthM, r.RoofPitchDeg, r.Base = float64(l.bays)*l.spacing, pitch, base
	r.CaseID = fmt.Sprintf("s%g-l%gx%d-h%g-p%g-%s-%s", span, r.LengthM, l.bays, h, pitch, r.WindCondition, base)
	r.QULSKPa, r.QSLSKPa = w.quKPa(h), w.qsKPa(h)
	r.Frames, r.FlyBracesPerFrame = l.bays+1, 2
	r.FootingCount, r.FootingWidthM, r.FootingDepthM, r.BoltsPerBase, r.BoltSize = 2*r.Frames, 0.6, 0.8, 4, "M16"
	r.ConcreteM3 = float64(r.FootingCount) * 0.6 * 0.6 * 0.8
	for k, role := range optimize.Roles {
		m := &r.Members[k]
		m.Designation, m.Count, m.LengthEachM = fmt.Sprintf("C%d", 100+10*k+int(span)), 2*r.Frames, span/2
		m.MassKg = float64(m.Count) * m.LengthEachM * 5
		r.SteelMassKg += m.MassKg
		if role == optimize.RolePurlin || role == optimize.RoleGirt {
			m.BridgingRows, m.LengthEachM = 1, l.spacing
			r.SteelMassKg -= m.MassKg
			m.MassKg = float64(m.Count) * m.LengthEachM * 5
			r.SteelMassKg += m.MassKg
		}
	}
	r.MassPerFloorKgM2 = r.SteelMassKg / r.FloorAreaM2()
	r.Status = "ok"
	if w.noSoln != nil && w.noSoln(&r) {
		r.Status, r.Reason = "no_solution", "rafter: no passing section"
	}
	return r
}

// testSiteWind stands in for checks/wind: the class pressures above, and
// made-up region sites whose pressure depends on the eaves height.
func testSiteWind(w WindRequest, at *dataset.Row) (Pressures, error) {
	for _, c := range []testCondition{condN1, condN2, condN3, condN4, condN5, condN6, condC1, condC2, condC3} {
		if c.wind.Class == w.Class && w.Class != "" {
			return Pressures{c.quKPa(0), c.qsKPa(0)}, nil
		}
	}
	switch w.Region {
	case "B2":
		return Pressures{condB2.quKPa(at.EavesHeightM), condB2.qsKPa(at.EavesHeightM)}, nil
	case "B1": // between N2 and B2
		return Pressures{0.9 + 0.05*at.EavesHeightM, 0.3}, nil
	case "A2": // above N2 and B2, below N3
		return Pressures{1.3, 0.4}, nil
	}
	return Pressures{}, fmt.Errorf("test site wind: no data for %v", w)
}

// writeRows writes rows into a new dataset directory.
func writeRows(dir string, rows []dataset.Row) error {
	w, err := dataset.Create(dir, dataset.Meta{ProgramVersion: "test", GridSHA256: "g", CatalogSHA256: "c"})
	if err != nil {
		return err
	}
	for _, r := range rows {
		if err := w.Write(r); err != nil {
			w.Abort()
			return err
		}
	}
	return w.Close()
}

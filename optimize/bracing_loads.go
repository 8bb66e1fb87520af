package optimize

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/checks/wind"
)

// bracingCase is one action the bracing carries: a longitudinal wind case
// (with the frames' restraint forces) or the gravity case in which the
// restraint forces act alone.
type bracingCase struct {
	name     string  // the wind case's name, or the gravity combination's
	windCase int     // index into the case's wind cases; −1 for gravity
	gableKPa float64 // ULS net pressure on the end wall one braced end takes (magnitude)
}

// gravityBracingCase names the case in which only the frames' restraint
// forces load the bracing: the frames' largest moments come from gravity.
const gravityBracingCase = "ULS 1.2G+1.5Q"

// bracingSolve is one bracing case in one direction: +1 pushes the end
// wall into the building, −1 pulls it out (the wind from the other end, or
// suction on a leeward wall).
type bracingSolve struct {
	cas        bracingCase
	direction  float64
	roof, wall bayForces
	// basis names the frame whose restraint forces the solve carries when
	// it is not the case's own (frameAndBracing); empty for the own.
	basis string
}

// dirName names the solve's direction.
func (s bracingSolve) dirName() string {
	if s.direction < 0 {
		return "outward"
	}
	return "inward"
}

// label names the solve for check lines, with the uplift combination's
// 0.9G (the bracing forces themselves carry no gravity).
func (s bracingSolve) label() string { return s.labelWith("0.9G") }

// labelWith names the solve with the given permanent-action term.
func (s bracingSolve) labelWith(g string) string {
	label := fmt.Sprintf("ULS %s+Wu %s, end wall load %s", g, s.cas.name, s.dirName())
	if s.cas.windCase < 0 {
		label = fmt.Sprintf("%s, frame restraint forces %s", s.cas.name, s.dirName())
	}
	if s.basis != "" {
		label += " (" + s.basis + ")"
	}
	return label
}

// bracingCases lists the longitudinal wind cases, each with the larger of
// its windward and leeward end-wall net pressures (AS/NZS 1170.2:2021
// Tables 5.2(A), 5.2(B) with the internal pressure of the case): each
// braced end carries its own end wall, so the end bays take whichever is
// larger. Frictional drag on the roof and side walls (cl. 5.5) is not
// included. Then the gravity case with restraint forces alone.
func (d *designer) bracingCases() []bracingCase {
	var out []bracingCase
	for i := range d.act.Wind.Cases {
		c := &d.act.Wind.Cases[i]
		if c.Direction != wind.Longitudinal {
			continue
		}
		var p float64
		for _, k := range []wind.SurfaceKind{wind.WindwardWall, wind.LeewardWall} {
			if s := c.Surface(k); s != nil {
				for _, z := range s.Zones {
					p = math.Max(p, math.Abs(z.PressureULSKPa))
				}
			}
		}
		out = append(out, bracingCase{name: c.Name, windCase: i, gableKPa: p})
	}
	return append(out, bracingCase{name: gravityBracingCase, windCase: -1})
}

// flangeForceN is a frame member's largest flange force, M*/d (N), from
// the frame step's largest ULS moment; where the frame step gives none,
// the section's design moment capacity φZ_x f_y (AS/NZS 4600:2018
// cl. 3.3.2, φ = 0.9) bounds it from above.
func flangeForceN(s catalog.Section, momentKNm float64) float64 {
	if !(s.DepthMM > 0) {
		return 0
	}
	m := momentKNm * 1e6
	if !(m > 0) {
		m = 0.9 * s.ZxMM3 * s.FyMPa
	}
	return m / s.DepthMM
}

// restraintForcesN are the restraint forces one braced bay takes from the
// frames it restrains (N): 2.5 % of each frame's flange force, rafters in
// the roof bracing and columns in the wall bracing (restraintFraction).
func (d *designer) restraintForcesN(l bracingLayout) (roofN, wallN float64) {
	nf := float64(l.framesPerBay)
	return restraintFraction * nf * flangeForceN(d.frm.Rafter, d.frm.RafterMomentKNm),
		restraintFraction * nf * flangeForceN(d.frm.Column, d.frm.ColumnMomentKNm)
}

// solveBracing solves the roof and wall bays of an end braced bay for every
// bracing case in both directions. The roof bay spans from eave to eave
// (both slopes unfolded into one plane; the rafters are its chords, the
// purlins its struts); the end wall's top reactions load the end rafter's
// panel points and the restraint forces the next rafter's. Each eave
// reaction then loads the top of a side-wall bay (the columns its chords,
// the eave purlin its top strut), held at the column bases.
// The bays are determinate, so the solves depend on the layout, the
// loads and the frame's restraint forces, not on the struts' sections: the
// bracing step's solves are kept (d.braceSolves) and the footings reuse
// them for the same layout.
func (d *designer) solveBracing(l bracingLayout) ([]bracingSolve, error) {
	if d.braceSolves != nil && d.braceLayout == l {
		return d.braceSolves, nil
	}
	out, err := d.solveBracingBays(l)
	if err == nil {
		d.braceSolves, d.braceLayout = out, l
	}
	return out, err
}

// solveBracingBays solves the bays of solveBracing.
func (d *designer) solveBracingBays(l bracingLayout) ([]bracingSolve, error) {
	diag := analysis.Section{E: steelE, A: 100} // any area: the bays are determinate (solveBay)
	roofSpec := analysis.BracingBaySpec{LengthMM: 2 * l.slopeM * 1e3, WidthMM: l.bayM * 1e3, Panels: l.roofPanels,
		Chord: trussSection(d.frm.Rafter, 1000), Strut: trussSection(d.purlin.Section, 500), Diagonal: diag,
		Support: analysis.SpanningBay}
	wallSpec := analysis.BracingBaySpec{LengthMM: l.eavesM * 1e3, WidthMM: l.bayM * 1e3, Panels: l.wallPanels,
		Chord: trussSection(d.frm.Column, 1000), Strut: trussSection(d.purlin.Section, 500), Diagonal: diag,
		Support: analysis.CantileverBay}
	roofBay, err := newBaySolver(roofSpec)
	if err != nil {
		return nil, err
	}
	wallBay, err := newBaySolver(wallSpec)
	if err != nil {
		return nil, err
	}
	shares := l.roofPanelShares()
	roofR, wallR := d.restraintForcesN(l)
	area := l.gableAreaM2()
	var out []bracingSolve
	for _, bc := range d.bracingCases() {
		for _, dir := range []float64{1, -1} {
			s := bracingSolve{cas: bc, direction: dir}
			roof := bayLoads{chordA: make([]float64, l.roofPanels+1), chordB: make([]float64, l.roofPanels+1)}
			for i, f := range shares {
				// Half of the wall's load goes to the roof line (kN → N).
				roof.chordA[i] = dir * bc.gableKPa * area / 2 * f * 1e3
				roof.chordB[i] = dir * roofR / float64(l.roofPanels+1)
			}
			var err error
			if s.roof, err = roofBay.solve(roof, s.label()+", roof"); err != nil {
				return nil, err
			}
			// The side wall under the eave with the larger reaction; the
			// roof bay pushes on it with the reaction reversed.
			top := -s.roof.reaction[0][1]
			if r := -s.roof.reaction[1][1]; math.Abs(r) > math.Abs(top) {
				top = r
			}
			wall := bayLoads{chordA: make([]float64, l.wallPanels+1), chordB: make([]float64, l.wallPanels+1)}
			wall.chordA[l.wallPanels] = top
			wall.chordB[l.wallPanels] = dir * wallR
			if s.wall, err = wallBay.solve(wall, s.label()+", wall"); err != nil {
				return nil, err
			}
			out = append(out, s)
		}
	}
	return out, nil
}

package optimize

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/checks/wind"
)

// frameGeometry is the interior portal frame of a case in the analysis
// units (N, mm) and the loads it carries that do not depend on its sections.
type frameGeometry struct {
	spanMM, heightMM, pitchRad float64
	cosPitch, tanPitch         float64
	rafterMM                   float64 // slope length of one rafter, eave to apex
	riseMM                     float64
	tributaryM                 float64   // width of roof and wall the frame carries
	purlinsMM                  []float64 // along each rafter from its eave
	girtsMM                    []float64 // above the base
}

// tributaryWidthM is the width of building one interior frame carries: one
// bay; with a single bay both frames are end frames and carry half a bay.
// End frames are taken as the interior frame's sections (stated default:
// an end frame carries half the width, the end-wall columns the rest).
func tributaryWidthM(bays int, bayM float64) float64 {
	if bays < 2 {
		return bayM / 2
	}
	return bayM
}

// newFrameGeometry reads the frame of the case and the purlin and girt
// lines chosen earlier. Without a purlin (girt) choice the lines are taken
// at the grid's largest spacing, so the outer flange still has restraints.
func (d *designer) newFrameGeometry() frameGeometry {
	c := d.c
	a := c.RoofPitchDeg * math.Pi / 180
	g := frameGeometry{spanMM: c.SpanM * 1e3, heightMM: c.EavesHeightM * 1e3, pitchRad: a,
		tributaryM: tributaryWidthM(c.Bays, c.BaySpacingM)}
	g.cosPitch, g.tanPitch = math.Cos(a), math.Tan(a)
	g.rafterMM = g.spanMM / 2 / math.Cos(a)
	g.riseMM = g.spanMM / 2 * math.Tan(a)
	g.purlinsMM = linePositionsMM(d.purlin.PositionsM, g.rafterMM, c.Options.Cladding.MaxPurlinSpacingM)
	g.girtsMM = linePositionsMM(d.girt.PositionsM, g.heightMM, c.Options.Cladding.MaxGirtSpacingM)
	return g
}

// linePositionsMM converts chosen line positions to mm, or spaces lines
// evenly at no more than maxSpacingM over lengthMM when none are given.
func linePositionsMM(positionsM []float64, lengthMM, maxSpacingM float64) []float64 {
	// Lines at an end are kept a micrometre inside it, so that rounding in
	// the portal's own lengths never puts them past the part's end.
	const inset = 1e-3
	var out []float64
	for _, p := range positionsM {
		if x := p * 1e3; x >= -inset && x <= lengthMM+inset {
			out = append(out, math.Min(math.Max(x, inset), lengthMM-inset))
		}
	}
	if len(out) > 0 || !(maxSpacingM > 0) {
		return out
	}
	n := int(math.Ceil(lengthMM/(maxSpacingM*1e3) - 1e-9))
	for i := 0; i <= n; i++ {
		out = append(out, math.Min(math.Max(lengthMM*float64(i)/float64(n), inset), lengthMM-inset))
	}
	return out
}

// loadCases builds the primary load cases of portal p in the order of
// d.act.Primaries: G, Q, H (if any), then one per wind case at ULS
// pressures. Wind blows from the left (the frame is symmetric).
func (d *designer) loadCases(p *analysis.Portal, g *frameGeometry) ([]analysis.LoadCase, error) {
	cases := make([]analysis.LoadCase, 0, len(d.act.Primaries))
	for _, id := range d.act.Primaries {
		lc := analysis.LoadCase{Name: string(id)}
		switch id {
		case actions.G:
			d.deadLoads(p, g, &lc)
		case actions.Q:
			p.RoofGravity(&lc, 0, g.spanMM, d.act.RoofLiveKPa*g.tributaryM)
		case actions.H:
			d.hoistLoad(p, g, &lc)
		default:
			wc := d.windCase(id)
			if wc == nil {
				return nil, fmt.Errorf("frame loads: primary case %q has no wind case", id)
			}
			d.windLoads(p, g, wc, &lc)
		}
		cases = append(cases, lc)
	}
	return cases, nil
}

// deadLoads are G: roof cladding on the slope, purlin and girt self weight
// at their lines, wall cladding down the columns, and the frame's own
// weight (LoadCase.SelfWeight).
func (d *designer) deadLoads(p *analysis.Portal, g *frameGeometry, lc *analysis.LoadCase) {
	t := g.tributaryM
	roof := d.act.Dead.RoofKPa * t // kN/m = N/mm per slope length
	for _, pt := range []analysis.Part{analysis.LeftRafter, analysis.RightRafter} {
		p.PartLoad(lc, pt, 0, g.rafterMM, analysis.GlobalAxes, 0, -roof, false)
	}
	wall := d.act.Dead.WallKPa * t // N/mm of column height: the wall hangs on the girts
	for _, pt := range []analysis.Part{analysis.LeftColumn, analysis.RightColumn} {
		p.PartLoad(lc, pt, 0, g.heightMM, analysis.GlobalAxes, 0, -wall, false)
	}
	if w := d.purlin.Section.MassKgPerM * analysis.Gravity * t; w > 0 {
		for _, r := range p.Purlins {
			p.PointLoadAt(lc, r, analysis.GlobalAxes, 0, -w)
		}
	}
	if w := d.girt.Section.MassKgPerM * analysis.Gravity * t; w > 0 {
		for _, r := range p.Girts {
			p.PointLoadAt(lc, r, analysis.GlobalAxes, 0, -w)
		}
	}
	lc.SelfWeight = 1
}

// hoistLoad is H: the hoist's point load on the rafter at its plan position.
func (d *designer) hoistLoad(p *analysis.Portal, g *frameGeometry, lc *analysis.LoadCase) {
	x := d.act.Hoist.PositionM * 1e3
	pt, along := analysis.LeftRafter, x/math.Cos(g.pitchRad)
	if x > g.spanMM/2 {
		pt, along = analysis.RightRafter, (x-g.spanMM/2)/math.Cos(g.pitchRad)
	}
	p.PointLoadAt(lc, p.Restraint(pt, math.Min(along, g.rafterMM)), analysis.GlobalAxes, 0, -d.act.Hoist.LoadKN*1e3)
}

// windCase returns the wind case of a wind primary, or nil.
func (d *designer) windCase(id actions.PrimaryID) *wind.WindCase {
	for i := range d.act.Wind.Cases {
		if actions.WindPrimary(d.act.Wind.Cases[i].Name) == id {
			return &d.act.Wind.Cases[i]
		}
	}
	return nil
}

// windLoads are one wind case's ULS net pressures (Zone.PressureULSKPa,
// inward positive) times the tributary width: crosswind roof zones by plan
// distance from the windward (left) eave and the windward and leeward walls
// on the columns; longitudinal wind takes the roof and side-wall zones at
// the first interior frame, averaged over its tributary strip from half a
// bay to one and a half bays from the windward end (stated assumption: the
// most loaded interior frame; the end frame carries half that width).
func (d *designer) windLoads(p *analysis.Portal, g *frameGeometry, wc *wind.WindCase, lc *analysis.LoadCase) {
	t := g.tributaryM
	h := g.heightMM
	for _, s := range wc.Surfaces {
		switch {
		case wc.Direction == wind.Crosswind && s.Kind.IsRoof():
			for _, z := range s.Zones {
				p.RoofPressure(lc, z.FromM*1e3, z.ToM*1e3, z.PressureULSKPa*t)
			}
		case wc.Direction == wind.Crosswind && s.Kind == wind.WindwardWall:
			p.WallPressure(lc, analysis.Left, 0, h, uniformPressureKPa(s)*t)
		case wc.Direction == wind.Crosswind && s.Kind == wind.LeewardWall:
			p.WallPressure(lc, analysis.Right, 0, h, uniformPressureKPa(s)*t)
		case wc.Direction == wind.Longitudinal && s.Kind == wind.Roof:
			p.RoofPressure(lc, 0, g.spanMM, d.stripPressureKPa(s)*t)
		case wc.Direction == wind.Longitudinal && s.Kind == wind.SideWalls:
			q := d.stripPressureKPa(s) * t
			p.WallPressure(lc, analysis.Left, 0, h, q)
			p.WallPressure(lc, analysis.Right, 0, h, q)
		}
	}
}

// uniformPressureKPa is the length-weighted mean ULS pressure of a surface
// (windward and leeward walls carry a single zone).
func uniformPressureKPa(s wind.Surface) float64 {
	return meanPressureKPa(s, s.FromM, s.ToM)
}

// stripPressureKPa is a longitudinal surface's mean ULS pressure over the
// design frame's tributary strip.
func (d *designer) stripPressureKPa(s wind.Surface) float64 {
	b := d.c.BaySpacingM
	if d.c.Bays < 2 {
		return meanPressureKPa(s, 0, b/2)
	}
	return meanPressureKPa(s, b/2, 1.5*b)
}

// meanPressureKPa averages a surface's zone pressures over [from, to] m.
func meanPressureKPa(s wind.Surface, from, to float64) float64 {
	var sum float64
	for _, z := range s.Zones {
		if a, b := math.Max(z.FromM, from), math.Min(z.ToM, to); b > a {
			sum += z.PressureULSKPa * (b - a)
		}
	}
	if to <= from {
		return 0
	}
	return sum / (to - from)
}

// combinations maps the case's combinations onto the primary indices.
func (d *designer) combinations() []analysis.Combination {
	index := make(map[actions.PrimaryID]int, len(d.act.Primaries))
	for i, id := range d.act.Primaries {
		index[id] = i
	}
	out := make([]analysis.Combination, len(d.act.Combinations))
	for i, c := range d.act.Combinations {
		for _, f := range c.Factors {
			out[i] = append(out[i], analysis.Term{Case: index[f.Case], Factor: f.Factor})
		}
	}
	return out
}

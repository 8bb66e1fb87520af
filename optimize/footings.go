package optimize

import (
	"errors"
	"fmt"
	"math"

	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/footing"
)

// footingRole names the footings in reasons and in the calculation; it is
// not a member group (footings are concrete, reported apart from steel).
const footingRole Role = "footing"

// footings sizes a square pad and holding-down bolts per column base with
// checks/footing's defaults (allowable bearing 100 kPa, common practice, no
// source: a site investigation must confirm it; 24 kN/m³ concrete with
// 0.9G against uplift; friction 0.3; soil over the pad not counted; class
// 4.6 bolts to AS 4100:2020 cl. 9.3.2). Two base types are designed: the
// frame bases outside the braced bays under the frame's reactions, and the
// braced bays' bases with the wall bracing's reactions added (uplift or
// down, and shear along the building combined with the frame's shear as a
// vector). The frame's reactions are those of an interior frame, used at
// the end frames too (they carry about half the load: conservative).
func (d *designer) footings() bool {
	if len(d.frm.Left) == 0 && len(d.frm.Right) == 0 {
		d.fail(footingRole, "the frame step gave no base reactions to size the footings from")
		return false
	}
	braced, err := d.bracedBaseExtras()
	if err != nil {
		d.fail(footingRole, err.Error())
		return false
	}
	plain, withBracing := newFootingInput("frame base"), newFootingInput("braced bay base")
	for _, side := range []struct {
		name string
		rs   []BaseReaction
	}{{"left", d.frm.Left}, {"right", d.frm.Right}} {
		for _, r := range side.rs {
			fr := footing.Reaction{Combination: fmt.Sprintf("%s (%s base)", r.Combination, side.name),
				VerticalKN: r.VerticalKN, ShearKN: r.ShearKN, MomentKNm: r.MomentKNm}
			plain.add(r.LimitState, fr)
			withBracing.add(r.LimitState, fr)
			for _, x := range braced[r.Combination] {
				withBracing.add(r.LimitState, footing.Reaction{Combination: fr.Combination + " + " + x.name,
					VerticalKN: r.VerticalKN + x.verticalKN, ShearKN: math.Hypot(r.ShearKN, x.shearKN), MomentKNm: r.MomentKNm})
			}
		}
	}
	var designs [2]footing.Footing
	for i, b := range []footing.Base{plain.base, withBracing.base} {
		f, err := designFooting(d.s.memo(), b)
		if err != nil {
			var ns *footing.NoSolutionError
			if errors.As(err, &ns) {
				d.fail(footingRole, ns.Error())
			} else {
				d.fail(footingRole, err.Error())
			}
			return false
		}
		designs[i] = f
	}
	d.setFootings(designs)
	return true
}

// footingCounts returns the pads outside and inside the braced bays: each
// braced bay has two frames (adjacent braced bays share one) and two bases
// per frame.
func (d *designer) footingCounts() (plain, braced int) {
	frames := d.r.Frames
	if frames == 0 {
		frames = d.c.Bays + 1
	}
	l := d.layoutBracing()
	bracedFrames := min(frames, 2*l.bracedBays)
	return 2 * (frames - bracedFrames), 2 * bracedFrames
}

// footingOf turns a footing design into the result's footing of n pads.
func footingOf(f footing.Footing, n int) Footing {
	g := f.Pad.Governing
	return Footing{WidthM: f.Pad.WidthM, DepthM: f.Pad.DepthM, Count: n,
		ConcreteM3: float64(n) * f.Pad.ConcreteVolumeM3, BoltSize: f.Bolts.Size + " " + f.Bolts.PropertyClass,
		BoltsPerBase: f.Bolts.Count,
		Governing: Governing{Check: g.Name, Standard: g.Standard, Clause: g.Clause, LimitState: g.LimitState,
			Combination: g.Combination, Utilisation: g.Utilisation}}
}

// footingInput collects a base's reactions, dropping repeats: the
// symmetric frame's bases and the bracing's directions give many equal
// reactions, and each costs a pass over checks/footing's pad grid.
type footingInput struct {
	base footing.Base
	seen map[[4]float64]bool
}

func newFootingInput(name string) *footingInput {
	return &footingInput{base: footing.Base{Name: name}, seen: map[[4]float64]bool{}}
}

// add appends r to the ULS or SLS list unless an equal reaction (to 1 N,
// 1 N·m) is there already.
func (in *footingInput) add(limitState string, r footing.Reaction) {
	ls := 0.0
	if limitState == "SLS" {
		ls = 1
	}
	key := [4]float64{ls, math.Round(r.VerticalKN * 1e3), math.Round(math.Abs(r.ShearKN) * 1e3), math.Round(math.Abs(r.MomentKNm) * 1e3)}
	if in.seen[key] {
		return
	}
	in.seen[key] = true
	if ls == 1 {
		in.base.SLS = append(in.base.SLS, r)
		return
	}
	in.base.ULS = append(in.base.ULS, r)
}

// bracingExtra is a wall bracing bay's reaction on one column base (kN,
// vertical positive down onto the footing, shear along the building).
type bracingExtra struct {
	name       string
	verticalKN float64
	shearKN    float64
}

// bracedBaseExtras maps each combination name to the wall bracing's
// reactions on a braced bay's column bases: for a longitudinal wind
// combination the solve of its wind case scaled by the combination's wind
// factor (ULS 1, SLS q_s/q_u; the restraint forces are scaled with it),
// both directions and both columns of the bay; the gravity restraint case
// for "ULS 1.2G+1.5Q".
func (d *designer) bracedBaseExtras() (map[string][]bracingExtra, error) {
	l := d.layoutBracing()
	solves, err := d.solveBracing(l)
	if err != nil {
		return nil, fmt.Errorf("bracing reactions: %w", err)
	}
	out := map[string][]bracingExtra{}
	for _, comb := range d.act.Combinations {
		for _, s := range solves {
			f := 0.0
			switch {
			case s.cas.windCase >= 0:
				f = comb.FactorOn(actions.WindPrimary(s.cas.name))
			case comb.Name == gravityBracingCase:
				f = 1
			}
			if f == 0 {
				continue
			}
			for k, col := range []string{"end column", "next column"} {
				r := s.wall.reaction[k] // force on the bay: along the column (up) and along the building
				out[comb.Name] = append(out[comb.Name], bracingExtra{
					name:       fmt.Sprintf("wall bracing (%s, %s)", s.dirName(), col),
					verticalKN: f * r[0] / 1e3, shearKN: f * math.Abs(r[1]) / 1e3})
			}
		}
	}
	return out, nil
}

// setFootings reports the frame bases' and the braced bays' pads.
func (d *designer) setFootings(designs [2]footing.Footing) {
	plain, braced := d.footingCounts()
	if plain > 0 {
		d.r.Footing, d.r.BracedFooting = footingOf(designs[0], plain), footingOf(designs[1], braced)
		d.r.Footing.Bases, d.r.BracedFooting.Bases = "frame bases", "braced-bay bases"
	} else {
		d.r.Footing = footingOf(designs[1], braced) // every base is in a braced bay
		d.r.Footing.Bases = "braced-bay bases"
	}
	if d.r.Calculation == nil {
		return
	}
	var checks []CheckLine
	notes := []string{"one footing type at the frame bases outside the braced bays and one at the braced bays' bases (common practice, no source)"}
	for i, k := range designs {
		n := []int{plain, braced}[i]
		notes = append(notes, fmt.Sprintf("%s (%d pads): %.2f m square x %.2f m deep, governed by %s; %d x %s %s bolts, governed by %s",
			k.Pad.Base, n, k.Pad.WidthM, k.Pad.DepthM, k.Pad.Governing.Name, k.Bolts.Count, k.Bolts.Size, k.Bolts.PropertyClass, k.Bolts.Governing.Name))
		for _, c := range append(append([]footing.Check(nil), k.Pad.Checks...), k.Bolts.Checks...) {
			checks = append(checks, CheckLine{Member: "footing, " + k.Pad.Base, Name: c.Name, Standard: c.Standard, Clause: c.Clause,
				LimitState: c.LimitState, Combination: c.Combination, Demand: c.Demand, Capacity: c.Capacity, Unit: c.Unit,
				Utilisation: c.Utilisation})
		}
	}
	notes = append(notes, designs[0].Pad.Notes...)
	notes = append(notes, designs[0].Bolts.Notes...)
	f := d.r.Footing
	d.record(GroupCalculation{Role: footingRole, Designation: fmt.Sprintf("pad %.2fx%.2fx%.2f m, %d x %s", f.WidthM, f.WidthM, f.DepthM,
		f.BoltsPerBase, f.BoltSize), Checks: checks, Notes: notes})
}

// padOptions are checks/footing's defaults with the soil's passive
// resistance on the pad's faces counted at half the Rankine value
// (PassiveFactor 0.5): pads are cast against undisturbed ground, and a
// pinned-base portal's wind shear arrives with uplift, when friction alone
// offers nothing. Common practice, no source; the site investigation the
// footing notes call for must confirm the soil's friction angle.
var padOptions = func() footing.Options {
	o := footing.DefaultOptions()
	o.IncludePassive = true
	return o
}()

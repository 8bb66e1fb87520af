package footing

import (
	"math"
)

// StabilisingFactor is the factor on permanent actions that resist
// uplift, sliding and overturning: 0.9G, AS/NZS 1170.0:2002 cl. 4.2.1(b)
// (from memory).
const StabilisingFactor = 0.9

const (
	std1170 = "AS/NZS 1170.0:2002"
	cl1170  = "4.2.1(b)"
)

// pad is one candidate pad with the options it is checked under.
type pad struct {
	b, d float64 // width and concrete depth, m
	o    *Options
}

func (p pad) volume() float64         { return p.b * p.b * p.d }
func (p pad) concreteWeight() float64 { return p.o.ConcreteUnitWeightKNm3 * p.volume() }
func (p pad) soilWeight() float64     { return p.o.SoilUnitWeightKNm3 * p.b * p.b * p.o.SoilCoverM }
func (p pad) underside() float64      { return p.o.SoilCoverM + p.d }

// stabilising is 0.9 × (pad weight + soil prism if counted), kN.
func (p pad) stabilising() float64 {
	w := p.concreteWeight()
	if p.o.IncludeSoil {
		w += p.soilWeight()
	}
	return StabilisingFactor * w
}

// momentAtUnderside is the overturning moment about the pad's underside:
// the base moment plus the shear times its height above it, kN·m.
func (p pad) momentAtUnderside(r Reaction) float64 {
	return math.Abs(r.MomentKNm) + math.Abs(r.ShearKN)*p.underside()
}

// uplift: ULS uplift against 0.9 × the footing's weight.
func (p pad) uplift(r Reaction) Check {
	return newCheck(std1170, cl1170, "uplift (0.9 x pad weight)", ULS, r.Combination,
		max(-r.VerticalKN, 0), p.stabilising(), "kN")
}

// bearing: SLS gross pressure under the pad against the allowable pressure,
// linear distribution with partial contact beyond the kern.
func (p pad) bearing(r Reaction) Check {
	q := p.o.AllowableBearingKPa
	c := newCheck("common practice, no source", "allowable bearing (site investigation per AS 2870 / AS 1726 needed)",
		"bearing pressure", SLS, r.Combination, 0, q, "kPa")
	load := r.VerticalKN + p.concreteWeight() + p.soilWeight()
	if load <= 0 {
		return c
	}
	e := p.momentAtUnderside(r) / load
	switch {
	case e <= p.b/6: // within the kern: trapezoidal
		c.Demand = load / (p.b * p.b) * (1 + 6*e/p.b)
	case e < p.b/2: // partial contact: triangular over 3(B/2 − e)
		c.Demand = 2 * load / (3 * p.b * (p.b/2 - e))
	default: // resultant outside the pad: no equilibrium on soil
		c.Demand = NoCapacityUtilisation * q
	}
	c.Utilisation = utilisation(c.Demand, c.Capacity)
	return c
}

// sliding: ULS base shear against friction μ(V + 0.9W), plus reduced
// Rankine passive on the pad face when opted.
func (p pad) sliding(r Reaction) Check {
	n := max(r.VerticalKN+p.stabilising(), 0)
	capacity := p.o.FrictionCoefficient * n
	if p.o.IncludePassive {
		capacity += p.passive()
	}
	return newCheck(std1170, cl1170, p.o.slidingName, ULS, r.Combination, math.Abs(r.ShearKN), capacity, "kN")
}

// passive is the reduced Rankine passive force on one face of the pad, kN:
// factor × ½ Kp γ (z2² − z1²) B with Kp = (1 + sin φ')/(1 − sin φ')
// (Rankine earth pressure, classical soil mechanics).
func (p pad) passive() float64 {
	s := math.Sin(p.o.SoilFrictionAngleDeg * math.Pi / 180)
	kp := (1 + s) / (1 - s)
	z1, z2 := p.o.SoilCoverM, p.underside()
	return p.o.PassiveFactor * 0.5 * kp * p.o.SoilUnitWeightKNm3 * (z2*z2 - z1*z1) * p.b
}

// overturning: ULS stability about the pad's edge, |M| + |H|z against
// (V + 0.9W)·B/2 (resultant within the pad, e ≤ B/2).
func (p pad) overturning(r Reaction) Check {
	n := max(r.VerticalKN+p.stabilising(), 0)
	return newCheck(std1170, cl1170, "overturning about pad edge", ULS, r.Combination,
		p.momentAtUnderside(r), n*p.b/2, "kNm")
}

func newCheck(standard, clause, name, ls, comb string, demand, capacity float64, unit string) Check {
	return Check{Standard: standard, Clause: clause, Name: name, LimitState: ls, Combination: comb,
		Demand: demand, Capacity: capacity, Unit: unit, Utilisation: utilisation(demand, capacity)}
}

// checks returns, for each kind of check that applies to base b, the
// worst combination's check: uplift and bearing always; sliding where any
// ULS shear is present; overturning where any ULS moment is present.
func (p pad) checks(b Base) []Check {
	out := []Check{worst(b.ULS, p.uplift), worst(b.SLS, p.bearing)}
	if anyOf(b.ULS, func(r Reaction) bool { return r.ShearKN != 0 }) {
		out = append(out, worst(b.ULS, p.sliding))
	}
	if anyOf(b.ULS, func(r Reaction) bool { return r.MomentKNm != 0 }) {
		out = append(out, worst(b.ULS, p.overturning))
	}
	return out
}

// passes reports whether the pad passes every check for base b, stopping
// at the first failure: the search's fast path, before checks builds the
// full list for the chosen pad.
func (p pad) passes(b Base) bool {
	ok := func(rs []Reaction, check func(Reaction) Check) bool {
		for _, r := range rs {
			if !check(r).Passes() {
				return false
			}
		}
		return true
	}
	return ok(b.ULS, p.uplift) && ok(b.SLS, p.bearing) && ok(b.ULS, p.sliding) && ok(b.ULS, p.overturning)
}

// worst applies check to every reaction and keeps the highest utilisation.
func worst(rs []Reaction, check func(Reaction) Check) Check {
	var g Check
	for i, r := range rs {
		if c := check(r); i == 0 || c.Utilisation > g.Utilisation {
			g = c
		}
	}
	return g
}

func anyOf(rs []Reaction, f func(Reaction) bool) bool {
	for _, r := range rs {
		if f(r) {
			return true
		}
	}
	return false
}

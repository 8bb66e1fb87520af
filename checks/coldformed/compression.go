package coldformed

import (
	"math"

	"github.com/spansweep/spansweep/catalog"
)

// EffectiveLengths are a compression member's effective lengths (mm):
// about the major axis (in the frame's plane, from the buckling factor),
// the minor axis and for torsion. Each is required and > 0.
type EffectiveLengths struct {
	Lex, Ley, Lez float64
}

func (l EffectiveLengths) validate(v *validator, path string) {
	v.positiveIn(path, ".Lex", l.Lex)
	v.positiveIn(path, ".Ley", l.Ley)
	v.positiveIn(path, ".Lez", l.Lez)
}

// ElasticBucklingStress is f_oc, the least elastic buckling stress in
// flexural, torsional or flexural-torsional buckling, AS/NZS 4600:2018
// cl. 3.4.2–3.4.4 (f_oxz confirmed: S3; the shape rules from memory):
// C (symmetric about x): min(f_oy, f_oxz); Z (point-symmetric): min of
// flexure about the minor principal axis and f_oz; 2C: min(f_ox, f_oy, f_oz).
func ElasticBucklingStress(sec *catalog.Section, l EffectiveLengths) float64 {
	p := sec.Properties
	euler := func(le, r float64) float64 { return math.Pi * math.Pi * E / ((le / r) * (le / r)) }
	fox, foy := euler(l.Lex, p.RxMM), euler(l.Ley, p.RyMM)
	foz := (G*p.JMM4 + math.Pi*math.Pi*E*p.IwMM6/(l.Lez*l.Lez)) / (p.AreaMM2 * p.RO1MM * p.RO1MM)
	switch sec.Shape {
	case catalog.ShapeC:
		beta := 1 - (p.ShearCentreXMM/p.RO1MM)*(p.ShearCentreXMM/p.RO1MM)
		s := fox + foz
		foxz := (s - math.Sqrt(s*s-4*beta*fox*foz)) / (2 * beta)
		return math.Min(foy, foxz)
	case catalog.ShapeZ:
		f2 := euler(l.Ley, math.Sqrt(p.I2MM4/p.AreaMM2))
		return math.Min(math.Min(f2, foz), fox)
	default:
		return math.Min(math.Min(fox, foy), foz)
	}
}

// ColumnStress is f_n from λ_c = √(f_y/f_oc), AS/NZS 4600:2018 cl. 3.4.1
// (confirmed in DSM form: S3): λ_c ≤ 1.5: 0.658^(λ_c²) f_y; else
// (0.877/λ_c²) f_y.
func ColumnStress(fy, foc float64) float64 {
	lc2 := fy / foc
	if lc2 <= 1.5*1.5 {
		return math.Pow(0.658, lc2) * fy
	}
	return 0.877 / lc2 * fy
}

// MemberCompression is the nominal N_c = A_e f_n (cl. 3.4.1) with A_e at
// f_n, and f_oc. Straps and rods return zeros.
func (c *Capacities) MemberCompression(l EffectiveLengths) (nc, foc float64) {
	if !isFlexural(c.Section.Shape) {
		return 0, 0
	}
	foc = ElasticBucklingStress(&c.Section, l)
	fn := ColumnStress(c.Section.FyMPa, foc)
	return c.effectiveArea(fn) * fn, foc
}

// compressionChecks are the member (cl. 3.4.1) and distortional (cl. 3.4.6)
// compression checks; it returns them and the governing nominal N_c.
func (c *Capacities) compressionChecks(nStar float64, l EffectiveLengths) ([2]Check, float64) {
	nc, foc := c.MemberCompression(l)
	checks := [2]Check{
		newCheck("3.4.1", "member compression capacity, flexural/torsional/flexural-torsional buckling", LimitStability,
			nStar, PhiCompression*nc, "N", Input{InLex, l.Lex}, Input{InLey, l.Ley}, Input{InLez, l.Lez},
			Input{InFoc, foc}),
		newCheck("3.4.6", "member compression capacity, distortional buckling", LimitStability,
			nStar, PhiCompression*c.Ncd, "N", Input{InFod, c.FodColumn}),
	}
	return checks, math.Min(nc, c.Ncd)
}

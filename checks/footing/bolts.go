package footing

import (
	"fmt"
	"math"
)

const (
	pi       = math.Pi
	std4100  = "AS 4100:2020"
	noteCone = "concrete cone breakout, pull-out, embedment, edge distance and the base plate are NOT checked (out of scope): an engineer must check them, e.g. to AS 5216:2021"
)

// BoltOptions are the holding-down bolt settings. A nil *BoltOptions, or a
// zero field, means the documented default.
type BoltOptions struct {
	// LeverArmMM is the distance between the two bolt rows that take a base
	// moment. Default 150 mm (common practice, no source).
	LeverArmMM float64
	// ShankInShearPlane sets n_x = 1, n_n = 0 (plain shank in the shear
	// plane). Default false: threads in the shear plane (n_n = 1), the
	// safe assumption for cast-in bolts.
	ShankInShearPlane bool
}

// Bolts is the holding-down bolt group chosen for one base.
type Bolts struct {
	Base   string `json:"base"`
	Status Status `json:"status"`
	Size   string `json:"size"`
	Count  int    `json:"count"`
	// PropertyClass is "4.6".
	PropertyClass string `json:"property_class"`
	// ShearCapacityKN is φV_f of one bolt.
	ShearCapacityKN float64 `json:"shear_capacity_kn"`
	// TensionCapacityKN is φN_tf of one bolt.
	TensionCapacityKN float64  `json:"tension_capacity_kn"`
	Governing         Check    `json:"governing"`
	Checks            []Check  `json:"checks"`
	Notes             []string `json:"notes"`
}

// ShearCapacityKN is φV_f of one class 4.6 bolt with one shear plane,
// AS 4100:2020 cl. 9.3.2.1: φ 0.62 f_uf k_r (n_n A_c + n_x A_o), k_r = 1
// (not a long lap joint). threads says the plane crosses the thread.
func ShearCapacityKN(s BoltSize, threads bool) float64 {
	a := s.ShankAreaMM2()
	if threads {
		a = s.CoreAreaMM2
	}
	return PhiBolt * 0.62 * FufClass46MPa * 1.0 * a / 1000
}

// TensionCapacityKN is φN_tf = φ A_s f_uf of one class 4.6 bolt,
// AS 4100:2020 cl. 9.3.2.2.
func TensionCapacityKN(s BoltSize) float64 {
	return PhiBolt * s.TensileStressAreaMM2 * FufClass46MPa / 1000
}

// boltDemand is the worst bolt's shear and tension in one combination, kN:
// shear shared equally; uplift shared equally; a moment taken as a couple
// between two rows of count/2 bolts LeverArmMM apart (downward load
// relieving the tension), plate bearing not counted.
func boltDemand(r Reaction, count int, leverArmMM float64) (shear, tension float64) {
	n := float64(count)
	shear = math.Abs(r.ShearKN) / n
	tension = -r.VerticalKN/n + math.Abs(r.MomentKNm)/(leverArmMM/1000)/(n/2)
	return shear, max(tension, 0)
}

// boltChecks returns the worst-combination shear, tension and combined
// checks for count bolts of size s.
func boltChecks(b Base, s BoltSize, count int, o BoltOptions) []Check {
	vCap, nCap := ShearCapacityKN(s, !o.ShankInShearPlane), TensionCapacityKN(s)
	name := fmt.Sprintf("%d x %s 4.6", count, s.Name)
	shear := func(r Reaction) Check {
		v, _ := boltDemand(r, count, o.LeverArmMM)
		return newCheck(std4100, "9.3.2.1", "bolt shear, "+name, ULS, r.Combination, v, vCap, "kN")
	}
	tension := func(r Reaction) Check {
		_, t := boltDemand(r, count, o.LeverArmMM)
		return newCheck(std4100, "9.3.2.2", "bolt tension, "+name, ULS, r.Combination, t, nCap, "kN")
	}
	combined := func(r Reaction) Check {
		v, t := boltDemand(r, count, o.LeverArmMM)
		// AS 4100:2020 cl. 9.3.2.3: (V*/φVf)² + (N*/φNtf)² ≤ 1.0
		u := math.Pow(v/vCap, 2) + math.Pow(t/nCap, 2)
		return Check{Standard: std4100, Clause: "9.3.2.3", Name: "bolt combined shear and tension, " + name,
			LimitState: ULS, Combination: r.Combination, Demand: u, Capacity: 1, Unit: "-", Utilisation: u}
	}
	return []Check{worst(b.ULS, shear), worst(b.ULS, tension), worst(b.ULS, combined)}
}

// SizeBolts returns the smallest bolt size, then the fewest bolts (2 or 4),
// of property class 4.6 that pass shear, tension and combined actions for
// every ULS combination of base b (AS 4100:2020 cl. 9.3.2). A nil opt
// means the defaults. When none passes, the result holds 4 × M24's checks
// and the error is a *NoSolutionError.
func SizeBolts(b Base, opt *BoltOptions) (Bolts, error) {
	o, err := opt.resolved()
	if err != nil {
		return Bolts{}, err
	}
	if err := b.Validate(); err != nil {
		return Bolts{}, err
	}
	for _, s := range BoltSizes {
		for _, n := range BoltCounts {
			if cs := boltChecks(b, s, n, o); allPass(cs) {
				return newBolts(b.Name, OK, s, n, o, cs), nil
			}
		}
	}
	s, n := BoltSizes[len(BoltSizes)-1], BoltCounts[len(BoltCounts)-1]
	res := newBolts(b.Name, NoSolution, s, n, o, boltChecks(b, s, n, o))
	return res, &NoSolutionError{Base: b.Name, What: "bolt group",
		Largest: fmt.Sprintf("%d x %s 4.6", n, s.Name), Governing: res.Governing}
}

func newBolts(name string, st Status, s BoltSize, n int, o BoltOptions, cs []Check) Bolts {
	return Bolts{Base: name, Status: st, Size: s.Name, Count: n, PropertyClass: "4.6",
		ShearCapacityKN: ShearCapacityKN(s, !o.ShankInShearPlane), TensionCapacityKN: TensionCapacityKN(s),
		Governing: governing(cs), Checks: cs,
		Notes: []string{noteCone, "design aid only; verify for the site with a qualified structural engineer; local codes and licensed practice govern"}}
}

func (o *BoltOptions) resolved() (BoltOptions, error) {
	r := BoltOptions{LeverArmMM: 150}
	if o == nil {
		return r, nil
	}
	var errs fieldErrors
	switch v := o.LeverArmMM; {
	case math.IsNaN(v) || math.IsInf(v, 0) || v < 0:
		errs.add("BoltOptions.LeverArmMM", fmt.Sprint(v), "a distance > 0 mm")
	case v > 0:
		r.LeverArmMM = v
	}
	r.ShankInShearPlane = o.ShankInShearPlane
	return r, errs.err("bolt options")
}

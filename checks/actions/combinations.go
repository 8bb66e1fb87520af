package actions

import (
	"fmt"

	"github.com/spansweep/spansweep/checks/wind"
)

// PrimaryID names a primary load case.
type PrimaryID string

// The gravity primaries.
const (
	G PrimaryID = "G" // dead: cladding, services and self weight
	Q PrimaryID = "Q" // roof live, distributed (AS/NZS 1170.1)
	H PrimaryID = "H" // hoist point load
)

// WindPrimary is the primary case of a wind case, loaded at its ULS
// pressures.
func WindPrimary(caseName string) PrimaryID { return PrimaryID("W " + caseName) }

// LimitState is ultimate or serviceability.
type LimitState int

const (
	ULS LimitState = iota
	SLS
)

func (l LimitState) String() string {
	switch l {
	case ULS:
		return "ULS"
	case SLS:
		return "SLS"
	}
	return fmt.Sprintf("LimitState(%d)", int(l))
}

// Factor is one primary case and its load factor.
type Factor struct {
	Case   PrimaryID
	Factor float64
}

// Combination is a named linear combination of primary cases.
type Combination struct {
	Name       string // e.g. "ULS 1.2G+1.5Q", "ULS 0.9G+Wu crosswind, roof max suction, sealed Cpi +0.00"
	LimitState LimitState
	Factors    []Factor
}

// FactorOn returns the factor on a primary case (0 if absent).
func (c Combination) FactorOn(id PrimaryID) float64 {
	for _, f := range c.Factors {
		if f.Case == id {
			return f.Factor
		}
	}
	return 0
}

// Roof ψ factors for distributed imposed actions on "all other roofs",
// AS/NZS 1170.0:2002 Table 4.1 (confirmed: S3): ψ_s = 0.7, ψ_c = ψ_l = 0,
// so roof live load does not accompany wind.
const (
	PsiSRoof = 0.7
	PsiCRoof = 0.0
)

// Primaries lists the primary cases the combinations use: G, Q, H if
// hoist, then one per wind case in w's order.
func Primaries(w wind.Loads, hoist bool) []PrimaryID {
	out := []PrimaryID{G, Q}
	if hoist {
		out = append(out, H)
	}
	for _, c := range w.Cases {
		out = append(out, WindPrimary(c.Name))
	}
	return out
}

// Combinations returns the AS/NZS 1170.0:2002 cl. 4.2.1 (ULS) and cl. 4.2.2
// (SLS) combinations for a shed:
//
//	ULS 1.35G; ULS 1.2G+1.5Q; ULS 1.2G+Wu and ULS 0.9G+Wu per wind case
//	(ψ_c = 0 for the roof, so no Q with wind);
//	SLS G; SLS G+0.7Q (ψ_s); SLS G+Ws per wind case (factor q_s/q_u on the
//	wind primary, which carries ULS pressures).
//
// With a hoist: ULS 1.2G+1.5H and SLS G+H. Assumptions (no clause covers a
// hoist): the hoist is an imposed action with the 1.5 factor and ψ_s = 1.0;
// it is not combined with the roof live load (the roof is not being
// maintained while a load hangs) or with wind (no hoisting in a design
// storm).
func Combinations(w wind.Loads, hoist bool) []Combination {
	out := make([]Combination, 0, 4+3*len(w.Cases)+2)
	add := func(ls LimitState, name string, f ...Factor) {
		out = append(out, Combination{Name: ls.String() + " " + name, LimitState: ls, Factors: f})
	}
	add(ULS, "1.35G", Factor{G, 1.35})
	add(ULS, "1.2G+1.5Q", Factor{G, 1.2}, Factor{Q, 1.5})
	if hoist {
		add(ULS, "1.2G+1.5H", Factor{G, 1.2}, Factor{H, 1.5})
	}
	for _, c := range w.Cases {
		add(ULS, "1.2G+Wu "+c.Name, Factor{G, 1.2}, Factor{WindPrimary(c.Name), 1})
	}
	for _, c := range w.Cases {
		add(ULS, "0.9G+Wu "+c.Name, Factor{G, 0.9}, Factor{WindPrimary(c.Name), 1})
	}
	add(SLS, "G", Factor{G, 1})
	add(SLS, "G+0.7Q", Factor{G, 1}, Factor{Q, PsiSRoof})
	if hoist {
		add(SLS, "G+H", Factor{G, 1}, Factor{H, 1})
	}
	ratio := w.Speeds.QSLSKPa / w.Speeds.QULSKPa
	for _, c := range w.Cases {
		add(SLS, "G+Ws "+c.Name, Factor{G, 1}, Factor{WindPrimary(c.Name), ratio})
	}
	return out
}

package wind

import (
	"fmt"
	"math"
)

// Permeability is the Table 5.1(A) case for a building with no dominant
// opening (AS/NZS 1170.2:2021 cl. 5.3.2).
type Permeability int

const (
	// Sealed: effectively sealed, non-opening windows; C_p,i = −0.2 or 0.0.
	Sealed Permeability = iota
	// AllWallsPermeable: all walls equally permeable; C_p,i = −0.3 or 0.0.
	AllWallsPermeable
)

func (p Permeability) String() string {
	switch p {
	case Sealed:
		return "sealed"
	case AllWallsPermeable:
		return "all walls permeable"
	}
	return fmt.Sprintf("Permeability(%d)", int(p))
}

// cpi returns the two Table 5.1(A) values (confirmed: S1).
func (p Permeability) cpi() ([2]float64, error) {
	switch p {
	case Sealed:
		return [2]float64{-0.2, 0.0}, nil
	case AllWallsPermeable:
		return [2]float64{-0.3, 0.0}, nil
	}
	return [2]float64{}, fmt.Errorf("permeability %d: allowed sealed (0), all walls permeable (1)", int(p))
}

// Wall names a wall of the shed.
type Wall int

const (
	// EaveWall is a long wall under an eave, parallel to the ridge.
	EaveWall Wall = iota
	// EndWall is a gable end wall, across the ridge.
	EndWall
)

func (w Wall) String() string {
	switch w {
	case EaveWall:
		return "eave wall"
	case EndWall:
		return "end wall"
	}
	return fmt.Sprintf("Wall(%d)", int(w))
}

// DominantOpening is an opening (e.g. a roller door left open) that
// dominates the internal pressure, AS/NZS 1170.2:2021 Table 5.1(B).
type DominantOpening struct {
	Wall Wall
	// AreaRatio is the opening's area over the total open area of the other
	// walls and the roof (Table 5.1(B)); must be positive.
	AreaRatio float64
	// AreaM2 is the opening's area, for the open area/volume factor K_v
	// (cl. 5.3.4); 0 means K_v = 1.0.
	AreaM2 float64
}

// Enclosure sets the internal pressure cases. The zero value is a sealed
// building with no dominant opening.
type Enclosure struct {
	Permeability Permeability
	Opening      *DominantOpening // nil: none
}

// InternalCase is one internal pressure coefficient to combine with the
// external pressures.
type InternalCase struct {
	Name string
	Cpi  float64 // including K_v for a dominant opening
}

// openingRole is where a dominant opening sits for one wind direction.
type openingRole int

const (
	openingWindward openingRole = iota
	openingLeeward
	openingSide
)

func (r openingRole) String() string {
	return [...]string{"windward", "leeward", "side"}[r]
}

// Table 5.1(B) ratios and fractions of C_p,e; confirmed: S1 (cpi_t5b 2021).
var (
	t51bRatios     = []float64{0.5, 1, 2, 3, 6}
	t51bWindwardLo = []float64{-0.3, -0.1}
	t51bWindwardHi = []float64{0.0, 0.2}
	t51bWindwardF  = []float64{0.7, 0.85, 1.0} // at ratios 2, 3, 6
	t51bOtherLo    = []float64{-0.3, -0.3}
	t51bOtherHi    = []float64{0.0, 0.0}
	t51bOtherF     = []float64{1.0, 1.0, 1.0}
)

// dominantCpi returns the Table 5.1(B) values (one or two) for an opening
// whose surface has external coefficient cpe, interpolated in the area ratio
// (as S1 does: towards the single value at ratio 2). K_v multiplies the
// values taken from C_p,e (ratio ≥ 2 and the interpolation towards them),
// not the fixed values of ratios ≤ 1 (S1 applies it only near ratio 6; the
// threshold is unverified, so this takes the wider, conservative reading
// when K_v > 1).
func dominantCpi(role openingRole, ratio, cpe, kv float64) []float64 {
	lo, hi, f := t51bOtherLo, t51bOtherHi, t51bOtherF
	if role == openingWindward {
		lo, hi, f = t51bWindwardLo, t51bWindwardHi, t51bWindwardF
	}
	curve := func(pair []float64) []float64 {
		return []float64{pair[0], pair[1], kv * f[0] * cpe, kv * f[1] * cpe, kv * f[2] * cpe}
	}
	a := interp(t51bRatios, curve(lo), ratio)
	b := interp(t51bRatios, curve(hi), ratio)
	if math.Abs(a-b) < 1e-9 {
		return []float64{a}
	}
	return []float64{a, b}
}

// openAreaFactor is K_v of AS/NZS 1170.2:2021 cl. 5.3.4 (confirmed: S1, S3):
// 1.01 + 0.15·log10(α_v), α_v = 100·A^1.5/V, 0.85 below α_v = 0.09 and
// 1.085 above α_v = 3.
func openAreaFactor(areaM2, volumeM3 float64) float64 {
	if areaM2 <= 0 {
		return 1
	}
	av := 100 * math.Pow(areaM2, 1.5) / volumeM3
	switch {
	case av < 0.09:
		return 0.85
	case av > 3:
		return 1.085
	}
	return 1.01 + 0.15*math.Log10(av)
}

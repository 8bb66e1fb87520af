package wind

import (
	"fmt"
	"math"
)

// Direction is the wind direction relative to the ridge.
type Direction int

const (
	// Crosswind is θ = 0°: wind normal to the ridge, on an eave wall.
	Crosswind Direction = iota
	// Longitudinal is θ = 90°: wind parallel to the ridge, on an end wall.
	Longitudinal
)

func (d Direction) String() string {
	switch d {
	case Crosswind:
		return "crosswind"
	case Longitudinal:
		return "longitudinal"
	}
	return fmt.Sprintf("Direction(%d)", int(d))
}

// RoofCase picks one of the two external roof coefficients the tables give
// (AS/NZS 1170.2:2021 Tables 5.3(A), 5.3(B)): every roof zone at its minimum
// (most negative, largest suction) or every zone at its maximum.
type RoofCase int

const (
	RoofMaxSuction RoofCase = iota // minimum C_p,e in every roof zone
	RoofMinSuction                 // maximum C_p,e in every roof zone
)

func (r RoofCase) String() string {
	switch r {
	case RoofMaxSuction:
		return "roof max suction"
	case RoofMinSuction:
		return "roof min suction"
	}
	return fmt.Sprintf("RoofCase(%d)", int(r))
}

// SurfaceKind names a surface for one wind direction.
type SurfaceKind int

const (
	WindwardWall SurfaceKind = iota // eave wall in crosswind, end wall in longitudinal wind
	LeewardWall
	SideWalls    // both walls parallel to the wind (equal by symmetry)
	RoofUpwind   // crosswind: windward slope, plan distance 0 to span/2
	RoofDownwind // crosswind: leeward slope, span/2 to span
	Roof         // longitudinal: both slopes, 0 to length from the windward end
)

func (k SurfaceKind) String() string {
	switch k {
	case WindwardWall:
		return "windward wall"
	case LeewardWall:
		return "leeward wall"
	case SideWalls:
		return "side walls"
	case RoofUpwind:
		return "roof upwind slope"
	case RoofDownwind:
		return "roof downwind slope"
	case Roof:
		return "roof"
	}
	return fmt.Sprintf("SurfaceKind(%d)", int(k))
}

// IsRoof reports whether the surface is part of the roof.
func (k SurfaceKind) IsRoof() bool { return k >= RoofUpwind }

// Zone is a strip of a surface with one pressure. See the package doc for
// coordinates; pressures are net and inward positive.
type Zone struct {
	FromM, ToM float64
	Cpe        float64 // external coefficient of Section 5, before K_a, K_c, K_l
	// CfigFrame is the net shape factor for a portal frame:
	// C_p,e·(K_a·K_c,e) − C_p,i·K_c,i, with K_l = 1.
	CfigFrame float64
	// CfigMember is the net shape factor for purlins, girts and cladding away
	// from edges: C_p,e − C_p,i (K_a = K_c = K_l = 1, conservative).
	CfigMember     float64
	PressureULSKPa float64 // CfigFrame·q_u
	PressureSLSKPa float64 // CfigFrame·q_s
}

// Surface is one surface's zones for one wind case.
type Surface struct {
	Kind       SurfaceKind
	FromM, ToM float64 // extent of the zone coordinate
	Ka         float64 // Table 5.4, on the frame's tributary area (1 where not a frame's)
	KaKce      float64 // K_a·K_c,e used for the frame, ≥ 0.8 (cl. 5.4.3)
	Zones      []Zone
}

// zonesFromBands clips bands (in multiples of h from the windward edge) to
// [from, to], merging neighbours with equal coefficients; hi picks the
// maximum coefficient of each band.
func zonesFromBands(bands []band, h, from, to float64, hi bool) []Zone {
	var out []Zone
	for _, bd := range bands {
		a, b := math.Max(bd.fromH*h, from), math.Min(bd.toH*h, to)
		if b <= a {
			continue
		}
		c := bd.lo
		if hi {
			c = bd.hi
		}
		if n := len(out); n > 0 && math.Abs(out[n-1].Cpe-c) < 1e-12 {
			out[n-1].ToM = b
			continue
		}
		out = append(out, Zone{FromM: a, ToM: b, Cpe: c})
	}
	return out
}

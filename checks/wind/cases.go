package wind

import (
	"fmt"
)

// WindCase is one wind direction with one external roof case and one
// internal pressure case; a frame, purlin line or girt line is loaded from
// its surfaces.
type WindCase struct {
	Name      string // e.g. "crosswind, roof max suction, sealed Cpi -0.20"
	Direction Direction
	Roof      RoofCase
	Internal  InternalCase
	Kci       float64 // K_c,i for the frame (Table 5.5)
	Surfaces  []Surface
}

// Surface returns the case's surface of a kind, or nil.
func (c *WindCase) Surface(k SurfaceKind) *Surface {
	for i := range c.Surfaces {
		if c.Surfaces[i].Kind == k {
			return &c.Surfaces[i]
		}
	}
	return nil
}

// Loads is the wind derivation for one building and site.
type Loads struct {
	Building Building
	Speeds   Speeds
	// Dimension a of cl. 5.4.4 for walls and roof (m).
	LocalDimensionWallM, LocalDimensionRoofM float64
	Cases                                    []WindCase
	Purlins, Girts                           MemberPressures
}

// directionGeometry is the building seen by one wind direction.
type directionGeometry struct {
	dir        Direction
	bM, dM     float64 // across and along the wind
	windwardKa kaRow   // Table 5.4 row of the windward and leeward walls for the frame
	leewardKa  kaRow
	sideKa     kaRow
	opening    []openingRole // the roles a dominant opening takes, if any
}

func geometries(b Building, e Enclosure) [2]directionGeometry {
	cross := directionGeometry{dir: Crosswind, bM: b.LengthM, dM: b.SpanM,
		windwardKa: kaWindward, leewardKa: kaLeeward, sideKa: kaNone}
	long := directionGeometry{dir: Longitudinal, bM: b.SpanM, dM: b.LengthM,
		windwardKa: kaNone, leewardKa: kaNone, sideKa: kaRoofOrSide}
	if o := e.Opening; o != nil {
		both, side := []openingRole{openingWindward, openingLeeward}, []openingRole{openingSide}
		if o.Wall == EaveWall {
			cross.opening, long.opening = both, side
		} else {
			cross.opening, long.opening = side, both
		}
	}
	return [2]directionGeometry{cross, long}
}

// Derive builds every wind case for an enclosed gable building: two
// directions × two roof cases × each internal case. Speeds come from
// Site.Speeds or HousingClass.Speeds at b.ReferenceHeightM().
func Derive(b Building, e Enclosure, s Speeds) (Loads, error) {
	if err := b.Validate(); err != nil {
		return Loads{}, fmt.Errorf("wind building: %w", err)
	}
	base, err := e.Permeability.cpi()
	if err != nil {
		return Loads{}, fmt.Errorf("wind enclosure: %w", err)
	}
	if o := e.Opening; o != nil && (!(o.AreaRatio > 0) || o.AreaM2 < 0 || (o.Wall != EaveWall && o.Wall != EndWall)) {
		return Loads{}, fmt.Errorf("wind enclosure: dominant opening %+v: need wall eave or end, area ratio > 0, area ≥ 0", *o)
	}
	if !(s.QULSKPa > 0) || !(s.QSLSKPa > 0) {
		return Loads{}, fmt.Errorf("wind speeds: q_u %g kPa, q_s %g kPa: must be positive", s.QULSKPa, s.QSLSKPa)
	}
	out := Loads{Building: b, Speeds: s}
	out.LocalDimensionWallM, out.LocalDimensionRoofM = b.LocalPressureDimensionM()
	out.Cases = make([]WindCase, 0, 16)
	for _, g := range geometries(b, e) {
		ext := externalSurfaces(b, g)
		for _, rc := range []RoofCase{RoofMaxSuction, RoofMinSuction} {
			for _, ic := range internalCases(b, e, g, base) {
				out.Cases = append(out.Cases, netCase(ext, g.dir, rc, ic, s))
			}
		}
	}
	out.Purlins, out.Girts = memberPressures(out)
	return out, nil
}

// internalCases lists the Table 5.1(A) pair and any Table 5.1(B) values.
func internalCases(b Building, e Enclosure, g directionGeometry, base [2]float64) []InternalCase {
	cases := []InternalCase{
		{Name: e.Permeability.String(), Cpi: base[0]},
		{Name: e.Permeability.String(), Cpi: base[1]},
	}
	o := e.Opening
	if o == nil {
		return cases
	}
	kv := openAreaFactor(o.AreaM2, b.volumeM3())
	for _, role := range g.opening {
		cpe := windwardWallCpe
		switch role {
		case openingLeeward:
			cpe = leewardCpeFor(b, g)
		case openingSide:
			cpe = sideWallBands[0].lo // worst side-wall zone: the opening's position is not given
		}
		name := fmt.Sprintf("dominant opening %s (%s, ratio %.3g)", role, o.Wall, o.AreaRatio)
		for _, cpi := range dominantCpi(role, o.AreaRatio, cpe, kv) {
			cases = append(cases, InternalCase{Name: name, Cpi: cpi})
		}
	}
	return cases
}

func leewardCpeFor(b Building, g directionGeometry) float64 {
	pitch := b.PitchDeg
	if g.dir == Longitudinal {
		pitch = 0 // Table 5.2(B): wind parallel to a gable ridge takes the α < 10° row
	}
	return leewardWallCpe(pitch, g.dM/g.bM)
}

// extSurface is a surface's external coefficients for both roof cases.
type extSurface struct {
	kind       SurfaceKind
	from, to   float64
	ka         float64
	zonesByCas [2][]Zone // indexed by RoofCase; Cpe only
}

func externalSurfaces(b Building, g directionGeometry) []extSurface {
	h := b.ReferenceHeightM()
	frameKa := func(row kaRow, areaM2 float64) float64 {
		if b.BaySpacingM == 0 {
			return 1
		}
		return areaReduction(row, areaM2)
	}
	wallArea, roofArea := b.BaySpacingM*b.EaveHeightM, b.BaySpacingM*b.SpanM
	uniform := func(k SurfaceKind, from, to, ka, lo, hi float64) extSurface {
		return extSurface{kind: k, from: from, to: to, ka: ka, zonesByCas: [2][]Zone{
			{{FromM: from, ToM: to, Cpe: lo}}, {{FromM: from, ToM: to, Cpe: hi}}}}
	}
	banded := func(k SurfaceKind, bands []band, from, to, ka float64) extSurface {
		return extSurface{kind: k, from: from, to: to, ka: ka, zonesByCas: [2][]Zone{
			zonesFromBands(bands, h, from, to, false), zonesFromBands(bands, h, from, to, true)}}
	}
	lee := leewardCpeFor(b, g)
	out := []extSurface{
		uniform(WindwardWall, 0, g.bM, frameKa(g.windwardKa, wallArea), windwardWallCpe, windwardWallCpe),
		uniform(LeewardWall, 0, g.bM, frameKa(g.leewardKa, wallArea), lee, lee),
		banded(SideWalls, sideWallBands, 0, g.dM, frameKa(g.sideKa, wallArea)),
	}
	kaRoof := frameKa(kaRoofOrSide, roofArea)
	hd := h / g.dM
	switch {
	case g.dir == Longitudinal:
		out = append(out, banded(Roof, roofABands(hd), 0, g.dM, kaRoof))
	case b.PitchDeg < 10: // Table 5.3(A) along the span
		bands := roofABands(hd)
		out = append(out, banded(RoofUpwind, bands, 0, g.dM/2, kaRoof), banded(RoofDownwind, bands, g.dM/2, g.dM, kaRoof))
	default: // Tables 5.3(B) and 5.3(C)
		lo, hi := upwindSlopeCpe(b.PitchDeg, hd)
		dn := downwindSlopeCpe(b.PitchDeg, hd, g.bM/g.dM)
		out = append(out, uniform(RoofUpwind, 0, g.dM/2, kaRoof, lo, hi), uniform(RoofDownwind, g.dM/2, g.dM, kaRoof, dn, dn))
	}
	return out
}

// netCase combines external surfaces with one internal coefficient.
func netCase(ext []extSurface, dir Direction, rc RoofCase, ic InternalCase, s Speeds) WindCase {
	kci := PortalKci(ic.Cpi)
	c := WindCase{
		Name:      fmt.Sprintf("%s, %s, %s Cpi %+.2f", dir, rc, ic.Name, ic.Cpi),
		Direction: dir, Roof: rc, Internal: ic, Kci: kci,
		Surfaces: make([]Surface, len(ext)),
	}
	n := 0
	for _, e := range ext {
		n += len(e.zonesByCas[rc])
	}
	backing := make([]Zone, n) // one allocation for the case's zones
	for i, e := range ext {
		kk := frameKaKc(e.ka)
		src := e.zonesByCas[rc]
		zones := backing[:len(src):len(src)]
		backing = backing[len(src):]
		for j, z := range src {
			z.CfigFrame = z.Cpe*kk - ic.Cpi*kci
			z.CfigMember = z.Cpe - ic.Cpi
			z.PressureULSKPa = z.CfigFrame * s.QULSKPa
			z.PressureSLSKPa = z.CfigFrame * s.QSLSKPa
			zones[j] = z
		}
		c.Surfaces[i] = Surface{Kind: e.kind, FromM: e.from, ToM: e.to, Ka: e.ka, KaKce: kk, Zones: zones}
	}
	return c
}

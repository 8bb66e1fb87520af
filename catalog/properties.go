package catalog

import (
	"math"
)

// SteelDensityKgM3 is the density used for mass per metre.
const SteelDensityKgM3 = 7850

// NewSection builds a section from its geometry and steel strengths and
// computes its properties. Bad data is a *ValidationError naming each column.
func NewSection(designation string, shape Shape, g Geometry, fyMPa, fuMPa float64) (Section, error) {
	g = normalised(shape, g)
	ps := geometryProblems(shape, g)
	ps = append(ps, strengthProblems(fyMPa, fuMPa)...)
	if designation == "" {
		ps = append(ps, Problem{Column: "designation", Reason: "empty; give each section a unique name such as C200x75x1.9"})
	}
	if len(ps) > 0 {
		return Section{}, &ValidationError{File: designation, Problems: ps}
	}
	return Section{
		Designation: designation, Shape: shape, Geometry: g,
		FyMPa: fyMPa, FuMPa: fuMPa, Properties: computeProperties(shape, g, false),
	}, nil
}

// ComputeProperties returns the gross properties of a shape with geometry g
// (a Z with Flange2MM zero has equal flanges),
// or a *ValidationError if the geometry cannot be built.
func ComputeProperties(shape Shape, g Geometry) (Properties, error) {
	return checkedProperties(shape, g, false)
}

// ComputeSharpCornerProperties is ComputeProperties on the sharp-corner
// centreline (corners as points, the inside radius ignored): the model of
// the elementary closed forms and of the warping constants and shear-centre
// positions in the AISI Cold-Formed Steel Design Manual's tables, whose
// areas and second moments use rounded corners. Use it only to compare with
// such published values; design uses ComputeProperties.
func ComputeSharpCornerProperties(shape Shape, g Geometry) (Properties, error) {
	return checkedProperties(shape, g, true)
}

func checkedProperties(shape Shape, g Geometry, sharp bool) (Properties, error) {
	g = normalised(shape, g)
	if ps := geometryProblems(shape, g); len(ps) > 0 {
		return Properties{}, &ValidationError{File: shape.String(), Problems: ps}
	}
	return computeProperties(shape, g, sharp), nil
}

func computeProperties(shape Shape, g Geometry, sharp bool) Properties {
	var p Properties
	switch shape {
	case ShapeStrap:
		p = strapProperties(g.DepthMM, g.ThicknessMM)
	case ShapeRod:
		p = rodProperties(g.DepthMM)
	default:
		p = thinWalledProperties(shape, g, sharp)
	}
	p.MassKgPerM = p.AreaMM2 * 1e-6 * SteelDensityKgM3
	return p
}

// thinWalledProperties maps the centreline integrals to Properties, setting
// to exactly zero what the shape's symmetry makes zero (a C is symmetric
// about x, a 2C about both axes, an equal-flange Z about its centroid).
func thinWalledProperties(shape Shape, g Geometry, sharp bool) Properties {
	m := profileCentreline(shape, g, sharp).integrate()
	tiny := 1e-9 * g.DepthMM
	p := Properties{
		AreaMM2:     m.area,
		CentroidXMM: snap(m.cx, tiny), CentroidYMM: snap(m.cy, tiny),
		IxMM4: m.ixx, IyMM4: m.iyy, IxyMM4: snap(m.ixy, 1e-9*m.ixx),
		ZxMM3: m.ixx / math.Max(-m.yMin, m.yMax), ZyMM3: m.iyy / math.Max(-m.xMin, m.xMax),
		RxMM: math.Sqrt(m.ixx / m.area), RyMM: math.Sqrt(m.iyy / m.area),
		JMM4: m.j, IwMM6: m.iw,
		ShearCentreXMM: snap(m.x0, tiny), ShearCentreYMM: snap(m.y0, tiny),
		BetaXMM: snap(m.betaX, tiny), BetaYMM: snap(m.betaY, tiny),
		TensileStressAreaMM2: m.area,
	}
	if shape == ShapeC || shape == Shape2C {
		p.IxyMM4, p.CentroidYMM, p.ShearCentreYMM, p.BetaXMM = 0, 0, 0, 0
	}
	if shape == Shape2C {
		p.CentroidXMM, p.ShearCentreXMM, p.BetaYMM = 0, 0, 0
	}
	p.I1MM4, p.I2MM4, p.PrincipalAngleRad = principal(p.IxMM4, p.IyMM4, p.IxyMM4)
	p.RO1MM = math.Sqrt(p.RxMM*p.RxMM + p.RyMM*p.RyMM + p.ShearCentreXMM*p.ShearCentreXMM + p.ShearCentreYMM*p.ShearCentreYMM)
	return p
}

// principal returns the principal second moments and the angle from x to
// the major axis, anticlockwise positive: tan 2θ = −2Ixy/(Ix − Iy) with
// Ixy = ∫xy dA (Mohr's circle; any mechanics of materials text).
func principal(ix, iy, ixy float64) (i1, i2, angle float64) {
	if ixy == 0 { // exactly the geometric axes
		if ix >= iy {
			return ix, iy, 0
		}
		return iy, ix, math.Pi / 2
	}
	mean := (ix + iy) / 2
	r := math.Hypot((ix-iy)/2, ixy)
	return mean + r, mean - r, 0.5 * math.Atan2(-2*ixy, ix-iy)
}

func snap(v, tiny float64) float64 {
	if math.Abs(v) <= tiny {
		return 0
	}
	return v
}

// normalised sets Flange2MM to FlangeMM for every shape but a Z, and for a Z
// whose Flange2MM is left zero (equal flanges).
func normalised(shape Shape, g Geometry) Geometry {
	if shape != ShapeZ || g.Flange2MM == 0 {
		g.Flange2MM = g.FlangeMM
	}
	return g
}

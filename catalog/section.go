package catalog

// Shape is a section's family.
type Shape int

// The section shapes of DESIGN.md §4.5.
const (
	ShapeC     Shape = iota + 1 // lipped channel
	ShapeZ                      // lipped Z (unequal flanges allowed, for nesting at laps)
	Shape2C                     // two lipped channels back to back
	ShapeStrap                  // flat strap (tension only)
	ShapeRod                    // round rod (tension only), threaded ends
)

// Geometry is a section's nominal dimensions as rolled, in mm: outside
// depth and flange widths, lip length, base-metal thickness and inside
// corner radius. Straps use DepthMM as width; rods use DepthMM as diameter.
type Geometry struct {
	DepthMM       float64
	FlangeMM      float64 // top flange (the only flange of a C)
	Flange2MM     float64 // bottom flange of a Z; equals FlangeMM otherwise
	LipMM         float64
	ThicknessMM   float64
	InnerRadiusMM float64
}

// Properties are a section's gross properties on the thin-walled centreline
// model with rounded corners. Axes: x is the major (bending) axis, parallel to
// the flanges, y parallel to the web, both through the centroid. For a Z, Ix,
// Iy and Ixy are about those geometric axes and I1, I2 the principal values.
type Properties struct {
	AreaMM2    float64
	MassKgPerM float64 // at 7850 kg/m³

	// Centroid measured from the web's centreline (x, towards the flange tips
	// of a C; from the back-to-back plane of a 2C) and from mid-depth (y).
	CentroidXMM float64
	CentroidYMM float64

	IxMM4  float64
	IyMM4  float64
	IxyMM4 float64
	I1MM4  float64 // major principal
	I2MM4  float64 // minor principal
	// PrincipalAngleRad is the angle from the x axis to the major principal axis.
	PrincipalAngleRad float64

	ZxMM3 float64 // Ix over the larger extreme-fibre distance from x
	ZyMM3 float64 // Iy over the larger extreme-fibre distance from y
	RxMM  float64
	RyMM  float64

	JMM4  float64 // St Venant torsion constant
	IwMM6 float64 // warping constant about the shear centre

	// Shear centre relative to the centroid (x0, y0); a C's x0 is negative
	// (behind the web).
	ShearCentreXMM float64
	ShearCentreYMM float64
	// RO1MM is the polar radius of gyration about the shear centre,
	// sqrt(rx² + ry² + x0² + y0²) (AS/NZS 4600:2018 cl. 3.3.3.2.1).
	RO1MM float64
	// Monosymmetry constants βx, βy (AS/NZS 4600:2018 cl. 3.3.3.2.1), with
	// this package's axes (a C's βy > 0); zero where the section is symmetric
	// about that axis (C: βx; Z and 2C: both).
	BetaXMM float64
	BetaYMM float64

	// TensileStressAreaMM2 is a rod's threaded stress area (ISO 898-1:2013
	// cl. 9.1.6.1, coarse pitch of ISO 261); the gross area for other shapes.
	TensileStressAreaMM2 float64
}

// Section is one catalogue entry: designation, shape, geometry, steel and
// computed properties.
type Section struct {
	Designation string // e.g. C200x75x1.9, Z250x2.4, 2C300x3.0, STRAP30x1.0, ROD12
	Shape       Shape
	Geometry
	FyMPa float64 // minimum yield stress
	FuMPa float64 // minimum tensile strength
	Properties
}

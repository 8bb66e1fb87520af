// Package catalog holds the cold-formed section catalogue: each section's
// geometry, steel grade and the gross properties computed from them.
//
// Units: mm for geometry, mm², mm⁴, mm⁶ for properties, MPa for stresses,
// kg/m for mass. Every field carries its unit in its name.
//
// # Shapes and axes
//
// C (lipped channel), Z (lipped Z, flanges may differ so Zs nest at laps),
// 2C (two Cs back to back, webs touching), strap (flat, tension only) and
// rod (round bar with threaded ends, tension only). Geometry holds outside
// dimensions, base-metal thickness and the inside corner radius. C and 2C
// lips are square to the flange; Z lips slope at 50° to the flange
// (Shape.LipAngleDeg), the form of the AISI Manual's Z sections.
//
// x is the axis parallel to the flanges (bending about x is major-axis
// bending), y is parallel to the web; both pass through the centroid. The
// section is drawn with the web centreline on x = 0, a C's flanges and a Z's
// top flange pointing to +x, y up. Ixy = ∫xy dA, so a Z whose top flange
// points to +x has Ixy > 0. The principal angle is from x to the major
// principal axis, anticlockwise positive. Shear centre and centroid offsets
// carry their signs: a C's shear centre lies behind its web, x0 < 0.
//
// # Formulas and their sources
//
// Roll-formed profiles (C, Z, 2C) use the thin-walled centreline model with
// rounded corners: the mid-thickness line, corners as arcs of radius
// r + t/2 cut into short chords, each straight strip integrated exactly
// (Simpson's rule is exact for the cubic integrands). This is the "linear
// method" of the AISI Cold-Formed Steel Design Manual, Part I, with the
// corner arcs integrated rather than approximated (from memory of the
// Manual; Yu & LaBoube, Cold-Formed Steel Design, 4th ed., Ch. 4).
//   - A, centroid, Ix, Iy, Ixy: ∫dA over the strips; principal values by
//     Mohr's circle.
//   - Zx, Zy: second moment over the distance to the farthest fibre (the
//     outer face, thickness included).
//   - J = Σ l t³/3, the open thin-walled section's St Venant constant.
//   - Shear centre and Iw from the sectorial coordinate ω (Vlasov's theory
//     of thin-walled beams as in Yu & LaBoube, App. B; Trahair, Flexural-
//     Torsional Buckling of Structures, Ch. 2), from memory of both.
//   - ro1 = √(rx² + ry² + x0² + y0²) and the monosymmetry constants
//     βx = (∫y³ dA + ∫x²y dA)/Ix − 2y0, βy = (∫x³ dA + ∫xy² dA)/Iy − 2x0
//     (AS/NZS 4600:2018 cl. 3.3.3.2.1; AISI S100-16 F2.1).
//
// A 2C is modelled as two channels whose webs act together for warping
// (joined at mid-web, as connected webs make them) while J is the sum of
// the two open channels. Published section tables mix models: the AISI
// Manual's areas and second moments use rounded corners but its warping
// constants and shear-centre distances the sharp-corner centreline; use
// ComputeSharpCornerProperties only to compare with such values.
//
// Straps: elementary rectangle formulas; J from Roark's Formulas for Stress
// and Strain (7th ed.), Table 10.7 (from memory); Iw taken as zero. Rods:
// elementary circle formulas, and the tensile stress area of the ISO 261
// coarse thread, As = (π/4)(d − 0.9382P)² (ISO 898-1:2013 cl. 9.1.6.1).
//
// Steel: the AS 1397 grades with the design values of AS/NZS 4600:2018
// Table 1.5 (Grades, GradeFor). Mass uses 7850 kg/m³.
//
// # Catalogues
//
// A catalogue is a CSV file with the columns of Columns; Load validates
// every row and reports all problems at once (ValidationError) or returns
// nothing. Default is the embedded, illustrative "RS" series of the fictional
// Ridgeline Sheds Pty Ltd, to be replaced by a maker's own profiles.
package catalog

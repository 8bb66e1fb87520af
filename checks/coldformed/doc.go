// Package coldformed checks cold-formed steel members (lipped C, Z, back-to-back
// 2C, flat straps and round rods) to AS/NZS 4600:2018 and returns each check's
// demand, capacity and utilisation, clause by clause.
//
// Edition: AS/NZS 4600:2018. The effective-width rules of Section 2 are the
// 2005 forms that the 2018 edition retains (cl. 2.2.1.2, 2.2.3, 2.3, 2.4.2);
// member rules are Section 3. Each rule cites its clause and the provenance tag
// of shared/REFERENCE-VALUES.md §5 ("confirmed", "derived", "from memory").
//
// Units: the package works wholly in N, mm and MPa: forces in N, moments in
// N·mm, lengths in mm, areas in mm², stresses in MPa. Exported fields carry no
// unit suffix for that reason (kN·m × 1e6 = N·mm; kN/m = N/mm).
//
// Sign conventions: axial force N* is positive in compression for
// beam-columns and positive in tension for tension members; moments and
// shears are magnitudes (the caller states which flange is in compression,
// see [Purlin]). Axes follow catalog: x is the major axis parallel to the
// flanges, y parallel to the web.
//
// Use: compute a section's stress-independent capacities once with
// [SectionCapacities], then call the member checks ([CheckPurlin],
// [CheckBeamColumn], [CheckTension]) per load combination; each returns a
// [MemberResult] listing every [Check] and its governing one.
//
// Choices, each stated where it is coded:
//   - Distortional buckling of beams (cl. 3.3.3.3) and columns (cl. 3.4.6)
//     uses the 2018 curves in their Section 7 (DSM) form with the elastic
//     f_od of the Appendix D Lau–Hancock closed form; no finite-strip
//     analysis. Sloping (Z) lips enter with their depth normal to the flange.
//   - Minor-axis effective modulus is Z_y·A_e/A at f_y (a simplification).
//   - Purlins and girts: the top flange (Geometry.FlangeMM) is the one
//     through-fastened. Inward load: section capacity and distortional
//     buckling (the sheeting's rotational restraint of the fastened flange
//     is conservatively ignored). Outward load: the larger of the R-factor
//     capacity (cl. 3.3.3.4, over the whole span) and lateral-torsional
//     buckling between bridging rows (cl. 3.3.3.2, sheeting restraint
//     ignored), the latter capped by distortional buckling.
//   - φ factors: see material.go (bending 0.9, compression 0.85, shear 0.9,
//     tension 0.9 on yield and on net fracture, rod threads 0.8, web
//     bearing per coefficient row).
//
// Caution: a design aid; verify for the site with a qualified structural
// engineer; local codes and licensed practice govern.
package coldformed

// Package footing sizes a square concrete pad footing and the holding-down
// bolts for one column base from the base's ULS and SLS reaction envelopes.
//
// # Units
//
// Forces are in kN, moments in kN·m, lengths in m, pressures in kPa and unit
// weights in kN/m³, so fields without a unit suffix in this package use that
// system. Bolt quantities carry their own units in their names (mm, mm², MPa,
// kN per bolt).
//
// # Sign conventions
//
// Reaction.VerticalKN is the force the column applies to the footing,
// positive DOWN (compression onto the pad); a negative value is uplift.
// ShearKN and MomentKNm may have either sign; only their magnitudes are used,
// and the moment acts in one plane (the frame plane), so the pad is checked
// for uniaxial eccentricity.
//
// # Method (choices stated once, here)
//
//   - Geometry: a square pad of width B and concrete depth D whose top lies
//     SoilCoverM below the ground (default 0: cast to ground level). Any
//     pier or plinth above the pad is not modelled; its weight is ignored.
//   - Uplift (ULS): the uplift of each ULS combination is resisted by 0.9
//     times the pad weight (24 kN/m³ by default, the unit weight of
//     reinforced concrete, from memory of AS/NZS 1170.1:2002 Appendix A),
//     per the stabilising factor 0.9G of AS/NZS 1170.0:2002 cl. 4.2.1(b)
//     (from memory). Soil over the pad is counted only when
//     Options.IncludeSoil is set, as the vertical prism directly above the
//     pad (no frustum spread: conservative).
//   - Bearing (SLS, allowable pressure): the gross pressure under the pad
//     from each SLS combination plus the unfactored pad and soil weight is
//     compared with Options.AllowableBearingKPa (default 100 kPa, common
//     practice, no source). A site investigation and site classification
//     (AS 2870, AS 1726) is needed to confirm it. With a moment the pressure
//     is linear: trapezoidal while e ≤ B/6 (within the kern), triangular
//     with partial contact, q = 2P/(3B(B/2 − e)), while B/6 < e < B/2.
//     Soil over the pad always loads the bearing check.
//   - Sliding (ULS): where a shear is present, μ(V + 0.9W) resists it, with
//     μ = Options.FrictionCoefficient (default 0.3, common practice, no
//     source); passive resistance on the pad face is ignored unless
//     Options.IncludePassive is set (Rankine Kp, reduced by
//     Options.PassiveFactor).
//   - Overturning (ULS, when a base moment is present): stability about the
//     pad's edge, destabilising |M| + |H|·(cover + D) against
//     (V + 0.9W)·B/2; this is the condition e ≤ B/2.
//   - The combination's own vertical reaction enters as given by the
//     combination; only the footing's own weight takes the 0.9 factor.
//
// The lightest pad (smallest concrete volume; ties to the shallower, then
// narrower) over the width and depth grid of Options that passes every
// check is returned; when none passes, a *NoSolutionError names the check
// that governs the largest pad.
//
// # Holding-down bolts
//
// Bolts are property class 4.6 (f_uf = 400 MPa, AS 1111.1, from memory),
// M12 to M24, 2 or 4 per base, checked per AS 4100:2020 cl. 9.3.2 for
// shear, tension and combined shear and tension (φ = 0.8, Table 3.4). The
// bolts share the shear and the uplift equally; a base moment is taken by
// two rows of bolts Options.LeverArmMM apart with no allowance for the plate
// bearing. Concrete cone breakout, pull-out, embedment, edge distance and the
// base plate are out of scope and are NOT checked: an engineer must check
// them (for example to AS 5216:2021); every Bolts result says so.
//
// This is a design aid; verify for the site with a qualified structural
// engineer; local codes and licensed practice govern.
package footing

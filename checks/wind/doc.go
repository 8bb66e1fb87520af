// Package wind derives the design wind actions on an enclosed gable shed:
// site design gust speeds from AS/NZS 1170.2:2021 (region, terrain, importance
// level and design working life, with the annual probability of exceedance of
// AS/NZS 1170.0:2002 Table F2) or from an AS 4055-2021 housing wind class, and
// the net pressures on every wall and roof zone for wind across the ridge
// (crosswind, θ = 0°) and along it (longitudinal, θ = 90°), for each external
// and internal pressure case.
//
// # Edition
//
// AS/NZS 1170.2:2021 throughout (regional speeds with the climate multiplier
// M_c, the single Table 4.1 for M_z,cat, the 2021 K_a for windward and
// leeward walls, the 2021 K_l and roof dimension a). Clauses and tables are
// named beside each rule.
//
// # Units and signs
//
// Metres for geometry, m/s for speeds, kPa for pressures, m² for areas,
// degrees for the roof pitch. Pressure coefficients are dimensionless.
//
// A pressure is positive inward: it pushes on the surface towards the inside
// of the building. External coefficients C_p,e keep the standard's sign
// (positive towards the surface). A positive internal coefficient C_p,i pushes
// the cladding outward, so every net value here is
//
//	p_net = q · (C_p,e·K_a·K_c,e·K_l − C_p,i·K_c,i)    (inward positive)
//
// with q = 0.5 ρ_air V_des² = 0.6 V_des² Pa (ρ_air = 1.2 kg/m³, C_dyn = 1,
// AS/NZS 1170.2:2021 cl. 2.4).
//
// # Coordinates of zones
//
// Roof and side-wall zones are located by the horizontal (plan) distance from
// the windward edge of the building, measured in the wind direction: from the
// windward eave wall in crosswind, from the windward gable end wall in
// longitudinal wind. Windward and leeward walls carry one zone across their
// whole width b, measured along the wall. Every surface's zones cover the
// surface from its FromM to its ToM without gaps or overlaps.
package wind

// Package actions gives the permanent and imposed actions on a gable shed
// (cladding and services dead load, AS/NZS 1170.1:2002 roof live load, an
// optional hoist point load) and the AS/NZS 1170.0:2002 cl. 4.2 load
// combinations, built as factors on primary load cases so that an analysis
// solves each primary case once and combines the results linearly.
//
// # Units and signs
//
// kPa for distributed actions, kN for point loads, m for positions and
// areas in m². Gravity actions are positive downward. Wind primaries follow
// package wind: net pressures inward positive.
//
// # Primary cases
//
// G (dead), Q (roof live, distributed), H (hoist, if any) and one primary per
// wind.WindCase, named "W " + the case's name. A wind primary is loaded with
// the case's ULS zone pressures (wind.Zone.PressureULSKPa); a serviceability
// combination carries the factor q_s/q_u on it, which is exact because every
// coefficient is the same at both limit states. Member self weight is the
// caller's, added to G.
package actions

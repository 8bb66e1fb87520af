// Package optimize finds, for one gable shed case, the lightest set of
// cold-formed members that passes every check, and runs many cases on a
// bounded worker pool in case order.
//
// Design derives the case's actions (checks/wind, checks/actions), searches
// the purlins and girts as independent sub-problems (candidates sorted by
// mass, first pass wins), searches the portal frame with stiffness-independent
// lower bounds to skip candidates that cannot pass, and then sizes the
// bracing, end-wall columns and footings. Results name the governing check of
// every member group: standard, clause, limit state, combination and
// utilisation.
//
// Units follow DESIGN.md §3: m for building geometry, kN, kN/m, kPa, kN·m,
// kg; member checks run in N and mm inside checks/coldformed.
//
// The package never parses files or formats output.
package optimize

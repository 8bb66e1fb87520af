// Package catalog holds the cold-formed section catalogue: each section's
// geometry, steel grade and the gross properties computed from them.
//
// Units: mm for geometry, mm², mm⁴, mm⁶ for properties, MPa for stresses,
// kg/m for mass. Every field carries its unit in its name.
package catalog

package actions

import "fmt"

// Dead is the superimposed permanent action of cladding and services. The
// zero value means the defaults.
type Dead struct {
	// RoofKPa is roof sheeting, fixings and services per unit of sloping
	// roof area; 0 means DefaultRoofDeadKPa.
	RoofKPa float64
	// WallKPa is wall sheeting per unit wall area; 0 means DefaultWallDeadKPa.
	WallKPa float64
}

// Default superimposed dead loads: 0.10 kPa roof (steel sheeting about
// 0.05 kPa plus fixings, insulation and light services) and 0.10 kPa walls.
// Common practice, no source.
const (
	DefaultRoofDeadKPa = 0.10
	DefaultWallDeadKPa = 0.10
)

// Resolved returns the dead loads with defaults filled in, or an error for a
// negative value.
func (d Dead) Resolved() (Dead, error) {
	if d.RoofKPa < 0 || d.WallKPa < 0 {
		return Dead{}, fmt.Errorf("dead load: roof %g kPa, wall %g kPa: allowed 0 (default) or positive", d.RoofKPa, d.WallKPa)
	}
	if d.RoofKPa == 0 {
		d.RoofKPa = DefaultRoofDeadKPa
	}
	if d.WallKPa == 0 {
		d.WallKPa = DefaultWallDeadKPa
	}
	return d, nil
}

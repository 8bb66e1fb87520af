package catalog

import (
	"fmt"
	"strings"
)

// shapeNames are the spellings used in catalogue files and on the command line.
var shapeNames = map[Shape]string{
	ShapeC:     "C",
	ShapeZ:     "Z",
	Shape2C:    "2C",
	ShapeStrap: "strap",
	ShapeRod:   "rod",
}

// Shapes lists every shape in catalogue order.
func Shapes() []Shape { return []Shape{ShapeC, ShapeZ, Shape2C, ShapeStrap, ShapeRod} }

// String returns the catalogue spelling: C, Z, 2C, strap or rod.
func (s Shape) String() string {
	if n, ok := shapeNames[s]; ok {
		return n
	}
	return fmt.Sprintf("Shape(%d)", int(s))
}

// ParseShape reads a shape's catalogue spelling, ignoring case.
func ParseShape(name string) (Shape, error) {
	for _, s := range Shapes() {
		if strings.EqualFold(name, shapeNames[s]) {
			return s, nil
		}
	}
	return 0, fmt.Errorf("catalog: unknown shape %q; allowed: %s", name, ShapeList())
}

// ShapeList is the allowed spellings joined for messages: "C, Z, 2C, strap, rod".
func ShapeList() string {
	names := make([]string, 0, len(shapeNames))
	for _, s := range Shapes() {
		names = append(names, shapeNames[s])
	}
	return strings.Join(names, ", ")
}

// LipAngleDeg is the angle between a lip and its flange used for the shape:
// 90° for C and 2C (lips square to the flange), 50° for Z (lips sloping
// outwards, as in the AISI Cold-Formed Steel Design Manual's Z sections, so
// that two Zs nest at a lap). Zero for shapes without lips.
func (s Shape) LipAngleDeg() float64 {
	switch s {
	case ShapeC, Shape2C:
		return 90
	case ShapeZ:
		return 50
	}
	return 0
}

// thinWalled reports whether the shape is a roll-formed profile computed on
// the centreline model (as opposed to a solid strap or rod).
func (s Shape) thinWalled() bool { return s == ShapeC || s == ShapeZ || s == Shape2C }

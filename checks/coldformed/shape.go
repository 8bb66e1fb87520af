package coldformed

import (
	"math"

	"github.com/spansweep/spansweep/catalog"
)

func isFlexural(s catalog.Shape) bool {
	return s == catalog.ShapeC || s == catalog.ShapeZ || s == catalog.Shape2C
}

func flange2(g catalog.Geometry) float64 {
	if g.Flange2MM > 0 {
		return g.Flange2MM
	}
	return g.FlangeMM
}

func shapeName(s catalog.Shape) string {
	switch s {
	case catalog.ShapeC:
		return "C"
	case catalog.ShapeZ:
		return "Z"
	case catalog.Shape2C:
		return "2C"
	case catalog.ShapeStrap:
		return "strap"
	case catalog.ShapeRod:
		return "rod"
	}
	return "unknown"
}

// lipAngleRad is the lip-to-flange angle: 90° for C and 2C, 50° for Z (the
// catalogue's convention, so two Zs nest at a lap).
func lipAngleRad(s catalog.Shape) float64 {
	if s == catalog.ShapeZ {
		return 50 * math.Pi / 180
	}
	return math.Pi / 2
}

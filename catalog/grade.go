package catalog

import (
	"fmt"
	"strings"
)

// Grade is a structural steel grade of AS 1397 (metallic-coated sheet and
// strip) with its minimum yield and tensile strengths as used in design.
type Grade struct {
	Name  string  // e.g. "G450"
	FyMPa float64 // minimum yield stress
	FuMPa float64 // minimum tensile strength
}

// Grades are the AS 1397 structural grades with the design values of
// AS/NZS 4600:2018 Table 1.5 (confirmed against an independent open-source
// transcription). G550 below 0.9 mm thickness has reduced values: see GradeFor.
var Grades = []Grade{
	{"G250", 250, 320},
	{"G300", 300, 340},
	{"G350", 350, 420},
	{"G450", 450, 480},
	{"G500", 500, 520},
	{"G550", 550, 550},
}

// GradeFor returns a grade's design fy and fu for a base-metal thickness:
// G550 is 550/550 MPa for t ≥ 0.9 mm, 495/495 MPa for 0.6 ≤ t < 0.9 mm and
// 413/413 MPa below 0.6 mm (AS/NZS 4600:2018 Table 1.5).
func GradeFor(name string, thicknessMM float64) (Grade, error) {
	for _, g := range Grades {
		if !strings.EqualFold(g.Name, name) {
			continue
		}
		if g.Name == "G550" {
			switch {
			case thicknessMM < 0.6:
				g.FyMPa, g.FuMPa = 413, 413
			case thicknessMM < 0.9:
				g.FyMPa, g.FuMPa = 495, 495
			}
		}
		return g, nil
	}
	names := make([]string, len(Grades))
	for i, g := range Grades {
		names[i] = g.Name
	}
	return Grade{}, fmt.Errorf("catalog: unknown steel grade %q; allowed AS 1397 grades %s", name, strings.Join(names, ", "))
}

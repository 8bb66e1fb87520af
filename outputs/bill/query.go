package bill

import (
	"errors"
	"fmt"
	"math"
	"slices"
	"strings"

	"github.com/spansweep/spansweep/outputs/dataset"
)

// Query is a customer's building and site. Zero optional fields mean "not
// asked" (see the package doc for what Lookup does then).
type Query struct {
	SpanM        float64
	LengthM      float64
	EavesHeightM float64
	RoofPitchDeg float64 // optional; 0 = any
	BaySpacingM  float64 // optional; 0 = any
	Base         string  // optional: "pinned", "fixed"; "" = any
	Wind         WindRequest
}

// WindRequest is the site wind: an AS 4055 housing class, or an
// AS/NZS 1170.2 region site.
type WindRequest struct {
	Class           string  // "N1" … "N6", "C1" … "C4"; empty for a region site
	Region          string  // e.g. "B2"; empty for a class
	TerrainCategory float64 // 1, 2, 2.5, 3 or 4
	ImportanceLevel int     // 1 … 4
	DesignLifeYears int     // default 50 when 0
}

// DefaultDesignLifeYears is used when a region request gives no design
// working life (50 years, AS/NZS 1170.0:2002 Table F2's usual row for a
// building; common practice).
const DefaultDesignLifeYears = 50

// Housing classes of AS 4055-2021 Table 2.1.
var housingClasses = []string{"N1", "N2", "N3", "N4", "N5", "N6", "C1", "C2", "C3", "C4"}

// terrainCategories of AS/NZS 1170.2:2021 cl. 4.2.1.
var terrainCategories = []float64{1, 2, 2.5, 3, 4}

// String names the condition as a person reads it.
func (w WindRequest) String() string {
	if w.Class != "" {
		return "class " + w.Class
	}
	return fmt.Sprintf("region %s, terrain category %g, importance level %d, design life %d years",
		w.Region, w.TerrainCategory, w.ImportanceLevel, w.life())
}

func (w WindRequest) life() int {
	if w.DesignLifeYears == 0 {
		return DefaultDesignLifeYears
	}
	return w.DesignLifeYears
}

// Cyclonic reports whether the condition is cyclonic: AS 4055-2021 classes
// C1–C4, AS/NZS 1170.2:2021 Figure 3.1 regions C and D.
func (w WindRequest) Cyclonic() bool {
	if w.Class != "" {
		return strings.HasPrefix(w.Class, "C")
	}
	return w.Region == "C" || w.Region == "D"
}

// rowWind is the wind condition of a dataset row as a WindRequest.
func rowWind(r *dataset.Row) WindRequest {
	return WindRequest{Class: r.WindClass, Region: r.Region, TerrainCategory: r.TerrainCategory,
		ImportanceLevel: r.ImportanceLevel, DesignLifeYears: r.DesignLifeYears}
}

// sameCondition reports whether a row's condition is exactly the one asked.
func (w WindRequest) sameCondition(r *dataset.Row) bool {
	if w.Class != "" {
		return r.WindClass == w.Class
	}
	return r.WindClass == "" && r.Region == w.Region && r.TerrainCategory == w.TerrainCategory &&
		r.ImportanceLevel == w.ImportanceLevel && r.DesignLifeYears == w.life()
}

// Validate reports every bad field of the query in one error.
func (q Query) Validate() error {
	var errs []error
	positive := func(name string, v float64, optional bool) {
		if optional && v == 0 {
			return
		}
		if !(v > 0) || math.IsInf(v, 0) {
			errs = append(errs, fmt.Errorf("%s %g m: must be a positive number of metres", name, v))
		}
	}
	positive("--span", q.SpanM, false)
	positive("--length", q.LengthM, false)
	positive("--height", q.EavesHeightM, false)
	positive("--bay", q.BaySpacingM, true)
	if q.BaySpacingM > q.LengthM && q.LengthM > 0 {
		errs = append(errs, fmt.Errorf("--bay %g m: must not exceed --length %g m", q.BaySpacingM, q.LengthM))
	}
	if !(q.RoofPitchDeg >= 0 && q.RoofPitchDeg < 90) {
		errs = append(errs, fmt.Errorf("--pitch %g°: allowed 0 ≤ pitch < 90", q.RoofPitchDeg))
	}
	if q.Base != "" && q.Base != "pinned" && q.Base != "fixed" {
		errs = append(errs, fmt.Errorf("--base %q: allowed pinned, fixed", q.Base))
	}
	errs = append(errs, q.Wind.validate())
	return errors.Join(errs...)
}

func (w WindRequest) validate() error {
	switch {
	case w.Class != "" && w.Region != "":
		return errors.New("wind: give either --wind-class or --region (with --terrain and --importance), not both")
	case w.Class != "":
		if !slices.Contains(housingClasses, w.Class) {
			return fmt.Errorf("--wind-class %q: allowed %s (AS 4055-2021)", w.Class, strings.Join(housingClasses, ", "))
		}
		return nil
	case w.Region == "":
		return errors.New("wind: missing; give --wind-class (e.g. N3) or --region, --terrain and --importance")
	}
	var errs []error
	if !slices.Contains(terrainCategories, w.TerrainCategory) {
		errs = append(errs, fmt.Errorf("--terrain %g: allowed 1, 2, 2.5, 3, 4 (AS/NZS 1170.2:2021 cl. 4.2.1)", w.TerrainCategory))
	}
	if w.ImportanceLevel < 1 || w.ImportanceLevel > 4 {
		errs = append(errs, fmt.Errorf("--importance %d: allowed 1, 2, 3, 4 (AS/NZS 1170.0:2002 Table 3.1)", w.ImportanceLevel))
	}
	if w.DesignLifeYears < 0 {
		errs = append(errs, fmt.Errorf("--life %d years: must be positive", w.DesignLifeYears))
	}
	return errors.Join(errs...)
}

// baysNeeded is the fewest bays of the asked spacing that make the asked
// length, or 0 when no spacing is asked.
func (q Query) baysNeeded() int {
	if q.BaySpacingM == 0 {
		return 0
	}
	return int(math.Ceil(q.LengthM/q.BaySpacingM - 1e-9))
}

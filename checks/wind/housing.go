package wind

import (
	"fmt"
	"strings"
)

// HousingClass is a wind class of AS 4055-2021 (N1–N6 non-cyclonic, C1–C4
// cyclonic).
type HousingClass string

// Housing wind classes of AS 4055-2021 Table 2.1.
const (
	N1 HousingClass = "N1"
	N2 HousingClass = "N2"
	N3 HousingClass = "N3"
	N4 HousingClass = "N4"
	N5 HousingClass = "N5"
	N6 HousingClass = "N6"
	C1 HousingClass = "C1"
	C2 HousingClass = "C2"
	C3 HousingClass = "C3"
	C4 HousingClass = "C4"
)

// classSpeeds holds V_h,u and V_h,s (m/s) of AS 4055 Table 2.1. ULS speeds
// confirmed: S6 (web page quoting the table); SLS speeds from memory of
// AS 4055-2012 Table 2.1 (REFERENCE-VALUES §2). C1–C4 share N3–N6's speeds.
var classSpeeds = map[HousingClass][2]float64{
	N1: {34, 26}, N2: {40, 26}, N3: {50, 32}, N4: {61, 39}, N5: {74, 47}, N6: {86, 55},
	C1: {50, 32}, C2: {61, 39}, C3: {74, 47}, C4: {86, 55},
}

// ParseHousingClass reads a class name such as "N3" (case-insensitive).
func ParseHousingClass(s string) (HousingClass, error) {
	c := HousingClass(strings.ToUpper(strings.TrimSpace(s)))
	if _, ok := classSpeeds[c]; !ok {
		return "", fmt.Errorf("housing wind class %q: allowed N1–N6, C1–C4 (AS 4055-2021)", s)
	}
	return c, nil
}

// Speeds returns the design gust speeds of the class at the building. They
// already include terrain, shielding and topography: site and design speeds
// are the class speeds, and V_R and the multipliers are reported as 0 (not
// applicable). AS 4055's ultimate speed is the 1/500
// speed and its serviceability speed the 1/25 speed (confirmed: S14).
func (c HousingClass) Speeds(referenceHeightM float64) (Speeds, error) {
	v, ok := classSpeeds[c]
	if !ok {
		return Speeds{}, fmt.Errorf("housing wind class %q: allowed N1–N6, C1–C4 (AS 4055-2021)", string(c))
	}
	return newSpeeds(Speeds{
		Source:               "AS 4055-2021 wind class " + string(c),
		ReferenceHeightM:     referenceHeightM,
		AnnualProbabilityULS: 1.0 / 500,
		AnnualProbabilitySLS: SLSAnnualProbability,
		VSitULSMS:            v[0],
		VSitSLSMS:            v[1],
		VDesULSMS:            v[0],
		VDesSLSMS:            v[1],
	}), nil
}

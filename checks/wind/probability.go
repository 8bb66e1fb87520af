package wind

import "fmt"

// SLSAnnualProbability is the annual probability of exceedance used for the
// serviceability wind speed: 1/25 (V_25). AS/NZS 1170.0:2002 leaves the
// serviceability probability to the designer (Appendix C guidance, from
// memory); 1/25 is the value independent transcriptions use (confirmed: S2
// uses R = 25, S3 NZ SLS1 1/25) and the AS 4055 serviceability basis (S14).
const SLSAnnualProbability = 1.0 / 25

// f2Row is one design-working-life row of AS/NZS 1170.0:2002 Table F2
// (wind, Australia): return periods (years) for importance levels 1–4; 0
// where the table gives none (risk analysis required).
type f2Row struct {
	lifeYears         int
	nonCyclonic, cycl [4]float64
}

// tableF2: confirmed against independent transcriptions (REFERENCE-VALUES
// §3.1, S2 and S3). Only IL1 differs in cyclonic regions (at 50 years).
var tableF2 = []f2Row{
	{5, [4]float64{25, 50, 100, 0}, [4]float64{25, 50, 100, 0}},
	{25, [4]float64{100, 200, 500, 1000}, [4]float64{100, 200, 500, 1000}},
	{50, [4]float64{100, 500, 1000, 2500}, [4]float64{200, 500, 1000, 2500}},
	{100, [4]float64{500, 1000, 2500, 0}, [4]float64{500, 1000, 2500, 0}},
}

// ULSAnnualProbability returns the annual probability of exceedance of the
// ultimate wind speed from AS/NZS 1170.0:2002 Table F2 for an importance
// level (1–4) and design working life in years. A life between the tabulated
// rows (5, 25, 50, 100 years) takes the next longer row, which is
// conservative; a life over 100 years takes the 100-year row ("100 or more").
func ULSAnnualProbability(importanceLevel, designLifeYears int, cyclonic bool) (float64, error) {
	if importanceLevel < 1 || importanceLevel > 4 {
		return 0, fmt.Errorf("importance level %d: allowed 1, 2, 3, 4 (AS/NZS 1170.0:2002 Table 3.1)", importanceLevel)
	}
	if designLifeYears < 1 {
		return 0, fmt.Errorf("design working life %d years: allowed ≥ 1", designLifeYears)
	}
	row := tableF2[len(tableF2)-1]
	for _, r := range tableF2 {
		if designLifeYears <= r.lifeYears {
			row = r
			break
		}
	}
	R := row.nonCyclonic[importanceLevel-1]
	if cyclonic {
		R = row.cycl[importanceLevel-1]
	}
	if R == 0 {
		return 0, fmt.Errorf("importance level %d with design working life %d years: AS/NZS 1170.0:2002 Table F2 requires a risk analysis", importanceLevel, designLifeYears)
	}
	return 1 / R, nil
}

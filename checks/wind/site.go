package wind

import (
	"errors"
	"fmt"
)

// Site is a building site described by the AS/NZS 1170.2:2021 parameters.
type Site struct {
	Region          string  // wind region of Figure 3.1(A)/(B): A0–A5, B1, B2, C, D, NZ1–NZ4
	TerrainCategory float64 // 1, 2, 2.5, 3 or 4 (cl. 4.2.1)
	ImportanceLevel int     // 1–4, AS/NZS 1170.0:2002 Table 3.1
	DesignLifeYears int     // design working life, AS/NZS 1170.0:2002 Table F2 rows 5, 25, 50, 100

	// Multipliers; 0 means the default 1.0.
	Ms float64 // shielding, cl. 4.3; default 1.0 (no shielding relied on)
	Mt float64 // topography, cl. 4.4; default 1.0 (flat site)
	Md float64 // direction, cl. 3.3; default 1.0 (any direction; required for cladding and immediate supports)
}

// MinULSDesignSpeedMS is the floor on the ultimate design speed,
// AS/NZS 1170.2:2021 cl. 2.3 (confirmed: S2).
const MinULSDesignSpeedMS = 30

// Speeds holds the design gust speeds and dynamic pressures at the reference
// height. For a housing class the multipliers and V_R are 0 (not applicable).
type Speeds struct {
	Source               string
	ReferenceHeightM     float64
	AnnualProbabilityULS float64
	AnnualProbabilitySLS float64
	VRULSMS, VRSLSMS     float64 // regional speeds, rounded, before M_c (Table 3.1(A))
	Mc, Md, Mzcat        float64
	Ms, Mt               float64
	VSitULSMS, VSitSLSMS float64 // site speeds, cl. 2.2
	VDesULSMS, VDesSLSMS float64 // design speeds, cl. 2.3 (ULS ≥ 30 m/s)
	QULSKPa, QSLSKPa     float64 // 0.6·V_des²/1000
}

// DynamicPressureKPa returns q = 0.5·ρ_air·V² with ρ_air = 1.2 kg/m³ and
// C_dyn = 1 (AS/NZS 1170.2:2021 cl. 2.4), in kPa.
func DynamicPressureKPa(vMS float64) float64 { return 0.6 * vMS * vMS / 1000 }

func newSpeeds(s Speeds) Speeds {
	s.QULSKPa = DynamicPressureKPa(s.VDesULSMS)
	s.QSLSKPa = DynamicPressureKPa(s.VDesSLSMS)
	return s
}

func orOne(m float64) float64 {
	if m == 0 {
		return 1
	}
	return m
}

// Validate reports every bad field of the site in one error.
func (s Site) Validate() error {
	var errs []error
	if _, err := lookupRegion(s.Region); err != nil {
		errs = append(errs, err)
	}
	if _, ok := mzRows[s.TerrainCategory]; !ok {
		errs = append(errs, fmt.Errorf("terrain category %g: allowed 1, 2, 2.5, 3, 4", s.TerrainCategory))
	}
	if s.ImportanceLevel < 1 || s.ImportanceLevel > 4 {
		errs = append(errs, fmt.Errorf("importance level %d: allowed 1, 2, 3, 4", s.ImportanceLevel))
	}
	if s.DesignLifeYears < 1 {
		errs = append(errs, fmt.Errorf("design working life %d years: allowed ≥ 1", s.DesignLifeYears))
	}
	for _, m := range []struct {
		name string
		v    float64
	}{{"M_s", s.Ms}, {"M_t", s.Mt}, {"M_d", s.Md}} {
		if m.v < 0 || m.v > 2 {
			errs = append(errs, fmt.Errorf("%s %g: allowed 0 (default 1.0) or 0 < M ≤ 2", m.name, m.v))
		}
	}
	return errors.Join(errs...)
}

// Speeds returns the site design speeds at reference height z (m):
// V_sit = V_R·M_c·M_d·(M_z,cat·M_s·M_t), cl. 2.2, with V_R rounded to 1 m/s
// before M_c as Table 3.1(A) prints it; V_des = V_sit (one orthogonal
// direction with M_d as given), floored at 30 m/s at ULS (cl. 2.3).
func (s Site) Speeds(zM float64) (Speeds, error) {
	if err := s.Validate(); err != nil {
		return Speeds{}, fmt.Errorf("wind site: %w", err)
	}
	cyc, _ := Cyclonic(s.Region)
	pU, err := ULSAnnualProbability(s.ImportanceLevel, s.DesignLifeYears, cyc)
	if err != nil {
		return Speeds{}, fmt.Errorf("wind site: %w", err)
	}
	mz, err := TerrainHeightMultiplier(s.TerrainCategory, zM)
	if err != nil {
		return Speeds{}, fmt.Errorf("wind site: reference height: %w", err)
	}
	vrU, err := RegionalSpeedMS(s.Region, 1/pU)
	if err != nil {
		return Speeds{}, fmt.Errorf("wind site: %w", err)
	}
	vrS, err := RegionalSpeedMS(s.Region, 1/SLSAnnualProbability)
	if err != nil {
		return Speeds{}, fmt.Errorf("wind site: %w", err)
	}
	mc, _ := ClimateMultiplier(s.Region)
	out := Speeds{
		Source: fmt.Sprintf("AS/NZS 1170.2:2021 region %s, terrain category %g, importance level %d, design life %d years",
			s.Region, s.TerrainCategory, s.ImportanceLevel, s.DesignLifeYears),
		ReferenceHeightM:     zM,
		AnnualProbabilityULS: pU,
		AnnualProbabilitySLS: SLSAnnualProbability,
		VRULSMS:              vrU,
		VRSLSMS:              vrS,
		Mc:                   mc,
		Md:                   orOne(s.Md),
		Mzcat:                mz,
		Ms:                   orOne(s.Ms),
		Mt:                   orOne(s.Mt),
	}
	m := out.Mc * out.Md * out.Mzcat * out.Ms * out.Mt
	out.VSitULSMS = vrU * m
	out.VSitSLSMS = vrS * m
	out.VDesULSMS = max(out.VSitULSMS, MinULSDesignSpeedMS)
	out.VDesSLSMS = out.VSitSLSMS
	return newSpeeds(out), nil
}

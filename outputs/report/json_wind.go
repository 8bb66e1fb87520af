package report

import "github.com/spansweep/spansweep/checks/wind"

// JSON shape of the wind derivation (wind.Loads).
type (
	// WindJSON is the speeds, multipliers and every wind case's zones.
	WindJSON struct {
		Source               string              `json:"source"`
		ReferenceHeightM     float64             `json:"reference_height_m"`
		AnnualProbabilityULS float64             `json:"annual_probability_uls"`
		AnnualProbabilitySLS float64             `json:"annual_probability_sls"`
		VRULSMS              float64             `json:"v_r_uls_ms"`
		VRSLSMS              float64             `json:"v_r_sls_ms"`
		Mc                   float64             `json:"m_c"`
		Md                   float64             `json:"m_d"`
		MzCat                float64             `json:"m_z_cat"`
		Ms                   float64             `json:"m_s"`
		Mt                   float64             `json:"m_t"`
		VSitULSMS            float64             `json:"v_sit_uls_ms"`
		VSitSLSMS            float64             `json:"v_sit_sls_ms"`
		VDesULSMS            float64             `json:"v_des_uls_ms"`
		VDesSLSMS            float64             `json:"v_des_sls_ms"`
		QULSKPa              float64             `json:"q_uls_kpa"`
		QSLSKPa              float64             `json:"q_sls_kpa"`
		LocalDimensionWallM  float64             `json:"local_dimension_wall_m"`
		LocalDimensionRoofM  float64             `json:"local_dimension_roof_m"`
		Cases                []WindCaseJSON      `json:"cases"`
		Purlins              MemberPressuresJSON `json:"purlins"`
		Girts                MemberPressuresJSON `json:"girts"`
	}

	// WindCaseJSON is one direction, roof case and internal pressure case.
	WindCaseJSON struct {
		Name      string        `json:"name"`
		Direction string        `json:"direction"`
		RoofCase  string        `json:"roof_case"`
		Internal  string        `json:"internal"`
		Cpi       float64       `json:"cpi"`
		Kci       float64       `json:"kc_i"`
		Surfaces  []SurfaceJSON `json:"surfaces"`
	}

	// SurfaceJSON is one surface's zones.
	SurfaceJSON struct {
		Surface string     `json:"surface"`
		FromM   float64    `json:"from_m"`
		ToM     float64    `json:"to_m"`
		Ka      float64    `json:"ka"`
		KaKce   float64    `json:"ka_kc_e"`
		Zones   []ZoneJSON `json:"zones"`
	}

	// ZoneJSON is one strip of a surface with one net pressure.
	ZoneJSON struct {
		FromM          float64 `json:"from_m"`
		ToM            float64 `json:"to_m"`
		Cpe            float64 `json:"cpe"`
		CfigFrame      float64 `json:"cfig_frame"`
		CfigMember     float64 `json:"cfig_member"`
		PressureULSKPa float64 `json:"pressure_uls_kpa"`
		PressureSLSKPa float64 `json:"pressure_sls_kpa"`
	}

	// MemberPressuresJSON is the purlin or girt design pressure envelope.
	MemberPressuresJSON struct {
		GeneralInwardULSKPa  float64 `json:"general_inward_uls_kpa"`
		GeneralInwardSLSKPa  float64 `json:"general_inward_sls_kpa"`
		GeneralOutwardULSKPa float64 `json:"general_outward_uls_kpa"`
		GeneralOutwardSLSKPa float64 `json:"general_outward_sls_kpa"`
		EdgeOutwardULSKPa    float64 `json:"edge_outward_uls_kpa"`
		EdgeOutwardSLSKPa    float64 `json:"edge_outward_sls_kpa"`
		EdgeKl               float64 `json:"edge_kl"`
		EdgeWidthM           float64 `json:"edge_width_m"`
	}
)

func windJSON(l wind.Loads) WindJSON {
	s := l.Speeds
	out := WindJSON{Source: s.Source, ReferenceHeightM: s.ReferenceHeightM,
		AnnualProbabilityULS: s.AnnualProbabilityULS, AnnualProbabilitySLS: s.AnnualProbabilitySLS,
		VRULSMS: s.VRULSMS, VRSLSMS: s.VRSLSMS, Mc: s.Mc, Md: s.Md, MzCat: s.Mzcat, Ms: s.Ms, Mt: s.Mt,
		VSitULSMS: s.VSitULSMS, VSitSLSMS: s.VSitSLSMS, VDesULSMS: s.VDesULSMS, VDesSLSMS: s.VDesSLSMS,
		QULSKPa: s.QULSKPa, QSLSKPa: s.QSLSKPa,
		LocalDimensionWallM: l.LocalDimensionWallM, LocalDimensionRoofM: l.LocalDimensionRoofM,
		Cases: make([]WindCaseJSON, 0, len(l.Cases)), Purlins: pressuresJSON(l.Purlins), Girts: pressuresJSON(l.Girts)}
	for _, c := range l.Cases {
		cj := WindCaseJSON{Name: c.Name, Direction: c.Direction.String(), RoofCase: c.Roof.String(),
			Internal: c.Internal.Name, Cpi: c.Internal.Cpi, Kci: c.Kci, Surfaces: make([]SurfaceJSON, 0, len(c.Surfaces))}
		for _, sf := range c.Surfaces {
			sj := SurfaceJSON{Surface: sf.Kind.String(), FromM: sf.FromM, ToM: sf.ToM, Ka: sf.Ka, KaKce: sf.KaKce,
				Zones: make([]ZoneJSON, 0, len(sf.Zones))}
			for _, z := range sf.Zones {
				sj.Zones = append(sj.Zones, ZoneJSON(z))
			}
			cj.Surfaces = append(cj.Surfaces, sj)
		}
		out.Cases = append(out.Cases, cj)
	}
	return out
}

func pressuresJSON(m wind.MemberPressures) MemberPressuresJSON {
	return MemberPressuresJSON{
		GeneralInwardULSKPa: m.GeneralInward.ULSKPa, GeneralInwardSLSKPa: m.GeneralInward.SLSKPa,
		GeneralOutwardULSKPa: m.GeneralOutward.ULSKPa, GeneralOutwardSLSKPa: m.GeneralOutward.SLSKPa,
		EdgeOutwardULSKPa: m.EdgeOutward.ULSKPa, EdgeOutwardSLSKPa: m.EdgeOutward.SLSKPa,
		EdgeKl: m.EdgeKl, EdgeWidthM: m.EdgeWidthM,
	}
}

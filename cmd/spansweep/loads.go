package main

import (
	"encoding/json"
	"fmt"
	"io"
	"strings"

	"github.com/spf13/pflag"

	"github.com/spansweep/spansweep/checks/actions"
	"github.com/spansweep/spansweep/checks/wind"
)

func init() {
	commands["loads"] = command{summary: "print the wind, dead and live actions and load combinations for one shed", run: runLoads}
}

const loadsSynopsis = `Derives the actions on one enclosed gable shed: site wind speeds
(AS/NZS 1170.2:2021 from a region, or an AS 4055-2021 housing class), dynamic
pressures, the net pressure zones of every wall and roof surface for each wind
case, purlin and girt design pressures, the AS/NZS 1170.1 roof live load and
the AS/NZS 1170.0 load combinations.

  spansweep loads --span 12 --length 30 --height 4 --pitch 5 --wind-class N3
  spansweep loads --span 12 --length 30 --height 4 --pitch 5 --region B2 --terrain 2.5 --importance 2 --life 50 --json

Pressures are net (external minus internal), inward positive. Zones run from
the windward edge in the wind direction (m, plan distance).`

// loadsFlags are the command's inputs.
type loadsFlags struct {
	span, length, height, pitch, bay float64
	siteFlags
	permeability              string
	openingWall               string
	openingRatio, openingArea float64
	deadRoof, deadWall        float64
	hoistKN, hoistAt          float64
	json                      bool
}

func (f *loadsFlags) register(fs *pflag.FlagSet) {
	fs.Float64Var(&f.span, "span", 0, "span across the ridge, column centrelines (m)")
	fs.Float64Var(&f.length, "length", 0, "length along the ridge (m)")
	fs.Float64Var(&f.height, "height", 0, "eaves height (m)")
	fs.Float64Var(&f.pitch, "pitch", 0, "roof pitch (degrees, 0–35)")
	fs.Float64Var(&f.bay, "bay", 6, "frame spacing (m): the frame's tributary area for K_a and the roof live load")
	f.siteFlags.register(fs, 2, 1, "1.0 for any direction")
	fs.StringVar(&f.permeability, "permeability", "sealed", "Table 5.1(A) case without a dominant opening: sealed (Cpi −0.2, 0.0) or permeable (all walls, −0.3, 0.0)")
	fs.StringVar(&f.openingWall, "opening-wall", "", "wall with a dominant opening (e.g. a roller door): eave or end; empty for none")
	fs.Float64Var(&f.openingRatio, "opening-ratio", 0, "dominant opening area over the other walls' and roof's open area (Table 5.1(B))")
	fs.Float64Var(&f.openingArea, "opening-area", 0, "dominant opening area (m²) for K_v; 0 for K_v = 1")
	fs.Float64Var(&f.deadRoof, "dead-roof", actions.DefaultRoofDeadKPa, "roof cladding and services dead load (kPa)")
	fs.Float64Var(&f.deadWall, "dead-wall", actions.DefaultWallDeadKPa, "wall cladding dead load (kPa)")
	fs.Float64Var(&f.hoistKN, "hoist-kn", 0, "hoist point load on a rafter (kN); 0 for none")
	fs.Float64Var(&f.hoistAt, "hoist-at", 0, "hoist position from the left column (m, plan)")
	fs.BoolVar(&f.json, "json", false, "print JSON instead of text")
}

// loadsResult is everything the command prints.
type loadsResult struct {
	building     wind.Building
	wind         wind.Loads
	dead         actions.Dead
	roofLiveArea float64
	roofLiveKPa  float64
	hoist        *actions.Hoist
	combinations []actions.Combination
}

func runLoads(args []string, stdout, stderr io.Writer) error {
	var f loadsFlags
	fs := newFlagSet("loads", loadsSynopsis, stdout)
	f.register(fs)
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	r, err := deriveLoads(&f, fs)
	if err != nil {
		return err
	}
	if f.json {
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(loadsJSONOf(r))
	}
	return printLoads(stdout, r)
}

// deriveLoads validates the flags (every bad flag in one message) and
// derives the actions.
func deriveLoads(f *loadsFlags, fs *pflag.FlagSet) (loadsResult, error) {
	var bad []string
	badf := func(format string, a ...any) { bad = append(bad, fmt.Sprintf(format, a...)) }
	for _, d := range []struct {
		name string
		v    float64
	}{{"span", f.span}, {"length", f.length}, {"height", f.height}, {"bay", f.bay}} {
		if !(d.v > 0) {
			badf("--%s %g: must be a positive length in m", d.name, d.v)
		}
	}
	if !(f.pitch >= 0 && f.pitch <= wind.MaxPitchDeg) {
		badf("--pitch %g: allowed 0–%d degrees (the AS/NZS 1170.2:2021 coefficient tables implemented)", f.pitch, wind.MaxPitchDeg)
	}
	if f.bay > f.length && f.length > 0 {
		badf("--bay %g: must not exceed --length %g", f.bay, f.length)
	}
	speedsOf := windSource(f, fs, badf)
	enc := enclosureOf(f, badf)
	dead, err := actions.Dead{RoofKPa: f.deadRoof, WallKPa: f.deadWall}.Resolved()
	if err != nil || f.deadRoof <= 0 || f.deadWall <= 0 {
		badf("--dead-roof %g, --dead-wall %g: must be positive (kPa)", f.deadRoof, f.deadWall)
	}
	var hoist *actions.Hoist
	if fs.Changed("hoist-kn") || fs.Changed("hoist-at") {
		hoist = &actions.Hoist{LoadKN: f.hoistKN, PositionM: f.hoistAt}
		if err := hoist.Validate(f.span); err != nil {
			badf("--hoist-kn/--hoist-at: %v", err)
		}
	}
	if len(bad) > 0 {
		return loadsResult{}, usagef("%s", strings.Join(bad, "; "))
	}
	b := wind.Building{SpanM: f.span, LengthM: f.length, EaveHeightM: f.height, PitchDeg: f.pitch, BaySpacingM: f.bay}
	if err := b.Validate(); err != nil {
		return loadsResult{}, usagef("building: %v", err)
	}
	sp, err := speedsOf(b.ReferenceHeightM())
	if err != nil {
		return loadsResult{}, usagef("--region/--terrain/--importance/--life: %v", err)
	}
	wl, err := wind.Derive(b, enc, sp)
	if err != nil {
		return loadsResult{}, usagef("%v", err)
	}
	area := f.bay * f.span
	q, err := actions.RoofLiveKPa(area)
	if err != nil {
		return loadsResult{}, fmt.Errorf("roof live load: %w", err)
	}
	return loadsResult{building: b, wind: wl, dead: dead, roofLiveArea: area, roofLiveKPa: q, hoist: hoist,
		combinations: actions.Combinations(wl, hoist != nil)}, nil
}

// windSource checks the class or region flags and returns the speed
// function for the reference height.
func windSource(f *loadsFlags, fs *pflag.FlagSet, badf func(string, ...any)) func(float64) (wind.Speeds, error) {
	none := func(float64) (wind.Speeds, error) { return wind.Speeds{}, nil }
	switch {
	case f.class != "" && f.region != "":
		badf("--wind-class %s and --region %s: give one, not both", f.class, f.region)
		return none
	case f.class == "" && f.region == "":
		badf("give --wind-class (N1–N6, C1–C4) or --region (%s)", strings.Join(wind.Regions(), ", "))
		return none
	case f.class != "":
		for _, n := range []string{"terrain", "importance", "life", "ms", "mt", "md"} {
			if fs.Changed(n) {
				badf("--%s: applies to --region only; a --wind-class speed already includes the site", n)
			}
		}
		hc, err := wind.ParseHousingClass(f.class)
		if err != nil {
			badf("--wind-class %s: allowed N1–N6, C1–C4 (AS 4055-2021)", f.class)
			return none
		}
		return hc.Speeds
	}
	site := wind.Site{Region: strings.ToUpper(f.region), TerrainCategory: f.terrain, ImportanceLevel: f.importance,
		DesignLifeYears: f.life, Ms: f.ms, Mt: f.mt, Md: f.md}
	if _, err := wind.ClimateMultiplier(site.Region); err != nil {
		badf("--region %s: allowed %s", f.region, strings.Join(wind.Regions(), ", "))
	}
	if _, err := wind.TerrainHeightMultiplier(f.terrain, 10); err != nil {
		badf("--terrain %g: allowed 1, 2, 2.5, 3, 4", f.terrain)
	}
	if f.importance < 1 || f.importance > 4 {
		badf("--importance %d: allowed 1, 2, 3, 4", f.importance)
	}
	if f.life < 1 {
		badf("--life %d: allowed ≥ 1 year", f.life)
	}
	for _, m := range []struct {
		n string
		v float64
	}{{"ms", f.ms}, {"mt", f.mt}, {"md", f.md}} {
		if !(m.v > 0 && m.v <= 2) {
			badf("--%s %g: allowed 0 < M ≤ 2", m.n, m.v)
		}
	}
	return site.Speeds
}

func enclosureOf(f *loadsFlags, badf func(string, ...any)) wind.Enclosure {
	var e wind.Enclosure
	switch strings.ToLower(f.permeability) {
	case "sealed":
		e.Permeability = wind.Sealed
	case "permeable":
		e.Permeability = wind.AllWallsPermeable
	default:
		badf("--permeability %s: allowed sealed, permeable", f.permeability)
	}
	var wall wind.Wall
	switch strings.ToLower(f.openingWall) {
	case "":
		if f.openingRatio != 0 || f.openingArea != 0 {
			badf("--opening-ratio/--opening-area need --opening-wall (eave or end)")
		}
		return e
	case "eave":
		wall = wind.EaveWall
	case "end":
		wall = wind.EndWall
	default:
		badf("--opening-wall %s: allowed eave, end", f.openingWall)
		return e
	}
	if !(f.openingRatio > 0) {
		badf("--opening-ratio %g: must be positive with --opening-wall", f.openingRatio)
	}
	if f.openingArea < 0 {
		badf("--opening-area %g: allowed ≥ 0 m²", f.openingArea)
	}
	e.Opening = &wind.DominantOpening{Wall: wall, AreaRatio: f.openingRatio, AreaM2: f.openingArea}
	return e
}

// JSON shape of `loads --json`: every key carries its unit.
type (
	loadsJSON struct {
		Caution               string              `json:"caution"`
		WindSource            string              `json:"wind_source"`
		SpanM                 float64             `json:"span_m"`
		LengthM               float64             `json:"length_m"`
		EaveHeightM           float64             `json:"eave_height_m"`
		PitchDeg              float64             `json:"pitch_deg"`
		BaySpacingM           float64             `json:"bay_spacing_m"`
		ReferenceHeightM      float64             `json:"reference_height_m"`
		AnnualProbabilityULS  float64             `json:"annual_probability_uls"`
		AnnualProbabilitySLS  float64             `json:"annual_probability_sls"`
		VRULSMS               float64             `json:"v_r_uls_ms"`
		VRSLSMS               float64             `json:"v_r_sls_ms"`
		Mc                    float64             `json:"m_c"`
		Md                    float64             `json:"m_d"`
		MzCat                 float64             `json:"mz_cat"`
		Ms                    float64             `json:"m_s"`
		Mt                    float64             `json:"m_t"`
		VSitULSMS             float64             `json:"v_sit_uls_ms"`
		VSitSLSMS             float64             `json:"v_sit_sls_ms"`
		VDesULSMS             float64             `json:"v_des_uls_ms"`
		VDesSLSMS             float64             `json:"v_des_sls_ms"`
		QULSKPa               float64             `json:"q_uls_kpa"`
		QSLSKPa               float64             `json:"q_sls_kpa"`
		LocalDimensionWallM   float64             `json:"local_dimension_wall_m"`
		LocalDimensionRoofM   float64             `json:"local_dimension_roof_m"`
		WindCases             []windCaseJSON      `json:"wind_cases"`
		Surfaces              []surfaceJSON       `json:"surfaces"`
		Purlins               memberPressuresJSON `json:"purlins"`
		Girts                 memberPressuresJSON `json:"girts"`
		DeadRoofKPa           float64             `json:"dead_roof_kpa"`
		DeadWallKPa           float64             `json:"dead_wall_kpa"`
		RoofLiveAreaM2        float64             `json:"roof_live_area_m2"`
		RoofLiveKPa           float64             `json:"roof_live_kpa"`
		RoofPointCladdingKN   float64             `json:"roof_point_cladding_kn"`
		RoofPointStructuralKN float64             `json:"roof_point_structural_kn"`
		HoistKN               float64             `json:"hoist_kn,omitempty"`
		HoistPositionM        float64             `json:"hoist_position_m,omitempty"`
		Combinations          []combinationJSON   `json:"combinations"`
	}
	windCaseJSON struct {
		Name      string  `json:"name"`
		Primary   string  `json:"primary"`
		Direction string  `json:"direction"`
		RoofCase  string  `json:"roof_case"`
		Internal  string  `json:"internal"`
		Cpi       float64 `json:"cpi"`
		Kci       float64 `json:"kc_i"`
	}
	surfaceJSON struct {
		Case    string     `json:"case"`
		Surface string     `json:"surface"`
		FromM   float64    `json:"from_m"`
		ToM     float64    `json:"to_m"`
		Ka      float64    `json:"ka"`
		KaKce   float64    `json:"ka_kc_e"`
		Zones   []zoneJSON `json:"zones"`
	}
	zoneJSON struct {
		FromM          float64 `json:"from_m"`
		ToM            float64 `json:"to_m"`
		Cpe            float64 `json:"cpe"`
		CfigFrame      float64 `json:"cfig_frame"`
		CfigMember     float64 `json:"cfig_member"`
		PressureULSKPa float64 `json:"pressure_uls_kpa"`
		PressureSLSKPa float64 `json:"pressure_sls_kpa"`
	}
	memberPressuresJSON struct {
		GeneralInwardULSKPa  float64 `json:"general_inward_uls_kpa"`
		GeneralInwardSLSKPa  float64 `json:"general_inward_sls_kpa"`
		GeneralOutwardULSKPa float64 `json:"general_outward_uls_kpa"`
		GeneralOutwardSLSKPa float64 `json:"general_outward_sls_kpa"`
		EdgeOutwardULSKPa    float64 `json:"edge_outward_uls_kpa"`
		EdgeOutwardSLSKPa    float64 `json:"edge_outward_sls_kpa"`
		EdgeKl               float64 `json:"edge_kl"`
		EdgeWidthM           float64 `json:"edge_width_m"`
	}
	combinationJSON struct {
		Name       string       `json:"name"`
		LimitState string       `json:"limit_state"`
		Factors    []factorJSON `json:"factors"`
	}
	factorJSON struct {
		Case   string  `json:"case"`
		Factor float64 `json:"factor"`
	}
)

func memberJSON(m wind.MemberPressures) memberPressuresJSON {
	return memberPressuresJSON{
		GeneralInwardULSKPa: m.GeneralInward.ULSKPa, GeneralInwardSLSKPa: m.GeneralInward.SLSKPa,
		GeneralOutwardULSKPa: m.GeneralOutward.ULSKPa, GeneralOutwardSLSKPa: m.GeneralOutward.SLSKPa,
		EdgeOutwardULSKPa: m.EdgeOutward.ULSKPa, EdgeOutwardSLSKPa: m.EdgeOutward.SLSKPa,
		EdgeKl: m.EdgeKl, EdgeWidthM: m.EdgeWidthM,
	}
}

func loadsJSONOf(r loadsResult) loadsJSON {
	s, b := r.wind.Speeds, r.building
	out := loadsJSON{
		Caution: caution, WindSource: s.Source,
		SpanM: b.SpanM, LengthM: b.LengthM, EaveHeightM: b.EaveHeightM, PitchDeg: b.PitchDeg, BaySpacingM: b.BaySpacingM,
		ReferenceHeightM: s.ReferenceHeightM, AnnualProbabilityULS: s.AnnualProbabilityULS, AnnualProbabilitySLS: s.AnnualProbabilitySLS,
		VRULSMS: s.VRULSMS, VRSLSMS: s.VRSLSMS, Mc: s.Mc, Md: s.Md, MzCat: s.Mzcat, Ms: s.Ms, Mt: s.Mt,
		VSitULSMS: s.VSitULSMS, VSitSLSMS: s.VSitSLSMS, VDesULSMS: s.VDesULSMS, VDesSLSMS: s.VDesSLSMS,
		QULSKPa: s.QULSKPa, QSLSKPa: s.QSLSKPa,
		LocalDimensionWallM: r.wind.LocalDimensionWallM, LocalDimensionRoofM: r.wind.LocalDimensionRoofM,
		Purlins: memberJSON(r.wind.Purlins), Girts: memberJSON(r.wind.Girts),
		DeadRoofKPa: r.dead.RoofKPa, DeadWallKPa: r.dead.WallKPa,
		RoofLiveAreaM2: r.roofLiveArea, RoofLiveKPa: r.roofLiveKPa,
		RoofPointCladdingKN: actions.RoofPointCladdingKN, RoofPointStructuralKN: actions.RoofPointStructuralKN,
	}
	if r.hoist != nil {
		out.HoistKN, out.HoistPositionM = r.hoist.LoadKN, r.hoist.PositionM
	}
	for _, c := range r.wind.Cases {
		out.WindCases = append(out.WindCases, windCaseJSON{Name: c.Name, Primary: string(actions.WindPrimary(c.Name)),
			Direction: c.Direction.String(), RoofCase: c.Roof.String(), Internal: c.Internal.Name, Cpi: c.Internal.Cpi, Kci: c.Kci})
		for _, sf := range c.Surfaces {
			sj := surfaceJSON{Case: c.Name, Surface: sf.Kind.String(), FromM: sf.FromM, ToM: sf.ToM, Ka: sf.Ka, KaKce: sf.KaKce}
			for _, z := range sf.Zones {
				sj.Zones = append(sj.Zones, zoneJSON(z))
			}
			out.Surfaces = append(out.Surfaces, sj)
		}
	}
	for _, c := range r.combinations {
		cj := combinationJSON{Name: c.Name, LimitState: c.LimitState.String()}
		for _, f := range c.Factors {
			cj.Factors = append(cj.Factors, factorJSON{Case: string(f.Case), Factor: f.Factor})
		}
		out.Combinations = append(out.Combinations, cj)
	}
	return out
}

// printLoads writes the human-readable report.
func printLoads(w io.Writer, r loadsResult) error {
	s, b := r.wind.Speeds, r.building
	p := &errWriter{w: w}
	p.printf("%s\n\n", caution)
	p.printf("Building: span %g m, length %g m, eaves %g m, pitch %g°, bays %g m (illustrative input)\n", b.SpanM, b.LengthM, b.EaveHeightM, b.PitchDeg, b.BaySpacingM)
	p.printf("Wind: %s\n", s.Source)
	p.printf("  reference height h (average roof height) %.3f m\n", s.ReferenceHeightM)
	if s.Mzcat > 0 {
		p.printf("  V_R ULS %g m/s (1/%.0f), SLS %g m/s (1/%.0f); M_c %.2f, M_d %.2f, M_z,cat %.4f, M_s %.2f, M_t %.2f\n",
			s.VRULSMS, 1/s.AnnualProbabilityULS, s.VRSLSMS, 1/s.AnnualProbabilitySLS, s.Mc, s.Md, s.Mzcat, s.Ms, s.Mt)
		p.printf("  V_sit ULS %.2f m/s, SLS %.2f m/s\n", s.VSitULSMS, s.VSitSLSMS)
	}
	p.printf("  V_des ULS %.2f m/s, SLS %.2f m/s; q_u %.4f kPa, q_s %.4f kPa (0.6·V², C_dyn 1)\n", s.VDesULSMS, s.VDesSLSMS, s.QULSKPa, s.QSLSKPa)
	p.printf("  local pressure dimension a: walls %.3f m, roof %.3f m\n", r.wind.LocalDimensionWallM, r.wind.LocalDimensionRoofM)
	p.printf("\nWind cases (frame net pressures, inward +; zones from the windward edge, m):\n")
	for _, c := range r.wind.Cases {
		p.printf("  %s  [K_c,i %.2f]\n", c.Name, c.Kci)
		for _, sf := range c.Surfaces {
			p.printf("    %-20s K_a %.3f K_a·K_c,e %.2f:", sf.Kind, sf.Ka, sf.KaKce)
			for _, z := range sf.Zones {
				p.printf("  %.2f–%.2f Cpe %+.3f → %+.3f / %+.3f kPa", z.FromM, z.ToM, z.Cpe, z.PressureULSKPa, z.PressureSLSKPa)
			}
			p.printf("\n")
		}
	}
	member := func(name string, m wind.MemberPressures) {
		p.printf("  %-7s inward %+.3f / %+.3f, outward %+.3f / %+.3f, edge (K_l %.1f within %.2f m) %+.3f / %+.3f kPa (ULS / SLS)\n", name,
			m.GeneralInward.ULSKPa, m.GeneralInward.SLSKPa, m.GeneralOutward.ULSKPa, m.GeneralOutward.SLSKPa,
			m.EdgeKl, m.EdgeWidthM, m.EdgeOutward.ULSKPa, m.EdgeOutward.SLSKPa)
	}
	p.printf("\nPurlin and girt design pressures (K_a = K_c = 1):\n")
	member("purlins", r.wind.Purlins)
	member("girts", r.wind.Girts)
	p.printf("\nDead: roof %.3f kPa, walls %.3f kPa (cladding and services; member self weight added by the analysis)\n", r.dead.RoofKPa, r.dead.WallKPa)
	p.printf("Roof live (AS/NZS 1170.1:2002 Table 3.2): %.3f kPa on A = %.1f m² (0.12 + 1.8/A ≥ 0.25); point %.1f kN cladding, %.1f kN structure\n",
		r.roofLiveKPa, r.roofLiveArea, actions.RoofPointCladdingKN, actions.RoofPointStructuralKN)
	if r.hoist != nil {
		p.printf("Hoist: %.2f kN at %.2f m from the left column (imposed action)\n", r.hoist.LoadKN, r.hoist.PositionM)
	}
	p.printf("\nCombinations (AS/NZS 1170.0:2002 cl. 4.2; wind primaries carry ULS pressures):\n")
	for _, c := range r.combinations {
		terms := make([]string, len(c.Factors))
		for i, f := range c.Factors {
			terms[i] = fmt.Sprintf("%.4g×[%s]", f.Factor, f.Case)
		}
		p.printf("  %s = %s\n", c.Name, strings.Join(terms, " + "))
	}
	return p.err
}

// errWriter keeps the first write error.
type errWriter struct {
	w   io.Writer
	err error
}

func (e *errWriter) printf(format string, a ...any) {
	if e.err == nil {
		_, e.err = fmt.Fprintf(e.w, format, a...)
	}
}

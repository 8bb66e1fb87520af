package grids

import (
	"fmt"
	"strconv"
	"strings"
)

// bounds is a closed (or left-open) interval of allowed numbers.
type bounds struct {
	lo, hi float64
	loOpen bool // lo itself is not allowed
}

func (b bounds) contains(v float64) bool {
	if b.loOpen && v <= b.lo || v < b.lo {
		return false
	}
	return v <= b.hi
}

func (b bounds) String() string {
	op := "≤"
	if b.loOpen {
		op = "<"
	}
	return fmt.Sprintf("%s %s value ≤ %s", fmtNum(b.lo), op, fmtNum(b.hi))
}

// keySpec documents one grid-file key. The same table drives validation
// (known keys, bounds) and KeyReference, so the two cannot drift apart.
type keySpec struct {
	Key     string  // dotted path; "[]" marks an array of tables
	Type    string  // TOML shape
	Unit    string  // unit, or "-"
	Default string  // "required" when the key must be given
	Allowed string  // allowed values, when not a numeric interval
	Bounds  *bounds // numeric interval, when one applies
	Source  string  // where the default or the limits come from
	Doc     string  // what the key means
}

func (s keySpec) allowed() string {
	if s.Bounds != nil {
		return s.Bounds.String()
	}
	return s.Allowed
}

const (
	srcPractice = "common practice, no source"
	srcC1       = "common practice; from memory of AS/NZS 1170.0:2002 Appendix C Table C1 (unverified)"
	numList     = "number list, or {from, to, step}"
	intList     = "integer list, or {from, to, step}"
)

// keySpecs lists every key a grid file may hold, in reference order.
var keySpecs = []keySpec{
	{Key: "name", Type: "string", Unit: "-", Default: `""`, Allowed: "any text", Source: "-", Doc: "Name of the range, printed on tables and reports."},

	{Key: "geometry.span_m", Type: numList, Unit: "m", Default: "required", Bounds: &bounds{lo: 3, hi: 40}, Source: srcPractice + " (light portal-frame range)", Doc: "Spans, between column centrelines."},
	{Key: "geometry.length_m", Type: numList, Unit: "m", Default: "required unless bays and bay_spacing_m", Bounds: &bounds{lo: 3, hi: 200}, Source: srcPractice, Doc: "Building lengths; the bay count is the least that keeps bays within max_bay_spacing_m. Give either length_m or bays with bay_spacing_m."},
	{Key: "geometry.max_bay_spacing_m", Type: "number", Unit: "m", Default: "6.0", Bounds: &bounds{lo: 1.5, hi: 12}, Source: srcPractice, Doc: "Largest bay spacing when lengths are given by length_m."},
	{Key: "geometry.bays", Type: intList, Unit: "-", Default: "required with bay_spacing_m", Bounds: &bounds{lo: 1, hi: 60}, Source: srcPractice, Doc: "Numbers of equal bays; length = bays × bay_spacing_m."},
	{Key: "geometry.bay_spacing_m", Type: numList, Unit: "m", Default: "required with bays", Bounds: &bounds{lo: 1.5, hi: 12}, Source: srcPractice, Doc: "Bay spacings (frame centres)."},
	{Key: "geometry.eaves_height_m", Type: numList, Unit: "m", Default: "required", Bounds: &bounds{lo: 2, hi: 12}, Source: srcPractice, Doc: "Eaves heights, ground to the top of the column."},
	{Key: "geometry.roof_pitch_deg", Type: numList, Unit: "°", Default: "required", Bounds: &bounds{lo: 0, hi: 35}, Source: "AS/NZS 1170.2:2021 Table 5.3 pitch range (roof C_p,e), from memory", Doc: "Roof pitches of the duopitch roof."},

	{Key: "wind.housing_classes", Type: "string list", Unit: "-", Default: "[] (give this or wind.site)", Allowed: "N1 … N6, C1 … C4", Source: "AS 4055:2021 Table 2.1 classes", Doc: "Housing wind classes. AS 4055 applies within its geometric limits (eaves ≤ 6 m, width ≤ 16 m, pitch ≤ 35°); outside them use wind.site."},
	{Key: "wind.site[].region", Type: "string", Unit: "-", Default: "required", Allowed: "A0 … A5, B1, B2, C, D, NZ1 … NZ4", Source: "AS/NZS 1170.2:2021 Section 3 regions", Doc: "Wind region of a site condition ([[wind.site]] table, one per condition)."},
	{Key: "wind.site[].terrain_category", Type: "number", Unit: "-", Default: "required", Allowed: "1, 2, 2.5, 3, 4", Source: "AS/NZS 1170.2:2021 Cl 4.2.1", Doc: "Terrain category of the site."},
	{Key: "wind.site[].importance_level", Type: "integer", Unit: "-", Default: "2", Allowed: "1, 2, 3, 4", Source: "AS/NZS 1170.0:2002 Table 3.1; IL2 is the ordinary building level (NCC)", Doc: "Importance level."},
	{Key: "wind.site[].design_life_years", Type: "integer", Unit: "year", Default: "50", Allowed: "5, 25, 50, 100 (rows of AS/NZS 1170.0 Table F2; IL4 with 100 years is not tabulated)", Source: "AS/NZS 1170.0:2002 Table F2", Doc: "Design working life, which with the importance level sets the annual probability of exceedance."},
	{Key: "wind.site[].ms", Type: "number", Unit: "-", Default: "1.0 (no shielding)", Bounds: &bounds{lo: 0.7, hi: 1}, Source: "AS/NZS 1170.2:2021 Table 4.3 range", Doc: "Shielding multiplier M_s."},
	{Key: "wind.site[].mt", Type: "number", Unit: "-", Default: "1.0 (flat ground)", Bounds: &bounds{lo: 1, hi: 2}, Source: "AS/NZS 1170.2:2021 Cl 4.4 (M_t ≥ 1); upper limit " + srcPractice, Doc: "Topographic multiplier M_t."},
	{Key: "wind.site[].md", Type: "number", Unit: "-", Default: "unset: the region's any-direction value (AS/NZS 1170.2:2021 Cl 3.3)", Bounds: &bounds{lo: 0.75, hi: 1}, Source: "AS/NZS 1170.2:2021 Table 3.2 range", Doc: "Wind direction multiplier M_d, when one value is wanted for all members."},

	{Key: "frame.base", Type: "string", Unit: "-", Default: `"pinned"`, Allowed: `"pinned", "fixed", "both"`, Source: srcPractice + " (pinned bases are the usual light-shed detail)", Doc: "Column base fixity; \"both\" designs each case with pinned and with fixed bases."},
	{Key: "frame.hoist_kn", Type: numList, Unit: "kN", Default: "[0]", Bounds: &bounds{lo: 0, hi: 100}, Source: srcPractice, Doc: "Hoist point loads hung from a rafter at mid-span (0 = none), imposed action."},

	{Key: "cladding.roof_dead_kpa", Type: "number", Unit: "kPa", Default: "0.10", Bounds: &bounds{lo: 0, hi: 1, loOpen: true}, Source: srcPractice + " (light steel sheeting with fixings)", Doc: "Roof cladding dead load."},
	{Key: "cladding.wall_dead_kpa", Type: "number", Unit: "kPa", Default: "0.10", Bounds: &bounds{lo: 0, hi: 1, loOpen: true}, Source: srcPractice, Doc: "Wall cladding dead load."},
	{Key: "cladding.max_purlin_spacing_m", Type: "number", Unit: "m", Default: "1.2", Bounds: &bounds{lo: 0.3, hi: 3}, Source: srcPractice + " (typical roof sheeting span)", Doc: "Largest purlin spacing the roof sheeting may span."},
	{Key: "cladding.max_girt_spacing_m", Type: "number", Unit: "m", Default: "1.5", Bounds: &bounds{lo: 0.3, hi: 3}, Source: srcPractice + " (typical wall sheeting span)", Doc: "Largest girt spacing the wall sheeting may span."},
	{Key: "cladding.spacing_step_m", Type: "number", Unit: "m", Default: "0.1", Bounds: &bounds{lo: 0, hi: 0.5, loOpen: true}, Source: srcPractice, Doc: "Step in which purlin and girt spacings are tried."},

	{Key: "limits.purlin_deflection_ratio", Type: "number", Unit: "span/x", Default: "150", Bounds: &bounds{lo: 50, hi: 1000}, Source: srcC1, Doc: "Purlin deflection limit under SLS wind, span/x."},
	{Key: "limits.girt_deflection_ratio", Type: "number", Unit: "span/x", Default: "150", Bounds: &bounds{lo: 50, hi: 1000}, Source: srcC1, Doc: "Girt deflection limit under SLS wind, span/x."},
	{Key: "limits.eaves_drift_ratio", Type: "number", Unit: "height/x", Default: "150", Bounds: &bounds{lo: 50, hi: 1000}, Source: srcC1, Doc: "Frame sway at the eaves under SLS wind, eaves height/x."},
	{Key: "limits.apex_deflection_ratio", Type: "number", Unit: "span/x", Default: "180", Bounds: &bounds{lo: 50, hi: 1000}, Source: srcPractice, Doc: "Apex vertical deflection under SLS actions, frame span/x."},

	{Key: "members.purlin_families", Type: "string list", Unit: "-", Default: `["Z", "C"]`, Allowed: `"Z", "C"`, Source: "-", Doc: "Section families the purlins may use."},
	{Key: "members.girt_families", Type: "string list", Unit: "-", Default: `["Z", "C"]`, Allowed: `"Z", "C"`, Source: "-", Doc: "Section families the girts may use."},
	{Key: "members.frame_families", Type: "string list", Unit: "-", Default: `["C", "2C"]`, Allowed: `"C", "2C" (back to back)`, Source: "-", Doc: "Section families the rafters and columns may use."},
	{Key: "members.same_rafter_and_column", Type: "boolean", Unit: "-", Default: "false", Allowed: "true, false", Source: "-", Doc: "Rafter and column must be the same section."},
	{Key: "members.knee_braces", Type: "boolean", Unit: "-", Default: "true", Allowed: "true, false", Source: "-", Doc: "Knee braces may be added at the eaves."},
	{Key: "members.span_types", Type: "string list", Unit: "-", Default: `["simple", "continuous", "lapped"]`, Allowed: `"simple", "continuous", "lapped"`, Source: "-", Doc: "Purlin and girt span arrangements the search may choose."},

	{Key: "dominant_opening.wall", Type: "string", Unit: "-", Default: "required in the table", Allowed: `"side", "end"`, Source: "-", Doc: "Wall holding a roller door that may be open in a storm (table optional: omit for no dominant opening)."},
	{Key: "dominant_opening.width_m", Type: "number", Unit: "m", Default: "required in the table", Bounds: &bounds{lo: 0, hi: 40, loOpen: true}, Source: "-", Doc: "Door width; less than the smallest span (end wall) or bay spacing (side wall)."},
	{Key: "dominant_opening.height_m", Type: "number", Unit: "m", Default: "required in the table", Bounds: &bounds{lo: 0, hi: 12, loOpen: true}, Source: "-", Doc: "Door height; less than the smallest eaves height."},

	{Key: "costs.per_kg", Type: "table of family = number", Unit: "currency/kg", Default: "required in the table", Bounds: &bounds{lo: 0, hi: 1000}, Source: "-", Doc: "Steel price by family; every family allowed in members needs a price (table optional: omit to minimise mass)."},
	{Key: "costs.per_fly_brace", Type: "number", Unit: "currency", Default: "0", Bounds: &bounds{lo: 0, hi: 1e6}, Source: "-", Doc: "Price per fly brace fitted."},
	{Key: "costs.per_bridging_row", Type: "number", Unit: "currency", Default: "0", Bounds: &bounds{lo: 0, hi: 1e6}, Source: "-", Doc: "Price per bridging row per bay."},
}

// specFor returns the spec of a key path ("wind.site[2].ms" finds
// "wind.site[].ms"). It panics on a key missing from keySpecs: a programming error.
func specFor(key string) keySpec {
	k := specPath(key)
	for _, s := range keySpecs {
		if s.Key == k {
			return s
		}
	}
	panic("grids: no key spec for " + key)
}

// specPath turns a key path with array indexes ("wind.site[2].ms") into the
// form keySpecs uses ("wind.site[].ms").
func specPath(key string) string {
	var b strings.Builder
	skip := false
	for _, r := range key {
		switch {
		case r == '[':
			skip = true
			b.WriteRune(r)
		case r == ']':
			skip = false
			b.WriteRune(r)
		case !skip:
			b.WriteRune(r)
		}
	}
	return b.String()
}

// KeyReference returns the Markdown reference of every grid-file key: type,
// unit, default, allowed values and the source of the default or limits.
func KeyReference() string {
	var b strings.Builder
	b.WriteString("| Key | Type | Unit | Default | Allowed | Source | Meaning |\n")
	b.WriteString("|---|---|---|---|---|---|---|\n")
	for _, s := range keySpecs {
		fmt.Fprintf(&b, "| `%s` | %s | %s | %s | %s | %s | %s |\n",
			s.Key, s.Type, s.Unit, mdCell(s.Default), mdCell(s.allowed()), s.Source, s.Doc)
	}
	b.WriteString("\nA `{from, to, step}` range lists from, from + step, … up to to, which must fall on a step. " +
		"Integer values are accepted for numbers. Unknown keys are errors.\n")
	return b.String()
}

func mdCell(s string) string { return strings.ReplaceAll(s, "|", `\|`) }

// fmtNum formats a number in its shortest exact decimal form.
func fmtNum(v float64) string { return strconv.FormatFloat(v, 'f', -1, 64) }

package main

import (
	"bytes"
	"encoding/json"
	"math"
	"strings"
	"testing"
)

func runLoadsArgs(args ...string) (code int, stdout, stderr string) {
	var out, errb bytes.Buffer
	code = run(append([]string{"loads"}, args...), &out, &errb)
	return code, out.String(), errb.String()
}

var shedArgs = []string{"--span", "12", "--length", "30", "--height", "4", "--pitch", "5"}

// TestLoadsJSONRegion checks the JSON keys and the worked example of
// checks/wind (TestWorkedExample): region A2, TC 2.5, IL2, 50 years gives
// h = 4.26247 m, M_z,cat 0.87, V_sit,u = 45·0.87 = 39.15 m/s,
// V_sit,s = 37·0.87 = 32.19 m/s, q_u = 0.91963 kPa, q_s = 0.62172 kPa,
// annual probabilities 1/500 (AS/NZS 1170.0:2002 Table F2) and 1/25; roof
// live load on A = 6·12 = 72 m² takes the 0.25 kPa floor (AS/NZS 1170.1).
func TestLoadsJSONRegion(t *testing.T) {
	code, out, errs := runLoadsArgs(append(shedArgs, "--region", "A2", "--terrain", "2.5", "--importance", "2", "--life", "50", "--json")...)
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var got map[string]any
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatalf("JSON: %v\n%s", err, out)
	}
	want := map[string]float64{
		"reference_height_m":     4.26247,
		"mz_cat":                 0.87,
		"v_sit_uls_ms":           39.15,
		"v_sit_sls_ms":           32.19,
		"q_uls_kpa":              0.91963,
		"q_sls_kpa":              0.62172,
		"annual_probability_uls": 1.0 / 500,
		"annual_probability_sls": 1.0 / 25,
		"roof_live_kpa":          0.25,
	}
	for k, w := range want {
		v, ok := got[k].(float64)
		if !ok || math.Abs(v-w) > 1e-5 {
			t.Errorf("%s: got %v, want %g", k, got[k], w)
		}
	}
	for _, k := range []string{"surfaces", "combinations", "wind_cases"} {
		if a, ok := got[k].([]any); !ok || len(a) == 0 {
			t.Errorf("%s: got %v, want a non-empty array", k, got[k])
		}
	}
	// 8 wind cases × (1.2G+Wu, 0.9G+Wu, G+Ws) + 1.35G, 1.2G+1.5Q, G, G+0.7Q.
	if n := len(got["combinations"].([]any)); n != 28 {
		t.Errorf("combinations: got %d, want 28", n)
	}
}

func TestLoadsTextClassWithOpeningAndHoist(t *testing.T) {
	code, out, errs := runLoadsArgs(append(shedArgs, "--wind-class", "n3", "--opening-wall", "end", "--opening-ratio", "3", "--hoist-kn", "10", "--hoist-at", "6")...)
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, w := range []string{caution, "AS 4055-2021 wind class N3", "q_u 1.5000 kPa", "dominant opening windward", "ULS 1.2G+1.5H", "ULS 0.9G+Wu longitudinal", "Roof live"} {
		if !strings.Contains(out, w) {
			t.Errorf("text output lacks %q", w)
		}
	}
}

// TestLoadsBadInput: every bad input exits 2 with a message naming the flag.
func TestLoadsBadInput(t *testing.T) {
	region := []string{"--region", "B2"}
	cases := []struct {
		name string
		args []string
		want string
	}{
		{"unknown region", append(shedArgs, "--region", "E"), "--region E"},
		{"unknown class", append(shedArgs, "--wind-class", "N7"), "--wind-class N7"},
		{"terrain 5", append(append(shedArgs, region...), "--terrain", "5"), "--terrain 5"},
		{"importance 0", append(append(shedArgs, region...), "--importance", "0"), "--importance 0"},
		{"pitch 40", []string{"--span", "12", "--length", "30", "--height", "4", "--pitch", "40", "--region", "B2"}, "--pitch 40"},
		{"span 0", []string{"--span", "0", "--length", "30", "--height", "4", "--region", "B2"}, "--span 0"},
		{"negative height", []string{"--span", "12", "--length", "30", "--height", "-3", "--region", "B2"}, "--height -3"},
		{"both class and region", append(append(shedArgs, region...), "--wind-class", "N2"), "give one, not both"},
		{"neither", shedArgs, "give --wind-class"},
		{"class with terrain", append(shedArgs, "--wind-class", "N2", "--terrain", "3"), "--terrain"},
		{"opening wall", append(append(shedArgs, region...), "--opening-wall", "roof", "--opening-ratio", "2"), "--opening-wall roof"},
		{"IL4 100 years", append(append(shedArgs, region...), "--importance", "4", "--life", "100"), "risk analysis"},
		{"stray argument", append(append(shedArgs, region...), "extra"), "unexpected argument"},
	}
	for _, c := range cases {
		code, _, errs := runLoadsArgs(c.args...)
		if code != exitUsage || !strings.Contains(errs, c.want) {
			t.Errorf("%s: got exit %d, %q; want exit 2 naming %q", c.name, code, errs, c.want)
		}
	}
}

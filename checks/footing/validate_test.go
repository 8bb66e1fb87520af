package footing

import (
	"errors"
	"math"
	"strings"
	"testing"
)

func TestBadInput(t *testing.T) {
	good := base("B1", []Reaction{{Combination: "u", VerticalKN: -10}}, []Reaction{{Combination: "s", VerticalKN: 10}})
	tests := []struct {
		name  string
		b     Base
		opt   *Options
		wants []string // each must appear in the message
	}{
		{"NaN vertical", base("B1", []Reaction{{Combination: "u", VerticalKN: math.NaN()}}, good.SLS), nil,
			[]string{"ULS[0].VerticalKN = NaN", "finite"}},
		{"Inf moment and unnamed", base("B1", good.ULS, []Reaction{{MomentKNm: math.Inf(1)}}), nil,
			[]string{"SLS[0].MomentKNm = +Inf", "SLS[0].Combination"}},
		{"no SLS", base("B1", good.ULS, nil), nil, []string{"SLS = none"}},
		{"negative width", good, &Options{MinWidthM: -0.45}, []string{"Options.MinWidthM = -0.45", "> 0 m"}},
		{"every bad field at once", good, &Options{WidthStepM: math.NaN(), AllowableBearingKPa: -1},
			[]string{"Options.WidthStepM = NaN", "Options.AllowableBearingKPa = -1"}},
		{"max below min", good, &Options{MinWidthM: 1, MaxWidthM: 0.5}, []string{"Options.MaxWidthM = 0.5", "≥ MinWidthM"}},
		{"friction too high", good, &Options{FrictionCoefficient: 3}, []string{"Options.FrictionCoefficient = 3"}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			_, err := SizePad(tc.b, tc.opt)
			if !errors.Is(err, ErrInvalid) {
				t.Fatalf("err = %v, want ErrInvalid", err)
			}
			for _, w := range tc.wants {
				if !strings.Contains(err.Error(), w) {
					t.Errorf("err = %q, want it to contain %q", err, w)
				}
			}
		})
	}
	if _, err := SizeBolts(good, &BoltOptions{LeverArmMM: math.NaN()}); !errors.Is(err, ErrInvalid) {
		t.Errorf("bolts NaN lever arm: err = %v, want ErrInvalid", err)
	}
}

// TestStepsNoDrift: 0.45 + 51·0.05 = 3.0 exactly on the grid (52 widths).
func TestStepsNoDrift(t *testing.T) {
	w := steps(0.45, 3.0, 0.05)
	if len(w) != 52 || w[len(w)-1] != 3.0 || w[1] != 0.5 {
		t.Errorf("steps = %d values ending %g, want 52 ending 3", len(w), w[len(w)-1])
	}
}

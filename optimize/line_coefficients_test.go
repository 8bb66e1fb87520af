package optimize

import (
	"math"
	"testing"

	"github.com/spansweep/spansweep/grids"
)

// Continuous-beam coefficients under uniform load on equal spans,
// REFERENCE-VALUES §7.6 (derived; 3-span M = wL²/10 and δ = wL⁴/145EI
// confirmed: AISC beam formulas, S12), and the simple span of §7.7.
func TestLineCoefficientsAgainstBeamTables(t *testing.T) {
	tests := []struct {
		name     string
		spanType string
		bays     int
		want     lineCoefficients
		tol      float64
	}{
		{"simple span", grids.SpanSimple, 4, lineCoefficients{Sag: 0.125, Shear: 0.5, EndReaction: 0.5, Deflection: 5.0 / 384}, 1e-12},
		// 2-span: support −wL²/8, span +9wL²/128, reactions 0.375/1.25 wL, shear 0.625 wL, δ 0.00542 wL⁴/EI.
		{"two-span piece", grids.SpanContinuous, 4, lineCoefficients{Sag: 9.0 / 128, Hog: 0.125, Shear: 0.625,
			EndReaction: 0.375, InteriorReaction: 1.25, Deflection: 0.005416}, 2e-3},
		// An odd bay count leaves one single-span piece per line, so the
		// two-span piece's coefficients are enveloped with the simple span's.
		{"two-span pieces, odd bays", grids.SpanContinuous, 3, lineCoefficients{Sag: 0.125, Hog: 0.125, Shear: 0.625,
			EndReaction: 0.5, InteriorReaction: 1.25, Deflection: 5.0 / 384}, 2e-3},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, err := coefficientsFor(tt.spanType, tt.bays)
			if err != nil {
				t.Fatal(err)
			}
			check := func(field string, g, w float64) {
				if math.Abs(g-w) > tt.tol*math.Max(1, math.Abs(w)) {
					t.Errorf("%s: got %.6g, want %.6g", field, g, w)
				}
			}
			check("sag", got.Sag, tt.want.Sag)
			check("hog", got.Hog, tt.want.Hog)
			check("shear", got.Shear, tt.want.Shear)
			check("end reaction", got.EndReaction, tt.want.EndReaction)
			check("interior reaction", got.InteriorReaction, tt.want.InteriorReaction)
			check("deflection", got.Deflection, tt.want.Deflection)
		})
	}
}

// A lapped line is stiffer over the supports than a plain continuous one:
// its span moment is below the simple span's and the support moment on one
// section is shared, so both stay below the plain 3-span values of
// REFERENCE-VALUES §7.6 (0.080 and 0.100 wL²) plus the lap's attraction.
func TestLappedLineSharesSupportMoment(t *testing.T) {
	c, err := coefficientsFor(grids.SpanLapped, 3)
	if err != nil {
		t.Fatal(err)
	}
	if !(c.Sag < 0.080) {
		t.Errorf("lapped 3-span sag coefficient %.4g: want below the plain 3-span 0.080 (laps attract moment to the supports)", c.Sag)
	}
	if !(c.Hog < 0.100) {
		t.Errorf("lapped 3-span hog on one section %.4g: want below the plain 3-span 0.100", c.Hog)
	}
	if !(c.Deflection < 0.0069) {
		t.Errorf("lapped 3-span deflection %.4g: want below the plain 3-span 0.0069", c.Deflection)
	}
	if !(c.InteriorReaction > 1.0 && c.EndReaction < 0.5) {
		t.Errorf("reactions end %.4g interior %.4g: want end < 0.5 and interior > 1.0 (continuity)", c.EndReaction, c.InteriorReaction)
	}
}

package plots

import (
	"errors"
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/stat"
)

var fitSpansM = []float64{6, 7.5, 9, 10.5, 12, 15, 18, 21, 24, 30}

// TestFitPowerRecoversExact fits noise-free data generated from known
// parameters: the expected A and B are the generating ones.
func TestFitPowerRecoversExact(t *testing.T) {
	for _, tc := range []struct {
		name string
		a, b float64
	}{
		{"total mass, steep", 12.5, 1.6},
		{"per floor area, shallow", 7.2, 0.35},
		{"square law", 0.8, 2.1},
		{"falling", 250, -0.4},
	} {
		t.Run(tc.name, func(t *testing.T) {
			ys := make([]float64, len(fitSpansM))
			for i, x := range fitSpansM {
				ys[i] = tc.a * math.Pow(x, tc.b)
			}
			f, err := FitPower(fitSpansM, ys)
			if err != nil {
				t.Fatal(err)
			}
			const tol = 1e-6 // relative
			if math.Abs(f.A-tc.a)/tc.a > tol || math.Abs(f.B-tc.b)/math.Abs(tc.b) > tol {
				t.Errorf("got A = %.9g, B = %.9g; want %g, %g within %g relative", f.A, f.B, tc.a, tc.b, tol)
			}
			if f.R2 < 1-1e-9 || f.N != len(ys) {
				t.Errorf("got R² = %.12g, N = %d; want 1, %d", f.R2, f.N, len(ys))
			}
		})
	}
}

// TestFitPowerWithNoise fits data with 3 % multiplicative Gaussian noise
// (fixed seed): the parameters land near the generating ones, and the
// least-squares fit is no worse than its log-log starting point.
func TestFitPowerWithNoise(t *testing.T) {
	const a, b = 18.0, 1.45
	rng := rand.New(rand.NewPCG(3, 5))
	var xs, ys []float64
	for range 4 { // four buildings per span
		for _, x := range fitSpansM {
			xs = append(xs, x)
			ys = append(ys, a*math.Pow(x, b)*(1+0.03*rng.NormFloat64()))
		}
	}
	f, err := FitPower(xs, ys)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(f.A-a)/a > 0.15 || math.Abs(f.B-b) > 0.05 {
		t.Errorf("got A = %.4g, B = %.4g; want near %g, %g (15 %%, ±0.05)", f.A, f.B, a, b)
	}
	if f.R2 < 0.97 {
		t.Errorf("got R² = %.4f, want > 0.97 for 3 %% noise", f.R2)
	}
	lx, ly := make([]float64, len(xs)), make([]float64, len(xs))
	for i := range xs {
		lx[i], ly[i] = math.Log(xs[i]), math.Log(ys[i])
	}
	la, lb := stat.LinearRegression(lx, ly, nil, false)
	start := PowerFit{A: math.Exp(la), B: lb}
	if got, want := sse(f, xs, ys), sse(start, xs, ys); got > want*(1+1e-12) {
		t.Errorf("fit SSE %.6g exceeds the log-log start's %.6g", got, want)
	}
}

func sse(f PowerFit, xs, ys []float64) float64 {
	var s float64
	for i := range xs {
		r := f.At(xs[i]) - ys[i]
		s += r * r
	}
	return s
}

func TestFitPowerRejectsBadData(t *testing.T) {
	for _, tc := range []struct {
		name   string
		xs, ys []float64
	}{
		{"lengths differ", []float64{6, 9}, []float64{1}},
		{"zero span", []float64{0, 9}, []float64{1, 2}},
		{"negative value", []float64{6, 9}, []float64{1, -2}},
		{"NaN value", []float64{6, 9}, []float64{1, math.NaN()}},
		{"one span", []float64{6, 6, 6}, []float64{1, 2, 3}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if _, err := FitPower(tc.xs, tc.ys); !errors.Is(err, ErrFitData) {
				t.Errorf("got %v, want ErrFitData", err)
			}
		})
	}
}

// TestFitPowerIsStationary checks BFGS converged, not just the start: with
// additive noise the least-squares optimum differs from the log-log line,
// and at the returned fit the gradient of the squared residuals over
// (ln A, B), by central differences, vanishes relative to its size at the
// start.
func TestFitPowerIsStationary(t *testing.T) {
	rng := rand.New(rand.NewPCG(9, 4))
	var xs, ys []float64
	for _, x := range fitSpansM {
		xs = append(xs, x)
		ys = append(ys, 20*math.Pow(x, 1.5)+40*rng.NormFloat64()+60)
	}
	f, err := FitPower(xs, ys)
	if err != nil {
		t.Fatal(err)
	}
	gradNorm := func(p PowerFit) float64 {
		const h = 1e-6
		at := func(dla, db float64) float64 {
			return sse(PowerFit{A: p.A * math.Exp(dla), B: p.B + db}, xs, ys)
		}
		ga := (at(h, 0) - at(-h, 0)) / (2 * h)
		gb := (at(0, h) - at(0, -h)) / (2 * h)
		return math.Hypot(ga, gb)
	}
	lx, ly := make([]float64, len(xs)), make([]float64, len(xs))
	for i := range xs {
		lx[i], ly[i] = math.Log(xs[i]), math.Log(ys[i])
	}
	la, lb := stat.LinearRegression(lx, ly, nil, false)
	start := PowerFit{A: math.Exp(la), B: lb}
	if g0, g := gradNorm(start), gradNorm(f); g > 1e-6*g0 {
		t.Errorf("gradient at the fit %.3g, at the start %.3g: want a reduction below 1e-6", g, g0)
	}
	if sse(f, xs, ys) >= sse(start, xs, ys) {
		t.Errorf("fit did not improve on the log-log start")
	}
}

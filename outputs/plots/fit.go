package plots

import (
	"errors"
	"fmt"
	"math"

	"gonum.org/v1/gonum/optimize"
	"gonum.org/v1/gonum/stat"
)

// PowerFit is a least-squares trend value = A·span^B.
type PowerFit struct {
	A    float64 // value at a span of 1 m, in the value's unit per m^B
	B    float64 // exponent, dimensionless
	R2   float64 // coefficient of determination, in the value's own scale
	RMS  float64 // root-mean-square residual, in the value's unit
	N    int     // points fitted
	Iter int     // BFGS major iterations taken
}

// At returns the trend's value at a span.
func (f PowerFit) At(spanM float64) float64 { return f.A * math.Pow(spanM, f.B) }

// ErrFitData reports data a power trend cannot be fitted to.
var ErrFitData = errors.New("plots: power fit")

// FitPower fits value = A·span^B by least squares on the values
// themselves (not their logarithms), so heavy buildings weigh as much as
// they do in a bill of materials. It starts from the straight-line fit of
// ln value on ln span, then minimises the sum of squared residuals over
// (ln A, B) with gonum/optimize's BFGS and an exact gradient.
//
// Spans and values must be positive and finite, with at least two distinct
// spans.
func FitPower(spanM, value []float64) (PowerFit, error) {
	if err := checkFitData(spanM, value); err != nil {
		return PowerFit{}, err
	}
	lx, ly := make([]float64, len(spanM)), make([]float64, len(spanM))
	var scale float64
	for i := range spanM {
		lx[i], ly[i] = math.Log(spanM[i]), math.Log(value[i])
		scale += value[i] * value[i]
	}
	lnA, b := stat.LinearRegression(lx, ly, nil, false)
	x0 := []float64{lnA, b}

	// Objective: SSE / Σ value², so its size does not depend on the unit.
	sse := func(p []float64) float64 {
		var s float64
		for i := range lx {
			r := math.Exp(p[0]+p[1]*lx[i]) - value[i]
			s += r * r
		}
		return s / scale
	}
	grad := func(g, p []float64) {
		g[0], g[1] = 0, 0
		for i := range lx {
			y := math.Exp(p[0] + p[1]*lx[i])
			r := y - value[i]
			g[0] += 2 * r * y / scale
			g[1] += 2 * r * y * lx[i] / scale
		}
	}
	best := x0
	res, err := optimize.Minimize(optimize.Problem{Func: sse, Grad: grad}, x0,
		&optimize.Settings{GradientThreshold: 1e-14}, &optimize.BFGS{})
	iter := 0
	if res != nil {
		iter = res.MajorIterations
		if sse(res.X) <= sse(x0) {
			best = res.X
		}
	}
	if err != nil && !isStall(err) {
		return PowerFit{}, fmt.Errorf("%w: minimising the squared residuals: %v", ErrFitData, err)
	}
	return summarise(best, spanM, value, iter), nil
}

// isStall reports a line search that can make no more progress: at the
// optimum to machine precision, not a failure.
func isStall(err error) bool {
	return errors.Is(err, optimize.ErrLinesearcherFailure) || errors.Is(err, optimize.ErrNoProgress) ||
		errors.Is(err, optimize.ErrNonDescentDirection)
}

func summarise(p, spanM, value []float64, iter int) PowerFit {
	f := PowerFit{A: math.Exp(p[0]), B: p[1], N: len(spanM), Iter: iter}
	mean := stat.Mean(value, nil)
	var res, tot float64
	for i := range spanM {
		r := f.At(spanM[i]) - value[i]
		res += r * r
		tot += (value[i] - mean) * (value[i] - mean)
	}
	f.RMS = math.Sqrt(res / float64(len(spanM)))
	f.R2 = 1
	if tot > 0 {
		f.R2 = 1 - res/tot
	}
	return f
}

func checkFitData(spanM, value []float64) error {
	if len(spanM) != len(value) {
		return fmt.Errorf("%w: %d spans but %d values; want one value per span", ErrFitData, len(spanM), len(value))
	}
	distinct := map[float64]bool{}
	for i := range spanM {
		if !(spanM[i] > 0) || math.IsInf(spanM[i], 0) {
			return fmt.Errorf("%w: span[%d] = %v; want a positive finite span in m", ErrFitData, i, spanM[i])
		}
		if !(value[i] > 0) || math.IsInf(value[i], 0) {
			return fmt.Errorf("%w: value[%d] = %v; want a positive finite value", ErrFitData, i, value[i])
		}
		distinct[spanM[i]] = true
	}
	if len(distinct) < 2 {
		return fmt.Errorf("%w: %d distinct spans; want at least 2", ErrFitData, len(distinct))
	}
	return nil
}

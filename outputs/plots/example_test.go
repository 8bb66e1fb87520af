package plots_test

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/outputs/plots"
)

// Fit a power trend to masses that follow 15·span^1.5 exactly.
func ExampleFitPower() {
	spans := []float64{6, 9, 12, 15, 18}
	mass := make([]float64, len(spans))
	for i, s := range spans {
		mass[i] = 15 * math.Pow(s, 1.5)
	}
	f, err := plots.FitPower(spans, mass)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("a = %.4g kg/m^b, b = %.4g, R² = %.4g, mass at 20 m = %.4g kg\n", f.A, f.B, f.R2, f.At(20))
	// Output: a = 15 kg/m^b, b = 1.5, R² = 1, mass at 20 m = 1342 kg
}

package wind

import (
	"fmt"
	"math"
)

// mzHeightsM and mzRows are AS/NZS 1170.2:2021 Table 4.1, terrain/height
// multiplier M_z,cat for all regions, z from 3 m to 30 m; z ≤ 3 m takes the
// 3 m value. Confirmed against independent transcriptions (REFERENCE-VALUES
// §1.4: S1, S2, S3).
var mzHeightsM = []float64{3, 5, 10, 15, 20, 30}

var mzRows = map[float64][]float64{
	1:   {0.97, 1.01, 1.08, 1.12, 1.14, 1.18},
	2:   {0.91, 0.91, 1.00, 1.05, 1.08, 1.12},
	2.5: {0.87, 0.87, 0.92, 0.97, 1.01, 1.06},
	3:   {0.83, 0.83, 0.83, 0.89, 0.94, 1.00},
	4:   {0.75, 0.75, 0.75, 0.75, 0.75, 0.80},
}

// MaxReferenceHeightM is the largest height the M_z,cat table here covers.
const MaxReferenceHeightM = 30

// TerrainHeightMultiplier returns M_z,cat of AS/NZS 1170.2:2021 Table 4.1 for
// terrain category 1, 2, 2.5, 3 or 4 at height z (m), interpolated linearly
// between tabulated heights (cl. 4.2.2).
func TerrainHeightMultiplier(terrainCategory, zM float64) (float64, error) {
	row, ok := mzRows[terrainCategory]
	if !ok {
		return 0, fmt.Errorf("terrain category %g: allowed 1, 2, 2.5, 3, 4 (AS/NZS 1170.2:2021 cl. 4.2.1)", terrainCategory)
	}
	if !(zM > 0) || zM > MaxReferenceHeightM || math.IsNaN(zM) {
		return 0, fmt.Errorf("height %g m: allowed 0 < z ≤ %d m for M_z,cat", zM, MaxReferenceHeightM)
	}
	return interp(mzHeightsM, row, zM), nil
}

// interp interpolates ys over ascending xs at x, holding the end values
// outside the range.
func interp(xs, ys []float64, x float64) float64 {
	if x <= xs[0] {
		return ys[0]
	}
	for i := 1; i < len(xs); i++ {
		if x <= xs[i] {
			t := (x - xs[i-1]) / (xs[i] - xs[i-1])
			return (1-t)*ys[i-1] + t*ys[i]
		}
	}
	return ys[len(ys)-1]
}

package wind

import "math"

// External pressure coefficients C_p,e for enclosed rectangular buildings,
// AS/NZS 1170.2:2021 Section 5.4 (values confirmed against independent
// transcriptions, REFERENCE-VALUES §1.6). Interpolation is linear, also
// across a change of sign (common practice, S5), and end values are held
// outside a table's range.

// windwardWallCpe is Table 5.2(A) for h < 25 m with the speed taken at z = h.
const windwardWallCpe = 0.7

// leewardWallCpe is Table 5.2(B). For wind normal to the ridge it depends on
// the pitch and on d/b; for wind parallel to a gable ridge the α < 10° row
// applies at any pitch (pass pitch 0).
func leewardWallCpe(pitchDeg, dOverB float64) float64 {
	low := interp([]float64{0.1, 0.3, 1, 2, 4}, []float64{-0.5, -0.5, -0.5, -0.3, -0.2}, dOverB)
	if pitchDeg < 10 {
		return low
	}
	steep := interp([]float64{0.1, 0.3, 1, 2, 4}, []float64{-0.75, -0.5, -0.5, -0.5, -0.5}, dOverB)
	return interp([]float64{10, 15, 20, 25}, []float64{-0.3, -0.3, -0.4, steep}, pitchDeg)
}

// band is a strip of a surface at distances [from, to) from the windward
// edge, in multiples of h, with its (min, max) coefficients.
type band struct {
	fromH, toH float64
	lo, hi     float64
}

// sideWallBands is Table 5.2(C): by distance from the windward edge.
var sideWallBands = []band{
	{0, 1, -0.65, -0.65}, {1, 2, -0.5, -0.5}, {2, 3, -0.3, -0.3}, {3, math.Inf(1), -0.2, -0.2},
}

// Table 5.3(A) rows, roofs α < 10° and gable roofs with wind parallel to the
// ridge: the h/d ≤ 0.5 row, and the h/d ≥ 1.0 row whose "beyond 0.5h" value is
// repeated in every band beyond 0.5h so that the rows interpolate band by band.
var (
	roofABandEdgesH = []float64{0, 0.5, 1, 2, 3, math.Inf(1)}
	roofALowLo      = []float64{-0.9, -0.9, -0.5, -0.3, -0.2}
	roofALowHi      = []float64{-0.4, -0.4, 0.0, 0.1, 0.2}
	roofAHighLo     = []float64{-1.3, -0.7, -0.7, -0.7, -0.7}
	roofAHighHi     = []float64{-0.6, -0.3, -0.3, -0.3, -0.3}
)

// roofABands returns Table 5.3(A) interpolated linearly in h/d between 0.5
// and 1.0.
func roofABands(hOverD float64) []band {
	t := math.Min(math.Max((hOverD-0.5)/0.5, 0), 1)
	out := make([]band, len(roofALowLo))
	for i := range out {
		out[i] = band{
			fromH: roofABandEdgesH[i], toH: roofABandEdgesH[i+1],
			lo: (1-t)*roofALowLo[i] + t*roofAHighLo[i],
			hi: (1-t)*roofALowHi[i] + t*roofAHighHi[i],
		}
	}
	return out
}

// Table 5.3(B), upwind slope, α ≥ 10°, wind normal to the ridge; rows by
// pitch, columns h/d = 0.25, 0.5, 1.0.
var (
	roofBPitches = []float64{10, 15, 20, 25, 30, 35}
	roofBHOverD  = []float64{0.25, 0.5, 1.0}
	roofBLo      = [][]float64{
		{-0.7, -0.9, -1.3}, {-0.5, -0.7, -1.0}, {-0.3, -0.4, -0.7},
		{-0.2, -0.3, -0.5}, {-0.2, -0.2, -0.3}, {0.0, -0.2, -0.2},
	}
	roofBHi = [][]float64{
		{-0.3, -0.4, -0.6}, {0.0, -0.3, -0.5}, {0.2, 0.0, -0.3},
		{0.3, 0.2, 0.0}, {0.4, 0.3, 0.2}, {0.5, 0.4, 0.3},
	}
)

// upwindSlopeCpe returns Table 5.3(B) (min, max) interpolated in pitch and h/d.
func upwindSlopeCpe(pitchDeg, hOverD float64) (lo, hi float64) {
	return bilinear(roofBPitches, roofBHOverD, roofBLo, pitchDeg, hOverD),
		bilinear(roofBPitches, roofBHOverD, roofBHi, pitchDeg, hOverD)
}

// downwindSlopeCpe returns Table 5.3(C): rows 10°, 15°, 20° by h/d, and for
// α ≥ 25° a value by b/d; between 20° and 25° interpolated in pitch.
func downwindSlopeCpe(pitchDeg, hOverD, bOverD float64) float64 {
	rows := [][]float64{{-0.3, -0.5, -0.7}, {-0.5, -0.5, -0.6}, {-0.6, -0.6, -0.6}}
	at20 := bilinear([]float64{10, 15, 20}, roofBHOverD, rows, min(pitchDeg, 20), hOverD)
	if pitchDeg <= 20 {
		return at20
	}
	var at25 float64
	switch {
	case bOverD <= 3:
		at25 = -0.6
	case bOverD < 8:
		at25 = -0.06 * (7 + bOverD)
	default:
		at25 = -0.9
	}
	return interp([]float64{20, 25}, []float64{at20, at25}, pitchDeg)
}

// bilinear interpolates table[i][j] over rows xs and columns ys.
func bilinear(xs, ys []float64, table [][]float64, x, y float64) float64 {
	col := make([]float64, len(xs))
	for i := range xs {
		col[i] = interp(ys, table[i], y)
	}
	return interp(xs, col, x)
}

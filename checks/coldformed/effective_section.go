package coldformed

// EffectiveArea is A_e (mm²) of a C, Z or 2C in uniform compression at
// stress fStar (MPa), AS/NZS 4600:2018 cl. 2.2.1.2 (web), 2.4.2 (lipped
// flanges) and 2.3.1 (unlipped flanges); the gross area for straps and rods.
func (c *Capacities) EffectiveArea(fStar float64) float64 {
	if !isFlexural(c.Section.Shape) {
		return c.Section.AreaMM2
	}
	return c.effectiveArea(fStar)
}

// EffectiveModulus is Z_c (mm³), the major-axis effective section modulus
// with the extreme compression fibre at fc (MPa), top or bottom flange in
// compression (AS/NZS 4600:2018 cl. 3.3.3.2, with the neutral axis iterated
// per cl. 2.2.3). Z_e at first yield is ZeTop or ZeBot. Zero for straps and
// rods.
func (c *Capacities) EffectiveModulus(fc float64, topInCompression bool) float64 {
	if !isFlexural(c.Section.Shape) {
		return 0
	}
	return c.effectiveModulusAt(fc, topInCompression)
}

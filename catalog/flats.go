package catalog

// FlatWidths are the flat widths of a roll-formed profile's plate elements
// between the bends, mm: the w of AS/NZS 4600:2018 cl. 1.6 used for
// effective widths (Section 2). For a 2C they are each channel's. Zero for
// an element the section does not have (no lip, strap, rod).
type FlatWidths struct {
	WebMM     float64
	FlangeMM  float64 // top flange (a C's flanges)
	Flange2MM float64 // bottom flange (a Z's second flange; equals FlangeMM otherwise)
	LipMM     float64
}

// FlatWidths returns the section's flat widths.
func (s Section) FlatWidths() FlatWidths {
	if !s.Shape.thinWalled() {
		return FlatWidths{}
	}
	var f FlatWidths
	for _, l := range profileLegs(s.Shape, s.Geometry) {
		w := l.flatMM(s.InnerRadiusMM, s.ThicknessMM)
		switch l.column {
		case "depth_mm":
			f.WebMM = w
		case "flange_mm":
			f.FlangeMM, f.Flange2MM = w, w
		case "flange2_mm":
			f.Flange2MM = w
		case "lip_mm":
			f.LipMM = w
		}
	}
	return f
}

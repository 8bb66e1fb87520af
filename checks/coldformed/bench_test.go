package coldformed

import "testing"

func BenchmarkSectionCapacities(b *testing.B) {
	s := sharpC(200, 75, 18, 1.9, 5, 450, 480)
	for b.Loop() {
		if _, err := SectionCapacities(s); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkPurlinChecks is one purlin's full check set for one combination
// with its capacities already computed.
func BenchmarkPurlinChecks(b *testing.B) {
	c := mustCaps(b, sharpC(200, 75, 18, 1.9, 5, 450, 480))
	br := Bearing{Length: 50, Fastened: true}
	p := Purlin{Span: 7000, SpanType: SpanLapped, BridgingRows: 1, EndBearing: br, InteriorBearing: br}
	a := PurlinActions{FastenedFlangeMoment: 5e6, FreeFlangeMoment: 6e6, Outward: true, Shear: 8000,
		MomentAtShear: 5e6, EndReaction: 7000, InteriorReaction: 15000}
	for b.Loop() {
		if _, err := CheckPurlin(c, p, a); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkColumnCombined is a column's combined compression and bending
// check set for one combination.
func BenchmarkColumnCombined(b *testing.B) {
	c := mustCaps(b, sharpC(250, 75, 18, 2.4, 5, 450, 480))
	m := BeamColumn{Compression: EffectiveLengths{Lex: 7000, Ley: 2000, Lez: 2000}, Bending: Segment{Length: 2000, Cb: 1.3}}
	a := BeamColumnActions{N: 40000, Mx: 8e6, My: 2e5, Cmx: 0.85, V: 6000, MomentAtShear: 8e6}
	for b.Loop() {
		if _, err := CheckBeamColumn(c, m, a); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkColumnCombinedInto is BenchmarkColumnCombined reusing one check
// buffer, as the frame search does: no allocation per check set.
func BenchmarkColumnCombinedInto(b *testing.B) {
	c := mustCaps(b, sharpC(250, 75, 18, 2.4, 5, 450, 480))
	m := BeamColumn{Compression: EffectiveLengths{Lex: 7000, Ley: 2000, Lez: 2000}, Bending: Segment{Length: 2000, Cb: 1.3}}
	a := BeamColumnActions{N: 40000, Mx: 8e6, My: 2e5, Cmx: 0.85, V: 6000, MomentAtShear: 8e6}
	var buf []Check
	b.ReportAllocs()
	for b.Loop() {
		r, err := CheckBeamColumnInto(buf, c, m, a)
		if err != nil {
			b.Fatal(err)
		}
		buf = r.Checks
	}
}

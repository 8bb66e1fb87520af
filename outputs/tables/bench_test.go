package tables

import (
	"io"
	"testing"
)

// BenchmarkSweep3000 accumulates and writes 3,000 cases (the default
// grid's order of size): sampleDesigns repeated over 188 spans.
func BenchmarkSweep3000(b *testing.B) {
	base := sampleDesigns()
	var ds []design
	for k := range 188 {
		for _, d := range base {
			d.index += 16 * k
			d.spanM += float64(k) * 0.5
			ds = append(ds, d)
		}
	}
	for b.Loop() {
		a := NewAccumulator(Options{Envelope: true, KgPerM: lookup})
		for _, d := range ds {
			if err := a.Add(d.result()); err != nil {
				b.Fatal(err)
			}
		}
		s := a.Set()
		if err := s.WriteCSV(io.Discard); err != nil {
			b.Fatal(err)
		}
		if err := s.WriteHTML(io.Discard, Assumptions{}, A4); err != nil {
			b.Fatal(err)
		}
	}
}

package catalog

import (
	"bytes"
	"errors"
	"math"
	"reflect"
	"testing"
	"time"
)

// FuzzLoad checks that Load never panics on arbitrary bytes, that a failure
// is a *ValidationError with problems or ErrEmpty, and that every section of
// a catalogue it accepts has positive area, mass and second moments and
// finite dimensions and properties. Seeds: the embedded catalogue, the rows
// of load_test.go and testdata/fuzz/FuzzLoad.
func FuzzLoad(f *testing.F) {
	f.Add(DefaultCSV())
	f.Add([]byte(header + goodRows))
	f.Add([]byte("\ufeff" + header + "C150x64x1.5,C,150,64,,15,1.5,3.75,450,480\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		start := time.Now()
		cat, err := Load(bytes.NewReader(data), "fuzz.csv")
		if d := time.Since(start); d > 2*time.Second {
			t.Fatalf("Load took %v on %q", d, data)
		}
		if err != nil {
			var ve *ValidationError
			if errors.Is(err, ErrEmpty) || (errors.As(err, &ve) && len(ve.Problems) > 0) {
				return
			}
			t.Fatalf("got error %v (%T), want a *ValidationError with problems or ErrEmpty", err, err)
		}
		if cat == nil || len(cat.Sections) == 0 || len(cat.HashSHA256) != 64 {
			t.Fatalf("got catalogue %+v with no error, want sections and a 64-digit hash", cat)
		}
		for _, s := range cat.Sections {
			checkSectionSane(t, s)
		}
	})
}

// checkSectionSane fails t unless s has finite geometry, steel and
// properties, positive area, mass and second moments, and I1 ≥ I2.
func checkSectionSane(t *testing.T, s Section) {
	t.Helper()
	for _, v := range []reflect.Value{reflect.ValueOf(s.Geometry), reflect.ValueOf(s.Properties)} {
		for i := range v.NumField() {
			if x := v.Field(i).Float(); math.IsNaN(x) || math.IsInf(x, 0) {
				t.Errorf("section %q: %s = %g, want a finite value", s.Designation, v.Type().Field(i).Name, x)
			}
		}
	}
	p := s.Properties
	for _, q := range []struct {
		name string
		v    float64
	}{{"AreaMM2", p.AreaMM2}, {"MassKgPerM", p.MassKgPerM}, {"IxMM4", p.IxMM4}, {"IyMM4", p.IyMM4},
		{"FyMPa", s.FyMPa}, {"FuMPa", s.FuMPa}} {
		if !(q.v > 0) {
			t.Errorf("section %q: %s = %g, want > 0", s.Designation, q.name, q.v)
		}
	}
	if p.I1MM4 < p.I2MM4*(1-1e-9) {
		t.Errorf("section %q: I1 = %g < I2 = %g, want the major principal value first", s.Designation, p.I1MM4, p.I2MM4)
	}
}

package coldformed

import (
	"errors"
	"reflect"
	"strings"
	"testing"
)

// TestCheckBeamColumnIntoSameChecks: the buffer-reusing variant returns
// exactly CheckBeamColumn's checks (the frame search relies on it for
// identical results), in compression, tension and with shear, reuses its
// buffer without allocating once warm, and reports bad input the same way.
func TestCheckBeamColumnIntoSameChecks(t *testing.T) {
	c := mustCaps(t, sharpC(250, 75, 18, 2.4, 5, 450, 480))
	m := BeamColumn{Compression: EffectiveLengths{Lex: 7000, Ley: 2000, Lez: 2000}, Bending: Segment{Length: 2000, Cb: 1.3}}
	actions := map[string]BeamColumnActions{
		"compression, small":  {N: 5000, Mx: 8e6},
		"compression, large":  {N: 90000, Mx: -6e6, My: 2e5, Cmx: 0.85},
		"tension with shear":  {N: -50000, Mx: 5e6, V: 6000, MomentAtShear: 5e6},
		"bending and shear":   {Mx: 9e6, V: 12000, MomentAtShear: 9e6},
		"compression, shear":  {N: 40000, Mx: 8e6, My: 2e5, Cmx: 0.85, V: 6000, MomentAtShear: 8e6},
		"axial only, no bend": {N: 30000},
	}
	var buf []Check
	for name, a := range actions {
		want, err := CheckBeamColumn(c, m, a)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		got, err := CheckBeamColumnInto(buf, c, m, a)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		if !reflect.DeepEqual(got, want) {
			t.Errorf("%s: CheckBeamColumnInto differs from CheckBeamColumn:\n got %v\nwant %v", name, got.Checks, want.Checks)
		}
		buf = got.Checks
	}
	a := actions["compression, shear"]
	if n := testing.AllocsPerRun(20, func() {
		r, _ := CheckBeamColumnInto(buf, c, m, a)
		buf = r.Checks
	}); n != 0 {
		t.Errorf("CheckBeamColumnInto with a warm buffer: %.0f allocations per call, want 0", n)
	}
	bad := m
	bad.Bending.Length = 0
	_, err := CheckBeamColumnInto(buf, c, bad, a)
	if !errors.Is(err, ErrInput) || !strings.Contains(err.Error(), "BeamColumn.Bending.Length = 0") {
		t.Errorf("Bending.Length = 0: got error %v, want ErrInput naming BeamColumn.Bending.Length", err)
	}
}

// TestCheckPurlinIntoSameChecks: the buffer-reusing purlin check returns
// exactly CheckPurlin's checks (the purlin and girt searches rely on it for
// identical results) under inward and outward actions with web bearing,
// and allocates nothing once its buffer is warm.
func TestCheckPurlinIntoSameChecks(t *testing.T) {
	c := mustCaps(t, sharpC(200, 75, 18, 1.9, 5, 450, 480))
	b := Bearing{Length: 50, Fastened: true}
	actions := map[string]struct {
		p Purlin
		a PurlinActions
	}{
		"inward, simple":    {Purlin{Span: 6000, SpanType: SpanSimple}, PurlinActions{FastenedFlangeMoment: 4e6, Shear: 3000}},
		"outward, lapped":   {Purlin{Span: 7000, SpanType: SpanLapped, BridgingRows: 1, EndBearing: b, InteriorBearing: b}, PurlinActions{FastenedFlangeMoment: 5e6, FreeFlangeMoment: 6e6, Outward: true, Shear: 8000, MomentAtShear: 5e6, EndReaction: 7000, InteriorReaction: 15000}},
		"outward, no shear": {Purlin{Span: 5000, SpanType: SpanContinuous, BridgingRows: 2}, PurlinActions{FreeFlangeMoment: 3e6, Outward: true, FreeFlangeCb: 1.1}},
	}
	var buf []Check
	for name, x := range actions {
		want, err := CheckPurlin(c, x.p, x.a)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		got, err := CheckPurlinInto(buf, c, x.p, x.a)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		if !reflect.DeepEqual(got, want) {
			t.Errorf("%s: CheckPurlinInto differs from CheckPurlin:\n got %v\nwant %v", name, got.Checks, want.Checks)
		}
		buf = got.Checks
	}
	x := actions["outward, lapped"]
	if n := testing.AllocsPerRun(20, func() {
		r, _ := CheckPurlinInto(buf, c, x.p, x.a)
		buf = r.Checks
	}); n != 0 {
		t.Errorf("CheckPurlinInto with a warm buffer: %.0f allocations per call, want 0", n)
	}
}

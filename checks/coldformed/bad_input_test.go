package coldformed

import (
	"errors"
	"math"
	"strings"
	"testing"
)

func TestBadInputIsAnError(t *testing.T) {
	c := mustCaps(t, sharpC(200, 75, 18, 2.0, 5, 450, 480))
	strap := sectionT{Designation: "strap 50x1.0", Shape: shapeStrap, FyMPa: 450, FuMPa: 480}
	strap.AreaMM2 = 50
	cs := mustCaps(t, strap)
	good := BeamColumn{Compression: EffectiveLengths{3000, 3000, 3000}, Bending: Segment{Length: 3000}}
	nan := math.NaN()
	cases := []struct {
		name  string
		run   func() error
		field string // must be named in the message
	}{
		{"zero purlin span", func() error {
			_, err := CheckPurlin(c, Purlin{Span: 0, SpanType: SpanSimple}, PurlinActions{})
			return err
		}, "Purlin.Span"},
		{"negative segment", func() error {
			m := good
			m.Bending.Length = -1
			_, err := CheckBeamColumn(c, m, BeamColumnActions{N: 1000})
			return err
		}, "BeamColumn.Bending.Length"},
		{"zero effective length", func() error {
			m := good
			m.Compression.Lex = 0
			_, err := CheckBeamColumn(c, m, BeamColumnActions{N: 1000})
			return err
		}, "BeamColumn.Compression.Lex"},
		{"NaN moment", func() error {
			_, err := CheckBeamColumn(c, good, BeamColumnActions{N: 1000, Mx: nan})
			return err
		}, "BeamColumnActions.Mx"},
		{"NaN purlin moment", func() error {
			_, err := CheckPurlin(c, Purlin{Span: 6000, SpanType: SpanSimple}, PurlinActions{FreeFlangeMoment: nan})
			return err
		}, "FreeFlangeMoment"},
		{"strap asked for bending", func() error {
			_, err := CheckBeamColumn(cs, good, BeamColumnActions{Mx: 1e6})
			return err
		}, "tension only"},
		{"strap as purlin", func() error {
			_, err := CheckPurlin(cs, Purlin{Span: 6000, SpanType: SpanSimple}, PurlinActions{})
			return err
		}, "tension only"},
		{"NaN tension", func() error {
			_, err := CheckTension(cs, TensionMember{}, nan)
			return err
		}, "N*"},
		{"bad span type", func() error {
			_, err := CheckPurlin(c, Purlin{Span: 6000}, PurlinActions{})
			return err
		}, "SpanType"},
		{"missing bearing length", func() error {
			_, err := CheckPurlin(c, Purlin{Span: 6000, SpanType: SpanSimple}, PurlinActions{EndReaction: 5000})
			return err
		}, "Bearing.Length"},
		{"section without properties", func() error {
			s := sharpC(200, 75, 18, 2.0, 5, 450, 480)
			s.RyMM = 0
			_, err := SectionCapacities(s)
			return err
		}, "RyMM"},
	}
	for _, tc := range cases {
		err := tc.run()
		if err == nil {
			t.Errorf("%s: no error", tc.name)
			continue
		}
		if !errors.Is(err, ErrInput) {
			t.Errorf("%s: %v does not wrap ErrInput", tc.name, err)
		}
		if !strings.Contains(err.Error(), tc.field) {
			t.Errorf("%s: %q does not name %q", tc.name, err, tc.field)
		}
	}
}

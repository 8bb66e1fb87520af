package coldformed

import (
	"fmt"
	"math"

	"github.com/spansweep/spansweep/catalog"
)

// flats are a lipped C's or Z's flat widths (mm) on the rounded-corner
// model: web, each flange and each lip, with the corners fully effective.
type flats struct {
	t, rc       float64 // thickness, corner centreline radius
	h           float64 // centreline depth
	web         float64 // web flat
	top, bot    float64 // flange flats (top is the flange of Geometry.FlangeMM)
	lipTop      float64 // lip flats; zero for an unlipped flange
	lipBot      float64
	nChannels   float64 // 2 for a back-to-back 2C, else 1
	sinLip      float64 // sine of the lip-to-flange angle
	cornerArc   float64 // centreline arc length of one 90° corner
	cornerDepth float64 // depth of a corner arc's centroid below the flange line
}

func newFlats(g catalog.Geometry, shape catalog.Shape) (flats, error) {
	var v validator
	v.positive("DepthMM", g.DepthMM)
	v.positive("FlangeMM", g.FlangeMM)
	v.positive("ThicknessMM", g.ThicknessMM)
	v.nonNegative("LipMM", g.LipMM)
	v.nonNegative("InnerRadiusMM", g.InnerRadiusMM)
	if err := v.err(); err != nil {
		return flats{}, err
	}
	t, ri := g.ThicknessMM, g.InnerRadiusMM
	f2 := g.Flange2MM
	if f2 <= 0 {
		f2 = g.FlangeMM
	}
	f := flats{t: t, rc: ri + t/2, h: g.DepthMM - t, nChannels: 1}
	if shape == catalog.Shape2C {
		f.nChannels = 2
	}
	theta := lipAngleRad(shape)
	f.sinLip = math.Sin(theta)
	bend := ri + t                          // outside-to-flat allowance of a 90° corner
	lipBend := (ri + t) * math.Tan(theta/2) // the same for the lip corner
	f.web = g.DepthMM - 2*bend
	flange := func(b float64) float64 {
		if g.LipMM > 0 {
			return b - bend - lipBend
		}
		return b - bend
	}
	f.top, f.bot = flange(g.FlangeMM), flange(f2)
	if g.LipMM > 0 {
		f.lipTop = g.LipMM - lipBend
		f.lipBot = f.lipTop
	}
	f.cornerArc = math.Pi / 2 * f.rc
	f.cornerDepth = f.rc - 2*f.rc/math.Pi
	if f.web <= 0 || f.top <= 0 || f.bot <= 0 || (g.LipMM > 0 && f.lipTop <= 0) {
		return flats{}, &InputError{Problems: []string{fmt.Sprintf(
			"geometry D=%g B=%g B2=%g L=%g t=%g r=%g leaves no flat web, flange or lip",
			g.DepthMM, g.FlangeMM, f2, g.LipMM, t, ri)}}
	}
	return f, nil
}

// lineSum accumulates length, first and second moments of line elements
// about mid-depth (y up), each of thickness t.
type lineSum struct{ L, Ly, Lyy float64 }

// addPoint adds a horizontal element (or a lumped corner) of length l at y.
func (s *lineSum) addPoint(l, y float64) {
	s.L += l
	s.Ly += l * y
	s.Lyy += l * y * y
}

// addVertical adds a vertical element from y0 to y1.
func (s *lineSum) addVertical(y0, y1 float64) {
	l := math.Abs(y1 - y0)
	y := (y0 + y1) / 2
	s.addPoint(l, y)
	s.Lyy += l * l * l / 12
}

// sub removes another sum.
func (s *lineSum) sub(o lineSum) {
	s.L -= o.L
	s.Ly -= o.Ly
	s.Lyy -= o.Lyy
}

// gross is the model's full line sum (one channel).
func (f flats) gross() lineSum {
	var s lineSum
	yf := f.h / 2
	yCorner := yf - f.cornerDepth
	s.addVertical(-f.web/2, f.web/2)
	for _, side := range [2]struct{ sign, flange, lip float64 }{{1, f.top, f.lipTop}, {-1, f.bot, f.lipBot}} {
		s.addPoint(side.flange, side.sign*yf)
		s.addPoint(f.cornerArc, side.sign*yCorner)
		if side.lip > 0 {
			s.addPoint(f.cornerArc, side.sign*yCorner)
			s.addVertical(side.sign*(yf-f.rc), side.sign*(yf-f.rc-side.lip*f.sinLip))
		}
	}
	return s
}

// modulus is I/y_max of a line sum about its own centroid, with the extreme
// fibres at ±(h+t)/2, and the centroid's height above mid-depth.
func (f flats) modulus(s lineSum) (z, yNA float64) {
	yNA = s.Ly / s.L
	i := f.t * (s.Lyy - s.L*yNA*yNA)
	return i / ((f.h+f.t)/2 + math.Abs(yNA)), yNA
}

// bendingRemoved is the ineffective part of one channel bent with its top
// flange in compression, at compressive stress fTop in the extreme top fibre
// and neutral axis yNA above mid-depth.
func (f flats) bendingRemoved(fTop, yNA float64) lineSum {
	var r lineSum
	yc := (f.h+f.t)/2 - yNA
	yf := f.h / 2
	if f.lipTop > 0 {
		es := edgeStiffenedFlange(f.top, f.lipTop, f.t, fTop, f.sinLip) // cl. 2.4.2
		r.addPoint(f.top-es.FlangeEff, yf)
		if es.LipEff < f.lipTop {
			r.addVertical(yf-f.rc-es.LipEff*f.sinLip, yf-f.rc-f.lipTop*f.sinLip)
		}
	} else {
		r.addPoint(f.top-EffectiveWidth(f.top, f.t, fTop, kUnstiffened), yf) // cl. 2.3.1
	}
	// Web under stress gradient, cl. 2.2.3.2.
	top := f.web / 2
	f1 := fTop * (top - yNA) / yc
	f2 := fTop * (-top - yNA) / yc
	b1, b2, comp, full := webWidths(f.web, f.t, f1, f2)
	if !full {
		r.addVertical(top-b1, top-(comp-b2))
	}
	return r
}

// effectiveModulus iterates the neutral axis of one channel bent with its
// top flange in compression (AS/NZS 4600:2018 cl. 2.1 and 2.2.3). With
// firstYield, the extreme fibre that yields first is at fy; otherwise the
// extreme compression fibre is at fy (the stress f_c of cl. 3.3.3.2).
// It returns Ze/Zg of the model, so callers scale the catalogue's Zx.
func (f flats) effectiveModulusRatio(fy float64, firstYield bool) float64 {
	g := f.gross()
	zg, yNA := f.modulus(g)
	ze := zg
	for it := 0; it < 30; it++ {
		yc := (f.h+f.t)/2 - yNA
		yt := (f.h+f.t)/2 + yNA
		fTop := fy
		if firstYield && yt > yc {
			fTop = fy * yc / yt
		}
		s := g
		s.sub(f.bendingRemoved(fTop, yNA))
		i := f.t * (s.Lyy - s.L*(s.Ly/s.L)*(s.Ly/s.L))
		next := s.Ly / s.L
		ymax := math.Max((f.h+f.t)/2-next, (f.h+f.t)/2+next)
		if !firstYield {
			ymax = (f.h+f.t)/2 - next // the compression fibre is at f_c
		}
		ze = i / ymax
		if math.Abs(next-yNA) < 1e-6*f.h {
			break
		}
		yNA = next
	}
	return ze / zg
}

// flipped is the same model bent the other way (bottom flange in compression).
func (f flats) flipped() flats {
	f.top, f.bot = f.bot, f.top
	f.lipTop, f.lipBot = f.lipBot, f.lipTop
	return f
}

// compressionRemoved is the ineffective length of one channel under uniform
// compression fStar: web (cl. 2.2.1.2, k = 4), both flanges with their lips
// (cl. 2.4.2) or unstiffened (cl. 2.3.1).
func (f flats) compressionRemoved(fStar float64) float64 {
	removed := f.web - EffectiveWidth(f.web, f.t, fStar, kStiffened)
	for _, side := range [2][2]float64{{f.top, f.lipTop}, {f.bot, f.lipBot}} {
		b, d := side[0], side[1]
		if d > 0 {
			es := edgeStiffenedFlange(b, d, f.t, fStar, f.sinLip)
			removed += b - es.FlangeEff + d - es.LipEff
		} else {
			removed += b - EffectiveWidth(b, f.t, fStar, kUnstiffened)
		}
	}
	return removed
}

package catalog

import (
	"math"
	"testing"
)

// This file is an independent check of the centreline integration: the
// profile is walked as a "turtle" along exact straight runs and circular
// arcs, cut into many short pieces integrated by the midpoint rule, with the
// sectorial coordinate accumulated along the walk. It shares no code with
// the package's vertex-and-fillet model or its Simpson integration.

// walk is one branch of the centreline, from a root where ω = 0.
type walk struct {
	x, y, heading float64
	t             float64
	pts           [][2]float64
}

func newWalk(x, y, headingDeg, t float64) *walk {
	return &walk{x: x, y: y, heading: headingDeg * math.Pi / 180, t: t, pts: [][2]float64{{x, y}}}
}

const walkStepMM = 0.02

func (w *walk) straight(l float64) {
	n := int(math.Ceil(l/walkStepMM)) + 1
	for k := 0; k < n; k++ {
		w.x += l / float64(n) * math.Cos(w.heading)
		w.y += l / float64(n) * math.Sin(w.heading)
		w.pts = append(w.pts, [2]float64{w.x, w.y})
	}
}

// turn follows an arc of radius r turning by deg (positive anticlockwise).
func (w *walk) turn(deg, r float64) {
	sweep := deg * math.Pi / 180
	side := math.Copysign(1, sweep)
	cx := w.x - side*r*math.Sin(w.heading)
	cy := w.y + side*r*math.Cos(w.heading)
	a0 := math.Atan2(w.y-cy, w.x-cx)
	n := int(math.Ceil(r*math.Abs(sweep)/walkStepMM)) + 1
	for k := 1; k <= n; k++ {
		a := a0 + sweep*float64(k)/float64(n)
		w.x, w.y = cx+r*math.Cos(a), cy+r*math.Sin(a)
		w.pts = append(w.pts, [2]float64{w.x, w.y})
	}
	w.heading += sweep
}

// independentBranches walks a C (flanges to +x) or Z from mid-web, up and
// down, for outside dimensions D, B1, B2, lip d, t, inside radius r, lip
// angle φ. Centreline legs: web D − t; flange B − t/2 − (t/2)tan(φ/2); lip
// d − (t/2)tan(φ/2); each bend of centreline radius r + t/2 takes
// rc·tan(θ/2) off each leg it ends.
func independentBranches(z bool, d, b1, b2, lip, t, r, phiDeg, x0 float64) []*walk {
	rc := r + t/2
	k := math.Tan(phiDeg * math.Pi / 360)
	var out []*walk
	for _, dir := range []float64{1, -1} {
		b := b1
		flangeTurn := -90.0 // web going up turns clockwise to the +x flange
		if dir < 0 {
			b = b2
			flangeTurn = 90 // web going down turns anticlockwise to a +x flange
			if z {
				flangeTurn = -90 // ...or clockwise to the Z's −x flange
			}
		}
		w := newWalk(x0, 0, 90*dir, t)
		w.straight((d-t)/2 - rc)
		w.turn(flangeTurn, rc)
		if lip == 0 {
			w.straight(b - t/2 - rc)
		} else {
			w.straight(b - t/2 - t/2*k - rc - rc*k)
			w.turn(math.Copysign(phiDeg, flangeTurn), rc)
			w.straight(lip - t/2*k - rc*k)
		}
		out = append(out, w)
	}
	return out
}

// mirror reflects branches in the y axis (the 2C's second channel).
func mirror(ws []*walk) []*walk {
	for _, w := range ws {
		for i := range w.pts {
			w.pts[i][0] = -w.pts[i][0]
		}
	}
	return ws
}

type independentProps struct {
	a, cx, cy, ix, iy, ixy, j, x0, y0, iw, betaX, betaY, zx, zy float64
}

// integrateWalks computes the properties by the midpoint rule.
func integrateWalks(ws []*walk) independentProps {
	var p independentProps
	each := func(f func(w *walk, xm, ym, dx, dy, da float64)) {
		for _, w := range ws {
			for i := 1; i < len(w.pts); i++ {
				dx, dy := w.pts[i][0]-w.pts[i-1][0], w.pts[i][1]-w.pts[i-1][1]
				xm, ym := (w.pts[i][0]+w.pts[i-1][0])/2, (w.pts[i][1]+w.pts[i-1][1])/2
				f(w, xm, ym, dx, dy, math.Hypot(dx, dy)*w.t)
			}
		}
	}
	each(func(w *walk, xm, ym, dx, dy, da float64) {
		p.a += da
		p.cx += xm * da
		p.cy += ym * da
		p.j += da * w.t * w.t / 3
	})
	p.cx /= p.a
	p.cy /= p.a
	var sw, swx, swy float64
	omega := func(f func(x, y, dx, dy, da, w float64)) {
		for _, w := range ws {
			om := 0.0
			for i := 1; i < len(w.pts); i++ {
				xa, ya := w.pts[i-1][0]-p.cx, w.pts[i-1][1]-p.cy
				xb, yb := w.pts[i][0]-p.cx, w.pts[i][1]-p.cy
				d := xa*yb - xb*ya
				f((xa+xb)/2, (ya+yb)/2, xb-xa, yb-ya, math.Hypot(xb-xa, yb-ya)*w.t, om+d/2)
				om += d
			}
		}
	}
	omega(func(x, y, dx, dy, da, w float64) {
		p.ix += y * y * da
		p.iy += x * x * da
		p.ixy += x * y * da
		swx += w * x * da
		swy += w * y * da
		p.betaX += (y*y*y + x*x*y) * da
		p.betaY += (x*x*x + x*y*y) * da
		n := [2]float64{-dy, dx}
		nl := math.Hypot(n[0], n[1])
		for _, s := range []float64{-1, 1} {
			p.zx = math.Max(p.zx, math.Abs(y+s*n[1]/nl*da/math.Hypot(dx, dy)/2))
			p.zy = math.Max(p.zy, math.Abs(x+s*n[0]/nl*da/math.Hypot(dx, dy)/2))
		}
	})
	det := p.ix*p.iy - p.ixy*p.ixy
	p.x0 = (p.iy*swy - p.ixy*swx) / det
	p.y0 = -(p.ix*swx - p.ixy*swy) / det
	var sww float64
	omega(func(x, y, dx, dy, da, w float64) {
		ws := w - p.x0*y + p.y0*x
		sw += ws * da
		sww += ws * ws * da
	})
	p.iw = sww - sw*sw/p.a
	p.betaX = p.betaX/p.ix - 2*p.y0
	p.betaY = p.betaY/p.iy - 2*p.x0
	p.zx = p.ix / p.zx
	p.zy = p.iy / p.zy
	return p
}

func independent(shape Shape, g Geometry) independentProps {
	phi := shape.LipAngleDeg()
	switch shape {
	case ShapeZ:
		return integrateWalks(independentBranches(true, g.DepthMM, g.FlangeMM, g.Flange2MM, g.LipMM, g.ThicknessMM, g.InnerRadiusMM, phi, 0))
	case Shape2C:
		right := independentBranches(false, g.DepthMM, g.FlangeMM, g.FlangeMM, g.LipMM, g.ThicknessMM, g.InnerRadiusMM, phi, g.ThicknessMM/2)
		left := mirror(independentBranches(false, g.DepthMM, g.FlangeMM, g.FlangeMM, g.LipMM, g.ThicknessMM, g.InnerRadiusMM, phi, g.ThicknessMM/2))
		return integrateWalks(append(right, left...))
	}
	return integrateWalks(independentBranches(false, g.DepthMM, g.FlangeMM, g.FlangeMM, g.LipMM, g.ThicknessMM, g.InnerRadiusMM, phi, 0))
}

// TestPropertiesAgainstIndependentIntegration checks every thin-walled
// property against the independent walk within 0.5 % (the bound).
// A zero-valued property is compared on the scale of its kind (Ix for
// second moments, depth for lengths).
func TestPropertiesAgainstIndependentIntegration(t *testing.T) {
	const tol = 0.005
	cases := []struct {
		name  string
		shape Shape
		g     Geometry
	}{
		{"C 200x75x15x2.0 r5 (REFERENCE-VALUES §8.4)", ShapeC, Geometry{DepthMM: 200, FlangeMM: 75, LipMM: 15, ThicknessMM: 2, InnerRadiusMM: 5}},
		{"C unlipped 150x50x1.5 r3", ShapeC, Geometry{DepthMM: 150, FlangeMM: 50, ThicknessMM: 1.5, InnerRadiusMM: 3}},
		{"C 400x110x28x3.0 r7.5", ShapeC, Geometry{DepthMM: 400, FlangeMM: 110, LipMM: 28, ThicknessMM: 3, InnerRadiusMM: 7.5}},
		{"Z 200x75x18x2.0 r5 equal flanges", ShapeZ, Geometry{DepthMM: 200, FlangeMM: 75, Flange2MM: 75, LipMM: 18, ThicknessMM: 2, InnerRadiusMM: 5}},
		{"Z 250x83/77x21x2.4 unequal flanges", ShapeZ, Geometry{DepthMM: 250, FlangeMM: 83, Flange2MM: 77, LipMM: 21, ThicknessMM: 2.4, InnerRadiusMM: 6}},
		{"Z 100x53/47x13x1.0", ShapeZ, Geometry{DepthMM: 100, FlangeMM: 53, Flange2MM: 47, LipMM: 13, ThicknessMM: 1, InnerRadiusMM: 2.5}},
		{"2C 300x90x22x2.4", Shape2C, Geometry{DepthMM: 300, FlangeMM: 90, LipMM: 22, ThicknessMM: 2.4, InnerRadiusMM: 6}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			got, err := ComputeProperties(c.shape, c.g)
			if err != nil {
				t.Fatal(err)
			}
			want := independent(c.shape, c.g)
			r := math.Hypot((want.ix-want.iy)/2, want.ixy) // Mohr's circle
			i1, i2 := (want.ix+want.iy)/2+r, (want.ix+want.iy)/2-r
			d := c.g.DepthMM
			checks := []struct {
				name      string
				got, want float64
				scale     float64
			}{
				{"A", got.AreaMM2, want.a, 0},
				{"centroid x", got.CentroidXMM, want.cx, d},
				{"centroid y", got.CentroidYMM, want.cy, d},
				{"Ix", got.IxMM4, want.ix, 0},
				{"Iy", got.IyMM4, want.iy, 0},
				{"Ixy", got.IxyMM4, want.ixy, want.ix},
				{"I1", got.I1MM4, i1, 0},
				{"I2", got.I2MM4, i2, 0},
				{"Zx", got.ZxMM3, want.zx, 0},
				{"Zy", got.ZyMM3, want.zy, 0},
				{"rx", got.RxMM, math.Sqrt(want.ix / want.a), 0},
				{"ry", got.RyMM, math.Sqrt(want.iy / want.a), 0},
				{"J", got.JMM4, want.j, 0},
				{"Iw", got.IwMM6, want.iw, 0},
				{"x0", got.ShearCentreXMM, want.x0, d},
				{"y0", got.ShearCentreYMM, want.y0, d},
				{"ro1", got.RO1MM, math.Sqrt((want.ix+want.iy)/want.a + want.x0*want.x0 + want.y0*want.y0), 0},
				{"betaX", got.BetaXMM, want.betaX, d},
				{"betaY", got.BetaYMM, want.betaY, d},
				{"mass", got.MassKgPerM, want.a * 7850e-6, 0},
			}
			for _, k := range checks {
				scale := math.Max(math.Abs(k.want), k.scale)
				if math.Abs(k.got-k.want) > tol*scale {
					t.Errorf("%s: got %.6g, want %.6g (independent integration, tolerance %.1f %%)", k.name, k.got, k.want, tol*100)
				}
			}
		})
	}
}

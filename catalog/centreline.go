package catalog

import "math"

// centreline is the thin-walled model of a profile: nodes on the mid-thickness
// line joined by straight strips of constant thickness. Corners are arcs cut
// into short chords (arcSegmentsPer90 per right angle). Strips may branch
// (2C) but must not close a loop; a strip of zero thickness joins parts for
// the sectorial coordinate without adding material.
type centreline struct {
	x, y   []float64
	strips []strip
}

type strip struct {
	i, j int
	t    float64
}

// arcSegmentsPer90 chords per quarter turn: the chord length falls short of
// the arc by under 0.02 % of the corner, far inside the 0.5 % test tolerance.
const arcSegmentsPer90 = 16

func (c *centreline) addNode(x, y float64) int {
	c.x = append(c.x, x)
	c.y = append(c.y, y)
	return len(c.x) - 1
}

func (c *centreline) addStrip(i, j int, t float64) { c.strips = append(c.strips, strip{i, j, t}) }

// vec is a point or a direction in the section's plane, mm.
type vec struct{ x, y float64 }

func (a vec) add(b vec) vec         { return vec{a.x + b.x, a.y + b.y} }
func (a vec) sub(b vec) vec         { return vec{a.x - b.x, a.y - b.y} }
func (a vec) scale(k float64) vec   { return vec{a.x * k, a.y * k} }
func (a vec) cross(b vec) float64   { return a.x*b.y - a.y*b.x }
func (a vec) dot(b vec) float64     { return a.x*b.x + a.y*b.y }
func (a vec) norm() float64         { return math.Hypot(a.x, a.y) }
func (a vec) unit() vec             { return a.scale(1 / a.norm()) }
func (a vec) mirrorX() vec          { return vec{-a.x, a.y} }
func polar(angle float64) vec       { return vec{math.Cos(angle), math.Sin(angle)} }
func (a vec) angle() float64        { return math.Atan2(a.y, a.x) }
func turnAngle(in, out vec) float64 { return math.Atan2(in.cross(out), in.dot(out)) }

// filletTangent is the distance from a sharp vertex to where a fillet of
// centreline radius rc meets each leg, for a change of direction turn.
func filletTangent(rc, turn float64) float64 { return rc * math.Tan(math.Abs(turn)/2) }

// addPolyline adds a profile whose sharp-corner centreline runs through pts,
// every interior vertex rounded with centreline radius rc, thickness t. It
// returns the node index of each vertex that is straight (zero turn), so a
// caller can join parts there; other vertices map to -1.
func (c *centreline) addPolyline(pts []vec, rc, t float64) []int {
	at := make([]int, len(pts))
	prev := c.addNode(pts[0].x, pts[0].y)
	at[0] = prev
	for k := 1; k < len(pts); k++ {
		at[k] = -1
		if k == len(pts)-1 {
			at[k] = c.lineTo(prev, pts[k], t)
			continue
		}
		in := pts[k].sub(pts[k-1]).unit()
		out := pts[k+1].sub(pts[k]).unit()
		turn := turnAngle(in, out)
		if turn == 0 {
			prev = c.lineTo(prev, pts[k], t)
			at[k] = prev
			continue
		}
		tan := filletTangent(rc, turn)
		prev = c.lineTo(prev, pts[k].sub(in.scale(tan)), t)
		prev = c.arc(prev, in, turn, rc, t)
	}
	return at
}

// lineTo adds a strip from node prev to p (skipped when it has no length) and
// returns the node at p.
func (c *centreline) lineTo(prev int, p vec, t float64) int {
	if math.Hypot(p.x-c.x[prev], p.y-c.y[prev]) < 1e-12 {
		return prev
	}
	n := c.addNode(p.x, p.y)
	c.addStrip(prev, n, t)
	return n
}

// arc adds the chords of a fillet that starts at node prev heading in and
// turns by turn (positive anticlockwise) on centreline radius rc.
func (c *centreline) arc(prev int, in vec, turn, rc, t float64) int {
	if rc == 0 {
		return prev
	}
	side := math.Copysign(1, turn)
	left := vec{-in.y, in.x}.scale(side)
	start := vec{c.x[prev], c.y[prev]}
	centre := start.add(left.scale(rc))
	a0 := start.sub(centre).angle()
	n := int(math.Ceil(math.Abs(turn) / (math.Pi / 2) * arcSegmentsPer90))
	for k := 1; k <= n; k++ {
		p := centre.add(polar(a0 + turn*float64(k)/float64(n)).scale(rc))
		prev = c.lineTo(prev, p, t)
	}
	return prev
}

// simpson integrates f along a strip's length times its thickness; exact for
// the cubic integrands used here since x, y and ω vary linearly on a strip.
func simpson(l, t, fi, fm, fj float64) float64 { return l * t * (fi + 4*fm + fj) / 6 }

package analysis

import (
	"bufio"
	"flag"
	"fmt"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"slices"
	"strconv"
	"strings"
	"testing"
)

// This file cross-checks the solver against CalculiX (ccx 2.20, Debian package calculix-ccx),
// an independent finite-element program, set up as /work/shared/CALCULIX-NOTES.md prescribes for
// Euler–Bernoulli agreement: B32R elements (about 10 per member), engineering-constants material
// with ν = 0 and G = 100·E, an *ORIENTATION per member, SECTION=RECT with the same A and I, Z
// fixed at every node plus one torsion restraint per node, loads as nodal CLOADs (1/6, 4/6, 1/6
// of each element's load). Pin-ended braces are T3D2 trusses with an isotropic ν = 0 material.

// ccxPath returns the ccx executable, failing under CI=true when it is missing.
func ccxPath(t *testing.T) string {
	t.Helper()
	p, err := exec.LookPath("ccx")
	if err != nil {
		if os.Getenv("CI") == "true" {
			t.Fatal("ccx (CalculiX, Debian package calculix-ccx) is required when CI=true: install it")
		}
		t.Skip("ccx not installed; skipping CalculiX cross-check")
	}
	return p
}

// ccxModel is a frame meshed for CalculiX.
type ccxModel struct {
	b      strings.Builder
	nodes  [][2]float64 // ccx node i+1
	rot    []int        // torsion DOF per node (0 = none yet)
	loads  map[int][2]float64
	nextEl int
}

func (c *ccxModel) node(x, y float64) int {
	c.nodes = append(c.nodes, [2]float64{x, y})
	c.rot = append(c.rot, 0)
	return len(c.nodes)
}

func (c *ccxModel) load(n int, fx, fy float64) {
	v := c.loads[n]
	c.loads[n] = [2]float64{v[0] + fx, v[1] + fy}
}

// writeCCX writes frame f under case lc as a CalculiX deck: a static step, then (buckle) a
// *BUCKLE step with the same loads.
func writeCCX(f *Frame, lc *LoadCase, buckle bool) (string, map[int][2]float64) {
	c := &ccxModel{loads: map[int][2]float64{}}
	for _, n := range f.Nodes {
		c.node(n.X, n.Y)
	}
	var els strings.Builder
	var props strings.Builder
	for mi := range f.Members {
		c.member(f, mi, lc, &els, &props)
	}
	for _, l := range lc.Nodal {
		c.load(l.Node+1, l.Fx, l.Fy)
	}
	b := &c.b
	b.WriteString("*HEADING\nspansweep analysis cross-check\n*NODE, NSET=NALL\n")
	for i, n := range c.nodes {
		fmt.Fprintf(b, "%d, %.9g, %.9g, 0\n", i+1, n[0], n[1])
	}
	b.WriteString(els.String())
	e := f.Members[0].E
	fmt.Fprintf(b, "*MATERIAL, NAME=BEAM\n*ELASTIC, TYPE=ENGINEERING CONSTANTS\n%g, %g, %g, 0, 0, 0, %g, %g\n%g, 0\n", e, e, e, 100*e, 100*e, 100*e)
	fmt.Fprintf(b, "*MATERIAL, NAME=TRUSS\n*ELASTIC\n%g, 0\n", e)
	b.WriteString(props.String())
	b.WriteString("*BOUNDARY\n")
	for i := range c.nodes {
		fmt.Fprintf(b, "%d, 3, 3\n", i+1)
		if c.rot[i] != 0 {
			fmt.Fprintf(b, "%d, %d, %d\n", i+1, c.rot[i], c.rot[i])
		}
	}
	b.WriteString("*NSET, NSET=NSUP\n")
	for _, s := range f.Supports {
		fmt.Fprintf(b, "%d\n", s.Node+1)
	}
	b.WriteString("*BOUNDARY\n")
	for _, s := range f.Supports {
		for d, fix := range s.Fix {
			if fix {
				dof := [3]int{1, 2, 6}[d]
				fmt.Fprintf(b, "%d, %d, %d\n", s.Node+1, dof, dof)
			}
		}
	}
	cload := func() {
		b.WriteString("*CLOAD\n")
		keys := make([]int, 0, len(c.loads))
		for k := range c.loads {
			keys = append(keys, k)
		}
		slices.Sort(keys)
		for _, k := range keys {
			v := c.loads[k]
			fmt.Fprintf(b, "%d, 1, %.12g\n%d, 2, %.12g\n", k, v[0], k, v[1])
		}
	}
	b.WriteString("*STEP\n*STATIC\n")
	cload()
	b.WriteString("*NODE PRINT, NSET=NSUP\nRF\n*NODE PRINT, NSET=NALL\nU\n*NODE FILE, OUTPUT=2D\nU\n*EL FILE, SECTION FORCES\nS\n*END STEP\n")
	if buckle {
		b.WriteString("*STEP\n*BUCKLE\n3\n")
		cload()
		b.WriteString("*END STEP\n")
	}
	return b.String(), c.loads
}

// member meshes member mi and converts its loads (from the raw MemberLoad description, not
// the solver's resolved loads) to nodal forces.
func (c *ccxModel) member(f *Frame, mi int, lc *LoadCase, els, props *strings.Builder) {
	m := &f.Members[mi]
	p0, p1 := f.Nodes[m.Start], f.Nodes[m.End]
	dx, dy := p1.X-p0.X, p1.Y-p0.Y
	L := math.Hypot(dx, dy)
	cs, sn := dx/L, dy/L
	at := func(x float64) (float64, float64) { return p0.X + cs*x, p0.Y + sn*x }
	if m.Release == Pinned {
		c.nextEl++
		fmt.Fprintf(els, "*ELEMENT, TYPE=T3D2, ELSET=M%d\n%d, %d, %d\n", mi, c.nextEl, m.Start+1, m.End+1)
		fmt.Fprintf(props, "*SOLID SECTION, ELSET=M%d, MATERIAL=TRUSS\n%g\n", mi, m.A)
		// A pin-ended member's self weight goes half to each end, as on a simple beam.
		wgt := m.MassKgPerM * 9.80665e-3 * lc.SelfWeight * L
		c.load(m.Start+1, 0, -wgt/2)
		c.load(m.End+1, 0, -wgt/2)
		return
	}
	// Element boundaries: 10 equal divisions plus every load discontinuity.
	xs := []float64{}
	for i := 0; i <= 10; i++ {
		xs = append(xs, L*float64(i)/10)
	}
	for _, l := range lc.Members {
		if l.Member == mi {
			xs = append(xs, math.Min(l.A, L))
			if !l.Point {
				xs = append(xs, math.Min(l.B, L))
			}
		}
	}
	slices.Sort(xs)
	var cut []float64
	for _, x := range xs {
		if len(cut) == 0 || x-cut[len(cut)-1] > 1e-6*L {
			cut = append(cut, x)
		}
	}
	cut[len(cut)-1] = L
	ids := make([]int, len(cut))
	ids[0], ids[len(ids)-1] = m.Start+1, m.End+1
	for i := 1; i+1 < len(cut); i++ {
		ids[i] = c.node(at(cut[i]))
	}
	fmt.Fprintf(els, "*ELEMENT, TYPE=B32R, ELSET=M%d\n", mi)
	torsion := 4 // rotation about X: twist of a member mostly along X
	if math.Abs(sn) > math.Abs(cs) {
		torsion = 5
	}
	for i := 0; i+1 < len(cut); i++ {
		mid := c.node(at((cut[i] + cut[i+1]) / 2))
		c.nextEl++
		fmt.Fprintf(els, "%d, %d, %d, %d\n", c.nextEl, ids[i], mid, ids[i+1])
		for _, n := range []int{ids[i], mid, ids[i+1]} {
			if c.rot[n-1] == 0 {
				c.rot[n-1] = torsion
			}
		}
		c.elementLoads(m, mi, lc, cut[i], cut[i+1], cs, sn, [3]int{ids[i], mid, ids[i+1]})
	}
	for _, l := range lc.Members {
		if l.Member == mi && l.Point {
			fx, fy := l.Qx, l.Qy
			if l.Axes == LocalAxes {
				fx, fy = cs*l.Qx-sn*l.Qy, sn*l.Qx+cs*l.Qy
			}
			i := slices.IndexFunc(cut, func(x float64) bool { return math.Abs(x-l.A) <= 1e-6*L })
			c.load(ids[i], fx, fy)
		}
	}
	d := math.Sqrt(12 * m.I / m.A)
	fmt.Fprintf(props, "*ORIENTATION, NAME=OR%d\n%.12g, %.12g, 0, %.12g, %.12g, 0\n", mi, cs, sn, -sn, cs)
	fmt.Fprintf(props, "*BEAM SECTION, ELSET=M%d, MATERIAL=BEAM, SECTION=RECT, ORIENTATION=OR%d\n%.12g, %.12g\n0, 0, 1\n", mi, mi, m.A/d, d)
}

// elementLoads adds the uniform loads covering element [x0, x1] as 1/6, 4/6, 1/6 nodal forces.
func (c *ccxModel) elementLoads(m *Member, mi int, lc *LoadCase, x0, x1, cs, sn float64, nodes [3]int) {
	le := x1 - x0
	var fx, fy float64 // total element force, global
	if lc.SelfWeight != 0 {
		fy -= m.MassKgPerM * 9.80665e-3 * lc.SelfWeight * le
	}
	for _, l := range lc.Members {
		if l.Member != mi || l.Point || l.A > x0+1e-9 || math.Min(l.B, 1e300) < x1-1e-9 {
			continue
		}
		switch {
		case l.Axes == LocalAxes:
			fx += (cs*l.Qx - sn*l.Qy) * le
			fy += (sn*l.Qx + cs*l.Qy) * le
		case l.Projected:
			// Per projected length: the element's extent normal to the load direction.
			q := math.Hypot(l.Qx, l.Qy)
			proj := math.Abs(cs*l.Qy-sn*l.Qx) / q * le
			fx += l.Qx * proj
			fy += l.Qy * proj
		default:
			fx += l.Qx * le
			fy += l.Qy * le
		}
	}
	for i, w := range [3]float64{1.0 / 6, 4.0 / 6, 1.0 / 6} {
		c.load(nodes[i], w*fx, w*fy)
	}
}

// ccxResult holds what the tests read back from CalculiX.
type ccxResult struct {
	rf, u   map[int][3]float64
	moment  map[int]float64 // SYZ section moment at frame nodes (.frd), N·mm
	buckled []float64
}

// ccxDecks, when set, keeps each deck written by the cross-check in that directory
// (e.g. -ccx-decks ../../testdata/calculix) for inspection or for use as a reference case.
var ccxDecks = flag.String("ccx-decks", "", "directory to keep the CalculiX decks in")

func runCCX(t *testing.T, exe, deck string) ccxResult {
	t.Helper()
	dir := t.TempDir()
	if *ccxDecks != "" {
		name := strings.NewReplacer("/", "_", " ", "_", ",", "").Replace(t.Name()) + ".inp"
		if err := os.WriteFile(filepath.Join(*ccxDecks, name), []byte(deck), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	if err := os.WriteFile(filepath.Join(dir, "job.inp"), []byte(deck), 0o644); err != nil {
		t.Fatal(err)
	}
	cmd := exec.Command(exe, "-i", "job")
	cmd.Dir = dir
	out, err := cmd.CombinedOutput()
	if err != nil || strings.Contains(string(out), "*ERROR") {
		t.Fatalf("ccx failed: %v\n%s", err, lastLines(string(out), 20))
	}
	r := ccxResult{rf: map[int][3]float64{}, u: map[int][3]float64{}, moment: map[int]float64{}}
	parseDat(t, filepath.Join(dir, "job.dat"), &r)
	parseFrd(t, filepath.Join(dir, "job.frd"), &r)
	if len(r.u) == 0 {
		t.Fatalf("ccx wrote no displacements\n%s", lastLines(string(out), 20))
	}
	return r
}

func lastLines(s string, n int) string {
	l := strings.Split(strings.TrimSpace(s), "\n")
	return strings.Join(l[max(0, len(l)-n):], "\n")
}

func parseDat(t *testing.T, path string, r *ccxResult) {
	fh, err := os.Open(path)
	if err != nil {
		t.Fatal(err)
	}
	defer fh.Close()
	block := ""
	seenU, seenBuckle := false, false
	sc := bufio.NewScanner(fh)
	for sc.Scan() {
		line := strings.TrimSpace(sc.Text())
		switch {
		case strings.Contains(line, "for set"):
			// Later steps repeat the static step's print requests; keep the first.
			if block == "displacements" {
				seenBuckle = true
			}
			block = strings.Fields(line)[0]
			continue
		case strings.Contains(line, "B U C K L I N G"):
			block = "buckling"
			continue
		}
		fs := strings.Fields(line)
		v := make([]float64, len(fs))
		ok := len(fs) > 0
		for i, s := range fs {
			if v[i], err = strconv.ParseFloat(s, 64); err != nil {
				ok = false
				break
			}
		}
		switch {
		case !ok:
		case block == "buckling" && len(v) == 2:
			r.buckled = append(r.buckled, v[1])
		case len(v) == 4 && block == "forces" && !seenU:
			r.rf[int(v[0])] = [3]float64{v[1], v[2], v[3]}
		case len(v) == 4 && block == "displacements" && !seenBuckle:
			r.u[int(v[0])] = [3]float64{v[1], v[2], v[3]}
			seenU = true
		}
	}
}

// parseFrd reads the first STRESS block (section forces) of a .frd: SYZ, the moment about
// local 1 = +Z, is its fifth component.
func parseFrd(t *testing.T, path string, r *ccxResult) {
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	in := false
	for _, line := range strings.Split(string(data), "\n") {
		switch {
		case strings.HasPrefix(line, " -4  STRESS"):
			in = len(r.moment) == 0
		case strings.HasPrefix(line, " -3"):
			in = false
		case in && strings.HasPrefix(line, " -1") && len(line) >= 13+6*12:
			n, _ := strconv.Atoi(strings.TrimSpace(line[3:13]))
			v, _ := strconv.ParseFloat(strings.TrimSpace(line[13+4*12:13+5*12]), 64)
			r.moment[n] = v
		}
	}
}

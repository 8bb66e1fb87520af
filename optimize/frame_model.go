package optimize

import (
	"math"
	"slices"
	"sync"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/checks/coldformed"
	"github.com/spansweep/spansweep/grids"
)

// mainParts are the frame parts checked as rafters and columns.
var mainParts = [4]analysis.Part{analysis.LeftColumn, analysis.LeftRafter, analysis.RightRafter, analysis.RightColumn}

// station is a point of a part where internal forces are sampled: every
// load discontinuity (both sides of a point load), member ends and purlin
// and girt lines, so that between consecutive stations the shear is
// linear and the moments between them follow exactly.
type station struct {
	member int
	at     float64 // from the analysis member's start, mm
	along  float64 // from the part's start, mm
	right  bool    // the value just past a point load
}

// frameTopology is a built portal with its load cases and stations; the
// sections of its members are changed in place between candidates.
type frameTopology struct {
	p        *analysis.Portal
	cases    []analysis.LoadCase
	stations [4][]station // per mainParts entry
	knee     *analysis.KneeBrace
}

// frameModel is one designer's analysis state for the frame search: a
// workspace (never shared between goroutines), the combinations and the
// per-candidate force tables.
type frameModel struct {
	d         *designer
	g         frameGeometry
	ws        *analysis.Workspace // from workspaces; frame returns it
	combs     []analysis.Combination
	prim      []analysis.Combination // each primary alone
	uls       []int                  // indices of ULS combinations
	order     []int                  // the ULS combinations in checking order (last failing first)
	sls       []int
	hasW      []bool // combination includes wind
	plain     *frameTopology
	caps      *capacityTable
	brace0    catalog.Section                    // lightest C: the knee brace stiffness in analysis and the fly-brace item
	heaviestC catalog.Section                    // for conservative brace weights in bounds
	mech      []mechanismPlace                   // statics bounds' mechanisms; nil for a flat roof
	ulsFG     []float64                          // dead-load factor of each m.uls combination (mechanism bounds)
	mixAbs    [nMixes]float64                    // |a| + |b| of each mechanismCombos mix
	placeComb int                                // the m.uls index that gave placeRatio's last largest ratio
	bestPlace [2]int                             // rafter and column knee-brace places of the last least ratio
	gravity   []gravityLoad                      // gravityLoads, once per case
	columnLey float64                            // the columns' l_ey (girt spacing), the same for every section
	phiNBound map[*coldformed.Capacities]float64 // boundPasses' φN_c with l_ex → 0 per column section
	kneeStart *frameTopology                     // the knee-braced portal at the start of the placement search
	// columnFirst checks the column before the rafter in a verdict: the
	// column failed the last candidate that failed.
	columnFirst bool
	// fast selects fastUtilisation where it applies (λc = ∞ stages, no
	// recording): it gives utilisations only, no check lists.
	fast bool

	// Per solve: sol and each primary's forces at every station.
	top *frameTopology
	sol *analysis.Solution
	pv  [4][][]analysis.Forces // [part][primary][station]
	// Every combination's forces at the stations: [part][combination][station].
	cv [4][][]analysis.Forces
	// Axial force of each buckling element per primary, for the λ bound.
	elemN [][]float64
	// checkBuf holds the inner- and outer-flange check lists of the last
	// segment checks (worstSegment, innerPasses), reused between them.
	checkBuf [2][]coldformed.Check
}

// workspaces recycles frame analysis workspaces between cases, so that
// each worker's solves reuse buffers sized for these frames instead of
// allocating them per case.
var workspaces = sync.Pool{New: func() any { return new(analysis.Workspace) }}

// release returns the model's workspace for another case; the model's
// solution must not be used after it.
func (m *frameModel) release() {
	if m != nil && m.ws != nil {
		workspaces.Put(m.ws)
		m.ws, m.sol = nil, nil
	}
}

// newTopology builds the portal for knee brace kb (nil: none).
func (m *frameModel) newTopology(kb *analysis.KneeBrace, r, c catalog.Section) (*frameTopology, error) {
	g := &m.g
	spec := analysis.PortalSpec{SpanMM: g.spanMM, EavesHeightMM: g.heightMM, PitchDeg: m.d.c.RoofPitchDeg,
		Base: analysis.PinnedBase, Column: memberSection(c), Rafter: memberSection(r),
		KneeBrace: kb, KneeBraceSect: memberSection(m.brace0), PurlinsMM: g.purlinsMM, GirtsMM: g.girtsMM}
	if m.d.c.Base == grids.BaseFixed {
		spec.Base = analysis.FixedBase
	}
	p, err := analysis.NewPortal(spec)
	if err != nil {
		return nil, err
	}
	cases, err := m.d.loadCases(p, g)
	if err != nil {
		return nil, err
	}
	t := &frameTopology{p: p, cases: cases, knee: kb}
	for i, pt := range mainParts {
		t.stations[i] = partStations(p, cases, pt)
	}
	return t, nil
}

// memberSection is a catalogue section's in-plane analysis properties.
func memberSection(s catalog.Section) analysis.Section {
	return analysis.Section{E: coldformed.E, A: s.AreaMM2, I: s.IxMM4, MassKgPerM: s.MassKgPerM}
}

// partStations lists a part's stations in order along it.
func partStations(p *analysis.Portal, cases []analysis.LoadCase, pt analysis.Part) []station {
	var out []station
	for _, sg := range p.Parts[pt] {
		mem := &p.Frame.Members[sg.Member]
		n0, n1 := p.Frame.Nodes[mem.Start], p.Frame.Nodes[mem.End]
		L := math.Hypot(n1.X-n0.X, n1.Y-n0.Y)
		xs := []float64{0, L}
		for _, r := range append(slices.Clip(p.Purlins), p.Girts...) {
			if r.Member == sg.Member {
				xs = append(xs, r.AtMM)
			}
		}
		points := map[float64]bool{}
		for _, c := range cases {
			for _, l := range c.Members {
				if l.Member != sg.Member {
					continue
				}
				xs = append(xs, math.Min(l.A, L))
				if l.Point {
					points[math.Min(l.A, L)] = true
				} else {
					xs = append(xs, math.Min(l.B, L))
				}
			}
		}
		slices.Sort(xs)
		xs = slices.Compact(xs)
		for _, x := range xs {
			out = append(out, station{member: sg.Member, at: x, along: sg.FromMM + x})
			if points[x] {
				out = append(out, station{member: sg.Member, at: x, along: sg.FromMM + x, right: true})
			}
		}
	}
	return out
}

// setSections puts the rafter and column sections on the topology's members.
func (t *frameTopology) setSections(r, c catalog.Section) {
	set := func(pt analysis.Part, s catalog.Section) {
		for _, sg := range t.p.Parts[pt] {
			mem := &t.p.Frame.Members[sg.Member]
			mem.E, mem.A, mem.I, mem.MassKgPerM = coldformed.E, s.AreaMM2, s.IxMM4, s.MassKgPerM
		}
	}
	set(analysis.LeftColumn, c)
	set(analysis.RightColumn, c)
	set(analysis.LeftRafter, r)
	set(analysis.RightRafter, r)
}

// setBrace puts the knee brace section on the topology's braces.
func (t *frameTopology) setBrace(b catalog.Section) {
	for _, pt := range []analysis.Part{analysis.LeftKneeBrace, analysis.RightKneeBrace} {
		for _, sg := range t.p.Parts[pt] {
			mem := &t.p.Frame.Members[sg.Member]
			mem.A, mem.I, mem.MassKgPerM = b.AreaMM2, b.IxMM4, b.MassKgPerM
		}
	}
}

// solve analyses topology t with its current sections; one analysis. The
// force tables follow with tabulate, only when the checks need them.
func (m *frameModel) solve(t *frameTopology) error {
	m.d.r.Analyses++
	sol, err := m.ws.Solve(&t.p.Frame, t.cases)
	if err != nil {
		return err
	}
	m.top, m.sol = t, sol
	return nil
}

// screen analyses topology t as far as its displacements (one analysis):
// enough for the serviceability checks, which most failing candidates
// fail. complete recovers the forces when the candidate goes on.
func (m *frameModel) screen(t *frameTopology) error {
	m.d.r.Analyses++
	sol, err := m.ws.SolveDisplacements(&t.p.Frame, t.cases)
	if err != nil {
		return err
	}
	m.top, m.sol = t, sol
	return nil
}

// complete finishes a screen's solve (analysis.Solution.Complete).
func (m *frameModel) complete() error { return m.sol.Complete() }

// tabulate fills each primary case's forces at the stations, every
// combination's sums, and the buckling elements' axial forces.
func (m *frameModel) tabulate() {
	t, sol := m.top, m.sol
	np := len(t.cases)
	for k := range mainParts {
		st := t.stations[k]
		m.pv[k] = growRows(m.pv[k], np, len(st))
		for i := range np {
			for j, s := range st {
				m.pv[k][i][j] = sol.At(m.prim[i], s.member, s.at, s.right)
			}
		}
		m.cv[k] = growRows(m.cv[k], len(m.combs), len(st))
		for c := range m.combs {
			m.combineInto(k, c)
		}
	}
	m.tabulateElementAxial()
}

// growRows returns a rows × cols table reusing rows' storage.
func growRows(rows [][]analysis.Forces, n, cols int) [][]analysis.Forces {
	if cap(rows) < n {
		rows = make([][]analysis.Forces, n)
	}
	rows = rows[:n]
	for i := range rows {
		rows[i] = slices.Grow(rows[i][:0], cols)[:cols]
	}
	return rows
}

// combine returns combination comb's forces at part k's stations.
func (m *frameModel) combine(k, comb int) []analysis.Forces { return m.cv[k][comb] }

// combineInto sums the primaries' forces of combination comb on part k.
func (m *frameModel) combineInto(k, comb int) {
	out := m.cv[k][comb]
	clear(out)
	for _, t := range m.combs[comb] {
		row := m.pv[k][t.Case]
		for j := range out {
			out[j].N += t.Factor * row[j].N
			out[j].V += t.Factor * row[j].V
			out[j].M += t.Factor * row[j].M
		}
	}
}

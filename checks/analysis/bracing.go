package analysis

import (
	"errors"
	"fmt"
)

// BaySupport says how a bracing bay is held.
type BaySupport uint8

// Bracing bay supports.
const (
	// SpanningBay is a roof bay spanning between its two ends (the eaves): pinned at the
	// start of chord A, on a roller (free along the chords) at the far end of chord A.
	SpanningBay BaySupport = iota
	// CantileverBay is a wall bay held at its start (the column bases), both chords pinned.
	CantileverBay
)

// BracingBaySpec describes a rectangular bracing bay: two chords (rafters or columns) along x,
// WidthMM apart in y, divided into Panels panels by struts (purlins or eave struts), each panel
// crossed by two tension-only diagonals. All joints are pins.
type BracingBaySpec struct {
	LengthMM, WidthMM      float64
	Panels                 int
	Chord, Strut, Diagonal Section
	Support                BaySupport
}

// BracingBay is a built bracing bay. Chords[k][i] is the node of chord k (0 at y = 0, 1 at
// y = WidthMM) at panel point i (x = i·LengthMM/Panels).
type BracingBay struct {
	Spec      BracingBaySpec
	Frame     Frame
	Chords    [2][]int
	Diagonals []int // members, two per panel
	Struts    []int
}

// NewBracingBay builds the pin-jointed truss of spec.
func NewBracingBay(spec BracingBaySpec) (*BracingBay, error) {
	var errs []error
	if !(spec.LengthMM > 0) {
		errs = append(errs, fmt.Errorf("bracing bay: LengthMM = %g, want > 0", spec.LengthMM))
	}
	if !(spec.WidthMM > 0) {
		errs = append(errs, fmt.Errorf("bracing bay: WidthMM = %g, want > 0", spec.WidthMM))
	}
	if spec.Panels < 1 {
		errs = append(errs, fmt.Errorf("bracing bay: Panels = %d, want ≥ 1", spec.Panels))
	}
	if err := errors.Join(errs...); err != nil {
		return nil, err
	}
	b := &BracingBay{Spec: spec}
	f := &b.Frame
	for k := range 2 {
		for i := 0; i <= spec.Panels; i++ {
			f.Nodes = append(f.Nodes, Node{X: spec.LengthMM * float64(i) / float64(spec.Panels), Y: spec.WidthMM * float64(k)})
			b.Chords[k] = append(b.Chords[k], len(f.Nodes)-1)
		}
	}
	add := func(name string, a, c int, s Section, tension bool) int {
		f.Members = append(f.Members, Member{Name: name, Start: a, End: c, E: s.E, A: s.A, I: s.I,
			MassKgPerM: s.MassKgPerM, Release: Pinned, TensionOnly: tension})
		return len(f.Members) - 1
	}
	for i := 0; i <= spec.Panels; i++ {
		b.Struts = append(b.Struts, add(fmt.Sprintf("strut %d", i), b.Chords[0][i], b.Chords[1][i], spec.Strut, false))
	}
	for i := range spec.Panels {
		for k := range 2 {
			add(fmt.Sprintf("chord %c%d", 'A'+k, i+1), b.Chords[k][i], b.Chords[k][i+1], spec.Chord, false)
		}
		b.Diagonals = append(b.Diagonals,
			add(fmt.Sprintf("diagonal %d/", i+1), b.Chords[0][i], b.Chords[1][i+1], spec.Diagonal, true),
			add(fmt.Sprintf("diagonal %d\\", i+1), b.Chords[1][i], b.Chords[0][i+1], spec.Diagonal, true))
	}
	n := spec.Panels
	if spec.Support == CantileverBay {
		f.Supports = []Support{PinnedSupport(b.Chords[0][0]), PinnedSupport(b.Chords[1][0])}
	} else {
		f.Supports = []Support{PinnedSupport(b.Chords[0][0]), RollerX(b.Chords[0][n])}
	}
	return b, nil
}

package optimize

import (
	"math"

	"gonum.org/v1/gonum/optimize"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/checks/coldformed"
)

// Knee brace placement range, as fractions of the eaves height (down the
// column from the knee) and of the rafter's slope length (along it from
// the knee): common practice, no source.
const (
	kneeColumnMin, kneeColumnMax = 0.10, 0.40
	kneeRafterMin, kneeRafterMax = 0.05, 0.25
	// kneeEvaluations caps the Nelder–Mead trials per candidate.
	kneeEvaluations = 20
	// kneeHopeless: a pair whose objective at the middle of the range
	// exceeds this is taken as beyond what a knee brace repairs, and not
	// searched further (part of the candidate's definition, so the
	// exhaustive enumeration does the same; common practice, no source).
	kneeHopeless = 1.25
)

// kneeAt maps Nelder–Mead's unconstrained pair onto the placement range
// (a smooth bijection, so the simplex never leaves the range).
func (m *frameModel) kneeAt(x []float64) analysis.KneeBrace {
	u := func(v, lo, hi float64) float64 { return lo + (hi-lo)*(0.5+0.5*math.Tanh(v)) }
	return analysis.KneeBrace{ColumnMM: u(x[0], kneeColumnMin, kneeColumnMax) * m.g.heightMM,
		RafterMM: u(x[1], kneeRafterMin, kneeRafterMax) * m.g.rafterMM}
}

// kneeBraceLengthMM is the brace's length from its column to its rafter end.
func (m *frameModel) kneeBraceLengthMM(kb analysis.KneeBrace) float64 {
	a := m.g.pitchRad
	return math.Hypot(kb.RafterMM*math.Cos(a), kb.ColumnMM+kb.RafterMM*math.Sin(a))
}

// placeKneeBrace finds the knee brace position of a candidate by
// Nelder–Mead (gonum optimize) over the two positions, minimising the
// governing utilisation (objective), from the middle of the range.
// It also returns the objective there: above 1 the candidate fails (the
// objective bounds the utilisation from below for the lightest brace's
// stiffness, which the placement is analysed with).
func (m *frameModel) placeKneeBrace(cd *frameCandidate) (analysis.KneeBrace, float64, error) {
	var firstErr error
	stop := math.Inf(1)
	f := func(x []float64) float64 {
		kb := m.kneeAt(x)
		t, err := m.kneeStart, error(nil)
		if t == nil || *t.knee != kb {
			t, err = m.newTopology(&kb, *cd.rafter, *cd.column)
		}
		if err == nil {
			var u float64
			if u, err = m.objective(cd, t, stop); err == nil {
				return u
			}
		}
		if firstErr == nil {
			firstErr = err
		}
		return math.Inf(1)
	}
	x0 := []float64{0, 0}
	if m.kneeStart == nil {
		kb := m.kneeAt(x0)
		if m.kneeStart, firstErr = m.newTopology(&kb, *cd.rafter, *cd.column); firstErr != nil {
			return kb, 0, firstErr
		}
	}
	m.kneeStart.setBrace(m.brace0)
	stop = kneeHopeless // the start only has to show whether the pair is worth searching
	u0 := f(x0)
	stop = math.Inf(1)
	if firstErr != nil || u0 > kneeHopeless {
		return m.kneeAt(x0), u0, firstErr
	}
	res, err := optimize.Minimize(optimize.Problem{Func: f}, x0,
		&optimize.Settings{FuncEvaluations: kneeEvaluations, Converger: &optimize.FunctionConverge{Absolute: 1e-3, Iterations: 5}},
		&optimize.NelderMead{SimplexSize: 1})
	if firstErr != nil {
		return analysis.KneeBrace{}, 0, firstErr
	}
	if res == nil {
		return analysis.KneeBrace{}, 0, err
	}
	return m.kneeAt(res.X), res.F, nil
}

// kneeBraceForces returns the knee braces' largest ULS compression and
// tension (N, both ≥ 0) in the last solve.
func (m *frameModel) kneeBraceForces() (comp, tens float64) {
	p := m.top.p
	for _, c := range m.uls {
		for _, pt := range []analysis.Part{analysis.LeftKneeBrace, analysis.RightKneeBrace} {
			for _, sg := range p.Parts[pt] {
				n := m.sol.AxialForce(m.combs[c], sg.Member)
				comp, tens = math.Max(comp, -n), math.Max(tens, n)
			}
		}
	}
	return comp, tens
}

// kneeBraceSection returns the lightest C that carries the brace forces as
// a pin-ended strut (AS/NZS 4600:2018 cl. 3.4, l_e = brace length on
// every axis) and tie (cl. 3.2), with its utilisation; ok false if none.
func (m *frameModel) kneeBraceSection(lengthMM, comp, tens float64) (catalog.Section, float64, bool) {
	for _, s := range m.d.byShape(catalog.ShapeC) {
		c, err := m.caps.of(s)
		if err != nil {
			continue
		}
		u := 0.0
		if comp > 0 {
			r, err := coldformed.CheckBeamColumn(c, coldformed.BeamColumn{
				Compression: coldformed.EffectiveLengths{Lex: lengthMM, Ley: lengthMM, Lez: lengthMM},
				Bending:     coldformed.Segment{Length: lengthMM}}, coldformed.BeamColumnActions{N: comp})
			if err != nil {
				continue
			}
			u = r.Utilisation()
		}
		if tens > 0 {
			r, err := coldformed.CheckTension(c, coldformed.TensionMember{}, tens)
			if err != nil {
				continue
			}
			u = math.Max(u, r.Utilisation())
		}
		if u <= 1 {
			return s, u, true
		}
	}
	return catalog.Section{}, math.Inf(1), false
}

// evaluateBraced places the knee braces, sizes them and evaluates the
// candidate with them. The brace section is found from the forces with the
// lightest C in the frame, then the frame is re-analysed with it (the
// brace's axial stiffness moves its force a little) and re-sized until the
// section settles (at most three rounds).
func (m *frameModel) evaluateBraced(cd *frameCandidate, full bool) (frameOutcome, error) {
	kb, u, err := m.placeKneeBrace(cd)
	if err != nil {
		return frameOutcome{}, err
	}
	if u > 1 {
		return frameOutcome{knee: &kb, util: u, stage: "knee brace placement"}, nil
	}
	t, err := m.newTopology(&kb, *cd.rafter, *cd.column)
	if err != nil {
		return frameOutcome{}, err
	}
	brace := m.brace0
	length := m.kneeBraceLengthMM(kb)
	var o frameOutcome
	for range 3 {
		t.setBrace(brace)
		if o, err = m.evaluate(cd, t, full); err != nil {
			return o, err
		}
		comp, tens := m.kneeBraceForces()
		next, u, ok := m.kneeBraceSection(length, comp, tens)
		o.braceLenMM, o.brace, o.braceUtil = length, next, u
		if !ok {
			o.pass, o.stage = false, "knee brace"
			return o, nil
		}
		if next.Designation == brace.Designation {
			return o, nil
		}
		brace = next
	}
	o.pass, o.stage = false, "knee brace section did not settle"
	return o, nil
}

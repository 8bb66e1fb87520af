package optimize

import (
	"crypto/sha256"
	"encoding/binary"
	"math"
	"slices"
	"sync"

	"github.com/spansweep/spansweep/checks/analysis"
	"github.com/spansweep/spansweep/checks/footing"
)

// Memo remembers the outcome of sub-searches whose inputs are exactly
// equal between cases of one sweep: cases of a range that differ only in a
// way a member group does not see (the number of bays, for the interior
// frame, once the purlins and girts are the same) pose that group the same
// problem. A hit replays the stored outcome, which depends on those inputs
// alone, so a design is the same with a Memo or without one, on any number
// of workers and in any order; only its time differs. A key is the SHA-256
// digest of the exact bits of every input the sub-search reads.
//
// A Memo is safe for concurrent use and bounded: each table keeps at most
// two generations of Limit entries, dropping the older generation when the
// newer fills, so a long sweep keeps the recent problems (neighbouring
// cases of a grid share the most) in constant memory.
type Memo struct {
	// Limit is the entries per generation of each table; 0 means 4,096
	// (a few kilobytes each).
	Limit int

	mu       sync.Mutex
	frames   memoTable[frameMemo]
	rechecks memoTable[frameMemo] // frame re-checks of the joint purlin choice
	footings memoTable[footingMemo]
	stats    MemoStats
}

// MemoStats counts a Memo's look-ups.
type MemoStats struct {
	FrameHits, FrameMisses     int
	RecheckHits, RecheckMisses int // frame re-checks under other purlins (joint.go)
	FootingHits, FootingMisses int
}

// Stats returns the look-ups so far.
func (mm *Memo) Stats() MemoStats {
	mm.mu.Lock()
	defer mm.mu.Unlock()
	return mm.stats
}

type memoKey [sha256.Size]byte

// memoTable is a two-generation map.
type memoTable[V any] struct{ cur, old map[memoKey]V }

func (t *memoTable[V]) get(k memoKey) (V, bool) {
	if v, ok := t.cur[k]; ok {
		return v, true
	}
	v, ok := t.old[k]
	return v, ok
}

func (t *memoTable[V]) put(k memoKey, v V, limit int) {
	if len(t.cur) >= limit {
		t.old, t.cur = t.cur, nil
	}
	if t.cur == nil {
		t.cur = make(map[memoKey]V)
	}
	t.cur[k] = v
}

func (mm *Memo) limit() int {
	if mm.Limit > 0 {
		return mm.Limit
	}
	return 4096
}

// frameMemo is a frame step's outcome: the chosen frame checked in full
// (without its check lists, which only a recorded calculation reads), and
// the analyses the search and the check spent, which a replay reports
// again so that Result.Analyses does not depend on the memo.
type frameMemo struct {
	accepted acceptedFrame
	analyses int
}

func (mm *Memo) frame(key memoKey) (frameMemo, bool) {
	return memoGet(mm, &mm.frames, key, &mm.stats.FrameHits, &mm.stats.FrameMisses)
}

// memoGet looks key up in table t of mm, counting the hit or the miss.
func memoGet[V any](mm *Memo, t *memoTable[V], key memoKey, hits, misses *int) (V, bool) {
	mm.mu.Lock()
	defer mm.mu.Unlock()
	v, ok := t.get(key)
	if ok {
		*hits++
	} else {
		*misses++
	}
	return v, ok
}

func (mm *Memo) storeFrame(key memoKey, f frameMemo) {
	slim(&f)
	mm.mu.Lock()
	defer mm.mu.Unlock()
	mm.frames.put(key, f, mm.limit())
}

// recheck looks up a frame re-check (designer.recheckFrame).
func (mm *Memo) recheck(key memoKey) (frameMemo, bool) {
	return memoGet(mm, &mm.rechecks, key, &mm.stats.RecheckHits, &mm.stats.RecheckMisses)
}

// recheckStore returns the store of frame re-checks, or nil for a nil Memo.
func (mm *Memo) recheckStore() func(memoKey, frameMemo) {
	if mm == nil {
		return nil
	}
	return func(key memoKey, f frameMemo) {
		slim(&f)
		mm.mu.Lock()
		defer mm.mu.Unlock()
		mm.rechecks.put(key, f, mm.limit())
	}
}

// recheckKey is frameKey with the pair a re-check checks: a different
// problem from the frame search of the same frame, so a different key.
func (m *frameModel) recheckKey(rafter, column string) memoKey {
	k := keyWriter{b: m.frameKeyBytes(make([]byte, 0, 8192))}
	k.s("re-check", rafter, column)
	return k.sum()
}

// slim drops the check lists of a stored frame: a replay reads the fly
// braces and the governing checks already taken from them.
func slim(f *frameMemo) {
	o := &f.accepted.o
	o.rafter = memberOutcome{fly: slices.Clone(o.rafter.fly)}
	o.column = memberOutcome{fly: slices.Clone(o.column.fly)}
}

// footingMemo is a pad design's outcome (checks/footing.Design is a pure
// function of the base's reactions and the options, which are fixed).
type footingMemo struct {
	f   footing.Footing
	err error
}

// footingKey is every input of a pad design: the base's name and reactions.
func footingKey(b *footing.Base) memoKey {
	var k keyWriter
	k.s(b.Name)
	for _, rs := range [2][]footing.Reaction{b.ULS, b.SLS} {
		k.i(len(rs))
		for _, r := range rs {
			k.s(r.Combination)
			k.f(r.VerticalKN, r.ShearKN, r.MomentKNm)
		}
	}
	return k.sum()
}

// designFooting is footing.Design with padOptions, through memo if set.
func designFooting(memo *Memo, b footing.Base) (footing.Footing, error) {
	if memo == nil {
		return footing.Design(b, &padOptions, nil)
	}
	key := footingKey(&b)
	f, ok := memoGet(memo, &memo.footings, key, &memo.stats.FootingHits, &memo.stats.FootingMisses)
	if ok {
		return f.f, f.err
	}
	f.f, f.err = footing.Design(b, &padOptions, nil)
	memo.mu.Lock()
	memo.footings.put(key, f, memo.limit())
	memo.mu.Unlock()
	return f.f, f.err
}

// keyWriter builds a memo key from exact values.
type keyWriter struct{ b []byte }

func (k *keyWriter) f(vs ...float64) {
	for _, v := range vs {
		k.b = binary.LittleEndian.AppendUint64(k.b, math.Float64bits(v))
	}
}

func (k *keyWriter) i(vs ...int) {
	for _, v := range vs {
		k.b = binary.LittleEndian.AppendUint64(k.b, uint64(v))
	}
}

func (k *keyWriter) bool(vs ...bool) {
	for _, v := range vs {
		if v {
			k.b = append(k.b, 1)
		} else {
			k.b = append(k.b, 0)
		}
	}
}

func (k *keyWriter) s(vs ...string) {
	for _, v := range vs {
		k.i(len(v))
		k.b = append(k.b, v...)
	}
}

func (k keyWriter) sum() memoKey { return sha256.Sum256(k.b) }

func (k *keyWriter) fs(vs []float64) {
	k.i(len(vs))
	k.f(vs...)
}

// frameKey is every input the frame search reads: the portal's geometry,
// restraint lines and base, its load cases and combinations, and the grid's
// frame options and limits. The catalogue is the Memo's own (Settings).
func (m *frameModel) frameKey() memoKey {
	return keyWriter{b: m.frameKeyBytes(make([]byte, 0, 8192))}.sum()
}

// frameKeyBytes appends frameKey's inputs to b.
func (m *frameModel) frameKeyBytes(b []byte) []byte {
	k := keyWriter{b: b}
	c := m.d.c
	g := &m.g
	k.s(c.Base)
	k.f(c.RoofPitchDeg, g.spanMM, g.heightMM, g.tributaryM)
	k.fs(g.purlinsMM)
	k.fs(g.girtsMM)
	mem := c.Options.Members
	k.s(mem.FrameFamilies...)
	k.bool(mem.SameRafterAndColumn, mem.KneeBraces)
	k.f(c.Options.Limits.EavesDriftRatio, c.Options.Limits.ApexDeflectionRatio)
	k.i(len(m.plain.cases))
	for _, lc := range m.plain.cases {
		writeLoadCase(&k, &lc)
	}
	k.i(len(m.combs))
	for i, cb := range m.combs {
		k.s(m.d.act.Combinations[i].Name)
		k.bool(m.hasW[i])
		k.i(len(cb))
		for _, t := range cb {
			k.i(t.Case)
			k.f(t.Factor)
		}
	}
	k.i(len(m.uls))
	k.i(m.uls...)
	return k.b
}

func writeLoadCase(k *keyWriter, lc *analysis.LoadCase) {
	k.s(lc.Name)
	k.f(lc.SelfWeight)
	k.i(len(lc.Nodal))
	for _, n := range lc.Nodal {
		k.i(n.Node)
		k.f(n.Fx, n.Fy, n.Mz)
	}
	k.i(len(lc.Members))
	for _, l := range lc.Members {
		k.i(l.Member, int(l.Axes))
		k.bool(l.Point, l.Projected)
		k.f(l.A, l.B, l.Qx, l.Qy)
	}
}

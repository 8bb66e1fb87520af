package optimize

import (
	"context"
	"reflect"
	"testing"

	"github.com/spansweep/spansweep/grids"
)

// TestMemoGivesTheSameDesigns designs the first 200 cases of the default
// grid (every bay count of 8 span, height and wind groups, so frames and
// pads repeat) without a memo, then through the engine with one memo on 2
// workers, and requires equal results, field for field, and that the memo
// replayed frames and footings (else the comparison proves nothing).
func TestMemoGivesTheSameDesigns(t *testing.T) {
	if testing.Short() {
		t.Skip("designs 400 cases")
	}
	g, err := grids.Default()
	if err != nil {
		t.Fatal(err)
	}
	var cases []grids.Case
	for c := range g.Cases() {
		if len(cases) == 200 {
			break
		}
		cases = append(cases, c)
	}
	want := make([]Result, len(cases))
	for i, c := range cases {
		want[i] = Design(c, nil)
	}
	memo := &Memo{}
	s := &Settings{Memo: memo}
	e := Engine{Workers: 2, Design: func(c grids.Case) Result { return Design(c, s) }}
	i := 0
	err = e.Run(context.Background(), func(yield func(grids.Case) bool) {
		for _, c := range cases {
			if !yield(c) {
				return
			}
		}
	}, func(r Result) error {
		if !reflect.DeepEqual(r, want[i]) {
			t.Errorf("case %s: with the memo %+v\nwithout %+v", r.Case.ID, r, want[i])
		}
		i++
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	st := memo.Stats()
	t.Logf("memo: %+v", st)
	if st.FrameHits == 0 || st.FootingHits == 0 || st.FrameHits+st.FrameMisses != len(cases) {
		t.Errorf("memo look-ups %+v: want frame hits and footing hits, and one frame look-up per case (%d)", st, len(cases))
	}
}

// TestMemoGenerations keeps at most two generations of Limit entries and
// finds entries of both.
func TestMemoGenerations(t *testing.T) {
	var tb memoTable[int]
	key := func(i int) memoKey { var k keyWriter; k.i(i); return k.sum() }
	for i := range 7 {
		tb.put(key(i), i, 3)
	}
	// Puts 0–2 filled a generation, 3–5 the next (0–2 kept as old), and 6
	// started a third (0–2 dropped).
	for i := range 7 {
		v, ok := tb.get(key(i))
		if want := i >= 3; ok != want || (ok && v != i) {
			t.Errorf("entry %d: got %d, %v; want present %v", i, v, ok, want)
		}
	}
	if n := len(tb.cur) + len(tb.old); n > 6 {
		t.Errorf("%d entries kept, want at most 2 × 3", n)
	}
}

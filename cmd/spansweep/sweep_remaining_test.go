package main

import (
	"path/filepath"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/grids"
)

// kept is a resumed part as the writer describes it.
type kept struct {
	rows, first, last int
	lastID            string
}

func (k kept) Rows() int          { return k.rows }
func (k kept) FirstIndex() int    { return k.first }
func (k kept) LastIndex() int     { return k.last }
func (k kept) LastCaseID() string { return k.lastID }

// TestRemaining: a resumed part that is the shard's prefix leaves the
// rest of the shard, in order; a part with a gap, a foreign start, too
// many rows or another last case is refused. The shard ranges are those of
// grids.Shard.Range on small.toml's 8 cases.
func TestRemaining(t *testing.T) {
	g, err := grids.LoadFile(filepath.Join(examplesDir, "small.toml"))
	if err != nil {
		t.Fatal(err)
	}
	second := grids.Shard{K: 2, N: 2}
	lo, hi := second.Range(g.Count())
	id := func(i int) string { return g.Case(i).ID }
	for _, tc := range []struct {
		name  string
		kept  kept
		first int    // first case left; -1: refused
		want  string // in the refusal
	}{
		{"nothing kept", kept{0, -1, -1, ""}, lo, ""},
		{"prefix of two", kept{2, lo, lo + 1, id(lo + 1)}, lo + 2, ""},
		{"whole shard", kept{hi - lo, lo, hi - 1, id(hi - 1)}, hi, ""},
		{"a gap", kept{2, lo, lo + 2, id(lo + 2)}, -1, "not a prefix"},
		{"another shard's cases", kept{2, 0, 1, id(1)}, -1, "not a prefix"},
		{"too many rows", kept{hi - lo + 1, lo, hi, ""}, -1, "not a prefix"},
		{"another last case", kept{2, lo, lo + 1, "s6-other"}, -1, "s6-other"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			todo, err := remaining(g, second, tc.kept)
			if tc.first < 0 {
				if err == nil || !strings.Contains(err.Error(), tc.want) {
					t.Errorf("got %v, want a refusal naming %q", err, tc.want)
				}
				return
			}
			if err != nil {
				t.Fatal(err)
			}
			next := tc.first
			for c := range todo {
				if c.Index != next || c.ID != id(next) {
					t.Fatalf("got case %d (%s), want %d (%s)", c.Index, c.ID, next, id(next))
				}
				next++
			}
			if next != hi {
				t.Errorf("the cases left end before %d, want before %d", next, hi)
			}
		})
	}
}

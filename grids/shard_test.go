package grids

import (
	"strings"
	"testing"
)

func TestParseShard(t *testing.T) {
	tests := []struct {
		in      string
		want    Shard
		wantErr string // substring; "" means no error
	}{
		{"1/3", Shard{1, 3}, ""},
		{"3/3", Shard{3, 3}, ""},
		{" 2/5 ", Shard{2, 5}, ""},
		{"4/3", Shard{}, "1 ≤ K ≤ N"},
		{"0/2", Shard{}, "1 ≤ K ≤ N"},
		{"1/0", Shard{}, "1 ≤ K ≤ N"},
		{"-1/2", Shard{}, "1 ≤ K ≤ N"},
		{"x", Shard{}, "K/N"},
		{"1/x", Shard{}, "K/N"},
		{"", Shard{}, "K/N"},
	}
	for _, tt := range tests {
		got, err := ParseShard(tt.in)
		switch {
		case tt.wantErr == "" && (err != nil || got != tt.want):
			t.Errorf("ParseShard(%q) = %v, %v; want %v", tt.in, got, err, tt.want)
		case tt.wantErr != "" && (err == nil || !strings.Contains(err.Error(), tt.wantErr) || !strings.Contains(err.Error(), strings.TrimSpace(tt.in))):
			t.Errorf("ParseShard(%q) error %v; want one naming the value and %q", tt.in, err, tt.wantErr)
		}
	}
}

func TestShardsPartitionTheGrid(t *testing.T) {
	g := mustParse(t, mixed)
	for _, n := range []int{1, 2, 3, 7, g.Count() + 5} {
		owner := make([]int, g.Count())
		next := 0 // shards concatenated in K order must be the enumeration order
		for k := 1; k <= n; k++ {
			for c := range g.ShardCases(Shard{K: k, N: n}) {
				if owner[c.Index] != 0 {
					t.Fatalf("N=%d: case %d in shards %d and %d", n, c.Index, owner[c.Index], k)
				}
				if c.Index != next {
					t.Fatalf("N=%d shard %d: got case %d, want %d", n, k, c.Index, next)
				}
				owner[c.Index] = k
				next++
			}
		}
		if next != g.Count() {
			t.Errorf("N=%d: shards cover %d of %d cases", n, next, g.Count())
		}
	}
}

func TestShardSizesDifferByAtMostOne(t *testing.T) {
	for _, total := range []int{0, 1, 10, 1680} {
		for _, n := range []int{1, 3, 4} {
			lo, hi := Shard{1, n}.Range(total)
			minSize, maxSize := hi-lo, hi-lo
			for k := 2; k <= n; k++ {
				lo, hi = Shard{k, n}.Range(total)
				minSize, maxSize = min(minSize, hi-lo), max(maxSize, hi-lo)
			}
			if maxSize-minSize > 1 {
				t.Errorf("total %d N %d: sizes from %d to %d", total, n, minSize, maxSize)
			}
		}
	}
}

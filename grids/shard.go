package grids

import (
	"fmt"
	"strconv"
	"strings"
)

// Shard is part K of N of a grid: a contiguous block of the enumeration, so
// each part stays in case order and the parts concatenated in K order are the
// whole run. The zero value means the whole grid (1/1).
type Shard struct {
	K, N int // 1 ≤ K ≤ N
}

// maxShards keeps K·total within int range.
const maxShards = 1_000_000

// ParseShard reads "K/N", e.g. "2/3".
func ParseShard(s string) (Shard, error) {
	ks, ns, ok := strings.Cut(strings.TrimSpace(s), "/")
	k, errK := strconv.Atoi(ks)
	n, errN := strconv.Atoi(ns)
	if !ok || errK != nil || errN != nil {
		return Shard{}, fmt.Errorf("grids: shard %q: want K/N with whole numbers, e.g. 2/3", s)
	}
	sh := Shard{K: k, N: n}
	if err := sh.Validate(); err != nil {
		return Shard{}, err
	}
	return sh, nil
}

// Validate checks 1 ≤ K ≤ N (the zero value is valid: the whole grid).
func (s Shard) Validate() error {
	if s == (Shard{}) {
		return nil
	}
	if s.N < 1 || s.K < 1 || s.K > s.N || s.N > maxShards {
		return fmt.Errorf("grids: shard %d/%d: allowed 1 ≤ K ≤ N ≤ %d", s.K, s.N, maxShards)
	}
	return nil
}

// String returns "K/N".
func (s Shard) String() string {
	if s == (Shard{}) {
		return "1/1"
	}
	return fmt.Sprintf("%d/%d", s.K, s.N)
}

// Range returns the half-open index range [lo, hi) of the shard in a grid of
// total cases: lo = ⌊(K−1)·total/N⌋, hi = ⌊K·total/N⌋. Parts differ in size
// by at most one case. It panics on an invalid shard.
func (s Shard) Range(total int) (lo, hi int) {
	if err := s.Validate(); err != nil {
		panic(err)
	}
	if s == (Shard{}) {
		return 0, total
	}
	return (s.K - 1) * total / s.N, s.K * total / s.N
}

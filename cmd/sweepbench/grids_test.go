package main

import (
	"path/filepath"
	"reflect"
	"testing"

	"github.com/spansweep/spansweep/grids"
)

// The scale-test grids parse, hold the case counts their comments state and
// differ only in their lengths, so two runs compare peak memory against grid
// size alone (DESIGN.md §8; issue 10 asks for at least 1,000,000 cases).
func TestLargeGrids(t *testing.T) {
	load := func(name string) *grids.Grid {
		g, err := grids.LoadFile(filepath.Join("..", "..", "testdata", "examples", name))
		if err != nil {
			t.Fatal(err)
		}
		return g
	}
	small, large := load("large-250k.toml"), load("large-1m.toml")
	// 10 AS 4055 housing classes + 6 sites; spans 6 to 16 m by 0.25 (41);
	// eaves 2.4 to 6 m by 0.15 (25); 4 bay spacings × 4 or 16 bay counts.
	tests := []struct {
		name string
		g    *grids.Grid
		want int
	}{
		{"large-250k", small, 16 * 41 * 25 * 4 * 4}, // 262,400
		{"large-1m", large, 16 * 41 * 25 * 4 * 16},  // 1,049,600
	}
	for _, tt := range tests {
		if got := tt.g.Count(); got != tt.want {
			t.Errorf("%s: got %d cases, want %d", tt.name, got, tt.want)
		}
		if n := len(tt.g.Winds); n != 16 {
			t.Errorf("%s: got %d wind conditions, want 16", tt.name, n)
		}
	}
	if large.Count() < 1_000_000 {
		t.Errorf("large-1m has %d cases, want at least 1,000,000", large.Count())
	}
	same := []struct {
		name string
		a, b any
	}{
		{"winds", small.Winds, large.Winds},
		{"spans", small.SpansM, large.SpansM},
		{"eaves heights", small.EavesHeightsM, large.EavesHeightsM},
		{"pitches", small.RoofPitchesDeg, large.RoofPitchesDeg},
		{"options", small.Options, large.Options},
	}
	for _, s := range same {
		if !reflect.DeepEqual(s.a, s.b) {
			t.Errorf("%s differ between the two grids; want only the lengths to differ", s.name)
		}
	}
}

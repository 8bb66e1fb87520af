package grids

import (
	"errors"
	"os"
	"path/filepath"
	"testing"
	"time"
)

// FuzzParse checks that Parse never panics, and that it returns either a
// grid whose every case can be built or a *ValidationError.
func FuzzParse(f *testing.F) {
	f.Add([]byte(minimal))
	f.Add([]byte(mixed))
	f.Add(defaultTOML)
	if files, err := filepath.Glob(filepath.Join(examplesDir, "*.toml")); err == nil {
		for _, p := range files {
			if data, err := os.ReadFile(p); err == nil {
				f.Add(data)
			}
		}
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		start := time.Now()
		g, err := Parse(data, "fuzz.toml")
		if d := time.Since(start); d > 2*time.Second {
			t.Fatalf("Parse took %v on %q", d, data)
		}
		if err != nil {
			var ve *ValidationError
			if !errors.As(err, &ve) || len(ve.Problems) == 0 {
				t.Fatalf("got error %v, want a *ValidationError with problems", err)
			}
			return
		}
		if n := g.Count(); n > 0 {
			_ = g.Case(0)
			_ = g.Case(n - 1)
		}
	})
}

package main

import (
	"fmt"
	"strings"
	"testing"

	"github.com/spansweep/spansweep/catalog"
	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/optimize"
)

// The design steps run in order (purlins, girts, frame, bracing, end walls,
// footings) and stop at the first member group without a candidate. Each
// stage below gives Design a catalogue (and member families) that leave the
// next step nothing to try, so it times optimize.Design up to and including
// one step: the purlin search, then the girts, then the frame search, then
// the whole case. The frame search alone is the "frame" time less the
// "girts" time. Run: go test ./cmd/sweepbench -run '^$' -bench . -benchtime 3x
type benchStage struct {
	name          string
	shapes        []catalog.Shape // the catalogue: the embedded sections of these shapes
	girt, frame   string          // members.girt_families and frame_families
	stopsAtPrefix string          // the reason must name this group; "" means the case is designed through
}

var benchStages = []benchStage{
	{"purlins", []catalog.Shape{catalog.ShapeZ}, `"C"`, `"C", "2C"`, "girt:"},
	{"girts", []catalog.Shape{catalog.ShapeZ, catalog.ShapeC}, `"Z", "C"`, `"2C"`, "rafter:"},
	{"frame", []catalog.Shape{catalog.ShapeZ, catalog.ShapeC, catalog.Shape2C}, `"Z", "C"`, `"C", "2C"`, "roof_bracing:"},
	{"case", nil, `"Z", "C"`, `"C", "2C"`, ""},
}

// benchCases are two sizes of the default range (illustrative): a small
// shed in N2 and a large one in N3.
var benchCases = []struct{ name, geometry, class string }{
	{"9m-N2", "span_m = [9.0]\nbays = [4]\nbay_spacing_m = [3.6]\neaves_height_m = [3.0]", "N2"},
	{"15m-N3", "span_m = [15.0]\nbays = [5]\nbay_spacing_m = [3.6]\neaves_height_m = [3.9]", "N3"},
}

func (s benchStage) catalogue() *catalog.Catalogue {
	if s.shapes == nil {
		return catalog.Default()
	}
	c := &catalog.Catalogue{Name: "bench " + s.name, HashSHA256: "bench-" + s.name}
	for _, sec := range catalog.Default().Sections {
		for _, sh := range s.shapes {
			if sec.Shape == sh {
				c.Sections = append(c.Sections, sec)
			}
		}
	}
	return c
}

func (s benchStage) benchCase(b *testing.B, geometry, class string) grids.Case {
	text := fmt.Sprintf("[geometry]\n%s\nroof_pitch_deg = [10]\n[wind]\nhousing_classes = [%q]\n[members]\npurlin_families = [\"Z\"]\ngirt_families = [%s]\nframe_families = [%s]\n",
		geometry, class, s.girt, s.frame)
	g, err := grids.Parse([]byte(text), "bench.toml")
	if err != nil {
		b.Fatal(err)
	}
	return g.Case(0)
}

// checkStop fails b unless the design stopped where the stage intends, so
// a stage never silently times something else.
func (s benchStage) checkStop(b *testing.B, r optimize.Result) {
	switch {
	case s.stopsAtPrefix == "" && r.Status != optimize.OK:
		b.Fatalf("%s: got %s (%s), want a full design", s.name, r.Status, r.Reason)
	case s.stopsAtPrefix != "" && !strings.HasPrefix(r.Reason, s.stopsAtPrefix):
		b.Fatalf("%s: got %s %q, want it to stop at %q", s.name, r.Status, r.Reason, s.stopsAtPrefix)
	}
}

func BenchmarkDesignUpTo(b *testing.B) {
	for _, s := range benchStages {
		settings := &optimize.Settings{Catalogue: s.catalogue()}
		for _, bc := range benchCases {
			b.Run(s.name+"/"+bc.name, func(b *testing.B) {
				c := s.benchCase(b, bc.geometry, bc.class)
				var r optimize.Result
				for b.Loop() {
					r = optimize.Design(c, settings)
				}
				s.checkStop(b, r)
				b.ReportMetric(float64(r.Analyses), "analyses/op")
			})
		}
	}
}

// BenchmarkEngine designs 20 evenly spaced cases of the default grid on the
// engine with 1 and 2 workers, as sweep does.
func BenchmarkEngine(b *testing.B) {
	g, err := grids.Default()
	if err != nil {
		b.Fatal(err)
	}
	cases := sampleCases(g, 20)
	for _, w := range []int{1, 2} {
		b.Run(fmt.Sprintf("workers=%d", w), func(b *testing.B) {
			for b.Loop() {
				run, _, _ := timeCases(cases, catalog.Default(), w, true)
				b.ReportMetric(run.CasesPerS, "cases/s")
			}
		})
	}
}

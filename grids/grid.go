package grids

import (
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"fmt"
	"math"
	"os"
	"slices"

	"github.com/BurntSushi/toml"
)

// Base fixities of the column bases.
const (
	BasePinned = "pinned"
	BaseFixed  = "fixed"
)

// maxCases caps a grid's case count: beyond it a grid is far more likely a
// typing mistake than a product range.
const maxCases = 100_000_000

// Length is one building length: n equal bays at a spacing.
type Length struct {
	LengthM     float64 `json:"length_m"`
	Bays        int     `json:"bays"`
	BaySpacingM float64 `json:"bay_spacing_m"`
}

// Grid is a validated grid file: the values of every dimension, in
// enumeration order, and the options shared by its cases.
type Grid struct {
	File       string // file name given to Parse
	Name       string // the file's name key
	HashSHA256 string // sha256 of the file bytes, lower-case hex

	Winds          []Wind
	EavesHeightsM  []float64
	SpansM         []float64
	Lengths        []Length
	RoofPitchesDeg []float64
	Bases          []string // BasePinned, BaseFixed
	HoistsKN       []float64

	Options Options
}

// Parse validates a grid file's bytes. filename names the file in problems.
// Any problem gives a *ValidationError listing all of them.
func Parse(data []byte, filename string) (*Grid, error) {
	var doc map[string]any
	if _, err := toml.Decode(string(data), &doc); err != nil {
		return nil, syntaxError(filename, err)
	}
	r := &reader{file: filename, lines: keyLines(data)}
	g := r.readGrid(doc)
	if len(r.problems) > 0 {
		return nil, &ValidationError{Problems: r.sorted()}
	}
	sum := sha256.Sum256(data)
	g.File, g.HashSHA256 = filename, hex.EncodeToString(sum[:])
	return g, nil
}

// LoadFile reads and parses a grid file.
func LoadFile(path string) (*Grid, error) {
	data, err := os.ReadFile(path)
	if err != nil {
		return nil, fmt.Errorf("grids: %w", err)
	}
	return Parse(data, path)
}

// syntaxError turns a TOML parse failure into a one-problem ValidationError.
func syntaxError(file string, err error) error {
	p := Problem{File: file, Key: "(syntax)", Allowed: "TOML syntax: " + err.Error()}
	var pe toml.ParseError
	if errors.As(err, &pe) {
		p.Line, p.Allowed = pe.Position.Line, "TOML syntax: "+pe.Message
		if pe.LastKey != "" {
			p.Key = pe.LastKey
		}
	}
	return &ValidationError{Problems: []Problem{p}}
}

// readGrid reads every section of the document.
func (r *reader) readGrid(doc map[string]any) *Grid {
	r.checkKeys(doc, "")
	g := &Grid{Name: r.str(doc, "", "name", "", false, nil), Options: defaultOptions()}
	r.readGeometry(doc, g)
	g.Winds = r.readWind(doc)
	r.readFrame(doc, g)
	r.readOptions(doc, g)
	if len(r.problems) == 0 && g.count() > maxCases {
		r.add("geometry", nil, fmt.Sprintf("the grid has %.4g cases; at most %d allowed (split it into several files)", g.count(), maxCases))
	}
	return g
}

func (r *reader) readGeometry(doc map[string]any, g *Grid) {
	geo, ok := r.table(doc, "", "geometry")
	if !ok {
		geo = map[string]any{}
	}
	dim := func(name string) []float64 {
		v, ok := r.numbers(geo, "geometry", name)
		if !ok {
			r.missing("geometry." + name)
		}
		return v
	}
	g.SpansM = dim("span_m")
	g.EavesHeightsM = dim("eaves_height_m")
	g.RoofPitchesDeg = dim("roof_pitch_deg")
	g.Lengths = r.readLengths(geo)
}

// readLengths reads length_m (with max_bay_spacing_m) or bays × bay_spacing_m.
func (r *reader) readLengths(geo map[string]any) []Length {
	lengths, hasL := r.numbers(geo, "geometry", "length_m")
	bays, hasB := r.ints(geo, "geometry", "bays")
	spacings, hasS := r.numbers(geo, "geometry", "bay_spacing_m")
	maxBay := r.number(geo, "geometry", "max_bay_spacing_m", 6, false)
	var out []Length
	switch {
	case hasL && (hasB || hasS):
		r.add("geometry.length_m", geo["length_m"], "give either length_m or bays with bay_spacing_m, not both")
	case hasL:
		for _, l := range lengths {
			n := int(math.Ceil(l/maxBay - 1e-9))
			out = append(out, Length{LengthM: l, Bays: n, BaySpacingM: round6(l / float64(n))})
		}
	case hasB && hasS:
		if _, ok := geo["max_bay_spacing_m"]; ok {
			r.add("geometry.max_bay_spacing_m", geo["max_bay_spacing_m"], "applies only with length_m; remove it or give length_m")
		}
		lb := specFor("geometry.length_m").Bounds
		for _, s := range spacings {
			for _, n := range bays {
				l := round6(float64(n) * s)
				if !lb.contains(l) {
					r.add("geometry.bays", float64(n), fmt.Sprintf("%d bays × %s m = %s m; length allowed %s", n, fmtNum(s), fmtNum(l), lb))
					continue
				}
				out = append(out, Length{LengthM: l, Bays: n, BaySpacingM: s})
			}
		}
	case hasB:
		r.missing("geometry.bay_spacing_m")
	case hasS:
		r.missing("geometry.bays")
	default:
		r.missing("geometry.length_m")
	}
	return out
}

func (r *reader) readFrame(doc map[string]any, g *Grid) {
	f, _ := r.table(doc, "", "frame")
	switch r.str(f, "frame", "base", "pinned", false, []string{"pinned", "fixed", "both"}) {
	case "fixed":
		g.Bases = []string{BaseFixed}
	case "both":
		g.Bases = []string{BasePinned, BaseFixed}
	default:
		g.Bases = []string{BasePinned}
	}
	g.HoistsKN = []float64{0}
	if h, ok := r.numbers(f, "frame", "hoist_kn"); ok {
		g.HoistsKN = h
	}
}

// count is the number of cases as a float, safe from overflow.
func (g *Grid) count() float64 {
	n := 1.0
	for _, l := range g.sizes() {
		n *= float64(l)
	}
	return n
}

// sizes are the dimension lengths in enumeration order, outermost first.
func (g *Grid) sizes() [7]int {
	return [7]int{len(g.Winds), len(g.EavesHeightsM), len(g.SpansM), len(g.Lengths),
		len(g.RoofPitchesDeg), len(g.Bases), len(g.HoistsKN)}
}

// WindKeys lists the wind conditions' keys in enumeration order.
func (g *Grid) WindKeys() []string {
	keys := make([]string, len(g.Winds))
	for i, w := range g.Winds {
		keys[i] = w.Key()
	}
	return slices.Clip(keys)
}

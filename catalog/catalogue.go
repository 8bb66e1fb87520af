package catalog

import (
	_ "embed"
	"sort"
	"strings"
	"sync"
)

// Catalogue is a named list of sections with the SHA-256 of the file they
// came from, so every result can name the exact dataset it used.
type Catalogue struct {
	Name       string
	Sections   []Section // in file order
	HashSHA256 string    // hex SHA-256 of the CSV bytes
}

//go:embed rs_sections.csv
var defaultCSV []byte

// DefaultName is the embedded catalogue's name in messages and outputs.
const DefaultName = "embedded:rs_sections.csv"

var (
	defaultOnce sync.Once
	defaultCat  *Catalogue
)

// Default returns the embedded catalogue of Ridgeline Sheds' illustrative
// "RS" series, parsed once. Callers must not modify it. It panics if the
// embedded file is bad, which a test rules out.
func Default() *Catalogue {
	defaultOnce.Do(func() {
		c, err := parse(defaultCSV, DefaultName)
		if err != nil {
			panic(err)
		}
		defaultCat = c
	})
	return defaultCat
}

// DefaultCSV returns a copy of the embedded catalogue's bytes, a template
// for a maker's own file.
func DefaultCSV() []byte { return append([]byte(nil), defaultCSV...) }

// ByShape returns the sections of one shape, lightest first (ties by
// designation), in a new slice.
func (c *Catalogue) ByShape(s Shape) []Section {
	var out []Section
	for _, sec := range c.Sections {
		if sec.Shape == s {
			out = append(out, sec)
		}
	}
	sort.SliceStable(out, func(i, j int) bool {
		if out[i].MassKgPerM != out[j].MassKgPerM {
			return out[i].MassKgPerM < out[j].MassKgPerM
		}
		return out[i].Designation < out[j].Designation
	})
	return out
}

// Find returns the section with a designation, ignoring case.
func (c *Catalogue) Find(designation string) (Section, bool) {
	for _, sec := range c.Sections {
		if strings.EqualFold(sec.Designation, designation) {
			return sec, true
		}
	}
	return Section{}, false
}

package report

import (
	"errors"
	"fmt"

	"github.com/spansweep/spansweep/optimize"
)

// Report is one designed case and the provenance its Inputs section states.
type Report struct {
	// Result is the design. Its Calculation (optimize.Settings.Record) gives
	// the working; without it the report has the summary, inputs, schedule,
	// footings and bill, and says the working was not recorded.
	Result *optimize.Result
	// Title heads the report; empty means "Calculation report".
	Title string
	// Catalogue names the section catalogue and its SHA-256, e.g.
	// "embedded:rs_sections.csv (sha256 1f0c…)".
	Catalogue string
	// OptionsSource says where the case's shared options came from, e.g.
	// "grid file range.toml" or "grid defaults".
	OptionsSource string
	// Version is the program version; empty leaves it out.
	Version string
}

// errNoResult is returned for a Report without a Result.
var errNoResult = errors.New("report: no result to report")

// SectionHeadings lists the report's section headings in order, for
// readers and tests that look for them.
var SectionHeadings = []string{
	"Summary", "Inputs", "Wind derivation", "Wind pressures by zone", "Load cases and combinations",
	"Member schedule", "Frame analysis", "Member checks", "Deflections", "Footings",
	"Bill summary", "Standards and editions",
}

// build assembles the document; every section builder gets the same
// Report and appends its blocks.
func (r Report) build() (*document, error) {
	if r.Result == nil {
		return nil, errNoResult
	}
	title := r.Title
	if title == "" {
		title = "Calculation report"
	}
	builders := []func(*section){
		r.summary, r.inputs, r.windDerivation, r.pressures, r.loadCases,
		r.schedule, r.frameAnalysis, r.checks, r.deflections, r.footings,
		r.bill, r.standards,
	}
	d := &document{title: fmt.Sprintf("%s: case %s", title, r.Result.Case.ID)}
	for i, b := range builders {
		s := section{id: anchor(SectionHeadings[i]), heading: fmt.Sprintf("%d. %s", i+1, SectionHeadings[i])}
		b(&s)
		d.sections = append(d.sections, s)
	}
	return d, nil
}

// calc returns the recorded working, or nil.
func (r Report) calc() *optimize.Calculation { return r.Result.Calculation }

// notRecorded is the paragraph of a section whose working was not kept.
const notRecorded = "Not recorded: the design was run without keeping its calculation (optimize.Settings.Record)."

// anchor turns a heading into an HTML id: lower case, spaces to hyphens.
func anchor(heading string) string {
	b := []byte(heading)
	out := b[:0]
	for _, c := range b {
		switch {
		case c >= 'A' && c <= 'Z':
			out = append(out, c+'a'-'A')
		case c >= 'a' && c <= 'z', c >= '0' && c <= '9':
			out = append(out, c)
		case c == ' ':
			out = append(out, '-')
		}
	}
	return string(out)
}

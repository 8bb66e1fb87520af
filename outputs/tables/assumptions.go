package tables

// Caution is printed at the top and bottom of every table page.
const Caution = "CAUTION: spansweep is a design aid. Verify every design for its site with a qualified structural engineer; local codes and licensed practice govern."

// Assumptions is the header text of a table page, supplied by the caller
// (the grid and catalogue know it; this package does not). Empty fields
// and lists are left out.
type Assumptions struct {
	Title     string // page title, e.g. "Ridgeline Sheds Pty Ltd: gable sheds (illustrative)"
	Maker     string // e.g. "Ridgeline Sheds Pty Ltd (fictional)"
	Generated string // a date or run label; passed in so output stays reproducible
	Version   string // program version
	Grid      string // grid file name and content hash
	Catalogue string // catalogue name and content hash

	Standards   []string // standards and editions, e.g. "AS/NZS 1170.2:2021 Wind actions"
	Defaults    []string // e.g. "roof cladding 0.05 kPa", "purlin spacing at most 1.5 m"
	LimitStates []string // e.g. "rafter deflection under G+Ws ≤ span/150"
	Notes       []string // anything else the page must say
}

// StandardNotes are the reading notes every page carries after the
// caller's assumptions: what a cell shows, what the marks mean.
func (s *Set) StandardNotes() []string { return standardNotes(s.varying(), s.marks()) }

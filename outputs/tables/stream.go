package tables

import (
	"fmt"
	"io"
	"sort"

	"github.com/spansweep/spansweep/optimize"
)

// Stream builds the same span tables as an Accumulator, byte for byte, in
// memory that does not grow with the number of cases: it takes results
// grouped by wind condition and eaves height, as a grid enumerates them
// (wind condition outermost, then eaves height), holds only the cells of
// the current group, and when the group changes renders its tables to a
// spool file and forgets them. What the whole page needs (titles naming
// what varies, the notes on marks used, the table order) is a few facts
// per table. The spool is removed by Close.
type Stream struct {
	opt       Options
	spool     *spool
	cur       *Accumulator // the current group's tables; nil between groups
	curGroup  group
	finished  map[group]bool
	windFirst map[string]int // lowest case index per wind condition
	tables    []spooledTable
	vary      varying
	marks     marks
}

// group is the run of cases a Stream holds at once.
type group struct {
	wind         string
	eavesHeightM float64
}

// spooledTable is a finished table: its key and its bodies in the spool.
type spooledTable struct {
	key  Key
	body [numFormats]extent
}

// NewStream returns an empty stream whose spool file is made in spoolDir
// (created if needed; "" is the system's temporary directory).
func NewStream(opt Options, spoolDir string) (*Stream, error) {
	if opt.WindLabel == nil {
		opt.WindLabel = windLabel
	}
	sp, err := newSpool(spoolDir)
	if err != nil {
		return nil, err
	}
	return &Stream{
		opt: opt, spool: sp,
		finished:  map[group]bool{},
		windFirst: map[string]int{},
		marks:     marks{enveloped: opt.Envelope},
	}, nil
}

// Add takes one result. Results of one wind condition and eaves height
// must come together: a result for a group already finished is an error.
func (s *Stream) Add(r *optimize.Result) error {
	c := r.Case
	if err := checkDimensions(c); err != nil {
		return fmt.Errorf("span tables: case %s: %w", c.ID, err)
	}
	g := group{wind: s.opt.WindLabel(c), eavesHeightM: c.EavesHeightM}
	if s.cur == nil || g != s.curGroup {
		if err := s.finishGroup(); err != nil {
			return err
		}
		if s.finished[g] {
			return fmt.Errorf("span tables: case %s: the tables of wind %s, eaves height %g m were finished before it arrived; "+
				"a Stream takes results grouped by wind condition and eaves height, as the grid enumerates them (an Accumulator takes any order)",
				c.ID, g.wind, g.eavesHeightM)
		}
		s.cur, s.curGroup = NewAccumulator(s.opt), g
	}
	if first, ok := s.windFirst[g.wind]; !ok || c.Index < first {
		s.windFirst[g.wind] = c.Index
	}
	return s.cur.Add(r)
}

// finishGroup renders the current group's tables to the spool and drops
// them.
func (s *Stream) finishGroup() error {
	if s.cur == nil {
		return nil
	}
	for _, t := range s.cur.build() {
		st := spooledTable{key: t.Key}
		for f := range numFormats {
			e, err := s.spool.add(func(w io.Writer) error { return renderBody(w, f, &t) })
			if err != nil {
				return err
			}
			st.body[f] = e
		}
		s.vary.note(t.Key)
		s.marks.note(&t)
		s.tables = append(s.tables, st)
	}
	s.finished[s.curGroup] = true
	s.cur = nil
	return nil
}

// bodies finishes the current group and returns every table in Set order,
// each writing its spooled body.
func (s *Stream) bodies() ([]tableBody, error) {
	if err := s.finishGroup(); err != nil {
		return nil, err
	}
	sort.Slice(s.tables, func(i, j int) bool { return keyLess(s.windFirst, s.tables[i].key, s.tables[j].key) })
	out := make([]tableBody, len(s.tables))
	for i := range s.tables {
		st := &s.tables[i]
		out[i] = tableBody{key: st.key, write: func(w io.Writer, f format) error { return s.spool.copyTo(w, st.body[f]) }}
	}
	return out, nil
}

// Tables returns the number of tables finished so far.
func (s *Stream) Tables() int { return len(s.tables) }

// WriteCSV writes the tables as Set.WriteCSV does.
func (s *Stream) WriteCSV(w io.Writer) error {
	b, err := s.bodies()
	if err != nil {
		return err
	}
	return writeCSVPage(w, b)
}

// WriteMarkdown writes the page as Set.WriteMarkdown does.
func (s *Stream) WriteMarkdown(w io.Writer, a Assumptions) error {
	b, err := s.bodies()
	if err != nil {
		return err
	}
	return writeMarkdownPage(w, a, s.vary, s.marks, b)
}

// WriteHTML writes the page as Set.WriteHTML does.
func (s *Stream) WriteHTML(w io.Writer, a Assumptions, paper Paper) error {
	b, err := s.bodies()
	if err != nil {
		return err
	}
	return writeHTMLPage(w, a, paper, s.vary, s.marks, b)
}

// Close removes the spool file. The stream writes nothing after it.
func (s *Stream) Close() error {
	if err := s.spool.remove(); err != nil {
		return fmt.Errorf("span tables: spool: %w", err)
	}
	return nil
}

// heldCells counts the cells the stream holds in memory (the current
// group's); the tests check it stays within one group.
func (s *Stream) heldCells() int {
	if s.cur == nil {
		return 0
	}
	return s.cur.cells()
}

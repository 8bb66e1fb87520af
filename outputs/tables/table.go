package tables

// Table is one span table: rows of span, columns of length.
type Table struct {
	Key     Key
	SpansM  []float64 // row headings, ascending
	Columns []Column  // column headings, ascending length
	// Cells[i][j] is the building of span SpansM[i] and Columns[j]; nil
	// where the grid has no such size.
	Cells [][]*Cell
}

// Set is every table of a sweep, ready to write.
type Set struct {
	Tables    []Table
	Enveloped bool // the envelope was applied
	// Which key fields differ between tables; titles name only those,
	// and the page header states the fixed ones once.
	VariesPitch, VariesBase, VariesHoist bool
}

func (s *Set) noteVarying() {
	var v varying
	for i := range s.Tables {
		v.note(s.Tables[i].Key)
	}
	s.VariesPitch, s.VariesBase, s.VariesHoist = v.pitch, v.base, v.hoist
}

// varying is the set's Varies fields as the page writers read them.
func (s *Set) varying() varying {
	v := varying{tables: len(s.Tables), pitch: s.VariesPitch, base: s.VariesBase, hoist: s.VariesHoist}
	if len(s.Tables) > 0 {
		v.first = s.Tables[0].Key
	}
	return v
}

// marks reports which cell marks the set's tables use.
func (s *Set) marks() marks {
	m := marks{enveloped: s.Enveloped}
	for i := range s.Tables {
		m.note(&s.Tables[i])
	}
	return m
}

// Title names a table by its wind condition, eaves height and whichever of
// pitch, base and hoist vary across the set.
func (s *Set) Title(t *Table) string { return s.varying().title(t.Key) }

// Fixed lists the key fields shared by every table, for the page header.
func (s *Set) Fixed() []string { return s.varying().fixed() }

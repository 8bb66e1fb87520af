package dataset

import (
	"errors"
	"fmt"
	"io"
	"slices"

	"github.com/parquet-go/parquet-go"

	"github.com/spansweep/spansweep/optimize"
)

// RowRef locates one row of the dataset, for ReadRow.
type RowRef struct {
	part, group, row int
}

// ScanColumns is Scan decoding only the named columns and those of the
// filter; the Row passed to fn has every other field zero (and Members nil
// when no member column is named). It reads a
// fraction of each row group when few columns are named, so a lookup can
// choose a case from a large dataset quickly and then ReadRow it whole.
// The Row is reused: fn must Clone it to keep it.
func (d *Dataset) ScanColumns(f Filter, names []string, fn func(r *Row, ref RowRef) error) (ScanStats, error) {
	var st ScanStats
	bs, err := f.resolve()
	if err != nil {
		return st, err
	}
	cols, err := projection(bs, names)
	if err != nil {
		return st, err
	}
	var rows []Row
	for pi := range d.files {
		p, done, err := d.piece(pi)
		if err != nil {
			return st, err
		}
		rows, err = p.scanColumns(pi, bs, cols, rows, &st, fn)
		done()
		if err != nil {
			return st, err
		}
	}
	return st, nil
}

// scanColumns is ScanColumns over the row groups of part pi, decoding into
// rows (reused) and returning them.
func (p *part) scanColumns(pi int, bs []boundIndex, cols []int, rows []Row, st *ScanStats, fn func(r *Row, ref RowRef) error) ([]Row, error) {
	for gi, g := range p.pf.RowGroups() {
		st.RowGroups++
		if !p.mayMatch(bs, g) {
			continue
		}
		st.RowGroupsRead++
		var err error
		if rows, err = p.readColumns(g, cols, rows); err != nil {
			return rows, err
		}
		for ri := range rows {
			if !matchRow(bs, &rows[ri]) {
				continue
			}
			st.RowsMatched++
			if err := fn(&rows[ri], RowRef{pi, gi, ri}); err != nil {
				return rows, err
			}
		}
	}
	return rows, nil
}

// projection resolves the column names to decode: the named ones and the
// filter's.
func projection(bs []boundIndex, names []string) ([]int, error) {
	var cols []int
	for _, n := range names {
		c, ok := columnByName[n]
		if !ok {
			return nil, fmt.Errorf("dataset: unknown column %q", n)
		}
		cols = append(cols, c)
	}
	for _, b := range bs {
		cols = append(cols, b.col)
	}
	slices.Sort(cols)
	return slices.Compact(cols), nil
}

// readColumns decodes the given columns of row group g into rows, reusing
// its storage; other fields are zeroed.
func (p *part) readColumns(g parquet.RowGroup, cols []int, rows []Row) ([]Row, error) {
	n := int(g.NumRows())
	if cap(rows) < n {
		rows = make([]Row, n)
	}
	rows = rows[:n]
	members := slices.ContainsFunc(cols, func(c int) bool { return c >= len(caseColumns) && c < len(columns)-len(tailColumns) })
	for i := range rows {
		rows[i] = rowInto(rows[i].Members, members)
	}
	chunks := g.ColumnChunks()
	for _, c := range cols {
		if err := readChunk(chunks[p.oursToFile[c]], c, rows); err != nil {
			return nil, fmt.Errorf("dataset: %s: column %s: %w", p.path, columns[c].name, err)
		}
	}
	return rows, nil
}

// rowInto returns a zero Row reusing a Members slice of the right length;
// without member columns to decode, Members stays as it is (zeroed).
func rowInto(members []Member, needMembers bool) Row {
	switch {
	case len(members) == len(optimize.Roles):
		clear(members)
		return Row{Members: members}
	case needMembers:
		return NewRow()
	}
	return Row{}
}

// readChunk sets column c of rows from every value of a column chunk.
func readChunk(cc parquet.ColumnChunk, c int, rows []Row) error {
	pages := cc.Pages()
	defer pages.Close()
	buf := make([]parquet.Value, 512)
	i := 0
	for {
		page, err := pages.ReadPage()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			return err
		}
		vr := page.Values()
		for {
			k, err := vr.ReadValues(buf)
			for _, v := range buf[:k] {
				if i >= len(rows) {
					parquet.Release(page)
					return fmt.Errorf("more values than the row group's %d rows", len(rows))
				}
				setValue(&rows[i], c, v) // copies byte arrays before the page is released
				i++
			}
			if errors.Is(err, io.EOF) {
				break
			}
			if err != nil {
				parquet.Release(page)
				return err
			}
		}
		parquet.Release(page)
	}
	if i != len(rows) {
		return fmt.Errorf("%d values for %d rows", i, len(rows))
	}
	return nil
}

// ReadRow decodes the whole row at ref.
func (d *Dataset) ReadRow(ref RowRef) (Row, error) {
	if ref.part < 0 || ref.part >= len(d.files) {
		return Row{}, fmt.Errorf("dataset: row reference %+v out of range", ref)
	}
	p, done, err := d.piece(ref.part)
	if err != nil {
		return Row{}, err
	}
	defer done()
	groups := p.pf.RowGroups()
	if ref.group >= len(groups) || int64(ref.row) >= groups[ref.group].NumRows() {
		return Row{}, fmt.Errorf("dataset: row reference %+v out of range", ref)
	}
	rows := groups[ref.group].Rows()
	defer rows.Close()
	if err := rows.SeekToRow(int64(ref.row)); err != nil {
		return Row{}, fmt.Errorf("dataset: %s: seek: %w", p.path, err)
	}
	buf := make([]parquet.Row, 1)
	if n, err := rows.ReadRows(buf); n != 1 {
		return Row{}, fmt.Errorf("dataset: %s: read row %+v: %w", p.path, ref, err)
	}
	r := NewRow()
	decode(&r, buf[0], p.fileToOurs)
	return r, nil
}

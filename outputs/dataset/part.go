package dataset

import (
	"errors"
	"fmt"
	"io"
	"os"

	"github.com/parquet-go/parquet-go"
)

// part is one open part file and the mapping of its leaf columns to ours.
type part struct {
	path       string
	f          *os.File
	pf         *parquet.File
	fileToOurs []int // file leaf index → index in columns, or -1
	oursToFile []int // index in columns → file leaf index
}

// openPart opens a part file and checks its schema version and columns.
func openPart(path string) (*part, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, fmt.Errorf("dataset: %w", err)
	}
	st, err := f.Stat()
	if err != nil {
		f.Close()
		return nil, fmt.Errorf("dataset: %w", err)
	}
	// Scans read rows in order and skip row groups by the column chunks'
	// statistics in the footer, so the page indexes and bloom filters are
	// not read: held for every row group, they would grow with the part.
	pf, err := parquet.OpenFile(f, st.Size(), parquet.SkipPageIndex(true), parquet.SkipBloomFilters(true))
	if err != nil {
		f.Close()
		return nil, fmt.Errorf("dataset: %s: not a readable Parquet file: %w", path, err)
	}
	p := &part{path: path, f: f, pf: pf}
	if err := checkVersion(path, pf.Lookup); err != nil {
		f.Close()
		return nil, err
	}
	if err := p.mapColumns(); err != nil {
		f.Close()
		return nil, err
	}
	return p, nil
}

// mapColumns finds each of our columns in the file's schema by name.
func (p *part) mapColumns() error {
	fs := p.pf.Schema()
	p.fileToOurs = make([]int, len(fs.Columns()))
	for i := range p.fileToOurs {
		p.fileToOurs[i] = -1
	}
	p.oursToFile = make([]int, len(columns))
	for i, c := range columns {
		leaf, ok := fs.Lookup(c.name)
		if !ok {
			return &VersionError{File: p.path, Got: "without column " + c.name, Want: SchemaVersion}
		}
		p.oursToFile[i] = leaf.ColumnIndex
		p.fileToOurs[leaf.ColumnIndex] = i
	}
	return nil
}

func (p *part) close() error { return p.f.Close() }

// readGroup decodes every row of row group g, calling fn for each in order.
func (p *part) readGroup(g parquet.RowGroup, fn func(*Row) error) error {
	rows := g.Rows()
	defer rows.Close()
	buf := make([]parquet.Row, 256)
	r := NewRow()
	for {
		n, err := rows.ReadRows(buf)
		for i := range n {
			decode(&r, buf[i], p.fileToOurs)
			if ferr := fn(&r); ferr != nil {
				return ferr
			}
		}
		if errors.Is(err, io.EOF) {
			return nil
		}
		if err != nil {
			return fmt.Errorf("dataset: %s: read rows: %w", p.path, err)
		}
	}
}

// each decodes every row of the part in order.
func (p *part) each(fn func(*Row) error) error {
	for _, g := range p.pf.RowGroups() {
		if err := p.readGroup(g, fn); err != nil {
			return err
		}
	}
	return nil
}

package dataset

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"slices"
)

// ErrNoParts is returned by Open for a directory without part files.
var ErrNoParts = errors.New("dataset: no part-*.parquet files")

// Dataset is an open dataset directory: every finished piece, in shard and
// piece order, read as one. It keeps at most one piece file open at a time
// (the one last read), so its memory does not grow with the number of
// pieces: a piece's footer holds the metadata of each of its row groups. A
// Dataset is not safe for concurrent use.
type Dataset struct {
	dir   string
	meta  Meta
	files []pieceFile
	open  *part // the piece last read, kept open; nil if none
	at    int   // its index in files
	busy  int   // scans under way on open: it is not closed under them
}

// pieceFile is one piece of the dataset as Open found it.
type pieceFile struct {
	path string
	rows int64
}

// Open opens every part-*.parquet file in dir. It fails if dir is missing
// (the error wraps fs.ErrNotExist), holds no parts (ErrNoParts), holds a part
// that is not readable Parquet, was written with another schema version
// (*VersionError), or mixes parts of different grids or catalogues
// (*MismatchError). Files named with PartialPrefix (a shard not yet
// finished) are not part of the dataset.
func Open(dir string) (*Dataset, error) {
	st, err := os.Stat(dir)
	if err != nil {
		return nil, fmt.Errorf("dataset: open %s: %w", dir, err)
	}
	if !st.IsDir() {
		return nil, fmt.Errorf("dataset: open %s: not a directory", dir)
	}
	paths, err := filepath.Glob(filepath.Join(dir, "part-*.parquet"))
	if err != nil {
		return nil, fmt.Errorf("dataset: open %s: %w", dir, err)
	}
	if len(paths) == 0 {
		return nil, fmt.Errorf("%w in %s", ErrNoParts, dir)
	}
	slices.Sort(paths)
	d := &Dataset{dir: dir}
	for i, path := range paths {
		p, err := openPart(path)
		if err != nil {
			d.Close()
			return nil, err
		}
		m, err := metaOf(p.pf.Lookup)
		if err != nil {
			p.close()
			d.Close()
			return nil, fmt.Errorf("dataset: %s: %w", path, err)
		}
		if i == 0 {
			d.meta = m
		} else if m.GridSHA256 != d.meta.GridSHA256 || m.CatalogSHA256 != d.meta.CatalogSHA256 || m.ProgramVersion != d.meta.ProgramVersion {
			p.close()
			d.Close()
			return nil, mixedParts(path, m, d.meta)
		}
		d.files = append(d.files, pieceFile{path: path, rows: p.pf.NumRows()})
		if i == 0 {
			d.keep(p, i) // scans start here
		} else {
			p.close()
		}
	}
	return d, nil
}

// keep makes p, piece i, the open piece, closing the one before.
func (d *Dataset) keep(p *part, i int) {
	if d.open != nil {
		d.open.close()
	}
	d.open, d.at = p, i
}

// piece returns piece i open, and the function to call when done with it.
// The open piece is reused; another replaces it unless a scan is reading it,
// in which case the new one is closed when done.
func (d *Dataset) piece(i int) (*part, func(), error) {
	if i < 0 || i >= len(d.files) {
		return nil, nil, fmt.Errorf("dataset: piece %d of %d", i, len(d.files))
	}
	if d.open != nil && d.at == i {
		d.busy++
		return d.open, func() { d.busy-- }, nil
	}
	if d.busy == 0 && d.open != nil {
		d.open.close() // before the next is read: one footer in memory, not two
		d.open = nil
	}
	f := d.files[i]
	p, err := openPart(f.path)
	if err != nil {
		return nil, nil, err
	}
	if p.pf.NumRows() != f.rows {
		p.close()
		return nil, nil, fmt.Errorf("dataset: %s: %d rows, but %d when the dataset was opened; it changed under the reader", f.path, p.pf.NumRows(), f.rows)
	}
	if d.busy > 0 {
		return p, func() { p.close() }, nil
	}
	d.keep(p, i)
	d.busy++
	return p, func() { d.busy-- }, nil
}

// mixedParts names the first metadata key in which two parts differ.
func mixedParts(path string, got, want Meta) error {
	switch {
	case got.GridSHA256 != want.GridSHA256:
		return &MismatchError{File: path, Key: KeyGridSHA256, Got: got.GridSHA256, Want: want.GridSHA256}
	case got.CatalogSHA256 != want.CatalogSHA256:
		return &MismatchError{File: path, Key: KeyCatalogSHA256, Got: got.CatalogSHA256, Want: want.CatalogSHA256}
	}
	return &MismatchError{File: path, Key: KeyProgramVersion, Got: got.ProgramVersion, Want: want.ProgramVersion}
}

// Meta returns the provenance of the dataset (of its first part; Open checks
// that every part agrees).
func (d *Dataset) Meta() Meta { return d.meta }

// Parts returns the paths of the part files, in shard and piece order.
func (d *Dataset) Parts() []string {
	paths := make([]string, len(d.files))
	for i, f := range d.files {
		paths[i] = f.path
	}
	return paths
}

// NumRows returns the number of rows in all parts.
func (d *Dataset) NumRows() int64 {
	var n int64
	for _, f := range d.files {
		n += f.rows
	}
	return n
}

// Each calls fn for every row of every part, in order. The Row passed to fn
// is reused: fn must Clone it to keep it. An error from fn stops the
// iteration and is returned.
func (d *Dataset) Each(fn func(*Row) error) error {
	_, err := d.Scan(nil, fn)
	return err
}

// Close closes the open part file.
func (d *Dataset) Close() error {
	var err error
	if d.open != nil {
		err = d.open.close()
	}
	d.open, d.files = nil, nil
	return err
}

// Clone returns a deep copy of r, safe to keep after an Each or Scan
// callback returns.
func (r *Row) Clone() Row {
	c := *r
	c.Members = slices.Clone(r.Members)
	return c
}

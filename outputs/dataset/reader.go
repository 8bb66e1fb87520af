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

// Dataset is an open dataset directory: every complete part, in shard order.
type Dataset struct {
	dir   string
	meta  Meta
	parts []*part
}

// Open opens every part-*.parquet file in dir. It fails if dir is missing
// (the error wraps fs.ErrNotExist), holds no parts (ErrNoParts), holds a part
// that is not readable Parquet, was written with another schema version
// (*VersionError), or mixes parts of different grids or catalogues
// (*MismatchError).
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
		d.parts = append(d.parts, p)
		m, err := metaOf(p.pf.Lookup)
		if err != nil {
			d.Close()
			return nil, fmt.Errorf("dataset: %s: %w", path, err)
		}
		if i == 0 {
			d.meta = m
			continue
		}
		if m.GridSHA256 != d.meta.GridSHA256 || m.CatalogSHA256 != d.meta.CatalogSHA256 || m.ProgramVersion != d.meta.ProgramVersion {
			d.Close()
			return nil, mixedParts(path, m, d.meta)
		}
	}
	return d, nil
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

// Parts returns the paths of the part files, in shard order.
func (d *Dataset) Parts() []string {
	paths := make([]string, len(d.parts))
	for i, p := range d.parts {
		paths[i] = p.path
	}
	return paths
}

// NumRows returns the number of rows in all parts.
func (d *Dataset) NumRows() int64 {
	var n int64
	for _, p := range d.parts {
		n += p.pf.NumRows()
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

// Close closes every part file.
func (d *Dataset) Close() error {
	var errs []error
	for _, p := range d.parts {
		errs = append(errs, p.close())
	}
	d.parts = nil
	return errors.Join(errs...)
}

// Clone returns a deep copy of r, safe to keep after an Each or Scan
// callback returns.
func (r *Row) Clone() Row {
	c := *r
	c.Members = slices.Clone(r.Members)
	return c
}

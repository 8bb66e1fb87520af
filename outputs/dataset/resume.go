package dataset

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
)

// ErrNothingToResume is returned by Resume when the directory holds neither a
// partial nor a complete part of the shard.
var ErrNothingToResume = errors.New("dataset: nothing to resume")

// Resume continues an interrupted run of meta.Shard in dir. It reads the
// partial part (or, if the shard already finished, the complete part),
// checks that its grid and catalogue hashes, program version and shard match
// meta, and returns a Writer that already holds its rows: the caller checks
// them against its cases (Rows, FirstIndex, LastIndex, LastCaseID), skips
// them and writes the rest in order. On a
// mismatch it returns a *MismatchError and leaves every file as it was.
func Resume(dir string, meta Meta) (*Writer, error) {
	if err := meta.Shard.validate(); err != nil {
		return nil, err
	}
	meta.Shard = meta.Shard.norm()
	src, err := resumeSource(dir, meta.Shard)
	if err != nil {
		return nil, err
	}
	p, err := openPart(src)
	if err != nil {
		return nil, err
	}
	defer p.close()
	if err := checkMeta(src, p.pf.Lookup, meta); err != nil {
		return nil, err
	}
	w, err := Create(dir, meta)
	if err != nil {
		return nil, err
	}
	if err := p.each(func(r *Row) error { return w.Write(*r) }); err != nil {
		w.closed = true
		w.tmp.Close()
		os.Remove(w.tmp.Name())
		return nil, fmt.Errorf("dataset: resume from %s: %w", src, err)
	}
	return w, nil
}

// resumeSource picks the partial part if there is one, else the complete one.
func resumeSource(dir string, s Shard) (string, error) {
	for _, name := range []string{partialName(s), partName(s)} {
		path := filepath.Join(dir, name)
		if _, err := os.Stat(path); err == nil {
			return path, nil
		}
	}
	return "", fmt.Errorf("%w: no %s or %s in %s", ErrNothingToResume, partialName(s), partName(s), dir)
}

package main

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"

	"github.com/spansweep/spansweep/grids"
	"github.com/spansweep/spansweep/outputs/dataset"
)

// outLayout names the files of a sweep's output directory.
type outLayout struct{ root string }

func (l outLayout) datasetDir() string { return filepath.Join(l.root, "dataset") }
func (l outLayout) tablesDir() string  { return filepath.Join(l.root, "tables") }
func (l outLayout) plotsDir() string   { return filepath.Join(l.root, "plots") }

// summaryPath is summary.json for a whole-grid run, or the shard's own file
// under shards/ so that concurrent shards sharing --out never collide.
func (l outLayout) summaryPath(s grids.Shard) string {
	if s.N <= 1 {
		return filepath.Join(l.root, "summary.json")
	}
	return filepath.Join(l.root, "shards", fmt.Sprintf("summary-%05d-of-%05d.json", s.K, s.N))
}

// dataShard is the dataset package's name for a shard.
func dataShard(s grids.Shard) dataset.Shard { return dataset.Shard{K: s.K, N: s.N} }

// checkOutDir checks that the output directory can be written: it is a
// directory, or it does not exist yet and its parent is one. It writes only
// a probe file, removed at once.
func checkOutDir(dir string) (outLayout, error) {
	if dir == "" {
		return outLayout{}, usagef("--out: empty; allowed: a directory path")
	}
	st, err := os.Stat(dir)
	switch {
	case err == nil && !st.IsDir():
		return outLayout{}, usagef("--out %s: exists and is not a directory", dir)
	case err == nil:
		return outLayout{dir}, probeWritable("--out", dir)
	case !errors.Is(err, fs.ErrNotExist):
		return outLayout{}, usagef("--out %s: %v", dir, err)
	}
	parent := filepath.Dir(filepath.Clean(dir))
	pst, err := os.Stat(parent)
	switch {
	case errors.Is(err, fs.ErrNotExist):
		return outLayout{}, usagef("--out %s: parent directory %s does not exist; create it first", dir, parent)
	case err != nil:
		return outLayout{}, usagef("--out %s: %v", dir, err)
	case !pst.IsDir():
		return outLayout{}, usagef("--out %s: parent %s is not a directory", dir, parent)
	}
	return outLayout{dir}, probeWritable("--out", parent)
}

// probeWritable creates and removes a file in dir.
func probeWritable(flag, dir string) error {
	f, err := os.CreateTemp(dir, ".spansweep-probe-*")
	if err != nil {
		return usagef("%s: cannot write in %s: %v", flag, dir, errors.Unwrap(err))
	}
	f.Close()
	return os.Remove(f.Name())
}

// checkNewFile checks that a profile file can be created: its directory
// exists. An empty path means no profile.
func checkNewFile(flag, path string) error {
	if path == "" {
		return nil
	}
	if st, err := os.Stat(path); err == nil && st.IsDir() {
		return usagef("%s %s: is a directory; allowed: a file path", flag, path)
	}
	dir := filepath.Dir(path)
	if st, err := os.Stat(dir); err != nil || !st.IsDir() {
		return usagef("%s %s: directory %s does not exist", flag, path, dir)
	}
	return nil
}

// checkExisting applies the overwrite policy to the dataset directory:
//   - pieces of another shard count are never mixed in (a dataset holds one
//     sharding of one grid);
//   - this shard's finished or interrupted pieces are kept unless --resume,
//     which continues (or, for a finished shard, re-reads) them;
//   - other shards' pieces of the same count belong to sibling jobs and are
//     left alone.
func (l outLayout) checkExisting(s grids.Shard, resume bool) error {
	entries, err := os.ReadDir(l.datasetDir())
	if errors.Is(err, fs.ErrNotExist) {
		return nil
	}
	if err != nil {
		return usagef("--out %s: %v", l.root, err)
	}
	var finished, partial string // a piece of this shard of each kind
	for _, e := range entries {
		f, ok := dataset.ParseFileName(e.Name())
		if !ok {
			continue
		}
		if f.Shard.N != s.N {
			return usagef("%s: a dataset sharded %d ways is already there and this run is shard %s; nothing was overwritten. Use the same N, another --out, or remove %s",
				filepath.Join(l.datasetDir(), e.Name()), f.Shard.N, s, l.datasetDir())
		}
		switch {
		case f.Shard.K != s.K:
		case f.Partial && partial == "":
			partial = e.Name()
		case !f.Partial && finished == "":
			finished = e.Name()
		}
	}
	if resume {
		return nil
	}
	name, what := finished, "a finished run of shard "+s.String()+" is"
	if partial != "" {
		name, what = partial, "an interrupted run of shard "+s.String()+" is"
	}
	if name == "" {
		return nil
	}
	return usagef("%s: %s already there; nothing was overwritten. Add --resume to continue it (a finished run is kept and its tables rebuilt), choose another --out, or remove the shard's pieces from %s to start afresh",
		filepath.Join(l.datasetDir(), name), what, l.datasetDir())
}

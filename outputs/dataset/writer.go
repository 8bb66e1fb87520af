package dataset

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"

	"github.com/parquet-go/parquet-go"
	"github.com/parquet-go/parquet-go/compress/snappy"
)

// RowGroupRows is the number of rows per row group. Each group's column
// statistics (min, max) let a lookup skip groups without decoding them.
const RowGroupRows = 4096

// Writer streams rows of one shard into its part file. Rows must come in
// enumeration order (case_index strictly ascending). Nothing appears under
// the final name until Close succeeds. A Writer is not safe for concurrent
// use: the engine's ordered output feeds it from one goroutine.
//
// Memory: each row goes straight to the Parquet writer, which holds the
// current row group's columns; the Writer keeps no rows and no record per
// case. What still grows is the footer the Parquet writer keeps until
// Close: the metadata and page indexes of every row group (some tens of
// bytes a row at RowGroupRows 4096 and 201 columns; larger row groups
// would shrink it, at the cost of coarser skipping).
type Writer struct {
	dir     string
	meta    Meta
	tmp     *os.File
	pw      *parquet.Writer
	one     [1]parquet.Row // the row being written; its buffer is reused
	pending int            // rows written since the last row group
	rows    int
	// The case_index of the first and last rows and the last row's id:
	// rows come in strictly ascending case_index, so these describe what
	// the part holds without a record per case (memory stays flat however
	// many rows a part gets).
	firstIndex, lastIndex int
	lastID                string
	closed                bool
}

// Create starts a new part for meta.Shard in dir, creating dir if needed. A
// part or partial part left by an earlier run is replaced only when Close
// succeeds.
func Create(dir string, meta Meta) (*Writer, error) {
	if err := meta.Shard.validate(); err != nil {
		return nil, err
	}
	meta.Shard = meta.Shard.norm()
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return nil, fmt.Errorf("dataset: create directory: %w", err)
	}
	tmpPath := filepath.Join(dir, tempName(meta.Shard))
	f, err := os.Create(tmpPath)
	if err != nil {
		return nil, fmt.Errorf("dataset: create part: %w", err)
	}
	w := &Writer{dir: dir, meta: meta, tmp: f, firstIndex: -1, lastIndex: -1}
	w.pw = parquet.NewWriter(f, schema,
		parquet.Compression(&snappy.Codec{}),
		parquet.DataPageStatistics(true),
		parquet.CreatedBy("spansweep", meta.ProgramVersion, ""),
		parquet.SortingWriterConfig(parquet.SortingColumns(parquet.Ascending("case_index"))),
		parquet.KeyValueMetadata(KeyProgramVersion, meta.ProgramVersion),
		parquet.KeyValueMetadata(KeyGridSHA256, meta.GridSHA256),
		parquet.KeyValueMetadata(KeyCatalogSHA256, meta.CatalogSHA256),
		parquet.KeyValueMetadata(KeySchemaVersion, SchemaVersion),
		parquet.KeyValueMetadata(KeyShard, meta.Shard.String()),
		parquet.KeyValueMetadata(KeyComplete, "false"),
	)
	return w, nil
}

// Path returns the part's final path.
func (w *Writer) Path() string { return filepath.Join(w.dir, partName(w.meta.Shard)) }

// Rows returns the number of rows written so far, resumed ones included.
func (w *Writer) Rows() int { return w.rows }

// FirstIndex returns the case_index of the first row written, resumed ones
// included; -1 before any row.
func (w *Writer) FirstIndex() int { return w.firstIndex }

// LastIndex returns the case_index of the last row written; -1 before any
// row. Rows come in strictly ascending case_index, so after Resume the part
// holds an unbroken run of cases exactly when LastIndex − FirstIndex + 1
// equals Rows.
func (w *Writer) LastIndex() int { return w.lastIndex }

// LastCaseID returns the case_id of the last row written; "" before any row.
func (w *Writer) LastCaseID() string { return w.lastID }

// Write appends one row. Its provenance columns are set from the Writer's
// Meta.
func (w *Writer) Write(r Row) error {
	if w.closed {
		return errors.New("dataset: write after Close or Abort")
	}
	if r.CaseIndex <= w.lastIndex {
		return fmt.Errorf("dataset: case %s: case_index %d after %d; rows must come in enumeration order", r.CaseID, r.CaseIndex, w.lastIndex)
	}
	r.GridSHA256, r.CatalogSHA256, r.ProgramVersion = w.meta.GridSHA256, w.meta.CatalogSHA256, w.meta.ProgramVersion
	w.one[0] = encode(w.one[0][:0], &r)
	if _, err := w.pw.WriteRows(w.one[:]); err != nil {
		return fmt.Errorf("dataset: write rows: %w", err)
	}
	w.pending++
	if w.rows == 0 {
		w.firstIndex = r.CaseIndex
	}
	w.lastIndex, w.lastID = r.CaseIndex, r.CaseID
	w.rows++
	if w.pending == RowGroupRows {
		return w.flush()
	}
	return nil
}

// flush ends the row group of the rows written since the last one.
func (w *Writer) flush() error {
	if w.pending == 0 {
		return nil
	}
	w.pending = 0
	if err := w.pw.Flush(); err != nil {
		return fmt.Errorf("dataset: flush row group: %w", err)
	}
	return nil
}

// finish writes the footer with complete set, closes the temporary file and
// renames it to name. On failure the temporary file is removed.
func (w *Writer) finish(complete bool, name string) (err error) {
	w.closed = true
	tmpPath := w.tmp.Name()
	defer func() {
		if err != nil {
			w.tmp.Close()
			os.Remove(tmpPath)
		}
	}()
	if err := w.flush(); err != nil {
		return err
	}
	w.pw.SetKeyValueMetadata(KeyComplete, fmt.Sprint(complete))
	if err := w.pw.Close(); err != nil {
		return fmt.Errorf("dataset: write footer: %w", err)
	}
	if err := w.tmp.Sync(); err != nil {
		return fmt.Errorf("dataset: sync part: %w", err)
	}
	if err := w.tmp.Close(); err != nil {
		return fmt.Errorf("dataset: close part: %w", err)
	}
	if err := os.Rename(tmpPath, filepath.Join(w.dir, name)); err != nil {
		return fmt.Errorf("dataset: finalize part: %w", err)
	}
	syncDir(w.dir)
	return nil
}

// Close finalizes the part: the footer is written with complete=true, the
// temporary file is renamed to part-K-of-N.parquet, and a partial part of an
// earlier, interrupted run of this shard is removed.
func (w *Writer) Close() error {
	if w.closed {
		return errors.New("dataset: Close after Close or Abort")
	}
	if err := w.finish(true, partName(w.meta.Shard)); err != nil {
		return err
	}
	if err := os.Remove(filepath.Join(w.dir, partialName(w.meta.Shard))); err != nil && !errors.Is(err, os.ErrNotExist) {
		return fmt.Errorf("dataset: remove partial part: %w", err)
	}
	return nil
}

// Abort stops an interrupted run. With rows written, it finalizes them as a
// valid Parquet file part-K-of-N.parquet.partial (complete=false) for
// Resume; with none, or when finalizing fails, it removes the temporary file.
// The final part name is never touched.
func (w *Writer) Abort() error {
	if w.closed {
		return nil
	}
	if w.rows == 0 {
		w.closed = true
		w.tmp.Close()
		return os.Remove(w.tmp.Name())
	}
	return w.finish(false, partialName(w.meta.Shard))
}

// syncDir makes a rename durable where the platform allows it; failure is
// harmless for correctness, so it is ignored.
func syncDir(dir string) {
	if d, err := os.Open(dir); err == nil {
		d.Sync()
		d.Close()
	}
}

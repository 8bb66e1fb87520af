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

// pageBufferBytes is the Parquet writer's page buffer per column. The
// writer sizes each column's buffer by it, so it sets most of the memory a
// Writer holds (201 columns). A row group's numeric column is 4096 × 8 B =
// 32 KiB, so 64 KiB still writes it as one page; the library's default,
// 256 KiB, sized every buffer for four times the values a group holds.
const pageBufferBytes = 64 << 10

// layout is how a Writer cuts a shard's rows into row groups and pieces.
type layout struct {
	groupRows   int // rows per row group
	pieceGroups int // row groups per piece
}

func (l layout) pieceRows() int { return l.groupRows * l.pieceGroups }

// Option sets how a Writer cuts the rows; the defaults are RowGroupRows and
// PieceRowGroups. Tests use small values to exercise several groups and
// pieces with few rows. The rows and their order do not depend on it.
type Option func(*layout)

// GroupRows sets the number of rows per row group (n ≥ 1).
func GroupRows(n int) Option { return func(l *layout) { l.groupRows = n } }

// PieceGroups sets the number of row groups per piece file (n ≥ 1).
func PieceGroups(n int) Option { return func(l *layout) { l.pieceGroups = n } }

func newLayout(opts []Option) (layout, error) {
	l := layout{groupRows: RowGroupRows, pieceGroups: PieceRowGroups}
	for _, o := range opts {
		o(&l)
	}
	if l.groupRows < 1 || l.pieceGroups < 1 {
		return l, fmt.Errorf("dataset: %d rows per row group, %d row groups per piece: want at least 1 of each", l.groupRows, l.pieceGroups)
	}
	return l, nil
}

// Writer streams rows of one shard into its piece files. Rows must come in
// enumeration order (case_index strictly ascending). Each piece is written
// under a hidden temporary name and, once it holds its row groups, renamed
// to its partial name (PartialName); Close renames every piece to its final
// name (PieceName), so nothing appears under a final name until the whole
// shard is written. A Writer is not safe for concurrent use: the engine's
// ordered output feeds it from one goroutine.
//
// Memory: each row goes straight to the Parquet writer, which holds a page
// buffer per column (pageBufferBytes) and, until the piece's footer is
// written, the metadata and page indexes of the piece's row groups (some
// 200 kB a group at 201 columns). A piece holds at most PieceRowGroups
// groups, so both are bounded whatever the number of rows; the Writer keeps
// no rows and no record per case, only one name per finished piece.
type Writer struct {
	dir    string
	meta   Meta
	layout layout
	// The piece being written: its number, hidden file, Parquet writer and
	// rows so far. Pieces 1 … piece−1 are finished and in dir.
	piece     int
	tmp       *os.File
	pw        *parquet.Writer
	pieceRows int
	pending   int            // rows written since the last row group
	one       [1]parquet.Row // the row being written; its buffer is reused
	rows      int
	// The case_index of the first and last rows and the last row's id:
	// rows come in strictly ascending case_index, so these describe what
	// the shard holds without a record per case (memory stays flat however
	// many rows a shard gets).
	firstIndex, lastIndex int
	lastID                string
	files                 []string // paths of the finished pieces, as they are named now
	closed                bool
}

// prepare reads Create's and Resume's options and checks and normalises
// meta's shard.
func prepare(meta Meta, opts []Option) (layout, Meta, error) {
	l, err := newLayout(opts)
	if err != nil {
		return l, meta, err
	}
	if err := meta.Shard.validate(); err != nil {
		return l, meta, err
	}
	meta.Shard = meta.Shard.norm()
	return l, meta, nil
}

// Create starts a new run of meta.Shard in dir, creating dir if needed.
// Files an earlier run of the shard left (finished or partial pieces) are
// replaced or removed only when Close succeeds; until then a partial piece
// of the same number is replaced as this run finishes its own.
func Create(dir string, meta Meta, opts ...Option) (*Writer, error) {
	l, meta, err := prepare(meta, opts)
	if err != nil {
		return nil, err
	}
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return nil, fmt.Errorf("dataset: create directory: %w", err)
	}
	w := &Writer{dir: dir, meta: meta, layout: l, firstIndex: -1, lastIndex: -1}
	if err := w.startPiece(1); err != nil {
		return nil, err
	}
	return w, nil
}

// startPiece opens piece p's temporary file and Parquet writer.
func (w *Writer) startPiece(p int) error {
	f, err := os.Create(filepath.Join(w.dir, tempName(w.meta.Shard, p)))
	if err != nil {
		return fmt.Errorf("dataset: create part: %w", err)
	}
	w.piece, w.tmp, w.pieceRows, w.pending = p, f, 0, 0
	meta := w.meta
	w.pw = parquet.NewWriter(f, schema,
		parquet.Compression(&snappy.Codec{}),
		parquet.DataPageStatistics(true),
		parquet.PageBufferSize(pageBufferBytes),
		parquet.CreatedBy("spansweep", meta.ProgramVersion, ""),
		parquet.SortingWriterConfig(parquet.SortingColumns(parquet.Ascending("case_index"))),
		parquet.KeyValueMetadata(KeyProgramVersion, meta.ProgramVersion),
		parquet.KeyValueMetadata(KeyGridSHA256, meta.GridSHA256),
		parquet.KeyValueMetadata(KeyCatalogSHA256, meta.CatalogSHA256),
		parquet.KeyValueMetadata(KeySchemaVersion, SchemaVersion),
		parquet.KeyValueMetadata(KeyShard, meta.Shard.String()),
		parquet.KeyValueMetadata(KeyComplete, "false"),
	)
	return nil
}

// Files returns the paths of the pieces holding the rows written so far,
// in case order: after Close their final paths, after Abort the partial
// pieces kept for Resume, before either the pieces finished so far (the one
// being written is not among them).
func (w *Writer) Files() []string { return append([]string(nil), w.files...) }

// Rows returns the number of rows written so far, resumed ones included.
func (w *Writer) Rows() int { return w.rows }

// FirstIndex returns the case_index of the first row written, resumed ones
// included; -1 before any row.
func (w *Writer) FirstIndex() int { return w.firstIndex }

// LastIndex returns the case_index of the last row written; -1 before any
// row. Rows come in strictly ascending case_index, so after Resume the shard
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
	w.pieceRows++
	if w.rows == 0 {
		w.firstIndex = r.CaseIndex
	}
	w.lastIndex, w.lastID = r.CaseIndex, r.CaseID
	w.rows++
	if w.pending == w.layout.groupRows {
		if err := w.flush(); err != nil {
			return err
		}
	}
	if w.pieceRows == w.layout.pieceRows() {
		return w.nextPiece()
	}
	return nil
}

// nextPiece finishes the full piece under its partial name and starts the
// next one.
func (w *Writer) nextPiece() error {
	name := PartialName(w.meta.Shard, w.piece)
	if err := w.finish(true, name); err != nil {
		w.closed = true
		return err
	}
	w.files = append(w.files, filepath.Join(w.dir, name))
	w.pw, w.tmp = nil, nil // the finished piece's buffers go before the next's are made
	if err := w.startPiece(w.piece + 1); err != nil {
		w.closed = true
		return err
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

// finish writes the current piece's footer with complete set, closes its
// temporary file and renames it to name. On failure the temporary file is
// removed.
func (w *Writer) finish(complete bool, name string) (err error) {
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

// dropPiece removes the current piece's temporary file unwritten.
func (w *Writer) dropPiece() error {
	w.tmp.Close()
	return os.Remove(w.tmp.Name())
}

// Close finalizes the shard: the last piece's footer is written with
// complete=true, every piece is renamed to its final name (part-K-of-N-
// piece-P.parquet), and any other piece of this shard an earlier run left
// is removed. A shard without rows still gets one (empty) piece.
func (w *Writer) Close() error {
	if w.closed {
		return errors.New("dataset: Close after Close or Abort")
	}
	w.closed = true
	if w.pieceRows > 0 || w.piece == 1 {
		name := PartialName(w.meta.Shard, w.piece)
		if err := w.finish(true, name); err != nil {
			return err
		}
		w.files = append(w.files, filepath.Join(w.dir, name))
	} else if err := w.dropPiece(); err != nil {
		return fmt.Errorf("dataset: remove empty piece: %w", err)
	}
	n := len(w.files)
	for p := 1; p <= n; p++ {
		final := filepath.Join(w.dir, PieceName(w.meta.Shard, p))
		partial := filepath.Join(w.dir, PartialName(w.meta.Shard, p))
		if err := os.Rename(partial, final); err != nil && !errors.Is(err, os.ErrNotExist) {
			return fmt.Errorf("dataset: finalize part: %w", err)
		}
		w.files[p-1] = final
	}
	syncDir(w.dir)
	return w.removeOthers(n)
}

// removeOthers removes the pieces of this shard numbered above n, final or
// partial, and partial pieces of any number: what an earlier run of the
// shard left that this run did not replace.
func (w *Writer) removeOthers(n int) error {
	entries, err := os.ReadDir(w.dir)
	if err != nil {
		return fmt.Errorf("dataset: remove earlier pieces: %w", err)
	}
	for _, e := range entries {
		f, ok := ParseFileName(e.Name())
		if !ok || f.Shard != w.meta.Shard || (f.Piece <= n && !f.Partial) {
			continue
		}
		if err := os.Remove(filepath.Join(w.dir, e.Name())); err != nil && !errors.Is(err, os.ErrNotExist) {
			return fmt.Errorf("dataset: remove earlier piece: %w", err)
		}
	}
	return nil
}

// Abort stops an interrupted run. The piece being written, if it has rows,
// is finalized as a valid Parquet file under its partial name
// (_partial-part-K-of-N-piece-P.parquet, complete=false) for Resume; the
// pieces finished before it keep their partial names. Without rows in it,
// or when finalizing fails, its temporary file is removed. No final name is
// touched.
func (w *Writer) Abort() error {
	if w.closed {
		return nil
	}
	w.closed = true
	if w.pieceRows == 0 {
		return w.dropPiece()
	}
	name := PartialName(w.meta.Shard, w.piece)
	if err := w.finish(false, name); err != nil {
		return err
	}
	w.files = append(w.files, filepath.Join(w.dir, name))
	return nil
}

// syncDir makes a rename durable where the platform allows it; failure is
// harmless for correctness, so it is ignored.
func syncDir(dir string) {
	if d, err := os.Open(dir); err == nil {
		d.Sync()
		d.Close()
	}
}

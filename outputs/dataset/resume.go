package dataset

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"slices"

	"github.com/parquet-go/parquet-go"
)

// ErrNothingToResume is returned by Resume when the directory holds no
// piece of the shard, partial or final.
var ErrNothingToResume = errors.New("dataset: nothing to resume")

// Resume continues an interrupted run of meta.Shard in dir. It reads the
// shard's pieces (the partial ones an interrupted run kept or, if the shard
// already finished, the final ones), checks that their grid and catalogue
// hashes, program version and shard match meta and that they hold one
// unbroken run of cases, and returns a Writer that already holds their
// rows: the caller checks them against its cases (Rows, FirstIndex,
// LastIndex, LastCaseID), skips them and writes the rest in order. Finished
// pieces are kept as they are; the rows of a piece the interrupt cut short
// are copied into a new one, which replaces it once written, so every piece
// equals that of an uninterrupted run. On a mismatch it returns a
// *MismatchError and leaves every file as it was.
func Resume(dir string, meta Meta, opts ...Option) (*Writer, error) {
	l, meta, err := prepare(meta, opts)
	if err != nil {
		return nil, err
	}
	paths, err := shardPieces(dir, meta.Shard)
	if err != nil {
		return nil, err
	}
	w := &Writer{dir: dir, meta: meta, layout: l, firstIndex: -1, lastIndex: -1}
	var cut *piece // the last piece, if the interrupt cut it short
	for i, path := range paths {
		pc, err := readPiece(path, meta)
		if err != nil {
			return nil, err
		}
		if pc.rows > 0 && w.rows > 0 && pc.first != w.lastIndex+1 {
			return nil, fmt.Errorf("dataset: %s starts at case_index %d, but the piece before it ends at %d; the pieces are not one run of cases (remove %s and start afresh)",
				path, pc.first, w.lastIndex, dir)
		}
		if !pc.complete {
			if i != len(paths)-1 {
				return nil, fmt.Errorf("dataset: %s was cut short by an interrupt, but later pieces follow it (remove %s and start afresh)", path, dir)
			}
			cut = &pc
			break
		}
		if pc.rows > 0 {
			if w.rows == 0 {
				w.firstIndex = pc.first
			}
			w.lastIndex = pc.last
			w.rows += pc.rows
		}
		w.files = append(w.files, path)
	}
	next := len(w.files) + 1
	if err := w.startPiece(next); err != nil {
		return nil, err
	}
	if cut != nil {
		err = copyPiece(w, cut.path)
	} else {
		w.lastID, err = lastCaseID(paths[len(paths)-1])
	}
	if err != nil {
		w.closed = true
		w.dropPiece()
		return nil, fmt.Errorf("dataset: %w", err)
	}
	return w, nil
}

// shardPieces lists the paths of the shard's pieces in dir in piece order,
// each under its partial or its final name; they must be numbered 1, 2, …
// without a gap.
func shardPieces(dir string, s Shard) ([]string, error) {
	entries, err := os.ReadDir(dir)
	if errors.Is(err, os.ErrNotExist) {
		return nil, fmt.Errorf("%w: no directory %s", ErrNothingToResume, dir)
	}
	if err != nil {
		return nil, fmt.Errorf("dataset: %w", err)
	}
	byPiece := map[int]string{}
	for _, e := range entries {
		f, ok := ParseFileName(e.Name())
		if !ok || f.Shard != s {
			continue
		}
		if other, dup := byPiece[f.Piece]; dup {
			return nil, fmt.Errorf("dataset: %s and %s are both in %s; keep one (or remove the directory and start afresh)", other, e.Name(), dir)
		}
		byPiece[f.Piece] = e.Name()
	}
	if len(byPiece) == 0 {
		return nil, fmt.Errorf("%w: no %s… or %s… in %s", ErrNothingToResume, PartialName(s, 1), PieceName(s, 1), dir)
	}
	nums := make([]int, 0, len(byPiece))
	for p := range byPiece {
		nums = append(nums, p)
	}
	slices.Sort(nums)
	paths := make([]string, len(nums))
	for i, p := range nums {
		if p != i+1 {
			return nil, fmt.Errorf("dataset: shard %s has no piece %d in %s but has %s; remove %s and start afresh", s, i+1, dir, byPiece[p], dir)
		}
		paths[i] = filepath.Join(dir, byPiece[p])
	}
	return paths, nil
}

// piece is what Resume learns of one piece from its footer.
type piece struct {
	path        string
	rows        int
	first, last int // case_index of its first and last rows
	complete    bool
}

// readPiece reads a piece's footer and checks its metadata against meta.
func readPiece(path string, meta Meta) (piece, error) {
	p, err := openPart(path)
	if err != nil {
		return piece{}, err
	}
	defer p.close()
	if err := checkMeta(path, p.pf.Lookup, meta); err != nil {
		return piece{}, err
	}
	complete, _ := p.pf.Lookup(KeyComplete)
	pc := piece{path: path, rows: int(p.pf.NumRows()), complete: complete == "true"}
	if pc.rows > 0 {
		if pc.first, pc.last, err = p.indexRange(); err != nil {
			return piece{}, err
		}
	}
	return pc, nil
}

// indexRange returns the case_index of the part's first and last rows, from
// the statistics of its first and last row groups (rows are in ascending
// case_index).
func (p *part) indexRange() (first, last int, err error) {
	groups := p.pf.RowGroups()
	col := p.oursToFile[columnByName["case_index"]]
	lo, _, ok1 := groupBounds(groups[0], col)
	_, hi, ok2 := groupBounds(groups[len(groups)-1], col)
	if !ok1 || !ok2 {
		return 0, 0, fmt.Errorf("dataset: %s: no case_index statistics", p.path)
	}
	return lo, hi, nil
}

func groupBounds(g parquet.RowGroup, col int) (lo, hi int, ok bool) {
	cb, ok := g.ColumnChunks()[col].(bounded)
	if !ok {
		return 0, 0, false
	}
	l, h, ok := cb.Bounds()
	if !ok {
		return 0, 0, false
	}
	return int(l.Int64()), int(h.Int64()), true
}

// copyPiece writes every row of the piece at path into w.
func copyPiece(w *Writer, path string) error {
	p, err := openPart(path)
	if err != nil {
		return err
	}
	defer p.close()
	if err := p.each(func(r *Row) error { return w.Write(*r) }); err != nil {
		return fmt.Errorf("from %s: %w", path, err)
	}
	return nil
}

// lastCaseID returns the case_id of the piece's last row ("" if it has none).
func lastCaseID(path string) (string, error) {
	p, err := openPart(path)
	if err != nil {
		return "", err
	}
	defer p.close()
	groups := p.pf.RowGroups()
	if len(groups) == 0 {
		return "", nil
	}
	var id string
	err = p.readGroup(groups[len(groups)-1], func(r *Row) error { id = r.CaseID; return nil })
	return id, err
}

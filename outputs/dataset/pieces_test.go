package dataset

import (
	"bytes"
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"reflect"
	"slices"
	"testing"

	"github.com/spansweep/spansweep/optimize"
)

// Small pieces for the tests: 16 rows a row group, 3 groups a piece, so
// 48 rows a piece. smallRows is 3 full pieces and one of 20 rows (two
// groups: 16 + 4).
var small = []Option{GroupRows(16), PieceGroups(3)}

const (
	smallPieceRows = 16 * 3
	smallRows      = 3*smallPieceRows + 20
)

// writeWith writes results into a new run in dir with opts and closes it.
func writeWith(t *testing.T, dir string, results []optimize.Result, opts ...Option) *Writer {
	t.Helper()
	w, err := Create(dir, testMeta, opts...)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range results {
		if err := w.WriteResult(r); err != nil {
			t.Fatal(err)
		}
	}
	if err := w.Close(); err != nil {
		t.Fatal(err)
	}
	return w
}

// pieceNames are the final names of pieces 1 … n of shard 1/1, written out
// by hand as the package doc gives the pattern.
func pieceNames(n int) []string {
	var out []string
	for p := 1; p <= n; p++ {
		out = append(out, fmt.Sprintf("part-00001-of-00001-piece-%05d.parquet", p))
	}
	return out
}

// A shard cut into several pieces reads back as one dataset, row for row
// equal to the same rows in one piece, with no piece over its row groups;
// an independent reader (Apache Arrow's) reads the pieces in name order as
// the cases in order.
func TestPiecesReadAsOne(t *testing.T) {
	results := sampleResults(smallRows)
	one, cut := t.TempDir(), t.TempDir()
	writeWith(t, one, results)
	w := writeWith(t, cut, results, small...)

	// ⌈164 / 48⌉ = 4 pieces.
	if got := names(t, cut); !slices.Equal(got, pieceNames(4)) {
		t.Fatalf("got files %v, want %v", got, pieceNames(4))
	}
	var want []string
	for _, n := range pieceNames(4) {
		want = append(want, filepath.Join(cut, n))
	}
	if got := w.Files(); !slices.Equal(got, want) {
		t.Errorf("Files after Close: got %v, want %v", got, want)
	}
	if a, b := readAll(t, one), readAll(t, cut); !reflect.DeepEqual(a, b) {
		t.Fatalf("the pieces read back differ from one part (%d vs %d rows)", len(b), len(a))
	}

	var ids []string
	for i, n := range pieceNames(4) {
		cols, kv := readWithArrow(t, filepath.Join(cut, n))
		if kv(KeyComplete) != "true" || kv(KeyShard) != "1/1" {
			t.Errorf("%s: complete %q, shard %q; want true, 1/1", n, kv(KeyComplete), kv(KeyShard))
		}
		wantRows := min(smallPieceRows, smallRows-i*smallPieceRows)
		if got := len(cols["case_id"]); got != wantRows {
			t.Errorf("%s: %d rows, want %d", n, got, wantRows)
		}
		for _, v := range cols["case_id"] {
			ids = append(ids, v.(string))
		}
		p, err := openPart(filepath.Join(cut, n))
		if err != nil {
			t.Fatal(err)
		}
		if g := len(p.pf.RowGroups()); g > 3 {
			t.Errorf("%s: %d row groups, want at most 3", n, g)
		}
		p.close()
	}
	for i, r := range results {
		if ids[i] != r.Case.ID {
			t.Fatalf("Arrow, pieces in name order: row %d is %s, want %s", i, ids[i], r.Case.ID)
		}
	}

	// Row-group statistics still let a scan skip groups: cases 50 … 60 lie
	// in piece 2's first group (48 … 63) alone, of 3+3+3+2 = 11 groups.
	d, err := Open(cut)
	if err != nil {
		t.Fatal(err)
	}
	defer d.Close()
	st, err := d.Scan(Filter{Between("case_index", 50, 60)}, func(*Row) error { return nil })
	if err != nil {
		t.Fatal(err)
	}
	if st != (ScanStats{RowGroups: 11, RowGroupsRead: 1, RowsMatched: 11}) {
		t.Errorf("scan of cases 50 to 60: got %+v, want 11 groups, 1 read, 11 rows", st)
	}
}

// ReadRow reaches rows of any piece, also from inside a scan of another
// piece (the Dataset keeps one piece open and must not close it under the
// scan).
func TestReadRowAcrossPieces(t *testing.T) {
	dir := t.TempDir()
	results := sampleResults(smallRows)
	writeWith(t, dir, results, small...)
	d, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer d.Close()
	var refs []RowRef
	_, err = d.ScanColumns(nil, []string{"case_id"}, func(r *Row, ref RowRef) error {
		refs = append(refs, ref)
		// While piece ref.part is scanned, read a row of the last piece
		// and the row itself.
		other, err := d.ReadRow(RowRef{3, 0, 0})
		if err != nil {
			return err
		}
		if other.CaseIndex != 3*smallPieceRows {
			return fmt.Errorf("row {3 0 0}: case_index %d, want %d", other.CaseIndex, 3*smallPieceRows)
		}
		self, err := d.ReadRow(ref)
		if err != nil {
			return err
		}
		if self.CaseID != r.CaseID {
			return fmt.Errorf("ReadRow(%+v) is %s, the scan gave %s", ref, self.CaseID, r.CaseID)
		}
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	if len(refs) != smallRows {
		t.Fatalf("scanned %d rows, want %d", len(refs), smallRows)
	}
	// Row 100 is piece 3 (rows 96 … 143), group 0 (96 … 111), row 4.
	if refs[100] != (RowRef{2, 0, 4}) {
		t.Errorf("row 100: got ref %+v, want {part:2 group:0 row:4}", refs[100])
	}
}

// While a run is under way its finished pieces carry the partial prefix and
// the one being written is hidden, so a reader of final names sees nothing.
func TestPiecesHiddenUntilClose(t *testing.T) {
	dir := t.TempDir()
	w, err := Create(dir, testMeta, small...)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range sampleResults(2*smallPieceRows + 5) {
		if err := w.WriteResult(r); err != nil {
			t.Fatal(err)
		}
	}
	want := []string{
		".part-00001-of-00001-piece-00003.parquet.tmp",
		"_partial-part-00001-of-00001-piece-00001.parquet",
		"_partial-part-00001-of-00001-piece-00002.parquet",
	}
	if got := names(t, dir); !slices.Equal(got, want) {
		t.Errorf("during the run: got files %v, want %v", got, want)
	}
	if _, err := Open(dir); !errors.Is(err, ErrNoParts) {
		t.Errorf("Open during the run: got %v, want ErrNoParts", err)
	}
	if err := w.Abort(); err != nil {
		t.Fatal(err)
	}
	want = []string{
		"_partial-part-00001-of-00001-piece-00001.parquet",
		"_partial-part-00001-of-00001-piece-00002.parquet",
		"_partial-part-00001-of-00001-piece-00003.parquet",
	}
	if got := names(t, dir); !slices.Equal(got, want) {
		t.Errorf("after Abort: got files %v, want %v", got, want)
	}
	if got := w.Files(); len(got) != 3 || got[2] != filepath.Join(dir, want[2]) {
		t.Errorf("Files after Abort: got %v, want the three partial pieces", got)
	}
}

// stopAt writes the first n results with small pieces and stops as a run
// would: by Abort (SIGINT) or, killed, by nothing at all (SIGKILL leaves
// the piece being written without a footer under its hidden name).
func stopAt(t *testing.T, dir string, results []optimize.Result, n int, killed bool) {
	t.Helper()
	w, err := Create(dir, testMeta, small...)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range results[:n] {
		if err := w.WriteResult(r); err != nil {
			t.Fatal(err)
		}
	}
	if killed {
		w.tmp.Close() // the process died; the kernel closes its files
		return
	}
	if err := w.Abort(); err != nil {
		t.Fatal(err)
	}
}

// Resuming a run stopped inside a piece, on a piece boundary, in its first
// row group or killed outright gives the pieces of an uninterrupted run
// byte for byte, and leaves nothing else.
func TestResumeAcrossPieces(t *testing.T) {
	results := sampleResults(smallRows)
	whole := t.TempDir()
	writeWith(t, whole, results, small...)
	for _, tc := range []struct {
		name   string
		n      int
		killed bool
		kept   int // rows Resume finds
	}{
		{"inside piece 2", smallPieceRows + 20, false, smallPieceRows + 20},
		{"on the boundary of pieces 2 and 3", 2 * smallPieceRows, false, 2 * smallPieceRows},
		{"inside the first row group", 5, false, 5},
		{"killed inside piece 3", 2*smallPieceRows + 30, true, 2 * smallPieceRows},
		{"killed inside the last piece", 3*smallPieceRows + 7, true, 3 * smallPieceRows},
	} {
		t.Run(tc.name, func(t *testing.T) {
			dir := t.TempDir()
			stopAt(t, dir, results, tc.n, tc.killed)
			w, err := Resume(dir, testMeta, small...)
			if err != nil {
				t.Fatal(err)
			}
			if w.Rows() != tc.kept || w.FirstIndex() != 0 || w.LastIndex() != tc.kept-1 || w.LastCaseID() != results[tc.kept-1].Case.ID {
				t.Fatalf("resumed writer: rows %d, case_index %d to %d, last %q; want %d, 0 to %d, %q",
					w.Rows(), w.FirstIndex(), w.LastIndex(), w.LastCaseID(), tc.kept, tc.kept-1, results[tc.kept-1].Case.ID)
			}
			for _, r := range results[w.Rows():] {
				if err := w.WriteResult(r); err != nil {
					t.Fatal(err)
				}
			}
			if err := w.Close(); err != nil {
				t.Fatal(err)
			}
			if got := names(t, dir); !slices.Equal(got, pieceNames(4)) {
				t.Fatalf("after the resumed Close: got files %v, want %v", got, pieceNames(4))
			}
			for _, n := range pieceNames(4) {
				a, _ := os.ReadFile(filepath.Join(whole, n))
				b, _ := os.ReadFile(filepath.Join(dir, n))
				if !bytes.Equal(a, b) {
					t.Errorf("%s is not byte-identical to the uninterrupted run's (%d vs %d bytes)", n, len(b), len(a))
				}
			}
		})
	}
}

// Resume of a finished shard keeps its pieces as they are; a second
// Resume-Close changes nothing.
func TestResumeFinishedPieces(t *testing.T) {
	dir := t.TempDir()
	results := sampleResults(smallRows)
	writeWith(t, dir, results, small...)
	before := map[string][]byte{}
	for _, n := range pieceNames(4) {
		before[n], _ = os.ReadFile(filepath.Join(dir, n))
	}
	w, err := Resume(dir, testMeta, small...)
	if err != nil {
		t.Fatal(err)
	}
	if w.Rows() != smallRows || w.LastCaseID() != results[smallRows-1].Case.ID {
		t.Fatalf("resumed a finished shard: rows %d, last %q; want %d, %q", w.Rows(), w.LastCaseID(), smallRows, results[smallRows-1].Case.ID)
	}
	if err := w.Close(); err != nil {
		t.Fatal(err)
	}
	if got := names(t, dir); !slices.Equal(got, pieceNames(4)) {
		t.Fatalf("got files %v, want %v", got, pieceNames(4))
	}
	for n, b := range before {
		if after, _ := os.ReadFile(filepath.Join(dir, n)); !bytes.Equal(after, b) {
			t.Errorf("%s changed", n)
		}
	}
}

// A new run's Close replaces an earlier finished run of the shard, also
// when the new one has fewer pieces; before Close the earlier run's final
// pieces are untouched.
func TestCloseReplacesEarlierPieces(t *testing.T) {
	dir := t.TempDir()
	writeWith(t, dir, sampleResults(smallRows), small...)
	first, _ := os.ReadFile(filepath.Join(dir, pieceNames(1)[0]))
	w, err := Create(dir, testMeta, small...)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range sampleResults(smallRows)[:30] {
		if err := w.WriteResult(r); err != nil {
			t.Fatal(err)
		}
	}
	if got, _ := os.ReadFile(filepath.Join(dir, pieceNames(1)[0])); !bytes.Equal(got, first) {
		t.Errorf("the earlier run's piece 1 changed before Close")
	}
	if err := w.Close(); err != nil {
		t.Fatal(err)
	}
	if got := names(t, dir); !slices.Equal(got, pieceNames(1)) {
		t.Errorf("after Close: got files %v, want %v", got, pieceNames(1))
	}
	if got := len(readAll(t, dir)); got != 30 {
		t.Errorf("got %d rows, want 30", got)
	}
}

// Resume refuses pieces that are not one unbroken run of the shard, and
// changes no file when it does.
func TestResumeRefusesBrokenPieces(t *testing.T) {
	results := sampleResults(smallRows)
	for _, tc := range []struct {
		name  string
		spoil func(t *testing.T, dir string)
	}{
		{"piece 1 missing", func(t *testing.T, dir string) {
			os.Remove(filepath.Join(dir, "_partial-part-00001-of-00001-piece-00001.parquet"))
		}},
		{"a cut piece before a later one", func(t *testing.T, dir string) {
			// Piece 3 is the cut one (rows 96 … 109); a copy of piece 2
			// under number 4 follows it.
			b, _ := os.ReadFile(filepath.Join(dir, "_partial-part-00001-of-00001-piece-00002.parquet"))
			os.WriteFile(filepath.Join(dir, "_partial-part-00001-of-00001-piece-00004.parquet"), b, 0o644)
		}},
		{"partial and final of one piece", func(t *testing.T, dir string) {
			b, _ := os.ReadFile(filepath.Join(dir, "_partial-part-00001-of-00001-piece-00001.parquet"))
			os.WriteFile(filepath.Join(dir, "part-00001-of-00001-piece-00001.parquet"), b, 0o644)
		}},
		{"pieces out of order", func(t *testing.T, dir string) {
			p1 := filepath.Join(dir, "_partial-part-00001-of-00001-piece-00001.parquet")
			p2 := filepath.Join(dir, "_partial-part-00001-of-00001-piece-00002.parquet")
			os.Rename(p1, p1+".x")
			os.Rename(p2, p1)
			os.Rename(p1+".x", p2)
		}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			dir := t.TempDir()
			stopAt(t, dir, results, 2*smallPieceRows+14, false)
			tc.spoil(t, dir)
			before := map[string][]byte{}
			for _, n := range names(t, dir) {
				before[n], _ = os.ReadFile(filepath.Join(dir, n))
			}
			w, err := Resume(dir, testMeta, small...)
			if err == nil {
				w.Abort()
				t.Fatal("Resume: got nil error, want a refusal")
			}
			if errors.Is(err, ErrNothingToResume) {
				t.Fatalf("got %v, want a refusal other than nothing to resume", err)
			}
			after := names(t, dir)
			if len(after) != len(before) {
				t.Errorf("files after the refusal: %v, want those before", after)
			}
			for n, b := range before {
				if got, _ := os.ReadFile(filepath.Join(dir, n)); !bytes.Equal(got, b) {
					t.Errorf("%s changed", n)
				}
			}
		})
	}
}

func TestParseFileName(t *testing.T) {
	for _, tc := range []struct {
		name string
		want FileName
		ok   bool
	}{
		{"part-00002-of-00008-piece-00003.parquet", FileName{Shard{2, 8}, 3, false}, true},
		{"_partial-part-00002-of-00008-piece-00001.parquet", FileName{Shard{2, 8}, 1, true}, true},
		{"part-00001-of-00001.parquet", FileName{}, false},                     // no piece
		{"part-00003-of-00002-piece-00001.parquet", FileName{}, false},         // K > N
		{"part-00001-of-00001-piece-00000.parquet", FileName{}, false},         // pieces count from 1
		{"part-1-of-1-piece-1.parquet", FileName{}, false},                     // not padded
		{".part-00001-of-00001-piece-00001.parquet.tmp", FileName{}, false},    // being written
		{"part-00001-of-00001-piece-00001.parquet.partial", FileName{}, false}, // trailing text
	} {
		got, ok := ParseFileName(tc.name)
		if ok != tc.ok || got != tc.want {
			t.Errorf("ParseFileName(%q): got %+v, %v; want %+v, %v", tc.name, got, ok, tc.want, tc.ok)
		}
	}
	s := Shard{7, 12}
	if f, ok := ParseFileName(PartialName(s, 42)); !ok || f != (FileName{s, 42, true}) {
		t.Errorf("PartialName does not parse back: %+v, %v", f, ok)
	}
}

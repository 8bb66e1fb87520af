package dataset

import (
	"bytes"
	"errors"
	"github.com/spansweep/spansweep/optimize"
	"io/fs"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
)

func readAll(t *testing.T, dir string) []Row {
	t.Helper()
	d, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer d.Close()
	var rows []Row
	if err := d.Each(func(r *Row) error { rows = append(rows, r.Clone()); return nil }); err != nil {
		t.Fatal(err)
	}
	return rows
}

func names(t *testing.T, dir string) []string {
	t.Helper()
	ents, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	var out []string
	for _, e := range ents {
		out = append(out, e.Name())
	}
	return out
}

func TestNoFinalFileBeforeClose(t *testing.T) {
	dir := t.TempDir()
	w, err := Create(dir, testMeta)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range sampleResults(RowGroupRows + 5) { // one row group flushed to the temp file
		if err := w.WriteResult(r); err != nil {
			t.Fatal(err)
		}
	}
	if got := names(t, dir); !reflect.DeepEqual(got, []string{".part-00001-of-00001-piece-00001.parquet.tmp"}) {
		t.Errorf("before Close: got files %v, want only the temporary part", got)
	}
	if _, err := Open(dir); !errors.Is(err, ErrNoParts) {
		t.Errorf("Open before Close: got %v, want ErrNoParts", err)
	}
	if err := w.Close(); err != nil {
		t.Fatal(err)
	}
	if got := names(t, dir); !reflect.DeepEqual(got, []string{"part-00001-of-00001-piece-00001.parquet"}) {
		t.Errorf("after Close: got files %v, want only the final part", got)
	}
	if got := len(readAll(t, dir)); got != RowGroupRows+5 {
		t.Errorf("got %d rows, want %d", got, RowGroupRows+5)
	}
}

func TestTempRemovedWhenFinalizeFails(t *testing.T) {
	dir := t.TempDir()
	// A non-empty directory under the final name makes the rename fail.
	if err := os.MkdirAll(filepath.Join(dir, "part-00001-of-00001-piece-00001.parquet", "x"), 0o755); err != nil {
		t.Fatal(err)
	}
	w, err := Create(dir, testMeta)
	if err != nil {
		t.Fatal(err)
	}
	if err := w.WriteResult(sampleResults(1)[0]); err != nil {
		t.Fatal(err)
	}
	if err := w.Close(); err == nil {
		t.Fatal("Close: got nil error, want the rename failure")
	}
	if _, err := os.Stat(filepath.Join(dir, ".part-00001-of-00001-piece-00001.parquet.tmp")); !errors.Is(err, fs.ErrNotExist) {
		t.Errorf("temporary part after a failed Close: got %v, want it removed", err)
	}
}

func TestUnwritableDirectory(t *testing.T) {
	file := filepath.Join(t.TempDir(), "plain-file")
	if err := os.WriteFile(file, nil, 0o644); err != nil {
		t.Fatal(err)
	}
	_, err := Create(filepath.Join(file, "dataset"), testMeta)
	if err == nil || !strings.Contains(err.Error(), "create directory") {
		t.Errorf("got %v, want a create directory error", err)
	}
}

func TestRowsMustComeInOrder(t *testing.T) {
	w, err := Create(t.TempDir(), testMeta)
	if err != nil {
		t.Fatal(err)
	}
	defer w.Abort()
	rs := sampleResults(2)
	if err := w.WriteResult(rs[1]); err != nil {
		t.Fatal(err)
	}
	if err := w.WriteResult(rs[0]); err == nil || !strings.Contains(err.Error(), "enumeration order") {
		t.Errorf("got %v, want an enumeration order error", err)
	}
}

func TestAbortWithoutRowsRemovesTemp(t *testing.T) {
	dir := t.TempDir()
	w, err := Create(dir, testMeta)
	if err != nil {
		t.Fatal(err)
	}
	if err := w.Abort(); err != nil {
		t.Fatal(err)
	}
	if got := names(t, dir); len(got) != 0 {
		t.Errorf("got files %v, want none", got)
	}
}

// interrupt writes the first n results and aborts, as a run stopped by
// Ctrl-C would.
func interrupt(t *testing.T, dir string, results []optimize.Result, n int) {
	t.Helper()
	w, err := Create(dir, testMeta)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range results[:n] {
		if err := w.WriteResult(r); err != nil {
			t.Fatal(err)
		}
	}
	if err := w.Abort(); err != nil {
		t.Fatal(err)
	}
}

func TestResumeEqualsUninterrupted(t *testing.T) {
	results := sampleResults(RowGroupRows + 300)
	whole, stopped := t.TempDir(), t.TempDir()
	if err := writeAll(whole, testMeta, results); err != nil {
		t.Fatal(err)
	}
	interrupt(t, stopped, results, RowGroupRows+123)
	if got := names(t, stopped); !reflect.DeepEqual(got, []string{"_partial-part-00001-of-00001-piece-00001.parquet"}) {
		t.Fatalf("after Abort: got files %v, want only the partial part", got)
	}
	w, err := Resume(stopped, testMeta)
	if err != nil {
		t.Fatal(err)
	}
	// The kept rows are the unbroken prefix 0 … RowGroupRows+122 of the
	// results (interrupt wrote exactly those).
	kept := RowGroupRows + 123
	if w.Rows() != kept || w.FirstIndex() != 0 || w.LastIndex() != kept-1 || w.LastCaseID() != results[kept-1].Case.ID {
		t.Fatalf("resumed writer: got rows %d, case_index %d to %d, last id %q; want %d, 0 to %d, %q",
			w.Rows(), w.FirstIndex(), w.LastIndex(), w.LastCaseID(), kept, kept-1, results[kept-1].Case.ID)
	}
	skipped := 0
	for _, r := range results {
		if r.Case.Index <= w.LastIndex() {
			skipped++
			continue
		}
		if err := w.WriteResult(r); err != nil {
			t.Fatal(err)
		}
	}
	if skipped != RowGroupRows+123 {
		t.Errorf("resume skipped %d cases, want %d", skipped, RowGroupRows+123)
	}
	if err := w.Close(); err != nil {
		t.Fatal(err)
	}
	if got := names(t, stopped); !reflect.DeepEqual(got, []string{"part-00001-of-00001-piece-00001.parquet"}) {
		t.Errorf("after resumed Close: got files %v, want only the final part", got)
	}
	a, b := readAll(t, whole), readAll(t, stopped)
	if !reflect.DeepEqual(a, b) {
		t.Errorf("resumed rows differ from an uninterrupted run (%d vs %d rows)", len(b), len(a))
	}
	fa, _ := os.ReadFile(filepath.Join(whole, "part-00001-of-00001-piece-00001.parquet"))
	fb, _ := os.ReadFile(filepath.Join(stopped, "part-00001-of-00001-piece-00001.parquet"))
	if !bytes.Equal(fa, fb) {
		t.Errorf("resumed part is not byte-identical to the uninterrupted one (%d vs %d bytes)", len(fb), len(fa))
	}
}

func TestResumeRefusesAnotherGrid(t *testing.T) {
	for _, tc := range []struct {
		name string
		edit func(*Meta)
		key  string
	}{
		{"grid", func(m *Meta) { m.GridSHA256 = "other" }, KeyGridSHA256},
		{"catalogue", func(m *Meta) { m.CatalogSHA256 = "other" }, KeyCatalogSHA256},
		{"program", func(m *Meta) { m.ProgramVersion = "test-2" }, KeyProgramVersion},
	} {
		t.Run(tc.name, func(t *testing.T) {
			dir := t.TempDir()
			interrupt(t, dir, sampleResults(10), 4)
			before, _ := os.ReadFile(filepath.Join(dir, "_partial-part-00001-of-00001-piece-00001.parquet"))
			m := testMeta
			tc.edit(&m)
			_, err := Resume(dir, m)
			var me *MismatchError
			if !errors.As(err, &me) || me.Key != tc.key {
				t.Fatalf("got %v, want a MismatchError on %s", err, tc.key)
			}
			after, _ := os.ReadFile(filepath.Join(dir, "_partial-part-00001-of-00001-piece-00001.parquet"))
			if got := names(t, dir); len(got) != 1 || !bytes.Equal(before, after) {
				t.Errorf("after a refused resume: files %v, partial unchanged %v; want the partial alone, unchanged", got, bytes.Equal(before, after))
			}
		})
	}
}

func TestResumeWithNothingToResume(t *testing.T) {
	if _, err := Resume(t.TempDir(), testMeta); !errors.Is(err, ErrNothingToResume) {
		t.Errorf("got %v, want ErrNothingToResume", err)
	}
}

package dataset

import (
	"errors"
	"io/fs"
	"os"
	"path/filepath"
	"reflect"
	"testing"

	"github.com/parquet-go/parquet-go"
)

func TestShardsReadAsOne(t *testing.T) {
	dir := t.TempDir()
	results := sampleResults(30)
	cuts := []int{0, 10, 20, 30}
	for k := 1; k <= 3; k++ {
		m := testMeta
		m.Shard = Shard{k, 3}
		if err := writeAll(dir, m, results[cuts[k-1]:cuts[k]]); err != nil {
			t.Fatal(err)
		}
	}
	rows := readAll(t, dir)
	if len(rows) != len(results) {
		t.Fatalf("got %d rows, want %d", len(rows), len(results))
	}
	for i, r := range rows {
		if r.CaseID != results[i].Case.ID {
			t.Fatalf("row %d: got case %s, want %s", i, r.CaseID, results[i].Case.ID)
		}
	}
}

func TestOpenErrors(t *testing.T) {
	t.Run("missing", func(t *testing.T) {
		if _, err := Open(filepath.Join(t.TempDir(), "nope")); !errors.Is(err, fs.ErrNotExist) {
			t.Errorf("got %v, want fs.ErrNotExist", err)
		}
	})
	t.Run("corrupt", func(t *testing.T) {
		dir := t.TempDir()
		os.WriteFile(filepath.Join(dir, "part-00001-of-00001-piece-00001.parquet"), []byte("not parquet"), 0o644)
		if _, err := Open(dir); err == nil {
			t.Error("got nil error, want a not-readable error")
		}
	})
	t.Run("other schema version", func(t *testing.T) {
		dir := t.TempDir()
		f, _ := os.Create(filepath.Join(dir, "part-00001-of-00001-piece-00001.parquet"))
		w := parquet.NewWriter(f, schema, parquet.KeyValueMetadata(KeySchemaVersion, "0"))
		w.Close()
		f.Close()
		var ve *VersionError
		if _, err := Open(dir); !errors.As(err, &ve) || ve.Got != "0" {
			t.Errorf("got %v, want a VersionError for version 0", err)
		}
	})
	t.Run("mixed grids", func(t *testing.T) {
		dir := t.TempDir()
		m1, m2 := testMeta, testMeta
		m1.Shard, m2.Shard, m2.GridSHA256 = Shard{1, 2}, Shard{2, 2}, "other"
		writeAll(dir, m1, sampleResults(2)[:1])
		writeAll(dir, m2, sampleResults(2)[1:])
		var me *MismatchError
		if _, err := Open(dir); !errors.As(err, &me) || me.Key != KeyGridSHA256 {
			t.Errorf("got %v, want a MismatchError on grid_sha256", err)
		}
	})
}

func TestScanSkipsRowGroupsByStatistics(t *testing.T) {
	dir := t.TempDir()
	results := sampleResults(3 * RowGroupRows)
	if err := writeAll(dir, testMeta, results); err != nil {
		t.Fatal(err)
	}
	d, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer d.Close()
	// case_index is ascending, so only the last row group can hold ≥ 2·4096.
	lo := float64(2*RowGroupRows + 10)
	want := 0
	for _, r := range results {
		if float64(r.Case.Index) >= lo && r.Case.Wind.HousingClass == "N2" {
			want++
		}
	}
	st, err := d.Scan(Filter{AtLeast("case_index", lo), Equal("wind_class", "N2")}, func(r *Row) error {
		if float64(r.CaseIndex) < lo || r.WindClass != "N2" {
			t.Fatalf("row %d (%s) does not meet the filter", r.CaseIndex, r.WindClass)
		}
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	if st.RowGroups != 3 || st.RowGroupsRead != 1 || st.RowsMatched != want {
		t.Errorf("got %+v, want 3 groups, 1 read, %d rows", st, want)
	}
	if _, err := d.Scan(Filter{AtLeast("base", 1)}, nil); err == nil {
		t.Error("numeric bound on a text column: got nil error")
	}
}

func TestScanColumnsAndReadRow(t *testing.T) {
	dir := t.TempDir()
	if err := writeAll(dir, testMeta, sampleResults(RowGroupRows+50)); err != nil {
		t.Fatal(err)
	}
	full := readAll(t, dir)
	d, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer d.Close()
	i := 0
	_, err = d.ScanColumns(Filter{Equal("status", "ok")}, []string{"case_id", "purlin_designation", "q_uls_kpa"}, func(r *Row, ref RowRef) error {
		for full[i].Status != "ok" {
			i++
		}
		w := full[i]
		if r.CaseID != w.CaseID || r.Member("purlin").Designation != w.Member("purlin").Designation || r.QULSKPa != w.QULSKPa {
			t.Fatalf("projected row %d: got %s %s %g, want %s %s %g", i, r.CaseID, r.Member("purlin").Designation, r.QULSKPa,
				w.CaseID, w.Member("purlin").Designation, w.QULSKPa)
		}
		if r.SpanM != 0 || r.Members[2].MassKg != 0 {
			t.Fatalf("projected row %d: columns not asked for are set", i)
		}
		if i%997 == 0 {
			whole, err := d.ReadRow(ref)
			if err != nil {
				t.Fatal(err)
			}
			if !reflect.DeepEqual(whole, w) {
				t.Fatalf("ReadRow %+v: got %+v, want %+v", ref, whole, w)
			}
		}
		i++
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
}

package main

import (
	"fmt"
	"io"
	"reflect"

	"github.com/spansweep/spansweep/outputs/dataset"
)

// differError says two datasets differ: exit status 1, not a usage error.
type differError struct{ msg string }

func (e *differError) Error() string { return e.msg }

// maxDiffs bounds the differences listed.
const maxDiffs = 10

// compareCommand compares two dataset directories and prints the verdict.
func compareCommand(a, b string, ignore []string, stdout io.Writer) error {
	n, diffs, err := compareDatasets(a, b, ignore...)
	if err != nil {
		return err
	}
	if len(diffs) > 0 {
		for _, d := range diffs {
			fmt.Fprintln(stdout, d)
		}
		return &differError{msg: fmt.Sprintf("%s and %s differ (%d differences listed)", a, b, len(diffs))}
	}
	fmt.Fprintf(stdout, "%s and %s hold the same %d rows in the same order\n", a, b, n)
	return nil
}

// compareDatasets reads the datasets in dirs a and b (every part of each, as
// one) and lists the first differences: row count, then row by row in order.
// Provenance columns count too, so parts of another grid or catalogue differ.
// Fields named in ignore (dataset.Row field names) are left out.
func compareDatasets(a, b string, ignore ...string) (rows int, diffs []string, err error) {
	ra, err := readRows(a)
	if err != nil {
		return 0, nil, err
	}
	rb, err := readRows(b)
	if err != nil {
		return 0, nil, err
	}
	for _, f := range ignore {
		if err := clearField(ra, f); err != nil {
			return 0, nil, err
		}
		if err := clearField(rb, f); err != nil {
			return 0, nil, err
		}
	}
	if len(ra) != len(rb) {
		diffs = append(diffs, fmt.Sprintf("row count: %s has %d, %s has %d", a, len(ra), b, len(rb)))
	}
	for i := range min(len(ra), len(rb)) {
		if len(diffs) >= maxDiffs {
			break
		}
		if !reflect.DeepEqual(ra[i], rb[i]) {
			diffs = append(diffs, fmt.Sprintf("row %d: %s has case %s (%s, %.6g kg), %s has case %s (%s, %.6g kg)%s",
				i, a, ra[i].CaseID, ra[i].Status, ra[i].SteelMassKg, b, rb[i].CaseID, rb[i].Status, rb[i].SteelMassKg, firstField(ra[i], rb[i])))
		}
	}
	return len(ra), diffs, nil
}

// readRows reads every row of the dataset in dir.
func readRows(dir string) ([]dataset.Row, error) {
	d, err := dataset.Open(dir)
	if err != nil {
		return nil, err
	}
	defer d.Close()
	var rows []dataset.Row
	err = d.Each(func(r *dataset.Row) error {
		rows = append(rows, r.Clone())
		return nil
	})
	return rows, err
}

// firstField names the first field in which two rows differ.
func firstField(a, b dataset.Row) string {
	va, vb := reflect.ValueOf(a), reflect.ValueOf(b)
	for i := range va.NumField() {
		if !reflect.DeepEqual(va.Field(i).Interface(), vb.Field(i).Interface()) {
			return fmt.Sprintf("; first differing field %s", va.Type().Field(i).Name)
		}
	}
	return ""
}

// clearField sets field name of every row to its zero value.
func clearField(rows []dataset.Row, name string) error {
	f, ok := reflect.TypeFor[dataset.Row]().FieldByName(name)
	if !ok || len(f.Index) != 1 {
		return usagef("--ignore %s: no such dataset field (use the Go field names of dataset.Row, e.g. Analyses)", name)
	}
	for i := range rows {
		v := reflect.ValueOf(&rows[i]).Elem().Field(f.Index[0])
		v.SetZero()
	}
	return nil
}

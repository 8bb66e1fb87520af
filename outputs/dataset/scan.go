package dataset

import (
	"fmt"
	"math"

	"github.com/parquet-go/parquet-go"
)

// Bound restricts one column: a numeric column to [Min, Max], a string
// column to the value Text. Build one with AtLeast, Between or Equal.
type Bound struct {
	Column   string
	Min, Max float64
	Text     string
	isText   bool
}

// AtLeast keeps rows whose numeric column is ≥ v.
func AtLeast(column string, v float64) Bound {
	return Bound{Column: column, Min: v, Max: math.Inf(1)}
}

// Between keeps rows whose numeric column lies in [lo, hi].
func Between(column string, lo, hi float64) Bound {
	return Bound{Column: column, Min: lo, Max: hi}
}

// Equal keeps rows whose string column equals s.
func Equal(column, s string) Bound {
	return Bound{Column: column, Text: s, isText: true}
}

// Filter is a conjunction of bounds.
type Filter []Bound

// ScanStats tells how much of the dataset a scan decoded.
type ScanStats struct {
	RowGroups     int // row groups in the dataset
	RowGroupsRead int // row groups whose statistics could match and were decoded
	RowsMatched   int // rows passed to the callback
}

// boundIndex is a Bound resolved to its column.
type boundIndex struct {
	Bound
	col int
}

func (f Filter) resolve() ([]boundIndex, error) {
	out := make([]boundIndex, len(f))
	probe := NewRow()
	for i, b := range f {
		c, ok := columnByName[b.Column]
		if !ok {
			return nil, fmt.Errorf("dataset: filter: unknown column %q", b.Column)
		}
		_, isString := columns[c].ref(&probe).(*string)
		if isString != b.isText {
			return nil, fmt.Errorf("dataset: filter: column %q is %s", b.Column, map[bool]string{true: "text: use Equal", false: "numeric: use AtLeast or Between"}[isString])
		}
		out[i] = boundIndex{b, c}
	}
	return out, nil
}

// matchRow reports whether r meets every bound.
func matchRow(bs []boundIndex, r *Row) bool {
	for _, b := range bs {
		switch p := columns[b.col].ref(r).(type) {
		case *string:
			if *p != b.Text {
				return false
			}
		case *float64:
			if *p < b.Min || *p > b.Max {
				return false
			}
		case *int:
			if v := float64(*p); v < b.Min || v > b.Max {
				return false
			}
		}
	}
	return true
}

// bounded is the part of parquet.ColumnChunk that exposes chunk statistics.
type bounded interface {
	Bounds() (min, max parquet.Value, ok bool)
}

// mayMatch reports whether row group g of p can hold a row meeting every
// bound, from the column chunks' min and max statistics alone.
func (p *part) mayMatch(bs []boundIndex, g parquet.RowGroup) bool {
	chunks := g.ColumnChunks()
	for _, b := range bs {
		cb, ok := chunks[p.oursToFile[b.col]].(bounded)
		if !ok {
			continue
		}
		lo, hi, ok := cb.Bounds()
		if !ok {
			continue
		}
		if b.isText {
			if string(lo.ByteArray()) > b.Text || string(hi.ByteArray()) < b.Text {
				return false
			}
			continue
		}
		l, h := number(lo), number(hi)
		if h < b.Min || l > b.Max {
			return false
		}
	}
	return true
}

func number(v parquet.Value) float64 {
	if v.Kind() == parquet.Double {
		return v.Double()
	}
	return float64(v.Int64())
}

// Scan calls fn, in order, for every row that meets the filter. Row groups
// whose column statistics rule the filter out are skipped undecoded. The
// Row passed to fn is reused: fn must Clone it to keep it.
func (d *Dataset) Scan(f Filter, fn func(*Row) error) (ScanStats, error) {
	var st ScanStats
	bs, err := f.resolve()
	if err != nil {
		return st, err
	}
	for i := range d.files {
		p, done, err := d.piece(i)
		if err != nil {
			return st, err
		}
		err = p.scan(bs, &st, fn)
		done()
		if err != nil {
			return st, err
		}
	}
	return st, nil
}

// scan is Scan over the row groups of one part.
func (p *part) scan(bs []boundIndex, st *ScanStats, fn func(*Row) error) error {
	for _, g := range p.pf.RowGroups() {
		st.RowGroups++
		if !p.mayMatch(bs, g) {
			continue
		}
		st.RowGroupsRead++
		err := p.readGroup(g, func(r *Row) error {
			if !matchRow(bs, r) {
				return nil
			}
			st.RowsMatched++
			return fn(r)
		})
		if err != nil {
			return err
		}
	}
	return nil
}

package dataset_test

import (
	"fmt"
	"log"
	"os"

	"github.com/spansweep/spansweep/outputs/dataset"
)

// A sweep writes one part per shard; a reader opens the directory and scans
// it, skipping row groups whose statistics rule the filter out.
func Example() {
	dir, err := os.MkdirTemp("", "dataset-example")
	if err != nil {
		log.Fatal(err)
	}
	defer os.RemoveAll(dir)

	w, err := dataset.Create(dir, dataset.Meta{ProgramVersion: "example", GridSHA256: "g", CatalogSHA256: "c"})
	if err != nil {
		log.Fatal(err)
	}
	for i, span := range []float64{6, 9, 12} {
		r := dataset.NewRow()
		r.CaseIndex, r.CaseID, r.SpanM, r.Status, r.SteelMassKg = i, fmt.Sprintf("case-%d", i), span, "ok", 100*span
		if err := w.Write(r); err != nil {
			log.Fatal(err)
		}
	}
	if err := w.Close(); err != nil {
		log.Fatal(err)
	}

	d, err := dataset.Open(dir)
	if err != nil {
		log.Fatal(err)
	}
	defer d.Close()
	_, err = d.Scan(dataset.Filter{dataset.AtLeast("span_m", 8)}, func(r *dataset.Row) error {
		fmt.Printf("%s span %.4g m steel %.4g kg\n", r.CaseID, r.SpanM, r.SteelMassKg)
		return nil
	})
	if err != nil {
		log.Fatal(err)
	}
	fmt.Println(d.Parts()[0][len(dir)+1:], d.Meta().Shard)
	// Output:
	// case-1 span 9 m steel 900 kg
	// case-2 span 12 m steel 1200 kg
	// part-00001-of-00001-piece-00001.parquet 1/1
}

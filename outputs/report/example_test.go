package report_test

import (
	"fmt"

	"github.com/spansweep/spansweep/outputs/report"
)

// The file name's extension picks the report's format.
func ExampleFormatOf() {
	f, err := report.FormatOf("calc.html")
	fmt.Println(f, err)
	_, err = report.FormatOf("calc.pdf")
	fmt.Println(err)
	// Output:
	// html <nil>
	// report file "calc.pdf": extension ".pdf": allowed .md or .html
}

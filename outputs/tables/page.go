package tables

import (
	"bufio"
	"encoding/csv"
	"fmt"
	"io"
)

// format is one of the files a set of tables is written as.
type format int

const (
	formatCSV format = iota
	formatMarkdown
	formatHTML
	numFormats
)

// tableBody is one table as the page writers take it: its key, for the
// title, and its body in a format (CSV records, or the Markdown or HTML
// grid and footnotes) without the title. A Set renders bodies when asked;
// a Stream copies the ones it rendered as each table was finished.
type tableBody struct {
	key   Key
	write func(w io.Writer, f format) error
}

// renderBody writes table t's body in format f.
func renderBody(w io.Writer, f format, t *Table) error {
	switch f {
	case formatCSV:
		cw := csv.NewWriter(w)
		for i, row := range t.Cells {
			for j, c := range row {
				if c != nil {
					cw.Write(csvRecord(t, t.SpansM[i], t.Columns[j], c))
				}
			}
		}
		cw.Flush()
		return cw.Error()
	case formatMarkdown:
		writeMarkdownGrid(w, t)
		return nil
	case formatHTML:
		return pageTemplate.ExecuteTemplate(w, "table-body", htmlTableOf(t))
	}
	return fmt.Errorf("span tables: unknown format %d", f)
}

// writeCSVPage writes the CSV header and every table's records.
func writeCSVPage(w io.Writer, bodies []tableBody) error {
	cw := csv.NewWriter(w)
	cw.Write(CSVHeader)
	cw.Flush()
	if err := cw.Error(); err != nil {
		return fmt.Errorf("span tables: csv: %w", err)
	}
	for _, b := range bodies {
		if err := b.write(w, formatCSV); err != nil {
			return fmt.Errorf("span tables: csv: %w", err)
		}
	}
	return nil
}

// writeMarkdownPage writes title, caution, assumptions, every table with
// its footnotes, and the caution again.
func writeMarkdownPage(w io.Writer, a Assumptions, v varying, m marks, bodies []tableBody) error {
	bw := bufio.NewWriter(w)
	fmt.Fprintf(bw, "# %s\n\n> %s\n\n", mdEscape(pageTitle(a)), Caution)
	for _, sec := range headerSections(a, standardNotes(v, m)) {
		fmt.Fprintf(bw, "## %s\n\n", sec.Heading)
		for _, it := range sec.Items {
			fmt.Fprintf(bw, "- %s\n", mdEscape(it))
		}
		fmt.Fprintln(bw)
	}
	for _, b := range bodies {
		fmt.Fprintf(bw, "## %s\n\n", mdEscape(v.title(b.key)))
		if err := b.write(bw, formatMarkdown); err != nil {
			return fmt.Errorf("span tables: markdown: %w", err)
		}
		fmt.Fprintln(bw)
	}
	fmt.Fprintf(bw, "> %s\n", Caution)
	if err := bw.Flush(); err != nil {
		return fmt.Errorf("span tables: markdown: %w", err)
	}
	return nil
}

// writeHTMLPage writes one printable page: the caution, the assumptions,
// every table, and the caution again.
func writeHTMLPage(w io.Writer, a Assumptions, paper Paper, v varying, m marks, bodies []tableBody) error {
	if paper == "" {
		paper = A4
	}
	if paper != A4 && paper != A3 {
		return fmt.Errorf("span tables: html: paper %q: want %q or %q", paper, A4, A3)
	}
	bw := bufio.NewWriter(w)
	top := struct {
		Title    string
		Paper    Paper
		Caution  string
		Sections []section
	}{pageTitle(a), paper, Caution, headerSections(a, standardNotes(v, m))}
	if err := pageTemplate.ExecuteTemplate(bw, "page-top", top); err != nil {
		return fmt.Errorf("span tables: html: %w", err)
	}
	for _, b := range bodies {
		if err := pageTemplate.ExecuteTemplate(bw, "table-title", v.title(b.key)); err != nil {
			return fmt.Errorf("span tables: html: %w", err)
		}
		if err := b.write(bw, formatHTML); err != nil {
			return fmt.Errorf("span tables: html: %w", err)
		}
	}
	if err := pageTemplate.ExecuteTemplate(bw, "page-bottom", Caution); err != nil {
		return fmt.Errorf("span tables: html: %w", err)
	}
	if err := bw.Flush(); err != nil {
		return fmt.Errorf("span tables: html: %w", err)
	}
	return nil
}

func pageTitle(a Assumptions) string {
	if a.Title == "" {
		return "Span tables"
	}
	return a.Title
}

// bodies renders the set's tables on demand, in Set order.
func (s *Set) bodies() []tableBody {
	out := make([]tableBody, len(s.Tables))
	for i := range s.Tables {
		t := &s.Tables[i]
		out[i] = tableBody{key: t.Key, write: func(w io.Writer, f format) error { return renderBody(w, f, t) }}
	}
	return out
}

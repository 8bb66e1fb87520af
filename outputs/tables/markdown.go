package tables

import (
	"bufio"
	"fmt"
	"io"
	"strings"
)

// WriteMarkdown writes the whole set: title, caution, assumptions, every
// table with its footnotes, and the caution again.
func (s *Set) WriteMarkdown(w io.Writer, a Assumptions) error {
	return writeMarkdownPage(w, a, s.varying(), s.marks(), s.bodies())
}

// WriteMarkdownTable writes one table and its footnotes, followed by the
// caution: the README excerpt.
func (s *Set) WriteMarkdownTable(w io.Writer, t *Table) error {
	bw := bufio.NewWriter(w)
	fmt.Fprintf(bw, "**%s**\n\n", mdEscape(s.Title(t)))
	writeMarkdownGrid(bw, t)
	fmt.Fprintf(bw, "\n> %s\n", Caution)
	if err := bw.Flush(); err != nil {
		return fmt.Errorf("span tables: markdown: %w", err)
	}
	return nil
}

// writeMarkdownGrid writes a table's grid and its footnotes; errors show
// when the caller flushes its buffer.
func writeMarkdownGrid(w io.Writer, t *Table) {
	numbers, list := notes(t)
	fmt.Fprint(w, "| Span \\ Length |")
	for _, c := range t.Columns {
		fmt.Fprintf(w, " %s |", mdEscape(c.Label()))
	}
	fmt.Fprint(w, "\n|---|")
	for range t.Columns {
		fmt.Fprint(w, "---|")
	}
	fmt.Fprintln(w)
	for i, row := range t.Cells {
		fmt.Fprintf(w, "| **%s** |", spanText(t.SpansM[i]))
		for j, c := range row {
			fmt.Fprintf(w, " %s |", mdEscape(strings.Join(cellLines(c, numbers[i][j]), "<br>")))
		}
		fmt.Fprintln(w)
	}
	if len(list) > 0 {
		fmt.Fprintln(w)
	}
	for _, n := range list {
		fmt.Fprintf(w, "%d. %s %s: %s\n", n.N, markNoSolution, mdEscape(n.Where), mdEscape(n.Reason))
	}
}

// mdEscape keeps a table cell in one piece: pipes and newlines would break it.
func mdEscape(s string) string { return mdCell.Replace(s) }

// mdCell is mdEscape's replacer, built once: a Replacer per call was the
// largest allocation of a million-case tables pass.
var mdCell = strings.NewReplacer("|", "\\|", "\n", " ")

// section is one titled list of the page header.
type section struct {
	Heading string
	Items   []string
}

// headerSections is the page header shared by the Markdown and HTML pages;
// notes are the standard reading notes.
func headerSections(a Assumptions, notes []string) []section {
	var about []string
	for _, f := range []struct{ label, value string }{
		{"Maker", a.Maker}, {"Generated", a.Generated}, {"Program version", a.Version},
		{"Grid", a.Grid}, {"Catalogue", a.Catalogue},
	} {
		if f.value != "" {
			about = append(about, f.label+": "+f.value)
		}
	}
	var out []section
	for _, sec := range []section{
		{"About these tables", about},
		{"Standards and editions", a.Standards},
		{"Defaults", a.Defaults},
		{"Limit-state criteria", a.LimitStates},
		{"Notes", a.Notes},
		{"Reading the tables", notes},
	} {
		if len(sec.Items) > 0 {
			out = append(out, sec)
		}
	}
	return out
}

package report

import (
	"fmt"
	"io"
	"strings"
)

// WriteMarkdown writes the report as Markdown: the caution, every section
// with its tables, the force diagrams as tables of values, and the caution
// again.
func (r Report) WriteMarkdown(w io.Writer) error {
	d, err := r.build()
	if err != nil {
		return err
	}
	p := &printer{w: w}
	p.printf("# %s\n\n> **%s**\n", mdText(d.title), Caution)
	for _, s := range d.sections {
		p.printf("\n## %s\n", mdText(s.heading))
		for _, b := range s.blocks {
			p.printf("\n")
			mdBlock(p, b)
		}
	}
	p.printf("\n---\n\n> **%s**\n", Caution)
	if p.err != nil {
		return fmt.Errorf("report: markdown: %w", p.err)
	}
	return nil
}

func mdBlock(p *printer, b block) {
	switch b := b.(type) {
	case *para:
		p.printf("%s\n", mdText(b.text))
	case *subheading:
		p.printf("### %s\n", mdText(b.text))
	case *list:
		for _, it := range b.items {
			p.printf("- %s\n", mdText(it))
		}
	case *table:
		mdTable(p, b)
	case *figure:
		p.printf("**Figure: %s.** %s\n\n", mdText(b.caption), mdText(extremes(b.diagram)))
		mdTable(p, diagramTable(b.diagram))
	}
}

func mdTable(p *printer, t *table) {
	p.printf("|")
	for _, h := range t.head {
		p.printf(" %s |", mdCell(h))
	}
	p.printf("\n|")
	for range t.head {
		p.printf("---|")
	}
	p.printf("\n")
	for _, r := range t.rows {
		p.printf("|")
		for _, c := range r.cells {
			c = mdCell(c)
			if r.highlight && c != "" {
				c = "**" + c + "**"
			}
			p.printf(" %s |", c)
		}
		p.printf("\n")
	}
}

// mdText escapes the characters Markdown would read as emphasis or HTML.
// Underscores are left alone: CommonMark reads no emphasis inside a word
// (V_des, K_c,i).
var mdReplacer = strings.NewReplacer("*", `\*`, "<", "&lt;", ">", "&gt;", "\n", " ")

func mdText(s string) string { return mdReplacer.Replace(s) }

// mdCell also escapes the table's column separator.
func mdCell(s string) string { return strings.ReplaceAll(mdText(s), "|", `\|`) }

// printer keeps the first write error.
type printer struct {
	w   io.Writer
	err error
}

func (p *printer) printf(format string, a ...any) {
	if p.err == nil {
		_, p.err = fmt.Fprintf(p.w, format, a...)
	}
}

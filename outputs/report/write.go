package report

import (
	"bytes"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
)

// Format is a report's file format.
type Format int

const (
	Markdown Format = iota
	HTML
)

// String returns the format's name: "markdown" or "html".
func (f Format) String() string {
	switch f {
	case Markdown:
		return "markdown"
	case HTML:
		return "html"
	}
	return fmt.Sprintf("Format(%d)", int(f))
}

// FormatError is a report file name whose extension names no format.
type FormatError struct{ Path string }

func (e *FormatError) Error() string {
	return fmt.Sprintf("report file %q: extension %q: allowed .md or .html", e.Path, filepath.Ext(e.Path))
}

// FormatOf picks the format from a file name's extension (.md, .markdown,
// .html, .htm; any case), or returns a *FormatError.
func FormatOf(path string) (Format, error) {
	switch strings.ToLower(filepath.Ext(path)) {
	case ".md", ".markdown":
		return Markdown, nil
	case ".html", ".htm":
		return HTML, nil
	}
	return 0, &FormatError{Path: path}
}

// Write writes the report in format f.
func (r Report) Write(w io.Writer, f Format) error {
	switch f {
	case Markdown:
		return r.WriteMarkdown(w)
	case HTML:
		return r.WriteHTML(w)
	}
	return fmt.Errorf("report: format %v: allowed markdown or html", f)
}

// WriteFile writes the report to path in the format its extension names.
// The file appears whole or not at all: the report is written to a
// temporary file in the same directory and renamed over path.
func (r Report) WriteFile(path string) error {
	f, err := FormatOf(path)
	if err != nil {
		return err
	}
	var buf bytes.Buffer
	if err := r.Write(&buf, f); err != nil {
		return err
	}
	return writeAtomic(path, buf.Bytes())
}

// writeAtomic writes data to a temporary file beside path, syncs it and
// renames it over path.
func writeAtomic(path string, data []byte) (err error) {
	dir := filepath.Dir(path)
	if fi, statErr := os.Stat(path); statErr == nil && fi.IsDir() {
		return fmt.Errorf("report file %s: is a directory", path)
	}
	tmp, err := os.CreateTemp(dir, "."+filepath.Base(path)+".tmp-*")
	if err != nil {
		return fmt.Errorf("report file %s: %w", path, err)
	}
	defer func() {
		if err != nil {
			tmp.Close()
			os.Remove(tmp.Name())
		}
	}()
	if _, err = tmp.Write(data); err != nil {
		return fmt.Errorf("report file %s: %w", path, err)
	}
	if err = tmp.Sync(); err != nil {
		return fmt.Errorf("report file %s: %w", path, err)
	}
	if err = tmp.Chmod(0o644); err != nil {
		return fmt.Errorf("report file %s: %w", path, err)
	}
	if err = tmp.Close(); err != nil {
		return fmt.Errorf("report file %s: %w", path, err)
	}
	if err = os.Rename(tmp.Name(), path); err != nil {
		return fmt.Errorf("report file %s: %w", path, err)
	}
	return nil
}

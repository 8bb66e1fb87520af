package report

import (
	"bytes"
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestFormatOf(t *testing.T) {
	for _, tc := range []struct {
		path string
		want Format
		ok   bool
	}{
		{"calc.md", Markdown, true},
		{"out/Calc.MD", Markdown, true},
		{"calc.markdown", Markdown, true},
		{"calc.html", HTML, true},
		{"calc.htm", HTML, true},
		{"calc.txt", 0, false},
		{"calc", 0, false},
		{"calc.md.pdf", 0, false},
	} {
		got, err := FormatOf(tc.path)
		var fe *FormatError
		switch {
		case tc.ok && (err != nil || got != tc.want):
			t.Errorf("%s: got %v, %v; want %v", tc.path, got, err, tc.want)
		case !tc.ok && !errors.As(err, &fe):
			t.Errorf("%s: got %v, %v; want a *FormatError", tc.path, got, err)
		}
	}
}

// TestWriteFile writes both formats, over an existing file, and checks the
// bytes equal the direct render and no temporary file is left behind.
func TestWriteFile(t *testing.T) {
	r := fixtureReport(t)
	dir := t.TempDir()
	for _, tc := range []struct {
		name   string
		format Format
	}{{"calc.md", Markdown}, {"calc.html", HTML}} {
		path := filepath.Join(dir, tc.name)
		if err := os.WriteFile(path, []byte("old"), 0o644); err != nil {
			t.Fatal(err)
		}
		if err := r.WriteFile(path); err != nil {
			t.Fatalf("%s: %v", tc.name, err)
		}
		got, err := os.ReadFile(path)
		if err != nil {
			t.Fatal(err)
		}
		var want bytes.Buffer
		if err := r.Write(&want, tc.format); err != nil {
			t.Fatal(err)
		}
		if !bytes.Equal(got, want.Bytes()) {
			t.Errorf("%s: file differs from the %v render", tc.name, tc.format)
		}
	}
	entries, _ := os.ReadDir(dir)
	for _, e := range entries {
		if strings.Contains(e.Name(), ".tmp-") {
			t.Errorf("temporary file %s left behind", e.Name())
		}
	}
}

func TestWriteFileBadPath(t *testing.T) {
	r := fixtureReport(t)
	dir := t.TempDir()
	for _, tc := range []struct {
		name, path, want string
	}{
		{"missing directory", filepath.Join(dir, "no", "such", "calc.md"), "no such file or directory"},
		{"a directory", mkdir(t, filepath.Join(dir, "calc.html")), "is a directory"},
		{"bad extension", filepath.Join(dir, "calc.pdf"), "allowed .md or .html"},
	} {
		err := r.WriteFile(tc.path)
		if err == nil || !strings.Contains(err.Error(), tc.want) || !strings.Contains(err.Error(), filepath.Base(tc.path)) {
			t.Errorf("%s: got %v, want an error naming the file and %q", tc.name, err, tc.want)
		}
	}
	entries, _ := os.ReadDir(dir)
	if len(entries) != 1 {
		t.Errorf("directory holds %d entries after failed writes, want 1 (the directory made by the test)", len(entries))
	}
}

func mkdir(t *testing.T, path string) string {
	t.Helper()
	if err := os.Mkdir(path, 0o755); err != nil {
		t.Fatal(err)
	}
	return path
}

func TestNum(t *testing.T) {
	for _, tc := range []struct {
		v    float64
		prec int
		want string
	}{{-0.0004, 3, "0.000"}, {-0.0006, 3, "-0.001"}, {1.23456, 2, "1.23"}, {-0, 1, "0.0"}} {
		if got := num(tc.v, tc.prec); got != tc.want {
			t.Errorf("num(%g, %d) = %q, want %q", tc.v, tc.prec, got, tc.want)
		}
	}
	if got := signed(0.2, 2); got != "+0.20" {
		t.Errorf("signed(0.2) = %q, want +0.20", got)
	}
}

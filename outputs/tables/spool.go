package tables

import (
	"bufio"
	"fmt"
	"io"
	"os"
)

// spool keeps rendered table bodies in a temporary file, so a finished
// table leaves memory and is copied into the pages when they are written.
type spool struct {
	f   *os.File
	buf *bufio.Writer
	off int64 // bytes written so far
}

// extent is one body's place in the spool.
type extent struct{ off, n int64 }

// newSpool creates the spool file in dir (created if needed; "" is the
// system's temporary directory).
func newSpool(dir string) (*spool, error) {
	if dir != "" {
		if err := os.MkdirAll(dir, 0o755); err != nil {
			return nil, fmt.Errorf("span tables: spool: %w", err)
		}
	}
	f, err := os.CreateTemp(dir, ".span-tables-*.spool")
	if err != nil {
		return nil, fmt.Errorf("span tables: spool: %w", err)
	}
	return &spool{f: f, buf: bufio.NewWriterSize(f, 1<<16)}, nil
}

// counter counts the bytes written through it.
type counter struct {
	w io.Writer
	n int64
}

func (c *counter) Write(p []byte) (int, error) {
	n, err := c.w.Write(p)
	c.n += int64(n)
	return n, err
}

// add appends what write writes and returns where it lies.
func (s *spool) add(write func(io.Writer) error) (extent, error) {
	c := &counter{w: s.buf}
	if err := write(c); err != nil {
		return extent{}, fmt.Errorf("span tables: spool: %w", err)
	}
	e := extent{s.off, c.n}
	s.off += c.n
	return e, nil
}

// copyTo writes the body at e to w.
func (s *spool) copyTo(w io.Writer, e extent) error {
	if err := s.buf.Flush(); err != nil {
		return fmt.Errorf("span tables: spool: %w", err)
	}
	if _, err := io.Copy(w, io.NewSectionReader(s.f, e.off, e.n)); err != nil {
		return fmt.Errorf("span tables: spool: %w", err)
	}
	return nil
}

// remove closes and deletes the spool file.
func (s *spool) remove() error {
	err := s.f.Close()
	if rerr := os.Remove(s.f.Name()); err == nil {
		err = rerr
	}
	return err
}

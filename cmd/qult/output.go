package main

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
)

// namesInput reports whether the output path out names the same file as
// the input path in (after cleaning, or as the same file on disk, which
// catches links and other spellings). "-" and "" never clash.
func namesInput(out, in string) bool {
	if out == "" || out == "-" || in == "" || in == "-" {
		return false
	}
	if filepath.Clean(out) == filepath.Clean(in) {
		return true
	}
	so, err1 := os.Stat(out)
	si, err2 := os.Stat(in)
	return err1 == nil && err2 == nil && os.SameFile(so, si)
}

// checkOut refuses an output path that names the input.
func (c *cmd) checkOut(out, in string) bool {
	if namesInput(out, in) {
		c.usageErr("%s: -o %s names the input file; choose another output file", c.verb, out)
		return false
	}
	return true
}

// atomicFile is an output file written under a temporary name in the same
// folder and renamed over the destination only when every byte is written,
// so a failed run never leaves a truncated or half-written file.
type atomicFile struct {
	f    *os.File
	dest string
}

func createAtomic(dest string) (*atomicFile, error) {
	f, err := os.CreateTemp(filepath.Dir(dest), "."+filepath.Base(dest)+".*.tmp")
	if err != nil {
		return nil, fmt.Errorf("cannot write %s: %w", dest, err)
	}
	return &atomicFile{f: f, dest: dest}, nil
}

func (a *atomicFile) Write(p []byte) (int, error) { return a.f.Write(p) }

// commit closes the temporary file and renames it to the destination.
func (a *atomicFile) commit() error {
	if err := a.f.Close(); err != nil {
		os.Remove(a.f.Name())
		return fmt.Errorf("writing %s: %w", a.dest, err)
	}
	if err := os.Chmod(a.f.Name(), 0o644); err != nil {
		os.Remove(a.f.Name())
		return fmt.Errorf("writing %s: %w", a.dest, err)
	}
	if err := os.Rename(a.f.Name(), a.dest); err != nil {
		os.Remove(a.f.Name())
		return fmt.Errorf("writing %s: %w", a.dest, err)
	}
	return nil
}

// abort removes the temporary file and leaves the destination as it was.
func (a *atomicFile) abort() {
	a.f.Close()
	os.Remove(a.f.Name())
}

// writeAtomic writes data to dest through an atomicFile.
func writeAtomic(dest string, data []byte) error {
	a, err := createAtomic(dest)
	if err != nil {
		return err
	}
	if _, err := a.Write(data); err != nil {
		a.abort()
		return fmt.Errorf("writing %s: %w", dest, err)
	}
	return a.commit()
}

// maxMessages is the most problem lines printed for one input; the rest
// are counted in a last line.
const maxMessages = 100

// cappedLines prints at most maxMessages lines through print and then one
// line saying how many were left out.
func cappedLines(w io.Writer, lines []string) {
	for i, l := range lines {
		if i == maxMessages {
			fmt.Fprintf(w, "qult: … and %d more problems not shown (the first %d are above)\n", len(lines)-maxMessages, maxMessages)
			return
		}
		fmt.Fprintln(w, l)
	}
}

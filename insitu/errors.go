package insitu

import (
	"errors"
	"fmt"
)

// Errors a reader wraps in a *ParseError.
var (
	ErrSyntax       = errors.New("malformed line")
	ErrNumber       = errors.New("not a number")
	ErrMissing      = errors.New("missing")
	ErrUnit         = errors.New("unit not accepted")
	ErrDepthOrder   = errors.New("depth does not increase")
	ErrDuplicate    = errors.New("given twice")
	ErrRange        = errors.New("out of range")
	ErrNoData       = errors.New("no data rows")
	ErrTooLarge     = errors.New("file too large")
	ErrNotSupported = errors.New("not supported")
)

// ParseError reports a problem in an input file: the file's name, the
// line (1-based; 0 when the problem concerns the whole file) and the field
// (a column header, an AGS heading, a GEF keyword).
type ParseError struct {
	File  string
	Line  int
	Field string
	Err   error
}

func (e *ParseError) Error() string {
	loc := e.File
	if e.Line > 0 {
		loc = fmt.Sprintf("%s:%d", e.File, e.Line)
	}
	if e.Field == "" {
		return fmt.Sprintf("%s: %v", loc, e.Err)
	}
	return fmt.Sprintf("%s: %s: %v", loc, e.Field, e.Err)
}

func (e *ParseError) Unwrap() error { return e.Err }

func perr(file string, line int, field string, err error, format string, args ...any) *ParseError {
	if format != "" {
		err = fmt.Errorf("%w: "+format, append([]any{err}, args...)...)
	}
	return &ParseError{File: file, Line: line, Field: field, Err: err}
}

// maxFile bounds what a reader accepts (64 MiB).
const maxFile = 64 << 20

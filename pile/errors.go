package pile

import (
	"errors"
	"fmt"
)

// PathError is an error about one input of an analysis. Path names the
// input as a calc file does ("pile.length", "layers[2].shaft",
// "methods.weak_below"); Msg says what is wrong and what is accepted; Err
// is the cause, when there is one (a shaft or bearing *RangeError, a
// profile error), so that errors.Is and errors.As reach it.
type PathError struct {
	Path string
	Msg  string
	Err  error
}

func (e *PathError) Error() string { return e.Path + ": " + e.Msg }

// Unwrap returns the cause, or nil.
func (e *PathError) Unwrap() error { return e.Err }

// pathErrorf returns a *PathError for path with the message of format and
// args (as fmt.Errorf formats them); a %w argument becomes its cause.
func pathErrorf(path, format string, args ...any) error {
	err := fmt.Errorf(format, args...)
	return &PathError{Path: path, Msg: err.Error(), Err: errors.Unwrap(err)}
}

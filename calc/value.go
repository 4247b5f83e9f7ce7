package calc

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/units"
)

// Value is one scalar as written in the calc file: a number with or without
// a unit, or a word. Line is its line in the file (0 when it was not read
// from a file). The zero Value means "not given".
type Value struct {
	Raw  string
	Line int
}

// V makes a Value from text, for building a File in code.
func V(s string) Value { return Value{Raw: s} }

// IsSet reports whether the value was given.
func (v Value) IsSet() bool { return strings.TrimSpace(v.Raw) != "" }

// String returns the value as written.
func (v Value) String() string { return v.Raw }

// MarshalText writes the value as written.
func (v Value) MarshalText() ([]byte, error) { return []byte(v.Raw), nil }

// quantity reads the value as a quantity of dimension d; a bare number is
// counted in system sys's unit for d.
func (v Value) quantity(d units.Dimension, sys units.System) (float64, error) {
	return units.ParseIn(v.Raw, d, sys)
}

// number reads a dimensionless number; a unit is an error.
func (v Value) number() (float64, error) {
	s := strings.TrimSpace(v.Raw)
	x, err := strconv.ParseFloat(s, 64)
	if err != nil {
		if q, perr := units.Parse(s); perr == nil {
			return 0, fmt.Errorf("%q is %s; this field is a plain number", s, units.Article(q.Dim))
		}
		return 0, fmt.Errorf("%q is not a number", s)
	}
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return 0, fmt.Errorf("%q is not a finite number", s)
	}
	return x, nil
}

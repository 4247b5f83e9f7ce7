package report

import (
	"encoding/json"
	"fmt"
	"io"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

// LineOptions set how WriteLine renders a result as one line of JSON.
type LineOptions struct {
	// Units, Date and Verification are as in Options; the view is always
	// the whole result.
	Units        units.System
	Date         string
	Verification string
	// Line is the line number of the calc file in its batch input,
	// written first as "line"; 0 leaves it out.
	Line int
	// ID identifies the calc file (its id key, or its title), written as
	// "id" after the line; "" leaves it out.
	ID string
	// OmitWithDepth leaves the capacity-with-depth table out (the bulk of
	// most results) and says so in "omitted": ["capacity_with_depth"].
	OmitWithDepth bool
}

// jLine is the JSON document with the batch members in front.
type jLine struct {
	Line int    `json:"line,omitempty"`
	ID   string `json:"id,omitempty"`
	*jResult
}

// jLeanLine is jLine without capacity with depth: the nil field shadows
// the embedded one (encoding/json takes the shallower field) and is
// omitted.
type jLeanLine struct {
	Line int    `json:"line,omitempty"`
	ID   string `json:"id,omitempty"`
	*jResult
	WithDepth []jDepthRow `json:"capacity_with_depth,omitempty"`
	Omitted   []string    `json:"omitted"`
}

// WriteLine writes result r as one line of compact JSON ending in a line
// break: the document Write gives in JSON (schema calc.ResultSchema, the
// same members with the same numbers), encoded directly without
// indentation, with "line" and "id" first when set. It is the line form
// of qult batch.
//
// Errors: a nil result, an unknown unit system, and write errors from w.
func WriteLine(w io.Writer, r *calc.Result, o LineOptions) error {
	if r == nil {
		return fmt.Errorf("report: nil result")
	}
	if o.Units != units.SI && o.Units != units.US {
		return fmt.Errorf("report: unit system %v: want SI or US", o.Units)
	}
	j := toJSON(r, Options{Units: o.Units, View: ViewReport, Date: o.Date, Verification: o.Verification})
	var v any = jLine{o.Line, o.ID, j}
	if o.OmitWithDepth {
		v = jLeanLine{Line: o.Line, ID: o.ID, jResult: j, Omitted: []string{"capacity_with_depth"}}
	}
	return json.NewEncoder(w).Encode(v)
}

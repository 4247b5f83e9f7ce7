package report

import (
	"fmt"
	"io"
	"reflect"
	"strconv"
	"sync"

	"github.com/qultgeo/qult/calc"
)

// LineOptions set how WriteLine renders a result as one line of JSON.
type LineOptions struct {
	// Units, Date and Verification are as in Options; the view is always
	// the whole result.
	Units        Units
	Date         string
	Verification string
	// Line is the line number of the calc file in its batch input,
	// written first as "line"; 0 leaves it out.
	Line int
	// ID identifies the calc file (its id key, or its title), written as
	// "id" after the line; "" leaves it out.
	ID string
	// Lean leaves out the capacity-with-depth table (the bulk of most
	// results) and the methods compared (the costliest part to compute)
	// and says so in "omitted": ["capacity_with_depth", "methods_compared"].
	Lean bool
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
	sys, err := o.Units.resolve(r)
	if err != nil {
		return err
	}
	j := toJSON(r, Options{Units: o.Units, sys: sys, View: ViewReport, Date: o.Date, Verification: o.Verification})
	bp := linePool.Get().(*[]byte)
	defer linePool.Put(bp)
	b := append((*bp)[:0], '{')
	if o.Line != 0 {
		b = append(b, `"line":`...)
		b = strconv.AppendInt(b, int64(o.Line), 10)
		b = append(b, ',')
	}
	if o.ID != "" {
		b = append(b, `"id":`...)
		b = appendString(b, o.ID)
		b = append(b, ',')
	}
	enc, tail := fullLine(), "}\n"
	if o.Lean {
		enc, tail = leanLine(), `,"omitted":["capacity_with_depth","methods_compared"]}`+"\n"
	}
	// The document is {…}: its members follow the line and id, so its
	// braces are dropped.
	at := len(b)
	b = enc(b, reflect.ValueOf(j).Elem())
	copy(b[at:], b[at+1:len(b)-1])
	b = append(b[:len(b)-2], tail...)
	*bp = b
	_, err = w.Write(b)
	return err
}

// linePool recycles the line buffers (tens of kB each).
var linePool = sync.Pool{New: func() any { b := make([]byte, 0, 64<<10); return &b }}

// The plans of the result document, whole and lean (without capacity with
// depth and the methods compared).
var (
	fullLine = sync.OnceValue(func() encFunc { return structEncoder(reflect.TypeOf(jResult{}), "id") })
	leanLine = sync.OnceValue(func() encFunc {
		return structEncoder(reflect.TypeOf(jResult{}), "id", "capacity_with_depth", "methods_compared")
	})
)

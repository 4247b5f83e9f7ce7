package verify

import (
	"errors"
	"fmt"
	"sort"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/units"
)

// args reads a case's inputs, recording every problem and every key read,
// so that a key the function does not read is reported rather than
// ignored.
type args struct {
	path string
	m    map[string]any
	used map[string]bool
	errs []error
}

func newArgs(path string, m map[string]any) *args {
	if m == nil {
		m = map[string]any{}
	}
	return &args{path: path, m: m, used: map[string]bool{}}
}

func (a *args) fail(key, format string, x ...any) {
	a.errs = append(a.errs, fmt.Errorf("%s%s: %s", a.path, key, fmt.Sprintf(format, x...)))
}

func (a *args) has(key string) bool {
	_, ok := a.m[key]
	return ok
}

func (a *args) get(key string) (any, bool) {
	v, ok := a.m[key]
	if ok {
		a.used[key] = true
	}
	return v, ok
}

// num reads a required number (a bare number, no unit).
func (a *args) num(key string) float64 {
	v, ok := a.get(key)
	if !ok {
		a.fail(key, "missing")
		return 0
	}
	return a.toNum(key, v)
}

// optNum reads an optional number; def when absent.
func (a *args) optNum(key string, def float64) float64 {
	v, ok := a.get(key)
	if !ok {
		return def
	}
	return a.toNum(key, v)
}

func (a *args) toNum(key string, v any) float64 {
	switch x := v.(type) {
	case int:
		return float64(x)
	case float64:
		return x
	case string:
		f, err := strconv.ParseFloat(strings.TrimSpace(x), 64)
		if err == nil {
			return f
		}
	}
	a.fail(key, "%v: want a plain number", v)
	return 0
}

// qty reads a required quantity written with its unit ("30 deg").
func (a *args) qty(key string, d units.Dimension) float64 {
	v, ok := a.get(key)
	if !ok {
		a.fail(key, "missing")
		return 0
	}
	return a.toQty(key, v, d)
}

// optQty reads an optional quantity; 0 when absent.
func (a *args) optQty(key string, d units.Dimension) float64 {
	v, ok := a.get(key)
	if !ok {
		return 0
	}
	return a.toQty(key, v, d)
}

func (a *args) toQty(key string, v any, d units.Dimension) float64 {
	s, ok := v.(string)
	if !ok {
		a.fail(key, "%v: want a quantity with its unit, such as \"1 %s\"", v, exampleUnit(d))
		return 0
	}
	q, err := units.Parse(s)
	if err != nil {
		a.fail(key, "%v", err)
		return 0
	}
	if q.Dim != d {
		a.fail(key, "%q has the dimension %v, want %v", s, q.Dim, d)
		return 0
	}
	return q.Value
}

// str reads a required string.
func (a *args) str(key string) string {
	v, ok := a.get(key)
	if !ok {
		a.fail(key, "missing")
		return ""
	}
	s, ok := v.(string)
	if !ok {
		a.fail(key, "%v: want text", v)
	}
	return s
}

// optStr reads an optional string; def when absent.
func (a *args) optStr(key, def string) string {
	if !a.has(key) {
		return def
	}
	return a.str(key)
}

// optBool reads an optional true/false.
func (a *args) optBool(key string) bool {
	v, ok := a.get(key)
	if !ok {
		return false
	}
	b, ok := v.(bool)
	if !ok {
		a.fail(key, "%v: want true or false", v)
	}
	return b
}

// list reads a required list.
func (a *args) list(key string) []any {
	v, ok := a.get(key)
	if !ok {
		a.fail(key, "missing")
		return nil
	}
	l, ok := v.([]any)
	if !ok {
		a.fail(key, "%v: want a list", v)
	}
	return l
}

// sub returns the inputs of a nested map.
func (a *args) sub(key string, v any) *args {
	m, ok := v.(map[string]any)
	if !ok {
		a.fail(key, "%v: want a map", v)
		return newArgs(a.path+key+".", nil)
	}
	return newArgs(a.path+key+".", m)
}

// done returns the problems met, with any key that was not read.
func (a *args) done() error {
	var extra []string
	for k := range a.m {
		if !a.used[k] {
			extra = append(extra, k)
		}
	}
	sort.Strings(extra)
	for _, k := range extra {
		a.fail(k, "not read by this function")
	}
	return errors.Join(a.errs...)
}

// merge adds the problems of a nested reader.
func (a *args) merge(b *args) {
	if err := b.done(); err != nil {
		a.errs = append(a.errs, err)
	}
}

func exampleUnit(d units.Dimension) string {
	switch d {
	case units.DimLength:
		return "m"
	case units.DimStress:
		return "kPa"
	case units.DimForce:
		return "kN"
	case units.DimUnitWeight:
		return "kN/m3"
	case units.DimAngle:
		return "deg"
	case units.DimArea:
		return "m2"
	}
	return d.String()
}

// unitScale returns the size of one unit in SI base units and its
// dimension; "-" is a number without dimension.
func unitScale(u string) (units.Quantity, error) {
	if u == "-" {
		return units.Quantity{Value: 1}, nil
	}
	q, err := units.Parse("1 " + u)
	if err != nil {
		return units.Quantity{}, err
	}
	return q, nil
}

func dimName(d interface{ String() string }) string {
	s := d.String()
	if s == "" || strings.HasPrefix(s, "Dimension(") {
		return "number without dimension"
	}
	return s
}

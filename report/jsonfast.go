package report

import (
	"encoding/json"
	"math"
	"reflect"
	"slices"
	"strconv"
	"strings"
	"sync"
	"unicode/utf8"
)

// A direct JSON encoder for the result document, for batch lines. It
// writes the same bytes encoding/json writes for these types (field order,
// omitempty, null for nil pointers and slices, HTML-safe string escapes,
// jnum through its MarshalJSON's digits) without encoding/json's cost per
// value: the per-type plans are built once by reflection, a jnum is
// formatted in one call, and nothing is re-scanned. Anything the plans do
// not cover (maps, interfaces, plain floats, other Marshalers, embedded
// fields) is handed to encoding/json itself, so the output stays exact. A
// test compares it with encoding/json on every example.

type encFunc func(b []byte, v reflect.Value) []byte

var encoders sync.Map // reflect.Type → encFunc

var (
	jnumType      = reflect.TypeOf(jnum(0))
	marshalerType = reflect.TypeOf((*json.Marshaler)(nil)).Elem()
	textType      = reflect.TypeOf((*interface{ MarshalText() ([]byte, error) })(nil)).Elem()
)

func encoderOf(t reflect.Type) encFunc {
	if f, ok := encoders.Load(t); ok {
		return f.(encFunc)
	}
	// A recursive type gets its function through an indirection while
	// its plan is built.
	var wg sync.WaitGroup
	var real encFunc
	wg.Add(1)
	if f, loaded := encoders.LoadOrStore(t, encFunc(func(b []byte, v reflect.Value) []byte {
		wg.Wait()
		return real(b, v)
	})); loaded {
		return f.(encFunc)
	}
	real = newEncoder(t)
	wg.Done()
	encoders.Store(t, real)
	return real
}

// viaStdlib encodes with encoding/json (the exact fallback).
func viaStdlib(b []byte, v reflect.Value) []byte {
	out, err := json.Marshal(v.Interface())
	if err != nil {
		return append(b, "null"...)
	}
	return append(b, out...)
}

func newEncoder(t reflect.Type) encFunc {
	if t == jnumType {
		return func(b []byte, v reflect.Value) []byte { return appendJnum(b, v.Float()) }
	}
	if t.Implements(marshalerType) || reflect.PointerTo(t).Implements(marshalerType) ||
		t.Implements(textType) || reflect.PointerTo(t).Implements(textType) {
		return viaStdlib
	}
	switch t.Kind() {
	case reflect.String:
		return func(b []byte, v reflect.Value) []byte { return appendString(b, v.String()) }
	case reflect.Bool:
		return func(b []byte, v reflect.Value) []byte { return strconv.AppendBool(b, v.Bool()) }
	case reflect.Int, reflect.Int8, reflect.Int16, reflect.Int32, reflect.Int64:
		return func(b []byte, v reflect.Value) []byte { return strconv.AppendInt(b, v.Int(), 10) }
	case reflect.Uint, reflect.Uint16, reflect.Uint32, reflect.Uint64:
		return func(b []byte, v reflect.Value) []byte { return strconv.AppendUint(b, v.Uint(), 10) }
	case reflect.Pointer:
		elem := encoderOf(t.Elem())
		return func(b []byte, v reflect.Value) []byte {
			if v.IsNil() {
				return append(b, "null"...)
			}
			return elem(b, v.Elem())
		}
	case reflect.Slice:
		if t.Elem().Kind() == reflect.Uint8 {
			return viaStdlib // base64
		}
		elem := encoderOf(t.Elem())
		return func(b []byte, v reflect.Value) []byte {
			if v.IsNil() {
				return append(b, "null"...)
			}
			b = append(b, '[')
			for i := range v.Len() {
				if i > 0 {
					b = append(b, ',')
				}
				b = elem(b, v.Index(i))
			}
			return append(b, ']')
		}
	case reflect.Struct:
		return structEncoder(t, "")
	}
	return viaStdlib
}

type fieldPlan struct {
	index     int
	key       []byte // `"name":`
	omitEmpty bool
	enc       encFunc
}

// structEncoder plans a struct's fields in order, leaving out the fields
// whose keys are in skip.
func structEncoder(t reflect.Type, skip ...string) encFunc {
	var fields []fieldPlan
	for i := range t.NumField() {
		f := t.Field(i)
		if f.Anonymous {
			return viaStdlib // embedding has its own rules
		}
		if !f.IsExported() {
			continue
		}
		tag := f.Tag.Get("json")
		if tag == "-" {
			continue
		}
		name, opts, _ := strings.Cut(tag, ",")
		if strings.Contains(","+opts+",", ",string,") {
			return viaStdlib
		}
		if name == "" {
			name = f.Name
		}
		if slices.Contains(skip, name) {
			continue
		}
		if !jsonPlainKey(name) {
			return viaStdlib
		}
		key := appendString(nil, name)
		key = append(key, ':')
		fields = append(fields, fieldPlan{index: i, key: key, omitEmpty: strings.Contains(","+opts+",", ",omitempty,"), enc: encoderOf(f.Type)})
	}
	return func(b []byte, v reflect.Value) []byte {
		b = append(b, '{')
		first := true
		for _, f := range fields {
			fv := v.Field(f.index)
			if f.omitEmpty && jsonEmpty(fv) {
				continue
			}
			if !first {
				b = append(b, ',')
			}
			first = false
			b = append(b, f.key...)
			b = f.enc(b, fv)
		}
		return append(b, '}')
	}
}

// jsonPlainKey: a plain key that encoding/json writes as it is.
func jsonPlainKey(s string) bool {
	for _, c := range s {
		if c >= utf8.RuneSelf || c < 0x20 || c == '"' || c == '\\' || c == '<' || c == '>' || c == '&' {
			return false
		}
	}
	return s != ""
}

// jsonEmpty is encoding/json's omitempty test.
func jsonEmpty(v reflect.Value) bool {
	switch v.Kind() {
	case reflect.Array, reflect.Map, reflect.Slice, reflect.String:
		return v.Len() == 0
	case reflect.Bool:
		return !v.Bool()
	case reflect.Int, reflect.Int8, reflect.Int16, reflect.Int32, reflect.Int64:
		return v.Int() == 0
	case reflect.Uint, reflect.Uint8, reflect.Uint16, reflect.Uint32, reflect.Uint64, reflect.Uintptr:
		return v.Uint() == 0
	case reflect.Float32, reflect.Float64:
		return v.Float() == 0
	case reflect.Interface, reflect.Pointer:
		return v.IsNil()
	}
	return false
}

// appendJnum writes what jnum.MarshalJSON writes: x rounded to jsonSig
// significant digits in the shortest form ('g'). Formatting with 'g' at
// jsonSig digits gives the same text: the rounded decimal has at most
// jsonSig digits, so it is the shortest decimal of the float nearest to
// it (for normal floats, which carry more than 15 digits), and both forms
// choose the exponent form by the same rule.
func appendJnum(b []byte, x float64) []byte {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return append(b, "null"...)
	}
	if a := math.Abs(x); a != 0 && a < 0x1p-1022 {
		// Subnormal: too few bits for six digits; round as jnum does.
		m, _ := jnum(x).MarshalJSON()
		return append(b, m...)
	}
	return strconv.AppendFloat(b, x, 'g', jsonSig, 64)
}

// appendString writes s as encoding/json does with HTML escaping: <, >
// and & as \u003c, \u003e, \u0026; control characters escaped; U+2028
// and U+2029 escaped; invalid UTF-8 as U+FFFD.
func appendString(b []byte, s string) []byte {
	const hex = "0123456789abcdef"
	b = append(b, '"')
	start := 0
	for i := 0; i < len(s); {
		c := s[i]
		if c < utf8.RuneSelf {
			if c >= 0x20 && c != '"' && c != '\\' && c != '<' && c != '>' && c != '&' {
				i++
				continue
			}
			b = append(b, s[start:i]...)
			switch c {
			case '\\', '"':
				b = append(b, '\\', c)
			case '\b':
				b = append(b, '\\', 'b')
			case '\f':
				b = append(b, '\\', 'f')
			case '\n':
				b = append(b, '\\', 'n')
			case '\r':
				b = append(b, '\\', 'r')
			case '\t':
				b = append(b, '\\', 't')
			default:
				b = append(b, '\\', 'u', '0', '0', hex[c>>4], hex[c&0xF])
			}
			i++
			start = i
			continue
		}
		r, size := utf8.DecodeRuneInString(s[i:])
		if r == utf8.RuneError && size == 1 {
			b = append(b, s[start:i]...)
			b = append(b, `\ufffd`...)
			i += size
			start = i
			continue
		}
		if r == '\u2028' || r == '\u2029' {
			b = append(b, s[start:i]...)
			b = append(b, '\\', 'u', '2', '0', '2', hex[r&0xF])
			i += size
			start = i
			continue
		}
		i += size
	}
	b = append(b, s[start:]...)
	return append(b, '"')
}

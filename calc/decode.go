package calc

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"reflect"
	"sort"
	"strconv"
	"strings"
	"sync"

	"go.yaml.in/yaml/v3"
)

// MaxFileSize is the largest calc file Decode reads: 1 MiB, far more than
// any borehole log needs.
const MaxFileSize = 1 << 20

// maxDepth is the deepest nesting of mappings and sequences accepted; a
// calc file needs 5.
const maxDepth = 16

// Problem is one thing wrong with a calc file.
type Problem struct {
	Path string // field path, such as "ground.layers[2].thickness"; "" for the file
	Line int    // line in the file, 0 when unknown
	Msg  string
	// Err is the library error behind the message, if any (a
	// *units.ParseError, a *profile.FieldError, a shaft or bearing
	// *RangeError, …), so that errors.Is and errors.As reach it through
	// Problems.
	Err error
}

// Unwrap returns the library error behind the problem, or nil.
func (p Problem) Unwrap() error { return p.Err }

func (p Problem) Error() string {
	var b strings.Builder
	if p.Path != "" {
		b.WriteString(p.Path)
	} else {
		b.WriteString("file")
	}
	if p.Line > 0 {
		b.WriteString(" (line ")
		b.WriteString(strconv.Itoa(p.Line))
		b.WriteString(")")
	}
	b.WriteString(": ")
	b.WriteString(p.Msg)
	return b.String()
}

// Problems is every problem found in a calc file. It is the error type of
// Decode and Run for bad input.
type Problems []Problem

// Unwrap returns the library errors behind the problems, for errors.Is
// and errors.As.
func (ps Problems) Unwrap() []error {
	var errs []error
	for _, p := range ps {
		if p.Err != nil {
			errs = append(errs, p.Err)
		}
	}
	return errs
}

func (ps Problems) Error() string {
	lines := make([]string, len(ps))
	for i, p := range ps {
		lines[i] = p.Error()
	}
	return strings.Join(lines, "\n")
}

// Decode reads a calc file in YAML or JSON (JSON is read as YAML, of which
// it is a subset; a file that is one JSON object is read by a faster JSON
// reader into the same node tree, with the same problems). It is strict: unknown keys, duplicate keys, anchors and
// aliases, more than one document, files over MaxFileSize and nesting
// deeper than a calc file needs are errors. Every problem found is
// reported, each with its field path and line, as Problems.
func Decode(data []byte) (*File, error) { return decode(data, true) }

// decode is Decode; with fast false it never takes the JSON reader (tests
// compare the two paths).
func decode(data []byte, fast bool) (*File, error) {
	if len(data) > MaxFileSize {
		return nil, Problems{{Msg: fmt.Sprintf("%d bytes is over the limit of %d bytes (1 MiB)", len(data), MaxFileSize)}}
	}
	if len(bytes.TrimSpace(data)) == 0 {
		return nil, Problems{{Msg: "empty; a calc file needs at least ground and pile"}}
	}
	if err := scanDepth(data); err != nil {
		return nil, err
	}
	var root *yaml.Node
	ok := false
	if fast {
		root, ok = jsonTree(data)
	}
	if !ok {
		var err error
		if root, err = yamlTree(data); err != nil {
			return nil, err
		}
	}
	if root.Kind != yaml.MappingNode {
		return nil, Problems{{Line: root.Line, Msg: "the top level must be a mapping of keys (title, ground, pile, …)"}}
	}
	var d decoder
	var f File
	d.value(root, reflect.ValueOf(&f).Elem(), "", 0)
	if len(d.probs) > 0 {
		return nil, d.probs
	}
	f.lines = &pathLines{root: root}
	return &f, nil
}

// pathLines is the line of every field path of a decoded file. Only
// problems read it, so it is built on first use, by walking the node tree
// again exactly as decode walked it, recording each path's line: a
// decoder without problems on the first walk has none on the second.
type pathLines struct {
	once sync.Once
	root *yaml.Node
	m    map[string]int
}

// lineMap returns the line of every field path read from the file (nil
// for a File that was not decoded).
func (f *File) lineMap() map[string]int {
	if f == nil || f.lines == nil {
		return nil
	}
	pl := f.lines
	pl.once.Do(func() {
		d := decoder{lines: map[string]int{}}
		var g File
		d.value(pl.root, reflect.ValueOf(&g).Elem(), "", 0)
		pl.m, pl.root = d.lines, nil
	})
	return pl.m
}

// yamlTree parses data with the YAML parser and returns the root node of
// its one document.
func yamlTree(data []byte) (*yaml.Node, error) {
	dec := yaml.NewDecoder(bytes.NewReader(data))
	var doc yaml.Node
	if err := dec.Decode(&doc); err != nil {
		if errors.Is(err, io.EOF) {
			return nil, Problems{{Msg: "empty (only comments); a calc file needs at least ground and pile"}}
		}
		return nil, Problems{{Line: yamlLine(err), Msg: "not valid YAML or JSON: " + yamlMsg(err)}}
	}
	var extra yaml.Node
	switch err := dec.Decode(&extra); {
	case err == nil:
		return nil, Problems{{Line: extra.Line, Msg: "holds more than one document; give one calculation per file"}}
	case !errors.Is(err, io.EOF):
		// Text after the first document that is not a document either
		// (after a "..." end marker, or a second JSON value): refused, not
		// dropped.
		return nil, Problems{{Line: yamlLine(err), Msg: "text after the end of the calc file is not valid YAML or JSON (" + yamlMsg(err) + "); give one calculation per file"}}
	}
	root := &doc
	if root.Kind == 0 || (root.Kind == yaml.DocumentNode && len(root.Content) == 0) {
		return nil, Problems{{Msg: "empty (only comments); a calc file needs at least ground and pile"}}
	}
	if root.Kind == yaml.DocumentNode && len(root.Content) == 1 {
		root = root.Content[0]
	}
	return root, nil
}

// scanDepth refuses flow nesting ([ and {) deeper than maxDepth before
// the YAML parser sees it.
func scanDepth(data []byte) error {
	depth, line := 0, 1
	var quote byte
	// prev is the last byte before c that is not a space or tab on the
	// current line ('\n' at the start of a line): brackets and quotes
	// open a flow collection or a quoted scalar only where a value may
	// start (after ": ", "- ", "? ", ",", "[", "{" or at the start of a
	// line) or anywhere inside a flow collection. A plain scalar such as
	// "a{{{{" or "O'Brien clay" and a comment do not count.
	prev := byte('\n')
	startsValue := func() bool {
		return depth > 0 && prev != '"' && prev != '\'' || strings.IndexByte(":-?,[{\n", prev) >= 0
	}
	for i := 0; i < len(data); i++ {
		c := data[i]
		if quote != 0 {
			switch {
			case c == '\n':
				line++
			case quote == '"' && c == '\\':
				i++ // an escaped character
			case c == quote && quote == '\'' && i+1 < len(data) && data[i+1] == '\'':
				i++ // '' inside single quotes
			case c == quote:
				quote, prev = 0, c
			}
			continue
		}
		switch c {
		case '\n':
			line++
			prev = '\n'
			continue
		case ' ', '\t', '\r':
			continue
		case '#':
			if i == 0 || data[i-1] == ' ' || data[i-1] == '\t' || data[i-1] == '\n' {
				for i+1 < len(data) && data[i+1] != '\n' {
					i++
				}
				continue
			}
		case '"', '\'':
			if startsValue() {
				quote = c
				continue
			}
			c = 'a' // an apostrophe inside a plain scalar
		case '[', '{':
			if !startsValue() {
				c = 'a' // part of a plain scalar: not an indicator
				break
			}
			depth++
			if depth > maxDepth {
				return Problems{{Line: line, Msg: fmt.Sprintf("nested deeper than %d levels; a calc file needs far fewer", maxDepth)}}
			}
		case ']', '}':
			if depth > 0 {
				depth--
			}
		}
		prev = c
	}
	return nil
}

func yamlLine(err error) int {
	s := err.Error()
	if i := strings.Index(s, "line "); i >= 0 {
		j := i + 5
		for j < len(s) && s[j] >= '0' && s[j] <= '9' {
			j++
		}
		n, _ := strconv.Atoi(s[i+5 : j])
		return n
	}
	return 0
}

func yamlMsg(err error) string {
	s := strings.TrimPrefix(err.Error(), "yaml: ")
	if i := strings.Index(s, "line "); i == 0 {
		if j := strings.Index(s, ": "); j > 0 {
			s = s[j+2:]
		}
	}
	return s
}

// decoder walks a YAML node tree into Go values by reflection, by the
// yaml tags of the target structs, collecting problems.
type decoder struct {
	probs Problems
	lines map[string]int
}

func (d *decoder) add(path string, line int, format string, args ...any) {
	d.probs = append(d.probs, Problem{Path: path, Line: line, Msg: fmt.Sprintf(format, args...)})
}

func join(path, key string) string {
	if path == "" {
		return key
	}
	return path + "." + key
}

var (
	valueType = reflect.TypeOf(Value{})
	strengthT = reflect.TypeOf(Strength{})
	loadT     = reflect.TypeOf(Load{})
)

func kindName(n *yaml.Node) string {
	switch n.Kind {
	case yaml.MappingNode:
		return "a mapping"
	case yaml.SequenceNode:
		return "a list"
	case yaml.ScalarNode:
		return "a single value"
	case yaml.AliasNode:
		return "an alias"
	}
	return "a document"
}

func (d *decoder) value(n *yaml.Node, v reflect.Value, path string, depth int) {
	if depth > maxDepth {
		d.add(path, n.Line, "nested deeper than %d levels", maxDepth)
		return
	}
	if d.lines != nil && path != "" {
		if _, ok := d.lines[path]; !ok {
			d.lines[path] = n.Line
		}
	}
	if n.Kind == yaml.AliasNode || n.Anchor != "" {
		d.add(path, n.Line, "anchors and aliases (& and *) are not accepted in calc files; write the values out")
		return
	}
	if n.Kind == yaml.ScalarNode && n.Tag == "!!null" && v.Kind() == reflect.Pointer {
		return
	}
	switch {
	case v.Type() == valueType:
		if n.Kind != yaml.ScalarNode {
			d.add(path, n.Line, "want a single value such as \"12 m\", got %s", kindName(n))
			return
		}
		if n.Tag == "!!null" {
			return
		}
		v.Set(reflect.ValueOf(Value{Raw: n.Value, Line: n.Line}))
		return
	case v.Type() == strengthT || v.Type() == loadT:
		if n.Kind == yaml.ScalarNode {
			v.Field(0).Set(reflect.ValueOf(Value{Raw: n.Value, Line: n.Line}))
			return
		}
		d.mapping(n, v, path, depth)
		return
	}
	switch v.Kind() {
	case reflect.Pointer:
		p := reflect.New(v.Type().Elem())
		d.value(n, p.Elem(), path, depth)
		v.Set(p)
	case reflect.Struct:
		d.mapping(n, v, path, depth)
	case reflect.Slice:
		if n.Kind != yaml.SequenceNode {
			d.add(path, n.Line, "want a list, got %s", kindName(n))
			return
		}
		s := reflect.MakeSlice(v.Type(), len(n.Content), len(n.Content))
		for i, c := range n.Content {
			d.value(c, s.Index(i), fmt.Sprintf("%s[%d]", path, i), depth+1)
		}
		v.Set(s)
	case reflect.Map:
		if n.Kind != yaml.MappingNode {
			d.add(path, n.Line, "want a mapping, got %s", kindName(n))
			return
		}
		m := reflect.MakeMap(v.Type())
		for i := 0; i+1 < len(n.Content); i += 2 {
			k, c := n.Content[i], n.Content[i+1]
			if k.Kind != yaml.ScalarNode {
				d.add(path, k.Line, "keys must be single values")
				continue
			}
			if m.MapIndex(reflect.ValueOf(k.Value)).IsValid() {
				d.add(join(path, k.Value), k.Line, "given twice")
				continue
			}
			e := reflect.New(v.Type().Elem()).Elem()
			d.value(c, e, join(path, k.Value), depth+1)
			m.SetMapIndex(reflect.ValueOf(k.Value), e)
		}
		v.Set(m)
	case reflect.String:
		if n.Kind != yaml.ScalarNode {
			d.add(path, n.Line, "want a single word or text, got %s", kindName(n))
			return
		}
		v.SetString(n.Value)
	case reflect.Bool:
		b, err := strconv.ParseBool(n.Value)
		if n.Kind != yaml.ScalarNode || err != nil {
			d.add(path, n.Line, "want true or false, got %q", n.Value)
			return
		}
		v.SetBool(b)
	case reflect.Int:
		i, err := strconv.Atoi(n.Value)
		if n.Kind != yaml.ScalarNode || err != nil {
			d.add(path, n.Line, "want a whole number, got %q", n.Value)
			return
		}
		v.SetInt(int64(i))
	default:
		d.add(path, n.Line, "cannot be read (internal: %s)", v.Kind())
	}
}

// mapping decodes a mapping node into struct v by its yaml tags.
func (d *decoder) mapping(n *yaml.Node, v reflect.Value, path string, depth int) {
	if n.Kind != yaml.MappingNode {
		d.add(path, n.Line, "want a mapping of keys, got %s", kindName(n))
		return
	}
	si := infoOf(v.Type())
	fields, inline := si.fields, si.inline
	// The keys taken so far: for a mapping of a few keys (every mapping of
	// a calc file in practice) an earlier key node of the same text is
	// found by scanning back, which allocates nothing; a key is taken
	// (below) whatever its position once its text is, so an earlier
	// scalar key of the same text was taken. Long mappings use a set.
	var seenSet map[string]bool
	if len(n.Content) > 2*seenScan {
		seenSet = make(map[string]bool, len(n.Content)/2)
	}
	seen := func(i int, key string) bool {
		if seenSet != nil {
			if seenSet[key] {
				return true
			}
			seenSet[key] = true
			return false
		}
		for j := 0; j < i; j += 2 {
			if kj := n.Content[j]; kj.Kind == yaml.ScalarNode && kj.Value == key {
				return true
			}
		}
		return false
	}
	for i := 0; i+1 < len(n.Content); i += 2 {
		k, c := n.Content[i], n.Content[i+1]
		if k.Kind != yaml.ScalarNode {
			d.add(path, k.Line, "keys must be single words")
			continue
		}
		if k.Value == "<<" {
			d.add(path, k.Line, "merge keys (<<) are not accepted in calc files")
			continue
		}
		p := join(path, k.Value)
		fi, ok := fields[k.Value]
		if !ok && inline >= 0 {
			if seen(i, k.Value) {
				d.add(p, k.Line, "given twice")
				continue
			}
			m := v.Field(inline)
			if m.IsNil() {
				m.Set(reflect.MakeMap(m.Type()))
			}
			e := reflect.New(m.Type().Elem()).Elem()
			d.value(c, e, p, depth+1)
			m.SetMapIndex(reflect.ValueOf(k.Value), e)
			continue
		}
		if !ok {
			if nn, renamed := renamedKeys[p]; renamed {
				d.add(p, k.Line, "renamed: write %s (%q is no longer read)", nn, k.Value)
				continue
			}
			d.add(p, k.Line, "unknown key %q; accepted here: %s", k.Value, si.names)
			continue
		}
		if seen(i, k.Value) {
			d.add(p, k.Line, "given twice")
			continue
		}
		d.value(c, v.Field(fi), p, depth+1)
	}
}

// seenScan is the number of keys up to which mapping finds a key given
// twice by scanning the keys before it rather than with a set.
const seenScan = 32

// structInfo is what mapping needs of a struct type: its keys by their
// yaml tags, and the map field that takes every other key.
type structInfo struct {
	fields map[string]int
	names  string // the accepted keys, sorted, for messages
	inline int    // a map field that takes every other key (the keys of a method); -1 for none
}

// structInfos caches structInfo by type: a pure function of the type,
// computed once per type rather than once per mapping read.
var structInfos sync.Map // reflect.Type → *structInfo

func infoOf(t reflect.Type) *structInfo {
	if v, ok := structInfos.Load(t); ok {
		return v.(*structInfo)
	}
	si := &structInfo{fields: map[string]int{}, inline: -1}
	var names []string
	for i := 0; i < t.NumField(); i++ {
		parts := strings.Split(t.Field(i).Tag.Get("yaml"), ",")
		tag := parts[0]
		if tag == "" && len(parts) > 1 && parts[1] == "inline" && t.Field(i).Type.Kind() == reflect.Map {
			si.inline = i
			continue
		}
		if tag == "" || tag == "-" {
			continue
		}
		si.fields[tag] = i
		names = append(names, tag)
	}
	sort.Strings(names)
	si.names = strings.Join(names, ", ")
	v, _ := structInfos.LoadOrStore(t, si)
	return v.(*structInfo)
}

// renamedKeys maps keys of earlier calc files to the keys that replaced
// them; the old spelling is refused with a message naming the new one.
// tension_factor meant a ratio on shaft resistance under methods and a
// factor of safety under design.
var renamedKeys = map[string]string{
	"methods.tension_factor": "methods.tension_shaft_ratio",
	"design.tension_factor":  "design.tension_safety_factor",
}

package calc

// Sources: none needed. The oracle is the YAML path of the decoder itself
// (go.yaml.in/yaml/v3 reading JSON as YAML): the JSON reader must give the
// same File, the same line of every key and the same problems. The calc
// files are the invented scenarios of examples/ and made-up bad inputs.

import (
	"encoding/json"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"

	"go.yaml.in/yaml/v3"
)

// sameOnBothPaths decodes data with the JSON reader and with the YAML
// parser and fails when the files or the problems differ. It returns
// whether the JSON reader took the input (rather than leaving it to YAML).
func sameOnBothPaths(t *testing.T, name string, data []byte) bool {
	t.Helper()
	_, took := jsonTree(data)
	fj, ej := decode(data, true)
	fy, ey := decode(data, false)
	if !reflect.DeepEqual(ej, ey) {
		t.Errorf("%s: problems differ\n JSON path: %v\n YAML path: %v", name, ej, ey)
	}
	if lj, ly := fj.lineMap(), fy.lineMap(); !reflect.DeepEqual(lj, ly) {
		t.Errorf("%s: lines of the keys differ\n JSON path: %v\n YAML path: %v", name, lj, ly)
	}
	if fj != nil && fy != nil {
		// The lines are compared above; the node trees they are built
		// from may differ in what no line reads (scalar styles).
		cj, cy := *fj, *fy
		cj.lines, cy.lines = nil, nil
		fj, fy = &cj, &cy
	}
	if !reflect.DeepEqual(fj, fy) {
		t.Errorf("%s: decoded files differ\n JSON path: %+v\n YAML path: %+v", name, fj, fy)
	}
	return took
}

// exampleJSON returns the calc files of examples/ as JSON: compact, and
// indented over many lines (so that line numbers are tested).
func exampleJSON(t *testing.T) map[string][]byte {
	t.Helper()
	paths, err := filepath.Glob(filepath.Join("..", "examples", "*.yaml"))
	if err != nil || len(paths) == 0 {
		t.Fatalf("no examples: %v", err)
	}
	out := map[string][]byte{}
	for _, p := range paths {
		data, err := os.ReadFile(p)
		if err != nil {
			t.Fatal(err)
		}
		var v map[string]any
		if err := yaml.Unmarshal(data, &v); err != nil {
			t.Fatal(err)
		}
		c, err := json.Marshal(v)
		if err != nil {
			t.Fatal(err)
		}
		in, _ := json.MarshalIndent(v, "", "  ")
		out[filepath.Base(p)] = c
		out[filepath.Base(p)+" indented"] = in
		out[filepath.Base(p)+" CRLF"] = []byte(strings.ReplaceAll(string(in), "\n", "\r\n"))
	}
	return out
}

// TestJSONPathExamples: every example, as JSON, decodes to the same File
// (values, lines) through the JSON reader as through the YAML parser, and
// the JSON reader takes it.
func TestJSONPathExamples(t *testing.T) {
	for name, data := range exampleJSON(t) {
		if !sameOnBothPaths(t, name, data) {
			t.Errorf("%s: the JSON reader left a plain JSON file to the YAML parser", name)
		}
	}
}

// TestJSONPathProblems: a table of bad inputs gives the same messages,
// paths and lines on both paths; "json" says whether the JSON reader takes
// the input (false: it is left to the YAML parser, which words the error).
func TestJSONPathProblems(t *testing.T) {
	for _, c := range []struct {
		name string
		in   string
		json bool
	}{
		{"unknown key", `{"title":"t","grund":1}`, true},
		{"unknown nested key", `{"ground":{"layers":[{"name":"a","thikness":"1 m"}]}}`, true},
		{"duplicate key", `{"title":"a","title":"b"}`, true},
		{"duplicate method key", `{"ground":{"layers":[{"name":"s","shaft":{"method":"beta","k":1,"k":2}}]}}`, true},
		{"duplicate factor map key", `{"design":{"basis":"lrfd","tip":{"vesic":0.5,"vesic":0.4}}}`, true},
		{"mapping for text", `{"title":{"a":1}}`, true},
		{"mapping for list", `{"ground":{"layers":{}}}`, true},
		{"list for a value", `{"pile":{"length":[1]}}`, true},
		{"word for a whole number", `{"qult":"x"}`, true},
		{"fraction for a whole number", `{"qult":1.5}`, true},
		{"number for a flag", `{"methods":{"clamp_charts":2}}`, true},
		{"null for a section", `{"methods":null,"title":null}`, true},
		{"list at the top", `[1,2]`, false},
		{"scalar in a list of layers", `{"ground":{"layers":[1,"a",true,null]}}`, true},
		{"problems on several lines", "{\n \"title\": \"t\",\n \"grund\": 1,\n \"pile\": {\n  \"lenght\": \"3 m\"\n },\n \"pile\": 2\n}\n", true},
		{"problems after CR LF", "{\r\n \"title\": 1,\r\n \"x\": 2\r\n}\r\n", true},
		{"problems after lone CR", "{\r \"title\": 1,\r \"x\": 2\r}", true},
		{"escapes", `{"title":"a\"b\\c\n\t\u00e9\u2028","zz\u00e9":1}`, true},
		{"numbers", `{"qult":1e3,"ground":{"water_depth":-0.5,"surcharge":12E-1}}`, true},
		{"non-ASCII text", `{"title":"Pont de l’Île, pieu Ø600 😀","x€":1}`, true},
		{"empty object", `{}`, true},
		{"empty key", `{"":1}`, true},
		{"key with a space before the colon", `{"title" : "t", "x" :1}`, true},
		// Left to the YAML parser, so its messages are the ones given.
		{"invalid JSON", `{"title":"t",}`, false},
		{"unquoted key", `{title: t, grund: 1}`, false},
		{"escaped slash", `{"title":"a\/b"}`, false},
		{"surrogate pair", `{"title":"\ud83d\ude00"}`, false},
		{"tab between tokens", "{\"title\":\t\"t\"}", false},
		{"control character", "{\"title\":\"a\x01b\"}", false},
		{"byte order mark", "\ufeff{\"title\":\"t\",\"x\":1}", false},
		{"two objects", `{"title":"t"} {"title":"u"}`, false},
		{"comment", "{\"title\":\"t\"} # note", false},
		{"colon on the next line", "{\"title\"\n:\"t\"}", false},
		{"long key", `{"` + strings.Repeat("k", 1100) + `":1}`, false},
		{"invalid UTF-8", "{\"title\":\"\xff\"}", false},
		{"word not JSON", `{"title":truex}`, false},
		{"leading zero", `{"qult":01}`, false},
	} {
		if got := sameOnBothPaths(t, c.name, []byte(c.in)); got != c.json {
			t.Errorf("%s: JSON reader took it: %v, want %v", c.name, got, c.json)
		}
	}
}

// FuzzJSONPath: for any input the JSON reader takes, both paths agree.
func FuzzJSONPath(f *testing.F) {
	f.Add([]byte(`{"title":"t","grund":1,"ground":{"layers":[{"name":"a","thickness":"1 m"}]}}`))
	f.Add([]byte("{\n\"a\":[1,-2.5e3,true,null,\"x\\u00e9\"],\r\n\"a\":{}}"))
	f.Add([]byte(`{"pile":{"section":{"shape":"circle","diameter":"0.5 m"},"length":"8 m","installation":"bored"}}`))
	f.Fuzz(func(t *testing.T, data []byte) {
		if len(data) > 4096 { // large inputs only slow the search down
			return
		}
		sameOnBothPaths(t, "fuzz input", data)
	})
}

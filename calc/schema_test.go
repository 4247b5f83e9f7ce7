package calc

import (
	"bytes"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"strconv"
	"testing"

	"go.yaml.in/yaml/v3"
)

var update = flag.Bool("update", false, "rewrite qult-calc.schema.json")

// TestSchema: the committed schema is what the Go types generate, it is
// valid JSON, and it forbids unknown keys at the top level.
func TestSchema(t *testing.T) {
	got, err := Schema()
	if err != nil {
		t.Fatal(err)
	}
	got = append(got, '\n')
	const path = "qult-calc.schema.json"
	if *update {
		if err := os.WriteFile(path, got, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test ./calc -update)", err)
	}
	if !bytes.Equal(got, want) {
		t.Errorf("%s is stale: run go test ./calc -run TestSchema -update", path)
	}
	var m map[string]any
	if err := json.Unmarshal(got, &m); err != nil {
		t.Fatal(err)
	}
	if m["additionalProperties"] != false {
		t.Error("top level allows unknown keys")
	}
	props := m["properties"].(map[string]any)
	for _, k := range []string{"ground", "pile", "methods", "design", "loads", "search", "units", "title"} {
		if _, ok := props[k]; !ok {
			t.Errorf("schema lacks %q", k)
		}
	}
}

// validate checks doc against the subset of JSON Schema that Schema
// writes (type, properties, additionalProperties, required, enum, items,
// oneOf), returning the first violation.
func validate(s map[string]any, doc any, path string) string {
	if one, ok := s["oneOf"].([]any); ok {
		n := 0
		for _, o := range one {
			if validate(o.(map[string]any), doc, path) == "" {
				n++
			}
		}
		if n != 1 {
			return path + ": matches " + strconv.Itoa(n) + " of oneOf"
		}
		return ""
	}
	if e, ok := s["enum"].([]any); ok {
		found := false
		for _, v := range e {
			if v == doc {
				found = true
			}
		}
		if !found {
			return path + ": not in enum"
		}
	}
	typeOK := func(t string) bool {
		switch t {
		case "object":
			_, ok := doc.(map[string]any)
			return ok
		case "array":
			_, ok := doc.([]any)
			return ok
		case "string":
			_, ok := doc.(string)
			return ok
		case "number":
			switch doc.(type) {
			case float64, int:
				return true
			}
		case "integer":
			_, ok := doc.(int)
			return ok
		case "boolean":
			_, ok := doc.(bool)
			return ok
		}
		return false
	}
	switch t := s["type"].(type) {
	case string:
		if !typeOK(t) {
			return path + ": not " + t
		}
	case []any:
		ok := false
		for _, x := range t {
			ok = ok || typeOK(x.(string))
		}
		if !ok {
			return path + ": wrong type"
		}
	}
	if m, ok := doc.(map[string]any); ok {
		props, _ := s["properties"].(map[string]any)
		for _, r := range asSlice(s["required"]) {
			if _, ok := m[r.(string)]; !ok {
				return path + ": lacks " + r.(string)
			}
		}
		for k, v := range m {
			if ps, ok := props[k]; ok {
				if msg := validate(ps.(map[string]any), v, path+"."+k); msg != "" {
					return msg
				}
			} else if ap, ok := s["additionalProperties"].(map[string]any); ok {
				if msg := validate(ap, v, path+"."+k); msg != "" {
					return msg
				}
			} else if s["additionalProperties"] == false {
				return path + ": unknown key " + k
			}
		}
	}
	if a, ok := doc.([]any); ok {
		for i, v := range a {
			if msg := validate(s["items"].(map[string]any), v, path+"["+strconv.Itoa(i)+"]"); msg != "" {
				return msg
			}
		}
	}
	return ""
}

func asSlice(v any) []any {
	s, _ := v.([]any)
	return s
}

// TestSchemaAcceptsExamples: every shipped calc file validates against the
// schema, and a file with an unknown key does not.
func TestSchemaAcceptsExamples(t *testing.T) {
	raw, _ := Schema()
	var s map[string]any
	if err := json.Unmarshal(raw, &s); err != nil {
		t.Fatal(err)
	}
	files, _ := filepath.Glob("../examples/*.yaml")
	if len(files) == 0 {
		t.Fatal("no examples")
	}
	for _, f := range files {
		var doc any
		if err := yaml.Unmarshal(mustRead(t, f), &doc); err != nil {
			t.Fatal(err)
		}
		if msg := validate(s, doc, "$"); msg != "" {
			t.Errorf("%s: %s", f, msg)
		}
	}
	var bad any
	_ = yaml.Unmarshal([]byte(base+"colour: red\n"), &bad)
	if validate(s, bad, "$") == "" {
		t.Error("unknown key accepted by the schema")
	}
}

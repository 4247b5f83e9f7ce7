package calc

import (
	"bytes"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/santhosh-tekuri/jsonschema/v6"
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

// compileSchema compiles the generated schema with an independent
// validator (github.com/santhosh-tekuri/jsonschema/v6, draft 2020-12).
func compileSchema(t *testing.T) *jsonschema.Schema {
	t.Helper()
	raw, err := Schema()
	if err != nil {
		t.Fatal(err)
	}
	doc, err := jsonschema.UnmarshalJSON(bytes.NewReader(raw))
	if err != nil {
		t.Fatal(err)
	}
	c := jsonschema.NewCompiler()
	if err := c.AddResource(SchemaID, doc); err != nil {
		t.Fatal(err)
	}
	sch, err := c.Compile(SchemaID)
	if err != nil {
		t.Fatal(err)
	}
	return sch
}

// instance reads a calc file (YAML or JSON) into the values a JSON
// validator sees.
func instance(t *testing.T, src []byte) any {
	t.Helper()
	var doc any
	if err := yaml.Unmarshal(src, &doc); err != nil {
		t.Fatal(err)
	}
	js, err := json.Marshal(doc)
	if err != nil {
		t.Fatal(err)
	}
	v, err := jsonschema.UnmarshalJSON(bytes.NewReader(js))
	if err != nil {
		t.Fatal(err)
	}
	return v
}

// TestSchemaAcceptsExamples: every shipped calc file, and the README's
// shortened one, validates against the schema in an independent validator.
func TestSchemaAcceptsExamples(t *testing.T) {
	sch := compileSchema(t)
	files, _ := filepath.Glob("../examples/*.yaml")
	if len(files) == 0 {
		t.Fatal("no examples")
	}
	for _, f := range files {
		if err := sch.Validate(instance(t, mustRead(t, f))); err != nil {
			t.Errorf("%s: %v", f, err)
		}
	}
	if err := sch.Validate(instance(t, []byte(base))); err != nil {
		t.Errorf("base file: %v", err)
	}
}

// TestSchemaRefuses: files with a wrong dimension, a value out of range, an
// unknown method or key, or a missing required key fail in the independent
// validator, as they fail in the decoder.
func TestSchemaRefuses(t *testing.T) {
	sch := compileSchema(t)
	cases := []struct{ name, from, to string }{
		{"thickness in kPa", "thickness: 30 m", "thickness: 12 kPa"},
		{"thickness negative", "thickness: 30 m", "thickness: -3 m"},
		{"thickness a word", "thickness: 30 m", "thickness: thirty"},
		{"phi 70 bare", "friction_angle: 34 deg", "friction_angle: 70"},
		{"phi 70 deg", "friction_angle: 34 deg", "friction_angle: 70 deg"},
		{"phi 50.5°", "friction_angle: 34 deg", "friction_angle: 50.5°"},
		{"phi in kPa", "friction_angle: 34 deg", "friction_angle: 34 kPa"},
		{"unit weight as length", "unit_weight: 18 kN/m3", "unit_weight: 18 m"},
		{"diameter as force", "diameter: 0.6 m", "diameter: 600 kN"},
		{"no water depth", "  water_depth: 2 m\n", ""},
		{"water depth a word", "water_depth: 2 m", "water_depth: dry"},
		{"no layers", "  layers:\n", "  strata:\n"},
		{"unknown drainage", "drainage: drained", "drainage: partly"},
		{"unknown shape", "shape: circle", "shape: hexagon"},
		{"unknown installation", "installation: driven-high", "installation: hammered"},
		{"no installation", "  installation: driven-high\n", ""},
		{"no length", "  length: 15 m\n", ""},
		{"unknown key", "title: t", "title: t\ncolour: red"},
		{"unknown layer key", "drainage: drained", "drainage: drained\n      frictionangle: 30"},
		{"unknown units", "units: SI", "units: imperial"},
		{"load bare", "pile:", "loads: {compression: 800 kN}\npile:"},
		{"load negative", "pile:", "loads: {compression: {permanent: -800 kN}}\npile:"},
		{"load as stress", "pile:", "loads: {compression: {permanent: 800 kPa}}\npile:"},
		{"void ratio over 20", "drainage: drained", "drainage: drained\n      void_ratio: 25"},
		{"unknown basis", "pile:", "design: {basis: lucky-guess}\npile:"},
		{"no basis", "pile:", "design: {factor: 2.5}\npile:"},
		{"factor over 1", "pile:", "design: {basis: lrfd, shaft: {beta: 1.5}}\npile:"},
		{"profiles fractional", "pile:", "design: {basis: en1997, approach: DA1, profiles: 2.5}\npile:"},
		{"unknown approach", "pile:", "design: {basis: en1997, approach: DA4}\npile:"},
		{"unknown self weight", "pile:", "methods: {self_weight: heavy}\npile:"},
	}
	for _, c := range cases {
		src := strings.Replace(base, c.from, c.to, 1)
		if src == base {
			t.Fatalf("%s: base file changed: %q not found", c.name, c.from)
		}
		if err := sch.Validate(instance(t, []byte(src))); err == nil {
			t.Errorf("%s: accepted by the schema", c.name)
		}
		if _, err := Parse([]byte(src)); err == nil {
			t.Errorf("%s: accepted by the decoder", c.name)
		}
	}
}

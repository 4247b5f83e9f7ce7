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
	sub, _ := filepath.Glob("../examples/*/*.yaml") // examples with their own files (soundings)
	for _, f := range append(files, sub...) {
		if err := sch.Validate(instance(t, mustRead(t, f))); err != nil {
			t.Errorf("%s: %v", f, err)
		}
	}
	if err := sch.Validate(instance(t, []byte(base))); err != nil {
		t.Errorf("base file: %v", err)
	}
	// Method choices the decoder accepts, the schema accepts too.
	for _, add := range []string{
		"tip: {method: given-nq, nq: 40, nc: 12, limit: 9 MPa}",
		"tip: {method: janbu, eta: 75 deg}",
		"shaft: {method: beta, k0: ocr, delta: 28 deg, limit: 90 kPa}",
		"shaft: {method: beta, k_over_kp: 0.2, delta_over_phi: 0.75}",
		"shaft: {method: beta-api, sand_class: api-dense-sand}",
		"shaft: {method: none}",
	} {
		src := strings.Replace(base, "friction_angle: 34 deg", "friction_angle: 34 deg\n      "+add, 1)
		if err := sch.Validate(instance(t, []byte(src))); err != nil {
			t.Errorf("%s: %v", add, err)
		}
		if _, err := Parse([]byte(src)); err != nil {
			t.Errorf("%s: refused by the decoder: %v", add, err)
		}
	}
	// The direct CPT methods: the schema and the resolution of the keys
	// accept them (running them needs the sounding file).
	for _, add := range []string{
		"shaft: {method: lcpc, alpha: 120, limit: 80 kPa}\n      tip: {method: lcpc, kc: 0.45, limit: 12 MPa}",
		"shaft: {method: eslami-fellenius, cs: 0.008}\n      tip: {method: eslami-fellenius, ct: 0.8}",
		"tip: {method: schmertmann, limit: 15 MPa}",
	} {
		src := strings.Replace(base, "friction_angle: 34 deg", "friction_angle: 34 deg\n      "+add, 1)
		if err := sch.Validate(instance(t, []byte(src))); err != nil {
			t.Errorf("%s: %v", add, err)
		}
		f, err := Decode([]byte(src))
		if err == nil {
			_, err = Resolve(f)
		}
		if err != nil {
			t.Errorf("%s: refused by the decoder: %v", add, err)
		}
	}
	src := strings.Replace(base, "pile:", "methods: {tip_drained: janbu, shaft_drained: beta-burland, shaft_undrained: lambda}\ndesign: {basis: lrfd, tip: {janbu: 0.4}, shaft: {lambda: 0.4, \"*\": 0.3}, uplift: {beta-burland: 0.3}}\npile:", 1)
	if err := sch.Validate(instance(t, []byte(src))); err != nil {
		t.Errorf("pile methods and factor keys: %v", err)
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
		// The catalogues of methods: identifiers, and the keys each reads.
		{"unknown tip method", "pile:", "methods: {tip_drained: guesswork}\npile:"},
		{"unknown shaft method", "pile:", "methods: {shaft_undrained: magic}\npile:"},
		{"none for every layer", "pile:", "methods: {shaft_undrained: none}\npile:"},
		{"lambda for drained layers", "pile:", "methods: {shaft_drained: lambda}\npile:"},
		{"given method for every layer", "pile:", "methods: {tip_drained: given-nq}\npile:"},
		{"unknown layer tip method", "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {method: guesswork}"},
		{"layer tip without method", "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {nq: 40}"},
		{"nq on meyerhof", "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {method: meyerhof, nq: 40}"},
		{"eta on given-nq", "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {method: given-nq, nq: 40, eta: 90}"},
		{"given-nq without nq", "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {method: given-nq, nc: 10}"},
		{"given-nc nc over 100", "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {method: given-nc, nc: 150}"},
		{"janbu eta 30", "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {method: janbu, eta: 30}"},
		{"k on beta-given", "friction_angle: 34 deg", "friction_angle: 34 deg\n      shaft: {method: beta-given, beta: 0.3, k: 1}"},
		{"limit on lambda", "friction_angle: 34 deg", "friction_angle: 34 deg\n      shaft: {method: lambda, limit: 50 kPa}"},
		{"two K keys", "friction_angle: 34 deg", "friction_angle: 34 deg\n      shaft: {method: beta, k: 1, k0: jaky}"},
		{"two δ keys", "friction_angle: 34 deg", "friction_angle: 34 deg\n      shaft: {method: beta, delta: 25, delta_over_phi: 0.8}"},
		{"unknown k0 rule", "friction_angle: 34 deg", "friction_angle: 34 deg\n      shaft: {method: beta, k0: rankine}"},
		{"beta-api without class", "friction_angle: 34 deg", "friction_angle: 34 deg\n      shaft: {method: beta-api}"},
		{"k_over_k0 zero", "friction_angle: 34 deg", "friction_angle: 34 deg\n      shaft: {method: beta, k_over_k0: 0}"},
		{"misspelt factor key", "pile:", "design: {basis: lrfd, shaft: {betta: 0.4}}\npile:"},
		{"factor key none", "pile:", "design: {basis: lrfd, uplift: {none: 0.4}}\npile:"},
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

package verify

import (
	"bytes"
	"encoding/json"
	"math"
	"strings"
	"testing"
	"testing/fstest"
)

// TestCatalogue runs every reference case; any failure fails the test,
// with the case, its source and the deviation.
func TestCatalogue(t *testing.T) {
	cs, err := Catalogue()
	if err != nil {
		t.Fatalf("catalogue: %v", err)
	}
	r := RunCases(cs)
	for _, o := range r.Outcomes {
		if !o.Pass {
			t.Errorf("%s (%s, %s): computed %s %s, expected %s within %s; deviation %s; error: %v",
				o.ID, o.Function, o.Reference(), fmtNum(o.Computed), o.Unit, fmtNum(o.Expected),
				o.Tolerance.String(o.Unit), o.deviation(), o.Err)
		}
	}
	if r.Cases != len(cs) || r.Passed+r.Failed != r.Cases {
		t.Errorf("counts: %d cases, %d passed, %d failed for %d in the catalogue", r.Cases, r.Passed, r.Failed, len(cs))
	}
	t.Logf("%s", r.summary())
}

// TestCatalogueSize: the record holds at least 100 cases, every one with a
// source, and covers the topics the record promises.
func TestCatalogueSize(t *testing.T) {
	cs, err := Catalogue()
	if err != nil {
		t.Fatal(err)
	}
	if len(cs) < 100 {
		t.Errorf("%d cases, want at least 100", len(cs))
	}
	topics := map[string]int{}
	for _, c := range cs {
		topics[c.Topic]++
		if c.Source.Author == "" || c.Source.Year == "" || c.Source.Title == "" || c.Where == "" {
			t.Errorf("%s: incomplete source %+v, where %q", c.ID, c.Source, c.Where)
		}
	}
	for _, want := range []string{"unit", "phase", "stress", "tip", "shaft", "whole pile", "design", "settlement"} {
		n := 0
		for tp, k := range topics {
			if strings.Contains(tp, want) {
				n += k
			}
		}
		if n == 0 {
			t.Errorf("no topic mentions %q: %v", want, topics)
		}
	}
}

// TestBadCatalogue: a malformed case is refused with the field named,
// and a value outside the tolerance fails (the record can fail).
func TestBadCatalogue(t *testing.T) {
	good := `topic: t
sources:
  s: {author: A, year: "2000", title: T}
cases:
  - id: a
    function: units.Parse
    inputs: {text: "1 ft"}
    quantity: value
    expected: 0.3048
    unit: m
    tolerance: {relative: 1.0e-9, why: exact}
    source: s
    where: Table 1
    status: read
    kind: table
`
	cs, err := load(fstest.MapFS{"c/a.yaml": {Data: []byte(good)}}, "c")
	if err != nil || len(cs) != 1 {
		t.Fatalf("good file: %v (%d cases)", err, len(cs))
	}
	if r := RunCases(cs); r.Passed != 1 {
		t.Errorf("good case failed: %+v", r.Outcomes[0])
	}
	for _, c := range []struct{ from, to, want string }{
		{"function: units.Parse", "function: units.Nothing", "function"},
		{"status: read", "status: recalled", "status"},
		{"kind: table", "kind: guess", "kind"},
		{"source: s", "source: t", "source"},
		{"{relative: 1.0e-9, why: exact}", "{relative: 1.0e-9, absolute: 1, why: exact}", "tolerance"},
		{"{relative: 1.0e-9, why: exact}", "{relative: 1.0e-9}", "tolerance.why"},
		{"unit: m", "unit: furlong", "unit"},
		{"where: Table 1", "where: \"\"", "where"},
		{"    kind: table\n", "    kind: table\n    extra: 1\n", "extra"},
	} {
		bad := strings.Replace(good, c.from, c.to, 1)
		_, err := load(fstest.MapFS{"c/a.yaml": {Data: []byte(bad)}}, "c")
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s → %s: err %v, want one naming %q", c.from, c.to, err, c.want)
		}
	}
	// Two files using one identifier.
	_, err = load(fstest.MapFS{"c/a.yaml": {Data: []byte(good)}, "c/b.yaml": {Data: []byte(good)}}, "c")
	if err == nil || !strings.Contains(err.Error(), "already used") {
		t.Errorf("duplicate id: %v", err)
	}
	// Run-time failures: a wrong expected value, an unread input, a wrong
	// unit dimension, an unknown quantity.
	for _, c := range []struct{ from, to, want string }{
		{"expected: 0.3048", "expected: 0.31", ""},
		{`inputs: {text: "1 ft"}`, `inputs: {text: "1 ft", spare: 2}`, "spare"},
		{"unit: m", "unit: kPa", "unit"},
		{"quantity: value", "quantity: area", "quantity"},
	} {
		bad := strings.Replace(good, c.from, c.to, 1)
		cs, err := load(fstest.MapFS{"c/a.yaml": {Data: []byte(bad)}}, "c")
		if err != nil {
			t.Fatalf("%s: %v", c.to, err)
		}
		o := RunCases(cs).Outcomes[0]
		if o.Pass || (c.want != "" && (o.Err == nil || !strings.Contains(o.Err.Error(), c.want))) {
			t.Errorf("%s: pass %v, err %v; want a failure naming %q", c.to, o.Pass, o.Err, c.want)
		}
	}
}

// TestWriteFormats: every format carries each case, the summary and the
// cautions; JSON parses and keeps the counts.
func TestWriteFormats(t *testing.T) {
	r, err := Run()
	if err != nil {
		t.Fatal(err)
	}
	for _, f := range Formats {
		var b bytes.Buffer
		if err := r.Write(&b, f); err != nil {
			t.Fatalf("%s: %v", f, err)
		}
		s := b.String()
		for _, o := range r.Outcomes[:3] {
			if !strings.Contains(s, o.ID) {
				t.Errorf("%s: case %s missing", f, o.ID)
			}
		}
		if !strings.Contains(s, "qualified") {
			t.Errorf("%s: no cautions", f)
		}
		if f == "json" {
			var j struct {
				Schema                string
				Cases, Passed, Failed int
				Outcomes              []map[string]any
			}
			if err := json.Unmarshal(b.Bytes(), &j); err != nil {
				t.Fatalf("json: %v", err)
			}
			if j.Schema != Schema || j.Cases != r.Cases || len(j.Outcomes) != r.Cases || j.Passed != r.Passed {
				t.Errorf("json counts %d/%d/%d, want %d/%d", j.Cases, j.Passed, len(j.Outcomes), r.Cases, r.Passed)
			}
		}
	}
	if err := r.Write(&bytes.Buffer{}, "pdf"); err == nil {
		t.Error("format pdf accepted")
	}
}

func TestSummary(t *testing.T) {
	n, p, f, err := Summary()
	if err != nil || n < 100 || p+f != n {
		t.Errorf("Summary = %d, %d, %d, %v", n, p, f, err)
	}
	if s := SummaryText(); !strings.Contains(s, "reference cases") {
		t.Errorf("SummaryText = %q", s)
	}
}

// TestDeviation: a relative deviation is a fraction of the expected
// value, an absolute one in the case's unit (closed form).
func TestDeviation(t *testing.T) {
	c := Case{Function: "units.Parse", Inputs: map[string]any{"text": "2 m"}, Quantity: "value", Expected: 2.1, Unit: "m",
		Tolerance: Tolerance{Absolute: 0.05}}
	o := runCase(c)
	if math.Abs(o.Deviation+0.1) > 1e-12 || o.Pass {
		t.Errorf("absolute: deviation %g pass %v, want -0.1 and a failure", o.Deviation, o.Pass)
	}
	c.Tolerance = Tolerance{Relative: 0.05}
	o = runCase(c)
	if math.Abs(o.Deviation+0.1/2.1) > 1e-12 || !o.Pass {
		t.Errorf("relative: deviation %g pass %v, want -0.047619 and a pass", o.Deviation, o.Pass)
	}
}

// TestInputErrors: a bad input names its key and fails the case, never a
// panic or a silent default.
func TestInputErrors(t *testing.T) {
	for _, c := range []struct {
		fn   string
		in   map[string]any
		want string
	}{
		{"bearing.PrandtlNq", map[string]any{"phi": 30}, "inputs.phi"},
		{"bearing.PrandtlNq", map[string]any{}, "inputs.phi: missing"},
		{"bearing.PrandtlNq", map[string]any{"phi": "30 kPa"}, "dimension stress, want angle"},
		{"bearing.VesicNsigma", map[string]any{"phi": "30 deg", "irr": "many"}, "inputs.irr"},
		{"profile.Profile.StressesAt", map[string]any{"z": "1 m", "ground": map[string]any{"water_depth": "1 m",
			"layers": []any{map[string]any{"thickness": "2 m", "drainage": "wet"}}}}, "inputs.ground.layers[0].drainage"},
		{"pile.Analysis.Capacity", map[string]any{"calc": "title: x\n"}, "pile"},
		{"pile.Eurocode7.Cases", map[string]any{"approach": "DA9", "installation": "bored", "case": "DA1-1"}, "DA9"},
		{"pile.Eurocode7.Cases", map[string]any{"approach": "DA1", "installation": "bored", "case": "DA7"}, "DA7"},
	} {
		o := runCase(Case{Function: c.fn, Inputs: c.in, Quantity: "value", Expected: 1, Unit: "-", Tolerance: Tolerance{Relative: 0.1}})
		if o.Pass || o.Err == nil || !strings.Contains(o.Err.Error(), c.want) {
			t.Errorf("%s %v: pass %v, err %v; want an error naming %q", c.fn, c.in, o.Pass, o.Err, c.want)
		}
	}
}

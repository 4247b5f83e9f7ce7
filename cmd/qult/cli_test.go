package main

// Sources: expected values of the quick tools are closed forms evaluated
// here with their own formulas, each named beside its check (three-phase
// relations as in Das & Sobhan 2014, Principles of Geotechnical
// Engineering, 8th ed., ch. 3; Skempton's Nc = 9, Skempton 1951; Vesic's
// undrained Nc* = (4/3)(ln Irr + 1) + π/2 + 1, Vesic 1977). Soil values
// given on the command line are invented.

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"go.yaml.in/yaml/v3"
)

// TestUsageErrors: every usage mistake is exit 2 with a message that says
// what is wrong and points at help.
func TestUsageErrors(t *testing.T) {
	ex := examplePath("pump-station-bored")
	for _, c := range []struct {
		args []string
		want string
	}{
		{nil, "usage: qult VERB"},
		{[]string{"frobnicate"}, `unknown verb "frobnicate"`},
		{[]string{"--format", "json"}, "before a verb"},
		{[]string{"help", "nope"}, `unknown verb "nope"`},
		{[]string{"help", "check", "length"}, "help takes one verb"},
		{[]string{"capacity"}, "no calc file given"},
		{[]string{"capacity", ex, ex}, "one calc file at a time"},
		{[]string{"capacity", "--format", "docx", ex}, `--format "docx"`},
		{[]string{"capacity", "--units", "metric", ex}, `--units "metric"`},
		{[]string{"capacity", "--colour", ex}, "flag provided but not defined: -colour"},
		{[]string{"capacity", "--format"}, "flag needs an argument"},
		{[]string{"phase"}, "no values given"},
		{[]string{"phase", "--gs", "2.7", "extra"}, "takes no file"},
		{[]string{"phase", "--gs", "2.7", "--format", "html"}, `--format "html"`},
		{[]string{"phase", "--gamma", "18 kPa", "--w", "0.2"}, `--gamma "18 kPa"`},
		{[]string{"phase", "--e", "0", "--gs", "2.7"}, "--e 0"},
		{[]string{"phase", "--e", "NaN", "--gs", "2.7"}, "not a finite number"},
		{[]string{"phase", "--gs", "2.7"}, "not enough values"},
		{[]string{"phase", "--gs", "5", "--e", "0.6", "--s", "1"}, "--gs:"},
		{[]string{"phase", "--gs", "2.7", "--e", "0.6", "--s", "1", "--gamma-sat", "25"}, "disagrees"},
		{[]string{"factors"}, "nothing to compare"},
		{[]string{"factors", "--phi", "34 kPa", "--q", "100"}, `--phi "34 kPa"`},
		{[]string{"factors", "--su", "-5"}, "must not be negative"},
		{[]string{"factors", "--n60", "many"}, "not a number"},
		{[]string{"factors", "--units", "SU", "--su", "50"}, `--units "SU"`},
		{[]string{"batch", "a.jsonl", "b.jsonl"}, "one input at a time"},
		{[]string{"batch", "--units", "x"}, `--units "x"`},
		{[]string{"batch", "--workers", "-1"}, "--workers -1: want 0 (one per CPU) or a positive number"},
		{[]string{"batch", "--workers", "two"}, `invalid value "two" for flag -workers`},
		{[]string{"version", "now"}, "takes no arguments"},
	} {
		r := runQ(t, slow, "", c.args...)
		if r.code != 2 {
			t.Errorf("qult %v: exit %d, want 2", c.args, r.code)
		}
		if !strings.Contains(r.stderr, c.want) {
			t.Errorf("qult %v: stderr lacks %q:\n%s", c.args, c.want, r.stderr)
		}
		if len(c.args) > 0 && !strings.Contains(r.stderr, "qult help") && !strings.Contains(r.stderr, "phase:") {
			t.Errorf("qult %v: usage error does not point at help:\n%s", c.args, r.stderr)
		}
		if r.stdout != "" {
			t.Errorf("qult %v: printed on standard output for a usage error: %q", c.args, r.stdout)
		}
	}
}

// TestCheckNeedsDesign: check and length refuse a file without a design
// section or without loads, naming the missing part.
func TestCheckNeedsDesign(t *testing.T) {
	data, err := os.ReadFile(examplePath("pump-station-bored"))
	if err != nil {
		t.Fatal(err)
	}
	src := string(data)
	cut := func(from, to string) string {
		i, j := strings.Index(src, from), strings.Index(src, to)
		if i < 0 || j < i {
			t.Fatalf("example changed: %q or %q not found", from, to)
		}
		return src[:i] + src[j:]
	}
	noDesign := cut("design:\n", "loads:\n")
	noLoads := cut("loads:\n", "search:\n")
	for _, verb := range []string{"check", "length"} {
		if r := runQ(t, slow, noDesign, verb, "-"); r.code != 2 || !strings.Contains(r.stderr, "<stdin>: design: not given") {
			t.Errorf("%s without design: exit %d, stderr %q", verb, r.code, r.stderr)
		}
		if r := runQ(t, slow, noLoads, verb, "-"); r.code != 2 || !strings.Contains(r.stderr, "<stdin>: loads: not given") {
			t.Errorf("%s without loads: exit %d, stderr %q", verb, r.code, r.stderr)
		}
	}
	if r := runQ(t, slow, noDesign, "capacity", "-"); r.code != 0 {
		t.Errorf("capacity without a design section: exit %d, stderr %q", r.code, r.stderr)
	}
}

// TestPanicIsReported: a panic inside a verb is recovered, reported as an
// internal error and exit code 2 (the last resort; no verb should get
// there).
func TestPanicIsReported(t *testing.T) {
	verbs = append(verbs, verb{name: "explode", run: func(*cmd, []string) int { panic("boom") }})
	defer func() { verbs = verbs[:len(verbs)-1] }()
	var o, e bytes.Buffer
	code := run(&o, &e, []string{"explode"})
	if code != 2 || !strings.Contains(e.String(), "qult: internal error: boom") {
		t.Errorf("panic: exit %d, stderr %q", code, e.String())
	}
}

func TestGoldenPhase(t *testing.T) {
	si := []string{"phase", "--gs", "2.70", "--e", "0.65", "--s", "1"}
	for _, f := range []string{"text", "json", "csv", "md"} {
		r := runQ(t, slow, "", append(si, "--format", f)...)
		if r.code != 0 {
			t.Fatalf("%v: exit %d\n%s", si, r.code, r.stderr)
		}
		golden(t, "phase/saturated-si."+extOf[f], []byte(r.stdout))
	}
	r := runQ(t, slow, "", "phase", "--units", "US", "--gamma", "120", "--w", "18 %", "--gs", "2.68")
	if r.code != 0 {
		t.Fatalf("phase US: exit %d\n%s", r.code, r.stderr)
	}
	golden(t, "phase/moist-us.txt", []byte(r.stdout))
}

// TestPhaseValues checks the solved state against the relations evaluated
// here (Das & Sobhan 2014, ch. 3: n = e/(1+e); w = S·e/Gs;
// γd = Gs·γw/(1+e); γsat = (Gs+e)·γw/(1+e); γ′ = γsat − γw).
func TestPhaseValues(t *testing.T) {
	r := runQ(t, slow, "", "phase", "--gs", "2.70", "--e", "0.65", "--s", "100 %", "--format", "json")
	if r.code != 0 {
		t.Fatalf("exit %d\n%s", r.code, r.stderr)
	}
	var doc struct {
		Quantities []struct {
			Symbol string
			Value  float64
			Given  bool
		}
	}
	if err := json.Unmarshal([]byte(r.stdout), &doc); err != nil {
		t.Fatal(err)
	}
	gs, e, s, gw := 2.70, 0.65, 1.0, 9.81 // γw = 9.81 kN/m3, the SI default (common practice)
	want := map[string]float64{
		"Gs": gs, "e": e, "S": s,
		"n":    e / (1 + e),
		"w":    s * e / gs,
		"γd":   gs * gw / (1 + e),
		"γsat": (gs + e) * gw / (1 + e),
		"γ":    (gs + s*e) * gw / (1 + e),
		"γ′":   (gs+e)*gw/(1+e) - gw,
		"γw":   gw,
	}
	seen := 0
	for _, q := range doc.Quantities {
		w, ok := want[q.Symbol]
		if !ok {
			continue
		}
		seen++
		if math.Abs(q.Value-w) > 1e-5*math.Abs(w) { // JSON carries 6 significant digits
			t.Errorf("%s = %g, want %g (closed form)", q.Symbol, q.Value, w)
		}
		if given := q.Symbol == "Gs" || q.Symbol == "e" || q.Symbol == "S"; given != q.Given {
			t.Errorf("%s: given = %v, want %v", q.Symbol, q.Given, given)
		}
	}
	if seen != len(want) {
		t.Errorf("found %d of the %d quantities", seen, len(want))
	}
}

func TestGoldenFactors(t *testing.T) {
	drained := []string{"factors", "--phi", "34", "--q", "180", "--l", "20", "--d", "0.6", "--n60", "30"}
	for _, f := range []string{"text", "json", "csv", "md"} {
		r := runQ(t, slow, "", append(drained, "--format", f)...)
		if r.code != 0 {
			t.Fatalf("%v: exit %d\n%s", drained, r.code, r.stderr)
		}
		golden(t, "factors/drained-si."+extOf[f], []byte(r.stdout))
	}
	for name, args := range map[string][]string{
		"undrained-si": {"factors", "--su", "75", "--ir", "150"},
		"drained-us":   {"factors", "--units", "US", "--phi", "36", "--q", "3.2", "--l", "60", "--d", "2", "--n60", "35"},
		"off-chart":    {"factors", "--phi", "47", "--q", "150", "--l", "10", "--d", "0.5"},
		"clamped":      {"factors", "--phi", "47", "--q", "150", "--l", "10", "--d", "0.5", "--clamp"},
	} {
		r := runQ(t, slow, "", args...)
		if r.code != 0 {
			t.Fatalf("%v: exit %d\n%s", args, r.code, r.stderr)
		}
		golden(t, "factors/"+name+".txt", []byte(r.stdout))
	}
}

// TestFactorsValues checks the undrained rows against their closed forms:
// qp = 9·su (Skempton 1951) and qp = Nc*·su with
// Nc* = (4/3)(ln Irr + 1) + π/2 + 1 (Vesic 1977).
func TestFactorsValues(t *testing.T) {
	r := runQ(t, slow, "", "factors", "--su", "75 kPa", "--ir", "150", "--format", "json")
	if r.code != 0 {
		t.Fatalf("exit %d\n%s", r.code, r.stderr)
	}
	var doc struct {
		Methods []struct {
			Method string
			Nc     float64
			Qp     float64
			Error  string
		}
	}
	if err := json.Unmarshal([]byte(r.stdout), &doc); err != nil {
		t.Fatal(err)
	}
	su := 75.0
	vesicNc := 4.0/3*(math.Log(150)+1) + math.Pi/2 + 1
	want := map[string]float64{"nc9": 9, "vesic-undrained": vesicNc}
	if len(doc.Methods) != len(want) {
		t.Errorf("%d methods, want %d (the undrained ones only)", len(doc.Methods), len(want))
	}
	for _, m := range doc.Methods {
		nc, ok := want[m.Method]
		if !ok || m.Error != "" {
			t.Errorf("unexpected row %+v", m)
			continue
		}
		if math.Abs(m.Nc-nc) > 1e-5*nc || math.Abs(m.Qp-nc*su) > 1e-5*nc*su {
			t.Errorf("%s: Nc %g qp %g, want Nc %g qp %g kPa (closed form)", m.Method, m.Nc, m.Qp, nc, nc*su)
		}
	}
}

// batchInput returns the examples as JSON Lines (each YAML file turned
// into one JSON object), with bad lines and a blank line among them.
func batchInput(t *testing.T) (string, int) {
	t.Helper()
	var lines []string
	for _, ex := range examples {
		data, err := os.ReadFile(examplePath(ex))
		if err != nil {
			t.Fatal(err)
		}
		var v map[string]any
		if err := yaml.Unmarshal(data, &v); err != nil {
			t.Fatal(err)
		}
		j, err := json.Marshal(v)
		if err != nil {
			t.Fatal(err)
		}
		lines = append(lines, string(j))
	}
	lines = append(lines[:1], append([]string{
		`{"title": "bad line", "ground": {"layers": []}}`,
		``,
		`not json at all`,
	}, lines[1:]...)...)
	lines = append(lines, `{"title": "unknown key", "grund": 1}`, `["a list"]`)
	return strings.Join(lines, "\n") + "\n", len(lines) - 1
}

// TestBatch: one output line per non-blank input line, in input order,
// the same with one worker and with many; bad lines carry their line
// number and an error; the exit code is 2 when any line is bad.
func TestBatch(t *testing.T) {
	in, n := batchInput(t)
	var outs []string
	for _, w := range []int{1, 8} {
		r := runQ(t, slow, in, "batch", "--workers", strconv.Itoa(w))
		if r.code != 2 || !strings.Contains(r.stderr, "4 line(s) with bad input") {
			t.Errorf("workers=%d: exit %d, stderr %q", w, r.code, r.stderr)
		}
		outs = append(outs, r.stdout)
	}
	if outs[0] != outs[1] {
		t.Errorf("batch output differs between 1 and 8 workers")
	}
	lines := strings.Split(strings.TrimRight(outs[0], "\n"), "\n")
	if len(lines) != n {
		t.Fatalf("%d output lines, want %d", len(lines), n)
	}
	wantErrLine := map[int]int{1: 2, 2: 4, 5: 7, 6: 8} // output index → input line number
	for i, l := range lines {
		var m map[string]any
		if err := json.Unmarshal([]byte(l), &m); err != nil {
			t.Fatalf("output line %d is not JSON: %v", i+1, err)
		}
		if num, bad := wantErrLine[i]; bad {
			if m["error"] == nil || m["line"] != float64(num) {
				t.Errorf("output line %d: want an error for input line %d, got %.200s", i+1, num, l)
			}
			continue
		}
		if m["error"] != nil {
			t.Errorf("output line %d: unexpected error %v", i+1, m["error"])
		}
	}
	golden(t, "batch/examples.jsonl", []byte(outs[0]))

	// All good lines: exit 0; from a file and with -o.
	good := strings.Join([]string{lines0(in, 0), lines0(in, 4)}, "\n") + "\n"
	dir := t.TempDir()
	inPath, outPath := filepath.Join(dir, "in.jsonl"), filepath.Join(dir, "out.jsonl")
	if err := os.WriteFile(inPath, []byte(good), 0o644); err != nil {
		t.Fatal(err)
	}
	r := runQ(t, slow, "", "batch", "-o", outPath, inPath)
	if r.code != 0 {
		t.Errorf("batch of good lines: exit %d, stderr %q", r.code, r.stderr)
	}
	got, err := os.ReadFile(outPath)
	if err != nil {
		t.Fatal(err)
	}
	if n := strings.Count(string(got), "\n"); n != 2 {
		t.Errorf("batch -o wrote %d lines, want 2", n)
	}
}

func lines0(s string, i int) string { return strings.Split(s, "\n")[i] }

// TestBatchLean: --lean leaves capacity with depth and the methods
// compared out of each result and names them under "omitted"; every other
// member is as without it.
func TestBatchLean(t *testing.T) {
	in, _ := batchInput(t)
	line := lines0(in, 0) + "\n"
	var docs [2]map[string]any
	for i, args := range [][]string{{"batch"}, {"batch", "--lean"}} {
		r := runQ(t, slow, line, args...)
		if r.code != 0 {
			t.Fatalf("%v: exit %d %s", args, r.code, r.stderr)
		}
		if err := json.Unmarshal([]byte(r.stdout), &docs[i]); err != nil {
			t.Fatal(err)
		}
	}
	full, lean := docs[0], docs[1]
	if rows, _ := full["capacity_with_depth"].([]any); len(rows) == 0 {
		t.Fatalf("the full line has no capacity with depth")
	}
	if _, ok := full["methods_compared"]; !ok {
		t.Fatalf("the full line has no methods compared")
	}
	for _, k := range []string{"capacity_with_depth", "methods_compared"} {
		if _, ok := lean[k]; ok {
			t.Errorf("--lean kept %s", k)
		}
	}
	if fmt.Sprint(lean["omitted"]) != "[capacity_with_depth methods_compared]" {
		t.Errorf("omitted %v, want [capacity_with_depth methods_compared]", lean["omitted"])
	}
	delete(full, "capacity_with_depth")
	delete(full, "methods_compared")
	delete(lean, "omitted")
	if fmt.Sprint(full) != fmt.Sprint(lean) {
		t.Errorf("--lean changed other members")
	}
}

// TestBatchFailingDesign: a line whose design fails makes exit code 1.
func TestBatchFailingDesign(t *testing.T) {
	data, err := os.ReadFile(filepath.Join("testdata", "overloaded.yaml"))
	if err != nil {
		t.Fatal(err)
	}
	var v map[string]any
	if err := yaml.Unmarshal(data, &v); err != nil {
		t.Fatal(err)
	}
	j, _ := json.Marshal(v)
	r := runQ(t, slow, string(j)+"\n", "batch", "-")
	if r.code != 1 || strings.Count(r.stdout, "\n") != 1 {
		t.Errorf("exit %d, want 1; stdout %d bytes; stderr %q", r.code, len(r.stdout), r.stderr)
	}
}

// TestBatchLongLine: a line over the size limit is one error line; the
// lines around it are still answered.
func TestBatchLongLine(t *testing.T) {
	in, _ := batchInput(t)
	first := lines0(in, 0)
	long := `{"title": "` + strings.Repeat("x", 1<<20+10) + `"}`
	r := runQ(t, slow, first+"\n"+long+"\n"+first+"\n", "batch")
	lines := strings.Split(strings.TrimRight(r.stdout, "\n"), "\n")
	if r.code != 2 || len(lines) != 3 || !strings.Contains(lines[1], `"line":2`) || !strings.Contains(lines[1], "over the limit") {
		t.Errorf("exit %d, %d lines; line 2: %.200s", r.code, len(lines), lines[min(1, len(lines)-1)])
	}
	if strings.TrimPrefix(lines[0], `{"line":1,`) != strings.TrimPrefix(lines[len(lines)-1], `{"line":3,`) {
		t.Errorf("the lines around the long one differ")
	}
}

// TestUnitsOverride: --units US shows the same result in US units. The
// conversions are exact by definition (closed form): 1 kip = 4.4482216152605
// kN, 1 ft = 0.3048 m.
func TestUnitsOverride(t *testing.T) {
	type q struct {
		Value float64
		Unit  string
	}
	var docs [2]struct {
		Units    string
		Pile     map[string]json.RawMessage
		Capacity struct{ Tip, Shaft, Compression, Tension q }
		Design   struct{ Pass bool }
	}
	for i, sys := range []string{"SI", "US"} {
		r := runQ(t, slow, "", "capacity", "--format", "json", "--units", sys, examplePath("pump-station-bored"))
		if r.code != 0 {
			t.Fatalf("--units %s: exit %d\n%s", sys, r.code, r.stderr)
		}
		if err := json.Unmarshal([]byte(r.stdout), &docs[i]); err != nil {
			t.Fatal(err)
		}
	}
	si, us := docs[0], docs[1]
	if si.Units != "SI" || us.Units != "US" {
		t.Errorf("units %q and %q, want SI and US", si.Units, us.Units)
	}
	const kip = 4.4482216152605 // kN, exact by definition of the pound-force
	for _, c := range []struct {
		name   string
		si, us q
	}{{"tip", si.Capacity.Tip, us.Capacity.Tip}, {"shaft", si.Capacity.Shaft, us.Capacity.Shaft},
		{"compression", si.Capacity.Compression, us.Capacity.Compression}, {"tension", si.Capacity.Tension, us.Capacity.Tension}} {
		if c.si.Unit != "kN" || c.us.Unit != "kip" {
			t.Errorf("%s: units %q and %q, want kN and kip", c.name, c.si.Unit, c.us.Unit)
		}
		if math.Abs(c.us.Value*kip-c.si.Value) > 2e-5*c.si.Value { // both carry 6 significant digits
			t.Errorf("%s: %g kip × %g = %g kN, want %g kN", c.name, c.us.Value, kip, c.us.Value*kip, c.si.Value)
		}
	}
	if si.Design.Pass != us.Design.Pass {
		t.Errorf("the design check differs with the display units")
	}
}

// TestBatchMatchesSingle: each batch answer is the compacted JSON that
// capacity --format json gives for the same input line, after its line
// number and id.
func TestBatchMatchesSingle(t *testing.T) {
	in, _ := batchInput(t)
	r := runQ(t, slow, in, "batch")
	out := strings.Split(strings.TrimRight(r.stdout, "\n"), "\n")
	for _, c := range []struct{ in, out int }{{0, 0}, {4, 3}, {5, 4}} {
		line := lines0(in, c.in)
		single := runQ(t, slow, line, "capacity", "--format", "json", "-")
		if single.code != 0 {
			t.Fatalf("capacity of input line %d: exit %d\n%s", c.in+1, single.code, single.stderr)
		}
		var compact bytes.Buffer
		if err := json.Compact(&compact, []byte(single.stdout)); err != nil {
			t.Fatal(err)
		}
		// The batch line opens with its line number and id (the title
		// here), then holds the same document byte for byte.
		var doc struct{ Title string }
		if err := json.Unmarshal(compact.Bytes(), &doc); err != nil {
			t.Fatal(err)
		}
		id, _ := json.Marshal(doc.Title)
		want := fmt.Sprintf(`{"line":%d,"id":%s,`, c.in+1, id) + strings.TrimPrefix(compact.String(), "{")
		if want != out[c.out] {
			t.Errorf("batch answer %d differs from capacity --format json of the same line", c.out+1)
		}
	}
}

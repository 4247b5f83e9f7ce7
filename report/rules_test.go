package report

import (
	"encoding/json"
	"math"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// Sources of the numbers in this file: the inputs of the calc files below
// (scenarios of our own) and closed-form arithmetic on them (depths, 10·D,
// Lb/((Lb/D)cr·D), Skempton's qp = 9·su, 1.27 m/B); the rules' constants
// as the packages document them: (Lb/D)cr = 10 (pile.DefaultEmbedmentRatio,
// Meyerhof 1976 via Das), the 10 D zone above a weaker layer (Meyerhof
// 1976), the bored-pile factor 1/3 and the 1.27 m large-base diameter
// (package bearing, O'Neill & Reese 1999), the 0.5 m default search step of
// an SI calc file (package calc). Equations printed with 4 significant
// digits are checked by multiplying out the printed numbers.

// weakFile is a 0.5 m closed pipe in dense sand over soft clay, with an
// excavation of 1 m and general and local scour of 0.5 m each, so that the
// design ground line is at 2 m; the tip at 6 m is 4 m into the sand below
// the design ground line and 2 m above the clay.
const weakFile = `qult: 1
title: Weak layer below
units: SI
ground:
  water_depth: 2 m
  excavation_depth: 1 m
  scour: {general: 0.5 m, local: 0.5 m}
  layers:
    - name: dense sand
      thickness: 8 m
      drainage: drained
      unit_weight: 18 kN/m3
      saturated_unit_weight: 20 kN/m3
      friction_angle: 38 deg
    - name: NAME
      thickness: 10 m
      drainage: undrained
      saturated_unit_weight: 17 kN/m3
      undrained_strength: 15 kPa
pile:
  section: {shape: closed-pipe, diameter: 500 mm, wall: 12 mm}
  length: 6 m
  installation: driven-high
design:
  basis: safety-factor
  factor: 2.5
loads:
  compression: {permanent: 300 kN, variable: 100 kN}
`

func parse(t *testing.T, src string) *calc.Result {
	t.Helper()
	r, err := calc.Parse([]byte(src))
	if err != nil {
		t.Fatalf("calc.Parse: %v", err)
	}
	return r
}

func weakResult(t *testing.T, name string) *calc.Result {
	return parse(t, strings.Replace(weakFile, "NAME", name, 1))
}

var numRe = `([0-9.]+)`

func atof(s string) float64 { x, _ := strconv.ParseFloat(s, 64); return x }

// near4 compares a value computed from printed numbers with a printed
// result, both at 4 significant digits.
func near4(got, want float64) bool { return math.Abs(got-want) <= 2e-3*math.Abs(want)+1e-9 }

// jsonDoc decodes a JSON report into generic maps.
func jsonDoc(t *testing.T, r *calc.Result, o Options) map[string]any {
	t.Helper()
	var m map[string]any
	if err := json.Unmarshal([]byte(render(t, r, JSON, o)), &m); err != nil {
		t.Fatal(err)
	}
	return m
}

// at walks a decoded JSON document by keys and indices.
func at(t *testing.T, v any, path ...any) any {
	t.Helper()
	for _, p := range path {
		switch k := p.(type) {
		case string:
			m, ok := v.(map[string]any)
			if !ok {
				t.Fatalf("%v: not an object at %q", path, k)
			}
			v = m[k]
		case int:
			a, ok := v.([]any)
			if !ok || k >= len(a) {
				t.Fatalf("%v: no element %d", path, k)
			}
			v = a[k]
		}
	}
	return v
}

func value(t *testing.T, v any, path ...any) float64 {
	t.Helper()
	x, ok := at(t, v, append(path, "value")...).(float64)
	if !ok {
		t.Fatalf("%v: no number", path)
	}
	return x
}

// flat collapses runs of white space, so that wrapped text compares with
// one-line sentences.
func flat(s string) string { return strings.Join(strings.Fields(s), " ") }

func TestTipRulesWorked(t *testing.T) {
	r := weakResult(t, "soft clay")
	tb := r.Breakdown.Tip
	if tb.WeakLayer != 1 || tb.Flags&pile.EmbedmentRamp == 0 {
		t.Fatalf("scenario does not raise both rules: weak layer %d, flags %v", tb.WeakLayer, tb.Flags)
	}
	out := render(t, r, Text, Options{View: ViewCapacity})
	// Embedment: Lb = 6 − 2 = 4 m below the design ground line, (Lb/D)cr·D
	// = 10 × 0.5 m = 5 m, factor 4/5.
	emb := regexp.MustCompile(`embedment ramp \(Meyerhof 1976\): Lb = 4 m < \(Lb/D\)cr·D = 10 × 0\.5 m = 5 m`)
	if !emb.MatchString(out) {
		t.Errorf("embedment line not found:\n%s", out)
	}
	ramp := regexp.MustCompile(`qp = qp·Lb/\(\(Lb/D\)cr·D\) = ` + numRe + ` kPa × 4 m/5 m = ` + numRe + ` kPa × 0\.8 = ` + numRe + ` kPa`)
	if m := ramp.FindStringSubmatch(out); m == nil {
		t.Error("embedment equation not found")
	} else if got := atof(m[1]) * 4 / 5; !near4(got, atof(m[3])) {
		t.Errorf("%q: %v × 0.8 = %.4g", m[0], m[1], got)
	}
	// Weak layer: clay top 8 m − tip 6 m = H = 2 m; 10 D = 5 m; q_weak =
	// 9 × 15 kPa = 135 kPa (Skempton's Nc = 9).
	weak := regexp.MustCompile(`qp = q_weak \+ \(q_strong − q_weak\)·H/\(10 D\) = 135 kPa \+ \(` + numRe + ` kPa − 135 kPa\) × 2 m/5 m = ` + numRe + ` kPa`)
	if m := weak.FindStringSubmatch(out); m == nil {
		t.Errorf("weak-layer equation not found:\n%s", out)
	} else if got := 135 + (atof(m[1])-135)*2/5; !near4(got, atof(m[2])) {
		t.Errorf("%q: gives %.4g", m[0], got)
	}
	if !strings.Contains(out, "weaker layer (soft clay) at H = 2 m below the tip") {
		t.Error("weak-layer line does not name the layer")
	}
	if !strings.Contains(flat(out), "Settlement basis of qp: "+bearing.SettlementBasisUltimate) {
		t.Error("settlement basis of Meyerhof's tip not stated")
	}
	// The lines added to the tip block stay under about 100 columns.
	sec := out[strings.Index(out, "Tip resistance"):strings.Index(out, "Characteristic capacity")]
	for _, l := range strings.Split(sec, "\n") {
		if n := width(l); n > 110 {
			t.Errorf("tip block line of %d columns: %q", n, l)
		}
	}

	j := jsonDoc(t, r, Options{})
	for _, c := range []struct {
		path []any
		want float64
	}{
		{[]any{"tip", "embedment", "lb"}, 4},
		{[]any{"tip", "embedment", "critical_length"}, 5},
		{[]any{"tip", "weak_layer", "h"}, 2},
		{[]any{"tip", "weak_layer", "zone"}, 5},
		{[]any{"tip", "weak_layer", "q_weak"}, 135},
		{[]any{"ground", "ground_lines", "excavation_floor"}, 1},
		{[]any{"ground", "ground_lines", "general_scour"}, 1.5},
		{[]any{"ground", "ground_lines", "design"}, 2},
		{[]any{"ground", "layers", 0, "removed"}, 2},
		{[]any{"ground", "layers", 1, "removed"}, 0},
	} {
		if got := value(t, j, c.path...); math.Abs(got-c.want) > 1e-9 {
			t.Errorf("%v = %v, want %v", c.path, got, c.want)
		}
	}
	for _, c := range []struct {
		path []any
		want float64
	}{{[]any{"tip", "embedment", "factor"}, 0.8}, {[]any{"tip", "embedment", "critical_ratio"}, 10}} {
		if got, _ := at(t, j, c.path...).(float64); math.Abs(got-c.want) > 1e-9 {
			t.Errorf("%v = %v, want %v", c.path, got, c.want)
		}
	}
	// q_strong and the result agree with the rule in closed form.
	qs, qw := value(t, j, "tip", "weak_layer", "q_strong"), value(t, j, "tip", "weak_layer", "q_weak")
	if got, want := value(t, j, "tip", "weak_layer", "qp"), qw+(qs-qw)*2/5; math.Abs(got-want) > 1e-5*want {
		t.Errorf("weak_layer.qp = %v, want %v", got, want)
	}
	if got := value(t, j, "tip", "qp"); math.Abs(got-value(t, j, "tip", "weak_layer", "qp")) > 1e-5*got {
		t.Errorf("tip.qp %v differs from the weak-layer result", got)
	}
	if eq, _ := at(t, j, "tip", "worked_equations").([]any); len(eq) < 5 {
		t.Errorf("tip.worked_equations: %d lines", len(eq))
	}
	if s, _ := at(t, j, "tip", "settlement_basis").(string); s != bearing.SettlementBasisUltimate {
		t.Errorf("tip.settlement_basis = %q", s)
	}
}

func TestGroundLines(t *testing.T) {
	r := weakResult(t, "soft clay")
	out := render(t, r, Text, Options{View: ViewReport})
	for _, want := range []string{`Original ground line +0 m`, `Excavation floor +1 m`, `General scour line +1\.5 m`,
		`Design ground line +2 m`, `Removed \(m\)`, `dense sand .* 2\n`} {
		if !regexp.MustCompile(want).MatchString(out) {
			t.Errorf("ground section lacks %q", want)
		}
	}
	if !strings.Contains(flat(out), "is removed: its weight is left out of σ′v below, and it gives no shaft or tip resistance") {
		t.Error("no note on the removed overburden")
	}
	if !strings.Contains(flat(out), "0 m to 2 m (dense sand): above the design ground line") {
		t.Error("the segment above the design ground line does not say why it has no friction")
	}
	h := render(t, r, HTML, Options{View: ViewReport})
	for _, want := range []string{"design ground line 2 m", "original ground line", "excavation floor 1 m", "general scour line 1.5 m"} {
		if !strings.Contains(h, want) {
			t.Errorf("ground drawing lacks %q", want)
		}
	}
	checkHTML(t, "ground lines", h)
	// The scour's source is cited.
	if !strings.Contains(flat(out), "Hydraulic Engineering Circular No. 18") {
		t.Error("HEC-18 not cited for the scour")
	}
	// Without a cut, neither the lines nor the column appear.
	plain := strings.Replace(strings.Replace(weakFile, "  excavation_depth: 1 m\n", "", 1), "  scour: {general: 0.5 m, local: 0.5 m}\n", "", 1)
	out = render(t, parse(t, strings.Replace(plain, "NAME", "clay", 1)), Text, Options{View: ViewReport})
	if strings.Contains(out, "Design ground line ") || strings.Contains(out, "Removed (m)") {
		t.Error("ground lines shown without a cut")
	}
}

func TestWarningsEveryFormat(t *testing.T) {
	r := weakResult(t, "soft clay")
	// The switches that turn a rule off, set on the result as an analysis
	// with them would: every one of their sentences must reach the
	// warnings, as must the not-found sentence of the search.
	r.Breakdown.Tip.Flags |= pile.WeakLayerOff | pile.EmbedmentOff
	r.Breakdown.Capacity.Flags |= pile.DrilledZonesOff
	r.Breakdown.Tip.Result.Flags |= bearing.ReductionOff
	want := append((pile.WeakLayerOff | pile.EmbedmentOff | pile.DrilledZonesOff).Messages(), bearingWarnings(bearing.ReductionOff)...)
	if n := len(want); n != 4 {
		t.Fatalf("%d warning sentences", n)
	}
	for _, w := range want[:3] {
		if !strings.HasPrefix(w, "WARNING:") {
			t.Errorf("%q does not begin with WARNING:", w)
		}
	}
	if r.Length == nil || r.Length.Found {
		t.Fatal("scenario should find no length")
	}
	// Search to the profile's bottom, 8 + 10 = 18 m, in the default 0.5 m.
	nf := "no pile length passes: the search ran to a tip depth of 18 m in steps of 0.5 m; the best utilisation reached was "
	for _, v := range allViews {
		txt := flat(render(t, r, Text, Options{View: v}))
		md := flat(render(t, r, Markdown, Options{View: v}))
		h := render(t, r, HTML, Options{View: v})
		var j struct {
			Warnings []string `json:"warnings"`
		}
		if err := json.Unmarshal([]byte(render(t, r, JSON, Options{View: v})), &j); err != nil {
			t.Fatal(err)
		}
		for _, w := range append(want, nf) {
			if !strings.Contains(txt, w) {
				t.Errorf("text %v: warning %q missing", v, w)
			}
			if !strings.Contains(md, mdEsc(w)) {
				t.Errorf("Markdown %v: warning %q missing", v, w)
			}
			if !strings.Contains(h, esc(w)) {
				t.Errorf("HTML %v: warning %q missing", v, w)
			}
			found := false
			for _, x := range j.Warnings {
				found = found || strings.Contains(x, w)
			}
			if !found {
				t.Errorf("JSON %v: warning %q missing", v, w)
			}
		}
		for _, c := range r.Cautions {
			if v == ViewReport && !strings.Contains(txt, flat(c)) {
				t.Errorf("text report: caution %q missing", c)
			}
		}
	}
	// The not-found sentence is in display units in a US report: 18 m =
	// 59.06 ft, 0.5 m = 1.640 ft (NIST SP 811).
	us := flat(render(t, r, Text, Options{View: ViewLength, Units: USUnits}))
	if !strings.Contains(us, "tip depth of 59.06 ft in steps of 1.64 ft") {
		t.Errorf("US not-found sentence not in feet:\n%s", us)
	}
	// A rule switched off at other tip depths of the capacity with depth
	// is named with where it is off.
	for i := range r.WithDepth {
		if z := r.WithDepth[i].TipDepth; z == 3*units.Metre || z == 3.5*units.Metre {
			r.WithDepth[i].Flags |= pile.WeakLayerOff
		}
	}
	if w := pile.WeakLayerOff.Messages()[0] + " (capacity with depth: 2 tip depths from 3 m to 3.5 m)"; !strings.Contains(flat(render(t, r, Text, Options{View: ViewLength})), w) {
		t.Errorf("warning %q missing", w)
	}
	// The defaults table marks the switched-off rules off.
	states := map[string]string{}
	for _, d := range defaultRows(r, conv{units.SI}) {
		states[d.Rule] = d.State
	}
	for _, rule := range []string{"Embedment ramp in a drained top layer", "Weaker layer below the tip", "Drilled-shaft zones without side resistance"} {
		if states[rule] != "off" {
			t.Errorf("defaults: %s is %q, want off", rule, states[rule])
		}
	}
}

func TestDefaultsTable(t *testing.T) {
	r := weakResult(t, "soft clay")
	rows := defaultRows(r, conv{units.SI})
	okState := map[string]bool{"applied": true, "on": true, "off": true, "not-applicable": true, "unknown": true}
	states := map[string]string{}
	for _, d := range rows {
		if d.Rule == "" || d.Value == "" || d.Source == "" || !okState[d.State] {
			t.Errorf("defaults row %+v incomplete", d)
		}
		states[d.Rule] = d.State
	}
	for rule, want := range map[string]string{
		"Embedment ramp in a drained top layer":       "applied",
		"Weaker layer below the tip":                  "applied",
		"Transition into a stronger layer":            "on",
		"Bored-pile tip in drained soil":              "not-applicable", // driven pile
		"Large-base reduction":                        "not-applicable", // 0.5 m ≤ 1.27 m
		"Drilled-shaft zones without side resistance": "not-applicable",
		"Design ground line":                          "applied",
		"Interface for δ/φ′":                          "applied",
		"Shaft resistance in tension":                 "applied",
	} {
		if states[rule] != want {
			t.Errorf("defaults: %s is %q, want %q", rule, states[rule], want)
		}
	}
	for _, f := range []Format{Text, Markdown, HTML} {
		out := render(t, r, f, Options{View: ViewReport})
		if !strings.Contains(out, "Defaults and rules in force") {
			t.Errorf("%v report lacks the defaults section", f)
		}
	}
	txt := render(t, r, Text, Options{View: ViewReport})
	sec := txt[strings.Index(txt, "Defaults and rules in force"):strings.Index(txt, "\nSources cited\n")]
	for _, l := range strings.Split(sec, "\n") {
		if width(l) > 100 {
			t.Errorf("defaults line of %d columns: %q", width(l), l)
		}
	}
	j := jsonDoc(t, r, Options{})
	if d, _ := at(t, j, "defaults").([]any); len(d) != len(rows) {
		t.Errorf("JSON defaults: %d rows, want %d", len(d), len(rows))
	}
}

// TestVesicIrr checks that the report prints the rigidity Vesic's tip
// used: Irr = Ir when Δ was ignored, and the reduction with its numbers
// when Δ was given or correlated.
func TestVesicIrr(t *testing.T) {
	r := load(t, example, func(s string) string {
		s = strings.Replace(s, "      rigidity_index: 80\n", "      rigidity_index: 80\n      tip: {method: vesic}\n", 1)
		return regexp.MustCompile(`(?m)^  length: .*$`).ReplaceAllString(s, "  length: 20 m")
	})
	res := r.Breakdown.Tip.Result
	if res.Ir != 80 { // rigidity_index: 80 in the example
		t.Fatalf("Ir = %v", res.Ir)
	}
	out := render(t, r, Text, Options{View: ViewCapacity})
	if res.DeltaBy == bearing.DeltaNone {
		if !strings.Contains(out, "Irr = Ir = 80 (volume change ignored") || strings.Contains(out, "Irr = Ir/(1 + Ir·Δ) =") {
			t.Errorf("Δ ignored: the report does not say Irr = Ir:\n%s", out)
		}
		if !strings.Contains(flat(out), flat(bearingWarnings(bearing.VolumeChangeIgnored)[0])) {
			t.Error("Δ ignored: no warning")
		}
	}
	// The reviewer's form: Δ from Vesic's correlation, as bearing
	// computes it for the same tip input.
	v, err := bearing.Vesic{Volume: bearing.VolumeCorrelated}.Tip(r.Breakdown.Tip.Input)
	if err != nil {
		t.Fatal(err)
	}
	r.Breakdown.Tip.Result = v
	out = render(t, r, Text, Options{View: ViewCapacity})
	re := regexp.MustCompile(`Irr = Ir/\(1 \+ Ir·Δ\) = 80/\(1 \+ 80 × ` + numRe + `\) = ` + numRe + ` \(Δ Vesic's correlation`)
	if m := re.FindStringSubmatch(out); m == nil {
		t.Errorf("correlated Δ: equation not found:\n%s", out)
	} else if got := 80 / (1 + 80*atof(m[1])); !near4(got, atof(m[2])) {
		t.Errorf("%q: gives %.4g", m[0], got)
	}
	j := jsonDoc(t, r, Options{})
	if b, _ := at(t, j, "tip", "vesic_delta_basis").(string); b != bearing.DeltaCorrelation.String() {
		t.Errorf("vesic_delta_basis = %q", b)
	}
	if d, _ := at(t, j, "tip", "vesic_delta").(float64); math.Abs(d-v.Delta) > 1e-5*v.Delta {
		t.Errorf("vesic_delta = %v, want %v", d, v.Delta)
	}
	if ir, _ := at(t, j, "tip", "ir").(float64); ir != 80 {
		t.Errorf("ir = %v", ir)
	}
}

// boredResult is a 1.8 m bored pile whose tip block is replaced by the
// bored-pile tip bearing computes for in.
func boredResult(t *testing.T, m bearing.Tip, in bearing.Input) *calc.Result {
	t.Helper()
	r := load(t, example, func(s string) string {
		return strings.Replace(s, "diameter: 1050 mm", "diameter: 1.8 m", 1)
	})
	in.D = 1.8 * units.Metre
	res, err := m.Tip(in)
	if err != nil {
		t.Fatal(err)
	}
	tb := &r.Breakdown.Tip
	tb.Method, tb.Equation, tb.Input, tb.Result = m.ID(), m.Equation(), in, res
	tb.Own, tb.Qp, tb.Upper, tb.WeakLayer, tb.Flags = res.Qp, res.Qp, 0, -1, 0
	tb.Force = units.Force(float64(res.Qp) * float64(tb.Area))
	return r
}

func TestBoredRules(t *testing.T) {
	in := bearing.Input{Phi: 36 * units.Degree, Q: 150 * units.Kilopascal}
	r := boredResult(t, bearing.BoredSand{}, in)
	res := r.Breakdown.Tip.Result
	if res.Rule != "bored-phi" {
		t.Fatalf("rule %q", res.Rule)
	}
	out := render(t, r, Text, Options{View: ViewCapacity})
	// bored-phi: one third of the driven value, then the cap, then the
	// large-base factor 1.27/1.8 = 0.7056.
	third := regexp.MustCompile(`bored pile \(bored-phi\): qp = 0\.3333 × ` + numRe + ` kPa = ` + numRe + ` kPa`)
	if m := third.FindStringSubmatch(out); m == nil {
		t.Errorf("bored-pile line not found:\n%s", out)
	} else if got := atof(m[1]) / 3; !near4(got, atof(m[2])) {
		t.Errorf("%q: gives %.4g", m[0], got)
	}
	if !regexp.MustCompile(`drilled-shaft cap: qp = min\(` + numRe + ` kPa, 2873 kPa\)`).MatchString(out) {
		t.Error("cap line not found (30 tsf = 2873 kPa)")
	}
	lb := regexp.MustCompile(`large base \(B = 1\.8 m > 1\.27 m\): qp = \(1\.27 m/B\)·qp = 0\.7056 × ` + numRe + ` kPa = ` + numRe + ` kPa`)
	if m := lb.FindStringSubmatch(out); m == nil {
		t.Errorf("large-base line not found:\n%s", out)
	} else if got := atof(m[1]) * 1.27 / 1.8; !near4(got, atof(m[2])) {
		t.Errorf("%q: gives %.4g", m[0], got)
	}
	if !strings.Contains(flat(out), "Settlement basis of qp: "+bearing.SettlementBasisLower) {
		t.Error("settlement basis of the bored-phi rule not stated")
	}
	j := jsonDoc(t, r, Options{})
	for k, want := range map[string]float64{"bored_factor": 1.0 / 3, "large_base_factor": 1.27 / 1.8, "reduction_factor": 1.27 / 1.8 / 3} {
		if got, _ := at(t, j, "tip", k).(float64); math.Abs(got-want) > 1e-5*want {
			t.Errorf("tip.%s = %v, want %v", k, got, want)
		}
	}
	if got := value(t, j, "tip", "cap"); math.Abs(got-2873) > 1 {
		t.Errorf("tip.cap = %v kPa, want 30 tsf = 2873 kPa", got)
	}
	if s, _ := at(t, j, "tip", "rule").(string); s != "bored-phi" {
		t.Errorf("tip.rule = %q", s)
	}
	states := map[string]string{}
	for _, d := range defaultRows(r, conv{units.SI}) {
		states[d.Rule] = d.State
	}
	if states["Large-base reduction"] != "applied" || states["Bored-pile tip in drained soil"] != "applied" {
		t.Errorf("defaults: large base %q, bored tip %q", states["Large-base reduction"], states["Bored-pile tip in drained soil"])
	}

	// With N60 the SPT rule: 5 % settlement basis.
	r = boredResult(t, bearing.BoredSand{}, bearing.Input{N60: 30, Q: 150 * units.Kilopascal})
	if out := flat(render(t, r, Text, Options{View: ViewCapacity})); !strings.Contains(out, "Settlement basis of qp: "+bearing.SettlementBasis5Percent) {
		t.Error("settlement basis of the SPT rule not stated")
	}

	// The large-base reduction switched off: a warning, and the table says off.
	r = boredResult(t, bearing.BoredSand{NoLargeBase: true}, in)
	out = flat(render(t, r, Text, Options{View: ViewReport}))
	if !strings.Contains(out, flat(bearingWarnings(bearing.ReductionOff)[0])) {
		t.Error("reduction off: no warning")
	}
	for _, d := range defaultRows(r, conv{units.SI}) {
		if d.Rule == "Large-base reduction" && d.State != "off" {
			t.Errorf("large base switched off shows %q", d.State)
		}
	}
}

func TestDrilledZones(t *testing.T) {
	src := `qult: 1
title: Drilled shaft in clay
units: SI
ground:
  water_depth: 1 m
  layers:
    - name: stiff clay
      thickness: 20 m
      drainage: undrained
      saturated_unit_weight: 19 kN/m3
      undrained_strength: 80 kPa
pile:
  section: {shape: circle, diameter: 1 m}
  length: 12 m
  installation: bored
`
	r := parse(t, src)
	out := flat(render(t, r, Text, Options{View: ViewCapacity}))
	// Top 1.5 m below the head and the bottom diameter (11 m to 12 m).
	for _, want := range []string{"0 m to 1.5 m (stiff clay): top 1.5 m of a drilled shaft",
		"11 m to 12 m (stiff clay): bottom diameter of a drilled shaft"} {
		if !strings.Contains(out, want) {
			t.Errorf("capacity lacks %q", want)
		}
	}
	j := jsonDoc(t, r, Options{})
	segs, _ := at(t, j, "shaft_segments").([]any)
	n := 0
	for _, s := range segs {
		if why, _ := s.(map[string]any)["no_resistance"].(string); strings.Contains(why, "drilled shaft") {
			n++
		}
	}
	if n != 3 { // the water table at 1 m splits the top zone
		t.Errorf("%d segments say why they carry no friction, want 3", n)
	}
	for _, d := range defaultRows(r, conv{units.SI}) {
		if d.Rule == "Drilled-shaft zones without side resistance" && d.State != "applied" {
			t.Errorf("drilled zones %q", d.State)
		}
	}
}

func TestPassingRanges(t *testing.T) {
	r := load(t, example, nil)
	if r.Length == nil {
		t.Fatal("no length")
	}
	l := r.Length
	l.Passing = []pile.DepthRange{{From: 13.5 * units.Metre, To: 14 * units.Metre}, {From: 18.5 * units.Metre, To: 31 * units.Metre}}
	l.Warnings = append(l.Warnings, "passing tip depths form 2 ranges: a shorter pile passes where a longer one fails")
	out := render(t, r, Text, Options{View: ViewLength})
	for _, want := range []string{`Passing from \(m\) +to \(m\)`, `13\.5 +14\n`, `18\.5 +31\n`, `passing tip depths form 2 ranges`} {
		if !regexp.MustCompile(want).MatchString(out) {
			t.Errorf("length view lacks %q:\n%s", want, out)
		}
	}
	j := jsonDoc(t, r, Options{})
	p, _ := at(t, j, "required_length", "passing").([]any)
	if len(p) != 2 || value(t, p[1], "from") != 18.5 || value(t, p[1], "to") != 31 {
		t.Errorf("required_length.passing = %v", p)
	}
	if w, _ := at(t, j, "required_length", "warnings").([]any); len(w) == 0 {
		t.Error("required_length.warnings empty")
	}
	for _, k := range []string{"step", "max_tip", "best_tip_depth"} {
		value(t, j, "required_length", k)
	}
}

func TestEscapingRules(t *testing.T) {
	name := `soft <b>clay</b> | *x*`
	r := weakResult(t, `"`+name+`"`)
	h := render(t, r, HTML, Options{View: ViewReport})
	if strings.Contains(h, "<b>") {
		t.Error("HTML: a layer name's markup is not escaped")
	}
	if !strings.Contains(h, "weaker layer ("+esc(name)+")") {
		t.Error("HTML: the weak layer's escaped name is not in the worked equation")
	}
	checkHTML(t, "escaping rules", h)
	md := render(t, r, Markdown, Options{View: ViewReport})
	if strings.Contains(md, "<b>") || !strings.Contains(md, mdEsc("weaker layer ("+name+")")) {
		t.Error("Markdown: the weak layer's name is not escaped")
	}
}

// TestTipRulesWithDepth checks the rules named at each depth of the
// capacity with depth, from the geometry of the weak-layer scenario:
// design ground 2 m, (Lb/D)cr·D = 5 m, clay from 8 m, 10 D = 5 m.
func TestTipRulesWithDepth(t *testing.T) {
	r := weakResult(t, "soft clay")
	j := jsonDoc(t, r, Options{View: ViewLength})
	rows, _ := at(t, j, "capacity_with_depth").([]any)
	want := map[float64][2]bool{ // depth: ramp, weak below
		6:   {true, true},   // 4 m into the sand, 2 m above the clay
		7:   {false, true},  // 5 m into the sand: the ramp is done
		8.5: {false, false}, // in the clay
	}
	seen := 0
	for _, row := range rows {
		z := value(t, row, "tip_depth")
		w, ok := want[z]
		if !ok {
			continue
		}
		seen++
		names, _ := at(t, row, "tip_rules").([]any)
		has := map[string]bool{}
		for _, n := range names {
			has[n.(string)] = true
		}
		if has["ramp"] != w[0] || has["weak below"] != w[1] {
			t.Errorf("tip at %v m: rules %v, want ramp %v, weak below %v", z, names, w[0], w[1])
		}
	}
	if seen != len(want) {
		t.Errorf("%d of the depths found", seen)
	}
	if !regexp.MustCompile(`\n +6 .*ramp, weak below\n`).MatchString(render(t, r, Text, Options{View: ViewLength})) {
		t.Error("text: the 6 m row does not name the ramp and the weak-layer rule")
	}
}

// TestScopeFromCatalogue: the tip block and the shaft section show each
// method's scope as the catalogue of methods states it.
func TestScopeFromCatalogue(t *testing.T) {
	r := load(t, example, nil)
	out := flat(render(t, r, Text, Options{View: ViewCapacity}))
	d, ok := bearing.Lookup(r.Breakdown.Tip.Method)
	if !ok || !strings.Contains(out, flat(d.Scope)) {
		t.Errorf("tip method %q: scope %q not shown", r.Breakdown.Tip.Method, d.Scope)
	}
	s, ok := shaft.Lookup("alpha-drilled")
	if !ok || !strings.Contains(out, flat(s.Scope)) {
		t.Errorf("shaft scope %q not shown", s.Scope)
	}
}

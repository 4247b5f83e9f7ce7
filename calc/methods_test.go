package calc

// Sources: none needed; these tests check how calc files choose methods and
// refuse keys; the numbers are invented inputs, compared in closed form with
// the methods built directly.

// The methods of a calc file come from the catalogues of packages bearing
// and shaft. The files here are our own, small variations of base; the
// defaults checked (K/K0 1.5 for driven high-displacement piles, δ/φ′ 0.6
// for smooth steel) are the middles of Kulhawy's (1984) ranges as package
// shaft documents them.

import (
	"encoding/json"
	"errors"
	"strings"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

func TestMethodProblems(t *testing.T) {
	layer := func(add string) string {
		return strings.Replace(base, "friction_angle: 34 deg", "friction_angle: 34 deg\n      "+add, 1)
	}
	pileLevel := func(add string) string { return strings.Replace(base, "pile:", add+"\npile:", 1) }
	cases := []struct {
		name, src, path string
		line            int
		want            []string
	}{
		{"nq on meyerhof", layer("tip: {method: meyerhof, nq: 40}"), "ground.layers[0].tip.nq", 12,
			[]string{"meyerhof does not read nq; it reads: (none)"}},
		{"eta on given-nq", layer("tip: {method: given-nq, nq: 40, eta: 80}"), "ground.layers[0].tip.eta", 12,
			[]string{"given-nq does not read eta; it reads: nq, nc, limit"}},
		{"k on beta-given", layer("shaft: {method: beta-given, beta: 0.3, k: 1}"), "ground.layers[0].shaft.k", 12,
			[]string{"beta-given does not read k; it reads: beta, limit"}},
		{"limit on lambda", layer("shaft: {method: lambda, limit: 50 kPa}"), "ground.layers[0].shaft.limit", 12,
			[]string{"lambda does not read limit; it reads: lambda"}},
		{"a key no method reads", layer("tip: {method: vesic, colour: red}"), "ground.layers[0].tip.colour", 12,
			[]string{"vesic does not read colour"}},
		{"unknown layer tip", layer("tip: {method: guesswork}"), "ground.layers[0].tip.method", 12,
			append([]string{`"guesswork" is not a tip method; want one of `}, bearing.IDs()...)},
		{"unknown layer shaft", layer("shaft: {method: magic}"), "ground.layers[0].shaft.method", 12,
			append([]string{`"magic" is not a shaft method; want one of `}, shaft.IDs()...)},
		{"unknown pile tip", pileLevel("methods: {tip_drained: guesswork}"), "methods.tip_drained", 12,
			[]string{`"guesswork" is not a tip method`}},
		{"given method for the pile", pileLevel("methods: {tip_drained: given-nq}"), "methods.tip_drained", 12,
			[]string{"given-nq needs nq", "on the layer"}},
		{"none for the pile", pileLevel("methods: {shaft_undrained: none}"), "methods.shaft_undrained", 12,
			[]string{`"none" cannot apply to every undrained layer`}},
		{"lambda for drained layers", pileLevel("methods: {shaft_drained: lambda}"), "methods.shaft_drained", 12,
			[]string{`"lambda" cannot apply to every drained layer`}},
		{"required key", layer("tip: {method: given-nq, nc: 10}"), "ground.layers[0].tip.nq", 12,
			[]string{"not given; given-nq needs nq"}},
		{"beta-api class", layer("shaft: {method: beta-api}"), "ground.layers[0].shaft.sand_class", 12,
			[]string{"not given; beta-api needs sand_class"}},
		{"two K keys", layer("shaft: {method: beta, k: 1, k0: jaky}"), "ground.layers[0].shaft.k0", 12,
			[]string{"give at most one of k, k_over_k0, k_over_kp, k0", "k and k0 are given"}},
		{"two δ keys", layer("shaft: {method: beta, delta: 25 deg, delta_over_phi: 0.8}"), "ground.layers[0].shaft.delta_over_phi", 12,
			[]string{"give at most one of delta, delta_over_phi"}},
		{"unknown K0 rule", layer("shaft: {method: beta, k0: rankine}"), "ground.layers[0].shaft.k0", 12,
			[]string{`"rankine": want one of jaky, ocr`}},
		{"K/K0 zero", layer("shaft: {method: beta, k_over_k0: 0}"), "ground.layers[0].shaft.k_over_k0", 12,
			[]string{`"0" is outside above 0 and at most 3`}},
		{"λ zero", layer("shaft: {method: lambda, lambda: 0}"), "ground.layers[0].shaft.lambda", 12,
			[]string{`"0" is outside above 0 and at most 1`}},
		{"Nc over 100", layer("tip: {method: given-nc, nc: 150}"), "ground.layers[0].tip.nc", 12,
			[]string{`"150" is outside 1 to 100`}},
		{"δ over 50 deg", layer("shaft: {method: beta, delta: 55 deg}"), "ground.layers[0].shaft.delta", 12,
			[]string{`"55 deg" is outside 0 to 50 deg`}},
		{"η′ in kPa", layer("tip: {method: janbu, eta: 90 kPa}"), "ground.layers[0].tip.eta", 12,
			[]string{"want an angle"}},
		{"limit over 5 MPa", layer("shaft: {method: alpha-api, limit: 6 MPa}"), "ground.layers[0].shaft.limit", 12,
			[]string{`"6 MPa" is outside above 0 and at most 5000 kPa`}},
		{"empty value", layer("tip: {method: given-nq, nq: }"), "ground.layers[0].tip.nq", 12,
			[]string{"given empty"}},
		{"misspelt factor key", pileLevel("design: {basis: lrfd, shaft: {betta: 0.4}}"), "design.shaft.betta", 12,
			[]string{"not a method identifier"}},
		{"factor for no shaft", pileLevel("design: {basis: lrfd, uplift: {none: 0.4}}"), "design.uplift.none", 12,
			[]string{"not a method identifier"}},
	}
	for _, c := range cases {
		ps := problems(t, c.src)
		found := false
		for _, p := range ps {
			if p.Path != c.path {
				continue
			}
			found = true
			if p.Line != c.line {
				t.Errorf("%s: %s at line %d, want %d", c.name, p.Path, p.Line, c.line)
			}
			for _, w := range c.want {
				if !strings.Contains(p.Msg, w) {
					t.Errorf("%s: %q lacks %q", c.name, p.Msg, w)
				}
			}
		}
		if !found {
			t.Errorf("%s: no problem at %s in %v", c.name, c.path, ps)
		}
	}
}

// The keys given reach the methods built, with their units; β takes the
// pile's defaults where no K or δ key is given.
func TestMethodValues(t *testing.T) {
	src := strings.Replace(base, "friction_angle: 34 deg", `friction_angle: 34 deg
      tip: {method: given-nq, nq: 40, limit: 9 MPa}
      shaft: {method: beta, delta: 30 deg, limit: 80 kPa}
    - name: sand 2
      thickness: 10 m
      drainage: drained
      unit_weight: 18 kN/m3
      saturated_unit_weight: 20 kN/m3
      friction_angle: 34 deg
      shaft: {method: beta}
      tip: {method: janbu, eta: 80 deg}`, 1)
	src = strings.Replace(src, "{shape: circle, diameter: 0.6 m}", "{shape: closed-pipe, diameter: 0.6 m, wall: 12 mm}", 1)
	f, err := Decode([]byte(src))
	if err != nil {
		t.Fatal(err)
	}
	in, err := Resolve(f)
	if err != nil {
		t.Fatal(err)
	}
	l0, l1 := in.Methods.Layers[0], in.Methods.Layers[1]
	if l0.Tip != (bearing.GivenNq{Nq: 40, Limit: 9 * units.Megapascal}) {
		t.Errorf("layer 0 tip %+v", l0.Tip)
	}
	c, ok := l0.Shaft.(shaft.Capped)
	if !ok || c.Limit != (shaft.LimitGiven{Fs: 80 * units.Kilopascal}) {
		t.Fatalf("layer 0 shaft %+v", l0.Shaft)
	}
	b, ok := c.Method.(shaft.Beta)
	if !ok || b.K != (shaft.KOverK0{Ratio: 1.5}) || b.Delta != (shaft.DeltaGiven{Delta: 30 * units.Degree}) {
		t.Errorf("layer 0 β %+v", c.Method)
	}
	if l1.Shaft != (shaft.Beta{K: shaft.KOverK0{Ratio: 1.5}, Delta: shaft.DeltaOverPhi{Ratio: 0.6}}) {
		t.Errorf("layer 1 β %+v, want K/K0 1.5 (driven high displacement) and δ/φ′ 0.6 (smooth steel)", l1.Shaft)
	}
	if l1.Tip != (bearing.Janbu{Eta: 80 * units.Degree}) {
		t.Errorf("layer 1 tip %+v", l1.Tip)
	}
	// λ given and no shaft.
	src = strings.Replace(base, "friction_angle: 34 deg", "friction_angle: 34 deg\n      shaft: {method: none}", 1)
	src = strings.Replace(src, "pile:", "methods: {shaft_undrained: lambda}\npile:", 1)
	if f, err = Decode([]byte(src)); err != nil {
		t.Fatal(err)
	}
	if in, err = Resolve(f); err != nil {
		t.Fatal(err)
	}
	if !in.Methods.Layers[0].NoShaft || !in.Methods.UndrainedLambda {
		t.Errorf("none and lambda: %+v", in.Methods)
	}
	// A wrong dimension keeps the units error in the chain.
	_, err = Parse([]byte(strings.Replace(base, "friction_angle: 34 deg", "friction_angle: 34 deg\n      shaft: {method: beta, delta: 3 m}", 1)))
	if !errors.Is(err, units.ErrDimension) {
		t.Errorf("δ in metres: %v does not wrap units.ErrDimension", err)
	}
}

// A layer's choice marshals as the calc file writes it: method and its keys
// side by side.
func TestChoiceJSON(t *testing.T) {
	b, err := json.Marshal(Layer{Name: "sand", Tip: &TipChoice{Method: "given-nq", Params: map[string]Value{"nq": V("40")}},
		Shaft: &ShaftChoice{Method: "beta", Params: map[string]Value{"k0": V("jaky")}}})
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{`"tip":{"method":"given-nq","nq":"40"}`, `"shaft":{"k0":"jaky","method":"beta"}`} {
		if !strings.Contains(string(b), want) {
			t.Errorf("%s lacks %s", b, want)
		}
	}
}

package calc

// Sources: none; fuzz seeds are invented scenarios.

import (
	"errors"
	"math"
	"strconv"
	"strings"
	"testing"
	"time"
)

// FuzzParse feeds arbitrary bytes to the decoder, validation and run: no
// panic, no hang (each input must finish within 2 s), and either Problems
// or a result with finite numbers.
func FuzzParse(f *testing.F) {
	f.Add([]byte(base))
	f.Add([]byte("a: &x [1]\nb: *x\n"))
	f.Add([]byte("{\"title\": 1}"))
	f.Add([]byte(base + "design: {basis: en1997, approach: DA1}\nloads: {compression: {permanent: 500 kN}}\n"))
	f.Add([]byte(base + "methods: {shaft_undrained: lambda, critical_depth: 20}\n"))
	f.Add([]byte(base + "design: {basis: safety-factor, factor: 2.5}\nloads: {compression: {permanent: 500 kN}}\ncandidates: {currency: EUR, piles: [{section: {shape: circle}, diameters: [450 mm, 600 mm], installation: bored, material: {concrete_strength: 30 MPa, reinforcement_ratio: 1 %, reinforcement_yield: 500 MPa}, costs: {per_metre: 40 EUR/m, per_pile: 300}}, {section: {shape: h-section, depth: 300 mm, width: 300 mm, web: 12 mm, flange: 12 mm}, installation: driven-low, free_length: 3 m, material: {steel_yield: 355 MPa}}]}\n"))
	// Layer methods with the keys of the catalogues (an inline map in the
	// decoder).
	f.Add([]byte(strings.Replace(base, "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {method: given-nq, nq: 40, nc: 5, limit: 8 MPa}\n      shaft: {method: beta, k0: ocr, delta: 30 deg, limit: 90 kPa}", 1)))
	f.Add([]byte(strings.Replace(base, "friction_angle: 34 deg", "friction_angle: 34 deg\n      tip: {method: janbu, eta: 80, eta: 90}\n      shaft: {method: beta, k: 1, k_over_kp: 0.2, nq: [1]}", 1)))
	f.Fuzz(func(t *testing.T, data []byte) {
		done := make(chan struct{})
		var r *Result
		var err error
		go func() {
			defer close(done)
			r, err = Parse(data)
		}()
		select {
		case <-done:
		case <-time.After(2 * time.Second):
			t.Fatalf("Parse did not finish in 2 s on %q", data)
		}
		if err != nil {
			var ps Problems
			if !errors.As(err, &ps) || len(ps) == 0 {
				t.Fatalf("error is not Problems: %T %v", err, err)
			}
			return
		}
		c := r.Breakdown.Capacity
		for _, v := range []float64{float64(c.Tip), float64(c.Shaft), float64(c.Compression), float64(c.Tension)} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				t.Fatalf("non-finite result %+v", c)
			}
		}
		if k := r.Candidates; k != nil {
			for _, x := range k.Rows {
				for _, v := range []float64{x.Cost, x.Use, float64(x.Length), x.SteelMass, float64(x.Concrete), float64(x.Structural.Resistance.Design)} {
					if math.IsNaN(v) || math.IsInf(v, 0) {
						t.Fatalf("non-finite candidate %+v", x)
					}
				}
			}
		}
	})
}

// FuzzCalcFile runs whole calc files built from fuzzed numbers and choices
// (so that most inputs are valid files, unlike random bytes): no panic, no
// hang, Problems or a result whose numbers are finite and whose
// compression resistance is Rc = Qp + Qs (less W′ with the gross
// self-weight option), and whose capacity with depth is finite. Seeds are
// invented scenarios.
func FuzzCalcFile(f *testing.F) {
	f.Add(2.0, 6.0, 30.0, 34.0, 0.6, 15.0, uint8(0), uint8(0), uint8(0), 1.0, 0.0)
	f.Add(-3.0, 9.0, 15.0, 38.0, 1.2, 25.0, uint8(1), uint8(1), uint8(1), 0.0, 2.5)
	f.Add(0.0, 0.5, 200.0, 25.0, 0.3, 6.0, uint8(2), uint8(2), uint8(2), 3.0, 0.5)
	f.Add(12.0, 20.0, 5.0, 45.0, 2.0, 39.0, uint8(3), uint8(4), uint8(3), 0.0, 0.0)
	f.Fuzz(func(t *testing.T, water, clay, su, phi, d, length float64, inst, design, self uint8, excav, scour float64) {
		insts := []string{"driven-high", "driven-low", "bored", "augered", "jetted"}
		designs := []string{"", "design: {basis: safety-factor, factor: 2.5}\n", "design: {basis: lrfd, preset: aashto-drilled}\n",
			"design: {basis: en1997, approach: DA1}\n", "design: {basis: en1997, approach: DA2, annex: uk}\n"}
		selfs := []string{"ignored", "net", "gross"}
		shape := "{shape: circle, diameter: " + num(d) + " m}"
		if inst%5 == 1 {
			shape = "{shape: open-pipe, diameter: " + num(d) + " m, wall: 0.02 m}"
		}
		src := "title: fuzz\nground:\n  water_depth: " + num(water) + " m\n"
		if excav != 0 {
			src += "  excavation_depth: " + num(excav) + " m\n"
		}
		if scour != 0 {
			src += "  scour: {general: " + num(scour) + " m}\n"
		}
		src += "  layers:\n" +
			"    - {name: clay, thickness: " + num(clay) + " m, drainage: undrained, unit_weight: 17 kN/m3, saturated_unit_weight: 18 kN/m3, undrained_strength: " + num(su) + " kPa}\n" +
			"    - {name: sand, thickness: 30 m, drainage: drained, unit_weight: 18 kN/m3, saturated_unit_weight: 20 kN/m3, friction_angle: " + num(phi) + " deg, n60: 25}\n" +
			"pile:\n  section: " + shape + "\n  length: " + num(length) + " m\n  installation: " + insts[int(inst)%5] + "\n  unit_weight: 24 kN/m3\n" +
			"methods: {self_weight: " + selfs[int(self)%3] + "}\n" + designs[int(design)%5] +
			"loads: {compression: {permanent: 500 kN, variable: 200 kN}, tension: {variable: 50 kN}}\nsearch: {step: 1 m}\n"
		done := make(chan struct{})
		var r *Result
		var err error
		go func() {
			defer close(done)
			r, err = Parse([]byte(src))
		}()
		select {
		case <-done:
		case <-time.After(5 * time.Second):
			t.Fatalf("Parse did not finish in 5 s on\n%s", src)
		}
		if err != nil {
			var ps Problems
			if !errors.As(err, &ps) || len(ps) == 0 {
				t.Fatalf("error is not Problems: %T %v\n%s", err, err, src)
			}
			return
		}
		c := r.Breakdown.Capacity
		for _, v := range []float64{float64(c.Tip), float64(c.Shaft), float64(c.Compression), float64(c.Tension), float64(c.Weight)} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				t.Fatalf("non-finite result %+v\n%s", c, src)
			}
		}
		want := c.Tip + c.Shaft
		if selfs[int(self)%3] == "gross" {
			want -= c.Weight
		}
		if math.Abs(float64(c.Compression-want)) > 1e-9*math.Max(1, math.Abs(float64(want))) {
			t.Fatalf("Rc = %v, want Qp + Qs (− W′) = %v\n%s", c.Compression, want, src)
		}
		for _, w := range r.WithDepth {
			if math.IsNaN(float64(w.Compression)) || math.IsInf(float64(w.Compression), 0) {
				t.Fatalf("non-finite capacity with depth at %v\n%s", w.TipDepth, src)
			}
		}
	})
}

// num writes a float for a calc file; NaN and infinities as YAML writes
// them, so that the decoder meets them.
func num(x float64) string {
	switch {
	case math.IsNaN(x):
		return ".nan"
	case math.IsInf(x, 1):
		return ".inf"
	case math.IsInf(x, -1):
		return "-.inf"
	}
	return strconv.FormatFloat(x, 'g', -1, 64)
}

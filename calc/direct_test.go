// Source of the numbers in this file: a scenario of our own with a
// uniform sounding, where each direct CPT method's average is the reading
// itself, so the capacity has a closed form worked in the comments; no
// published value is involved.

package calc

import (
	"errors"
	"fmt"
	"io/fs"
	"math"
	"strings"
	"testing"
)

// uniformCSV is a sounding of our own: qc 8 MPa, u2 0.1 MPa, a = 0.8
// (qt = 8.02 MPa, qE = 7.92 MPa) every 0.1 m from 0.1 to 15 m.
func uniformCSV() string {
	var b strings.Builder
	b.WriteString("# qult CPT sounding\n# id: U1\n# area_ratio: 0.8\ndepth_m,qc_MPa,fs_kPa,u2_kPa\n")
	for i := 1; i <= 150; i++ {
		fmt.Fprintf(&b, "%.1f,8,60,100\n", float64(i)/10)
	}
	return b.String()
}

// directCalc: a 0.3 m square driven pile 10 m long, its top 1 m in fill
// (β), then a sand whose shaft is by lcpc (α 100, limit 120 kPa: fs =
// 80 kPa) over 1 to 6 m and by eslami-fellenius (Cs 0.01: fs = 79.2 kPa)
// over 6 to 10 m, tip by lcpc (kc 0.5: qp = 4000 kPa).
func directCalc(sounding, design string) string {
	return `qult: 1
title: Direct CPT methods
units: SI
ground:
  water_depth: 20 m
` + sounding + `  layers:
    - name: fill
      thickness: 1 m
      drainage: drained
      unit_weight: 18 kN/m3
      friction_angle: 30 deg
      shaft: {method: none}
    - name: upper sand
      thickness: 5 m
      drainage: drained
      unit_weight: 19 kN/m3
      friction_angle: 34 deg
      shaft: {method: lcpc, alpha: 100, limit: 120 kPa}
    - name: lower sand
      thickness: 9 m
      drainage: drained
      unit_weight: 19 kN/m3
      friction_angle: 36 deg
      shaft: {method: eslami-fellenius, cs: 0.01}
      tip: {method: lcpc, kc: 0.5}
pile:
  section: {shape: square, width: 300 mm}
  length: 10 m
  installation: driven-high
` + design
}

func readUniform(name string) ([]byte, error) {
	if name == "u1.csv" {
		return []byte(uniformCSV()), nil
	}
	return nil, fs.ErrNotExist
}

// TestDirectCapacityClosedForm: Qs = 1.2 m × (80 × 5 + 79.2 × 4) kN/m =
// 860.16 kN, Qp = 4000 × 0.09 = 360 kN (closed form); the sounding's
// section names the methods that read it; capacity with depth holds the
// same value at 10 m.
func TestDirectCapacityClosedForm(t *testing.T) {
	r, err := ParseWith([]byte(directCalc("  sounding: {file: u1.csv}\n", "")), ParseOptions{ReadFile: readUniform})
	if err != nil {
		t.Fatal(err)
	}
	c := r.Breakdown.Capacity
	if got, want := c.Shaft.KN(), 1.2*(80*5+79.2*4); math.Abs(got-want) > 1e-9*want {
		t.Errorf("Qs = %.12g kN; want %g", got, want)
	}
	if got := c.Tip.KN(); math.Abs(got-360) > 1e-9 {
		t.Errorf("Qp = %.12g kN; want 360", got)
	}
	if r.Breakdown.Tip.Method != "lcpc" || r.Breakdown.Tip.Result.Cone.Q == 0 {
		t.Errorf("tip block: method %q, cone %v", r.Breakdown.Tip.Method, r.Breakdown.Tip.Result.Cone)
	}
	if r.Sounding == nil || len(r.Sounding.ReadBy) != 3 {
		t.Errorf("sounding read by %v; want the three direct methods", r.Sounding)
	}
	found := false
	for _, w := range r.WithDepth {
		if math.Abs(w.TipDepth.Metres()-10) < 1e-9 {
			found = true
			if math.Abs(float64(w.Compression-c.Compression)) > 1e-9*float64(c.Compression) {
				t.Errorf("with depth at 10 m: %v; capacity %v", w.Compression, c.Compression)
			}
		}
	}
	if !found {
		t.Error("capacity with depth has no row at 10 m")
	}
	// The sounding ends at 15 m, the ground too: the search stops where
	// the tip zone, 4 B = 1.2 m below the tip, stays within the readings.
	if last := r.WithDepth[len(r.WithDepth)-1].TipDepth.Metres(); last > 13.8+1e-9 {
		t.Errorf("capacity with depth reaches %g m, below the sounding's reach 13.8 m", last)
	}
	if !strings.Contains(strings.Join(r.Warnings, "\n"), "searched down to 13.8 m only") {
		t.Errorf("warnings %q lack the search's limit", r.Warnings)
	}
	// Resistance factors may name the direct methods.
	design := "design:\n  basis: lrfd\n  preset: aashto-driven\n  tip: {lcpc: 0.5}\n  shaft: {lcpc: 0.5, eslami-fellenius: 0.45}\n  uplift: {lcpc: 0.4, eslami-fellenius: 0.35}\nloads:\n  compression: {permanent: 200 kN}\n"
	r, err = ParseWith([]byte(directCalc("  sounding: {file: u1.csv}\n", design)), ParseOptions{ReadFile: readUniform})
	if err != nil {
		t.Fatal(err)
	}
	// Rd = 0.5 × 360 + 0.5 × 1.2 × 400 + 0.45 × 1.2 × 316.8 = 591.072 kN
	if d := r.Design; d == nil || math.Abs(d.Cases[0].CompressionRd.KN()-591.072) > 1e-6 {
		t.Errorf("design %+v; want Rd = 591.072 kN", d)
	}
}

// TestDirectProblems: a direct method without a sounding, chosen pile-wide,
// or whose sounding stops above the tip zone, is a problem naming its key
// and line.
func TestDirectProblems(t *testing.T) {
	short := func(name string) ([]byte, error) {
		if name != "s.csv" {
			return nil, fs.ErrNotExist
		}
		var b strings.Builder
		b.WriteString("# qult CPT sounding\n# id: S\ndepth_m,qc_MPa,fs_kPa,u2_kPa\n")
		for i := 1; i <= 100; i++ { // to 10 m: the tip zone reaches 10.45 m
			fmt.Fprintf(&b, "%.1f,8,60,0\n", float64(i)/10)
		}
		return []byte(b.String()), nil
	}
	for _, c := range []struct {
		name, file string
		read       ReadFileFunc
		path       string
		line       int
		msg        string
	}{
		{"no sounding", directCalc("", ""), readUniform, "ground.layers[1].shaft.method", 18, "give ground.sounding"},
		{"short sounding", directCalc("  sounding: {file: s.csv}\n", ""), short, "ground.layers[2].tip", 26, "not covered by the cone sounding (readings from 0.1 to 10 m)"},
		{"pile-wide", directCalc("  sounding: {file: u1.csv}\n", "methods: {shaft_drained: eslami-fellenius}\n"), readUniform, "methods.shaft_drained", 31, "choose it on a layer"},
		{"no reader", directCalc("  sounding: {file: u1.csv}\n", ""), nil, "ground.sounding.file", 6, "ground.layers[1].shaft.method, ground.layers[2].shaft.method, ground.layers[2].tip.method read it"},
	} {
		_, err := ParseWith([]byte(c.file), ParseOptions{ReadFile: c.read})
		var probs Problems
		if !errors.As(err, &probs) || len(probs) == 0 {
			t.Errorf("%s: %v; want problems", c.name, err)
			continue
		}
		p := probs[0]
		if p.Path != c.path || p.Line != c.line || !strings.Contains(p.Msg, c.msg) {
			t.Errorf("%s: %s (line %d): %s; want %s (line %d) with %q", c.name, p.Path, p.Line, p.Msg, c.path, c.line, c.msg)
		}
	}
}

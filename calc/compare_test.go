package calc

// Sources of the expected values: closed forms worked by hand here.
// Skempton (1951): Nc = 9 for a deep circular base, so Qp = 9·su·A.
// O'Neill & Reese (1999), Drilled Shafts: Construction Procedures and
// Design Methods, FHWA-IF-99-025, α = 0.55 for su/pa ≤ 1.5 (the value
// package shaft checks against its source), so Qs = 0.55·su·π·D·L in a
// layer of constant su. The ground and pile are invented.

import (
	"math"
	"testing"
)

const compareFile = `title: one clay layer
units: SI
ground:
  water_depth: 0 m
  layers:
    - name: uniform clay
      thickness: 20 m
      drainage: undrained
      saturated_unit_weight: 18 kN/m3
      undrained_strength: 50 kPa
pile:
  section: {shape: circle, diameter: 500 mm}
  length: 10 m
  installation: driven-high
methods: {shaft_undrained: alpha-api, tip_undrained: nc9}
`

func TestCompareClosedForms(t *testing.T) {
	r, err := Parse([]byte(compareFile))
	if err != nil {
		t.Fatal(err)
	}
	cm := r.Compared
	if cm == nil || len(cm.Shaft) != 1 || len(cm.Tip) != 1 {
		t.Fatalf("comparison = %+v, want one shaft and one tip group", cm)
	}
	area := math.Pi * 0.25 * 0.25
	want := map[string]float64{
		"nc9":           9 * 50e3 * area,                  // Skempton (1951)
		"alpha-drilled": 0.55 * 50e3 * math.Pi * 0.5 * 10, // O'Neill & Reese (1999)
	}
	found := map[string]bool{}
	for _, g := range append(cm.Shaft, cm.Tip...) {
		if g.Drainage != "undrained" {
			t.Errorf("group drainage %q, want undrained", g.Drainage)
		}
		for _, row := range g.Rows {
			if w, ok := want[row.Method]; ok {
				found[row.Method] = true
				if row.NotApplied != "" || math.Abs(float64(row.Force)-w) > 1e-6*w {
					t.Errorf("%s: force %v N (%s), want %.6g N", row.Method, float64(row.Force), row.NotApplied, w)
				}
			}
			if row.Chosen != (row.Method == "alpha-api" || row.Method == "nc9") {
				t.Errorf("%s: chosen = %v", row.Method, row.Chosen)
			}
		}
	}
	for m := range want {
		if !found[m] {
			t.Errorf("%s missing from the comparison", m)
		}
	}
	// The chosen rows repeat the file's own run.
	for _, g := range cm.Shaft {
		for _, row := range g.Rows {
			if row.Chosen && math.Abs(float64(row.Force-r.Breakdown.Shaft)) > 1e-9*float64(r.Breakdown.Shaft) {
				t.Errorf("chosen shaft %s: %v, the run gives %v", row.Method, row.Force, r.Breakdown.Shaft)
			}
		}
	}
	lo, hi, n := cm.Tip[0].Spread()
	if n < 1 || lo > hi {
		t.Errorf("tip spread %v..%v over %d", lo, hi, n)
	}
}

// Source of the numbers in this file: closed forms of Meyerhof's (1976) SPT
// rules for driven piles as the methods document them (qp = 0.4·pa·N60·Lb/D
// ≤ 4·pa·N60 with Lb in the bearing stratum, his layered rule below a
// weaker layer over 10 D, fs = 0.02·pa·N60 for a displacement pile) worked
// here by hand for a ground of our own; no published value (the methods'
// printed checks are in packages bearing and shaft).

package calc

import (
	"fmt"
	"math"
	"strings"
	"testing"
)

// meyerhofSPTCalc: a square 0.4 m displacement pile of length l, in sand
// (N60 30) from the surface or, with clayTop, below 4 m of clay (su 40 kPa).
func meyerhofSPTCalc(l float64, clayTop bool) string {
	clay := ""
	if clayTop {
		clay = `    - name: clay
      thickness: 4 m
      drainage: undrained
      unit_weight: 18 kN/m3
      undrained_strength: 40 kPa
      shaft: {method: none}
`
	}
	return fmt.Sprintf(`qult: 1
title: Meyerhof SPT rules
units: SI
ground:
  water_depth: none
  layers:
%s    - name: sand
      thickness: 20 m
      drainage: drained
      unit_weight: 18 kN/m3
      friction_angle: 33 deg
      n60: 30
      tip: {method: driven-n60-sand}
      shaft: {method: driven-n60-shaft}
pile:
  section: {shape: square, width: 400 mm}
  length: %g m
  installation: driven-high
`, clay, l)
}

func TestMeyerhofSPTInPile(t *testing.T) {
	const limit = 4 * 100 * 30.0 // kPa
	cases := []struct {
		l     float64
		clay  bool
		qpKPa float64
		qsKN  float64
	}{
		// From the surface: Lb = L; 0.4·100·30·(2/0.4) = 6000 kPa; Qs = 0.02·100·30·1.6·2.
		{2, false, 0.4 * 100 * 30 * 2 / 0.4, 0.02 * 100 * 30 * 1.6 * 2},
		{4, false, limit, 0.02 * 100 * 30 * 1.6 * 4},
		{9, false, limit, 0.02 * 100 * 30 * 1.6 * 9},
		// 2 m into the sand below clay: 9·su + (limit − 9·su)·2/(10·0.4); no shaft in the clay.
		{6, true, 9*40 + (limit-9*40)*2/4, 0.02 * 100 * 30 * 1.6 * 2},
		{10, true, limit, 0.02 * 100 * 30 * 1.6 * 6},
	}
	for _, c := range cases {
		r, err := ParseWith([]byte(meyerhofSPTCalc(c.l, c.clay)), ParseOptions{})
		if err != nil {
			t.Fatalf("L %g: %v", c.l, err)
		}
		b := r.Breakdown.Capacity
		if math.Abs(b.UnitTip.KPa()-c.qpKPa) > 1e-6*c.qpKPa {
			t.Errorf("L %g clay %v: qp %g kPa, want %g", c.l, c.clay, b.UnitTip.KPa(), c.qpKPa)
		}
		if math.Abs(b.Shaft.KN()-c.qsKN) > 1e-6*c.qsKN {
			t.Errorf("L %g clay %v: Qs %g kN, want %g", c.l, c.clay, b.Shaft.KN(), c.qsKN)
		}
	}
	// A layer without n60: an error naming the key.
	src := strings.Replace(meyerhofSPTCalc(6, false), "      n60: 30\n", "", 1)
	if _, err := ParseWith([]byte(src), ParseOptions{}); err == nil || !strings.Contains(err.Error(), "n60") {
		t.Errorf("no n60: err %v, want an error naming n60", err)
	}
}

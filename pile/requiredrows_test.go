// Source of the numbers in this file: the ground is the invented scenario of
// uniformClay; the expected values are Analysis.WithDepth and RequiredLength
// on the same pile (an oracle kept in the package), so no published value is
// involved.

package pile

import (
	"reflect"
	"testing"

	"github.com/qultgeo/qult/shaft"
)

// TestRequiredLengthWithDepthRows: the rows the search returns are, case
// by case, what Analysis.WithDepth gives on the search grid for the pile
// extended to the search limit with that case (equal to the bit), and the
// answer is RequiredLength's. The ground is the scenario of uniformClay.
func TestRequiredLengthWithDepthRows(t *testing.T) {
	prof := uniformClay(t)
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Installation: Bored, HeadDepth: 0.5 * m}
	ms := Methods{ShaftUndrained: shaft.AlphaGiven{Alpha: 0.6}}
	loads := Loads{Compression: Action{Permanent: 800 * kN, Variable: 200 * kN}, Tension: Action{Variable: 100 * kN}}
	s := Search{Step: 0.25 * m, MaxTip: 55 * m}
	for _, b := range []Basis{SafetyFactor{Global: 2.5}, Eurocode7{Approach: DA1, Profiles: 1}} {
		got, rows, err := RequiredLengthWithDepth(prof, p, ms, b, loads, s)
		if err != nil {
			t.Fatal(err)
		}
		want, err := RequiredLength(prof, p, ms, b, loads, s)
		if err != nil {
			t.Fatal(err)
		}
		if !reflect.DeepEqual(got, want) {
			t.Errorf("%T: %+v, RequiredLength %+v", b, got, want)
		}
		cases, err := b.Cases(p.Installation)
		if err != nil {
			t.Fatal(err)
		}
		if len(rows) != len(cases) {
			t.Fatalf("%T: %d sets of rows for %d cases", b, len(rows), len(cases))
		}
		deep := p
		deep.Length = s.MaxTip - p.HeadDepth
		for i := range cases {
			a, err := NewAnalysis(prof, deep, ms, &Options{Case: &cases[i]})
			if err != nil {
				t.Fatal(err)
			}
			w, err := a.WithDepth(DepthGrid{From: p.HeadDepth + s.Step, To: s.MaxTip, Step: s.Step}, nil)
			if err != nil {
				t.Fatal(err)
			}
			if !reflect.DeepEqual(rows[i], w) {
				t.Errorf("%T case %s: the search's rows differ from WithDepth's", b, cases[i].Name)
			}
		}
	}
	if _, rows, err := RequiredLengthWithDepth(prof, p, ms, SafetyFactor{Global: 2.5}, loads, Search{Step: -1}); err == nil || rows != nil {
		t.Errorf("a negative step: rows %v, error %v; want no rows and an error", rows, err)
	}
}

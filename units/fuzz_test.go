package units

// No published source here: the fuzz target checks robustness and the round
// trip; the NIST SP 811 (2008) factors are checked in units_test.go.

import (
	"math"
	"testing"
)

// FuzzParse checks that Parse never panics, and that a successful parse
// gives a finite value that survives a round trip through String.
func FuzzParse(f *testing.F) {
	for _, s := range []string{"16 m", "450 mm", "52.5 ft", "120 pcf", "2.5 ksf", "30 deg", "30°",
		"18 kN/m3", "18 kN/m³", "1e308 GPa", "NaN m", "3 ton", "", "-0 m", ".5mm", "1e-320 m", "5 kN/m^3"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		q, err := Parse(s)
		if err != nil {
			return
		}
		if math.IsNaN(q.Value) || math.IsInf(q.Value, 0) {
			t.Fatalf("Parse(%q) = %v without error", s, q.Value)
		}
		var out string
		switch q.Dim {
		case DimLength:
			out = Length(q.Value).String()
		case DimStress:
			out = Stress(q.Value).String()
		case DimUnitWeight:
			out = UnitWeight(q.Value).String()
		case DimForce:
			out = Force(q.Value).String()
		case DimAngle:
			out = Angle(q.Value).String()
		default:
			return
		}
		back, err := Parse(out)
		if err != nil {
			t.Fatalf("Parse(%q) round trip via %q: %v", s, out, err)
		}
		if !withinRel(back.Value, q.Value, 1e-12) && math.Abs(back.Value-q.Value) > 1e-300 {
			t.Fatalf("round trip %q -> %q: %v != %v", s, out, back.Value, q.Value)
		}
	})
}

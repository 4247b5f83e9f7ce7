// Source of the numbers in this file: the keys' values are invented; the
// test checks decoding (the values must arrive unchanged, in SI) and the
// line of a problem, so no published value is involved.

package calc

import (
	"strings"
	"testing"

	"github.com/qultgeo/qult/units"
)

// The compressibility keys of a layer reach the profile in SI, and a bad
// one is reported at its key and line. Decoding checks only: no published
// values are involved.
func TestCompressibilityKeys(t *testing.T) {
	src := strings.Replace(base, "      friction_angle: 34 deg\n", `      friction_angle: 34 deg
      compression_index: 0.45
      recompression_index: 0.05
      initial_void_ratio: 1.2
      preconsolidation_stress: 150 kPa
`, 1)
	f, err := Decode([]byte(src))
	if err != nil {
		t.Fatal(err)
	}
	in, err := Resolve(f)
	if err != nil {
		t.Fatal(err)
	}
	l := in.Ground.Layers[0]
	if l.Cc != 0.45 || l.Cr != 0.05 || l.E0 != 1.2 || l.Pc != 150*units.Kilopascal {
		t.Errorf("layer spec = Cc %g Cr %g e0 %g σ′p %v", l.Cc, l.Cr, l.E0, l.Pc)
	}
	mod := strings.Replace(base, "      friction_angle: 34 deg\n", "      friction_angle: 34 deg\n      constrained_modulus: 5 kN/m3\n", 1)
	ps := problems(t, mod)
	if len(ps) == 0 || ps[0].Path != "ground.layers[0].constrained_modulus" || ps[0].Line != 12 {
		t.Errorf("want a problem at ground.layers[0].constrained_modulus line 12, got %v", ps)
	}
	both := strings.Replace(base, "      friction_angle: 34 deg\n", "      friction_angle: 34 deg\n      compression_index: 0.3\n      void_ratio: 0.8\n      constrained_modulus: 5 MPa\n", 1)
	ps = problems(t, both)
	found := false
	for _, p := range ps {
		if p.Path == "ground.layers[0].constrained_modulus" && p.Line == 14 {
			found = true
		}
	}
	if !found {
		t.Errorf("indices with a modulus: want a problem at ground.layers[0].constrained_modulus line 14, got %v", ps)
	}
}

package shaft

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
	"gonum.org/v1/gonum/integrate/quad"
	"pgregory.net/rapid"
)

// TestPropAlphaAPIIntegral checks the closed-form segment integral of the API
// RP 2GEO (2011) α method against numerical quadrature of the point rule
// (gonum's fixed Gauss-Legendre rule, split at the branch points so that
// each piece is smooth): the two must agree to 1e-8 relative (the quadrature, not the closed form, limits it near σ′v → 0).
func TestPropAlphaAPIIntegral(t *testing.T) {
	m := AlphaAPI{}
	rapid.Check(t, func(r *rapid.T) {
		su := rapid.Float64Range(5, 300).Draw(r, "su") * 1e3
		s0 := rapid.Float64Range(1, 800).Draw(r, "s0") * 1e3
		s1 := rapid.Float64Range(1, 800).Draw(r, "s1") * 1e3
		h := rapid.Float64Range(0.01, 30).Draw(r, "h")
		got, _, err := m.Integral(units.Stress(su), units.Stress(s0), units.Stress(s1), units.Length(h))
		if err != nil {
			r.Fatal(err)
		}
		f := func(z float64) float64 {
			p := Point{Su: units.Stress(su), SigmaV: units.Stress(s0 + (s1-s0)*z/h)}
			res, err := m.Unit(p)
			if err != nil {
				r.Fatal(err)
			}
			return float64(res.Fs)
		}
		// split points where σ′v = su and σ′v = 4su
		cuts := []float64{0, h}
		for _, c := range []float64{su, 4 * su} {
			if (s0-c)*(s1-c) < 0 {
				cuts = append(cuts, h*(c-s0)/(s1-s0))
			}
		}
		for i := 1; i < len(cuts); i++ {
			for j := i; j > 0 && cuts[j] < cuts[j-1]; j-- {
				cuts[j], cuts[j-1] = cuts[j-1], cuts[j]
			}
		}
		want := 0.0
		for i := 0; i+1 < len(cuts); i++ {
			want += quad.Fixed(f, cuts[i], cuts[i+1], 400, nil, 0)
		}
		if math.Abs(float64(got)-want) > 1e-8*math.Abs(want) {
			r.Fatalf("Integral = %.12g, quadrature %.12g", float64(got), want)
		}
	})
	// Closed form at a point: constant σ′v gives h·fs.
	got, _, _ := m.Integral(50e3, 100e3, 100e3, 2)
	if want := 2 * 0.5 / math.Sqrt(0.5) * 50e3; math.Abs(float64(got)-want) > 1e-9*want {
		t.Errorf("constant σ′v: %v, want %v", float64(got), want)
	}
	if _, _, err := m.Integral(50e3, -1, 100e3, 2); err == nil {
		t.Error("negative σ′v accepted")
	}
	// From σ′v = 0 the integrand is 0.5·su^0.75·σ^0.25: over σ from 0 to
	// su (closed form) the integral is h·0.4·su^0.75·su^1.25/su = 0.4·su·h.
	got, _, _ = m.Integral(50e3, 0, 50e3, 3)
	if want := 0.4 * 50e3 * 3; math.Abs(float64(got)-want) > 1e-12*want {
		t.Errorf("from σ′v = 0: %v, want %v", float64(got), want)
	}
}

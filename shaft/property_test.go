package shaft

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// TestPropBetaProportional: for a fixed β, fs is proportional to σ′v
// (fs = β·σ′v, the closed form of every β method at fixed K, δ and depth).
func TestPropBetaProportional(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		phi := d(rapid.Float64Range(20, 45).Draw(t, "phi"))
		ocr := rapid.Float64Range(1, 10).Draw(t, "ocr")
		z := units.Length(rapid.Float64Range(0, 60).Draw(t, "z"))
		n60 := rapid.Float64Range(1, 60).Draw(t, "n60")
		s := units.Stress(rapid.Float64Range(1, 1000).Draw(t, "sigma")) * kPa
		k := rapid.Float64Range(0.01, 100).Draw(t, "k")
		// Keep k·σ′v inside the accepted range (its upper limit is
		// inclusive): the quotient max/σ′v can round so that its product
		// with σ′v lands a hair above the limit, so step down until it
		// does not.
		if s*units.Stress(k) > maxSigmaV {
			k = float64(maxSigmaV / s)
			for units.Stress(k)*s > maxSigmaV {
				k = math.Nextafter(k, 0)
			}
		}
		ms := []Unit{
			BetaGiven{Beta: 0.35},
			Beta{K: KMayneKulhawy{}, Delta: DeltaOverPhi{Ratio: 0.8}},
			Beta{K: KOverKp{Ratio: 0.3}, Delta: DeltaGiven{Delta: d(25)}},
			Burland{},
			DrilledSand{},
			DrilledSandK0{},
			APIBeta{Class: VeryDenseSand}, // below its limit only, checked below
		}
		for _, m := range ms {
			p := Point{SigmaV: s, Phi: phi, OCR: ocr, Depth: z, N60: n60}
			r1, err1 := m.Unit(p)
			p.SigmaV = units.Stress(k) * s
			r2, err2 := m.Unit(p)
			if err1 != nil || err2 != nil {
				t.Fatalf("%s: %v, %v", m.ID(), err1, err2)
			}
			if r1.Flags&LimitGoverns != 0 || r2.Flags&LimitGoverns != 0 {
				continue
			}
			if rel(float64(r2.Fs), k*float64(r1.Fs)) > 1e-12 {
				t.Fatalf("%s: fs(%g·σ′v) = %g, want %g·%g", m.ID(), k, r2.Fs, k, r1.Fs)
			}
			if r1.Beta != r2.Beta {
				t.Fatalf("%s: β changed with σ′v: %g, %g", m.ID(), r1.Beta, r2.Beta)
			}
		}
	})
}

// TestPropAlphaAPI: the API RP 2GEO α is continuous at ψ = 1 (both branches
// give 0.5 there, closed form) and never exceeds 1.
func TestPropAlphaAPI(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		su := units.Stress(rapid.Float64Range(0.1, 2000).Draw(t, "su")) * kPa
		sv := units.Stress(rapid.Float64Range(0.1, 4000).Draw(t, "sigma")) * kPa
		r, err := AlphaAPI{}.Unit(Point{Su: su, SigmaV: sv})
		if err != nil {
			t.Fatal(err)
		}
		if r.Alpha > 1 || r.Alpha <= 0 || r.Fs > su {
			t.Fatalf("α = %g at ψ = %g", r.Alpha, r.Psi)
		}
		// Continuity at ψ = 1: within ε either side, α differs from 0.5 by
		// less than the slope bound (|dα/dψ| ≤ 0.25 at ψ = 1) times ε, plus
		// rounding.
		eps := rapid.Float64Range(1e-12, 1e-3).Draw(t, "eps")
		lo, err1 := AlphaAPI{}.Unit(Point{Su: units.Stress(1-eps) * sv, SigmaV: sv})
		hi, err2 := AlphaAPI{}.Unit(Point{Su: units.Stress(1+eps) * sv, SigmaV: sv})
		if err1 != nil || err2 != nil {
			t.Fatal(err1, err2)
		}
		if math.Abs(lo.Alpha-0.5) > 0.26*eps+1e-12 || math.Abs(hi.Alpha-0.5) > 0.26*eps+1e-12 {
			t.Fatalf("α jumps at ψ = 1: %g below, %g above (ε = %g)", lo.Alpha, hi.Alpha, eps)
		}
	})
	// At ψ = 1 exactly both branches are 0.5 (closed form).
	if r, _ := (AlphaAPI{}).Unit(Point{Su: 70 * kPa, SigmaV: 70 * kPa}); r.Alpha != 0.5 {
		t.Errorf("α(ψ = 1) = %g, want 0.5", r.Alpha)
	}
}

// TestPropLambdaDecreases: λ falls with embedded length (Vijayvergiya &
// Focht 1972, as tabulated by Das, from memory): never rises, and falls
// strictly up to 70 m, where the table flattens at 0.110.
func TestPropLambdaDecreases(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		a := rapid.Float64Range(0.01, 90).Draw(t, "a")
		b := rapid.Float64Range(0.01, 90).Draw(t, "b")
		if a > b {
			a, b = b, a
		}
		ra, err1 := Lambda{}.Average(units.Length(a), 50*kPa, 30*kPa)
		rb, err2 := Lambda{}.Average(units.Length(b), 50*kPa, 30*kPa)
		if err1 != nil || err2 != nil {
			t.Fatal(err1, err2)
		}
		if rb.Lambda > ra.Lambda {
			t.Fatalf("λ(%g m) = %g > λ(%g m) = %g", b, rb.Lambda, a, ra.Lambda)
		}
		if a < b && b <= 70 && !(rb.Lambda < ra.Lambda) {
			t.Fatalf("λ not falling between %g m and %g m: %g, %g", a, b, ra.Lambda, rb.Lambda)
		}
	})
}

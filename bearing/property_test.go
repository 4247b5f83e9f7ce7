package bearing

import (
	"math"
	"testing"

	"pgregory.net/rapid"

	"github.com/qultgeo/qult/units"
)

// Property tests. The properties are those of the published methods:
// bearing-capacity factors grow with φ′ (Meyerhof 1976, Nq* chart; Vesic
// 1977; Janbu 1976; Prandtl-Reissner), Vesic's Nσ* grows with Irr (Vesic
// 1977), and Berezantzev's Nq does not grow with L/D (Berezantzev et al.
// 1961, the αT reduction).

// nqAt returns each method's Nq at φ′ (deg) with the other arguments fixed.
func nqFuncs(irr, eta, ld float64) map[string]func(phi float64) (float64, error) {
	return map[string]func(float64) (float64, error){
		"prandtl": func(phi float64) (float64, error) { return PrandtlNq(deg(phi)) },
		"meyerhof": func(phi float64) (float64, error) {
			nq, _, err := Meyerhof{}.NqStar(deg(phi), false)
			return nq, err
		},
		"vesic": func(phi float64) (float64, error) { return VesicNsigma(deg(phi), irr) },
		"janbu": func(phi float64) (float64, error) {
			nq, _, err := Janbu{Eta: deg(eta)}.Factors(deg(phi))
			return nq, err
		},
		"berezantzev": func(phi float64) (float64, error) {
			nq, _, err := Berezantzev{}.Nq(deg(phi), ld, false)
			return nq, err
		},
	}
}

// phiRange is each method's range of φ′ in degrees.
var phiRange = map[string][2]float64{
	"prandtl": {0, 50}, "meyerhof": {20, 45}, "vesic": {0, 50}, "janbu": {0, 50}, "berezantzev": {23, 39},
}

func TestPropNqIncreasesWithPhi(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		irr := rapid.Float64Range(1, 1000).Draw(t, "irr")
		eta := rapid.Float64Range(60, 105).Draw(t, "eta")
		ld := rapid.Float64Range(4, 60).Draw(t, "ld")
		for name, f := range nqFuncs(irr, eta, ld) {
			r := phiRange[name]
			a := rapid.Float64Range(r[0], r[1]).Draw(t, name+" phi1")
			b := rapid.Float64Range(r[0], r[1]).Draw(t, name+" phi2")
			if a > b {
				a, b = b, a
			}
			if b-a < 1e-6 {
				continue
			}
			na, err1 := f(a)
			nb, err2 := f(b)
			if err1 != nil || err2 != nil {
				t.Fatalf("%s: %v %v", name, err1, err2)
			}
			// Vesic's Nσ* is flat in φ′ only where Irr = 1 and φ′ = 0.
			if !(nb > na) {
				t.Fatalf("%s: Nq(%g) = %g is not above Nq(%g) = %g", name, b, nb, a, na)
			}
		}
	})
}

func TestPropVesicIncreasesWithIrr(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		phi := rapid.Float64Range(0.1, 50).Draw(t, "phi")
		a := rapid.Float64Range(1, 1e5).Draw(t, "irr1")
		b := rapid.Float64Range(1, 1e5).Draw(t, "irr2")
		if a > b {
			a, b = b, a
		}
		if b-a < 1e-6*b {
			return
		}
		na, _ := VesicNsigma(deg(phi), a)
		nb, _ := VesicNsigma(deg(phi), b)
		if !(nb > na) {
			t.Fatalf("φ′ = %g: Nσ*(Irr %g) = %g not above Nσ*(Irr %g) = %g", phi, b, nb, a, na)
		}
		// Undrained Nc* grows with Irr too.
		ua, _ := VesicNc(0, a)
		ub, _ := VesicNc(0, b)
		if !(ub > ua) {
			t.Fatalf("undrained Nc*(Irr %g) = %g not above Nc*(Irr %g) = %g", b, ub, a, ua)
		}
	})
}

func TestPropBerezantzevNotIncreasingWithLD(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		phi := rapid.Float64Range(23, 39).Draw(t, "phi")
		a := rapid.Float64Range(4, 100).Draw(t, "ld1")
		b := rapid.Float64Range(4, 100).Draw(t, "ld2")
		if a > b {
			a, b = b, a
		}
		na, _, err1 := Berezantzev{}.Nq(deg(phi), a, false)
		nb, _, err2 := Berezantzev{}.Nq(deg(phi), b, false)
		if err1 != nil || err2 != nil {
			t.Fatal(err1, err2)
		}
		if nb > na*(1+1e-12) {
			t.Fatalf("φ′ = %g: Nq(L/D %g) = %g above Nq(L/D %g) = %g", phi, b, nb, a, na)
		}
	})
}

func TestPropLimitHolds(t *testing.T) {
	// Qp never exceeds Unlimited, and never exceeds a limit that governs
	// (definition of a limit; Meyerhof 1976, API 2011, O'Neill & Reese 1999).
	rapid.Check(t, func(t *rapid.T) {
		in := Input{
			Phi: deg(rapid.Float64Range(20, 45).Draw(t, "phi")),
			Q:   units.Stress(rapid.Float64Range(0, 2e6).Draw(t, "q")),
			N60: rapid.Float64Range(1e-3, 200).Draw(t, "n60"), // 0 means not given
			D:   units.Length(rapid.Float64Range(0.1, 5).Draw(t, "d")),
		}
		for _, m := range []Tip{Meyerhof{}, APISand{Class: 1}, APISand{Class: 4}, ShaftSand{}, DrivenN60{}, BoredPhi{}, BoredSand{}, LargeBase{Of: ShaftSand{}}} {
			r, err := m.Tip(in)
			if err != nil {
				t.Fatal(err)
			}
			if r.Qp > r.Unlimited || (r.Flags&LimitGoverns != 0 && r.Reduction == 0 && math.Abs(float64(r.Qp-r.Limit)) > 1e-9*float64(r.Limit)) ||
				(r.Cap > 0 && r.Qp > r.Cap) {
				t.Fatalf("%s: %+v", m.ID(), r)
			}
		}
	})
}

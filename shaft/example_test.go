package shaft_test

import (
	"fmt"

	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// A bored pile in a medium dense sand at 8 m depth: K from K/K0 for bored
// piles (default within Kulhawy's range) and δ for rough concrete. The
// numbers are an invented scenario.
func ExampleBeta() {
	k, _ := shaft.KOverK0For(shaft.Bored)
	delta, _ := shaft.DeltaOverPhiFor(shaft.RoughConcrete)
	m := shaft.Beta{K: k, Delta: delta}
	r, err := m.Unit(shaft.Point{SigmaV: 85 * units.Kilopascal, Phi: 34 * units.Degree})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%s: K0 = %.3f, K/K0 = %.3f, K = %.3f, δ = %.1f°, β = %.3f, fs = %.1f kPa\n",
		m.ID(), r.K0, r.KRatio, r.K, r.Delta.Degrees(), r.Beta, r.Fs.KPa())
	// Output:
	// beta: K0 = 0.441, K/K0 = 0.833, K = 0.367, δ = 34.0°, β = 0.248, fs = 21.1 kPa
}

// A driven pipe pile in a firm clay at 14 m depth by the API α method, with a
// given cap. The numbers are an invented scenario (no published source).
func ExampleAlphaAPI() {
	m := shaft.Capped{Method: shaft.AlphaAPI{}, Limit: shaft.LimitGiven{Fs: 35 * units.Kilopascal}}
	r, err := m.Unit(shaft.Point{SigmaV: 110 * units.Kilopascal, Su: 55 * units.Kilopascal})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("ψ = %.2f, α = %.3f, fs = %.1f kPa (before limit %.1f kPa; %v)\n",
		r.Psi, r.Alpha, r.Fs.KPa(), r.Unlimited.KPa(), r.Flags)
	// Output:
	// ψ = 0.50, α = 0.707, fs = 35.0 kPa (before limit 38.9 kPa; limit governs)
}

// The λ method works on a whole embedded length from the mean σ′v and mean
// su over it. The numbers are an invented scenario (no published source).
func ExampleLambda() {
	r, err := shaft.Lambda{}.Average(25*units.Metre, 120*units.Kilopascal, 60*units.Kilopascal)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("λ = %.3f, fav = %.1f kPa\n", r.Lambda, r.Fav.KPa())
	// Output:
	// λ = 0.150, fav = 36.0 kPa
}

// Bad input names the method, the field and the accepted range.
func ExampleRangeError() {
	_, err := shaft.Burland{}.Unit(shaft.Point{SigmaV: 50 * units.Kilopascal, Phi: 62 * units.Degree})
	fmt.Println(err)
	// Output:
	// shaft: beta-burland: phi: 62 deg is above 50 deg (accepted above 0 and up to 50 deg)
}

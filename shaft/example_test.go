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

// A driven pile 20 m long with 12 m of clay under 8 m of sand: the λ
// method on the clay piece, λ that of the whole 20 m. The limit fav ≤ s̄u
// governs. The numbers are an invented scenario (no published source).
func ExampleLambda_Layered() {
	clay := []shaft.LambdaPiece{{Thickness: 12 * units.Metre,
		SigmaTop: 144 * units.Kilopascal, SigmaBottom: 254 * units.Kilopascal,
		SuTop: 35 * units.Kilopascal, SuBottom: 45 * units.Kilopascal}}
	r, err := shaft.Lambda{}.Layered(20*units.Metre, clay)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("σ̄′v = %.0f kPa, s̄u = %.0f kPa, λ = %.3f: %.1f kPa, held at %.1f kPa (%v); %.0f kN/m over %.0f m\n",
		r.SigmaV.KPa(), r.Su.KPa(), r.Lambda, r.Unlimited.KPa(), r.Fav.KPa(), r.Flags, float64(r.Integral)/1e3, r.Pieces.Metres())
	// Output:
	// σ̄′v = 199 kPa, s̄u = 40 kPa, λ = 0.173: 48.3 kPa, held at 40.0 kPa (λ limit fav ≤ s̄u governs); 480 kN/m over 12 m
}

// Tension capacity of the shaft of a bored pile in sand, 0.6 m across and
// 18 m long (L/D = 30), concrete with νp = 0.2, Ep = 30 GPa, in sand with
// Gav = 60 MPa and δ = 33°. The numbers are an invented scenario.
func ExampleTensionPoisson() {
	r, err := shaft.TensionPoisson{}.Tension(shaft.TensionInput{Slenderness: 30, PilePoisson: 0.2,
		ShearModulusRatio: 60e6 / 30e9, Delta: 33 * units.Degree})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("η = %.4f, Qt/Qc = %.3f·%.3f = %.3f\n", r.Eta, r.SlendernessTerm, r.Compressibility, r.Ratio)
	// Output:
	// η = 0.0078, Qt/Qc = 0.895·0.939 = 0.841
}

// Bad input names the method, the field and the accepted range.
func ExampleRangeError() {
	_, err := shaft.Burland{}.Unit(shaft.Point{SigmaV: 50 * units.Kilopascal, Phi: 62 * units.Degree})
	fmt.Println(err)
	// Output:
	// shaft: beta-burland: phi: 62 deg is above 50 deg (accepted above 0 and up to 50 deg)
}

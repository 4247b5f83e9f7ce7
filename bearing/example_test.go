package bearing_test

// The soils and piles in these examples are our own invention; no
// published source is checked here (the reference tests do that).

import (
	"fmt"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/units"
)

// A bored pile of our own invention ending in dense sand: φ′ = 36°,
// q′ = 160 kPa at the tip. Meyerhof's limit governs.
func ExampleMeyerhof_Tip() {
	in := bearing.Input{Phi: 36 * units.Degree, Q: 160 * units.Kilopascal}
	r, err := bearing.Meyerhof{}.Tip(in)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("Nq* = %.1f, q′·Nq* = %.0f kPa, limit = %.0f kPa, qp = %.0f kPa (%s)\n",
		r.Nq, r.Unlimited.KPa(), r.Limit.KPa(), r.Qp.KPa(), r.Flags)
	// Output:
	// Nq* = 168.0, q′·Nq* = 26880 kPa, limit = 6103 kPa, qp = 6103 kPa (limit governs)
}

// Vesic's method needs the rigidity of the sand; here Ir is given and
// the soil is taken as incompressible (Δ = 0), values of our own.
func ExampleVesic_Tip() {
	in := bearing.Input{Phi: 30 * units.Degree, Q: 200 * units.Kilopascal, Ir: 100}
	r, err := bearing.Vesic{}.Tip(in)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("Irr = %.0f, σ′o = %.1f kPa, Nσ* = %.2f, qp = %.0f kPa\n", r.Irr, r.Sigma.KPa(), r.Nq, r.Qp.KPa())
	// Output:
	// Irr = 100, σ′o = 133.3 kPa, Nσ* = 51.02, qp = 6803 kPa
}

// A chart read outside its range is an error unless the caller opts in.
func ExampleBerezantzev_Tip() {
	in := bearing.Input{Phi: 42 * units.Degree, Q: 150 * units.Kilopascal, L: 15, D: 0.5}
	_, err := bearing.Berezantzev{}.Tip(in)
	fmt.Println(err)
	in.Clamp = true
	r, _ := bearing.Berezantzev{}.Tip(in)
	fmt.Printf("Nq = %.1f, qp = %.0f kPa (%s)\n", r.Nq, r.Qp.KPa(), r.Flags)
	// Output:
	// bearing: berezantzev: phi: 42 deg is outside 23 to 39 deg (Berezantzev chart); reading at the chart's edge (clamping) can be asked for
	// Nq = 200.2, qp = 30030 kPa (clamped to chart edge)
}

// Compare lists every applicable method for one tip, as the factors tool
// does. The soil and pile are our own example. Checks by hand: Vesic's
// Δ = 0.005·(1 − 8/20)·1.2 = 0.0036 gives Irr = 60/1.216 = 49.34 and
// Nσ* = 49.44 by Vesic's closed form; bored-phi is 3117/3 = 1039 kPa;
// bored-sand takes the SPT rule, N60 being given; driven-n60-sand is
// 4·pa·N60 = 4·100·28 = 11200 kPa (its Lb/D growth is package pile's).
func ExampleCompare() {
	in := bearing.Input{Phi: 33 * units.Degree, Q: 120 * units.Kilopascal, Ir: 60, L: 16, D: 0.6, N60: 28}
	for _, row := range bearing.Compare(in) {
		if row.Err != nil {
			fmt.Printf("%-26s %v\n", row.ID, row.Err)
			continue
		}
		fmt.Printf("%-26s factor %7.2f  qp %6.0f kPa\n", row.ID, row.Factor, row.Result.Qp.KPa())
	}
	// Output:
	// meyerhof                   factor   96.00  qp   3117 kPa
	// vesic                      factor   49.44  qp   3779 kPa
	// berezantzev                factor   58.69  qp   7043 kPa
	// janbu                      factor   26.09  qp   3131 kPa
	// api-medium-dense-sand-silt factor   12.00  qp   1440 kPa
	// api-medium-dense-sand      factor   20.00  qp   2400 kPa
	// api-dense-sand             factor   40.00  qp   4800 kPa
	// api-very-dense-sand        factor   50.00  qp   6000 kPa
	// drilled-n60-sand           factor    0.00  qp   1609 kPa
	// driven-n60-sand            factor    0.00  qp  11200 kPa
	// bored-phi                  factor   96.00  qp   1039 kPa
	// bored-sand                 factor    0.00  qp   1609 kPa
}

// Vesic's method with the volume change of the sand taken from the
// correlation (the reviewer's choice); the result says which Ir, Δ and Irr
// were used. Values of our own.
func ExampleVesic_Tip_correlated() {
	in := bearing.Input{Phi: 34 * units.Degree, Q: 180 * units.Kilopascal, Ir: 120}
	r, err := bearing.Vesic{Volume: bearing.VolumeCorrelated}.Tip(in)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("Ir = %.0f, Δ = %.5f (%s), Irr = %.1f, Nσ* = %.1f, qp = %.0f kPa\n",
		r.Ir, r.Delta, r.DeltaBy, r.Irr, r.Nq, r.Qp.KPa())
	// Output:
	// Ir = 120, Δ = 0.00495 (Vesic's correlation with φ′ and q′/pa), Irr = 75.3, Nσ* = 66.4, qp = 7493 kPa
}

// The default tip of a bored pile in sand: the SPT rule when N60 is known,
// otherwise one third of the driven value under the drilled-shaft cap,
// with the large-base reduction. A 1.8 m bored pile of our own.
func ExampleBoredSand_Tip() {
	in := bearing.Input{Phi: 38 * units.Degree, Q: 240 * units.Kilopascal, D: 1.8}
	for _, n60 := range []float64{0, 35} {
		in.N60 = n60
		r, err := bearing.BoredSand{}.Tip(in)
		if err != nil {
			fmt.Println(err)
			return
		}
		fmt.Printf("%-14s qp = %4.0f kPa, reduction %.3f (%s)\n", r.Rule, r.Qp.KPa(), r.Reduction, r.Flags)
	}
	fmt.Println(bearing.SettlementBasis(bearing.ShaftSand{}))
	// Output:
	// bored-phi      qp = 2027 kPa, reduction 0.235 (limit governs; cap governs)
	// drilled-n60-sand qp = 1419 kPa, reduction 0.706 ()
	// unit base resistance at a base settlement of 5 % of the base diameter
}

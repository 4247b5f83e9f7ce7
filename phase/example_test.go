package phase_test

import (
	"fmt"

	"github.com/qultgeo/qult/phase"
	"github.com/qultgeo/qult/units"
)

// A laboratory sheet of our own (source: invented scenario): moist unit
// weight 19.2 kN/m³, water content 21 %, Gs 2.68.
func ExampleSolve() {
	st, err := phase.Solve(phase.Input{Gs: 2.68, W: 0.21, Gamma: 19.2 * units.KilonewtonPerCubicMetre})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("e %.3f  n %.3f  S %.3f\n", st.E, st.N, st.S)
	fmt.Printf("γd %.2f  γsat %.2f  γ′ %.2f kN/m³\n", st.GammaD.KNPerCubicMetre(),
		st.GammaSat.KNPerCubicMetre(), st.GammaSub.KNPerCubicMetre())

	// Two values are not enough: the error says what would close the system.
	_, err = phase.Solve(phase.Input{Gs: 2.68, W: 0.21})
	fmt.Println(err)
	// Output:
	// e 0.657  n 0.396  S 0.857
	// γd 15.87  γsat 19.76  γ′ 9.95 kN/m³
	// phase: not enough values to fix the state: {e, n, S, γ, γd, γsat, γ′} unknown; give one more of {e, n, S, γ, γd, γsat, γ′}
}

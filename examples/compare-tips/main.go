// Command compare-tips compares the tip bearing methods of package bearing
// for one pile tip, as a reviewer does before choosing one: a 900 mm bored
// pile ending 18 m down in dense sand (φ′ = 36°, σ′v = 190 kPa at the tip,
// SPT N60 = 38, rigidity index Ir = 90), then an undrained tip in stiff clay (su = 120 kPa). The
// soils are a scenario of our own, with invented numbers.
//
// Run it from the module root:
//
//	go run ./examples/compare-tips
package main

import (
	"fmt"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/units"
)

func main() {
	kPa := units.Kilopascal
	show("dense sand: φ′ = 36°, σ′v = 190 kPa, L = 18 m, D = 0.9 m, N60 = 38, Ir = 90",
		bearing.Input{Phi: 36 * units.Degree, Q: 190 * kPa, L: 18 * units.Metre, D: 0.9 * units.Metre, N60: 38, Ir: 90})
	show("stiff clay: su = 120 kPa, Ir = 200",
		bearing.Input{Su: 120 * kPa, Ir: 200})
}

func show(title string, in bearing.Input) {
	fmt.Println(title)
	fmt.Printf("  %-16s %8s %8s %12s %12s  %s\n", "method", "Nq", "Nc", "limit (kPa)", "qp (kPa)", "note")
	for _, row := range bearing.Compare(in) {
		if row.Err != nil {
			fmt.Printf("  %-16s %8s %8s %12s %12s  not applied: %v\n", row.ID, "-", "-", "-", "-", row.Err)
			continue
		}
		r := row.Result
		limit := "-"
		if r.Limit > 0 {
			limit = fmt.Sprintf("%.0f", r.Limit.KPa())
		}
		fmt.Printf("  %-16s %8s %8s %12s %12.0f  %s\n", row.ID, factor(r.Nq), factor(r.Nc), limit, r.Qp.KPa(), r.Flags)
	}
	fmt.Println()
}

// factor writes a bearing factor, or "-" where the method does not use it.
func factor(x float64) string {
	if x == 0 {
		return "-"
	}
	return fmt.Sprintf("%.2f", x)
}

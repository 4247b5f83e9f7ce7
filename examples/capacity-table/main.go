// Command capacity-table prints the axial capacity of a precast concrete
// pile with its tip depth, for a small ground profile, using package pile
// directly (no calc file). The site is a scenario of our own: a light
// industrial shed on a river terrace, 350 mm square driven piles through
// firm alluvial clay into medium dense and then dense sand and gravel.
// Invented numbers, for illustration only.
//
// Run it from the module root:
//
//	go run ./examples/capacity-table
package main

import (
	"fmt"
	"os"

	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

func main() {
	if err := run(); err != nil {
		fmt.Fprintln(os.Stderr, "capacity-table:", err)
		os.Exit(1)
	}
}

func run() error {
	m, kPa, kNm3 := units.Metre, units.Kilopascal, units.KilonewtonPerCubicMetre
	ground, err := profile.New(profile.Spec{
		WaterDepth: 2 * m,
		Layers: []profile.LayerSpec{
			{Name: "firm alluvial clay", Thickness: 5 * m, Drainage: profile.Undrained,
				UnitWeight: 18.5 * kNm3, SaturatedUnitWeight: 18.5 * kNm3, SuTop: 35 * kPa, SuBottom: 50 * kPa},
			{Name: "medium dense sand", Thickness: 6 * m, Drainage: profile.Drained,
				SaturatedUnitWeight: 19.5 * kNm3, Phi: 32 * units.Degree},
			{Name: "dense sand and gravel", Thickness: 12 * m, Drainage: profile.Drained,
				SaturatedUnitWeight: 21 * kNm3, Phi: 37 * units.Degree},
		},
	})
	if err != nil {
		return err
	}
	p := pile.Pile{
		Section:      pile.Section{Shape: pile.Square, Width: 0.35 * m},
		Length:       ground.Depth(), // the longest pile the table reaches
		Installation: pile.DrivenHigh,
	}
	a, err := pile.NewAnalysis(ground, p, pile.DefaultMethods(), nil)
	if err != nil {
		return err
	}
	// One pass down the pile, every metre from 2 m to 20 m.
	rows, err := a.WithDepth(pile.DepthGrid{From: 2 * m, To: 20 * m, Step: 1 * m}, nil)
	if err != nil {
		return err
	}
	fmt.Println("350 mm square driven pile, characteristic capacity with tip depth")
	fmt.Printf("%9s  %10s  %9s  %9s  %9s  %9s\n", "tip (m)", "qp (kPa)", "Qp (kN)", "Qs (kN)", "Rc (kN)", "Rt (kN)")
	for _, c := range rows {
		fmt.Printf("%9.1f  %10.0f  %9.0f  %9.0f  %9.0f  %9.0f\n",
			c.TipDepth.Metres(), c.UnitTip.KPa(), c.Tip.KN(), c.Shaft.KN(), c.Compression.KN(), c.Tension.KN())
	}
	return nil
}

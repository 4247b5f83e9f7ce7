// Source of the numbers in this file: a scenario of our own; the expected
// output is worked by hand in the example's comment from the cited equations
// (AASHTO practice efficiency, Terzaghi & Peck block), a closed-form check,
// not a published value.

package group_test

import (
	"fmt"

	"github.com/qultgeo/qult/group"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// A 3 × 3 group of driven 400 mm square piles in firm clay, a scenario of
// our own: the efficiency by AASHTO's practice, the block, and the lesser.
// By hand: s/D = 3, η = 0.65 + 0.35·0.5/3.5 = 0.70; the block's side
// 11.2 m × ∫0^15 (40 + 80z/30) dz = 11.2 × 900 = 10 080 kN and its base
// 9 × 80 kPa × 7.84 m² = 5644.8 kN, 15 725 kN in all; η·n·Rc takes the
// single pile's Rc from package pile.
func ExampleAnalyse() {
	ground, err := profile.New(profile.Spec{WaterDepth: 1 * units.Metre, Layers: []profile.LayerSpec{
		{Name: "firm clay", Thickness: 30 * units.Metre, Drainage: profile.Undrained,
			SuTop: 40 * units.Kilopascal, SuBottom: 120 * units.Kilopascal,
			UnitWeight: 18 * units.KilonewtonPerCubicMetre, SaturatedUnitWeight: 19 * units.KilonewtonPerCubicMetre},
	}})
	if err != nil {
		fmt.Println(err)
		return
	}
	layout, err := group.Grid(3, 3, 1.2*units.Metre, 1.2*units.Metre)
	if err != nil {
		fmt.Println(err)
		return
	}
	r, err := group.Analyse(group.Input{
		Profile: ground,
		Pile:    pile.Pile{Section: pile.Section{Shape: pile.Square, Width: 0.4 * units.Metre}, Length: 15 * units.Metre, Installation: pile.DrivenHigh},
		Methods: pile.DefaultMethods(),
		Layout:  layout,
		Options: group.Options{NoRaft: true},
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("block %.1f m × %.1f m, η = %.2f (%s)\n", r.Geometry.Bg.Metres(), r.Geometry.Lg.Metres(), r.Efficiency.Value, r.Efficiency.Rule)
	fmt.Printf("η·n·Rc %.0f kN, block %.0f kN: %s govern\n", r.Reduced.KN(), r.Block.Capacity.KN(), r.Governs)
	// Output:
	// block 2.8 m × 2.8 m, η = 0.70 (practice)
	// η·n·Rc 5877 kN, block 15725 kN: piles govern
}

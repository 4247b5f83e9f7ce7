package pile_test

import (
	"fmt"

	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// A bored pile through a soft estuarine clay into dense sand, a scenario of
// our own.
func Example() {
	kPa, kNm, m := units.Kilopascal, units.KilonewtonPerCubicMetre, units.Metre
	ground, err := profile.New(profile.Spec{
		WaterDepth: 1.5 * m,
		Layers: []profile.LayerSpec{
			{Name: "made ground", Thickness: 2 * m, Drainage: profile.Drained, Phi: 30 * units.Degree,
				UnitWeight: 18 * kNm, SaturatedUnitWeight: 19.5 * kNm},
			{Name: "estuarine clay", Thickness: 9 * m, Drainage: profile.Undrained, SuTop: 20 * kPa, SuBottom: 45 * kPa,
				SaturatedUnitWeight: 17 * kNm},
			{Name: "dense sand", Thickness: 25 * m, Drainage: profile.Drained, Phi: 37 * units.Degree,
				SaturatedUnitWeight: 20.5 * kNm},
		},
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	p := pile.Pile{
		Section:      pile.Section{Shape: pile.Circle, Diameter: 0.6 * m},
		Length:       30 * m,
		Installation: pile.Bored,
	}
	a, err := pile.NewAnalysis(ground, p, pile.DefaultMethods(), nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	c, err := a.Capacity()
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("tip %.0f kN, shaft %.0f kN, compression %.0f kN\n", c.Tip.KN(), c.Shaft.KN(), c.Compression.KN())
	d, err := pile.Check(ground, p, pile.DefaultMethods(), pile.Eurocode7{Approach: pile.DA1, Profiles: 1},
		pile.Loads{Compression: pile.Action{Permanent: 800 * units.Kilonewton, Variable: 250 * units.Kilonewton}})
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, v := range d.Cases {
		fmt.Printf("%s: Ed %.0f kN, Rd %.0f kN, utilisation %.2f\n", v.Case, v.CompressionEd.KN(), v.CompressionRd.KN(), v.CompressionUse)
	}
	// Output:
	// tip 689 kN, shaft 2093 kN, compression 2782 kN
	// DA1-1: Ed 1455 kN, Rd 1889 kN, utilisation 0.77
	// DA1-2: Ed 1125 kN, Rd 1458 kN, utilisation 0.77
}

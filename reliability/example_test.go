package reliability_test

import (
	"fmt"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/reliability"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// A scenario of our own: a 0.5 m pile, 20 m into a uniform clay with α =
// 0.6 given on the shaft and Nc = 9 at the tip, su normal with mean 60 kPa
// and standard deviation 9 kPa. The capacity is linear in su,
//
//	R = su·(α·L·π·D + Nc·π·D²/4) = su·(18.8496 + 1.7671) m² = su·20.6167 m²
//
// so μR = 60 kPa × 20.6167 m² = 1237.0 kN, σR = 9 kPa × 20.6167 m² =
// 185.6 kN and, against 700 kN, β = (1237.0 − 700)/185.6 = 2.894: FOSM
// gives these exactly (closed form), Monte Carlo within its sampling error.
func ExampleFOSM() {
	ground := profile.Spec{WaterDepth: 2 * units.Metre, Layers: []profile.LayerSpec{{Name: "clay", Thickness: 30 * units.Metre,
		Drainage: profile.Undrained, Su: 60 * units.Kilopascal,
		UnitWeight: 18 * units.KilonewtonPerCubicMetre, SaturatedUnitWeight: 19 * units.KilonewtonPerCubicMetre}}}
	p := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: 0.5 * units.Metre}, Length: 20 * units.Metre, Installation: pile.DrivenHigh}
	m := pile.Methods{LayeredTip: true, Layers: []pile.LayerMethods{{Shaft: shaft.AlphaGiven{Alpha: 0.6}, Tip: bearing.GivenNc{Nc: 9}}}}
	model, err := reliability.NewPileModel(ground, p, m, []reliability.Target{{Layer: 0, Key: reliability.KeyUndrainedStrength}})
	if err != nil {
		fmt.Println(err)
		return
	}
	prob := reliability.Problem{
		Params: []reliability.Param{{Name: "clay su", Dist: reliability.Distribution{Kind: reliability.Normal, Mean: 60e3, SD: 9e3}}},
		Model:  model,
	}
	f, err := reliability.FOSM(prob, reliability.Options{Load: 700e3})
	if err != nil {
		fmt.Println(err)
		return
	}
	c := f.Compression
	fmt.Printf("μR = %.1f kN, σR = %.1f kN, β = %.3f\n", c.Mean/1e3, c.SD/1e3, c.Beta)
	fmt.Printf("most sensitive: %s (share %.2f)\n", c.Ranking[0].Param, c.Ranking[0].Share)
	// Output:
	// μR = 1237.0 kN, σR = 185.6 kN, β = 2.894
	// most sensitive: clay su (share 1.00)
}

package profile_test

import (
	"fmt"
	"math"
	"testing"

	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

const (
	kPa  = units.Kilopascal
	kNm3 = units.KilonewtonPerCubicMetre
	m    = units.Metre
)

// siteLog (source: our own scenario) is an invented four-layer log (a river-terrace site of our own):
// two layers given as dry unit weight with void ratio, two as water content
// with Gs; water table 2 m down.
func siteLog() profile.Spec {
	return profile.Spec{
		WaterDepth: 2 * m,
		Layers: []profile.LayerSpec{
			{Name: "loose silty sand fill", Thickness: 3 * m, Drainage: profile.Drained,
				Phi: 29 * units.Degree, DryUnitWeight: 15.8 * kNm3, VoidRatio: 0.66},
			{Name: "soft grey estuarine clay", Thickness: 6 * m, Drainage: profile.Undrained,
				SuTop: 15 * kPa, SuBottom: 35 * kPa, WaterContent: 0.48, Gs: 2.70},
			{Name: "dense brown sand", Thickness: 6 * m, Drainage: profile.Drained,
				Phi: 36 * units.Degree, DryUnitWeight: 17.2 * kNm3, VoidRatio: 0.52},
			{Name: "stiff fissured clay", Thickness: 7 * m, Drainage: profile.Undrained,
				Su: 85 * kPa, WaterContent: 0.26, Gs: 2.72},
		},
	}
}

func Example() {
	p, err := profile.New(siteLog())
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, l := range p.Layers() {
		fmt.Printf("%-25s %5.1f-%4.1f m  γsat %5.2f  γ′ %5.2f kN/m³  (%s)\n", l.Name,
			l.Top.Metres(), l.Bottom.Metres(), l.SaturatedUnitWeight.KNPerCubicMetre(),
			l.SubmergedUnitWeight.KNPerCubicMetre(), l.Basis)
	}
	s, _ := p.StressesAt(p.Depth())
	fmt.Printf("at the base, %.1f m: σv %.1f kPa, u %.1f kPa, σ′v %.1f kPa\n",
		p.Depth().Metres(), s.Total.KPa(), s.Pore.KPa(), s.Effective.KPa())
	// Output:
	// loose silty sand fill       0.0- 3.0 m  γsat 19.70  γ′  9.89 kN/m³  (phase+assumed-dry)
	// soft grey estuarine clay    3.0- 9.0 m  γsat 17.07  γ′  7.26 kN/m³  (phase+assumed-saturated)
	// dense brown sand            9.0-15.0 m  γsat 20.56  γ′ 10.75 kN/m³  (phase+assumed-dry)
	// stiff fissured clay        15.0-22.0 m  γsat 19.69  γ′  9.88 kN/m³  (phase+assumed-saturated)
	// at the base, 22.0 m: σv 414.9 kPa, u 196.2 kPa, σ′v 218.7 kPa
}

// TestExampleByHand recomputes the example's base stress with the closed
// forms γsat = γd + e/(1+e)·γw and γsat = Gs(1+w)γw/(1+wGs) (S = 1), so
// the printed output is checked against arithmetic done independently.
func TestExampleByHand(t *testing.T) {
	const gw = 9.81
	fill := 15.8 + 0.66/1.66*gw
	softClay := 2.70 * 1.48 * gw / (1 + 0.48*2.70)
	sand := 17.2 + 0.52/1.52*gw
	stiffClay := 2.72 * 1.26 * gw / (1 + 0.26*2.72)
	sigma := 15.8*2 + fill*1 + softClay*6 + sand*6 + stiffClay*7
	u := gw * 20
	p, err := profile.New(siteLog())
	if err != nil {
		t.Fatal(err)
	}
	s, _ := p.StressesAt(22 * m)
	if math.Abs(s.Total.KPa()-sigma) > 1e-9 || math.Abs(s.Effective.KPa()-(sigma-u)) > 1e-9 {
		t.Errorf("base: σv %.6f σ′v %.6f; by hand %.6f, %.6f (closed form)", s.Total.KPa(), s.Effective.KPa(), sigma, sigma-u)
	}
}

// A river pier (a scenario of our own): 4 m of water over 3 m of loose
// sand and 17 m of clay; the design scour is 1 m general and 2.5 m local.
// The soil above the design ground line leaves σ′v below it. The printed
// stresses were worked by hand: σv = 9.81·(4 + 3.5) + 18·6.5 = 190.575,
// u = 9.81·14 = 137.34, σ′v = 8.19·6.5 = 53.235 kPa; without scour
// σ′v = 9.19·3 + 8.19·7 = 84.9 kPa.
func ExampleSpec_scour() {
	spec := profile.Spec{
		WaterDepth: -4 * m, // standing water above the original bed
		Layers: []profile.LayerSpec{
			{Name: "loose sand", Thickness: 3 * m, Drainage: profile.Drained, Phi: 30 * units.Degree,
				SaturatedUnitWeight: 19 * kNm3},
			{Name: "clay", Thickness: 17 * m, Drainage: profile.Undrained, Su: 40 * kPa,
				SaturatedUnitWeight: 18 * kNm3},
		},
	}
	before, _ := profile.New(spec)
	spec.Scour = profile.Scour{General: 1 * m, Local: 2.5 * m}
	after, err := profile.New(spec)
	if err != nil {
		fmt.Println(err)
		return
	}
	g := after.GroundLines()
	fmt.Printf("original ground 0 m, general scour line %.1f m, design ground line %.1f m\n",
		g.GeneralScour.Metres(), g.Design.Metres())
	for _, l := range after.Layers() {
		fmt.Printf("%-10s removed %.1f of %.1f m\n", l.Name, l.Removed.Metres(), l.Thickness().Metres())
	}
	s, _ := after.StressesAt(10 * m)
	s0, _ := before.StressesAt(10 * m)
	fmt.Printf("at 10 m: σv %.1f kPa, u %.1f kPa, σ′v %.1f kPa (%.1f kPa without scour)\n",
		s.Total.KPa(), s.Pore.KPa(), s.Effective.KPa(), s0.Effective.KPa())
	// Output:
	// original ground 0 m, general scour line 1.0 m, design ground line 3.5 m
	// loose sand removed 3.0 of 3.0 m
	// clay       removed 0.5 of 17.0 m
	// at 10 m: σv 190.6 kPa, u 137.3 kPa, σ′v 53.2 kPa (84.9 kPa without scour)
}

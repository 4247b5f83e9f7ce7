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

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

// estuary is a scenario of our own: made ground over a soft estuarine clay
// over dense sand, water 1.5 m down.
func estuary() (*profile.Profile, error) {
	kPa, kNm, m := units.Kilopascal, units.KilonewtonPerCubicMetre, units.Metre
	return profile.New(profile.Spec{
		WaterDepth: 1.5 * m,
		Layers: []profile.LayerSpec{
			{Name: "made ground", Thickness: 2 * m, Drainage: profile.Drained, Phi: 30 * units.Degree,
				UnitWeight: 18 * kNm, SaturatedUnitWeight: 19.5 * kNm, N60: 10},
			{Name: "estuarine clay", Thickness: 9 * m, Drainage: profile.Undrained, SuTop: 20 * kPa, SuBottom: 45 * kPa,
				SaturatedUnitWeight: 17 * kNm},
			{Name: "dense sand", Thickness: 25 * m, Drainage: profile.Drained, Phi: 37 * units.Degree,
				SaturatedUnitWeight: 20.5 * kNm, N60: 32},
		},
	})
}

// Capacity with depth in one pass: a driven precast pile, every 4 m from
// 8 m to 32 m.
func ExampleAnalysis_WithDepth() {
	m := units.Metre
	ground, err := estuary()
	if err != nil {
		fmt.Println(err)
		return
	}
	p := pile.Pile{Section: pile.Section{Shape: pile.Square, Width: 0.4 * m}, Length: 32 * m, Installation: pile.DrivenHigh}
	a, err := pile.NewAnalysis(ground, p, pile.DefaultMethods(), nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	rows, err := a.WithDepth(pile.DepthGrid{From: 8 * m, To: 32 * m, Step: 4 * m}, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, c := range rows {
		fmt.Printf("tip %2.0f m: Qp %5.0f kN, Qs %5.0f kN\n", c.TipDepth.Metres(), c.Tip.KN(), c.Shaft.KN())
	}
	// Output:
	// tip  8 m: Qp    53 kN, Qs   208 kN
	// tip 12 m: Qp   341 kN, Qs   414 kN
	// tip 16 m: Qp  1170 kN, Qs   737 kN
	// tip 20 m: Qp  1170 kN, Qs  1167 kN
	// tip 24 m: Qp  1170 kN, Qs  1705 kN
	// tip 28 m: Qp  1170 kN, Qs  2350 kN
	// tip 32 m: Qp  1170 kN, Qs  3103 kN
}

// The shortest drilled shaft under LRFD with the AASHTO drilled-shaft
// preset, its calibrated methods filled in where the defaults differ. A search that
// finds nothing is not an error: NotFound says how near it came.
func ExampleRequiredLength() {
	m, kN := units.Metre, units.Kilonewton
	ground, err := estuary()
	if err != nil {
		fmt.Println(err)
		return
	}
	p := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: 0.9 * m}, Installation: pile.Bored}
	basis := pile.AASHTODrilledShafts()
	methods, err := basis.Calibrated.Fill(pile.DefaultMethods())
	if err != nil {
		fmt.Println(err)
		return
	}
	loads := pile.Loads{Compression: pile.Action{Permanent: 700 * kN, Variable: 300 * kN}}
	l, err := pile.RequiredLength(ground, p, methods, basis, loads, pile.Search{Step: 0.5 * m})
	if err != nil {
		fmt.Println(err)
		return
	}
	if !l.Found {
		fmt.Println(l.NotFound())
		return
	}
	fmt.Printf("length %.1f m (%s, utilisation %.2f)\n", l.Length.Metres(), l.Governs, l.Use)
	heavy := pile.Loads{Compression: pile.Action{Permanent: 7000 * kN, Variable: 3000 * kN}}
	l, err = pile.RequiredLength(ground, p, methods, basis, heavy, pile.Search{Step: 0.5 * m})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(l.Found, l.NotFound())
	// Output:
	// length 17.5 m (aashto-drilled compression, utilisation 0.96)
	// false no pile length passes: the search ran to a tip depth of 36 m in steps of 0.5 m; the best utilisation reached was 3.7 (aashto-drilled compression) with the tip at 36 m
}

// A check with a global factor of safety of 2.5 in compression: the 20 m
// pile falls short, the 24 m pile passes.
func ExampleCheck() {
	m, kN := units.Metre, units.Kilonewton
	ground, err := estuary()
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, length := range []units.Length{20 * m, 24 * m} {
		p := pile.Pile{Section: pile.Section{Shape: pile.Square, Width: 0.4 * m}, Length: length, Installation: pile.DrivenHigh}
		d, err := pile.Check(ground, p, pile.DefaultMethods(), pile.SafetyFactor{Global: 2.5},
			pile.Loads{Compression: pile.Action{Permanent: 700 * kN, Variable: 300 * kN}})
		if err != nil {
			fmt.Println(err)
			return
		}
		for _, v := range d.Cases {
			fmt.Printf("%.0f m, %s: Ed %.0f kN, Rd %.0f kN, utilisation %.2f, passes %v\n",
				length.Metres(), v.Case, v.CompressionEd.KN(), v.CompressionRd.KN(), v.CompressionUse, v.CompressionUse <= 1)
		}
	}
	// Output:
	// 20 m, FS: Ed 1000 kN, Rd 935 kN, utilisation 1.07, passes false
	// 24 m, FS: Ed 1000 kN, Rd 1150 kN, utilisation 0.87, passes true
}

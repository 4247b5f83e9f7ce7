package units_test

// The conversions printed here rest on the NIST SP 811 (2008) factors that
// units_test.go checks; the scenarios are our own.

import (
	"fmt"

	"github.com/qultgeo/qult/units"
)

func ExampleLength() {
	d := 600 * units.Millimetre
	fmt.Printf("%.4f ft\n", d.Feet())
	fmt.Println(d)
	// Output:
	// 1.9685 ft
	// 0.6 m
}

func ExampleStress_KSF() {
	q := 250 * units.Kilopascal
	fmt.Printf("%.3f ksf\n", q.KSF())
	// Output: 5.221 ksf
}

func ExampleStressOver() {
	// Effective stress under 3 m of soil with γ′ = 9.5 kN/m³.
	s := units.StressOver(9.5*units.KilonewtonPerCubicMetre, 3*units.Metre)
	fmt.Println(s)
	// Output: 28.5 kPa
}

func ExampleParse() {
	q, err := units.Parse("120 pcf")
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%s: %.2f kN/m3\n", q.Dim, units.UnitWeight(q.Value).KNPerCubicMetre())
	// Output: unit weight: 18.85 kN/m3
}

func ExampleParseLength() {
	l, err := units.ParseLength("52.5 ft")
	fmt.Printf("%.3f m %v\n", l.Metres(), err)
	_, err = units.ParseLength("3 ton")
	fmt.Println(err)
	// Output:
	// 16.002 m <nil>
	// units.ParseLength: parsing "3 ton": ambiguous unit "ton": a short, long or metric ton; use tsf for a stress, or kip, lbf, kN for a force
}

func ExampleParseIn() {
	// A calc file declared in US units gives a bare 120 for a unit weight.
	v, _ := units.ParseIn("120", units.DimUnitWeight, units.US)
	fmt.Printf("%.4f kN/m3\n", units.UnitWeight(v).KNPerCubicMetre())
	// Output: 18.8505 kN/m3
}

func ExampleSystem_In() {
	v, unit := units.US.In(float64(2200*units.Kilonewton), units.DimForce)
	fmt.Printf("%.1f %s\n", v, unit)
	// Output: 494.6 kip
}

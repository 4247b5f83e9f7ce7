// Source of the numbers in this file: a sounding of our own; the example
// documents the use of the package, and its output is what the
// interpretation gives for that invented input (the reference checks against
// published values are in the package's other tests), not a published value.

package insitu_test

import (
	"fmt"
	"math"
	"strings"

	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/units"
)

// A sounding of our own through soft clay into sand, in the CSV form, read,
// interpreted with hydrostatic water 1.2 m below ground and a unit weight of
// 18 kN/m³, and averaged about the tip of a 0.8 m pile at 6 m (1.5 diameters each side).
func Example() {
	const file = `# id: CPT-E1
# area_ratio: 0.75
depth_m,qc_MPa,fs_kPa,u2_kPa
2,0.45,9,60
3,0.52,10,85
4,0.60,12,110
5,6.5,45,45
6,11.2,70,55
7,13.8,84,63
8,15.1,95,72
`
	s, err := insitu.ReadCPTCSV(strings.NewReader(file), "cpt-e1.csv")
	if err != nil {
		fmt.Println(err)
		return
	}
	ground := func(z units.Length) (units.Stress, units.Stress) {
		sv := 18e3 * z.Metres()
		u0 := 9.81e3 * math.Max(0, z.Metres()-1.2)
		return units.Stress(sv), units.Stress(u0)
	}
	pts, err := insitu.InterpretCPT(s, ground, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, p := range pts {
		fmt.Printf("%3.0f m  qt %5.2f MPa  Qtn %6.1f  Fr %4.2f %%  Ic %4.2f  %v\n",
			p.Depth.Metres(), p.Qt.MPa(), p.Qtn, p.Fr, p.Ic, p.Zone)
	}
	m, err := insitu.TipZone(pts, 6, 1.5*0.8, 1.5*0.8, func(p *insitu.Point) float64 { return p.Qt.MPa() })
	fmt.Printf("mean qt from 4.8 to 7.2 m: %.2f MPa (%d readings) %v\n", m.Value, m.Readings, err)
	layers, _ := insitu.SuggestLayers(pts, 1)
	for _, l := range layers {
		fmt.Printf("suggested: %.1f to %.1f m, %v\n", l.Top.Metres(), l.Bottom.Metres(), l.Zone)
	}
	// Output:
	// 2 m  qt  0.47 MPa  Qtn   13.9  Fr 2.10 %  Ic 2.79  4: silt mixtures: clayey silt to silty clay
	//   3 m  qt  0.54 MPa  Qtn   12.7  Fr 2.05 %  Ic 2.82  4: silt mixtures: clayey silt to silty clay
	//   4 m  qt  0.63 MPa  Qtn   12.1  Fr 2.16 %  Ic 2.85  4: silt mixtures: clayey silt to silty clay
	//   5 m  qt  6.51 MPa  Qtn   93.0  Fr 0.70 %  Ic 1.84  6: sands: clean sand to silty sand
	//   6 m  qt 11.21 MPa  Qtn  143.3  Fr 0.63 %  Ic 1.66  6: sands: clean sand to silty sand
	//   7 m  qt 13.82 MPa  Qtn  164.5  Fr 0.61 %  Ic 1.61  6: sands: clean sand to silty sand
	//   8 m  qt 15.12 MPa  Qtn  170.3  Fr 0.63 %  Ic 1.61  6: sands: clean sand to silty sand
	// mean qt from 4.8 to 7.2 m: 10.69 MPa (3 readings) <nil>
	// suggested: 2.0 to 4.5 m, 4: silt mixtures: clayey silt to silty clay
	// suggested: 4.5 to 8.0 m, 6: sands: clean sand to silty sand
}

// A piezocone sounding of our own (clay over sand at 8 m, readings every
// 0.1 m) prepared for the direct methods, and the tip of a 0.4 m pile at
// 12 m by each: the factors kc and Ct are the engineer's, given.
func ExampleNewCone() {
	s := &insitu.Sounding{ID: "CPT-X", AreaRatio: 0.8, HasU2: true}
	for i := 1; i <= 200; i++ {
		z := float64(i) / 10
		qc, u2 := 0.6+0.03*z, 0.03*z // MPa: clay with excess pore pressure
		if z > 8 {
			qc, u2 = 12+0.4*(z-8), 0.0098*z // sand
		}
		s.Rows = append(s.Rows, insitu.Row{Depth: units.Length(z), Qc: units.Stress(qc) * units.Megapascal, U2: units.Stress(u2) * units.Megapascal})
	}
	c, err := insitu.NewCone(s)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, m := range []insitu.DirectTip{insitu.LCPCTip{Kc: 0.4}, insitu.SchmertmannTip{Limit: 15 * units.Megapascal}, insitu.EslamiFelleniusTip{}} {
		r, err := m.Tip(c, 12*units.Metre, 0.4*units.Metre)
		if err != nil {
			fmt.Println(err)
			continue
		}
		fmt.Printf("%-16s averaged %.0f kPa over %.2f to %.2f m, qp = %.0f kPa\n", m.ID(), r.Cone.KPa(), r.Top.Metres(), r.Bottom.Metres(), r.Qp.KPa())
	}
	// Output:
	// lcpc             averaged 13600 kPa over 11.40 to 12.60 m, qp = 5440 kPa
	// schmertmann      averaged 13308 kPa over 8.80 to 13.60 m, qp = 13308 kPa
	// eslami-fellenius averaged 13181 kPa over 8.80 to 13.60 m, qp = 13181 kPa
}

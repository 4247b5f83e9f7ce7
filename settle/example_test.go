package settle_test

// Sources: none; the examples are invented scenarios (documentation).

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/settle"
	"github.com/qultgeo/qult/units"
)

// A 0.6 m bored pile, 24 m long, through 9 m of soft clay into sand, on the
// API curves: settlement under the working load and the share of it that
// reaches the tip. (An invented scenario for the example.) The 4000 kN
// step cannot be carried: the clay softens to its residual (0.7 by
// default) and the pile plunges at 0.7·339 + 1838 + 1131 = 3206 kN.
func Example() {
	clay, _ := settle.APIClay(0)
	d := 0.6 * units.Metre
	p := units.Length(math.Pi) * d
	m := settle.Model{Diameter: d, EA: units.Force(30e9 * math.Pi / 4 * 0.36),
		Segments: []settle.Segment{
			{Top: 0, Bottom: 9, Perimeter: p, FsTop: 10 * units.Kilopascal, FsBottom: 30 * units.Kilopascal, Curve: clay},
			{Top: 9, Bottom: 24, Perimeter: p, FsTop: 40 * units.Kilopascal, FsBottom: 90 * units.Kilopascal, Curve: settle.APISand()},
		},
		Tip: settle.TipSpring{Area: units.Circle(d), Qp: 4 * units.Megapascal, Curve: settle.APITip()}}
	s, err := settle.NewSolver(m, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	shaft, tip := s.Capacity()
	fmt.Printf("capacity: shaft %.0f kN, tip %.0f kN\n", shaft.KN(), tip.KN())
	r, err := s.Run([]units.Force{1000 * units.Kilonewton, 2000 * units.Kilonewton, 4000 * units.Kilonewton})
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, st := range r.Steps {
		fmt.Printf("%4.0f kN: head %5.2f mm, tip %5.2f mm, shaft %2.0f %%, tip %2.0f %%\n",
			st.Head.KN(), st.Settlement.Millimetres(), st.TipMove.Millimetres(), 100*st.ShaftShare, 100*st.TipShare)
	}
	if r.Plunged {
		fmt.Printf("plunges at %.0f kN\n", r.PlungeLoad.KN())
	}
	// Output:
	// capacity: shaft 2177 kN, tip 1131 kN
	// 1000 kN: head  2.50 mm, tip  0.66 mm, shaft 85 %, tip 15 %
	// 2000 kN: head  5.26 mm, tip  1.46 mm, shaft 85 %, tip 15 %
	// plunges at 3206 kN
}

// Reading a static load test of our own by the four criteria (the
// hyperbolic fits over the points from the fourth on).
func ExampleDavisson() {
	kN, mm := units.Kilonewton, units.Millimetre
	lt := settle.LoadTest{
		Load:       []units.Force{0, 400 * kN, 800 * kN, 1200 * kN, 1500 * kN, 1700 * kN, 1800 * kN},
		Settlement: []units.Length{0, 1.8 * mm, 4.0 * mm, 7.1 * mm, 11.5 * mm, 18 * mm, 31 * mm},
	}
	dav, _ := settle.Davisson(lt, 18, units.Force(30e9*0.16), 0.4)
	ten, _ := settle.TenPercent(lt, 0.4)
	chin, _ := settle.ChinKondner(lt, 3)
	bh, _ := settle.BrinchHansen80(lt, 3)
	for _, l := range []settle.Limit{dav, ten, chin, bh} {
		if l.Reached {
			fmt.Printf("%-17s %5.0f kN\n", l.Criterion, l.Load.KN())
		} else {
			fmt.Printf("%-17s not reached\n", l.Criterion)
		}
	}
	// Output:
	// davisson           1544 kN
	// ten-percent       not reached
	// chin-kondner       2097 kN
	// brinch-hansen-80   1871 kN
}

// A driven pile 24 m long through 12 m of settling clay into sand, with
// the tip force found by settlement compatibility on the API q-z curve.
// A scenario of our own; the numbers agree with the brute-force oracle of
// TestDowndragPartialOracle.
func ExampleDowndrag() {
	d := 0.4
	p := units.Length(math.Pi * d)
	dd := settle.Downdrag{
		Rows: []settle.ShaftRow{
			{Top: 0, Bottom: 12, Perimeter: p, FsTop: 10e3, FsBottom: 25e3},  // clay
			{Top: 12, Bottom: 24, Perimeter: p, FsTop: 40e3, FsBottom: 80e3}, // sand
		},
		Load:     600 * units.Kilonewton,
		EA:       units.Force(30e9 * math.Pi / 4 * d * d),
		Diameter: units.Length(d),
		Tip:      settle.TipSpring{Area: units.Circle(units.Length(d)), Qp: 6e6, Curve: settle.APITip()},
		Ground:   []settle.SettlementPoint{{Depth: 0, Settlement: 0.15}, {Depth: 12, Settlement: 0}},
	}
	r, err := dd.Solve()
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("neutral plane %.2f m, drag load %.0f kN, largest force %.0f kN\n", float64(r.NeutralPlane), r.DragLoad.KN(), r.MaxForce.KN())
	fmt.Printf("tip force %.0f kN of %.0f kN; pile settles %.1f mm at the neutral plane\n", r.TipForce.KN(), r.TipCapacity.KN(), r.GroundAtNP.Millimetres())
	// Output:
	// neutral plane 11.88 m, drag load 260 kN, largest force 860 kN
	// tip force 0 kN of 754 kN; pile settles 1.5 mm at the neutral plane
}

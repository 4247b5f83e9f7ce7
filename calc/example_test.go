package calc_test

// Sources: none; an invented scenario (documentation).

import (
	"fmt"

	"github.com/qultgeo/qult/calc"
)

// A calc file parsed and run from a string: a driven precast pile through
// soft clay into sand (invented numbers).
func ExampleParse() {
	src := `title: Harbour wall, trial pile
ground:
  water_depth: 1 m
  layers:
    - {name: soft clay, thickness: 6 m, drainage: undrained, saturated_unit_weight: 17 kN/m3, undrained_strength: 25 kPa}
    - {name: dense sand, thickness: 20 m, drainage: drained, saturated_unit_weight: 20 kN/m3, friction_angle: 36 deg}
pile:
  section: {shape: square, width: 400 mm}
  length: 16 m
  installation: driven-high
design: {basis: safety-factor, factor: 2.5}
loads: {compression: {permanent: 450 kN, variable: 200 kN}}
`
	r, err := calc.Parse([]byte(src))
	if err != nil {
		fmt.Println(err)
		return
	}
	c := r.Breakdown.Capacity
	fmt.Printf("Qp %.0f kN, Qs %.0f kN, Rc %.0f kN\n", c.Tip.KN(), c.Shaft.KN(), c.Compression.KN())
	fmt.Printf("design check passes: %v (utilisation %.2f)\n", r.Design.Pass, r.Design.MaxUse())
	// Output:
	// Qp 976 kN, Qs 785 kN, Rc 1761 kN
	// design check passes: true (utilisation 0.92)
}

// A bad file: every problem at once, each with its key and line.
func ExampleParse_problems() {
	_, err := calc.Parse([]byte("title: t\nground:\n  water_depth: 2 m\n  layers:\n    - {name: sand, thickness: 12 kPa, drainage: drained, unit_weight: 18, friction_angle: 30}\npile: {section: {shape: circle, diameter: 0.5 m}, length: 8 m, installation: hammered}\n"))
	fmt.Println(err)
	// Output:
	// ground.layers[0].thickness (line 5): "12 kPa": wrong dimension: 12 kPa is a stress, want a length (m, mm, cm, km, ft, in)
	// pile.installation (line 6): installation "hammered": want one of driven-high, driven-low, bored, augered, jetted
}

// Source of the numbers in this file: the grounds and loads are drawn at
// random; the expected values are the ordinary design check of the same file
// (a property that holds by construction), so no published value is
// involved.

package calc

// The property holds by construction (no published values): with a
// downdrag section whose ground does not settle, the downdrag check of
// every design case is the ordinary design check. Invented inputs.

import (
	"fmt"
	"math"
	"testing"

	"pgregory.net/rapid"
)

// TestPropDowndragNoSettlementIsDesignCheck: no ground settlement means no
// negative skin friction, a neutral plane at the head, a drag load of 0,
// and the same Ed, Rd and verdict as the ordinary check, whatever the
// basis.
func TestPropDowndragNoSettlementIsDesignCheck(t *testing.T) {
	bases := []string{
		"{basis: safety-factor, factor: 2.5}",
		"{basis: safety-factor, tip_factor: 3, shaft_factor: 1.5}",
		"{basis: en1997, approach: DA1}",
		"{basis: en1997, approach: DA2}",
		"{basis: lrfd, tip: {nc9: 0.4, meyerhof: 0.45}, shaft: {alpha-api: 0.35, beta: 0.45}, uplift: {alpha-api: 0.25, beta: 0.35}, permanent: 1.25, variable: 1.75}",
	}
	rapid.Check(t, func(r *rapid.T) {
		su := rapid.Float64Range(10, 150).Draw(r, "su")
		phi := rapid.Float64Range(26, 40).Draw(r, "phi")
		h1 := rapid.Float64Range(2, 15).Draw(r, "h1")
		L := rapid.Float64Range(3, 28).Draw(r, "L")
		g := rapid.Float64Range(100, 3000).Draw(r, "G")
		q := rapid.Float64Range(0, 1500).Draw(r, "Q")
		basis := bases[rapid.IntRange(0, len(bases)-1).Draw(r, "basis")]
		src := fmt.Sprintf(`title: property
units: SI
ground:
  water_depth: 1 m
  layers:
    - {name: clay, thickness: %g m, drainage: undrained, unit_weight: 17 kN/m3, saturated_unit_weight: 18 kN/m3, undrained_strength: %g kPa}
    - {name: sand, thickness: 30 m, drainage: drained, saturated_unit_weight: 20 kN/m3, friction_angle: %g deg}
pile:
  section: {shape: circle, diameter: 500 mm}
  length: %g m
  installation: driven-high
  youngs_modulus: 30 GPa
methods: {tip_undrained: nc9, shaft_undrained: alpha-api, tip_drained: meyerhof}
design: %s
loads:
  compression: {permanent: %g kN, variable: %g kN}
downdrag:
  ground_settlement:
    - {depth: 0 m, settlement: 0 mm}
    - {depth: 10 m, settlement: 0 mm}
`, h1, su, phi, L, basis, g, q)
		res, err := Parse([]byte(src))
		if err != nil {
			r.Fatalf("%v\n%s", err, src)
		}
		d := res.Downdrag
		if d.DragLoad != 0 || d.NeutralPlane != res.Pile.HeadDepth || d.MaxForce != d.Load {
			r.Fatalf("no settlement: drag %v, neutral plane %v, largest %v", d.DragLoad, d.NeutralPlane, d.MaxForce)
		}
		if len(d.Cases) != len(res.Design.Cases) {
			r.Fatalf("%d downdrag cases, %d design cases", len(d.Cases), len(res.Design.Cases))
		}
		for i, c := range d.Cases {
			o := res.Design.Cases[i]
			near := func(a, b float64) bool { return math.Abs(a-b) <= 1e-9*math.Max(1, math.Abs(b)) }
			if !near(float64(c.Ed), float64(o.CompressionEd)) || !near(float64(c.Rd), float64(o.CompressionRd)) {
				r.Fatalf("case %s: downdrag Ed %v Rd %v, ordinary Ed %v Rd %v", c.Case, c.Ed, c.Rd, o.CompressionEd, o.CompressionRd)
			}
			if c.Pass != (o.CompressionUse <= 1) {
				r.Fatalf("case %s: downdrag pass %v, ordinary compression use %v", c.Case, c.Pass, o.CompressionUse)
			}
		}
	})
}

package calc

// Published examples run through calc files with qult's DEFAULT method
// selection for the case (no chart readings fed in). The inputs and
// expected values are recorded, with how they were read, in
// testdata/published/ (Das, Principles of Foundation Engineering, worked
// examples read in the FOSSEE textbook-companion transcriptions, which
// give page numbers that fit the 7th edition, 2011; the 8th edition,
// 2016, printed value of Example 12.3 read directly). Each tolerance is
// the source's reading or rounding tolerance stated there.

import (
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func TestPublishedWithDefaults(t *testing.T) {
	cases := []struct {
		name, file string
		get        func(r *Result) float64 // kN or kip as the file's units
		want, tol  float64                 // tol relative
		why        string
	}{
		{
			// Das Ex. 11.4, p. 535: driven 406 mm closed pipe, 30 m, in clay
			// (su 30 kPa to 10 m, 100 kPa below). Unit weights and the water
			// table (18 kN/m³ above 5 m, 18 then 19.6 kN/m³ below) are
			// inferred from the source's mid-depth stresses (marked so in
			// testdata/published/das7-ex11-4-driven-pipe-clay.yaml). The
			// source's α-method total: Qp 116.55 kN + Qs 2136.4 kN; qult's
			// default for a driven pile in clay is the API RP 2GEO α,
			// integrated with depth, against the source's α read from a chart
			// at mid-depth (±0.05 on α ≈ 0.7: ±8 %).
			name: "Das 11.4 whole pile, API α and Nc = 9",
			file: `title: Das Ex. 11.4
ground:
  water_depth: 5 m
  water_unit_weight: 9.81 kN/m3
  layers:
    - {name: clay 1a, thickness: 5 m, drainage: undrained, unit_weight: 18 kN/m3, saturated_unit_weight: 18 kN/m3, undrained_strength: 30 kPa}
    - {name: clay 1b, thickness: 5 m, drainage: undrained, saturated_unit_weight: 18 kN/m3, undrained_strength: 30 kPa}
    - {name: clay 2, thickness: 25 m, drainage: undrained, saturated_unit_weight: 19.6 kN/m3, undrained_strength: 100 kPa}
pile:
  section: {shape: closed-pipe, diameter: 406 mm, wall: 10 mm}
  length: 30 m
  installation: driven-high
`,
			get:  func(r *Result) float64 { return r.Breakdown.Compression.KN() },
			want: 116.55 + 2136.4, tol: 0.08,
			why: "Qp 116.55 kN (Nc = 9) + Qs 2136.4 kN (α from the chart)",
		},
		{
			name: "Das 11.4 tip, Nc = 9",
			file: "", // same file as above; see below
			get:  func(r *Result) float64 { return r.Breakdown.Tip.Force.KN() },
			want: 116.55, tol: 0.005,
			why: "Qp = 0.1295 m² × 9 × 100 kPa",
		},
		{
			// Das Ex. 12.3 (8th ed., 2016, p. 529, printed): drilled shaft in
			// sand, N60 = 30 at the base, base diameter 1.5 m: Qp = 2582 kN
			// from qp = 57.5·N60 kPa reduced by 1.27/Db. qult's bored default
			// with N60 given is the same O'Neill & Reese rule, 0.6·N60 tsf
			// (= 57.46·N60 kPa); the base is modelled as a 1.5 m shaft (qult
			// has no bell) and only the tip is compared. ±0.2 %: 57.5 against
			// 57.46 kPa per blow.
			name: "Das 12.3 bored tip, N60 rule with the large-base reduction",
			file: `title: Das Ex. 12.3
ground:
  water_depth: none
  layers:
    - {name: sand, thickness: 30 m, drainage: drained, unit_weight: 16 kN/m3, friction_angle: 36 deg, n60: 30}
pile:
  section: {shape: circle, diameter: 1.5 m}
  length: 12 m
  installation: bored
`,
			get:  func(r *Result) float64 { return r.Breakdown.Tip.Force.KN() },
			want: 2582, tol: 0.002,
			why: "Qp printed 2582 kN",
		},
		{
			// Das Ex. 11.1(a), p. 532: 16 in square precast pile driven 50 ft
			// into dry sand (γ 110 pcf, φ′ 30°); Meyerhof's limit governs,
			// 0.5·pa·Nq*·tanφ′ with pa = 2000 psf and Nq* = 55 read from the
			// chart: Qp = 56.45 kip. qult's defaults: Meyerhof for a driven
			// pile, pa = 2000 psf in a US file, Nq*(30°) = 56.7 from its own
			// tabulation; ±5.5 % for the chart reading of Nq* (±3 on 55).
			name: "Das 11.1 driven tip, Meyerhof's limit in US units",
			file: `title: Das Ex. 11.1
units: US
ground:
  water_depth: none
  layers:
    - {name: sand, thickness: 80, drainage: drained, unit_weight: 110, friction_angle: 30}
pile:
  section: {shape: square, width: 16 in}
  length: 50
  installation: driven-high
`,
			get:  func(r *Result) float64 { return r.Breakdown.Tip.Force.Kips() },
			want: 56.45, tol: 0.055,
			why: "Qp printed 56.45 kip",
		},
	}
	cases[1].file = cases[0].file
	for _, c := range cases {
		r, err := Parse([]byte(c.file))
		require.NoError(t, err, c.name)
		got := c.get(r)
		assert.InEpsilon(t, c.want, got, c.tol, "%s: %s (Das, Principles of Foundation Engineering)", c.name, c.why)
		t.Logf("%s: %.4g against %.4g (%s): %+.2f %%", c.name, got, c.want, c.why, 100*(got-c.want)/c.want)
	}
}

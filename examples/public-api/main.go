// Command public-api runs a whole calculation through qult's public API
// alone, as another tool would import it: a three-layer profile, capacity
// with depth, the required length under LRFD with the AASHTO drilled-shaft
// factors, and a text report. A scenario of our own, invented numbers.
//
// Results are for qualified engineers: check them against the governing
// codes, the site investigation and load tests.
package main

import (
	"fmt"
	"io"
	"os"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/report"
	"github.com/qultgeo/qult/units"
)

func main() {
	if err := run(os.Stdout); err != nil {
		fmt.Fprintln(os.Stderr, "public-api:", err)
		os.Exit(1)
	}
}

func run(w io.Writer) error {
	m, kPa, kNm := units.Metre, units.Kilopascal, units.KilonewtonPerCubicMetre
	ground, err := profile.New(profile.Spec{WaterDepth: 2 * m, Layers: []profile.LayerSpec{
		{Name: "sandy fill", Thickness: 3 * m, Drainage: profile.Drained, Phi: 30 * units.Degree,
			UnitWeight: 18 * kNm, SaturatedUnitWeight: 19.5 * kNm, N60: 12},
		{Name: "firm clay", Thickness: 8 * m, Drainage: profile.Undrained, SuTop: 35 * kPa, SuBottom: 60 * kPa,
			SaturatedUnitWeight: 18 * kNm},
		{Name: "dense sand", Thickness: 25 * m, Drainage: profile.Drained, Phi: 36 * units.Degree,
			SaturatedUnitWeight: 20.5 * kNm, N60: 35},
	}})
	if err != nil {
		return err
	}
	p := pile.Pile{Section: pile.Section{Shape: pile.Circle, Diameter: 0.9 * m}, Length: 20 * m,
		Installation: pile.Bored, UnitWeight: 24 * kNm}

	// Capacity with depth, every 2 m from 4 m to 30 m.
	deep := p
	deep.Length = 30 * m
	a, err := pile.NewAnalysis(ground, deep, pile.DefaultMethods(), nil)
	if err != nil {
		return err
	}
	rows, err := a.WithDepth(pile.DepthGrid{From: 4 * m, To: 30 * m, Step: 2 * m}, nil)
	if err != nil {
		return err
	}
	fmt.Fprintln(w, "tip (m)  Qp (kN)  Qs (kN)  Rc (kN)")
	for _, c := range rows {
		fmt.Fprintf(w, "%7.0f  %7.0f  %7.0f  %7.0f\n", c.TipDepth.Metres(), c.Tip.KN(), c.Shaft.KN(), c.Compression.KN())
	}

	// The required length under LRFD with the AASHTO drilled-shaft preset,
	// its own methods filled in where the defaults would differ.
	basis := pile.AASHTODrilledShafts()
	methods, err := basis.Calibrated.Fill(pile.DefaultMethods())
	if err != nil {
		return err
	}
	loads := pile.Loads{Compression: pile.Action{Permanent: 1800 * units.Kilonewton, Variable: 600 * units.Kilonewton}}
	l, err := pile.RequiredLength(ground, p, methods, basis, loads, pile.Search{Step: 0.5 * m, MaxTip: 34 * m})
	if err != nil {
		return err
	}
	if !l.Found {
		fmt.Fprintln(w, l.NotFound())
	} else {
		fmt.Fprintf(w, "required length %.1f m (%s, utilisation %.2f)\n", l.Length.Metres(), l.Governs, l.Use)
	}

	// A calc file and its report, through package calc.
	res, err := calc.Parse([]byte(`title: Public API tour
ground:
  water_depth: 2 m
  layers:
    - {name: sandy fill, thickness: 3 m, drainage: drained, unit_weight: 18 kN/m3, saturated_unit_weight: 19.5 kN/m3, friction_angle: 30 deg, n60: 12}
    - {name: firm clay, thickness: 8 m, drainage: undrained, saturated_unit_weight: 18 kN/m3, undrained_strength: {top: 35 kPa, bottom: 60 kPa}}
    - {name: dense sand, thickness: 25 m, drainage: drained, saturated_unit_weight: 20.5 kN/m3, friction_angle: 36 deg, n60: 35}
pile:
  section: {shape: circle, diameter: 0.9 m}
  length: 20 m
  installation: bored
`))
	if err != nil {
		return err
	}
	return report.Write(w, res, report.Text, report.Options{Units: report.SIUnits, View: report.ViewCheck})
}

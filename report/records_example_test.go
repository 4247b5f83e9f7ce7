package report_test

// Sources: none; an invented scenario (documentation).

import (
	"fmt"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/report"
	"github.com/qultgeo/qult/units"
)

// A result's tables as flat records, for a data frame: the column names
// carry the unit of the display system.
func ExampleTables() {
	r, err := calc.Parse([]byte(`id: T-1
title: Trial pile
ground:
  water_depth: 2 m
  layers:
    - {name: sand, thickness: 15 m, drainage: drained, unit_weight: 18 kN/m3, saturated_unit_weight: 20 kN/m3, friction_angle: 33 deg}
pile: {section: {shape: circle, diameter: 400 mm}, length: 10 m, installation: driven-high}
`))
	if err != nil {
		fmt.Println(err)
		return
	}
	ts, err := report.Tables(r, units.US)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, t := range ts {
		if t.Name == "stresses" {
			fmt.Println(t.Columns)
			for _, row := range t.Rows {
				fmt.Println(row...)
			}
		}
	}
	// Output:
	// [depth_ft sigma_v_ksf u_ksf sigma_v_eff_ksf]
	// 0 0 0 0
	// 6.56168 0.751876 0 0.751876
	// 49.2126 6.18209 2.66352 3.51857
}

package report_test

// Sources: none; an invented scenario (documentation).

import (
	"bytes"
	"encoding/json"
	"fmt"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/report"
)

// A result rendered as the JSON a notebook reads: the schema name, the
// capacity as value and unit, and the cautions that travel with it.
func ExampleWrite() {
	r, err := calc.Parse([]byte(`title: Yard crane base
ground:
  water_depth: none
  layers:
    - {name: stiff clay, thickness: 20 m, drainage: undrained, unit_weight: 19 kN/m3, undrained_strength: 80 kPa}
pile:
  section: {shape: circle, diameter: 0.6 m}
  length: 12 m
  installation: bored
`))
	if err != nil {
		fmt.Println(err)
		return
	}
	var buf bytes.Buffer
	if err := report.Write(&buf, r, report.JSON, report.Options{Units: report.SIUnits, View: report.ViewCapacity}); err != nil {
		fmt.Println(err)
		return
	}
	var out struct {
		Schema   string `json:"schema"`
		Capacity struct {
			Compression struct {
				Value float64 `json:"value"`
				Unit  string  `json:"unit"`
			} `json:"compression"`
		} `json:"capacity"`
		Cautions []string `json:"cautions"`
	}
	if err := json.Unmarshal(buf.Bytes(), &out); err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(out.Schema)
	fmt.Printf("Rc = %.0f %s\n", out.Capacity.Compression.Value, out.Capacity.Compression.Unit)
	fmt.Println(len(out.Cautions) > 0)
	// Output:
	// qult.result/1
	// Rc = 1025 kN
	// true
}

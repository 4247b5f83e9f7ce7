package calc_test

// Sources: none; an invented scenario (documentation).

import (
	"context"
	"fmt"
	"strings"

	"github.com/qultgeo/qult/calc"
)

// A batch of calc files, one JSON object per line, run on two workers with
// the answers in input order: a good line, a blank line (skipped) and a
// line with an unknown key (an answer with its problems, not a stop).
func ExampleRunBatch() {
	ground := `"ground":{"water_depth":"1 m","layers":[{"name":"dense sand","thickness":"25 m","drainage":"drained",` +
		`"saturated_unit_weight":"20 kN/m3","friction_angle":"35 deg"}]}`
	pile := `"pile":{"section":{"shape":"circle","diameter":"500 mm"},"length":"%d m","installation":"driven-high"}`
	in := strings.Join([]string{
		`{"id":"B-12","title":"Jetty, bent 12",` + ground + `,` + fmt.Sprintf(pile, 12) + `}`,
		``,
		`{"id":"B-13","title":"Jetty, bent 13",` + ground + `,` + fmt.Sprintf(pile, 14) + `,"lenght":"14 m"}`,
	}, "\n")
	err := calc.RunBatch(context.Background(), strings.NewReader(in), calc.BatchOptions{Workers: 2},
		func(it calc.BatchItem) error {
			if it.Err != nil {
				fmt.Printf("line %d (%s): %v\n", it.Line, it.ID, it.Err)
				return nil
			}
			fmt.Printf("line %d (%s): Rc %.0f kN\n", it.Line, it.ID, it.Result.Breakdown.Capacity.Compression.KN())
			return nil
		})
	if err != nil {
		fmt.Println(err)
	}
	// Output:
	// line 1 (B-12): Rc 1504 kN
	// line 3 (B-13): lenght (line 1): unknown key "lenght"; accepted here: candidates, date, design, downdrag, engineer, ground, group, id, load_test, loads, methods, pile, project, qult, reliability, revision, search, settlement, title, units
}

// Source of the numbers in this file: a benchmark on a pile of our own; it
// asserts no value.

package settle

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// BenchmarkDowndrag: the unified method with the tip force found by
// compatibility, on a pile of 10 rows (a scenario of our own).
func BenchmarkDowndrag(b *testing.B) {
	d := 0.5
	dd := Downdrag{Load: 1e6, EA: units.Force(30e9 * math.Pi / 4 * d * d), Diameter: units.Length(d),
		Tip:    TipSpring{Area: units.Circle(units.Length(d)), Qp: 5e6, Curve: APITip()},
		Ground: []SettlementPoint{{0, 0.2}, {15, 0}}}
	for i := range 10 {
		dd.Rows = append(dd.Rows, ShaftRow{Top: units.Length(3 * i), Bottom: units.Length(3 * (i + 1)), Perimeter: units.Length(math.Pi * d),
			FsTop: units.Stress(5e3 * float64(i+1)), FsBottom: units.Stress(5e3 * float64(i+2))})
	}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := dd.Solve(); err != nil {
			b.Fatal(err)
		}
	}
}

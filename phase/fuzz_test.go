package phase

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/units"
)

// FuzzSolve feeds arbitrary inputs (seeds invented) to Solve: it must never
// panic, and a state returned without error must be finite and satisfy
// Se = wGs (closed form).
func FuzzSolve(f *testing.F) {
	f.Add(2.7, 0.6, 0.0, 0.1, 0.0, 0.0, 0.0, 0.0, 0.0)
	f.Add(0.0, 0.0, 0.0, 0.12, 0.0, 19.5, 0.0, 0.0, 0.0)
	f.Add(0.0, 0.0, 0.4, 0.0, 0.9, 0.0, 16.0, 0.0, 0.0)
	f.Add(2.65, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 20.0, 10.0)
	f.Fuzz(func(t *testing.T, gs, e, n, w, s, g, gd, gsat, gsub float64) {
		k := float64(units.KilonewtonPerCubicMetre)
		st, err := Solve(Input{Gs: gs, E: e, N: n, W: w, S: s, Gamma: units.UnitWeight(g * k),
			GammaD: units.UnitWeight(gd * k), GammaSat: units.UnitWeight(gsat * k), GammaSub: units.UnitWeight(gsub * k)})
		if err != nil {
			return
		}
		for _, v := range []float64{st.Gs, st.E, st.N, st.W, st.S, float64(st.Gamma), float64(st.GammaD),
			float64(st.GammaSat), float64(st.GammaSub)} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				t.Fatalf("non-finite state %+v", st)
			}
		}
		if math.Abs(st.S*st.E-st.W*st.Gs) > 1e-9*math.Max(1, st.W*st.Gs) {
			t.Fatalf("Se = %v but wGs = %v in %+v", st.S*st.E, st.W*st.Gs, st)
		}
	})
}

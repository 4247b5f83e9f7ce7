package pile

import (
	"testing"

	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// TestPropTensionFactorsBound: with any drained and undrained tension
// factors in (0, 1], the shaft resistance in tension lies between the
// smaller factor times the compression shaft and the compression shaft
// itself (closed section, one perimeter), and the design tension under
// any case equals Σ f·t·Rs,i + Weight·W′ ≤ Rs + W′ (closed form reasoning).
func TestPropTensionFactorsBound(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		td := rapid.Float64Range(0.01, 1).Draw(r, "drained")
		tu := rapid.Float64Range(0.01, 1).Draw(r, "undrained")
		fs := rapid.Float64Range(0.01, 1).Draw(r, "phi")
		w := rapid.Float64Range(0, 1).Draw(r, "weight")
		l := rapid.Float64Range(2, 25).Draw(r, "length")
		prof, err := profile.New(profile.Spec{WaterDepth: 2 * m, WaterUnitWeight: 9.81 * kNm, Layers: []profile.LayerSpec{
			{Name: "sand", Thickness: 5 * m, Drainage: profile.Drained, Phi: 32 * deg, UnitWeight: 18 * kNm, SaturatedUnitWeight: 20 * kNm},
			{Name: "clay", Thickness: 10 * m, Drainage: profile.Undrained, Su: 40 * kPa, UnitWeight: 18 * kNm, SaturatedUnitWeight: 18 * kNm},
			{Name: "sand 2", Thickness: 15 * m, Drainage: profile.Drained, Phi: 36 * deg, UnitWeight: 19 * kNm, SaturatedUnitWeight: 20 * kNm},
		}})
		if err != nil {
			r.Fatal(err)
		}
		p := Pile{Section: Section{Shape: Circle, Diameter: 0.6 * m}, Length: units.Length(l), Installation: Bored,
			UnitWeight: 24 * kNm}
		ms := Methods{Tension: TensionFactor{Name: "given", Drained: td, Undrained: tu}}
		cs := Case{Name: "x", Tip: map[string]float64{"": 1}, Shaft: map[string]float64{"": 1},
			Tension: map[string]float64{"": fs}, Permanent: 1, Variable: 1, Weight: w, TanPhi: 1, Su: 1}
		a, err := NewAnalysis(prof, p, ms, &Options{Case: &cs})
		if err != nil {
			r.Fatal(err)
		}
		c, err := a.Capacity()
		if err != nil {
			r.Fatal(err)
		}
		lo := min(td, tu) * float64(c.Shaft)
		if float64(c.TensionShaft) < lo*(1-1e-9) || float64(c.TensionShaft) > float64(c.Shaft)*(1+1e-9) {
			r.Fatalf("Rs,t %g N outside [%g, %g] N", float64(c.TensionShaft), lo, float64(c.Shaft))
		}
		want := fs*float64(c.TensionShaft) + w*float64(c.Weight)
		if !relClose(float64(c.DesignTension), want, 1e-9) {
			r.Fatalf("Rt,d %g N, want f·Rs,t + w·W′ = %g N", float64(c.DesignTension), want)
		}
	})
}

package pile

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
)

// apiShim is the API α behind another type, so that quad takes its
// general path (the method called through the interface).
type apiShim struct{ shaft.AlphaAPI }

// TestQuadAlphaAPIWrittenOut: quad's written-out API α gives the same
// bits, flags and errors as calling the method, on random segments of a
// clay whose su varies (a scenario of our own: su from 5 to 400 kPa over
// 30 m), including σ′v near zero, ψ on both branches, α at its bound and
// σ′v outside the method's range.
func TestQuadAlphaAPIWrittenOut(t *testing.T) {
	prof := mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "clay", Thickness: 30 * m, Drainage: profile.Undrained, SuTop: 5 * kPa, SuBottom: 400 * kPa, UnitWeight: 18 * kNm},
	}})
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Length: 25 * m, Installation: DrivenHigh}
	a, err := NewAnalysis(prof, p, Methods{ShaftUndrained: shaft.AlphaAPI{}}, nil)
	if err != nil {
		t.Fatal(err)
	}
	lp := &a.plans[0]
	if lp.kind != kindGeneral {
		t.Fatalf("kind %d, want the general kind (su varies)", lp.kind)
	}
	shim := *lp
	shim.shaft = apiShim{}
	r := rand.New(rand.NewPCG(1, 2))
	bound, branches := 0, [2]int{}
	for k := range 20000 {
		z0 := r.Float64() * 29
		z1 := z0 + r.Float64()*(30-z0)
		s0 := r.Float64() * 600e3
		s1 := r.Float64() * 600e3
		switch k % 10 {
		case 0:
			s0 = 0 // the surface: σ′v = 0 at one end
		case 1:
			s1 = 25e6 // beyond the method's range of σ′v
		case 2:
			s0, s1 = r.Float64()*1e3, r.Float64()*2e3 // ψ large: α at its bound
		}
		got, gfl, gerr := a.quad(lp, z0, z1, s0, s1, 0)
		want, wfl, werr := a.quad(&shim, z0, z1, s0, s1, 0)
		if math.Float64bits(got) != math.Float64bits(want) || gfl != wfl || (gerr == nil) != (werr == nil) ||
			gerr != nil && gerr.Error() != werr.Error() {
			t.Fatalf("z %v to %v, σ′v %v to %v: written out %v %v %v, method %v %v %v", z0, z1, s0, s1, got, gfl, gerr, want, wfl, werr)
		}
		if gerr == nil {
			if gfl&BoundApplied != 0 {
				bound++
			}
			branches[min(k%10, 1)]++
		}
	}
	if bound == 0 || branches[0] == 0 || branches[1] == 0 {
		t.Errorf("the draws did not reach every case: bound %d, %v", bound, branches)
	}
}

package pile

import (
	"math"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
	"pgregory.net/rapid"
)

// The properties below hold by construction of the method (closed form
// reasoning), not by any published number.

// relClose reports |a − b| ≤ rel·max(|a|, |b|) (or both tiny).
func relClose(a, b, rel float64) bool {
	return math.Abs(a-b) <= rel*math.Max(math.Abs(a), math.Abs(b))+1e-9
}

// TestPropLongerNeverWeaker: in a uniform drained profile with no critical
// depth and no shaft limit, compression capacity never falls as the pile
// lengthens.
func TestPropLongerNeverWeaker(t *testing.T) {
	rapid.Check(t, func(r *rapid.T) {
		phi := rapid.Float64Range(20, 44).Draw(r, "phi")
		gamma := rapid.Float64Range(15, 21).Draw(r, "gamma")
		zw := rapid.Float64Range(0, 40).Draw(r, "water")
		d := rapid.Float64Range(0.2, 1.5).Draw(r, "d")
		l1 := rapid.Float64Range(2, 38).Draw(r, "l1")
		l2 := rapid.Float64Range(l1, 39).Draw(r, "l2")
		prof, err := profile.New(profile.Spec{WaterDepth: units.Length(zw), Layers: []profile.LayerSpec{{
			Name: "sand", Thickness: 40 * m, Drainage: profile.Drained, Phi: units.Angle(phi) * deg,
			UnitWeight: units.UnitWeight(gamma) * kNm, SaturatedUnitWeight: units.UnitWeight(gamma+2) * kNm}}})
		if err != nil {
			r.Fatal(err)
		}
		p := Pile{Section: Section{Shape: Circle, Diameter: units.Length(d)}, Installation: DrivenHigh}
		var caps [2]float64
		for i, l := range []float64{l1, l2} {
			p.Length = units.Length(l)
			a, err := NewAnalysis(prof, p, DefaultMethods(), nil)
			if err != nil {
				r.Fatal(err)
			}
			c, err := a.Capacity()
			if err != nil {
				r.Fatal(err)
			}
			caps[i] = float64(c.Compression)
		}
		if caps[1] < caps[0]*(1-1e-12) {
			r.Fatalf("capacity fell from %g N at %g m to %g N at %g m", caps[0], l1, caps[1], l2)
		}
	})
}

// layered returns a three-layer profile (sand over clay over sand), with
// every length, stress and unit weight multiplied by the given unit
// constants so that the same ground can be entered in SI or US units.
type unitSet struct {
	L units.Length
	S units.Stress
	G units.UnitWeight
}

var (
	siUnits = unitSet{L: units.Metre, S: units.Kilopascal, G: units.KilonewtonPerCubicMetre}
	usUnits = unitSet{L: units.Foot, S: units.PSF, G: units.PCF}
)

// in converts an SI count (m, kPa, kN/m³) to the count in u, then back to
// a quantity through u's constant: the way a user entering US numbers
// would build the same ground.
func (u unitSet) len(v float64) units.Length { return units.Length(v*1/float64(u.L)) * u.L }
func (u unitSet) str(v float64) units.Stress {
	return units.Stress(v*1e3/float64(u.S)) * u.S
}
func (u unitSet) gam(v float64) units.UnitWeight {
	return units.UnitWeight(v*1e3/float64(u.G)) * u.G
}

func layeredSpec(u unitSet, split bool) profile.Spec {
	clay := []profile.LayerSpec{{Name: "clay", Thickness: u.len(8), Drainage: profile.Undrained,
		SuTop: u.str(25), SuBottom: u.str(60), UnitWeight: u.gam(17.5), SaturatedUnitWeight: u.gam(17.5)}}
	if split {
		clay = []profile.LayerSpec{
			{Name: "clay a", Thickness: u.len(4), Drainage: profile.Undrained, SuTop: u.str(25), SuBottom: u.str(42.5),
				UnitWeight: u.gam(17.5), SaturatedUnitWeight: u.gam(17.5)},
			{Name: "clay b", Thickness: u.len(4), Drainage: profile.Undrained, SuTop: u.str(42.5), SuBottom: u.str(60),
				UnitWeight: u.gam(17.5), SaturatedUnitWeight: u.gam(17.5)},
		}
	}
	layers := []profile.LayerSpec{{Name: "fill", Thickness: u.len(3), Drainage: profile.Drained, Phi: 30 * deg, Ir: 50,
		UnitWeight: u.gam(18), SaturatedUnitWeight: u.gam(20)}}
	layers = append(layers, clay...)
	layers = append(layers, profile.LayerSpec{Name: "dense sand", Thickness: u.len(20), Drainage: profile.Drained,
		Phi: 36 * deg, UnitWeight: u.gam(19), SaturatedUnitWeight: u.gam(20.5), Ir: 80})
	return profile.Spec{WaterDepth: u.len(2), WaterUnitWeight: u.gam(9.81), Layers: layers}
}

func layeredPile(u unitSet) Pile {
	return Pile{Section: Section{Shape: Circle, Diameter: u.len(0.6)}, Length: u.len(20), Installation: Bored,
		UnitWeight: u.gam(24)}
}

var propertyMethods = []struct {
	name string
	m    Methods
	rel  float64 // closed-form paths agree to rounding; quadrature to its tolerance
}{
	{"default (β, α-drilled, Meyerhof)", DefaultMethods(), 1e-9},
	{"vesic and α-API", Methods{TipDrained: bearing.Vesic{}, ShaftUndrained: shaft.AlphaAPI{}, LayeredTip: true}, 1e-6},
	{"λ", Methods{UndrainedLambda: true, LayeredTip: true}, 1e-9},
	{"critical depth", Methods{CriticalDepth: 15, LayeredTip: true}, 1e-9},
}

// TestSameInUSUnits: the same ground and pile entered in feet, psf and pcf
// give the same capacities within 1e-9 (quadrature paths within their
// tolerance).
func TestSameInUSUnits(t *testing.T) {
	for _, pm := range propertyMethods {
		var caps [2]Capacity
		for i, u := range []unitSet{siUnits, usUnits} {
			prof := mustProfile(t, layeredSpec(u, false))
			caps[i] = mustCapacity(t, prof, layeredPile(u), pm.m)
		}
		for _, f := range []struct {
			n    string
			a, b units.Force
		}{{"tip", caps[0].Tip, caps[1].Tip}, {"shaft", caps[0].Shaft, caps[1].Shaft}, {"tension", caps[0].Tension, caps[1].Tension}} {
			if !relClose(float64(f.a), float64(f.b), pm.rel) {
				t.Errorf("%s: %s SI %v, US %v", pm.name, f.n, f.a, f.b)
			}
		}
	}
}

// TestSplitLayerChangesNothing: splitting the clay into two identical
// halves (su continuous across the split) changes no force.
func TestSplitLayerChangesNothing(t *testing.T) {
	for _, pm := range propertyMethods {
		var caps [2]Capacity
		for i, split := range []bool{false, true} {
			prof := mustProfile(t, layeredSpec(siUnits, split))
			ms := pm.m
			caps[i] = mustCapacity(t, prof, layeredPile(siUnits), ms)
		}
		if !relClose(float64(caps[0].Shaft), float64(caps[1].Shaft), pm.rel) ||
			!relClose(float64(caps[0].Tip), float64(caps[1].Tip), 1e-12) ||
			!relClose(float64(caps[0].Weight), float64(caps[1].Weight), 1e-12) {
			t.Errorf("%s: whole %+v, split %+v", pm.name, caps[0], caps[1])
		}
	}
}

// TestWithDepthMatchesSingleRuns: the one-pass capacity with depth equals
// a separate analysis at each depth.
func TestWithDepthMatchesSingleRuns(t *testing.T) {
	prof := mustProfile(t, layeredSpec(siUnits, false))
	for _, pm := range propertyMethods {
		p := layeredPile(siUnits)
		p.Length = 30 * m
		a, err := NewAnalysis(prof, p, pm.m, nil)
		if err != nil {
			t.Fatal(err)
		}
		rows, err := a.WithDepth(DepthGrid{From: 0.5 * m, To: 30 * m, Step: 0.25 * m}, nil)
		if err != nil {
			t.Fatal(err)
		}
		if len(rows) != 119 {
			t.Fatalf("%s: %d rows, want 119", pm.name, len(rows))
		}
		for _, r := range rows {
			single, err := a.CapacityAt(r.TipDepth)
			if err != nil {
				t.Fatal(err)
			}
			if !relClose(float64(r.Compression), float64(single.Compression), pm.rel) ||
				!relClose(float64(r.Tension), float64(single.Tension), pm.rel) {
				t.Errorf("%s at %v: with depth %v / %v, single %v / %v", pm.name, r.TipDepth,
					r.Compression, r.Tension, single.Compression, single.Tension)
			}
		}
	}
}

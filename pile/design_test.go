package pile

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// TestEN1997Tables checks the partial factors against EN 1997-1:2004
// Annex A as reproduced in Tomlinson & Woodward (2008), Pile Design and
// Construction Practice, 5th ed., Tables 4.3-4.5 (read): driven γb = γs =
// 1.0/1.1/1.0/1.3; bored γb 1.25/1.1/1.0/1.6, γs 1.0/1.1/1.0/1.3; CFA γb
// 1.1/1.1/1.0/1.45; γs,t 1.25/1.15/1.1/1.6; Table A.3 γG 1.35 (A1), 1.0
// (A2), γQ 1.5, 1.3; Table A.4 M2 γφ′ 1.25, γcu 1.4.
func TestEN1997Tables(t *testing.T) {
	cases := []struct {
		inst                Installation
		ap                  Approach
		name                string
		gb, gs, gst, gG, gQ float64
		tanPhi, su          float64
	}{
		{DrivenHigh, DA1, "DA1-1", 1.0, 1.0, 1.25, 1.35, 1.5, 1, 1},
		{DrivenHigh, DA2, "DA2", 1.1, 1.1, 1.15, 1.35, 1.5, 1, 1},
		{Bored, DA1, "DA1-2", 1.6, 1.3, 1.6, 1.0, 1.3, 1, 1},
		{Augered, DA1, "DA1-2", 1.45, 1.3, 1.6, 1.0, 1.3, 1, 1},
		{Bored, DA3, "DA3", 1.0, 1.0, 1.1, 1.35, 1.5, 1.25, 1.4},
	}
	for _, c := range cases {
		cs, err := Eurocode7{Approach: c.ap}.Cases(c.inst)
		if err != nil {
			t.Fatal(err)
		}
		var got *Case
		for i := range cs {
			if cs[i].Name == c.name {
				got = &cs[i]
			}
		}
		if got == nil {
			t.Fatalf("%v %v: no case %s", c.inst, c.ap, c.name)
		}
		// One ground profile: ξ3 = 1.40 (Table A.10) divides too.
		xi := 1.0
		for _, f := range []struct {
			n         string
			got, want float64
		}{
			{"tip", got.Tip[""], 1 / (xi * c.gb)}, {"shaft", got.Shaft[""], 1 / (xi * c.gs)},
			{"tension", got.Tension[""], 1 / (xi * c.gst)}, {"γG", got.Permanent, c.gG}, {"γQ", got.Variable, c.gQ},
			{"γφ", got.TanPhi, c.tanPhi}, {"γcu", got.Su, c.su},
		} {
			if math.Abs(f.got-f.want) > 1e-12 {
				t.Errorf("%v %s %s: %g, want %g", c.inst, c.name, f.n, f.got, f.want)
			}
		}
	}
	// With one ground profile, ξ3 = ξ4 = 1.40 divides the resistance.
	cs, _ := Eurocode7{Approach: DA2, Profiles: 1}.Cases(DrivenHigh)
	if want := 1 / (1.40 * 1.1); math.Abs(cs[0].Tip[""]-want) > 1e-12 {
		t.Errorf("DA2 with one profile: tip multiplier %g, want %g", cs[0].Tip[""], want)
	}
}

// TestEN1997Characteristic checks EN 1997-1 eq. 7.8 with Table A.10 against
// Tomlinson & Woodward (2008), 5th ed., Example 4.5: four CPT profiles give
// 6.82, 8.17, 8.65 and 9.07 MN; ξ3 = 1.31, ξ4 = 1.20; mean/ξ3 = 6.24 MN,
// min/ξ4 = 5.68 MN, so Rc,k = 5.68 MN.
func TestEN1997Characteristic(t *testing.T) {
	mn := units.Meganewton
	rk, err := Characteristic([]units.Force{6.82 * mn, 8.17 * mn, 8.65 * mn, 9.07 * mn})
	if err != nil {
		t.Fatal(err)
	}
	near(t, "Rc,k (Tomlinson & Woodward Ex. 4.5)", rk.MN(), 5.68, 0.001)
	x3, x4, _ := Xi(4)
	if x3 != 1.31 || x4 != 1.20 {
		t.Errorf("ξ(4) = %g, %g; want 1.31, 1.20 (EN 1997-1 Table A.10)", x3, x4)
	}
	if _, err := Characteristic(nil); err == nil {
		t.Error("no profiles accepted")
	}
}

// TestEN1997WorkedChecks checks the design values of two published worked
// examples, using the total factor γt on a characteristic resistance:
//   - Tomlinson & Woodward (2008), 5th ed., Example 4.3 (bored pile in
//     clay, DA1): Gk = 1100 kN, Qk = 300 kN; combination 1 Fd = 1935 kN,
//     combination 2 Fd = 1490 kN; Rc,k = 2678 kN, combination 1
//     Rc,d = 2678/1.15 = 2329 kN.
//   - Bond & Harris (2008), Decoding Eurocode 7, ch. 13 (bored pile,
//     Rc,k = 4271 kN): DA1-2 Rc,d = 4271/1.5 = 2847 kN; DA2 Rc,d =
//     4271/1.1 = 3882 kN with Fc,d = 1.35·1500 + 1.5·700 = 3075 kN.
func TestEN1997WorkedChecks(t *testing.T) {
	rd := func(ap Approach, name string, rk float64) (Case, float64) {
		cs, err := Eurocode7{Approach: ap, Total: true}.Cases(Bored)
		if err != nil {
			t.Fatal(err)
		}
		for _, c := range cs {
			if c.Name == name {
				return c, rk * c.Shaft[""]
			}
		}
		t.Fatalf("no case %s", name)
		return Case{}, 0
	}
	c1, r1 := rd(DA1, "DA1-1", 2678)
	near(t, "Rc,d DA1-1 (Tomlinson Ex. 4.3)", r1, 2329, 0.001)
	v := Verify(Capacity{DesignCompression: units.Force(r1) * kN}, c1,
		Loads{Compression: Action{Permanent: 1100 * kN, Variable: 300 * kN}})
	near(t, "Fd DA1-1 (Tomlinson Ex. 4.3)", v.CompressionEd.KN(), 1935, 1e-9)
	if !v.Pass {
		t.Error("Tomlinson Ex. 4.3 passes DA1-1")
	}
	c2, _ := rd(DA1, "DA1-2", 2678)
	v = Verify(Capacity{}, c2, Loads{Compression: Action{Permanent: 1100 * kN, Variable: 300 * kN}})
	near(t, "Fd DA1-2 (Tomlinson Ex. 4.3)", v.CompressionEd.KN(), 1490, 1e-9)

	_, r := rd(DA1, "DA1-2", 4271)
	near(t, "Rc,d DA1-2 (Bond & Harris ch. 13)", r, 2847, 0.001)
	c, r := rd(DA2, "DA2", 4271)
	near(t, "Rc,d DA2 (Bond & Harris ch. 13)", r, 3882, 0.001)
	v = Verify(Capacity{DesignCompression: units.Force(r) * kN}, c, Loads{Compression: Action{Permanent: 1500 * kN, Variable: 700 * kN}})
	near(t, "Fc,d DA2 (Bond & Harris ch. 13)", v.CompressionEd.KN(), 3075, 1e-9)
	near(t, "utilisation DA2", v.CompressionUse, 3075.0/3882, 0.001)
}

// gec10Pier2 is the drilled shaft of FHWA GEC 10 (Brown et al. 2018,
// FHWA-NHI-18-024), Appendix A, Pier 2, Strength I with design scour (read
// through a text extraction of the manual): an 8 ft shaft through sand
// and clay below the scoured mudline. Layer thicknesses, φ′, σ′p, N60 and
// su(CIUC) are the manual's (Table A-4); the manual gives σ′v at the
// middle of each sand layer after scour (845, 2266, 3844, 8266 psf), and
// the effective unit weights here are chosen so that the profile
// reproduces those four values (the clay layers, whose σ′v the manual does
// not list, take the same unit weight as the sand below them).
func gec10Pier2(t *testing.T) (*profile.Profile, Pile, Methods) {
	gw := 62.4 * pcf
	sand := func(name string, th, phiDeg, gamma float64) profile.LayerSpec {
		return profile.LayerSpec{Name: name, Thickness: units.Length(th) * ft, Drainage: profile.Drained,
			Phi: units.Angle(phiDeg) * deg, SaturatedUnitWeight: units.UnitWeight(gamma)*pcf + gw, N60: 41}
	}
	clay := func(name string, th, su, gamma float64) profile.LayerSpec {
		return profile.LayerSpec{Name: name, Thickness: units.Length(th) * ft, Drainage: profile.Undrained,
			Su: units.Stress(su) * psf, SaturatedUnitWeight: units.UnitWeight(gamma)*pcf + gw}
	}
	g2 := 845.0 / 13.5
	g3 := (2266 - 27*g2) / 10
	g45 := (3844 - 27*g2 - 20*g3) / 20
	g67 := (8266 - 27*g2 - 20*g3 - 15*g45 - 10*g45) / (80.5 + 10.5/2)
	prof := mustProfile(t, profile.Spec{WaterDepth: -20 * ft, WaterUnitWeight: gw, Layers: []profile.LayerSpec{
		sand("sand 2", 27, 44, g2), sand("sand 3", 20, 40, g3), clay("clay 4", 15, 2057, g45),
		sand("sand 5", 10, 40, g45), clay("clay 6", 80.5, 2523, g67), sand("sand 7", 22, 39, g67),
	}})
	pile := Pile{Section: Section{Shape: Circle, Diameter: 8 * ft}, Length: 163 * ft, Installation: Bored}
	// β = K0·tanφ′ with δ = φ′ and K0 = (1 − sinφ′)·OCR^sinφ′ (Mayne &
	// Kulhawy 1982), OCR = σ′p/σ′v before scour as the manual computes it
	// (layer 7: σ′p < σ′v, taken as 1.0 as the manual does).
	ocr := []float64{13263.0 / 2817, 7654.0 / 4645, 0, 8539.0 / 6223, 0, 1}
	// α = 0.30 + 0.17/(su/pa), pa = 2116 psf, as the manual computes it.
	alpha := func(su float64) float64 { return 0.30 + 0.17/(su/2116) }
	beta := func(i int) shaft.Unit {
		return shaft.Beta{K: shaft.KGiven{K: k0(prof.Layer(i).Phi, ocr[i])}, Delta: shaft.DeltaOverPhi{Ratio: 1}}
	}
	ms := Methods{Layers: []LayerMethods{
		{Shaft: beta(0)}, {Shaft: beta(1)}, {Shaft: shaft.AlphaGiven{Alpha: alpha(2057)}},
		{Shaft: beta(3)}, {Shaft: shaft.AlphaGiven{Alpha: alpha(2523)}},
		{Shaft: beta(5), Tip: bearing.ShaftSand{}},
	}}
	return prof, pile, ms
}

// k0 is (1 − sinφ′)·OCR^sinφ′ (Mayne & Kulhawy 1982), closed form.
func k0(phi units.Angle, ocr float64) float64 {
	s := phi.Sin()
	return (1 - s) * math.Pow(ocr, s)
}

// TestGEC10DrilledShaftLRFD runs FHWA GEC 10 (2018) Appendix A, Pier 2,
// Strength I, through the analysis and the AASHTO drilled-shaft factors:
// nominal side resistance of the sand layers 496,072 + 470,684 + 354,897 +
// 654,807 lb, of the clay layers 368,124 + 2,258,442 lb, base 2,473,062 lb
// (qBN = 0.6·N60 = 24.6 tsf); factored φs = 0.55 (sand), 0.45 (clay),
// φB = 0.50: 1,087,053 + 1,181,955 + 1,236,531 = 3,505,539 lb, against the
// factored Strength I demand of 3,389.47 kips, which passes. The manual
// rounds intermediate values, so per-layer values are checked within 1 %,
// and so is the total.
func TestGEC10DrilledShaftLRFD(t *testing.T) {
	prof, pile, ms := gec10Pier2(t)
	a, err := NewAnalysis(prof, pile, ms, nil)
	if err != nil {
		t.Fatal(err)
	}
	b, err := a.Breakdown()
	if err != nil {
		t.Fatal(err)
	}
	want := []float64{496072, 470684, 368124, 354897, 2258442, 654807}
	if len(b.Rows) != len(want) {
		t.Fatalf("%d shaft rows, want %d", len(b.Rows), len(want))
	}
	lbf := units.PoundForce
	for i, w := range want {
		near(t, "RSN "+b.Rows[i].LayerName+" (GEC 10 Table A-4)", float64(b.Rows[i].Force/lbf), w, 0.01)
	}
	near(t, "RBN (GEC 10 Table A-4)", float64(b.Tip.Force/lbf), 2473062, 0.01)

	l := AASHTODrilledShafts()
	// The manual's demand is already factored: load factors of 1.
	l.Permanent, l.Variable = 1, 1
	// The β and α here are given (K0 and the 2018 α worked by hand as the
	// manual does), so the engineer declares them the table's β-method
	// and α-method: side in sand 0.55, side in clay 0.45 (uplift 0.45 and
	// 0.35, not used by this compression check). The tip in sand is the
	// preset's own method, drilled-n60-sand (0.50).
	l.Shaft["beta"], l.Shaft["alpha-given"] = 0.55, 0.45
	l.Tension["beta"], l.Tension["alpha-given"] = 0.45, 0.35
	d, err := Check(prof, pile, ms, l, Loads{Compression: Action{Permanent: 3389.47 * kip}})
	if err != nil {
		t.Fatal(err)
	}
	v := d.Cases[0]
	near(t, "ΣφR (GEC 10 Table A-4)", float64(v.CompressionRd/lbf), 3505539, 0.01)
	if !d.Pass || v.CompressionUse > 1 {
		t.Errorf("GEC 10 Pier 2 passes Strength I; got use %.3f", v.CompressionUse)
	}
}

// TestSafetyFactorClosedForm: Rd = Rb/Fb + Rs/Fs (closed form).
func TestSafetyFactorClosedForm(t *testing.T) {
	cs, err := SafetyFactor{Tip: 3, Shaft: 2}.Cases(Bored)
	if err != nil {
		t.Fatal(err)
	}
	prof, p := dasClay(t)
	a, err := NewAnalysis(prof, p, Methods{}, &Options{Case: &cs[0]})
	if err != nil {
		t.Fatal(err)
	}
	c, err := a.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	near(t, "Rd", float64(c.DesignCompression), float64(c.Tip)/3+float64(c.Shaft)/2, 1e-12)
	if _, err := (SafetyFactor{Global: 2.5, Tip: 3}).Cases(Bored); err == nil {
		t.Error("global and separate factors both accepted")
	}
	if _, err := (SafetyFactor{Global: 0.8}).Cases(Bored); err == nil {
		t.Error("a factor of safety below 1 accepted")
	}
}

// TestMissingFactorIsAnError: an LRFD basis without a factor for a method
// in use refuses with a *MissingFactorError naming the method, the kind
// and the calc-file key; it never takes φ = 0. The AASHTO driven-pile table
// has no row for the β method in sand nor for Meyerhof's tip.
func TestMissingFactorIsAnError(t *testing.T) {
	prof := mustProfile(t, profile.Spec{NoWater: true, Layers: []profile.LayerSpec{
		{Name: "sand", Thickness: 30 * m, Drainage: profile.Drained, Phi: 34 * deg, UnitWeight: 19 * kNm},
	}})
	p := Pile{Section: Section{Shape: Circle, Diameter: 0.5 * m}, Length: 12 * m, Installation: DrivenHigh}
	loads := Loads{Compression: Action{Permanent: 100 * kN}}
	cases := []struct {
		name   string
		edit   func(l *LRFD)
		kind   Resistance
		method string
		key    string
	}{
		{"shaft", func(*LRFD) {}, ShaftResistance, "beta", "design.shaft.beta"},
		{"uplift", func(l *LRFD) { l.Shaft["beta"] = 0.3 }, TensionResistance, "beta", "design.uplift.beta"},
		{"tip", func(l *LRFD) { l.Shaft["beta"], l.Tension["beta"] = 0.3, 0.2 }, TipResistance, "meyerhof", "design.tip.meyerhof"},
	}
	for _, c := range cases {
		l := AASHTODrivenPiles()
		c.edit(&l)
		_, err := Check(prof, p, Methods{}, l, loads)
		var me *MissingFactorError
		if !errors.As(err, &me) {
			t.Fatalf("%s: %v is not a *MissingFactorError", c.name, err)
		}
		if me.Kind != c.kind || me.Method != c.method || me.Key() != c.key || me.Layer != 0 || me.Case != "aashto-driven" {
			t.Errorf("%s: %+v, key %s", c.name, *me, me.Key())
		}
		if !strings.Contains(err.Error(), `"`+c.method+`"`) || !strings.Contains(err.Error(), c.key) {
			t.Errorf("%s: message %q names neither the method nor the key", c.name, err)
		}
	}
}

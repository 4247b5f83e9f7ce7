package pile

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// caseOf returns the single case of an LRFD basis for inst.
func caseOf(t *testing.T, l LRFD, inst Installation) Case {
	t.Helper()
	cs, err := l.Cases(inst)
	if err != nil {
		t.Fatal(err)
	}
	if len(cs) != 1 {
		t.Fatalf("%d cases, want 1", len(cs))
	}
	return cs[0]
}

// TestAASHTODrivenTable checks every factor of the driven-pile preset
// against AASHTO LRFD Table 10.5.5.2.3-1 as we recall it (from memory: the
// table, and its reproduction in FHWA GEC 12, could not be read here):
// static analysis, skin friction and end bearing in clay and mixed soils,
// α-method (Tomlinson 1987; Skempton 1951) 0.35, β-method (Esrig & Kirby
// 1979; Skempton 1951) 0.25, λ-method (Vijayvergiya & Focht 1972;
// Skempton 1951) 0.40; uplift α 0.25, β 0.20, λ 0.30. The end bearing in
// clay takes the factor of the shaft method it is paired with, and the β
// of the table is a clay β: a β in sand, Meyerhof's tip and the drilled
// α have no factor.
func TestAASHTODrivenTable(t *testing.T) {
	cs := caseOf(t, AASHTODrivenPiles(), DrivenHigh)
	u, d := profile.Undrained, profile.Drained
	cases := []struct {
		kind         Resistance
		method, with string
		cls          profile.Drainage
		want         float64 // 0: no factor
	}{
		{ShaftResistance, "alpha-api", "", u, 0.35},
		{ShaftResistance, "alpha-chart", "", u, 0.35},
		{ShaftResistance, "alpha-given", "", u, 0.35},
		{TipResistance, "nc9", "alpha-api", u, 0.35},
		{TipResistance, "nc9", "alpha-given", u, 0.35},
		{ShaftResistance, "beta-burland", "", u, 0.25},
		{ShaftResistance, "beta", "", u, 0.25},
		{TipResistance, "nc9", "beta-burland", u, 0.25},
		{ShaftResistance, "lambda", "", u, 0.40},
		{TipResistance, "nc9", "lambda", u, 0.40},
		{TensionResistance, "alpha-api", "", u, 0.25},
		{TensionResistance, "beta-burland", "", u, 0.20},
		{TensionResistance, "lambda", "", u, 0.30},
		{ShaftResistance, "beta", "", d, 0},
		{TensionResistance, "beta", "", d, 0},
		{TipResistance, "meyerhof", "beta", d, 0},
		{TipResistance, "nc9", "alpha-drilled", u, 0},
		{ShaftResistance, "alpha-drilled", "", u, 0},
	}
	for _, c := range cases {
		got, ok := cs.lookup(c.kind, c.method, c.with, c.cls)
		if c.want == 0 {
			if ok {
				t.Errorf("%s %s (with %q, %s): %g, want no factor", c.kind, c.method, c.with, c.cls, got)
			}
			continue
		}
		if !ok || got != c.want {
			t.Errorf("%s %s (with %q, %s): %g (%v), want %g", c.kind, c.method, c.with, c.cls, got, ok, c.want)
		}
	}
	// Strength I: DC 1.25, LL 1.75; the DC minimum 0.90 on the pile's
	// weight in uplift (AASHTO Tables 3.4.1-1 and 3.4.1-2, from memory).
	if cs.Permanent != 1.25 || cs.Variable != 1.75 || cs.Weight != 0.90 {
		t.Errorf("load factors %g, %g, weight %g; want 1.25, 1.75, 0.90", cs.Permanent, cs.Variable, cs.Weight)
	}
	if _, err := AASHTODrivenPiles().Cases(Bored); err == nil {
		t.Error("the driven-pile table accepted a bored pile")
	}
}

// TestAASHTODrilledTable checks the drilled-shaft preset against AASHTO
// LRFD Table 10.5.5.2.4-1: side in sand 0.55, side in clay 0.45, tip in
// sand 0.50 as FHWA GEC 10 (Brown et al. 2018, Appendix A, Table A-4)
// applies them (read); tip in clay 0.40, uplift in clay 0.35 and in sand
// 0.45 from memory.
func TestAASHTODrilledTable(t *testing.T) {
	cs := caseOf(t, AASHTODrilledShafts(), Bored)
	u, d := profile.Undrained, profile.Drained
	cases := []struct {
		kind   Resistance
		method string
		cls    profile.Drainage
		want   float64
	}{
		{ShaftResistance, "alpha-drilled", u, 0.45},
		{TipResistance, "nc9", u, 0.40},
		{ShaftResistance, "beta-drilled-sand", d, 0.55},
		{ShaftResistance, "beta-drilled-k0", d, 0.55},
		{TipResistance, "drilled-n60-sand", d, 0.50},
		{TensionResistance, "alpha-drilled", u, 0.35},
		{TensionResistance, "beta-drilled-sand", d, 0.45},
		{TensionResistance, "beta-drilled-k0", d, 0.45},
		{ShaftResistance, "alpha-api", u, 0},
		{TipResistance, "meyerhof", d, 0},
		{ShaftResistance, "beta", d, 0},
		{ShaftResistance, "beta-drilled-sand", u, 0},
	}
	for _, c := range cases {
		got, ok := cs.lookup(c.kind, c.method, "", c.cls)
		if c.want == 0 {
			if ok {
				t.Errorf("%s %s (%s): %g, want no factor", c.kind, c.method, c.cls, got)
			}
			continue
		}
		if !ok || got != c.want {
			t.Errorf("%s %s (%s): %g (%v), want %g", c.kind, c.method, c.cls, got, ok, c.want)
		}
	}
	if _, err := AASHTODrilledShafts().Cases(DrivenHigh); err == nil {
		t.Error("the drilled-shaft table accepted a driven pile")
	}
}

// TestAASHTODrivenDasExample applies the driven-pile preset to the nominal
// resistances of Das (Principles of Foundation Engineering, 5th/6th ed.),
// Example 11.4 (read: see TestDasClayAlphaLambdaBeta): Qp = 116.55 kN,
// Qs = 2136 kN by α (α given as read from Das's chart), 1727 kN by λ.
// The factored resistance is the table's closed form: φ·(Qp + Qs) with the
// φ of the shaft method (0.35 for α, 0.40 for λ) on both, the end bearing
// being paired with the shaft method. No published LRFD worked example of
// a driven pile could be read here; the factoring itself is the check.
func TestAASHTODrivenDasExample(t *testing.T) {
	prof, p := dasClay(t)
	alpha := Methods{Layers: []LayerMethods{
		{Shaft: shaft.AlphaGiven{Alpha: 0.6}}, {Shaft: shaft.AlphaGiven{Alpha: 0.9}}, {Shaft: shaft.AlphaGiven{Alpha: 0.725}},
	}}
	lambda := Methods{UndrainedLambda: true}
	for _, c := range []struct {
		name    string
		m       Methods
		qs, phi float64
	}{{"α", alpha, 2136, 0.35}, {"λ", lambda, 1727, 0.40}} {
		l := AASHTODrivenPiles()
		l.Permanent, l.Variable = 1, 1
		d, err := Check(prof, p, c.m, l, Loads{Compression: Action{Permanent: 500 * kN}})
		if err != nil {
			t.Fatal(err)
		}
		near(t, "φRn "+c.name+" (Das Ex. 11.4 with AASHTO φ)", d.Cases[0].CompressionRd.KN(), c.phi*(116.55+c.qs), 0.01)
		// The same run against its own characteristic values, exactly.
		near(t, "φRn "+c.name+" closed form", float64(d.Cases[0].CompressionRd), c.phi*float64(d.Characteristic.Compression), 1e-12)
	}
}

// TestPresetWorksWithItsMethods: a preset's own methods (PresetMethods.Fill
// over the defaults) run without a missing factor, in a clay profile for
// the driven-pile table and in sand over clay for the drilled-shaft table,
// and the design resistance is the closed form of the table's factors.
func TestPresetWorksWithItsMethods(t *testing.T) {
	prof, p := dasClay(t)
	l := AASHTODrivenPiles()
	ms, err := l.Calibrated.Fill(DefaultMethods())
	if err != nil {
		t.Fatal(err)
	}
	d, err := Check(prof, p, ms, l, Loads{Compression: Action{Permanent: 100 * kN}})
	if err != nil {
		t.Fatalf("aashto-driven with its own methods: %v", err)
	}
	c := d.Characteristic
	near(t, "φ(Qp+Qs), α-method and Skempton", float64(d.Cases[0].CompressionRd), 0.35*float64(c.Tip+c.Shaft), 1e-12)

	sand := mustProfile(t, profile.Spec{WaterDepth: 2 * m, WaterUnitWeight: 9.81 * kNm, Layers: []profile.LayerSpec{
		{Name: "clay", Thickness: 8 * m, Drainage: profile.Undrained, Su: 60 * kPa, UnitWeight: 18 * kNm, SaturatedUnitWeight: 18 * kNm},
		{Name: "sand", Thickness: 20 * m, Drainage: profile.Drained, Phi: 36 * deg, N60: 30, UnitWeight: 19 * kNm, SaturatedUnitWeight: 20 * kNm},
	}})
	shaftP := Pile{Section: Section{Shape: Circle, Diameter: 1.2 * m}, Length: 18 * m, Installation: Bored}
	ld := AASHTODrilledShafts()
	ms, err = ld.Calibrated.Fill(Methods{})
	if err != nil {
		t.Fatal(err)
	}
	a, err := NewAnalysis(sand, shaftP, ms, nil)
	if err != nil {
		t.Fatal(err)
	}
	b, err := a.Breakdown()
	if err != nil {
		t.Fatal(err)
	}
	d, err = Check(sand, shaftP, ms, ld, Loads{Compression: Action{Permanent: 100 * kN}, Tension: Action{Permanent: 10 * kN}})
	if err != nil {
		t.Fatalf("aashto-drilled with its own methods: %v", err)
	}
	if len(b.Rows) < 2 {
		t.Fatalf("%d shaft rows", len(b.Rows))
	}
	var clayQs, sandQs float64
	for _, r := range b.Rows {
		if r.LayerName == "clay" {
			clayQs += float64(r.Force)
		} else {
			sandQs += float64(r.Force)
		}
	}
	want := 0.45*clayQs + 0.55*sandQs + 0.50*float64(b.Tip.Force)
	near(t, "ΣφR drilled (0.45 clay side, 0.55 sand side, 0.50 sand tip)", float64(d.Cases[0].CompressionRd), want, 1e-9)
	// Uplift: 0.35 clay, 0.45 sand on the tension shaft (0.7 of the sand's
	// compression shaft by default, the clay's unreduced); no weight given.
	near(t, "ΣφRup drilled", float64(d.Cases[0].TensionRd), 0.35*clayQs+0.45*0.7*sandQs, 1e-9)
}

// TestUpliftWeightFactor: the pile's effective weight W′ adds to the design
// tension resistance with the basis's factor on a favourable permanent
// action: AASHTO's DC minimum 0.90, EN 1997-1 γG,fav = 1.0 (Table A.3,
// sets A1 and A2, read), 1/F under a factor of safety by default, 1 when
// counted unfactored. Closed form against the analysis' own W′ and shaft.
func TestUpliftWeightFactor(t *testing.T) {
	prof, p := dasClay(t)
	p.UnitWeight = 78.5 * kNm
	loads := Loads{Compression: Action{Permanent: 100 * kN}, Tension: Action{Permanent: 50 * kN}}
	alpha := Methods{Layers: []LayerMethods{
		{Shaft: shaft.AlphaGiven{Alpha: 0.6}}, {Shaft: shaft.AlphaGiven{Alpha: 0.9}}, {Shaft: shaft.AlphaGiven{Alpha: 0.725}},
	}}
	check := func(name string, b Basis, rt func(c Capacity) float64) {
		t.Helper()
		d, err := Check(prof, p, alpha, b, loads)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		c := d.Characteristic
		if !(c.Weight > 0) {
			t.Fatalf("%s: no weight", name)
		}
		near(t, name, float64(d.Cases[len(d.Cases)-1].TensionRd), rt(c), 1e-12)
	}
	check("AASHTO: 0.25·Rs,t + 0.90·W′", AASHTODrivenPiles(), func(c Capacity) float64 {
		return 0.25*float64(c.TensionShaft) + 0.90*float64(c.Weight)
	})
	check("FS 2.5: (Rs,t + W′)/2.5", SafetyFactor{Global: 2.5}, func(c Capacity) float64 {
		return float64(c.TensionShaft+c.Weight) / 2.5
	})
	check("FS 2.5, W′ unfactored", SafetyFactor{Global: 2.5, WeightUnfactored: true}, func(c Capacity) float64 {
		return float64(c.TensionShaft)/2.5 + float64(c.Weight)
	})
	// DA1-2 (the last case), driven pile, one profile: ξ = 1.40, γs;t = 1.6.
	check("EN DA1-2: Rs,t/(1.40·1.6) + 1.0·W′", Eurocode7{Approach: DA1, Profiles: 1}, func(c Capacity) float64 {
		return float64(c.TensionShaft)/(1.40*1.6) + float64(c.Weight)
	})
	// Characteristic: W′ at 1.
	a, err := NewAnalysis(prof, p, alpha, nil)
	if err != nil {
		t.Fatal(err)
	}
	c, err := a.Capacity()
	if err != nil {
		t.Fatal(err)
	}
	near(t, "characteristic Rt = Rs,t + W′", float64(c.DesignTension), float64(c.TensionShaft+c.Weight), 1e-12)
}

// TestTensionFactorByDrainage: the shaft in tension is t·fs layer by layer,
// t = 0.7 in drained and 1.0 in undrained layers by default (De Nicola &
// Randolph 1993, lower end of 0.7-0.85, from memory), or as given; one
// value applies to both classes. Closed form against the breakdown rows.
func TestTensionFactorByDrainage(t *testing.T) {
	prof := mustProfile(t, profile.Spec{WaterDepth: 3 * m, WaterUnitWeight: 9.81 * kNm, Layers: []profile.LayerSpec{
		{Name: "sand", Thickness: 6 * m, Drainage: profile.Drained, Phi: 33 * deg, UnitWeight: 18 * kNm, SaturatedUnitWeight: 20 * kNm},
		{Name: "clay", Thickness: 6 * m, Drainage: profile.Undrained, Su: 50 * kPa, UnitWeight: 18 * kNm, SaturatedUnitWeight: 18 * kNm},
		{Name: "sand 2", Thickness: 10 * m, Drainage: profile.Drained, Phi: 36 * deg, UnitWeight: 19 * kNm, SaturatedUnitWeight: 20 * kNm},
	}})
	p := Pile{Section: Section{Shape: Square, Width: 0.4 * m}, Length: 15 * m, Installation: DrivenHigh}
	for _, c := range []struct {
		name   string
		tf     TensionFactor
		td, tu float64
	}{
		{"default", TensionFactor{}, 0.7, 1},
		{"DefaultTension", DefaultTension(), 0.7, 1},
		{"same", TensionSame(), 1, 1},
		{"given both", TensionFactor{Name: "given", Drained: 0.8, Undrained: 0.9}, 0.8, 0.9},
		{"one value", TensionFactor{Name: "given", Value: 0.75}, 0.75, 0.75},
		{"drained only", TensionFactor{Name: "given", Value: 1, Drained: 0.6}, 0.6, 1},
	} {
		a, err := NewAnalysis(prof, p, Methods{Tension: c.tf}, nil)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		b, err := a.Breakdown()
		if err != nil {
			t.Fatal(err)
		}
		var want float64
		for _, r := range b.Rows {
			tt := c.tu
			if r.LayerName != "clay" {
				tt = c.td
			}
			want += tt * float64(r.Force)
		}
		cp, err := a.Capacity()
		if err != nil {
			t.Fatal(err)
		}
		near(t, "Rs,t "+c.name, float64(cp.TensionShaft), want, 1e-9)
	}
	if DefaultTension().Unreduced() || !TensionSame().Unreduced() {
		t.Error("Unreduced: want false for the default and true for TensionSame")
	}
}

// TestEN1997RecommendedTables checks EN1997Recommended against EN 1997-1
// Annex A as read: Table A.3 (γG 1.35/1.0, γG,fav 1.0/1.0, γQ 1.5/1.3) and
// Table A.4 (M2 γφ′ 1.25, γcu 1.4) in the reproduction of EN 1997-1 at
// geotechnicaldesign.info (§A.3.1, §A.3.2); Table A.10 at the same place
// (§A.3.3.3); Tables A.6-A.8 in Tomlinson & Woodward (2008), Tables
// 4.3-4.5, and Smith (2014), Table 10.3A. Bored γt in R4 is 1.5: Smith's
// table and Bond & Harris's (2008, ch. 13) worked example (4271/1.5 =
// 2847 kN) against Tomlinson & Woodward's 1.6.
func TestEN1997RecommendedTables(t *testing.T) {
	f := EN1997Recommended()
	if err := f.Validate("design.factors"); err != nil {
		t.Fatal(err)
	}
	eq := func(name string, got, want [4]float64) {
		if got != want {
			t.Errorf("%s: %v, want %v", name, got, want)
		}
	}
	eq("driven γb", f.Driven.Base, [4]float64{1.0, 1.1, 1.0, 1.3})
	eq("driven γs", f.Driven.Shaft, [4]float64{1.0, 1.1, 1.0, 1.3})
	eq("driven γt", f.Driven.Total, [4]float64{1.0, 1.1, 1.0, 1.3})
	eq("bored γb", f.Bored.Base, [4]float64{1.25, 1.1, 1.0, 1.6})
	eq("bored γs", f.Bored.Shaft, [4]float64{1.0, 1.1, 1.0, 1.3})
	eq("bored γt", f.Bored.Total, [4]float64{1.15, 1.1, 1.0, 1.5})
	eq("CFA γb", f.CFA.Base, [4]float64{1.1, 1.1, 1.0, 1.45})
	eq("CFA γs", f.CFA.Shaft, [4]float64{1.0, 1.1, 1.0, 1.3})
	eq("CFA γt", f.CFA.Total, [4]float64{1.1, 1.1, 1.0, 1.4})
	for _, s := range []RSet{f.Driven, f.Bored, f.CFA} {
		eq("γs;t", s.Tension, [4]float64{1.25, 1.15, 1.1, 1.6})
	}
	if f.A1 != (ActionSet{1.35, 1.0, 1.5}) || f.A2 != (ActionSet{1.0, 1.0, 1.3}) {
		t.Errorf("A1 %v, A2 %v", f.A1, f.A2)
	}
	if f.M2TanPhi != 1.25 || f.M2Su != 1.4 || f.ModelFactor != 1 {
		t.Errorf("M2 %g, %g; γRd %g", f.M2TanPhi, f.M2Su, f.ModelFactor)
	}
	want3 := []float64{1.40, 1.35, 1.33, 1.31, 1.29, 1.27, 1.25}
	want4 := []float64{1.40, 1.27, 1.23, 1.20, 1.15, 1.12, 1.08}
	for i, n := range []int{1, 2, 3, 4, 5, 7, 10} {
		x3, x4, err := f.Xi(n)
		if err != nil || x3 != want3[i] || x4 != want4[i] {
			t.Errorf("ξ(%d) = %g, %g (%v); want %g, %g", n, x3, x4, err, want3[i], want4[i])
		}
	}
	// Between tabulated n the smaller n (larger ξ); beyond 10, n = 10.
	if x3, x4, _ := f.Xi(6); x3 != 1.29 || x4 != 1.15 {
		t.Errorf("ξ(6) = %g, %g; want those of n = 5", x3, x4)
	}
	if x3, _, _ := f.Xi(40); x3 != 1.25 {
		t.Errorf("ξ3(40) = %g; want 1.25", x3)
	}
}

// TestUKAnnexTables checks the UK National Annex preset: R1 all 1.0 (Bond
// & Harris 2008, §13.11.1, read); R4 read in Smith (2014), Table 10.3B
// (no SLS check / SLS verified): driven γb 1.7/1.5, γs 1.5/1.3, γt
// 1.7/1.5; bored and CFA γb 2.0/1.7, γs 1.6/1.4, γt 2.0/1.7. From memory:
// γs;t R4 2.0, ξ3/ξ4 of Table A.NA.10, γRd 1.4. Actions as EN 1997-1
// (Smith 2014, §10.6.1, read). DA1 only.
func TestUKAnnexTables(t *testing.T) {
	for _, sls := range []bool{false, true} {
		f := UKAnnex(sls)
		if err := f.Validate("design.factors"); err != nil {
			t.Fatal(err)
		}
		pick := func(a, b float64) float64 {
			if sls {
				return b
			}
			return a
		}
		for _, c := range []struct {
			name      string
			s         RSet
			b, sh, tt float64
		}{
			{"driven", f.Driven, pick(1.7, 1.5), pick(1.5, 1.3), pick(1.7, 1.5)},
			{"bored", f.Bored, pick(2.0, 1.7), pick(1.6, 1.4), pick(2.0, 1.7)},
			{"cfa", f.CFA, pick(2.0, 1.7), pick(1.6, 1.4), pick(2.0, 1.7)},
		} {
			if c.s.Base[3] != c.b || c.s.Shaft[3] != c.sh || c.s.Total[3] != c.tt || c.s.Tension[3] != 2.0 {
				t.Errorf("%s R4 (sls %v): %g %g %g %g", c.name, sls, c.s.Base[3], c.s.Shaft[3], c.s.Total[3], c.s.Tension[3])
			}
			if c.s.Base[0] != 1 || c.s.Shaft[0] != 1 || c.s.Total[0] != 1 || c.s.Tension[0] != 1 {
				t.Errorf("%s R1: want all 1.0", c.name)
			}
		}
		if f.A1 != (ActionSet{1.35, 1.0, 1.5}) || f.A2 != (ActionSet{1.0, 1.0, 1.3}) || f.ModelFactor != 1.4 {
			t.Errorf("actions %v %v, γRd %g", f.A1, f.A2, f.ModelFactor)
		}
		if x3, x4, _ := f.Xi(4); x3 != 1.38 || x4 != 1.29 {
			t.Errorf("UK ξ(4) = %g, %g; want 1.38, 1.29 (from memory)", x3, x4)
		}
	}
	// DA1-2 of a bored pile, no SLS check, one profile taken by the model
	// factor alone: Rc,d = Rb/(1.4·2.0) + Rs/(1.4·1.6).
	f := UKAnnex(false)
	cs, err := Eurocode7{Approach: DA1, Factors: &f}.Cases(Bored)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "UK DA1-2 tip multiplier", cs[1].Tip[""], 1/(1.4*2.0), 1e-12)
	near(t, "UK DA1-2 shaft multiplier", cs[1].Shaft[""], 1/(1.4*1.6), 1e-12)
	near(t, "UK DA1-1 tip multiplier", cs[0].Tip[""], 1/1.4, 1e-12)
	// A maintained load test lets γRd fall to 1.2.
	cs, _ = Eurocode7{Approach: DA1, Factors: &f, ModelFactor: 1.2}.Cases(Bored)
	near(t, "UK DA1-2 tip with γRd 1.2", cs[1].Tip[""], 1/(1.2*2.0), 1e-12)
	if _, err := (Eurocode7{Approach: DA2, Factors: &f}).Cases(Bored); err == nil {
		t.Error("the UK preset accepted DA2")
	}
}

// TestEN1997GivenXi: given ξ3 and ξ4 replace the table's, the larger
// dividing a single profile's resistance, and eq. 7.8 runs with them.
func TestEN1997GivenXi(t *testing.T) {
	cs, err := Eurocode7{Approach: DA2, Profiles: 3, Xi3: 1.2, Xi4: 1.3}.Cases(DrivenHigh)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "DA2 tip multiplier with ξ = max(1.2, 1.3)", cs[0].Tip[""], 1/(1.3*1.1), 1e-12)
	mn := units.Meganewton
	// Tomlinson & Woodward (2008) Example 4.5 (read): 6.82, 8.17, 8.65 and
	// 9.07 MN, ξ3 1.31, ξ4 1.20: Rc,k = 5.68 MN.
	rk, err := CharacteristicXi([]units.Force{6.82 * mn, 8.17 * mn, 8.65 * mn, 9.07 * mn}, 1.31, 1.20)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "Rc,k (Tomlinson & Woodward Ex. 4.5)", rk.MN(), 5.68, 0.001)
	// With the mean governing: mean 8.1775/1.0 against 6.82/1.5.
	rk, _ = CharacteristicXi([]units.Force{6.82 * mn, 8.17 * mn, 8.65 * mn, 9.07 * mn}, 1.0, 1.5)
	near(t, "Rc,k min governs", rk.MN(), 6.82/1.5, 1e-12)
	rk, _ = CharacteristicXi([]units.Force{6.82 * mn, 8.17 * mn, 8.65 * mn, 9.07 * mn}, 1.5, 1.0)
	near(t, "Rc,k mean governs", rk.MN(), (6.82+8.17+8.65+9.07)/4/1.5, 1e-12)
}

// TestVerifyProfiles runs the characteristic resistance from several
// profiles: Tomlinson & Woodward (2008) Example 4.5's four profile
// resistances (read: 6.82, 8.17, 8.65, 9.07 MN, Rc,k = 5.68 MN with ξ3
// 1.31, ξ4 1.20) taken as shaft; then DA1 with the total factor γt of
// driven piles (1.0 and 1.3): Rc,d = 5.68 and 5.68/1.3 MN.
func TestVerifyProfiles(t *testing.T) {
	mn := units.Meganewton
	var cal []ProfileResistance
	for _, r := range []float64{6.82, 8.17, 8.65, 9.07} {
		cal = append(cal, ProfileResistance{Shaft: units.Force(r) * mn, Tension: units.Force(r) * mn / 2})
	}
	d, err := Eurocode7{Approach: DA1, Total: true}.VerifyProfiles(DrivenHigh, cal, 0,
		Loads{Compression: Action{Permanent: 3 * mn, Variable: 1 * mn}, Tension: Action{Variable: 1 * mn}})
	if err != nil {
		t.Fatal(err)
	}
	near(t, "Rc,k (Tomlinson & Woodward Ex. 4.5)", d.Characteristic.Compression.MN(), 5.68, 0.001)
	near(t, "Rc,d DA1-1", d.Cases[0].CompressionRd.MN(), 6.82/1.20, 1e-12)
	near(t, "Rc,d DA1-2", d.Cases[1].CompressionRd.MN(), 6.82/1.20/1.3, 1e-12)
	near(t, "Fc,d DA1-1", d.Cases[0].CompressionEd.MN(), 1.35*3+1.5*1, 1e-12)
	near(t, "Rt,d DA1-2", d.Cases[1].TensionRd.MN(), 3.41/1.20/1.6, 1e-12)
	// Base and shaft split from the governing (least) profile.
	cal[0].Base, cal[0].Shaft = 2*mn, 4.82*mn
	d, err = Eurocode7{Approach: DA2}.VerifyProfiles(DrivenHigh, cal, 0.1*mn, Loads{})
	if err != nil {
		t.Fatal(err)
	}
	near(t, "Rc,d DA2 split", d.Cases[0].CompressionRd.MN(), (2/1.20)/1.1+(4.82/1.20)/1.1, 1e-12)
	near(t, "Rt,d DA2 with W′", d.Cases[0].TensionRd.MN(), 3.41/1.20/1.15+1.0*0.1, 1e-12)
	for _, c := range []struct {
		name string
		e    Eurocode7
		cal  []ProfileResistance
		w    units.Force
	}{
		{"DA3", Eurocode7{Approach: DA3}, cal, 0},
		{"none", Eurocode7{Approach: DA1}, nil, 0},
		{"count", Eurocode7{Approach: DA1, Profiles: 3}, cal, 0},
		{"negative", Eurocode7{Approach: DA1}, []ProfileResistance{{Base: -1}}, 0},
		{"NaN", Eurocode7{Approach: DA1}, []ProfileResistance{{Shaft: units.Force(math.NaN())}}, 0},
		{"weight", Eurocode7{Approach: DA1}, cal, units.Force(math.Inf(1))},
	} {
		if _, err := c.e.VerifyProfiles(DrivenHigh, c.cal, c.w, Loads{}); err == nil {
			t.Errorf("%s: accepted", c.name)
		}
	}
}

// TestDesignBadInput: every bad design input is refused with a typed
// error naming the field (errors.As reaches a *FieldError), never a panic
// or a silent clamp.
func TestDesignBadInput(t *testing.T) {
	nan := math.NaN()
	bad := func(edit func(l *LRFD)) LRFD {
		l := AASHTODrivenPiles()
		edit(&l)
		return l
	}
	badEN := func(edit func(f *EN7Factors)) Eurocode7 {
		f := EN1997Recommended()
		edit(&f)
		return Eurocode7{Approach: DA1, Factors: &f}
	}
	cases := []struct {
		name  string
		b     Basis
		field string
	}{
		{"φ 0", bad(func(l *LRFD) { l.Tip["nc9"] = 0 }), `design.tip["nc9"]`},
		{"φ above 1", bad(func(l *LRFD) { l.Shaft["alpha-api"] = 1.2 }), `design.shaft["alpha-api"]`},
		{"φ NaN", bad(func(l *LRFD) { l.Tension["beta"] = nan }), `design.uplift["beta"]`},
		{"φ negative", bad(func(l *LRFD) { l.Tip[""] = -0.5 }), `design.tip[""]`},
		{"unknown key", bad(func(l *LRFD) { l.Shaft["alpah-api"] = 0.3 }), `design.shaft["alpah-api"]`},
		{"unknown tip key", bad(func(l *LRFD) { l.Tip["alpha-api"] = 0.3 }), `design.tip["alpha-api"]`},
		{"load factor NaN", bad(func(l *LRFD) { l.Permanent = nan }), "design.permanent"},
		{"load factor below 1", bad(func(l *LRFD) { l.Variable = 0.9 }), "design.variable"},
		{"weight factor above 1", bad(func(l *LRFD) { l.Weight = 1.5 }), "design.weight"},
		{"weight factor NaN", bad(func(l *LRFD) { l.Weight = nan }), "design.weight"},
		{"row above 1", bad(func(l *LRFD) { l.Rows[0].Value = 1.1 }), "design.rows[0]"},
		{"FS below 1", SafetyFactor{Global: 0.8}, "design.factor"},
		{"FS NaN", SafetyFactor{Tip: nan, Shaft: 2}, "design.tip_factor"},
		{"FS both", SafetyFactor{Global: 2.5, Tip: 3}, "design.factor"},
		{"γb below 1", badEN(func(f *EN7Factors) { f.Bored.Base[3] = 0.9 }), "design.factors.bored.gamma_b.R4"},
		{"γs;t NaN", badEN(func(f *EN7Factors) { f.Driven.Tension[0] = nan }), "design.factors.driven.gamma_st.R1"},
		{"γG below 1", badEN(func(f *EN7Factors) { f.A1.G = 0.5 }), "design.factors.A1.gamma_g"},
		{"γG,fav above 1", badEN(func(f *EN7Factors) { f.A2.GFav = 1.2 }), "design.factors.A2.gamma_g_fav"},
		{"γQ NaN", badEN(func(f *EN7Factors) { f.A2.Q = nan }), "design.factors.A2.gamma_q"},
		{"ξ table", badEN(func(f *EN7Factors) { f.Xi4 = f.Xi4[:3] }), "design.factors.xi"},
		{"ξ below 1", badEN(func(f *EN7Factors) { f.Xi3[2] = 0.9 }), "design.factors.xi3[2]"},
		{"ξ n order", badEN(func(f *EN7Factors) { f.XiN[3] = 2 }), "design.factors.xi.n[3]"},
		{"γRd below 1", Eurocode7{Approach: DA1, ModelFactor: 0.8}, "design.model_factor"},
		{"γRd NaN", Eurocode7{Approach: DA1, ModelFactor: nan}, "design.model_factor"},
		{"ξ3 alone", Eurocode7{Approach: DA1, Xi3: 1.3}, "design.xi3"},
		{"ξ4 below 1", Eurocode7{Approach: DA1, Xi3: 1.3, Xi4: 0.5}, "design.xi4"},
		{"profiles", Eurocode7{Approach: DA1, Profiles: -2}, "design.profiles"},
	}
	for _, c := range cases {
		_, err := c.b.Cases(DrivenHigh)
		var fe *FieldError
		if !errors.As(err, &fe) {
			t.Errorf("%s: %v is not a *FieldError", c.name, err)
			continue
		}
		if fe.Field != c.field {
			t.Errorf("%s: field %q, want %q (%v)", c.name, fe.Field, c.field, err)
		}
		if !strings.Contains(err.Error(), c.field) {
			t.Errorf("%s: message %q does not name the field", c.name, err)
		}
	}
	if _, err := (Eurocode7{Approach: 7}).Cases(DrivenHigh); err == nil {
		t.Error("approach 7 accepted")
	}
	if _, err := CharacteristicXi([]units.Force{1}, nan, 1.2); err == nil {
		t.Error("ξ3 NaN accepted")
	}
	for _, tf := range []TensionFactor{
		{Name: "given", Value: 1.5}, {Name: "given", Value: nan}, {Name: "given", Drained: 0.7},
		{Name: "given", Value: 0.8, Undrained: -1}, {Name: "given", Value: 0.8, Drained: 2},
	} {
		err := tf.Validate("methods.tension_factor")
		var fe *FieldError
		if !errors.As(err, &fe) || !strings.HasPrefix(fe.Field, "methods.tension_factor") {
			t.Errorf("tension factor %+v: %v", tf, err)
		}
	}
	var fe *FieldError
	if err := (Loads{Tension: Action{Variable: units.Force(nan)}}).Validate("loads"); !errors.As(err, &fe) || fe.Field != "loads.tension.variable" {
		t.Errorf("NaN load: %v", err)
	}
}

// TestFillKeepsGivenMethods: Fill replaces only what the caller left to
// the default, and refuses a preset naming a method qult lacks.
func TestFillKeepsGivenMethods(t *testing.T) {
	m, err := AASHTODrivenPiles().Calibrated.Fill(Methods{ShaftUndrained: shaft.AlphaChart{}})
	if err != nil {
		t.Fatal(err)
	}
	if m.ShaftUndrained.ID() != "alpha-chart" || m.TipUndrained.ID() != "nc9" || m.TipDrained != nil || m.ShaftDrained != nil {
		t.Errorf("Fill: %+v", m)
	}
	m, err = PresetMethods{ShaftUndrained: "lambda"}.Fill(Methods{})
	if err != nil || !m.UndrainedLambda {
		t.Errorf("λ preset: %v, %+v", err, m)
	}
	if _, err := (PresetMethods{TipDrained: "nordlund"}).Fill(Methods{}); err == nil {
		t.Error("an unimplemented method accepted")
	}
}

// TestOverridden: a factor given for a method the table covers replaces
// the table's row, and Overridden lists the rows set aside.
func TestOverridden(t *testing.T) {
	l := AASHTODrivenPiles()
	if len(l.Overridden()) != 0 {
		t.Fatal("the preset overrides itself")
	}
	l.Shaft["beta"] = 0.3
	cs := caseOf(t, l, DrivenHigh)
	if v, _ := cs.lookup(ShaftResistance, "beta", "", profile.Undrained); v != 0.3 {
		t.Errorf("given β factor: %g, want 0.3", v)
	}
	o := l.Overridden()
	if len(o) != 1 || o[0].Method != "beta" || o[0].Value != 0.25 || o[0].Kind != ShaftResistance {
		t.Errorf("Overridden: %+v", o)
	}
}

package verify

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/phase"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/settle"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/structural"
	"github.com/qultgeo/qult/units"
)

// values are a function's outputs by quantity name, SI inside.
type values map[string]units.Quantity

// runner runs one library function on a case's inputs and returns its
// outputs by quantity name.
type runner func(a *args) (values, error)

// runners are the functions the catalogue can run, by the name a case
// gives in its function key: package.Function or package.Type.Method, the
// names the function-to-case map uses.
var runners map[string]runner

func init() {
	runners = map[string]runner{
		"units.Parse": runParse,

		"phase.Solve":                       runPhaseSolve,
		"profile.Profile.StressesAt":        runStresses("all"),
		"profile.Profile.EffectiveStress":   runStresses("effective"),
		"profile.Profile.TotalStress":       runStresses("total"),
		"profile.Profile.PorePressure":      runStresses("pore"),
		"profile.Layer.ConsolidationStrain": runConsolidationStrain,

		"bearing.PrandtlNq":          runAngleFactor(bearing.PrandtlNq),
		"bearing.PrandtlNc":          runAngleFactor(bearing.PrandtlNc),
		"bearing.VesicNgamma":        runAngleFactor(bearing.VesicNgamma),
		"bearing.VesicNsigma":        runVesicFactor(bearing.VesicNsigma),
		"bearing.VesicNc":            runVesicFactor(bearing.VesicNc),
		"bearing.Janbu.Factors":      runJanbuFactors,
		"bearing.Meyerhof.NqStar":    runMeyerhofNq,
		"bearing.Berezantzev.Nq":     runBerezantzevNq,
		"bearing.LargeBaseFactor":    runLargeBase,
		"bearing.ShearModulus":       runBearingShear,
		"bearing.Meyerhof.Tip":       runTip(func(*args) bearing.Tip { return bearing.Meyerhof{} }),
		"bearing.Janbu.Tip":          runTip(func(a *args) bearing.Tip { return bearing.Janbu{Eta: units.Angle(a.optQty("eta", units.DimAngle))} }),
		"bearing.Vesic.Tip":          runTip(vesicOf),
		"bearing.VesicUndrained.Tip": runTip(func(*args) bearing.Tip { return bearing.VesicUndrained{} }),
		"bearing.Skempton.Tip":       runTip(func(*args) bearing.Tip { return bearing.Skempton{} }),
		"bearing.ShaftSand.Tip":      runTip(func(*args) bearing.Tip { return bearing.ShaftSand{} }),
		"bearing.BoredSand.Tip":      runTip(func(*args) bearing.Tip { return bearing.BoredSand{} }),
		"bearing.DrivenN60.Tip":      runTip(func(*args) bearing.Tip { return bearing.DrivenN60{} }),
		"bearing.DrivenN60Tip":       runDrivenN60Tip,
		"bearing.GivenNq.Tip": runTip(func(a *args) bearing.Tip {
			return bearing.GivenNq{Nq: a.num("nq"), Nc: a.optNum("nc", 0), Limit: units.Stress(a.optQty("limit", units.DimStress))}
		}),
		"bearing.APISand.Tip": runTip(func(a *args) bearing.Tip { return bearing.APISand{Class: int(a.num("class"))} }),

		"shaft.AlphaAPI.Unit":      runUnit(func(*args) shaft.Unit { return shaft.AlphaAPI{} }),
		"shaft.AlphaChart.Unit":    runUnit(func(*args) shaft.Unit { return shaft.AlphaChart{} }),
		"shaft.AlphaDrilled.Unit":  runUnit(func(*args) shaft.Unit { return shaft.AlphaDrilled{} }),
		"shaft.Burland.Unit":       runUnit(func(*args) shaft.Unit { return shaft.Burland{} }),
		"shaft.DrilledSand.Unit":   runUnit(func(*args) shaft.Unit { return shaft.DrilledSand{} }),
		"shaft.DrilledSandK0.Unit": runUnit(func(*args) shaft.Unit { return shaft.DrilledSandK0{} }),
		"shaft.DrivenN60.Unit":     runUnit(func(a *args) shaft.Unit { return shaft.DrivenN60{Low: a.optNum("low", 0) == 1} }),
		"shaft.Beta.Unit":          runUnit(betaOf),
		"shaft.AlphaGiven.Unit":    runUnit(func(a *args) shaft.Unit { return shaft.AlphaGiven{Alpha: a.num("alpha")} }),
		"shaft.APIBeta.Unit": runUnit(func(a *args) shaft.Unit {
			c, err := shaft.ParseSandClass(a.str("class"))
			if err != nil {
				a.fail("class", "%v", err)
			}
			return shaft.APIBeta{Class: c}
		}),
		"shaft.KJaky.KOf":         runK(func(*args) shaft.KRule { return shaft.KJaky{} }),
		"shaft.KMayneKulhawy.KOf": runK(func(*args) shaft.KRule { return shaft.KMayneKulhawy{} }),
		"shaft.Surface.Potyondy":  runPotyondy,
		"shaft.SandClass.API":     runSandClass,
		"shaft.Lambda.Average":    runLambda,
		"shaft.LambdaMeans":       runLambdaMeans,

		"pile.Section.GrossArea":         runSection("area"),
		"pile.Section.OuterPerimeter":    runSection("perimeter"),
		"pile.Analysis.Capacity":         runPile("capacity"),
		"pile.Analysis.CapacityAt":       runPile("capacity-at"),
		"pile.Analysis.Breakdown":        runPile("breakdown"),
		"pile.Analysis.WithDepth":        runPile("with-depth"),
		"pile.Check":                     runPile("check"),
		"pile.Xi":                        runXi,
		"pile.Characteristic":            runCharacteristic(false),
		"pile.CharacteristicXi":          runCharacteristic(true),
		"pile.Eurocode7.Cases":           runEN7Cases,
		"pile.Eurocode7.VerifyProfiles":  runVerifyProfiles,
		"pile.EN7Factors.Xi":             runAnnexXi,
		"pile.EN7Factors.Characteristic": runAnnexCharacteristic,
		"pile.AASHTODrivenPiles":         runAASHTO(pile.AASHTODrivenPiles, pile.DrivenHigh),
		"pile.AASHTODrilledShafts":       runAASHTO(pile.AASHTODrilledShafts, pile.Bored),
		"pile.Verify":                    runVerify,
		"pile.EN1997Recommended":         runEN7Table(func(*args) pile.EN7Factors { return pile.EN1997Recommended() }),
		"pile.UKAnnex":                   runEN7Table(func(a *args) pile.EN7Factors { return pile.UKAnnex(a.optBool("sls_verified")) }),

		"structural.AASHTO.Compression":    runStructural("aashto"),
		"structural.Eurocode.Compression":  runStructural("en"),
		"structural.Allowable.Compression": runStructural("allowable"),
		"structural.DesignDiameter":        runDesignDiameter,

		"settle.Iws":                 runIws,
		"settle.Vesic.Settlement":    runVesicSettlement,
		"settle.RandolphWroth.Solve": runRandolphWroth,
		"settle.Downdrag.Solve":      runDowndrag,
	}
	addInsituRunners(runners)
	addDirectRunners(runners)
}

// Functions returns the names of the functions the catalogue can run,
// sorted.
func Functions() []string {
	var fs []string
	for k := range runners {
		fs = append(fs, k)
	}
	sort.Strings(fs)
	return fs
}

func num(x float64) units.Quantity                        { return units.Quantity{Value: x} }
func qv(x float64, d units.Dimension) units.Quantity      { return units.Quantity{Value: x, Dim: d} }
func stress(s units.Stress) units.Quantity                { return qv(float64(s), units.DimStress) }
func force(f units.Force) units.Quantity                  { return qv(float64(f), units.DimForce) }
func length(l units.Length) units.Quantity                { return qv(float64(l), units.DimLength) }
func weight(g units.UnitWeight) units.Quantity            { return qv(float64(g), units.DimUnitWeight) }
func finish(a *args, v values, err error) (values, error) { return v, joinErr(a.done(), err) }

func joinErr(a, b error) error {
	switch {
	case a == nil:
		return b
	case b == nil:
		return a
	}
	return fmt.Errorf("%w; %w", a, b)
}

// ---- units ----

func runParse(a *args) (values, error) {
	s := a.str("text")
	q, err := units.Parse(s)
	return finish(a, values{"value": q}, err)
}

// ---- phase ----

func runPhaseSolve(a *args) (values, error) {
	in := phase.Input{
		Gs: a.optNum("gs", 0), E: a.optNum("e", 0), N: a.optNum("n", 0), W: a.optNum("w", 0), S: a.optNum("s", 0),
		Gamma:    units.UnitWeight(a.optQty("gamma", units.DimUnitWeight)),
		GammaD:   units.UnitWeight(a.optQty("gamma_d", units.DimUnitWeight)),
		GammaSat: units.UnitWeight(a.optQty("gamma_sat", units.DimUnitWeight)),
		GammaSub: units.UnitWeight(a.optQty("gamma_sub", units.DimUnitWeight)),
		GammaW:   units.UnitWeight(a.optQty("gamma_w", units.DimUnitWeight)),
	}
	if err := a.done(); err != nil {
		return nil, err
	}
	st, err := phase.Solve(in)
	if err != nil {
		return nil, err
	}
	return values{"gs": num(st.Gs), "e": num(st.E), "n": num(st.N), "w": num(st.W), "s": num(st.S),
		"gamma": weight(st.Gamma), "gamma_d": weight(st.GammaD), "gamma_sat": weight(st.GammaSat),
		"gamma_sub": weight(st.GammaSub)}, nil
}

// ---- profile ----

// groundSpec reads a ground block: water_depth (a length, or "none"),
// water_unit_weight, surcharge, pore_pressures [{depth, u}], layers
// [{name, thickness, drainage, unit_weight, saturated_unit_weight, phi,
// su, ocr}].
func groundSpec(a *args) profile.Spec {
	v, ok := a.get("ground")
	if !ok {
		a.fail("ground", "missing")
		return profile.Spec{}
	}
	g := a.sub("ground", v)
	defer a.merge(g)
	var s profile.Spec
	if g.has("water_depth") {
		if w, _ := g.m["water_depth"].(string); w == "none" {
			g.used["water_depth"] = true
			s.NoWater = true
		} else {
			s.WaterDepth = units.Length(g.qty("water_depth", units.DimLength))
		}
	} else {
		g.fail("water_depth", "missing (a depth, or none)")
	}
	s.WaterUnitWeight = units.UnitWeight(g.optQty("water_unit_weight", units.DimUnitWeight))
	s.Surcharge = units.Stress(g.optQty("surcharge", units.DimStress))
	if g.has("pore_pressures") {
		for i, p := range g.list("pore_pressures") {
			pa := g.sub(fmt.Sprintf("pore_pressures[%d]", i), p)
			s.PorePressures = append(s.PorePressures, profile.PorePoint{
				Depth: units.Length(pa.qty("depth", units.DimLength)), U: units.Stress(pa.qty("u", units.DimStress))})
			g.merge(pa)
		}
	}
	for i, l := range g.list("layers") {
		la := g.sub(fmt.Sprintf("layers[%d]", i), l)
		ls := profile.LayerSpec{
			Name:                la.optStr("name", ""),
			Thickness:           units.Length(la.qty("thickness", units.DimLength)),
			Phi:                 units.Angle(la.optQty("phi", units.DimAngle)),
			Su:                  units.Stress(la.optQty("su", units.DimStress)),
			UnitWeight:          units.UnitWeight(la.optQty("unit_weight", units.DimUnitWeight)),
			SaturatedUnitWeight: units.UnitWeight(la.optQty("saturated_unit_weight", units.DimUnitWeight)),
			OCR:                 la.optNum("ocr", 0),
		}
		switch d := la.str("drainage"); d {
		case "drained":
			ls.Drainage = profile.Drained
		case "undrained":
			ls.Drainage = profile.Undrained
		default:
			la.fail("drainage", "%q: want drained or undrained", d)
		}
		s.Layers = append(s.Layers, ls)
		g.merge(la)
	}
	return s
}

func runStresses(which string) runner {
	return func(a *args) (values, error) {
		spec := groundSpec(a)
		z := units.Length(a.qty("z", units.DimLength))
		if err := a.done(); err != nil {
			return nil, err
		}
		p, err := profile.New(spec)
		if err != nil {
			return nil, err
		}
		var s units.Stress
		switch which {
		case "effective":
			s, err = p.EffectiveStress(z)
			return values{"effective": stress(s)}, err
		case "total":
			s, err = p.TotalStress(z)
			return values{"total": stress(s)}, err
		case "pore":
			s, err = p.PorePressure(z)
			return values{"pore": stress(s)}, err
		}
		st, err := p.StressesAt(z)
		return values{"total": stress(st.Total), "pore": stress(st.Pore), "effective": stress(st.Effective)}, err
	}
}

// runConsolidationStrain gives the settlement of a layer of thickness h
// under a uniform change of effective stress, ε·h.
func runConsolidationStrain(a *args) (values, error) {
	l := profile.Layer{Cc: a.optNum("cc", 0), Cr: a.optNum("cr", 0), E0: a.optNum("e0", 0),
		Pc: units.Stress(a.optQty("pc", units.DimStress)), M: units.Stress(a.optQty("m", units.DimStress))}
	s0 := units.Stress(a.qty("s0", units.DimStress))
	ds := units.Stress(a.qty("ds", units.DimStress))
	h := a.qty("h", units.DimLength)
	if err := a.done(); err != nil {
		return nil, err
	}
	eps, err := l.ConsolidationStrain(s0, ds)
	return values{"settlement": units.Quantity{Value: eps * h, Dim: units.DimLength}}, err
}

// ---- bearing ----

func runAngleFactor(f func(units.Angle) (float64, error)) runner {
	return func(a *args) (values, error) {
		phi := units.Angle(a.qty("phi", units.DimAngle))
		if err := a.done(); err != nil {
			return nil, err
		}
		x, err := f(phi)
		return values{"value": num(x)}, err
	}
}

func runVesicFactor(f func(units.Angle, float64) (float64, error)) runner {
	return func(a *args) (values, error) {
		phi := units.Angle(a.qty("phi", units.DimAngle))
		irr := a.num("irr")
		if err := a.done(); err != nil {
			return nil, err
		}
		x, err := f(phi, irr)
		return values{"value": num(x)}, err
	}
}

func runJanbuFactors(a *args) (values, error) {
	phi := units.Angle(a.qty("phi", units.DimAngle))
	eta := units.Angle(a.optQty("eta", units.DimAngle))
	if err := a.done(); err != nil {
		return nil, err
	}
	nq, nc, err := bearing.Janbu{Eta: eta}.Factors(phi)
	return values{"nq": num(nq), "nc": num(nc)}, err
}

func runMeyerhofNq(a *args) (values, error) {
	phi := units.Angle(a.qty("phi", units.DimAngle))
	if err := a.done(); err != nil {
		return nil, err
	}
	nq, _, err := bearing.Meyerhof{}.NqStar(phi, false)
	return values{"nq": num(nq)}, err
}

func runBerezantzevNq(a *args) (values, error) {
	phi := units.Angle(a.qty("phi", units.DimAngle))
	ld := a.num("l_over_d")
	if err := a.done(); err != nil {
		return nil, err
	}
	nq, _, err := bearing.Berezantzev{}.Nq(phi, ld, false)
	return values{"nq": num(nq)}, err
}

func runLargeBase(a *args) (values, error) {
	b := units.Length(a.qty("base", units.DimLength))
	if err := a.done(); err != nil {
		return nil, err
	}
	f, err := bearing.LargeBaseFactor(b)
	return values{"value": num(f)}, err
}

func runBearingShear(a *args) (values, error) {
	e := units.Stress(a.qty("e", units.DimStress))
	nu := a.num("nu")
	if err := a.done(); err != nil {
		return nil, err
	}
	g, err := bearing.ShearModulus(e, nu)
	return values{"value": stress(g)}, err
}

func vesicOf(a *args) bearing.Tip {
	v := bearing.Vesic{}
	if a.optBool("volume_correlated") {
		v.Volume = bearing.VolumeCorrelated
	}
	return v
}

// runTip runs a tip method on the inputs phi, c, su, q, ir, g, delta, k0,
// l, d, n60, pa; outputs qp, nq, nc, sigma, ir, irr, limit, unlimited.
// runDrivenN60Tip runs Meyerhof's SPT tip rule for one stratum: n60, the
// embedment lb, the width d and pa (optional).
func runDrivenN60Tip(a *args) (values, error) {
	n60 := a.num("n60")
	lb, d := units.Length(a.qty("lb", units.DimLength)), units.Length(a.qty("d", units.DimLength))
	pa := units.Stress(a.optQty("pa", units.DimStress))
	if err := a.done(); err != nil {
		return nil, err
	}
	q, err := bearing.DrivenN60Tip(n60, lb, d, pa)
	return values{"qp": stress(q)}, err
}

func runTip(method func(*args) bearing.Tip) runner {
	return func(a *args) (values, error) {
		m := method(a)
		in := bearing.Input{
			Phi: units.Angle(a.optQty("phi", units.DimAngle)), C: units.Stress(a.optQty("c", units.DimStress)),
			Su: units.Stress(a.optQty("su", units.DimStress)), Q: units.Stress(a.optQty("q", units.DimStress)),
			K0: a.optNum("k0", 0), Ir: a.optNum("ir", 0), G: units.Stress(a.optQty("g", units.DimStress)),
			Delta: a.optNum("delta", 0), L: units.Length(a.optQty("l", units.DimLength)),
			D: units.Length(a.optQty("d", units.DimLength)), N60: a.optNum("n60", 0),
			Pa: units.Stress(a.optQty("pa", units.DimStress)),
		}
		if err := a.done(); err != nil {
			return nil, err
		}
		r, err := m.Tip(in)
		return values{"qp": stress(r.Qp), "nq": num(r.Nq), "nc": num(r.Nc), "sigma": stress(r.Sigma),
			"ir": num(r.Ir), "irr": num(r.Irr), "limit": stress(r.Limit), "unlimited": stress(r.Unlimited)}, err
	}
}

// ---- shaft ----

func point(a *args) shaft.Point {
	return shaft.Point{
		SigmaV: units.Stress(a.optQty("sigma_v", units.DimStress)), Depth: units.Length(a.optQty("z", units.DimLength)),
		Phi: units.Angle(a.optQty("phi", units.DimAngle)), OCR: a.optNum("ocr", 0),
		Su: units.Stress(a.optQty("su", units.DimStress)), Diameter: units.Length(a.optQty("d", units.DimLength)),
		N60: a.optNum("n60", 0), Pa: units.Stress(a.optQty("pa", units.DimStress)),
	}
}

// betaOf reads k (jaky, mayne-kulhawy or a number) and delta_over_phi or
// delta.
func betaOf(a *args) shaft.Unit {
	var b shaft.Beta
	switch k := a.str("k"); k {
	case "jaky":
		b.K = shaft.KJaky{}
	case "mayne-kulhawy":
		b.K = shaft.KMayneKulhawy{}
	default:
		b.K = shaft.KGiven{K: a.toNum("k", k)}
	}
	if a.has("delta") {
		b.Delta = shaft.DeltaGiven{Delta: units.Angle(a.qty("delta", units.DimAngle))}
	} else {
		b.Delta = shaft.DeltaOverPhi{Ratio: a.num("delta_over_phi")}
	}
	return b
}

func runUnit(method func(*args) shaft.Unit) runner {
	return func(a *args) (values, error) {
		m := method(a)
		p := point(a)
		if err := a.done(); err != nil {
			return nil, err
		}
		r, err := m.Unit(p)
		return values{"fs": stress(r.Fs), "alpha": num(r.Alpha), "beta": num(r.Beta), "k": num(r.K)}, err
	}
}

func runK(rule func(*args) shaft.KRule) runner {
	return func(a *args) (values, error) {
		r := rule(a)
		p := point(a)
		if err := a.done(); err != nil {
			return nil, err
		}
		k, err := r.KOf(p)
		return values{"k": num(k.K)}, err
	}
}

func runPotyondy(a *args) (values, error) {
	s, err := shaft.ParseSurface(a.str("surface"))
	if err := joinErr(a.done(), err); err != nil {
		return nil, err
	}
	r, err := s.Potyondy()
	return values{"delta_over_phi": num(r)}, err
}

func runSandClass(a *args) (values, error) {
	c, err := shaft.ParseSandClass(a.str("class"))
	if err := joinErr(a.done(), err); err != nil {
		return nil, err
	}
	b, l, err := c.API()
	return values{"beta": num(b), "limit": stress(l)}, err
}

func runLambda(a *args) (values, error) {
	l := units.Length(a.qty("length", units.DimLength))
	sv := units.Stress(a.qty("mean_sigma_v", units.DimStress))
	su := units.Stress(a.qty("mean_su", units.DimStress))
	if err := a.done(); err != nil {
		return nil, err
	}
	r, err := shaft.Lambda{}.Average(l, sv, su)
	return values{"lambda": num(r.Lambda), "fav": stress(r.Fav)}, err
}

func runLambdaMeans(a *args) (values, error) {
	var ps []shaft.LambdaPiece
	for i, p := range a.list("pieces") {
		pa := a.sub(fmt.Sprintf("pieces[%d]", i), p)
		ps = append(ps, shaft.LambdaPiece{Thickness: units.Length(pa.qty("thickness", units.DimLength)),
			SigmaTop: units.Stress(pa.qty("sigma_top", units.DimStress)), SigmaBottom: units.Stress(pa.qty("sigma_bottom", units.DimStress)),
			SuTop: units.Stress(pa.qty("su_top", units.DimStress)), SuBottom: units.Stress(pa.qty("su_bottom", units.DimStress))})
		a.merge(pa)
	}
	if err := a.done(); err != nil {
		return nil, err
	}
	l, sv, su, err := shaft.LambdaMeans(ps)
	return values{"length": length(l), "mean_sigma_v": stress(sv), "mean_su": stress(su)}, err
}

// ---- pile ----

func runSection(what string) runner {
	return func(a *args) (values, error) {
		shape, err := pile.ParseShape(a.str("shape"))
		sec := pile.Section{Shape: shape, Diameter: units.Length(a.optQty("diameter", units.DimLength)),
			Width: units.Length(a.optQty("width", units.DimLength)), Wall: units.Length(a.optQty("wall", units.DimLength))}
		if err := joinErr(a.done(), err); err != nil {
			return nil, err
		}
		if err := sec.Validate("section"); err != nil {
			return nil, err
		}
		if what == "area" {
			return values{"area": qv(float64(sec.GrossArea()), units.DimArea)}, nil
		}
		return values{"perimeter": length(sec.OuterPerimeter())}, nil
	}
}

// calcInputs decodes and resolves the case's calc file (inputs key calc)
// with package calc, and builds the ground profile.
func calcInputs(a *args) (*calc.Inputs, *profile.Profile, error) {
	text := a.str("calc")
	if len(a.errs) > 0 {
		return nil, nil, a.done()
	}
	f, err := calc.Decode([]byte(text))
	if err != nil {
		return nil, nil, err
	}
	in, err := calc.Resolve(f)
	if err != nil {
		return nil, nil, err
	}
	prof, err := profile.New(in.Ground)
	if err != nil {
		return nil, nil, err
	}
	return in, prof, nil
}

func capacityValues(c pile.Capacity) values {
	return values{"tip": force(c.Tip), "shaft": force(c.Shaft), "compression": force(c.Compression),
		"tension": force(c.Tension), "unit_tip": stress(c.UnitTip),
		"design_compression": force(c.DesignCompression), "design_tension": force(c.DesignTension)}
}

// runPile runs a whole pile given as a calc file (inputs: calc, and depth
// for capacity-at and with-depth; layer for a breakdown's per-layer
// shaft force). The library is called directly on the resolved inputs.
func runPile(what string) runner {
	return func(a *args) (values, error) {
		var depth units.Length
		if what == "capacity-at" || what == "with-depth" {
			depth = units.Length(a.qty("depth", units.DimLength))
		}
		layer := ""
		if what == "breakdown" {
			layer = a.optStr("layer", "")
		}
		in, prof, err := calcInputs(a)
		if err := joinErr(a.done(), err); err != nil {
			return nil, err
		}
		if what == "check" {
			if in.Basis == nil {
				return nil, fmt.Errorf("pile.Check: the calc file has no design section")
			}
			d, err := pile.Check(prof, in.Pile, in.Methods, in.Basis, in.Loads)
			if err != nil {
				return nil, err
			}
			v := d.Cases[d.Governing]
			return values{"rd": force(v.CompressionRd), "ed": force(v.CompressionEd), "use": num(v.CompressionUse),
				"tension_rd": force(v.TensionRd)}, nil
		}
		an, err := pile.NewAnalysis(prof, in.Pile, in.Methods, nil)
		if err != nil {
			return nil, err
		}
		switch what {
		case "capacity":
			c, err := an.Capacity()
			return capacityValues(c), err
		case "capacity-at":
			c, err := an.CapacityAt(depth)
			return capacityValues(c), err
		case "with-depth":
			// The capacity with depth on a grid whose last depth is the
			// one asked for.
			step := depth / 10
			rows, err := an.WithDepth(pile.DepthGrid{From: step, To: depth, Step: step}, nil)
			if err != nil {
				return nil, err
			}
			if len(rows) == 0 || math.Abs(float64(rows[len(rows)-1].TipDepth-depth)) > 1e-9 {
				return nil, fmt.Errorf("pile.Analysis.WithDepth: no row at %v", depth)
			}
			return capacityValues(rows[len(rows)-1]), nil
		}
		b, err := an.Breakdown()
		if err != nil {
			return nil, err
		}
		v := capacityValues(b.Capacity)
		v["tip_block"] = force(b.Tip.Force)
		if layer != "" {
			var sum units.Force
			found := false
			for _, r := range b.Rows {
				if r.LayerName == layer {
					sum += r.Force
					found = true
				}
			}
			if !found {
				return nil, fmt.Errorf("pile.Analysis.Breakdown: no shaft row in layer %q", layer)
			}
			v["layer_shaft"] = force(sum)
		}
		return v, nil
	}
}

func runXi(a *args) (values, error) {
	n := a.num("profiles")
	if err := a.done(); err != nil {
		return nil, err
	}
	x3, x4, err := pile.Xi(int(n))
	return values{"xi3": num(x3), "xi4": num(x4)}, err
}

func forces(a *args, key string) []units.Force {
	var fs []units.Force
	for i, v := range a.list(key) {
		fs = append(fs, units.Force(a.toQty(fmt.Sprintf("%s[%d]", key, i), v, units.DimForce)))
	}
	return fs
}

func runCharacteristic(withXi bool) runner {
	return func(a *args) (values, error) {
		cal := forces(a, "resistances")
		var x3, x4 float64
		if withXi {
			x3, x4 = a.num("xi3"), a.num("xi4")
		}
		if err := a.done(); err != nil {
			return nil, err
		}
		var r units.Force
		var err error
		if withXi {
			r, err = pile.CharacteristicXi(cal, x3, x4)
		} else {
			r, err = pile.Characteristic(cal)
		}
		return values{"value": force(r)}, err
	}
}

// en7Case returns the named case of a Eurocode 7 basis read from the
// inputs approach, installation, total, profiles and case.
func en7Case(a *args) (pile.Case, error) {
	ap, err1 := pile.ParseApproach(a.str("approach"))
	inst, err2 := pile.ParseInstallation(a.str("installation"))
	e := pile.Eurocode7{Approach: ap, Total: a.optBool("total"), Profiles: int(a.optNum("profiles", 0))}
	name := a.str("case")
	if err := joinErr(err1, err2); err != nil {
		return pile.Case{}, err
	}
	if len(a.errs) > 0 {
		return pile.Case{}, nil // reported by the caller's a.done()
	}
	cs, err := e.Cases(inst)
	if err != nil {
		return pile.Case{}, err
	}
	var names []string
	for _, c := range cs {
		if c.Name == name {
			return c, nil
		}
		names = append(names, c.Name)
	}
	return pile.Case{}, fmt.Errorf("case: %q is not among %s", name, strings.Join(names, ", "))
}

// runEN7Cases gives the multipliers of one case and, with rk given, the
// design resistance rk times the total (or shaft) multiplier.
func runEN7Cases(a *args) (values, error) {
	c, err := en7Case(a)
	rk := units.Force(a.optQty("rk", units.DimForce))
	if err := joinErr(a.done(), err); err != nil {
		return nil, err
	}
	v := values{"tip_multiplier": num(c.Tip[""]), "shaft_multiplier": num(c.Shaft[""]),
		"tension_multiplier": num(c.Tension[""]), "gamma_g": num(c.Permanent), "gamma_q": num(c.Variable)}
	if rk > 0 {
		v["rd"] = force(rk * units.Force(c.Shaft[""]))
	}
	return v, nil
}

// runVerify checks loads (permanent, variable) against a design
// resistance rd under one Eurocode 7 case.
func runVerify(a *args) (values, error) {
	c, err := en7Case(a)
	rd := units.Force(a.optQty("rd", units.DimForce))
	l := pile.Loads{Compression: pile.Action{Permanent: units.Force(a.optQty("permanent", units.DimForce)),
		Variable: units.Force(a.optQty("variable", units.DimForce))}}
	if err := joinErr(a.done(), err); err != nil {
		return nil, err
	}
	v := pile.Verify(pile.Capacity{DesignCompression: rd}, c, l)
	return values{"ed": force(v.CompressionEd), "use": num(v.CompressionUse)}, nil
}

// runEN7Table reads one factor of a factor table: quantity names such as
// "bored.base.R4", "A1.g", "M2.tan_phi".
func runEN7Table(table func(*args) pile.EN7Factors) runner {
	return func(a *args) (values, error) {
		f := table(a)
		if err := a.done(); err != nil {
			return nil, err
		}
		v := values{"A1.g": num(f.A1.G), "A1.g_fav": num(f.A1.GFav), "A1.q": num(f.A1.Q),
			"A2.g": num(f.A2.G), "A2.g_fav": num(f.A2.GFav), "A2.q": num(f.A2.Q),
			"M2.tan_phi": num(f.M2TanPhi), "M2.su": num(f.M2Su), "model_factor": num(f.ModelFactor)}
		for _, s := range []struct {
			name string
			set  pile.RSet
		}{{"driven", f.Driven}, {"bored", f.Bored}, {"cfa", f.CFA}} {
			for i := range 4 {
				r := fmt.Sprintf("R%d", i+1)
				v[s.name+".base."+r] = num(s.set.Base[i])
				v[s.name+".shaft."+r] = num(s.set.Shaft[i])
				v[s.name+".total."+r] = num(s.set.Total[i])
				v[s.name+".tension."+r] = num(s.set.Tension[i])
			}
		}
		return v, nil
	}
}

// ---- structural ----

// runStructural runs a structural rule on a member: shape and its sizes,
// installation, concrete, steel, rebar, rebar_yield, cased, and the rule's
// options spiral and good_driving (aashto), alpha_cc (en).
func runStructural(rule string) runner {
	return func(a *args) (values, error) {
		shape, err := pile.ParseShape(a.str("shape"))
		inst, ierr := pile.ParseInstallation(a.str("installation"))
		m := structural.Member{Section: pile.Section{Shape: shape, Diameter: units.Length(a.optQty("diameter", units.DimLength)),
			Width: units.Length(a.optQty("width", units.DimLength)), Wall: units.Length(a.optQty("wall", units.DimLength)),
			Depth: units.Length(a.optQty("depth", units.DimLength)), Web: units.Length(a.optQty("web", units.DimLength)),
			Flange: units.Length(a.optQty("flange", units.DimLength))},
			Installation: inst, Concrete: units.Stress(a.optQty("concrete", units.DimStress)),
			SteelYield: units.Stress(a.optQty("steel", units.DimStress)), Rebar: units.Area(a.optQty("rebar", units.DimArea)),
			RebarYield: units.Stress(a.optQty("rebar_yield", units.DimStress)), Cased: a.optBool("cased")}
		var r structural.Rule
		switch rule {
		case "aashto":
			r = structural.AASHTO{Spiral: a.optBool("spiral"), GoodDriving: a.optBool("good_driving")}
		case "en":
			r = structural.Eurocode{AlphaCC: a.optNum("alpha_cc", 0)}
		default:
			r = structural.Allowable{}
		}
		if err := joinErr(joinErr(a.done(), err), ierr); err != nil {
			return nil, err
		}
		res, err := r.Compression(m)
		return values{"design": force(res.Design), "nominal": force(res.Nominal), "squash": force(res.Squash),
			"factor": num(res.Factor), "concrete_area": qv(float64(res.ConcreteArea), units.DimArea),
			"steel_area": qv(float64(res.SteelArea), units.DimArea), "design_diameter": length(res.DesignDiameter)}, err
	}
}

func runDesignDiameter(a *args) (values, error) {
	d := units.Length(a.qty("diameter", units.DimLength))
	if err := a.done(); err != nil {
		return nil, err
	}
	return values{"value": length(structural.DesignDiameter(d))}, nil
}

// ---- settle ----

func runIws(a *args) (values, error) {
	l := units.Length(a.qty("length", units.DimLength))
	d := units.Length(a.qty("diameter", units.DimLength))
	if err := a.done(); err != nil {
		return nil, err
	}
	return values{"value": num(settle.Iws(l, d))}, nil
}

func runVesicSettlement(a *args) (values, error) {
	v := settle.Vesic{Length: units.Length(a.qty("length", units.DimLength)),
		Diameter:    units.Length(a.qty("diameter", units.DimLength)),
		Area:        units.Area(a.qty("area", units.DimArea)),
		Perimeter:   units.Length(a.qty("perimeter", units.DimLength)),
		Modulus:     units.Stress(a.qty("modulus", units.DimStress)),
		TipLoad:     units.Force(a.optQty("tip_load", units.DimForce)),
		ShaftLoad:   units.Force(a.optQty("shaft_load", units.DimForce)),
		Xi:          a.num("xi"),
		Form:        settle.Elastic,
		SoilModulus: units.Stress(a.qty("soil_modulus", units.DimStress)),
		Poisson:     a.num("poisson"),
		Iwp:         a.optNum("iwp", 0),
	}
	if err := a.done(); err != nil {
		return nil, err
	}
	r, err := v.Settlement()
	return values{"shortening": length(r.Shortening), "tip": length(r.Tip), "shaft": length(r.Shaft),
		"total": length(r.Total), "iws": num(r.Iws)}, err
}

func runRandolphWroth(a *args) (values, error) {
	nu := a.num("poisson")
	rw := settle.RandolphWroth{Length: units.Length(a.qty("length", units.DimLength)),
		Radius:     units.Length(a.qty("radius", units.DimLength)),
		BaseRadius: units.Length(a.optQty("base_radius", units.DimLength)),
		Modulus:    units.Stress(a.qty("modulus", units.DimStress)),
		ShearTop:   settle.ShearModulus(units.Stress(a.qty("soil_modulus_top", units.DimStress)), nu),
		ShearTip:   settle.ShearModulus(units.Stress(a.qty("soil_modulus_tip", units.DimStress)), nu),
		ShearBase:  settle.ShearModulus(units.Stress(a.qty("soil_modulus_base", units.DimStress)), nu),
		Poisson:    nu}
	p := units.Force(a.qty("load", units.DimForce))
	if err := a.done(); err != nil {
		return nil, err
	}
	r, err := rw.Solve()
	if err != nil {
		return nil, err
	}
	wt := r.Settlement(p)
	return values{"xi": num(r.Xi), "rho": num(r.Rho), "lambda": num(r.Lambda), "zeta": num(r.Zeta),
		"mu_l": num(r.MuL), "head_settlement": length(wt), "base_settlement": length(wt * units.Length(r.BaseRatio)),
		"tip_share": num(r.TipShare)}, nil
}

// annexOf reads the annex: recommended (EN 1997-1 Annex A, the default)
// or uk.
func annexOf(a *args) pile.EN7Factors {
	switch s := a.optStr("annex", "recommended"); s {
	case "recommended":
		return pile.EN1997Recommended()
	case "uk":
		return pile.UKAnnex(a.optBool("sls_verified"))
	default:
		a.fail("annex", "%q: want recommended or uk", s)
	}
	return pile.EN1997Recommended()
}

func runAnnexXi(a *args) (values, error) {
	f := annexOf(a)
	n := a.num("profiles")
	if err := a.done(); err != nil {
		return nil, err
	}
	x3, x4, err := f.Xi(int(n))
	return values{"xi3": num(x3), "xi4": num(x4)}, err
}

func runAnnexCharacteristic(a *args) (values, error) {
	f := annexOf(a)
	cal := forces(a, "resistances")
	if err := a.done(); err != nil {
		return nil, err
	}
	r, err := f.Characteristic(cal)
	return values{"value": force(r)}, err
}

// runVerifyProfiles runs the resistances of several ground profiles
// (taken as shaft resistance) through a Eurocode 7 basis and gives the
// characteristic resistance and the design resistance of the named case.
func runVerifyProfiles(a *args) (values, error) {
	ap, err1 := pile.ParseApproach(a.str("approach"))
	inst, err2 := pile.ParseInstallation(a.str("installation"))
	e := pile.Eurocode7{Approach: ap, Total: a.optBool("total")}
	var cal []pile.ProfileResistance
	for _, r := range forces(a, "resistances") {
		cal = append(cal, pile.ProfileResistance{Shaft: r})
	}
	name := a.str("case")
	if err := joinErr(a.done(), joinErr(err1, err2)); err != nil {
		return nil, err
	}
	d, err := e.VerifyProfiles(inst, cal, 0, pile.Loads{})
	if err != nil {
		return nil, err
	}
	v := values{"characteristic": force(d.Characteristic.Compression)}
	for _, c := range d.Cases {
		if c.Case == name {
			v["rd"] = force(c.CompressionRd)
		}
	}
	return v, nil
}

// runAASHTO reads one resistance factor of an AASHTO preset: kind (tip,
// shaft or tension), method, with (for a tip calibrated with a shaft
// method) and drainage.
func runAASHTO(preset func() pile.LRFD, inst pile.Installation) runner {
	return func(a *args) (values, error) {
		kind, method, with := a.str("kind"), a.str("method"), a.optStr("with", "")
		var cls profile.Drainage
		switch d := a.str("drainage"); d {
		case "drained":
			cls = profile.Drained
		case "undrained":
			cls = profile.Undrained
		default:
			a.fail("drainage", "%q: want drained or undrained", d)
		}
		if err := a.done(); err != nil {
			return nil, err
		}
		cs, err := preset().Cases(inst)
		if err != nil {
			return nil, err
		}
		for _, r := range cs[0].Rows {
			if r.Kind.String() == kind && r.Method == method && (r.With == "" || r.With == with) &&
				(r.Class == profile.DrainageUnset || r.Class == cls) {
				return values{"factor": num(r.Value)}, nil
			}
		}
		return nil, fmt.Errorf("no %s factor for %s (with %q) in %s layers", kind, method, with, cls)
	}
}

// runDowndrag runs the unified method on one of two shafts: Das's granular
// fill over clay (fill_height, fill_unit_weight, saturated_unit_weight,
// friction_angle, delta_ratio: no friction in the fill, fn = K′·tan δ′·
// (γf·Hf + γ′z) in the clay, K′ = 1 − sin φ′, γw = 9.81 kN/m³), or a
// uniform unit shaft resistance fs. The tip force is given (tip_force,
// default 0) and the ground settles (a profile falling from 0.1 m at the
// head to 0 at the tip), so that the neutral plane is the force
// equilibrium; or, with tip_capacity, the tip force is found by settlement
// compatibility on a rigid pile (see below). With piles (n, default 1) it
// also gives group_drag_load = n·Qn.
func runDowndrag(a *args) (values, error) {
	L := a.qty("length", units.DimLength)
	d := a.qty("diameter", units.DimLength)
	p := math.Pi * d
	dd := settle.Downdrag{Load: units.Force(a.optQty("load", units.DimForce)), EA: 1e12, TipGiven: true,
		TipForce: units.Force(a.optQty("tip_force", units.DimForce)),
		Tip:      settle.TipSpring{Area: 1, Qp: 1e12},
		Ground:   []settle.SettlementPoint{{Depth: 0, Settlement: 0.1}, {Depth: units.Length(L), Settlement: 0}}}
	var hf float64
	if a.has("fs") {
		fs := units.Stress(a.qty("fs", units.DimStress))
		dd.Rows = []settle.ShaftRow{{Top: 0, Bottom: units.Length(L), Perimeter: units.Length(p), FsTop: fs, FsBottom: fs}}
	} else {
		hf = a.qty("fill_height", units.DimLength)
		gf := a.qty("fill_unit_weight", units.DimUnitWeight)
		gp := a.qty("saturated_unit_weight", units.DimUnitWeight) - 9.81e3
		phi := a.qty("friction_angle", units.DimAngle)
		k, t := 1-math.Sin(phi), math.Tan(a.num("delta_ratio")*phi)
		fn := func(z float64) units.Stress { return units.Stress(k * t * (gf*hf + gp*z)) }
		dd.Rows = []settle.ShaftRow{{Top: 0, Bottom: units.Length(hf), Perimeter: units.Length(p)},
			{Top: units.Length(hf), Bottom: units.Length(L), Perimeter: units.Length(p), FsTop: fn(0), FsBottom: fn(L - hf)}}
	}
	if a.has("tip_capacity") {
		// Settlement compatibility on a rigid pile: a linear q-z curve to
		// full mobilisation at qz_full, the ground settling linearly from
		// ground_settlement_head at the head to 0 at ground_settlement_depth.
		zf := a.qty("qz_full", units.DimLength)
		curve, err := settle.Points([]float64{0, zf}, []float64{0, 1}, false)
		if err != nil {
			return nil, err
		}
		dd.TipGiven, dd.EA = false, 1e18
		dd.Tip = settle.TipSpring{Area: 1, Qp: units.Stress(a.qty("tip_capacity", units.DimForce)), Curve: curve}
		dd.Ground = []settle.SettlementPoint{{Depth: 0, Settlement: units.Length(a.qty("ground_settlement_head", units.DimLength))},
			{Depth: units.Length(a.qty("ground_settlement_depth", units.DimLength)), Settlement: 0}}
	}
	piles := a.optNum("piles", 1) // n·Qn for a group of n piles, each with the same drag
	if err := a.done(); err != nil {
		return nil, err
	}
	if !(piles >= 1) {
		return nil, fmt.Errorf("settle: piles %g: want 1 or more", piles)
	}
	r, err := dd.Solve()
	if err != nil {
		return nil, err
	}
	return values{"neutral_plane": length(r.NeutralPlane), "neutral_depth_below_fill": length(r.NeutralPlane - units.Length(hf)),
		"drag_load": force(r.DragLoad), "max_force": force(r.MaxForce), "tip_force": force(r.TipForce),
		"ground_settlement_at_np": length(r.GroundAtNP), "group_drag_load": force(units.Force(piles) * r.DragLoad)}, nil
}

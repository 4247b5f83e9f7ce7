package verify

import (
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/units"
)

// addInsituRunners adds the runners of package insitu.
func addInsituRunners(r map[string]runner) {
	r["insitu.InterpretCPT"] = runInterpretCPT
	r["insitu.SBTIndex"] = runSBTIndex
	r["insitu.ZoneOf"] = runZoneOf
	r["insitu.OverburdenFactor"] = runOverburdenFactor
	r["insitu.RodFactor"] = runRodFactor
	r["insitu.BoreholeFactor"] = runBoreholeFactor
	r["insitu.SamplerFactor"] = runSamplerFactor
	r["insitu.PhiQtn.Phi"] = runPhiQtn
	r["insitu.PhiN160.Phi"] = runPhiN160
	r["insitu.CorrectSPT"] = runCorrectSPT
	r["insitu.StrengthN60.Su"] = runStrengthN60
	r["insitu.StrengthNkt.Su"] = runStrengthNkt
}

// runInterpretCPT interprets one reading: qc, fs, u2, area_ratio and the
// total and effective vertical stresses at its depth.
func runInterpretCPT(a *args) (values, error) {
	row := insitu.Row{Depth: units.Length(a.optQty("z", units.DimLength)),
		Qc: units.Stress(a.qty("qc", units.DimStress)), Fs: units.Stress(a.qty("fs", units.DimStress))}
	s := &insitu.Sounding{AreaRatio: a.optNum("area_ratio", 1)}
	if a.has("u2") {
		row.U2 = units.Stress(a.qty("u2", units.DimStress))
		s.HasU2 = true
	}
	s.Rows = []insitu.Row{row}
	sv := units.Stress(a.qty("sigma_v", units.DimStress))
	eff := units.Stress(a.qty("sigma_v_eff", units.DimStress))
	if err := a.done(); err != nil {
		return nil, err
	}
	p, err := insitu.InterpretCPT(s, func(units.Length) (units.Stress, units.Stress) { return sv, sv - eff }, nil)
	if err != nil {
		return nil, err
	}
	q := p[0]
	return values{"qt": stress(q.Qt), "qnet": stress(q.Qnet), "fr": num(q.Fr), "bq": num(q.Bq), "qtn": num(q.Qtn),
		"n": num(q.N), "ic": num(q.Ic), "zone": num(float64(q.Zone))}, nil
}

func runSBTIndex(a *args) (values, error) {
	qtn, fr := a.num("qtn"), a.num("fr")
	if err := a.done(); err != nil {
		return nil, err
	}
	ic, err := insitu.SBTIndex(qtn, fr)
	return values{"ic": num(ic)}, err
}

func runZoneOf(a *args) (values, error) {
	ic := a.num("ic")
	if err := a.done(); err != nil {
		return nil, err
	}
	return values{"zone": num(float64(insitu.ZoneOf(ic)))}, nil
}

func runOverburdenFactor(a *args) (values, error) {
	eff := units.Stress(a.qty("sigma_v_eff", units.DimStress))
	pa := units.Stress(a.qty("pa", units.DimStress))
	if err := a.done(); err != nil {
		return nil, err
	}
	cn, err := insitu.OverburdenFactor(eff, pa)
	return values{"cn": num(cn)}, err
}

func runRodFactor(a *args) (values, error) {
	l := units.Length(a.qty("rod_length", units.DimLength))
	if err := a.done(); err != nil {
		return nil, err
	}
	f, err := insitu.RodFactor(l)
	return values{"cr": num(f)}, err
}

func runBoreholeFactor(a *args) (values, error) {
	d := units.Length(a.qty("diameter", units.DimLength))
	if err := a.done(); err != nil {
		return nil, err
	}
	f, err := insitu.BoreholeFactor(d)
	return values{"cb": num(f)}, err
}

func runSamplerFactor(a *args) (values, error) {
	name := a.str("sampler")
	if err := a.done(); err != nil {
		return nil, err
	}
	s, ok := insitu.ParseSampler(name)
	if !ok {
		a.fail("sampler", "%q is not no-liner, liner-dense or liner-loose", name)
		return nil, a.done()
	}
	f, err := insitu.SamplerFactor(s)
	return values{"cs": num(f)}, err
}

func runPhiQtn(a *args) (values, error) {
	p := &insitu.Point{Qtn: a.num("qtn"), Ic: a.num("ic")}
	if err := a.done(); err != nil {
		return nil, err
	}
	phi, err := (insitu.PhiQtn{}).Phi(p)
	return values{"phi": qv(float64(phi), units.DimAngle)}, err
}

func runPhiN160(a *args) (values, error) {
	c := &insitu.CorrectedSPT{N160: a.num("n160")}
	er := a.optNum("er", 0)
	if err := a.done(); err != nil {
		return nil, err
	}
	phi, err := (insitu.PhiN160{ER: er}).Phi(c)
	return values{"phi": qv(float64(phi), units.DimAngle)}, err
}

// runCorrectSPT corrects one test: n, energy_ratio (percent), rod_length,
// borehole (optional), sampler (optional, no-liner by default) and the
// total and effective vertical stresses at its depth.
func runCorrectSPT(a *args) (values, error) {
	t := insitu.SPT{Depth: units.Length(a.optQty("z", units.DimLength)), N: a.num("n"), EnergyRatio: a.num("energy_ratio"),
		RodLength: units.Length(a.qty("rod_length", units.DimLength)), Borehole: units.Length(a.optQty("borehole", units.DimLength))}
	name := a.optStr("sampler", "no-liner")
	s, ok := insitu.ParseSampler(name)
	if !ok {
		a.fail("sampler", "%q is not no-liner, liner-dense or liner-loose", name)
	}
	t.Sampler = s
	sv := units.Stress(a.qty("sigma_v", units.DimStress))
	eff := units.Stress(a.qty("sigma_v_eff", units.DimStress))
	if err := a.done(); err != nil {
		return nil, err
	}
	c, err := insitu.CorrectSPT([]insitu.SPT{t}, func(units.Length) (units.Stress, units.Stress) { return sv, sv - eff }, nil)
	if err != nil {
		return nil, err
	}
	return values{"n60": num(c[0].N60), "cn": num(c[0].CN), "n160": num(c[0].N160)}, nil
}

func runStrengthN60(a *args) (values, error) {
	f1 := units.Stress(a.qty("f1", units.DimStress))
	c := &insitu.CorrectedSPT{N60: a.num("n60")}
	if err := a.done(); err != nil {
		return nil, err
	}
	su, err := (insitu.StrengthN60{F1: f1}).Su(c)
	return values{"su": stress(su)}, err
}

func runStrengthNkt(a *args) (values, error) {
	nkt := a.num("nkt")
	p := &insitu.Point{Qnet: units.Stress(a.qty("qnet", units.DimStress)), Ic: a.num("ic")}
	if err := a.done(); err != nil {
		return nil, err
	}
	su, err := (insitu.StrengthNkt{Nkt: nkt}).Su(p)
	return values{"su": stress(su)}, err
}

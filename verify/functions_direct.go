package verify

import (
	"fmt"

	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/units"
)

// addDirectRunners adds the runners of the direct CPT methods (package
// insitu).
func addDirectRunners(r map[string]runner) {
	r["insitu.LCPCTip.Tip"] = func(a *args) (values, error) {
		m := insitu.LCPCTip{Kc: a.num("kc"), Limit: units.Stress(a.optQty("limit", units.DimStress))}
		return runDirectTip(a, m)
	}
	r["insitu.SchmertmannTip.Tip"] = func(a *args) (values, error) {
		return runDirectTip(a, insitu.SchmertmannTip{Limit: units.Stress(a.qty("limit", units.DimStress))})
	}
	r["insitu.EslamiFelleniusTip.Tip"] = func(a *args) (values, error) {
		return runDirectTip(a, insitu.EslamiFelleniusTip{Ct: a.optNum("ct", 0)})
	}
	r["insitu.LCPCShaft.Integral"] = func(a *args) (values, error) {
		m := insitu.LCPCShaft{Alpha: a.num("alpha"), Limit: units.Stress(a.qty("limit", units.DimStress))}
		return runDirectShaft(a, m)
	}
	r["insitu.EslamiFelleniusShaft.Integral"] = func(a *args) (values, error) {
		return runDirectShaft(a, insitu.EslamiFelleniusShaft{Cs: a.num("cs")})
	}
	r["insitu.SchmertmannSandShaft.Integral"] = func(a *args) (values, error) {
		m := insitu.SchmertmannSandShaft{K: a.num("k"), Limit: units.Stress(a.optQty("limit", units.DimStress))}
		return runDirectShaft(a, m)
	}
	r["insitu.SchmertmannClayShaft.Integral"] = func(a *args) (values, error) {
		m := insitu.SchmertmannClayShaft{Alpha: a.num("alpha"), Limit: units.Stress(a.optQty("limit", units.DimStress))}
		return runDirectShaft(a, m)
	}
}

// coneRows reads the sounding of a case: rows of [depth in m, qc in MPa],
// [depth, qc, u2 in MPa] or [depth, qc, u2, fs in kPa], with the cone's
// area ratio (default 1).
func coneRows(a *args) (*insitu.Cone, error) {
	s := &insitu.Sounding{ID: "case", AreaRatio: a.optNum("area_ratio", 1)}
	for i, v := range a.list("rows") {
		row, ok := v.([]any)
		if !ok || len(row) < 2 || len(row) > 4 {
			a.fail("rows", "row %d: want [depth m, qc MPa], [depth m, qc MPa, u2 MPa] or [depth m, qc MPa, u2 MPa, fs kPa]", i)
			continue
		}
		key := fmt.Sprintf("rows[%d]", i)
		r := insitu.Row{Depth: units.Length(a.toNum(key, row[0])), Qc: units.Stress(a.toNum(key, row[1])) * units.Megapascal}
		if len(row) >= 3 {
			r.U2 = units.Stress(a.toNum(key, row[2])) * units.Megapascal
			s.HasU2 = true
		}
		if len(row) == 4 {
			r.Fs = units.Stress(a.toNum(key, row[3])) * units.Kilopascal
		}
		s.Rows = append(s.Rows, r)
	}
	if len(a.errs) > 0 {
		return nil, nil
	}
	return insitu.NewCone(s)
}

func runDirectTip(a *args, m insitu.DirectTip) (values, error) {
	tip := units.Length(a.qty("tip", units.DimLength))
	b := units.Length(a.qty("b", units.DimLength))
	c, err := coneRows(a)
	if err := a.done(); err != nil {
		return nil, err
	}
	if err != nil {
		return nil, err
	}
	r, err := m.Tip(c, tip, b)
	if err != nil {
		return nil, err
	}
	v := values{"qp": stress(r.Qp), "cone": stress(r.Cone)}
	if r.Qc1 > 0 || r.Qc2 > 0 {
		v["qc1"], v["qc2"] = stress(r.Qc1), stress(r.Qc2)
	}
	return v, nil
}

func runDirectShaft(a *args, m insitu.DirectShaft) (values, error) {
	top := units.Length(a.qty("top", units.DimLength))
	bot := units.Length(a.qty("bottom", units.DimLength))
	b := units.Length(a.optQty("b", units.DimLength)) // pile width, for the rules that read it
	c, err := coneRows(a)
	if err := a.done(); err != nil {
		return nil, err
	}
	if err != nil {
		return nil, err
	}
	q, _, err := m.Integral(c, top, bot, b)
	if err != nil {
		return nil, err
	}
	return values{"integral": qv(q, units.DimForcePerLength)}, nil
}

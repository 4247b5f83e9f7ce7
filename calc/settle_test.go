package calc

// Sources: the calc files here are our own (examples/warehouse-driven-settle.yaml,
// invented numbers). Expected values come from direct calls of package
// settle with the same inputs (its methods carry their own published
// checks), or from the closed forms written beside them (Vesic 1977 as
// presented by Das 2019: se1 = (Qwp + ξ·Qws)·L/(Ap·Ep), se2 =
// (qwp·D/Es)(1 − ν²)·Iwp, se3 = (Qws/(p·L))(D/Es)(1 − ν²)·Iws).

import (
	"errors"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/settle"
	"github.com/qultgeo/qult/units"
)

func settleExample(t *testing.T) string {
	t.Helper()
	b, err := os.ReadFile(filepath.Join("..", "examples", "warehouse-driven-settle.yaml"))
	if err != nil {
		t.Fatal(err)
	}
	return string(b)
}

// parseWith runs the example with each old → new replacement made (each
// must match).
func parseWith(t *testing.T, repl ...string) (*Result, error) {
	t.Helper()
	s := settleExample(t)
	for i := 0; i+1 < len(repl); i += 2 {
		if !strings.Contains(s, repl[i]) {
			t.Fatalf("the example has no %q", repl[i])
		}
		s = strings.Replace(s, repl[i], repl[i+1], 1)
	}
	return Parse([]byte(s))
}

func near(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Abs(want)
}

// TestSettleLoadTransferMatchesLibrary: the calc file's result is that of
// a direct call of package settle on the same breakdown, EA and curves.
func TestSettleLoadTransferMatchesLibrary(t *testing.T) {
	res, err := parseWith(t)
	if err != nil {
		t.Fatal(err)
	}
	s := res.Settlement
	if s == nil || s.Method != SettleLoadTransfer {
		t.Fatalf("settlement %+v", s)
	}
	// 500 + 200 kN, the characteristic compression load of the example.
	if s.Load != 700*units.Kilonewton || s.LoadFrom != "loads.compression" {
		t.Errorf("load %v from %s, want 700 kN from loads.compression", s.Load, s.LoadFrom)
	}
	ea := units.Force(32e9 * 0.4 * 0.4) // E × B² of the 400 mm square section
	if !near(float64(s.EA), float64(ea), 1e-12) {
		t.Errorf("EA %v, want %v", s.EA, ea)
	}
	api, _ := settle.APICurves(0)
	m, err := settle.FromBreakdown(res.Breakdown, 0.4, ea, api, settle.APITip())
	if err != nil {
		t.Fatal(err)
	}
	sv, err := settle.NewSolver(m, nil)
	if err != nil {
		t.Fatal(err)
	}
	var loads []units.Force
	for i := 1; i <= 10; i++ {
		loads = append(loads, 70*units.Kilonewton*units.Force(i))
	}
	run, err := sv.Run(loads)
	if err != nil || run.Plunged {
		t.Fatal(err, run.Plunged)
	}
	last := run.Steps[len(run.Steps)-1]
	if !near(float64(s.Settlement), float64(last.Settlement), 1e-9) || !near(s.TipShare, last.TipShare, 1e-9) {
		t.Errorf("settlement %v, tip share %v; direct call %v, %v", s.Settlement, s.TipShare, last.Settlement, last.TipShare)
	}
	if len(s.AxialLoad) != len(run.Depth) || len(s.Depth) != len(run.Depth) || !near(float64(s.AxialLoad[0]), 700e3, 1e-6) {
		t.Errorf("axial load with depth: %d nodes, head %v", len(s.AxialLoad), s.AxialLoad)
	}
	// 15 mm allowable in the example.
	if !s.HasAllowable || s.Allowable != 15*units.Millimetre || !s.Pass || !res.ServiceabilityPass() {
		t.Errorf("serviceability %v ≤ %v: pass %v", s.Settlement, s.Allowable, s.Pass)
	}
	if len(s.Curve) < 10 || s.Curve[0] != (CurvePoint{}) {
		t.Errorf("curve %v", s.Curve)
	}
	for i := 1; i < len(s.Curve); i++ {
		if !(s.Curve[i].Settlement > s.Curve[i-1].Settlement) {
			t.Errorf("curve settlement does not rise at %d: %v", i, s.Curve)
		}
	}
	for _, c := range s.LayerCurves {
		want := map[string]string{"firm brown clay": "api-clay", "medium dense sand": "api-sand"}[c.Layer]
		if c.Curve != want {
			t.Errorf("layer %s curve %s, want %s", c.Layer, c.Curve, want)
		}
	}
}

// TestSettleGivenCurves: a layer's own t-z points and the tip's q-z
// points reach the solver (compared with a direct call).
func TestSettleGivenCurves(t *testing.T) {
	res, err := parseWith(t, "      youngs_modulus: 60 MPa\n", "      youngs_modulus: 60 MPa\n      t_z: {points: [[0, 0], [0.005, 0.6], [0.02, 1]], per_diameter: true}\n",
		"  allowable: 15 mm\n", "  allowable: 15 mm\n  load: 900 kN\n  residual: 0.9\n  q_z:\n    points: [[0 mm, 0], [10 mm, 0.5], [40 mm, 1]]\n  elements: 60\n")
	if err != nil {
		t.Fatal(err)
	}
	s := res.Settlement
	tz, _ := settle.Points([]float64{0, 0.005, 0.02}, []float64{0, 0.6, 1}, true)
	qz, _ := settle.Points([]float64{0, 0.01, 0.04}, []float64{0, 0.5, 1}, false)
	clay, _ := settle.APIClay(0.9)
	m, err := settle.FromBreakdown(res.Breakdown, 0.4, s.EA, func(r pile.Row) settle.Curve {
		if r.LayerName == "medium dense sand" {
			return tz
		}
		return clay
	}, qz)
	if err != nil {
		t.Fatal(err)
	}
	sv, _ := settle.NewSolver(m, &settle.Options{Elements: 60})
	var loads []units.Force
	for i := 1; i <= 10; i++ {
		loads = append(loads, 90*units.Kilonewton*units.Force(i))
	}
	run, err := sv.Run(loads)
	if err != nil || run.Plunged {
		t.Fatal(err)
	}
	if want := run.Steps[9].Settlement; !near(float64(s.Settlement), float64(want), 1e-9) {
		t.Errorf("settlement %v, direct call %v", s.Settlement, want)
	}
	if s.Load != 900*units.Kilonewton || s.LoadFrom != "settlement.load" || s.TipCurve != "points" || s.Residual != 0.9 {
		t.Errorf("load %v from %s, tip curve %s, residual %v", s.Load, s.LoadFrom, s.TipCurve, s.Residual)
	}
}

// TestSettleVesicClosedForm: Vesic's elastic form against its closed
// form with the example's numbers: Es and ν of the sand at the tip for
// se2, their length-weighted means along the shaft for se3.
func TestSettleVesicClosedForm(t *testing.T) {
	res, err := parseWith(t, "method: load-transfer", "method: vesic\n  vesic: {form: elastic, xi: 0.5}")
	if err != nil {
		t.Fatal(err)
	}
	s := res.Settlement
	qs, qp := float64(res.Breakdown.Capacity.Shaft), float64(res.Breakdown.Capacity.Tip)
	q := 700e3
	qwp, qws := q*qp/(qs+qp), q*qs/(qs+qp)
	L, D, A, p := 18.0, 0.4, 0.16, 1.6
	ea := 32e9 * 0.16
	se1 := (qwp + 0.5*qws) * L / ea
	se2 := (qwp / A) * D / 60e6 * (1 - 0.09) * 0.85
	// Along the shaft: 6 m of clay (G 12 MPa, ν 0.5: E = 2G(1 + ν) =
	// 36 MPa) and 12 m of sand (E 60 MPa, ν 0.3).
	es := (6*36e6 + 12*60e6) / 18
	nu := (6*0.5 + 12*0.3) / 18
	iws := 2 + 0.35*math.Sqrt(L/D)
	se3 := qws / (p * L) * D / es * (1 - nu*nu) * iws
	if s.Vesic == nil {
		t.Fatal("no Vesic result")
	}
	for _, c := range []struct {
		name      string
		got, want float64
	}{{"se1", float64(s.Vesic.Shortening), se1}, {"se2", float64(s.Vesic.Tip), se2}, {"se3", float64(s.Vesic.Shaft), se3},
		{"total", float64(s.Settlement), se1 + se2 + se3}} {
		if !near(c.got, c.want, 1e-9) {
			t.Errorf("%s = %.6g m, want %.6g m", c.name, c.got, c.want)
		}
	}
	// Empirical form with Cp of the loose end for driven piles in sand,
	// 0.04 (settle.CpRange, from Das's table): se2 = Qwp·Cp/(D·qp).
	res, err = parseWith(t, "method: load-transfer", "method: vesic\n  vesic: {form: empirical}")
	if err != nil {
		t.Fatal(err)
	}
	s = res.Settlement
	wantTip := qwp * 0.04 / (D * float64(res.Breakdown.Tip.Qp))
	if !near(float64(s.Vesic.Tip), wantTip, 1e-9) {
		t.Errorf("empirical se2 = %v, want %v", float64(s.Vesic.Tip), wantTip)
	}
}

// TestSettleRandolphWroth: the head stiffness of a direct call with G
// linear through the mean over the shaft and GL at the tip level.
func TestSettleRandolphWroth(t *testing.T) {
	res, err := parseWith(t, "method: load-transfer", "method: randolph-wroth")
	if err != nil {
		t.Fatal(err)
	}
	s := res.Settlement
	gSand := 60e6 / (2 * 1.3) // G = E/(2(1 + ν))
	gAvg := (6*12e6 + 12*gSand) / 18
	rw := settle.RandolphWroth{Length: 18, Radius: 0.2, Modulus: units.Stress(32e9 * 0.16 / (math.Pi * 0.04)),
		ShearTop: units.Stress(2*gAvg - gSand), ShearTip: units.Stress(gSand), ShearBase: units.Stress(gSand),
		Poisson: (6*0.5 + 12*0.3) / 18}
	rr, err := rw.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if want := rr.Settlement(700e3); !near(float64(s.Settlement), float64(want), 1e-9) || !near(s.TipShare, rr.TipShare, 1e-12) {
		t.Errorf("settlement %v tip share %v, want %v, %v", s.Settlement, s.TipShare, want, rr.TipShare)
	}
}

// TestSettleFailsAndPlunges: an allowable below the settlement fails the
// serviceability check; a load above the capacity plunges with a clear
// result and no NaN.
func TestSettleFailsAndPlunges(t *testing.T) {
	res, err := parseWith(t, "allowable: 15 mm", "allowable: 1 mm")
	if err != nil {
		t.Fatal(err)
	}
	if res.Settlement.Pass || res.ServiceabilityPass() || !strings.Contains(strings.Join(res.Warnings, "\n"), "serviceability check fails") {
		t.Errorf("1 mm allowable: pass %v, warnings %q", res.Settlement.Pass, res.Warnings)
	}
	for _, m := range []string{SettleLoadTransfer, SettleVesic, SettleRandolphWroth} {
		res, err := parseWith(t, "method: load-transfer", "method: "+m, "allowable: 15 mm", "allowable: 15 mm\n  load: 5000 kN")
		if err != nil {
			t.Fatal(m, err)
		}
		s := res.Settlement
		capacity := res.Breakdown.Capacity.Shaft + res.Breakdown.Capacity.Tip
		if !s.Plunged || s.Pass || !(s.PlungeLoad > 0) || s.PlungeLoad > capacity*(1+1e-6) || s.Settlement != 0 {
			t.Errorf("%s at 5000 kN: plunged %v at %v (capacity %v), pass %v, settlement %v", m, s.Plunged, s.PlungeLoad, capacity, s.Pass, s.Settlement)
		}
		for _, c := range s.Curve {
			if math.IsNaN(float64(c.Settlement)) || math.IsInf(float64(c.Settlement), 0) {
				t.Errorf("%s: curve holds %v", m, c)
			}
		}
	}
}

// TestLoadTestMatchesLibrary: the criteria read from the calc file are
// those of direct calls on the same points.
func TestLoadTestMatchesLibrary(t *testing.T) {
	res, err := parseWith(t)
	if err != nil {
		t.Fatal(err)
	}
	kN, mm := units.Kilonewton, units.Millimetre
	lt := settle.LoadTest{
		Load:       []units.Force{0, 300 * kN, 600 * kN, 900 * kN, 1200 * kN, 1500 * kN, 1700 * kN, 1850 * kN},
		Settlement: []units.Length{0, 1.1 * mm, 2.4 * mm, 4 * mm, 6.3 * mm, 9.8 * mm, 14.5 * mm, 22 * mm},
	}
	dav, _ := settle.Davisson(lt, 18, units.Force(32e9*0.16), 0.4)
	ten, _ := settle.TenPercent(lt, 0.4)
	chin, _ := settle.ChinKondner(lt, 3)
	bh, _ := settle.BrinchHansen80(lt, 3)
	want := []settle.Limit{dav, ten, chin, bh}
	got := res.LoadTest.Limits
	if len(got) != 4 {
		t.Fatalf("%d criteria, want 4", len(got))
	}
	for i, w := range want {
		if got[i].Criterion != w.Criterion || got[i].Reached != w.Reached || !near(float64(got[i].Load), float64(w.Load), 1e-12) {
			t.Errorf("%s: %v %v, want %v %v", w.Criterion, got[i].Reached, got[i].Load, w.Reached, w.Load)
		}
	}
	// A test without an asymptote (settlement proportional to load: s/Q
	// constant, slope 0) is a note and a warning, not an error.
	s := settleExample(t)
	s = s[:strings.Index(s, "load_test:")] + "load_test:\n  points: [[0, 0], [100 kN, 1 mm], [200 kN, 2 mm], [300 kN, 3 mm]]\n  criteria: [chin-kondner]\n"
	res, err = Parse([]byte(s))
	if err != nil {
		t.Fatal(err)
	}
	if l := res.LoadTest.Limits; len(l) != 1 || l[0].Reached || l[0].Note == "" || l[0].Load != 0 ||
		!strings.Contains(strings.Join(res.Warnings, "\n"), "load test, chin-kondner") {
		t.Errorf("linear test: %+v, warnings %q", l, res.Warnings)
	}
}

// TestSettleBadInput: each problem names its key and line.
func TestSettleBadInput(t *testing.T) {
	cases := []struct {
		name string
		repl []string
		path string
		text string
	}{
		{"missing E for vesic", []string{"method: load-transfer", "method: vesic", "      youngs_modulus: 60 MPa\n", ""},
			"ground.layers[1].youngs_modulus", "not given"},
		{"missing G for randolph-wroth", []string{"method: load-transfer", "method: randolph-wroth", "      shear_modulus: 12 MPa\n", ""},
			"ground.layers[0].shear_modulus", "not given"},
		{"missing nu", []string{"method: load-transfer", "method: randolph-wroth", "      poissons_ratio: 0.3\n", ""},
			"ground.layers[1].poissons_ratio", "not given"},
		{"missing pile E", []string{"  youngs_modulus: 32 GPa\n", ""}, "pile.youngs_modulus", "not given"},
		{"falling load", []string{"[1200 kN, 6.3 mm]", "[800 kN, 6.3 mm]"}, "load_test.points[4][0]", "must not fall"},
		{"settlement not rising", []string{"[1200 kN, 6.3 mm]", "[1200 kN, 3.9 mm]"}, "load_test.points[4][1]", "must rise"},
		{"negative stiffness", []string{"      youngs_modulus: 60 MPa\n", "      youngs_modulus: 60 MPa\n      t_z: {points: [[0, 0], [2 mm, 0.8], [4 mm, 0.6], [6 mm, 1]]}\n"},
			"ground.layers[1].t_z.points[2][1]", "negative stiffness"},
		{"t_z without load transfer", []string{"method: load-transfer", "method: vesic", "      youngs_modulus: 60 MPa\n", "      youngs_modulus: 60 MPa\n      t_z: {points: [[0, 0], [2 mm, 1]]}\n"},
			"ground.layers[1].t_z", "only settlement.method load-transfer"},
		{"unknown method", []string{"method: load-transfer", "method: guess"}, "settlement.method", "load-transfer, vesic, randolph-wroth"},
		{"no load", []string{"loads:\n  compression: {permanent: 500 kN, variable: 200 kN}\n", "", "design:\n  basis: safety-factor\n  factor: 2.5\n", ""},
			"settlement.load", "not given"},
		{"unknown criterion", []string{"  fit_from: 3", "  fit_from: 3\n  criteria: [davisson, eyeball]"}, "load_test.criteria[1]", "eyeball"},
		{"fit_from too late", []string{"  fit_from: 3", "  fit_from: 6"}, "load_test.fit_from", "outside 0 to 5"},
		{"vesic key on load transfer", []string{"allowable: 15 mm", "allowable: 15 mm\n  vesic: {cp: 0.03}"}, "settlement.vesic", "does not read vesic"},
		{"cp on elastic form", []string{"method: load-transfer", "method: vesic\n  vesic: {cp: 0.03}"}, "settlement.vesic.cp", "empirical form does"},
		{"allowable as force", []string{"allowable: 15 mm", "allowable: 15 kN"}, "settlement.allowable", "length"},
	}
	for _, c := range cases {
		_, err := parseWith(t, c.repl...)
		var ps Problems
		if !errors.As(err, &ps) {
			t.Errorf("%s: err %v, want Problems", c.name, err)
			continue
		}
		found := false
		for _, p := range ps {
			if p.Path == c.path && strings.Contains(p.Msg, c.text) {
				found = true
				if p.Line == 0 {
					t.Errorf("%s: %s has no line", c.name, p.Path)
				}
			}
		}
		if !found {
			t.Errorf("%s: want %s with %q, got %v", c.name, c.path, c.text, err)
		}
	}
}

// TestSchemaAcceptsSettlement: the settlement keys the decoder accepts,
// the schema (checked by an independent validator) accepts too.
func TestSchemaAcceptsSettlement(t *testing.T) {
	sch := compileSchema(t)
	for _, repl := range [][]string{
		{"method: load-transfer", "method: vesic\n  vesic: {form: empirical, xi: 0.5, cp: 0.03}"},
		{"method: load-transfer", "method: vesic\n  vesic: {form: elastic, iwp: 0.9}"},
		{"method: load-transfer", "method: randolph-wroth"},
		{"      youngs_modulus: 60 MPa\n", "      youngs_modulus: 60 MPa\n      t_z: {points: [[0, 0], [0.005, 0.6], [0.02, 1]], per_diameter: true}\n",
			"  allowable: 15 mm\n", "  allowable: 15 mm\n  load: 900 kN\n  residual: 0.9\n  q_z: {points: [[0 mm, 0], [10 mm, 0.5], [40 mm, 1]]}\n  elements: 60\n  tolerance: 1e-8\n"},
		{"  fit_from: 3", "  fit_from: 3\n  criteria: [davisson, chin-kondner]"},
	} {
		s := settleExample(t)
		for i := 0; i+1 < len(repl); i += 2 {
			s = strings.Replace(s, repl[i], repl[i+1], 1)
		}
		if err := sch.Validate(instance(t, []byte(s))); err != nil {
			t.Errorf("%v: schema: %v", repl, err)
		}
		if _, err := Parse([]byte(s)); err != nil {
			t.Errorf("%v: decoder: %v", repl, err)
		}
	}
	// And refuses what the decoder refuses by form: a point that is not a pair.
	bad := strings.Replace(settleExample(t), "[300 kN, 1.1 mm]", "[300 kN, 1.1 mm, 4]", 1)
	if err := sch.Validate(instance(t, []byte(bad))); err == nil {
		t.Error("schema accepts a load-test point of three values")
	}
	if _, err := Parse([]byte(bad)); err == nil {
		t.Error("decoder accepts a load-test point of three values")
	}
}

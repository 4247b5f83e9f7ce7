package calc

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/settle"
	"github.com/qultgeo/qult/units"
)

// The settlement methods of the calc file.
const (
	SettleLoadTransfer  = "load-transfer"
	SettleVesic         = "vesic"
	SettleRandolphWroth = "randolph-wroth"
)

// settleMethods lists the settlement methods, the default first.
var settleMethods = []string{SettleLoadTransfer, SettleVesic, SettleRandolphWroth}

// LoadTestCriteria lists the identifiers of the load-test criteria, in
// the order a result gives them.
var LoadTestCriteria = []string{"davisson", "ten-percent", "chin-kondner", "brinch-hansen-80"}

// SettleInputs is the settlement section resolved (SI).
type SettleInputs struct {
	Method       string
	Allowable    units.Length
	HasAllowable bool
	Load         units.Force // 0 when not given (then loads.compression)
	HasLoad      bool
	Residual     float64              // 0 means settle.DefaultResidual
	TZ           map[int]settle.Curve // the layers' own t-z curves, by layer index
	QZ           *settle.Curve        // the tip's own q-z curve
	Options      settle.Options       // zero fields mean the defaults
	Form         settle.TipForm       // vesic
	Xi, Iwp, Cp  float64              // vesic; 0 means the default
	hasXi        bool
}

// LoadTestInputs is the load-test section resolved (SI).
type LoadTestInputs struct {
	Test     settle.LoadTest
	FitFrom  int
	Criteria []string
}

// SettlementResult is the settlement of the pile at the serviceability
// load by one method, with the predicted load-settlement curve.
//
// Choices where the sources leave it open: the serviceability load is
// settlement.load, or else the characteristic compression load of loads
// (permanent + variable, unfactored). The serviceability check fails when
// the settlement exceeds the allowable one, and whenever the pile cannot
// carry the load (Plunged), allowable or not.
type SettlementResult struct {
	Method   string // load-transfer, vesic or randolph-wroth
	Equation string
	// Load is the serviceability load and LoadFrom the key it came from
	// (settlement.load or loads.compression).
	Load     units.Force
	LoadFrom string
	// Allowable is the allowable settlement (HasAllowable false: none).
	Allowable    units.Length
	HasAllowable bool
	// Settlement is the head settlement at Load; 0 when Plunged.
	Settlement units.Length
	// Plunged: the pile cannot carry Load; PlungeLoad is the largest head
	// load it carries (load transfer: the peak of its load path; the
	// elastic methods: the capacity Qs + Qp of the pile analysis, beyond
	// which they do not apply).
	Plunged    bool
	PlungeLoad units.Force
	// Pass is the serviceability check: not Plunged, and Settlement ≤
	// Allowable when an allowable is given.
	Pass bool
	// ShaftLoad and TipLoad are the loads carried by the shaft and the
	// tip at Load, ShaftShare and TipShare their shares of it.
	ShaftLoad, TipLoad   units.Force
	ShaftShare, TipShare float64
	// TipMove is the displacement of the tip at Load (load transfer and
	// Randolph & Wroth; 0 for Vesic).
	TipMove units.Length
	// EA is the axial stiffness of the pile (pile.youngs_modulus × the
	// material area); ShaftCapacity and TipCapacity those of the pile
	// analysis the methods read.
	EA                         units.Force
	ShaftCapacity, TipCapacity units.Force
	// Curve is the predicted load-settlement curve from the unloaded pile
	// (load transfer: under head displacements to beyond the load test or
	// 10 % of the diameter; the elastic methods: a straight line to the
	// capacity Qs + Qp).
	Curve []CurvePoint
	// Depth, AxialLoad and Displacement are the axial force and the
	// displacement of the pile at each node at Load (load transfer only;
	// empty for the elastic methods and when Plunged).
	Depth        []units.Length
	AxialLoad    []units.Force
	Displacement []units.Length

	// Load transfer: the curve of each shaft segment's layer and of the
	// tip, the mesh and the iterations.
	LayerCurves        []LayerCurve
	TipCurve           string
	Elements           int
	Iterations         int
	ShaftMobilised     float64
	TipMobilised       float64
	Residual           float64
	Tolerance          float64
	VesicInputs        *settle.Vesic
	VesicShaftModulus  units.Stress // Es (and ν below) used for se3 (elastic form)
	VesicShaftPoisson  float64
	Vesic              *settle.VesicResult
	RandolphWrothInput *settle.RandolphWroth
	RandolphWroth      *settle.RandolphWrothResult
	Notes              []string
}

// CurvePoint is one point of a load-settlement curve.
type CurvePoint struct {
	Load       units.Force
	Settlement units.Length
}

// LayerCurve names the t-z curve used in one layer.
type LayerCurve struct {
	Layer string
	Curve string // api-clay, api-sand or points
}

// LoadTestResult is a static load test read by the chosen criteria.
type LoadTestResult struct {
	Points  []CurvePoint
	FitFrom int
	// Length, EA and Diameter are the pile's, as Davisson's line reads
	// them (EA 0 when pile.youngs_modulus is not given).
	Length, Diameter units.Length
	EA               units.Force
	Limits           []LoadTestLimit
}

// LoadTestLimit is one criterion's reading; Note says why a criterion
// gave no load (the points show no asymptote, too few points).
type LoadTestLimit struct {
	settle.Limit
	Note string
}

// ServiceabilityPass reports whether the serviceability check passes: true
// without a settlement section.
func (r *Result) ServiceabilityPass() bool {
	return r.Settlement == nil || r.Settlement.Pass
}

// settlement resolves the settlement and load-test sections.
func (r *resolver) settlement(f *File, in *Inputs) {
	s := f.Settlement
	for i, l := range f.Ground.Layers {
		if l.TZ != nil && (s == nil || methodOf(s) != SettleLoadTransfer) {
			r.add(fmt.Sprintf("ground.layers[%d].t_z", i), 0, "only settlement.method load-transfer reads t_z curves; give that method, or leave t_z out")
		}
	}
	if s != nil {
		sp := &SettleInputs{Method: methodOf(s), TZ: map[int]settle.Curve{}}
		if !slices.Contains(settleMethods, sp.Method) {
			r.add("settlement.method", 0, "%q: want one of %s", s.Method, strings.Join(settleMethods, ", "))
		}
		if s.Allowable.IsSet() {
			sp.Allowable, sp.HasAllowable = r.length(s.Allowable, "settlement.allowable"), true
			if !(sp.Allowable > 0) && zeroValue(s.Allowable) || sp.Allowable < 0 {
				r.add("settlement.allowable", s.Allowable.Line, "%q: want a settlement above 0", s.Allowable.Raw)
			}
		}
		if s.Load.IsSet() {
			sp.Load, sp.HasLoad = r.force(s.Load, "settlement.load"), true
			if sp.Load < 0 || sp.Load > maxLoad || sp.Load == 0 && zeroValue(s.Load) {
				r.add("settlement.load", s.Load.Line, "%q is outside (0, %v]", s.Load.Raw, maxLoad)
			}
		}
		lt := sp.Method == SettleLoadTransfer
		only := func(key string, given bool, method string) {
			if given && sp.Method != method {
				r.add("settlement."+key, 0, "method %s does not read %s; only %s does", sp.Method, key, method)
			}
		}
		only("residual", s.Residual.IsSet(), SettleLoadTransfer)
		only("q_z", s.QZ != nil, SettleLoadTransfer)
		only("elements", s.Elements.IsSet(), SettleLoadTransfer)
		only("tolerance", s.Tolerance.IsSet(), SettleLoadTransfer)
		only("vesic", s.Vesic != nil, SettleVesic)
		if lt {
			sp.Residual = r.num(s.Residual, "settlement.residual", 0.7, 1)
			if s.Elements.IsSet() {
				e := r.num(s.Elements, "settlement.elements", 1, 100000)
				if e != math.Trunc(e) {
					r.add("settlement.elements", s.Elements.Line, "%q: want a whole number of elements", s.Elements.Raw)
				}
				sp.Options.Elements = int(e)
			}
			sp.Options.Tolerance = r.num(s.Tolerance, "settlement.tolerance", 1e-14, 1e-3)
			if s.QZ != nil {
				if c, ok := r.curve(s.QZ, "settlement.q_z"); ok {
					sp.QZ = &c
				}
			}
			for i, l := range f.Ground.Layers {
				if l.TZ != nil {
					if c, ok := r.curve(l.TZ, fmt.Sprintf("ground.layers[%d].t_z", i)); ok {
						sp.TZ[i] = c
					}
				}
			}
		}
		if v := s.Vesic; v != nil && sp.Method == SettleVesic {
			switch strings.TrimSpace(v.Form) {
			case "", "elastic":
				sp.Form = settle.Elastic
			case "empirical":
				sp.Form = settle.Empirical
			default:
				r.add("settlement.vesic.form", 0, "%q: want elastic or empirical", v.Form)
			}
			sp.Xi, sp.hasXi = r.num(v.Xi, "settlement.vesic.xi", 0, 1), v.Xi.IsSet()
			sp.Iwp = r.num(v.Iwp, "settlement.vesic.iwp", 0, 2)
			sp.Cp = r.num(v.Cp, "settlement.vesic.cp", 0, 0.5)
			if v.Iwp.IsSet() && sp.Form != settle.Elastic {
				r.add("settlement.vesic.iwp", v.Iwp.Line, "the empirical form does not read iwp; the elastic form does")
			}
			if v.Cp.IsSet() && sp.Form != settle.Empirical {
				r.add("settlement.vesic.cp", v.Cp.Line, "the elastic form does not read cp; the empirical form does")
			}
			for _, z := range []struct {
				key string
				v   Value
				x   float64
			}{{"iwp", v.Iwp, sp.Iwp}, {"cp", v.Cp, sp.Cp}} {
				if z.v.IsSet() && z.x == 0 && zeroValue(z.v) {
					r.add("settlement.vesic."+z.key, z.v.Line, "%q: zero is not an accepted value here (it must be above 0); leave the key out for the default", z.v.Raw)
				}
			}
		}
		in.Settle = sp
	}
	if t := f.LoadTest; t != nil {
		in.LoadTest = r.loadTest(t)
	}
}

func methodOf(s *Settlement) string {
	m := strings.TrimSpace(s.Method)
	if m == "" {
		return SettleLoadTransfer
	}
	return m
}

// curve reads a curve given as points. The library's own checks (the
// curve starts at (0, 0), displacements rise, ratios never fall and end
// at 1) name the point and whether its displacement or ratio is wrong.
func (r *resolver) curve(c *CurvePoints, path string) (settle.Curve, bool) {
	before := len(r.probs)
	var z, ratio []float64
	for i, p := range c.Points {
		pp := fmt.Sprintf("%s.points[%d]", path, i)
		if len(p) != 2 {
			r.add(pp, 0, "%d values; give a pair [displacement, ratio]", len(p))
			continue
		}
		var zi float64
		if c.PerDiameter {
			zi = r.num(p[0], pp+"[0]", 0, 1e3)
		} else {
			zi = float64(r.length(p[0], pp+"[0]"))
		}
		z = append(z, zi)
		ratio = append(ratio, r.num(p[1], pp+"[1]", 0, 1))
	}
	if len(r.probs) > before {
		return settle.Curve{}, false
	}
	cv, err := settle.Points(z, ratio, c.PerDiameter)
	if err != nil {
		msg := err.Error()
		sub, rest, _ := strings.Cut(msg, ": ")
		sub = strings.NewReplacer(".ratio", "[1]", ".z", "[0]").Replace(sub)
		if !strings.HasPrefix(sub, "points") {
			sub, rest = "points", msg
		}
		if !c.PerDiameter && strings.Contains(sub, "[0]") {
			rest += " (displacements in metres)"
		}
		r.add(path+"."+sub, 0, "%s", rest)
		return settle.Curve{}, false
	}
	return cv, true
}

func (r *resolver) loadTest(t *LoadTest) *LoadTestInputs {
	lt := &LoadTestInputs{}
	before := len(r.probs)
	if len(t.Points) < 2 {
		r.add("load_test.points", 0, "%d points; give at least 2 [load, settlement] pairs", len(t.Points))
	}
	for i, p := range t.Points {
		pp := fmt.Sprintf("load_test.points[%d]", i)
		if len(p) != 2 {
			r.add(pp, 0, "%d values; give a pair [load, settlement]", len(p))
			continue
		}
		n := len(r.probs)
		q := r.force(p[0], pp+"[0]")
		s := r.length(p[1], pp+"[1]")
		if len(r.probs) > n {
			continue
		}
		if q < 0 || q > maxLoad {
			r.add(pp+"[0]", p[0].Line, "%q is outside 0 to %v", p[0].Raw, maxLoad)
			continue
		}
		if s < 0 {
			r.add(pp+"[1]", p[1].Line, "%q: a settlement is 0 or more", p[1].Raw)
			continue
		}
		if k := len(lt.Test.Load); k > 0 && k == i {
			if q < lt.Test.Load[k-1] {
				r.add(pp+"[0]", p[0].Line, "%q is less than the load before it, %q: the points must not fall (give the loading branch only)", p[0].Raw, t.Points[i-1][0].Raw)
			}
			if !(s > lt.Test.Settlement[k-1]) {
				r.add(pp+"[1]", p[1].Line, "%q is not more than the settlement before it, %q: settlements must rise (give the loading branch only)", p[1].Raw, t.Points[i-1][1].Raw)
			}
		}
		lt.Test.Load = append(lt.Test.Load, q)
		lt.Test.Settlement = append(lt.Test.Settlement, s)
	}
	if t.FitFrom.IsSet() {
		x := r.num(t.FitFrom, "load_test.fit_from", 0, 1e5)
		switch {
		case x != math.Trunc(x):
			r.add("load_test.fit_from", t.FitFrom.Line, "%q: want the whole-number index of a point", t.FitFrom.Raw)
		case len(t.Points) >= 3 && int(x) > len(t.Points)-3:
			r.add("load_test.fit_from", t.FitFrom.Line, "%q is outside 0 to %d (the hyperbolic fits need 3 points from it)", t.FitFrom.Raw, max(0, len(t.Points)-3))
		}
		lt.FitFrom = int(x)
	}
	seen := map[string]bool{}
	for i, c := range t.Criteria {
		c = strings.TrimSpace(c)
		path := fmt.Sprintf("load_test.criteria[%d]", i)
		switch {
		case !slices.Contains(LoadTestCriteria, c):
			r.add(path, 0, "%q: want one of %s", c, strings.Join(LoadTestCriteria, ", "))
		case seen[c]:
			r.add(path, 0, "%q given twice", c)
		default:
			seen[c] = true
			lt.Criteria = append(lt.Criteria, c)
		}
	}
	if t.Criteria == nil {
		lt.Criteria = slices.Clone(LoadTestCriteria)
	} else if len(t.Criteria) == 0 {
		r.add("load_test.criteria", 0, "empty; name at least one of %s, or leave the key out for all", strings.Join(LoadTestCriteria, ", "))
	}
	if len(r.probs) > before {
		return nil
	}
	return lt
}

// settleProblem is a problem of the settlement stage at a path.
func settleProblem(f *File, path, format string, args ...any) Problem {
	return Problem{Path: path, Line: lineOf(f, path), Msg: fmt.Sprintf(format, args...)}
}

// pileEA returns E·A of the pile's material section, or a problem naming
// pile.youngs_modulus.
func pileEA(f *File, p pile.Pile, what string) (units.Force, *Problem) {
	if !(p.Modulus > 0) {
		pr := settleProblem(f, "pile.youngs_modulus", "not given; %s needs Young's modulus of the pile material (EA = E × material area)", what)
		return 0, &pr
	}
	return units.Force(float64(p.Modulus) * float64(p.Section.MaterialArea())), nil
}

// runSettlement computes the settlement and reads the load test; the
// problems it finds (missing stiffness, a missing load) name their keys.
func runSettlement(f *File, in *Inputs, prof *profile.Profile, res *Result) ([]cite.Ref, error) {
	var refs []cite.Ref
	var probs Problems
	if sp := in.Settle; sp != nil {
		sr, rf, ps := settlement(f, in, sp, prof, res)
		probs = append(probs, ps...)
		if len(ps) == 0 {
			res.Settlement = sr
			refs = append(refs, rf...)
		}
	}
	if lt := in.LoadTest; lt != nil {
		lr, rf, ps := loadTest(f, in, lt)
		probs = append(probs, ps...)
		if len(ps) == 0 {
			res.LoadTest = lr
			refs = append(refs, rf...)
		}
	}
	if len(probs) > 0 {
		return nil, probs
	}
	return refs, nil
}

func loadTest(f *File, in *Inputs, lt *LoadTestInputs) (*LoadTestResult, []cite.Ref, Problems) {
	p := in.Pile
	out := &LoadTestResult{FitFrom: lt.FitFrom, Length: p.Length, Diameter: p.Section.Size()}
	for i := range lt.Test.Load {
		out.Points = append(out.Points, CurvePoint{lt.Test.Load[i], lt.Test.Settlement[i]})
	}
	var refs []cite.Ref
	for _, c := range lt.Criteria {
		var l settle.Limit
		var err error
		switch c {
		case "davisson":
			ea, pr := pileEA(f, p, "the davisson criterion of load_test")
			if pr != nil {
				return nil, nil, Problems{*pr}
			}
			out.EA = ea
			l, err = settle.Davisson(lt.Test, p.Length, ea, p.Section.Size())
		case "ten-percent":
			l, err = settle.TenPercent(lt.Test, p.Section.Size())
		case "chin-kondner":
			l, err = settle.ChinKondner(lt.Test, lt.FitFrom)
		case "brinch-hansen-80":
			l, err = settle.BrinchHansen80(lt.Test, lt.FitFrom)
		}
		ll := LoadTestLimit{Limit: l}
		if err != nil {
			// The points do not show the criterion: a result, not bad input.
			_, why, _ := strings.Cut(err.Error(), ": ")
			ll = LoadTestLimit{Limit: settle.Limit{Criterion: c}, Note: why}
		}
		refs = append(refs, ll.Refs...)
		out.Limits = append(out.Limits, ll)
	}
	return out, refs, nil
}

// serviceLoad returns the serviceability load and the key it came from.
func serviceLoad(f *File, in *Inputs, sp *SettleInputs) (units.Force, string, *Problem) {
	if sp.HasLoad {
		return sp.Load, "settlement.load", nil
	}
	c := in.Loads.Compression
	if q := c.Permanent + c.Variable; q > 0 {
		return q, "loads.compression", nil
	}
	pr := settleProblem(f, "settlement.load", "not given, and loads gives no compression; give the serviceability load as settlement.load (or loads.compression)")
	return 0, "", &pr
}

func settlement(f *File, in *Inputs, sp *SettleInputs, prof *profile.Profile, res *Result) (*SettlementResult, []cite.Ref, Problems) {
	p := in.Pile
	ea, pr := pileEA(f, p, "settlement (method "+sp.Method+")")
	if pr != nil {
		return nil, nil, Problems{*pr}
	}
	load, from, pr := serviceLoad(f, in, sp)
	if pr != nil {
		return nil, nil, Problems{*pr}
	}
	b := res.Breakdown
	out := &SettlementResult{Method: sp.Method, Load: load, LoadFrom: from, Allowable: sp.Allowable, HasAllowable: sp.HasAllowable,
		EA: ea, ShaftCapacity: b.Capacity.Shaft, TipCapacity: b.Capacity.Tip}
	var refs []cite.Ref
	var probs Problems
	switch sp.Method {
	case SettleLoadTransfer:
		refs, probs = loadTransfer(f, in, sp, prof, res, out)
	case SettleVesic:
		refs, probs = vesic(f, in, sp, prof, res, out)
	case SettleRandolphWroth:
		refs, probs = randolphWroth(f, in, prof, res, out)
	}
	if len(probs) > 0 {
		return nil, nil, probs
	}
	out.Pass = !out.Plunged && (!out.HasAllowable || out.Settlement <= out.Allowable)
	return out, refs, nil
}

func loadTransfer(f *File, in *Inputs, sp *SettleInputs, prof *profile.Profile, res *Result, out *SettlementResult) ([]cite.Ref, Problems) {
	p := in.Pile
	b := res.Breakdown
	api, err := settle.APICurves(sp.Residual)
	if err != nil {
		return nil, Problems{settleProblem(f, "settlement.residual", "%v", err)}
	}
	choose := func(r pile.Row) settle.Curve {
		if c, ok := sp.TZ[r.Layer]; ok {
			return c
		}
		return api(r)
	}
	tip := settle.APITip()
	if sp.QZ != nil {
		tip = *sp.QZ
	}
	d := p.Section.Size()
	m, err := settle.FromBreakdown(b, d, out.EA, choose, tip)
	if err != nil {
		return nil, Problems{settleProblem(f, "settlement", "%v", err)}
	}
	s, err := settle.NewSolver(m, &sp.Options)
	if err != nil {
		return nil, Problems{settleProblem(f, "settlement", "%v", err)}
	}
	out.Equation = "pile of elastic elements EA/h on t-z springs t = τ(z)·fs along the shaft and a q-z spring Q = κ(z)·qp·Ab at the tip; equilibrium by Newton's method to the stated tolerance"
	out.Residual = sp.Residual
	if out.Residual == 0 {
		out.Residual = settle.DefaultResidual
	}
	out.Tolerance = sp.Options.Tolerance
	if out.Tolerance == 0 {
		out.Tolerance = settle.DefaultTolerance
	}
	out.TipCurve = tip.ID()
	seen := map[int]bool{}
	api0 := false
	for _, r := range b.Rows {
		if seen[r.Layer] {
			continue
		}
		seen[r.Layer] = true
		c := choose(r)
		out.LayerCurves = append(out.LayerCurves, LayerCurve{Layer: r.LayerName, Curve: c.ID()})
		api0 = api0 || c.ID() != "points"
	}
	if !p.Installation.Driven() && (api0 || sp.QZ == nil) {
		out.Notes = append(out.Notes, fmt.Sprintf("the API t-z and Q-z curves were drawn from tests on driven piles; for a %s pile give the layers' t_z and settlement.q_z from drilled-shaft curves or a load test", p.Installation))
	}
	// The serviceability load in ten equal steps (the springs soften: a
	// load path, not one jump).
	loads := make([]units.Force, 10)
	for i := range loads {
		loads[i] = out.Load * units.Force(i+1) / 10
	}
	run, err := s.Run(loads)
	if err != nil {
		return nil, Problems{settleProblem(f, "settlement", "the load-transfer solution failed: %v; try settlement.tolerance or settlement.elements", err)}
	}
	out.Elements, out.Iterations = run.Elements, run.Iterations
	if run.Plunged {
		out.Plunged, out.PlungeLoad = true, run.PlungeLoad
	} else {
		st := run.Steps[len(run.Steps)-1]
		out.Settlement, out.TipMove = st.Settlement, st.TipMove
		out.ShaftLoad, out.TipLoad, out.ShaftShare, out.TipShare = st.Shaft, st.Tip, st.ShaftShare, st.TipShare
		out.ShaftMobilised, out.TipMobilised = st.ShaftMobilised, st.TipMobilised
		out.Depth = slices.Clone(run.Depth)
		out.AxialLoad = slices.Clone(st.Load)
		out.Displacement = slices.Clone(st.Move)
	}
	// The predicted curve under head displacements: past the peak of
	// softening curves the head load falls, which load steps cannot show.
	wmax := 0.1 * d
	if out.Settlement*2 > wmax {
		wmax = out.Settlement * 2
	}
	if lt := in.LoadTest; lt != nil && len(lt.Test.Settlement) > 0 {
		wmax = max(wmax, lt.Test.Settlement[len(lt.Test.Settlement)-1]*6/5)
	}
	const n = 40
	ws := make([]units.Length, n)
	for i := range ws {
		ws[i] = wmax * units.Length(i+1) / n
	}
	cr, err := s.RunDisplacements(ws)
	if err != nil {
		return nil, Problems{settleProblem(f, "settlement", "the load-transfer solution failed: %v; try settlement.tolerance or settlement.elements", err)}
	}
	out.Curve = append(out.Curve, CurvePoint{})
	for _, st := range cr.Steps {
		out.Curve = append(out.Curve, CurvePoint{st.Head, st.Settlement})
	}
	refs := s.Refs()
	return refs, nil
}

// embedded returns the top of the embedded shaft (the head, or the
// design ground line when it is lower) and the tip depth.
func embedded(p pile.Pile, prof *profile.Profile) (top, tip units.Length) {
	return max(p.HeadDepth, prof.DesignGround()), p.Tip()
}

// modulus is a soil modulus of one layer: E, G and ν as given or
// derived by isotropic elasticity.
type modulus struct {
	e, g units.Stress
	nu   float64
}

func layerModulus(l profile.Layer) modulus {
	m := modulus{e: l.E, g: l.G, nu: l.Nu}
	if m.e == 0 && m.g > 0 && m.nu > 0 {
		m.e = units.Stress(2 * float64(m.g) * (1 + m.nu))
	}
	if m.g == 0 && m.e > 0 && m.nu > 0 {
		m.g = settle.ShearModulus(m.e, m.nu)
	}
	return m
}

// stiffness gathers the moduli of the layers from the top of the
// embedded shaft to the tip and of the layer below it. need names what
// each layer must give ("e" for E, "g" for G; ν always); a layer missing
// one is a problem naming the key.
func stiffness(f *File, prof *profile.Profile, top, tip units.Length, need, method string) (along []struct {
	m modulus
	h units.Length
}, above, below modulus, probs Problems) {
	ia, _ := prof.LayerAbove(tip)
	ib, _ := prof.LayerAt(tip)
	check := func(i int) modulus {
		l := prof.Layer(i)
		m := layerModulus(l)
		path := fmt.Sprintf("ground.layers[%d]", i)
		miss := ""
		switch {
		case need == "e" && m.e == 0 && m.g > 0, need == "g" && m.g == 0 && m.e > 0:
			miss = "poissons_ratio" // the other modulus is given: ν converts it
		case need == "e" && m.e == 0:
			miss = "youngs_modulus"
		case need == "g" && m.g == 0:
			miss = "shear_modulus"
		}
		if miss == "" && m.nu == 0 {
			miss = "poissons_ratio"
		}
		if miss != "" {
			key := path + "." + miss
			for _, p := range probs {
				if p.Path == key {
					return m
				}
			}
			what := map[string]string{"youngs_modulus": "Young's modulus E (or shear_modulus with poissons_ratio)",
				"shear_modulus": "the shear modulus G (or youngs_modulus with poissons_ratio)", "poissons_ratio": "Poisson's ratio ν"}[miss]
			probs = append(probs, Problem{Path: key, Line: lineOf(f, path), Msg: fmt.Sprintf("not given; settlement method %s needs %s of layer %q, which the pile crosses or bears on", method, what, l.Name)})
		}
		return m
	}
	for i, l := range prof.Layers() {
		t, bt := max(l.Top, top), min(l.Bottom, tip)
		if bt > t {
			along = append(along, struct {
				m modulus
				h units.Length
			}{check(i), bt - t})
		}
	}
	above, below = check(ia), check(ib)
	return along, above, below, probs
}

func vesic(f *File, in *Inputs, sp *SettleInputs, prof *profile.Profile, res *Result, out *SettlementResult) ([]cite.Ref, Problems) {
	p := in.Pile
	b := res.Breakdown
	top, tip := embedded(p, prof)
	qs, qp := b.Capacity.Shaft, b.Capacity.Tip
	if !(qs+qp > 0) {
		return nil, Problems{settleProblem(f, "settlement.method", "vesic needs a pile analysis with some shaft or tip resistance")}
	}
	area := b.Tip.Area
	v := settle.Vesic{Length: tip - top, Diameter: p.Section.Size(), Area: area, Perimeter: p.Section.OuterPerimeter(),
		Modulus: units.Stress(float64(out.EA) / float64(area)), Form: sp.Form, Xi: sp.Xi, Iwp: sp.Iwp, Cp: sp.Cp}
	if !sp.hasXi {
		v.Xi = settle.XiTriangular
	}
	out.Equation = v.Equation()
	var shaftE units.Stress
	var shaftNu float64
	switch sp.Form {
	case settle.Elastic:
		along, _, below, probs := stiffness(f, prof, top, tip, "e", "vesic (elastic form)")
		if len(probs) > 0 {
			return nil, probs
		}
		var h, se, snu float64
		for _, a := range along {
			h += float64(a.h)
			se += float64(a.m.e) * float64(a.h)
			snu += a.m.nu * float64(a.h)
		}
		v.SoilModulus, v.Poisson = below.e, below.nu
		shaftE, shaftNu = units.Stress(se/h), snu/h
		out.Notes = append(out.Notes, fmt.Sprintf("Es and νs of the layer at the tip for se2 (%v, %.3g); their means over the embedded shaft, weighted by length, for se3 (%v, %.3g)",
			below.e, below.nu, shaftE, shaftNu))
	case settle.Empirical:
		v.UnitTip = b.Tip.Qp
		if v.Cp == 0 {
			soil := settle.Sand
			if prof.Layer(b.Tip.Layer).Drainage == profile.Undrained {
				soil = settle.Clay
			}
			_, hi, err := settle.CpRange(soil, p.Installation)
			if err != nil {
				return nil, Problems{settleProblem(f, "settlement.vesic.cp", "%v", err)}
			}
			v.Cp = hi
			inst := "bored"
			if p.Installation.Driven() {
				inst = "driven"
			}
			out.Notes = append(out.Notes, fmt.Sprintf("Cp = %.3g, the loose or soft end of Vesic's range for %s, %s (give settlement.vesic.cp for a dense or stiff soil, or a silt)", hi, soil, inst))
		}
	}
	if out.Load > qs+qp {
		out.Plunged, out.PlungeLoad = true, qs+qp
	}
	// The working load shared as the ultimate resistances are: more load at
	// the tip than the shaft-first mobilisation gives, and so a larger
	// settlement.
	one := func(q units.Force) (settle.VesicResult, settle.Vesic, error) {
		vv := v
		vv.TipLoad = units.Force(float64(q) * float64(qp) / float64(qs+qp))
		vv.ShaftLoad = q - vv.TipLoad
		r, err := vv.Settlement()
		if err != nil || sp.Form != settle.Elastic {
			return r, vv, err
		}
		vs := vv
		vs.SoilModulus, vs.Poisson = shaftE, shaftNu
		rs, err := vs.Settlement()
		r.Shaft = rs.Shaft
		r.Total = r.Shortening + r.Tip + r.Shaft
		return r, vv, err
	}
	q := out.Load
	if out.Plunged {
		q = out.PlungeLoad
	}
	r, vv, err := one(q)
	if err != nil {
		return nil, Problems{settleProblem(f, "settlement", "vesic: %v", err)}
	}
	out.VesicInputs, out.VesicShaftModulus, out.VesicShaftPoisson = &vv, shaftE, shaftNu
	if !out.Plunged {
		out.Vesic = &r
		out.Settlement = r.Total
		out.ShaftLoad, out.TipLoad = vv.ShaftLoad, vv.TipLoad
		out.ShaftShare, out.TipShare = float64(vv.ShaftLoad/q), float64(vv.TipLoad/q)
	}
	out.Curve = linearCurve(qs+qp, func(x units.Force) units.Length { rr, _, _ := one(x); return rr.Total })
	out.Notes = append(out.Notes, fmt.Sprintf("the load shared between tip and shaft as the ultimate resistances are (Qwp/Qw = Qp/(Qp + Qs) = %.3g); ξ = %.3g", float64(qp/(qs+qp)), v.Xi))
	return v.Refs(), nil
}

// linearCurve is the straight load-settlement line of an elastic method
// from 0 to the capacity, in ten steps.
func linearCurve(capacity units.Force, s func(units.Force) units.Length) []CurvePoint {
	out := []CurvePoint{{}}
	for i := 1; i <= 10; i++ {
		q := capacity * units.Force(i) / 10
		out = append(out, CurvePoint{q, s(q)})
	}
	return out
}

func randolphWroth(f *File, in *Inputs, prof *profile.Profile, res *Result, out *SettlementResult) ([]cite.Ref, Problems) {
	p := in.Pile
	b := res.Breakdown
	top, tip := embedded(p, prof)
	along, above, below, probs := stiffness(f, prof, top, tip, "g", "randolph-wroth")
	if len(probs) > 0 {
		return nil, probs
	}
	var h, sg, snu float64
	for _, a := range along {
		h += float64(a.h)
		sg += float64(a.m.g) * float64(a.h)
		snu += a.m.nu * float64(a.h)
	}
	gAvg, gl := sg/h, float64(above.g)
	ia, _ := prof.LayerAbove(tip)
	gPath := fmt.Sprintf("ground.layers[%d].shear_modulus", ia)
	// ρ = Ḡ/GL, the mean over the embedded length to the value at the tip
	// level: a line through G(L/2) = Ḡ with G(L) = GL.
	gTop := 2*gAvg - gl
	if gAvg > gl*(1+1e-12) {
		return nil, Problems{settleProblem(f, gPath, "randolph-wroth takes G rising with depth; the mean G over the embedded shaft, %v, is above G at the tip level, %v (choose method load-transfer or vesic)", units.Stress(gAvg), units.Stress(gl))}
	}
	if gTop < 0 {
		return nil, Problems{settleProblem(f, gPath, "randolph-wroth takes G linear in depth from 0 or more at the head; the mean G over the embedded shaft, %v, is below half of G at the tip level, %v (ρ < 0.5; choose method load-transfer or vesic)", units.Stress(gAvg), units.Stress(gl))}
	}
	r0 := p.Section.Size() / 2
	rw := settle.RandolphWroth{Length: tip - top, Radius: r0, Modulus: units.Stress(float64(out.EA) / (math.Pi * float64(r0) * float64(r0))),
		ShearTop: units.Stress(max(0, gTop)), ShearTip: units.Stress(gl), ShearBase: below.g, Poisson: snu / h}
	rr, err := rw.Solve()
	if err != nil {
		return nil, Problems{settleProblem(f, "settlement", "randolph-wroth: %v", err)}
	}
	out.Equation = rw.Equation()
	out.RandolphWrothInput, out.RandolphWroth = &rw, &rr
	qs, qp := b.Capacity.Shaft, b.Capacity.Tip
	if out.Load > qs+qp {
		out.Plunged, out.PlungeLoad = true, qs+qp
	} else {
		out.Settlement = rr.Settlement(out.Load)
		out.TipMove = units.Length(float64(out.Settlement) * rr.BaseRatio)
		out.TipShare = rr.TipShare
		out.ShaftShare = 1 - rr.TipShare
		out.TipLoad = units.Force(float64(out.Load) * rr.TipShare)
		out.ShaftLoad = out.Load - out.TipLoad
	}
	out.Curve = linearCurve(qs+qp, rr.Settlement)
	out.Notes = append(out.Notes, fmt.Sprintf("G from the layers: Ḡ = %v over the embedded shaft (weighted by length), GL = %v at the tip level, Gb = %v below the base; ν = %.3g (mean over the shaft); r0 = half the diameter or width; Ep = EA/(π·r0²)",
		units.Stress(gAvg), units.Stress(gl), below.g, snu/h))
	return rw.Refs(), nil
}

// settleWarnings are the warnings of the settlement stage.
func settleWarnings(r *Result) []string {
	var w []string
	if s := r.Settlement; s != nil {
		if s.Plunged {
			w = append(w, fmt.Sprintf("settlement: the pile cannot carry the serviceability load of %v (%s); it plunges at %v", s.Load, s.Method, s.PlungeLoad))
		} else if s.HasAllowable && !s.Pass {
			w = append(w, fmt.Sprintf("the serviceability check fails: settlement %v at %v is above the allowable %v", s.Settlement, s.Load, s.Allowable))
		}
		for _, n := range s.Notes {
			if strings.HasPrefix(n, "the API") {
				w = append(w, "settlement: "+n)
			}
		}
	}
	if t := r.LoadTest; t != nil {
		for _, l := range t.Limits {
			if l.Note != "" {
				w = append(w, "load test, "+l.Criterion+": "+l.Note)
			}
		}
	}
	return w
}

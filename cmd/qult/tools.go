package main

import (
	"bytes"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/phase"
	"github.com/qultgeo/qult/units"
)

// toolFormats are the output formats of phase and factors.
const toolFormats = "text, json, csv, md"

// given is a flag value kept as text until the unit system is known.
type given struct {
	raw string
	set bool
}

func (g *given) String() string { return g.raw }
func (g *given) Set(s string) error {
	if strings.TrimSpace(s) == "" {
		return errors.New("empty value")
	}
	g.raw, g.set = s, true
	return nil
}

// readNum reads a plain number; a percentage ("25 %") when pct is true.
func readNum(name string, g *given, pct bool) (float64, error) {
	s := strings.TrimSpace(g.raw)
	div := 1.0
	if t, ok := strings.CutSuffix(s, "%"); ok && pct {
		s, div = strings.TrimSpace(t), 100
	}
	x, err := strconv.ParseFloat(s, 64)
	if err != nil {
		if q, perr := units.Parse(s); perr == nil {
			return 0, fmt.Errorf("--%s %q is %s; this flag is a plain number", name, g.raw, units.Article(q.Dim))
		}
		return 0, fmt.Errorf("--%s %q is not a number", name, g.raw)
	}
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return 0, fmt.Errorf("--%s %q is not a finite number", name, g.raw)
	}
	return x / div, nil
}

// readQty reads a quantity of dimension d; a bare number counts in sys.
func readQty(name string, g *given, d units.Dimension, sys units.System) (float64, error) {
	x, err := units.ParseIn(g.raw, d, sys)
	if err != nil {
		var pe *units.ParseError
		if errors.As(err, &pe) {
			err = pe.Err
		}
		return 0, fmt.Errorf("--%s %q: %v (accepted units: %s)", name, g.raw, err, units.Accepted(d))
	}
	return x, nil
}

// toolOpts are the flags common to phase and factors.
type toolOpts struct {
	format string
	units  string
	out    string
	wide   bool
}

func (o *toolOpts) register(fs *flag.FlagSet) {
	fs.StringVar(&o.format, "format", "text", "output `format`: "+toolFormats)
	fs.StringVar(&o.units, "units", "SI", "unit `system` for bare numbers and for display: SI or US")
	fs.StringVar(&o.out, "o", "", "write the output to `FILE` instead of standard output")
	fs.BoolVar(&o.wide, "wide", false, "text: lay tables and notes out at their natural width instead of fitting 100 columns")
}

func (c *cmd) toolSetup(o *toolOpts, pos []string) (units.System, bool) {
	if len(pos) > 0 {
		c.usageErr("%s takes no file, got %q", c.verb, strings.Join(pos, " "))
		return 0, false
	}
	o.format = strings.ToLower(o.format)
	if err := oneOf("format", o.format, "text", "json", "csv", "md"); err != nil {
		c.usageErr("%s: %v", c.verb, err)
		return 0, false
	}
	sys, err := units.ParseSystem(o.units)
	if err != nil {
		c.usageErr("%s: --units %q: want SI or US", c.verb, o.units)
		return 0, false
	}
	return sys, true
}

// ---- phase ----

// phaseQ is one phase quantity: its flag, name and dimension (0 for a
// plain number).
type phaseQ struct {
	q    phase.Quantity
	flag string
	name string
	dim  units.Dimension
	pct  bool
}

var phaseQs = []phaseQ{
	{phase.Gs, "gs", "specific gravity of solids", 0, false},
	{phase.E, "e", "void ratio", 0, false},
	{phase.N, "n", "porosity", 0, true},
	{phase.W, "w", "water content", 0, true},
	{phase.S, "s", "degree of saturation", 0, true},
	{phase.Gamma, "gamma", "bulk unit weight", units.DimUnitWeight, false},
	{phase.GammaD, "gamma-d", "dry unit weight", units.DimUnitWeight, false},
	{phase.GammaSat, "gamma-sat", "saturated unit weight", units.DimUnitWeight, false},
	{phase.GammaSub, "gamma-sub", "submerged unit weight", units.DimUnitWeight, false},
	{phase.Dr, "dr", "relative density", 0, true},
}

type phaseOpts struct {
	toolOpts
	vals         [len(phaseQsNames)]given
	gw, emax, em given
}

// phaseQsNames fixes the array length of phaseOpts.vals.
var phaseQsNames = [...]string{"gs", "e", "n", "w", "s", "gamma", "gamma-d", "gamma-sat", "gamma-sub", "dr"}

func phaseFlags(o *phaseOpts) *flag.FlagSet {
	fs := newFlagSet("phase")
	for i, p := range phaseQs {
		help := p.name
		switch {
		case p.dim != 0:
			help += " (kN/m3 in SI, pcf in US, or with a unit)"
		case p.pct:
			help += " (a fraction, or a percentage such as \"25 %\")"
		}
		fs.Var(&o.vals[i], p.flag, help)
	}
	fs.Var(&o.gw, "gamma-w", "unit weight of water (default 9.81 kN/m3 in SI, 62.4 pcf in US)")
	fs.Var(&o.emax, "emax", "maximum void ratio, for the relative density")
	fs.Var(&o.em, "emin", "minimum void ratio, for the relative density")
	o.register(fs)
	return fs
}

func runPhase(c *cmd, args []string) int {
	var o phaseOpts
	fs := phaseFlags(&o)
	pos, code, ok := c.parseFlags(fs, args)
	if !ok {
		return code
	}
	sys, ok := c.toolSetup(&o.toolOpts, pos)
	if !ok {
		return exitUsage
	}
	var in phase.Input
	var errs []string
	var isGiven phase.Set
	for i, p := range phaseQs {
		g := &o.vals[i]
		if !g.set {
			continue
		}
		var x float64
		var err error
		if p.dim != 0 {
			x, err = readQty(p.flag, g, p.dim, sys)
		} else {
			x, err = readNum(p.flag, g, p.pct)
		}
		if err != nil {
			errs = append(errs, err.Error())
			continue
		}
		if x == 0 {
			if p.q != phase.S && p.q != phase.W && p.q != phase.Dr {
				errs = append(errs, fmt.Sprintf("--%s 0: %s must be greater than 0", p.flag, p.name))
				continue
			}
			in.Zero |= phase.Of(p.q)
		}
		isGiven |= phase.Of(p.q)
		switch p.q {
		case phase.Gs:
			in.Gs = x
		case phase.E:
			in.E = x
		case phase.N:
			in.N = x
		case phase.W:
			in.W = x
		case phase.S:
			in.S = x
		case phase.Gamma:
			in.Gamma = units.UnitWeight(x)
		case phase.GammaD:
			in.GammaD = units.UnitWeight(x)
		case phase.GammaSat:
			in.GammaSat = units.UnitWeight(x)
		case phase.GammaSub:
			in.GammaSub = units.UnitWeight(x)
		case phase.Dr:
			in.Dr = x
		}
	}
	if o.gw.set {
		x, err := readQty("gamma-w", &o.gw, units.DimUnitWeight, sys)
		if err == nil && !(x > 0) {
			err = fmt.Errorf("--gamma-w %q: must be greater than 0", o.gw.raw)
		}
		if err != nil {
			errs = append(errs, err.Error())
		}
		in.GammaW = units.UnitWeight(x)
	} else if sys == units.US {
		in.GammaW = phase.WaterUnitWeightUS
	}
	for _, e := range []struct {
		name string
		g    *given
		dst  *float64
	}{{"emax", &o.emax, &in.EMax}, {"emin", &o.em, &in.EMin}} {
		if e.g.set {
			x, err := readNum(e.name, e.g, false)
			if err != nil {
				errs = append(errs, err.Error())
			}
			*e.dst = x
		}
	}
	if len(errs) == 0 && isGiven == 0 {
		return c.usageErr("phase: no values given; give at least two, for example --gs 2.7 --e 0.6 --s 1")
	}
	if len(errs) > 0 {
		for _, e := range errs {
			c.errorf("phase: %s", e)
		}
		fmt.Fprintf(c.stderr, "run 'qult help phase' for usage\n")
		return exitUsage
	}
	st, err := phase.Solve(in)
	if err != nil {
		for _, e := range flatten(err) {
			c.errorf("phase: %s", phaseMsg(e))
		}
		return exitUsage
	}
	var buf bytes.Buffer
	writePhase(&buf, o.format, st, isGiven, sys, o.wide)
	return c.output(o.out, &buf)
}

// flatten unwraps errors.Join.
func flatten(err error) []error {
	if j, ok := err.(interface{ Unwrap() []error }); ok {
		var out []error
		for _, e := range j.Unwrap() {
			out = append(out, flatten(e)...)
		}
		return out
	}
	return []error{err}
}

// phaseMsg names the flag of a given value that is out of range.
func phaseMsg(e error) string {
	msg := strings.TrimPrefix(e.Error(), "phase: ")
	var re *phase.RangeError
	if errors.As(e, &re) && !re.Derived {
		for _, p := range phaseQs {
			if p.q == re.Quantity && re.Field == p.q.String() {
				return "--" + p.flag + ": " + msg
			}
		}
	}
	return msg
}

func writePhase(b *bytes.Buffer, format string, st phase.State, isGiven phase.Set, sys units.System, wide bool) {
	type row struct {
		sym, name string
		v         float64
		unit      string
		given     bool
	}
	vals := map[phase.Quantity]float64{phase.Gs: st.Gs, phase.E: st.E, phase.N: st.N, phase.W: st.W, phase.S: st.S,
		phase.Gamma: float64(st.Gamma), phase.GammaD: float64(st.GammaD), phase.GammaSat: float64(st.GammaSat),
		phase.GammaSub: float64(st.GammaSub), phase.Dr: st.Dr}
	var rows []row
	for _, p := range phaseQs {
		if p.q == phase.Dr && !st.HasDr {
			continue
		}
		v, unit := vals[p.q], ""
		if p.dim != 0 {
			v, unit = sys.In(v, p.dim)
		}
		rows = append(rows, row{p.q.String(), p.name, v, unit, isGiven.Has(p.q)})
	}
	gw, gwu := sys.In(float64(st.GammaW), units.DimUnitWeight)
	rows = append(rows, row{"γw", "unit weight of water", gw, gwu, false})
	if format == "json" {
		type jrow struct {
			Symbol string      `json:"symbol"`
			Name   string      `json:"name"`
			Value  json.Number `json:"value"`
			Unit   string      `json:"unit,omitempty"`
			Given  bool        `json:"given"`
		}
		out := struct {
			Schema     string   `json:"schema"`
			Units      string   `json:"units"`
			Quantities []jrow   `json:"quantities"`
			Cautions   []string `json:"cautions"`
		}{Schema: "qult.phase/1", Units: sys.String(), Cautions: calc.CautionText()}
		for _, r := range rows {
			out.Quantities = append(out.Quantities, jrow{r.sym, r.name, jsonNum(r.v), r.unit, r.given})
		}
		writeJSON(b, out)
		return
	}
	t := table{header: []string{"symbol", "quantity", "value", "unit", "source"}, right: []bool{false, false, true}}
	for _, r := range rows {
		src := "derived"
		if r.given {
			src = "given"
		}
		if r.sym == "γw" {
			src = "used"
		}
		t.add(r.sym, r.name, sig(r.v, 4), r.unit, src)
	}
	emit(b, format, &t, wide)
}

func emit(b *bytes.Buffer, format string, t *table, wide bool) {
	switch format {
	case "csv":
		t.csv(b)
		b.WriteString("# " + calc.CautionLine + "\n")
	case "md":
		t.md(b)
		b.WriteString("\n" + calc.CautionLine + "\n")
	default:
		t.text(b, wide)
		b.WriteString("\n")
		hanging(b, calc.CautionLine, "", wide)
	}
}

func writeJSON(b *bytes.Buffer, v any) {
	enc := json.NewEncoder(b)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	if err := enc.Encode(v); err != nil {
		panic("qult: encoding JSON: " + err.Error()) // a programming mistake: the types are fixed
	}
}

// ---- factors ----

type factorOpts struct {
	toolOpts
	phi, q, c, su, ir, l, d, n60, g, k0 given
	clamp                               bool
}

func factorFlags(o *factorOpts) *flag.FlagSet {
	fs := newFlagSet("factors")
	fs.Var(&o.phi, "phi", "effective friction angle φ′ (deg, or with a unit)")
	fs.Var(&o.q, "q", "effective vertical stress σ′v at the tip (kPa in SI, ksf in US, or with a unit)")
	fs.Var(&o.c, "c", "effective cohesion c′ (kPa in SI, ksf in US, or with a unit)")
	fs.Var(&o.su, "su", "undrained shear strength su (kPa in SI, ksf in US, or with a unit)")
	fs.Var(&o.ir, "ir", "rigidity index Ir for Vesic's methods (a plain number)")
	fs.Var(&o.g, "g", "shear modulus G, for Ir when --ir is not given (kPa in SI, ksf in US, or with a unit)")
	fs.Var(&o.k0, "k0", "K0 for Vesic's mean stress (default Jaky's 1 − sin φ′)")
	fs.Var(&o.l, "l", "embedded length, for Berezantzev's L/D (m in SI, ft in US, or with a unit)")
	fs.Var(&o.d, "d", "pile diameter or width at the tip (m in SI, ft in US, or with a unit)")
	fs.Var(&o.n60, "n60", "SPT blow count N60, for the drilled-shaft SPT method")
	fs.BoolVar(&o.clamp, "clamp", false, "read a φ′ or L/D outside a chart at the chart's edge (flagged) instead of refusing")
	o.register(fs)
	return fs
}

func runFactors(c *cmd, args []string) int {
	var o factorOpts
	fs := factorFlags(&o)
	pos, code, ok := c.parseFlags(fs, args)
	if !ok {
		return code
	}
	sys, ok := c.toolSetup(&o.toolOpts, pos)
	if !ok {
		return exitUsage
	}
	var in bearing.Input
	var errs []string
	qty := func(name string, g *given, d units.Dimension) float64 {
		if !g.set {
			return 0
		}
		x, err := readQty(name, g, d, sys)
		if err == nil && x < 0 {
			err = fmt.Errorf("--%s %q: must not be negative", name, g.raw)
		}
		if err != nil {
			errs = append(errs, err.Error())
			return 0
		}
		return x
	}
	num := func(name string, g *given) float64 {
		if !g.set {
			return 0
		}
		x, err := readNum(name, g, false)
		if err == nil && x < 0 {
			err = fmt.Errorf("--%s %q: must not be negative", name, g.raw)
		}
		if err != nil {
			errs = append(errs, err.Error())
			return 0
		}
		return x
	}
	in.Phi = units.Angle(qty("phi", &o.phi, units.DimAngle))
	in.Q = units.Stress(qty("q", &o.q, units.DimStress))
	in.C = units.Stress(qty("c", &o.c, units.DimStress))
	in.Su = units.Stress(qty("su", &o.su, units.DimStress))
	in.G = units.Stress(qty("g", &o.g, units.DimStress))
	in.L = units.Length(qty("l", &o.l, units.DimLength))
	in.D = units.Length(qty("d", &o.d, units.DimLength))
	in.Ir = num("ir", &o.ir)
	in.K0 = num("k0", &o.k0)
	in.N60 = num("n60", &o.n60)
	in.Clamp = o.clamp
	if len(errs) > 0 {
		for _, e := range errs {
			c.errorf("factors: %s", e)
		}
		fmt.Fprintf(c.stderr, "run 'qult help factors' for usage\n")
		return exitUsage
	}
	if in.Phi == 0 && in.Q == 0 && in.Su == 0 && in.N60 == 0 {
		return c.usageErr("factors: nothing to compare; give --phi and --q (drained), --su (undrained) or --n60")
	}
	rows := bearing.Compare(in)
	var buf bytes.Buffer
	writeFactors(&buf, o.format, rows, sys, o.wide)
	return c.output(o.out, &buf)
}

func writeFactors(b *bytes.Buffer, format string, rows []bearing.Row, sys units.System, wide bool) {
	su := sys.Unit(units.DimStress)
	stress := func(s units.Stress) float64 { v, _ := sys.In(float64(s), units.DimStress); return v }
	if format == "json" {
		type jrow struct {
			Method    string       `json:"method"`
			Equation  string       `json:"equation"`
			Range     string       `json:"range"`
			Nq        *json.Number `json:"nq,omitempty"`
			Nc        *json.Number `json:"nc,omitempty"`
			Irr       *json.Number `json:"irr,omitempty"`
			Unlimited *json.Number `json:"qp_unlimited,omitempty"`
			Limit     *json.Number `json:"limit,omitempty"`
			Reduction *json.Number `json:"reduction,omitempty"`
			Qp        *json.Number `json:"qp,omitempty"`
			Flags     string       `json:"flags,omitempty"`
			Error     string       `json:"error,omitempty"`
		}
		p := func(x float64) *json.Number { n := jsonNum(x); return &n }
		out := struct {
			Schema      string   `json:"schema"`
			Units       string   `json:"units"`
			StressUnits string   `json:"stress_unit"`
			Methods     []jrow   `json:"methods"`
			Cautions    []string `json:"cautions"`
		}{Schema: "qult.factors/1", Units: sys.String(), StressUnits: su, Methods: []jrow{}, Cautions: calc.CautionText()}
		for _, r := range rows {
			j := jrow{Method: r.ID, Equation: r.Equation, Range: r.Range}
			if r.Err != nil {
				j.Error = r.Err.Error()
			} else {
				res := r.Result
				if res.Nq != 0 {
					j.Nq = p(res.Nq)
				}
				if res.Nc != 0 {
					j.Nc = p(res.Nc)
				}
				if res.Irr != 0 {
					j.Irr = p(res.Irr)
				}
				j.Unlimited, j.Qp = p(stress(res.Unlimited)), p(stress(res.Qp))
				if res.Limit != 0 {
					j.Limit = p(stress(res.Limit))
				}
				if res.Reduction != 0 {
					j.Reduction = p(res.Reduction)
				}
				j.Flags = res.Flags.String()
			}
			out.Methods = append(out.Methods, j)
		}
		writeJSON(b, out)
		return
	}
	t := table{header: []string{"method", "Nq", "Nc", "Irr", "qp before limit (" + su + ")", "limit (" + su + ")", "qp (" + su + ")", "note"},
		right: []bool{false, true, true, true, true, true, true}}
	// A missing number is "–" in text and Markdown, an empty field in CSV
	// (which a spreadsheet reads as blank, not as text).
	missing := "–"
	if format == "csv" {
		missing = ""
	}
	opt := func(x float64) string {
		if x == 0 {
			return missing
		}
		return sig(x, 4)
	}
	for _, r := range rows {
		if r.Err != nil {
			t.add(r.ID, missing, missing, missing, missing, missing, missing, "not applied: "+strings.TrimPrefix(r.Err.Error(), "bearing: "))
			continue
		}
		res := r.Result
		note := res.Flags.String()
		if res.Reduction != 0 {
			// The bored-pile and large-base rules scale qp after the limit.
			red := "qp × " + sig(res.Reduction, 4) + " (bored-pile or large-base rule)"
			if note != "" {
				red += "; " + note
			}
			note = red
		}
		t.add(r.ID, opt(res.Nq), opt(res.Nc), opt(res.Irr), sig(stress(res.Unlimited), 4), opt(stress(res.Limit)), sig(stress(res.Qp), 4), note)
	}
	if format == "text" && len(rows) == 0 {
		b.WriteString("no method applies to the values given\n")
		return
	}
	emit(b, format, &t, wide)
	if format == "text" || format == "md" {
		b.WriteString("\n")
		for _, r := range rows {
			if format == "md" {
				fmt.Fprintf(b, "- `%s`: %s (accepts %s)\n", r.ID, r.Equation, r.Range)
			} else {
				hanging(b, fmt.Sprintf("%s: %s (accepts %s)", r.ID, r.Equation, r.Range), "    ", wide)
			}
		}
	}
}

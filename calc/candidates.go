package calc

import (
	"errors"
	"fmt"
	"math"
	"slices"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/structural"
	"github.com/qultgeo/qult/units"
)

// Candidates is the candidates section of a calc file: pile sections and
// installations to compare, each with its material and, optionally, its
// unit costs. Every candidate is checked in the file's ground with the
// file's methods, design basis and loads (and settlement, when the file
// gives an allowable settlement); the answer is each candidate's shortest
// passing length, what governs it, its quantities and cost.
type Candidates struct {
	// Currency is the ISO 4217 code of every cost in the section (EUR,
	// GBP, USD, …); needed when any cost is given.
	Currency string      `yaml:"currency,omitempty" json:"currency,omitempty" doc:"ISO 4217 code of the unit costs (EUR, GBP, USD, …); needed when any cost is given, and every cost must be in it."`
	Piles    []Candidate `yaml:"piles" json:"piles" doc:"The candidate piles: a section (or one section shape with several diameters), an installation and a material each."`
}

// Candidate is one pile type to compare. Diameters gives several sizes of
// one circle or pipe at once (one candidate each); the section then omits
// its diameter.
type Candidate struct {
	Name          string    `yaml:"name,omitempty" json:"name,omitempty" doc:"A name of your own for the candidate (default: the section and installation)."`
	Section       Section   `yaml:"section" json:"section"`
	Diameters     []Value   `yaml:"diameters,omitempty" json:"diameters,omitempty" doc:"Several diameters of a circle or pipe section, one candidate each (the section then gives no diameter)."`
	Installation  string    `yaml:"installation" json:"installation"`
	Surface       string    `yaml:"surface,omitempty" json:"surface,omitempty"`
	Plug          string    `yaml:"plug,omitempty" json:"plug,omitempty"`
	YoungsModulus Value     `yaml:"youngs_modulus,omitempty" json:"youngs_modulus,omitempty" q:"stress,0," doc:"Young's modulus of the pile material, for settlement (default: pile.youngs_modulus)."`
	UnitWeight    Value     `yaml:"unit_weight,omitempty" json:"unit_weight,omitempty" q:"unitweight,0," doc:"Unit weight of the pile material, for its self-weight (default: pile.unit_weight)."`
	FreeLength    Value     `yaml:"free_length,omitempty" json:"free_length,omitempty" q:"length,0," doc:"Unbraced length of a steel pile above the ground or in water, down to the depth of fixity you assess; absent: fully embedded (no buckling). Steel sections only."`
	EffectiveK    Value     `yaml:"effective_length_factor,omitempty" json:"effective_length_factor,omitempty" q:"number,0.5,3" doc:"Effective length factor K of the free length (default 2.1: fixed at depth, free at the head)."`
	Material      *Material `yaml:"material,omitempty" json:"material,omitempty" doc:"The section's material: concrete_strength for circle, square and given sections (with reinforcement), steel_yield for pipes and H-sections."`
	Costs         *Costs    `yaml:"costs,omitempty" json:"costs,omitempty" doc:"Unit costs in the section's currency: per_metre of pile, per m3 of concrete, per tonne of steel, per pile."`
}

// Material is a candidate's material, read by the structural rule of the
// design basis (package structural).
type Material struct {
	ConcreteStrength   Value  `yaml:"concrete_strength,omitempty" json:"concrete_strength,omitempty" q:"stress,0," doc:"Concrete strength: f′c (lrfd, safety-factor) or the characteristic cylinder strength fck (en1997), 5 to 120 MPa."`
	SteelYield         Value  `yaml:"steel_yield,omitempty" json:"steel_yield,omitempty" q:"stress,0," doc:"Yield strength of a steel pipe or H-section (Fy, fyk), 150 to 1000 MPa."`
	ReinforcementRatio Value  `yaml:"reinforcement_ratio,omitempty" json:"reinforcement_ratio,omitempty" q:"fraction" doc:"Longitudinal bars as a share of the gross (nominal) area, a fraction or a percentage, at most 8 %."`
	ReinforcementArea  Value  `yaml:"reinforcement_area,omitempty" json:"reinforcement_area,omitempty" q:"area,0," doc:"Area of the longitudinal bars (instead of reinforcement_ratio)."`
	ReinforcementYield Value  `yaml:"reinforcement_yield,omitempty" json:"reinforcement_yield,omitempty" q:"stress,0," doc:"Yield strength of the bars (fy, fyk), 150 to 1000 MPa."`
	Transverse         string `yaml:"transverse,omitempty" json:"transverse,omitempty" doc:"Transverse reinforcement of a concrete section for AASHTO 5.6.4.4: ties (default, k = 0.80) or spiral (k = 0.85)."`
	Driving            string `yaml:"driving,omitempty" json:"driving,omitempty" doc:"Driving conditions of a steel pile for AASHTO 6.5.4.2's φc: severe (default, the lower φc) or good."`
	Casing             string `yaml:"casing,omitempty" json:"casing,omitempty" doc:"A bored or augered pile cast in a permanent casing (permanent) or against the ground (none, default: EN 1992-1-1's reduced diameter and γc apply)."`
	AlphaCC            Value  `yaml:"alpha_cc,omitempty" json:"alpha_cc,omitempty" q:"number,0.8,1" doc:"EN 1992-1-1's αcc (default 1.0, the recommended value; a national annex may give 0.85)."`
}

// Costs are a candidate's unit costs, each a number with the section's
// currency and the unit it is counted per ("85 EUR/m", "140 EUR/m3",
// "1350 EUR/t", "900 EUR"), or a bare number in the currency per metre,
// per m³, per tonne or per pile. None may be negative.
type Costs struct {
	PerMetre Value `yaml:"per_metre,omitempty" json:"per_metre,omitempty" doc:"Cost per metre of pile (installation, labour): \"85 EUR/m\" (or /ft)."`
	Concrete Value `yaml:"concrete,omitempty" json:"concrete,omitempty" doc:"Cost per cubic metre of concrete: \"140 EUR/m3\" (or /yd3, /ft3)."`
	Steel    Value `yaml:"steel,omitempty" json:"steel,omitempty" doc:"Cost per tonne of steel (bars or section): \"1350 EUR/t\" (or /kg, /lb)."`
	PerPile  Value `yaml:"per_pile,omitempty" json:"per_pile,omitempty" doc:"Cost per pile (mobilisation, testing, cutting off): \"900 EUR\"."`
}

// currencies are the ISO 4217 codes a calc file may declare (the
// currencies of the economies where qult's design bases are used; a code
// not listed is refused rather than guessed).
var currencies = []string{"AED", "AUD", "BRL", "CAD", "CHF", "CLP", "CNY", "COP", "CZK", "DKK", "EUR", "GBP", "HKD", "HUF",
	"IDR", "ILS", "INR", "ISK", "JPY", "KRW", "MXN", "MYR", "NOK", "NZD", "PEN", "PHP", "PLN", "QAR", "RON", "SAR", "SEK",
	"SGD", "THB", "TRY", "TWD", "USD", "VND", "ZAR"}

// candidateInput is one candidate resolved (SI).
type candidateInput struct {
	name     string
	path     string // calc-file path of the candidate, such as "candidates.piles[2]"
	pile     pile.Pile
	member   structural.Member
	rule     structural.Rule
	costs    costInput
	diameter units.Length // the size the figure plots
}

// costInput are the unit costs in the currency per SI unit: per metre, per
// m³, per kg, per pile.
type costInput struct {
	given                           bool
	perMetre, perM3, perKg, perPile float64
}

// candidatesInputs is the candidates section resolved.
type candidatesInputs struct {
	currency string
	list     []candidateInput
}

// maxCandidates bounds the number of candidates of one file (after
// diameters are expanded): a comparison, not a batch.
const maxCandidates = 500

// candidatesSection resolves the candidates section.
func (r *resolver) candidatesSection(f *File, in *Inputs) {
	c := f.Candidates
	if c == nil {
		return
	}
	out := &candidatesInputs{currency: strings.TrimSpace(c.Currency)}
	if f.Design == nil || f.Loads == nil || f.Loads.Compression == nil {
		r.add("candidates", lineOf(f, "candidates"), "candidates are checked against the design basis and the loads: give design (basis) and loads.compression")
	}
	anyCost := false
	for _, p := range c.Piles {
		anyCost = anyCost || p.Costs != nil
	}
	if out.currency != "" && !slices.Contains(currencies, out.currency) {
		r.add("candidates.currency", 0, "%q is not a currency unit qult knows; want an ISO 4217 code: %s", out.currency, strings.Join(currencies, ", "))
	} else if out.currency == "" && anyCost {
		r.add("candidates.currency", lineOf(f, "candidates"), "not given; costs need the currency they are in (an ISO 4217 code such as EUR, GBP or USD)")
	}
	if len(c.Piles) == 0 {
		r.add("candidates.piles", lineOf(f, "candidates"), "no candidates given; list at least one pile under candidates.piles")
	}
	for i := range c.Piles {
		r.candidate(f, in, out, &c.Piles[i], fmt.Sprintf("candidates.piles[%d]", i))
	}
	if len(out.list) > maxCandidates {
		r.add("candidates.piles", lineOf(f, "candidates.piles"), "%d candidates after expanding diameters; at most %d", len(out.list), maxCandidates)
	}
	in.candidates = out
}

// candidate resolves one entry, one candidate per diameter.
func (r *resolver) candidate(f *File, in *Inputs, out *candidatesInputs, c *Candidate, path string) {
	before := len(r.probs)
	shape, err := pile.ParseShape(strings.TrimSpace(c.Section.Shape))
	if err != nil {
		if c.Section.Shape == "" {
			r.add(path+".section.shape", lineOf(f, path+".section"), "not given; want one of circle, square, closed-pipe, open-pipe, h-section, given")
		} else {
			r.add(path+".section.shape", 0, "%v", err)
		}
	}
	inst, err := pile.ParseInstallation(strings.TrimSpace(c.Installation))
	if err != nil {
		if c.Installation == "" {
			r.add(path+".installation", lineOf(f, path), "not given; want one of driven-high, driven-low, bored, augered, jetted")
		} else {
			r.add(path+".installation", 0, "%v", err)
		}
	}
	sec := pile.Section{Shape: shape,
		Diameter: r.length(c.Section.Diameter, path+".section.diameter"), Width: r.length(c.Section.Width, path+".section.width"),
		Wall: r.length(c.Section.Wall, path+".section.wall"), Depth: r.length(c.Section.Depth, path+".section.depth"),
		Web: r.length(c.Section.Web, path+".section.web"), Flange: r.length(c.Section.Flange, path+".section.flange"),
		Area: r.area(c.Section.Area, path+".section.area"), Perimeter: r.length(c.Section.Perimeter, path+".section.perimeter")}
	var sizes []units.Length
	if len(c.Diameters) > 0 {
		if shape != pile.Circle && shape != pile.ClosedPipe && shape != pile.OpenPipe && shape != 0 {
			r.add(path+".diameters", 0, "shape %s has no diameter; diameters is for circle, closed-pipe and open-pipe", shape)
		}
		if c.Section.Diameter.IsSet() {
			r.add(path+".section.diameter", 0, "given together with diameters; give one or the other")
		}
		for j, v := range c.Diameters {
			sizes = append(sizes, r.length(v, fmt.Sprintf("%s.diameters[%d]", path, j)))
		}
	} else if shape != 0 {
		r.sectionKeysAt(shape, c.Section, path+".section", lineOf(r.f, path+".section"))
	}
	p := pile.Pile{Section: sec, HeadDepth: in.Pile.HeadDepth, Installation: inst,
		Modulus: in.Pile.Modulus, UnitWeight: in.Pile.UnitWeight}
	if c.YoungsModulus.IsSet() {
		p.Modulus = r.stress(c.YoungsModulus, path+".youngs_modulus")
	}
	if c.UnitWeight.IsSet() {
		p.UnitWeight = r.weight(c.UnitWeight, path+".unit_weight")
	}
	if c.Surface != "" {
		s, err := shaft.ParseSurface(c.Surface)
		if err != nil {
			r.add(path+".surface", 0, "%v", err)
		}
		p.Surface = s
	}
	if c.Plug != "" {
		pl, err := pile.ParsePlug(c.Plug)
		if err != nil {
			r.add(path+".plug", 0, "%v", err)
		}
		p.Plug = pl
	}
	m, rule := r.material(f, in, c, path, shape)
	m.Column = structural.Column{Length: r.length(c.FreeLength, path+".free_length"), K: r.num(c.EffectiveK, path+".effective_length_factor", 0.5, 3)}
	if c.EffectiveK.IsSet() && !c.FreeLength.IsSet() {
		r.add(path+".effective_length_factor", c.EffectiveK.Line, "given without free_length; K applies to a free length")
	}
	costs := r.costs(out.currency, c.Costs, path+".costs")
	if len(r.probs) > before {
		return
	}
	if len(sizes) == 0 {
		sizes = []units.Length{sec.Size()}
	}
	for j, d := range sizes {
		q := p
		cp := path
		if len(c.Diameters) > 0 {
			q.Section.Diameter = d
			cp = fmt.Sprintf("%s.diameters[%d]", path, j)
		}
		mm := m
		mm.Section, mm.Installation = q.Section, inst
		if m.Rebar < 0 { // a ratio: the area follows the size
			mm.Rebar = units.Area(-float64(m.Rebar)) * q.Section.GrossArea()
		}
		if err := mm.Validate("candidate"); err != nil {
			r.candidateError(f, cp, path, err)
			continue
		}
		name := strings.TrimSpace(c.Name)
		if name == "" {
			name = fmt.Sprintf("%s %s", q.Section.Shape, inst)
		}
		if len(c.Diameters) > 0 {
			name = fmt.Sprintf("%s %.4g mm", name, d.Millimetres())
		}
		out.list = append(out.list, candidateInput{name: name, path: cp, pile: q, member: mm, rule: rule, costs: costs, diameter: q.Section.Size()})
	}
}

// candidateError reports a library error on a candidate: a field error of
// package structural or pile under the candidate's path.
func (r *resolver) candidateError(f *File, cp, path string, err error) {
	field, msg := "", err.Error()
	var se *structural.FieldError
	var pe *pile.PathError
	switch {
	case errors.As(err, &se):
		field, msg = se.Field, se.Msg
	case errors.As(err, &pe):
		field, msg = pe.Path, pe.Msg
	}
	field = strings.TrimPrefix(strings.TrimPrefix(field, "candidate"), ".")
	full := path
	if field != "" {
		full = path + "." + field
		if strings.HasPrefix(field, "section.diameter") && cp != path {
			full = cp
		}
	}
	r.add(full, lineOf(f, full), "%s", msg)
}

// material resolves a candidate's material and the structural rule of the
// file's design basis with the material's options. A reinforcement ratio
// comes back as a negative Rebar (the area follows each diameter).
func (r *resolver) material(f *File, in *Inputs, c *Candidate, path string, shape pile.Shape) (structural.Member, structural.Rule) {
	mp := path + ".material"
	if c.Material == nil {
		what := "concrete_strength (with reinforcement_ratio and reinforcement_yield if reinforced)"
		if shape == pile.ClosedPipe || shape == pile.OpenPipe || shape == pile.HSection {
			what = "steel_yield"
		}
		r.add(mp, lineOf(f, path), "not given; a candidate needs its material to check the section's strength: give %s", what)
		return structural.Member{}, nil
	}
	mat := c.Material
	m := structural.Member{Concrete: r.stress(mat.ConcreteStrength, mp+".concrete_strength"),
		SteelYield: r.stress(mat.SteelYield, mp+".steel_yield"), RebarYield: r.stress(mat.ReinforcementYield, mp+".reinforcement_yield")}
	if !mat.ConcreteStrength.IsSet() && !mat.SteelYield.IsSet() {
		r.add(mp, lineOf(f, mp), "gives neither concrete_strength nor steel_yield; a candidate needs the strength of its material")
	}
	switch {
	case mat.ReinforcementRatio.IsSet() && mat.ReinforcementArea.IsSet():
		r.add(mp+".reinforcement_area", mat.ReinforcementArea.Line, "given together with reinforcement_ratio; give one or the other")
	case mat.ReinforcementRatio.IsSet():
		ratio := r.fraction(mat.ReinforcementRatio, mp+".reinforcement_ratio")
		if !(ratio > 0 && ratio <= 0.08) && !zeroValue(mat.ReinforcementRatio) {
			r.add(mp+".reinforcement_ratio", mat.ReinforcementRatio.Line, "%q is outside 0 to 8 %%", mat.ReinforcementRatio.Raw)
		} else if ratio > 0 {
			m.Rebar = units.Area(-ratio)
		}
	case mat.ReinforcementArea.IsSet():
		m.Rebar = r.area(mat.ReinforcementArea, mp+".reinforcement_area")
	}
	if m.Rebar != 0 && m.RebarYield == 0 && !mat.ReinforcementYield.IsSet() {
		r.add(mp+".reinforcement_yield", lineOf(f, mp), "not given; bars need their yield strength (fy or fyk)")
	}
	switch strings.TrimSpace(mat.Casing) {
	case "", "none":
	case "permanent":
		m.Cased = true
	default:
		r.add(mp+".casing", 0, "%q: want none or permanent", mat.Casing)
	}
	spiral, good := false, false
	switch strings.TrimSpace(mat.Transverse) {
	case "", "ties":
	case "spiral":
		spiral = true
	default:
		r.add(mp+".transverse", 0, "%q: want ties or spiral", mat.Transverse)
	}
	switch strings.TrimSpace(mat.Driving) {
	case "", "severe":
	case "good":
		good = true
	default:
		r.add(mp+".driving", 0, "%q: want severe or good", mat.Driving)
	}
	acc := r.num(mat.AlphaCC, mp+".alpha_cc", 0.8, 1)
	var rule structural.Rule
	switch structural.ForBasis(in.Basis).(type) {
	case structural.AASHTO:
		rule = structural.AASHTO{Spiral: spiral, GoodDriving: good}
	case structural.Eurocode:
		rule = structural.Eurocode{AlphaCC: acc}
	case structural.Allowable:
		rule = structural.Allowable{}
	}
	_, isAASHTO := rule.(structural.AASHTO)
	_, isEN := rule.(structural.Eurocode)
	for _, k := range []struct {
		key   string
		set   bool
		ok    bool
		basis string
	}{{"transverse", mat.Transverse != "", isAASHTO, "lrfd (AASHTO)"}, {"driving", mat.Driving != "", isAASHTO, "lrfd (AASHTO)"},
		{"alpha_cc", mat.AlphaCC.IsSet(), isEN, "en1997 (EN 1992-1-1)"}} {
		if k.set && !k.ok && rule != nil {
			r.add(mp+"."+k.key, lineOf(f, mp+"."+k.key), "is read by the structural rule of basis %s only; this file's basis uses the %s rule", k.basis, rule.ID())
		}
	}
	return m, rule
}

// costs resolves a candidate's unit costs.
func (r *resolver) costs(currency string, c *Costs, path string) costInput {
	if c == nil {
		return costInput{}
	}
	out := costInput{given: true}
	for _, k := range []struct {
		key   string
		v     Value
		dst   *float64
		per   map[string]float64 // accepted "/unit" suffixes: SI units per unit
		label string
	}{
		{"per_metre", c.PerMetre, &out.perMetre, map[string]float64{"m": 1, "ft": 1 / units.Foot.Metres()}, "/m or /ft"},
		{"concrete", c.Concrete, &out.perM3, map[string]float64{"m3": 1, "m³": 1, "yd3": 1 / math.Pow(3*units.Foot.Metres(), 3), "ft3": 1 / units.CubicFoot.CubicMetres()}, "/m3, /yd3 or /ft3"},
		{"steel", c.Steel, &out.perKg, map[string]float64{"t": 1e-3, "kg": 1, "lb": 1 / 0.45359237}, "/t, /kg or /lb"},
		{"per_pile", c.PerPile, &out.perPile, map[string]float64{"": 1}, ""},
	} {
		if !k.v.IsSet() {
			continue
		}
		x, err := parseCost(k.v.Raw, currency, k.per)
		if err != nil {
			want := "a number, optionally with the currency"
			if k.label != "" {
				want += " and " + k.label
			}
			r.add(path+"."+k.key, k.v.Line, "%q: %v (want %s)", k.v.Raw, err, want)
			continue
		}
		*k.dst = x
	}
	return out
}

// parseCost reads "85", "85 EUR", "85 EUR/m" or "85/m": a number, the
// currency (which must be the section's) and a unit from per, and returns
// the cost per SI unit. A negative cost is refused.
func parseCost(s, currency string, per map[string]float64) (float64, error) {
	s = strings.TrimSpace(s)
	num, rest := s, ""
	if i := strings.IndexFunc(s, func(c rune) bool {
		return c == ' ' || c == '/' || (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z' && c != 'e')
	}); i > 0 {
		num, rest = s[:i], strings.TrimSpace(s[i:])
	}
	x, err := strconv.ParseFloat(num, 64)
	if err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
		return 0, fmt.Errorf("not a number")
	}
	if x < 0 {
		return 0, fmt.Errorf("a cost is not negative")
	}
	cur, unit, hasUnit := strings.Cut(rest, "/")
	cur = strings.TrimSpace(cur)
	if cur != "" && cur != currency {
		if currency == "" {
			return 0, fmt.Errorf("currency unit %q, but candidates.currency is not given", cur)
		}
		return 0, fmt.Errorf("unknown currency unit %q: the file declares %s", cur, currency)
	}
	unit = strings.TrimSpace(unit)
	if !hasUnit {
		if _, ok := per[""]; ok {
			return x, nil
		}
		for _, u := range []string{"m", "m3", "t"} {
			if f, ok := per[u]; ok {
				return x * f, nil // a bare number is per the SI unit
			}
		}
	}
	f, ok := per[unit]
	if !ok || unit == "" {
		return 0, fmt.Errorf("unit /%s is not accepted here", unit)
	}
	return x * f, nil
}

package shaft

import (
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Drainage is the drainage class of the layers a method is written for.
type Drainage string

// The drainage classes of the catalogue.
const (
	DrainedLayers   Drainage = "drained"              // effective stress in sand
	UndrainedLayers Drainage = "undrained"            // total stress in clay
	AnyLayers       Drainage = "drained or undrained" // effective stress in any soil, or no shaft
)

// Kind says how a catalogue method gives shaft resistance.
type Kind uint8

const (
	// PointMethod: a Unit, evaluated at each depth of the shaft.
	PointMethod Kind = iota
	// WholePile: the λ method, an average over the pile's embedded length
	// (package pile builds it from Choice.LambdaValue).
	WholePile
	// NoResistance: the layer carries no shaft resistance.
	NoResistance
)

// Param is one value a method reads from a calc file (the keys beside
// method: under a layer's shaft).
type Param struct {
	Key string // calc-file key, such as "k_over_k0"
	// Dim is "number" (a plain number), "angle", "stress" or "word" (one
	// of Words).
	Dim string
	// Min and Max bound the value: plain numbers as they are, angles in
	// degrees, stresses in kPa. Max is inclusive; Min is inclusive unless
	// MinOpen.
	Min, Max float64
	MinOpen  bool
	Words    []string // the accepted words of a "word" parameter
	// Group names keys of which at most one may be given ("K", "δ").
	Group    string
	Required bool   // the method cannot be built without it
	Default  string // what applies when the key is not given; "" when Required
	Meaning  string // one line
}

// Values are the parameters given for one method: numbers as they are,
// angles in radians, stresses in Pa, keyed by Param.Key; words by key.
// Installation and Surface are the pile's, for the β method's default K/K0
// and δ/φ′.
type Values struct {
	Num          map[string]float64
	Word         map[string]string
	Installation Installation
	Surface      Surface
}

// Choice is a method built from a catalogue entry.
type Choice struct {
	// Unit is the point method, wrapped in Capped when a limit is given;
	// nil unless the entry's Kind is PointMethod.
	Unit Unit
	// LambdaValue is λ given for the WholePile method; 0 reads λ from its
	// table.
	LambdaValue float64
}

// Descriptor is one shaft method of the catalogue: its calc-file
// identifier, what it is for, what it reads and how it is built.
type Descriptor struct {
	ID       string   // stable identifier, used in calc files and on the command line
	Drainage Drainage // the layers it is written for
	Kind     Kind
	Scope    string  // one line: the ground and piles it is meant for
	Params   []Param // the keys it reads beside method:, in the order a message lists them
	// Method is the method with no parameter given (rules left unset, a
	// given factor at zero): its Equation, Valid and Refs are the entry's.
	Method Method
	// New builds the method from the values given; keys not given are
	// absent and New applies the defaults. The caller checks keys,
	// ranges, words, groups and required keys against Params first
	// (package calc does). A "limit" given caps a point method (Capped
	// with LimitGiven).
	New func(v Values) (Choice, error)
}

// Equation returns the method's equation on one line.
func (d Descriptor) Equation() string { return d.Method.Equation() }

// Refs returns the method's published sources.
func (d Descriptor) Refs() []cite.Ref { return d.Method.Refs() }

// Valid returns the accepted range of the inputs the method reads.
func (d Descriptor) Valid() string { return d.Method.Valid() }

// Param returns the parameter with the given key, if the method reads it.
func (d Descriptor) Param(key string) (Param, bool) {
	for _, p := range d.Params {
		if p.Key == key {
			return p, true
		}
	}
	return Param{}, false
}

// Keys returns the keys the method reads, in order.
func (d Descriptor) Keys() []string {
	keys := make([]string, len(d.Params))
	for i, p := range d.Params {
		keys[i] = p.Key
	}
	return keys
}

// None is the choice of no shaft resistance in a layer (fill, a sleeve, a
// soil the engineer discounts). It is not a Unit: package pile skips the
// layer.
type None struct{}

func (None) ID() string       { return "none" }
func (None) Equation() string { return "fs = 0 (no shaft resistance counted in the layer)" }
func (None) Valid() string    { return "any layer" }
func (None) Refs() []cite.Ref { return nil }

// paramLimit is the cap every point method takes.
var paramLimit = Param{Key: "limit", Dim: "stress", Min: 0, MinOpen: true, Max: maxSu / 1e3, Default: "none (beta-api: its class limit)",
	Meaning: "limiting unit shaft friction fL, given"}

// point returns a constructor for a point method that reads no parameter
// but the limit.
func point(u Unit) func(Values) (Choice, error) {
	return func(v Values) (Choice, error) { return capped(u, v), nil }
}

// capped wraps u in the given limit, if any.
func capped(u Unit, v Values) Choice {
	if fl, ok := v.Num["limit"]; ok {
		return Choice{Unit: Capped{Method: u, Limit: LimitGiven{Fs: units.Stress(fl)}}}
	}
	return Choice{Unit: u}
}

// newDrivenN60 builds DrivenN60 from its displacement key, or from the
// pile's installation; a pile that is not driven is refused.
func newDrivenN60(v Values) (Choice, error) {
	if v.Installation != 0 && !v.Installation.Driven() {
		return Choice{}, &ChoiceError{Field: "installation (a rule for driven piles)", Value: v.Installation.String(), Accepted: []string{"driven-high", "driven-low"}}
	}
	var low bool
	switch w := v.Word["displacement"]; {
	case w == "low":
		low = true
	case w == "high":
	case v.Installation == DrivenLow:
		low = true
	case v.Installation == DrivenHigh:
	default:
		return Choice{}, &ChoiceError{Field: "installation (a rule for driven piles)", Value: v.Installation.String(), Accepted: []string{"driven-high", "driven-low"}}
	}
	return capped(DrivenN60{Low: low}, v), nil
}

// newBeta builds the β method from its K and δ keys, with the defaults by
// the pile's installation and surface.
func newBeta(v Values) (Choice, error) {
	var k KRule
	switch {
	case has(v.Num, "k"):
		k = KGiven{K: v.Num["k"]}
	case has(v.Num, "k_over_k0"):
		k = KOverK0{Ratio: v.Num["k_over_k0"]}
	case has(v.Num, "k_over_kp"):
		k = KOverKp{Ratio: v.Num["k_over_kp"]}
	case v.Word["k0"] == "jaky":
		k = KJaky{}
	case v.Word["k0"] == "ocr":
		k = KMayneKulhawy{}
	default:
		kk, err := KOverK0For(v.Installation)
		if err != nil {
			return Choice{}, err
		}
		k = kk
	}
	var d DeltaRule
	switch {
	case has(v.Num, "delta"):
		d = DeltaGiven{Delta: units.Angle(v.Num["delta"])}
	case has(v.Num, "delta_over_phi"):
		d = DeltaOverPhi{Ratio: v.Num["delta_over_phi"]}
	default:
		dd, err := DeltaOverPhiFor(v.Surface)
		if err != nil {
			return Choice{}, err
		}
		d = dd
	}
	return capped(Beta{K: k, Delta: d}, v), nil
}

func has(m map[string]float64, key string) bool { _, ok := m[key]; return ok }

// catalogue is the table of shaft methods, in the order they are listed.
var catalogue = []Descriptor{
	{ID: "beta", Drainage: AnyLayers, Method: Beta{}, New: newBeta,
		Scope: "any pile in any soil by effective stress, with K and δ chosen (defaults by installation and surface)",
		Params: []Param{
			{Key: "k", Dim: "number", Min: 0, Max: 10, Group: "K", Default: "K/K0 by installation (see k_over_k0)",
				Meaning: "earth pressure coefficient K on the shaft, given"},
			{Key: "k_over_k0", Dim: "number", Min: 0, MinOpen: true, Max: 3, Group: "K",
				Default: "by installation: 0.583 jetted, 0.833 bored, 1.0 driven low, 1.5 driven high displacement (Kulhawy 1984)",
				Meaning: "K/K0, K0 = (1 − sin φ′)·OCR^sin φ′"},
			{Key: "k_over_kp", Dim: "number", Min: 0, MinOpen: true, Max: 1, Group: "K", Default: "K/K0 by installation (see k_over_k0)",
				Meaning: "K/Kp, Kp = tan²(45° + φ′/2)"},
			{Key: "k0", Dim: "word", Words: []string{"jaky", "ocr"}, Group: "K", Default: "K/K0 by installation (see k_over_k0)",
				Meaning: "K = K0 by Jaky (1 − sin φ′) or by Mayne & Kulhawy with the layer's OCR"},
			{Key: "delta", Dim: "angle", Min: 0, Max: 50, Group: "δ", Default: "δ/φ′ by surface (see delta_over_phi)",
				Meaning: "interface friction angle δ, given"},
			{Key: "delta_over_phi", Dim: "number", Min: 0, MinOpen: true, Max: 1, Group: "δ",
				Default: "by surface: 1.0 rough concrete, 0.9 smooth concrete, 0.8 rough steel, 0.6 smooth steel, 0.85 timber (Kulhawy 1984)",
				Meaning: "δ/φ′"},
			paramLimit,
		}},
	{ID: "beta-given", Drainage: AnyLayers, Method: BetaGiven{},
		Scope: "any pile in any soil, with β from the engineer (a load test, a report)",
		Params: []Param{
			{Key: "beta", Dim: "number", Min: 0, Max: 3, Required: true, Meaning: "β = K·tan δ, given"},
			paramLimit,
		},
		New: func(v Values) (Choice, error) { return capped(BetaGiven{Beta: v.Num["beta"]}, v), nil }},
	{ID: "beta-burland", Drainage: AnyLayers, Method: Burland{}, New: point(Burland{}), Params: []Param{paramLimit},
		Scope: "driven piles in normally and lightly overconsolidated clay, by effective stress"},
	{ID: "beta-drilled-sand", Drainage: DrainedLayers, Method: DrilledSand{}, New: point(DrilledSand{}), Params: []Param{paramLimit},
		Scope: "drilled shafts in sand, β by depth and N60 (O'Neill & Reese 1999)"},
	{ID: "beta-drilled-k0", Drainage: DrainedLayers, Method: DrilledSandK0{}, New: point(DrilledSandK0{}), Params: []Param{paramLimit},
		Scope: "drilled shafts in sand, β from K0 with the preconsolidation stress (GEC 10)"},
	{ID: "driven-n60-shaft", Drainage: DrainedLayers, Method: DrivenN60{},
		Scope: "driven piles in sand, from the layer's SPT N60 (Meyerhof 1976)",
		Params: []Param{
			{Key: "displacement", Dim: "word", Words: []string{"high", "low"},
				Default: "by the pile's installation: high for driven-high, low for driven-low",
				Meaning: "high: displacement pile, fs = 0.02·pa·N60; low: small-displacement pile (H, open pipe), 0.01·pa·N60"},
			paramLimit,
		},
		New: newDrivenN60},
	{ID: "beta-api", Drainage: DrainedLayers, Method: APIBeta{},
		Scope: "driven open steel pipe piles in siliceous sand and silt, by API sand class, with its limit",
		Params: []Param{
			{Key: "sand_class", Dim: "word", Words: sandClassIDs[1:], Required: true, Meaning: "the API RP 2GEO sand class"},
			paramLimit,
		},
		New: func(v Values) (Choice, error) {
			cl, err := ParseSandClass(v.Word["sand_class"])
			if err != nil {
				return Choice{}, err
			}
			return capped(APIBeta{Class: cl}, v), nil
		}},
	{ID: "alpha-api", Drainage: UndrainedLayers, Method: AlphaAPI{}, New: point(AlphaAPI{}), Params: []Param{paramLimit},
		Scope: "driven piles in clay, α by su/σ′v (API RP 2GEO)"},
	{ID: "alpha-chart", Drainage: UndrainedLayers, Method: AlphaChart{}, New: point(AlphaChart{}), Params: []Param{paramLimit},
		Scope: "driven piles in clay, α read from its table by su/pa"},
	{ID: "alpha-drilled", Drainage: UndrainedLayers, Method: AlphaDrilled{}, New: point(AlphaDrilled{}), Params: []Param{paramLimit},
		Scope: "drilled shafts in clay, α by su/pa (O'Neill & Reese 1999)"},
	{ID: "alpha-given", Drainage: UndrainedLayers, Method: AlphaGiven{},
		Scope: "any pile in clay, with α from the engineer",
		Params: []Param{
			{Key: "alpha", Dim: "number", Min: 0, Max: 1.5, Required: true, Meaning: "adhesion factor α, given"},
			paramLimit,
		},
		New: func(v Values) (Choice, error) { return capped(AlphaGiven{Alpha: v.Num["alpha"]}, v), nil }},
	{ID: "lambda", Drainage: UndrainedLayers, Kind: WholePile, Method: Lambda{},
		Scope: "driven piles in clay, the average over the embedded length (Vijayvergiya & Focht 1972)",
		Params: []Param{{Key: "lambda", Dim: "number", Min: 0, MinOpen: true, Max: 1, Default: "read from the λ–L table",
			Meaning: "λ, given instead of read from the table"}},
		New: func(v Values) (Choice, error) { return Choice{LambdaValue: v.Num["lambda"]}, nil }},
	{ID: "none", Drainage: AnyLayers, Kind: NoResistance, Method: None{},
		Scope: "a layer whose shaft resistance is not counted",
		New:   func(Values) (Choice, error) { return Choice{}, nil }},
}

// Methods returns the catalogue of shaft methods: every method a calc file
// can name, in a fixed order. The slice is a copy; the table itself does
// not change.
func Methods() []Descriptor {
	out := make([]Descriptor, len(catalogue))
	for i, d := range catalogue {
		out[i] = d.clone()
	}
	return out
}

// clone returns d with its own copy of the parameters.
func (d Descriptor) clone() Descriptor {
	d.Params = append([]Param(nil), d.Params...)
	for j := range d.Params {
		d.Params[j].Words = append([]string(nil), d.Params[j].Words...)
	}
	return d
}

// Lookup returns the catalogue entry with the given identifier.
func Lookup(id string) (Descriptor, bool) {
	for _, d := range catalogue {
		if d.ID == id {
			return d.clone(), true
		}
	}
	return Descriptor{}, false
}

// IDs returns the identifiers of the catalogue, in its order.
func IDs() []string {
	ids := make([]string, len(catalogue))
	for i, d := range catalogue {
		ids[i] = d.ID
	}
	return ids
}

// ResistanceIDs returns the identifiers of the methods that give shaft
// resistance (every Kind but NoResistance), the keys a table of resistance
// factors may hold.
func ResistanceIDs() []string {
	var ids []string
	for _, d := range catalogue {
		if d.Kind != NoResistance {
			ids = append(ids, d.ID)
		}
	}
	return ids
}

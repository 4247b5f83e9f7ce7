package bearing

import (
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Drainage is the drainage class of the layers a method is written for.
type Drainage string

// The drainage classes of the catalogue.
const (
	DrainedLayers   Drainage = "drained"   // φ′ and c′ govern
	UndrainedLayers Drainage = "undrained" // su governs
)

// Param is one value a method reads from a calc file (the keys beside
// method: under a layer's tip).
type Param struct {
	Key string // calc-file key, such as "nq"
	// Dim is "number" (a plain number), "angle" or "stress".
	Dim string
	// Min and Max bound the value, inclusive: plain numbers as they are,
	// angles in degrees, stresses in kPa. Max is +Inf where only the sign
	// is bounded.
	Min, Max float64
	Required bool   // the method cannot be built without it
	Default  string // what applies when the key is not given; "" when Required
	Meaning  string // one line
}

// Descriptor is one tip method of the catalogue: its calc-file identifier,
// what it is for, what it reads and how it is built.
type Descriptor struct {
	ID       string   // stable identifier, used in calc files and on the command line
	Drainage Drainage // the layers it is written for
	Scope    string   // one line: the ground and piles it is meant for
	Params   []Param  // the keys it reads beside method:, in the order a message lists them
	// Method is the method as built with no parameter given (a given
	// factor left at zero): its Equation, Range and Refs are the entry's.
	Method Tip
	// New builds the method from the values given: numbers as they are,
	// angles in radians, stresses in Pa, keyed by Param.Key. Keys not
	// given are absent; New applies the defaults. The caller checks keys,
	// ranges and required keys against Params first (package calc does),
	// so New refuses nothing those checks pass.
	New func(v map[string]float64) (Tip, error)
}

// Equation returns the method's equation on one line.
func (d Descriptor) Equation() string { return d.Method.Equation() }

// Refs returns the method's published sources.
func (d Descriptor) Refs() []cite.Ref { return d.Method.Refs() }

// Range returns the inputs the method accepts, on one line.
func (d Descriptor) Range() string { return d.Method.Range() }

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

// Parameters shared by several entries.
var (
	paramNcGiven = Param{Key: "nc", Dim: "number", Min: 0, Max: 1e4, Default: "0 (no c′ term)",
		Meaning: "bearing capacity factor Nc on c′, given"}
	paramLimit = Param{Key: "limit", Dim: "stress", Min: 0, Max: math.Inf(1), Default: "none",
		Meaning: "limiting unit tip resistance, given"}
)

// fixed returns a constructor for a method that reads no parameter.
func fixed(t Tip) func(map[string]float64) (Tip, error) {
	return func(map[string]float64) (Tip, error) { return t, nil }
}

// catalogue is the table of tip methods, in the order they are listed
// (the drained methods first, as the factors tool compares them).
var catalogue = []Descriptor{
	{ID: "meyerhof", Drainage: DrainedLayers, Method: Meyerhof{}, New: fixed(Meyerhof{}),
		Scope: "driven piles in sand; Nq* read from Meyerhof's chart, φ′ 20 to 45 deg"},
	{ID: "vesic", Drainage: DrainedLayers, Method: Vesic{Volume: VolumeCorrelated}, New: fixed(Vesic{Volume: VolumeCorrelated}),
		Scope: "piles in sand and c′-φ′ soil, by cavity expansion; Δ from the layer's volumetric_strain or Vesic's correlation"},
	{ID: "berezantzev", Drainage: DrainedLayers, Method: Berezantzev{}, New: fixed(Berezantzev{}),
		Scope: "driven and bored piles in sand; Nq read from the chart by φ′ 23 to 39 deg and L/D"},
	{ID: "janbu", Drainage: DrainedLayers, Method: Janbu{},
		Params: []Param{{Key: "eta", Dim: "angle", Min: 60, Max: 105, Default: "90 deg",
			Meaning: "Janbu's angle η′ of the plastic zone"}},
		New:   func(v map[string]float64) (Tip, error) { return Janbu{Eta: units.Angle(v["eta"])}, nil },
		Scope: "piles in sand and c′-φ′ soil, closed form in φ′ and η′"},
	{ID: "api-medium-dense-sand-silt", Drainage: DrainedLayers, Method: APISand{Class: 1}, New: fixed(APISand{Class: 1}),
		Scope: "driven open steel piles in medium dense sand-silt (API class 1)"},
	{ID: "api-medium-dense-sand", Drainage: DrainedLayers, Method: APISand{Class: 2}, New: fixed(APISand{Class: 2}),
		Scope: "driven open steel piles in medium dense sand or dense sand-silt (API class 2)"},
	{ID: "api-dense-sand", Drainage: DrainedLayers, Method: APISand{Class: 3}, New: fixed(APISand{Class: 3}),
		Scope: "driven open steel piles in dense sand or very dense sand-silt (API class 3)"},
	{ID: "api-very-dense-sand", Drainage: DrainedLayers, Method: APISand{Class: 4}, New: fixed(APISand{Class: 4}),
		Scope: "driven open steel piles in very dense sand (API class 4)"},
	{ID: "drilled-n60-sand", Drainage: DrainedLayers, Method: ShaftSand{}, New: fixed(ShaftSand{}),
		Scope: "drilled shafts in sand, from the layer's SPT N60; at a base settlement of 5 % of the diameter"},
	{ID: "driven-n60-sand", Drainage: DrainedLayers, Method: DrivenN60{}, New: fixed(DrivenN60{}),
		Scope: "driven piles in sand and gravel, from the layer's SPT N60 (Meyerhof 1976); Lb/D by the embedment and layered rules"},
	{ID: "bored-phi", Drainage: DrainedLayers, Method: BoredPhi{}, New: fixed(BoredPhi{}),
		Scope: "bored and augered piles in sand without SPT data: one third of Meyerhof's driven value, capped"},
	{ID: "bored-sand", Drainage: DrainedLayers, Method: BoredSand{}, New: fixed(BoredSand{}),
		Scope: "bored and augered piles in sand: drilled-n60-sand where N60 is given, else bored-phi; large-base reduction"},
	{ID: "vesic-given", Drainage: DrainedLayers, Method: VesicGiven{},
		Params: []Param{
			{Key: "nsigma", Dim: "number", Min: 1, Max: 1e4, Required: true, Meaning: "Vesic's bearing factor Nσ*, given"},
			paramNcGiven,
		},
		New:   func(v map[string]float64) (Tip, error) { return VesicGiven{Nsigma: v["nsigma"], Nc: v["nc"]}, nil },
		Scope: "any drained tip whose Vesic factors Nσ* and Nc* the engineer gives"},
	{ID: "given-nq", Drainage: DrainedLayers, Method: GivenNq{},
		Params: []Param{
			{Key: "nq", Dim: "number", Min: 1, Max: 1e4, Required: true, Meaning: "bearing capacity factor Nq, given"},
			paramNcGiven,
			paramLimit,
		},
		New: func(v map[string]float64) (Tip, error) {
			return GivenNq{Nq: v["nq"], Nc: v["nc"], Limit: units.Stress(v["limit"])}, nil
		},
		Scope: "any drained tip whose factors the engineer gives, such as from a geotechnical report"},
	{ID: "nc9", Drainage: UndrainedLayers, Method: Skempton{}, New: fixed(Skempton{}),
		Scope: "piles in clay, base deeper than about four diameters"},
	{ID: "vesic-undrained", Drainage: UndrainedLayers, Method: VesicUndrained{}, New: fixed(VesicUndrained{}),
		Scope: "piles in clay, by cavity expansion with the rigidity index"},
	{ID: "given-nc", Drainage: UndrainedLayers, Method: GivenNc{},
		Params: []Param{{Key: "nc", Dim: "number", Min: 1, Max: 100, Required: true, Meaning: "bearing capacity factor Nc on su, given"}},
		New:    func(v map[string]float64) (Tip, error) { return GivenNc{Nc: v["nc"]}, nil },
		Scope:  "any undrained tip whose factor Nc the engineer gives"},
}

// Methods returns the catalogue of tip methods: every method a calc file
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

// renamed maps identifiers of earlier versions to the ones that replaced
// them: the API sand classes take the spelling of the shaft side's
// sand_class, and the drilled-shaft SPT tip is named for what it is.
var renamed = map[string]string{
	"api-sand-1":     "api-medium-dense-sand-silt",
	"api-sand-2":     "api-medium-dense-sand",
	"api-sand-3":     "api-dense-sand",
	"api-sand-4":     "api-very-dense-sand",
	"shaft-n60-sand": "drilled-n60-sand",
}

// Renamed returns the identifier that replaced an earlier one, so that a
// calc file naming the old one is told the new; ok is false for an
// identifier that was never renamed.
func Renamed(old string) (id string, ok bool) {
	id, ok = renamed[old]
	return id, ok
}

// IDs returns the identifiers of the catalogue, in its order.
func IDs() []string {
	ids := make([]string, len(catalogue))
	for i, d := range catalogue {
		ids[i] = d.ID
	}
	return ids
}

// needsNothing reports whether every parameter of d is optional, so that
// the method can be built and compared without a value given.
func (d Descriptor) needsNothing() bool {
	for _, p := range d.Params {
		if p.Required {
			return false
		}
	}
	return true
}

// of returns the methods of the catalogue in the given drainage class that
// need no given value, built with their defaults.
func of(class Drainage) []Tip {
	var out []Tip
	for _, d := range catalogue {
		if d.Drainage != class || !d.needsNothing() {
			continue
		}
		t, err := d.New(nil)
		if err != nil {
			panic("bearing: catalogue entry " + d.ID + " does not build with its defaults: " + err.Error())
		}
		out = append(out, t)
	}
	return out
}

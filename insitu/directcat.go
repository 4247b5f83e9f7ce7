package insitu

import (
	"math"

	"github.com/qultgeo/qult/units"
)

// Part says which resistance a direct method gives.
type Part string

// The parts of a pile's resistance.
const (
	TipPart   Part = "tip"
	ShaftPart Part = "shaft"
)

// DirectParam is one value a direct method reads from a calc file (the
// keys beside method: under a layer's tip or shaft).
type DirectParam struct {
	Key string
	// Dim is "number" (a plain number) or "stress".
	Dim string
	// Min and Max bound the value, inclusive: numbers as they are,
	// stresses in kPa.
	Min, Max float64
	Required bool
	Default  string // what applies when not given; "" when Required
	Meaning  string
}

// DirectDescriptor is one direct CPT method of the catalogue: a layer's
// tip or shaft method that reads the file's cone sounding instead of the
// layer's strength parameters.
type DirectDescriptor struct {
	ID     string
	Part   Part
	Scope  string
	Params []DirectParam
	// Tip or Shaft is the method as built with no value given (for its
	// Equation, Range and Refs).
	Tip   DirectTip
	Shaft DirectShaft
	// NewTip or NewShaft builds the method from the values given
	// (stresses in Pa), keyed by DirectParam.Key; the caller checks keys
	// and ranges against Params first.
	NewTip   func(v map[string]float64) DirectTip
	NewShaft func(v map[string]float64) DirectShaft
}

// Equation returns the method's equation on one line.
func (d DirectDescriptor) Equation() string {
	if d.Part == TipPart {
		return d.Tip.Equation()
	}
	return d.Shaft.Equation()
}

var directCatalogue = []DirectDescriptor{
	{ID: "lcpc", Part: TipPart, Tip: LCPCTip{},
		Scope: "any pile, from a cone sounding: qp = kc·qca with kc of the soil and pile category, given",
		Params: []DirectParam{
			{Key: "kc", Dim: "number", Min: 0.05, Max: 1, Required: true, Meaning: "bearing factor kc of the soil and pile category (Bustamante & Gianeselli 1982), given"},
			{Key: "limit", Dim: "stress", Min: 0, Max: math.Inf(1), Default: "none", Meaning: "limiting unit tip resistance, given"},
		},
		NewTip: func(v map[string]float64) DirectTip {
			return LCPCTip{Kc: v["kc"], Limit: units.Stress(v["limit"])}
		}},
	{ID: "schmertmann", Part: TipPart, Tip: SchmertmannTip{},
		Scope: "driven piles, from a cone sounding: mean of qc below (0.7B to 4B) and above (8B) the tip by the minimum path",
		Params: []DirectParam{
			{Key: "limit", Dim: "stress", Min: 1, Max: 100000, Required: true, Meaning: "limiting unit tip resistance of the method, given"},
		},
		NewTip: func(v map[string]float64) DirectTip { return SchmertmannTip{Limit: units.Stress(v["limit"])} }},
	{ID: "eslami-fellenius", Part: TipPart, Tip: EslamiFelleniusTip{},
		Scope: "any pile, from a piezocone sounding: qp = Ct·qEg, the geometric mean of qt − u2 about the tip",
		Params: []DirectParam{
			{Key: "ct", Dim: "number", Min: 0.1, Max: 1, Default: "1", Meaning: "toe correlation coefficient Ct"},
		},
		NewTip: func(v map[string]float64) DirectTip { return EslamiFelleniusTip{Ct: v["ct"]} }},
	{ID: "lcpc", Part: ShaftPart, Shaft: LCPCShaft{},
		Scope: "any pile, from a cone sounding: fs = qc/α up to the category's limit, both given",
		Params: []DirectParam{
			{Key: "alpha", Dim: "number", Min: 10, Max: 300, Required: true, Meaning: "friction coefficient α of the soil and pile category (Bustamante & Gianeselli 1982), given"},
			{Key: "limit", Dim: "stress", Min: 0.001, Max: 1000, Required: true, Meaning: "limiting unit shaft resistance fs,max of the category, given"},
		},
		NewShaft: func(v map[string]float64) DirectShaft {
			return LCPCShaft{Alpha: v["alpha"], Limit: units.Stress(v["limit"])}
		}},
	{ID: "schmertmann-sand", Part: ShaftPart, Shaft: SchmertmannSandShaft{},
		Scope: "driven piles in sand, from a cone sounding's sleeve friction: fs = K·w·fs,cone, the top 8B weighted, K given",
		Params: []DirectParam{
			{Key: "k", Dim: "number", Min: 0.1, Max: 3, Required: true, Meaning: "ratio K of the pile's unit friction to the sleeve's for the pile's embedment ratio (Schmertmann 1978 chart), given"},
			{Key: "limit", Dim: "stress", Min: 0, Max: math.Inf(1), Default: "none", Meaning: "limiting unit shaft resistance, given"},
		},
		NewShaft: func(v map[string]float64) DirectShaft {
			return SchmertmannSandShaft{K: v["k"], Limit: units.Stress(v["limit"])}
		}},
	{ID: "schmertmann-clay", Part: ShaftPart, Shaft: SchmertmannClayShaft{},
		Scope: "driven piles in clay, from a cone sounding's sleeve friction: fs = α′·fs,cone, α′ given",
		Params: []DirectParam{
			{Key: "alpha", Dim: "number", Min: 0.1, Max: 1.5, Required: true, Meaning: "ratio α′ of the pile's unit friction to the sleeve's (Schmertmann 1978 chart), given"},
			{Key: "limit", Dim: "stress", Min: 0, Max: math.Inf(1), Default: "none", Meaning: "limiting unit shaft resistance, given"},
		},
		NewShaft: func(v map[string]float64) DirectShaft {
			return SchmertmannClayShaft{Alpha: v["alpha"], Limit: units.Stress(v["limit"])}
		}},
	{ID: "eslami-fellenius", Part: ShaftPart, Shaft: EslamiFelleniusShaft{},
		Scope: "any pile, from a piezocone sounding: fs = Cs·(qt − u2) with Cs of the soil type, given",
		Params: []DirectParam{
			{Key: "cs", Dim: "number", Min: 0.001, Max: 0.1, Required: true, Meaning: "shaft correlation coefficient Cs of the soil type (Eslami & Fellenius 1997 chart), given"},
		},
		NewShaft: func(v map[string]float64) DirectShaft { return EslamiFelleniusShaft{Cs: v["cs"]} }},
}

// DirectMethods returns the catalogue of direct CPT methods, in a fixed
// order. The slice is a copy.
func DirectMethods() []DirectDescriptor {
	out := make([]DirectDescriptor, len(directCatalogue))
	for i, d := range directCatalogue {
		d.Params = append([]DirectParam(nil), d.Params...)
		out[i] = d
	}
	return out
}

// LookupDirect returns the direct method of the given part and identifier.
func LookupDirect(part Part, id string) (DirectDescriptor, bool) {
	for _, d := range directCatalogue {
		if d.Part == part && d.ID == id {
			d.Params = append([]DirectParam(nil), d.Params...)
			return d, true
		}
	}
	return DirectDescriptor{}, false
}

// DirectIDs returns the identifiers of the direct methods of a part.
func DirectIDs(part Part) []string {
	var ids []string
	for _, d := range directCatalogue {
		if d.Part == part {
			ids = append(ids, d.ID)
		}
	}
	return ids
}

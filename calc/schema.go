package calc

import (
	"encoding/json"
	"maps"
	"math"
	"reflect"
	"regexp"
	"slices"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/group"
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/reliability"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

var (
	tipChoiceT   = reflect.TypeOf(TipChoice{})
	shaftChoiceT = reflect.TypeOf(ShaftChoice{})
	pairsT       = reflect.TypeOf([][]Value{})
)

// SchemaID is the identifier of the calc file's JSON Schema.
const SchemaID = "urn:qult:calc-file:1"

// enums lists the accepted words of string fields, by key.
var enums = map[string][]string{
	"drainage":     {"drained", "undrained"},
	"soil":         {"gravel", "sand", "silt", "clay", "peat", "fill"},
	"shape":        {"circle", "square", "closed-pipe", "open-pipe", "h-section", "given"},
	"installation": {"driven-high", "driven-low", "bored", "augered", "jetted"},
	"surface":      {"rough-concrete", "smooth-concrete", "rough-steel", "smooth-steel", "timber"},
	"plug":         {"lesser", "plugged", "unplugged"},
	"units":        {"SI", "US", "si", "us"},
	"basis":        {"safety-factor", "lrfd", "en1997"},
	"preset":       {"aashto-driven", "aashto-drilled"},
	"approach":     {"DA1", "DA2", "DA3"},
	"annex":        {"recommended", "uk"},
	"self_weight":  {"ignored", "net", "gross"},
	"k0":           {"jaky", "ocr"},
	// settlement and load_test
	"method":   settleMethods,
	"form":     {"elastic", "empirical"},
	"criteria": LoadTestCriteria,
	// group
	"efficiency":  group.RuleIDs(),
	"raft_method": {group.RaftTwoToOne, group.RaftTomlinson},
	"raft_stress": {group.StressCentre, group.StressAverage, group.StressSpread},
	// reliability
	"distribution": {"normal", "lognormal", "truncated-normal", "uniform"},
	"key":          append(slices.Clone(reliability.LayerKeys), reliability.GlobalKeys...),
	// candidates
	"transverse": {"ties", "spiral"},
	"driving":    {"severe", "good"},
	"casing":     {"none", "permanent"},
	"currency":   currencies,
	// The methods chosen for the whole pile: those that need no key (a
	// given value belongs to a layer); shaft_drained takes a method that
	// gives fs at each depth, shaft_undrained also the λ method.
	"tip_drained":     pileTipIDs(),
	"tip_undrained":   pileTipIDs(),
	"shaft_drained":   pileShaftIDs(false),
	"shaft_undrained": pileShaftIDs(true),
}

// factorKeys lists the keys of the resistance-factor maps of design: the
// methods of the catalogues and "*" for any other.
var factorKeys = map[string][]string{
	"tip":    append(append(bearing.IDs(), insitu.DirectIDs(insitu.TipPart)...), "*"),
	"shaft":  append(append(shaft.ResistanceIDs(), insitu.DirectIDs(insitu.ShaftPart)...), "*"),
	"uplift": append(append(shaft.ResistanceIDs(), insitu.DirectIDs(insitu.ShaftPart)...), "*"),
}

func needsNothing(ps []param) bool {
	for _, p := range ps {
		if p.required {
			return false
		}
	}
	return true
}

func pileTipIDs() []string {
	var ids []string
	for _, d := range bearing.Methods() {
		if needsNothing(tipParams(d)) {
			ids = append(ids, d.ID)
		}
	}
	return ids
}

func pileShaftIDs(lambda bool) []string {
	var ids []string
	for _, d := range shaft.Methods() {
		if needsNothing(shaftParams(d)) && (d.Kind == shaft.PointMethod || lambda && d.Kind == shaft.WholePile) {
			ids = append(ids, d.ID)
		}
	}
	return ids
}

// entry is a catalogue method as the schema sees it.
type entry struct {
	id     string
	params []param
}

func tipEntries() []entry {
	var es []entry
	for _, d := range bearing.Methods() {
		es = append(es, entry{d.ID, tipParams(d)})
	}
	for _, d := range insitu.DirectMethods() {
		if d.Part == insitu.TipPart {
			es = append(es, entry{d.ID, directParams(d)})
		}
	}
	return es
}

func shaftEntries() []entry {
	var es []entry
	for _, d := range shaft.Methods() {
		es = append(es, entry{d.ID, shaftParams(d)})
	}
	for _, d := range insitu.DirectMethods() {
		if d.Part == insitu.ShaftPart {
			es = append(es, entry{d.ID, directParams(d)})
		}
	}
	return es
}

// paramSchema is the schema of one method parameter.
func paramSchema(p param, doc string) map[string]any {
	if p.dim == "word" {
		return map[string]any{"type": "string", "enum": p.words, "description": doc}
	}
	lo := strconv.FormatFloat(p.min, 'g', -1, 64)
	hi := ""
	if !math.IsInf(p.max, 1) {
		hi = strconv.FormatFloat(p.max, 'g', -1, 64)
	}
	m := fieldSchema(p.dim+","+lo+","+hi, doc)
	if p.minOpen {
		num := m["oneOf"].([]any)[0].(map[string]any)
		delete(num, "minimum")
		num["exclusiveMinimum"] = p.min
	}
	return m
}

// choiceSchema is the schema of a layer's tip or shaft: method, one of the
// catalogue's identifiers, and beside it only the keys that method reads,
// with their ranges; required keys required, and at most one key of a
// group.
func choiceSchema(what string, es []entry) map[string]any {
	var ids []string
	union := map[string]param{}
	readBy := map[string][]string{}
	var order []string
	for _, e := range es {
		ids = append(ids, e.id)
		for _, p := range e.params {
			u, seen := union[p.key]
			if !seen {
				order = append(order, p.key)
				u = p
			} else {
				// The loosest range of the methods that read the key.
				u.minOpen = u.minOpen && p.minOpen && p.min == u.min
				u.min, u.max = math.Min(u.min, p.min), math.Max(u.max, p.max)
			}
			union[p.key] = u
			readBy[p.key] = append(readBy[p.key], e.id)
		}
	}
	props := map[string]any{"method": map[string]any{"type": "string", "enum": ids,
		"description": "The " + what + " method: an identifier of the catalogue; the other keys are the values it reads."}}
	for _, k := range order {
		u := union[k]
		props[k] = paramSchema(u, u.meaning+" (read by "+strings.Join(readBy[k], ", ")+")")
	}
	var cases []any
	for _, e := range es {
		then := map[string]any{"properties": map[string]any{"method": true}, "additionalProperties": false}
		var req []string
		groups := map[string][]string{}
		for _, p := range e.params {
			then["properties"].(map[string]any)[p.key] = paramSchema(p, p.meaning)
			if p.required {
				req = append(req, p.key)
			}
			if p.group != "" {
				groups[p.group] = append(groups[p.group], p.key)
			}
		}
		if len(req) > 0 {
			then["required"] = req
		}
		var nots []any
		for _, g := range slices.Sorted(maps.Keys(groups)) {
			keys := groups[g]
			for i := range keys {
				for j := i + 1; j < len(keys); j++ {
					nots = append(nots, map[string]any{"not": map[string]any{"required": []string{keys[i], keys[j]}}})
				}
			}
		}
		if len(nots) > 0 {
			then["allOf"] = nots
		}
		cases = append(cases, map[string]any{
			"if":   map[string]any{"properties": map[string]any{"method": map[string]any{"const": e.id}}, "required": []string{"method"}},
			"then": then,
		})
	}
	return map[string]any{"type": "object", "properties": props, "additionalProperties": false,
		"required": []string{"method"}, "allOf": cases}
}

// required lists the keys each struct needs.
var required = map[reflect.Type][]string{
	reflect.TypeOf(File{}):        {"ground", "pile"},
	reflect.TypeOf(Ground{}):      {"water_depth", "layers"},
	reflect.TypeOf(Layer{}):       {"drainage"},
	reflect.TypeOf(Pile{}):        {"section", "length", "installation"},
	reflect.TypeOf(Section{}):     {"shape"},
	reflect.TypeOf(Design{}):      {"basis"},
	reflect.TypeOf(Zone{}):        {"top", "bottom"},
	reflect.TypeOf(PorePoint{}):   {"depth", "pressure"},
	reflect.TypeOf(CurvePoints{}): {"points"},
	reflect.TypeOf(LoadTest{}):    {"points"},
	reflect.TypeOf(Uncertain{}):   {"key", "distribution"},
	reflect.TypeOf(Correlation{}): {"between", "rho"},
}

var quantity = map[string]any{
	"type":        []string{"string", "number"},
	"description": "a number with a unit, such as \"12 m\" or \"18 kN/m3\", or a bare number in the file's unit system",
}

// kindDims maps the q tag's kinds onto the dimensions whose units a string
// may carry.
var kindDims = map[string]units.Dimension{
	"length": units.DimLength, "length-or-none": units.DimLength, "area": units.DimArea,
	"stress": units.DimStress, "force": units.DimForce, "unitweight": units.DimUnitWeight,
	"angle": units.DimAngle,
}

// numberRE matches a decimal number as package units reads it.
const numberRE = `[0-9]+(\.[0-9]*)?|\.[0-9]+`

// unitAlternation writes the accepted spellings of a dimension's units as a
// regular-expression alternation, with the powers in any of the forms
// units reads (m2, m², m^2) and spaces around a slash.
func unitAlternation(d units.Dimension) string {
	var alts []string
	for _, sym := range units.Symbols(d) {
		var b strings.Builder
		for _, r := range sym {
			switch r {
			case '2':
				b.WriteString(`(2|²|\^2)`)
			case '3':
				b.WriteString(`(3|³|\^3)`)
			case '/':
				b.WriteString(` */ *`)
			default:
				b.WriteString(regexp.QuoteMeta(string(r)))
			}
		}
		alts = append(alts, b.String())
	}
	return strings.Join(alts, "|")
}

// fieldSchema returns the schema of one tagged Value field: a number, or a
// string holding a number with (or without) one of the dimension's units.
// Bounds go on bare numbers where they do not depend on the unit system
// (angles are degrees in both, plain numbers have no unit); a lower bound
// of 0 also forbids a minus sign in the string form.
func fieldSchema(tag, doc string) map[string]any {
	parts := strings.Split(tag, ",")
	kind := parts[0]
	var lo, hi string
	if len(parts) == 3 {
		lo, hi = parts[1], parts[2]
	}
	sign := `[-+]?`
	if lo == "0" {
		sign = `\+?`
	}
	num := map[string]any{"type": "number"}
	str := map[string]any{"type": "string"}
	switch kind {
	case "number", "integer", "fraction", "factormap":
		str["pattern"] = `^ *` + sign + `(` + numberRE + `)([eE][-+]?[0-9]+)? *$`
		if kind == "fraction" {
			str["pattern"] = `^ *\+?(` + numberRE + `)([eE][-+]?[0-9]+)? *%? *$`
			lo, hi = "0", "10"
		}
		if kind == "integer" {
			num["type"] = "integer"
			str["pattern"] = `^ *\+?[0-9]+ *$`
		}
	default:
		d, ok := kindDims[kind]
		if !ok {
			panic("calc: unknown q tag kind " + kind)
		}
		str["pattern"] = `^ *` + sign + `(` + numberRE + `)([eE][-+]?[0-9]+)? *(` + unitAlternation(d) + `)? *$`
		if kind == "length-or-none" {
			str["pattern"] = `^ *(none|[-+]?(` + numberRE + `)([eE][-+]?[0-9]+)? *(` + unitAlternation(d) + `)?) *$`
		}
		if kind == "angle" && hi != "" && !angleBoundable(hi) {
			// Degrees bounded on the bare number only; a string by form.
			str["pattern"] = `^ *` + sign + `(` + numberRE + `)([eE][-+]?[0-9]+)? *(deg|°|rad)? *$`
		} else if kind == "angle" && hi != "" {
			// Degrees bounded as the bare number is; radians only by form.
			str["pattern"] = `^ *\+?(0*(` + belowRE(int(atof(hi))) + `)(\.[0-9]*)?|0*` + hi + `(\.0*)?|\.[0-9]+) *(deg|°)? *$|^ *\+?(` + numberRE + `) *rad *$`
		} else {
			hi = "" // a bare number's unit depends on the file's system
		}
	}
	if lo != "" {
		num["minimum"] = atof(lo)
	}
	if hi != "" {
		num["maximum"] = atof(hi)
	}
	one := map[string]any{"oneOf": []any{num, str}, "description": doc}
	if kind == "factormap" {
		return map[string]any{"type": "object", "additionalProperties": map[string]any{"oneOf": []any{num, str}}, "description": doc}
	}
	return one
}

// belowRE returns a regular expression for the whole numbers 0 to n − 1,
// for n a multiple of 10 from 20 to 990 (the angle limits of the calc
// file: 50 and 180 degrees).
func belowRE(n int) string {
	if n%10 != 0 || n < 20 || n > 990 {
		panic("calc: belowRE: unsupported limit " + strconv.Itoa(n))
	}
	tens := n / 10 // n = tens·10: two-digit numbers up to (tens−1)9
	if n < 100 {
		return "[0-9]|[1-" + strconv.Itoa(tens-1) + "][0-9]"
	}
	h, t := n/100, (n/10)%10
	re := "[0-9]|[1-9][0-9]"
	if h > 1 {
		re += "|[1-" + strconv.Itoa(h-1) + "][0-9][0-9]"
	}
	if t > 0 {
		re += "|" + strconv.Itoa(h) + "[0-" + strconv.Itoa(t-1) + "][0-9]"
	}
	return re
}

// angleBoundable reports whether belowRE can write the bound hi (degrees).
func angleBoundable(hi string) bool {
	n := atof(hi)
	return n == math.Trunc(n) && int(n)%10 == 0 && n >= 20 && n <= 990
}

func atof(s string) float64 {
	x, err := strconv.ParseFloat(s, 64)
	if err != nil {
		panic("calc: bad number in a q tag: " + s)
	}
	return x
}

// Schema returns the JSON Schema (draft 2020-12) of the calc file,
// generated from the Go types, so that editors can check files.
func Schema() ([]byte, error) {
	s := schemaOf(reflect.TypeOf(File{}), "")
	s["$schema"] = "https://json-schema.org/draft/2020-12/schema"
	s["$id"] = SchemaID
	s["title"] = "qult calc file, format version 1"
	return json.MarshalIndent(s, "", "  ")
}

func schemaOf(t reflect.Type, key string) map[string]any {
	for t.Kind() == reflect.Pointer {
		t = t.Elem()
	}
	switch {
	case t == valueType:
		return copyMap(quantity)
	case t == strengthT:
		obj := object(t)
		return map[string]any{"oneOf": []any{copyMap(quantity), obj}}
	case t == loadT: // permanent and variable parts only: a bare load is refused
		return object(t)
	case t == tipChoiceT:
		return choiceSchema("tip", tipEntries())
	case t == shaftChoiceT:
		return choiceSchema("shaft", shaftEntries())
	}
	switch t.Kind() {
	case reflect.Struct:
		return object(t)
	case reflect.Slice:
		return map[string]any{"type": "array", "items": schemaOf(t.Elem(), key)}
	case reflect.Map:
		return map[string]any{"type": "object", "additionalProperties": schemaOf(t.Elem(), key)}
	case reflect.String:
		m := map[string]any{"type": "string"}
		if e, ok := enums[key]; ok {
			m["enum"] = e
		}
		return m
	case reflect.Bool:
		return map[string]any{"type": "boolean"}
	case reflect.Int:
		return map[string]any{"type": "integer"}
	}
	return map[string]any{}
}

func object(t reflect.Type) map[string]any {
	props := map[string]any{}
	for i := 0; i < t.NumField(); i++ {
		f := t.Field(i)
		name := strings.Split(f.Tag.Get("yaml"), ",")[0]
		if name == "" || name == "-" {
			continue
		}
		if q := f.Tag.Get("q"); q != "" {
			fs := fieldSchema(q, f.Tag.Get("doc"))
			if keys, ok := factorKeys[name]; ok && strings.HasPrefix(q, "factormap") {
				fs["propertyNames"] = map[string]any{"enum": keys}
			}
			props[name] = fs
			continue
		}
		props[name] = schemaOf(f.Type, name)
		if f.Type == pairsT { // [x, y] pairs
			pair := props[name].(map[string]any)["items"].(map[string]any)
			pair["minItems"], pair["maxItems"] = 2, 2
		}
		if d := f.Tag.Get("doc"); d != "" {
			props[name].(map[string]any)["description"] = d
		}
	}
	m := map[string]any{"type": "object", "properties": props, "additionalProperties": false}
	if r, ok := required[t]; ok {
		m["required"] = r
	}
	return m
}

func copyMap(m map[string]any) map[string]any {
	out := make(map[string]any, len(m))
	for k, v := range m {
		out[k] = v
	}
	return out
}

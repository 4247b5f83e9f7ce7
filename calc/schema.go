package calc

import (
	"encoding/json"
	"reflect"
	"strings"
)

// SchemaID is the identifier of the calc file's JSON Schema.
const SchemaID = "urn:qult:calc-file:1"

// enums lists the accepted words of string fields, by key.
var enums = map[string][]string{
	"drainage":     {"drained", "undrained"},
	"shape":        {"circle", "square", "closed-pipe", "open-pipe", "h-section", "given"},
	"installation": {"driven-high", "driven-low", "bored", "augered", "jetted"},
	"surface":      {"rough-concrete", "smooth-concrete", "rough-steel", "smooth-steel", "timber"},
	"plug":         {"lesser", "plugged", "unplugged"},
	"units":        {"SI", "US", "si", "us"},
	"basis":        {"safety-factor", "lrfd", "en1997"},
	"preset":       {"aashto-driven", "aashto-drilled"},
	"approach":     {"DA1", "DA2", "DA3"},
	"self_weight":  {"ignored", "net", "gross"},
	"k0":           {"jaky", "ocr"},
	"sand_class":   {"api-medium-dense-sand-silt", "api-medium-dense-sand", "api-dense-sand", "api-very-dense-sand"},
}

// required lists the keys each struct needs.
var required = map[reflect.Type][]string{
	reflect.TypeOf(File{}):        {"ground", "pile"},
	reflect.TypeOf(Ground{}):      {"layers"},
	reflect.TypeOf(Layer{}):       {"drainage"},
	reflect.TypeOf(Pile{}):        {"section", "length", "installation"},
	reflect.TypeOf(Section{}):     {"shape"},
	reflect.TypeOf(ShaftChoice{}): {"method"},
	reflect.TypeOf(TipChoice{}):   {"method"},
	reflect.TypeOf(Design{}):      {"basis"},
	reflect.TypeOf(Zone{}):        {"top", "bottom"},
	reflect.TypeOf(PorePoint{}):   {"depth", "pressure"},
}

var quantity = map[string]any{
	"type":        []string{"string", "number"},
	"description": "a number with a unit, such as \"12 m\" or \"18 kN/m3\", or a bare number in the file's unit system",
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
		name := strings.Split(t.Field(i).Tag.Get("yaml"), ",")[0]
		if name == "" || name == "-" {
			continue
		}
		props[name] = schemaOf(t.Field(i).Type, name)
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

package bearing

// Sources: none needed; these tests check the catalogue's structure (every
// identifier builds its method, ranges are the methods' own); the numbers
// are invented inputs, checked in closed form against the methods.

import (
	"go/ast"
	"go/parser"
	"go/token"
	"math"
	"os"
	"path/filepath"
	"reflect"
	"slices"
	"strings"
	"testing"
)

// Completeness and consistency of the catalogue (Methods). No published
// value is involved: these check the table against the package's own
// types and against itself.

// notInCatalogue lists the types with a Tip method that a calc file cannot
// name on their own, with the reason.
var notInCatalogue = map[string]string{
	"LargeBase": "a wrapper that applies the large-base reduction to another method; bored-sand applies it",
}

// sample returns values for every parameter of d: a required one at its
// lower bound, an optional one in the middle of its range.
func sample(d Descriptor) map[string]float64 {
	v := map[string]float64{}
	for _, p := range d.Params {
		x := p.Min
		if !p.Required && !math.IsInf(p.Max, 1) {
			x = (p.Min + p.Max) / 2
		}
		if p.Dim == "angle" {
			x *= math.Pi / 180
		}
		if p.Dim == "stress" {
			x *= 1e3
		}
		v[p.Key] = x
	}
	return v
}

func TestCatalogueBuilds(t *testing.T) {
	seen := map[string]bool{}
	for _, d := range Methods() {
		if seen[d.ID] {
			t.Errorf("%s: listed twice", d.ID)
		}
		seen[d.ID] = true
		if d.Drainage != DrainedLayers && d.Drainage != UndrainedLayers {
			t.Errorf("%s: drainage %q", d.ID, d.Drainage)
		}
		if d.Scope == "" || d.Equation() == "" || d.Range() == "" {
			t.Errorf("%s: empty scope, equation or range", d.ID)
		}
		if d.Method == nil || d.Method.ID() != d.ID {
			t.Errorf("%s: Method %v does not carry the identifier", d.ID, d.Method)
		}
		// Built with no value (when it needs none) and with every value.
		var inputs []map[string]float64
		if d.needsNothing() {
			inputs = append(inputs, nil)
		}
		inputs = append(inputs, sample(d))
		for _, v := range inputs {
			m, err := d.New(v)
			if err != nil || m == nil {
				t.Errorf("%s: New(%v) = %v, %v", d.ID, v, m, err)
				continue
			}
			if m.ID() != d.ID {
				t.Errorf("%s: New builds a method with ID %q", d.ID, m.ID())
			}
			if reflect.TypeOf(m) != reflect.TypeOf(d.Method) {
				t.Errorf("%s: New builds a %T, Method is a %T", d.ID, m, d.Method)
			}
		}
		keys := map[string]bool{}
		for _, p := range d.Params {
			if p.Key == "" || keys[p.Key] || p.Meaning == "" || !(p.Min <= p.Max) {
				t.Errorf("%s: bad parameter %+v", d.ID, p)
			}
			keys[p.Key] = true
			if !slices.Contains([]string{"number", "angle", "stress"}, p.Dim) {
				t.Errorf("%s.%s: dimension %q", d.ID, p.Key, p.Dim)
			}
			if p.Required == (p.Default != "") {
				t.Errorf("%s.%s: a required key has no default, an optional one says what applies", d.ID, p.Key)
			}
		}
		if got, ok := Lookup(d.ID); !ok || got.ID != d.ID {
			t.Errorf("Lookup(%q) = %v, %v", d.ID, got.ID, ok)
		}
	}
	if _, ok := Lookup("no-such-method"); ok {
		t.Error("Lookup of an unknown identifier succeeded")
	}
	if !slices.Equal(IDs(), func() []string {
		var ids []string
		for _, d := range Methods() {
			ids = append(ids, d.ID)
		}
		return ids
	}()) {
		t.Error("IDs and Methods disagree")
	}
}

// A given value reaches the method it builds.
func TestCatalogueValues(t *testing.T) {
	build := func(id string, v map[string]float64) Tip {
		t.Helper()
		d, ok := Lookup(id)
		if !ok {
			t.Fatalf("%s not in the catalogue", id)
		}
		m, err := d.New(v)
		if err != nil {
			t.Fatal(err)
		}
		return m
	}
	if got := build("given-nq", map[string]float64{"nq": 40, "nc": 25, "limit": 5e6}); got != (GivenNq{Nq: 40, Nc: 25, Limit: 5e6}) {
		t.Errorf("given-nq built %+v", got)
	}
	if got := build("given-nc", map[string]float64{"nc": 7.5}); got != (GivenNc{Nc: 7.5}) {
		t.Errorf("given-nc built %+v", got)
	}
	if got := build("vesic-given", map[string]float64{"nsigma": 60}); got != (VesicGiven{Nsigma: 60}) {
		t.Errorf("vesic-given built %+v", got)
	}
	if got := build("janbu", map[string]float64{"eta": 1.5}); got != (Janbu{Eta: 1.5}) {
		t.Errorf("janbu built %+v", got)
	}
	if got := build("api-dense-sand", nil); got != (APISand{Class: 3}) {
		t.Errorf("api-dense-sand built %+v", got)
	}
	// A calc file's vesic takes Δ by the correlation unless the layer
	// gives it (the lower tip; package doc).
	if got := build("vesic", nil); got != (Vesic{Volume: VolumeCorrelated}) {
		t.Errorf("vesic built %+v", got)
	}
}

// Every type of the package with a Tip method is in the catalogue, or
// listed in notInCatalogue with its reason.
func TestCatalogueHasEveryMethod(t *testing.T) {
	files, err := filepath.Glob("*.go")
	if err != nil {
		t.Fatal(err)
	}
	fset := token.NewFileSet()
	var types []string
	for _, f := range files {
		if strings.HasSuffix(f, "_test.go") {
			continue
		}
		src, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		file, err := parser.ParseFile(fset, f, src, 0)
		if err != nil {
			t.Fatal(err)
		}
		for _, decl := range file.Decls {
			fn, ok := decl.(*ast.FuncDecl)
			if !ok || fn.Recv == nil || fn.Name.Name != "Tip" {
				continue
			}
			typ := fn.Recv.List[0].Type
			if s, ok := typ.(*ast.StarExpr); ok {
				typ = s.X
			}
			types = append(types, typ.(*ast.Ident).Name)
		}
	}
	if len(types) < 10 {
		t.Fatalf("found only %d types with a Tip method: %v", len(types), types)
	}
	listed := map[string]bool{}
	for _, d := range Methods() {
		listed[reflect.TypeOf(d.Method).Name()] = true
	}
	for _, name := range types {
		if !listed[name] && notInCatalogue[name] == "" {
			t.Errorf("type %s has a Tip method but no catalogue entry", name)
		}
	}
}

// The package documentation lists every identifier of the catalogue and
// every key its methods read.
func TestCatalogueDocumented(t *testing.T) {
	doc, err := os.ReadFile("doc.go")
	if err != nil {
		t.Fatal(err)
	}
	for _, d := range Methods() {
		if !strings.Contains(string(doc), d.ID) {
			t.Errorf("doc.go does not list %s", d.ID)
		}
		for _, p := range d.Params {
			if !strings.Contains(string(doc), p.Key) {
				t.Errorf("doc.go does not list %s's key %s", d.ID, p.Key)
			}
		}
	}
}

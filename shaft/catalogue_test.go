package shaft

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

	"github.com/qultgeo/qult/units"
)

// Completeness and consistency of the catalogue (Methods). No published
// value is involved, except the default K/K0 and δ/φ′, which are those of
// KOverK0For and DeltaOverPhiFor (checked against Kulhawy's ranges in
// their own tests).

// notInCatalogue lists the types with a Unit or Average method that a calc
// file cannot name on their own, with the reason.
var notInCatalogue = map[string]string{
	"Capped":      "the limit on a point method: the limit key of every point method builds it",
	"LambdaGiven": "the λ method with λ given: the lambda key of lambda builds it (in package pile)",
}

// sample returns values for every parameter of d: a required one at its
// upper bound, an optional one in the middle of its range, a word the
// first accepted; of each group, only the first key.
func sample(d Descriptor) Values {
	v := Values{Num: map[string]float64{}, Word: map[string]string{}, Installation: Bored, Surface: RoughConcrete}
	if d.ID == "driven-n60-shaft" {
		v.Installation = DrivenLow // a rule for driven piles only: a bored pile is refused
	}
	groups := map[string]bool{}
	for _, p := range d.Params {
		if p.Group != "" {
			if groups[p.Group] {
				continue
			}
			groups[p.Group] = true
		}
		if p.Dim == "word" {
			v.Word[p.Key] = p.Words[0]
			continue
		}
		x := p.Max
		if !p.Required {
			x = (p.Min + p.Max) / 2
		}
		switch p.Dim {
		case "angle":
			x *= math.Pi / 180
		case "stress":
			x *= 1e3
		}
		v.Num[p.Key] = x
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
		if !slices.Contains([]Drainage{DrainedLayers, UndrainedLayers, AnyLayers}, d.Drainage) {
			t.Errorf("%s: drainage %q", d.ID, d.Drainage)
		}
		if d.Scope == "" || d.Equation() == "" || d.Valid() == "" {
			t.Errorf("%s: empty scope, equation or range", d.ID)
		}
		if d.Method == nil || d.Method.ID() != d.ID {
			t.Errorf("%s: Method %v does not carry the identifier", d.ID, d.Method)
		}
		required := false
		for _, p := range d.Params {
			required = required || p.Required
		}
		var inputs []Values
		if !required {
			inputs = append(inputs, Values{Installation: DrivenHigh, Surface: SmoothSteel})
		}
		inputs = append(inputs, sample(d))
		for _, v := range inputs {
			c, err := d.New(v)
			if err != nil {
				t.Errorf("%s: New(%+v): %v", d.ID, v, err)
				continue
			}
			switch d.Kind {
			case PointMethod:
				if c.Unit == nil {
					t.Errorf("%s: a point method built no Unit", d.ID)
					continue
				}
				id := c.Unit.ID()
				if _, limited := v.Num["limit"]; limited {
					if cp, ok := c.Unit.(Capped); !ok || cp.Limit.ID() != "limit-given" {
						t.Errorf("%s: a limit given should cap the method, got %s", d.ID, id)
						continue
					}
					id = c.Unit.(Capped).Method.ID()
				}
				if id != d.ID {
					t.Errorf("%s: New builds a method with ID %q", d.ID, id)
				}
			default:
				if c.Unit != nil {
					t.Errorf("%s: kind %d built a Unit", d.ID, d.Kind)
				}
			}
		}
		keys := map[string]bool{}
		for _, p := range d.Params {
			if p.Key == "" || keys[p.Key] || p.Meaning == "" || !(p.Min <= p.Max) {
				t.Errorf("%s: bad parameter %+v", d.ID, p)
			}
			keys[p.Key] = true
			if !slices.Contains([]string{"number", "angle", "stress", "word"}, p.Dim) || (p.Dim == "word") != (len(p.Words) > 0) {
				t.Errorf("%s.%s: dimension %q with words %v", d.ID, p.Key, p.Dim, p.Words)
			}
			if p.Required == (p.Default != "") {
				t.Errorf("%s.%s: a required key has no default, an optional one says what applies", d.ID, p.Key)
			}
		}
		if d.Kind == PointMethod && !keys["limit"] {
			t.Errorf("%s: a point method takes a limit", d.ID)
		}
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
	if r := ResistanceIDs(); slices.Contains(r, "none") || !slices.Contains(r, "lambda") || len(r) != len(IDs())-1 {
		t.Errorf("ResistanceIDs = %v", r)
	}
	// The table cannot be changed through what Methods and Lookup return.
	m := Methods()
	m[0].Params[0].Key = "changed"
	d, _ := Lookup("beta-api")
	d.Params[0].Words[0] = "changed"
	if Methods()[0].Params[0].Key == "changed" || slices.Contains(sandClassIDs[:], "changed") {
		t.Error("the catalogue changed through a returned value")
	}
}

// The β method's keys and defaults reach the rules it builds.
func TestCatalogueBeta(t *testing.T) {
	d, ok := Lookup("beta")
	if !ok {
		t.Fatal("beta not in the catalogue")
	}
	build := func(v Values) Beta {
		t.Helper()
		c, err := d.New(v)
		if err != nil {
			t.Fatal(err)
		}
		b, ok := c.Unit.(Beta)
		if !ok {
			t.Fatalf("built %T", c.Unit)
		}
		return b
	}
	// Defaults: the middle of Kulhawy's ranges, as KOverK0For and
	// DeltaOverPhiFor give them (1.5 driven high displacement, 0.6 smooth
	// steel; package doc).
	b := build(Values{Installation: DrivenHigh, Surface: SmoothSteel})
	if b.K != (KOverK0{Ratio: 1.5}) || b.Delta != (DeltaOverPhi{Ratio: 0.6}) {
		t.Errorf("defaults built K %+v, δ %+v", b.K, b.Delta)
	}
	cases := []struct {
		v     Values
		k     KRule
		delta DeltaRule
	}{
		{Values{Num: map[string]float64{"k": 0.8, "delta": 0.5}}, KGiven{K: 0.8}, DeltaGiven{Delta: units.Angle(0.5)}},
		{Values{Num: map[string]float64{"k_over_kp": 0.1, "delta_over_phi": 0.7}}, KOverKp{Ratio: 0.1}, DeltaOverPhi{Ratio: 0.7}},
		{Values{Num: map[string]float64{"k_over_k0": 1.2, "delta_over_phi": 1}}, KOverK0{Ratio: 1.2}, DeltaOverPhi{Ratio: 1}},
		{Values{Word: map[string]string{"k0": "jaky"}, Num: map[string]float64{"delta_over_phi": 1}}, KJaky{}, DeltaOverPhi{Ratio: 1}},
		{Values{Word: map[string]string{"k0": "ocr"}, Num: map[string]float64{"delta_over_phi": 1}}, KMayneKulhawy{}, DeltaOverPhi{Ratio: 1}},
	}
	for _, c := range cases {
		b := build(c.v)
		if b.K != c.k || b.Delta != c.delta {
			t.Errorf("%+v built K %+v, δ %+v; want %+v, %+v", c.v, b.K, b.Delta, c.k, c.delta)
		}
	}
	// A limit caps it.
	c, err := d.New(Values{Num: map[string]float64{"k": 1, "delta": 0.5, "limit": 80e3}})
	if err != nil {
		t.Fatal(err)
	}
	if cp, ok := c.Unit.(Capped); !ok || cp.Limit != (LimitGiven{Fs: 80e3}) {
		t.Errorf("limit built %+v", c.Unit)
	}
	// The sand class of beta-api and a given λ reach their methods.
	api, _ := Lookup("beta-api")
	if c, err := api.New(Values{Word: map[string]string{"sand_class": "api-dense-sand"}}); err != nil || c.Unit != (APIBeta{Class: DenseSand}) {
		t.Errorf("beta-api built %+v, %v", c.Unit, err)
	}
	lam, _ := Lookup("lambda")
	if c, err := lam.New(Values{Num: map[string]float64{"lambda": 0.2}}); err != nil || c.LambdaValue != 0.2 {
		t.Errorf("lambda built %+v, %v", c, err)
	}
}

// Every type of the package with a Unit or Average method is in the
// catalogue, or listed in notInCatalogue with its reason.
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
			if !ok || fn.Recv == nil || (fn.Name.Name != "Unit" && fn.Name.Name != "Average") {
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
		t.Fatalf("found only %d method types: %v", len(types), types)
	}
	listed := map[string]bool{}
	for _, d := range Methods() {
		listed[reflect.TypeOf(d.Method).Name()] = true
	}
	for _, name := range types {
		if !listed[name] && notInCatalogue[name] == "" {
			t.Errorf("type %s is a method but has no catalogue entry", name)
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

package insitu

// The catalogue's own checks (no numbers of a source): every entry builds
// a method with its identifier and part, its keys are sane, and the
// package documentation lists every identifier and key.

import (
	"os"
	"strings"
	"testing"
)

func TestDirectCatalogue(t *testing.T) {
	seen := map[string]bool{}
	for _, d := range DirectMethods() {
		k := string(d.Part) + " " + d.ID
		if seen[k] {
			t.Errorf("%s listed twice", k)
		}
		seen[k] = true
		v := map[string]float64{}
		for _, p := range d.Params {
			if !(p.Min <= p.Max) || (p.Dim != "number" && p.Dim != "stress") || p.Meaning == "" || p.Required == (p.Default != "") {
				t.Errorf("%s: key %s: %+v", k, p.Key, p)
			}
			v[p.Key] = p.Min
			if p.Dim == "stress" {
				v[p.Key] = max(p.Min, 1) * 1000 // kPa to Pa, inside the range
			}
		}
		switch d.Part {
		case TipPart:
			if d.Tip == nil || d.NewTip == nil || d.Shaft != nil || d.Tip.ID() != d.ID || d.NewTip(v).ID() != d.ID {
				t.Errorf("%s: tip entry malformed", k)
			}
		case ShaftPart:
			if d.Shaft == nil || d.NewShaft == nil || d.Tip != nil || d.Shaft.ID() != d.ID || d.NewShaft(v).ID() != d.ID {
				t.Errorf("%s: shaft entry malformed", k)
			}
		default:
			t.Errorf("%s: part %q", k, d.Part)
		}
		if d.Equation() == "" || d.Scope == "" {
			t.Errorf("%s: no equation or scope", k)
		}
		if got, ok := LookupDirect(d.Part, d.ID); !ok || got.ID != d.ID {
			t.Errorf("LookupDirect(%s) failed", k)
		}
	}
	if _, ok := LookupDirect(TipPart, "meyerhof"); ok {
		t.Error("LookupDirect found a method that is not direct")
	}
	if got := strings.Join(DirectIDs(TipPart), ","); got != "lcpc,schmertmann,eslami-fellenius" {
		t.Errorf("DirectIDs(tip) = %s", got)
	}
}

func TestDirectCatalogueDocumented(t *testing.T) {
	doc, err := os.ReadFile("doc.go")
	if err != nil {
		t.Fatal(err)
	}
	// rows of the tables: "//\t<part> <identifier> …"
	var rows [][]string
	for _, l := range strings.Split(string(doc), "\n") {
		if f := strings.Fields(strings.TrimPrefix(l, "//")); strings.HasPrefix(l, "//\t") && len(f) > 2 {
			rows = append(rows, f)
		}
	}
	has := func(part Part, id, field string) bool {
		for _, f := range rows {
			if f[0] == string(part) && f[1] == id && (field == "" || strings.Contains(" "+strings.Join(f[2:], " ")+" ", " "+field+" ")) {
				return true
			}
		}
		return false
	}
	for _, d := range DirectMethods() {
		if !has(d.Part, d.ID, "") {
			t.Errorf("doc.go does not list %s %s", d.Part, d.ID)
		}
		for _, p := range d.Params {
			if !has(d.Part, d.ID, p.Key) {
				t.Errorf("doc.go does not list %s %s's key %s", d.Part, d.ID, p.Key)
			}
		}
	}
}

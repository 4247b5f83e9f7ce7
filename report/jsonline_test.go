package report

// Sources: none needed. The oracle is encoding/json itself: WriteLine's
// direct encoder must write byte for byte what encoding/json writes for
// the same document (jLine and jLeanLine below are that document with the
// line members in front, as encoding/json lays out embedded fields). The
// calc files are the invented scenarios of ../examples.

import (
	"bytes"
	"encoding/json"
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/qultgeo/qult/calc"
	"github.com/qultgeo/qult/units"
)

// jLine is the line document as encoding/json lays it out.
type jLine struct {
	Line int    `json:"line,omitempty"`
	ID   string `json:"id,omitempty"`
	*jResult
}

// jLeanLine is jLine without capacity with depth and the methods
// compared: the nil fields shadow the embedded ones (encoding/json takes
// the shallower field) and are omitted.
type jLeanLine struct {
	Line int    `json:"line,omitempty"`
	ID   string `json:"id,omitempty"`
	*jResult
	WithDepth []jDepthRow `json:"capacity_with_depth,omitempty"`
	Compared  *jCompared  `json:"methods_compared,omitempty"`
	Omitted   []string    `json:"omitted"`
}

func lineExamples(t *testing.T) map[string]*calc.Result {
	t.Helper()
	files, err := filepath.Glob("../examples/*.yaml")
	if err != nil || len(files) == 0 {
		t.Fatalf("no examples: %v", err)
	}
	out := map[string]*calc.Result{}
	for _, f := range files {
		data, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		r, err := calc.Parse(data)
		if err != nil {
			t.Fatalf("%s: %v", f, err)
		}
		out[filepath.Base(f)] = r
	}
	return out
}

// TestWriteLineMatchesEncodingJSON: every example, in both unit systems,
// whole and lean, with and without line and id, and with awkward text in
// the title and id: the direct encoder writes what encoding/json writes.
func TestWriteLineMatchesEncodingJSON(t *testing.T) {
	odd := "a<b>&c \u2028\u2029 \x01\x1f\b\f\n\r\t \"q\\ \xff σ′v ≤ 😀"
	for name, r := range lineExamples(t) {
		for _, sys := range []units.System{units.SI, units.US} {
			for _, c := range []struct {
				line  int
				id    string
				title string
				lean  bool
			}{{0, "", "", false}, {7, "P-7", "", false}, {3, odd, odd, false}, {12, "x", "", true}, {0, "", "", true}} {
				rr := *r
				if c.title != "" {
					rr.Title = c.title
				}
				rr.ID = c.id // the result's own id: the line's opening "id" stands for it
				o := LineOptions{Units: UnitsOf(sys), Verification: "12 cases <all> pass", Line: c.line, ID: c.id, Lean: c.lean}
				var got bytes.Buffer
				if err := WriteLine(&got, &rr, o); err != nil {
					t.Fatal(err)
				}
				j := toJSON(&rr, Options{Units: UnitsOf(sys), sys: sys, View: ViewReport, Verification: o.Verification})
				var v any = jLine{c.line, c.id, j}
				if c.lean {
					v = jLeanLine{Line: c.line, ID: c.id, jResult: j, Omitted: []string{"capacity_with_depth", "methods_compared"}}
				}
				var want bytes.Buffer
				if err := json.NewEncoder(&want).Encode(v); err != nil {
					t.Fatal(err)
				}
				if got.String() != want.String() {
					g, w := got.String(), want.String()
					i := 0
					for i < len(g) && i < len(w) && g[i] == w[i] {
						i++
					}
					t.Errorf("%s %v %+v: differs from encoding/json at byte %d:\n got  …%.120s\n want …%.120s", name, sys, c, i, g[max(0, i-40):], w[max(0, i-40):])
				}
				if !c.lean && c.line == 0 && c.id == "" {
					// Without line members it is the compacted report JSON.
					var full, compact bytes.Buffer
					if err := Write(&full, &rr, JSON, Options{Units: UnitsOf(sys), View: ViewReport, Verification: o.Verification}); err != nil {
						t.Fatal(err)
					}
					if err := json.Compact(&compact, full.Bytes()); err != nil {
						t.Fatal(err)
					}
					if strings.TrimSuffix(got.String(), "\n") != compact.String() {
						t.Errorf("%s %v: differs from the compacted report JSON", name, sys)
					}
				}
			}
		}
	}
}

// TestAppendJnum: the one-call formatting of a JSON number gives the text
// jnum.MarshalJSON gives (round to 6 digits, then shortest form), over
// magnitudes from 1e-300 to 1e300, ties at the sixth digit, signed zeros,
// integers and the non-finite values.
func TestAppendJnum(t *testing.T) {
	rng := rand.New(rand.NewPCG(17, 19)) // fixed seed
	xs := []float64{0, math.Copysign(0, -1), 1, -1, 0.5, 1.5, 123456, 1234565, 1234575, 999999.5, 9999995, 1e21, 1e-7, 6.60913e-09,
		1e-5, 1e-4, 0.0001234565, 100000, 1e6, 123456789, math.MaxFloat64, math.SmallestNonzeroFloat64, math.NaN(), math.Inf(1), math.Inf(-1)}
	for range 200000 {
		e := rng.IntN(600) - 300
		x := (rng.Float64()*9 + 1) * math.Pow(10, float64(e))
		if rng.IntN(2) == 0 {
			x = -x
		}
		xs = append(xs, x)
		// a value on a tie of the sixth digit, and an integer
		xs = append(xs, math.Round(x*1e6)/1e6+5e-7, float64(rng.Int64N(1e12)))
	}
	for _, x := range xs {
		want, _ := jnum(x).MarshalJSON()
		if got := appendJnum(nil, x); string(got) != string(want) {
			t.Fatalf("%v: %s, want %s", x, got, want)
		}
	}
}

// TestAppendString: strings as encoding/json writes them, for every byte
// and for random strings of bytes and runes.
func TestAppendString(t *testing.T) {
	rng := rand.New(rand.NewPCG(23, 29)) // fixed seed
	var ss []string
	for c := range 256 {
		ss = append(ss, string([]byte{byte(c)}), "x"+string(rune(c))+"y")
	}
	runes := []rune{'a', '<', '>', '&', '"', '\\', '\u2028', '\u2029', 'σ', '′', '😀', '\ufffd', 0, 0x7f, 0x85}
	for range 20000 {
		var b []byte
		for range rng.IntN(12) {
			if rng.IntN(3) == 0 {
				b = append(b, byte(rng.IntN(256)))
			} else {
				b = append(b, string(runes[rng.IntN(len(runes))])...)
			}
		}
		ss = append(ss, string(b))
	}
	for _, s := range ss {
		want, _ := json.Marshal(s)
		if got := appendString(nil, s); string(got) != string(want) {
			t.Fatalf("%q: %s, want %s", s, got, want)
		}
	}
}

// TestJSONCarriesID: the result document of a calc file with an id key
// carries it as "id", and a batch line carries it once, at the start.
func TestJSONCarriesID(t *testing.T) {
	r := load(t, example, nil)
	rr := *r
	rr.ID = "P-17"
	var doc struct {
		ID string `json:"id"`
	}
	if err := json.Unmarshal([]byte(render(t, &rr, JSON, Options{})), &doc); err != nil || doc.ID != "P-17" {
		t.Errorf("JSON id %q (%v), want P-17", doc.ID, err)
	}
	var line bytes.Buffer
	if err := WriteLine(&line, &rr, LineOptions{Line: 3, ID: rr.ID}); err != nil {
		t.Fatal(err)
	}
	if n := strings.Count(line.String(), `"id":`); n != 1 || !strings.HasPrefix(line.String(), `{"line":3,"id":"P-17",`) {
		t.Errorf("the batch line has %d ids and starts %.40q", n, line.String())
	}
}

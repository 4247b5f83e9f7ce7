package report

import (
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/qultgeo/qult/calc"
)

// soundingResult runs a shipped example with a sounding of our own named in
// its ground.
func soundingResult(t *testing.T) *calc.Result {
	t.Helper()
	data, err := os.ReadFile(example)
	if err != nil {
		t.Fatal(err)
	}
	text := strings.Replace(string(data), "  layers:\n", "  sounding: {file: s.csv, nkt: 15}\n  layers:\n", 1)
	if text == string(data) {
		t.Fatal("the example changed: no ground.layers line")
	}
	var b strings.Builder
	b.WriteString("# id: S-9\n# area_ratio: 0.8\ndepth_m,qc_MPa,fs_kPa,u2_kPa\n")
	for i := 1; i <= 40; i++ {
		z := 0.5 * float64(i)
		if z < 3 || z > 12 {
			fmt.Fprintf(&b, "%g,%g,%g,%g\n", z, 6+0.5*z, 40+2*z, 9.81*z)
		} else {
			fmt.Fprintf(&b, "%g,%g,%g,%g\n", z, 0.3+0.04*z, 9+z, 30*z)
		}
	}
	dir := t.TempDir()
	if err := os.WriteFile(filepath.Join(dir, "s.csv"), []byte(b.String()), 0o644); err != nil {
		t.Fatal(err)
	}
	r, err := calc.ParseWith([]byte(text), calc.ParseOptions{ReadFile: calc.ReadFileIn(dir, os.ReadFile)})
	if err != nil {
		t.Fatal(err)
	}
	return r
}

func TestSoundingSection(t *testing.T) {
	r := soundingResult(t)
	txt := render(t, r, Text, Options{View: ViewReport})
	for _, want := range []string{headSounding, "S-9", "not used in the capacity", "Layering suggested by breaks in Ic", "Robertson, P.K. (2009)"} {
		if !strings.Contains(txt, want) {
			t.Errorf("text report lacks %q", want)
		}
	}
	for _, f := range []Format{Markdown, HTML} {
		if out := render(t, r, f, Options{View: ViewReport}); !strings.Contains(out, headSounding) {
			t.Errorf("%v report lacks the sounding", f)
		}
	}
	var d struct {
		Sounding struct {
			ID       string
			Readings int
			Layers   []struct {
				Name     string
				Readings int
				Ic       *float64
				Su       *qtyT
			}
			Suggested []struct{ Zone int } `json:"suggested_layers"`
		}
	}
	if err := json.Unmarshal([]byte(render(t, r, JSON, Options{View: ViewReport})), &d); err != nil {
		t.Fatal(err)
	}
	s := d.Sounding
	if s.ID != "S-9" || s.Readings != r.Sounding.Readings || len(s.Layers) != len(r.Sounding.Layers) || len(s.Suggested) == 0 {
		t.Errorf("JSON sounding %+v", s)
	}
	for i, l := range s.Layers {
		want := r.Sounding.Layers[i]
		if l.Name != want.Name || l.Readings != want.Readings || (want.Readings > 0) != (l.Ic != nil) || (want.Su > 0) != (l.Su != nil) {
			t.Errorf("layer %d: JSON %+v, result %+v", i, l, want)
		}
	}
	if plain := render(t, load(t, example, nil), JSON, Options{View: ViewReport}); strings.Contains(plain, `"sounding"`) {
		t.Error("a result without a sounding writes the key")
	}
}

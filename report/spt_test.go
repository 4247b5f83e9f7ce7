// Sources: the borehole records and ground are the shipped example
// examples/spt-borehole (a scenario of our own); the checks are on what
// the report shows (sections, JSON members, figures and their depth
// frame), not on published values. The frame's numbers are worked here by
// hand from the example's pile (tip 15 m) and last test (19 m).

package report

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/qultgeo/qult/calc"
)

const sptExample = "../examples/spt-borehole/pump-station-spt.yaml"

func sptResult(t *testing.T) *calc.Result {
	t.Helper()
	data, err := os.ReadFile(sptExample)
	if err != nil {
		t.Fatal(err)
	}
	r, err := calc.ParseWith(data, calc.ParseOptions{ReadFile: calc.ReadFileIn(filepath.Dir(sptExample), os.ReadFile)})
	if err != nil {
		t.Fatal(err)
	}
	return r
}

func TestSPTSection(t *testing.T) {
	r := sptResult(t)
	txt := render(t, r, Text, Options{View: ViewReport})
	for _, want := range []string{headSPT, "BH-R2", "hatanaka-uchida", "su-stroud", "ER assumed", "not used in the capacity",
		"Hatanaka, M.", "Stroud, M.A.", "Liao"} {
		if !strings.Contains(txt, want) {
			t.Errorf("text report lacks %q", want)
		}
	}
	for _, f := range []Format{Markdown, HTML} {
		if out := render(t, r, f, Options{View: ViewReport}); !strings.Contains(out, headSPT) {
			t.Errorf("%v report lacks the SPT section", f)
		}
	}
	var d struct {
		SPT struct {
			Hole  string
			Tests []struct {
				N60     float64  `json:"n60"`
				By      string   `json:"by"`
				Note    string   `json:"not_estimated"`
				Assumed []string `json:"assumed"`
			}
			Layers []struct {
				Tests    int
				N60Given *float64 `json:"n60_given"`
			}
		} `json:"spt"`
	}
	if err := json.Unmarshal([]byte(render(t, r, JSON, Options{View: ViewReport})), &d); err != nil {
		t.Fatal(err)
	}
	s := d.SPT
	if s.Hole != "BH-R2" || len(s.Tests) != len(r.SPT.Tests) || len(s.Layers) != len(r.SPT.Layers) {
		t.Fatalf("JSON spt %+v", s)
	}
	for i, tt := range s.Tests {
		want := r.SPT.Tests[i]
		if tt.By != want.By || (tt.Note != "") != (want.Note != "") || tt.Assumed == nil {
			t.Errorf("test %d: JSON %+v, result %+v", i, tt, want)
		}
	}
	if plain := render(t, load(t, example, nil), JSON, Options{View: ViewReport}); strings.Contains(plain, `"spt"`) {
		t.Error("a result without SPT records writes the key")
	}
}

func TestInsituFigures(t *testing.T) {
	r := sptResult(t)
	html := render(t, r, HTML, Options{View: ViewReport})
	if !strings.Contains(html, `aria-label="Standard penetration tests with depth"`) {
		t.Error("HTML report lacks the SPT figure")
	}
	// The frame: down to the deeper of the last test (19 m) and the tip
	// (15 m), 5 % more (19.95 m), then to the next half step of the depth
	// ticks (2.5 m): 20 m; breaks at 1.8, 6.2 and 12.5 m.
	c := conv{r.Display}
	f := newDepthFrame(r, c, r.SPT.Tests[len(r.SPT.Tests)-1].Test.Depth, sptLayers(r))
	if f.bottom != 20 || f.tip != 15 || f.head != 0 || len(f.breaks) != 3 || f.breaks[0] != 1.8 || f.breaks[2] != 12.5 {
		t.Errorf("frame %+v", f)
	}
	s := soundingResult(t)
	if out := render(t, s, HTML, Options{View: ViewReport}); !strings.Contains(out, `aria-label="Cone sounding with depth"`) {
		t.Error("HTML report lacks the sounding figure")
	}
	// The figure is the same bytes on every run (goldens rely on it).
	a, err1 := sptFigure(r, c)
	b, err2 := sptFigure(r, c)
	if err1 != nil || err2 != nil || a.svg != b.svg {
		t.Errorf("SPT figure differs between runs (%v, %v)", err1, err2)
	}
}

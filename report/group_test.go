package report

// Sources: examples/footbridge-pier-group.yaml is a scenario of our own
// (invented numbers); these tests check the shape of the output, not
// numbers.

import (
	"os"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"github.com/qultgeo/qult/calc"
)

func groupExample(t *testing.T) *calc.Result {
	t.Helper()
	data, err := os.ReadFile("../examples/footbridge-pier-group.yaml")
	if err != nil {
		t.Fatal(err)
	}
	r, err := calc.Parse(data)
	if err != nil {
		t.Fatal(err)
	}
	return r
}

// TestGroupSection: check and report show the group's section with its
// tables; capacity does not; the HTML carries the plan with one shape per
// pile, and the JSON the group.
func TestGroupSection(t *testing.T) {
	r := groupExample(t)
	for _, v := range []View{ViewCheck, ViewReport} {
		out := render(t, r, Text, Options{View: v})
		for _, want := range []string{headGroup, "Sum of single piles n·Rc (n = 12)", "Block Qblock", "Group uplift Tg", "Equivalent raft"} {
			if !strings.Contains(out, want) {
				t.Errorf("%v: no %q", v, want)
			}
		}
	}
	if out := render(t, r, Text, Options{View: ViewCapacity}); strings.Contains(out, headGroup) {
		t.Error("capacity shows the group")
	}
	html := render(t, r, HTML, Options{View: ViewReport})
	if !strings.Contains(html, `aria-label="Plan of a group of 12 piles"`) {
		t.Error("HTML: no plan of the group")
	}
	js := render(t, r, JSON, Options{View: ViewCheck})
	if !strings.Contains(js, `"group": {`) || !strings.Contains(js, `"compression_governed_by": "piles"`) {
		t.Error("JSON: no group")
	}
}

// TestGroupFigureInside: every point of every path of the plan (cap,
// block outline, piles) lies inside the drawing.
func TestGroupFigureInside(t *testing.T) {
	r := groupExample(t)
	f, err := groupFigure(r, conv{})
	if err != nil {
		t.Fatal(err)
	}
	w, h := float64(f.w), float64(f.h)
	paths := regexp.MustCompile(` d="([^"]*)"`).FindAllStringSubmatch(f.svg, -1)
	if len(paths) < 12 {
		t.Fatalf("%d paths; want at least one per pile", len(paths))
	}
	pt := regexp.MustCompile(`(-?[0-9.]+),(-?[0-9.]+)`)
	for _, p := range paths {
		for _, m := range pt.FindAllStringSubmatch(p[1], -1) {
			x, _ := strconv.ParseFloat(m[1], 64)
			y, _ := strconv.ParseFloat(m[2], 64)
			if x < 0 || x > w || y < 0 || y > h {
				t.Errorf("point (%g, %g) outside %g × %g", x, y, w, h)
			}
		}
	}
}

// TestGroupTomlinsonRaftShown: a Tomlinson raft is named with its spread,
// stress and factors in text, and the JSON carries its method, plan and
// factors; the two-to-one raft's JSON says so and has no stress.
func TestGroupTomlinsonRaftShown(t *testing.T) {
	data, err := os.ReadFile("../examples/footbridge-pier-group.yaml")
	if err != nil {
		t.Fatal(err)
	}
	src := strings.Replace(string(data), "  allowable: 50 mm\n", "  allowable: 50 mm\n  raft_method: tomlinson\n  raft_depth_factor: 0.8\n", 1)
	r, err := calc.Parse([]byte(src))
	if err != nil {
		t.Fatal(err)
	}
	out := strings.Join(strings.Fields(render(t, r, Text, Options{View: ViewReport})), " ") // unwrapped
	for _, want := range []string{"Equivalent raft (Tomlinson & Woodward)", "widened 1 in 4", "below its centre", "× μd 0.8 × μg 1 =", "Newmark's corner factor"} {
		if !strings.Contains(out, want) {
			t.Errorf("text: no %q", want)
		}
	}
	js := render(t, r, JSON, Options{View: ViewCheck})
	for _, want := range []string{`"method": "tomlinson"`, `"stress": "centre"`, `"depth_factor": 0.8`, `"geological_factor": 1`, `"spread_top": {`, `"oedometer": {`} {
		if !strings.Contains(js, want) {
			t.Errorf("JSON: no %s", want)
		}
	}
	js = render(t, groupExample(t), JSON, Options{View: ViewCheck})
	for _, want := range []string{`"method": "two-to-one"`, `"stress": null`, `"spread_top": null`} {
		if !strings.Contains(js, want) {
			t.Errorf("two-to-one JSON: no %s", want)
		}
	}
}

package report

// Sources: none needed. The checks are geometric: every label of the
// ground drawing lies inside the drawing and right of the ground column
// (so clear of the pile), measured with the font it is drawn in; labels do
// not overlap; the numbers are the drawing's own constants.

import (
	"html"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
)

var svgTextRe = regexp.MustCompile(`(?s)<text x="([-0-9.e]+)" y="([-0-9.e]+)" transform="scale\(1, -1\)"\s*style="([^"]*)"[^>]*>([^<]*)</text>`)

func TestGroundLabelsFit(t *testing.T) {
	long := strings.Repeat("very soft grey organic silty clay with shells and peat lenses ", 3)
	r := load(t, example, func(s string) string {
		return strings.Replace(s, "name: estuarine silty clay", "name: '"+long+"'", 1)
	})
	g, err := groundFigure(r, conv{})
	if err != nil {
		t.Fatal(err)
	}
	W, H := float64(g.w), float64(g.h)
	const columnRight = 54 + 190 // left + colW of groundFigure
	type box struct{ x0, x1, y float64 }
	var labels []box
	found := false
	for _, m := range svgTextRe.FindAllStringSubmatch(g.svg, -1) {
		x, _ := strconv.ParseFloat(m[1], 64)
		y, _ := strconv.ParseFloat(m[2], 64)
		y = -y // the text is drawn flipped: scale(1, -1)
		text := html.UnescapeString(m[4])
		size := 9.5
		if sm := regexp.MustCompile(`font-size:([0-9.]+)px`).FindStringSubmatch(m[3]); sm != nil {
			size, _ = strconv.ParseFloat(sm[1], 64)
		}
		bold := strings.Contains(m[3], "bold")
		face := sans(vg.Length(size), bold)
		w := float64(face.Width(text))
		if x < 0 || x+w > W+0.01 || y < 0 || y > H {
			t.Errorf("label %q at (%.1f, %.1f), %.1f wide, outside the %gx%g drawing", text, x, y, w, W, H)
		}
		if strings.Contains(long, text) && text != "" {
			found = true
		}
		if x > columnRight {
			labels = append(labels, box{x, x + w, y})
		}
	}
	if !found {
		t.Error("the long layer name is not drawn (wrapped) in the drawing")
	}
	// Labels in the column beside the ground do not overlap: baselines at
	// least one line (11.5 pt, less the rounding of the SVG) apart.
	for i := range labels {
		for j := i + 1; j < len(labels); j++ {
			if a, b := labels[i], labels[j]; a.y != b.y && abs(a.y-b.y) < 11 {
				t.Errorf("labels at y %.1f and %.1f overlap", a.y, b.y)
			}
		}
	}
	if len(labels) < 5 {
		t.Errorf("%d labels beside the ground, want the layers, the water table and the tip", len(labels))
	}
}

func abs(x float64) float64 {
	if x < 0 {
		return -x
	}
	return x
}

// TestCompareLabelsFit: every text of the methods-compared figure, measured
// in its font, lies inside the figure.
func TestCompareLabelsFit(t *testing.T) {
	for _, path := range []string{example, "../examples/abutment-hpile-us.yaml"} {
		r := load(t, path, nil)
		g, err := compareFigure(r, conv{})
		if err != nil || g.svg == "" {
			t.Fatalf("%s: no figure (%v)", path, err)
		}
		n := 0
		for _, m := range svgTextRe.FindAllStringSubmatch(g.svg, -1) {
			x, _ := strconv.ParseFloat(m[1], 64)
			y, _ := strconv.ParseFloat(m[2], 64)
			size, _ := strconv.ParseFloat(regexp.MustCompile(`font-size:([0-9.]+)px`).FindStringSubmatch(m[3])[1], 64)
			face := sans(vg.Length(size), strings.Contains(m[3], "bold"))
			w := float64(face.Width(html.UnescapeString(m[4])))
			if x < 0 || x+w > float64(g.w)+0.01 || -y < 0 || -y > float64(g.h) {
				t.Errorf("%s: %q at (%.1f, %.1f), %.1f wide, outside the figure", path, m[4], x, -y, w)
			}
			n++
		}
		if n < 10 {
			t.Errorf("%s: %d texts, want a name and a value per method", path, n)
		}
	}
}

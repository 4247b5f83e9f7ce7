package report

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"

	"github.com/qultgeo/qult/profile"
)

// TestSoilPatternMarksInside: every mark of the grid patterns and every
// hatch line lies inside its rectangle (closed forms of the geometry: a
// hatch line u + v = k keeps u + v = k after clipping), for rectangles
// from a sliver to a whole layer.
func TestSoilPatternMarksInside(t *testing.T) {
	for _, wh := range [][2]vg.Length{{190, 3}, {190, 11}, {22, 11}, {190, 40}, {190, 400}, {7, 200}} {
		w, h := wh[0], wh[1]
		for _, g := range []struct{ dx, dy, m vg.Length }{{6, 5, 0.8}, {11, 9, 2.4}, {8, 5, 2.2}, {12, 8, 4}} {
			for _, c := range gridPoints(w, h, g.dx, g.dy, g.m) {
				if c.X-g.m < 0 || c.X+g.m > w || c.Y-g.m < 0 || c.Y+g.m > h {
					t.Errorf("%v×%v grid %v: mark at %v leaves the rectangle", w, h, g, c)
				}
			}
		}
		for _, sg := range hatchSegments(w, h, 7) {
			for _, q := range sg {
				if q.X < -1e-9 || q.X > w+1e-9 || q.Y < -1e-9 || q.Y > h+1e-9 {
					t.Errorf("%v×%v hatch: point %v leaves the rectangle", w, h, q)
				}
			}
			if k0, k1 := sg[0].X+sg[0].Y, sg[1].X+sg[1].Y; math.Abs(float64(k0-k1)) > 1e-9 {
				t.Errorf("%v×%v hatch: segment %v is not at 45°", w, h, sg)
			}
		}
	}
	if n := len(gridPoints(190, 40, 6, 5, 0.8)); n < 150 {
		t.Errorf("sand pattern in a 190×40 pt layer: %d dots, want a filled area (about 240)", n)
	}
}

// TestGroundFigureSoilKey: a layer that names its soil gets the soil's
// entry in the key; without soil names the key has no soil row.
func TestGroundFigureSoilKey(t *testing.T) {
	logged := load(t, example, nil)
	r := *logged
	r.Layers = append(r.Layers[:0:0], logged.Layers...)
	for i := range r.Layers {
		r.Layers[i].Soil = profile.SoilUnset
	}
	c := conv{r.Display}
	plain, err := groundFigure(&r, c)
	if err != nil {
		t.Fatal(err)
	}
	if strings.Contains(plain.svg, "Soil as logged") {
		t.Error("a profile without soil names shows a soil key")
	}
	rs := r
	rs.Layers = append(rs.Layers[:0:0], r.Layers...)
	rs.Layers[0].Soil = profile.Sand
	rs.Layers[len(rs.Layers)-1].Soil = profile.Clay
	fig, err := groundFigure(&rs, c)
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"Soil as logged", ">sand<", ">clay<"} {
		if !strings.Contains(fig.svg, want) {
			t.Errorf("the key lacks %q", want)
		}
	}
	if fig.h <= plain.h {
		t.Errorf("the drawing with a soil key is %v high, without %v: want room for the key row", fig.h, plain.h)
	}
}

// Source of the numbers in this file: invented layouts; the expected values
// are the layout rules' own thresholds (one pile width; AASHTO LRFD 10.7.1.2
// spacing and edge distances, from memory, as the package doc cites them),
// no published worked value.

package group_test

import (
	"errors"
	"strings"
	"testing"

	"github.com/qultgeo/qult/group"
	"github.com/qultgeo/qult/units"
)

// TestLayoutErrors: overlapping piles and spacings under one width are
// errors naming the field; close spacing and a narrow cap edge are warnings.
func TestLayoutErrors(t *testing.T) {
	d := 0.6 * units.Metre
	for _, c := range []struct {
		name  string
		l     func() (group.Layout, error)
		field string
	}{
		{"same position", func() (group.Layout, error) {
			return group.Positions([]group.Point{{X: 0, Y: 0}, {X: 2, Y: 0}, {X: 0, Y: 0}})
		}, "positions[2]"},
		{"overlap", func() (group.Layout, error) {
			return group.Positions([]group.Point{{X: 0, Y: 0}, {X: 0.5, Y: 0.1}})
		}, "positions[1]"},
		{"grid under one width", func() (group.Layout, error) { return group.Grid(2, 3, 0.55, 2) }, "spacing_x"},
		{"grid rows under one width", func() (group.Layout, error) { return group.Grid(3, 1, 0, 0.3) }, "spacing_y"},
	} {
		l, err := c.l()
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		_, _, err = l.Measure(d, 0.3, false)
		var fe *group.FieldError
		if !errors.As(err, &fe) || fe.Path != c.field {
			t.Errorf("%s: error %v, want one on %s", c.name, err, c.field)
		}
	}
	l, _ := group.Grid(2, 2, 1.2, 1.2) // 2 D < 2.5 D
	_, warn, err := l.Measure(d, 0.1, false)
	if err != nil {
		t.Fatal(err)
	}
	if len(warn) != 2 || !strings.Contains(warn[0], "minimum") || !strings.Contains(warn[1], "cap") {
		t.Errorf("warnings %q: want the spacing and the cap edge", warn)
	}
	for _, bad := range []func() (group.Layout, error){
		func() (group.Layout, error) { return group.Grid(0, 3, 1, 1) },
		func() (group.Layout, error) { return group.Grid(2, 2, -1, 1) },
		func() (group.Layout, error) { return group.Grid(2, 1, 1, 0) },
		func() (group.Layout, error) { return group.Positions(nil) },
	} {
		if _, err := bad(); err == nil {
			t.Error("bad layout accepted")
		}
	}
}

// TestGridGeometry: a 3 × 4 grid measures Bg and Lg to the outer faces.
func TestGridGeometry(t *testing.T) {
	l, err := group.Grid(3, 4, 1.5, 2)
	if err != nil {
		t.Fatal(err)
	}
	g, _, err := l.Measure(0.5, 0.3, false)
	if err != nil {
		t.Fatal(err)
	}
	// Bg = 3·1.5 + 0.5 = 5.0, Lg = 2·2 + 0.5 = 4.5, least spacing 1.5
	if g.N != 12 || g.Bg != 5 || g.Lg != 4.5 || g.MinSpacing != 1.5 {
		t.Errorf("geometry %+v", g)
	}
}

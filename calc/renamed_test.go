package calc

// Sources: none needed; these tests check that spellings of earlier calc
// files are refused with a message naming the key or identifier that
// replaced them.

import (
	"strings"
	"testing"
)

func TestRenamedSpellings(t *testing.T) {
	layer := func(add string) string {
		return strings.Replace(base, "friction_angle: 34 deg", "friction_angle: 34 deg\n      "+add, 1)
	}
	for _, c := range []struct {
		name, src, path, want string
	}{
		{"methods.tension_factor", strings.Replace(base, "pile:", "methods: {tension_factor: 0.8}\npile:", 1),
			"methods.tension_factor", "methods.tension_shaft_ratio"},
		{"design.tension_factor", base + "design: {basis: safety-factor, factor: 2.5, tension_factor: 3}\n",
			"design.tension_factor", "design.tension_safety_factor"},
		{"api-sand-3", layer("tip: {method: api-sand-3}"), "ground.layers[0].tip.method", `"api-dense-sand"`},
		{"api-sand-1", layer("tip: {method: api-sand-1}"), "ground.layers[0].tip.method", `"api-medium-dense-sand-silt"`},
		{"shaft-n60-sand", layer("tip: {method: shaft-n60-sand}"), "ground.layers[0].tip.method", `"drilled-n60-sand"`},
	} {
		t.Run(c.name, func(t *testing.T) {
			ps := problems(t, c.src)
			found := false
			for _, p := range ps {
				if p.Path == c.path && strings.Contains(p.Msg, "renamed") && strings.Contains(p.Msg, c.want) {
					found = true
				}
			}
			if !found {
				t.Errorf("no problem at %s naming %s; got %v", c.path, c.want, ps)
			}
		})
	}
	// The new spellings are read.
	for _, src := range []string{
		strings.Replace(base, "pile:", "methods: {tension_shaft_ratio: 0.8}\npile:", 1),
		base + "design: {basis: safety-factor, factor: 2.5, tension_safety_factor: 3}\n",
		layer("tip: {method: api-dense-sand}"),
	} {
		if _, err := Parse([]byte(src)); err != nil {
			t.Errorf("%v\n%s", err, src)
		}
	}
}

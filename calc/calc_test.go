package calc

import (
	"errors"
	"math"
	"os"
	"slices"
	"strconv"
	"strings"
	"testing"

	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// The checks in this file are of decoding and validation: they compare
// messages and line numbers, and results against the library run directly
// (closed-form reasoning: the same input must give the same number). No
// published values are involved.

func mustRead(t *testing.T, path string) []byte {
	t.Helper()
	b, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	return b
}

func TestExampleRuns(t *testing.T) {
	r, err := Parse(mustRead(t, "../examples/pump-station-bored.yaml"))
	if err != nil {
		t.Fatal(err)
	}
	if r.Schema != ResultSchema || len(r.Breakdown.Rows) == 0 || r.Design == nil || len(r.WithDepth) == 0 {
		t.Errorf("incomplete result: schema %q, %d rows, design %v, %d depths", r.Schema, len(r.Breakdown.Rows), r.Design, len(r.WithDepth))
	}
	if len(r.Cautions) == 0 || len(r.Sources) == 0 {
		t.Error("no cautions or sources")
	}
}

const base = `title: t
units: SI
ground:
  water_depth: 2 m
  layers:
    - name: sand
      thickness: 30 m
      drainage: drained
      unit_weight: 18 kN/m3
      saturated_unit_weight: 20 kN/m3
      friction_angle: 34 deg
pile:
  section: {shape: circle, diameter: 0.6 m}
  length: 15 m
  installation: driven-high
`

func problems(t *testing.T, src string) Problems {
	t.Helper()
	_, err := Parse([]byte(src))
	if err == nil {
		t.Fatalf("accepted:\n%s", src)
	}
	var ps Problems
	if !errors.As(err, &ps) {
		t.Fatalf("error %T %v is not Problems", err, err)
	}
	return ps
}

func TestProblemsNamePathAndLine(t *testing.T) {
	cases := []struct {
		name, src, path string
		line            int
	}{
		{"unknown key", strings.Replace(base, "  length: 15 m", "  length: 15 m\n  lenght: 15 m", 1), "pile.lenght", 15},
		{"wrong dimension", strings.Replace(base, "thickness: 30 m", "thickness: 30 kPa", 1), "ground.layers[0].thickness", 7},
		{"phi 70", strings.Replace(base, "34 deg", "70 deg", 1), "ground.layers[0].friction_angle", 11},
		{"tip below", strings.Replace(base, "length: 15 m", "length: 45 m", 1), "pile.length", 14},
		{"ambiguous unit", strings.Replace(base, "2 m\n", "2 ton\n", 1), "ground.water_depth", 4},
		{"bad drainage", strings.Replace(base, "drainage: drained", "drainage: sandy", 1), "ground.layers[0].drainage", 8},
		{"duplicate key", strings.Replace(base, "title: t", "title: t\ntitle: u", 1), "title", 2},
		{"no water data", strings.Replace(base, "  water_depth: 2 m\n", "", 1), "ground.water_depth", 0},
	}
	for _, c := range cases {
		ps := problems(t, c.src)
		found := false
		for _, p := range ps {
			if p.Path == c.path && (c.line == 0 || p.Line == c.line) {
				found = true
			}
		}
		if !found {
			t.Errorf("%s: want a problem at %s line %d, got %v", c.name, c.path, c.line, ps)
		}
	}
}

func TestEveryProblemAtOnce(t *testing.T) {
	src := strings.Replace(base, "thickness: 30 m", "thickness: 30 kPa", 1)
	src = strings.Replace(src, "installation: driven-high", "installation: hammered", 1)
	src = strings.Replace(src, "diameter: 0.6 m", "diameter: 0.6 furlong", 1)
	ps := problems(t, src)
	if len(ps) < 3 {
		t.Errorf("want three problems reported together, got %v", ps)
	}
}

func TestStrictness(t *testing.T) {
	for name, src := range map[string]string{
		"alias":      "a: &x 1\nb: *x\n",
		"two docs":   base + "---\ntitle: again\n",
		"not a map":  "- 1\n- 2\n",
		"deep":       strings.Repeat("[", 40) + strings.Repeat("]", 40),
		"empty":      "  \n# only a comment\n",
		"not yaml":   "title: [unclosed\n",
		"merge key":  "title: t\n<<: {units: SI}\n",
		"list for a": strings.Replace(base, "  section: {shape: circle, diameter: 0.6 m}", "  section: [circle]", 1),
		"after end":  base + "...\ngarbage: [\n",
		"two values": `{"title": "a"}` + "\n" + `{"title": "b"}` + "\n",
	} {
		if _, err := Parse([]byte(src)); err == nil {
			t.Errorf("%s: accepted", name)
		}
	}
	big := make([]byte, MaxFileSize+1)
	if _, err := Decode(big); err == nil || !strings.Contains(err.Error(), "over the limit") {
		t.Errorf("oversize file: %v", err)
	}
}

// TestDepthScanReadsYAML: brackets inside plain scalars, quoted scalars and
// comments are text, not nesting, so names such as these are accepted.
func TestDepthScanReadsYAML(t *testing.T) {
	for _, name := range []string{
		"dense{{{{{{{{{{{{{{{{{{{{ sand",
		"O'Brien's fill [[[[[[[[[[[[[[[[[[[[",
		`"quoted {{{{{{{{{{{{{{{{{{{{{{{{ \" [[[["`,
		`'single [[[[[[[[[[[[[[[[[[[[[ '' {{{{'`,
		"sand # {{{{{{{{{{{{{{{{{{{{{{{{{{{{ a comment",
	} {
		src := strings.Replace(base, "name: sand", "name: "+name, 1)
		if src == base {
			t.Fatal("base file changed: the test no longer renames a layer")
		}
		if _, err := Parse([]byte(src)); err != nil {
			t.Errorf("layer name %s: %v", name, err)
		}
	}
}

// TestJSONSameAsYAML: the same file written as JSON gives the same result.
func TestJSONSameAsYAML(t *testing.T) {
	js := `{"title": "t", "units": "SI",
	"ground": {"water_depth": "2 m", "layers": [{"name": "sand", "thickness": 30, "drainage": "drained",
	  "unit_weight": "18 kN/m3", "saturated_unit_weight": 20, "friction_angle": 34}]},
	"pile": {"section": {"shape": "circle", "diameter": "600 mm"}, "length": "15 m", "installation": "driven-high"}}`
	a, err := Parse([]byte(js))
	if err != nil {
		t.Fatal(err)
	}
	b, err := Parse([]byte(base))
	if err != nil {
		t.Fatal(err)
	}
	if a.Breakdown.Compression != b.Breakdown.Compression {
		t.Errorf("JSON %v, YAML %v", a.Breakdown.Compression, b.Breakdown.Compression)
	}
}

// TestUSUnitsSame: the same calculation entered in US units (bare numbers
// in ft, ksf, pcf, deg) gives the same capacity within 1e-9. The US values
// are the SI ones divided by the NIST SP 811 factors (1 ft = 0.3048 m,
// 1 pcf = 157.0874606 N/m³).
func TestUSUnitsSame(t *testing.T) {
	ft := func(m float64) float64 { return m / 0.3048 }
	pcf := func(kn float64) float64 { return kn * 1000 / (4.4482216152605 / (0.3048 * 0.3048 * 0.3048)) }
	// γw and pa defaults differ by system (9.81 kN/m³ and 100 kPa SI, 62.4
	// pcf and 2000 psf US): give them.
	si := strings.Replace(base, "  water_depth: 2 m\n", "  water_depth: 2 m\n  water_unit_weight: 9.81 kN/m3\n", 1) + "methods: {pa: 100 kPa}\n"
	us := strings.NewReplacer(
		"9.81 kN/m3", fmtF(pcf(9.81)),
		"units: SI", "units: US",
		"2 m", fmtF(ft(2)), "30 m", fmtF(ft(30)), "0.6 m", fmtF(ft(0.6)), "15 m", fmtF(ft(15)),
		"18 kN/m3", fmtF(pcf(18)), "20 kN/m3", fmtF(pcf(20)), "34 deg", "34",
	).Replace(si)
	a, err := Parse([]byte(us))
	if err != nil {
		t.Fatal(err)
	}
	b, err := Parse([]byte(si))
	if err != nil {
		t.Fatal(err)
	}
	if d := math.Abs(float64(a.Breakdown.Compression-b.Breakdown.Compression)) / float64(b.Breakdown.Compression); d > 1e-9 {
		t.Errorf("US %v, SI %v (rel %g)", a.Breakdown.Compression, b.Breakdown.Compression, d)
	}
}

func fmtF(x float64) string { return strings.TrimRight(strings.TrimRight(strconvF(x), "0"), ".") }

func strconvF(x float64) string { return strconv.FormatFloat(x, 'f', 12, 64) }

// TestErrorsKeepTheirChain: errors.Is and errors.As reach the library
// error behind a problem, through Parse.
func TestErrorsKeepTheirChain(t *testing.T) {
	src := strings.Replace(base, "thickness: 30 m", "thickness: 12 kPa", 1)
	if src == base {
		t.Fatal("base file changed: the test no longer breaks a thickness")
	}
	_, err := Parse([]byte(src))
	if !errors.Is(err, units.ErrDimension) {
		t.Errorf("errors.Is(err, units.ErrDimension) = false for %v", err)
	}
	var pe *units.ParseError
	if !errors.As(err, &pe) || pe.Input != "12 kPa" {
		t.Errorf("errors.As(*units.ParseError) failed or wrong input: %v", err)
	}
	var ps Problems
	if !errors.As(err, &ps) || len(ps) == 0 || ps[0].Path != "ground.layers[0].thickness" {
		t.Errorf("Problems: %v", err)
	}
	// A profile error keeps its type too.
	src = strings.Replace(base, "thickness: 30 m", "thickness: -3 m", 1)
	_, err = Parse([]byte(src))
	var fe *profile.FieldError
	if !errors.As(err, &fe) {
		t.Errorf("errors.As(*profile.FieldError) failed: %v", err)
	}
}

// TestScourKeys: ground.excavation_depth and ground.scour reach the
// profile: σ′v below the design ground line is counted from it (closed
// form γ′·(z − zd) in the base file's uniform sand under water), and a
// line below the profile is an error naming the key.
func TestScourKeys(t *testing.T) {
	src := strings.Replace(base, "  water_depth: 2 m\n", "  water_depth: -1 m\n  excavation_depth: 1 m\n  scour: {general: 0.5 m, local: 1.5 m}\n", 1)
	r, err := Parse([]byte(src))
	if err != nil {
		t.Fatal(err)
	}
	const zd, gw = 3.0, 9.81 // design ground line 1 + 0.5 + 1.5 m; γw SI default
	sv, err := r.Ground.EffectiveStress(10 * units.Metre)
	if err != nil {
		t.Fatal(err)
	}
	if want := (20 - gw) * (10 - zd) * 1e3; math.Abs(float64(sv)-want) > 1e-6*want {
		t.Errorf("σ′v(10 m) = %v, want %g Pa", sv, want)
	}
	if got := r.Ground.DesignGround(); math.Abs(float64(got)-zd) > 1e-12 {
		t.Errorf("design ground %v, want %g m", got, zd)
	}
	bad := strings.Replace(base, "  water_depth: 2 m\n", "  water_depth: 2 m\n  scour: {general: 40 m}\n", 1)
	ps := problems(t, bad)
	if len(ps) == 0 || ps[0].Path != "ground.scour.general" {
		t.Errorf("problems %v, want ground.scour.general", ps)
	}
}

// TestPileErrorsKeepTheirType: a pile error reaches the caller of Parse as
// a *pile.PathError with its field, and the problem carries the calc-file
// key and line.
func TestPileErrorsKeepTheirType(t *testing.T) {
	src := strings.Replace(base, "length: 15 m", "length: 45 m", 1) // below the 30 m profile
	if src == base {
		t.Fatal("base file changed")
	}
	_, err := Parse([]byte(src))
	var pe *pile.PathError
	if !errors.As(err, &pe) || pe.Path != "pile.length" {
		t.Fatalf("errors.As(*pile.PathError): %v", err)
	}
	var ps Problems
	if !errors.As(err, &ps) || ps[0].Path != "pile.length" || ps[0].Line != 14 {
		t.Errorf("problems %v, want pile.length at line 14", ps)
	}
}

// TestProblemsAcrossStages: a problem found while resolving (a bare load)
// and one the pile analysis finds (a tip below the profile) are reported
// together.
func TestProblemsAcrossStages(t *testing.T) {
	src := strings.Replace(base, "length: 15 m", "length: 45 m", 1) + "loads: {compression: 800 kN}\n"
	ps := problems(t, src)
	var paths []string
	for _, p := range ps {
		paths = append(paths, p.Path)
	}
	if !slices.Contains(paths, "loads.compression") || !slices.Contains(paths, "pile.length") {
		t.Errorf("problems %v, want loads.compression and pile.length together", paths)
	}
}

// TestUnusualInputWarns: values accepted but unusual (common practice, no
// published limit) are warnings, not errors: a driven 3 m solid pile, a
// 0.1 m pile, φ′ of 48°.
func TestUnusualInputWarns(t *testing.T) {
	for _, c := range []struct{ from, to, want string }{
		{"diameter: 0.6 m", "diameter: 3 m", "driven circle 3 m wide"},
		{"diameter: 0.6 m", "diameter: 0.1 m", "under 0.15 m"},
		{"friction_angle: 34 deg", "friction_angle: 48 deg", "over 45°"},
	} {
		src := strings.Replace(base, c.from, c.to, 1)
		if src == base {
			t.Fatalf("%q not in the base file", c.from)
		}
		src += "methods: {clamp_charts: true}\n" // Meyerhof's chart stops at 45°
		r, err := Parse([]byte(src))
		if err != nil {
			t.Fatalf("%s: %v", c.to, err)
		}
		found := false
		for _, w := range r.Warnings {
			found = found || strings.Contains(w, c.want)
		}
		if !found {
			t.Errorf("%s: no warning containing %q in %q", c.to, c.want, r.Warnings)
		}
	}
}

// TestOtherProfiles: design.other_profiles gives EN 1997-1's characteristic
// resistance from n = 3 ground profiles, Rc,k = min(mean/ξ3, min/ξ4) with
// ξ3 = 1.33, ξ4 = 1.23 (EN 1997-1:2004 Table A.10, n = 3); DA1-2 with R4
// for a driven pile divides by γb = γs = 1.3 (Table A.6). The three
// calculated resistances are the same file's capacity in each ground.
func TestOtherProfiles(t *testing.T) {
	grounds := []string{
		"  water_depth: 1 m\n  layers:\n    - {name: clay, thickness: 6 m, drainage: undrained, saturated_unit_weight: 18 kN/m3, undrained_strength: 40 kPa}\n    - {name: sand, thickness: 20 m, drainage: drained, saturated_unit_weight: 20 kN/m3, friction_angle: 34 deg}\n",
		"  water_depth: 1 m\n  layers:\n    - {name: clay, thickness: 7 m, drainage: undrained, saturated_unit_weight: 18 kN/m3, undrained_strength: 35 kPa}\n    - {name: sand, thickness: 20 m, drainage: drained, saturated_unit_weight: 20 kN/m3, friction_angle: 33 deg}\n",
		"  water_depth: 1.5 m\n  layers:\n    - {name: clay, thickness: 5 m, drainage: undrained, saturated_unit_weight: 18 kN/m3, undrained_strength: 45 kPa}\n    - {name: sand, thickness: 20 m, drainage: drained, saturated_unit_weight: 20 kN/m3, friction_angle: 35 deg}\n",
	}
	pileDesign := "pile:\n  section: {shape: square, width: 400 mm}\n  length: 15 m\n  installation: driven-high\n" +
		"loads: {compression: {permanent: 500 kN, variable: 150 kN}}\n"
	var rc []float64
	for _, g := range grounds {
		r, err := Parse([]byte("title: one\nground:\n" + g + pileDesign))
		if err != nil {
			t.Fatal(err)
		}
		rc = append(rc, r.Breakdown.Compression.KN())
	}
	indent := func(g string) string {
		return strings.ReplaceAll(strings.Replace(g, "  water_depth", "    - water_depth", 1), "\n  ", "\n      ")
	}
	src := "title: three\nground:\n" + grounds[0] + pileDesign +
		"design:\n  basis: en1997\n  approach: DA1\n  other_profiles:\n" + indent(grounds[1]) + indent(grounds[2])
	r, err := Parse([]byte(src))
	if err != nil {
		t.Fatalf("%v\n%s", err, src)
	}
	mean := (rc[0] + rc[1] + rc[2]) / 3
	rk := math.Min(mean/1.33, math.Min(rc[0], math.Min(rc[1], rc[2]))/1.23)
	var got float64
	for _, v := range r.Design.Cases {
		if v.Case == "DA1-2" {
			got = v.CompressionRd.KN()
		}
	}
	if want := rk / 1.3; math.Abs(got-want) > 1e-6*want {
		t.Errorf("DA1-2 Rd = %v kN, want %v kN (Rc,cal %v)", got, want, rc)
	}
}

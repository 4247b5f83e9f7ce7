package calc

import (
	"errors"
	"fmt"
	"maps"
	"math"
	"slices"
	"sort"
	"strconv"
	"strings"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/insitu"
	"github.com/qultgeo/qult/phase"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// Inputs are a calc file resolved into the library's types, all in SI.
type Inputs struct {
	// OtherProfiles are the further ground test profiles of an EN 1997-1
	// design (design.other_profiles).
	OtherProfiles []profile.Spec
	System        units.System
	Ground        profile.Spec
	Pile          pile.Pile
	Methods       pile.Methods
	Basis         pile.Basis // nil without a design section
	Loads         pile.Loads
	HasLoad       bool
	Step          units.Length
	MaxTip        units.Length
	// Settle and LoadTest are the settlement and load-test sections; nil
	// when the file has none.
	Settle   *SettleInputs
	LoadTest *LoadTestInputs
	// reliability is the reliability section; nil when the file has none.
	reliability *reliabilityInputs
	// group is the group section; nil when the file has none.
	group *groupInputs
	// candidates is the candidates section; nil when the file has none.
	candidates *candidatesInputs
	downdrag   *downdragInputs // the downdrag section; nil without one
	// cone is the cone sounding the layers' direct CPT methods read,
	// shared by them: filled by loadCone before any analysis. coneUsers
	// are the calc-file paths of the methods that read it.
	cone      *insitu.Cone
	coneUsers []string
}

// resolver turns Values into quantities, recording problems.
type resolver struct {
	f     *File
	sys   units.System
	probs Problems
	in    *Inputs // for the cone sounding the direct methods share; nil outside Resolve
}

func (r *resolver) add(path string, line int, format string, args ...any) {
	if line == 0 {
		line = lineOf(r.f, path)
	}
	var cause error
	for _, a := range args {
		if e, ok := a.(error); ok {
			cause = e
			break
		}
	}
	r.probs = append(r.probs, Problem{Path: path, Line: line, Msg: fmt.Sprintf(format, args...), Err: cause})
}

func (r *resolver) q(v Value, path string, d units.Dimension) float64 {
	if !v.IsSet() {
		return 0
	}
	x, err := v.quantity(d, r.sys)
	if err != nil {
		// The message shows the reason without the parser's own prefix;
		// the Problem keeps the whole *units.ParseError for errors.As.
		reason := err
		var pe *units.ParseError
		if errors.As(err, &pe) {
			reason = pe.Err
		}
		line := v.Line
		if line == 0 {
			line = lineOf(r.f, path)
		}
		msg := fmt.Sprintf("%q: %v", v.Raw, reason) // a wrong dimension lists the accepted units
		if !errors.Is(err, units.ErrDimension) {
			msg = fmt.Sprintf("%q: %v (accepted units: %s)", v.Raw, reason, units.Accepted(d))
		}
		r.probs = append(r.probs, Problem{Path: path, Line: line, Msg: msg, Err: err})
		return 0
	}
	return x
}

func (r *resolver) length(v Value, path string) units.Length {
	return units.Length(r.q(v, path, units.DimLength))
}
func (r *resolver) stress(v Value, path string) units.Stress {
	return units.Stress(r.q(v, path, units.DimStress))
}
func (r *resolver) weight(v Value, path string) units.UnitWeight {
	return units.UnitWeight(r.q(v, path, units.DimUnitWeight))
}
func (r *resolver) angle(v Value, path string) units.Angle {
	return units.Angle(r.q(v, path, units.DimAngle))
}
func (r *resolver) force(v Value, path string) units.Force {
	return units.Force(r.q(v, path, units.DimForce))
}
func (r *resolver) area(v Value, path string) units.Area {
	return units.Area(r.q(v, path, units.DimArea))
}

// The readers below take a field's path as its parent's path and its key
// (".key"), joined only for a value that is given: most keys of a layer
// are not, and their paths are then never needed.
func (r *resolver) lengthAt(v Value, path, key string) units.Length {
	if !v.IsSet() {
		return 0
	}
	return r.length(v, path+key)
}
func (r *resolver) stressAt(v Value, path, key string) units.Stress {
	if !v.IsSet() {
		return 0
	}
	return r.stress(v, path+key)
}
func (r *resolver) weightAt(v Value, path, key string) units.UnitWeight {
	if !v.IsSet() {
		return 0
	}
	return r.weight(v, path+key)
}
func (r *resolver) angleAt(v Value, path, key string) units.Angle {
	if !v.IsSet() {
		return 0
	}
	return r.angle(v, path+key)
}
func (r *resolver) fractionAt(v Value, path, key string) float64 {
	if !v.IsSet() {
		return 0
	}
	return r.fraction(v, path+key)
}
func (r *resolver) numAt(v Value, path, key string, lo, hi float64) float64 {
	if !v.IsSet() {
		return 0
	}
	return r.num(v, path+key, lo, hi)
}

// num reads a plain number within [lo, hi]; unset gives 0.
func (r *resolver) num(v Value, path string, lo, hi float64) float64 {
	if !v.IsSet() {
		return 0
	}
	x, err := v.number()
	if err != nil {
		r.add(path, v.Line, "%v", err)
		return 0
	}
	if x < lo || x > hi {
		r.add(path, v.Line, "%g is outside %g to %g", x, lo, hi)
		return 0
	}
	return x
}

// zeroValue reports whether v reads as a number equal to zero ("0",
// "0 kPa", "0 %"), as opposed to a value that failed to parse (already
// reported) and so resolved to zero.
func zeroValue(v Value) bool {
	num, _, ok := strings.Cut(strings.TrimSpace(v.Raw)+" ", " ")
	if !ok {
		return false
	}
	num = strings.TrimRight(num, "%°")
	x, err := strconv.ParseFloat(num, 64)
	return err == nil && x == 0
}

// fraction reads a fraction that may be written as a percentage ("25 %").
func (r *resolver) fraction(v Value, path string) float64 {
	if !v.IsSet() {
		return 0
	}
	s := strings.TrimSpace(v.Raw)
	if t, ok := strings.CutSuffix(s, "%"); ok {
		x := r.num(Value{Raw: strings.TrimSpace(t), Line: v.Line}, path, 0, 1000)
		return x / 100
	}
	return r.num(v, path, 0, 10)
}

// Resolve checks a decoded file and turns it into library inputs. Every
// problem found is reported, with its path and line, as Problems; the
// Inputs returned with them hold what could be resolved (Run uses them to
// report the library's problems with the other sections at once).
func Resolve(f *File) (*Inputs, error) {
	in := &Inputs{cone: &insitu.Cone{}}
	r := &resolver{f: f, in: in}
	if f.Qult != 0 && f.Qult != FormatVersion {
		r.add("qult", 0, "format version %d is not known; this qult reads version %d", f.Qult, FormatVersion)
	}
	switch strings.ToUpper(strings.TrimSpace(f.Units)) {
	case "", "SI":
		in.System = units.SI
	case "US":
		in.System = units.US
	default:
		r.add("units", 0, "%q: want SI or US", f.Units)
	}
	r.sys = in.System
	r.ground(f, in)
	r.pile(f, in)
	r.methods(f, in)
	r.design(f, in)
	r.loads(f, in)
	r.search(f, in)
	r.settlement(f, in)
	r.reliabilitySection(f, in)
	r.groupSection(f, in)
	r.candidatesSection(f, in)
	r.downdrag(f, in)
	if len(r.probs) > 0 {
		return in, r.probs
	}
	return in, nil
}

func (r *resolver) ground(f *File, in *Inputs) {
	in.Ground = r.groundSpec(&f.Ground, "ground", in.System)
}

// groundSpec resolves one ground profile; pre is its key path ("ground",
// or "design.other_profiles[2]").
func (r *resolver) groundSpec(g *Ground, pre string, sys units.System) profile.Spec {
	var spec profile.Spec
	s := &spec
	switch strings.TrimSpace(strings.ToLower(g.WaterDepth.Raw)) {
	case "":
		r.add(pre+".water_depth", 0, "not given; give the depth of the water table below ground level (negative for water above the ground), or \"none\" for a dry site")
	case "none":
		s.NoWater = true
	default:
		s.WaterDepth = r.length(g.WaterDepth, pre+".water_depth")
	}
	s.WaterUnitWeight = r.weight(g.WaterUnitWeight, pre+".water_unit_weight")
	if s.WaterUnitWeight == 0 && sys == units.US {
		s.WaterUnitWeight = 62.4 * units.PCF
	}
	s.Surcharge = r.stress(g.Surcharge, pre+".surcharge")
	s.ExcavationDepth = r.length(g.ExcavationDepth, pre+".excavation_depth")
	if g.Scour != nil {
		s.Scour = profile.Scour{General: r.length(g.Scour.General, pre+".scour.general"), Local: r.length(g.Scour.Local, pre+".scour.local")}
	}
	for i, p := range g.PorePressures {
		path := fmt.Sprintf(pre+".pore_pressures[%d]", i)
		if !p.Depth.IsSet() || !p.Pressure.IsSet() {
			r.add(path, p.Depth.Line, "give both depth and pressure")
		}
		s.PorePressures = append(s.PorePressures, profile.PorePoint{
			Depth: r.length(p.Depth, path+".depth"), U: r.stress(p.Pressure, path+".pressure")})
	}
	if len(g.Layers) == 0 {
		r.add(pre+".layers", 0, "none given; give at least one layer")
	}
	for i, l := range g.Layers {
		path := fmt.Sprintf(pre+".layers[%d]", i)
		ls := profile.LayerSpec{Name: l.Name}
		ls.Thickness = r.lengthAt(l.Thickness, path, ".thickness")
		ls.Top = r.lengthAt(l.Top, path, ".top")
		ls.Bottom = r.lengthAt(l.Bottom, path, ".bottom")
		if !l.Thickness.IsSet() && !l.Bottom.IsSet() {
			r.add(path+".thickness", 0, "not given; give thickness, or top and bottom")
		}
		switch strings.ToLower(strings.TrimSpace(l.Drainage)) {
		case "drained":
			ls.Drainage = profile.Drained
		case "undrained":
			ls.Drainage = profile.Undrained
		case "":
			r.add(path+".drainage", 0, "not given; want drained or undrained")
		default:
			r.add(path+".drainage", 0, "%q: want drained or undrained", l.Drainage)
		}
		if l.Soil != "" {
			soil, err := profile.ParseSoil(strings.ToLower(strings.TrimSpace(l.Soil)))
			if err != nil {
				r.add(path+".soil", 0, "%v", err)
			}
			ls.Soil = soil
		}
		ls.UnitWeight = r.weightAt(l.UnitWeight, path, ".unit_weight")
		ls.SaturatedUnitWeight = r.weightAt(l.SaturatedUnitWeight, path, ".saturated_unit_weight")
		ls.DryUnitWeight = r.weightAt(l.DryUnitWeight, path, ".dry_unit_weight")
		ls.VoidRatio = r.numAt(l.VoidRatio, path, ".void_ratio", 0, 20)
		ls.WaterContent = r.fractionAt(l.WaterContent, path, ".water_content")
		ls.Gs = r.numAt(l.SpecificGravity, path, ".specific_gravity", 0, 10)
		ls.Saturation = r.fractionAt(l.Saturation, path, ".saturation")
		ls.Phi = r.angleAt(l.FrictionAngle, path, ".friction_angle")
		ls.Cohesion = r.stressAt(l.Cohesion, path, ".cohesion")
		if su := l.UndrainedStrength; su != nil {
			if su.Value.IsSet() {
				ls.Su = r.stressAt(su.Value, path, ".undrained_strength")
			} else {
				ls.SuTop = r.stressAt(su.Top, path, ".undrained_strength.top")
				ls.SuBottom = r.stressAt(su.Bottom, path, ".undrained_strength.bottom")
				if !su.Top.IsSet() || !su.Bottom.IsSet() {
					r.add(path+".undrained_strength", 0, "give a single value, or both top and bottom")
				}
			}
		}
		ls.OCR = r.numAt(l.OCR, path, ".ocr", 0, 1e6)
		ls.Dr = r.fractionAt(l.RelativeDensity, path, ".relative_density")
		ls.N60 = r.numAt(l.N60, path, ".n60", 0, 1e6)
		ls.E = r.stressAt(l.YoungsModulus, path, ".youngs_modulus")
		ls.G = r.stressAt(l.ShearModulus, path, ".shear_modulus")
		ls.Nu = r.numAt(l.PoissonsRatio, path, ".poissons_ratio", 0, 1e6)
		ls.Ir = r.numAt(l.RigidityIndex, path, ".rigidity_index", 0, 1e9)
		ls.Delta = r.numAt(l.VolumetricStrain, path, ".volumetric_strain", 0, 0.5)
		ls.Cc = r.numAt(l.CompressionIndex, path, ".compression_index", 0, 10)
		ls.Cr = r.numAt(l.RecompressionIndex, path, ".recompression_index", 0, 10)
		ls.E0 = r.numAt(l.InitialVoidRatio, path, ".initial_void_ratio", 0, 15)
		ls.Pc = r.stressAt(l.PreconsolidationStress, path, ".preconsolidation_stress")
		ls.M = r.stressAt(l.ConstrainedModulus, path, ".constrained_modulus")
		// An explicit zero is a value, not "not given": where the library
		// reads zero as absent, a zero given in the file is refused; where
		// zero is a real state (a dry soil), it is passed on as one.
		for _, z := range []struct {
			key string
			v   Value
			x   float64
		}{
			{"unit_weight", l.UnitWeight, float64(ls.UnitWeight)}, {"saturated_unit_weight", l.SaturatedUnitWeight, float64(ls.SaturatedUnitWeight)},
			{"dry_unit_weight", l.DryUnitWeight, float64(ls.DryUnitWeight)}, {"void_ratio", l.VoidRatio, ls.VoidRatio},
			{"specific_gravity", l.SpecificGravity, ls.Gs},
			{"ocr", l.OCR, ls.OCR}, {"relative_density", l.RelativeDensity, ls.Dr}, {"n60", l.N60, ls.N60},
			{"youngs_modulus", l.YoungsModulus, float64(ls.E)}, {"shear_modulus", l.ShearModulus, float64(ls.G)},
			{"poissons_ratio", l.PoissonsRatio, ls.Nu}, {"rigidity_index", l.RigidityIndex, ls.Ir},
			{"volumetric_strain", l.VolumetricStrain, ls.Delta},
			{"compression_index", l.CompressionIndex, ls.Cc}, {"recompression_index", l.RecompressionIndex, ls.Cr},
			{"initial_void_ratio", l.InitialVoidRatio, ls.E0}, {"preconsolidation_stress", l.PreconsolidationStress, float64(ls.Pc)},
			{"constrained_modulus", l.ConstrainedModulus, float64(ls.M)},
		} {
			if z.v.IsSet() && z.x == 0 && zeroValue(z.v) {
				r.add(path+"."+z.key, z.v.Line, "%q: zero is not an accepted value here (it must be above 0); leave the key out if it is not known", z.v.Raw)
			}
		}
		if ls.Drainage == profile.Drained && l.FrictionAngle.IsSet() && ls.Phi == 0 && zeroValue(l.FrictionAngle) {
			r.add(path+".friction_angle", l.FrictionAngle.Line, "%q: a drained layer needs φ′ above 0 deg", l.FrictionAngle.Raw)
		}
		if su := l.UndrainedStrength; su != nil {
			for _, v := range []struct {
				key string
				v   Value
				x   units.Stress
			}{{"undrained_strength", su.Value, ls.Su}, {"undrained_strength.top", su.Top, ls.SuTop}, {"undrained_strength.bottom", su.Bottom, ls.SuBottom}} {
				if v.v.IsSet() && v.x == 0 && zeroValue(v.v) {
					r.add(path+"."+v.key, v.v.Line, "%q: zero is not an accepted value here (su must be above 0)", v.v.Raw)
				}
			}
		}
		if l.WaterContent.IsSet() && ls.WaterContent == 0 && zeroValue(l.WaterContent) {
			ls.Zero |= phase.Of(phase.W)
		}
		if l.Saturation.IsSet() && ls.Saturation == 0 && zeroValue(l.Saturation) {
			ls.Zero |= phase.Of(phase.S)
		}
		s.Layers = append(s.Layers, ls)
	}
	return spec
}

func (r *resolver) pile(f *File, in *Inputs) {
	p := f.Pile
	sec := p.Section
	shape, err := pile.ParseShape(strings.TrimSpace(sec.Shape))
	if err != nil {
		if sec.Shape == "" {
			r.add("pile.section.shape", 0, "not given; want one of circle, square, closed-pipe, open-pipe, h-section, given")
		} else {
			r.add("pile.section.shape", 0, "%v", err)
		}
	}
	if err == nil {
		r.sectionKeys(shape, sec)
	}
	in.Pile.Section = pile.Section{Shape: shape,
		Diameter: r.length(sec.Diameter, "pile.section.diameter"), Width: r.length(sec.Width, "pile.section.width"),
		Wall: r.length(sec.Wall, "pile.section.wall"), Depth: r.length(sec.Depth, "pile.section.depth"),
		Web: r.length(sec.Web, "pile.section.web"), Flange: r.length(sec.Flange, "pile.section.flange"),
		Area: r.area(sec.Area, "pile.section.area"), Perimeter: r.length(sec.Perimeter, "pile.section.perimeter")}
	if !p.Length.IsSet() {
		r.add("pile.length", 0, "not given")
	}
	in.Pile.Length = r.length(p.Length, "pile.length")
	in.Pile.HeadDepth = r.length(p.HeadDepth, "pile.head_depth")
	inst, err := pile.ParseInstallation(strings.TrimSpace(p.Installation))
	if err != nil {
		r.add("pile.installation", 0, "%v", err)
	}
	in.Pile.Installation = inst
	if p.Surface != "" {
		s, err := shaft.ParseSurface(p.Surface)
		if err != nil {
			r.add("pile.surface", 0, "%v", err)
		}
		in.Pile.Surface = s
	}
	if p.Plug != "" {
		pl, err := pile.ParsePlug(p.Plug)
		if err != nil {
			r.add("pile.plug", 0, "%v", err)
		}
		in.Pile.Plug = pl
	}
	in.Pile.Modulus = r.stress(p.YoungsModulus, "pile.youngs_modulus")
	in.Pile.UnitWeight = r.weight(p.UnitWeight, "pile.unit_weight")
}

// sectionFields lists, per shape, the section keys it reads and what each
// means, in the order a message names them.
var sectionFields = map[pile.Shape][]struct{ key, what string }{
	pile.Circle:       {{"diameter", "the diameter"}},
	pile.Square:       {{"width", "the side"}},
	pile.ClosedPipe:   {{"diameter", "the outside diameter"}, {"wall", "the wall thickness"}},
	pile.OpenPipe:     {{"diameter", "the outside diameter"}, {"wall", "the wall thickness"}},
	pile.HSection:     {{"depth", "the section depth"}, {"width", "the flange width"}, {"web", "the web thickness"}, {"flange", "the flange thickness"}},
	pile.GivenSection: {{"area", "the tip area"}, {"perimeter", "the shaft perimeter"}, {"width", "the width used for L/D, critical depth and the zones around the tip"}},
}

// sectionKeys reports the keys a shape needs that are missing, and keys
// given that the shape does not read (they would be ignored in silence).
func (r *resolver) sectionKeys(shape pile.Shape, sec Section) {
	r.sectionKeysAt(shape, sec, "pile.section", 0)
}

// sectionKeysAt is sectionKeys for the section at path; a missing key is
// reported at line missingLine (0: looked up from the path).
func (r *resolver) sectionKeysAt(shape pile.Shape, sec Section, path string, missingLine int) {
	given := map[string]Value{"diameter": sec.Diameter, "width": sec.Width, "wall": sec.Wall, "depth": sec.Depth,
		"web": sec.Web, "flange": sec.Flange, "area": sec.Area, "perimeter": sec.Perimeter}
	used := map[string]bool{}
	var need []string
	for _, f := range sectionFields[shape] {
		used[f.key] = true
		need = append(need, f.key)
	}
	for _, f := range sectionFields[shape] {
		if !given[f.key].IsSet() {
			r.add(path+"."+f.key, missingLine, "not given; shape %s needs %s (%s: %s)", shape, strings.Join(need, ", "), f.key, f.what)
		}
	}
	for _, k := range []string{"diameter", "width", "wall", "depth", "web", "flange", "area", "perimeter"} {
		if v := given[k]; v.IsSet() && !used[k] {
			r.add(path+"."+k, v.Line, "shape %s does not use %s; it reads %s", shape, k, strings.Join(need, ", "))
		}
	}
}

// param is a catalogue parameter as calc reads it, from either method
// package.
type param struct {
	key, dim string
	min, max float64
	minOpen  bool
	words    []string
	group    string
	required bool
	meaning  string
}

func directParams(d insitu.DirectDescriptor) []param {
	ps := make([]param, len(d.Params))
	for i, p := range d.Params {
		ps[i] = param{key: p.Key, dim: p.Dim, min: p.Min, max: p.Max, required: p.Required, meaning: p.Meaning}
	}
	return ps
}

// cone returns the cone sounding the direct methods share, recording that
// the method at path reads it.
func (r *resolver) cone(path string) *insitu.Cone {
	if r.in == nil {
		return nil
	}
	r.in.coneUsers = append(r.in.coneUsers, path)
	return r.in.cone
}

func tipParams(d bearing.Descriptor) []param {
	ps := make([]param, len(d.Params))
	for i, p := range d.Params {
		ps[i] = param{key: p.Key, dim: p.Dim, min: p.Min, max: p.Max, required: p.Required, meaning: p.Meaning}
	}
	return ps
}

func shaftParams(d shaft.Descriptor) []param {
	ps := make([]param, len(d.Params))
	for i, p := range d.Params {
		ps[i] = param{key: p.Key, dim: p.Dim, min: p.Min, max: p.Max, minOpen: p.MinOpen, words: p.Words,
			group: p.Group, required: p.Required, meaning: p.Meaning}
	}
	return ps
}

// keyList writes the keys of ps for a message, or "(none)".
func keyList(ps []param) string {
	if len(ps) == 0 {
		return "(none)"
	}
	keys := make([]string, len(ps))
	for i, p := range ps {
		keys[i] = p.key
	}
	return strings.Join(keys, ", ")
}

// dimOf maps a catalogue dimension onto the units dimension and the unit
// its bounds are written in.
var dimOf = map[string]struct {
	d    units.Dimension
	unit float64 // SI value of one unit of the bounds
}{
	"angle":  {units.DimAngle, float64(units.Degree)},
	"stress": {units.DimStress, float64(units.Kilopascal)},
}

// bounds writes p's accepted range in the file's units.
func (r *resolver) bounds(p param) string {
	lo, hi, unit := p.min, p.max, ""
	if dd, ok := dimOf[p.dim]; ok {
		lo, unit = r.sys.In(p.min*dd.unit, dd.d)
		hi, _ = r.sys.In(p.max*dd.unit, dd.d)
		unit = " " + unit
		if p.dim == "angle" {
			unit = " deg"
		}
	}
	f := func(x float64) string { return strconv.FormatFloat(x, 'g', 4, 64) }
	switch {
	case math.IsInf(p.max, 1) && p.minOpen:
		return "above " + f(lo) + unit
	case math.IsInf(p.max, 1):
		return f(lo) + unit + " or more"
	case p.minOpen:
		return "above " + f(lo) + " and at most " + f(hi) + unit
	}
	return f(lo) + " to " + f(hi) + unit
}

// params checks the keys given beside a method (under path; "" for a
// method chosen for the whole pile at methodPath, which takes no keys)
// against the parameters it reads and reads their values: numbers as they are, angles in radians,
// stresses in Pa, words as written. A key the method does not read, a
// value outside its range, two keys of one group and a required key not
// given are problems; ok is false when there was any.
func (r *resolver) params(id string, ps []param, given map[string]Value, path, methodPath string) (num map[string]float64, word map[string]string, ok bool) {
	before := len(r.probs)
	num, word = map[string]float64{}, map[string]string{}
	byKey := map[string]param{}
	for _, p := range ps {
		byKey[p.key] = p
	}
	groups := map[string][]string{}
	for _, k := range slices.Sorted(maps.Keys(given)) {
		v := given[k]
		kpath := path + "." + k
		p, known := byKey[k]
		if !known {
			r.add(kpath, v.Line, "%s does not read %s; it reads: %s", id, k, keyList(ps))
			continue
		}
		if !v.IsSet() {
			r.add(kpath, v.Line, "given empty; give %s (%s), or leave the key out", k, p.meaning)
			continue
		}
		if p.group != "" {
			groups[p.group] = append(groups[p.group], k)
		}
		if p.dim == "word" {
			w := strings.TrimSpace(v.Raw)
			if !slices.Contains(p.words, w) {
				r.add(kpath, v.Line, "%q: want one of %s", v.Raw, strings.Join(p.words, ", "))
				continue
			}
			word[k] = w
			continue
		}
		var x, scale float64 = 0, 1
		if dd, isQty := dimOf[p.dim]; isQty {
			n := len(r.probs)
			x = r.q(v, kpath, dd.d)
			if len(r.probs) > n {
				continue
			}
			scale = dd.unit
		} else {
			var err error
			if x, err = v.number(); err != nil {
				r.add(kpath, v.Line, "%v", err)
				continue
			}
		}
		lo, hi := p.min*scale, p.max*scale
		if x < lo || x > hi || (p.minOpen && x == lo) {
			r.add(kpath, v.Line, "%q is outside %s (%s)", v.Raw, r.bounds(p), p.meaning)
			continue
		}
		num[k] = x
	}
	for _, g := range slices.Sorted(maps.Keys(groups)) {
		if keys := groups[g]; len(keys) > 1 {
			var all []string
			for _, p := range ps {
				if p.group == g {
					all = append(all, p.key)
				}
			}
			r.add(path+"."+keys[1], given[keys[1]].Line, "give at most one of %s (they set %s); %s are given",
				strings.Join(all, ", "), g, strings.Join(keys, " and "))
		}
	}
	for _, p := range ps {
		if _, isGiven := given[p.key]; p.required && !isGiven {
			if path == "" {
				r.add(methodPath, 0, "%s needs %s (%s), which only a layer gives: choose it on the layer, as {method: %s, %s: …}", id, p.key, p.meaning, id, p.key)
				continue
			}
			r.add(path+"."+p.key, 0, "not given; %s needs %s (%s)", id, p.key, p.meaning)
		}
	}
	return num, word, len(r.probs) == before
}

// unknownMethod reports an identifier that is not in a catalogue.
func (r *resolver) unknownMethod(id, path, what string, ids []string) {
	if id == "" {
		r.add(path, 0, "not given; want one of the %s methods: %s", what, strings.Join(ids, ", "))
		return
	}
	r.add(path, 0, "%q is not a %s method; want one of %s", id, what, strings.Join(ids, ", "))
}

// tip builds a tip method from its catalogue entry and the keys given
// beside it; nil after a problem.
func (r *resolver) tip(id string, given map[string]Value, path, methodPath string) bearing.Tip {
	id = strings.TrimSpace(id)
	d, ok := bearing.Lookup(id)
	if nn, renamed := bearing.Renamed(id); !ok && renamed {
		r.add(methodPath, 0, "tip method %q was renamed: write %q", id, nn)
		return nil
	}
	if dd, direct := insitu.LookupDirect(insitu.TipPart, id); !ok && direct {
		if path == "" {
			r.add(methodPath, 0, "%q is a direct CPT method, which reads the cone sounding: choose it on a layer, as tip: {method: %s, …}", id, id)
			return nil
		}
		num, _, ok := r.params(id, directParams(dd), given, path, methodPath)
		if !ok {
			return nil
		}
		return pile.ConeTip{Method: dd.NewTip(num), Cone: r.cone(methodPath)}
	}
	if !ok {
		ids := bearing.IDs()
		if path == "" {
			ids = pileTipIDs()
		} else {
			ids = append(ids, insitu.DirectIDs(insitu.TipPart)...)
		}
		r.unknownMethod(id, methodPath, "tip", ids)
		return nil
	}
	num, _, ok := r.params(id, tipParams(d), given, path, methodPath)
	if !ok {
		return nil
	}
	t, err := d.New(num)
	if err != nil {
		r.add(methodPath, 0, "%v", err)
		return nil
	}
	return t
}

// shaftMethod builds a shaft method from its catalogue entry and the keys
// given beside it into lm: a point method, the λ method or no shaft.
// It returns the entry's kind; ok is false after a problem.
func (r *resolver) shaftMethod(id string, given map[string]Value, path, methodPath string, p pile.Pile, lm *pile.LayerMethods) (shaft.Kind, bool) {
	id = strings.TrimSpace(id)
	d, ok := shaft.Lookup(id)
	if dd, direct := insitu.LookupDirect(insitu.ShaftPart, id); !ok && direct {
		if path == "" {
			r.add(methodPath, 0, "%q is a direct CPT method, which reads the cone sounding: choose it on a layer, as shaft: {method: %s, …}", id, id)
			return shaft.PointMethod, false
		}
		num, _, ok := r.params(id, directParams(dd), given, path, methodPath)
		if !ok {
			return shaft.PointMethod, false
		}
		lm.Shaft = pile.ConeShaft{Method: dd.NewShaft(num), Cone: r.cone(methodPath)}
		return shaft.PointMethod, true
	}
	if !ok {
		ids := shaft.IDs()
		if path != "" {
			ids = append(ids, insitu.DirectIDs(insitu.ShaftPart)...)
		}
		switch methodPath {
		case "methods.shaft_drained":
			ids = pileShaftIDs(false)
		case "methods.shaft_undrained":
			ids = pileShaftIDs(true)
		}
		r.unknownMethod(id, methodPath, "shaft", ids)
		return 0, false
	}
	num, word, ok := r.params(id, shaftParams(d), given, path, methodPath)
	if !ok {
		return d.Kind, false
	}
	surf := p.Surface
	if surf == 0 {
		surf = pile.DefaultSurface(p.Section, p.Installation)
	}
	c, err := d.New(shaft.Values{Num: num, Word: word, Installation: p.Installation, Surface: surf})
	if err != nil {
		r.add(methodPath, 0, "%v", err)
		return d.Kind, false
	}
	switch d.Kind {
	case shaft.WholePile:
		lm.Lambda, lm.LambdaValue = true, c.LambdaValue
	case shaft.NoResistance:
		lm.NoShaft = true
	default:
		lm.Shaft = c.Unit
	}
	return d.Kind, true
}

func (r *resolver) methods(f *File, in *Inputs) {
	ms := pile.DefaultMethods()
	if r.sys == units.US {
		// Das presents Meyerhof's limit and the SPT rules with pa = 2000
		// psf in US units; 2116 psf (one atmosphere) can be given.
		ms.Pa = 2000 * units.PSF
	}
	if m := f.Methods; m != nil {
		if m.TipDrained != "" {
			ms.TipDrained = r.tip(m.TipDrained, nil, "", "methods.tip_drained")
		}
		if m.TipUndrained != "" {
			ms.TipUndrained = r.tip(m.TipUndrained, nil, "", "methods.tip_undrained")
		}
		if m.ShaftDrained != "" {
			var lm pile.LayerMethods
			kind, ok := r.shaftMethod(m.ShaftDrained, nil, "", "methods.shaft_drained", in.Pile, &lm)
			ms.ShaftDrained = lm.Shaft
			if ok && kind != shaft.PointMethod {
				r.add("methods.shaft_drained", 0, "%q cannot apply to every drained layer; give it on a layer, or choose a method that gives fs at each depth", m.ShaftDrained)
			}
		}
		if m.ShaftUndrained != "" {
			var lm pile.LayerMethods
			kind, ok := r.shaftMethod(m.ShaftUndrained, nil, "", "methods.shaft_undrained", in.Pile, &lm)
			ms.ShaftUndrained, ms.UndrainedLambda = lm.Shaft, lm.Lambda
			if ok && kind == shaft.NoResistance {
				r.add("methods.shaft_undrained", 0, "%q cannot apply to every undrained layer; give it on a layer", m.ShaftUndrained)
			}
		}
		ms.CriticalDepth = r.num(m.CriticalDepth, "methods.critical_depth", 0, 1e3)
		if m.LayeredTip != nil {
			ms.LayeredTip = *m.LayeredTip
		}
		ms.WeakBelow = r.num(m.WeakBelow, "methods.weak_below", 0, 1e3)
		if m.SelfWeight != "" {
			w, err := pile.ParseSelfWeight(m.SelfWeight)
			if err != nil {
				r.add("methods.self_weight", 0, "%v", err)
			}
			ms.SelfWeight = w
		}
		if m.TensionShaftRatio.IsSet() {
			ms.Tension = pile.TensionFactor{Name: "given", Value: r.num(m.TensionShaftRatio, "methods.tension_shaft_ratio", 0, 1e3)}
		}
		ms.Clamp = m.ClampCharts
		if m.Pa.IsSet() {
			ms.Pa = r.stress(m.Pa, "methods.pa")
			if ms.Pa < 80*units.Kilopascal || ms.Pa > 120*units.Kilopascal {
				r.add("methods.pa", m.Pa.Line, "%q is outside 80 to 120 kPa (1671 to 2506 psf)", m.Pa.Raw)
			}
		}
		off := func(b *bool) bool { return b != nil && !*b }
		ms.NoWeakLayer, ms.NoEmbedment = off(m.WeakLayer), off(m.Embedment)
		ms.NoDrilledZones, ms.NoLambdaCap = off(m.DrilledZones), off(m.LambdaCap)
		if m.EmbedmentRatio.IsSet() {
			ms.EmbedmentRatio = r.num(m.EmbedmentRatio, "methods.embedment_ratio", 1, 50)
		}
		for i, z := range m.NoShaft {
			path := fmt.Sprintf("methods.no_shaft[%d]", i)
			ms.NoShaft = append(ms.NoShaft, pile.Zone{Top: r.length(z.Top, path+".top"), Bottom: r.length(z.Bottom, path+".bottom")})
		}
	}
	for i, l := range f.Ground.Layers {
		var lm pile.LayerMethods
		path := fmt.Sprintf("ground.layers[%d]", i)
		if l.Shaft != nil {
			r.shaftMethod(l.Shaft.Method, l.Shaft.Params, path+".shaft", path+".shaft.method", in.Pile, &lm)
		}
		if l.Tip != nil {
			lm.Tip = r.tip(l.Tip.Method, l.Tip.Params, path+".tip", path+".tip.method")
		}
		ms.Layers = append(ms.Layers, lm)
	}
	in.Methods = ms
}

// factorMap reads resistance factors keyed by method identifier; a key
// that is not one of ids (or "*", any other method) is an error, so that
// a misspelt method cannot leave a factor unused.
func (r *resolver) factorMap(m map[string]Value, path string, ids []string) map[string]float64 {
	if m == nil {
		return nil
	}
	out := map[string]float64{}
	keys := make([]string, 0, len(m))
	for k := range m {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	for _, k := range keys {
		v := m[k]
		key := k
		if k == "*" {
			key = ""
		} else if !slices.Contains(ids, k) {
			r.add(path+"."+k, v.Line, "%q is not a method identifier; want one of %s, or * for any other", k, strings.Join(ids, ", "))
			continue
		}
		out[key] = r.num(v, path+"."+k, 0, 1)
	}
	return out
}

func (r *resolver) design(f *File, in *Inputs) {
	d := f.Design
	if d == nil {
		return
	}
	r.designKeys(d)
	switch strings.TrimSpace(d.Basis) {
	case "safety-factor":
		in.Basis = pile.SafetyFactor{Global: r.num(d.Factor, "design.factor", 0, 100),
			Tip: r.num(d.TipFactor, "design.tip_factor", 0, 100), Shaft: r.num(d.ShaftFactor, "design.shaft_factor", 0, 100),
			Tension: r.num(d.TensionSafetyFactor, "design.tension_safety_factor", 0, 100), WeightUnfactored: d.WeightUnfactored}
	case "lrfd":
		var l pile.LRFD
		switch d.Preset {
		case "":
			l = pile.LRFD{Permanent: 1.25, Variable: 1.75, Tip: map[string]float64{}, Shaft: map[string]float64{}, Tension: map[string]float64{}}
		case "aashto-driven":
			l = pile.AASHTODrivenPiles()
		case "aashto-drilled":
			l = pile.AASHTODrilledShafts()
		default:
			r.add("design.preset", 0, "%q: want aashto-driven or aashto-drilled", d.Preset)
			l = pile.LRFD{Tip: map[string]float64{}, Shaft: map[string]float64{}, Tension: map[string]float64{}}
		}
		for k, v := range r.factorMap(d.Tip, "design.tip", append(bearing.IDs(), insitu.DirectIDs(insitu.TipPart)...)) {
			l.Tip[k] = v
		}
		for k, v := range r.factorMap(d.Shaft, "design.shaft", append(shaft.ResistanceIDs(), insitu.DirectIDs(insitu.ShaftPart)...)) {
			l.Shaft[k] = v
		}
		for k, v := range r.factorMap(d.Uplift, "design.uplift", append(shaft.ResistanceIDs(), insitu.DirectIDs(insitu.ShaftPart)...)) {
			l.Tension[k] = v
		}
		if d.Permanent.IsSet() {
			l.Permanent = r.num(d.Permanent, "design.permanent", 0, 10)
		}
		if d.Variable.IsSet() {
			l.Variable = r.num(d.Variable, "design.variable", 0, 10)
		}
		if d.Weight.IsSet() {
			l.Weight = r.num(d.Weight, "design.weight", 0, 1)
		}
		// A preset's own methods are the defaults where the file names
		// none, so a preset works with qult's defaults out of the box.
		if ms, err := l.Calibrated.Fill(in.Methods); err == nil {
			in.Methods = ms
		} else {
			r.add("design.preset", 0, "%v", err)
		}
		in.Basis = l
	case "en1997":
		ap, err := pile.ParseApproach(strings.ToUpper(strings.TrimSpace(d.Approach)))
		if err != nil {
			r.add("design.approach", 0, "%v", err)
		}
		prof := 1.0
		if d.Profiles.IsSet() {
			prof = r.num(d.Profiles, "design.profiles", 0, 1000)
		}
		if prof != math.Trunc(prof) {
			r.add("design.profiles", d.Profiles.Line, "%g: want a whole number of ground profiles", prof)
		}
		e := pile.Eurocode7{Approach: ap, Profiles: int(prof), ModelFactor: r.num(d.ModelFactor, "design.model_factor", 0, 10), Total: d.Total}
		e.Xi3, e.Xi4 = r.num(d.Xi3, "design.xi3", 1, 3), r.num(d.Xi4, "design.xi4", 1, 3)
		if (e.Xi3 == 0) != (e.Xi4 == 0) {
			r.add("design.xi3", 0, "give both xi3 and xi4, or neither")
		}
		var fs pile.EN7Factors
		switch strings.TrimSpace(d.Annex) {
		case "", "recommended":
			fs = pile.EN1997Recommended()
			if d.SLSVerified {
				r.add("design.sls_verified", 0, "only the uk annex reads sls_verified")
			}
		case "uk":
			fs = pile.UKAnnex(d.SLSVerified)
		default:
			r.add("design.annex", 0, "%q: want recommended (EN 1997-1 Annex A) or uk (the UK National Annex)", d.Annex)
		}
		r.en7Tables(d, &fs, in.Pile.Installation)
		e.Factors = &fs
		for i := range d.OtherProfiles {
			in.OtherProfiles = append(in.OtherProfiles, r.groundSpec(&d.OtherProfiles[i], fmt.Sprintf("design.other_profiles[%d]", i), in.System))
		}
		if n := 1 + len(d.OtherProfiles); len(d.OtherProfiles) > 0 && d.Profiles.IsSet() && int(prof) != n {
			r.add("design.profiles", d.Profiles.Line, "%g, but the file gives %d ground profiles (ground and other_profiles); leave profiles out or make it %d", prof, n, n)
		} else if len(d.OtherProfiles) > 0 {
			e.Profiles = n
		}
		in.Basis = e
	case "":
		r.add("design.basis", 0, "not given; want safety-factor, lrfd or en1997")
	default:
		r.add("design.basis", 0, "%q: want safety-factor, lrfd or en1997", d.Basis)
	}
}

// designKeysOf lists the design keys each basis reads.
var designKeysOf = map[string][]string{
	"safety-factor": {"factor", "tip_factor", "shaft_factor", "tension_safety_factor", "weight_unfactored"},
	"lrfd":          {"preset", "tip", "shaft", "uplift", "permanent", "variable", "weight"},
	"en1997": {"approach", "profiles", "model_factor", "total", "annex", "sls_verified", "xi3", "xi4",
		"resistance_factors", "action_factors", "other_profiles"},
}

// en7Tables replaces the annex's factors with the file's: resistance sets
// R1 to R4 for the pile's installation, action sets A1 and A2.
func (r *resolver) en7Tables(d *Design, fs *pile.EN7Factors, inst pile.Installation) {
	rs := &fs.Driven
	switch inst {
	case pile.Bored:
		rs = &fs.Bored
	case pile.Augered:
		rs = &fs.CFA
	}
	for _, k := range slices.Sorted(maps.Keys(d.Resistance)) {
		path := "design.resistance_factors." + k
		i := slices.Index([]string{"R1", "R2", "R3", "R4"}, k)
		if i < 0 {
			r.add(path, 0, "%q: want R1, R2, R3 or R4", k)
			continue
		}
		v := d.Resistance[k]
		for _, f := range []struct {
			key string
			val Value
			dst *float64
		}{{"base", v.Base, &rs.Base[i]}, {"shaft", v.Shaft, &rs.Shaft[i]}, {"total", v.Total, &rs.Total[i]}, {"tension", v.Tension, &rs.Tension[i]}} {
			if f.val.IsSet() {
				*f.dst = r.num(f.val, path+"."+f.key, 1, 5)
			}
		}
	}
	for _, k := range slices.Sorted(maps.Keys(d.Actions)) {
		path := "design.action_factors." + k
		var a *pile.ActionSet
		switch k {
		case "A1":
			a = &fs.A1
		case "A2":
			a = &fs.A2
		default:
			r.add(path, 0, "%q: want A1 or A2", k)
			continue
		}
		v := d.Actions[k]
		for _, f := range []struct {
			key string
			val Value
			dst *float64
		}{{"g", v.G, &a.G}, {"g_fav", v.GFav, &a.GFav}, {"q", v.Q, &a.Q}} {
			if f.val.IsSet() {
				*f.dst = r.num(f.val, path+"."+f.key, 0, 5)
			}
		}
	}
	if len(d.Resistance) > 0 || len(d.Actions) > 0 {
		fs.Name += "+given"
	}
}

// designKeys refuses keys that the chosen basis does not read (a preset
// under a safety-factor basis would otherwise be ignored in silence).
func (r *resolver) designKeys(d *Design) {
	reads, ok := designKeysOf[strings.TrimSpace(d.Basis)]
	if !ok {
		return // the basis itself is reported
	}
	set := map[string]bool{
		"factor": d.Factor.IsSet(), "tip_factor": d.TipFactor.IsSet(), "shaft_factor": d.ShaftFactor.IsSet(),
		"tension_safety_factor": d.TensionSafetyFactor.IsSet(), "preset": d.Preset != "", "tip": d.Tip != nil,
		"shaft": d.Shaft != nil, "uplift": d.Uplift != nil, "permanent": d.Permanent.IsSet(),
		"variable": d.Variable.IsSet(), "approach": d.Approach != "", "profiles": d.Profiles.IsSet(),
		"model_factor": d.ModelFactor.IsSet(), "total": d.Total, "weight_unfactored": d.WeightUnfactored,
		"weight": d.Weight.IsSet(), "annex": d.Annex != "", "sls_verified": d.SLSVerified, "xi3": d.Xi3.IsSet(),
		"xi4": d.Xi4.IsSet(), "resistance_factors": d.Resistance != nil, "action_factors": d.Actions != nil,
		"other_profiles": d.OtherProfiles != nil,
	}
	for _, k := range []string{"factor", "tip_factor", "shaft_factor", "tension_safety_factor", "weight_unfactored", "preset",
		"tip", "shaft", "uplift", "permanent", "variable", "weight", "approach", "profiles", "model_factor", "total",
		"annex", "sls_verified", "xi3", "xi4", "resistance_factors", "action_factors", "other_profiles"} {
		if set[k] && !slices.Contains(reads, k) {
			r.add("design."+k, 0, "basis %s does not use %s; it reads %s", strings.TrimSpace(d.Basis), k, strings.Join(reads, ", "))
		}
	}
}

func (r *resolver) load(l *Load, path string) pile.Action {
	if l == nil {
		return pile.Action{}
	}
	if l.Value.IsSet() {
		// A design basis factors permanent and variable actions
		// differently, so a bare value would choose a factor in silence.
		r.add(path, l.Value.Line, "%q does not say whether the load is permanent or variable; write {permanent: %s} or {variable: %s} (or both parts)", l.Value.Raw, l.Value.Raw, l.Value.Raw)
		return pile.Action{}
	}
	a := pile.Action{Permanent: r.force(l.Permanent, path+".permanent"), Variable: r.force(l.Variable, path+".variable")}
	for _, p := range []struct {
		key string
		v   Value
		f   *units.Force
	}{{"permanent", l.Permanent, &a.Permanent}, {"variable", l.Variable, &a.Variable}} {
		if f := *p.f; f < 0 || f > maxLoad {
			r.add(path+"."+p.key, p.v.Line, "%q is outside 0 to %v; a load on one pile is a magnitude in the direction of the check", p.v.Raw, maxLoad)
			*p.f = 0
		}
	}
	return a
}

// maxLoad is the largest characteristic load accepted on one pile: 1 GN,
// some twenty times the largest single drilled shaft or monopile load in
// practice (common practice); anything larger is a slip of units.
const maxLoad = 1e6 * units.Kilonewton

func (r *resolver) loads(f *File, in *Inputs) {
	if f.Loads == nil {
		return
	}
	in.HasLoad = true
	in.Loads = pile.Loads{Compression: r.load(f.Loads.Compression, "loads.compression"), Tension: r.load(f.Loads.Tension, "loads.tension")}
}

func (r *resolver) search(f *File, in *Inputs) {
	if f.Search == nil {
		return
	}
	in.Step = r.length(f.Search.Step, "search.step")
	in.MaxTip = r.length(f.Search.MaxTip, "search.max_tip")
	if f.Search.Step.IsSet() && !(in.Step > 0) {
		r.add("search.step", 0, "%q: want a positive step", f.Search.Step.Raw)
	}
	if f.Search.MaxTip.IsSet() && !(in.MaxTip > 0) {
		r.add("search.max_tip", 0, "%q: want a depth below the ground surface", f.Search.MaxTip.Raw)
	}
}

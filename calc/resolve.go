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
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/phase"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// Inputs are a calc file resolved into the library's types, all in SI.
type Inputs struct {
	System  units.System
	Ground  profile.Spec
	Pile    pile.Pile
	Methods pile.Methods
	Basis   pile.Basis // nil without a design section
	Loads   pile.Loads
	HasLoad bool
	Step    units.Length
	MaxTip  units.Length
}

// resolver turns Values into quantities, recording problems.
type resolver struct {
	f     *File
	sys   units.System
	probs Problems
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
	r := &resolver{f: f}
	in := &Inputs{}
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
	if len(r.probs) > 0 {
		return in, r.probs
	}
	return in, nil
}

func (r *resolver) ground(f *File, in *Inputs) {
	g := f.Ground
	s := &in.Ground
	switch strings.TrimSpace(strings.ToLower(g.WaterDepth.Raw)) {
	case "":
		r.add("ground.water_depth", 0, "not given; give the depth of the water table below ground level (negative for water above the ground), or \"none\" for a dry site")
	case "none":
		s.NoWater = true
	default:
		s.WaterDepth = r.length(g.WaterDepth, "ground.water_depth")
	}
	s.WaterUnitWeight = r.weight(g.WaterUnitWeight, "ground.water_unit_weight")
	if s.WaterUnitWeight == 0 && in.System == units.US {
		s.WaterUnitWeight = 62.4 * units.PCF
	}
	s.Surcharge = r.stress(g.Surcharge, "ground.surcharge")
	s.ExcavationDepth = r.length(g.ExcavationDepth, "ground.excavation_depth")
	if g.Scour != nil {
		s.Scour = profile.Scour{General: r.length(g.Scour.General, "ground.scour.general"), Local: r.length(g.Scour.Local, "ground.scour.local")}
	}
	for i, p := range g.PorePressures {
		path := fmt.Sprintf("ground.pore_pressures[%d]", i)
		if !p.Depth.IsSet() || !p.Pressure.IsSet() {
			r.add(path, p.Depth.Line, "give both depth and pressure")
		}
		s.PorePressures = append(s.PorePressures, profile.PorePoint{
			Depth: r.length(p.Depth, path+".depth"), U: r.stress(p.Pressure, path+".pressure")})
	}
	if len(g.Layers) == 0 {
		r.add("ground.layers", 0, "none given; give at least one layer")
	}
	for i, l := range g.Layers {
		path := fmt.Sprintf("ground.layers[%d]", i)
		ls := profile.LayerSpec{Name: l.Name}
		ls.Thickness = r.length(l.Thickness, path+".thickness")
		ls.Top = r.length(l.Top, path+".top")
		ls.Bottom = r.length(l.Bottom, path+".bottom")
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
		ls.UnitWeight = r.weight(l.UnitWeight, path+".unit_weight")
		ls.SaturatedUnitWeight = r.weight(l.SaturatedUnitWeight, path+".saturated_unit_weight")
		ls.DryUnitWeight = r.weight(l.DryUnitWeight, path+".dry_unit_weight")
		ls.VoidRatio = r.num(l.VoidRatio, path+".void_ratio", 0, 20)
		ls.WaterContent = r.fraction(l.WaterContent, path+".water_content")
		ls.Gs = r.num(l.SpecificGravity, path+".specific_gravity", 0, 10)
		ls.Saturation = r.fraction(l.Saturation, path+".saturation")
		ls.Phi = r.angle(l.FrictionAngle, path+".friction_angle")
		ls.Cohesion = r.stress(l.Cohesion, path+".cohesion")
		if su := l.UndrainedStrength; su != nil {
			if su.Value.IsSet() {
				ls.Su = r.stress(su.Value, path+".undrained_strength")
			} else {
				ls.SuTop = r.stress(su.Top, path+".undrained_strength.top")
				ls.SuBottom = r.stress(su.Bottom, path+".undrained_strength.bottom")
				if !su.Top.IsSet() || !su.Bottom.IsSet() {
					r.add(path+".undrained_strength", 0, "give a single value, or both top and bottom")
				}
			}
		}
		ls.OCR = r.num(l.OCR, path+".ocr", 0, 1e6)
		ls.Dr = r.fraction(l.RelativeDensity, path+".relative_density")
		ls.N60 = r.num(l.N60, path+".n60", 0, 1e6)
		ls.E = r.stress(l.YoungsModulus, path+".youngs_modulus")
		ls.G = r.stress(l.ShearModulus, path+".shear_modulus")
		ls.Nu = r.num(l.PoissonsRatio, path+".poissons_ratio", 0, 1e6)
		ls.Ir = r.num(l.RigidityIndex, path+".rigidity_index", 0, 1e9)
		ls.Delta = r.num(l.VolumetricStrain, path+".volumetric_strain", 0, 0.5)
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
			r.add("pile.section."+f.key, 0, "not given; shape %s needs %s (%s: %s)", shape, strings.Join(need, ", "), f.key, f.what)
		}
	}
	for _, k := range []string{"diameter", "width", "wall", "depth", "web", "flange", "area", "perimeter"} {
		if v := given[k]; v.IsSet() && !used[k] {
			r.add("pile.section."+k, v.Line, "shape %s does not use %s; it reads %s", shape, k, strings.Join(need, ", "))
		}
	}
}

// tipMethods and shaftMethods list the identifiers accepted in calc files.
var tipIDs = []string{"meyerhof", "vesic", "vesic-given", "berezantzev", "janbu", "api-sand-1", "api-sand-2", "api-sand-3",
	"api-sand-4", "shaft-n60-sand", "bored-sand", "bored-phi", "given-nq", "nc9", "vesic-undrained", "given-nc"}

var shaftIDs = []string{"beta", "beta-given", "beta-burland", "beta-drilled-sand", "beta-drilled-k0", "beta-api",
	"alpha-api", "alpha-chart", "alpha-drilled", "alpha-given", "lambda", "none"}

// tip builds a tip method from its identifier and values.
func (r *resolver) tip(id string, c *TipChoice, path string) bearing.Tip {
	id = strings.TrimSpace(id)
	var nq, nc float64
	var lim units.Stress
	var eta units.Angle
	if c != nil {
		nq = r.num(c.Nq, path+".nq", 0, 1e4)
		nc = r.num(c.Nc, path+".nc", 0, 1e4)
		lim = r.stress(c.Limit, path+".limit")
		eta = r.angle(c.Eta, path+".eta")
	}
	switch id {
	case "meyerhof":
		return bearing.Meyerhof{}
	case "vesic":
		// Δ from the layer's volumetric_strain, else Vesic's correlation.
		return bearing.Vesic{Volume: bearing.VolumeCorrelated}
	case "vesic-given":
		ns := 0.0
		if c != nil {
			ns = r.num(c.Nsigma, path+".nsigma", 0, 1e5)
		}
		if ns == 0 {
			r.add(path+".nsigma", 0, "vesic-given needs nsigma (Nσ*)")
		}
		return bearing.VesicGiven{Nsigma: ns, Nc: nc}
	case "bored-sand":
		return bearing.BoredSand{}
	case "bored-phi":
		return bearing.BoredPhi{}
	case "berezantzev":
		return bearing.Berezantzev{}
	case "janbu":
		return bearing.Janbu{Eta: eta}
	case "api-sand-1", "api-sand-2", "api-sand-3", "api-sand-4":
		return bearing.APISand{Class: int(id[len(id)-1] - '0')}
	case "shaft-n60-sand":
		return bearing.ShaftSand{}
	case "given-nq":
		if nq == 0 {
			r.add(path+".nq", 0, "given-nq needs nq")
		}
		return bearing.GivenNq{Nq: nq, Nc: nc, Limit: lim}
	case "nc9":
		return bearing.Skempton{}
	case "vesic-undrained":
		return bearing.VesicUndrained{}
	case "given-nc":
		if nc == 0 {
			r.add(path+".nc", 0, "given-nc needs nc")
		}
		return bearing.GivenNc{Nc: nc}
	}
	r.add(path+".method", 0, "%q: want one of %s", id, strings.Join(tipIDs, ", "))
	return nil
}

// shaftUnit builds a layer's shaft method; lambda and none are returned
// through the LayerMethods flags.
func (r *resolver) shaftUnit(c *ShaftChoice, path string, inst pile.Installation, lm *pile.LayerMethods) shaft.Unit {
	id := strings.TrimSpace(c.Method)
	var m shaft.Unit
	switch id {
	case "beta":
		m = r.beta(c, path, inst)
	case "beta-given":
		b := r.num(c.Beta, path+".beta", 0, 3)
		if !c.Beta.IsSet() {
			r.add(path+".beta", 0, "beta-given needs beta")
		}
		m = shaft.BetaGiven{Beta: b}
	case "beta-burland":
		m = shaft.Burland{}
	case "beta-drilled-sand":
		m = shaft.DrilledSand{}
	case "beta-drilled-k0":
		m = shaft.DrilledSandK0{}
	case "beta-api":
		cl, err := shaft.ParseSandClass(c.SandClass)
		if err != nil {
			r.add(path+".sand_class", 0, "%v", err)
		}
		m = shaft.APIBeta{Class: cl}
	case "alpha-api":
		m = shaft.AlphaAPI{}
	case "alpha-chart":
		m = shaft.AlphaChart{}
	case "alpha-drilled":
		m = shaft.AlphaDrilled{}
	case "alpha-given":
		a := r.num(c.Alpha, path+".alpha", 0, 1.5)
		if !c.Alpha.IsSet() {
			r.add(path+".alpha", 0, "alpha-given needs alpha")
		}
		m = shaft.AlphaGiven{Alpha: a}
	case "lambda":
		lm.Lambda = true
		lm.LambdaValue = r.num(c.Lambda, path+".lambda", 0, 1)
		return nil
	case "none":
		lm.NoShaft = true
		return nil
	default:
		r.add(path+".method", 0, "%q: want one of %s", id, strings.Join(shaftIDs, ", "))
		return nil
	}
	if c.Limit.IsSet() {
		m = shaft.Capped{Method: m, Limit: shaft.LimitGiven{Fs: r.stress(c.Limit, path+".limit")}}
	}
	return m
}

// beta builds the β method from K and δ choices, with the defaults of
// package pile for what is not given.
func (r *resolver) beta(c *ShaftChoice, path string, inst pile.Installation) shaft.Unit {
	var k shaft.KRule
	n := 0
	if c.K.IsSet() {
		k, n = shaft.KGiven{K: r.num(c.K, path+".k", 0, 10)}, n+1
	}
	if c.KOverK0.IsSet() {
		k, n = shaft.KOverK0{Ratio: r.num(c.KOverK0, path+".k_over_k0", 0, 3)}, n+1
	}
	if c.KOverKp.IsSet() {
		k, n = shaft.KOverKp{Ratio: r.num(c.KOverKp, path+".k_over_kp", 0, 1)}, n+1
	}
	switch c.K0 {
	case "":
	case "jaky":
		k, n = shaft.KJaky{}, n+1
	case "ocr":
		k, n = shaft.KMayneKulhawy{}, n+1
	default:
		r.add(path+".k0", 0, "%q: want jaky or ocr", c.K0)
	}
	if n > 1 {
		r.add(path, 0, "give one of k, k_over_k0, k_over_kp, k0")
	}
	if k == nil {
		kk, _ := shaft.KOverK0For(shaftInst(inst))
		k = kk
	}
	var d shaft.DeltaRule
	if c.Delta.IsSet() && c.DeltaOverPhi.IsSet() {
		r.add(path, 0, "give delta or delta_over_phi, not both")
	}
	switch {
	case c.Delta.IsSet():
		d = shaft.DeltaGiven{Delta: r.angle(c.Delta, path+".delta")}
	case c.DeltaOverPhi.IsSet():
		d = shaft.DeltaOverPhi{Ratio: r.num(c.DeltaOverPhi, path+".delta_over_phi", 0, 1)}
	}
	return betaWith{k: k, d: d}
}

// betaWith is a β method whose δ rule may still be the pile's default,
// filled in by methods() once the surface is known.
type betaWith struct {
	k shaft.KRule
	d shaft.DeltaRule
}

func (b betaWith) ID() string       { return "beta" }
func (b betaWith) Equation() string { return "" }
func (b betaWith) Valid() string    { return "" }
func (b betaWith) Refs() []cite.Ref { return nil }
func (b betaWith) Unit(shaft.Point) (shaft.Result, error) {
	return shaft.Result{}, errors.New("calc: unresolved β")
}

func shaftInst(i pile.Installation) shaft.Installation {
	switch i {
	case pile.DrivenHigh:
		return shaft.DrivenHighDisplacement
	case pile.DrivenLow:
		return shaft.DrivenLowDisplacement
	case pile.Jetted:
		return shaft.Jetted
	}
	return shaft.Bored
}

// finishBeta replaces a betaWith by a shaft.Beta with the default δ rule
// for the pile's surface where none was given.
func finishBeta(m shaft.Unit, p pile.Pile) shaft.Unit {
	switch b := m.(type) {
	case betaWith:
		d := b.d
		if d == nil {
			surf := p.Surface
			if surf == 0 {
				surf = pile.DefaultSurface(p.Section, p.Installation)
			}
			dd, _ := shaft.DeltaOverPhiFor(surf)
			d = dd
		}
		return shaft.Beta{K: b.k, Delta: d}
	case shaft.Capped:
		b.Method = finishBeta(b.Method, p)
		return b
	}
	return m
}

func (r *resolver) methods(f *File, in *Inputs) {
	ms := pile.DefaultMethods()
	if r.sys == units.US {
		// Das presents Meyerhof's limit and the SPT rules with pa = 2000
		// psf in US units; 2116 psf (one atmosphere) can be given.
		ms.Pa = 2000 * units.PSF
	}
	inst := in.Pile.Installation
	if m := f.Methods; m != nil {
		if m.TipDrained != "" {
			ms.TipDrained = r.tip(m.TipDrained, nil, "methods.tip_drained")
		}
		if m.TipUndrained != "" {
			ms.TipUndrained = r.tip(m.TipUndrained, nil, "methods.tip_undrained")
		}
		if m.ShaftDrained != "" {
			var lm pile.LayerMethods
			ms.ShaftDrained = r.shaftUnit(&ShaftChoice{Method: m.ShaftDrained}, "methods.shaft_drained", inst, &lm)
			if lm.Lambda || lm.NoShaft {
				r.add("methods.shaft_drained", 0, "%q cannot apply to every drained layer", m.ShaftDrained)
			}
		}
		if m.ShaftUndrained != "" {
			var lm pile.LayerMethods
			ms.ShaftUndrained = r.shaftUnit(&ShaftChoice{Method: m.ShaftUndrained}, "methods.shaft_undrained", inst, &lm)
			ms.UndrainedLambda = lm.Lambda
			if lm.NoShaft {
				r.add("methods.shaft_undrained", 0, "\"none\" cannot apply to every undrained layer; use none on a layer")
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
		if m.TensionFactor.IsSet() {
			ms.Tension = pile.TensionFactor{Name: "given", Value: r.num(m.TensionFactor, "methods.tension_factor", 0, 1e3)}
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
			lm.Shaft = r.shaftUnit(l.Shaft, path+".shaft", inst, &lm)
		}
		if l.Tip != nil {
			lm.Tip = r.tip(l.Tip.Method, l.Tip, path+".tip")
		}
		ms.Layers = append(ms.Layers, lm)
	}
	if ms.ShaftDrained != nil {
		ms.ShaftDrained = finishBeta(ms.ShaftDrained, in.Pile)
	}
	if ms.ShaftUndrained != nil {
		ms.ShaftUndrained = finishBeta(ms.ShaftUndrained, in.Pile)
	}
	for i := range ms.Layers {
		if ms.Layers[i].Shaft != nil {
			ms.Layers[i].Shaft = finishBeta(ms.Layers[i].Shaft, in.Pile)
		}
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
			Tension: r.num(d.TensionFactor, "design.tension_factor", 0, 100), WeightUnfactored: d.WeightUnfactored}
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
		for k, v := range r.factorMap(d.Tip, "design.tip", tipIDs) {
			l.Tip[k] = v
		}
		for k, v := range r.factorMap(d.Shaft, "design.shaft", shaftIDs) {
			l.Shaft[k] = v
		}
		for k, v := range r.factorMap(d.Uplift, "design.uplift", shaftIDs) {
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
		in.Basis = e
	case "":
		r.add("design.basis", 0, "not given; want safety-factor, lrfd or en1997")
	default:
		r.add("design.basis", 0, "%q: want safety-factor, lrfd or en1997", d.Basis)
	}
}

// designKeysOf lists the design keys each basis reads.
var designKeysOf = map[string][]string{
	"safety-factor": {"factor", "tip_factor", "shaft_factor", "tension_factor", "weight_unfactored"},
	"lrfd":          {"preset", "tip", "shaft", "uplift", "permanent", "variable", "weight"},
	"en1997": {"approach", "profiles", "model_factor", "total", "annex", "sls_verified", "xi3", "xi4",
		"resistance_factors", "action_factors"},
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
		"tension_factor": d.TensionFactor.IsSet(), "preset": d.Preset != "", "tip": d.Tip != nil,
		"shaft": d.Shaft != nil, "uplift": d.Uplift != nil, "permanent": d.Permanent.IsSet(),
		"variable": d.Variable.IsSet(), "approach": d.Approach != "", "profiles": d.Profiles.IsSet(),
		"model_factor": d.ModelFactor.IsSet(), "total": d.Total, "weight_unfactored": d.WeightUnfactored,
		"weight": d.Weight.IsSet(), "annex": d.Annex != "", "sls_verified": d.SLSVerified, "xi3": d.Xi3.IsSet(),
		"xi4": d.Xi4.IsSet(), "resistance_factors": d.Resistance != nil, "action_factors": d.Actions != nil,
	}
	for _, k := range []string{"factor", "tip_factor", "shaft_factor", "tension_factor", "weight_unfactored", "preset",
		"tip", "shaft", "uplift", "permanent", "variable", "weight", "approach", "profiles", "model_factor", "total",
		"annex", "sls_verified", "xi3", "xi4", "resistance_factors", "action_factors"} {
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

package profile

import (
	"errors"
	"fmt"
	"math"
	"slices"
	"strings"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/phase"
	"github.com/qultgeo/qult/units"
)

// FieldError is one invalid value in a Spec, named by its field path.
type FieldError struct {
	Path string // such as "layers[2].thickness"
	Msg  string // such as "-1 m is outside (0, ∞)"
	Err  error  // underlying error, if any
}

func (e *FieldError) Error() string { return e.Path + ": " + e.Msg }
func (e *FieldError) Unwrap() error { return e.Err }

// DepthError reports a query depth outside the profile or layer.
type DepthError struct {
	Depth       units.Length
	Top, Bottom units.Length
	What        string // "profile", or "layer NAME"
}

func (e *DepthError) Error() string {
	if math.IsNaN(float64(e.Depth)) || math.IsInf(float64(e.Depth), 0) {
		return fmt.Sprintf("profile: depth %v is not a finite number", float64(e.Depth))
	}
	if e.What == "profile" && e.Depth > e.Bottom {
		return fmt.Sprintf("profile: depth %s is past the bottom of the profile, which goes down to %s", e.Depth, e.Bottom)
	}
	return fmt.Sprintf("profile: depth %s is outside %s, from %s to %s", e.Depth, e.What, e.Top, e.Bottom)
}

// ParamError reports a layer parameter asked for but not given.
type ParamError struct {
	Layer, Param string
}

func (e *ParamError) Error() string {
	return fmt.Sprintf("profile: layer %s has no %s", e.Layer, e.Param)
}

// Profile is an immutable layered ground profile. Build it with New.
type Profile struct {
	layers     []Layer
	breaks     []float64 // b[0] = 0 < … < b[m] = depth
	sig, dsig  []float64 // per interval: total stress at top, gradient
	u, du      []float64 // per interval: pore pressure at top, gradient
	gw         float64
	waterDepth float64
	noWater    bool
	surcharge  float64
	// the ground lines: excavation floor, general scour line, design
	// ground line (depths below the original surface)
	excavation, general, design float64
}

// Stresses holds the three vertical stresses at one depth.
type Stresses struct {
	Total, Pore, Effective units.Stress
}

const (
	maxUnitWeight = 35 * units.KilonewtonPerCubicMetre
	minGammaW     = 9 * units.KilonewtonPerCubicMetre
	maxGammaW     = 10.5 * units.KilonewtonPerCubicMetre
	maxPhi        = 50 * units.Degree
	maxDepth      = 10 * units.Kilometre   // deeper than any pile: a unit slip
	maxHead       = 12 * units.Kilometre   // free water above ground: the deepest ocean
	maxStress     = 100 * units.Megapascal // surcharge and |u| at points
)

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

type collector struct{ errs []error }

func (c *collector) add(path, format string, args ...any) {
	c.errs = append(c.errs, &FieldError{Path: path, Msg: fmt.Sprintf(format, args...)})
}

// New validates spec and builds its Profile. All problems found are
// returned together, joined with errors.Join, each a *FieldError naming
// its field path.
func New(spec Spec) (*Profile, error) {
	var c collector
	p := &Profile{gw: float64(spec.WaterUnitWeight), waterDepth: float64(spec.WaterDepth),
		noWater: spec.NoWater, surcharge: float64(spec.Surcharge)}
	if p.gw == 0 {
		p.gw = float64(phase.WaterUnitWeight)
	}
	if !finite(p.gw) || p.gw < float64(minGammaW) || p.gw > float64(maxGammaW) {
		c.add("water_unit_weight", "%s is outside [%s, %s]", units.UnitWeight(p.gw), minGammaW, maxGammaW)
		p.gw = float64(phase.WaterUnitWeight) // to go on checking the rest
	}
	if !finite(p.waterDepth) || p.waterDepth < -float64(maxHead) {
		c.add("water_depth", "%s is outside [%s, ∞)", spec.WaterDepth, -maxHead)
	}
	if p.noWater && p.waterDepth != 0 {
		c.add("water_depth", "%s is given for a site marked no_water", spec.WaterDepth)
	}
	if !finite(p.surcharge) || p.surcharge < 0 || p.surcharge > float64(maxStress) {
		c.add("surcharge", "%s is outside [0, %s]", spec.Surcharge, maxStress)
	}
	cutOK := p.checkCutFields(spec, &c)
	for i, pt := range spec.PorePressures {
		path := fmt.Sprintf("pore_pressures[%d]", i)
		if !finite(float64(pt.Depth)) || pt.Depth < 0 {
			c.add(path+".depth", "%s is outside [0, ∞)", pt.Depth)
		} else if i > 0 && !(pt.Depth > spec.PorePressures[i-1].Depth) {
			c.add(path+".depth", "%s is not below the previous point at %s", pt.Depth, spec.PorePressures[i-1].Depth)
		}
		if !finite(float64(pt.U)) || math.Abs(float64(pt.U)) > float64(maxStress) {
			c.add(path+".u", "%s is outside [%s, %s]", pt.U, -maxStress, maxStress)
		}
	}
	if len(spec.Layers) == 0 {
		c.add("layers", "none given; a profile needs at least one layer")
		return nil, errors.Join(c.errs...)
	}
	p.layers = make([]Layer, len(spec.Layers))
	geometryOK := p.resolveGeometry(spec.Layers, &c)
	if geometryOK && cutOK {
		cutOK = p.placeCut(spec, &c)
	}
	if !cutOK {
		// Which weights are needed is then unknown below the cut: ask as
		// if nothing were removed.
		p.excavation, p.general, p.design = 0, 0, 0
	}
	for i := range spec.Layers {
		p.resolveLayer(i, spec.Layers[i], geometryOK, &c)
	}
	if len(c.errs) > 0 {
		return nil, errors.Join(c.errs...)
	}
	p.precompute(spec.PorePressures)
	for i := range p.sig {
		if !finite(p.sig[i]) || !finite(p.dsig[i]) || !finite(p.u[i]) || !finite(p.du[i]) {
			return nil, &FieldError{Path: "layers", Msg: fmt.Sprintf("the stresses below %s are not finite numbers", units.Length(p.breaks[i]))}
		}
	}
	if err := p.checkEffective(); err != nil {
		return nil, err
	}
	return p, nil
}

// checkCutFields checks the excavation and scour depths on their own, and
// what may not be given with a cut; it reports false when a depth is
// unusable.
func (p *Profile) checkCutFields(spec Spec, c *collector) bool {
	ok := true
	for _, f := range []struct {
		path string
		v    units.Length
	}{{"excavation_depth", spec.ExcavationDepth}, {"scour.general", spec.Scour.General}, {"scour.local", spec.Scour.Local}} {
		if !finite(float64(f.v)) || f.v < 0 || f.v > maxDepth {
			c.add(f.path, "%s is outside [0, %s]", f.v, maxDepth)
			ok = false
		}
	}
	if !ok {
		return false
	}
	cut := spec.ExcavationDepth + spec.Scour.General + spec.Scour.Local
	if cut > 0 && spec.Surcharge != 0 {
		c.add("surcharge", "%s is given with the ground cut down to %s by excavation or scour; a surcharge on the original surface goes with the soil removed: give 0", spec.Surcharge, cut)
	}
	for i, pt := range spec.PorePressures {
		if cut > 0 && pt.Depth < cut {
			c.add(fmt.Sprintf("pore_pressures[%d].depth", i), "%s is above the design ground line at %s; give the pore pressures of the ground that remains, at or below it", pt.Depth, cut)
		}
	}
	return true
}

// placeCut sets the ground lines once the profile's depth is known; each
// must leave soil below it. It reports false when one does not.
func (p *Profile) placeCut(spec Spec, c *collector) bool {
	depth := float64(p.layers[len(p.layers)-1].Bottom)
	e := float64(spec.ExcavationDepth)
	g := e + float64(spec.Scour.General)
	d := g + float64(spec.Scour.Local)
	bottom := units.Length(depth)
	switch {
	case e >= depth:
		c.add("excavation_depth", "%s is outside [0, %s): the excavation floor must lie above the bottom of the profile at %s",
			spec.ExcavationDepth, bottom, bottom)
		return false
	case g >= depth:
		c.add("scour.general", "%s is outside [0, %s): below the excavation floor at %s, the general scour line must lie above the bottom of the profile at %s",
			spec.Scour.General, units.Length(depth-e), units.Length(e), bottom)
		return false
	case d >= depth:
		c.add("scour.local", "%s is outside [0, %s): below the general scour line at %s, the design ground line must lie above the bottom of the profile at %s",
			spec.Scour.Local, units.Length(depth-g), units.Length(g), bottom)
		return false
	}
	p.excavation, p.general, p.design = e, g, d
	return true
}

// resolveGeometry fixes Top and Bottom of every layer; it reports false when
// the depths are unusable.
func (p *Profile) resolveGeometry(ls []LayerSpec, c *collector) bool {
	ok := true
	prev := units.Length(0)
	for i, l := range ls {
		path := fmt.Sprintf("layers[%d]", i)
		var top, bottom units.Length
		switch {
		case l.Bottom != 0 || l.Top != 0:
			top, bottom = l.Top, l.Bottom
			if !finite(float64(top)) || top < 0 {
				c.add(path+".top", "%s is outside [0, ∞)", top)
				ok = false
				continue
			}
			if !finite(float64(bottom)) || !(bottom > top) || bottom > maxDepth {
				c.add(path+".bottom", "%s is outside (%s, %s]: it must be below the top", bottom, top, maxDepth)
				ok = false
				continue
			}
			if l.Thickness != 0 && math.Abs(float64(bottom-top-l.Thickness)) > 1e-9*float64(bottom) {
				c.add(path+".thickness", "%s disagrees with bottom − top = %s", l.Thickness, bottom-top)
				ok = false
			}
			if top > prev {
				if i == 0 {
					c.add(path+".top", "%s leaves a gap below the ground surface: the first layer must start at 0 m", top)
				} else {
					c.add(path+".top", "%s leaves a gap below layers[%d], which ends at %s", top, i-1, prev)
				}
				ok = false
			} else if top < prev {
				c.add(path+".top", "%s overlaps layers[%d], which ends at %s", top, i-1, prev)
				ok = false
			}
		default:
			if !finite(float64(l.Thickness)) || !(l.Thickness > 0) {
				c.add(path+".thickness", "%s is outside (0, ∞)", l.Thickness)
				ok = false
				continue
			}
			top, bottom = prev, prev+l.Thickness
			if bottom > maxDepth {
				c.add(path+".thickness", "%s takes the profile to %s, past the limit of %s", l.Thickness, bottom, maxDepth)
				ok = false
				continue
			}
		}
		p.layers[i].Top, p.layers[i].Bottom = top, bottom
		prev = bottom
	}
	return ok
}

func (p *Profile) resolveLayer(i int, ls LayerSpec, geometryOK bool, c *collector) {
	path := fmt.Sprintf("layers[%d]", i)
	l := &p.layers[i]
	l.Name = ls.Name
	if l.Name == "" {
		l.Name = fmt.Sprintf("layer %d", i+1)
	}
	if geometryOK {
		l.Removed = min(max(units.Length(p.design)-l.Top, 0), l.Bottom-l.Top)
	}
	l.Soil = ls.Soil
	if ls.Soil > Fill {
		c.add(path+".soil", "%v: want one of gravel, sand, silt, clay, peat, fill", ls.Soil)
	}
	l.Drainage = ls.Drainage
	switch ls.Drainage {
	case Drained, Undrained:
	default:
		c.add(path+".drainage", "not given; want drained or undrained")
	}

	// Strength.
	if !finite(float64(ls.Phi)) || ls.Phi < 0 || ls.Phi > maxPhi {
		c.add(path+".phi", "%.4g° is outside 0° to 50°", ls.Phi.Degrees())
	} else if ls.Drainage == Drained && ls.Phi == 0 {
		c.add(path+".phi", "not given; a drained layer needs φ′ in (0°, 50°]")
	}
	l.Phi = ls.Phi
	if !finite(float64(ls.Cohesion)) || ls.Cohesion < 0 {
		c.add(path+".cohesion", "%s is outside [0, ∞)", ls.Cohesion)
	}
	l.Cohesion = ls.Cohesion
	for _, f := range []struct {
		name string
		v    units.Stress
	}{{"su", ls.Su}, {"su_top", ls.SuTop}, {"su_bottom", ls.SuBottom}} {
		if !finite(float64(f.v)) || f.v < 0 {
			c.add(path+"."+f.name, "%s is outside [0, ∞)", f.v)
		}
	}
	linear := ls.SuTop != 0 || ls.SuBottom != 0
	switch {
	case ls.Su != 0 && linear:
		c.add(path+".su", "given with su_top/su_bottom; give a constant su or a linear one, not both")
	case ls.Su > 0:
		l.SuTop, l.SuBottom, l.HasSu = ls.Su, ls.Su, true
	case linear:
		l.SuTop, l.SuBottom, l.HasSu = ls.SuTop, ls.SuBottom, true
	case ls.Drainage == Undrained:
		c.add(path+".su", "not given; an undrained layer needs su > 0 (su, or su_top and su_bottom)")
	}

	// Optional parameters.
	opt := []struct {
		name   string
		v      float64
		lo, hi float64
		loOpen bool
		rng    string
	}{
		{"ocr", ls.OCR, 1, 100, false, "[1, 100]"},
		{"dr", ls.Dr, 0, 1, true, "(0, 1] (a fraction)"},
		{"n60", ls.N60, 0, 300, true, "(0, 300]"},
		{"e", float64(ls.E), 0, math.Inf(1), true, "(0, ∞) Pa"},
		{"g", float64(ls.G), 0, math.Inf(1), true, "(0, ∞) Pa"},
		{"nu", ls.Nu, 0, 0.5, true, "(0, 0.5]"},
		{"ir", ls.Ir, 1, math.Inf(1), false, "[1, ∞)"},
		{"delta", ls.Delta, 0, 0.5, true, "(0, 0.5]"},
	}
	for _, o := range opt {
		if o.v == 0 {
			continue
		}
		if !finite(o.v) || o.v > o.hi || o.v < o.lo || (o.loOpen && o.v == o.lo) {
			c.add(path+"."+o.name, "%.6g is outside %s", o.v, o.rng)
		}
	}
	l.OCR, l.Dr, l.N60, l.E, l.G, l.Nu, l.Ir = ls.OCR, ls.Dr, ls.N60, ls.E, ls.G, ls.Nu, ls.Ir
	l.Delta = ls.Delta
	p.resolveCompressibility(path, l, ls, c)

	p.resolveWeights(path, l, ls, geometryOK, c)
}

// resolveWeights fixes the unit weights of layer l.
func (p *Profile) resolveWeights(path string, l *Layer, ls LayerSpec, geometryOK bool, c *collector) {
	n0 := len(c.errs)
	for _, f := range []struct {
		name string
		v    units.UnitWeight
	}{{"unit_weight", ls.UnitWeight}, {"saturated_unit_weight", ls.SaturatedUnitWeight}, {"dry_unit_weight", ls.DryUnitWeight}} {
		if f.v != 0 && (!finite(float64(f.v)) || f.v < 0 || f.v > maxUnitWeight) {
			c.add(path+"."+f.name, "%s is outside (0, %s]", f.v, maxUnitWeight)
		}
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"void_ratio", ls.VoidRatio}, {"water_content", ls.WaterContent}, {"gs", ls.Gs}, {"saturation", ls.Saturation}} {
		if !finite(f.v) || f.v < 0 {
			c.add(path+"."+f.name, "%.6g is outside [0, ∞)", f.v)
		}
	}
	if len(c.errs) > n0 {
		return
	}
	// Without usable depths, which weights are needed is unknown: ask for
	// none. Only the soil below the design ground line weighs.
	top := max(float64(l.Top), p.design)
	remains := float64(l.Bottom) > p.design
	needAbove := geometryOK && remains && (p.noWater || top < p.waterDepth)
	needBelow := geometryOK && remains && !p.noWater && float64(l.Bottom) > p.waterDepth
	gw := units.UnitWeight(p.gw)
	phaseGiven := ls.DryUnitWeight != 0 || ls.VoidRatio != 0 || ls.WaterContent != 0 || ls.Gs != 0 || ls.Saturation != 0
	if !phaseGiven {
		above, below := ls.UnitWeight, ls.SaturatedUnitWeight
		if needBelow && below == 0 {
			c.add(path+".saturated_unit_weight", "not given, and the layer lies below the water table at %s; give it, or phase data (dry_unit_weight with void_ratio, water_content with gs, …)", units.Length(p.waterDepth))
		}
		if needAbove && above == 0 {
			if below != 0 {
				above = below
				l.Basis |= SaturatedAboveWater
			} else {
				c.add(path+".unit_weight", "not given; give unit_weight, saturated_unit_weight, or phase data")
			}
		}
		if above != 0 && below != 0 && above > below {
			c.add(path+".unit_weight", "%s above water exceeds the saturated unit weight %s", above, below)
		}
		if below != 0 && below <= gw {
			c.add(path+".saturated_unit_weight", "%s is not more than γw = %s", below, gw)
		}
		l.UnitWeight, l.SaturatedUnitWeight = above, below
		if below != 0 {
			l.SubmergedUnitWeight = below - gw
		}
		return
	}
	in := phase.Input{Gs: ls.Gs, E: ls.VoidRatio, W: ls.WaterContent, S: ls.Saturation,
		Gamma: ls.UnitWeight, GammaD: ls.DryUnitWeight, GammaSat: ls.SaturatedUnitWeight, GammaW: gw,
		Zero: ls.Zero & phase.Of(phase.S, phase.W)}
	st, err := phase.Solve(in)
	var ie *phase.InsufficientError
	if errors.As(err, &ie) && ls.Saturation == 0 && ls.UnitWeight == 0 && ls.Zero == 0 {
		if ls.WaterContent == 0 {
			in.Zero = phase.Of(phase.S, phase.W)
			if st, err = phase.Solve(in); err == nil {
				l.Basis |= AssumedDry
			}
		} else {
			in.S = 1
			if st, err = phase.Solve(in); err == nil {
				l.Basis |= AssumedSaturated
			}
		}
	}
	if errors.As(err, &ie) {
		var fields []string
		for q, name := range specFields {
			if ie.Closers.Has(q) || ie.Pair.Has(q) {
				fields = append(fields, name)
			}
		}
		slices.Sort(fields)
		msg := "the phase data given do not fix the unit weights"
		if len(fields) > 0 {
			join := " or "
			if ie.Closers == 0 {
				join = " and "
			}
			msg += "; give also " + strings.Join(fields, join)
		}
		c.errs = append(c.errs, &FieldError{Path: path, Msg: msg, Err: err})
		return
	}
	if err != nil {
		c.errs = append(c.errs, &FieldError{Path: path, Msg: err.Error(), Err: err})
		return
	}
	l.Basis |= BasisPhase
	l.UnitWeight, l.SaturatedUnitWeight, l.SubmergedUnitWeight = st.Gamma, st.GammaSat, st.GammaSub
}

// specFields names the LayerSpec field of each phase quantity it has.
var specFields = map[phase.Quantity]string{
	phase.Gs: "gs", phase.E: "void_ratio", phase.W: "water_content", phase.S: "saturation",
	phase.Gamma: "unit_weight", phase.GammaD: "dry_unit_weight", phase.GammaSat: "saturated_unit_weight",
}

// porePressure evaluates the pore-pressure rule at z (the value below z
// where it jumps). It is used only while building.
func (p *Profile) porePressure(z float64, pts []PorePoint) float64 {
	if len(pts) == 0 {
		if p.noWater || z <= p.waterDepth {
			return 0
		}
		return p.gw * (z - p.waterDepth)
	}
	first, last := pts[0], pts[len(pts)-1]
	z1, u1 := float64(first.Depth), float64(first.U)
	switch {
	case z < z1:
		if u1 <= 0 {
			return 0
		}
		return math.Max(0, u1-p.gw*(z1-z))
	case z >= float64(last.Depth):
		return float64(last.U) + p.gw*(z-float64(last.Depth))
	}
	k, _ := slices.BinarySearchFunc(pts, z, func(pt PorePoint, z float64) int {
		switch {
		case float64(pt.Depth) < z:
			return -1
		case float64(pt.Depth) > z:
			return 1
		}
		return 0
	})
	// pts[k-1].Depth < z ≤ pts[k].Depth, or z == pts[0].Depth with k = 0.
	if float64(pts[k].Depth) == z {
		return float64(pts[k].U)
	}
	a, b := pts[k-1], pts[k]
	f := (z - float64(a.Depth)) / float64(b.Depth-a.Depth)
	return float64(a.U) + f*float64(b.U-a.U)
}

// boundaries returns the depths of the layer bottoms.
func (p *Profile) boundaries() []float64 {
	out := make([]float64, len(p.layers))
	for i, l := range p.layers {
		out[i] = float64(l.Bottom)
	}
	return out
}

// breakTol is the relative distance within which two break depths are
// taken as one (a nanometre on a metre).
const breakTol = 1e-9

// precompute builds the breaks and the per-interval stresses.
func (p *Profile) precompute(pts []PorePoint) {
	depth := float64(p.layers[len(p.layers)-1].Bottom)
	// A water table or design ground line a rounding error away from the
	// surface or a layer boundary is taken at it.
	snap := func(z float64) float64 {
		for _, b := range append([]float64{0}, p.boundaries()...) {
			if math.Abs(z-b) <= breakTol*math.Max(1, math.Abs(b)) {
				return b
			}
		}
		return z
	}
	if !p.noWater {
		p.waterDepth = snap(p.waterDepth)
	}
	p.design = snap(p.design)
	bs := []float64{0, depth}
	for _, l := range p.layers[:len(p.layers)-1] {
		bs = append(bs, float64(l.Bottom))
	}
	if !p.noWater {
		bs = append(bs, p.waterDepth)
	}
	for _, pt := range pts {
		bs = append(bs, float64(pt.Depth))
	}
	if len(pts) > 0 && pts[0].U > 0 {
		if z := float64(pts[0].Depth) - float64(pts[0].U)/p.gw; z > p.design {
			bs = append(bs, z) // above the design ground u is free water's
		}
	}
	if p.design > 0 {
		bs = append(bs, p.design)
	}
	bs = slices.DeleteFunc(bs, func(z float64) bool { return !(z >= 0 && z <= depth) })
	slices.Sort(bs)
	// Depths that differ by rounding only (decimal thicknesses that add up
	// to the water depth: 0.01 + 0.05 against 0.06) are one break.
	bs = slices.CompactFunc(bs, func(a, b float64) bool { return math.Abs(a-b) <= breakTol*math.Max(1, math.Abs(a)) })
	p.breaks = slices.Clip(bs)

	m := len(p.breaks) - 1
	p.sig, p.dsig, p.u, p.du = make([]float64, m), make([]float64, m), make([]float64, m), make([]float64, m)
	// At the design ground line (the surface without a cut): the
	// surcharge and any free water standing above it.
	sig := p.surcharge
	if !p.noWater && p.waterDepth < p.design {
		sig += p.gw * (p.design - p.waterDepth)
	}
	li := 0
	for i := range m {
		top, bot := p.breaks[i], p.breaks[i+1]
		mid := 0.5 * (top + bot)
		for float64(p.layers[li].Bottom) < mid {
			li++
		}
		if mid < p.design {
			// Removed by the cut: free water below the water level, or air.
			if !p.noWater && mid > p.waterDepth {
				w := p.gw * (top - p.waterDepth)
				p.sig[i], p.dsig[i], p.u[i], p.du[i] = w, p.gw, w, p.gw
			}
			continue
		}
		l := &p.layers[li]
		g := float64(l.UnitWeight)
		if !p.noWater && mid > p.waterDepth {
			g = float64(l.SaturatedUnitWeight)
		}
		p.sig[i], p.dsig[i] = sig, g
		sig += g * (bot - top)
		uTop := p.porePressure(top, pts)
		uBot := p.porePressure(mid, pts) // u is linear inside the interval
		p.u[i] = uTop
		if mid > top {
			p.du[i] = (uBot - uTop) / (mid - top)
		}
		if len(pts) > 0 && pts[0].U < 0 && top < float64(pts[0].Depth) {
			// Above a suction point u is zero; avoid round-off from the mid-point slope.
			p.u[i], p.du[i] = 0, 0
		}
	}
}

// checkEffective reports a negative effective stress at any break.
func (p *Profile) checkEffective() error {
	for i := range p.sig {
		h := p.breaks[i+1] - p.breaks[i]
		for _, z := range [2]struct{ at, sig, u float64 }{
			{p.breaks[i], p.sig[i], p.u[i]},
			{p.breaks[i+1], p.sig[i] + p.dsig[i]*h, p.u[i] + p.du[i]*h},
		} {
			if eff := z.sig - z.u; eff < -1e-9*math.Max(1, math.Abs(z.sig)) {
				return &FieldError{Path: "pore_pressures",
					Msg: fmt.Sprintf("effective stress %s at %s depth is negative: pore pressure %s exceeds total stress %s",
						units.Stress(eff), units.Length(z.at), units.Stress(z.u), units.Stress(z.sig))}
			}
		}
	}
	return nil
}

// Depth returns the depth of the profile's bottom.
func (p *Profile) Depth() units.Length { return units.Length(p.breaks[len(p.breaks)-1]) }

// NumLayers returns the number of layers.
func (p *Profile) NumLayers() int { return len(p.layers) }

// Layer returns layer i, 0 ≤ i < NumLayers(); it panics otherwise, as an
// index out of range is a programming mistake.
func (p *Profile) Layer(i int) Layer { return p.layers[i] }

// Layers returns a copy of all layers, top down.
func (p *Profile) Layers() []Layer { return slices.Clone(p.layers) }

// WaterDepth returns the depth of the water table (negative above ground)
// and false for a dry site.
func (p *Profile) WaterDepth() (units.Length, bool) { return units.Length(p.waterDepth), !p.noWater }

// WaterUnitWeight returns γw used by the profile.
func (p *Profile) WaterUnitWeight() units.UnitWeight { return units.UnitWeight(p.gw) }

// Surcharge returns the uniform surface surcharge.
func (p *Profile) Surcharge() units.Stress { return units.Stress(p.surcharge) }

// DesignGround returns the depth of the design ground line below the
// original ground surface: excavation plus general and local scour, zero
// without a cut. Above it there is no soil: no shaft resistance and no tip.
func (p *Profile) DesignGround() units.Length { return units.Length(p.design) }

// OriginalGround returns the depth of the original ground surface, from
// which every depth is measured: always zero. It is there so that code
// drawing both lines reads plainly.
func (p *Profile) OriginalGround() units.Length { return 0 }

// Refs returns the sources of the design ground line: with scour given,
// FHWA HEC-18 for its division of total scour into components that add;
// nil otherwise (an excavation is plain mechanics).
func (p *Profile) Refs() []cite.Ref {
	if p.design <= p.excavation {
		return nil
	}
	return []cite.Ref{{Source: cite.Richardson2001, Where: "ch. 2, total scour"}}
}

// GroundLines returns the depths of the original ground, the excavation
// floor, the general scour line and the design ground line.
func (p *Profile) GroundLines() GroundLines {
	return GroundLines{Excavation: units.Length(p.excavation), GeneralScour: units.Length(p.general),
		Design: units.Length(p.design)}
}

// Breaks returns, sorted and distinct, every depth where the profile
// changes, from 0 to Depth() inclusive: layer boundaries, the water table,
// pore-pressure points, where u reaches zero above the first point, and
// the design ground line.
// Between two consecutive breaks σv and u are linear, so a shaft cut at the
// breaks integrates them exactly. The slice is a copy.
func (p *Profile) Breaks() []units.Length {
	out := make([]units.Length, len(p.breaks))
	for i, b := range p.breaks {
		out[i] = units.Length(b)
	}
	return out
}

// interval returns the index of the interval holding z: breaks[i] ≤ z <
// breaks[i+1], and the last interval for z = Depth().
func (p *Profile) interval(z units.Length) (int, error) {
	zf := float64(z)
	bottom := p.breaks[len(p.breaks)-1]
	if !(zf >= 0 && zf <= bottom) {
		return 0, &DepthError{Depth: z, Top: 0, Bottom: units.Length(bottom), What: "profile"}
	}
	lo, hi := 0, len(p.breaks)-2 // answer in [lo, hi]
	for lo < hi {
		mid := int(uint(lo+hi+1) >> 1)
		if p.breaks[mid] <= zf {
			lo = mid
		} else {
			hi = mid - 1
		}
	}
	return lo, nil
}

// TotalStress returns σv at depth z in [0, Depth()]:
//
//	σv(z) = q + γw·hw + Σ γi·Δzi
func (p *Profile) TotalStress(z units.Length) (units.Stress, error) {
	i, err := p.interval(z)
	if err != nil {
		return 0, err
	}
	return units.Stress(p.sig[i] + p.dsig[i]*(float64(z)-p.breaks[i])), nil
}

// PorePressure returns u at depth z in [0, Depth()] (see the package doc for
// the rule).
func (p *Profile) PorePressure(z units.Length) (units.Stress, error) {
	i, err := p.interval(z)
	if err != nil {
		return 0, err
	}
	return units.Stress(p.u[i] + p.du[i]*(float64(z)-p.breaks[i])), nil
}

// EffectiveStress returns σ′v = σv − u at depth z in [0, Depth()].
func (p *Profile) EffectiveStress(z units.Length) (units.Stress, error) {
	i, err := p.interval(z)
	if err != nil {
		return 0, err
	}
	dz := float64(z) - p.breaks[i]
	return units.Stress(p.sig[i] + p.dsig[i]*dz - p.u[i] - p.du[i]*dz), nil
}

// StressesAt returns σv, u and σ′v at depth z in [0, Depth()].
func (p *Profile) StressesAt(z units.Length) (Stresses, error) {
	i, err := p.interval(z)
	if err != nil {
		return Stresses{}, err
	}
	dz := float64(z) - p.breaks[i]
	s, u := p.sig[i]+p.dsig[i]*dz, p.u[i]+p.du[i]*dz
	return Stresses{units.Stress(s), units.Stress(u), units.Stress(s - u)}, nil
}

// LayerAt returns the index of the layer at depth z. At a boundary the
// layer below wins; at the bottom of the profile, the last layer.
func (p *Profile) LayerAt(z units.Length) (int, error) {
	if err := p.checkDepth(z); err != nil {
		return 0, err
	}
	// the first layer whose bottom lies below z
	lo, hi := 0, len(p.layers)
	for lo < hi {
		m := int(uint(lo+hi) >> 1)
		if p.layers[m].Bottom <= z {
			lo = m + 1
		} else {
			hi = m
		}
	}
	return min(lo, len(p.layers)-1), nil
}

// LayerAbove returns the index of the layer at depth z where, at a
// boundary, the layer above wins; z = 0 gives the first layer. Use it for a
// segment that ends at z.
func (p *Profile) LayerAbove(z units.Length) (int, error) {
	if err := p.checkDepth(z); err != nil {
		return 0, err
	}
	// the first layer whose bottom lies at or below z
	lo, hi := 0, len(p.layers)
	for lo < hi {
		m := int(uint(lo+hi) >> 1)
		if p.layers[m].Bottom < z {
			lo = m + 1
		} else {
			hi = m
		}
	}
	return min(lo, len(p.layers)-1), nil
}

// LayerOf returns the index of the one layer holding the segment from top
// to bottom (top < bottom, both in [0, Depth()]); it returns an error when
// the segment crosses a layer boundary.
func (p *Profile) LayerOf(top, bottom units.Length) (int, error) {
	i, err := p.LayerAt(top)
	if err != nil {
		return 0, err
	}
	j, err := p.LayerAbove(bottom)
	if err != nil {
		return 0, err
	}
	if !(bottom > top) {
		return 0, fmt.Errorf("profile: segment from %s to %s: bottom must be below top", top, bottom)
	}
	if i != j {
		return 0, fmt.Errorf("profile: segment from %s to %s crosses the boundary at %s between %s and %s",
			top, bottom, p.layers[i].Bottom, p.layers[i].Name, p.layers[j].Name)
	}
	return i, nil
}

func (p *Profile) checkDepth(z units.Length) error {
	bottom := p.breaks[len(p.breaks)-1]
	if !(float64(z) >= 0 && float64(z) <= bottom) {
		return &DepthError{Depth: z, Top: 0, Bottom: units.Length(bottom), What: "profile"}
	}
	return nil
}

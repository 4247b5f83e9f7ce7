package pile

import (
	"errors"
	"fmt"
	"math"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// Pile is one pile: its section, where it sits, how it is installed.
type Pile struct {
	Section Section
	// Length is the pile length from head to tip, > 0.
	Length units.Length
	// HeadDepth is the depth of the pile head below the ground surface, ≥ 0.
	HeadDepth    units.Length
	Installation Installation
	// Surface is the shaft's interface for the default δ/φ′; zero picks
	// the default for the section and installation (see DefaultSurface).
	Surface shaft.Surface
	// Plug says how an open pipe or H-section mobilises tip and shaft.
	Plug Plug
	// Modulus is Young's modulus of the pile material (used by settlement
	// analyses; not by capacity). Zero means not given.
	Modulus units.Stress
	// UnitWeight is the unit weight of the pile material, for its
	// self-weight; zero means the pile's weight is not counted.
	UnitWeight units.UnitWeight
}

// Tip returns the tip depth below ground, HeadDepth + Length.
func (p Pile) Tip() units.Length { return p.HeadDepth + p.Length }

// DefaultSurface returns the interface used for δ/φ′ when Pile.Surface is
// zero: rough concrete for bored and augered piles (concrete cast against
// soil), smooth steel for steel pipes and H-sections (new steel, the
// "coated or new" class of Kulhawy's (1984) δ/φ′ table; rough steel is for
// corrugated or heavily rusted steel and must be chosen through
// Pile.Surface), and smooth concrete for driven solid sections (precast).
// These are our defaults within Kulhawy's (1984) categories; give
// Pile.Surface to choose another.
func DefaultSurface(sec Section, inst Installation) shaft.Surface {
	switch {
	case inst == Bored || inst == Augered:
		return shaft.RoughConcrete
	case sec.Shape == ClosedPipe || sec.Shape == OpenPipe || sec.Shape == HSection:
		return shaft.SmoothSteel
	default:
		return shaft.SmoothConcrete
	}
}

// SelfWeight says how the pile's own weight enters compression capacity.
type SelfWeight int

const (
	// WeightIgnored, the default, takes Rc = Qp + Qs: the pile's weight is
	// taken to balance the overburden it displaces at the tip, as Das
	// (2019, §12.5) and most hand methods assume.
	WeightIgnored SelfWeight = iota
	// WeightNet takes Rc = (qp − σ′v,tip)·Ab + Qs: the net tip
	// resistance, with the pile's weight ignored.
	WeightNet
	// WeightGross takes Rc = Qp + Qs − W′: the gross tip resistance with
	// the pile's effective (buoyant below water) weight subtracted.
	WeightGross
)

var weightIDs = [...]string{WeightIgnored: "ignored", WeightNet: "net", WeightGross: "gross"}

// String returns "ignored", "net" or "gross".
func (w SelfWeight) String() string {
	if w >= 0 && int(w) < len(weightIDs) {
		return weightIDs[w]
	}
	return fmt.Sprintf("SelfWeight(%d)", int(w))
}

// ParseSelfWeight reads "ignored", "net" or "gross".
func ParseSelfWeight(s string) (SelfWeight, error) {
	for w := WeightIgnored; w <= WeightGross; w++ {
		if weightIDs[w] == s {
			return w, nil
		}
	}
	return 0, fmt.Errorf("self_weight %q: want ignored, net or gross", s)
}

// TensionFactor multiplies the compression unit shaft resistance to give
// the resistance in tension (uplift), layer by layer by drainage class:
//
//	fs,t = t·fs,  t = Drained or Undrained by the layer's class (Value where 0)
//
// Value is one factor for every layer (a factor given as one number);
// Drained and Undrained, where not 0, replace it for their class. Every
// factor used must lie in (0, 1]. The zero value means DefaultTension.
type TensionFactor struct {
	Name               string  // identifier: "default", "same" or "given"
	Value              float64 // the factor for every layer, (0, 1]; 0 when both classes are given
	Drained, Undrained float64 // the factor for drained and undrained layers, (0, 1]; 0 takes Value
	Refs               []cite.Ref
}

// For returns the factor of a layer of drainage class d.
func (t TensionFactor) For(d profile.Drainage) float64 {
	switch {
	case d == profile.Drained && t.Drained != 0:
		return t.Drained
	case d == profile.Undrained && t.Undrained != 0:
		return t.Undrained
	}
	return t.Value
}

// Validate checks that the factor of each drainage class is in (0, 1].
func (t TensionFactor) Validate(path string) error {
	for _, c := range []struct {
		name string
		d    profile.Drainage
		own  float64
	}{{"drained", profile.Drained, t.Drained}, {"undrained", profile.Undrained, t.Undrained}} {
		v := t.For(c.d)
		if !(v > 0 && v <= 1) {
			field := path
			if c.own != 0 {
				field += "." + c.name
			}
			return &FieldError{Field: field, Value: v, Range: "(0, 1]", Note: "ratio of shaft resistance in tension to compression in " + c.name + " layers"}
		}
	}
	return nil
}

// Unreduced reports whether drained layers keep their full compression
// shaft resistance in tension, switching off the published reduction of
// DefaultTension: a choice the output should show as a warning.
func (t TensionFactor) Unreduced() bool { return t.For(profile.Drained) >= 1 }

// DefaultTension is the default: in drained layers the shaft resistance in
// tension is 0.7 times that in compression, in undrained layers the same.
// De Nicola & Randolph (1993) find the ratio of tension to compression
// shaft capacity of piles in sand about 0.7 to 0.85, falling with the
// pile's slenderness and the sand's stiffness relative to the pile's (from
// memory: the paper could not be read here); we take the lower end, the
// conservative side. In clay API RP 2GEO (2011) takes the same unit
// friction in both directions (from memory).
func DefaultTension() TensionFactor {
	return TensionFactor{Name: "default", Drained: 0.7, Undrained: 1,
		Refs: []cite.Ref{{Source: cite.DeNicolaRandolph1993, Where: "ratio of tension to compression shaft capacity in sand (from memory)"},
			{Source: cite.API2011, Where: "axial pile capacity, shaft friction in clay in either direction (from memory)"}}}
}

// TensionSame takes the same unit shaft friction in tension as in
// compression in every layer, as API RP 2GEO (2011) does for piles in clay
// and sand (from memory: the API sand and clay rules carry no reduction
// for load direction). In drained layers it switches off the reduction of
// DefaultTension (see Unreduced).
func TensionSame() TensionFactor {
	return TensionFactor{Name: "same", Value: 1,
		Refs: []cite.Ref{{Source: cite.API2011, Where: "axial pile capacity, shaft friction in tension"}}}
}

// LayerMethods overrides the methods for one layer. A nil field keeps the
// default for the layer's drainage class.
type LayerMethods struct {
	Tip   bearing.Tip
	Shaft shaft.Unit
	// Lambda selects the λ method for this layer's shaft (undrained
	// layers only); LambdaValue, if > 0, is a λ given instead of read
	// from the table.
	Lambda      bool
	LambdaValue float64
	// NoShaft marks the layer as carrying no shaft friction (fill that will
	// settle, a layer cased off).
	NoShaft bool
}

// Zone is a depth range along the pile that carries no shaft friction: a
// length below the head, a disturbed zone, a casing. A zone keeps the
// soil's weight in σ′v below it; for scour or an excavation, which remove
// it, give profile.Spec's Scour and ExcavationDepth instead.
type Zone struct {
	Top, Bottom units.Length // depths below ground, Top < Bottom
}

// Methods chooses the methods of an analysis. The zero value is a valid
// choice: every rule that lowers capacity (the weak-layer reduction, the
// embedment ramp, the drilled-shaft zones without side resistance) is on
// in it and is switched off only through a No… field, which raises a
// warning flag. A nil method takes the default:
//
//	TipDrained      bearing.Meyerhof{} (driven, jetted), bearing.BoredSand{} (bored, augered:
//	                the drilled-shaft N60 rule where N60 is given, else ⅓ of Meyerhof's
//	                driven value, capped, with the large-base reduction)
//	TipUndrained    bearing.Skempton{} (Nc = 9)
//	ShaftDrained    shaft.Beta{K: Kulhawy K/K0 by installation, δ: Kulhawy δ/φ′ by surface}
//	ShaftUndrained  shaft.AlphaAPI{} (driven), shaft.AlphaDrilled{} (bored, augered)
type Methods struct {
	TipDrained     bearing.Tip
	TipUndrained   bearing.Tip
	ShaftDrained   shaft.Unit
	ShaftUndrained shaft.Unit
	// UndrainedLambda selects the λ method for every undrained layer.
	UndrainedLambda bool
	// Layers overrides methods layer by layer, by layer index; it may be
	// shorter than the profile.
	Layers []LayerMethods
	// CriticalDepth, if > 0, is the ratio n of the critical depth zc = n·D
	// below which σ′v is held constant for shaft friction (5 to 50), in
	// drained layers whose shaft method is of the β family (β, β given,
	// Burland's β, the API sand β, the drilled-shaft β); α, λ and other
	// methods always take σ′v itself.
	CriticalDepth float64
	// NoShaft lists depth ranges that carry no shaft friction.
	NoShaft []Zone
	// Tension is the factor on shaft resistance in tension; the zero value
	// means DefaultTension.
	Tension TensionFactor
	// SelfWeight says how the pile's weight enters compression.
	SelfWeight SelfWeight
	// LayeredTip turns on Meyerhof's (1976) rule for a tip less than ten
	// diameters into a stronger layer; true by default through
	// DefaultMethods. WeakBelow, the depth below the tip searched for a
	// weaker layer, in diameters; 0 means 3.
	LayeredTip bool
	WeakBelow  float64
	// NoWeakLayer turns off Meyerhof's (1976) reduction of the unit tip
	// resistance within WeakZoneRatio (10) diameters above a weaker layer
	// (see WeakZoneRatio); the WeakLayerOff flag is then raised wherever
	// the rule would have applied.
	NoWeakLayer bool
	// NoEmbedment turns off Meyerhof's (1976) ramp of the unit tip
	// resistance with embedment in a drained bearing layer that starts at
	// the ground surface (see EmbedmentRatio); the EmbedmentOff flag is then
	// raised wherever the ramp would have applied.
	NoEmbedment bool
	// EmbedmentRatio is the critical embedment ratio (Lb/D)cr of that
	// ramp; 0 means DefaultEmbedmentRatio (10), else 1 to 50.
	EmbedmentRatio float64
	// NoDrilledZones turns off, for bored and augered piles, the exclusion
	// of side resistance from the top DrilledTopZone (1.5 m) and the bottom
	// diameter of the shaft in layers using the drilled-shaft α
	// (shaft.AlphaDrilled; O'Neill & Reese 1999); the DrilledZonesOff flag
	// is then raised.
	NoDrilledZones bool
	// NoLambdaCap switches off the λ method's cap fav ≤ s̄u (α ≤ 1), with
	// the warning LambdaCapOff.
	NoLambdaCap bool
	// Clamp lets chart methods read outside their charts at the edge (a
	// warning is raised) instead of failing.
	Clamp bool
	// Pa is the atmospheric (reference) pressure of the methods that read
	// one (Meyerhof's limit, the drilled-shaft α and β, Vesic's Δ
	// correlation, the bored-pile rules); zero means 100 kPa. US practice
	// often writes 2000 psf (Das) or 2116 psf (one atmosphere); the methods
	// accept 80 to 120 kPa.
	Pa units.Stress
}

// DefaultMethods returns the defaults described on Methods, with
// Meyerhof's layered-tip rule on.
func DefaultMethods() Methods { return Methods{LayeredTip: true} }

// Options adjust an analysis for a design case.
type Options struct {
	// Case, if not nil, supplies resistance multipliers (by method
	// identifier) and soil factors; the analysis then also reports design
	// resistances. Nil means characteristic values only.
	Case *Case
}

// lambdaID is the identifier under which design bases find a factor for
// the λ method.
const lambdaID = "lambda"

// layerPlan is one layer's resolved methods and parameters.
type layerPlan struct {
	layer   *profile.Layer // a.layers[i], shared read only
	phi     units.Angle    // φ′ after soil factors
	c       units.Stress   // c′ after soil factors
	su0     units.Stress   // su at top after soil factors
	su1     units.Stress   // su at bottom after soil factors
	k0      float64        // (1 − sinφ′)·OCR^sinφ′ for Vesic's σ′o
	tip     bearing.Tip
	shaft   shaft.Unit
	lambda  bool
	lamVal  float64
	noShaft bool
	// design multipliers
	fTip, fShaft, fTension float64
	// tip reduced to factors, and the tip at the layer's bottom and top
	// (for the layered-tip rule and the weak-layer check)
	tm             tipModel
	qpTop, qpBot   float64
	errTop, errBot error
	// the tip at the layer's top and bottom after the embedment ramp and
	// the layered rule (base*), and at its top after the weak-layer rule
	// too (effTop): the values the rules of the layers around it read
	baseTop, baseBot float64
	effTop           float64
	errEff           error
	// drilled: the layer's shaft is the drilled-shaft α of a bored or
	// augered pile with the zones without side resistance in force.
	// drilledOff: it would be, but Methods.NoDrilledZones is set.
	drilled, drilledOff bool
	// held: σ′v is held below the critical depth for this layer's shaft
	// (β-family methods in drained layers only).
	held bool
	// spt: the tip method is an SPT rule (the drilled-shaft N60 rule),
	// whose calibration already covers embedment, so Meyerhof's
	// embedment ramp, a rule of his bearing-factor method, does not apply.
	spt bool
	// cone: the tip method is a direct CPT method (ConeTip), to which
	// Meyerhof's tip rules (embedment ramp, layered, weak layer) do not
	// apply.
	cone bool
	// closed-form integration (see classify)
	kind  int
	coef  float64
	cap   units.Stress
	flags shaft.Flags
}

// Analysis is a prepared pile-in-profile calculation. NewAnalysis resolves
// the methods of every layer and the depths at which the shaft is split;
// Capacity then computes without allocating.
type Analysis struct {
	prof      *profile.Profile
	pile      Pile
	methods   Methods
	plans     []layerPlan
	layers    []profile.Layer // prof's layers, read only (shared with the analyses made from this one)
	splits    []float64       // sorted depths where the shaft is split (profile breaks, zc, zones, kinks)
	iv        []interval
	zc        float64 // critical depth, 0 for none
	svc       float64 // σ′v at the critical depth
	size      float64 // section size D
	outer     float64 // outer perimeter
	inner     float64 // inner perimeter
	gross     float64 // gross area
	mat       float64 // material area
	lambda    shaft.Lambda
	tension   TensionFactor
	useCase   bool
	cs        Case
	weakBelow float64
	embedN    float64     // (Lb/D)cr of the embedment ramp
	drilled   bool        // some layer has the drilled-shaft zones in force
	dp        []depthPlan // per interval: how capacity with depth treats it (prepareDepth)
}

// Validate checks the pile's geometry and installation.
func (p Pile) Validate() error {
	var errs []error
	if err := p.Section.Validate("pile.section"); err != nil {
		errs = append(errs, err)
	}
	if !(p.Length > 0) || math.IsInf(float64(p.Length), 0) {
		errs = append(errs, pathErrorf("pile.length", "%v is outside (0, ∞) m", p.Length))
	}
	if !(p.HeadDepth >= 0) || math.IsInf(float64(p.HeadDepth), 0) {
		errs = append(errs, pathErrorf("pile.head_depth", "%v is outside 0 to ∞ m", p.HeadDepth))
	}
	if p.Installation < DrivenHigh || p.Installation > Jetted {
		errs = append(errs, pathErrorf("pile.installation", "%d: want one of driven-high, driven-low, bored, augered, jetted", int(p.Installation)))
	}
	if p.Plug < PlugLesser || p.Plug > Unplugged {
		errs = append(errs, pathErrorf("pile.plug", "%d: want lesser, plugged or unplugged", int(p.Plug)))
	}
	if !(p.UnitWeight >= 0) || p.UnitWeight > 100*units.KilonewtonPerCubicMetre {
		errs = append(errs, pathErrorf("pile.unit_weight", "%v is outside 0 to 100 kN/m3", p.UnitWeight))
	}
	if !(p.Modulus >= 0) || math.IsInf(float64(p.Modulus), 0) {
		errs = append(errs, pathErrorf("pile.youngs_modulus", "%v is outside 0 to ∞ kPa", p.Modulus))
	}
	return errors.Join(errs...)
}

// NewAnalysis prepares the analysis of pile p in profile prof with methods
// m. The pile tip must lie within the profile.
func NewAnalysis(prof *profile.Profile, p Pile, m Methods, opt *Options) (*Analysis, error) {
	return newAnalysis(prof, p, m, opt, nil)
}

// newAnalysis is NewAnalysis; with tips not nil it takes the layers' tip
// models, their tips at the layers' ends and the rules of the tip zone
// from tips instead of working them out again. These read the profile, the
// section, the layers' tip methods and parameters after the soil factors,
// and the tip options; never the shaft methods nor a design case's
// multipliers. So tips must be an analysis of the same profile and pile
// whose methods differ from m at most in the layers' shaft methods
// (WithShafts) and whose soil factors are those of opt's case (tipsFor).
func newAnalysis(prof *profile.Profile, p Pile, m Methods, opt *Options, tips *Analysis) (*Analysis, error) {
	if prof == nil {
		return nil, errors.New("pile: NewAnalysis: nil profile")
	}
	if err := p.Validate(); err != nil {
		return nil, err
	}
	if p.Tip() > prof.Depth() {
		return nil, pathErrorf("pile.length", "tip at %v is below the bottom of the ground profile at %v; extend the profile or shorten the pile", p.Tip(), prof.Depth())
	}
	if zd := prof.DesignGround(); p.Tip() <= zd {
		return nil, pathErrorf("pile.length", "tip at %v is not below the design ground line at %v (excavation and scour); lengthen the pile", p.Tip(), zd)
	}
	a := &Analysis{prof: prof, pile: p, methods: m}
	if opt != nil && opt.Case != nil {
		a.useCase = true
		a.cs = *opt.Case
	} else {
		a.cs = Case{TanPhi: 1, Su: 1}
	}
	if !(a.cs.TanPhi >= 1) || !(a.cs.Su >= 1) || math.IsInf(a.cs.TanPhi, 0) || math.IsInf(a.cs.Su, 0) {
		return nil, pathErrorf("design", "soil factors on tanφ′ (%g) and su (%g) must be 1 or more", a.cs.TanPhi, a.cs.Su)
	}
	a.size = float64(p.Section.Size())
	a.outer = float64(p.Section.OuterPerimeter())
	a.inner = float64(p.Section.InnerPerimeter())
	a.gross = float64(p.Section.GrossArea())
	a.mat = float64(p.Section.MaterialArea())
	a.lambda = shaft.Lambda{Extrapolate: m.Clamp, NoCap: m.NoLambdaCap}
	a.tension = m.Tension
	if a.tension.Name == "" && a.tension.Value == 0 && a.tension.Drained == 0 && a.tension.Undrained == 0 {
		if tips != nil {
			a.tension = tips.tension // the same default (the methods agree), read only
		} else {
			a.tension = DefaultTension()
		}
	}
	if err := a.tension.Validate("methods.tension_shaft_ratio"); err != nil {
		return nil, err
	}
	a.weakBelow = m.WeakBelow
	if a.weakBelow == 0 {
		a.weakBelow = 3
	}
	if !(a.weakBelow > 0 && a.weakBelow <= 20) {
		return nil, pathErrorf("methods.weak_below", "%g diameters is outside (0, 20]", m.WeakBelow)
	}
	a.embedN = m.EmbedmentRatio
	if a.embedN == 0 {
		a.embedN = DefaultEmbedmentRatio
	}
	if !(a.embedN >= 1 && a.embedN <= 50) {
		return nil, pathErrorf("methods.embedment_ratio", "%g is outside 1 to 50 (0 for %g)", m.EmbedmentRatio, float64(DefaultEmbedmentRatio))
	}
	if len(m.Layers) > prof.NumLayers() {
		return nil, pathErrorf("methods.layers", "%d entries for a profile of %d layers", len(m.Layers), prof.NumLayers())
	}
	if m.CriticalDepth != 0 {
		zc, err := (shaft.CriticalDepth{Ratio: m.CriticalDepth}).Depth(p.Section.Size())
		if err != nil {
			return nil, pathErrorf("methods.critical_depth", "%w", err)
		}
		a.zc = float64(zc)
		if zc >= prof.Depth() {
			a.zc = 0 // below the profile: it never governs
		} else {
			svc, err := prof.EffectiveStress(zc)
			if err != nil {
				return nil, err
			}
			a.svc = float64(svc)
		}
	}
	var errs []error
	if tips != nil {
		a.layers = tips.layers
	} else {
		a.layers = prof.Layers()
	}
	a.plans = make([]layerPlan, 0, prof.NumLayers())
	for i := 0; i < prof.NumLayers(); i++ {
		lp, err := a.plan(i)
		if err == nil {
			err = a.classify(i, &lp)
		}
		if err != nil {
			errs = append(errs, err)
		}
		a.plans = append(a.plans, lp)
	}
	for i, z := range m.NoShaft {
		if !(z.Top >= 0 && z.Bottom > z.Top) || math.IsInf(float64(z.Bottom), 0) {
			errs = append(errs, pathErrorf(fmt.Sprintf("methods.no_shaft[%d]", i), "from %v to %v: want 0 ≤ top < bottom", z.Top, z.Bottom))
		}
	}
	if err := errors.Join(errs...); err != nil {
		return nil, err
	}
	a.resolveFactors()
	// Split depths: the profile's breaks, the critical depth, the zones.
	for _, b := range prof.Breaks() {
		a.splits = append(a.splits, float64(b))
	}
	if a.zc > 0 {
		a.splits = append(a.splits, a.zc)
	}
	for _, z := range m.NoShaft {
		a.splits = append(a.splits, float64(z.Top), float64(z.Bottom))
	}
	if a.drilled {
		if zt := a.drilledTop(); zt < float64(prof.Depth()) {
			a.splits = append(a.splits, zt)
		}
	}
	a.splits = sortUnique(a.splits)
	if err := a.buildIntervals(); err != nil {
		return nil, err
	}
	if k := a.kinkSplits(); len(k) > 0 {
		a.splits = sortUnique(append(a.splits, k...))
		if err := a.buildIntervals(); err != nil {
			return nil, err
		}
	}
	a.markRanges()
	if tips != nil {
		for i := range a.plans {
			lp, tp := &a.plans[i], &tips.plans[i]
			lp.tm, lp.qpTop, lp.qpBot, lp.errTop, lp.errBot = tp.tm, tp.qpTop, tp.qpBot, tp.errTop, tp.errBot
			lp.baseTop, lp.baseBot, lp.effTop, lp.errEff = tp.baseTop, tp.baseBot, tp.effTop, tp.errEff
		}
		a.prepareDepth()
		return a, nil
	}
	for i := range a.plans {
		lp := &a.plans[i]
		lp.tm = a.buildTipModel(lp)
		lp.qpTop, lp.errTop = a.directTip(lp, float64(lp.layer.Top))
		lp.qpBot, lp.errBot = a.directTip(lp, float64(lp.layer.Bottom))
	}
	a.prepareTipRules()
	return a, nil
}

func sortUnique(x []float64) []float64 {
	// insertion sort: the list is short and nearly sorted
	for i := 1; i < len(x); i++ {
		for j := i; j > 0 && x[j] < x[j-1]; j-- {
			x[j], x[j-1] = x[j-1], x[j]
		}
	}
	out := x[:0]
	for i, v := range x {
		if i == 0 || v != out[len(out)-1] {
			out = append(out, v)
		}
	}
	return out
}

// plan resolves layer i's methods and factored parameters.
func (a *Analysis) plan(i int) (layerPlan, error) {
	l := &a.layers[i]
	m := a.methods
	path := func() string { return fmt.Sprintf("layers[%d]", i) } // for an error only
	lp := layerPlan{layer: l}
	// Soil factors (EN 1997-1 M2): tanφ′d = tanφ′/γφ, c′d = c′/γc, sud = su/γcu.
	lp.phi = units.Atan(l.Phi.Tan() / a.cs.TanPhi)
	lp.c = l.Cohesion / units.Stress(a.cs.TanPhi)
	lp.su0 = l.SuTop / units.Stress(a.cs.Su)
	lp.su1 = l.SuBottom / units.Stress(a.cs.Su)
	ocr := l.OCR
	if ocr == 0 {
		ocr = 1
	}
	if l.Phi > 0 {
		s := lp.phi.Sin()
		lp.k0 = (1 - s) * math.Pow(ocr, s)
	}
	var over LayerMethods
	if i < len(m.Layers) {
		over = m.Layers[i]
	}
	drained := l.Drainage == profile.Drained
	// Tip.
	switch {
	case over.Tip != nil:
		lp.tip = over.Tip
	case drained && m.TipDrained != nil:
		lp.tip = m.TipDrained
	case drained && (a.pile.Installation == Bored || a.pile.Installation == Augered):
		// The driven-pile chart and limit unreduced overstate a bored
		// pile's tip; see bearing.BoredSand.
		lp.tip = bearing.BoredSand{}
	case drained:
		lp.tip = bearing.Meyerhof{}
	case m.TipUndrained != nil:
		lp.tip = m.TipUndrained
	default:
		lp.tip = bearing.Skempton{}
	}
	switch lp.tip.(type) {
	case ConeTip:
		lp.cone = true
	case bearing.ShaftSand:
		lp.spt = true
	case bearing.BoredSand:
		lp.spt = l.N60 > 0 // BoredSand takes the N60 rule where N60 is given
	}
	// Shaft.
	lp.noShaft = over.NoShaft
	switch {
	case over.Shaft != nil:
		lp.shaft = over.Shaft
	case over.Lambda || (!drained && m.UndrainedLambda):
		if drained {
			return lp, pathErrorf(path()+".shaft", "layer %q: the λ method applies to undrained layers only", l.Name)
		}
		lp.lambda = true
		lp.lamVal = over.LambdaValue
		if over.LambdaValue != 0 && !(over.LambdaValue > 0 && over.LambdaValue <= 1) {
			return lp, pathErrorf(path()+".shaft.lambda", "layer %q: %g is outside (0, 1]", l.Name, over.LambdaValue)
		}
	case drained && m.ShaftDrained != nil:
		lp.shaft = m.ShaftDrained
	case drained:
		k, err := shaft.KOverK0For(a.pile.Installation)
		if err != nil {
			return lp, pathErrorf(path()+".shaft", "layer %q: %w", l.Name, err)
		}
		surf := a.pile.Surface
		if surf == 0 {
			surf = DefaultSurface(a.pile.Section, a.pile.Installation)
		}
		d, err := shaft.DeltaOverPhiFor(surf)
		if err != nil {
			return lp, pathErrorf(path()+".shaft", "layer %q: %w", l.Name, err)
		}
		lp.shaft = shaft.Beta{K: k, Delta: d}
	case m.ShaftUndrained != nil:
		lp.shaft = m.ShaftUndrained
	case a.pile.Installation == Bored || a.pile.Installation == Augered:
		lp.shaft = shaft.AlphaDrilled{}
	default:
		lp.shaft = shaft.AlphaAPI{}
	}
	// Methods that need N60 and have none: an error naming the field, never
	// a tip or a friction of zero.
	if l.N60 == 0 {
		if needsN60Tip(lp.tip) {
			return lp, pathErrorf(fmt.Sprintf("layers[%d].n60", i), "layer %q has no N60 and its tip method %q needs it; give n60 (above 0, at most 300) or choose another tip method", l.Name, lp.tip.ID())
		}
		if !lp.lambda && needsN60Shaft(lp.shaft) {
			return lp, pathErrorf(fmt.Sprintf("layers[%d].n60", i), "layer %q has no N60 and its shaft method %q needs it; give n60 (above 0, at most 300) or choose another shaft method", l.Name, lp.shaft.ID())
		}
	}
	lp.held = drained && !lp.lambda && betaFamily(lp.shaft)
	if !lp.lambda && !lp.noShaft && drilledAlpha(lp.shaft) && (a.pile.Installation == Bored || a.pile.Installation == Augered) {
		if m.NoDrilledZones {
			lp.drilledOff = true
		} else {
			lp.drilled = true
			a.drilled = true
		}
	}
	// Design multipliers.
	lp.fTip, lp.fShaft, lp.fTension = 1, 1, 1
	if a.useCase {
		sid := lambdaID
		if !lp.lambda {
			sid = lp.shaft.ID()
		}
		lp.fTip = factor(a.cs.Tip, lp.tip.ID())
		lp.fShaft = factor(a.cs.Shaft, sid)
		lp.fTension = factor(a.cs.Tension, sid)
		// A missing factor is an error only where the layer is used (see
		// segment and tipAt): a layer below the tip needs none.
	}
	return lp, nil
}

// directTip evaluates layer lp's tip method at depth z (clamped into the
// layer) with the layer's own parameters.
func (a *Analysis) directTip(lp *layerPlan, z float64) (float64, error) {
	in, err := a.tipInput(lp, z)
	if err != nil {
		return 0, err
	}
	r, err := lp.tip.Tip(in)
	if err != nil {
		return 0, err
	}
	return float64(r.Qp), nil
}

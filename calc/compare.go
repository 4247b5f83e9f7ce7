package calc

import (
	"sync"

	"github.com/qultgeo/qult/bearing"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/shaft"
	"github.com/qultgeo/qult/units"
)

// Comparison is the shaft and tip resistance of the same pile in the same
// ground by every applicable method of the catalogues that needs no key
// of its own: each shaft method applied to every embedded layer of its
// drainage class (the other layers keep the file's methods), each tip
// method applied to every layer of the bearing layer's class. The rules
// of the run (limits, critical depth, tip rules, zones without friction,
// layers whose shaft is set to none) stay as the file chose them.
type Comparison struct {
	// Shaft holds one group per drainage class of the embedded layers
	// (drained first); Tip one group for the bearing layer's class.
	Shaft []CompareGroup
	Tip   []CompareGroup
}

// CompareGroup is the methods of one drainage class.
type CompareGroup struct {
	Drainage string // "drained" or "undrained"
	// Layers names the layers the methods were applied to.
	Layers []string
	Rows   []CompareRow
}

// CompareRow is one method's result.
type CompareRow struct {
	Method   string // catalogue identifier
	Equation string
	// Force is Qs of the group's layers (shaft) or Qp (tip); Total is the
	// shaft Qs of every layer (shaft groups) or the compression Rc (tip
	// groups), with the other choices as in the file.
	Force, Total units.Force
	// Chosen marks the method the file uses for every layer of the group.
	Chosen bool
	// NotApplied says why the method gave no value (its range, a missing
	// input); Force and Total are then zero.
	NotApplied string
}

// Spread returns the least and greatest Force of the rows that gave a
// value, and how many did; n < 1 means none did.
func (g CompareGroup) Spread() (lo, hi units.Force, n int) {
	for _, r := range g.Rows {
		if r.NotApplied != "" {
			continue
		}
		if n == 0 || r.Force < lo {
			lo = r.Force
		}
		if n == 0 || r.Force > hi {
			hi = r.Force
		}
		n++
	}
	return lo, hi, n
}

// shaftCatalogue and tipCatalogue are the method tables, copied once: the
// comparison only reads them (shaft.Methods and bearing.Methods copy the
// table at every call).
var (
	shaftCatalogue = sync.OnceValue(shaft.Methods)
	tipCatalogue   = sync.OnceValue(bearing.Methods)
)

// compare computes the Comparison of pile p in prof with the file's
// methods m; b is the file's own breakdown (for the methods chosen) and
// base, when not nil, the analysis it came from (pile.NewAnalysis(prof,
// p, m, nil)), which compare then does not build again.
func compare(base *pile.Analysis, prof *profile.Profile, p pile.Pile, m pile.Methods, b pile.Breakdown) *Comparison {
	layers := prof.Layers()
	embedded := map[int]bool{}
	for _, r := range b.Rows {
		embedded[r.Layer] = true
	}
	surf := p.Surface
	if surf == 0 {
		surf = pile.DefaultSurface(p.Section, p.Installation)
	}
	// withLayers returns m with the layers of class cls set by set.
	withLayers := func(cls profile.Drainage, set func(lm *pile.LayerMethods)) pile.Methods {
		mm := m
		mm.Layers = make([]pile.LayerMethods, len(layers))
		copy(mm.Layers, m.Layers)
		for i, l := range layers {
			if l.Drainage == cls {
				set(&mm.Layers[i])
			}
		}
		return mm
	}
	// The file's own analysis and its shaft, segment by segment: a method
	// compared in the layers of one class leaves the other layers' shaft
	// as it is, and their segments are taken from here (to the bit).
	var baseErr error
	if base == nil {
		base, baseErr = pile.NewAnalysis(prof, p, m, nil)
	}
	var pass *pile.ShaftPass
	if baseErr == nil {
		pass, _ = base.ShaftPass() // on an error, every breakdown integrates its own shaft
	}
	out := &Comparison{}
	for _, cls := range []profile.Drainage{profile.Drained, profile.Undrained} {
		same := make([]bool, len(layers))
		for i, l := range layers {
			same[i] = l.Drainage != cls
		}
		g := CompareGroup{Drainage: cls.String()}
		for i, l := range layers {
			if l.Drainage == cls && embedded[i] {
				g.Layers = append(g.Layers, l.Name)
			}
		}
		if len(g.Layers) == 0 {
			continue
		}
		chosen := ""
		for _, r := range b.Rows {
			if r.Drainage != cls || r.Method == "none" {
				continue
			}
			if chosen == "" {
				chosen = r.Method
			} else if chosen != r.Method {
				chosen = "-" // mixed: no single method is marked
			}
		}
		for _, d := range shaftCatalogue() {
			if !shaftApplies(d, cls) {
				continue
			}
			row := CompareRow{Method: d.ID, Equation: d.Equation(), Chosen: d.ID == chosen}
			c, err := d.New(shaft.Values{Installation: p.Installation, Surface: surf})
			if err == nil {
				// Every layer of the class takes method d, but where the
				// engineer chose no friction.
				choice := pile.ShaftChoice{Set: true}
				if d.Kind == shaft.WholePile {
					choice.Lambda = true
				} else {
					choice.Shaft = c.Unit
				}
				var bd pile.Breakdown
				if baseErr == nil {
					// From the file's own analysis, which lends its tip
					// preparation (pile.Analysis.WithShafts: the same bits).
					set := make([]pile.ShaftChoice, len(layers))
					for i, l := range layers {
						if l.Drainage == cls && !(i < len(m.Layers) && m.Layers[i].NoShaft) {
							set[i] = choice
						}
					}
					if base.HasShafts(set) {
						bd = b // the file's own methods: its breakdown, to the bit
					} else {
						bd, err = breakdownFrom(base, set, pass, same)
					}
				} else {
					mm := withLayers(cls, func(lm *pile.LayerMethods) {
						if !lm.NoShaft {
							lm.Shaft, lm.Lambda, lm.LambdaValue = choice.Shaft, choice.Lambda, choice.LambdaValue
						}
					})
					bd, err = breakdownOf(prof, p, mm, pass, same)
				}
				if err == nil {
					for _, r := range bd.Rows {
						if r.Drainage == cls {
							row.Force += r.Force
						}
					}
					row.Total = bd.Shaft
				}
			}
			if err != nil {
				row = CompareRow{Method: d.ID, Equation: d.Equation(), Chosen: row.Chosen, NotApplied: err.Error()}
			}
			g.Rows = append(g.Rows, row)
		}
		out.Shaft = append(out.Shaft, g)
	}
	// Tip: the bearing layer's class.
	tl := b.Tip.Layer
	if tl >= 0 && tl < len(layers) {
		cls := layers[tl].Drainage
		g := CompareGroup{Drainage: cls.String(), Layers: []string{layers[tl].Name}}
		// Each method on every layer of the class: one set of tip methods
		// per method, computed together (pile.CapacityWithTips integrates
		// the shaft, which they share, once; it gives what an analysis
		// built whole with them gives).
		var ds []*bearing.Descriptor // pointers into the table, read only
		var sets [][]bearing.Tip
		var newErrs []error
		cat := tipCatalogue()
		for k := range cat {
			d := &cat[k]
			if string(d.Drainage) != cls.String() || requiresKey(d.Params) {
				continue
			}
			t, err := d.New(nil)
			var set []bearing.Tip
			if err == nil {
				set = make([]bearing.Tip, len(layers))
				for i, l := range layers {
					if l.Drainage == cls {
						set[i] = t
					}
				}
			}
			ds, sets, newErrs = append(ds, d), append(sets, set), append(newErrs, err)
		}
		caps, errs := tipCapacities(base, baseErr, prof, p, m, sets)
		if len(ds) > 0 {
			g.Rows = make([]CompareRow, 0, len(ds))
		}
		for j, d := range ds {
			row := CompareRow{Method: d.ID, Equation: d.Equation(), Chosen: d.ID == b.Tip.Method}
			err := newErrs[j]
			if err == nil {
				err = errs[j]
			}
			if err == nil {
				row.Force, row.Total = caps[j].Tip, caps[j].Compression
			} else {
				row = CompareRow{Method: d.ID, Equation: d.Equation(), Chosen: row.Chosen, NotApplied: err.Error()}
			}
			g.Rows = append(g.Rows, row)
		}
		out.Tip = append(out.Tip, g)
	}
	return out
}

// shaftApplies reports whether shaft method d is compared in layers of
// class cls: written for the class (or for any layer by effective stress),
// needing no key of its own, and giving resistance.
func shaftApplies(d shaft.Descriptor, cls profile.Drainage) bool {
	if d.Kind == shaft.NoResistance {
		return false
	}
	for _, p := range d.Params {
		if p.Required {
			return false
		}
	}
	return d.Drainage == shaft.AnyLayers || string(d.Drainage) == cls.String()
}

func requiresKey(ps []bearing.Param) bool {
	for _, p := range ps {
		if p.Required {
			return true
		}
	}
	return false
}

// tipCapacities returns the capacity of pile p in prof with methods m
// and, for each set, the tip methods of the set (nil entries and sets keep
// m's): through pile.CapacityWithTips on base (the analysis with m), or,
// where that could not be built (baseErr), an analysis built whole per set.
func tipCapacities(base *pile.Analysis, baseErr error, prof *profile.Profile, p pile.Pile, m pile.Methods, sets [][]bearing.Tip) ([]pile.Capacity, []error) {
	if baseErr == nil {
		return base.CapacityWithTips(sets)
	}
	caps, errs := make([]pile.Capacity, len(sets)), make([]error, len(sets))
	for j, set := range sets {
		mm := m
		mm.Layers = make([]pile.LayerMethods, max(len(m.Layers), len(set)))
		copy(mm.Layers, m.Layers)
		for i, t := range set {
			if t != nil {
				mm.Layers[i].Tip = t
			}
		}
		a, err := pile.NewAnalysis(prof, p, mm, nil)
		if err == nil {
			caps[j], err = a.Capacity()
		}
		errs[j] = err
	}
	return caps, errs
}

// breakdownOf returns the breakdown of pile p in prof with methods m,
// taking from pass (when not nil) the shaft segments of the layers marked
// same (see pile.Analysis.BreakdownSharing).
func breakdownOf(prof *profile.Profile, p pile.Pile, m pile.Methods, pass *pile.ShaftPass, same []bool) (pile.Breakdown, error) {
	a, err := pile.NewAnalysis(prof, p, m, nil)
	if err != nil {
		return pile.Breakdown{}, err
	}
	return a.BreakdownSharing(pass, same)
}

// breakdownFrom is breakdownOf for base's profile and pile with base's
// methods and the layers' shaft methods of set (pile.Analysis.WithShafts).
func breakdownFrom(base *pile.Analysis, set []pile.ShaftChoice, pass *pile.ShaftPass, same []bool) (pile.Breakdown, error) {
	a, err := base.WithShafts(set)
	if err != nil {
		return pile.Breakdown{}, err
	}
	return a.BreakdownSharing(pass, same)
}

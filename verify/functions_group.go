package verify

import (
	"errors"
	"strconv"

	"github.com/qultgeo/qult/group"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// The pile group's functions (package group). This file's init runs after
// functions.go's, which builds the map (files initialise in name order).
func init() {
	runners["group.ConverseLabarreEfficiency"] = runConverseLabarre
	runners["group.SkemptonNc"] = runSkemptonNc
	runners["group.BlockCapacity"] = runBlockCapacity
	runners["group.VesicSettlement"] = runVesicGroup
	runners["group.RaftSettlement"] = runRaft
	runners["group.PracticeEfficiency"] = runPracticeEfficiency
	runners["group.NewmarkCorner"] = runNewmarkCorner
	runners["group.SpreadStress"] = runSpreadStress
	runners["group.CentreStress"] = runRectStress(group.CentreStress)
	runners["group.AverageStress"] = runRectStress(group.AverageStress)
}

func runConverseLabarre(a *args) (values, error) {
	n1, n2 := int(a.num("rows")), int(a.num("columns"))
	d := units.Length(a.qty("width", units.DimLength))
	s := units.Length(a.qty("spacing", units.DimLength))
	if err := a.done(); err != nil {
		return nil, err
	}
	if n1 < 1 || n2 < 1 || !(d > 0) || !(s > 0) {
		return nil, errBad("rows, columns, width and spacing must be positive")
	}
	return values{"efficiency": num(group.ConverseLabarreEfficiency(n1, n2, d, s))}, nil
}

func runSkemptonNc(a *args) (values, error) {
	b := units.Length(a.qty("width", units.DimLength))
	l := units.Length(a.qty("length", units.DimLength))
	df := units.Length(a.qty("depth", units.DimLength))
	if err := a.done(); err != nil {
		return nil, err
	}
	if !(b > 0) || !(l > 0) || !(df >= 0) {
		return nil, errBad("width and length must be positive, depth zero or more")
	}
	return values{"nc": num(group.SkemptonNc(b, l, df))}, nil
}

// runBlockCapacity: a block in one undrained layer (su, saturated unit
// weight, thickness, water at the surface), from top (default the ground
// surface) to tip.
func runBlockCapacity(a *args) (values, error) {
	su := units.Stress(a.qty("su", units.DimStress))
	g := units.UnitWeight(a.qty("unit_weight", units.DimUnitWeight))
	h := units.Length(a.qty("thickness", units.DimLength))
	top := units.Length(a.optQty("top", units.DimLength))
	tip := units.Length(a.qty("tip", units.DimLength))
	bg := units.Length(a.qty("bg", units.DimLength))
	lg := units.Length(a.qty("lg", units.DimLength))
	nc := a.optNum("nc", 0)
	if err := a.done(); err != nil {
		return nil, err
	}
	p, err := profile.New(profile.Spec{Layers: []profile.LayerSpec{{Name: "clay", Thickness: h, Drainage: profile.Undrained, Su: su, SaturatedUnitWeight: g}}})
	if err != nil {
		return nil, err
	}
	b, err := group.BlockCapacity(p, group.BlockInput{Top: top, Tip: tip, Bg: bg, Lg: lg, Nc: nc})
	if err != nil {
		return nil, err
	}
	return values{"base": force(b.Base), "side": force(b.Side), "capacity": force(b.Capacity), "nc": num(b.Nc)}, nil
}

// runPracticeEfficiency: the group efficiency at a spacing of s_over_d
// pile widths; undrained, cap_contact and bored as the function takes them.
func runPracticeEfficiency(a *args) (values, error) {
	r := a.num("s_over_d")
	und, cc, bored := a.optBool("undrained"), a.optBool("cap_contact"), a.optBool("bored")
	if err := a.done(); err != nil {
		return nil, err
	}
	if !(r > 0) {
		return nil, errBad("s_over_d must be positive")
	}
	eta, _ := group.PracticeEfficiency(r, und, cc, bored)
	return values{"efficiency": num(eta)}, nil
}

func runVesicGroup(a *args) (values, error) {
	s := units.Length(a.qty("single", units.DimLength))
	bg := units.Length(a.qty("bg", units.DimLength))
	d := units.Length(a.qty("width", units.DimLength))
	if err := a.done(); err != nil {
		return nil, err
	}
	if !(s >= 0) || !(bg > 0) || !(d > 0) {
		return nil, errBad("single settlement zero or more, bg and width positive")
	}
	return values{"settlement": length(group.VesicSettlement(s, bg, d))}, nil
}

// runRaft: an equivalent raft in one elastic layer (Young's modulus,
// unit weight, thickness, dry), or, with mv (a list of coefficients of
// volume compressibility in m²/MN, one per layer of layer_thickness below
// the raft), in those layers under an incompressible cover down to the
// raft (M = 1/mv). method, stress, spread_top, depth_factor and
// geological_factor as group.RaftInput takes them.
func runRaft(a *args) (values, error) {
	in := group.RaftInput{Load: units.Force(a.qty("load", units.DimForce)), Bg: units.Length(a.qty("bg", units.DimLength)),
		Lg: units.Length(a.qty("lg", units.DimLength)), Depth: units.Length(a.qty("depth", units.DimLength)),
		Bottom: units.Length(a.optQty("bottom", units.DimLength)), Method: a.optStr("method", ""), Stress: a.optStr("stress", ""),
		SpreadTop: units.Length(a.optQty("spread_top", units.DimLength)), DepthFactor: a.optNum("depth_factor", 0),
		GeologicalFactor: a.optNum("geological_factor", 0)}
	var spec profile.Spec
	if a.has("mv") {
		h := units.Length(a.qty("layer_thickness", units.DimLength))
		spec.Layers = []profile.LayerSpec{{Name: "cover", Thickness: in.Depth, Drainage: profile.Undrained, Su: 100 * units.Kilopascal,
			SaturatedUnitWeight: 20 * units.KilonewtonPerCubicMetre}}
		for i, v := range a.list("mv") {
			mv := a.toNum("mv", v)
			if !(mv > 0) {
				return nil, errBad("mv must be positive")
			}
			spec.Layers = append(spec.Layers, profile.LayerSpec{Name: "layer " + strconv.Itoa(i+1), Thickness: h, Drainage: profile.Undrained,
				Su: 100 * units.Kilopascal, SaturatedUnitWeight: 20 * units.KilonewtonPerCubicMetre, M: units.Stress(1e6 / mv)})
		}
	} else {
		e := units.Stress(a.qty("modulus", units.DimStress))
		h := units.Length(a.qty("thickness", units.DimLength))
		spec = profile.Spec{NoWater: true, Layers: []profile.LayerSpec{{Name: "soil", Thickness: h, Drainage: profile.Drained,
			Phi: 30 * units.Degree, UnitWeight: 19 * units.KilonewtonPerCubicMetre, E: e}}}
	}
	if err := a.done(); err != nil {
		return nil, err
	}
	p, err := profile.New(spec)
	if err != nil {
		return nil, err
	}
	r, err := group.RaftSettlement(p, in)
	if err != nil {
		return nil, err
	}
	return values{"settlement": length(r.Total), "oedometer": length(r.Oedometer), "consolidation": length(r.Consolidation),
		"width": length(r.Bg), "length": length(r.Lg)}, nil
}

// runSpreadStress: the 2:1 stress at depth below a raft carrying a load.
func runSpreadStress(a *args) (values, error) {
	q := units.Force(a.qty("load", units.DimForce))
	b := units.Length(a.qty("width", units.DimLength))
	l := units.Length(a.qty("length", units.DimLength))
	z := units.Length(a.qty("depth", units.DimLength))
	if err := a.done(); err != nil {
		return nil, err
	}
	if !(b > 0) || !(l > 0) || !(z >= 0) || !(q >= 0) {
		return nil, errBad("width and length must be positive, depth and load zero or more")
	}
	return values{"stress": stress(group.SpreadStress(q, b, l, z))}, nil
}

// runNewmarkCorner: Newmark's corner factor at m = b/z and n = l/z.
func runNewmarkCorner(a *args) (values, error) {
	mm, n := a.num("m"), a.num("n")
	if err := a.done(); err != nil {
		return nil, err
	}
	if !(mm > 0) || !(n > 0) {
		return nil, errBad("m and n must be positive")
	}
	return values{"factor": num(group.NewmarkCorner(units.Length(mm), units.Length(n), units.Metre))}, nil
}

// runRectStress: the stress factor Δσ/q at a depth below the centre of a
// loaded rectangle, or averaged over its plan (group.AverageStress).
func runRectStress(f func(units.Stress, units.Length, units.Length, units.Length) units.Stress) runner {
	return func(a *args) (values, error) {
		b := units.Length(a.qty("width", units.DimLength))
		l := units.Length(a.qty("length", units.DimLength))
		z := units.Length(a.qty("depth", units.DimLength))
		if err := a.done(); err != nil {
			return nil, err
		}
		if !(b > 0) || !(l > 0) || !(z >= 0) {
			return nil, errBad("width and length must be positive, depth zero or more")
		}
		return values{"factor": num(float64(f(1, b, l, z)))}, nil
	}
}

func errBad(msg string) error { return errors.New("group: " + msg) }

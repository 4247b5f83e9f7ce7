package group

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// BlockInput is the block of soil and piles: from Top (the pile head or
// the design ground line, whichever is deeper) to Tip, Bg × Lg in plan.
type BlockInput struct {
	Top, Tip units.Length
	Bg, Lg   units.Length
	// Nc is a bearing factor of the engineer's own for an undrained base;
	// 0 means Skempton's.
	Nc float64
	// DrainedBase is the unit base resistance used when the layer at the
	// tip is drained: the single pile's unit tip resistance qp (with its
	// limits), so that the block and the pile share a method.
	DrainedBase units.Stress
}

// BlockRow is one piece of the block's perimeter, between two breaks of
// the profile.
type BlockRow struct {
	Top, Bottom units.Length
	Layer       string
	Undrained   bool
	// Tau is the mean shear stress on the perimeter over the piece: su, or
	// c′ + K0·σ′v·tanφ′ with K0 = 1 − sinφ′.
	Tau   units.Stress
	K0    float64 // 0 in undrained layers
	Force units.Force
}

// Block is the block failure of a group (Terzaghi & Peck 1967; Das &
// Sivakugan 2019):
//
//	Qblock = qb·Bg·Lg + 2(Bg + Lg)·Σ τ·ΔL
type Block struct {
	Top, Tip, Bg, Lg units.Length
	Perimeter        units.Length // 2(Bg + Lg)
	Rows             []BlockRow
	Side             units.Force // the perimeter's shear, 2(Bg + Lg)·Σ τ·ΔL
	// The base: in an undrained layer qb = Nc·su at the tip; in a drained
	// one, the single pile's unit tip resistance.
	BaseLayer     string
	BaseUndrained bool
	Nc            float64 // 0 for a drained base
	NcGiven       bool
	Su            units.Stress
	UnitBase      units.Stress
	Base          units.Force
	Capacity      units.Force // Base + Side
	// Weight is the block's effective weight Bg·Lg·(σ′v(Tip) − σ′v(Top)),
	// for uplift.
	Weight units.Force
	Refs   []cite.Ref
}

// SkemptonNc returns Skempton's (1951) bearing factor of a rectangular
// foundation B ≤ L at depth Df in undrained clay:
//
//	Nc = 5·(1 + 0.2·Df/B)·(1 + 0.2·B/L),  Df/B taken at most 2.5
//
// (9 for a deep square block). It panics unless B, L > 0 and Df ≥ 0.
func SkemptonNc(b, l, df units.Length) float64 {
	if !(b > 0) || !(l > 0) || !(df >= 0) {
		panic(fmt.Sprintf("group: SkemptonNc(%v, %v, %v)", b, l, df))
	}
	b, l = min(b, l), max(b, l)
	return 5 * (1 + 0.2*min(float64(df/b), 2.5)) * (1 + 0.2*float64(b/l))
}

// BlockCapacity returns the block failure of the group in profile prof.
func BlockCapacity(prof *profile.Profile, in BlockInput) (Block, error) {
	if !(in.Bg > 0) || !(in.Lg > 0) || math.IsInf(float64(in.Bg+in.Lg), 0) {
		return Block{}, fmt.Errorf("group: block %v × %v: want positive dimensions", in.Bg, in.Lg)
	}
	top := max(in.Top, prof.DesignGround())
	if !(in.Tip > top) || in.Tip > prof.Depth() {
		return Block{}, fmt.Errorf("group: block from %v to %v: want the tip below the top and within the profile (to %v)", top, in.Tip, prof.Depth())
	}
	if in.Nc != 0 && !(in.Nc >= 1 && in.Nc <= 20) {
		return Block{}, &FieldError{"block_nc", fmt.Sprintf("%g: want 1 to 20", in.Nc)}
	}
	b := Block{Top: top, Tip: in.Tip, Bg: in.Bg, Lg: in.Lg, Perimeter: 2 * (in.Bg + in.Lg),
		Refs: []cite.Ref{{Source: cite.TerzaghiPeck1967, Where: "block failure of a pile group in clay"},
			{Source: cite.Das2019, Where: "section on the ultimate capacity of group piles in saturated clay (block equation)"}}}
	side, err := perimeterShear(prof, top, in.Tip, &b.Rows)
	if err != nil {
		return Block{}, err
	}
	for _, r := range b.Rows {
		if !r.Undrained {
			b.Refs = append(b.Refs, cite.Ref{Source: cite.Jaky1944, Where: "K0 = 1 − sinφ′ on the block's side in drained layers"})
			break
		}
	}
	b.Side = units.Force(float64(b.Perimeter) * side)
	b.setForces()
	li, err := prof.LayerAt(in.Tip)
	if err != nil {
		return Block{}, err
	}
	lay := prof.Layer(li)
	b.BaseLayer = lay.Name
	area := units.Rectangle(in.Bg, in.Lg)
	if lay.Drainage == profile.Undrained {
		su, err := lay.SuAt(in.Tip)
		if err != nil {
			return Block{}, err
		}
		b.BaseUndrained, b.Su = true, su
		if in.Nc != 0 {
			b.Nc, b.NcGiven = in.Nc, true
		} else {
			b.Nc = SkemptonNc(in.Bg, in.Lg, in.Tip-prof.DesignGround())
			b.Refs = append(b.Refs, cite.Ref{Source: cite.Skempton1951, Where: "Nc of a rectangular foundation at depth"})
		}
		b.UnitBase = units.Stress(b.Nc * float64(su))
	} else {
		if !(in.DrainedBase >= 0) || math.IsInf(float64(in.DrainedBase), 0) {
			return Block{}, fmt.Errorf("group: block base in drained layer %q: unit base resistance %v", lay.Name, in.DrainedBase)
		}
		b.UnitBase = in.DrainedBase
	}
	b.Base = units.ForceOn(b.UnitBase, area)
	b.Capacity = b.Base + b.Side
	s0, err := prof.EffectiveStress(top)
	if err != nil {
		return Block{}, err
	}
	s1, err := prof.EffectiveStress(in.Tip)
	if err != nil {
		return Block{}, err
	}
	b.Weight = units.ForceOn(max(s1-s0, 0), area)
	return b, nil
}

// perimeterShear returns Σ τ·ΔL from top to tip (N/m), appending a row per
// piece between the profile's breaks, where σ′v and su are linear.
func perimeterShear(prof *profile.Profile, top, tip units.Length, rows *[]BlockRow) (float64, error) {
	cuts := []units.Length{top}
	for _, z := range prof.Breaks() {
		if z > top && z < tip {
			cuts = append(cuts, z)
		}
	}
	cuts = append(cuts, tip)
	total := 0.0
	for i := 0; i+1 < len(cuts); i++ {
		a, c := cuts[i], cuts[i+1]
		li, err := prof.LayerOf(a, c)
		if err != nil {
			return 0, err
		}
		l := prof.Layer(li)
		r := BlockRow{Top: a, Bottom: c, Layer: l.Name, Undrained: l.Drainage == profile.Undrained}
		var ta, tc float64
		if r.Undrained {
			sa, err := l.SuAt(a)
			if err != nil {
				return 0, err
			}
			sc, err := l.SuAt(c)
			if err != nil {
				return 0, err
			}
			ta, tc = float64(sa), float64(sc)
		} else {
			r.K0 = 1 - l.Phi.Sin()
			sa, err := prof.EffectiveStress(a)
			if err != nil {
				return 0, err
			}
			sc, err := prof.EffectiveStress(c)
			if err != nil {
				return 0, err
			}
			ta = float64(l.Cohesion) + r.K0*float64(sa)*l.Phi.Tan()
			tc = float64(l.Cohesion) + r.K0*float64(sc)*l.Phi.Tan()
		}
		r.Tau = units.Stress((ta + tc) / 2)
		perM := float64(r.Tau) * float64(c-a)
		total += perM
		*rows = append(*rows, r)
	}
	return total, nil
}

// setForces fills each row's Force from the block's perimeter.
func (b *Block) setForces() {
	for i := range b.Rows {
		r := &b.Rows[i]
		r.Force = units.Force(float64(b.Perimeter) * float64(r.Tau) * float64(r.Bottom-r.Top))
	}
}

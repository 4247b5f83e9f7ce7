package profile

import (
	"errors"
	"fmt"
	"math"

	"github.com/qultgeo/qult/units"
	"gonum.org/v1/gonum/integrate/quad"
)

// Compressibility names how a layer's one-dimensional consolidation is
// computed.
type Compressibility uint8

const (
	// Incompressible: the layer has no compressibility parameters and
	// adds nothing to a consolidation settlement.
	Incompressible Compressibility = iota
	// ByIndex: compression and recompression indices with e0 and σ′p.
	ByIndex
	// ByModulus: the constrained modulus M = 1/mv.
	ByModulus
)

func (c Compressibility) String() string {
	switch c {
	case ByIndex:
		return "Cc, Cr, e0"
	case ByModulus:
		return "constrained modulus"
	}
	return "none"
}

// Compressibility reports how the layer's consolidation is computed.
func (l Layer) Compressibility() Compressibility {
	switch {
	case l.M > 0:
		return ByModulus
	case l.Cc > 0 || l.Cr > 0:
		return ByIndex
	}
	return Incompressible
}

// Preconsolidation returns the layer's preconsolidation stress σ′p at a
// point where the vertical effective stress before loading is s0: the
// given Pc, else OCR·s0, else s0 (normally consolidated).
func (l Layer) Preconsolidation(s0 units.Stress) units.Stress {
	switch {
	case l.Pc > 0:
		return l.Pc
	case l.OCR > 0:
		return units.Stress(l.OCR) * s0
	}
	return s0
}

// ConsolidationStrain returns the one-dimensional vertical strain of the
// layer at a point where the vertical effective stress changes from s0 to
// s0 + ds (compression positive). With compression indices and σ′p
// (Terzaghi & Peck 1967; Das, Principles of Geotechnical Engineering,
// "Calculation of settlement from one-dimensional primary consolidation"):
//
//	σ′f ≤ σ′p:        ε = Cr/(1+e0)·log10(σ′f/σ′0)
//	σ′0 < σ′p < σ′f:  ε = Cr/(1+e0)·log10(σ′p/σ′0) + Cc/(1+e0)·log10(σ′f/σ′p)
//	σ′p ≤ σ′0:        ε = Cc/(1+e0)·log10(σ′f/σ′0)
//
// and an unloading (ds < 0) swells along Cr. With the constrained modulus,
// ε = Δσ′/M (= mv·Δσ′). An incompressible layer returns 0. s0 must be > 0
// and s0 + ds > 0; a strain that needs Cr (the stress stays below σ′p, or
// falls) when only Cc was given is an error naming the field.
func (l Layer) ConsolidationStrain(s0, ds units.Stress) (float64, error) {
	if !finite(float64(s0)) || !finite(float64(ds)) {
		return 0, fmt.Errorf("stress not finite (σ′v0 %v, Δσ′ %v)", s0, ds)
	}
	switch l.Compressibility() {
	case Incompressible:
		return 0, nil
	case ByModulus:
		return float64(ds / l.M), nil
	}
	if s0 <= 0 {
		return 0, fmt.Errorf("σ′v0 = %v: the index form needs σ′v0 > 0", s0)
	}
	sf := s0 + ds
	if sf <= 0 {
		return 0, fmt.Errorf("σ′v0 + Δσ′ = %v: the final effective stress must stay > 0", sf)
	}
	if ds == 0 {
		return 0, nil
	}
	e := 1 + l.E0
	sp := max(l.Preconsolidation(s0), s0)
	needCr := func() error {
		if l.Cr > 0 {
			return nil
		}
		return &FieldError{Path: "recompression_index", Msg: fmt.Sprintf("not given; needed where σ′v stays below σ′p (%v) or falls", sp)}
	}
	switch {
	case sf <= sp:
		if err := needCr(); err != nil {
			return 0, err
		}
		return l.Cr / e * math.Log10(float64(sf/s0)), nil
	case s0 < sp:
		if err := needCr(); err != nil {
			return 0, err
		}
		if l.Cc == 0 {
			return 0, &FieldError{Path: "compression_index", Msg: fmt.Sprintf("not given; needed where σ′v passes σ′p (%v)", sp)}
		}
		return l.Cr/e*math.Log10(float64(sp/s0)) + l.Cc/e*math.Log10(float64(sf/sp)), nil
	default:
		if l.Cc == 0 {
			return 0, &FieldError{Path: "compression_index", Msg: "not given; needed where the layer is normally consolidated"}
		}
		return l.Cc / e * math.Log10(float64(sf/s0)), nil
	}
}

// LayerCompression is one layer's share of a consolidation settlement.
type LayerCompression struct {
	Layer       int          // index in the profile
	Top, Bottom units.Length // the part of the layer counted
	Model       Compressibility
	Settlement  units.Length // compression of that part, m (0 when Incompressible)
}

// StressChange is an increase of vertical effective stress with depth
// (a fill, a surcharge, a lowered water table, a raft's load spread).
type StressChange func(z units.Length) units.Stress

// gaussPoints is the Gauss–Legendre order used on each piece of at most
// maxPiece metres between breaks.
const (
	gaussPoints = 12
	maxPiece    = 1.0
)

// Consolidation returns the one-dimensional primary consolidation
// settlement of the ground between depths top and bottom (0 ≤ top ≤ bottom
// ≤ Depth()) under the effective-stress increase ds, and each layer's
// share:
//
//	s = ∫ ε(σ′v0(z), Δσ′(z)) dz    (ε from Layer.ConsolidationStrain)
//
// σ′v0 is the profile's vertical effective stress before the change. The
// integral is cut at every break of the profile (layer boundaries, the
// water table, the design ground line), where σ′v0 reaches a constant σ′p
// and where σ′v0 + Δσ′ reaches σ′p, and each piece of at most 1 m is integrated by 12-point
// Gauss–Legendre quadrature (gonum's quad.Fixed), so the layer-by-layer
// sum of textbook practice at mid-layer is replaced by the integral it
// approximates. Soil above the design ground line (excavated, scoured) is
// not counted; layers without compressibility add nothing and are listed
// with Model Incompressible.
func (p *Profile) Consolidation(top, bottom units.Length, ds StressChange) (units.Length, []LayerCompression, error) {
	if ds == nil {
		return 0, nil, errors.New("profile: consolidation: no stress change given")
	}
	if err := p.checkDepth(top); err != nil {
		return 0, nil, err
	}
	if err := p.checkDepth(bottom); err != nil {
		return 0, nil, err
	}
	if bottom < top {
		return 0, nil, fmt.Errorf("profile: consolidation: bottom %v is above top %v", bottom, top)
	}
	var parts []LayerCompression
	var total float64
	for i, l := range p.layers {
		a := max(float64(top), float64(l.Top), p.design)
		b := min(float64(bottom), float64(l.Bottom))
		if b <= a {
			continue
		}
		lc := LayerCompression{Layer: i, Top: units.Length(a), Bottom: units.Length(b), Model: l.Compressibility()}
		if lc.Model != Incompressible {
			s, err := p.compress(i, a, b, ds)
			if err != nil {
				return 0, nil, err
			}
			lc.Settlement = units.Length(s)
			total += s
		}
		parts = append(parts, lc)
	}
	return units.Length(total), parts, nil
}

// compress integrates layer i's strain over [a, b].
func (p *Profile) compress(i int, a, b float64, ds StressChange) (float64, error) {
	l := p.layers[i]
	cuts := []float64{a}
	for _, z := range p.breaks {
		if z > a && z < b {
			cuts = append(cuts, z)
		}
	}
	cuts = append(cuts, b)
	// Where σ′v0 meets a constant σ′p the strain has a kink: cut there.
	if l.Compressibility() == ByIndex && l.Pc > 0 {
		var more []float64
		for k := 0; k+1 < len(cuts); k++ {
			more = append(more, cuts[k])
			s1, _ := p.EffectiveStress(units.Length(cuts[k]))
			s2, _ := p.EffectiveStress(units.Length(cuts[k+1]))
			if (s1 < l.Pc) != (s2 < l.Pc) && s1 != s2 {
				z := cuts[k] + (cuts[k+1]-cuts[k])*float64(l.Pc-s1)/float64(s2-s1)
				if z > cuts[k] && z < cuts[k+1] {
					more = append(more, z)
				}
			}
		}
		cuts = append(more, b)
	}
	var errOut error
	f := func(z float64) float64 {
		s0, err := p.EffectiveStress(units.Length(z))
		if err == nil {
			d := ds(units.Length(z))
			var e float64
			e, err = l.ConsolidationStrain(s0, d)
			if err == nil {
				return e
			}
		}
		if errOut == nil {
			errOut = &FieldError{Path: fmt.Sprintf("layers[%d]", i), Msg: fmt.Sprintf("at depth %.3f m: %v", z, err), Err: err}
		}
		return 0
	}
	// The strain also has a kink where the final stress σ′0 + Δσ′ meets
	// σ′p; that depth depends on the caller's Δσ′, so it is found by
	// bisection inside each piece whose ends fall on either side of it.
	over := func(z float64) bool {
		s0, err := p.EffectiveStress(units.Length(z))
		if err != nil {
			return false
		}
		return s0+ds(units.Length(z)) > l.Preconsolidation(s0)
	}
	piece := func(lo, hi float64) float64 {
		if l.Compressibility() == ByIndex && over(lo) != over(hi) {
			a, b, atA := lo, hi, over(lo)
			for range 60 {
				mid := (a + b) / 2
				if over(mid) == atA {
					a = mid
				} else {
					b = mid
				}
			}
			return quad.Fixed(f, lo, a, gaussPoints, quad.Legendre{}, 0) + quad.Fixed(f, a, hi, gaussPoints, quad.Legendre{}, 0)
		}
		return quad.Fixed(f, lo, hi, gaussPoints, quad.Legendre{}, 0)
	}
	var sum float64
	for k := 0; k+1 < len(cuts); k++ {
		lo, hi := cuts[k], cuts[k+1]
		n := max(1, int(math.Ceil((hi-lo)/maxPiece)))
		h := (hi - lo) / float64(n)
		for j := range n {
			sum += piece(lo+float64(j)*h, lo+float64(j+1)*h)
		}
	}
	if errOut != nil {
		return 0, errOut
	}
	if !finite(sum) {
		return 0, &FieldError{Path: fmt.Sprintf("layers[%d]", i), Msg: "consolidation settlement is not finite"}
	}
	return sum, nil
}

// GroundSettlement fills dst (grown as needed) with the settlement of the
// ground at each depth of zs under the stress change ds: the compression
// of everything between that depth and the bottom of the profile, which is
// taken as incompressible below. zs must increase and lie in
// [0, Depth()].
func (p *Profile) GroundSettlement(zs []units.Length, ds StressChange, dst []units.Length) ([]units.Length, error) {
	for i := range zs {
		if err := p.checkDepth(zs[i]); err != nil {
			return dst, err
		}
		if i > 0 && !(zs[i] > zs[i-1]) {
			return dst, fmt.Errorf("profile: ground settlement: depths must increase (%v after %v)", zs[i], zs[i-1])
		}
	}
	dst = dst[:0]
	for range zs {
		dst = append(dst, 0)
	}
	below := p.Depth()
	var acc units.Length
	for i := len(zs) - 1; i >= 0; i-- {
		s, _, err := p.Consolidation(zs[i], below, ds)
		if err != nil {
			return dst, err
		}
		acc += s
		dst[i] = acc
		below = zs[i]
	}
	return dst, nil
}

// resolveCompressibility checks and copies a layer's compressibility.
func (p *Profile) resolveCompressibility(path string, l *Layer, ls LayerSpec, c *collector) {
	check := func(name string, v, lo, hi float64, rng string) {
		if v != 0 && (!finite(v) || v <= lo || v > hi) {
			c.add(path+"."+name, "%.6g is outside %s", v, rng)
		}
	}
	check("compression_index", ls.Cc, 0, 10, "(0, 10]")
	check("recompression_index", ls.Cr, 0, 10, "(0, 10]")
	check("initial_void_ratio", ls.E0, 0, 15, "(0, 15]")
	check("preconsolidation_stress", float64(ls.Pc), 0, math.Inf(1), "(0, ∞) Pa")
	check("constrained_modulus", float64(ls.M), 0, math.Inf(1), "(0, ∞) Pa")
	index := ls.Cc != 0 || ls.Cr != 0
	switch {
	case index && ls.M != 0:
		c.add(path+".constrained_modulus", "given with compression indices; give Cc (and Cr) with e0, or the constrained modulus, not both")
	case ls.Cc != 0 && ls.Cr != 0 && ls.Cr > ls.Cc:
		c.add(path+".recompression_index", "%.4g exceeds the compression index %.4g; want Cr ≤ Cc", ls.Cr, ls.Cc)
	}
	e0 := ls.E0
	if e0 == 0 {
		e0 = ls.VoidRatio
	}
	if index && e0 == 0 {
		c.add(path+".initial_void_ratio", "not given; compression indices need e0 (initial_void_ratio, or the layer's void_ratio)")
	}
	if !index && (ls.E0 != 0 || ls.Pc != 0) {
		name := "initial_void_ratio"
		if ls.Pc != 0 {
			name = "preconsolidation_stress"
		}
		c.add(path+"."+name, "given without compression_index or recompression_index, which it serves")
	}
	if ls.Pc != 0 && ls.OCR != 0 {
		c.add(path+".preconsolidation_stress", "given with ocr; give one")
	}
	l.Cc, l.Cr, l.Pc, l.M = ls.Cc, ls.Cr, ls.Pc, ls.M
	if index {
		l.E0 = e0
	}
}

package pile

import (
	"errors"
	"fmt"
	"math"

	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// Verification is one design case checked against the loads.
type Verification struct {
	Case string
	// Compression: design action Ed, design resistance Rd, and Ed/Rd.
	CompressionEd, CompressionRd units.Force
	CompressionUse               float64
	// Tension, where a tension load is given.
	TensionEd, TensionRd units.Force
	TensionUse           float64
	Pass                 bool
}

// utilisation returns ed/rd, with 0/0 = 0 and x/0 = +Inf reported as a
// very large number so that results stay finite.
func utilisation(ed, rd units.Force) float64 {
	switch {
	case ed <= 0:
		return 0
	case rd <= 0:
		return math.MaxFloat64
	}
	return float64(ed / rd)
}

// Verify checks capacity c, computed by an analysis built with case cs,
// against loads l:
//
//	Ed = Permanent·G + Variable·Q,  pass when Ed ≤ Rd in compression and tension.
func Verify(c Capacity, cs Case, l Loads) Verification {
	v := Verification{Case: cs.Name}
	v.CompressionEd = units.Force(cs.Permanent)*l.Compression.Permanent + units.Force(cs.Variable)*l.Compression.Variable
	v.CompressionRd = c.DesignCompression
	v.CompressionUse = utilisation(v.CompressionEd, v.CompressionRd)
	v.TensionEd = units.Force(cs.Permanent)*l.Tension.Permanent + units.Force(cs.Variable)*l.Tension.Variable
	v.TensionRd = c.DesignTension
	v.TensionUse = utilisation(v.TensionEd, v.TensionRd)
	v.Pass = v.CompressionUse <= 1 && v.TensionUse <= 1
	return v
}

// Design is the result of applying a design basis to a pile.
type Design struct {
	Basis          string
	Cases          []Verification
	Characteristic Capacity // without design multipliers (and soil factors)
	// Governing is the index in Cases of the highest utilisation.
	Governing int
	Pass      bool
}

// MaxUse returns the highest utilisation over all cases and both
// directions.
func (d Design) MaxUse() float64 {
	m := 0.0
	for _, v := range d.Cases {
		m = max(m, v.CompressionUse, v.TensionUse)
	}
	return m
}

// Check analyses pile p in profile prof with methods m and applies design
// basis b to loads l: one analysis for the characteristic capacity and one
// per design case (each with its own soil factors).
func Check(prof *profile.Profile, p Pile, m Methods, b Basis, l Loads) (Design, error) {
	if b == nil {
		return Design{}, errors.New("design: no design basis given")
	}
	if err := l.Validate("loads"); err != nil {
		return Design{}, err
	}
	cases, err := b.Cases(p.Installation)
	if err != nil {
		return Design{}, err
	}
	a, err := NewAnalysis(prof, p, m, nil)
	if err != nil {
		return Design{}, err
	}
	char, err := a.Capacity()
	if err != nil {
		return Design{}, err
	}
	d := Design{Basis: b.ID(), Characteristic: char, Pass: true}
	worst := -1.0
	for i := range cases {
		cs := cases[i]
		ad, err := NewAnalysis(prof, p, m, &Options{Case: &cs})
		if err != nil {
			return Design{}, fmt.Errorf("design case %s: %w", cs.Name, err)
		}
		c, err := ad.Capacity()
		if err != nil {
			return Design{}, fmt.Errorf("design case %s: %w", cs.Name, err)
		}
		v := Verify(c, cs, l)
		d.Cases = append(d.Cases, v)
		if u := max(v.CompressionUse, v.TensionUse); u > worst {
			worst, d.Governing = u, i
		}
		d.Pass = d.Pass && v.Pass
	}
	return d, nil
}

// Length is the result of a search for the shortest pile.
type Length struct {
	Found bool
	// TipDepth is the shallowest candidate tip depth at which every case
	// passes; Length = TipDepth − head depth.
	TipDepth units.Length
	Length   units.Length
	// Governs names what governs at the found depth: the case and the
	// direction ("DA1-2 compression").
	Governs string
	Use     float64 // the highest utilisation there
}

// RequiredLength finds the shallowest tip depth, on a grid from the pile
// head + step down to maxTip in steps of step, at which every case of
// basis b passes. Each case is one pass down the pile with running sums,
// not one analysis per depth. p.Length is ignored.
func RequiredLength(prof *profile.Profile, p Pile, m Methods, b Basis, l Loads, step, maxTip units.Length) (Length, error) {
	if b == nil {
		return Length{}, errors.New("design: no design basis given")
	}
	if err := l.Validate("loads"); err != nil {
		return Length{}, err
	}
	if !(step > 0) || math.IsInf(float64(step), 0) {
		return Length{}, fmt.Errorf("search.step: %v is outside (0, ∞) m", step)
	}
	if maxTip > prof.Depth() || maxTip <= p.HeadDepth {
		return Length{}, fmt.Errorf("search.max_tip: %v: want below the head (%v) and within the profile (to %v)", maxTip, p.HeadDepth, prof.Depth())
	}
	if n := float64((maxTip - p.HeadDepth) / step); n > 1e6 {
		return Length{}, fmt.Errorf("search.step: %v gives %.3g candidate depths; at most 1e6", step, n)
	}
	cases, err := b.Cases(p.Installation)
	if err != nil {
		return Length{}, err
	}
	q := p
	q.Length = maxTip - p.HeadDepth
	var rows [][]Capacity
	for i := range cases {
		cs := cases[i]
		a, err := NewAnalysis(prof, q, m, &Options{Case: &cs})
		if err != nil {
			return Length{}, fmt.Errorf("design case %s: %w", cs.Name, err)
		}
		r, err := a.WithDepth(p.HeadDepth+step, maxTip, step, nil)
		if err != nil {
			return Length{}, fmt.Errorf("design case %s: %w", cs.Name, err)
		}
		rows = append(rows, r)
	}
	for j := range rows[0] {
		ok, worst, gov := true, 0.0, ""
		for i, cs := range cases {
			v := Verify(rows[i][j], cs, l)
			if v.CompressionUse > worst {
				worst, gov = v.CompressionUse, cs.Name+" compression"
			}
			if v.TensionUse > worst {
				worst, gov = v.TensionUse, cs.Name+" tension"
			}
			ok = ok && v.Pass
		}
		if ok {
			t := rows[0][j].TipDepth
			return Length{Found: true, TipDepth: t, Length: t - p.HeadDepth, Governs: gov, Use: worst}, nil
		}
	}
	return Length{}, nil
}

// WithDepth returns the capacity for tip depths from `from` to `to` in steps
// of step (the last depth is `to` if the steps do not land on it), in one
// pass with running sums along the shaft. Rows are appended to dst.
func (a *Analysis) WithDepth(from, to, step units.Length, dst []Capacity) ([]Capacity, error) {
	head := a.pile.HeadDepth
	if !(from > head) || to > a.prof.Depth() || !(to >= from) {
		return dst, fmt.Errorf("pile: depth range %v to %v: want below the head (%v) and within the profile (to %v)", from, to, head, a.prof.Depth())
	}
	if !(step > 0) || math.IsInf(float64(step), 0) {
		return dst, fmt.Errorf("pile: step %v is outside (0, ∞) m", step)
	}
	n := int(math.Floor(float64((to-from)/step)+1e-9)) + 1
	if n > 1e6 {
		return dst, fmt.Errorf("pile: %d depths asked for; at most 1e6", n)
	}
	var s sums
	prev := float64(head)
	for i := 0; i <= n; i++ {
		z := float64(from) + float64(i)*float64(step)
		if i == n {
			if float64(to)-prev <= 1e-9*float64(step) {
				break
			}
			z = float64(to)
		}
		z = min(z, float64(to))
		if err := a.addShaft(&s, prev, z); err != nil {
			return dst, err
		}
		prev = z
		dst = append(dst, Capacity{})
		if err := a.finish(&s, z, &dst[len(dst)-1]); err != nil {
			return dst[:len(dst)-1], err
		}
	}
	return dst, nil
}

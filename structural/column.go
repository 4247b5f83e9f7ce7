package structural

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/units"
)

// Column is the unbraced part of a steel pile: above the ground, in water,
// or in soil too soft to brace it, down to the depth of fixity the
// engineer assesses. The zero value is a fully embedded pile (no
// buckling).
type Column struct {
	// Length is the unbraced length l, from the head to the depth of
	// fixity, 0 to 100 m.
	Length units.Length
	// K is the effective length factor, 0.5 to 3; 0 means 2.1, the design
	// value for a member fixed at one end and free to rotate and sway at
	// the other (AASHTO Table C4.6.2.5-1, from memory): a pile free at the
	// head, the conservative case. A head held by a cap gives less; the
	// engineer's to choose.
	K float64
}

// DefaultK is the effective length factor of a Column whose K is zero.
const DefaultK = 2.1

// maxColumn bounds the unbraced length: longer is a slip of units.
const maxColumn = 100 * units.Metre

// effective returns K·l and K, checking the ranges.
func (c Column) effective() (units.Length, float64, error) {
	if !(c.Length >= 0 && c.Length <= maxColumn) {
		return 0, 0, fieldErrorf("candidate.free_length", "%.4g m is outside 0 to %.4g m", c.Length.Metres(), maxColumn.Metres())
	}
	k := c.K
	if k == 0 {
		k = DefaultK
	}
	if !(k >= 0.5 && k <= 3) {
		return 0, 0, fieldErrorf("candidate.effective_length_factor", "%g is outside 0.5 to 3", k)
	}
	return units.Length(k) * c.Length, k, nil
}

// MinRadius returns the least radius of gyration of a steel section: a
// pipe's √(D² + d²)/4 (d the inside diameter), an H-section's about the
// weak axis, √(Iz/A) with Iz = 2·tf·bf³/12 + (h − 2tf)·tw³/12 (root radii
// left out, on the safe side). Zero for other shapes.
func MinRadius(s pile.Section) units.Length {
	switch s.Shape {
	case pile.ClosedPipe, pile.OpenPipe:
		d := float64(s.Diameter - 2*s.Wall)
		return units.Length(math.Sqrt(float64(s.Diameter)*float64(s.Diameter)+d*d) / 4)
	case pile.HSection:
		iz := 2*float64(s.Flange)*math.Pow(float64(s.Width), 3)/12 + float64(s.Depth-2*s.Flange)*math.Pow(float64(s.Web), 3)/12
		return units.Length(math.Sqrt(iz / float64(s.MaterialArea())))
	}
	return 0
}

// aashtoColumn returns AASHTO 6.9.4.1.1's nominal compressive resistance
// from the yield load Po and the elastic critical load Pe (the same
// curve as AISC 360 E3):
//
//	Pn = 0.658^(Po/Pe)·Po   for Pe/Po ≥ 0.44
//	Pn = 0.877·Pe           for Pe/Po < 0.44
//
// as quoted in FHWA GEC 9 (2018), Eqs. 11-34 and 11-35 (read).
func aashtoColumn(po, pe units.Force) units.Force {
	if pe >= 0.44*po {
		return units.Force(math.Pow(0.658, float64(po/pe))) * po
	}
	return 0.877 * pe
}

// eulerLoad returns Pe = π²·E·A/(K·l/r)².
func eulerLoad(e units.Stress, a units.Area, kl, r units.Length) units.Force {
	s := float64(kl / r)
	return units.Force(math.Pi * math.Pi * float64(e) * float64(a) / (s * s))
}

// enChi returns EN 1993-1-1 6.3.1.2's reduction factor for flexural
// buckling,
//
//	χ = 1/(Φ + √(Φ² − λ̄²)) ≤ 1,  Φ = 0.5·[1 + α·(λ̄ − 0.2) + λ̄²]
//
// and 1 for λ̄ ≤ 0.2 (6.3.1.2(4)).
func enChi(lambda, alpha float64) float64 {
	if lambda <= 0.2 {
		return 1
	}
	phi := 0.5 * (1 + alpha*(lambda-0.2) + lambda*lambda)
	return min(1, 1/(phi+math.Sqrt(phi*phi-lambda*lambda)))
}

// enAlphaC is the imperfection factor of buckling curve c, 0.49 (EN
// 1993-1-1 Table 6.1): the curve of a rolled H about its weak axis
// (h/b ≤ 1.2, tf ≤ 100 mm) and of a cold-formed hollow section (Table
// 6.2, from memory); taken for every steel pile, the safe side for a
// hot-finished pipe (curve a).
const enAlphaC = 0.49

// steelColumn reduces a steel section's resistance for its free length:
// rule "aashto" or "allowable" by AASHTO 6.9.4.1.1 (E = 29 000 ksi),
// "en" by EN 1993-1-1 6.3.1 (E = 210 GPa, curve c, γM1 = 1.0). It returns
// the reduction Pn/Po (or χ), the note and the equation, or 1 and "" for
// a fully embedded pile.
func steelColumn(rule string, m Member, c Column) (float64, string, error) {
	kl, k, err := c.effective()
	if err != nil || kl == 0 {
		return 1, "", err
	}
	a := m.Section.MaterialArea()
	r := MinRadius(m.Section)
	po := squash(m.SteelYield, a)
	if rule == "en" {
		ncr := eulerLoad(enE, a, kl, r)
		lam := math.Sqrt(float64(po / ncr))
		chi := enChi(lam, enAlphaC)
		return chi, fmt.Sprintf("free length %.4g m, K = %.3g: Lcr = %.4g m, i = %.4g mm, Ncr = π²EA/(Lcr/i)² = %.6g kN, λ̄ = √(A·fy/Ncr) = %.4g, curve c (α = 0.49), χ = %.4g (EN 1993-1-1 6.3.1.2, γM1 = 1.0)",
			c.Length.Metres(), k, kl.Metres(), r.Millimetres(), ncr.KN(), lam, chi), nil
	}
	pe := eulerLoad(aashtoE, a, kl, r)
	pn := aashtoColumn(po, pe)
	f := float64(pn / po)
	return f, fmt.Sprintf("free length %.4g m, K = %.3g: K·l/rs = %.4g, Pe = π²E·As/(K·l/rs)² = %.6g kN, Pe/Po = %.4g, Pn = %.6g kN = %.4g·Po (AASHTO 6.9.4.1.1)",
		c.Length.Metres(), k, float64(kl/r), pe.KN(), float64(pe/po), pn.KN(), f), nil
}

// enE is the modulus of structural steel in EN 1993-1-1 3.2.6, 210 GPa
// (from memory).
const enE = 210 * units.Gigapascal

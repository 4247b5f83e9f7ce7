package bearing

import (
	"math"

	"gonum.org/v1/gonum/interp"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Berezantzev is the method of Berezantzev, Khristoforov & Golubkov
// (1961) for the tip of a pile in sand, identifier "berezantzev":
//
//	qp = q′·Nq,  Nq = αT(φ′, L/D)·Bk(φ′)
//
// Bk is Berezantzev's factor for a deep base and αT reduces it for the
// arching of the sand around a pile of embedment ratio L/D; Nq does not
// increase with L/D. The factors are digitised as data for φ′ from 23 to
// 39 deg and L/D from 4 to 25; the tabulation states that its L/D = 25
// row holds for any greater L/D, so L/D above 25 reads that row without a
// warning. Between tabulated points ln Nq is interpolated linearly in φ′
// and Nq linearly in L/D.
//
// Data: the tabulation of Berezantzev's factors (α2 = Bk, α3 = αT) in the
// Soviet pile code SNiP 2.02.03-85, Table 6, recalled from memory and not
// yet checked against the printed table or against the chart reproduced
// by Tomlinson & Woodward (2008). Reading tolerance: ±10 % until checked.
//
// Scope. This is Berezantzev's bearing factor applied to the effective
// overburden at the tip, qp = Nq·q′, the way Tomlinson & Woodward (2008)
// use Berezantzev's Nq (as recalled). It is not the design-resistance
// formula of SNiP 2.02.03-85 for bored piles in sand, which (as recalled,
// not read) reads R = 0.75·α4·(α1·γ′·d + α2·α3·γ·h) with a term in the
// base width d and a factor α4 below 1 that depends on d; neither that
// term nor the factors 0.75 and α4 are applied here, so this method is
// not a SNiP design resistance and is not to be compared with one. The
// full published form will be implemented when its table can be read in a
// citable source.
//
// Reads Phi, Q, L and D. A φ′ outside 23 to 39 deg or an L/D below 4 is
// an error unless Clamp is set, when the chart is read at its edge and
// the result is flagged Clamped. No limit is applied.
type Berezantzev struct{}

// BerezantzevReadingTolerance is the relative tolerance of the digitised
// factors.
const BerezantzevReadingTolerance = 0.10

var (
	berezPhi = [...]float64{23, 25, 27, 29, 31, 33, 35, 37, 39}
	berezBk  = [...]float64{18.6, 24.8, 32.8, 45.5, 64.0, 87.6, 127, 185, 260}
	berezLD  = [...]float64{4, 5, 7.5, 10, 12.5, 15, 17.5, 20, 22.5, 25}
	// berezAlpha[i][j] is αT at berezLD[i] and berezPhi[j].
	berezAlpha = [len(berezLD)][len(berezPhi)]float64{
		{0.78, 0.79, 0.80, 0.82, 0.84, 0.85, 0.85, 0.86, 0.87},
		{0.75, 0.76, 0.77, 0.79, 0.81, 0.82, 0.83, 0.84, 0.85},
		{0.68, 0.70, 0.71, 0.74, 0.76, 0.78, 0.80, 0.82, 0.84},
		{0.62, 0.65, 0.67, 0.70, 0.73, 0.75, 0.77, 0.79, 0.81},
		{0.58, 0.61, 0.63, 0.67, 0.70, 0.73, 0.75, 0.78, 0.80},
		{0.55, 0.58, 0.61, 0.65, 0.68, 0.71, 0.73, 0.76, 0.79},
		{0.51, 0.55, 0.58, 0.62, 0.66, 0.69, 0.72, 0.75, 0.78},
		{0.49, 0.53, 0.57, 0.61, 0.65, 0.68, 0.72, 0.75, 0.78},
		{0.46, 0.51, 0.55, 0.60, 0.64, 0.67, 0.71, 0.74, 0.77},
		{0.44, 0.49, 0.54, 0.59, 0.63, 0.67, 0.70, 0.74, 0.77},
	}
	berezRows = fitBerezantzev()
)

// fitBerezantzev fits ln Nq against φ′ for each tabulated L/D.
func fitBerezantzev() [len(berezLD)]interp.PiecewiseLinear {
	var rows [len(berezLD)]interp.PiecewiseLinear
	ly := make([]float64, len(berezPhi))
	for i := range berezLD {
		for j := range berezPhi {
			ly[j] = math.Log(berezAlpha[i][j] * berezBk[j])
		}
		if err := rows[i].Fit(berezPhi[:], ly); err != nil {
			panic("bearing: bad chart data: " + err.Error())
		}
	}
	return rows
}

// ID returns "berezantzev".
func (Berezantzev) ID() string { return "berezantzev" }

// Equation returns the rule on one line.
func (Berezantzev) Equation() string {
	return "qp = q′·Nq, Nq = αT(φ′, L/D)·Bk(φ′) from chart"
}

// Refs returns Berezantzev et al. (1961) and the tabulation used.
func (Berezantzev) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Berezantzev1961}, {Source: snip1985, Where: "Table 6 (α2, α3)"},
		{Source: cite.TomlinsonWoodward2008, Where: "Berezantzev's Nq chart"}}
}

// Range returns the inputs Berezantzev accepts.
func (Berezantzev) Range() string {
	return "φ′ 23 to 39 deg, L/D ≥ 4 (chart; L/D above 25 reads the 25 row); q′ ≥ 0"
}

var snip1985 = cite.Source{Key: "snip-2.02.03-85", Authors: "Gosstroy USSR", Year: 1985,
	Title: "SNiP 2.02.03-85 Pile Foundations", Publication: "Building Norms and Rules, Moscow"}

// Nq returns Berezantzev's Nq at φ′ and embedment ratio ld = L/D, and
// whether either was clamped to the chart.
func (b Berezantzev) Nq(phi units.Angle, ld float64, clamp bool) (nq float64, clamped bool, err error) {
	d := phi.Degrees()
	if !finite(d) {
		return 0, false, rangeErr(b.ID(), "phi", d, 23, 39, "deg", "23 to 39 deg")
	}
	if d < 23-degEps || d > 39+degEps {
		if !clamp {
			return 0, false, rangeErr(b.ID(), "phi", d, 23, 39, "deg", "23 to 39 deg (Berezantzev chart); reading at the chart's edge (clamping) can be asked for")
		}
		d = math.Min(math.Max(d, 23), 39)
		clamped = true
	}
	if !finite(ld) || ld <= 0 || ld > 1e4 {
		return 0, false, rangeErr(b.ID(), "l/d", ld, 4, 1e4, "", "4 to 1e+04 (give l and d)")
	}
	if ld < 4 {
		if !clamp {
			return 0, false, rangeErr(b.ID(), "l/d", ld, 4, math.Inf(1), "", "4 and above (Berezantzev chart); reading at the chart's edge (clamping) can be asked for")
		}
		ld = 4
		clamped = true
	}
	ld = math.Min(ld, 25) // the L/D = 25 row holds for greater L/D
	i := 0
	for i < len(berezLD)-2 && ld > berezLD[i+1] {
		i++
	}
	w := (ld - berezLD[i]) / (berezLD[i+1] - berezLD[i])
	lo := math.Exp(berezRows[i].Predict(d))
	hi := math.Exp(berezRows[i+1].Predict(d))
	return lo + w*(hi-lo), clamped, nil
}

// Tip returns Berezantzev's unit tip resistance.
func (b Berezantzev) Tip(in Input) (Result, error) {
	l, dia := in.L.Metres(), in.D.Metres()
	if !finite(l) || !finite(dia) || l <= 0 || dia <= 0 {
		return Result{}, &RangeError{Method: b.ID(), Field: "l, d", Value: "L = " + in.L.String() + ", D = " + in.D.String(), Range: "(0, ∞) m for each (the embedment L and the diameter D give L/D)"}
	}
	nq, clamped, err := b.Nq(in.Phi, l/dia, in.Clamp)
	if err != nil {
		return Result{}, err
	}
	if err := checkStress(b.ID(), "q", in.Q); err != nil {
		return Result{}, err
	}
	r := Result{Nq: nq, Sigma: in.Q, Unlimited: units.Stress(nq * float64(in.Q))}
	if clamped {
		r.Flags |= Clamped
	}
	return finish(r), nil
}

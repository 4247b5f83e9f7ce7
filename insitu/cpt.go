package insitu

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// ReferencePressure is the atmospheric pressure pa used to normalise cone
// and SPT readings: 100 kPa (Robertson 2009, eq. 5; Liao & Whitman 1986
// take 1 tsf ≈ 96 kPa, and common practice rounds both to 100 kPa).
const ReferencePressure = 100 * units.Kilopascal

// Stresses returns the total vertical stress σv and the equilibrium pore
// pressure u0 at depth z below ground level. A profile's stresses (package
// profile) or any other ground model can supply them.
type Stresses func(z units.Length) (sigmaV, u0 units.Stress)

// Zone is a soil behaviour type zone of Robertson's (1990) normalised
// chart, as bounded by the index Ic (Robertson 2009, Fig. 5 and eq. 6;
// Robertson 2010). Zones 1, 8 and 9 (sensitive fine grained; very stiff
// sand to clayey sand; very stiff fine grained) are not separated by Ic
// alone and are not returned. The zero Zone means not classified.
type Zone int

// Zone boundaries on Ic: 1.31, 2.05, 2.60, 2.95, 3.60.
const (
	ZoneNone            Zone = 0
	ZoneOrganic         Zone = 2 // organic soils: clay to peat, Ic > 3.60
	ZoneClay            Zone = 3 // clays: silty clay to clay, 2.95 < Ic ≤ 3.60
	ZoneSiltMixture     Zone = 4 // silt mixtures: clayey silt to silty clay, 2.60 < Ic ≤ 2.95
	ZoneSandMixture     Zone = 5 // sand mixtures: silty sand to sandy silt, 2.05 < Ic ≤ 2.60
	ZoneSand            Zone = 6 // sands: clean sand to silty sand, 1.31 < Ic ≤ 2.05
	ZoneGravellySand    Zone = 7 // gravelly sand to dense sand, Ic ≤ 1.31
	zoneBoundaryGravel       = 1.31
	zoneBoundarySand         = 2.05
	zoneBoundarySandMix      = 2.60
	zoneBoundarySiltMix      = 2.95
	zoneBoundaryClay         = 3.60
)

// ZoneOf returns the zone of an index Ic (Ic > 0). Boundaries belong to the
// zone below them (the finer-grained side), as Ic ≤ 2.60 marks sand-like
// behaviour in Robertson (2009).
func ZoneOf(ic float64) Zone {
	switch {
	case !(ic > 0):
		return ZoneNone
	case ic <= zoneBoundaryGravel:
		return ZoneGravellySand
	case ic <= zoneBoundarySand:
		return ZoneSand
	case ic <= zoneBoundarySandMix:
		return ZoneSandMixture
	case ic <= zoneBoundarySiltMix:
		return ZoneSiltMixture
	case ic <= zoneBoundaryClay:
		return ZoneClay
	default:
		return ZoneOrganic
	}
}

// ZoneBoundaries returns the values of Ic that separate the zones, from
// the coarsest: 1.31, 2.05, 2.60, 2.95, 3.60 (Robertson 1990, 2009).
func ZoneBoundaries() [5]float64 {
	return [5]float64{zoneBoundaryGravel, zoneBoundarySand, zoneBoundarySandMix, zoneBoundarySiltMix, zoneBoundaryClay}
}

var zoneNames = map[Zone]string{
	ZoneOrganic:      "organic soils: clay to peat",
	ZoneClay:         "clays: silty clay to clay",
	ZoneSiltMixture:  "silt mixtures: clayey silt to silty clay",
	ZoneSandMixture:  "sand mixtures: silty sand to sandy silt",
	ZoneSand:         "sands: clean sand to silty sand",
	ZoneGravellySand: "gravelly sand to dense sand",
}

// String returns the zone's number and description.
func (z Zone) String() string {
	n, ok := zoneNames[z]
	if !ok {
		return "not classified"
	}
	return fmt.Sprintf("%d: %s", int(z), n)
}

// PointFlag records why a reading could not be interpreted.
type PointFlag uint8

const (
	// FlagNetNotPositive: qt ≤ σv, so qn, Qtn and Fr are undefined.
	FlagNetNotPositive PointFlag = 1 << iota
	// FlagNoFriction: fs = 0, so log Fr is undefined.
	FlagNoFriction
	// FlagEffectiveNotPositive: σ′v ≤ 0 (at or above ground level, or
	// u0 ≥ σv).
	FlagEffectiveNotPositive
)

// Point is one interpreted reading. When Flags is not zero the reading
// could not be normalised and Qtn, N, Fr, Bq, Ic and Zone are zero.
type Point struct {
	Depth     units.Length
	Qt        units.Stress // corrected cone resistance qt = qc + u2(1 − a)
	SigmaV    units.Stress // total vertical stress σv
	U0        units.Stress // equilibrium pore pressure u0
	SigmaVEff units.Stress // effective vertical stress σ′v = σv − u0
	Qnet      units.Stress // net cone resistance qn = qt − σv
	Fs        units.Stress
	Qtn       float64 // normalised cone resistance (qn/pa)(pa/σ′v)^n
	N         float64 // stress exponent n
	Fr        float64 // normalised friction ratio fs/qn, percent
	Bq        float64 // pore pressure ratio (u2 − u0)/qn; 0 when u2 is not measured
	Ic        float64 // soil behaviour type index
	Zone      Zone
	Flags     PointFlag
}

// Valid reports whether the reading was normalised.
func (p *Point) Valid() bool { return p.Flags == 0 }

// nTolerance is the change in n below which the iteration stops. Robertson
// (2009) iterates until Δn < 0.01; a tighter tolerance costs little and
// makes the result independent of the starting value to four figures.
const nTolerance = 1e-9

// CPTInterpretationRefs are the sources of InterpretCPT.
func CPTInterpretationRefs() []cite.Ref {
	return []cite.Ref{
		{Source: cite.Robertson2009, Where: "eqs. 1 (qt), 5 (Qtn), 6 (Ic), 7 (n), Fig. 5 (zones)"},
		{Source: cite.Robertson2010, Where: "Ic with Qtn"},
	}
}

// InterpretCPT interprets every reading of a sounding, appending the
// points to dst[:0] (pass a slice with capacity len(s.Rows) and nothing is
// allocated). For each reading:
//
//	qt  = qc + u2·(1 − a)                                (Robertson 2009, eq. 1)
//	qn  = qt − σv,  σ′v = σv − u0
//	Fr  = fs/qn · 100 %
//	Qtn = (qn/pa)·(pa/σ′v)^n                             (eq. 5)
//	Ic  = √((3.47 − log Qtn)² + (log Fr + 1.22)²)        (eq. 6)
//	n   = 0.381·Ic + 0.05·(σ′v/pa) − 0.15,  n ≤ 1.0      (eq. 7)
//
// n is solved with Ic until it changes by less than 1e-9 (Robertson
// iterates to Δn < 0.01), by a bracketed Newton iteration.
//
// What was read: the Ic equation and the zone boundaries as printed in the
// CPT interpretation summary of a site report (public records copy,
// lfweb.sjgov.org document 563124, p. 147), which also says n varies from
// 0.5 to 1.0 and is chosen by iteration on Ic; qt, qn, Fr and Bq through
// the consistent example values of the AGS 4.1.1 dictionary (group SCPT).
// The equation for n (eq. 7) and the equation numbers are from memory of
// Robertson (2009); the paper itself was not reached. Readings
// where qn, fs or σ′v is not positive are returned with Flags set and no
// normalised values. Rows must hold finite values at increasing depths,
// and stresses must return finite σv ≥ 0 and u0; an error names the row
// or the depth otherwise.
func InterpretCPT(s *Sounding, stresses Stresses, dst []Point) ([]Point, error) {
	if !(s.AreaRatio > 0 && s.AreaRatio <= 1) {
		return dst[:0], fmt.Errorf("insitu: sounding %q: area ratio %g is outside 0 (exclusive) to 1", s.ID, s.AreaRatio)
	}
	out := dst[:0]
	pa := float64(ReferencePressure)
	for i := range s.Rows {
		r := &s.Rows[i]
		if !finite(float64(r.Depth)) || !finite(float64(r.Qc)) || !finite(float64(r.Fs)) || !finite(float64(r.U2)) || !finite(float64(s.Qt(i))) {
			return out, fmt.Errorf("insitu: sounding %q: rows[%d]: depth, qc, fs, u2 and qt must be finite", s.ID, i)
		}
		if i > 0 && !(r.Depth > s.Rows[i-1].Depth) {
			return out, fmt.Errorf("insitu: sounding %q: rows[%d]: depth %g m does not increase from %g m", s.ID, i, r.Depth.Metres(), s.Rows[i-1].Depth.Metres())
		}
		sv, u0 := stresses(r.Depth)
		if math.IsNaN(float64(sv)) || math.IsInf(float64(sv), 0) || sv < 0 || math.IsNaN(float64(u0)) || math.IsInf(float64(u0), 0) {
			return out, fmt.Errorf("insitu: sounding %q: stresses at %g m: σv = %g Pa, u0 = %g Pa (σv must be finite and ≥ 0, u0 finite)",
				s.ID, float64(r.Depth), float64(sv), float64(u0))
		}
		p := Point{Depth: r.Depth, Qt: s.Qt(i), SigmaV: sv, U0: u0, SigmaVEff: sv - u0, Fs: r.Fs}
		p.Qnet = p.Qt - sv
		if !(p.Qnet > 0) {
			p.Flags |= FlagNetNotPositive
		}
		if !(r.Fs > 0) {
			p.Flags |= FlagNoFriction
		}
		if !(p.SigmaVEff > 0) {
			p.Flags |= FlagEffectiveNotPositive
		}
		if p.Flags == 0 {
			qn, eff := float64(p.Qnet), float64(p.SigmaVEff)
			p.Fr = float64(r.Fs) / qn * 100
			if s.HasU2 {
				p.Bq = float64(r.U2-u0) / qn
			}
			p.N, p.Ic, p.Qtn = normalise(qn/pa, eff/pa, p.Fr)
			p.Zone = ZoneOf(p.Ic)
		}
		out = append(out, p)
	}
	return out, nil
}

// normalise solves Robertson's (2009) eqs. 5 to 7 for one reading: qnPa =
// qn/pa, effPa = σ′v/pa, fr = Fr in percent. It returns n, Ic and Qtn.
//
// The root of g(n) = min(1, f(n)) − n, f(n) = 0.381·Ic(n) + 0.05·σ′v/pa −
// 0.15, is found by Newton's method kept inside a bracket [lo, hi] with
// g(lo) > 0 > g(hi), falling back to bisection when a step leaves it. The
// bracket starts as [−1, 1]: f ≥ −0.15 > −1 since Ic ≥ 0, and n = 1 is
// the root when f(1) ≥ 1. The root is unique when g decreases, as it does
// for σ′v < pa; at higher stress f varies slowly with n (|f′| < 1 for
// readings on the chart) and the plain fixed point that Robertson
// describes lands on the same root.
func normalise(qnPa, effPa, fr float64) (n, ic, qtn float64) {
	lq0 := math.Log10(qnPa)
	l := -math.Log10(effPa) // log(pa/σ′v)
	b := math.Log10(fr) + 1.22
	b2 := b * b
	c := 0.05*effPa - 0.15
	icOf := func(n float64) (ic, a float64) {
		a = 3.47 - (lq0 + n*l)
		return math.Sqrt(a*a + b2), a
	}
	if ic1, _ := icOf(1); 0.381*ic1+c >= 1 {
		return 1, ic1, math.Exp((lq0 + l) * math.Ln10)
	}
	lo, hi := -1.0, 1.0
	n = 0.5
	for range 200 {
		ic, a := icOf(n)
		f := 0.381*ic + c
		df := 0.0
		if f > 1 {
			f = 1
		} else if ic > 0 {
			df = -0.381 * a * l / ic
		}
		g := f - n
		if g > 0 {
			lo = n
		} else {
			hi = n
		}
		next := n - g/(df-1)
		if !(next > lo && next < hi) {
			next = (lo + hi) / 2
		}
		if math.Abs(next-n) < nTolerance || hi-lo < nTolerance {
			n = next
			break
		}
		n = next
	}
	ic, _ = icOf(n)
	return n, ic, math.Exp((lq0 + n*l) * math.Ln10)
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// SBTIndex returns Ic from Qtn and Fr (percent), Robertson (2009) eq. 6:
//
//	Ic = √((3.47 − log Qtn)² + (log Fr + 1.22)²)
//
// Qtn and Fr must be positive.
func SBTIndex(qtn, fr float64) (float64, error) {
	if !(qtn > 0) || math.IsInf(qtn, 0) {
		return 0, fmt.Errorf("insitu: Qtn %g must be positive and finite", qtn)
	}
	if !(fr > 0) || math.IsInf(fr, 0) {
		return 0, fmt.Errorf("insitu: Fr %g %% must be positive and finite", fr)
	}
	a := 3.47 - math.Log10(qtn)
	b := math.Log10(fr) + 1.22
	return math.Sqrt(a*a + b*b), nil
}

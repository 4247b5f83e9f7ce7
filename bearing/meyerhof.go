package bearing

import (
	"math"

	"gonum.org/v1/gonum/interp"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Meyerhof is Meyerhof's (1976) method for the tip of a deep foundation
// in sand, identifier "meyerhof":
//
//	qp = c′·Nc* + min(q′·Nq*, q_l)
//	q_l = 0.5·pa·Nq*·tanφ′            (limiting unit tip resistance)
//	Nc* = (Nq* − 1)·cotφ′
//
// Nq*(φ′) is read from Meyerhof's (1976) chart of Nq* for deep
// foundations in the 1-degree tabulation of Das (2019), chapter on pile
// foundations, for φ′ from 20 to 45 deg. Between the tabulated angles, ln Nq* is
// interpolated by a monotone cubic (Fritsch-Butland), because Nq* grows
// roughly exponentially with φ′; the interpolation passes through every
// tabulated value. Reading tolerance: the tabulation reads the chart to
// about ±5 %.
//
// The limit applies to the friction term only, as Das presents it; pa is
// Input.Pa (DefaultPa when zero).
//
// Reads Phi, Q, C, Pa and Clamp. A φ′ outside 20 to 45 deg is an error
// unless Clamp is set, when Nq* is read at the chart edge and the result
// is flagged Clamped.
type Meyerhof struct{}

// meyerhofPhi and meyerhofNq are the digitised chart: Das (2019),
// "Interpolated values of Nq* based on Meyerhof's theory". The
// values at 20, 25, 30, 35, 40 and 45 deg were read from Das; the others
// are recalled from the same table (from memory).
var (
	meyerhofPhi = [...]float64{20, 21, 22, 23, 24, 25, 26, 27, 28, 29, 30, 31, 32,
		33, 34, 35, 36, 37, 38, 39, 40, 41, 42, 43, 44, 45}
	meyerhofNq = [...]float64{12.4, 13.8, 15.5, 17.9, 21.4, 26.0, 29.5, 34.0, 39.7, 46.5, 56.7, 68.2, 81.0,
		96.0, 115.0, 143.0, 168.0, 194.0, 231.0, 276.0, 346.0, 420.0, 525.0, 650.0, 780.0, 930.0}
	meyerhofFit = fitLog(meyerhofPhi[:], meyerhofNq[:])
)

// MeyerhofReadingTolerance is the relative reading tolerance of the
// digitised Nq* chart.
const MeyerhofReadingTolerance = 0.05

// fitLog fits a monotone cubic to ln y against x. The data are constants
// of this package, so a failure is a programming mistake.
func fitLog(xs, ys []float64) *interp.FritschButland {
	ly := make([]float64, len(ys))
	for i, y := range ys {
		ly[i] = math.Log(y)
	}
	var fb interp.FritschButland
	if err := fb.Fit(xs, ly); err != nil {
		panic("bearing: bad chart data: " + err.Error())
	}
	return &fb
}

// ID returns "meyerhof".
func (Meyerhof) ID() string { return "meyerhof" }

// Equation returns the rule on one line.
func (Meyerhof) Equation() string {
	return "qp = c′·Nc* + min(q′·Nq*, 0.5·pa·Nq*·tanφ′), Nq* from chart"
}

// Refs returns Meyerhof (1976) and Das's tabulation.
func (Meyerhof) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Meyerhof1976, Where: "Nq* chart for deep foundations; limiting point resistance"}, {Source: cite.Das2019, Where: "table of interpolated Nq* (pile foundations)"}}
}

// Range returns the inputs Meyerhof accepts.
func (Meyerhof) Range() string {
	return "φ′ 20 to 45 deg (chart); q′, c′ ≥ 0; pa 50 to 150 kPa"
}

// NqStar returns Meyerhof's Nq* at φ′ and whether φ′ was clamped to the
// chart; outside 20 to 45 deg it is an error unless clamp is true.
func (m Meyerhof) NqStar(phi units.Angle, clamp bool) (nq float64, clamped bool, err error) {
	d := phi.Degrees()
	if !finite(d) {
		return 0, false, rangeErr(m.ID(), "phi", d, 20, 45, "deg", "20 to 45 deg")
	}
	if d < 20-degEps || d > 45+degEps {
		if !clamp {
			return 0, false, rangeErr(m.ID(), "phi", d, 20, 45, "deg", "20 to 45 deg (Meyerhof chart); reading at the chart's edge (clamping) can be asked for")
		}
		d = math.Min(math.Max(d, 20), 45)
		clamped = true
	}
	return math.Exp(meyerhofFit.Predict(d)), clamped, nil
}

// Tip returns Meyerhof's unit tip resistance.
func (m Meyerhof) Tip(in Input) (Result, error) {
	nq, clamped, err := m.NqStar(in.Phi, in.Clamp)
	if err != nil {
		return Result{}, err
	}
	if err := checkStress(m.ID(), "q", in.Q); err != nil {
		return Result{}, err
	}
	if err := checkStress(m.ID(), "c", in.C); err != nil {
		return Result{}, err
	}
	pa, err := atmosphere(m.ID(), in.Pa)
	if err != nil {
		return Result{}, err
	}
	r := Result{Nq: nq, Sigma: in.Q, C: in.C}
	if clamped {
		r.Flags |= Clamped
	}
	// The chart's lowest φ′ is 20 deg, so cotφ′ is bounded.
	phi := math.Max(float64(in.Phi), 20*float64(units.Degree))
	phi = math.Min(phi, 45*float64(units.Degree))
	if in.C > 0 {
		r.Nc = (nq - 1) / math.Tan(phi)
	}
	fric := units.Stress(nq * float64(in.Q))
	limit := units.Stress(0.5 * float64(pa) * nq * math.Tan(phi))
	r.Limit = limit
	r.Unlimited = units.Stress(r.Nc*float64(in.C)) + fric
	r.Qp = r.Unlimited
	if fric > limit {
		r.Qp = units.Stress(r.Nc*float64(in.C)) + limit
		r.Flags |= LimitGoverns
	}
	return r, nil
}

// atmosphere returns pa, or DefaultPa when pa is zero.
func atmosphere(id string, pa units.Stress) (units.Stress, error) {
	if pa == 0 {
		return DefaultPa, nil
	}
	k := pa.KPa()
	if !finite(k) || k < 50 || k > 150 {
		return 0, rangeErr(id, "pa", k, 50, 150, "kPa", "50 to 150 kPa (0 for 100 kPa)")
	}
	return pa, nil
}

package shaft

import (
	"math"
	"slices"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
	"gonum.org/v1/gonum/interp"
)

// AlphaAPI is the α (total stress) method of API RP 2GEO (2011) for driven
// piles in clay:
//
//	ψ = su/σ′v
//	α = 0.5·ψ^−0.5   (ψ ≤ 1)
//	α = 0.5·ψ^−0.25  (ψ > 1)
//	α ≤ 1,  fs = α·su
//
// It reads su (above 0, at most 5 MPa) and σ′v (above 0, at most 20 MPa).
// BoundApplied is set when α ≤ 1 governs (ψ < 0.25).
type AlphaAPI struct{}

func (AlphaAPI) ID() string { return "alpha-api" }
func (AlphaAPI) Equation() string {
	return "fs = α·su, α = 0.5·ψ^−0.5 (ψ ≤ 1) or 0.5·ψ^−0.25 (ψ > 1), α ≤ 1, ψ = su/σ′v"
}
func (AlphaAPI) Valid() string { return "0 < su ≤ 5 MPa, 0 < σ′v ≤ 20 MPa" }
func (AlphaAPI) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.API2011, Where: "shaft friction in cohesive soils"}}
}
func (m AlphaAPI) Unit(p Point) (Result, error) {
	id := m.ID()
	if err := checkSu(id, p.Su); err != nil {
		return Result{}, err
	}
	if err := checkSigmaVPositive(id, p.SigmaV); err != nil {
		return Result{}, err
	}
	psi := float64(p.Su / p.SigmaV)
	var a float64
	if psi <= 1 {
		a = 0.5 / math.Sqrt(psi)
	} else {
		a = 0.5 / math.Sqrt(math.Sqrt(psi))
	}
	var fl Flags
	if a > 1 {
		a, fl = 1, BoundApplied
	}
	fs := units.Stress(a) * p.Su
	return Result{Fs: fs, Unlimited: fs, SigmaV: p.SigmaV, Alpha: a, Psi: psi, Flags: fl}, nil
}

// alphaChartX and alphaChartY are the tabulation of α against su/pa given by
// Das & Sivakugan (2019), Principles of Foundation Engineering, 9th ed.,
// Table 12.11 ("variation of α, interpolated values based on Terzaghi, Peck
// & Mesri 1996"), first recalled and since checked against a reproduction
// of the table (see TestAlphaChartReadTable). At and below su/pa = 0.1 the
// table gives α = 1.00.
var (
	alphaChartX = [...]float64{0.1, 0.2, 0.3, 0.4, 0.6, 0.8, 1.0, 1.2, 1.4, 1.6, 1.8, 2.0, 2.4, 2.8}
	alphaChartY = [...]float64{1.00, 0.92, 0.82, 0.74, 0.62, 0.54, 0.48, 0.42, 0.40, 0.38, 0.36, 0.35, 0.34, 0.34}
)

// AlphaChartTolerance is the reading tolerance of the α tabulation: the
// values are printed to two decimals, so ±0.005 at the nodes; between nodes
// linear interpolation adds up to a further ±0.005.
const AlphaChartTolerance = 0.01

// LambdaChartTolerance is the reading tolerance of the λ tabulation: values
// are printed to three decimals, so ±0.0005 at the nodes; between nodes
// linear interpolation adds up to a further ±0.0015.
const LambdaChartTolerance = 0.002

// AlphaChartPoints returns copies of the α tabulation: su/pa and α.
func AlphaChartPoints() (suOverPa, alpha []float64) {
	return slices.Clone(alphaChartX[:]), slices.Clone(alphaChartY[:])
}

// charts holds the fitted interpolators. They are set once at package
// initialisation and only read afterwards.
var charts = fitCharts()

type fitted struct{ alpha, lambda interp.PiecewiseLinear }

func fitCharts() *fitted {
	var f fitted
	if err := f.alpha.Fit(alphaChartX[:], alphaChartY[:]); err != nil {
		panic("shaft: alpha chart: " + err.Error())
	}
	if err := f.lambda.Fit(lambdaX[:], lambdaY[:]); err != nil {
		panic("shaft: lambda chart: " + err.Error())
	}
	return &f
}

// AlphaChart is the α method with α read from the tabulation of α against
// su/pa in Das after Terzaghi, Peck & Mesri (1996), interpolated linearly:
//
//	α = table(su/pa),  fs = α·su
//
// α = 1.00 for su/pa ≤ 0.1, as tabulated. Beyond su/pa = 2.8 (the table's
// end) it returns an error, unless Extrapolate is set, when α is held at the
// last value (0.34) and ChartEdge is set. It reads su (above 0, at most
// 5 MPa) and pa (0 for 100 kPa, else 80 to 120 kPa).
type AlphaChart struct{ Extrapolate bool }

func (AlphaChart) ID() string       { return "alpha-chart" }
func (AlphaChart) Equation() string { return "fs = α·su, α from the α–su/pa table" }
func (AlphaChart) Valid() string    { return "0 < su/pa ≤ 2.8 (beyond only by opting in)" }
func (AlphaChart) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Das2019, Where: "table of α against cu/pa"}, {Source: tpm1996}}
}
func (m AlphaChart) Unit(p Point) (Result, error) {
	id := m.ID()
	if err := checkSu(id, p.Su); err != nil {
		return Result{}, err
	}
	if err := checkPa(id, p); err != nil {
		return Result{}, err
	}
	r := float64(p.Su / p.pa())
	last := alphaChartX[len(alphaChartX)-1]
	var a float64
	var fl Flags
	switch {
	case r <= alphaChartX[0]:
		a = alphaChartY[0]
	case r <= last:
		a = charts.alpha.Predict(r)
	case m.Extrapolate:
		a, fl = alphaChartY[len(alphaChartY)-1], ChartEdge
	default:
		return Result{}, &RangeError{Method: id, Field: "su/pa", Value: r, Min: 0, Max: last, Open: true}
	}
	fs := units.Stress(a) * p.Su
	return Result{Fs: fs, Unlimited: fs, Alpha: a, SuPa: r, Flags: fl}, nil
}

// AlphaDrilled is the α of O'Neill & Reese (1999) for drilled shafts in
// cohesive soil, as given in FHWA GEC 10 (Brown et al. 2010):
//
//	α = 0.55                      (su/pa ≤ 1.5)
//	α = 0.55 − 0.1·(su/pa − 1.5)  (1.5 < su/pa ≤ 2.5)
//	fs = α·su
//
// Above su/pa = 2.5 the soil is treated as cohesive intermediate geomaterial
// by those sources and this method returns an error. It reads su (above 0,
// at most 5 MPa) and pa (0 for 100 kPa, else 80 to 120 kPa).
//
// The same sources count parts of a straight shaft in cohesive soil as
// giving no side resistance with this α; NoSide returns them (the top
// 1.5 m and the bottom one diameter) for the caller to leave out.
//
// FHWA GEC 10 of 2018 (Brown et al., FHWA-NHI-18-024) was not read, so
// whether its α for cohesive soil differs from this form is not known here;
// no 2018 form is offered.
type AlphaDrilled struct{}

func (AlphaDrilled) ID() string { return "alpha-drilled" }
func (AlphaDrilled) Equation() string {
	return "fs = α·su, α = 0.55 (su/pa ≤ 1.5) or 0.55 − 0.1·(su/pa − 1.5) (≤ 2.5)"
}
func (AlphaDrilled) Valid() string { return "0 < su/pa ≤ 2.5" }
func (AlphaDrilled) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.ONeillReese1999, Where: "α for drilled shafts in cohesive soil; zones without side resistance"},
		{Source: cite.Brown2010, Where: "ch. 13, side resistance in cohesive soil; zones without side resistance"}}
}
func (m AlphaDrilled) Unit(p Point) (Result, error) {
	id := m.ID()
	if err := checkSu(id, p.Su); err != nil {
		return Result{}, err
	}
	if err := checkPa(id, p); err != nil {
		return Result{}, err
	}
	r := float64(p.Su / p.pa())
	if r > 2.5 {
		return Result{}, &RangeError{Method: id, Field: "su/pa", Value: r, Min: 0, Max: 2.5, Open: true}
	}
	a := 0.55
	if r > 1.5 {
		a = 0.55 - 0.1*(r-1.5)
	}
	fs := units.Stress(a) * p.Su
	return Result{Fs: fs, Unlimited: fs, Alpha: a, SuPa: r}, nil
}

// NoSideZones are the parts of a straight drilled shaft in cohesive soil
// that give no side resistance by the α of O'Neill & Reese (1999) and
// FHWA GEC 10 (Brown et al. 2010): a length Top below the top of the
// shaft's embedded length, and BottomDiameters shaft diameters above its
// base.
type NoSideZones struct {
	Top             units.Length // 1.5 m (5 ft in the US form)
	BottomDiameters float64      // 1
}

// NoSide returns the zones without side resistance that the sources of
// AlphaDrilled prescribe for a straight (not belled) shaft in cohesive
// soil: the top 1.5 m (5 ft) and the bottom one diameter, as recalled from
// O'Neill & Reese (1999) and GEC 10 (2010), not read (see the package doc).
// A belled shaft loses more (the bell's periphery and one diameter above
// it); that is not covered here.
func (AlphaDrilled) NoSide() NoSideZones {
	return NoSideZones{Top: 1.5 * units.Metre, BottomDiameters: 1}
}

// Span returns the part of a shaft that may carry side resistance: from
// top + Top down to base − BottomDiameters·d, where top is the depth of the
// top of the shaft's embedded length (the ground surface or, if deeper,
// the shaft head) and base the depth of its base. ok is false, and from
// and to are zero, when the zones cover the whole shaft. Inputs are
// depths in metres below ground, 0 to 300 m, with top < base, and
// 0 < d ≤ 10 m.
func (z NoSideZones) Span(top, base, d units.Length) (from, to units.Length, ok bool, err error) {
	const id = "alpha-drilled"
	if err := checkDepth(id, top); err != nil {
		return 0, 0, false, err
	}
	if err := check(id, "base", base.Metres(), top.Metres(), maxDepth, "m", true); err != nil {
		return 0, 0, false, err
	}
	if err := check(id, "diameter", d.Metres(), 0, maxDiam, "m", true); err != nil {
		return 0, 0, false, err
	}
	from, to = top+z.Top, base-units.Length(z.BottomDiameters)*d
	if !(from < to) {
		return 0, 0, false, nil
	}
	return from, to, true, nil
}

// AlphaGiven is the α method with α given, 0 to 1.5:
//
//	fs = α·su
//
// It reads su (above 0, at most 5 MPa).
type AlphaGiven struct{ Alpha float64 }

func (AlphaGiven) ID() string       { return "alpha-given" }
func (AlphaGiven) Equation() string { return "fs = α·su" }
func (AlphaGiven) Valid() string    { return "0 ≤ α ≤ 1.5, 0 < su ≤ 5 MPa" }
func (AlphaGiven) Refs() []cite.Ref { return nil }
func (g AlphaGiven) Unit(p Point) (Result, error) {
	if err := check(g.ID(), "alpha", g.Alpha, 0, 1.5, "", false); err != nil {
		return Result{}, err
	}
	if err := checkSu(g.ID(), p.Su); err != nil {
		return Result{}, err
	}
	fs := units.Stress(g.Alpha) * p.Su
	return Result{Fs: fs, Unlimited: fs, Alpha: g.Alpha}, nil
}

// tpm1996 is the source of the α tabulation reproduced by Das.
var tpm1996 = cite.Source{Key: "terzaghi-peck-mesri1996", Authors: "Terzaghi, K., Peck, R.B., Mesri, G.", Year: 1996,
	Title: "Soil Mechanics in Engineering Practice", Publication: "3rd ed., Wiley, New York"}

// Integral returns the integral of fs over a segment of length h along
// which su is constant and σ′v varies linearly from s0 at its top to s1 at
// its bottom (σ′v ≥ 0; F(0) = 0, since α → 0 as ψ → ∞), in closed form. With ψ = su/σ′v, fs is a power of σ′v on
// each branch of the rule, so with F the antiderivative in σ′v,
//
//	F(σ) = 0.4·su^0.75·σ^1.25                         σ ≤ su       (ψ ≥ 1)
//	F(σ) = 0.4·su² + (1/3)·su^0.5·(σ^1.5 − su^1.5)     su ≤ σ ≤ 4su
//	F(σ) = (41/15)·su² + su·(σ − 4su)                  σ ≥ 4su      (α = 1)
//	∫ fs dz = h·(F(s1) − F(s0))/(s1 − s0)
//
// and h·fs when σ′v is constant. It checks its inputs as Unit does and
// sets BoundApplied where α = 1 governs anywhere in the segment. It
// allocates nothing.
func (m AlphaAPI) Integral(su, s0, s1 units.Stress, h units.Length) (units.ForcePerLength, Flags, error) {
	id := m.ID()
	if err := checkSu(id, su); err != nil {
		return 0, 0, err
	}
	if err := checkSigmaV(id, s0); err != nil {
		return 0, 0, err
	}
	if err := checkSigmaV(id, s1); err != nil {
		return 0, 0, err
	}
	if err := check(id, "h", h.Metres(), 0, maxDepth, "m", false); err != nil {
		return 0, 0, err
	}
	var fl Flags
	if max(s0, s1) > 4*su {
		fl = BoundApplied
	}
	u, a, b := float64(su), float64(s0), float64(s1)
	if a == 0 && b == 0 {
		return 0, fl, nil // ψ → ∞, α → 0
	}
	if math.Abs(b-a) <= 1e-9*math.Max(a, b) {
		r, err := m.Unit(Point{Su: su, SigmaV: (s0 + s1) / 2})
		if err != nil {
			return 0, 0, err
		}
		return units.ForcePerLength(float64(r.Fs) * h.Metres()), fl, nil
	}
	F := func(s float64) float64 {
		switch {
		case s <= u:
			return 0.4 * math.Pow(u, 0.75) * math.Pow(s, 1.25)
		case s <= 4*u:
			return 0.4*u*u + math.Sqrt(u)*(s*math.Sqrt(s)-u*math.Sqrt(u))/3
		default:
			return 41.0/15*u*u + u*(s-4*u)
		}
	}
	return units.ForcePerLength(h.Metres() * (F(b) - F(a)) / (b - a)), fl, nil
}

package shaft

import (
	"slices"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// lambdaX and lambdaY are the tabulation of λ against embedded length (m)
// given by Das (Principles of Foundation Engineering) after Vijayvergiya &
// Focht (1972), recalled, not read; see the package doc.
var (
	lambdaX = [...]float64{0, 5, 10, 15, 20, 25, 30, 35, 40, 50, 60, 70, 80, 90}
	lambdaY = [...]float64{0.500, 0.336, 0.245, 0.200, 0.173, 0.150, 0.136, 0.132, 0.127, 0.118, 0.113, 0.110, 0.110, 0.110}
)

// LambdaChartPoints returns copies of the λ tabulation: embedded length in
// metres and λ.
func LambdaChartPoints() (lengthM, lambda []float64) {
	return slices.Clone(lambdaX[:]), slices.Clone(lambdaY[:])
}

// Lambda is the λ method of Vijayvergiya & Focht (1972) for driven piles in
// clay. It is not a point method: it gives the average unit shaft friction
// over the whole embedded length L from the averages over that length,
//
//	fav = λ·(σ̄′v + 2·s̄u),  fav ≤ s̄u (α = fav/s̄u ≤ 1)
//
// where σ̄′v is the mean vertical effective stress over L and s̄u the mean
// undrained shear strength over L (each the integral over L divided by L;
// LambdaMeans forms them from layer pieces as Das does). λ is read from its
// tabulation against L and interpolated linearly. The shaft capacity is fav
// times the shaft area over L. Beyond L = 90 m (the table's end) Average
// returns an error, unless Extrapolate is set, when λ is held at its last
// value (0.110) and ChartEdge is set.
//
// The limit fav ≤ s̄u is ours, applied by default: neither Das nor
// Vijayvergiya & Focht (as Das presents them) print one, but under a sand
// layer σ̄′v is large beside s̄u and the rule alone gives fav well above su,
// which no total-stress adhesion rule allows (API RP 2GEO holds its α ≤ 1,
// the same bound). LambdaCapped is set when the limit governs; Result.Alpha
// is fav/s̄u before it. NoCap turns the limit off and sets LambdaCapOff on
// every result, so the output shows that the limit was not applied.
type Lambda struct {
	Extrapolate bool // hold λ at its last value beyond L = 90 m (ChartEdge)
	NoCap       bool // do not hold fav ≤ s̄u (LambdaCapOff is set)
}

func (Lambda) ID() string { return "lambda" }
func (m Lambda) Equation() string {
	if m.NoCap {
		return "fav = λ·(σ̄′v + 2·s̄u), λ from the λ–L table (no limit)"
	}
	return "fav = λ·(σ̄′v + 2·s̄u) ≤ s̄u, λ from the λ–L table"
}
func (Lambda) Valid() string {
	return "0 < L ≤ 90 m (beyond only by opting in), 0 ≤ σ̄′v ≤ 20 MPa, 0 ≤ s̄u ≤ 5 MPa"
}
func (m Lambda) Refs() []cite.Ref {
	r := []cite.Ref{{Source: cite.VijayvergiyaFocht1972},
		{Source: cite.Das2019, Where: "λ method: Table 12.10 of λ against embedment length; Fig. 12.25, layered soil"}}
	if !m.NoCap {
		r = append(r, cite.Ref{Source: cite.API2011, Where: "α ≤ 1 in clay, taken as the limit fav ≤ s̄u"})
	}
	return r
}

// LambdaResult is the average unit shaft friction over an embedded length.
type LambdaResult struct {
	Fav       units.Stress // average unit shaft friction over L, after any limit
	Unlimited units.Stress // λ·(σ̄′v + 2·s̄u), before the limit fav ≤ s̄u
	Alpha     float64      // Unlimited/s̄u (0 when s̄u is 0): above 1 where the limit governs
	Lambda    float64      // λ at L
	Length    units.Length // L, embedded length
	SigmaV    units.Stress // σ̄′v, mean vertical effective stress over L
	Su        units.Stress // s̄u, mean undrained shear strength over L
	// Pieces is the length over which fav acts when the result comes from
	// Layered (the sum of the pieces' thicknesses), and Integral is
	// fav·Pieces, the shaft friction per unit perimeter over them. Both
	// are zero from Average.
	Pieces   units.Length
	Integral units.ForcePerLength
	Flags    Flags
}

// Average returns the average unit shaft friction over the embedded length
// from the mean σ′v and mean su over it. It allocates nothing when it
// succeeds.
func (m Lambda) Average(length units.Length, meanSigmaV, meanSu units.Stress) (LambdaResult, error) {
	id := m.ID()
	last := lambdaX[len(lambdaX)-1]
	if err := checkLambdaInputs(id, length, meanSigmaV, meanSu); err != nil {
		return LambdaResult{}, err
	}
	l := length.Metres()
	var lam float64
	var fl Flags
	switch {
	case l <= last:
		lam = charts.lambda.Predict(l)
	case m.Extrapolate:
		lam, fl = lambdaY[len(lambdaY)-1], ChartEdge
	default:
		return LambdaResult{}, &RangeError{Method: id, Field: "length", Value: l, Unit: "m", Min: 0, Max: last, Open: true}
	}
	return lambdaFav(lam, m.NoCap, length, meanSigmaV, meanSu, fl), nil
}

func checkLambdaInputs(id string, length units.Length, meanSigmaV, meanSu units.Stress) error {
	if err := check(id, "length", length.Metres(), 0, maxDepth, "m", true); err != nil {
		return err
	}
	if err := checkSigmaV(id, meanSigmaV); err != nil {
		return err
	}
	return check(id, "su", meanSu.KPa(), 0, maxSu/1e3, "kPa", false)
}

// lambdaFav applies fav = λ·(σ̄′v + 2·s̄u) and, unless noCap, fav ≤ s̄u.
func lambdaFav(lam float64, noCap bool, length units.Length, sv, su units.Stress, fl Flags) LambdaResult {
	raw := units.Stress(lam) * (sv + 2*su)
	fav := raw
	switch {
	case noCap:
		fl |= LambdaCapOff
	case raw > su:
		fav = su
		fl |= LambdaCapped
	}
	var a float64
	if su > 0 {
		a = float64(raw / su)
	}
	return LambdaResult{Fav: fav, Unlimited: raw, Alpha: a, Lambda: lam, Length: length, SigmaV: sv, Su: su, Flags: fl}
}

// LambdaGiven is the λ method with λ given, above 0 and at most 1, and the
// same limit as Lambda:
//
//	fav = λ·(σ̄′v + 2·s̄u),  fav ≤ s̄u
//
// NoCap turns the limit off and sets LambdaCapOff.
type LambdaGiven struct {
	Lambda float64
	NoCap  bool
}

func (LambdaGiven) ID() string { return "lambda-given" }
func (m LambdaGiven) Equation() string {
	if m.NoCap {
		return "fav = λ·(σ̄′v + 2·s̄u), λ given (no limit)"
	}
	return "fav = λ·(σ̄′v + 2·s̄u) ≤ s̄u, λ given"
}
func (LambdaGiven) Valid() string {
	return "0 < λ ≤ 1, 0 < L ≤ 300 m, 0 ≤ σ̄′v ≤ 20 MPa, 0 ≤ s̄u ≤ 5 MPa"
}
func (LambdaGiven) Refs() []cite.Ref { return nil }

// Average is Lambda.Average with λ given. It allocates nothing when it
// succeeds.
func (m LambdaGiven) Average(length units.Length, meanSigmaV, meanSu units.Stress) (LambdaResult, error) {
	id := m.ID()
	if err := check(id, "lambda", m.Lambda, 0, 1, "", true); err != nil {
		return LambdaResult{}, err
	}
	if err := checkLambdaInputs(id, length, meanSigmaV, meanSu); err != nil {
		return LambdaResult{}, err
	}
	return lambdaFav(m.Lambda, m.NoCap, length, meanSigmaV, meanSu, 0), nil
}

// LambdaPiece is one piece of the embedded length over which σ′v and su
// vary linearly (a layer, or part of one between the water table and a
// layer boundary): its thickness, and σ′v and su at its top and bottom.
type LambdaPiece struct {
	Thickness             units.Length // above 0, at most 300 m
	SigmaTop, SigmaBottom units.Stress // σ′v at the top and bottom, 0 to 20 MPa
	SuTop, SuBottom       units.Stress // su at the top and bottom, 0 to 5 MPa
}

// LambdaMeans returns the means that the λ method takes, formed from
// pieces as Das (after Vijayvergiya & Focht 1972) forms them for a layered
// profile (Principles of Foundation Engineering, λ method, Fig. 12.25):
//
//	σ̄′v = (A1 + A2 + … + An)/L,  Ai = ∫ σ′v dz over piece i = hi·(σ′top,i + σ′bottom,i)/2
//	s̄u  = (su,1·h1 + … + su,n·hn)/L,  su,i = (su,top,i + su,bottom,i)/2
//	L   = h1 + … + hn
//
// the areas of the σ′v diagram and the su-weighted thicknesses summed over
// the pieces and divided by their total thickness. Both are exact for σ′v
// and su linear within each piece. Das applies them to the whole embedded
// length of a pile in clay. In a profile of clay and sand, pass only the
// clay pieces: because Qs = p·λ·Σ(Ai + 2·su,i·hi) is a sum over pieces, the
// means over the clay pieces times their total thickness give the part of
// Das's sum that the clay carries, while λ stays that of the whole
// embedded length (Layered). It allocates nothing.
func LambdaMeans(pieces []LambdaPiece) (length units.Length, meanSigmaV, meanSu units.Stress, err error) {
	const id = "lambda"
	var h, area, suh float64
	for i := range pieces {
		p := &pieces[i]
		if err := check(id, "pieces.thickness", p.Thickness.Metres(), 0, maxDepth, "m", true); err != nil {
			return 0, 0, 0, err
		}
		for _, s := range [...]units.Stress{p.SigmaTop, p.SigmaBottom} {
			if err := checkSigmaV(id, s); err != nil {
				return 0, 0, 0, err
			}
		}
		for _, s := range [...]units.Stress{p.SuTop, p.SuBottom} {
			if err := check(id, "su", s.KPa(), 0, maxSu/1e3, "kPa", false); err != nil {
				return 0, 0, 0, err
			}
		}
		t := p.Thickness.Metres()
		h += t
		area += t * float64(p.SigmaTop+p.SigmaBottom) / 2
		suh += t * float64(p.SuTop+p.SuBottom) / 2
	}
	if h == 0 {
		return 0, 0, 0, &RangeError{Method: id, Field: "pieces", Value: 0, Unit: "m", Min: 0, Max: maxDepth, Open: true}
	}
	return units.Length(h), units.Stress(area / h), units.Stress(suh / h), nil
}

// Layered returns the λ result for pieces of clay within an embedded
// length: the means of LambdaMeans, λ at the whole embedded length (the
// pieces may cover only part of it, as in clay under sand), fav with its
// limit, and in Integral the friction per unit perimeter over the pieces,
// fav·Σhi. The pieces' total thickness may not exceed the embedded length
// (by more than a rounding error). It allocates nothing when it succeeds.
func (m Lambda) Layered(embedded units.Length, pieces []LambdaPiece) (LambdaResult, error) {
	if err := check(m.ID(), "length", embedded.Metres(), 0, maxDepth, "m", true); err != nil {
		return LambdaResult{}, err
	}
	h, sv, su, err := LambdaMeans(pieces)
	if err != nil {
		return LambdaResult{}, err
	}
	if err := check(m.ID(), "pieces", h.Metres(), 0, embedded.Metres()*(1+1e-12), "m", true); err != nil {
		return LambdaResult{}, err
	}
	r, err := m.Average(embedded, sv, su)
	if err != nil {
		return LambdaResult{}, err
	}
	r.Pieces = h
	r.Integral = units.ForcePerLength(float64(r.Fav) * h.Metres())
	return r, nil
}

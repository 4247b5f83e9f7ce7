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
//	fav = λ·(σ̄′v + 2·s̄u)
//
// where σ̄′v is the mean vertical effective stress over L and s̄u the mean
// undrained shear strength over L (each the integral over L divided by L).
// λ is read from its tabulation against L and interpolated linearly. The
// shaft capacity is fav times the shaft area over L. Beyond L = 90 m (the
// table's end) Average returns an error, unless Extrapolate is set, when λ
// is held at its last value (0.110) and ChartEdge is set.
type Lambda struct{ Extrapolate bool }

func (Lambda) ID() string       { return "lambda" }
func (Lambda) Equation() string { return "fav = λ·(σ̄′v + 2·s̄u), λ from the λ–L table" }
func (Lambda) Valid() string {
	return "0 < L ≤ 90 m (beyond only by opting in), 0 ≤ σ̄′v ≤ 20 MPa, 0 ≤ s̄u ≤ 5 MPa"
}
func (Lambda) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.VijayvergiyaFocht1972}, {Source: cite.Das2019, Where: "table of λ against embedment length"}}
}

// LambdaResult is the average unit shaft friction over an embedded length.
type LambdaResult struct {
	Fav    units.Stress // average unit shaft friction over L
	Lambda float64      // λ at L
	Length units.Length // L, embedded length
	SigmaV units.Stress // σ̄′v, mean vertical effective stress over L
	Su     units.Stress // s̄u, mean undrained shear strength over L
	Flags  Flags
}

// Average returns the average unit shaft friction over the embedded length
// from the mean σ′v and mean su over it. It allocates nothing when it
// succeeds.
func (m Lambda) Average(length units.Length, meanSigmaV, meanSu units.Stress) (LambdaResult, error) {
	id := m.ID()
	last := lambdaX[len(lambdaX)-1]
	if err := check(id, "length", length.Metres(), 0, maxDepth, "m", true); err != nil {
		return LambdaResult{}, err
	}
	if err := checkSigmaV(id, meanSigmaV); err != nil {
		return LambdaResult{}, err
	}
	if err := check(id, "su", meanSu.KPa(), 0, maxSu/1e3, "kPa", false); err != nil {
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
	fav := units.Stress(lam) * (meanSigmaV + 2*meanSu)
	return LambdaResult{Fav: fav, Lambda: lam, Length: length, SigmaV: meanSigmaV, Su: meanSu, Flags: fl}, nil
}

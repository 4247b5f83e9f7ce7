package settle

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
)

// Curve is a load-transfer curve: the ratio of mobilised to ultimate
// resistance (t/tmax on the shaft, Q/Qp at the tip) against the local
// displacement of the pile, piecewise linear through its points and
// constant beyond the last one. Displacements are metres, or multiples of
// the pile diameter when PerDiameter is set.
//
// Build one with APIClay, APISand, APITip or Points; the zero Curve is not
// valid. A curve is a value: copy it, do not change its slices.
type Curve struct {
	id          string
	z, r        []float64
	perDiameter bool
	refs        []cite.Ref
	softening   bool
}

// ID returns the curve's identifier: "api-clay", "api-sand", "api-tip" or
// "points".
func (c Curve) ID() string { return c.id }

// Refs returns the sources of the curve.
func (c Curve) Refs() []cite.Ref { return c.refs }

// PerDiameter reports whether displacements are multiples of the diameter.
func (c Curve) PerDiameter() bool { return c.perDiameter }

// Points returns copies of the curve's displacements and ratios.
func (c Curve) Points() (z, ratio []float64) {
	return append([]float64(nil), c.z...), append([]float64(nil), c.r...)
}

// Softening reports whether the ratio falls after its peak (a residual).
func (c Curve) Softening() bool { return c.softening }

// Valid reports whether the curve was built by one of the constructors.
func (c Curve) Valid() bool { return len(c.z) >= 2 }

// API RP 2GEO (2011) t-z and Q-z points. These are from memory, as recalled
// in the project's bibliography: the standard itself was not read here.
var (
	apiClayZ = []float64{0, 0.0016, 0.0031, 0.0057, 0.0080, 0.0100, 0.0200} // z/D
	apiClayR = []float64{0, 0.30, 0.50, 0.75, 0.90, 1.00}                   // t/tmax; residual appended
	apiTipZ  = []float64{0, 0.002, 0.013, 0.042, 0.073, 0.100}              // z/D
	apiTipR  = []float64{0, 0.25, 0.50, 0.75, 0.90, 1.00}                   // Q/Qp
)

// DefaultResidual is the post-peak ratio tres/tmax of the API clay t-z
// curve used when none is given: 0.7, the low end of API RP 2GEO's 0.7 to
// 0.9 (from memory), so that the default does not overstate the shaft
// resistance after its peak.
const DefaultResidual = 0.7

func apiRef(where string) []cite.Ref {
	return []cite.Ref{{Source: cite.API2011, Where: where}}
}

// APIClay returns the API RP 2GEO (2011) t-z curve for clay, z/D against
// t/tmax (from memory):
//
//	z/D    0  0.0016 0.0031 0.0057 0.0080 0.0100 0.0200  ∞
//	t/tmax 0  0.30   0.50   0.75   0.90   1.00   res     res
//
// residual is tres/tmax, 0.7 to 1 (API gives 0.7 to 0.9; 1 removes the
// softening); 0 means DefaultResidual.
func APIClay(residual float64) (Curve, error) {
	if residual == 0 {
		residual = DefaultResidual
	}
	if !(residual >= 0.7 && residual <= 1) {
		return Curve{}, fmt.Errorf("residual: %v is outside 0.7 to 1", residual)
	}
	r := append(append([]float64(nil), apiClayR...), residual)
	return Curve{id: "api-clay", z: apiClayZ, r: r, perDiameter: true, softening: residual < 1,
		refs: apiRef("t-z curve for clay (from memory)")}, nil
}

// APISandDisplacement is the displacement at which the API sand t-z curve
// reaches tmax: 0.1 in = 2.54 mm (from memory).
const APISandDisplacement = 0.00254

// APISand returns the API RP 2GEO (2011) t-z curve for sand: linear from 0
// to tmax at 2.54 mm (0.1 in), constant beyond (from memory).
func APISand() Curve {
	return Curve{id: "api-sand", z: []float64{0, APISandDisplacement}, r: []float64{0, 1},
		refs: apiRef("t-z curve for sand (from memory)")}
}

// APITip returns the API RP 2GEO (2011) Q-z curve of the tip, z/D against
// Q/Qp (from memory):
//
//	z/D  0  0.002 0.013 0.042 0.073 0.100  ∞
//	Q/Qp 0  0.25  0.50  0.75  0.90  1.00   1.00
func APITip() Curve {
	return Curve{id: "api-tip", z: apiTipZ, r: apiTipR, perDiameter: true,
		refs: apiRef("Q-z curve of the tip (from memory)")}
}

// Points returns a curve the engineer gives as points: displacements z
// (metres, or multiples of D when perDiameter) and ratios. It must start at
// (0, 0), have at least two points, z strictly increasing, ratios 0 to 1
// and never falling (no negative stiffness), a positive first slope, and
// reach 1 at its last point.
func Points(z, ratio []float64, perDiameter bool) (Curve, error) {
	if len(z) != len(ratio) {
		return Curve{}, fmt.Errorf("points: %d displacements and %d ratios; give one ratio per displacement", len(z), len(ratio))
	}
	if len(z) < 2 {
		return Curve{}, fmt.Errorf("points: %d points; give at least 2, from (0, 0) to a ratio of 1", len(z))
	}
	if z[0] != 0 || ratio[0] != 0 {
		return Curve{}, fmt.Errorf("points[0]: (%v, %v) is not (0, 0)", z[0], ratio[0])
	}
	for i := 1; i < len(z); i++ {
		if !(z[i] > z[i-1]) || math.IsInf(z[i], 0) {
			return Curve{}, fmt.Errorf("points[%d].z: %v is not greater than %v (displacements must rise)", i, z[i], z[i-1])
		}
		if !(ratio[i] >= ratio[i-1] && ratio[i] <= 1) {
			return Curve{}, fmt.Errorf("points[%d].ratio: %v is outside %v to 1 (ratios may not fall: negative stiffness)", i, ratio[i], ratio[i-1])
		}
	}
	if !(ratio[1] > 0) {
		return Curve{}, fmt.Errorf("points[1].ratio: 0; the first slope must be positive")
	}
	if ratio[len(ratio)-1] != 1 {
		return Curve{}, fmt.Errorf("points[%d].ratio: %v; the last point must reach 1 (full mobilisation)", len(ratio)-1, ratio[len(ratio)-1])
	}
	return Curve{id: "points", z: append([]float64(nil), z...), r: append([]float64(nil), ratio...),
		perDiameter: perDiameter}, nil // the engineer's own data: no published source
}

// scaled is a curve in metres, ready for the solver: displacements z (m),
// ratios r, and the slopes of its pieces.
type scaled struct {
	z, r, k []float64
}

func (c Curve) scale(d float64) scaled {
	s := scaled{z: make([]float64, len(c.z)), r: c.r, k: make([]float64, len(c.z))}
	f := 1.0
	if c.perDiameter {
		f = d
	}
	for i := range c.z {
		s.z[i] = c.z[i] * f
	}
	for i := 1; i < len(s.z); i++ {
		s.k[i-1] = (s.r[i] - s.r[i-1]) / (s.z[i] - s.z[i-1])
	}
	s.k[len(s.z)-1] = 0
	return s
}

// eval returns the ratio and its slope at displacement w (odd in w: the
// same curve in tension). It allocates nothing.
func (s *scaled) eval(w float64) (ratio, slope float64) {
	sign := 1.0
	if w < 0 {
		sign, w = -1, -w
	}
	n := len(s.z)
	if w >= s.z[n-1] {
		return sign * s.r[n-1], 0
	}
	// Few points: a linear scan is fastest.
	i := 1
	for w >= s.z[i] {
		i++
	}
	k := s.k[i-1]
	return sign * (s.r[i-1] + k*(w-s.z[i-1])), k
}

// peak is the largest ratio of the curve.

package group

import (
	"math"

	"gonum.org/v1/gonum/integrate/quad"

	"github.com/qultgeo/qult/units"
)

// NewmarkCorner returns the influence factor I of the vertical stress at
// depth z below a corner of a uniformly loaded flexible rectangle b × l
// on an elastic half-space (Boussinesq's solution integrated over the
// rectangle, Newmark 1935):
//
//	Δσz = q·I,  m = b/z,  n = l/z,  V = m² + n² + 1
//	I = (1/4π)·[2mn√V/(V + m²n²)·(V + 1)/V + atan2(2mn√V, V − m²n²)]
//
// atan2 takes the angle past π/2 where m²n² > V, which the form with
// arctan writes as "add π". At z ≤ 0 (the loaded surface) I is its limit,
// 1/4. It panics unless b, l > 0.
func NewmarkCorner(b, l, z units.Length) float64 {
	if !(b > 0) || !(l > 0) {
		panic("group: NewmarkCorner: b and l must be more than 0")
	}
	if z <= 0 || float64(z) < 1e-12*float64(max(b, l)) {
		return 0.25
	}
	m, n := float64(b/z), float64(l/z)
	v := m*m + n*n + 1
	mn2 := m * m * n * n
	r := 2 * m * n * math.Sqrt(v)
	return (r/(v+mn2)*(v+1)/v + math.Atan2(r, v-mn2)) / (4 * math.Pi)
}

// CentreStress returns the increase of vertical stress at depth z below
// the centre of a flexible rectangle b × l loaded with q: four corners of
// b/2 × l/2 (superposition),
//
//	Δσ = 4·q·I(b/2, l/2, z)
func CentreStress(q units.Stress, b, l, z units.Length) units.Stress {
	return units.Stress(4 * float64(q) * NewmarkCorner(b/2, l/2, z))
}

// AverageStress returns the mean over the rectangle's plan of the
// increase of vertical stress at depth z below a flexible rectangle b × l
// loaded with q. The stress at a point (x, y) of the plan is the sum of
// four corner factors; over the plan each of them averages to the same
// integral, so
//
//	Δσ̄ = q·(4/(b·l))·∫₀ᵇ∫₀ˡ I(x, y, z) dy dx
//
// integrated by 10-point Gauss–Legendre on pieces that grow fourfold from
// the corner (0, z, 4z, 16z, … in each direction), where I changes over a
// length of about z; the relative error is below 1e-8 (checked against a
// much finer rule in the tests). At z ≤ 0 it is q.
func AverageStress(q units.Stress, b, l, z units.Length) units.Stress {
	if !(b > 0) || !(l > 0) {
		panic("group: AverageStress: b and l must be more than 0")
	}
	if z <= 0 || float64(z) < 1e-12*float64(max(b, l)) {
		return q
	}
	xs, ys := gradedBreaks(float64(b), float64(z)), gradedBreaks(float64(l), float64(z))
	var sum float64
	for i := 0; i+1 < len(xs); i++ {
		for j := 0; j+1 < len(ys); j++ {
			x0, x1, y0, y1 := xs[i], xs[i+1], ys[j], ys[j+1]
			inner := func(x float64) float64 {
				return quad.Fixed(func(y float64) float64 {
					return NewmarkCorner(units.Length(x), units.Length(y), z)
				}, y0, y1, averagePoints, quad.Legendre{}, 0)
			}
			sum += quad.Fixed(inner, x0, x1, averagePoints, quad.Legendre{}, 0)
		}
	}
	return units.Stress(float64(q) * 4 * sum / (float64(b) * float64(l)))
}

// averagePoints is the Gauss–Legendre order of each piece of AverageStress.
const averagePoints = 10

// gradedBreaks returns 0, z, 4z, 16z, … below a, then a; a break within
// a quarter of its own value of a is left out (no sliver of a piece).
func gradedBreaks(a, z float64) []float64 {
	out := []float64{0}
	for x := z; 1.25*x <= a; x *= 4 {
		out = append(out, x)
	}
	return append(out, a)
}

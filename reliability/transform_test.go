// Source of the numbers in this file: parameters of our own; the expected
// values are fromNormal's on the same inputs (the general path as the
// oracle), so no published value is involved.

package reliability

import (
	"math"
	"math/rand/v2"
	"testing"
)

// TestTransformMatchesFromNormal: transform, which writes the normal and
// the lognormal out for independent parameters, gives each parameter the
// bits fromNormal gives it, for every kind (degenerate ones included).
func TestTransformMatchesFromNormal(t *testing.T) {
	ds := []Distribution{
		{Kind: Normal, Mean: 1.2, SD: 0.3},
		{Kind: Normal, Mean: 20e3, SD: 0},
		{Kind: LogNormal, Mean: 50e3, SD: 15e3},
		{Kind: LogNormal, Mean: 3, SD: 0},
		{Kind: TruncatedNormal, Mean: 0.6, SD: 0.05, Lower: 0.5, Upper: 0.7},
		{Kind: Uniform, Lower: 0.5, Upper: 2.5},
	}
	pp := &prepared{n: len(ds)}
	for _, d := range ds {
		if err := d.Validate(); err != nil {
			t.Fatal(err)
		}
		pp.m = append(pp.m, newMarginal(d))
	}
	rng := rand.New(rand.NewPCG(5, 6))
	u, x := make([]float64, len(ds)), make([]float64, len(ds))
	for range 10000 {
		for i := range u {
			u[i] = 3 * rng.NormFloat64()
		}
		pp.transform(u, x)
		for i := range u {
			if want := pp.m[i].fromNormal(u[i]); math.Float64bits(x[i]) != math.Float64bits(want) {
				t.Fatalf("%v at z = %v: transform %v, fromNormal %v", ds[i], u[i], x[i], want)
			}
		}
	}
}

// Source of the numbers in this file: parameters of our own (fixed, and
// random ones drawn by rapid); the expected values are fromNormal's on the
// same inputs (the general path as the oracle), and the bounds are checked
// against the values transformChunk maps, so no published value is
// involved.

package reliability

import (
	"math"
	"math/rand/v2"
	"testing"

	"pgregory.net/rapid"
)

// TestTransformMatchesFromNormal: transform and transformChunk, which
// write the maps out for independent parameters, give each parameter the
// bits fromNormal gives it, for every kind (degenerate ones included); a
// parameter drawn as a probability v gives at v = Φ(z) the bits
// fromNormal gives at z.
func TestTransformMatchesFromNormal(t *testing.T) {
	ds := []Distribution{
		{Kind: Normal, Mean: 1.2, SD: 0.3},
		{Kind: Normal, Mean: 20e3, SD: 0},
		{Kind: LogNormal, Mean: 50e3, SD: 15e3},
		{Kind: LogNormal, Mean: 3, SD: 0},
		{Kind: TruncatedNormal, Mean: 0.6, SD: 0.05, Lower: 0.5, Upper: 0.7},
		{Kind: Uniform, Lower: 0.5, Upper: 2.5},
	}
	pr := Problem{Model: linear{1}}
	for _, d := range ds {
		pr.Params = append(pr.Params, Param{Dist: d})
	}
	pp, err := pr.prepare()
	if err != nil {
		t.Fatal(err)
	}
	if pp.probs != 2 {
		t.Fatalf("%d parameters drawn as a probability, want the truncated normal and the uniform", pp.probs)
	}
	rng := rand.New(rand.NewPCG(5, 6))
	n := len(ds)
	u, x := make([]float64, n), make([]float64, n)
	uc, xc := make([]float64, n*chunk), make([]float64, n*chunk)
	for k := range 10000 {
		for i := range u {
			u[i] = 3 * rng.NormFloat64()
		}
		// A parameter drawn as a probability gets v = Φ(z): its value must
		// be the bits fromNormal gives at z.
		d := make([]float64, n)
		for i, z := range u {
			d[i] = z
			if pp.m[i].drawsProb() {
				d[i] = phi(z)
			}
		}
		pp.transform(d, x)
		// transformChunk, the same sample at s of a chunk of c.
		c := 1 + k%chunk
		s := k % c
		copy(uc[s*n:], d)
		pp.transformChunk(uc, xc, c, nil, nil)
		for i := range u {
			want := pp.m[i].fromNormal(u[i])
			if math.Float64bits(x[i]) != math.Float64bits(want) {
				t.Fatalf("%v at z = %v: transform %v, fromNormal %v", ds[i], u[i], x[i], want)
			}
			if got := xc[i*chunk+s]; math.Float64bits(got) != math.Float64bits(want) {
				t.Fatalf("%v at z = %v: transformChunk %v, fromNormal %v", ds[i], u[i], got, want)
			}
		}
	}
}

// TestPropBounds: every value transformChunk maps lies within the bounds
// it gives for the parameter, for every
// kind of distribution, independent or correlated (random distributions,
// correlations and normals; the transform is the oracle).
func TestPropBounds(t *testing.T) {
	rapid.Check(t, func(rt *rapid.T) {
		n := rapid.IntRange(1, 5).Draw(rt, "n")
		pr := Problem{Model: linear{1}}
		for range n {
			mean := rapid.Float64Range(-10, 10).Draw(rt, "mean")
			sd := rapid.Float64Range(0, 1).Draw(rt, "cov") * math.Abs(mean)
			d := Distribution{Kind: rapid.SampledFrom([]Kind{Normal, LogNormal, TruncatedNormal, Uniform}).Draw(rt, "kind"), Mean: mean, SD: sd}
			switch d.Kind {
			case LogNormal:
				d.Mean = math.Abs(mean) + 0.1
				d.SD = min(sd, d.Mean)
			case TruncatedNormal:
				d.Lower, d.Upper = mean-rapid.Float64Range(0.1, 3).Draw(rt, "below")*sd-1e-3, mean+rapid.Float64Range(0.1, 3).Draw(rt, "above")*sd+1e-3
			case Uniform:
				d.Lower, d.Upper = mean, mean+rapid.Float64Range(1e-3, 5).Draw(rt, "width")
			}
			pr.Params = append(pr.Params, Param{Dist: d})
		}
		if n > 1 && rapid.Bool().Draw(rt, "correlated") {
			rho := rapid.Float64Range(-0.9/float64(n-1), 0.9).Draw(rt, "rho")
			pr.Correlation = make([][]float64, n)
			for i := range n {
				pr.Correlation[i] = make([]float64, n)
				for j := range n {
					pr.Correlation[i][j] = rho
				}
				pr.Correlation[i][i] = 1
			}
		}
		pp, err := pr.prepare()
		if err != nil {
			rt.Skip(err)
		}
		c := rapid.IntRange(1, chunk).Draw(rt, "samples")
		u, x := make([]float64, n*chunk), make([]float64, n*chunk)
		scale := rapid.SampledFrom([]float64{1, 3, 8}).Draw(rt, "scale")
		for k := range u[:c*n] {
			if pp.m[k%n].drawsProb() {
				u[k] = rapid.Float64Range(0, 1-0x1p-53).Draw(rt, "v")
			} else {
				u[k] = scale * rapid.Float64Range(-1, 1).Draw(rt, "u")
			}
		}
		lo, hi := make([]float64, n), make([]float64, n)
		pp.transformChunk(u, x, c, lo, hi)
		for j := range n {
			for s := range c {
				if v := x[j*chunk+s]; !(v >= lo[j] && v <= hi[j]) {
					rt.Fatalf("parameter %d (%+v), sample %d: %v outside [%v, %v]", j, pr.Params[j].Dist, s, v, lo[j], hi[j])
				}
			}
		}
	})
}

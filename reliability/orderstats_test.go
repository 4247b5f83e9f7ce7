// Source of the numbers in this file: drawn samples of our own; the expected
// values are the same samples sorted (the oracle sortFloats, then quantile)
// and plain loops over them for the moments and the bins, so no published
// value is involved.

package reliability

import (
	"math"
	"math/rand/v2"
	"slices"
	"testing"
)

// TestSummariseOrderStats: summarise reads its quantiles, least and
// greatest values and histogram from bucketed order statistics; they must
// be, to the bit, what the sorted samples give (the oracle here: sortFloats,
// whose order TestSortFloats checks, then quantile on the sorted slice), on
// samples of several shapes: a normal spread, a lognormal, many repeats,
// signed zeros, a few far outliers (where summarise falls back to sorting)
// and sizes around the 4096 below which it always sorts.
func TestSummariseOrderStats(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 4))
	shapes := map[string]func() float64{
		"normal":    func() float64 { return 1.3e7 + 1e6*rng.NormFloat64() },
		"lognormal": func() float64 { return math.Exp(2 * rng.NormFloat64()) },
		"repeats":   func() float64 { return float64(rng.IntN(5)) * 0.25 },
		"zeros": func() float64 {
			if rng.IntN(2) == 0 {
				return math.Copysign(0, -1)
			}
			return float64(rng.IntN(3))
		},
		"outliers": func() float64 {
			if rng.IntN(50000) == 0 {
				return 1e12
			}
			return 5e6 + rng.Float64()
		},
	}
	for name, draw := range shapes {
		for _, n := range []int{4095, 4096, 4097, 50000, 300001} {
			r := make([]float64, n)
			for i := range r {
				r[i] = draw()
			}
			got := summarise(slices.Clone(r), 1e6, 40)
			s := slices.Clone(r)
			sortFloats(s)
			same := func(what string, a, b float64) {
				if math.Float64bits(a) != math.Float64bits(b) {
					t.Fatalf("%s, n %d: %s %v, sorted %v", name, n, what, a, b)
				}
			}
			same("min", got.Min, s[0])
			same("max", got.Max, s[n-1])
			same("p5", got.P5, quantile(s, 0.05))
			same("p50", got.P50, quantile(s, 0.5))
			same("p95", got.P95, quantile(s, 0.95))
			for _, q := range got.CDF {
				same("cdf", q.Value, quantile(s, q.P))
			}
			count := 0
			for _, b := range got.Histogram {
				count += b.Count
			}
			if count != n || got.Histogram[0].From != s[0] || got.Histogram[len(got.Histogram)-1].To != s[n-1] {
				t.Fatalf("%s, n %d: histogram %v", name, n, got.Histogram)
			}
			// The moments and the bins, each in a plain loop of its own
			// over the samples in their order.
			var sum, ss float64
			for _, v := range r {
				sum += v - r[0]
			}
			mean := r[0] + sum/float64(n)
			for _, v := range r {
				ss += (v - mean) * (v - mean)
			}
			same("mean", got.Mean, mean)
			same("sd", got.SD, math.Sqrt(ss/float64(n-1)))
			if lo, hi := s[0], s[n-1]; lo != hi {
				w := (hi - lo) / 40
				bins := make([]int, 40)
				for _, v := range r {
					bins[min(int((v-lo)/w), 39)]++
				}
				for k, b := range got.Histogram {
					if b.Count != bins[k] {
						t.Fatalf("%s, n %d: bin %d holds %d, want %d", name, n, k, b.Count, bins[k])
					}
				}
			}
		}
	}
}

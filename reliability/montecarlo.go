package reliability

import (
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"runtime"
	"slices"
	"strings"
	"sync"
	"sync/atomic"

	"gonum.org/v1/gonum/stat/distuv"
)

// BlockSize is the number of samples drawn from one random source: block
// b of a run with seed s draws from PCG(s, b) (math/rand/v2), whichever
// worker takes it, so a run gives the same samples with any number of
// workers.
const BlockSize = 4096

// MaxSamples is the largest number of samples of one run (each sample's
// two capacities are kept for the percentiles: 160 MB at the limit).
const MaxSamples = 10_000_000

// DefaultSamples is the number of samples when Options.Samples is 0.
const DefaultSamples = 10_000

// Options control a Monte Carlo run.
type Options struct {
	// Samples: 1 to MaxSamples; 0 means DefaultSamples.
	Samples int
	// Seed of the run; the same seed gives the same result.
	Seed uint64
	// Workers: goroutines sharing the blocks; 0 means runtime.GOMAXPROCS.
	// The result does not depend on it.
	Workers int
	// Load and TensionLoad, N, if above 0: the loads the capacities are
	// compared with (probability of falling below, reliability index).
	Load, TensionLoad float64
	// Bins of the histograms: 0 means 40; at most 1000.
	Bins int
}

// Bin is one bar of a histogram: samples with From ≤ R < To (the last
// bin includes its upper edge).
type Bin struct {
	From, To float64
	Count    int
}

// Quantile is one point of the empirical distribution function: a
// fraction P of the samples lies at or below Value.
type Quantile struct {
	P, Value float64
}

// Summary describes the sampled distribution of one capacity, N.
type Summary struct {
	Mean, SD float64
	// CoV is SD/Mean (0 when Mean is 0).
	CoV           float64
	Min, Max      float64
	P5, P50, P95  float64
	SEMean, SESD  float64 // sampling errors of Mean and SD: σ/√n and σ/√(2(n−1))
	HasLoad       bool
	Load          float64
	PBelow        float64 // fraction of samples with R < Load
	PBelowSE      float64 // its sampling error √(p(1 − p)/n)
	Beta          float64 // (Mean − Load)/SD
	BetaDefined   bool    // false where SD = 0 (or no load)
	BetaPf        float64 // −Φ⁻¹(PBelow)
	BetaPfDefined bool    // false where PBelow is 0 or 1 (or no load)
	Histogram     []Bin
	// CDF holds the quantiles at P = 0, 0.01, …, 1.
	CDF []Quantile
}

// MCResult is the result of a Monte Carlo run.
type MCResult struct {
	Samples, Workers, BlockSize int
	Seed                        uint64
	Compression, Tension        Summary
}

// MonteCarlo samples the problem and summarises the capacities. See the
// package documentation for the method. A sample the model refuses stops
// the run with an error naming the sample and the parameter values; the
// error is that of the first such sample in sample order.
func MonteCarlo(p Problem, opt Options) (*MCResult, error) {
	pp, err := p.prepare()
	if err != nil {
		return nil, err
	}
	n := opt.Samples
	if n == 0 {
		n = DefaultSamples
	}
	if n < 1 || n > MaxSamples {
		return nil, &FieldError{Path: "samples", Msg: fmt.Sprintf("%d is outside 1 to %d", opt.Samples, MaxSamples)}
	}
	workers := opt.Workers
	if workers == 0 {
		workers = runtime.GOMAXPROCS(0)
	}
	if workers < 1 || workers > 1024 {
		return nil, &FieldError{Path: "workers", Msg: fmt.Sprintf("%d is outside 1 to 1024 (0 for all cores)", opt.Workers)}
	}
	bins := opt.Bins
	if bins == 0 {
		bins = 40
	}
	if bins < 1 || bins > 1000 {
		return nil, &FieldError{Path: "bins", Msg: fmt.Sprintf("%d is outside 1 to 1000", opt.Bins)}
	}
	if !(opt.Load >= 0) || !finite(opt.Load) {
		return nil, &FieldError{Path: "load", Msg: fmt.Sprintf("%g N is outside 0 to ∞", opt.Load)}
	}
	if !(opt.TensionLoad >= 0) || !finite(opt.TensionLoad) {
		return nil, &FieldError{Path: "tension_load", Msg: fmt.Sprintf("%g N is outside 0 to ∞", opt.TensionLoad)}
	}
	blocks := (n + BlockSize - 1) / BlockSize
	workers = min(workers, blocks)
	comp := make([]float64, n)
	tens := make([]float64, n)

	var next atomic.Int64
	var errBlock atomic.Int64 // the lowest block with an error
	errBlock.Store(math.MaxInt64)
	errs := make([]error, blocks)
	evals := make([]Evaluator, workers)
	for w := range evals {
		if evals[w], err = p.Model.NewEvaluator(); err != nil {
			return nil, err
		}
	}
	var wg sync.WaitGroup
	for w := range workers {
		wg.Add(1)
		go func(ev Evaluator) {
			defer wg.Done()
			// A chunk of samples at a time: the draws of sample after
			// sample in u, parameter j of sample s at x[j*chunk+s].
			u := make([]float64, pp.n*chunk)
			x := make([]float64, pp.n*chunk)
			row := make([]float64, pp.n)
			xlo, xhi := make([]float64, pp.n), make([]float64, pp.n)
			var fc *fastChunk
			if f, ok := ev.(*fastModel); ok {
				fc = f.newChunk(x)
			}
			var pcg rand.PCG
			rng := rand.New(&pcg)
			for {
				b := int(next.Add(1) - 1)
				if b >= blocks || int64(b) > errBlock.Load() {
					return
				}
				pcg.Seed(opt.Seed, uint64(b))
			chunks:
				for lo, hi := b*BlockSize, min((b+1)*BlockSize, n); lo < hi; lo += chunk {
					c := min(chunk, hi-lo)
					pp.draw(rng, u[:c*pp.n])
					if fc != nil {
						pp.transformChunk(u, x, c, xlo, xhi)
						if fc.capacity(c, comp[lo:lo+c], tens[lo:lo+c], xlo, xhi) {
							continue
						}
					} else {
						pp.transformChunk(u, x, c, nil, nil)
					}
					// One sample at a time: the general model, or a chunk
					// with a sample the closed form may refuse.
					for s := range c {
						for j := range row {
							row[j] = x[j*chunk+s]
						}
						i := lo + s
						o, err := ev.Capacity(row)
						if err == nil && (!finite(o.Compression) || !finite(o.Tension)) {
							err = errors.New("the model gave no finite capacity")
						}
						if err != nil {
							errs[b] = sampleError(i, p.Params, row, err)
							for {
								cur := errBlock.Load()
								if int64(b) >= cur || errBlock.CompareAndSwap(cur, int64(b)) {
									break
								}
							}
							break chunks
						}
						comp[i], tens[i] = o.Compression, o.Tension
					}
				}
			}
		}(evals[w])
	}
	wg.Wait()
	if eb := errBlock.Load(); eb != math.MaxInt64 {
		return nil, errs[eb]
	}
	res := &MCResult{Samples: n, Workers: workers, BlockSize: BlockSize, Seed: opt.Seed}
	wg.Add(2)
	go func() { defer wg.Done(); res.Compression = summarise(comp, opt.Load, bins) }()
	go func() { defer wg.Done(); res.Tension = summarise(tens, opt.TensionLoad, bins) }()
	wg.Wait()
	return res, nil
}

// sampleError names the sample and its parameter values.
func sampleError(i int, ps []Param, x []float64, err error) error {
	var sb strings.Builder
	for j, p := range ps {
		if j > 0 {
			sb.WriteString(", ")
		}
		if j == 8 {
			sb.WriteString("…")
			break
		}
		name := p.Name
		if name == "" {
			name = fmt.Sprintf("params[%d]", j)
		}
		fmt.Fprintf(&sb, "%s = %.6g", name, x[j])
	}
	return &SampleError{Sample: i, Values: sb.String(), Err: err}
}

// SampleError is a sample the model refused.
type SampleError struct {
	Sample int
	Values string // the parameter values of the sample, SI
	Err    error
}

func (e *SampleError) Error() string {
	return fmt.Sprintf("reliability: sample %d (in SI units: %s): %v; no sample is clamped or dropped: give bounds inside the accepted range (a truncated normal) or a smaller spread", e.Sample, e.Values, e.Err)
}

func (e *SampleError) Unwrap() error { return e.Err }

// summarise describes r (and may sort it in place). It reads the samples
// in three passes where it can: the sum for the mean with the least and
// greatest value; the sum of squares with the count below the load, the
// histogram and the buckets of the order statistics; and their gathering.
func summarise(r []float64, load float64, bins int) Summary {
	n := len(r)
	// Mean as r[0] + mean of the deviations from it: exact when every
	// sample is equal, and less rounding for a narrow spread. The least
	// and greatest value by the order sortFloats sorts in.
	var s float64
	r0 := r[0]
	klo, khi := floatKey(r0), floatKey(r0)
	for _, v := range r {
		s += v - r0
		k := floatKey(v)
		if k < klo {
			klo = k
		}
		if k > khi {
			khi = k
		}
	}
	mean := r0 + s/float64(n)
	lo, hi := keyFloat(klo), keyFloat(khi)
	var ranks []int
	for _, p := range summaryProbs() {
		h := float64(n-1) * p
		if k := int(h); k >= n-1 {
			ranks = append(ranks, n-1)
		} else {
			ranks = append(ranks, k, k+1)
		}
	}
	// The order statistics the quantiles read: from buckets where that
	// is quicker than sorting (at least 4096 samples, not all equal).
	var ob *orderBuckets
	if n >= 4096 && lo < hi {
		ob = new(orderBuckets)
		if !ob.init(lo, hi) {
			ob = nil
		}
	}
	var hist []Bin
	w := (hi - lo) / float64(bins)
	if hi == lo {
		hist = []Bin{{From: lo, To: hi, Count: n}}
	} else {
		hist = make([]Bin, bins)
		for k := range hist {
			hist[k] = Bin{From: lo + float64(k)*w, To: lo + float64(k+1)*w}
		}
		hist[bins-1].To = hi
	}
	var ss float64
	below := 0
	switch {
	case ob != nil && hi != lo:
		// The common case in one loop.
		for _, v := range r {
			d := v - mean
			ss += d * d
			if v < load {
				below++
			}
			ob.start[ob.bucket(v)+1]++
			hist[min(int((v-lo)/w), bins-1)].Count++
		}
	default:
		for _, v := range r {
			d := v - mean
			ss += d * d
			if v < load {
				below++
			}
			if ob != nil {
				ob.start[ob.bucket(v)+1]++
			}
			if hi != lo {
				hist[min(int((v-lo)/w), bins-1)].Count++
			}
		}
	}
	sd := 0.0
	if n > 1 {
		sd = math.Sqrt(ss / float64(n-1))
	}
	at := func(k int) float64 { return r[k] }
	var vals map[int]float64
	ok := false
	if ob != nil {
		vals, ok = ob.stats(r, ranks)
	}
	if ok {
		at = func(k int) float64 { return vals[k] }
	} else {
		sortFloats(r)
	}
	q := func(p float64) float64 { return quantileAt(n, at, p) }
	out := Summary{Mean: mean, SD: sd, Min: lo, Max: hi,
		P5: q(0.05), P50: q(0.5), P95: q(0.95),
		SEMean: sd / math.Sqrt(float64(n)), Histogram: hist}
	if n > 1 {
		out.SESD = sd / math.Sqrt(2*float64(n-1))
	}
	if mean != 0 {
		out.CoV = sd / mean
	}
	if load > 0 {
		out.HasLoad, out.Load = true, load
		p := float64(below) / float64(n)
		out.PBelow, out.PBelowSE = p, math.Sqrt(p*(1-p)/float64(n))
		if sd > 0 {
			out.Beta, out.BetaDefined = (mean-load)/sd, true
		}
		if p > 0 && p < 1 {
			out.BetaPf, out.BetaPfDefined = -distuv.UnitNormal.Quantile(p), true
		}
	}
	for k := 0; k <= 100; k++ {
		pk := float64(k) / 100
		out.CDF = append(out.CDF, Quantile{P: pk, Value: q(pk)})
	}
	return out
}

// sortFloats sorts finite r in place: a least-significant-digit radix sort
// on the bits of each value mapped to an order-preserving unsigned key
// (sign bit set: all bits flipped; else the sign bit set), 11 bits a pass,
// six passes; small slices go to slices.Sort.
func sortFloats(r []float64) {
	n := len(r)
	if n < 4096 {
		slices.Sort(r)
		return
	}
	key := make([]uint64, n)
	tmp := make([]uint64, n)
	for i, v := range r {
		b := math.Float64bits(v)
		if b>>63 != 0 {
			b = ^b
		} else {
			b |= 1 << 63
		}
		key[i] = b
	}
	const bits, buckets = 11, 1 << 11
	var count [buckets]int
	for shift := uint(0); shift < 64; shift += bits {
		clear(count[:])
		for _, k := range key {
			count[(k>>shift)&(buckets-1)]++
		}
		if count[(key[0]>>shift)&(buckets-1)] == n {
			continue // every key has this digit: the pass changes nothing
		}
		sum := 0
		for i, c := range count {
			count[i], sum = sum, sum+c
		}
		for _, k := range key {
			d := (k >> shift) & (buckets - 1)
			tmp[count[d]] = k
			count[d]++
		}
		key, tmp = tmp, key
	}
	for i, b := range key {
		if b>>63 != 0 {
			b &^= 1 << 63
		} else {
			b = ^b
		}
		r[i] = math.Float64frombits(b)
	}
}

// quantile returns the p-quantile of sorted r by linear interpolation
// between order statistics: h = (n − 1)·p (Hyndman & Fan 1996, Sample
// quantiles in statistical packages, Am. Stat. 50(4), definition 7, from
// memory; NumPy's default).
func quantile(r []float64, p float64) float64 {
	return quantileAt(len(r), func(k int) float64 { return r[k] }, p)
}

// quantileAt is quantile with the n sorted values read through at.
func quantileAt(n int, at func(int) float64, p float64) float64 {
	h := float64(n-1) * p
	k := int(h)
	if k >= n-1 {
		return at(n - 1)
	}
	f := h - float64(k)
	if f == 0 {
		return at(k)
	}
	return at(k) + f*(at(k+1)-at(k))
}

// summaryProbs are the probabilities at which summarise reads quantiles:
// 0.05, 0.5, 0.95 and 0, 0.01, …, 1.
func summaryProbs() []float64 {
	ps := []float64{0.05, 0.5, 0.95}
	for k := 0; k <= 100; k++ {
		ps = append(ps, float64(k)/100)
	}
	return ps
}

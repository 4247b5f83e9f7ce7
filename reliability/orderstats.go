package reliability

import (
	"math"
	"slices"
	"sort"
)

// floatKey maps a float64 onto an unsigned key with the same order (sign
// bit set: all bits flipped; else the sign bit set), as sortFloats orders
// the samples: −0 before +0.
func floatKey(v float64) uint64 {
	b := math.Float64bits(v)
	if b>>63 != 0 {
		return ^b
	}
	return b | 1<<63
}

// keyFloat is floatKey's inverse.
func keyFloat(k uint64) float64 {
	if k>>63 != 0 {
		return math.Float64frombits(k &^ (1 << 63))
	}
	return math.Float64frombits(^k)
}

// orderStatBuckets is the number of buckets orderStats spreads the
// samples over.
const orderStatBuckets = 1 << 12

// orderStats returns the values that r would hold at the given ranks
// (0-based) once sorted by sortFloats, without sorting r: the samples are
// counted into buckets of equal width between their least and greatest
// value lo and hi (lo < hi; the bucket of v, ⌊(v − lo)·scale⌋, never
// decreases as v grows, so a bucket holds every rank from its first to its
// last), and only the buckets that hold a rank asked for are gathered and
// sorted. ok is false, and nothing is returned, where those buckets hold
// more than a quarter of the samples (a few outliers stretching the
// range): then a full sort is the quicker way.
func orderStats(r []float64, lo, hi float64, ranks []int) (vals map[int]float64, ok bool) {
	const nb = orderStatBuckets
	n := len(r)
	scale := nb / (hi - lo)
	if !(scale > 0) || math.IsInf(scale, 0) {
		return nil, false
	}
	bucket := func(v float64) int { return min(int((v-lo)*scale), nb-1) }
	var start [nb + 1]int
	for _, v := range r {
		start[bucket(v)+1]++
	}
	for b := 1; b <= nb; b++ {
		start[b] += start[b-1]
	}
	// The buckets holding the ranks, and where each is gathered.
	var at [nb]int32 // 1 + the bucket's offset in buf; 0: not needed
	total := 0
	for _, k := range ranks {
		b := sort.Search(nb, func(b int) bool { return start[b+1] > k })
		if at[b] == 0 {
			at[b] = int32(total + 1)
			total += start[b+1] - start[b]
		}
	}
	if total > n/4 {
		return nil, false
	}
	buf := make([]uint64, total)
	var fill [nb]int32
	for _, v := range r {
		b := bucket(v)
		if at[b] == 0 {
			continue
		}
		buf[at[b]-1+fill[b]] = floatKey(v)
		fill[b]++
	}
	vals = make(map[int]float64, len(ranks))
	sorted := map[int]bool{}
	for _, k := range ranks {
		b := sort.Search(nb, func(b int) bool { return start[b+1] > k })
		off := int(at[b]) - 1
		seg := buf[off : off+start[b+1]-start[b]]
		if !sorted[b] {
			slices.Sort(seg)
			sorted[b] = true
		}
		vals[k] = keyFloat(seg[k-start[b]])
	}
	return vals, true
}

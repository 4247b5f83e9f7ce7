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

// orderStatBuckets is the number of buckets orderBuckets spreads the
// samples over.
const orderStatBuckets = 1 << 14

// orderBuckets finds the values that samples r would hold at given
// ranks (0-based) once sorted by sortFloats, without sorting r: the
// samples are counted into buckets of equal width between their least and
// greatest value lo and hi (lo < hi; the bucket of v, ⌊(v − lo)·scale⌋,
// never decreases as v grows, so a bucket holds every rank from its first
// to its last), and only the buckets that hold a rank asked for are
// gathered and sorted. The caller counts in a pass of its own
// (start[bucket(v)+1]++ for every sample), then calls stats.
type orderBuckets struct {
	lo, scale float64
	start     [orderStatBuckets + 1]int32
	at, fill  [orderStatBuckets]int32
}

// init prepares the buckets for samples from lo to hi (lo < hi); false
// where their width is not a usable number.
func (ob *orderBuckets) init(lo, hi float64) bool {
	ob.lo, ob.scale = lo, orderStatBuckets/(hi-lo)
	return ob.scale > 0 && !math.IsInf(ob.scale, 0)
}

// bucket returns the bucket of v.
func (ob *orderBuckets) bucket(v float64) int {
	return min(int((v-ob.lo)*ob.scale), orderStatBuckets-1)
}

// stats returns the values at the ranks once the samples r are counted.
// ok is false, and nothing is returned, where the buckets holding them hold
// more than a quarter of the samples (a few outliers stretching the
// range): then a full sort is the quicker way.
func (ob *orderBuckets) stats(r []float64, ranks []int) (vals map[int]float64, ok bool) {
	const nb = orderStatBuckets
	n := len(r)
	start := &ob.start
	for b := 1; b <= nb; b++ {
		start[b] += start[b-1]
	}
	// The buckets holding the ranks, and where each is gathered (at: 1 +
	// the bucket's offset in buf; 0: not needed).
	at, fill := &ob.at, &ob.fill
	total := 0
	for _, k := range ranks {
		b := sort.Search(nb, func(b int) bool { return int(start[b+1]) > k })
		if at[b] == 0 {
			at[b] = int32(total + 1)
			total += int(start[b+1] - start[b])
		}
	}
	if total > n/4 {
		return nil, false
	}
	buf := make([]uint64, total)
	for _, v := range r {
		b := ob.bucket(v)
		if at[b] == 0 {
			continue
		}
		buf[at[b]-1+fill[b]] = floatKey(v)
		fill[b]++
	}
	vals = make(map[int]float64, len(ranks))
	sorted := map[int]bool{}
	for _, k := range ranks {
		b := sort.Search(nb, func(b int) bool { return int(start[b+1]) > k })
		off := int(at[b]) - 1
		seg := buf[off : off+int(start[b+1]-start[b])]
		if !sorted[b] {
			slices.Sort(seg)
			sorted[b] = true
		}
		vals[k] = keyFloat(seg[k-int(start[b])])
	}
	return vals, true
}

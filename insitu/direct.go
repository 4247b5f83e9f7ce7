package insitu

import (
	"fmt"
	"math"
	"sort"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// Cone is a sounding prepared for the direct methods of pile capacity:
// the depths of its readings and the cone values the methods read. Between
// two readings a value is taken to vary linearly (the trapezoidal rule of
// MeanOver); readings are never extrapolated beyond the first and the
// last. The zero value holds no reading; every method then refuses it.
type Cone struct {
	z   []float64 // depth, m, strictly increasing
	qc  []float64 // cone resistance as measured (qc, or qt where the file gave qt), Pa
	qe  []float64 // effective cone resistance qE = qt − u2, Pa
	lqe []float64 // ln(qE/1 Pa)
	cqc []float64 // running integral of qc from z[0], Pa·m
	cqe []float64 // running integral of qE, Pa·m
	fs  []float64 // sleeve friction fs, Pa
	cfs []float64 // running integral of fs, Pa·m
	cl  []float64 // running integral of ln qE, m
	id  string
	u2  bool   // u2 was measured (a piezocone sounding)
	lbl string // "cone sounding " + id, for results
}

// NewCone prepares sounding s for the direct methods. Every reading must
// have qc > 0 and qE = qt − u2 > 0, and the depths must increase; a
// reading that breaks this is an error naming its depth.
func NewCone(s *Sounding) (*Cone, error) {
	if s == nil || len(s.Rows) == 0 {
		return nil, fmt.Errorf("insitu: cone: the sounding holds no reading")
	}
	n := len(s.Rows)
	c := &Cone{id: s.ID, u2: s.HasU2, lbl: "cone sounding " + s.ID, z: make([]float64, n), qc: make([]float64, n), qe: make([]float64, n),
		lqe: make([]float64, n), cqc: make([]float64, n), cqe: make([]float64, n), cl: make([]float64, n),
		fs: make([]float64, n), cfs: make([]float64, n)}
	for i, r := range s.Rows {
		z, qc, qt := float64(r.Depth), float64(r.Qc), float64(s.Qt(i))
		qe := qt - float64(r.U2)
		switch {
		case math.IsNaN(z) || math.IsInf(z, 0) || z < 0:
			return nil, fmt.Errorf("insitu: cone: reading %d: depth %g m is not a depth below ground", i+1, z)
		case i > 0 && !(z > c.z[i-1]):
			return nil, fmt.Errorf("insitu: cone: reading %d at %g m is not below the one before (%g m)", i+1, z, c.z[i-1])
		case !(qc > 0) || math.IsInf(qc, 0):
			return nil, fmt.Errorf("insitu: cone: reading at %g m: qc %g kPa is not above 0", z, qc/1e3)
		case !(qe > 0) || math.IsInf(qe, 0):
			return nil, fmt.Errorf("insitu: cone: reading at %g m: qE = qt − u2 = %g kPa is not above 0", z, qe/1e3)
		}
		if f := float64(r.Fs); !(f >= 0) || math.IsInf(f, 0) {
			return nil, fmt.Errorf("insitu: cone: reading at %g m: fs %g kPa is negative or not a number", z, f/1e3)
		}
		c.z[i], c.qc[i], c.qe[i], c.lqe[i], c.fs[i] = z, qc, qe, math.Log(qe), float64(r.Fs)
		if i > 0 {
			h := z - c.z[i-1]
			c.cqc[i] = c.cqc[i-1] + h*(qc+c.qc[i-1])/2
			c.cqe[i] = c.cqe[i-1] + h*(qe+c.qe[i-1])/2
			c.cl[i] = c.cl[i-1] + h*(c.lqe[i]+c.lqe[i-1])/2
			c.cfs[i] = c.cfs[i-1] + h*(c.fs[i]+c.fs[i-1])/2
		}
	}
	return c, nil
}

// Top and Bottom return the depths of the first and the last reading.
func (c *Cone) Top() units.Length { return units.Length(c.first()) }

// Bottom returns the depth of the last reading.
func (c *Cone) Bottom() units.Length { return units.Length(c.last()) }

// Readings returns the number of readings.
func (c *Cone) Readings() int { return len(c.z) }

// ID returns the sounding's identifier.
func (c *Cone) ID() string { return c.id }

// Label returns "cone sounding " and the sounding's identifier.
func (c *Cone) Label() string { return c.lbl }

// HasU2 reports whether the sounding measured u2 (a piezocone).
func (c *Cone) HasU2() bool { return c.u2 }

// needU2 refuses a sounding without u2 for a method that reads qE =
// qt − u2: without it qE would be qt, too high wherever the pore pressure
// is not negligible.
func (c *Cone) needU2(method string) error {
	if len(c.z) > 0 && !c.u2 {
		return fmt.Errorf("insitu: %s: reads qE = qt − u2, and the sounding %q has no u2 measured; use a piezocone sounding or another method", method, c.id)
	}
	return nil
}

func (c *Cone) first() float64 {
	if len(c.z) == 0 {
		return math.NaN()
	}
	return c.z[0]
}

func (c *Cone) last() float64 {
	if len(c.z) == 0 {
		return math.NaN()
	}
	return c.z[len(c.z)-1]
}

// ZoneError says that a direct method needs readings over a depth range
// the sounding does not cover.
type ZoneError struct {
	Method      string  // identifier of the method
	What        string  // what the range is for, such as "tip zone"
	Top, Bottom float64 // the range needed, m
	First, Last float64 // the sounding's first and last reading, m
}

func (e *ZoneError) Error() string {
	if math.IsNaN(e.First) {
		return fmt.Sprintf("insitu: %s: the %s from %.4g to %.4g m needs a cone sounding, and it holds no reading", e.Method, e.What, e.Top, e.Bottom)
	}
	return fmt.Sprintf("insitu: %s: the %s from %.4g to %.4g m is not covered by the cone sounding (readings from %.4g to %.4g m); readings are never extrapolated",
		e.Method, e.What, e.Top, e.Bottom, e.First, e.Last)
}

// cover checks that [a, b] lies within the readings.
func (c *Cone) cover(method, what string, a, b float64) error {
	if len(c.z) == 0 || !(a >= c.z[0]) || !(b <= c.z[len(c.z)-1]) {
		return &ZoneError{Method: method, What: what, Top: a, Bottom: b, First: c.first(), Last: c.last()}
	}
	return nil
}

// seg returns the index i with z[i] ≤ x < z[i+1] (the last segment for x at
// the last reading); x must be within the readings and there must be two.
func (c *Cone) seg(x float64) int {
	i := sort.SearchFloat64s(c.z, x) // first z[i] ≥ x
	if i < len(c.z) && c.z[i] == x {
		if i == len(c.z)-1 {
			return i - 1
		}
		return i
	}
	return i - 1
}

// interp returns series v at depth x (within the readings).
func (c *Cone) interp(v []float64, x float64) float64 {
	if len(c.z) == 1 {
		return v[0]
	}
	i := c.seg(x)
	t := (x - c.z[i]) / (c.z[i+1] - c.z[i])
	return v[i] + t*(v[i+1]-v[i])
}

// running returns the integral of series v from z[0] to x, with cum its
// running integral at the readings.
func (c *Cone) running(v, cum []float64, x float64) float64 {
	if len(c.z) == 1 {
		return 0
	}
	i := c.seg(x)
	h := x - c.z[i]
	return cum[i] + h*(v[i]+c.interp(v, x))/2
}

// integral returns ∫ v dz from a to b (a ≤ b, both within the readings).
func (c *Cone) integral(v, cum []float64, a, b float64) float64 {
	return c.running(v, cum, b) - c.running(v, cum, a)
}

// mean returns the mean of series v over [a, b]; a = b gives the value there.
func (c *Cone) mean(v, cum []float64, a, b float64) float64 {
	if !(b > a) {
		return c.interp(v, a)
	}
	return c.integral(v, cum, a, b) / (b - a)
}

// nodes calls f for the readings strictly inside (a, b) and the ends a
// and b (interpolated), in increasing depth.
func (c *Cone) nodes(v []float64, a, b float64, f func(z, x float64)) {
	f(a, c.interp(v, a))
	i := sort.SearchFloat64s(c.z, a)
	for ; i < len(c.z) && c.z[i] < b; i++ {
		if c.z[i] > a {
			f(c.z[i], v[i])
		}
	}
	if b > a {
		f(b, c.interp(v, b))
	}
}

// clippedMean returns the mean over [a, b] of series v with every value
// held within [lo, hi]: the exact integral of the clipped linear pieces.
func (c *Cone) clippedMean(v []float64, a, b, lo, hi float64) float64 {
	if !(b > a) {
		return min(max(c.interp(v, a), lo), hi)
	}
	var sum, z0, v0 float64
	started := false
	c.nodes(v, a, b, func(z, x float64) {
		if started {
			sum += clippedPiece(z-z0, v0, x, lo, hi)
		}
		z0, v0, started = z, x, true
	})
	return sum / (b - a)
}

// clippedPiece integrates min(max(v, lo), hi) over a length h along which
// v runs linearly from v0 to v1.
func clippedPiece(h, v0, v1, lo, hi float64) float64 {
	ts := [4]float64{0, 1, 0, 0}
	n := 2
	for _, c := range [2]float64{lo, hi} {
		if (v0-c)*(v1-c) < 0 {
			ts[n] = (c - v0) / (v1 - v0)
			n++
		}
	}
	t := ts[:n]
	sort.Float64s(t)
	sum := 0.0
	for k := 1; k < len(t); k++ {
		x0 := min(max(v0+(v1-v0)*t[k-1], lo), hi)
		x1 := min(max(v0+(v1-v0)*t[k], lo), hi)
		sum += (t[k] - t[k-1]) * (x0 + x1) / 2
	}
	return sum * h
}

// TipResult is the unit tip resistance by a direct method, with the
// values a reviewer needs to redo it:
//
//	Qp = min(Factor·Cone, Limit)   (Limit 0: none)
type TipResult struct {
	Qp        units.Stress
	Unlimited units.Stress // Factor·Cone
	Cone      units.Stress // the cone resistance the method averaged over its zone
	Factor    float64      // the factor on it (kc, Ct, 1)
	Limit     units.Stress // 0: none
	Limited   bool         // the limit governs
	// Top and Bottom are the depths of the zone averaged.
	Top, Bottom units.Length
	// Qc1 and Qc2 are the means below and above the tip of the minimum
	// path rule (SchmertmannTip); 0 otherwise.
	Qc1, Qc2 units.Stress
	// Raw is the mean over the zone before clipping (LCPCTip, whose clip
	// bounds are 0.7 and 1.3 times it); 0 otherwise.
	Raw units.Stress
}

// DirectTip is a direct CPT method for the unit tip resistance of a pile
// whose tip lies at depth tip, of diameter or width b.
type DirectTip interface {
	ID() string
	Equation() string
	Range() string
	cite.Cited
	Tip(c *Cone, tip, b units.Length) (TipResult, error)
}

// DirectShaft is a direct CPT method for the unit shaft resistance of a
// pile of diameter or width b (a rule that does not read b ignores it).
// Integral returns ∫ fs dz over [top, bottom] (N/m per metre of
// perimeter, that is Pa·m), exact for the linear variation between
// readings, and whether a limit governed anywhere in it.
type DirectShaft interface {
	ID() string
	Equation() string
	Range() string
	cite.Cited
	Unit(c *Cone, z, b units.Length) (fs, unlimited units.Stress, err error)
	Integral(c *Cone, top, bottom, b units.Length) (force float64, limited bool, err error)
}

// checkSize refuses a pile size outside (0, 10] m.
func checkSize(method string, b units.Length) error {
	if !(b > 0 && b <= 10*units.Metre) {
		return fmt.Errorf("insitu: %s: pile diameter or width %g m is outside (0, 10] m", method, b.Metres())
	}
	return nil
}

// limitOf applies a limit (0: none).
func limitOf(v, limit float64) (float64, bool) {
	if limit > 0 && v > limit {
		return limit, true
	}
	return v, false
}

// LCPCTip is Bustamante & Gianeselli's (1982) tip rule (the LCPC method):
//
//	qp = kc·qca
//
// qca is the equivalent cone resistance at the tip: the mean qc′ of qc
// over the zone from 1.5·B above the tip to 1.5·B below it, then the mean
// over the same zone of qc clipped to 0.7·qc′ … 1.3·qc′ (each value beyond
// a bound replaced by the bound; the linear variation between readings is
// integrated exactly). kc, the bearing factor of the soil and pile
// category, is given by the engineer from the method's table (0.05 to 1);
// qult holds no copy of the table, which could not be read here. The
// zone must lie within the sounding.
type LCPCTip struct {
	Kc    float64
	Limit units.Stress // optional cap on qp; 0: none
}

// ID returns "lcpc".
func (LCPCTip) ID() string { return "lcpc" }

// Equation returns the rule.
func (LCPCTip) Equation() string {
	return "qp = kc·qca, qca = mean over tip ± 1.5B of qc clipped to 0.7…1.3 × its mean there"
}

// Range returns the accepted inputs.
func (LCPCTip) Range() string { return "kc 0.05 to 1; B above 0 to 10 m; readings over tip ± 1.5B" }

// Refs returns the source.
func (LCPCTip) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.BustamanteGianeselli1982, Where: "equivalent cone resistance qca and qp = kc·qca (from memory)"}}
}

// Tip returns the unit tip resistance with the tip at depth tip.
func (m LCPCTip) Tip(c *Cone, tip, b units.Length) (TipResult, error) {
	if err := checkSize(m.ID(), b); err != nil {
		return TipResult{}, err
	}
	if !(m.Kc >= 0.05 && m.Kc <= 1) {
		return TipResult{}, fmt.Errorf("insitu: %s: kc %g is outside 0.05 to 1", m.ID(), m.Kc)
	}
	a, e := float64(tip-1.5*b), float64(tip+1.5*b)
	if err := c.cover(m.ID(), "tip zone (tip ± 1.5 B)", a, e); err != nil {
		return TipResult{}, err
	}
	raw := c.mean(c.qc, c.cqc, a, e)
	qca := c.clippedMean(c.qc, a, e, 0.7*raw, 1.3*raw)
	r := TipResult{Cone: units.Stress(qca), Factor: m.Kc, Limit: m.Limit, Top: units.Length(a), Bottom: units.Length(e), Raw: units.Stress(raw)}
	q := m.Kc * qca
	r.Unlimited = units.Stress(q)
	q, r.Limited = limitOf(q, float64(m.Limit))
	r.Qp = units.Stress(q)
	return r, nil
}

// LCPCShaft is Bustamante & Gianeselli's (1982) shaft rule:
//
//	fs = min(qc/α, fs,max)
//
// with qc at the depth, and α and the limit fs,max of the soil and pile
// category given by the engineer from the method's tables (α 10 to 300;
// limit above 0 to 1 MPa); qult holds no copy of the tables.
type LCPCShaft struct {
	Alpha float64
	Limit units.Stress
}

// ID returns "lcpc".
func (LCPCShaft) ID() string { return "lcpc" }

// Equation returns the rule.
func (LCPCShaft) Equation() string { return "fs = min(qc/α, fs,max)" }

// Range returns the accepted inputs.
func (LCPCShaft) Range() string {
	return "α 10 to 300; fs,max above 0 to 1000 kPa; readings along the shaft"
}

// Refs returns the source.
func (LCPCShaft) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.BustamanteGianeselli1982, Where: "fs = qc/α with the limit of the category (from memory)"}}
}

func (m LCPCShaft) check() error {
	if !(m.Alpha >= 10 && m.Alpha <= 300) {
		return fmt.Errorf("insitu: %s: α %g is outside 10 to 300", m.ID(), m.Alpha)
	}
	if !(m.Limit > 0 && m.Limit <= units.Megapascal) {
		return fmt.Errorf("insitu: %s: fs,max %g kPa is outside (0, 1000] kPa", m.ID(), m.Limit.KPa())
	}
	return nil
}

// Unit returns fs at depth z, and qc/α before the limit.
func (m LCPCShaft) Unit(c *Cone, z, _ units.Length) (units.Stress, units.Stress, error) {
	if err := m.check(); err != nil {
		return 0, 0, err
	}
	if err := c.cover(m.ID(), "shaft", float64(z), float64(z)); err != nil {
		return 0, 0, err
	}
	u := c.interp(c.qc, float64(z)) / m.Alpha
	f, _ := limitOf(u, float64(m.Limit))
	return units.Stress(f), units.Stress(u), nil
}

// Integral returns ∫ fs dz over [top, bottom].
func (m LCPCShaft) Integral(c *Cone, top, bottom, _ units.Length) (float64, bool, error) {
	if err := m.check(); err != nil {
		return 0, false, err
	}
	a, b := float64(top), float64(bottom)
	if err := c.cover(m.ID(), "shaft", a, b); err != nil {
		return 0, false, err
	}
	if !(b > a) {
		return 0, false, nil
	}
	capq := m.Alpha * float64(m.Limit)
	full := c.integral(c.qc, c.cqc, a, b)
	clipped := c.clippedMean(c.qc, a, b, math.Inf(-1), capq) * (b - a)
	return clipped / m.Alpha, clipped < full, nil
}

// SchmertmannTip is the tip rule of Schmertmann (1978) after Nottingham
// (1975), with the minimum-path averaging of the Dutch method:
//
//	qp = (qc1 + qc2)/2 ≤ limit
//	qc1 = (qcI + qcII)/2 below the tip, to the depth y·B (0.7 ≤ y ≤ 4) that gives the least qp
//	qcI  = mean qc from the tip down to y·B
//	qcII = mean of the minimum path from y·B back up to the tip (each value the least met so far)
//	qc2  = mean of the minimum path over 8·B above the tip, going up, starting from the least value below
//
// The means take the readings inside each range and the values at its
// ends (linear between readings) by the trapezoidal rule; y runs over
// 0.7, 4 and every reading between. Limit, the published cap on qp, is
// given by the engineer (the report could not be read here).
//
// The averaging is the Dutch method's, as read in ENV 1997-3 Annex B.4(3)
// (the zones, the critical depth at the least resistance, the minimum path
// up from it, the path above starting from the least value below) and in
// Tomlinson & Woodward (2008, Eq. 4.19, p. 178: qp = (qc1 + qc2)/2, and
// qc1 over 0.7B alone where qc rises below the tip). The split qc1 =
// (qcI + qcII)/2 is recalled, not read. Caution: where qc drops sharply
// between 0.7B and 4B below the tip, Tomlinson & Woodward take the least
// value in that range as qc1, which is lower than (qcI + qcII)/2; an
// engineer who follows that reading should check the tip by hand.
type SchmertmannTip struct {
	Limit units.Stress
}

// ID returns "schmertmann".
func (SchmertmannTip) ID() string { return "schmertmann" }

// Equation returns the rule.
func (SchmertmannTip) Equation() string {
	return "qp = (qc1 + qc2)/2 ≤ limit; qc1 over 0.7B to 4B below (minimum path), qc2 over 8B above (minimum path)"
}

// Range returns the accepted inputs.
func (SchmertmannTip) Range() string {
	return "limit above 0 to 100 MPa; B above 0 to 10 m; readings from 8B above to 4B below the tip"
}

// Refs returns the sources.
func (SchmertmannTip) Refs() []cite.Ref {
	return []cite.Ref{
		{Source: cite.Schmertmann1978, Where: "pile tip from qc1 and qc2 (from memory)"},
		{Source: cite.Nottingham1975, Where: "averaging of qc about the tip (from memory)"},
		{Source: cite.ENV1997Part3, Where: "Annex B.4(3), the averaging zones and the minimum path (read in a transcription)"},
		{Source: cite.TomlinsonWoodward2008, Where: "Eq. 4.19, qp = (qc1 + qc2)/2, p. 178"},
	}
}

// Tip returns the unit tip resistance with the tip at depth tip.
func (m SchmertmannTip) Tip(c *Cone, tip, b units.Length) (TipResult, error) {
	if err := checkSize(m.ID(), b); err != nil {
		return TipResult{}, err
	}
	if !(m.Limit > 0 && m.Limit <= 100*units.Megapascal) {
		return TipResult{}, fmt.Errorf("insitu: %s: limit %g kPa is outside (0, 100000] kPa", m.ID(), m.Limit.KPa())
	}
	z, bb := float64(tip), float64(b)
	top, bot := z-8*bb, z+4*bb
	if err := c.cover(m.ID(), "tip zone (8B above to 4B below)", top, bot); err != nil {
		return TipResult{}, err
	}
	best := math.Inf(1)
	var bestQ1, bestQ2 float64
	lastLeast, lastQ2 := math.NaN(), 0.0
	try := func(d float64) {
		q1, least := c.minPathBelow(z, d)
		// the path above depends on the candidate only through the least
		// value below, which falls as d grows: work it out when it changes
		if least != lastLeast {
			lastLeast, lastQ2 = least, c.minPathAbove(z, top, least)
		}
		q2 := lastQ2
		if q := (q1 + q2) / 2; q < best {
			best, bestQ1, bestQ2 = q, q1, q2
		}
	}
	try(z + 0.7*bb)
	for i := sort.SearchFloat64s(c.z, z+0.7*bb); i < len(c.z) && c.z[i] < z+4*bb; i++ {
		if c.z[i] > z+0.7*bb {
			try(c.z[i])
		}
	}
	try(z + 4*bb)
	r := TipResult{Cone: units.Stress(best), Factor: 1, Limit: m.Limit, Top: units.Length(top), Bottom: units.Length(bot),
		Qc1: units.Stress(bestQ1), Qc2: units.Stress(bestQ2)}
	r.Unlimited = units.Stress(best)
	q, lim := limitOf(best, float64(m.Limit))
	r.Qp, r.Limited = units.Stress(q), lim
	return r, nil
}

// inside returns the indices lo…hi of the readings strictly inside (a, b)
// (hi < lo when there is none).
func (c *Cone) inside(a, b float64) (lo, hi int) {
	lo = sort.SearchFloat64s(c.z, a)
	if lo < len(c.z) && c.z[lo] == a {
		lo++
	}
	hi = sort.SearchFloat64s(c.z, b) - 1 // last z[i] < b
	return lo, hi
}

// minPathBelow returns (qcI + qcII)/2 from z down to d, and the least qc
// met on the way: the readings inside (z, d) and the values at both ends,
// taken bottom-up. It allocates nothing.
func (c *Cone) minPathBelow(z, d float64) (float64, float64) {
	pz, pv := d, c.interp(c.qc, d)
	if !(d > z) {
		return pv, pv
	}
	least := pv
	var sI, sII float64
	step := func(zk, vk float64) {
		h := pz - zk
		sI += h * (pv + vk) / 2
		hi := least
		least = min(least, vk)
		sII += h * (hi + least) / 2
		pz, pv = zk, vk
	}
	lo, hi := c.inside(z, d)
	for i := hi; i >= lo; i-- {
		step(c.z[i], c.qc[i])
	}
	step(z, c.interp(c.qc, z))
	L := d - z
	return (sI/L + sII/L) / 2, least
}

// minPathAbove returns the mean of the minimum path from z up to top,
// starting from the bound least. It allocates nothing.
func (c *Cone) minPathAbove(z, top, least float64) float64 {
	pz := z
	cur := min(least, c.interp(c.qc, z))
	if !(z > top) {
		return cur
	}
	var s float64
	step := func(zk, vk float64) {
		next := min(cur, vk)
		s += (pz - zk) * (cur + next) / 2
		pz, cur = zk, next
	}
	lo, hi := c.inside(top, z)
	for i := hi; i >= lo; i-- {
		step(c.z[i], c.qc[i])
	}
	step(top, c.interp(c.qc, top))
	return s / (z - top)
}

// EslamiFelleniusTip is Eslami & Fellenius's (1997) tip rule:
//
//	qp = Ct·qEg,  qE = qt − u2
//
// with qEg the geometric mean of qE over the tip zone. The method takes
// 8·B above and 4·B below the tip where the pile enters a stronger soil
// from a weaker, 2·B above and 4·B below where it enters a weaker soil
// from a stronger; we take the lesser of the two means, so that the
// engineer need not choose the case (the lower, conservative value; our
// choice). The mean is that of ln qE, linear between readings. Ct, the
// toe correlation coefficient, is 1 unless given (0.1 to 1). The sounding
// must have u2 measured (a piezocone): without it qE would be qt.
type EslamiFelleniusTip struct {
	Ct float64 // 0 means 1
}

// ID returns "eslami-fellenius".
func (EslamiFelleniusTip) ID() string { return "eslami-fellenius" }

// Equation returns the rule.
func (EslamiFelleniusTip) Equation() string {
	return "qp = Ct·qEg, qE = qt − u2, qEg the geometric mean over 8B (or 2B) above to 4B below, the lesser"
}

// Range returns the accepted inputs.
func (EslamiFelleniusTip) Range() string {
	return "Ct 0.1 to 1; B above 0 to 10 m; readings from 8B above to 4B below the tip"
}

// Refs returns the source.
func (EslamiFelleniusTip) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.EslamiFellenius1997, Where: "toe resistance from the geometric mean of qE, Ct = 1 (from memory; the unfiltered geometric average as the abstract states)"}}
}

func (m EslamiFelleniusTip) ct() float64 {
	if m.Ct == 0 {
		return 1
	}
	return m.Ct
}

// Tip returns the unit tip resistance with the tip at depth tip.
func (m EslamiFelleniusTip) Tip(c *Cone, tip, b units.Length) (TipResult, error) {
	if err := checkSize(m.ID(), b); err != nil {
		return TipResult{}, err
	}
	ct := m.ct()
	if !(ct >= 0.1 && ct <= 1) {
		return TipResult{}, fmt.Errorf("insitu: %s: Ct %g is outside 0.1 to 1", m.ID(), ct)
	}
	z, bb := float64(tip), float64(b)
	top, bot := z-8*bb, z+4*bb
	if err := c.cover(m.ID(), "tip zone (8B above to 4B below)", top, bot); err != nil {
		return TipResult{}, err
	}
	if err := c.needU2(m.ID()); err != nil {
		return TipResult{}, err
	}
	g8 := math.Exp(c.mean(c.lqe, c.cl, top, bot))
	g2 := math.Exp(c.mean(c.lqe, c.cl, z-2*bb, bot))
	g := g8
	r := TipResult{Factor: ct, Top: units.Length(top), Bottom: units.Length(bot)}
	if g2 < g8 {
		g, r.Top = g2, units.Length(z-2*bb)
	}
	r.Cone = units.Stress(g)
	r.Unlimited = units.Stress(ct * g)
	r.Qp = r.Unlimited
	return r, nil
}

// EslamiFelleniusShaft is Eslami & Fellenius's (1997) shaft rule:
//
//	fs = Cs·qE,  qE = qt − u2
//
// with Cs the shaft correlation coefficient of the soil type the engineer
// reads from the method's soil profiling chart (0.001 to 0.1); qult holds
// no copy of the chart's table. The sounding must have u2 measured.
type EslamiFelleniusShaft struct {
	Cs float64
}

// ID returns "eslami-fellenius".
func (EslamiFelleniusShaft) ID() string { return "eslami-fellenius" }

// Equation returns the rule.
func (EslamiFelleniusShaft) Equation() string { return "fs = Cs·qE, qE = qt − u2" }

// Range returns the accepted inputs.
func (EslamiFelleniusShaft) Range() string { return "Cs 0.001 to 0.1; readings along the shaft" }

// Refs returns the source.
func (EslamiFelleniusShaft) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.EslamiFellenius1997, Where: "shaft resistance rs = Cs·qE by soil type (from memory)"}}
}

func (m EslamiFelleniusShaft) check() error {
	if !(m.Cs >= 0.001 && m.Cs <= 0.1) {
		return fmt.Errorf("insitu: %s: Cs %g is outside 0.001 to 0.1", m.ID(), m.Cs)
	}
	return nil
}

// Unit returns fs at depth z (twice: the method has no limit).
func (m EslamiFelleniusShaft) Unit(c *Cone, z, _ units.Length) (units.Stress, units.Stress, error) {
	if err := m.check(); err != nil {
		return 0, 0, err
	}
	if err := c.cover(m.ID(), "shaft", float64(z), float64(z)); err != nil {
		return 0, 0, err
	}
	if err := c.needU2(m.ID()); err != nil {
		return 0, 0, err
	}
	f := units.Stress(m.Cs * c.interp(c.qe, float64(z)))
	return f, f, nil
}

// Integral returns ∫ fs dz over [top, bottom].
func (m EslamiFelleniusShaft) Integral(c *Cone, top, bottom, _ units.Length) (float64, bool, error) {
	if err := m.check(); err != nil {
		return 0, false, err
	}
	a, b := float64(top), float64(bottom)
	if err := c.cover(m.ID(), "shaft", a, b); err != nil {
		return 0, false, err
	}
	if err := c.needU2(m.ID()); err != nil {
		return 0, false, err
	}
	if !(b > a) {
		return 0, false, nil
	}
	return m.Cs * c.integral(c.qe, c.cqe, a, b), false, nil
}

// taperedIntegral returns ∫ (z/zt)·v dz over [a, b] (0 ≤ a ≤ b ≤ zt), v
// linear between readings: Simpson's rule on each piece, exact for the
// product of two linear functions.
func (c *Cone) taperedIntegral(v []float64, a, b, zt float64) float64 {
	if !(b > a) {
		return 0
	}
	var sum, z0, v0 float64
	started := false
	c.nodes(v, a, b, func(z, x float64) {
		if started {
			zm, vm := (z0+z)/2, (v0+x)/2
			sum += (z - z0) / 6 * (z0*v0 + 4*zm*vm + z*x)
		}
		z0, v0, started = z, x, true
	})
	return sum / zt
}

// SchmertmannSandShaft is the shaft rule of Schmertmann (1978) after
// Nottingham (1975) in sand, from the sleeve friction:
//
//	fs,pile = K·w(z)·fs,   w = z/(8B) for z < 8B below the ground surface, 1 below
//
// with K, the ratio of the pile's unit friction to the sleeve's for the
// pile's embedment ratio L/B, pile material and cone, read by the engineer
// from the method's chart and given (0.1 to 3); qult holds no copy of the
// chart. Limit, a cap on fs,pile, is optional (0: none).
type SchmertmannSandShaft struct {
	K     float64
	Limit units.Stress
}

// ID returns "schmertmann-sand".
func (SchmertmannSandShaft) ID() string { return "schmertmann-sand" }

// Equation returns the rule.
func (SchmertmannSandShaft) Equation() string {
	return "fs = K·w·fs,cone ≤ limit, w = z/(8B) over the top 8B, 1 below"
}

// Range returns the accepted inputs.
func (SchmertmannSandShaft) Range() string {
	return "K 0.1 to 3; limit ≥ 0 kPa (0: none); B above 0 to 10 m; readings along the shaft"
}

// Refs returns the sources.
func (SchmertmannSandShaft) Refs() []cite.Ref {
	return []cite.Ref{
		{Source: cite.Schmertmann1978, Where: "pile friction in sand from the sleeve friction, K by embedment ratio, the top 8B weighted (from memory)"},
		{Source: cite.Nottingham1975, Where: "friction correction factors (from memory)"},
	}
}

func (m SchmertmannSandShaft) check(b units.Length) error {
	if !(m.K >= 0.1 && m.K <= 3) {
		return fmt.Errorf("insitu: %s: K %g is outside 0.1 to 3", m.ID(), m.K)
	}
	if !(m.Limit >= 0) || math.IsInf(float64(m.Limit), 0) {
		return fmt.Errorf("insitu: %s: limit %g kPa is negative or not finite", m.ID(), m.Limit.KPa())
	}
	return checkSize(m.ID(), b)
}

// Unit returns fs at depth z for a pile of width b, and the value before
// the limit.
func (m SchmertmannSandShaft) Unit(c *Cone, z, b units.Length) (units.Stress, units.Stress, error) {
	if err := m.check(b); err != nil {
		return 0, 0, err
	}
	if err := c.cover(m.ID(), "shaft", float64(z), float64(z)); err != nil {
		return 0, 0, err
	}
	w := min(float64(z)/(8*float64(b)), 1)
	u := m.K * w * c.interp(c.fs, float64(z))
	f, _ := limitOf(u, float64(m.Limit))
	return units.Stress(f), units.Stress(u), nil
}

// Integral returns ∫ fs dz over [top, bottom] for a pile of width b,
// exact for the linear variation between readings; with a limit, the
// integral is taken by Simpson's rule on each piece between readings of
// min(K·w·fs, limit) (exact where the limit does not cut a piece).
func (m SchmertmannSandShaft) Integral(c *Cone, top, bottom, b units.Length) (float64, bool, error) {
	if err := m.check(b); err != nil {
		return 0, false, err
	}
	a, e := float64(top), float64(bottom)
	if err := c.cover(m.ID(), "shaft", a, e); err != nil {
		return 0, false, err
	}
	if !(e > a) {
		return 0, false, nil
	}
	zt := 8 * float64(b)
	if m.Limit == 0 {
		q := c.taperedIntegral(c.fs, a, min(e, zt), zt)
		if e > zt {
			q += c.integral(c.fs, c.cfs, max(a, zt), e)
		}
		return m.K * q, false, nil
	}
	lim := float64(m.Limit)
	var sum, z0, v0 float64
	limited, started := false, false
	f := func(z, v float64) float64 {
		u := m.K * min(z/zt, 1) * v
		if u > lim {
			limited = true
			return lim
		}
		return u
	}
	c.nodes(c.fs, a, e, func(z, x float64) {
		if started {
			// split a piece at 8B so that each part is a product of linears
			parts := [3]float64{z0, z, z}
			if z0 < zt && zt < z {
				parts[1] = zt
			}
			for k := 0; k < 2; k++ {
				p0, p1 := parts[k], parts[k+1]
				if !(p1 > p0) {
					continue
				}
				vp0 := v0 + (x-v0)*(p0-z0)/(z-z0)
				vp1 := v0 + (x-v0)*(p1-z0)/(z-z0)
				pm := (p0 + p1) / 2
				sum += (p1 - p0) / 6 * (f(p0, vp0) + 4*f(pm, (vp0+vp1)/2) + f(p1, vp1))
			}
		}
		z0, v0, started = z, x, true
	})
	return sum, limited, nil
}

// SchmertmannClayShaft is the shaft rule of Schmertmann (1978) in clay:
//
//	fs,pile = α′·fs ≤ limit
//
// with α′ read by the engineer from the method's chart (by pile material
// and fs) and given (0.1 to 1.5); Limit optional (0: none).
type SchmertmannClayShaft struct {
	Alpha float64
	Limit units.Stress
}

// ID returns "schmertmann-clay".
func (SchmertmannClayShaft) ID() string { return "schmertmann-clay" }

// Equation returns the rule.
func (SchmertmannClayShaft) Equation() string { return "fs = α′·fs,cone ≤ limit" }

// Range returns the accepted inputs.
func (SchmertmannClayShaft) Range() string {
	return "α′ 0.1 to 1.5; limit ≥ 0 kPa (0: none); readings along the shaft"
}

// Refs returns the source.
func (SchmertmannClayShaft) Refs() []cite.Ref {
	return []cite.Ref{{Source: cite.Schmertmann1978, Where: "pile friction in clay from the sleeve friction, α′ (from memory)"}}
}

func (m SchmertmannClayShaft) check() error {
	if !(m.Alpha >= 0.1 && m.Alpha <= 1.5) {
		return fmt.Errorf("insitu: %s: α′ %g is outside 0.1 to 1.5", m.ID(), m.Alpha)
	}
	if !(m.Limit >= 0) || math.IsInf(float64(m.Limit), 0) {
		return fmt.Errorf("insitu: %s: limit %g kPa is negative or not finite", m.ID(), m.Limit.KPa())
	}
	return nil
}

// Unit returns fs at depth z, and the value before the limit.
func (m SchmertmannClayShaft) Unit(c *Cone, z, _ units.Length) (units.Stress, units.Stress, error) {
	if err := m.check(); err != nil {
		return 0, 0, err
	}
	if err := c.cover(m.ID(), "shaft", float64(z), float64(z)); err != nil {
		return 0, 0, err
	}
	u := m.Alpha * c.interp(c.fs, float64(z))
	f, _ := limitOf(u, float64(m.Limit))
	return units.Stress(f), units.Stress(u), nil
}

// Integral returns ∫ fs dz over [top, bottom], exact for the linear
// variation between readings (each piece clipped at the limit exactly).
func (m SchmertmannClayShaft) Integral(c *Cone, top, bottom, _ units.Length) (float64, bool, error) {
	if err := m.check(); err != nil {
		return 0, false, err
	}
	a, e := float64(top), float64(bottom)
	if err := c.cover(m.ID(), "shaft", a, e); err != nil {
		return 0, false, err
	}
	if !(e > a) {
		return 0, false, nil
	}
	full := c.integral(c.fs, c.cfs, a, e)
	if m.Limit == 0 {
		return m.Alpha * full, false, nil
	}
	clipped := c.clippedMean(c.fs, a, e, math.Inf(-1), float64(m.Limit)/m.Alpha) * (e - a)
	return m.Alpha * clipped, clipped < full, nil
}

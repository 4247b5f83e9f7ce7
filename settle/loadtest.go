package settle

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/units"
)

// LoadTest is a static compression load test as points: head load and
// head settlement, in the order applied.
type LoadTest struct {
	Load       []units.Force
	Settlement []units.Length
}

// check validates the points: equal counts, at least min points, every
// value finite and at least 0, loads never falling and settlements rising
// (strictly, after the first point).
func (t LoadTest) check(min int) error {
	if len(t.Load) != len(t.Settlement) {
		return fmt.Errorf("load_test.points: %d loads and %d settlements; give one settlement per load", len(t.Load), len(t.Settlement))
	}
	if len(t.Load) < min {
		return fmt.Errorf("load_test.points: %d points; this criterion needs at least %d", len(t.Load), min)
	}
	for i := range t.Load {
		q, s := float64(t.Load[i]), float64(t.Settlement[i])
		if !(q >= 0) || math.IsInf(q, 0) {
			return fmt.Errorf("load_test.points[%d].load: %v kN is outside 0 to ∞ kN", i, q/1e3)
		}
		if !(s >= 0) || math.IsInf(s, 0) {
			return fmt.Errorf("load_test.points[%d].settlement: %v mm is outside 0 to ∞ mm", i, s*1e3)
		}
		if i > 0 {
			if q < float64(t.Load[i-1]) {
				return fmt.Errorf("load_test.points[%d].load: %v kN is less than the load before it, %v kN (points must not fall)", i, q/1e3, t.Load[i-1].KN())
			}
			if !(s > float64(t.Settlement[i-1])) {
				return fmt.Errorf("load_test.points[%d].settlement: %v mm is not greater than the settlement before it, %v mm (points must rise)", i, s*1e3, t.Settlement[i-1].Millimetres())
			}
		}
	}
	return nil
}

// Limit is a load read from a load test by one criterion.
type Limit struct {
	Criterion  string       // our identifier: "davisson", "chin-kondner", "ten-percent", "brinch-hansen-80"
	Load       units.Force  // the limit load (0 when not Reached)
	Settlement units.Length // the settlement at that load
	// Reached is false when the test stopped before the criterion was met
	// (Davisson, ten percent): no load is read then, nothing is
	// extrapolated.
	Reached bool
	// C1 and C2 are the straight-line fit of the hyperbolic criteria
	// (Chin-Kondner: s/Q = C1·s + C2; Brinch Hansen: √s/Q = C1·s + C2),
	// in SI units, and R2 its coefficient of determination.
	C1, C2, R2 float64
	Refs       []cite.Ref
}

// crossing returns the first load at which the measured curve, linear
// between points, meets s = line(Q) from below, and the settlement there.
func (t LoadTest) crossing(line func(q float64) float64) (q, s float64, ok bool) {
	prev := 0.0
	for i := range t.Load {
		qi, si := float64(t.Load[i]), float64(t.Settlement[i])
		g := si - line(qi)
		if g >= 0 {
			if i == 0 {
				return qi, si, true
			}
			q0, s0 := float64(t.Load[i-1]), float64(t.Settlement[i-1])
			f := prev / (prev - g) // prev < 0 ≤ g
			return q0 + f*(qi-q0), s0 + f*(si-s0), true
		}
		prev = g
	}
	return 0, 0, false
}

// DavissonOffset is Davisson's offset, 0.15 in = 3.81 mm (the source
// writes inches; 3.8 or 4 mm in rounded SI).
const DavissonOffset = 0.15 * units.Inch

// Davisson returns Davisson's (1972) offset limit load: where the measured
// curve meets the line
//
//	s = Q·L/(A·E) + 0.15 in + D/120
//
// L is the pile length (m), A·E the axial stiffness of the section (N) and
// D the diameter or width (m). The measured curve is linear between points;
// a test that stops before the line is met is not Reached.
func Davisson(t LoadTest, length units.Length, ea units.Force, diameter units.Length) (Limit, error) {
	if err := t.check(2); err != nil {
		return Limit{}, err
	}
	if err := posLen("length", length); err != nil {
		return Limit{}, err
	}
	if err := posLen("diameter", diameter); err != nil {
		return Limit{}, err
	}
	if !(ea > 0) || math.IsInf(float64(ea), 0) {
		return Limit{}, fmt.Errorf("ea: %v kN is outside (0, ∞) kN", ea.KN())
	}
	c := float64(length) / float64(ea)
	off := float64(DavissonOffset) + float64(diameter)/120
	lim := Limit{Criterion: "davisson", Refs: []cite.Ref{{Source: cite.Davisson1972, Where: "offset limit"},
		{Source: cite.FelleniusBasics, Where: "interpretation of static loading tests"}}}
	q, s, ok := t.crossing(func(q float64) float64 { return q*c + off })
	if ok {
		lim.Load, lim.Settlement, lim.Reached = units.Force(q), units.Length(s), true
	}
	return lim, nil
}

// TenPercent returns the load at a settlement of 10 % of the diameter D
// (EN ISO 22477-1), linear between points; not Reached when the test
// stopped short of it.
func TenPercent(t LoadTest, diameter units.Length) (Limit, error) {
	if err := t.check(2); err != nil {
		return Limit{}, err
	}
	if err := posLen("diameter", diameter); err != nil {
		return Limit{}, err
	}
	target := 0.1 * float64(diameter)
	lim := Limit{Criterion: "ten-percent", Refs: []cite.Ref{{Source: cite.ENISO22477, Where: "settlement of 10 % of the pile diameter"}}}
	q, s, ok := t.crossing(func(float64) float64 { return target })
	if ok {
		lim.Load, lim.Settlement, lim.Reached = units.Force(q), units.Length(s), true
	}
	return lim, nil
}

// fit returns the least-squares line y = c1·x + c2 and R².
func fit(x, y []float64) (c1, c2, r2 float64) {
	n := float64(len(x))
	var sx, sy, sxx, sxy, syy float64
	for i := range x {
		sx += x[i]
		sy += y[i]
	}
	mx, my := sx/n, sy/n
	for i := range x {
		dx, dy := x[i]-mx, y[i]-my
		sxx += dx * dx
		sxy += dx * dy
		syy += dy * dy
	}
	c1 = sxy / sxx
	c2 = my - c1*mx
	if syy > 0 {
		r2 = sxy * sxy / (sxx * syy)
	} else {
		r2 = 1
	}
	return c1, c2, r2
}

// hyperPoints returns the points from index from on with load and
// settlement above zero.
func (t LoadTest) hyperPoints(from int) (q, s []float64) {
	for i := from; i < len(t.Load); i++ {
		if t.Load[i] > 0 && t.Settlement[i] > 0 {
			q = append(q, float64(t.Load[i]))
			s = append(s, float64(t.Settlement[i]))
		}
	}
	return q, s
}

func checkFrom(t LoadTest, from int) error {
	if from < 0 || from >= len(t.Load) {
		return fmt.Errorf("load_test.fit_from: %d is outside 0 to %d", from, len(t.Load)-1)
	}
	return nil
}

// ChinKondner returns Chin's (1970) extrapolation of Kondner's (1963)
// hyperbola: a straight line is fitted by least squares to s/Q against s
// over the points from index from (those with Q and s above zero; at least
// 3), s/Q = C1·s + C2, and the ultimate load is its asymptote
//
//	Qult = 1/C1
//
// An asymptote is not a failure load: it lies above the loads measured and
// is reached only at infinite settlement. Fit the straight part of the
// plot (the later points).
func ChinKondner(t LoadTest, from int) (Limit, error) {
	c1, c2, r2, err := t.fitFrom(from, "Chin-Kondner", func(q, s float64) float64 { return s / q })
	if err != nil {
		return Limit{}, err
	}
	if !(c1 > 0) {
		return Limit{}, fmt.Errorf("load_test.points: s/Q against s has slope %.4g ≤ 0; the points show no asymptote (load them further)", c1)
	}
	qu := 1 / c1
	if math.IsInf(qu, 0) || math.IsNaN(c2) || math.IsInf(c2, 0) {
		return Limit{}, fmt.Errorf("load_test.points: the fit of s/Q against s is not finite (slope %.4g); check the points", c1)
	}
	// Settlement stays 0: an asymptote has no settlement.
	return Limit{Criterion: "chin-kondner", Load: units.Force(qu),
		Reached: true, C1: c1, C2: c2, R2: r2,
		Refs: []cite.Ref{{Source: cite.Chin1970, Where: "s/Q against s"}, {Source: cite.Kondner1963, Where: "hyperbola"}}}, nil
}

// fitFrom fits y(Q, s) = C1·s + C2 by least squares over the points from
// index from whose load and settlement are above zero (at least 3), the
// straight line of the hyperbolic criteria; name says which criterion in
// the messages.
func (t LoadTest) fitFrom(from int, name string, y func(q, s float64) float64) (c1, c2, r2 float64, err error) {
	if err := t.check(3); err != nil {
		return 0, 0, 0, err
	}
	if err := checkFrom(t, from); err != nil {
		return 0, 0, 0, err
	}
	q, s := t.hyperPoints(from)
	if len(q) < 3 {
		return 0, 0, 0, fmt.Errorf("load_test.points: %d points with load and settlement above zero from point %d; %s needs 3", len(q), from, name)
	}
	ys := make([]float64, len(q))
	for i := range q {
		ys[i] = y(q[i], s[i])
	}
	c1, c2, r2 = fit(s, ys)
	return c1, c2, r2, nil
}

// BrinchHansen80 returns Brinch Hansen's (1963) 80 % criterion: the
// ultimate load Qu is the load at which the settlement is four times the
// settlement at 0.8·Qu. With the curve taken as √s/Q = C1·s + C2 (fitted
// by least squares over the points from index from, at least 3):
//
//	Qu = 1/(2·√(C1·C2)), su = C2/C1
//
// (the fitting procedure as described by Fellenius, from memory).
func BrinchHansen80(t LoadTest, from int) (Limit, error) {
	c1, c2, r2, err := t.fitFrom(from, "Brinch Hansen's criterion", func(q, s float64) float64 { return math.Sqrt(s) / q })
	if err != nil {
		return Limit{}, err
	}
	if !(c1 > 0 && c2 > 0) {
		return Limit{}, fmt.Errorf("load_test.points: √s/Q against s gives C1 = %.4g, C2 = %.4g; both must be above zero (the points do not show the criterion)", c1, c2)
	}
	qu, su := 1/(2*math.Sqrt(c1)*math.Sqrt(c2)), c2/c1
	if math.IsInf(qu, 0) || math.IsNaN(qu) || math.IsInf(su, 0) || math.IsNaN(su) {
		return Limit{}, fmt.Errorf("load_test.points: the fit of √s/Q against s is not finite (C1 %.4g, C2 %.4g); check the points", c1, c2)
	}
	return Limit{Criterion: "brinch-hansen-80", Load: units.Force(qu), Settlement: units.Length(su),
		Reached: true, C1: c1, C2: c2, R2: r2,
		Refs: []cite.Ref{{Source: cite.BrinchHansen1963, Where: "80 % criterion"}, {Source: cite.FelleniusBasics, Where: "interpretation of static loading tests"}}}, nil
}

package insitu

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/units"
)

// Value picks the quantity to average from an interpreted point, such as
// func(p *Point) float64 { return float64(p.Qt) }.
type Value func(p *Point) float64

// Mean is an average over a depth range.
type Mean struct {
	Top, Bottom units.Length // the range asked for
	Value       float64      // the mean
	Readings    int          // valid readings inside the range
	Skipped     int          // readings inside the range that were not normalised
}

// MeanOver returns the depth-weighted mean of v over the valid points with
// top ≤ depth ≤ bottom (points in increasing depth, as InterpretCPT
// returns them):
//
//	mean = ∫ v dz / (z_last − z_first)
//
// by the trapezoidal rule between the readings inside the range; one
// reading is its own mean. Readings are not extrapolated to the ends of
// the range. It is an error when the range holds no valid reading or lies
// outside the sounding.
func MeanOver(points []Point, top, bottom units.Length, v Value) (Mean, error) {
	m := Mean{Top: top, Bottom: bottom}
	if !(bottom >= top) {
		return m, fmt.Errorf("insitu: mean: bottom %g m is above top %g m", bottom.Metres(), top.Metres())
	}
	if len(points) == 0 {
		return m, fmt.Errorf("insitu: mean: no readings")
	}
	if top > points[len(points)-1].Depth || bottom < points[0].Depth {
		return m, fmt.Errorf("insitu: mean: %g to %g m lies outside the sounding (%g to %g m)",
			top.Metres(), bottom.Metres(), points[0].Depth.Metres(), points[len(points)-1].Depth.Metres())
	}
	var sum, zFirst, zPrev, vPrev float64
	for i := range points {
		p := &points[i]
		if p.Depth < top {
			continue
		}
		if p.Depth > bottom {
			break
		}
		if !p.Valid() {
			m.Skipped++
			continue
		}
		z, val := float64(p.Depth), v(p)
		if math.IsNaN(val) || math.IsInf(val, 0) {
			return m, fmt.Errorf("insitu: mean: value at %g m is not finite", z)
		}
		if m.Readings == 0 {
			zFirst = z
			m.Value = val
		} else {
			sum += (z - zPrev) * (val + vPrev) / 2
		}
		zPrev, vPrev = z, val
		m.Readings++
	}
	switch {
	case m.Readings == 0:
		return m, fmt.Errorf("insitu: mean: no valid reading from %g to %g m", top.Metres(), bottom.Metres())
	case m.Readings > 1:
		m.Value = sum / (zPrev - zFirst)
	}
	return m, nil
}

// TipZone returns the mean of v over the zone about a pile tip at depth
// tip, from tip − above to tip + below. Direct methods define their own
// zones (for example 1.5 diameters each side, or 8 diameters above and 4
// below); the engineer gives them. The zone must lie within the sounding:
// a sounding that stops short of the zone's base is an error, as readings
// are never extrapolated.
func TipZone(points []Point, tip, above, below units.Length, v Value) (Mean, error) {
	if !(above >= 0 && below >= 0) {
		return Mean{}, fmt.Errorf("insitu: tip zone: above %g m and below %g m must not be negative", above.Metres(), below.Metres())
	}
	if len(points) > 0 && tip+below > points[len(points)-1].Depth {
		return Mean{Top: tip - above, Bottom: tip + below}, fmt.Errorf("insitu: tip zone: reaches %g m, below the last reading at %g m",
			(tip + below).Metres(), points[len(points)-1].Depth.Metres())
	}
	return MeanOver(points, tip-above, tip+below, v)
}

// SuggestedLayer is one layer of a layering proposed from a sounding.
type SuggestedLayer struct {
	Top, Bottom units.Length
	Zone        Zone    // the zone of the run the layer grew from (a thin run takes its thicker neighbour's zone)
	MeanIc      float64 // depth-weighted mean Ic of its readings
	Readings    int
}

// SuggestLayers proposes a layering from breaks in Ic: consecutive valid
// readings of one zone form a run; a run thinner than minThickness is
// merged into the thicker of its neighbours, and neighbours of one zone are
// joined. Each boundary lies midway between the last reading of one layer
// and the first of the next; the first layer starts at the first reading
// and the last ends at the last. The result is a suggestion for the
// engineer to review against the borehole logs: nothing in qult uses it
// unless it is written into a ground model.
func SuggestLayers(points []Point, minThickness units.Length) ([]SuggestedLayer, error) {
	if !(minThickness >= 0) {
		return nil, fmt.Errorf("insitu: suggest layers: minimum thickness %g m is negative", minThickness.Metres())
	}
	type run struct {
		first, last int // indices into points
		zone        Zone
	}
	var runs []run
	for i := range points {
		p := &points[i]
		if !p.Valid() {
			continue
		}
		if n := len(runs); n > 0 && runs[n-1].zone == p.Zone {
			runs[n-1].last = i
			continue
		}
		runs = append(runs, run{i, i, p.Zone})
	}
	if len(runs) == 0 {
		return nil, fmt.Errorf("insitu: suggest layers: no valid reading")
	}
	thick := func(r run) units.Length { return points[r.last].Depth - points[r.first].Depth }
	for len(runs) > 1 {
		// thinnest run below the minimum
		at := -1
		for i, r := range runs {
			if thick(r) < minThickness && (at < 0 || thick(r) < thick(runs[at])) {
				at = i
			}
		}
		if at < 0 {
			break
		}
		into := at - 1
		if at == 0 || (at+1 < len(runs) && thick(runs[at+1]) > thick(runs[at-1])) {
			into = at + 1
		}
		lo, hi := min(at, into), max(at, into)
		merged := run{runs[lo].first, runs[hi].last, runs[into].zone}
		runs = append(runs[:lo], append([]run{merged}, runs[hi+1:]...)...)
		// join neighbours of one zone
		for i := 1; i < len(runs); {
			if runs[i].zone == runs[i-1].zone {
				runs[i-1].last = runs[i].last
				runs = append(runs[:i], runs[i+1:]...)
				continue
			}
			i++
		}
	}
	out := make([]SuggestedLayer, len(runs))
	for i, r := range runs {
		l := SuggestedLayer{Top: points[r.first].Depth, Bottom: points[r.last].Depth, Zone: r.zone}
		if i > 0 {
			l.Top = (points[runs[i-1].last].Depth + points[r.first].Depth) / 2
		}
		if i+1 < len(runs) {
			l.Bottom = (points[r.last].Depth + points[runs[i+1].first].Depth) / 2
		}
		m, err := MeanOver(points, points[r.first].Depth, points[r.last].Depth, func(p *Point) float64 { return p.Ic })
		if err != nil {
			return nil, err
		}
		l.MeanIc, l.Readings = m.Value, m.Readings
		out[i] = l
	}
	return out, nil
}

// MeansPerLayer returns MeanOver for each layer between consecutive
// boundaries (depths increasing: the top of the first layer, then each
// layer's bottom). A layer without a valid reading is an error naming it.
func MeansPerLayer(points []Point, boundaries []units.Length, v Value) ([]Mean, error) {
	if len(boundaries) < 2 {
		return nil, fmt.Errorf("insitu: means per layer: give at least two boundaries")
	}
	out := make([]Mean, 0, len(boundaries)-1)
	for i := 1; i < len(boundaries); i++ {
		if !(boundaries[i] > boundaries[i-1]) {
			return nil, fmt.Errorf("insitu: means per layer: boundaries[%d] = %g m is not below boundaries[%d] = %g m",
				i, boundaries[i].Metres(), i-1, boundaries[i-1].Metres())
		}
		m, err := MeanOver(points, boundaries[i-1], boundaries[i], v)
		if err != nil {
			return nil, fmt.Errorf("layers[%d]: %w", i-1, err)
		}
		out = append(out, m)
	}
	return out, nil
}

// SPTValue picks the quantity to average from a corrected test, such as
// func(c *CorrectedSPT) float64 { return c.N60 }.
type SPTValue func(c *CorrectedSPT) float64

// MeanSPT returns the arithmetic mean of v over the tests with
// top ≤ depth ≤ bottom (common practice for discrete tests; a
// depth-weighted mean would weight a test by its distance to its
// neighbours, which SPT spacing does not justify). Tests of several
// boreholes are averaged together: filter by Location first to keep them
// apart. It is an error when no test lies in the range.
func MeanSPT(tests []CorrectedSPT, top, bottom units.Length, v SPTValue) (Mean, error) {
	m := Mean{Top: top, Bottom: bottom}
	if !(bottom >= top) {
		return m, fmt.Errorf("insitu: SPT mean: bottom %g m is above top %g m", bottom.Metres(), top.Metres())
	}
	sum := 0.0
	for i := range tests {
		c := &tests[i]
		if c.Test.Depth < top || c.Test.Depth > bottom {
			continue
		}
		x := v(c)
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return m, fmt.Errorf("insitu: SPT mean: value at %g m is not finite", c.Test.Depth.Metres())
		}
		sum += x
		m.Readings++
	}
	if m.Readings == 0 {
		return m, fmt.Errorf("insitu: SPT mean: no test from %g to %g m", top.Metres(), bottom.Metres())
	}
	m.Value = sum / float64(m.Readings)
	return m, nil
}

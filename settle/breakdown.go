package settle

import (
	"fmt"
	"math"

	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// APICurves returns a chooser of t-z curves for FromBreakdown: the API
// sand curve in drained layers and the API clay curve (with the residual
// ratio given; 0 means DefaultResidual) in undrained ones.
func APICurves(residual float64) (func(pile.Row) Curve, error) {
	clay, err := APIClay(residual)
	if err != nil {
		return nil, err
	}
	sand := APISand()
	return func(r pile.Row) Curve {
		if r.Drainage == profile.Undrained {
			return clay
		}
		return sand
	}, nil
}

// FromBreakdown builds a load-transfer model from a pile analysis, so that
// the ultimate unit resistances are those of the analysis (with its
// defaults, limits and factors). Each breakdown row becomes a segment
// with the row's perimeter and fs linear between the row's end values
// (At[0].Fs, At[1].Fs), scaled so that p·∫fs dz over the row equals the
// row's force exactly (rows integrated by quadrature, such as the API α
// with su varying, are not exactly linear); rows of the λ method carry
// their average fs uniformly; rows without friction carry none. The tip
// carries the analysis' Qp on its area. The capacity at full mobilisation
// is then the analysis' Qs + Qp.
//
// diameter scales the curves given per diameter; ea is E·A of the section
// (N); shaft picks each row's t-z curve (APICurves, or the engineer's
// choice); tip is the q-z curve (APITip, or points).
func FromBreakdown(b pile.Breakdown, diameter units.Length, ea units.Force, shaft func(pile.Row) Curve, tip Curve) (Model, error) {
	if len(b.Rows) == 0 {
		return Model{}, fmt.Errorf("breakdown: no shaft rows")
	}
	if shaft == nil {
		return Model{}, fmt.Errorf("shaft: no t-z curve chooser")
	}
	m := Model{Diameter: diameter, EA: ea, Tip: TipSpring{Area: b.Tip.Area, Qp: b.Tip.Qp, Curve: tip}}
	for i, r := range b.Rows {
		if i > 0 {
			prev := m.Segments[len(m.Segments)-1]
			if gap := float64(r.Top - prev.Bottom); gap > 1e-9 {
				// A length without friction between rows.
				m.Segments = append(m.Segments, Segment{Top: prev.Bottom, Bottom: r.Top, Perimeter: prev.Perimeter, Curve: prev.Curve})
			}
		}
		sg := Segment{Top: r.Top, Bottom: r.Bottom, Perimeter: r.Perimeter, Curve: shaft(r)}
		if !sg.Curve.Valid() {
			return Model{}, fmt.Errorf("rows[%d] (%s): the chooser gave no t-z curve", i, r.LayerName)
		}
		h := float64(r.Bottom - r.Top)
		integral := float64(r.Integral)
		if r.Method != "none" && integral > 0 && h > 0 {
			f0, f1 := float64(r.At[0].Fs), float64(r.At[1].Fs)
			trap := (f0 + f1) / 2 * h
			if trap > 0 && !math.IsInf(trap, 0) {
				k := integral / trap
				sg.FsTop, sg.FsBottom = units.Stress(f0*k), units.Stress(f1*k)
			} else {
				sg.FsTop = units.Stress(integral / h)
				sg.FsBottom = sg.FsTop
			}
		}
		m.Segments = append(m.Segments, sg)
	}
	return m, nil
}

// RowsFromBreakdown returns the shaft of a pile analysis as rows for the
// unified method (Downdrag): each breakdown row with its perimeter and fs
// linear between its end values, scaled as in FromBreakdown so that the
// row's force is the analysis' own; lengths without friction between rows
// are rows with fs zero.
func RowsFromBreakdown(b pile.Breakdown) ([]ShaftRow, error) {
	m, err := FromBreakdown(b, 1, 1, func(pile.Row) Curve { return APISand() }, APITip())
	if err != nil {
		return nil, err
	}
	rows := make([]ShaftRow, len(m.Segments))
	for i, s := range m.Segments {
		rows[i] = ShaftRow{Top: s.Top, Bottom: s.Bottom, Perimeter: s.Perimeter, FsTop: s.FsTop, FsBottom: s.FsBottom}
	}
	return rows, nil
}

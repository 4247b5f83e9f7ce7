package phase

import (
	"fmt"

	"github.com/qultgeo/qult/units"
)

// The named relations below each evaluate one equation. Each checks its
// arguments against the ranges of the package doc and returns a *RangeError
// naming the first argument outside them. γw must be positive; pass
// WaterUnitWeight or WaterUnitWeightUS.

func check(q Quantity, v float64, gw units.UnitWeight) error {
	s := solver{gw: float64(gw)}
	if rng, ok := s.inRange(q, v); !ok {
		return &RangeError{Quantity: q, Field: q.String(), Value: v, Range: rng}
	}
	return nil
}

func checkAll(gw units.UnitWeight, pairs ...any) error {
	if !finite(float64(gw)) || gw <= 0 {
		return &RangeError{Quantity: nQuantities, Field: "γw", Value: float64(gw), Range: "(0, ∞)"}
	}
	for i := 0; i < len(pairs); i += 2 {
		q := pairs[i].(Quantity)
		var v float64
		switch x := pairs[i+1].(type) {
		case float64:
			v = x
		case units.UnitWeight:
			v = float64(x)
		default:
			panic(fmt.Sprintf("phase: checkAll given %T", x))
		}
		if err := check(q, v, gw); err != nil {
			return err
		}
	}
	return nil
}

// PorosityFromVoidRatio returns n for a void ratio e > 0:
//
//	n = e/(1+e)
func PorosityFromVoidRatio(e float64) (float64, error) {
	if err := checkAll(WaterUnitWeight, E, e); err != nil {
		return 0, err
	}
	return e / (1 + e), nil
}

// VoidRatioFromPorosity returns e for a porosity n in (0, 1):
//
//	e = n/(1−n)
func VoidRatioFromPorosity(n float64) (float64, error) {
	if err := checkAll(WaterUnitWeight, N, n); err != nil {
		return 0, err
	}
	return n / (1 - n), nil
}

// DryUnitWeight returns γd from Gs and e:
//
//	γd = Gs·γw/(1+e)
func DryUnitWeight(gs, e float64, gw units.UnitWeight) (units.UnitWeight, error) {
	if err := checkAll(gw, Gs, gs, E, e); err != nil {
		return 0, err
	}
	return units.UnitWeight(gs * float64(gw) / (1 + e)), nil
}

// SaturatedUnitWeight returns γsat from Gs and e:
//
//	γsat = (Gs+e)·γw/(1+e)
func SaturatedUnitWeight(gs, e float64, gw units.UnitWeight) (units.UnitWeight, error) {
	if err := checkAll(gw, Gs, gs, E, e); err != nil {
		return 0, err
	}
	return units.UnitWeight((gs + e) * float64(gw) / (1 + e)), nil
}

// SubmergedUnitWeight returns γ′ from Gs and e:
//
//	γ′ = γsat − γw = (Gs−1)·γw/(1+e)
func SubmergedUnitWeight(gs, e float64, gw units.UnitWeight) (units.UnitWeight, error) {
	if err := checkAll(gw, Gs, gs, E, e); err != nil {
		return 0, err
	}
	return units.UnitWeight((gs - 1) * float64(gw) / (1 + e)), nil
}

// MoistUnitWeight returns γ from Gs, e and the water content w, which must
// not exceed the saturated water content e/Gs:
//
//	γ = Gs·(1+w)·γw/(1+e)
func MoistUnitWeight(gs, e, w float64, gw units.UnitWeight) (units.UnitWeight, error) {
	if err := checkAll(gw, Gs, gs, E, e, W, w); err != nil {
		return 0, err
	}
	if err := check(S, w*gs/e, gw); err != nil {
		return 0, fmt.Errorf("phase: w = %.4g with Gs = %.4g and e = %.4g: %w", w, gs, e, err)
	}
	return units.UnitWeight(gs * (1 + w) * float64(gw) / (1 + e)), nil
}

// GsFromDryUnitWeight returns Gs from γd and e:
//
//	Gs = γd·(1+e)/γw
func GsFromDryUnitWeight(gd units.UnitWeight, e float64, gw units.UnitWeight) (float64, error) {
	if err := checkAll(gw, GammaD, gd, E, e); err != nil {
		return 0, err
	}
	gs := float64(gd) * (1 + e) / float64(gw)
	if err := check(Gs, gs, gw); err != nil {
		return 0, fmt.Errorf("phase: γd = %s with e = %.4g: %w", gd, e, err)
	}
	return gs, nil
}

// VoidRatioFromDryUnitWeight returns e from γd and Gs:
//
//	e = Gs·γw/γd − 1
func VoidRatioFromDryUnitWeight(gd units.UnitWeight, gs float64, gw units.UnitWeight) (float64, error) {
	if err := checkAll(gw, GammaD, gd, Gs, gs); err != nil {
		return 0, err
	}
	e := gs*float64(gw)/float64(gd) - 1
	if err := check(E, e, gw); err != nil {
		return 0, fmt.Errorf("phase: γd = %s with Gs = %.4g: %w", gd, gs, err)
	}
	return e, nil
}

// SaturatedWaterContent returns the water content of the saturated soil,
// from S·e = w·Gs with S = 1:
//
//	w = e/Gs
func SaturatedWaterContent(e, gs float64) (float64, error) {
	if err := checkAll(WaterUnitWeight, E, e, Gs, gs); err != nil {
		return 0, err
	}
	return e / gs, nil
}

// Saturation returns S from w, Gs and e; w must not exceed e/Gs:
//
//	S = w·Gs/e
func Saturation(w, gs, e float64) (float64, error) {
	if err := checkAll(WaterUnitWeight, W, w, Gs, gs, E, e); err != nil {
		return 0, err
	}
	s := w * gs / e
	if err := check(S, s, WaterUnitWeight); err != nil {
		return 0, err
	}
	return s, nil
}

// RelativeDensity returns Dr from e, emax and emin (emin < emax, e in
// [emin, emax]):
//
//	Dr = (emax − e)/(emax − emin)
func RelativeDensity(e, emax, emin float64) (float64, error) {
	if err := checkAll(WaterUnitWeight, E, e); err != nil {
		return 0, err
	}
	if !finite(emin) || emin <= 0 {
		return 0, &RangeError{Quantity: nQuantities, Field: "emin", Value: emin, Range: "(0, emax)"}
	}
	if !finite(emax) || emax <= emin {
		return 0, &RangeError{Quantity: nQuantities, Field: "emax", Value: emax, Range: fmt.Sprintf("(emin, ∞) with emin = %.4g", emin)}
	}
	dr := (emax - e) / (emax - emin)
	if err := check(Dr, dr, WaterUnitWeight); err != nil {
		return 0, fmt.Errorf("phase: e = %.4g with emax = %.4g and emin = %.4g: %w", e, emax, emin, err)
	}
	return dr, nil
}

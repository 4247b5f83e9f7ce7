package bearing

import (
	"math"

	"github.com/qultgeo/qult/units"
)

// Shallow building blocks: the classical factors of a strip footing at the
// surface, φ′ from 0 to 50 deg. They allocate nothing.

// PrandtlNq returns the Prandtl-Reissner surcharge factor for φ′ from 0
// to 50 deg:
//
//	Nq = e^(π·tanφ′)·tan²(45° + φ′/2)
//
// It is 1 at φ′ = 0 and 18.40 at 30 deg. Source: Reissner (1924), as
// given by Vesic (1973) and Das (2019), Table 3.3.
func PrandtlNq(phi units.Angle) (float64, error) {
	if err := checkPhi("prandtl", phi, 0, 50); err != nil {
		return 0, err
	}
	return prandtlNq(phi), nil
}

func prandtlNq(phi units.Angle) float64 {
	t := math.Tan(math.Pi/4 + float64(phi)/2)
	return math.Exp(math.Pi*phi.Tan()) * t * t
}

// PrandtlNc returns the Prandtl cohesion factor for φ′ from 0 to 50 deg:
//
//	Nc = (Nq − 1)·cotφ′,  Nc → 2 + π = 5.14 as φ′ → 0
//
// Source: Prandtl (1921), as given by Das (2019), Table 3.3.
func PrandtlNc(phi units.Angle) (float64, error) {
	if err := checkPhi("prandtl", phi, 0, 50); err != nil {
		return 0, err
	}
	return cohesionTerm(prandtlNq(phi), phi, 2+math.Pi), nil
}

// VesicNgamma returns Vesic's self-weight factor for φ′ from 0 to 50 deg:
//
//	Nγ = 2·(Nq + 1)·tanφ′
//
// with Nq from PrandtlNq. Source: Vesic (1973), as given by Das (2019),
// Table 3.3.
func VesicNgamma(phi units.Angle) (float64, error) {
	if err := checkPhi("vesic-ngamma", phi, 0, 50); err != nil {
		return 0, err
	}
	return 2 * (prandtlNq(phi) + 1) * phi.Tan(), nil
}

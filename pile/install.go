package pile

import (
	"fmt"

	"github.com/qultgeo/qult/shaft"
)

// Installation is how the pile is put in the ground: the module's one
// installation type, defined in package shaft (its K/K0 ranges live there)
// and used here under the same name. It selects the documented defaults of
// the methods (K/K0 and δ/φ′ in the β method, the EN 1997-1 resistance
// table), never hidden constants.
type Installation = shaft.Installation

// The installation methods (the constants of package shaft, under the
// same names).
const (
	// DrivenHigh is a driven high-displacement pile (closed pipe, precast
	// concrete, timber).
	DrivenHigh = shaft.DrivenHigh
	// DrivenLow is a driven low-displacement pile (H-section, open pipe).
	DrivenLow = shaft.DrivenLow
	// Bored is a bored pile or drilled shaft.
	Bored = shaft.Bored
	// Augered is a continuous flight auger (CFA) pile.
	Augered = shaft.Augered
	// Jetted is a pile installed with jetting.
	Jetted = shaft.Jetted
)

// ParseInstallation reads an installation identifier ("driven-high",
// "driven-low", "bored", "augered", "jetted").
func ParseInstallation(s string) (Installation, error) {
	i, err := shaft.ParseInstallation(s)
	if err != nil {
		return 0, fmt.Errorf("installation %q: want one of driven-high, driven-low, bored, augered, jetted", s)
	}
	return i, nil
}

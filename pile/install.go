package pile

import "fmt"

// Installation is how the pile is put in the ground. It selects the
// documented defaults of the methods (K/K0 and δ/φ′ in the β method, the
// EN 1997-1 resistance table), never hidden constants.
type Installation int

// The installation methods.
const (
	// DrivenHigh is a driven high-displacement pile (closed pipe, precast
	// concrete, timber).
	DrivenHigh Installation = iota + 1
	// DrivenLow is a driven low-displacement pile (H-section, open pipe).
	DrivenLow
	// Bored is a bored pile or drilled shaft.
	Bored
	// Augered is a continuous flight auger (CFA) pile.
	Augered
	// Jetted is a pile installed with jetting.
	Jetted
)

var installIDs = [...]string{DrivenHigh: "driven-high", DrivenLow: "driven-low", Bored: "bored",
	Augered: "augered", Jetted: "jetted"}

// String returns the identifier used in calc files.
func (i Installation) String() string {
	if i > 0 && int(i) < len(installIDs) {
		return installIDs[i]
	}
	return fmt.Sprintf("Installation(%d)", int(i))
}

// ParseInstallation reads an installation identifier.
func ParseInstallation(s string) (Installation, error) {
	for i := DrivenHigh; i <= Jetted; i++ {
		if installIDs[i] == s {
			return i, nil
		}
	}
	return 0, fmt.Errorf("installation %q: want one of driven-high, driven-low, bored, augered, jetted", s)
}

// Driven reports whether the pile is driven (high or low displacement).
func (i Installation) Driven() bool { return i == DrivenHigh || i == DrivenLow }

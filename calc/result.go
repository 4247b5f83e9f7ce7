package calc

import (
	"github.com/qultgeo/qult/cite"
	"github.com/qultgeo/qult/pile"
	"github.com/qultgeo/qult/profile"
	"github.com/qultgeo/qult/units"
)

// ResultSchema names the version of Result's JSON form.
const ResultSchema = "qult.result/1"

// Result is one calculation run: the inputs as entered and as normalised,
// every intermediate value, the design check, warnings and sources. All
// quantities are SI inside; reports convert them for display.
type Result struct {
	Schema   string
	Version  string // qult version that ran it
	ID       string // the calc file's id, as given
	Title    string
	Project  string
	Revision string
	Engineer string
	Date     string
	// Display is the unit system the file declared (for reports).
	Display units.System

	// Input is the file as decoded; Source is its text as entered.
	Input  *File
	Source []byte

	// Ground is the resolved profile; Layers its layers with unit weights
	// derived; Stresses σv, u and σ′v at every break of the profile.
	Ground   *profile.Profile
	Layers   []profile.Layer
	Stresses []StressPoint

	// Pile as normalised, and the methods resolved for each layer.
	Pile    pile.Pile
	Methods []LayerMethods

	// Breakdown is the characteristic capacity with its derivation.
	Breakdown pile.Breakdown
	// Design is the design check; nil when the file has no design basis.
	Design *pile.Design
	// Loads as normalised; zero when the file gives none.
	Loads pile.Loads
	// WithDepth is the characteristic capacity for tip depths from
	// Search.Step to Search.MaxTip; DesignWithDepth is the design
	// compression resistance of the governing case at the same depths
	// (empty without a design basis).
	WithDepth       []pile.Capacity
	DesignWithDepth []units.Force
	// Length is the shortest pile that passes, when a design basis and
	// loads are given.
	Length *pile.LengthResult

	// Settlement is the settlement at the serviceability load (nil without
	// a settlement section); LoadTest the load test read by its criteria
	// (nil without a load_test section). A settlement above the allowable,
	// or a pile that cannot carry the serviceability load, fails the
	// serviceability check (ServiceabilityPass).
	Settlement *SettlementResult
	LoadTest   *LoadTestResult
	// Reliability is the probabilistic capacity (nil without a
	// reliability section).
	Reliability *ReliabilityResult
	// Group is the pile group (nil without a group section).
	Group *GroupResult

	// Candidates compares the candidate piles (nil without a candidates
	// section).
	Candidates *CandidatesResult
	// Sounding is the cone sounding the ground names, interpreted (nil
	// without ground.sounding).
	Sounding *SoundingResult
	// SPT is the borehole's standard penetration tests the ground names,
	// corrected (nil without ground.spt); never used in the capacity.
	SPT *SPTResult
	// Downdrag is the neutral plane, drag load and largest axial force
	// (nil without a downdrag section).
	Downdrag *DowndragResult

	// Compared is the shaft and tip resistance of the same pile by every
	// applicable method of the catalogues (nil when it could not be run).
	Compared *Comparison

	Warnings []string
	Sources  []cite.Source
	Cautions []string
}

// StressPoint is the vertical stress state at one depth.
type StressPoint struct {
	Depth                  units.Length
	Total, Pore, Effective units.Stress
}

// LayerMethods records which methods each layer uses.
type LayerMethods struct {
	Layer    string
	Drainage string
	Tip      string
	Shaft    string
}

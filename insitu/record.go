package insitu

import (
	"github.com/qultgeo/qult/units"
)

// Row is one reading of a cone sounding.
type Row struct {
	Depth units.Length // depth below ground level of the cone tip
	Qc    units.Stress // cone resistance: qc, or qt when Sounding.TipCorrected
	Fs    units.Stress // sleeve friction fs
	U2    units.Stress // pore pressure behind the cone (u2); zero when not measured
}

// Sounding is one cone penetration test.
type Sounding struct {
	ID string // location or test identifier as the file gives it
	// AreaRatio is the cone's net area ratio a (0 < a ≤ 1) used in
	// qt = qc + u2(1 − a). It is 1 when unknown: then qt = qc.
	AreaRatio float64
	// TipCorrected says that Row.Qc already holds qt (the file gave qt).
	TipCorrected bool
	// HasU2 says whether u2 was measured.
	HasU2 bool
	// Voids counts the rows a reader left out because a cell held the
	// file's void value (GEF #COLUMNVOID): a reading the file itself marks
	// as missing.
	Voids int
	Rows  []Row
}

// Qt returns the corrected cone resistance of row i:
//
//	qt = qc + u2·(1 − a)
//
// (Robertson 2009, eq. 1), or Row.Qc when the sounding already holds qt.
func (s *Sounding) Qt(i int) units.Stress {
	r := s.Rows[i]
	if s.TipCorrected {
		return r.Qc
	}
	return r.Qc + units.Stress((1-s.AreaRatio)*float64(r.U2))
}

// Sampler describes the SPT split-barrel sampler as tested.
type Sampler int

// Samplers, as tabulated for the sampler correction CS.
const (
	// SamplerNoLiner is a split barrel without a liner (CS = 1.0).
	SamplerNoLiner Sampler = iota
	// SamplerLinerDense is a barrel with its liner fitted, in dense sand or
	// clay (CS = 0.8).
	SamplerLinerDense
	// SamplerLinerLoose is a barrel with its liner fitted, in loose sand
	// (CS = 0.9).
	SamplerLinerLoose
)

var samplerNames = [...]string{"no-liner", "liner-dense", "liner-loose"}

// String returns the sampler's identifier as the CSV form writes it.
func (s Sampler) String() string {
	if s < 0 || int(s) >= len(samplerNames) {
		return "sampler(?)"
	}
	return samplerNames[s]
}

// ParseSampler reads a sampler identifier: no-liner, liner-dense or
// liner-loose.
func ParseSampler(s string) (Sampler, bool) {
	for i, n := range samplerNames {
		if s == n {
			return Sampler(i), true
		}
	}
	return 0, false
}

// SPT is one standard penetration test.
type SPT struct {
	Location string       // borehole identifier
	Depth    units.Length // depth to the top of the test drive
	N        float64      // field blow count for the 300 mm test drive
	// EnergyRatio is the hammer's measured energy ratio ER in percent of
	// the free-fall energy (typically 45 to 100). Zero means not recorded.
	EnergyRatio float64
	// RodLength is the length of rod from the anvil to the sampler. Zero
	// means not recorded.
	RodLength units.Length
	// Borehole is the borehole diameter. Zero means not recorded.
	Borehole units.Length
	Sampler  Sampler
}

// Stratum is one stratum of a borehole log (AGS4 group GEOL).
type Stratum struct {
	Location    string
	Top, Base   units.Length
	Description string
	Legend      string // GEOL_LEG, the legend code
}

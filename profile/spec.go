package profile

import (
	"github.com/qultgeo/qult/phase"
	"strings"

	"github.com/qultgeo/qult/units"
)

// Drainage is the behaviour of a layer for design.
type Drainage uint8

// Drainage behaviours. The zero value is not a valid choice: every layer
// must say which.
const (
	DrainageUnset Drainage = iota
	Drained                // effective-stress parameters φ′, c′ govern
	Undrained              // undrained strength su governs
)

// String returns "drained", "undrained" or "unset".
func (d Drainage) String() string {
	switch d {
	case Drained:
		return "drained"
	case Undrained:
		return "undrained"
	}
	return "unset"
}

// Spec is the plain description of a profile that New builds from.
type Spec struct {
	// Layers from the ground surface down, without gaps or overlaps.
	Layers []LayerSpec
	// WaterDepth is the depth of the water table below the ground surface;
	// negative means free water standing above the ground. Zero is a water
	// table at the surface unless NoWater is set.
	WaterDepth units.Length
	// NoWater marks a dry site: no water table in or above the profile.
	NoWater bool
	// PorePressures, if any, replace the hydrostatic pore pressure (see the
	// package doc for the rule above the first and below the last point).
	// Depths must be ≥ 0 and strictly increasing.
	PorePressures []PorePoint
	// Surcharge is a uniform vertical stress on the ground surface, ≥ 0.
	// It must be zero when the ground is cut (see ExcavationDepth).
	Surcharge units.Stress
	// ExcavationDepth is the depth of an excavation floor below the
	// original ground surface, ≥ 0; zero means no excavation. The soil
	// above it is removed (see the package doc).
	ExcavationDepth units.Length
	// Scour is the design scour below the excavation floor (or the
	// original ground surface without one); the zero value means none.
	Scour Scour
	// WaterUnitWeight is γw; zero means phase.WaterUnitWeight (9.81 kN/m³).
	WaterUnitWeight units.UnitWeight
}

// Scour is the design scour at a pier or abutment, as bridge hydraulics
// separates it (FHWA HEC-18): the components add, each measured down from
// the line the one before it leaves.
type Scour struct {
	// General is the lowering of the whole bed at the crossing: long-term
	// degradation plus general (contraction) scour, below the excavation
	// floor or, without one, the original ground surface; ≥ 0.
	General units.Length
	// Local is the local scour at the pier or abutment, below the general
	// scour line; ≥ 0.
	Local units.Length
}

// GroundLines are the depths, below the original ground surface, of the
// lines a report draws: the original ground (always 0), the excavation
// floor, the general scour line and the design ground line (the local
// scour line), each at or below the one before. Without a cut all four are
// zero.
type GroundLines struct {
	Original, Excavation, GeneralScour, Design units.Length
}

// PorePoint is a measured or designed pore pressure U at a depth.
type PorePoint struct {
	Depth units.Length
	U     units.Stress
}

// LayerSpec is one layer as a log gives it. Zero means not given throughout.
type LayerSpec struct {
	Name string // free text; empty becomes "layer N"
	// Soil is the kind of soil as the log names it (description only).
	Soil Soil
	// Thickness, or Top and Bottom depths (Bottom non-zero selects them).
	// Giving all three requires Bottom − Top = Thickness.
	Thickness   units.Length
	Top, Bottom units.Length

	Drainage Drainage
	Phi      units.Angle  // effective friction angle φ′, (0°, 50°]
	Cohesion units.Stress // effective cohesion c′, ≥ 0
	// Su is a constant undrained strength; SuTop and SuBottom a linear one.
	Su, SuTop, SuBottom units.Stress

	// Unit weights given directly: above and below the water table.
	UnitWeight          units.UnitWeight
	SaturatedUnitWeight units.UnitWeight
	// Phase data, from which phase.Solve derives the unit weights.
	DryUnitWeight units.UnitWeight
	VoidRatio     float64
	WaterContent  float64 // fraction, 0.25 for 25 %
	Gs            float64
	Saturation    float64 // fraction
	// Zero marks the phase quantities given as exactly zero (phase.S,
	// phase.W), which the fields above cannot tell from "not given": a dry
	// soil with S = 0 and w = 0.
	Zero phase.Set

	// Optional parameters for later design steps.
	OCR float64      // overconsolidation ratio, [1, 100]
	Dr  float64      // relative density, fraction (0, 1]
	N60 float64      // SPT blow count corrected to 60 % energy, (0, 300]
	E   units.Stress // Young's modulus, > 0
	G   units.Stress // shear modulus, > 0
	Nu  float64      // Poisson's ratio ν, (0, 0.5]
	Ir  float64      // rigidity index, ≥ 1
	// Delta is Vesic's (1977) average volumetric strain Δ in the plastic
	// zone around a pile tip, (0, 0.5]; zero means not given.
	Delta float64

	// Compressibility for one-dimensional consolidation (see
	// Layer.ConsolidationStrain); zero means not given. Give Cc (with Cr
	// where σ′p exceeds σ′v0) and e0, or the constrained modulus M, not both.
	Cc, Cr float64      // compression and recompression indices, (0, 10]
	E0     float64      // initial void ratio, (0, 15]; defaults to VoidRatio
	Pc     units.Stress // preconsolidation stress σ′p, > 0; else OCR·σ′v0, else σ′v0
	M      units.Stress // constrained (oedometer) modulus 1/mv, > 0
}

// Basis records how a layer's unit weights were obtained.
type Basis uint8

// Basis flags.
const (
	// BasisPhase: derived with phase.Solve from phase data.
	BasisPhase Basis = 1 << iota
	// AssumedDry: no water content or saturation given; the soil above
	// water was taken as dry (γ = γd).
	AssumedDry
	// AssumedSaturated: a water content but no saturation given; the soil
	// was taken as saturated (S = 1).
	AssumedSaturated
	// SaturatedAboveWater: only a saturated unit weight was given; it was
	// used above the water table as well.
	SaturatedAboveWater
)

// String lists the flags, such as "phase+assumed-dry", or "given".
func (b Basis) String() string {
	if b == 0 {
		return "given"
	}
	var parts []string
	for _, f := range []struct {
		b Basis
		s string
	}{{BasisPhase, "phase"}, {AssumedDry, "assumed-dry"}, {AssumedSaturated, "assumed-saturated"},
		{SaturatedAboveWater, "saturated-above-water"}} {
		if b&f.b != 0 {
			parts = append(parts, f.s)
		}
	}
	return strings.Join(parts, "+")
}

// Layer is one resolved layer of a Profile.
type Layer struct {
	Name        string
	Soil        Soil // the kind of soil as the log names it; SoilUnset if not
	Top, Bottom units.Length
	Drainage    Drainage
	Phi         units.Angle
	Cohesion    units.Stress
	// SuTop and SuBottom bound the undrained strength, linear with depth
	// (equal when constant); HasSu is false when none was given.
	SuTop, SuBottom units.Stress
	HasSu           bool
	// UnitWeight is used above the water table, SaturatedUnitWeight below;
	// SubmergedUnitWeight = SaturatedUnitWeight − γw. A weight the layer
	// never needed and could not derive is zero.
	UnitWeight          units.UnitWeight
	SaturatedUnitWeight units.UnitWeight
	SubmergedUnitWeight units.UnitWeight
	Basis               Basis
	// Removed is the thickness cut from the top of the layer by excavation
	// and scour: 0 for a layer wholly below the design ground line,
	// Thickness() for one wholly above it.
	Removed      units.Length
	OCR, Dr, N60 float64
	E, G         units.Stress
	Nu, Ir       float64
	Delta        float64 // Vesic's volumetric strain Δ; 0 when not given
	// Compressibility (zero when not given): Cc, Cr and e0 with the
	// preconsolidation stress Pc (0: from OCR, else normally
	// consolidated), or the constrained modulus M.
	Cc, Cr, E0 float64
	Pc, M      units.Stress
}

// Thickness returns Bottom − Top.
func (l Layer) Thickness() units.Length { return l.Bottom - l.Top }

// SuAt returns the undrained strength at depth z within the layer, linear
// between SuTop and SuBottom:
//
//	su(z) = suTop + (suBottom − suTop)·(z − top)/(bottom − top)
//
// It returns an error when the layer has no su or z is outside [Top, Bottom].
func (l Layer) SuAt(z units.Length) (units.Stress, error) {
	if !l.HasSu {
		return 0, &ParamError{Layer: l.Name, Param: "su"}
	}
	if !(z >= l.Top && z <= l.Bottom) {
		return 0, &DepthError{Depth: z, Top: l.Top, Bottom: l.Bottom, What: "layer " + l.Name}
	}
	f := float64((z - l.Top) / (l.Bottom - l.Top))
	return l.SuTop + units.Stress(f)*(l.SuBottom-l.SuTop), nil
}

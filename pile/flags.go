package pile

import "strings"

// Flags are warnings raised by an analysis, as a bitmask so that the
// capacity path allocates nothing. Breakdown turns them into messages.
type Flags uint32

const (
	// ShaftLimit: a limiting unit shaft friction capped fs somewhere.
	ShaftLimit Flags = 1 << iota
	// CriticalDepthApplied: σ′v was held at its value at the critical depth
	// below it.
	CriticalDepthApplied
	// BoundApplied: a method's published bound replaced its raw value.
	BoundApplied
	// ChartEdge: a chart was read at its edge because Methods.Clamp is set.
	ChartEdge
	// TipLimit: the tip method's limiting resistance governs.
	TipLimit
	// LayeredTip: the tip is less than ten diameters into a stronger layer
	// and Meyerhof's (1976) rule reduced it.
	LayeredTip
	// WeakBelow: a layer within Methods.WeakBelow diameters below the tip
	// gives a lower unit tip resistance than the bearing layer.
	WeakBelow
	// UnpluggedGoverns: the unplugged mode (annulus tip plus internal
	// friction) gives less than the plugged mode and was used.
	UnpluggedGoverns
	// TipNearBoundary: the tip lies within one diameter of a layer boundary.
	TipNearBoundary
	// WeakLayerReduced: the tip is within WeakZoneRatio (10) diameters
	// above a weaker layer and Meyerhof's (1976) reduction lowered qp.
	WeakLayerReduced
	// WeakLayerOff: the weak-layer reduction would apply here but
	// Methods.NoWeakLayer switched it off (or a layer below could not be
	// evaluated while it is off).
	WeakLayerOff
	// EmbedmentRamp: the tip is less than (Lb/D)cr diameters into a drained
	// top layer and Meyerhof's (1976) embedment ramp lowered qp.
	EmbedmentRamp
	// EmbedmentOff: the embedment ramp would apply here but
	// Methods.NoEmbedment switched it off.
	EmbedmentOff
	// DrilledZones: side resistance was left out of the top 1.5 m and the
	// bottom diameter in drilled-shaft α layers (O'Neill & Reese 1999).
	DrilledZones
	// DrilledZonesOff: a bored or augered pile uses the drilled-shaft α
	// with Methods.NoDrilledZones set, so those zones carry side resistance.
	DrilledZonesOff
	// LambdaCapped: the λ method's unit friction was capped at s̄u (α ≤ 1).
	LambdaCapped
	// LambdaCapOff: the λ method's cap was switched off.
	LambdaCapOff
	// VolumeChangeIgnored: a Vesic tip took Irr = Ir (Δ = 0).
	VolumeChangeIgnored
	// TipReductionOff: a rule that lowers a bored pile's tip (the cap or the
	// large-base reduction) was switched off.
	TipReductionOff
	// TipCapGoverns: the bored-pile tip cap governs.
	TipCapGoverns
	// LayeredTipOff: the tip is less than 10 diameters into a stronger
	// layer but Methods.LayeredTip is false, so the transition was not
	// applied.
	LayeredTipOff
	// WeightExceedsResistance: with the gross self-weight option the
	// pile's weight W′ exceeds Qp + Qs, so Rc is negative.
	WeightExceedsResistance
)

var flagText = [...]string{
	"a limiting unit shaft friction governs",
	"σ′v held constant below the critical depth",
	"a published bound of a method replaced its raw value",
	"a chart was read at its edge (clamping was asked for)",
	"the limiting unit tip resistance governs",
	"tip less than 10 diameters into a stronger layer: Meyerhof's (1976) transition applied",
	"a weaker layer lies within a few diameters below the tip",
	"the unplugged mode governs",
	"the tip lies within one diameter of a layer boundary",
	"tip within 10 diameters above a weaker layer: Meyerhof's (1976) reduction applied",
	"WARNING: Meyerhof's (1976) weak-layer reduction is switched off although a weaker layer lies within 10 diameters below the tip; the tip resistance may be unconservative",
	"tip less than the critical embedment ratio into a drained layer from the ground surface: Meyerhof's (1976) embedment ramp applied",
	"WARNING: Meyerhof's (1976) embedment ramp is switched off although the tip is shallower than the critical embedment ratio; the tip resistance may be unconservative",
	"no side resistance counted in the top 1.5 m and the bottom diameter of drilled-shaft α layers (O'Neill & Reese 1999)",
	"WARNING: the zones without side resistance of the drilled-shaft α (top 1.5 m, bottom diameter) are switched off; the shaft resistance may be unconservative",
	"the λ method's unit friction is capped at the mean su (α ≤ 1)",
	"WARNING: the λ method's cap fav ≤ s̄u is switched off; the shaft resistance may be unconservative",
	"WARNING: Vesic's tip took Irr = Ir (no volumetric strain Δ): the tip resistance may be unconservative in compressible sand",
	"WARNING: a rule that lowers a bored pile's tip resistance (the cap or the large-base reduction) is switched off",
	"the bored-pile tip cap governs",
	"WARNING: Meyerhof's (1976) transition for a tip less than 10 diameters into a stronger layer is switched off; the tip resistance may be unconservative",
	"WARNING: the pile's effective weight W′ exceeds Qp + Qs, so the compression resistance Rc = Qp + Qs − W′ is negative",
}

// Messages returns one sentence per set flag.
func (f Flags) Messages() []string {
	var out []string
	for i, t := range flagText {
		if f&(1<<i) != 0 {
			out = append(out, t)
		}
	}
	return out
}

// String joins the messages with "; ", or returns "none".
func (f Flags) String() string {
	if f == 0 {
		return "none"
	}
	return strings.Join(f.Messages(), "; ")
}

// Package profile provides the layered ground of one borehole: layers from
// the surface down, groundwater, surcharge, and the total stress, pore
// pressure and effective vertical stress at any depth.
//
// Build a Profile with New from a plain Spec. The Profile is immutable; New
// resolves every layer (unit weights given directly, or derived with package
// phase from what the log gives), validates everything, and precomputes, for
// each interval between consecutive breaks, the stresses at its top and
// their gradients. A stress query is then a binary search and one
// multiply-add: O(log n), no allocation.
//
// Depths z are measured down from the original ground surface (z = 0) to
// the profile's bottom, Depth(). Stresses are vertical:
//
//	σv(z) = q + γw·hw + Σ γi·Δzi       (q surcharge, hw free water above ground)
//	u(z)  = γw·(z − zw)  for z > zw   (hydrostatic, water table at zw)
//	σ′v   = σv − u
//
// # Excavation and scour
//
// Spec.ExcavationDepth and Spec.Scour cut the ground down to the design
// ground line, at depth
//
//	zd = excavation + general scour + local scour
//
// below the original surface (DesignGround; GroundLines gives each line
// for drawing). The components add, each measured from the line the one
// before leaves: general scour (long-term degradation and contraction
// scour, across the bed) below the excavation floor, local scour (at the
// pier or abutment) below the general scour line, as bridge hydraulics
// separates total scour: long-term degradation, contraction (general) and
// local scour, which develop independently and add (FHWA HEC-18,
// Richardson & Davis, ch. 2, as summarised in FHWA-RD-03-052, 2005, ch. 2;
// an early edition's step 3, "evaluate the scour analysis method"). The
// current edition is Arneson et al. (2012), FHWA-HIF-12-003. The soil
// above zd is removed for everything: it
// carries no shaft resistance and holds no tip, and its weight leaves the
// stresses below. FHWA's circular on laterally loaded deep foundations
// (GEC 9, text beside its Fig. 6-14) takes the whole depth of the scour
// zone as removed and refers axial design to Hannigan et al. (2016), FHWA
// GEC 12, and Brown et al. (2010), GEC 10; an agency manual (TxDOT
// Geotechnical Manual, "Driven Piles and Scour") sizes piles for the
// nominal resistance after the design scour, the skin friction of the
// scoured soil being lost. For local scour, whose hole is narrow, some
// overburden may remain beside the pile; it is removed in full here, the
// conservative reading (common practice; a partial reduction is not
// offered). So, with depths still from the original surface:
//
//	σv(z) = γw·max(0, zd − zw) + Σ γi·Δzi   (soil from zd down to z), z ≥ zd
//	σv(z) = u(z) = γw·max(0, z − zw),  σ′v = 0,                        z < zd
//
// which is the profile one would build from the design ground line down,
// with the water level where it is. Choices:
//
//   - Layer depths, the water depth, pore-pressure points, pile head and
//     tip depths all keep their meaning: depths from the original surface.
//   - A layer cut through keeps its Top and Bottom (and its index); only
//     its part below zd weighs, and Layer.Removed says how much was cut.
//     A layer wholly above zd stays in Layers for the record and the
//     drawing, with Removed = Thickness(); it needs no unit weight.
//   - Strength parameters are not changed by the cut. Unloading raises the
//     OCR of what remains; leaving it as logged errs on the low side for
//     K0 = (1 − sinφ′)·OCR^sinφ′. Review su and OCR for a deep cut.
//   - Water above the design ground line: the water table (WaterDepth)
//     stays where it is. Where it lies above zd, the excavation or scour
//     hole is full of water up to it, which adds to σv and u alike; where
//     it lies below zd, the cut is dry. Model a dewatered excavation with a
//     water table at or below its floor, or with pore-pressure points.
//   - Pore-pressure points must lie at or below zd (an error names the
//     point otherwise): they describe the ground that remains. Above zd u
//     is that of free water. At zd u may then jump from the free water's
//     value to the first point's rule, as at any break.
//   - A surcharge with a cut is an error: a load on the original surface
//     goes with the soil removed, and keeping it would overstate σ′v.
//   - The depths of the cut must leave soil: each of excavation_depth,
//     scour.general and scour.local is in [0, 10 km], and the line each
//     reaches must lie above the bottom of the profile; the error names
//     the field and its range there.
//
// Choices made where the sources are silent:
//
//   - Depth zero is the ground surface. Spec.WaterDepth is the depth of the
//     water table; negative means free water standing above the ground (a
//     river or sea bed), whose weight adds to total stress and pore pressure
//     equally and so not to effective stress. A zero WaterDepth is a water
//     table at the ground surface; set Spec.NoWater for a dry site.
//   - Soil above the water table weighs its UnitWeight, soil below weighs its
//     SaturatedUnitWeight; the water table decides which, also when
//     pore-pressure points are given.
//   - Pore-pressure points (depth, u), for artesian, under-drained or
//     capillary cases, replace the hydrostatic line. Between points u is
//     linear. Below the last point u continues hydrostatically,
//     u = un + γw·(z − zn). Above the first point u falls hydrostatically to
//     zero and stays zero, u = max(0, u1 − γw·(z1 − z)); a negative first
//     value (capillary suction) applies from its own depth down, with u = 0
//     above it. Negative u is allowed only through points.
//   - At a break where u jumps (the top of a capillary zone), the value
//     below the break is returned, matching LayerAt.
//   - LayerAt(z) at a boundary returns the layer below (the bottom of the
//     profile belongs to the last layer); LayerAbove(z) returns the layer
//     above (z = 0 belongs to the first layer); LayerOf(top, bottom) returns
//     the one layer holding a segment, for shaft segments cut at breaks.
//   - Unit weights: a layer may give UnitWeight (above water) and
//     SaturatedUnitWeight (below water) directly, or any phase data
//     (DryUnitWeight, VoidRatio, WaterContent, Gs, Saturation) with which
//     phase.Solve fixes the state; given values are then checked against
//     each other. Where the phase data alone do not fix the state, New
//     assumes, and records in Layer.Basis: without water content or
//     saturation, the soil above water is dry (γ = γd, common practice for
//     clean sands); with a water content but no saturation, the soil is
//     saturated (S = 1, common practice for clays near or below the water
//     table). A layer given only SaturatedUnitWeight is taken at that weight
//     above water too (flagged); a layer below the water table must have a
//     saturated unit weight, given or derived.
//   - Undrained strength is Su (constant) or SuTop/SuBottom (linear through
//     the layer), not both. A drained layer needs φ′ in (0°, 50°]; an
//     undrained layer needs su > 0 somewhere. Either may also carry the
//     other's parameters (a clay checked both short and long term).
//   - Optional parameters, zero meaning not given, with accepted ranges:
//     OCR [1, 100], Dr (0, 1] as a fraction, N60 (0, 300], E and G (0, ∞),
//     ν (0, 0.5], Ir [1, ∞). E, G and ν are not cross-checked.
//   - Unit weights must lie in (0, 35 kN/m³]; γw in [9, 10.5] kN/m³ (fresh
//     to sea water; 62.4 pcf is 9.80 kN/m³). Surcharge in [0, 100 MPa];
//     pore pressures at points within ±100 MPa; the profile no deeper than
//     10 km and free water no higher than 12 km: limits far beyond practice
//     that catch unit slips and keep every stress finite.
//   - Negative effective stress anywhere in the profile is an error naming
//     the depth.
//   - Queries between 0 and Depth() are answered above the design ground
//     line too (σ′v = 0 there), so that a pile whose head is above it can
//     walk its whole length; LayerAt still names the layer that was there.
//   - Validation reports every problem it finds, joined with errors.Join,
//     each naming its field path, such as
//     "layers[2].thickness: -1 m is outside (0, ∞)".
//
// # Consolidation
//
// A layer may carry compressibility: the compression and recompression
// indices Cc and Cr with the initial void ratio e0 and the
// preconsolidation stress σ′p (given, or OCR·σ′v0, or σ′v0 for a normally
// consolidated layer), or the constrained modulus M = 1/mv.
// Layer.ConsolidationStrain gives the one-dimensional strain for a change
// of vertical effective stress; Profile.Consolidation integrates it over
// depth for a stress change with depth (a fill, a surcharge, a lowered
// water table, a load spread below an equivalent raft), and
// Profile.GroundSettlement gives the settlement of the ground at a list of
// depths (the compression of everything below each). Layers without
// compressibility count as incompressible and are listed as such; the
// bottom of the profile is taken as an incompressible base.
package profile

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
// Depths z are measured down from the ground surface (z = 0) to the
// profile's bottom, Depth(). Stresses are vertical:
//
//	σv(z) = q + γw·hw + Σ γi·Δzi       (q surcharge, hw free water above ground)
//	u(z)  = γw·(z − zw)  for z > zw   (hydrostatic, water table at zw)
//	σ′v   = σv − u
//
// Choices made where the brief was silent:
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
//   - Validation reports every problem it finds, joined with errors.Join,
//     each naming its field path, such as
//     "layers[2].thickness: -1 m is outside (0, ∞)".
package profile

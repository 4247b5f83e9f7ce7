// Package pile provides the axial capacity of a single pile or drilled
// shaft in a layered ground profile, the design bases that turn it into a
// design resistance, and the search for the shortest pile that carries a
// load.
//
// An Analysis composes package profile (stresses with depth), package
// bearing (the tip) and package shaft (unit shaft resistance). NewAnalysis
// resolves, once, the methods of every layer and the depths at which the
// shaft is split: every layer boundary, the water table, each pore-pressure
// point, the critical depth, the edges of zones without friction, and, for
// the API α method in a layer whose su varies, the depths where ψ = su/σ′v
// passes 1 and 0.25. Between two splits σ′v and su are linear, so
//
//	Qs = p·Σ ∫ fs dz
//
// is summed exactly (in closed form) for the β method and for α methods
// whose α is constant in the layer, in closed form for the API α where su
// is constant, and otherwise by adaptive Gauss–Kronrod quadrature to the
// relative tolerance QuadratureTolerance. Capacity, CapacityAt and WithDepth
// allocate nothing; WithDepth makes one pass down the pile with running
// sums. Breakdown returns the same capacity with a row per shaft segment
// and a tip block, the warnings and the sources.
//
// # Defaults and choices (where the issue or the sources were silent)
//
//   - Methods by drainage class, each overridable per layer: drained tip
//     Meyerhof (1976) with its limit; undrained tip Nc = 9 (Skempton 1951);
//     drained shaft the β method with K/K0 and δ/φ′ from Kulhawy (1984) by
//     installation and surface (the middle of his ranges; CFA piles are
//     taken as bored; see DefaultSurface); undrained shaft the API RP 2GEO
//     α for driven piles and the drilled-shaft α of O'Neill & Reese (1999)
//     for bored and CFA piles.
//   - Every factor a method computes can be given instead, per layer,
//     through the shaft and bearing packages' "given" methods (K, K/K0,
//     K/Kp, δ, δ/φ′, α, β, Nq, Nc) or LayerMethods.LambdaValue for λ.
//   - The λ method (Vijayvergiya & Focht 1972) is applied to the undrained
//     layers along the shaft: λ is read for the embedded length L (head to
//     tip), and fav = λ·(σ̄′v + 2·s̄u) uses the means over the λ layers only.
//   - The tip bears on the layer below when it sits on a boundary. It uses
//     σ′v at the tip (no critical depth: methods carry their own limits).
//     Meyerhof's rule for a tip less than ten diameters into a stronger
//     layer (Methods.LayeredTip; on in DefaultMethods) grows qp linearly
//     from the upper layer's unit tip resistance at the interface. A layer
//     within Methods.WeakBelow diameters (default 3) below the tip whose
//     unit tip resistance at its top is lower raises the WeakBelow warning.
//   - Open pipes and H-sections: plugged = tip on the gross (box) area and
//     friction on the outer perimeter; unplugged = tip on the steel area
//     and friction on the outer and inner perimeters with the same unit
//     friction; PlugLesser (the default) takes the lesser compression
//     capacity. In tension only the outer perimeter counts unless the pile
//     is declared Unplugged.
//   - Self-weight: by default Rc = Qp + Qs (the pile's weight balances the
//     overburden it displaces, as hand methods assume); WeightNet uses
//     qp − σ′v at the tip; WeightGross subtracts W′. In tension the pile's
//     effective weight W′ (buoyant below the water table) adds to the shaft
//     resistance: at 1 in characteristic values, and in a design case at
//     the basis's factor on a favourable permanent action (Case.Weight:
//     AASHTO's DC minimum 0.90, EN 1997-1 γG,fav = 1.0, 1/F under a factor
//     of safety unless SafetyFactor.WeightUnfactored).
//   - Tension shaft resistance is the compression unit friction times a
//     tension factor by drainage class (DefaultTension: 0.7 in drained
//     layers after De Nicola & Randolph 1993, 1.0 in undrained layers);
//     TensionSame, or a factor of 1 given for drained layers, switches the
//     reduction off (TensionFactor.Unreduced, for a warning). Design bases
//     apply their own tension factors on top (EN 1997-1 γs,t; AASHTO φ for
//     uplift).
//   - Design bases: SafetyFactor, LRFD and Eurocode7. LRFD factors belong to
//     methods: a preset (AASHTODrivenPiles, AASHTODrilledShafts) holds its
//     table as FactorRows (a tip factor may be paired with the shaft method
//     of its bearing layer, a row may be limited to a drainage class), covers
//     only the methods and installations it was calibrated for, and names
//     them (LRFD.Calibrated, for defaults that follow the preset); a method
//     without a factor is a *MissingFactorError naming the calc-file key.
//     Eurocode7 (EN 1997-1 DA1, DA2, DA3 with sets R1 to R4, ξ3/ξ4 and a
//     model factor; M2 soil factors for DA3 divide tanφ′ and su) takes Annex
//     A's recommended values or given ones (EN7Factors; UKAnnex for the UK
//     National Annex), and VerifyProfiles derives the characteristic
//     resistance from several ground test profiles. A basis gives one or
//     more Cases; Check runs an analysis per case and Verify compares Ed
//     with Rd. Bad design input is a *FieldError naming the field.
//
// Results are for qualified engineers: check them against local codes,
// the site investigation and load tests.
package pile

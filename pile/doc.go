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
// and a tip block, the warnings and the sources. For comparing methods,
// CapacityWithTips (several sets of tip methods) and BreakdownSharing (a
// breakdown that takes the segments it shares from another analysis'
// ShaftPass) give what separate analyses give, to the bit, while
// integrating a shaft they share once.
//
// # Defaults a reviewer sees (each default, its value, its source, when it applies)
//
//	default                      value                                   source                                   applies
//	drained tip                  Meyerhof Nq*, qp ≤ 0.5·pa·Nq*·tanφ′,      Meyerhof (1976); Das, Nq* table           drained layers
//	                             pa = 100 kPa
//	undrained tip                qp = 9·su                               Skempton (1951)                          undrained layers
//	drained shaft                β = K·tanδ, K/K0 the middle of          Kulhawy (1984)                           drained layers
//	                             Kulhawy's range by installation (CFA
//	                             as bored), δ/φ′ by surface
//	interface (Pile.Surface 0)   rough concrete: bored, augered;         Kulhawy (1984) categories                drained shaft, β
//	                             smooth steel: pipes, H-sections (new
//	                             steel); smooth concrete: driven solid
//	undrained shaft              API α (driven, jetted); drilled-shaft   API RP 2GEO (2011); O'Neill & Reese      undrained layers
//	                             α (bored, augered)                      (1999)
//	layered tip                  on (DefaultMethods): qp grows from the  Meyerhof (1976)                          tip < 10 D into a stronger layer
//	                             upper layer's qp over 10 D
//	weak layer below             on: qp = q_weak + (q_strong − q_weak)·  Meyerhof (1976) (from memory)            tip < 10 D above a weaker layer;
//	                             H/(10 D) ≤ q_strong                                                               any drainage
//	embedment ramp               on: qp·Lb/((Lb/D)cr·D), (Lb/D)cr = 10   Meyerhof (1976); Das, Meyerhof's         tip < 10 D into a drained top layer
//	                                                                     method in sand
//	weaker layer warning         WeakBelow flag within 3 D               our choice                               always
//	critical depth               off; when given, σ′v held below n·D     Meyerhof (1976); Kulhawy (1984)          β-family shaft methods in drained
//	                                                                                                              layers only
//	drilled-shaft zones          on: no side resistance in the top       O'Neill & Reese (1999); FHWA GEC 10      bored and augered piles, layers
//	                             1.5 m below the head and the bottom     (2010) (from memory)                     with the drilled-shaft α; compression
//	                             diameter                                                                          and tension
//	N60 missing                  an error naming layers[i].n60           our choice (no value is assumed)         methods that read N60
//	plug mode                    lesser of plugged and unplugged:        common practice                          open pipes and H-sections
//	                             characteristic values without a case,
//	                             design values in a design case
//	self-weight                  Rc = Qp + Qs                            Das (§ pile capacity)                    compression
//	tension                      same unit friction as compression; W′   API RP 2GEO (2011) (from memory)         tension
//	                             added at a factor of 1
//	chart edges                  an error (Methods.Clamp reads at the    our choice                               chart methods
//	                             edge with a warning)
//	required length              the top of the deepest range of         our choice (a longer pile must not       RequiredLength
//	                             passing tip depths that reaches the     fail)
//	                             search limit
//
// Every rule that lowers capacity is on in the zero Methods value and is
// turned off only by a No… field (NoWeakLayer, NoEmbedment,
// NoDrilledZones), which raises a warning flag (WeakLayerOff,
// EmbedmentOff, DrilledZonesOff) wherever the rule would have applied.
//
// # Methods and how they combine
//
//   - Methods by drainage class, each overridable per layer (see the
//     table). Every factor a method computes can be given instead, per
//     layer, through the shaft and bearing packages' "given" methods (K,
//     K/K0, K/Kp, δ, δ/φ′, α, β, Nq, Nc) or LayerMethods.LambdaValue for λ.
//   - The λ method (Vijayvergiya & Focht 1972) is applied to the undrained
//     layers along the shaft: λ is read for the embedded length L (head to
//     tip), and fav = λ·(σ̄′v + 2·s̄u) uses the means over the λ layers only.
//   - The tip bears on the layer below when it sits on a boundary. It uses
//     σ′v at the tip (no critical depth: methods carry their own limits).
//     The layer's own method gives qp; then, in this order: the embedment
//     ramp (a drained top layer only: the ground surface is the "weaker
//     layer" above it, of zero resistance); the layered rule (the upper
//     layer's value at the interface is that layer's value after these same
//     rules); and the weak-layer rule (each weaker layer's q_weak is its
//     value at its top after all the rules, so that a stack of layers is
//     handled; with several weaker layers within 10 D, the least result
//     governs). So built, qp is continuous in depth through every layer
//     boundary and the edge of every zone (tests check it). A layer whose
//     tip resistance cannot be evaluated is an error where one of these
//     rules needs it.
//   - Direct CPT methods (package insitu) serve as a layer's tip or shaft
//     through ConeTip and ConeShaft, bound to a cone sounding. A cone tip
//     takes none of the rules above: its averaging zone about the tip
//     already reads the layers there, qp is not continuous at its layer's
//     boundaries, and a layer above applying the weak-layer rule reads the
//     cone tip's value at its top. A cone shaft is integrated exactly over
//     the readings (linear between them). A zone or length of shaft the
//     sounding does not cover is an error at the layer's field (ErrNoCone
//     when there is no sounding).
//   - The embedment ramp is Meyerhof's growth of the point resistance with
//     the embedment in the bearing stratum up to the critical embedment
//     ratio; (Lb/D)cr = 10 by default (the ratio at which his SPT rule
//     0.4·pa·N60·L/D ≤ 4·pa·N60 reaches its limit, and that of his layered
//     rule); Methods.EmbedmentRatio gives another. It multiplies the whole
//     unit tip resistance (after the method's own limit). It belongs to
//     the bearing-factor methods: the SPT rules for drilled shafts and
//     bored piles (the drilled-shaft N60 rule, and the bored-pile rule
//     where N60 is given) are correlations that already cover embedment,
//     and take no ramp. Meyerhof's SPT rule for driven piles
//     (bearing.DrivenN60) is given by its limit 4·pa·N60 and takes the
//     ramp and the layered rule, which with the default ratio are its own
//     0.4·pa·N60·Lb/D growth.
//   - The drilled-shaft zones: the top zone is measured from the pile head
//     (or the design ground line, where that is deeper);
//     the bottom one moves with the tip (in capacity with depth too). Both
//     apply in tension as in compression (the conservative reading).
//   - Open pipes and H-sections: plugged = tip on the gross (box) area and
//     friction on the outer perimeter; unplugged = tip on the steel area
//     and friction on the outer and inner perimeters with the same unit
//     friction; PlugLesser (the default) takes the lesser compression
//     capacity, compared on design values in a design case. In tension only
//     the outer perimeter counts unless the pile is declared Unplugged.
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
//   - RequiredLength checks every candidate tip depth on its grid; a depth
//     is the answer only if every deeper candidate down to the search limit
//     passes too. Passing ranges that are not one range are listed with a
//     warning; a search that finds nothing states its limit, its step and
//     the best utilisation reached, and where.
//
// Results are for qualified engineers: check them against local codes,
// the site investigation and load tests.
package pile

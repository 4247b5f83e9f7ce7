// Package bearing provides bearing-capacity factors and the unit tip
// resistance of piles and drilled shafts in drained and undrained soil,
// by the published methods a reviewer expects to see compared, each with
// the limits practice puts on it.
//
// Each method is a value that implements Tip: it has our own stable
// identifier (used in calc files and on the command line), a one-line
// equation, its sources (Refs) and its valid range, and it turns an Input
// (φ′, c′, su, q′ and the few extra quantities some methods need) into a
// Result holding the factors used, the unit tip resistance before and
// after the limit, and warning Flags. Tip allocates nothing when it
// succeeds.
//
//	identifier        value                   rule
//	meyerhof          Meyerhof{}              qp = c′Nc* + min(q′Nq*, 0.5·pa·Nq*·tanφ′), Nq* from chart
//	vesic             Vesic{Volume}           qp = c′Nc* + σ′o·Nσ*(φ′, Irr), σ′o = (1+2K0)/3·q′, Irr = Ir/(1+Ir·Δ)
//	vesic-given       VesicGiven{Nsigma, Nc}  qp = c′Nc* + σ′o·Nσ*, factors given
//	berezantzev       Berezantzev{}           qp = q′·Nq(φ′, L/D), from chart
//	janbu             Janbu{Eta}              qp = c′Nc* + q′Nq*(φ′, η′)
//	api-medium-dense-sand-silt … -4   APISand{Class}          qp = min(q′Nq, q_L) by sand class (api-medium-dense-sand-silt, api-medium-dense-sand,
//	                                          api-dense-sand, api-very-dense-sand)
//	drilled-n60-sand    ShaftSand{}             qp = 0.6·N60 tsf ≤ 30 tsf (at 5 % base settlement)
//	driven-n60-sand   DrivenN60{}             qp = 0.4·pa·N60·Lb/D ≤ 4·pa·N60 (Meyerhof 1976; Lb/D by package pile)
//	bored-phi         BoredPhi{NoCap}         qp = min(1/3·qp,Meyerhof, 30 tsf)
//	bored-sand        BoredSand{…}            drilled-n60-sand if N60 given, else bored-phi; × 1.27 m/B for B > 1.27 m
//	<id>+large-base   LargeBase{Of, Off}      qp(Of) × min(1, 1.27 m/B)
//	given-nq          GivenNq{Nq, Nc, Limit}  qp = min(c′Nc + q′Nq, limit)
//	nc9               Skempton{}              qp = 9·su
//	vesic-undrained   VesicUndrained{}        qp = [(4/3)(ln Irr + 1) + π/2 + 1]·su
//	given-nc          GivenNc{Nc}             qp = Nc·su
//
// # The catalogue
//
// Methods returns the table above as data, one Descriptor per identifier
// a calc file can name: its drainage class, its scope, the keys it reads
// beside method: (Param: key, dimension, range, default, meaning, required
// or not), its Equation, Range and Refs, and New, which builds the method
// from the values given. Lookup finds an entry, IDs lists them. Package
// calc, its JSON Schema and the factors tool read this table, so a method
// is added by one entry. The keys:
//
//	janbu         eta     η′, 60 to 105 deg (default 90 deg)
//	vesic-given   nsigma  Nσ*, 1 to 1e4 (required); nc  Nc*, 0 to 1e4 (default 0)
//	given-nq      nq      Nq, 1 to 1e4 (required); nc  0 to 1e4 (default 0); limit  ≥ 0 (default none)
//	given-nc      nc      Nc, 1 to 100 (required)
//
// Every other method reads no key: its inputs come from the layer (φ′,
// c′, su, N60, Ir, Δ) and the pile. In a calc file, vesic takes Δ from the
// layer's volumetric_strain or, when none is given, from Vesic's
// correlation (Vesic{Volume: VolumeCorrelated}). Drained and Undrained
// build the entries of a drainage class that need no key, in the table's
// order, for Compare.
//
// The classical shallow factors PrandtlNq, PrandtlNc and VesicNgamma, and
// Vesic's VesicNsigma and VesicNc, are exported as building blocks.
// Compare evaluates every applicable method for one Input, for the
// command-line factors tool and the report.
//
// # Choices where the published methods are silent
//
//   - q′ is the effective vertical stress at the tip, supplied by the
//     caller; this package applies no critical depth.
//   - Charts (Meyerhof's Nq*, Berezantzev's Nq) are data with their source
//     and reading tolerance. Outside a chart is an error naming the range,
//     unless Input.Clamp is set, when the chart is read at its edge and the
//     result carries the Clamped flag. Meyerhof's ln Nq* is interpolated by
//     a monotone cubic through the tabulated points; Berezantzev's ln Nq
//     linearly in φ′ and Nq linearly in L/D.
//   - Meyerhof's limit q_l = 0.5·pa·Nq*·tanφ′ applies to the friction term
//     only, as Das (2019) presents it. pa is Input.Pa wherever a method
//     uses it (Meyerhof, BoredPhi, BoredSand, Vesic's Δ correlation): 0
//     means DefaultPa, 100 kPa; 50 to 150 kPa is accepted, so a US file may
//     pass 2000 psf or 2116 psf. The drilled-shaft SPT rule is written in
//     tsf as published and does not use pa.
//   - Vesic's Ir is G/(c′ + q′·tanφ′) drained and G/su undrained unless the
//     caller gives Ir (ShearModulus turns Es and μs into G). A given Δ is
//     used as given. When none is given, Vesic{Volume: VolumeCorrelated}
//     takes Das's correlation Δ = 0.005·(1 − (φ′ − 25°)/20°)·q′/pa (φ′ 25
//     to 45 deg); the zero value Vesic{} takes Δ = 0 and flags the result
//     VolumeChangeIgnored, because that is the higher tip. The Result
//     records Ir, Δ, DeltaBy and Irr. Undrained, Δ = 0 unless given. K0 = 0
//     means Jaky's 1 − sinφ′.
//   - Bored and augered piles and drilled shafts in sand: BoredSand takes
//     the drilled-shaft SPT rule when N60 is given, otherwise one third of
//     Meyerhof's driven value (Meyerhof 1976) capped at the drilled-shaft
//     30 tsf, and reduces either by 1.27 m/B for bases over 1.27 m
//     (O'Neill & Reese 1999). It never exceeds Meyerhof's driven value in
//     the same sand. The cap and the reduction are on by default; turning
//     either off flags ReductionOff where it would have applied.
//   - Each method's unit tip resistance has a settlement basis
//     (SettlementBasis): ultimate for the classical methods, 5 % of the
//     base diameter for the drilled-shaft SPT rule, the lesser of the two
//     for the bored-pile rules.
//   - Coyle & Castello's (1981) tip is not provided: its Nq* chart could
//     not be read in a published table or worked example, and a chart is
//     not drawn from memory.
//   - Janbu's η′ defaults to 90 deg (the Prandtl-Reissner Nq).
//   - Drained methods add the c′ term only when c′ > 0; Nc is then
//     (Nq − 1)·cotφ′ for the method's Nq, and its limit as φ′ → 0.
//   - ShaftSand on its own applies no reduction for base diameters over
//     1.27 m; LargeBase and BoredSand apply it from Input.D. A zero N60 is
//     "not given" and an error naming n60.
//   - Values recalled rather than read (the API sand table, Berezantzev's
//     tabulation, Meyerhof's intermediate 1-degree values, the
//     drilled-shaft SPT rule, its cap and large-base reduction, and
//     Meyerhof's one third for bored piles) are marked so in the method
//     documentation and the tests.
//
// Errors are *RangeError values naming the method, the field and the
// accepted range, with the value written in enough digits to differ from the
// limit it passes. Limits are inclusive; φ′ is compared with a tolerance of
// 1e-9 degrees, so a range edge converted from degrees to radians and back
// stays inside. No result holds NaN or Inf.
package bearing

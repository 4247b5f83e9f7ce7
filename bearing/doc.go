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
//	vesic             Vesic{}                 qp = c′Nc* + σ′o·Nσ*(φ′, Irr), σ′o = (1+2K0)/3·q′
//	berezantzev       Berezantzev{}           qp = q′·Nq(φ′, L/D), from chart
//	janbu             Janbu{Eta}              qp = c′Nc* + q′Nq*(φ′, η′)
//	api-sand-1 … -4   APISand{Class}          qp = min(q′Nq, q_L) by sand class
//	shaft-n60-sand    ShaftSand{}             qp = 0.6·N60 tsf ≤ 30 tsf
//	given-nq          GivenNq{Nq, Nc, Limit}  qp = min(c′Nc + q′Nq, limit)
//	nc9               Skempton{}              qp = 9·su
//	vesic-undrained   VesicUndrained{}        qp = [(4/3)(ln Irr + 1) + π/2 + 1]·su
//	given-nc          GivenNc{Nc}             qp = Nc·su
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
//     only, as Das (2019) presents it; pa defaults to 100 kPa (DefaultPa).
//   - Vesic's Ir is G/(c′ + q′·tanφ′) drained and G/su undrained unless the
//     caller gives Ir; Δ = 0 (the default) means Irr = Ir. K0 = 0 means
//     Jaky's 1 − sinφ′.
//   - Janbu's η′ defaults to 90 deg (the Prandtl-Reissner Nq).
//   - Drained methods add the c′ term only when c′ > 0; Nc is then
//     (Nq − 1)·cotφ′ for the method's Nq, and its limit as φ′ → 0.
//   - The SPT method for drilled shafts applies no reduction for base
//     diameters over 1.27 m; the pile package owns the geometry.
//   - Values recalled rather than read (the API sand table, Berezantzev's
//     tabulation, Meyerhof's intermediate 1-degree values) are marked so
//     in the method documentation and the tests.
//
// Errors are *RangeError values naming the method, the field and the
// accepted range, with the value written in enough digits to differ from the
// limit it passes. Limits are inclusive; φ′ is compared with a tolerance of
// 1e-9 degrees, so a range edge converted from degrees to radians and back
// stays inside. No result holds NaN or Inf.
package bearing

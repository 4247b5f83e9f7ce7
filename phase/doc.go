// Package phase provides the three-phase (solids, water, air) relations of
// one soil element: specific gravity of solids Gs, void ratio e, porosity n,
// water content w, degree of saturation S, moist, dry, saturated and
// submerged unit weights γ, γd, γsat, γ′, and relative density Dr.
//
// Solve takes whatever a log or a laboratory sheet gives (an Input in which
// a zero field means "not given") and returns the whole State, or an error
// that says what is missing, what disagrees, or what is impossible. The
// named functions (DryUnitWeight, SaturatedUnitWeight, GsFromDryUnitWeight,
// …) evaluate one relation each.
//
// The relations used (Das & Sobhan 2014, ch. 3; Knappett & Craig 2012, ch. 1):
//
//	n    = e/(1+e)
//	S·e  = w·Gs
//	γd   = Gs·γw/(1+e)
//	γsat = (Gs+e)·γw/(1+e) = γd + n·γw
//	γ′   = γsat − γw
//	γ    = γd·(1+w) = γd + S·n·γw
//	γd   = Gs·γw·S/(S + w·Gs)
//	Dr   = (emax − e)/(emax − emin)
//
// Choices made where the sources are silent:
//
//   - Quantities are fractions, not percentages: w = 0.18 for 18 %, S = 0.9,
//     n = 0.35, Dr = 0.6.
//   - Zero means "not given". A true zero (a dry soil with S = 0 and w = 0, or
//     the loosest state Dr = 0) is given by setting its bit in Input.Zero.
//   - The unit weight of water is the caller's: Input.GammaW, defaulting to
//     WaterUnitWeight (9.81 kN/m³); use WaterUnitWeightUS (62.4 pcf) for US
//     work.
//   - A full state needs three independent values (for example Gs, e and w)
//     and, for Dr, both emax and emin. Given values beyond that are checked
//     against each other to a relative tolerance (DefaultTolerance, 0.5 %,
//     unless Input.Tol is set), enough to accept published data rounded to
//     three significant figures. Once they agree, the state is recomputed
//     from Gs, e and S, so that every relation holds exactly in what is
//     returned (and printed); another given value may move by up to the
//     tolerance.
//   - Gs must lie in [MinGs, MaxGs] = [1.3, 3.5]: common practice puts
//     quartz and clay minerals at 2.6-2.8, organic soils and peat down to
//     about 1.4, and heavy-mineral sands up to about 3.4. Dr must lie in
//     [0, 1]; e must be positive; S in [0, 1]; n in (0, 1).
package phase

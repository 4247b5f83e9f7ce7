// Package structural computes the axial compression resistance of a pile's
// own cross-section (the material, not the ground) by the published rules
// of the design basis in force, so that a pile is checked against the
// largest axial force it carries as well as against the ground.
//
// Units are SI throughout (the units types). Nothing here prints or reads
// files.
//
// # Rules
//
//	AASHTO (LRFD bases)      concrete: Pr = φ·k·[0.85·f′c·(Ag − Ast) + fy·Ast]      AASHTO 5.6.4.4, φ from 5.5.4.2
//	                         steel:    Pr = φc·Fy·As  (λ = 0, fully embedded)       AASHTO 6.9.4.1, φc from 6.5.4.2
//	EN (EN 1997-1 basis)     concrete: NRd = fcd·Ac + σsd·As,  fcd = αcc·fck/(kf·γc)  EN 1992-1-1 3.1.6, 2.3.4.2, 2.4.2.5
//	                         steel:    Npl,Rd = A·fy/γM0                            EN 1993-1-1 6.2.4
//	Allowable (safety factor) concrete: Pa = fc·f′c·(Ag − As) + fr·fy·As
//	                         steel:    Pa = fs·Fy·As                                IBC 2018 §1810.3.2.6
//
// k is 0.80 for tied and 0.85 for spiral transverse reinforcement; φ is
// 0.75 for compression-controlled concrete sections; φc is 0.50 (H-pile)
// or 0.60 (pipe) under severe driving and 0.60 or 0.70 under good driving.
// In EN 1992-1-1 a cast-in-place pile without permanent casing (bored or
// augered) is designed on the reduced diameter of 2.3.4.2(2) (d − 20 mm
// below 0.4 m, 0.95·d from 0.4 to 1.0 m, d − 50 mm above) with γc
// multiplied by kf = 1.1 (2.4.2.5(2)); in pure compression the strain is
// limited to εc2 = 2 ‰ (6.1(5)), so the bars' stress is
// σsd = min(fyk/γs, Es·εc2) = min(fyk/1.15, 400 MPa).
//
// # Assumptions
//
// The pile is fully embedded unless a steel member is given a free length
// (Column: the unbraced length down to the depth of fixity the engineer
// assesses, and K, default 2.1): then AASHTO 6.9.4.1.1's column curve
// (Pn = 0.658^(Po/Pe)·Po, or 0.877·Pe below Pe/Po = 0.44; the allowable
// rule takes its fraction of this Pn) or EN 1993-1-1 6.3.1 (χ on curve c)
// reduces the resistance. Bending at the head is not checked, and a
// concrete section with a free length is refused: its column check is not
// made here. Steel sections must not be slender (AASHTO: b/t and D/t limits
// of 6.9.4.2; EN 1993-1-1: Class 1 to 3 in compression, Table 5.2):
// a slender section is refused, not reduced. A steel pipe's concrete fill
// and a precast pile's prestress are not counted (both would change the
// resistance: give the section as it is). Values marked "from memory" in
// the doc comments were not read in the standard here; check them.
//
// The results are for qualified engineers; the governing code and licensed
// practice prevail.
package structural

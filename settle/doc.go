// Package settle estimates the settlement of a single axially loaded pile
// and reads static load tests: Vesic's three-component method, Randolph &
// Wroth's closed-form head stiffness, load transfer on t-z and q-z
// springs, four criteria of load-test interpretation, and downdrag by the
// unified method (the neutral plane).
//
// Units are SI throughout (the units types): metres, newtons, pascals.
// Depths are measured down from ground level. Compression and settlement
// are positive. Nothing here prints or reads files; warnings are data.
//
// # Vesic (1977), as presented by Das (2019)
//
// Vesic.Settlement adds three components under the working load:
//
//	se1 = (Qwp + ξ·Qws)·L/(Ap·Ep)                       elastic shortening
//	se2 = (qwp·D/Es)(1 − νs²)·Iwp        (Elastic)      load at the tip, Iwp = 0.85
//	se2 = Qwp·Cp/(D·qp)                  (Empirical)
//	se3 = (Qws/(p·L))·(D/Es)(1 − νs²)·Iws (Elastic)     load along the shaft,
//	      Iws = 2 + 0.35·√(L/D)
//	se3 = Qws·Cs/(L·qp), Cs = (0.93 + 0.16·√(L/D))·Cp (Empirical)
//
// ξ is 1/2 for unit shaft resistance uniform with depth and 2/3 for one
// rising linearly from zero (XiUniform, XiTriangular). CpRange gives
// Vesic's typical Cp by soil and installation (values recalled from Das's
// table, marked from memory); its high end gives the larger settlement.
//
// # Randolph & Wroth (1978)
//
// RandolphWroth.Solve gives the head stiffness of a compressible pile in a
// soil whose shear modulus rises linearly with depth (G at the head to GL
// at the tip level), on a base stratum of modulus Gb:
//
//	η = rb/r0, ξ = GL/Gb, ρ = G(L/2)/GL, λ = Ep/GL
//	rm = {0.25 + ξ[2.5ρ(1 − ν) − 0.25]}·L  (= 2.5·L·ρ·(1 − ν) for ξ = 1)
//	ζ = ln(rm/r0), μL = √(2/(ζλ))·(L/r0)
//	Pt/(GL·r0·wt) = [4η/((1 − ν)ξ) + (2πρ/ζ)(tanh μL/μL)(L/r0)]
//	              / [1 + (1/(πλ))(4η/((1 − ν)ξ))(tanh μL/μL)(L/r0)]
//
// with the rigid-pile limit (λ → ∞), the share of the head load reaching
// the base Pb/Pt and the ratio wb/wt = 1/cosh μL. Valid for L/r0 ≥ 2,
// 0 ≤ G(head) ≤ GL, ν 0 to 0.5. The form of rm with ξ < 1 is recalled
// (Randolph & Wroth 1978; Fleming et al. 2009); the tests check it against
// a published worked calculation.
//
// # Load transfer
//
// A Model is the pile as a column of elastic elements of stiffness EA/h on
// nonlinear springs: along the shaft a t-z curve scaled by the ultimate
// unit shaft resistance fs of each Segment (linear between its top and
// bottom), at the base a q-z curve scaled by Qp·Ab. Each element carries
// half of its shaft spring at each end (the trapezoid rule: exact for the
// capacity, and second-order accurate in the displacements, as a test
// against the closed form of an elastic pile on linear springs shows:
//
//	P/w = EA·μ·(Ω + tanh μL)/(1 + Ω·tanh μL), μ = √(k·p/(EA)), Ω = kb/(EA·μ)
//
// within 0.5 % at 100 elements, error falling as h²). Element ends fall on
// segment boundaries. NewSolver builds the mesh once; Run follows a
// sequence of head loads, RunDisplacements a sequence of head
// displacements, SettlementAt and HeadLoadAt answer one value and allocate
// nothing.
//
// The solution holds the head displacement and solves the rest of the pile
// by Newton's method on its tridiagonal tangent (a Thomas solve over
// preallocated arrays, with backtracking); a head load is reached by a
// bracketed Newton search on the head displacement. Both stop when every
// out-of-balance force, and the miss of the head load, is at most
// Options.Tolerance (default 1e-9) times the capacity (or the
// floating-point floor of the column forces, when larger), and give up
// with an error after Options.MaxIterations (default 100). A head load the
// pile cannot carry is a result, not a failure: Result.Plunged with
// Result.PlungeLoad, the largest head load found (Σ shaft + tip when no
// curve softens; the peak of the load path when one does), or a
// *PlungeError from SettlementAt.
//
// Curves: APIClay (API RP 2GEO 2011 clay t-z with a residual ratio after
// the peak, default 0.7, the low end of the standard's 0.7 to 0.9), APISand
// (linear to tmax at 2.54 mm), APITip (the API Q-z curve), and Points for
// curves the engineer gives. The API points are recalled, not read from
// the standard here (marked from memory). The springs are nonlinear
// elastic: loading is monotonic, there are no unloading branches, and the
// curves act alike in tension on the shaft; the base carries no tension.
// FromBreakdown builds a Model from a pile analysis (package pile), so the
// ultimate values, with their defaults, limits and factors, come from it;
// at full mobilisation the model carries the analysis' Qs + Qp exactly.
//
// # Downdrag and the neutral plane (Fellenius 2004)
//
// Downdrag.Solve takes the shaft as rows of unit shaft resistance fs
// (ShaftRow; RowsFromBreakdown from a pile analysis), the sustained load
// Qd, the tip (area, qp, q-z curve) and the ground settlement with depth
// (SettlementPoint: depths increasing, linear between them). The same fs
// acts downward above the neutral plane and upward below it:
//
//	from the head   Q(z) = Qd + ∫head..z p·fs dz
//	from the tip    Q(z) = Rt,mob + ∫z..tip p·fs dz
//	neutral plane   where they meet; drag load Qn = ∫head..NP p·fs dz
//	largest force   Qd + Qn, at the neutral plane
//
// The rows are integrated in closed form (fs linear in a row), so the
// neutral plane is the root of a quadratic. The mobilised tip resistance
// Rt,mob is given, or found by bisection so that the pile settles with
// the ground at the neutral plane: toe movement on the q-z curve plus the
// pile's shortening ∫Q/EA below the neutral plane equals the ground
// settlement there. Where even with no tip force the pile would settle
// more than the ground at the equilibrium depth, the neutral plane is
// where the two settle alike, higher up, the shaft below it only partly
// mobilised. With no ground settlement there is no negative skin
// friction and the check is the ordinary one (DowndragResult.Carries:
// Qd + Qn ≤ Rs below NP + Rt). DowndragResult carries NeutralPlane,
// DragLoad, MaxForce, the settlements and the forces with depth. Choices:
// a sharp change of sign at the neutral plane (no transition zone: the
// largest drag load), the pile's weight left out.
//
// # Static load tests
//
// A LoadTest is points of head load and head settlement; loads must not
// fall and settlements must rise. Davisson gives the offset limit load
// (Davisson 1972), where the curve (linear between points) meets
//
//	s = Q·L/(A·E) + 0.15 in + D/120      (0.15 in = 3.81 mm)
//
// TenPercent the load at a settlement of 0.1·D (EN ISO 22477-1);
// ChinKondner the asymptote 1/C1 of s/Q = C1·s + C2 fitted by least
// squares (Chin 1970; Kondner 1963); BrinchHansen80 the load
// Qu = 1/(2√(C1·C2)) at su = C2/C1 of √s/Q = C1·s + C2 (Brinch Hansen
// 1963), where the settlement is four times that at 0.8·Qu. A criterion the
// test never met is reported as not Reached; nothing is extrapolated
// except by the two hyperbolic criteria, whose asymptote or fitted peak
// lies beyond the points by design.
//
// # Cautions
//
// These are estimates for qualified geotechnical engineers. Elastic
// parameters (Es, G, ν) and load-transfer curves carry large uncertainty;
// the API curves were drawn from tests on driven offshore piles, and bored
// piles are better served by curves for drilled shafts or by the
// engineer's own points. Check every result against the governing codes,
// the site investigation and load tests on the site; the judgement of a
// licensed professional engineer governs any design that uses them.
package settle

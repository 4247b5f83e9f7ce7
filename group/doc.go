// Package group provides the axial design of a group of identical vertical
// piles under a rigid cap: the layout and its spacing checks, the group
// efficiency by the published formulas, block failure, group uplift, and
// the settlement of the group by Vesic's ratio and by an equivalent raft.
//
// Every length is in metres, every force in newtons (package units).
//
// # Layout
//
// A layout is rows × columns at spacings sx (between columns, along x) and
// sy (between rows, along y), or a list of positions. Two piles closer than
// one pile width (centre to centre) overlap: an error. A spacing under the
// minimum of AASHTO LRFD 10.7.1.2 (the greater of 2.5 widths and 30 in (762 mm) for
// driven piles; 3 widths for bored and augered piles, AASHTO LRFD 10.8.1.2)
// and a clear distance from a pile's face to the cap's edge under 9 in (229 mm)
// (AASHTO LRFD 10.7.1.2) are warnings. The clause numbers and values were
// written from memory of the 9th edition, not read in this session.
//
// The block is the rectangle that encloses the piles' outer faces: Bg is
// its width along x and Lg its length along y.
//
// # Efficiency
//
// η multiplies the sum of the single piles' characteristic compression
// resistances. The rules (identifiers in calc files):
//
//	practice          AASHTO LRFD 10.7.3.9 (driven) and 10.8.3.6 (bored):
//	                  ground with an undrained layer along the pile or at its
//	                  tip, cap not in firm contact: η = 0.65 at s = 2.5 D rising
//	                  linearly to 1 at 6 D; cap in firm contact: 1; drained
//	                  ground: 1 for driven piles, and for bored piles 0.67 at
//	                  2.5 D rising to 1 at 4 D (values from memory)
//	converse-labarre  η = 1 − θ·[(n1 − 1)·n2 + (n2 − 1)·n1]/(90·n1·n2), θ = atan(D/s) in degrees
//	los-angeles       η = 1 − D/(π·s·n1·n2)·[n1(n2 − 1) + n2(n1 − 1) + √2 (n1 − 1)(n2 − 1)]
//	seiler-keeney     η = 1 − [11 s/(7 (s² − 1))]·[(n1 + n2 − 2)/(n1 + n2 − 1)] + 0.3/(n1 + n2), s in feet
//	feld              each pile loses 1/16 of its capacity for each neighbouring pile
//	                  in its row, column or diagonal
//	given             a value of the engineer's own, 0 < η ≤ 1
//
// n1 is the number of rows, n2 the number of columns, D the pile width and
// s the centre-to-centre spacing (the smaller of sx and sy when they
// differ, the lower efficiency). The formulas are those Das & Sivakugan
// (2019) list in their section on group efficiency, written here from
// memory of that section; Converse-Labarre is checked against a printed
// example. The formulas need rows and columns; a layout given by positions
// takes practice or given. An efficiency above 1 is taken as 1 with a
// warning.
//
// The default is practice: the formulas differ widely and AASHTO's rule is
// what a reviewer of a highway or building foundation expects; in clay the
// block check (always made) guards against the group failing as one.
//
// # Block failure
//
// After Terzaghi & Peck (1967), as Das & Sivakugan (2019) give it, the
// group may fail as one block of soil and piles:
//
//	Qblock = qb·Bg·Lg + 2(Bg + Lg)·Σ τ·ΔL
//
// with τ = su in undrained layers and τ = c′ + K0·σ′v·tanφ′, K0 = 1 − sinφ′
// (Jaky 1944) in drained layers (soil sheared against soil; our choice);
// at the base qb = Nc·su with Skempton's (1951) Nc = 5(1 + 0.2·Df/Bg)(1 +
// 0.2·Bg/Lg), Df/Bg ≤ 2.5, in an undrained layer, and the single pile's
// unit tip resistance in a drained one. The group's capacity is the lesser
// of η·n·Qsingle and Qblock. In sand the usual rule (AASHTO LRFD
// 10.7.3.9; Das & Sivakugan 2019) is η = 1 and block failure does not
// govern; the block is still computed and shown.
//
// # Uplift
//
// The lesser of n times the single pile's tension resistance and the
// block's effective weight plus the shear on its perimeter (AASHTO LRFD
// 10.7.3.11, written from memory):
//
//	Tg = min(n·Tsingle, W′block + 2(Bg + Lg)·Σ τ·ΔL)
//
// with τ as for the block in compression. In cohesionless soil AASHTO's
// block spreads outwards (a pyramid at 1 horizontal in 4 vertical, from
// memory); it is not modelled: the vertical block here is the smaller, the
// lower uplift resistance. W′ is the soil's effective weight inside the
// block; the piles' extra weight over the soil they replace is left out.
//
// # Settlement
//
// Vesic (1969): sg = s·√(Bg/D), s the single pile's settlement at the same
// load per pile. Equivalent raft: the group's service load on a raft at
// two-thirds of the embedded length below the head (Tomlinson & Woodward
// 2008, Fig. 5.4, p. 243), by one of two methods (RaftInput.Method; calc file:
// group.raft_method).
//
// two-to-one (the default): the raft is the group's plan Bg × Lg and the
// load spreads 2 vertical to 1 horizontal below it (common practice, as
// Murthy 2002 draws it), the mean stress over the spread area:
//
//	Δσ(z) = Q/((Bg + z′)(Lg + z′)),  z′ = z − zr
//
// tomlinson: Tomlinson & Woodward's procedure (Fig. 5.4, p. 243;
// Example 5.1, pp. 292-294). The raft is the group's plan widened by a
// spread of 1 horizontal in 4 vertical from the pile heads (or the top of
// the bearing stratum, group.raft_spread_top) down to the raft,
//
//	Br = Bg + (zr − zs)/2,  Lr = Lg + (zr − zs)/2,  q = Q/(Br·Lr)
//
// and the stress below it is Boussinesq's for a flexible loaded rectangle
// in Newmark's closed form (NewmarkCorner), either below the raft's
// centre (the default, the largest on any vertical: conservative) or
// averaged over the raft's plan (group.raft_stress: average); or, as some
// teaching texts combine them, the 2:1 spread below the widened raft
// (raft_stress: two-to-one, Q/((Br + z′)(Lr + z′))). Tomlinson
// & Woodward read their stress factors from a chart; the factors printed
// in their Example 5.1 agree with the plan average within the chart's
// reading (0.804, 0.513, 0.332, 0.223, 0.157 against 0.80, 0.51, 0.33,
// 0.22, 0.15), not with the centre (0.97 at the first layer), so the
// average reproduces their figures and the centre gives some 25 % more.
//
// Below either raft: the consolidation of layers with compressibility
// (Cc, Cr, e0 and σ′p, or a constrained modulus M = 1/mv;
// profile.Profile.Consolidation, which integrates over each layer where
// the textbook sums mv·Δσ·H at mid-layer) and the compression ∫ Δσ/E dz of
// layers that have only a Young's modulus (E taken as a one-dimensional
// modulus, our simplification; it understates the compression of a
// laterally confined layer). A layer with neither adds nothing, with a
// warning. The consolidation (oedometer) settlement is multiplied by the
// depth factor μd (the correction for a raft below the surface, which
// Tomlinson & Woodward read from their Fig. 5.23; Fox's, from memory) and
// the geological factor μg (about 0.5 for London Clay as their Example
// 5.1 takes it; Skempton & Bjerrum's, from memory): both are the
// engineer's inputs, μd in (0, 1] and μg in (0, 1.2] (the upper end of
// Skempton & Bjerrum's range, for very sensitive clays, from memory), and
// both default to 1, no reduction, the conservative choice.
// The elastic compression is not multiplied. Where the piles pass through
// soft ground into a firm stratum, Tomlinson & Woodward place the raft at
// two-thirds of the length in the firm stratum and start the spread at
// its top: give the raft's depth (group.raft_depth) and, for the
// tomlinson method, the spread's top (group.raft_spread_top).
//
// These routines are aids for qualified engineers; check them against the
// governing code, the site investigation and load tests.
package group

// Package pier computes the lateral rigidity of a masonry or concrete shear
// wall with openings by the classic hand method of docs/method.md §2, and
// with it the share of the wall shear that each pier carries, the forces of
// every pier (docs/method.md §6), the wall's top deflection and the
// storey-drift check.
//
// # What is computed
//
// Element gives the deflection of a solid rectangle under a unit shear at
// its top, as a cantilever (d = 4r³/kf + 1.2r/(g·kv)) or fixed-fixed
// (d = r³/kf + 1.2r/(g·kv)), r = h/L, split into bending and shear. These are
// Timoshenko beams with shear coefficient 5/6.
//
// Solve decomposes the active layout of a wall as a tree of regions (the
// wall, and every pier with openings inside it), built first and computed
// from the leaves up: start from the solid wall,
// and for each band (merged vertical projection of the openings) remove the
// solid strip and put back the band's piers in parallel; a pier with an
// opening inside is decomposed the same way one level down. Bands that
// reach the top of a cantilever region are cantilevers; every other band is
// fixed-fixed. The result holds the working (Steps), every pier (Piers:
// names P1, P2, … left to right, lowest band first; P2.1 inside P2; a wall
// with no opening is the one pier P1), the wall's relative deflection and
// rigidity and their bending/shear split, the warnings (one typed list:
// kind, severity, subject, text), and, when the material and the load are
// given, the rigidity in N/m, the top deflection and the drift check.
//
// Every pier, parents included, gets its section forces at its bottom,
// middle and top (Pier.Loads) under the lateral load (V = share × V, the
// moment of its support, the axial force of its band's overturning
// couple), the dead load and the live load (axial forces by tributary
// width, with the wall's self weight above each section; DefaultSelfWeight
// when the file gives none). Result.Overturning is the wall's base
// overturning moment.
//
// MaterialModuli turns a material into E and E_v by TMS 402-22 (masonry) or
// ACI 318-19 (concrete), with the user's overrides, and says where each value
// came from.
//
// # Units
//
// Lengths are metres, forces newtons, stresses pascals, moments N·m (all
// SI internally; the wall's unit system only affects how values are read
// and shown). Relative deflections and rigidities are computed with E = 1
// and t = 1: a relative rigidity times E·t is a rigidity in N/m, a relative
// deflection times V/(E·t) is a deflection in metres. Relative values are
// therefore dimensionless and do not change when every length is scaled.
//
// # Invariants
//
//   - A Result never holds NaN or Inf. A wall that the openings cut (no
//     solid path from base to top) is a *CutError; a full-height opening
//     leaves two cantilever piers side by side, which docs/method.md §2.2 solves as it
//     stands; a band with no pier is a *StaggeredError;
//     sizes that are not positive and finite are plain errors.
//   - The BandShare of the piers of one band sum to one; a pier's Share is
//     its BandShare times its parent's Share, so the shares of the piers of
//     a band sum to the share of the region they divide (1 at the top).
//   - A mirrored wall gives mirrored piers and shares; scaling every length
//     leaves every relative value and share unchanged.
//   - Deflection = Split.Bending + Split.Shear.
//   - In every band with two piers or more, at each of its piers' sections,
//     the lateral shears add up to the region's shear, the lateral axial
//     forces to the region's (zero for the wall), and Σ(M_i + N_i·(x_i − x̄))
//     to the region's moment about the piers' centroid x̄; the dead loads of
//     a wall band add up to the line load on the wall and the weight above.
//
// # Assumptions (the method's, not the code's)
//
//   - Piers are fixed against rotation by rigid spandrels and sills, except
//     those in a band that reaches the top of a cantilever wall. Shallow
//     spandrels make this unconservative: the method then overestimates
//     rigidity, which the finite-element check (package pier/fe) shows.
//   - Every band carries the whole wall shear; the deflections of the solid
//     parts and the bands simply add.
//   - When no opening spans the full height of its band (staggered
//     openings), each opening is a cut and each pier takes the band's full
//     height. Because of this rule, adding an opening can occasionally make
//     the computed wall stiffer: a new opening that spans such a band turns
//     the others into openings inside piers. The rule is kept as published;
//     Result.Warnings says when it applied.
//   - A pier with no load path of its own (openings that cut it) gets no
//     rigidity and no share, with a warning.
//
// The results support, and do not replace, the judgement of a licensed
// engineer; local codes govern.
package pier

// Package pier computes the lateral rigidity of a masonry or concrete shear
// wall with openings by the classic hand method of DESIGN §3, and with it
// the share of the wall shear that each pier carries, the pier shears and
// moments, the wall's top deflection and the storey-drift check.
//
// # What is computed
//
// Element gives the deflection of a solid rectangle under a unit shear at
// its top, as a cantilever (d = 4r³/kf + 1.2r/(g·kv)) or fixed-fixed
// (d = r³/kf + 1.2r/(g·kv)), r = h/L, split into bending and shear. These are
// Timoshenko beams with shear coefficient 5/6.
//
// Solve decomposes the active layout of a wall: start from the solid wall,
// and for each band (merged vertical projection of the openings) remove the
// solid strip and put back the band's piers in parallel; a pier with an
// opening inside is decomposed the same way one level down. Bands that
// reach the top of a cantilever region are cantilevers; every other band is
// fixed-fixed. The result holds the working (Steps), every pier (Piers:
// names P1, P2, … left to right, lowest band first; P2.1 inside P2), the
// wall's relative deflection and rigidity and their bending/shear split,
// and, when the material and the load are given, the rigidity in N/m, the
// top deflection, pier forces and the drift check.
//
// MaterialModuli turns a material into E and E_v by TMS 402 (masonry) or
// ACI 318 (concrete), with the user's overrides, and says where each value
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
//     leaves two cantilever piers side by side, which §3 solves as it
//     stands; a band with no pier is a *StaggeredError;
//     sizes that are not positive and finite are plain errors.
//   - The BandShare of the piers of one band sum to one; a pier's Share is
//     its BandShare times its parent's Share, so the shares of the piers of
//     a band sum to the share of the region they divide (1 at the top).
//   - A mirrored wall gives mirrored piers and shares; scaling every length
//     leaves every relative value and share unchanged.
//   - Deflection = Split.Bending + Split.Shear.
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

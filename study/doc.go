// Package study compares opening layouts of shear walls and sweeps one
// opening along a wall.
//
// A comparison solves two walls, or two layouts (variants) of one wall, with
// the classic method of package pier and lines up what changed: the wall's
// relative rigidity and rigidity, its deflection and drift check, and each
// leaf pier's share of the wall shear and its shear force. Piers are matched
// as physical piers, not by name, because the names P1, P2, … are handed out
// left to right and shift when an opening moves: two piers are the same pier
// when they stand between the same openings (or wall ends: PierBounds), and
// among the rest when their rectangles overlap, the pair with the larger
// overlap (intersection over union) winning. A pier of one layout that
// matches no pier of the other appears or vanishes, and the comparison says
// so. On request
// (Options.FE) both layouts also get the plane-stress finite-element check
// of package pier/fe, which answers even where the classic method cannot.
//
// A sweep moves one opening step by step, along x or y, through every
// position where it fits in the wall (inside it, clear of the other
// openings) and solves the wall at each. Positions where the classic method
// has no answer (the opening cuts the wall, or staggered openings leave a
// band without a pier) are kept as points with an error, never dropped, so
// a plot or table shows the gap. A pier's series follows the physical pier
// (PierShare.Key, its bounds), not its name at each position. The best position is the one where the
// highest leaf-pier shear stress, V_i/(L_i·t), is lowest; with the wall's
// thickness and shear the same at every position this is the position with
// the lowest max(share_i/L_i), which is what is ranked, so a wall without a
// load still has a best position. A position where the classic method warns
// about the layout in a way it does not at the current position (a sliver
// pier, a thin strip between bands, a shallow spandrel, a staggered band:
// Point.Weak) is flagged, and is taken as best only when every position is.
//
// Units follow package geometry: lengths in metres, forces in newtons,
// stresses in pascals; relative values are computed with E = 1 and t = 1.
package study

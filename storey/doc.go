// Package storey shares a storey shear among the shear walls of one storey
// through its diaphragm — rigid (with torsion), flexible (by tributary
// spans between wall lines) or the envelope of the two — checks the
// torsional irregularity and the storey drift, and carries each wall's
// design shear into its pier forces. The method, its assumptions and
// sources are docs/method.md §9.
//
// # The storey file
//
// A TOML file (Parse, Load) with title, units ("us" or "si"), a [storey]
// table (shear, mass_center = [x, y], size = [x, y], accidental (0.05),
// diaphragm ("rigid"), basis ("classic"), sdc, cd, ie (1), height,
// drift_limit) and one [[wall]] per wall: file (a wall file, relative to the
// storey file) or rigidity ("500kip/in", with a name and optionally a
// length), direction ("x", "y" or an angle in degrees from +x), position (y
// of an x-wall, x of a y-wall; [x, y] of a point on the line of a wall at an
// angle), and optionally start, name and layout. The plan runs from (0, 0),
// its south-west corner, to size; x points east, y north. Lengths, forces
// and rigidities are stored in SI (m, N, N/m). Errors are *geometry.Error
// values naming file, line and key; values beyond any building are refused.
//
// # The analysis
//
// Analyse solves each wall on the storey's basis (classic strip method or
// the finite-element model, the latter on a pool of one worker per core),
// then Distribute solves the rigid diaphragm as a 3×3 stiffness problem
// (u_x, u_y, θ) about the centre of rigidity, where it uncouples: for
// orthogonal plans the shares are exactly the centre-of-rigidity method's
// V·R/ΣR ± V·e·d·R/J. Four cases (load along x and y, accidental ±),
// each checked for torsional irregularity (ASCE 7-22 Table 12.3-1) and, in
// categories C to F, re-solved with A_x (§12.8.4.3). DistributeFlexible
// carries the shear to wall lines by simple spans. A wall's design shear is
// the largest |shear| of its cases, never below its direct shear (common
// practice), or its flexible share, or the larger of both (envelope).
//
// Sign convention: a wall's shear is positive along the positive axis of
// its own direction when V acts along the positive axis of the load; the
// torsional shears of each direction sum to zero and the moment of all wall
// shears about the centre of rigidity equals the load's.
//
// Each wall is then solved under its design shear; its leaf piers take
// their share of it on the storey's basis (Wall.Piers). PierDesign checks
// the piers of each wall whose file has [design] and names its governing
// pier.
package storey

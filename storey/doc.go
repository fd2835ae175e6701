// Package storey shares a storey shear among the shear walls of one storey
// through a rigid diaphragm, with torsion (DESIGN §10; Taly, Design of
// Reinforced Masonry Structures, 2nd ed., §7.9), and carries each wall's
// design shear into its pier forces.
//
// # The storey file
//
// A TOML file (Parse, Load) with title, units ("us" or "si"), a [storey]
// table (shear, mass_center = [x, y], size = [x, y], accidental, default
// 0.05) and one [[wall]] per wall: file (a wall file, relative to the storey
// file), direction ("x": the wall resists shear along x; "y"), position (its
// line: y of an x-wall, x of a y-wall), and optionally start (where it
// begins along its line; default: centred, used for the plan sketch and the
// fit check), name (default: the wall file's title, else its base name)
// and layout (one of the wall file's layouts; default: the file's active
// one; the name then carries the layout).
// The plan runs from (0, 0), its south-west corner, to size; x points east,
// y north. Lengths and forces are read with geometry.ParseLength and
// ParseForce in the storey's units; a bare number is ft/kip or m/kN. Errors
// are *geometry.Error values naming file, line and key.
//
// # Rigidities
//
// A wall's rigidity in the distribution is its absolute rigidity R = E·t/d
// (pier.Result.RigidityAbs, N/m) when every wall's material gives E. If one
// does not, every wall uses its relative rigidity times its thickness, which
// assumes one E for all walls; the analysis says so in a warning.
//
// # The distribution (Distribute)
//
// For the walls of each direction, ΣR and the centre of rigidity:
// x_R = Σ R·x / Σ R over the y-walls, y_R = Σ R·y / Σ R over the x-walls.
// d is each wall's signed distance from the centre of rigidity across its
// line (y − y_R for an x-wall, x − x_R for a y-wall), and
// J = Σ R·d² over the walls of both directions.
//
// The storey shear V acts at the mass centre along +x and along +y in turn.
// For a load along x the eccentricity is e = y_m − y_R ± a·size_y, for a load
// along y e = x_m − x_R ± a·size_x (a = accidental, 0.05 by ASCE 7-22
// §12.8.4.2): four cases, "x +acc", "x -acc", "y +acc", "y -acc".
//
// Sign convention: a wall's shear is positive along the positive axis of its
// own direction. A wall parallel to the load takes the direct shear V·R/ΣR
// and the torsional shear +V·e·d·R/J (positive adds to the direct shear); a
// wall across the load takes −V·e·d·R/J and no direct shear. With this
// convention the torsional shears of one direction sum to zero, and the
// moment of all wall shears about the centre of rigidity is V·e
// (counter-clockwise for a load along y, clockwise for a load along x).
//
// A wall's design shear is the largest |direct + torsional| over the four
// cases, and never less than its direct shear: torsion is not allowed to
// relieve a wall (common practice; the load also reverses, which is why the
// magnitude counts). Design.Case says which case governs, or -1 when the
// direct shear alone does.
//
// # Piers
//
// Each wall is then solved with pier.Solve under its design shear, so each
// leaf pier's shear is its share of the design shear and its moment V_i·h
// (cantilever) or V_i·h/2 (fixed-fixed), as in DESIGN §3.
//
// # Assumptions
//
// The diaphragm is rigid; walls resist shear only along their own line;
// walls of the storey share one diaphragm level; the plan is rectangular for
// the accidental eccentricity. The report warns where these look weak.
package storey

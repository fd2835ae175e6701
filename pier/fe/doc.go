// Package fe is the finite-element check of the classic pier method: a
// plane-stress model of the same wall elevation, so the engineer sees how
// far the hand method is from a continuum answer for this layout
// (DESIGN §5, issue 3).
//
// # What is computed
//
// Solve models the active opening layout of a wall and returns its top
// deflection and rigidity, the share of the wall shear that crosses each
// leaf pier of the classic result at its mid-height, the mesh size and the
// element and equation counts, and the relative difference between the
// classic and the FE rigidity.
//
// # Units
//
// Results are relative, like the classic method's (DESIGN §3): the model is
// solved with E = 1, t = 1 and a shear V = 1, so Deflection is in units of
// V/(E t) and Rigidity in units of E t. Multiply by the wall's E_m·t (or
// V/(E_m·t)) for absolute values. Lengths are metres inside the package;
// relative values do not depend on the length unit or on the wall's size.
// Shares are fractions of V (0–1).
//
// # The model
//
//   - Mesh: rectangles. Grid lines pass through every wall edge, every
//     opening edge and every leaf pier's edges and mid-height; each interval
//     is subdivided so that no element is larger than Options.Mesh
//     (DefaultMesh, 6 in, when zero). When the wall has openings the mesh is
//     graded toward opening edges, the wall's ends and its base (elements a
//     quarter of the size there, growing by 1.5 per element), because the
//     stress is singular at re-entrant opening corners and where the fixed
//     base meets a free edge. Elements inside openings are removed.
//   - Material: plane stress, ν = E/(2 E_v) − 1 from the wall's material
//     (pier.MaterialModuliFor; 0.25 when the moduli are unknown, which is
//     E_v = 0.4 E). A plane-stress model needs E_v > E/3 (ν < 0.5). The
//     user's stiffness modifiers, when not 1, are applied as an orthotropic
//     material: vertical modulus kf·E (the wall's bending is carried by its
//     vertical fibres) and shear modulus kv·G, the roles kf and kv have in the
//     classic formulas.
//   - Supports: every base node is fixed in x and y. A "fixed" (fixed-fixed)
//     wall also holds every top node vertically, which keeps the top from
//     rotating.
//   - Load: V = 1 along the top edge, shared among the top nodes in
//     proportion to each node's tributary length of solid top edge.
//   - Deflection: the plain average of the top nodes' horizontal
//     displacements.
//   - Pier share: the horizontal shear crossing the pier's mid-height line
//     between its left and right edges, as the sum of the internal x-forces
//     K_e u_e that the elements just below the line receive at their nodes on
//     the line. For a pier whose sides are free edges this is exactly the
//     shear in the pier (statics); where a pier's side is not free at its
//     mid-height, it is the shear through that stretch of the section.
//
// # Elements
//
//   - "q4": the plain 4-node bilinear quadrilateral with 2×2 Gauss points,
//     the element general-purpose programs use (CalculiX CPS4), so results
//     can be compared one to one (calculix_test.go).
//   - "qm6" (default): the bilinear quadrilateral with incompatible modes
//     (1 − ξ²) and (1 − η²) in both displacement components, condensed out
//     element by element: Wilson, Taylor, Doherty & Ghaboussi, "Incompatible
//     displacement models", in Numerical and Computer Methods in Structural
//     Mechanics, Academic Press, 1973, with the correction of Taylor,
//     Beresford & Wilson, "A non-conforming element for stress analysis",
//     Int. J. Numer. Meth. Engng 10 (1976) 1211–1219, that makes it pass the
//     patch test on any quadrilateral (from memory). On the rectangles used
//     here the correction changes nothing (the Jacobian is constant); the
//     element represents pure bending exactly and so avoids the shear
//     locking that makes q4 too stiff in slender piers on coarse meshes.
//
// # Solver
//
// Nodes are numbered across the shorter direction of the grid, which gives
// the smallest band for a rectilinear mesh, and the symmetric band stiffness
// is factored by band Cholesky (band.go): a right-looking version with
// rank-4 updates, measured about 12 % faster than gonum's LAPACK
// lapack64.Pbtrf, which the tests keep as its reference. (mat.BandCholesky
// is not used: it always estimates the condition number, which is slow on
// large meshes.) A wall with no load path makes the matrix singular, and
// Solve returns an error rather than a number.
//
// # Reading the difference
//
// Result.Difference = (classic rigidity − FE rigidity) / FE rigidity. It is
// positive when the hand method is stiffer, which is the usual case: the
// classic method treats each pier as fixed against rotation by a rigid
// spandrel (or free at the top of the wall) and adds the strips and piers in
// series and parallel, while the continuum lets spandrels bend, pier ends
// rotate and the regions where piers and spandrels meet deform. The
// difference can be negative for squat walls held fixed-fixed: holding every
// top node vertically also keeps the top from warping and stretching, which
// the beam formula does not assume (a solid wall measured −10 % at
// h/L = 0.25 and −4 % at h/L = 1). Measured on
// the example walls at the default mesh: a solid wall 0 %, a wall with two
// small windows held fixed-fixed 23 %, a single door under a deep spandrel
// 44 %, a row of three windows 112 %. The FE answer converges from below in
// deflection (it is slightly too stiff); at the default mesh it is within
// about 2 % of the converged value on the example walls, so differences of a
// few percent mean nothing. Pier shares can move by several percentage points
// either way (up to about 10 on the example walls), because the continuum
// shares the shear by the stiffness of piers whose ends are not rigidly held.
// WarnDifference is the threshold for the report's warning.
//
// Both methods are linear-elastic and uncracked unless the modifiers say
// otherwise; neither checks strength. The results support, and do not
// replace, the judgement of a licensed engineer; local codes govern.
package fe

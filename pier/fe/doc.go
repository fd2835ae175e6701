// Package fe is the finite-element model of a wall elevation: a plane-stress
// continuum of the same wall the classic pier method decomposes, which
// gives the wall's deflection and rigidity, the share of the shear each
// pier carries, and every pier's shear, axial force and moment at its
// bottom, middle and top under the lateral load and under gravity
// (docs/method.md §4).
//
// # What is computed
//
// Solve (and SolveContext, which can be cancelled) models the active
// opening layout of a wall and returns:
//   - its deflection and rigidity under V = 1 (relative), and in real units
//     when the material and thickness are known, with the drift check;
//   - for every pier of the classic result passed in, leaves and parents,
//     its share of the wall shear and its section forces (pier.PierLoads)
//     under the wall's shear, the dead load (line load along the top and
//     self weight) and the live load, from one factorisation solved for
//     three right-hand sides;
//   - the mesh size, element and equation counts, the relative difference
//     between the classic and the model's rigidity, warnings and notes.
//
// # Units
//
// The model is solved with E = 1 and t = 1: Deflection is in units of
// V/(E t) and Rigidity in units of E t, like the classic method's
// (docs/method.md §1). Forces do not depend on E or t: pier forces are in
// newtons and newton-metres under the wall's own loads. Lengths are metres.
// Shares are fractions of V (0–1).
//
// # The model (docs/method.md §4)
//
//   - Mesh: rectangles, with lines through every wall and opening edge and
//     every pier's edges, base, top and mid-height; no element larger than
//     Options.Mesh (DefaultMesh, 6 in, when zero), graded toward opening
//     edges, the wall's ends and base. Opening edges closer than
//     pier.SnapTolerance merge first (pier.SnapEdges, with a warning). The
//     model's size is judged from the mesh lines before anything large is
//     allocated, and a model over 200 MB of band matrix is refused with its
//     cause (too many opening edges, or too fine a mesh).
//   - Material: plane stress, ν from the wall's moduli (0.25 when unknown);
//     the stiffness modifiers make it orthotropic (vertical modulus kf·E,
//     shear modulus kv·G).
//   - Supports and ties: the base is fixed. When openings reach the top, the
//     top nodes' horizontal displacements are tied together (a collector;
//     off with the wall's Analysis.NoTopTie). A fixed-fixed wall ties the
//     top nodes' vertical displacements, so its top cannot rotate but
//     gravity still enters the wall. Ties are solved by a Schur complement
//     outside the band; the CalculiX export writes them as *EQUATION.
//   - Loads: V = 1 over the top by tributary length of solid top edge; a
//     line load along the whole top (over an opening that reaches the top,
//     half to each side); self weight as a consistent body force.
//   - Deflection: the work-conjugate average Σ f_i u_i / V of the loaded
//     nodes (with the collector, the collector's displacement), so that
//     V/δ is the energy-consistent stiffness.
//   - Section forces: the nodal forces K_e u_e − f_e that the pier's own
//     elements receive along the section line, summed into V, N and M about
//     the centroid of the section's solid length: exact for equilibrium.
//
// # Elements
//
//   - "q4": the plain 4-node bilinear quadrilateral with 2×2 Gauss points,
//     the element general-purpose programs use (CalculiX CPS4), so results
//     can be compared one to one (calculix_test.go).
//   - "qm6" (default): the bilinear quadrilateral with incompatible modes
//     (1 − ξ²) and (1 − η²) in both displacement components, condensed out
//     element by element (Wilson, Taylor, Doherty & Ghaboussi 1973; Taylor,
//     Beresford & Wilson 1976). It represents pure bending exactly and so
//     avoids the shear locking that makes q4 too stiff in slender piers on
//     coarse meshes.
//
// # Solver
//
// Nodes are numbered across the shorter direction of the grid, and the
// band stiffness is factored once by band Cholesky (the band type in
// band.go, which states its preconditions, takes its workspace from the
// caller and gives the figure that keeps its kernel), then solved for each
// load case. The assembly and the factorisation check the context as they
// go. A wall with no load path makes the matrix singular, and Solve
// returns an error rather than a number. Solve is safe for concurrent use.
//
// # Reading the difference
//
// Result.Difference = (classic rigidity − FE rigidity) / FE rigidity. It is
// positive when the hand method is stiffer, which is the usual case: the
// classic method treats each pier as fixed against rotation by a rigid
// spandrel (or free at the top of the wall) and adds the strips and piers in
// series and parallel, while the continuum lets spandrels bend, pier ends
// rotate and the regions where piers and spandrels meet deform. The
// difference can be negative for squat walls held fixed-fixed: tying the
// top keeps it from warping, which the beam formula does not assume. The FE
// answer converges from the stiff side; halving the default element size
// moves the deflection by less than 1 % on the test walls, so differences
// of a few percent mean nothing. Pier shares can move by several
// percentage points either way, because the continuum shares the shear by
// the stiffness of piers whose ends are not rigidly held. WarnDifference is
// the threshold for the report's warning.
//
// Both methods are linear-elastic and uncracked unless the modifiers say
// otherwise; neither checks strength. The results support, and do not
// replace, the judgement of a licensed engineer; local codes govern.
package fe

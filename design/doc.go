// Package design checks the piers of a masonry or concrete shear wall
// against the strength-design rules of TMS 402-22 (masonry) and ACI 318-19
// (concrete), under the load combinations of ASCE 7-22 §2.3
// (docs/method.md §8). It is pure computation: no I/O, no drawing.
//
// # What is computed
//
// PierBars lays each pier's vertical bars from the wall's reinforcement:
// jamb bars at the pier's bounded ends, uniform bars at the spacing laid
// from the wall's left end. Combinations builds the factored combinations
// (both directions of the lateral load). CheckWall checks every leaf pier
// at its bottom and top sections for every combination: shear (φV_n) and
// flexure with axial load (φM_n at P_u by strain compatibility), the
// demand/capacity ratios and which governs, the code's rules on the
// reinforcement itself (maximum steel for masonry, minimum ratios for
// concrete and special masonry walls), the pier's governing check and the
// wall's governing pier. Section.Curve gives a pier's P–M interaction curve
// for plotting with PierResult.Demand.
//
// # Units
//
// SI throughout, like the rest of pierwise: metres, m², newtons, pascals,
// N·m. The codes' equations written in psi (every √f'm and √f'c term and
// its coefficient) are evaluated by converting explicitly: √f is taken of
// f in psi and the result, a stress in psi, is converted back to pascals.
//
// # Signs
//
// Forces follow pier.Forces: axial compression positive, moment positive
// when it compresses the pier's right end. A check's moment strength is on
// the side of its moment's sign; ratios use magnitudes.
//
// # Invariants
//
//   - No result holds NaN or Inf: a ratio is at most RatioCap.
//   - More bars never lower φM_n or φV_n.
//   - With no load at all every ratio is zero.
//
// # Assumptions
//
// Masonry bars in compression are ignored (they are not laterally
// confined); out-of-plane loads and slenderness are not checked; concrete
// is normal weight (λ = 1); values and clause numbers marked "from memory"
// in docs/method.md §8 should be checked against the printed standards.
//
// The checks support, and do not replace, the judgement of a licensed
// engineer; local codes and their amendments govern.
package design

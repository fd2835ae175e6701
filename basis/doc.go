// Package basis answers "the result of the chosen basis" for a wall: the
// classic strip method (package pier) or the plane-stress finite-element
// model (package pier/fe), chosen by the wall's [analysis] basis or the
// --basis flag, with the other basis's rigidity beside it as the check.
//
// Every downstream number (rigidity, deflection, drift, pier shares and
// section forces) is read through a Result's accessors, so no view or study
// picks a model itself. Units are those of the underlying results:
// relative values with E = 1 and t = 1, absolute ones in SI (N/m, m, N,
// N·m).
//
// Invariants: the classic basis returns the classic result's numbers
// unchanged; on either basis the piers are those of the classic
// decomposition (the finite-element model measures its sections there), so
// on the fe basis a layout the classic method cannot decompose (cut or
// staggered) has a rigidity, a deflection and a drift but no piers.
// docs/method.md §5.
package basis

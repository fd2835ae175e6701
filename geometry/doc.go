// Package geometry knows walls, openings and what people type about them:
// lengths, forces and stresses with their units, the wall file, and the
// rules a wall must follow before it is solved. It computes no mechanics.
//
// # Units
//
// Every value is stored in SI base units whatever the wall's unit system:
// Length in metres, Force in newtons, Stress in pascals. The System (US or
// SI) only decides how values are read and shown: a bare number is feet or
// metres for lengths, kip or kN for forces, psi or MPa for stresses.
// ParseLength accepts in, ft, mm, cm, m and feet-inches (12'-6", 12'6",
// 12' 6 1/2", 6", 12ft 6in); ParseForce lb, kip, N, kN; ParseStress psi, ksi, Pa,
// kPa, MPa, GPa; ParseLineLoad (force per length, N/m) plf, lb/ft, klf,
// kip/ft, N/m, kN/m, bare kip/ft or kN/m; ParseAreaLoad (force per area, Pa)
// psf, ksf, psi, Pa, kPa, N/m2, kN/m2, bare psf or kPa. The conversion factors are exact by definition (1 in =
// 25.4 mm, 1 lbf = 4.448 221 615 260 5 N; NIST SP 811, Appendix B).
// FormatLength, FormatForce and FormatStress round for people; they are not
// meant to be read back. Marshal writes values that read back exactly.
//
// # Coordinates
//
// Wall coordinates have x along the wall from its left end and y up from its
// base. An opening's X and Sill place its lower left corner; its outline is
// [X, X+Width] × [Sill, Sill+Height].
//
// # Invariants of a valid wall (Validate)
//
//   - length, height and thickness are finite and positive; so are the
//     strength (except for a custom material), the stiffness modifiers and
//     C_d and I_e; moduli and the shear are finite and not negative;
//   - values stay in ranges far wider than any building needs, so that a
//     wrong unit is caught and no accepted wall can overflow the mechanics:
//     sizes from 0.1 mm to 10 km, thicknesses from 50 mm to 1.5 m,
//     strengths (f'm, f'c) from 1 to 250 MPa, E from 0.5 to 500 GPa and
//     E_v from 0.1 to 250 GPa, the shear up to 10^12 N, modifiers from
//     0.01 to 10, C_d and I_e up to 100, and at most 1000 FE elements
//     along the wall's larger side;
//   - a custom material gives its modulus; Poisson's ratio ([material]
//     poisson, E_v = E/(2(1+ν))) lies in (0, 0.5) and does not come with
//     shear_modulus; a drift limit is a known preset or a fraction in
//     (0, 0.1], or 0 for no check;
//   - there is at least one layout, Active names one of them, and layout
//     names are unique;
//   - every opening has positive finite sizes, lies inside the wall (it may
//     reach the base and the top edge), has a name unique in its layout, and
//     overlaps no other opening of its layout (touching edges and corners
//     are allowed; edges within a nanometre count as touching).
//
// Validate reports every broken rule at once as an ErrorList. Parse adds the
// file name and the line of each key. Nothing a user can type makes this
// package panic.
//
// # The wall file
//
// TOML. Every setting (a key with one value, such as length or
// [material] strength) is described once in Settings: its key, kind of
// value, default, plausible range, help text and where it shows. Parse,
// Marshal, MarshalKeeping and Validate are driven by that table, and so are
// the editor's wall form, the report's inputs and the JSON of pierwise
// solve; unknown keys are the ones the TOML decoder reports as not decoded.
// Besides the basic keys (title, units, length, height, thickness, support,
// [material], [load] shear, [[opening]]):
//
//	layout = "as drawn"      # name of the top-level [[opening]] layout; default "main"
//	active = "door moved"    # the layout to solve; default the top-level one
//
//	[stiffness]              # cracking modifiers, default 1 and 1
//	flexure = 0.35
//	shear = 1.0
//
//	[drift]                  # δ = cd·δe/ie against limit·h_sx; no verdict without cd and ie
//	cd = 4.0                 # C_d, no default
//	ie = 1.0                 # I_e, no default
//	limit = "masonry-cantilever"   # a DriftPresets name, or a number such as 0.01
//	storey_height = "10ft"   # h_sx; default the wall's height
//
//	[check]                  # finite-element check
//	mesh = "6in"             # largest element size; default chosen by the solver
//	element = "q4"           # "qm6" (default) or "q4"
//
//	[analysis]
//	basis = "fe"             # "classic" (default) or "fe": the model results come from
//	top_tie = false          # default true: the FE model ties the top nodes' sway
//
//	[gravity]                # line loads along the top (LineLoad, N/m)
//	dead = "1.2kip/ft"       # plf, lb/ft, klf, kip/ft, N/m, kN/m; bare kip/ft or kN/m
//	live = "800lb/ft"
//	self_weight = "60psf"    # per face area: psf, ksf, psi, Pa, kPa, N/m2, kN/m2;
//	                         # bare psf or kPa; 0 = none (NoSelf); left out = default
//
//	[[variant]]              # another layout of the same wall
//	name = "door moved"
//	[[variant.opening]]      # same keys as [[opening]]
//	x = "22ft"
//	width = "3ft"
//	height = "7ft"
//
// An opening's sill defaults to 0 (a door) and its name to the next free D1,
// D2… for doors or W1, W2… for windows. Unknown keys are errors. In error
// keys the tables of an array are counted from 1: opening[2] is the second
// [[opening]] of the top-level layout, variant[1].opening[3] the third
// opening of the first [[variant]].
//
// Marshal writes a tidy file in the wall's units; Parse(Marshal(w)) gives
// back w exactly (every float64 bit for bit) for every valid wall. Save
// writes atomically through a temporary file in the same directory and, over
// an existing wall file, keeps its comments and unchanged lines where
// practical (MarshalKeeping).
package geometry

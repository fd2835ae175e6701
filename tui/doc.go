// Package tui is pierwise's terminal editor: a wall elevation drawn to
// scale, edited from the keyboard (and the mouse), with rigidity,
// deflection, drift and every pier's share of the wall shear recomputed on
// each edit, and the plane-stress finite-element check following in the
// background.
//
// Structure: a root model (root.go) owns the window and a stack of screens
// (the contract is in screen.go); the elevation screen (elevation*.go) is
// the first one. Screens share a *common: the size, the styles (styles.go,
// the one place colours are chosen; every colour has a character or bold
// twin for NO_COLOR and monochrome terminals), the keys and the document
// (document.go: the wall, its file and the undo history).
//
// The package asks pier for every number it shows and draws the elevation
// with package sketch; it computes no mechanics itself. Views are pure;
// solving happens in Update, files are written in Update or in commands.
package tui

package tui

// The functions of other packages the editor leans on, in one place.

import (
	"pierwise/geometry"
	"pierwise/pier"
)

// solveWall solves the active layout with the classic method.
func solveWall(w *geometry.Wall) (*pier.Result, error) { return pier.Solve(w) }

// cloneWall deep-copies a wall for the undo history.
func cloneWall(w *geometry.Wall) *geometry.Wall { return w.Clone() }

// checkOpening says whether opening i (-1 for a new one) may be o.
func checkOpening(w *geometry.Wall, i int, o geometry.Opening) error { return w.CheckOpening(i, o) }

// freeSpot moves o along x to the nearest place where it fits.
func freeSpot(w *geometry.Wall, o geometry.Opening) (geometry.Opening, bool) { return w.FreeSpot(o) }

// validateWall checks the whole wall.
func validateWall(w *geometry.Wall) error { return w.Validate() }

// loadWall reads a wall file.
func loadWall(path string) (*geometry.Wall, error) { return geometry.LoadFile(path) }

// saveWall writes a wall file atomically.
func saveWall(path string, w *geometry.Wall) error { return geometry.Save(path, w) }

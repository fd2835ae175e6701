package tui

// The functions of other packages the editor leans on, in one place. Some
// of them are still being written elsewhere in the tree; until they land
// these stand-ins keep the editor building (each says what it waits for).

import (
	"errors"
	"fmt"
	"os"

	"pierwise/geometry"
	"pierwise/pier"
)

// solveWall solves the active layout (pier.Solve).
func solveWall(w *geometry.Wall) (*pier.Result, error) {
	return nil, errors.New("the classic solver is not in this build yet")
}

// cloneWall deep-copies a wall for the undo history (geometry Wall.Clone).
func cloneWall(w *geometry.Wall) *geometry.Wall {
	c := *w
	c.Layouts = make([]geometry.Layout, len(w.Layouts))
	for i, l := range w.Layouts {
		c.Layouts[i] = geometry.Layout{Name: l.Name, Openings: append([]geometry.Opening(nil), l.Openings...)}
	}
	return &c
}

// checkOpening says whether opening i (-1 for a new one) may be o
// (geometry Wall.CheckOpening).
func checkOpening(w *geometry.Wall, i int, o geometry.Opening) error {
	if !(o.Width > 0) || !(o.Height > 0) {
		return errors.New("width and height must be positive")
	}
	r := o.Rect()
	const tol = 1e-9
	if r.X0 < -tol || r.Y0 < -tol || r.X1 > float64(w.Length)+tol || r.Y1 > float64(w.Height)+tol {
		return errors.New("it would leave the wall")
	}
	for j, p := range w.Openings() {
		if j == i {
			continue
		}
		q := p.Rect()
		if r.X0 < q.X1-tol && q.X0 < r.X1-tol && r.Y0 < q.Y1-tol && q.Y0 < r.Y1-tol {
			return fmt.Errorf("it would overlap %s", p.Name)
		}
	}
	return nil
}

// freeSpot moves o along x to the first place where it fits
// (geometry Wall.FreeSpot).
func freeSpot(w *geometry.Wall, o geometry.Opening) (geometry.Opening, bool) {
	xs := []geometry.Length{0}
	for _, p := range w.Openings() {
		xs = append(xs, p.X+p.Width)
	}
	best, found := o, false
	for _, x := range xs {
		o.X = x
		if checkOpening(w, -1, o) == nil && (!found || x < best.X) {
			best, found = o, true
		}
	}
	return best, found
}

// validateWall checks the whole wall (geometry Wall.Validate).
func validateWall(w *geometry.Wall) error {
	if !(w.Length > 0) || !(w.Height > 0) || !(w.Thickness > 0) {
		return errors.New("length, height and thickness must be positive")
	}
	return nil
}

// loadWall reads a wall file (geometry.Load).
func loadWall(path string) (*geometry.Wall, error) {
	if _, err := os.Stat(path); err != nil {
		return nil, err
	}
	return nil, errors.New("reading wall files is not in this build yet")
}

// saveWall writes a wall file atomically (geometry.Save).
func saveWall(path string, w *geometry.Wall) error {
	return errors.New("writing wall files is not in this build yet")
}

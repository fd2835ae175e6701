package fe

import (
	"pierwise/geometry"
	"pierwise/pier"
)

// Test walls in feet. The leaf piers are written by hand from the classic
// method's rules (docs/method.md §2), so these tests do not depend on pier.Solve.

const ft = geometry.Foot

func opening(name string, x, sill, w, h float64) geometry.Opening {
	return geometry.Opening{Name: name, X: geometry.Length(x) * ft, Sill: geometry.Length(sill) * ft,
		Width: geometry.Length(w) * ft, Height: geometry.Length(h) * ft}
}

func wallFt(length, height float64, s geometry.Support, ops ...geometry.Opening) *geometry.Wall {
	return &geometry.Wall{
		Title: "test", Length: geometry.Length(length) * ft, Height: geometry.Length(height) * ft,
		Thickness: 7.625 * geometry.Inch, Support: s,
		Layouts: []geometry.Layout{{Name: "main", Openings: ops}},
	}
}

func leaf(name string, x0, y0, x1, y1 float64) pier.Pier {
	f := float64(ft)
	return pier.Pier{Name: name, Leaf: true, Rect: geometry.Rect{X0: x0 * f, Y0: y0 * f, X1: x1 * f, Y1: y1 * f}}
}

func classicOf(ps ...pier.Pier) *pier.Result {
	if len(ps) == 0 {
		return nil
	}
	return &pier.Result{Piers: ps}
}

type testWall struct {
	name    string
	wall    *geometry.Wall
	classic *pier.Result
	// Piers whose base reactions equal their shear by equilibrium: free
	// edges (opening or wall end) on both sides from the base to mid-height.
	baseShare []string
	// Groups of piers that are the whole solid section at their common
	// mid-height: their shares sum to 1.
	sections [][]string
}

// exampleWalls are six kinds of wall: solid, a door, a band of windows,
// nested openings, two storeys, and a fixed-fixed wall.
func exampleWalls() []testWall {
	return []testWall{
		{name: "solid", wall: wallFt(20, 10, geometry.Cantilever)},
		{
			name:      "door",
			wall:      wallFt(16, 10, geometry.Cantilever, opening("D1", 6, 0, 4, 7)),
			classic:   classicOf(leaf("P1", 0, 0, 6, 7), leaf("P2", 10, 0, 16, 7)),
			baseShare: []string{"P1", "P2"},
			sections:  [][]string{{"P1", "P2"}},
		},
		{
			name: "band",
			wall: wallFt(24, 10, geometry.Cantilever,
				opening("W1", 4, 3, 4, 4), opening("W2", 10, 3, 4, 4), opening("W3", 16, 3, 4, 4)),
			classic:  classicOf(leaf("P1", 0, 3, 4, 7), leaf("P2", 8, 3, 10, 7), leaf("P3", 14, 3, 16, 7), leaf("P4", 20, 3, 24, 7)),
			sections: [][]string{{"P1", "P2", "P3", "P4"}},
		},
		{
			// Geometry of the Masonry Chronicles nested-opening example (docs/method.md §2).
			name:      "nested",
			wall:      wallFt(18, 16, geometry.Cantilever, opening("D1", 4, 0, 4, 8), opening("W1", 12, 2, 4, 4)),
			classic:   classicOf(leaf("P1", 0, 0, 4, 8), leaf("P2.1", 8, 2, 12, 6), leaf("P2.2", 16, 2, 18, 6)),
			baseShare: []string{"P1"},
			sections:  [][]string{{"P1", "P2.1", "P2.2"}},
		},
		{
			name: "storeys",
			wall: wallFt(20, 20, geometry.Cantilever,
				opening("D1", 3, 0, 4, 7), opening("W1", 13, 3, 4, 4),
				opening("W2", 3, 13, 4, 4), opening("W3", 13, 13, 4, 4)),
			classic: classicOf(leaf("P1", 0, 0, 3, 7), leaf("P2.1", 7, 3, 13, 7), leaf("P2.2", 17, 3, 20, 7),
				leaf("P3", 0, 13, 3, 17), leaf("P4", 7, 13, 13, 17), leaf("P5", 17, 13, 20, 17)),
			baseShare: []string{"P1"},
		},
		{
			name:     "fixed",
			wall:     wallFt(24, 12, geometry.Fixed, opening("W1", 5, 4, 3, 4), opening("W2", 16, 4, 3, 4)),
			classic:  classicOf(leaf("P1", 0, 4, 5, 8), leaf("P2", 8, 4, 16, 8), leaf("P3", 19, 4, 24, 8)),
			sections: [][]string{{"P1", "P2", "P3"}},
		},
	}
}

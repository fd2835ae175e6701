package pier

import (
	"math/rand/v2"

	"pierwise/geometry"
)

// randomWall makes a wall with up to n openings on a coarse grid (so that
// openings often touch, line up and nest), seeded for repeatability.
// Sizes are invented test data.
func randomWall(rng *rand.Rand, n int) *geometry.Wall {
	const cell = 2 * geometry.Foot
	cols, rows := 4+rng.IntN(20), 3+rng.IntN(10)
	w := &geometry.Wall{
		Length: geometry.Length(cols) * cell, Height: geometry.Length(rows) * cell,
		Thickness: 8 * geometry.Inch,
		Support:   geometry.Support(rng.IntN(2)),
		Layouts:   []geometry.Layout{{Name: "main"}},
	}
	for range n {
		o, ok := randomOpening(rng, w, cols, rows, cell)
		if ok {
			w.Layouts[0].Openings = append(w.Layouts[0].Openings, o)
		}
	}
	return w
}

// randomOpening tries a few random places for an opening that fits.
func randomOpening(rng *rand.Rand, w *geometry.Wall, cols, rows int, cell geometry.Length) (geometry.Opening, bool) {
	for range 20 {
		wd, ht := 1+rng.IntN(max(1, cols/3)), 1+rng.IntN(max(1, rows/2))
		x, y := rng.IntN(cols-wd+1), rng.IntN(rows-ht+1)
		if rng.IntN(4) == 0 {
			y = 0 // a door
		}
		o := geometry.Opening{X: geometry.Length(x) * cell, Sill: geometry.Length(y) * cell,
			Width: geometry.Length(wd) * cell, Height: geometry.Length(ht) * cell}
		if fits(w, o) {
			o.Name = "O" + string(rune('A'+len(w.Layouts[0].Openings)%26)) + string(rune('a'+len(w.Layouts[0].Openings)/26))
			return o, true
		}
	}
	return geometry.Opening{}, false
}

// fits reports whether o is inside w and overlaps no opening (touching is
// allowed).
func fits(w *geometry.Wall, o geometry.Opening) bool {
	r := o.Rect()
	if r.X0 < 0 || r.Y0 < 0 || r.X1 > float64(w.Length)+1e-9 || r.Y1 > float64(w.Height)+1e-9 {
		return false
	}
	for _, q := range w.Openings() {
		s := q.Rect()
		if r.X0 < s.X1-1e-9 && s.X0 < r.X1-1e-9 && r.Y0 < s.Y1-1e-9 && s.Y0 < r.Y1-1e-9 {
			return false
		}
	}
	return true
}

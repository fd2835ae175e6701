package geometry

import (
	"math"
	"testing"
)

func TestPlaceNew(t *testing.T) {
	const ft, in = Foot, Inch
	w := &Wall{
		Units: US, Length: 30 * ft, Height: 12 * ft, Thickness: 8 * in,
		Layouts: []Layout{{Name: "a", Openings: []Opening{
			{Name: "D1", X: 3 * ft, Width: 3 * ft, Height: 7 * ft},
			{Name: "W1", X: 10 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
	// A new window (sill 3 ft, 4 × 4 ft) shares its height with D1 and W1:
	// the solid pieces are 0–3, 6–10 and 14–30 ft; the widest is 14–30,
	// centred 20–24 ft, on the 8 in grid: x = 20 ft (240 in = 30 × 8 in).
	o, ok := w.PlaceNew(Opening{Name: "W2", Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft}, 8*in, 8*in)
	if !ok {
		t.Fatal("no place found")
	}
	if math.Abs(float64(o.X-20*ft)) > 1e-9 {
		t.Errorf("x = %v ft, want 20", float64(o.X/ft))
	}
	// The first door of an empty 20 ft wall: centred (8.5 ft), on the grid.
	e := &Wall{Units: US, Length: 20 * ft, Height: 10 * ft, Layouts: []Layout{{Name: "a"}}}
	d, ok := e.PlaceNew(Opening{Name: "D1", Width: 3 * ft, Height: 7 * ft}, 8*in, 8*in)
	if !ok {
		t.Fatal("no place for a door in an empty wall")
	}
	if r := math.Mod(float64(d.X/(8*in))+1e-9, 1); r > 1e-6 {
		t.Errorf("door at %v in, off the 8 in grid", float64(d.X/in))
	}
	if math.Abs(float64(d.X+d.Width/2-10*ft)) > float64(8*in) {
		t.Errorf("door at %v ft, not near the middle", float64(d.X/ft))
	}
}

// Invariants over every grid and margin: a placed opening fits, keeps the
// margin to the wall ends and to every opening at its height, and lies on
// the grid.
func TestPlaceNewKeepsMargins(t *testing.T) {
	const ft, in = Foot, Inch
	w := &Wall{
		Units: US, Length: 24 * ft, Height: 10 * ft,
		Layouts: []Layout{{Name: "a", Openings: []Opening{
			{Name: "D1", X: 2 * ft, Width: 3 * ft, Height: 7 * ft},
			{Name: "W1", X: 13 * ft, Sill: 3 * ft, Width: 3 * ft, Height: 4 * ft},
		}}},
	}
	for _, m := range []Length{0, 4 * in, 8 * in, 2 * ft} {
		for _, g := range []Length{0, 1 * in, 8 * in, 1 * ft} {
			o, ok := w.PlaceNew(Opening{Name: "N", Sill: 2 * ft, Width: 2 * ft, Height: 3 * ft}, m, g)
			if !ok {
				t.Errorf("margin %v grid %v: no place", m, g)
				continue
			}
			if err := w.CheckOpening(-1, o); err != nil {
				t.Errorf("margin %v grid %v: %v", m, g, err)
			}
			r := o.Rect()
			if r.X0 < float64(m)-1e-9 || r.X1 > float64(w.Length-m)+1e-9 {
				t.Errorf("margin %v grid %v: %v inside the end margin", m, g, r)
			}
			for _, p := range w.Openings() {
				q := p.Rect()
				if q.Y0 < r.Y1 && q.Y1 > r.Y0 && r.X0 < q.X1+float64(m)-1e-9 && r.X1 > q.X0-float64(m)+1e-9 {
					t.Errorf("margin %v grid %v: %v closer than the margin to %s", m, g, r, p.Name)
				}
			}
			if g > 0 {
				if k := float64(o.X / g); math.Abs(k-math.Round(k)) > 1e-6 {
					t.Errorf("margin %v grid %v: x %v off the grid", m, g, o.X)
				}
			}
		}
	}
	// No piece wide enough: false.
	if _, ok := w.PlaceNew(Opening{Name: "N", Sill: 2 * ft, Width: 20 * ft, Height: 3 * ft}, 8*in, 8*in); ok {
		t.Error("a 20 ft opening placed in a wall with 16 ft of solid piece")
	}
}

package study

import (
	"slices"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// classroom is an invented wall: 40 ft × 12 ft cantilever, 7.625 in block,
// f'm = 2000 psi, 35 kip, three 4 ft × 4 ft windows with sills at 3 ft at
// 6, 18 and 30 ft.
func classroom() *geometry.Wall {
	w := &geometry.Wall{
		Units: geometry.US, Length: 40 * ft, Height: 12 * ft, Thickness: 7.625 * geometry.Inch,
		Support:  geometry.Cantilever,
		Material: geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Load:     geometry.Load{Shear: 35 * geometry.Kip},
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "W1", X: 6 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
			{Name: "W2", X: 18 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
			{Name: "W3", X: 30 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
	return w
}

// Raising W2 to a sill of 7 ft 8 in leaves an 8 in strip between its band
// and the band of W1 and W3 (head 7 ft): the method takes that strip as
// rigid and the wall comes out stiffer than with the windows in line, and
// with the lowest pier stress of the sweep. The point is marked Weak (thin
// solid between bands, a layout warning the current position has not) and
// is not taken as best; the current position, with no such warning, is.
func TestSweepWeakPositionsAreNotBest(t *testing.T) {
	pts, err := Sweep(classroom(), "W2", AlongY, 8*geometry.Inch)
	if err != nil {
		t.Fatal(err)
	}
	var high *Point
	lowest := -1
	for i := range pts {
		p := &pts[i]
		if p.Err != nil {
			continue
		}
		if lowest < 0 || p.StressIndex < pts[lowest].StressIndex {
			lowest = i
		}
		if geometry.Length(7*ft+8*geometry.Inch)-p.Y < 1e-9 && p.Y-geometry.Length(7*ft+8*geometry.Inch) < 1e-9 {
			high = p
		}
		if p.Current && len(p.Weak) != 0 {
			t.Errorf("current position marked weak: %v", p.Weak)
		}
	}
	if high == nil {
		t.Fatal("no point at a sill of 7 ft 8 in")
	}
	if !slices.Contains(high.Weak, pier.WarnSolidBetween) || high.Best {
		t.Errorf("sill 7'-8\": weak %v, best %v; want the thin solid flagged and not best", high.Weak, high.Best)
	}
	if &pts[lowest] != high {
		t.Errorf("the lowest stress is at sill %g m, expected at 7'-8\" (the case this test is about)", float64(pts[lowest].Y))
	}
	if i := BestIndex(pts); i < 0 || !pts[i].Current {
		t.Errorf("best at %d, want the current position", i)
	}
}

// An opening is found by its name typed in any case, as layouts are; the
// exact name wins when two differ only in case.
func TestFindOpeningIgnoresCase(t *testing.T) {
	w := classroom()
	if i := FindOpening(w, "w2"); i != 1 {
		t.Errorf("w2 → %d, want 1", i)
	}
	w.Layouts[0].Openings[2].Name = "w2"
	if i := FindOpening(w, "w2"); i != 2 {
		t.Errorf("exact w2 → %d, want 2", i)
	}
	if i := FindOpening(w, "W9"); i != -1 {
		t.Errorf("W9 → %d, want -1", i)
	}
	if _, err := Sweep(classroom(), "w1", AlongX, geometry.Foot); err != nil {
		t.Errorf("sweep of w1: %v", err)
	}
}

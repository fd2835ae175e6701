package study

import (
	"errors"
	"math"
	"strings"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

const ft = geometry.Foot

// annex is an invented wall for the tests (not a published example): 40 ft
// by 14 ft, concrete masonry, a door, two windows and an entrance, with a
// second layout in which window W2 has moved 4 ft to the right and a third
// in which the entrance is gone.
func annex() *geometry.Wall {
	main := []geometry.Opening{
		{Name: "D1", X: 4 * ft, Sill: 0, Width: 3 * ft, Height: 7 * ft},
		{Name: "W1", X: 12 * ft, Sill: 3 * ft, Width: 6 * ft, Height: 4 * ft},
		{Name: "W2", X: 22 * ft, Sill: 3 * ft, Width: 6 * ft, Height: 4 * ft},
		{Name: "D2", X: 31 * ft, Sill: 0, Width: 6 * ft, Height: 8 * ft},
	}
	moved := append([]geometry.Opening(nil), main...)
	moved[2].X = 26 * ft
	moved[3].X = 33 * ft
	moved[3].Width = 4 * ft
	return &geometry.Wall{
		Title:     "Test annex",
		Units:     geometry.US,
		Length:    40 * ft,
		Height:    14 * ft,
		Thickness: 7.625 * geometry.Inch,
		Support:   geometry.Cantilever,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Load:      geometry.Load{Shear: 45 * geometry.Kip},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 3.5, Ie: 1, Limit: 0.010},
		Layouts: []geometry.Layout{
			{Name: "main", Openings: main},
			{Name: "W2 moved", Openings: moved},
			{Name: "no entrance", Openings: main[:3]},
		},
	}
}

// chronicles is the Masonry Chronicles nested-opening wall of docs/method.md §2
// (Concrete Masonry Association of California and Nevada): 18 ft × 16 ft,
// cantilever; door 4 × 8 ft at 4 ft; window 4 × 4 ft, sill 2 ft, at 12 ft.
// Printed wall deflection 7.614/(E t).
func chronicles() *geometry.Wall {
	return &geometry.Wall{
		Units: geometry.US, Length: 18 * ft, Height: 16 * ft, Thickness: 7.625 * geometry.Inch,
		Support:   geometry.Cantilever,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 1500 * geometry.PSI},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 1, Ie: 1},
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "D1", X: 4 * ft, Width: 4 * ft, Height: 8 * ft},
			{Name: "W1", X: 12 * ft, Sill: 2 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
}

func near(a, b, rel float64) bool {
	return math.Abs(a-b) <= rel*math.Max(math.Abs(a), math.Abs(b))
}

func mustSolve(t *testing.T, w *geometry.Wall) *pier.Result {
	t.Helper()
	r, err := pier.Solve(w)
	if err != nil {
		t.Fatalf("solve %q: %v", w.Layouts[w.Active].Name, err)
	}
	return r
}

func TestCompareEqualsSeparateSolves(t *testing.T) {
	w := annex()
	for _, pair := range [][2]int{{0, 1}, {1, 0}, {0, 2}, {0, 0}} {
		a, b := WithLayout(w, pair[0]), WithLayout(w, pair[1])
		c, err := Compare(a, b)
		if err != nil {
			t.Fatal(err)
		}
		ra, rb := mustSolve(t, a), mustSolve(t, b)
		if !near(c.Before.Result.Rigidity, ra.Rigidity, 1e-12) || !near(c.After.Result.Rigidity, rb.Rigidity, 1e-12) {
			t.Errorf("%v: rigidities %g %g, separately %g %g", pair, c.Before.Result.Rigidity, c.After.Result.Rigidity, ra.Rigidity, rb.Rigidity)
		}
		if !near(float64(c.After.Result.DeflectionAbs), float64(rb.DeflectionAbs), 1e-12) {
			t.Errorf("%v: deflection %g, separately %g", pair, c.After.Result.DeflectionAbs, rb.DeflectionAbs)
		}
		ch, ok := c.RigidityChange()
		if !ok || !near(ch, (rb.Rigidity-ra.Rigidity)/ra.Rigidity, 1e-9) && math.Abs(ch) > 1e-12 {
			t.Errorf("%v: rigidity change %g (%v), want %g", pair, ch, ok, (rb.Rigidity-ra.Rigidity)/ra.Rigidity)
		}
		// Every leaf pier of each separate solve is in the pier table once,
		// with the same share and shear.
		count := map[string]int{}
		for _, pc := range c.Piers {
			for side, p := range map[string]*pier.Pier{"a": pc.Before, "b": pc.After} {
				if p == nil {
					continue
				}
				res := ra
				if side == "b" {
					res = rb
				}
				count[side+p.Name]++
				found := false
				for _, lp := range res.Leaves() {
					if lp.Name == p.Name {
						found = true
						if !near(lp.Share, p.Share, 1e-12) || !near(float64(lp.Shear), float64(p.Shear), 1e-12) {
							t.Errorf("%v: pier %s share %g shear %g, separately %g %g", pair, p.Name, p.Share, p.Shear, lp.Share, lp.Shear)
						}
					}
				}
				if !found {
					t.Errorf("%v: pier %s is not a leaf of the separate solve", pair, p.Name)
				}
			}
		}
		if len(count) != len(ra.Leaves())+len(rb.Leaves()) {
			t.Errorf("%v: %d piers in the table, want %d", pair, len(count), len(ra.Leaves())+len(rb.Leaves()))
		}
		for k, n := range count {
			if n != 1 {
				t.Errorf("%v: pier %s listed %d times", pair, k, n)
			}
		}
	}
}

func TestComparePublishedWall(t *testing.T) {
	// Masonry Chronicles nested-opening wall: printed wall deflection 7.614
	// (units of 1/(E t)); the printed figures carry rounding, so 0.2 %.
	w := chronicles()
	solid := w.Clone()
	solid.Layouts = []geometry.Layout{{Name: "solid"}}
	c, err := Compare(w, solid)
	if err != nil {
		t.Fatal(err)
	}
	if !near(c.Before.Result.Deflection, 7.614, 0.002) {
		t.Errorf("wall deflection %.4f, published 7.614", c.Before.Result.Deflection)
	}
	// The same source prints the solid wall at 5.476 (4r³ + 3r, r = 16/18).
	if !near(c.After.Result.Deflection, 5.476, 0.002) {
		t.Errorf("solid deflection %.4f, published 5.476", c.After.Result.Deflection)
	}
	ch, ok := c.RigidityChange()
	if !ok || !near(ch, 7.614/5.476-1, 0.004) {
		t.Errorf("rigidity change %.4f, from the published deflections %.4f", ch, 7.614/5.476-1)
	}
	// Closing the openings leaves one pier, P1, the whole wall: it is
	// matched with the leaf it overlaps most (P1 beside the door, 4 ft ×
	// 8 ft of the 18 ft × 16 ft wall) and takes the whole shear; the other
	// leaves vanish.
	for _, pc := range c.Piers {
		want := Vanishes
		if pc.Before != nil && pc.Before.Name == "P1" {
			want = Kept
			if pc.After == nil || pc.After.Name != "P1" || !near(pc.ShareChange(), 1-pc.Before.Share, 1e-12) {
				t.Errorf("P1 %+v, want matched with the solid wall's P1", pc)
			}
		}
		if pc.Status() != want {
			t.Errorf("pier %+v: status %v, want %v", pc, pc.Status(), want)
		}
	}
}

func TestMatchPiersSameLayout(t *testing.T) {
	w := annex()
	r := mustSolve(t, w)
	pcs := MatchPiers(w, r.Leaves(), w, r.Leaves())
	if len(pcs) != len(r.Leaves()) {
		t.Fatalf("%d pairs for %d piers", len(pcs), len(r.Leaves()))
	}
	for _, pc := range pcs {
		if pc.Status() != Kept || pc.Before.Name != pc.After.Name || !near(pc.Overlap, 1, 1e-12) || pc.ShareChange() != 0 {
			t.Errorf("pair %s/%s overlap %g status %v", pc.Before.Name, pc.After.Name, pc.Overlap, pc.Status())
		}
	}
}

func TestMatchPiersAppearVanish(t *testing.T) {
	// A window moved to the wall's left end: the pier left of it vanishes.
	// Moved back, it appears.
	w := &geometry.Wall{
		Units: geometry.US, Length: 20 * ft, Height: 10 * ft, Thickness: 8 * geometry.Inch,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 1, Ie: 1},
		Layouts: []geometry.Layout{
			{Name: "middle", Openings: []geometry.Opening{{Name: "W1", X: 8 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft}}},
			{Name: "end", Openings: []geometry.Opening{{Name: "W1", X: 0, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft}}},
		},
	}
	c, err := Compare(WithLayout(w, 0), WithLayout(w, 1))
	if err != nil {
		t.Fatal(err)
	}
	nb, na := len(c.Before.Result.Leaves()), len(c.After.Result.Leaves())
	if nb != 2 || na != 1 {
		t.Fatalf("leaf piers %d and %d, want 2 and 1", nb, na)
	}
	var kept, vanished int
	for _, pc := range c.Piers {
		switch pc.Status() {
		case Kept:
			kept++
			// The pier right of the window (x 12–20 ft before, 4–20 ft
			// after) overlaps most.
			if pc.Before.Rect.X0 < 10*float64(ft) {
				t.Errorf("kept pier %s at x0 %g, want the right-hand one", pc.Before.Name, pc.Before.Rect.X0)
			}
		case Vanishes:
			vanished++
		default:
			t.Errorf("unexpected %v", pc.Status())
		}
	}
	if kept != 1 || vanished != 1 {
		t.Errorf("kept %d vanished %d, want 1 and 1", kept, vanished)
	}
	back, err := Compare(WithLayout(w, 1), WithLayout(w, 0))
	if err != nil {
		t.Fatal(err)
	}
	appeared := 0
	for _, pc := range back.Piers {
		if pc.Status() == Appears {
			appeared++
			if pc.Before != nil || pc.After == nil || !near(pc.ShareChange(), pc.After.Share, 1e-15) {
				t.Errorf("appearing pier %+v", pc)
			}
		}
	}
	if appeared != 1 {
		t.Errorf("%d piers appear, want 1", appeared)
	}
}

func TestCompareCutLayout(t *testing.T) {
	w := annex()
	cut := w.Clone()
	// A ribbon window along the whole length leaves no path from base to
	// top.
	cut.Layouts = []geometry.Layout{{Name: "cut", Openings: []geometry.Opening{
		{Name: "W1", X: 0, Sill: 3 * ft, Width: 40 * ft, Height: 2 * ft},
	}}}
	c, err := Compare(w, cut)
	if err != nil {
		t.Fatal(err)
	}
	var ce *pier.CutError
	if !errors.As(c.After.Err, &ce) {
		t.Fatalf("after: err %v, want a cut error", c.After.Err)
	}
	if c.After.OK() || c.After.Result != nil || !c.Before.OK() {
		t.Errorf("sides OK %v/%v", c.Before.OK(), c.After.OK())
	}
	if _, ok := c.RigidityChange(); ok {
		t.Error("rigidity change defined for a cut wall")
	}
	if len(c.Piers) != 0 {
		t.Errorf("%d pier rows for a cut wall", len(c.Piers))
	}
}

func TestCompareMisuse(t *testing.T) {
	w := annex()
	if _, err := Compare(nil, w); err == nil {
		t.Error("nil wall: no error")
	}
	bad := WithLayout(w, 7)
	if _, err := Compare(w, bad); err == nil {
		t.Error("active layout out of range: no error")
	}
}

func TestSelect(t *testing.T) {
	w := annex()
	if err := Select(w, "w2 MOVED"); err != nil || w.Active != 1 {
		t.Fatalf("select: %v, active %d", err, w.Active)
	}
	err := Select(w, "nope")
	if err == nil || !strings.Contains(err.Error(), `"main", "W2 moved", "no entrance"`) {
		t.Errorf("unknown variant: %v", err)
	}
}

func TestSplitArg(t *testing.T) {
	for _, tc := range []struct{ in, path, variant string }{
		{"wall.toml", "wall.toml", ""},
		{"wall.toml:door moved", "wall.toml", "door moved"},
		{"dir/wall.toml:a:b", "dir/wall.toml:a", "b"},
		{":x", ":x", ""},
	} {
		p, v := SplitArg(tc.in)
		if p != tc.path || v != tc.variant {
			t.Errorf("SplitArg(%q) = %q, %q; want %q, %q", tc.in, p, v, tc.path, tc.variant)
		}
	}
}

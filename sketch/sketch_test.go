package sketch

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"pierwise/geometry"
	"pierwise/internal/testkit"
	"pierwise/pier"
)

const ft = geometry.Foot

// chronicles is the wall of the nested-opening check published in Masonry
// Chronicles (Concrete Masonry Association of California and Nevada), as
// docs/method.md §2 describes it: 18 ft × 16 ft cantilever, a 4 × 8 ft door 4 ft
// from the left end and a 4 × 4 ft window on a 2 ft sill 12 ft from it.
func chronicles() *geometry.Wall {
	return &geometry.Wall{
		Title: "check wall", Units: geometry.US,
		Length: 18 * ft, Height: 16 * ft, Thickness: 7.625 * geometry.Inch,
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "D1", X: 4 * ft, Sill: 0, Width: 4 * ft, Height: 8 * ft},
			{Name: "W1", X: 12 * ft, Sill: 2 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
}

// chroniclesPiers are the piers of that wall by docs/method.md §2 (fixed-fixed in
// the band under the spandrel), with shares from the §3 formulas
// (d = r³ + 3r fixed-fixed), worked here so the labels have true values.
func chroniclesPiers() *pier.Result {
	fixed := func(h, l float64) float64 { r := h / l; return r*r*r + 3*r }
	dP1 := fixed(8, 4)
	dP21, dP22 := fixed(4, 4), fixed(4, 2)
	dP2 := fixed(8, 10) - fixed(4, 10) + 1/(1/dP21+1/dP22)
	k1, k2 := 1/dP1, 1/dP2
	s1, s2 := k1/(k1+k2), k2/(k1+k2)
	s21 := s2 * (1 / dP21) / (1/dP21 + 1/dP22)
	s22 := s2 - s21
	m := float64(ft)
	rect := func(x0, y0, x1, y1 float64) geometry.Rect {
		return geometry.Rect{X0: x0 * m, Y0: y0 * m, X1: x1 * m, Y1: y1 * m}
	}
	return &pier.Result{Piers: []pier.Pier{
		{Name: "P1", Rect: rect(0, 0, 4, 8), Support: geometry.Fixed, Leaf: true, Share: s1},
		{Name: "P2", Rect: rect(8, 0, 18, 8), Support: geometry.Fixed, Share: s2},
		{Name: "P2.1", Parent: "P2", Rect: rect(8, 2, 12, 6), Support: geometry.Fixed, Leaf: true, Share: s21},
		{Name: "P2.2", Parent: "P2", Rect: rect(16, 2, 18, 6), Support: geometry.Fixed, Leaf: true, Share: s22},
	}}
}

// long is an invented demo wall: 40 ft × 12 ft with a door and three windows.
func long() *geometry.Wall {
	return &geometry.Wall{
		Units: geometry.US, Length: 40 * ft, Height: 12 * ft,
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "W1", X: 3 * ft, Sill: 3 * ft, Width: 5 * ft, Height: 5 * ft},
			{Name: "D1", X: 12 * ft, Sill: 0, Width: 6 * ft, Height: 8 * ft},
			{Name: "W2", X: 22 * ft, Sill: 3 * ft, Width: 5 * ft, Height: 5 * ft},
			{Name: "W3", X: 31 * ft, Sill: 3 * ft, Width: 5 * ft, Height: 5 * ft},
		}}},
	}
}

// tower is an invented tall narrow wall, 4 ft × 60 ft, with a 1 ft × 4 ft
// window W1 at a sill of 30 ft: the window's box has no room for its name
// and neither has the wall beside it.
func tower() *geometry.Wall {
	return &geometry.Wall{
		Units: geometry.US, Length: 4 * ft, Height: 60 * ft,
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "W1", X: 1.5 * ft, Sill: 30 * ft, Width: 1 * ft, Height: 4 * ft},
		}}},
	}
}

// slot is an invented 20 ft × 10 ft wall with a slot window W1 (1 ft × 4 ft,
// sill 3 ft) too narrow for its name, and solid wall beside it.
func slot() *geometry.Wall {
	return &geometry.Wall{
		Units: geometry.US, Length: 20 * ft, Height: 10 * ft,
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "W1", X: 8 * ft, Sill: 3 * ft, Width: 1 * ft, Height: 4 * ft},
		}}},
	}
}

// An opening's name is drawn in its box, on its head line or beside it on
// one of its rows, or not at all: never above or below it, where it reads
// as a label of the solid wall.
func TestOpeningLabelStaysWithItsBox(t *testing.T) {
	for _, tc := range []struct {
		name       string
		wall       *geometry.Wall
		cols, rows int
		drawn      bool // whether there is room for the name
	}{
		{"tower", tower(), 34, 20, false},
		{"tower", tower(), 40, 40, false},
		{"slot", slot(), 30, 10, true},
		{"slot", slot(), 12, 6, true},
		{"long", long(), 20, 6, true},
		{"chronicles", chronicles(), 40, 12, true},
	} {
		g := Elevation(tc.wall, nil, tc.cols, tc.rows)
		for i, o := range tc.wall.Openings() {
			c0, c1, r0, r1 := g.box(o.Rect())
			n := 0
			for r := 0; r < g.Rows; r++ {
				for c := 0; c < g.Cols; c++ {
					cell := g.At(c, r)
					if cell.Kind != OpeningLabel || cell.Opening != i {
						continue
					}
					n++
					if r < r1 || r > r0 {
						t.Errorf("%s %dx%d: a letter of %s on row %d, outside its box's rows %d–%d:\n%s",
							tc.name, tc.cols, tc.rows, o.Name, r, r1, r0, g)
					}
					if near := c >= c0-1-len(o.Name) && c <= c1+1+len(o.Name); !near {
						t.Errorf("%s %dx%d: a letter of %s in column %d, away from its box %d–%d", tc.name, tc.cols, tc.rows, o.Name, c, c0, c1)
					}
				}
			}
			if n != 0 && n != len(o.Name) {
				t.Errorf("%s %dx%d: %d letters of %s drawn", tc.name, tc.cols, tc.rows, n, o.Name)
			}
			if i == 0 && (n > 0) != tc.drawn {
				t.Errorf("%s %dx%d: %s drawn %v, want %v:\n%s", tc.name, tc.cols, tc.rows, o.Name, n > 0, tc.drawn, g)
			}
		}
	}
}

func golden(t *testing.T, name, got string) {
	t.Helper()
	testkit.Golden(t, name, got+"\n")
}

func TestElevationGolden(t *testing.T) {
	for _, tc := range []struct {
		name       string
		wall       *geometry.Wall
		res        *pier.Result
		cols, rows int
	}{
		{"chronicles_60x20.txt", chronicles(), chroniclesPiers(), 60, 20},
		{"chronicles_40x12.txt", chronicles(), chroniclesPiers(), 40, 12},
		{"chronicles_nores_30x10.txt", chronicles(), nil, 30, 10},
		{"long_78x14.txt", long(), nil, 78, 14},
		{"long_20x6.txt", long(), nil, 20, 6},
		{"tower_34x20.txt", tower(), nil, 34, 20},
		{"slot_30x10.txt", slot(), nil, 30, 10},
	} {
		t.Run(tc.name, func(t *testing.T) {
			g := Elevation(tc.wall, tc.res, tc.cols, tc.rows)
			golden(t, tc.name, g.String())
		})
	}
}

// TestScale checks that the drawing keeps the wall's proportions with a cell
// twice as tall as wide, and fits the box.
func TestScale(t *testing.T) {
	for _, tc := range []struct {
		l, h       float64
		cols, rows int
	}{
		{18, 16, 60, 20}, {18, 16, 200, 20}, {40, 12, 78, 14}, {40, 12, 30, 40}, {4, 30, 80, 24}, {100, 2, 80, 24},
	} {
		w := &geometry.Wall{Length: geometry.Length(tc.l), Height: geometry.Length(tc.h), Layouts: []geometry.Layout{{}}}
		g := Elevation(w, nil, tc.cols, tc.rows)
		if g.Cols > tc.cols || g.Rows > tc.rows || g.Cols < 3 || g.Rows < 3 {
			t.Errorf("%v×%v in %d×%d: grid %d×%d", tc.l, tc.h, tc.cols, tc.rows, g.Cols, g.Rows)
			continue
		}
		// One of the two dimensions fills the box.
		if g.Cols != tc.cols && g.Rows != tc.rows {
			t.Errorf("%v×%v in %d×%d: grid %d×%d fills neither way", tc.l, tc.h, tc.cols, tc.rows, g.Cols, g.Rows)
		}
		// Aspect: (cols-1) columns for L, (rows-1) rows of two columns each for H,
		// within one cell of rounding in each direction (the floor of 2 cells
		// distorts slender walls, so skip those).
		if g.Cols-1 > 2 && g.Rows-1 > 2 {
			got := float64(g.Cols-1) / (2 * float64(g.Rows-1))
			want := tc.l / tc.h
			lo := float64(g.Cols-2) / (2 * float64(g.Rows))
			hi := float64(g.Cols) / (2 * float64(g.Rows-2))
			if want < lo || want > hi {
				t.Errorf("%v×%v: drawn aspect %.3f, want %.3f", tc.l, tc.h, got, want)
			}
		}
	}
}

// TestCells checks the cell records the editor relies on: every opening
// cell lies inside its opening, every pier cell inside its pier, and every
// opening and leaf pier is drawn and named.
func TestCells(t *testing.T) {
	w, res := chronicles(), chroniclesPiers()
	for _, size := range [][2]int{{60, 20}, {40, 12}, {120, 40}} {
		g := Elevation(w, res, size[0], size[1])
		step := math.Max(g.length/float64(g.Cols-1), g.height/float64(g.Rows-1)) * 1.01
		seenOp := map[int]bool{}
		seenPier := map[int]bool{}
		for r := 0; r < g.Rows; r++ {
			for c := 0; c < g.Cols; c++ {
				cell := g.At(c, r)
				x, y := g.X(c), g.Y(r)
				if cell.Kind == OpeningSpace {
					o := w.Openings()[cell.Opening].Rect()
					if x < o.X0-step || x > o.X1+step || y < o.Y0-step || y > o.Y1+step {
						t.Errorf("%v: cell (%d,%d) at (%.2f,%.2f) m marked opening %d outside it", size, c, r, x, y, cell.Opening)
					}
					seenOp[cell.Opening] = true
				}
				if cell.Pier >= 0 {
					p := res.Piers[cell.Pier]
					if !p.Leaf {
						t.Errorf("cell (%d,%d) in non-leaf pier %s", c, r, p.Name)
					}
					if x < p.Rect.X0-step || x > p.Rect.X1+step || y < p.Rect.Y0-step || y > p.Rect.Y1+step {
						t.Errorf("%v: cell (%d,%d) marked pier %s outside it", size, c, r, p.Name)
					}
					seenPier[cell.Pier] = true
				}
			}
		}
		for i := range w.Openings() {
			if !seenOp[i] {
				t.Errorf("%v: opening %d has no cell", size, i)
			}
		}
		for i, p := range res.Piers {
			if p.Leaf && !seenPier[i] {
				t.Errorf("%v: pier %s has no cell", size, p.Name)
			}
		}
		s := g.String()
		names := []string{"D1", "W1", "P1", "P2.1"}
		if size[0] >= 60 { // P2.2 is 2 ft long: 2 columns at 40 wide, no room for a label
			names = append(names, "P2.2")
		}
		for _, name := range names {
			if !strings.Contains(s, name) {
				t.Errorf("%v: %s not labelled:\n%s", size, name, s)
			}
		}
		// The shares printed are the result's, rounded.
		if want := fmt.Sprintf("%.0f%%", 100*res.Piers[0].Share); !strings.Contains(s, want) {
			t.Errorf("%v: share %s of P1 not shown:\n%s", size, want, s)
		}
		for _, line := range strings.Split(s, "\n") {
			for _, ch := range line {
				if ch > 0x7e || ch < 0x20 {
					t.Fatalf("non-ASCII %q in %q", ch, line)
				}
			}
		}
	}
}

// TestNoPanic: nonsense input gives an empty or clipped grid, never a panic.
func TestNoPanic(t *testing.T) {
	walls := []*geometry.Wall{
		nil,
		{},
		{Length: -1, Height: 3, Layouts: []geometry.Layout{{}}},
		{Length: geometry.Length(math.Inf(1)), Height: 3, Layouts: []geometry.Layout{{}}},
		{Length: 10, Height: 3, Layouts: []geometry.Layout{{Openings: []geometry.Opening{{Name: "X", X: -5, Sill: 2, Width: 50, Height: 9}}}}},
		{Length: 10, Height: 3, Active: 4},
	}
	for i, w := range walls {
		for _, size := range [][2]int{{0, 0}, {2, 2}, {3, 3}, {80, 24}} {
			g := Elevation(w, nil, size[0], size[1])
			if g.Cols > max(size[0], 0) || g.Rows > max(size[1], 0) {
				t.Errorf("wall %d in %v: grid %d×%d", i, size, g.Cols, g.Rows)
			}
			_ = g.String()
			_ = g.At(-1, 5)
		}
	}
}

// TestLabelsFromSolver: with the solver's own result for the published wall
// the labels show pier.Solve's shares, rounded, and agree with the hand-worked
// ones above.
func TestLabelsFromSolver(t *testing.T) {
	w := chronicles()
	res, err := pier.Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	s := Elevation(w, res, 60, 20).String()
	hand := chroniclesPiers()
	for _, p := range res.Leaves() {
		label := fmt.Sprintf("%.0f%%", 100*p.Share)
		if !strings.Contains(s, label) {
			t.Errorf("%s: %s not drawn:\n%s", p.Name, label, s)
		}
		for _, h := range hand.Piers {
			if h.Name == p.Name && math.Abs(h.Share-p.Share) > 1e-9 {
				t.Errorf("%s: solver share %.6f, hand-worked %.6f", p.Name, p.Share, h.Share)
			}
		}
	}
	if got := Elevation(w, hand, 60, 20).String(); got != s {
		t.Errorf("drawing from the solver differs from the hand-worked piers:\n%s\n%s", s, got)
	}
}

package sketch

import (
	"strings"
	"testing"

	"pierwise/geometry"
)

// FuzzElevation draws arbitrary walls with up to two openings into arbitrary
// boxes: the grid fits the box, every cell's indices are valid, and the
// text is printable ASCII of the grid's size.
func FuzzElevation(f *testing.F) {
	f.Add(18.0, 16.0, 4.0, 0.0, 4.0, 8.0, 12.0, 2.0, 4.0, 4.0, 60, 20)
	f.Add(40.0, 12.0, 3.0, 3.0, 5.0, 5.0, 12.0, 0.0, 6.0, 8.0, 20, 6)
	f.Add(1.0, 100.0, 0.0, 0.0, 1.0, 100.0, 0.0, 0.0, 0.0, 0.0, 3, 3)
	f.Fuzz(func(t *testing.T, l, h, x1, s1, w1, h1, x2, s2, w2, h2 float64, cols, rows int) {
		if cols > 400 || rows > 200 {
			return
		}
		w := &geometry.Wall{
			Length: geometry.Length(l), Height: geometry.Length(h),
			Layouts: []geometry.Layout{{Openings: []geometry.Opening{
				{Name: "A", X: geometry.Length(x1), Sill: geometry.Length(s1), Width: geometry.Length(w1), Height: geometry.Length(h1)},
				{Name: "B2", X: geometry.Length(x2), Sill: geometry.Length(s2), Width: geometry.Length(w2), Height: geometry.Length(h2)},
			}}},
		}
		g := Elevation(w, nil, cols, rows)
		if g.Cols > max(cols, 0) || g.Rows > max(rows, 0) || len(g.Cells) != g.Rows {
			t.Fatalf("grid %d×%d (%d rows of cells) in a %d×%d box", g.Cols, g.Rows, len(g.Cells), cols, rows)
		}
		for r, row := range g.Cells {
			if len(row) != g.Cols {
				t.Fatalf("row %d has %d cells, want %d", r, len(row), g.Cols)
			}
			for _, c := range row {
				if c.Opening < -1 || c.Opening > 1 || c.Pier != -1 {
					t.Fatalf("cell %+v: bad indices", c)
				}
			}
		}
		s := g.String()
		lines := strings.Split(s, "\n")
		if g.Rows > 0 && len(lines) != g.Rows {
			t.Fatalf("%d lines for %d rows", len(lines), g.Rows)
		}
		for _, line := range lines {
			if len(line) > g.Cols {
				t.Fatalf("line %q longer than %d", line, g.Cols)
			}
			for _, ch := range line {
				if ch < 0x20 || ch > 0x7e {
					t.Fatalf("non-ASCII %q", ch)
				}
			}
		}
	})
}

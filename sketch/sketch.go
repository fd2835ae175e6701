package sketch

import (
	"fmt"
	"math"
	"strings"
	"unicode/utf8"

	"pierwise/geometry"
	"pierwise/pier"
)

// CellKind says what a cell of the elevation shows.
type CellKind int

const (
	Empty        CellKind = iota // outside the wall
	Solid                        // wall material that is in no leaf pier (spandrels, sills)
	PierFill                     // wall material inside a leaf pier
	WallEdge                     // the wall's outline
	OpeningEdge                  // an opening's outline
	OpeningSpace                 // the open space inside an opening
	OpeningLabel                 // a letter of an opening's name
	PierLabel                    // a letter of a pier's name or share
)

// Cell is one character of the elevation. Pier is an index into the
// pier.Result's Piers (a leaf pier) or -1; Opening is an index into the
// wall's active openings or -1.
type Cell struct {
	Ch      rune
	Kind    CellKind
	Pier    int
	Opening int
}

// Grid is an elevation drawn into character cells, Cells[row][col], row 0 at
// the top of the wall. Column Col(x) draws the vertical line at x metres from
// the wall's left end, row Row(y) the horizontal line at y metres above its
// base.
type Grid struct {
	Cols, Rows int
	Cells      [][]Cell

	length, height float64 // the wall, metres
}

var blank = Cell{Ch: ' ', Kind: Empty, Pier: -1, Opening: -1}

// Elevation draws the active layout of w to scale inside a box of cols × rows
// cells. res may be nil (no pier labels); when given it must be the result
// of the same wall and layout. A wall that does not fit at all (a box
// smaller than 3 × 3, or a wall without size) gives an empty grid.
func Elevation(w *geometry.Wall, res *pier.Result, cols, rows int) *Grid {
	return ElevationLabeled(w, res, cols, rows, nil)
}

// ElevationLabeled is Elevation with each leaf pier's figure given by value
// (i indexes res.Piers) instead of its share: a demand/capacity ratio, say.
// A nil value gives the share.
func ElevationLabeled(w *geometry.Wall, res *pier.Result, cols, rows int, value func(i int, p pier.Pier) string) *Grid {
	g := &Grid{}
	if w == nil || cols < 3 || rows < 3 || !(w.Length > 0) || !(w.Height > 0) ||
		math.IsInf(float64(w.Length), 0) || math.IsInf(float64(w.Height), 0) {
		return g
	}
	L, H := float64(w.Length), float64(w.Height)
	// Columns per metre: the wall spans Col(0)..Col(L); a row is two columns tall.
	s := math.Min(float64(cols-1)/L, 2*float64(rows-1)/H)
	wc := max(2, min(cols-1, int(math.Round(L*s))))
	hr := max(2, min(rows-1, int(math.Round(H*s/2))))
	g.Cols, g.Rows = wc+1, hr+1
	g.length, g.height = L, H
	g.Cells = make([][]Cell, g.Rows)
	for r := range g.Cells {
		g.Cells[r] = make([]Cell, g.Cols)
		for c := range g.Cells[r] {
			g.Cells[r][c] = Cell{Ch: ' ', Kind: Solid, Pier: -1, Opening: -1}
		}
	}

	ops := w.Openings()
	// Open space first, so that pier fill never claims it.
	for i, o := range ops {
		c0, c1, r0, r1 := g.box(o.Rect())
		for r := r1 + 1; r < r0; r++ {
			for c := c0 + 1; c < c1; c++ {
				g.Cells[r][c] = Cell{Ch: ' ', Kind: OpeningSpace, Pier: -1, Opening: i}
			}
		}
	}
	if res != nil {
		for i, p := range res.Piers {
			if !p.Leaf {
				continue
			}
			c0, c1, r0, r1 := g.box(p.Rect)
			for r := r1; r <= r0; r++ {
				for c := c0; c <= c1; c++ {
					if cell := &g.Cells[r][c]; cell.Kind == Solid {
						cell.Kind, cell.Pier = PierFill, i
					}
				}
			}
		}
	}

	// Outlines: the wall, then the openings over it.
	g.rect(0, wc, hr, 0, WallEdge, -1)
	for i, o := range ops {
		c0, c1, r0, r1 := g.box(o.Rect())
		g.rect(c0, c1, r0, r1, OpeningEdge, i)
	}

	var beside []int // openings whose names do not fit in their boxes
	for i, o := range ops {
		if o.Name != "" && !g.labelOpening(i, o) {
			beside = append(beside, i)
		}
	}
	if res != nil {
		for i, p := range res.Piers {
			if p.Leaf {
				g.labelPier(i, p, value)
			}
		}
	}
	// Names beside their boxes take what the pier labels left.
	for _, i := range beside {
		g.labelBeside(i, ops[i])
	}
	return g
}

// Col returns the column that draws the vertical line at x metres from the
// wall's left end (clamped to the grid).
func (g *Grid) Col(x float64) int {
	if g.Cols == 0 {
		return 0
	}
	c := int(math.Round(x / g.length * float64(g.Cols-1)))
	return max(0, min(g.Cols-1, c))
}

// Row returns the row that draws the horizontal line at y metres above the
// wall's base (clamped to the grid).
func (g *Grid) Row(y float64) int {
	if g.Rows == 0 {
		return 0
	}
	r := g.Rows - 1 - int(math.Round(y/g.height*float64(g.Rows-1)))
	return max(0, min(g.Rows-1, r))
}

// X and Y return the wall coordinates (metres) of a column's and a row's
// line: the inverse of Col and Row, for the mouse.
func (g *Grid) X(col int) float64 {
	if g.Cols < 2 {
		return 0
	}
	return float64(col) / float64(g.Cols-1) * g.length
}

func (g *Grid) Y(row int) float64 {
	if g.Rows < 2 {
		return 0
	}
	return float64(g.Rows-1-row) / float64(g.Rows-1) * g.height
}

// At returns the cell at (col, row), or an Empty cell outside the grid.
func (g *Grid) At(col, row int) Cell {
	if row < 0 || row >= g.Rows || col < 0 || col >= g.Cols {
		return blank
	}
	return g.Cells[row][col]
}

// String returns the elevation as plain ASCII lines without trailing spaces.
func (g *Grid) String() string {
	var b strings.Builder
	for r, row := range g.Cells {
		if r > 0 {
			b.WriteByte('\n')
		}
		line := make([]rune, len(row))
		for c, cell := range row {
			line[c] = cell.Ch
		}
		b.WriteString(strings.TrimRight(string(line), " "))
	}
	return b.String()
}

// box maps a rectangle to its outline's columns c0 ≤ c1 and rows r1 ≤ r0
// (r1 is the top).
func (g *Grid) box(r geometry.Rect) (c0, c1, r0, r1 int) {
	return g.Col(r.X0), g.Col(r.X1), g.Row(r.Y0), g.Row(r.Y1)
}

// rect draws an outline; lines that cross make a corner.
func (g *Grid) rect(c0, c1, r0, r1 int, kind CellKind, opening int) {
	for c := c0; c <= c1; c++ {
		g.line(c, r0, '-', kind, opening)
		g.line(c, r1, '-', kind, opening)
	}
	for r := r1; r <= r0; r++ {
		g.line(c0, r, '|', kind, opening)
		g.line(c1, r, '|', kind, opening)
	}
	for _, p := range [][2]int{{c0, r0}, {c0, r1}, {c1, r0}, {c1, r1}} {
		g.line(p[0], p[1], '+', kind, opening)
	}
}

func (g *Grid) line(c, r int, ch rune, kind CellKind, opening int) {
	cell := &g.Cells[r][c]
	if (cell.Kind == WallEdge || cell.Kind == OpeningEdge) && cell.Ch != ch {
		ch = '+'
	}
	if kind == OpeningEdge || cell.Opening < 0 {
		cell.Opening = opening
	}
	cell.Ch, cell.Kind, cell.Pier = ch, kind, -1
}

// labelOpening writes the opening's name inside it, else over its head
// line; it reports whether the name fitted. A name that does not fit goes
// beside the box (labelBeside) or nowhere: a name anywhere else (above the
// box, say) reads as a label of the solid wall around it.
func (g *Grid) labelOpening(i int, o geometry.Opening) bool {
	name := geometry.Visible(o.Name) // a name from a file may hold control characters
	c0, c1, r0, r1 := g.box(o.Rect())
	n := utf8.RuneCountInString(name)
	free := func(k CellKind) func(Cell) bool {
		return func(c Cell) bool { return c.Kind == k && c.Opening == i }
	}
	if c1-c0-1 >= n && r0-r1-1 >= 1 {
		if g.place((r0+r1)/2, c0+1, c1-1, name, OpeningLabel, i, free(OpeningSpace)) {
			return true
		}
	}
	return c1-c0-1 >= n && g.place(r1, c0+1, c1-1, name, OpeningLabel, i, free(OpeningEdge))
}

// labelBeside writes the opening's name beside its box, right, then left,
// on the box's rows from the middle out; one cell from the outline when
// there is room, else touching it; never touching another outline. It
// reports whether the name found room.
func (g *Grid) labelBeside(i int, o geometry.Opening) bool {
	name := geometry.Visible(o.Name) // a name from a file may hold control characters
	c0, c1, r0, r1 := g.box(o.Rect())
	n := utf8.RuneCountInString(name)
	solid := func(c Cell) bool { return c.Kind == Solid || c.Kind == PierFill }
	mid := (r0 + r1) / 2
	for _, gap := range []int{1, 0} {
		for d := 0; d <= r0-r1; d++ {
			for _, r := range []int{mid - d, mid + d} {
				if r < r1 || r > r0 || (d > 0 && r == mid) {
					continue
				}
				// The gap and the cell past the name must be solid too: a
				// name that touches another outline reads as that one's.
				if g.fits(r, c1+1, c1+gap+n+1, strings.Repeat(" ", gap+n+1), solid) &&
					g.place(r, c1+1+gap, c1+gap+n, name, OpeningLabel, i, solid) {
					return true
				}
				if g.fits(r, c0-gap-n-1, c0-1, strings.Repeat(" ", gap+n+1), solid) &&
					g.place(r, c0-gap-n, c0-gap-1, name, OpeningLabel, i, solid) {
					return true
				}
			}
		}
	}
	return false
}

// labelPier writes the pier's name and share inside it where they fit:
// "P1 34%" on one line, else on two lines, else the share alone, else the
// name alone.
func (g *Grid) labelPier(i int, p pier.Pier, value func(int, pier.Pier) string) {
	c0, c1, r0, r1 := g.box(p.Rect)
	pct := fmt.Sprintf("%.0f%%", 100*p.Share)
	if value != nil {
		pct = value(i, p)
	}
	free := func(c Cell) bool { return c.Kind == PierFill && c.Pier == i }
	mid := (r0 + r1) / 2
	// Rows from the middle outwards.
	var order []int
	for d := 0; d <= r0-r1; d++ {
		for _, r := range []int{mid - d, mid + d} {
			if r >= r1 && r <= r0 && (d == 0 || r != mid) {
				order = append(order, r)
			}
		}
	}
	try := func(texts ...string) bool {
		for _, r := range order {
			if r+len(texts)-1 > r0 {
				continue
			}
			ok := true
			for k, t := range texts {
				if !g.fits(r+k, c0, c1, t, free) {
					ok = false
					break
				}
			}
			if !ok {
				continue
			}
			for k, t := range texts {
				g.place(r+k, c0, c1, t, PierLabel, -1, free)
			}
			return true
		}
		return false
	}
	_ = try(p.Name+" "+pct) || try(p.Name, pct) || try(pct) || try(p.Name)
}

// fits reports whether text, centred between columns c0 and c1 of row r,
// lands on cells that ok accepts.
func (g *Grid) fits(r, c0, c1 int, text string, ok func(Cell) bool) bool {
	n := utf8.RuneCountInString(text)
	if r < 0 || r >= g.Rows || c1-c0+1 < n {
		return false
	}
	start := c0 + (c1-c0+1-n)/2
	for c := start; c < start+n; c++ {
		if c < 0 || c >= g.Cols || !ok(g.Cells[r][c]) {
			return false
		}
	}
	return true
}

// place writes text centred between columns c0 and c1 of row r when it fits;
// the cells keep their pier and take the opening index when one is given.
func (g *Grid) place(r, c0, c1 int, text string, kind CellKind, opening int, ok func(Cell) bool) bool {
	if !g.fits(r, c0, c1, text, ok) {
		return false
	}
	n := utf8.RuneCountInString(text)
	c := c0 + (c1-c0+1-n)/2
	for _, ch := range text {
		cell := &g.Cells[r][c]
		cell.Ch, cell.Kind = ch, kind
		if opening >= 0 {
			cell.Opening = opening
		}
		c++
	}
	return true
}

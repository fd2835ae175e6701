package storey

import (
	"math"
	"strings"
)

// PlanCell is one character of a plan sketch.
type PlanCell struct {
	Ch   rune
	Wall int // index into the storey's walls, or -1
	Mark rune
}

// PlanGrid is an ASCII sketch of a storey plan, north up: the plan outline
// in dots, x-walls as '=', y-walls as '|', each wall labelled with its key
// (1–9, then A–Z; see WallKey), the mass centre 'M' and the centre of
// rigidity 'R' ('*' where they share a cell). A cell is taken to be twice as
// tall as it is wide.
type PlanGrid struct {
	Cols, Rows int
	Cells      [][]PlanCell
	scale      float64 // metres per column
}

// WallKey is the one-character label of wall i in a plan sketch.
func WallKey(i int) rune {
	const keys = "123456789ABCDEFGHIJKLMNOPQRSTUVWXYZ"
	if i < len(keys) {
		return rune(keys[i])
	}
	return '?'
}

// Plan draws the storey of a at most cols wide and rows tall. The
// centre of rigidity is drawn only when a has a distribution.
func Plan(s *Storey, a *Analysis, cols, rows int) *PlanGrid {
	cols, rows = max(cols, 8), max(rows, 5)
	sx, sy := float64(s.Size[0]), float64(s.Size[1])
	// metres per column; a row is two columns tall.
	scale := math.Max(sx/float64(cols-1), sy/(2*float64(rows-1)))
	g := &PlanGrid{scale: scale}
	g.Cols = int(math.Round(sx/scale)) + 1
	g.Rows = int(math.Round(sy/(2*scale))) + 1
	g.Cells = make([][]PlanCell, g.Rows)
	for r := range g.Cells {
		g.Cells[r] = make([]PlanCell, g.Cols)
		for c := range g.Cells[r] {
			g.Cells[r][c] = PlanCell{Ch: ' ', Wall: -1}
		}
	}
	for c := 0; c < g.Cols; c++ {
		g.set(c, 0, '.', -1)
		g.set(c, g.Rows-1, '.', -1)
	}
	for r := 0; r < g.Rows; r++ {
		g.set(0, r, '.', -1)
		g.set(g.Cols-1, r, '.', -1)
	}
	for i, ref := range s.Walls {
		var length float64
		if a != nil && i < len(a.Walls) {
			length = float64(wallLength(a.Walls[i]))
		} else if ref.HasRigidity {
			length = float64(ref.Length)
		}
		if ref.Direction == Angled {
			g.angled(ref, length, i)
			continue
		}
		along := float64(s.Size[ref.Direction])
		start := (along - length) / 2
		if ref.HasStart {
			start = float64(ref.Start)
		}
		end := start + length
		if ref.Direction == X {
			r := g.row(float64(ref.Position))
			c0, c1 := g.col(start), g.col(end)
			for c := c0; c <= c1; c++ {
				g.set(c, r, '=', i)
			}
			g.set((c0+c1)/2, r, WallKey(i), i)
		} else {
			c := g.col(float64(ref.Position))
			r0, r1 := g.row(end), g.row(start)
			for r := r0; r <= r1; r++ {
				g.set(c, r, '|', i)
			}
			g.set(c, (r0+r1)/2, WallKey(i), i)
		}
	}
	mc, mr := g.col(float64(s.MassCenter[0])), g.row(float64(s.MassCenter[1]))
	g.mark(mc, mr, 'M')
	if a != nil && a.Distribution != nil {
		cr := a.Distribution.CenterOfRigidity
		rc, rr := g.col(cr[0]), g.row(cr[1])
		if rc == mc && rr == mr {
			g.mark(rc, rr, '*')
		} else {
			g.mark(rc, rr, 'R')
		}
	}
	return g
}

// angled draws a wall at an angle centred on its point, with '/' or a backslash (or
// '=' and '|' when it is nearly along an axis), clipped to the plan.
func (g *PlanGrid) angled(ref WallRef, length float64, i int) {
	c, s := math.Cos(ref.Angle), math.Sin(ref.Angle)
	ch := '/'
	switch {
	case math.Abs(s) < 0.38: // within about 22° of x
		ch = '='
	case math.Abs(c) < 0.38:
		ch = '|'
	case c*s < 0:
		ch = '\\'
	}
	x0, y0 := float64(ref.At[0]), float64(ref.At[1])
	n := max(int(length/g.scale)*2, 1)
	for k := 0; k <= n; k++ {
		t := length * (float64(k)/float64(n) - 0.5)
		g.set(g.col(x0+t*c), g.row(y0+t*s), ch, i)
	}
	g.set(g.col(x0), g.row(y0), WallKey(i), i)
}

func (g *PlanGrid) col(x float64) int {
	return min(max(int(math.Round(x/g.scale)), 0), g.Cols-1)
}

// row counts from the top: y grows upwards (north).
func (g *PlanGrid) row(y float64) int {
	r := g.Rows - 1 - int(math.Round(y/(2*g.scale)))
	return min(max(r, 0), g.Rows-1)
}

func (g *PlanGrid) set(c, r int, ch rune, wall int) {
	g.Cells[r][c] = PlanCell{Ch: ch, Wall: wall}
}

func (g *PlanGrid) mark(c, r int, ch rune) {
	g.Cells[r][c].Ch = ch
	g.Cells[r][c].Mark = ch
}

// String returns the sketch as plain ASCII lines.
func (g *PlanGrid) String() string {
	var b strings.Builder
	for _, row := range g.Cells {
		line := make([]rune, len(row))
		for i, c := range row {
			line[i] = c.Ch
		}
		b.WriteString(strings.TrimRight(string(line), " "))
		b.WriteByte('\n')
	}
	return b.String()
}

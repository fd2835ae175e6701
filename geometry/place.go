package geometry

import "math"

// PlaceNew finds where a new opening o (its Width, Height and Sill set) goes
// in the active layout: in the widest solid piece of the wall at the
// opening's height that leaves at least margin of pier on each side (to the
// neighbouring openings and to the wall's ends), centred in that piece and
// then moved onto the grid of grid (x a whole multiple of grid from the
// wall's left end; 0 for no grid). It returns false when no piece is wide
// enough; the caller may then fall back to FreeSpot, which only avoids
// overlaps.
func (w *Wall) PlaceNew(o Opening, margin, grid Length) (Opening, bool) {
	width, m := float64(o.Width), math.Max(0, float64(margin))
	if !(width > 0) || !finite(width) || !finite(m) {
		return o, false
	}
	y0, y1 := float64(o.Sill), float64(o.Sill+o.Height)
	// The openings that share the new opening's height cut the wall's
	// length into solid pieces.
	type span struct{ a, b float64 }
	var cuts []span
	for _, p := range w.Openings() {
		r := p.Rect()
		if r.Y0 < y1 && r.Y1 > y0 {
			cuts = append(cuts, span{r.X0, r.X1})
		}
	}
	pieces := []span{{0, float64(w.Length)}}
	for _, c := range cuts {
		var next []span
		for _, p := range pieces {
			if c.b <= p.a || c.a >= p.b {
				next = append(next, p)
				continue
			}
			if c.a > p.a {
				next = append(next, span{p.a, c.a})
			}
			if c.b < p.b {
				next = append(next, span{c.b, p.b})
			}
		}
		pieces = next
	}
	g := float64(grid)
	best, found := 0.0, false
	widest := 0.0
	for _, p := range pieces {
		lo, hi := p.a+m, p.b-m-width // the range of x that keeps the margins
		if hi < lo-1e-9 || p.b-p.a <= widest {
			continue
		}
		x := (lo + hi) / 2
		if g > 0 && finite(g) {
			// The grid point nearest the centre that keeps the margins.
			x = math.Round(x/g) * g
			if x < lo-1e-9 {
				x += g * math.Ceil((lo-x)/g-1e-9)
			}
			if x > hi+1e-9 {
				continue
			}
		}
		probe := o
		probe.X = Length(x)
		if w.CheckOpening(-1, probe) != nil {
			continue
		}
		best, found, widest = x, true, p.b-p.a
	}
	if !found {
		return o, false
	}
	o.X = Length(best)
	return o, true
}

package design

import (
	"sort"

	"pierwise/geometry"
)

// Bar is one vertical bar (or a group of bars at one place) of a pier: X from
// the wall's left end in metres, Area in m².
type Bar struct {
	X    float64
	Area float64
}

// cellModule is the length of masonry that one grouted cell stands for: half
// a 16-in (400-mm) unit, 8 in or 200 mm (common practice).
func cellModule(sys geometry.System) float64 {
	if sys == geometry.SI {
		return 0.200
	}
	return float64(8 * geometry.Inch)
}

// EdgeDefault is the distance from a pier's end to its jamb bars when the
// file gives none (docs/method.md §8): for masonry half a cell module, the
// centre of the end cell (4 in, 100 mm; common practice); for concrete the
// cover of ACI 318-19 Table 20.5.1.3.1 for cast-in-place concrete exposed to
// weather, 1½ in for #5 and smaller, 2 in above (table number from memory),
// plus half the jamb bar.
func EdgeDefault(w Wall, r *Reinforcement) geometry.Length {
	if w.Material.Kind != geometry.Concrete {
		return geometry.Length(cellModule(w.Units) / 2)
	}
	bar := r.Jamb.Size
	if r.Jamb.Count == 0 {
		bar = r.Vertical.Size
	}
	cover := 1.5 * geometry.Inch
	if bar.Diameter > 0.625*geometry.Inch+1e-6 {
		cover = 2 * geometry.Inch
	}
	return cover + bar.Diameter/2
}

// FaceShellDefault is the face-shell thickness of hollow units when the file
// gives none: the minimum of ASTM C90 for the unit's width, 1¼ in for units
// 8 in and wider, 1 in for 6-in units, ¾ in below (values from memory).
func FaceShellDefault(t geometry.Length) geometry.Length {
	switch {
	case t >= 7*geometry.Inch:
		return 1.25 * geometry.Inch
	case t >= 5*geometry.Inch:
		return 1.0 * geometry.Inch
	}
	return 0.75 * geometry.Inch
}

// layers returns the number of curtains of the uniform bars.
func layers(w Wall, r *Reinforcement) int {
	if r.Layers > 0 {
		return r.Layers
	}
	if w.Material.Kind == geometry.Concrete && w.Thickness > 10*geometry.Inch {
		return 2
	}
	return 1
}

func edge(w Wall, r *Reinforcement) float64 {
	if r.Edge > 0 {
		return float64(r.Edge)
	}
	return float64(EdgeDefault(w, r))
}

// sameLine is the tolerance for "the same line" in metres (a fraction of a
// millimetre; lengths come from typed values).
const sameLine = 1e-6

// overlaps reports whether the opening's height overlaps the pier's by more
// than the tolerance.
func overlaps(o geometry.Opening, p geometry.Rect) bool {
	r := o.Rect()
	return r.Y0 < p.Y1-sameLine && r.Y1 > p.Y0+sameLine
}

// PierBars lays the bars of one pier (docs/method.md §8):
//
//   - jamb bars at the edge distance inside each end of the pier that is a
//     wall end or the side of an opening that bounds it (an opening whose
//     side lies on the pier's end and whose height overlaps the pier's);
//   - uniform bars at x = k·s from the wall's left end (k = 1, 2, …), those
//     inside the pier's x-extent, skipping positions inside an opening whose
//     height overlaps the pier's and positions within the edge distance of
//     a bounded end (the end cell, where the jamb bars stand, or would).
//
// Bars are returned left to right; a nil reinforcement gives none.
func PierBars(w Wall, p geometry.Rect, r *Reinforcement) []Bar {
	if r == nil || !r.Reinforced() {
		return nil
	}
	e := edge(w, r)
	wallL := float64(w.Length)
	left, right := p.X0 <= sameLine, p.X1 >= wallL-sameLine
	for _, o := range w.Openings {
		if !overlaps(o, p) {
			continue
		}
		or := o.Rect()
		if abs(or.X1-p.X0) <= sameLine {
			left = true
		}
		if abs(or.X0-p.X1) <= sameLine {
			right = true
		}
	}
	var bars []Bar
	if r.Jamb.Count > 0 {
		// A pier narrower than two edge distances gets its bars at the middle.
		at := func(x float64) float64 {
			if p.W() < 2*e {
				return (p.X0 + p.X1) / 2
			}
			return x
		}
		if left {
			bars = append(bars, Bar{X: at(p.X0 + e), Area: r.Jamb.Area()})
		}
		if right {
			bars = append(bars, Bar{X: at(p.X1 - e), Area: r.Jamb.Area()})
		}
	}
	if s := float64(r.Vertical.Spacing); s > 0 {
		area := r.Vertical.Size.Area * float64(layers(w, r))
		lo, hi := p.X0, p.X1
		if left {
			lo = p.X0 + e // the end cell, where a jamb bar stands
		}
		if right {
			hi = p.X1 - e
		}
	positions:
		for k := max(1, int(lo/s)); float64(k)*s < hi+sameLine; k++ {
			x := float64(k) * s
			if x < lo+sameLine && left || x < lo-sameLine || x > hi-sameLine && right || x > hi+sameLine {
				continue
			}
			for _, o := range w.Openings {
				or := o.Rect()
				if overlaps(o, p) && x >= or.X0-sameLine && x <= or.X1+sameLine {
					continue positions
				}
			}
			bars = append(bars, Bar{X: x, Area: area})
		}
	}
	sort.Slice(bars, func(i, j int) bool { return bars[i].X < bars[j].X })
	return bars
}

func abs(x float64) float64 {
	if x < 0 {
		return -x
	}
	return x
}

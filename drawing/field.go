package drawing

import (
	"fmt"
	"math"
	"sort"

	"pierwise/geometry"
	"pierwise/pier/fe"
)

// Component is the stress component a stress map shows.
type Component int

const (
	NoField  Component = iota
	Shear              // τxy, positive along the wall's shear
	Vertical           // σy, tension positive
)

// String returns the component as the command line spells it.
func (c Component) String() string {
	switch c {
	case Shear:
		return "shear"
	case Vertical:
		return "vertical"
	}
	return "none"
}

// ParseComponent reads "shear" or "vertical".
func ParseComponent(s string) (Component, bool) {
	switch s {
	case "shear":
		return Shear, true
	case "vertical":
		return Vertical, true
	}
	return NoField, false
}

// fieldLevels is the number of colour steps of a stress map: enough that the
// steps read as a smooth field, few enough that runs of one colour merge
// into long rectangles and the file stays small.
const fieldLevels = 24

// fieldStops is the map's diverging palette (the project's own): deep
// blue-green for the negative end, a warm white at zero, brick red for the
// positive end.
var fieldStops = [][3]float64{
	{0x1d, 0x4e, 0x6b}, {0x4f, 0x8c, 0xa8}, {0xac, 0xcf, 0xdb}, {0xf5, 0xf2, 0xea},
	{0xf0, 0xc6, 0x9a}, {0xd2, 0x7a, 0x48}, {0x8c, 0x2a, 0x14},
}

// fieldColour returns the colour of level k of fieldLevels (0 = most
// negative).
func fieldColour(k int) string {
	t := (float64(k) + 0.5) / fieldLevels * float64(len(fieldStops)-1)
	i := min(int(t), len(fieldStops)-2)
	f := t - float64(i)
	a, b := fieldStops[i], fieldStops[i+1]
	return fmt.Sprintf("#%02x%02x%02x",
		int(math.Round(a[0]+(b[0]-a[0])*f)), int(math.Round(a[1]+(b[1]-a[1])*f)), int(math.Round(a[2]+(b[2]-a[2])*f)))
}

// stressMap is a stress field prepared for the sheet: the value per unit
// (what 1 Pa of the relative field is worth in the shown unit), the limit of
// the colour scale and the peak.
type stressMap struct {
	comp  Component
	unit  string        // "psi", "MPa" or "× V/(L·t)"
	scale float64       // shown value per relative value
	limit float64       // colour scale runs −limit … +limit (shown unit)
	peak  float64       // largest |value| of the element centres (shown unit)
	at    geometry.Rect // the element where the peak is
	clip  bool          // the limit is below the peak
}

func (c Component) of(s fe.Stress) float64 {
	if c == Vertical {
		return s.Y
	}
	return s.XY
}

// newStressMap chooses the unit and the colour limits. With the wall's shear
// and thickness known, stresses are in psi or MPa (the model's stress times
// V/t); otherwise in multiples of the average shear stress V/(L·t). The
// colour limit is the 98th percentile of |value| over the wall's area, so
// the singular peaks at re-entrant opening corners do not wash the rest of
// the map out; the legend says when the peak lies beyond it.
func newStressMap(f *fe.Field, c Component, w *geometry.Wall) stressMap {
	m := stressMap{comp: c}
	V, t := float64(w.Load.Shear), float64(w.Thickness)
	if V > 0 && t > 0 {
		unit := geometry.PSI
		m.unit = "psi"
		if w.Units == geometry.SI {
			unit, m.unit = geometry.Megapascal, "MPa"
		}
		m.scale = V / t / float64(unit)
	} else {
		m.unit = "× V/(L·t)"
		m.scale = float64(w.Length)
	}
	type av struct{ a, v float64 }
	vals := make([]av, 0, len(f.Cells))
	total := 0.0
	for _, cell := range f.Cells {
		v := math.Abs(c.of(cell.Center) * m.scale)
		a := cell.Rect.W() * cell.Rect.H()
		vals = append(vals, av{a, v})
		total += a
		if v > m.peak {
			m.peak, m.at = v, cell.Rect
		}
	}
	sort.Slice(vals, func(i, j int) bool { return vals[i].v < vals[j].v })
	acc := 0.0
	for _, x := range vals {
		acc += x.a
		if acc >= 0.98*total {
			m.limit = x.v
			break
		}
	}
	if m.limit <= 0 {
		m.limit = m.peak
	}
	if m.limit <= 0 {
		m.limit = 1
	}
	m.limit = niceCeil(m.limit)
	m.clip = m.peak > m.limit*1.0001
	return m
}

// peakPlace says where the peak element is: at the base, at a corner of
// an opening (the element touches it), or at its centre's coordinates.
func (m stressMap) peakPlace(w *geometry.Wall) string {
	r := m.at
	if r.Y0 <= 1e-9 {
		return fmt.Sprintf("at the base, x = %s", dimText((r.X0+r.X1)/2, w.Units))
	}
	for _, o := range w.Openings() {
		q := o.Rect()
		for _, c := range [][2]float64{{q.X0, q.Y0}, {q.X1, q.Y0}, {q.X0, q.Y1}, {q.X1, q.Y1}} {
			if c[0] >= r.X0-1e-9 && c[0] <= r.X1+1e-9 && c[1] >= r.Y0-1e-9 && c[1] <= r.Y1+1e-9 {
				return "at a corner of " + orText(o.Name, "an opening")
			}
		}
	}
	return fmt.Sprintf("at x = %s, y = %s", dimText((r.X0+r.X1)/2, w.Units), dimText((r.Y0+r.Y1)/2, w.Units))
}

// niceCeil rounds v up to 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8 × 10ⁿ, so the
// scale's ticks are round numbers.
func niceCeil(v float64) float64 {
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10} {
		if m*p >= v*(1-1e-12) {
			return m * p
		}
	}
	return 10 * p
}

// level returns the colour level of a shown value.
func (m stressMap) level(v float64) int {
	k := int(math.Floor((v/m.limit + 1) / 2 * fieldLevels))
	return min(max(k, 0), fieldLevels-1)
}

// maxFieldCells bounds the raster of a stress map (cells across × up).
const maxFieldCells = 60000

// drawField paints the stress field over the wall: the field is sampled on
// a raster whose columns and rows subdivide the model's own grid lines, so
// no raster cell straddles an opening edge; each cell takes the colour of
// the bilinear nodal-averaged value at its centre, and runs of one colour
// along a row become one rectangle of one path per colour.
func (d *doc) drawField(f *fe.Field, m stressMap, tx func(x, y float64) (float64, float64), k float64, xKeys, yKeys []float64) {
	xs, ys := f.Lines()
	target := 1.0 / k * 1.2 // metres of wall per 1.2 mm of paper
	wallW, wallH := xs[len(xs)-1]-xs[0], ys[len(ys)-1]-ys[0]
	for (wallW/target)*(wallH/target) > maxFieldCells {
		target *= 1.25
	}
	sub := func(lines []float64) []float64 {
		out := []float64{lines[0]}
		for i := 1; i < len(lines); i++ {
			a, b := lines[i-1], lines[i]
			n := max(1, int(math.Ceil((b-a)/target-1e-9)))
			for s := 1; s <= n; s++ {
				out = append(out, a+(b-a)*float64(s)/float64(n))
			}
		}
		return out
	}
	// Merge model lines closer than a raster cell first (the graded mesh
	// is much finer than the paper near opening edges), keeping every
	// opening edge: those are the lines the rest of the sheet draws.
	rx, ry := sub(thin(xs, target, xKeys)), sub(thin(ys, target, yKeys))
	paths := make([]pathBuilder, fieldLevels)
	for j := 0; j+1 < len(ry); j++ {
		yc := (ry[j] + ry[j+1]) / 2
		run, start := -1, 0
		flush := func(end int) {
			if run < 0 {
				return
			}
			xa, ya := tx(rx[start], ry[j+1])
			xb, yb := tx(rx[end], ry[j])
			paths[run].rect(xa, ya, xb, yb)
		}
		for i := 0; i+1 < len(rx); i++ {
			s, ok := f.At((rx[i]+rx[i+1])/2, yc)
			lv := -1
			if ok {
				lv = m.level(m.comp.of(s) * m.scale)
			}
			if lv != run {
				flush(i)
				run, start = lv, i
			}
		}
		flush(len(rx) - 1)
	}
	d.open("g", "stroke", "none")
	for lv := range paths {
		if !paths[lv].empty() {
			// A hairline of the same colour closes the seams that
			// anti-aliasing leaves between neighbouring rectangles.
			c := fieldColour(lv)
			d.el("path", "d", paths[lv].String(), "fill", c, "stroke", c, "stroke-width", "0.05")
		}
	}
	d.close("g")
}

// thin drops grid lines that lie closer than minGap to the previous kept
// line, always keeping the first, the last and those on a key line.
func thin(lines []float64, minGap float64, keys []float64) []float64 {
	isKey := func(v float64) bool {
		for _, k := range keys {
			if math.Abs(k-v) <= 1e-6 {
				return true
			}
		}
		return false
	}
	out := []float64{lines[0]}
	for i := 1; i < len(lines)-1; i++ {
		if lines[i]-out[len(out)-1] >= minGap*0.999 || isKey(lines[i]) {
			out = append(out, lines[i])
		}
	}
	return append(out, lines[len(lines)-1])
}

package drawing

import (
	"fmt"
	"math"
)

// paint is how one class of piers is filled: a colour and a hatch, so that
// a black-and-white print tells the classes apart as well as colour does.
// The hatch is drawn as plain line segments (not an SVG <pattern>), so that
// every viewer, printer driver and the test rasteriser shows it.
type paint struct {
	Fill    string
	Spacing float64 // mm between hatch lines; 0 = no hatch
	Cross   bool    // both diagonals
	Label   string  // legend text
}

// shareClasses split the share of the wall shear a leaf pier takes into five
// classes, light to dark with the hatch growing denser; the luminance of the
// fills falls steadily, so a grey print orders them too. The palette is the
// project's own.
var shareBounds = []float64{0.10, 0.25, 0.40, 0.60}

var sharePaints = []paint{
	{Fill: "#f3efe2", Spacing: 3.2},
	{Fill: "#cfe0bd", Spacing: 1.7},
	{Fill: "#8fc0a8", Spacing: 3.2, Cross: true},
	{Fill: "#4f8f92", Spacing: 1.9, Cross: true},
	{Fill: "#2b5a74", Spacing: 1.2, Cross: true},
}

// ratioBounds split demand/capacity ratios; the last class (over 1) fails.
var ratioBounds = []float64{0.5, 0.75, 0.9, 1.0}

var ratioPaints = []paint{
	{Fill: "#e6efdc", Spacing: 3.2},
	{Fill: "#c9dc9f", Spacing: 1.7},
	{Fill: "#f0d57e", Spacing: 3.2, Cross: true},
	{Fill: "#e49a5e", Spacing: 1.9, Cross: true},
	{Fill: "#b8372a", Spacing: 1.2, Cross: true},
}

// Plain fills.
const (
	solidFill   = "#e2e2e2" // wall outside the leaf piers (spandrels, strips)
	openingFill = "#ffffff"
	hatchStroke = "#1a1a1a"
	inkColour   = "#000000"
	cutFill     = "#ffffff" // a pier without a load path
)

// classOf returns the class of v among bounds (0 … len(bounds)).
func classOf(v float64, bounds []float64) int {
	for i, b := range bounds {
		if v < b-1e-12 {
			return i
		}
	}
	return len(bounds)
}

// classLabels names the classes of bounds, e.g. "under 10 %", "10–25 %".
func classLabels(bounds []float64, pct bool) []string {
	f := func(v float64) string {
		if pct {
			return fmt.Sprintf("%g %%", math.Round(v*1000)/10)
		}
		return fmt.Sprintf("%g", v)
	}
	out := make([]string, len(bounds)+1)
	out[0] = "under " + f(bounds[0])
	for i := 1; i < len(bounds); i++ {
		out[i] = f(bounds[i-1]) + " to " + f(bounds[i])
	}
	out[len(bounds)] = f(bounds[len(bounds)-1]) + " and over"
	return out
}

// hatch adds to p the hatch lines of a paint inside the rectangle
// [x0, x1] × [y0, y1] (sheet mm, y down). The lines lie on one lattice for
// the whole sheet (x ± y = k·s·√2), so the hatch of neighbouring piers lines
// up. Clipping a 45° line to an axis-aligned rectangle is two max/min pairs,
// which is why no geometry library is used for it.
func hatch(p *pathBuilder, pt paint, x0, y0, x1, y1 float64) {
	if pt.Spacing <= 0 || x1 <= x0 || y1 <= y0 {
		return
	}
	step := pt.Spacing * math.Sqrt2
	// Lines y = x − c (rising to the right on the sheet, y down means
	// falling; either way one diagonal family): x from max(x0, y0+c) to
	// min(x1, y1+c).
	for c := math.Floor((x0-y1)/step) * step; c <= x1-y0; c += step {
		a, b := math.Max(x0, y0+c), math.Min(x1, y1+c)
		if b-a > 1e-6 {
			p.move(a, a-c)
			p.line(b, b-c)
		}
	}
	if !pt.Cross {
		return
	}
	// Lines y = −x + c: x from max(x0, c−y1) to min(x1, c−y0).
	for c := math.Floor((x0+y0)/step) * step; c <= x1+y1; c += step {
		a, b := math.Max(x0, c-y1), math.Min(x1, c-y0)
		if b-a > 1e-6 {
			p.move(a, c-a)
			p.line(b, c-b)
		}
	}
}

// swatch draws a legend swatch of a paint.
func (d *doc) swatch(x, y, w, h float64, pt paint) {
	d.rect(x, y, x+w, y+h, "fill", pt.Fill, "stroke", "none")
	var p pathBuilder
	hatch(&p, pt, x, y, x+w, y+h)
	if !p.empty() {
		d.el("path", "d", p.String(), "fill", "none", "stroke", hatchStroke, "stroke-width", "0.15")
	}
	d.rect(x, y, x+w, y+h, "fill", "none", "stroke", inkColour, "stroke-width", "0.3")
}

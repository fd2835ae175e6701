package drawing

import (
	"fmt"
	"math"
	"sort"
	"strings"
	"time"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
	"pierwise/report"
)

// Show says which value each pier carries on the drawing.
type Show int

const (
	Shares Show = iota // share of the wall shear
	Forces             // V and M of each leaf pier
	Ratios             // demand/capacity ratio from pier design
)

// String returns the value as the command line spells it.
func (s Show) String() string {
	switch s {
	case Forces:
		return "forces"
	case Ratios:
		return "ratios"
	}
	return "shares"
}

// ParseShow reads "shares", "forces" or "ratios".
func ParseShow(s string) (Show, bool) {
	for _, v := range []Show{Shares, Forces, Ratios} {
		if v.String() == s {
			return v, true
		}
	}
	return Shares, false
}

// Pier is one leaf pier as a basis gives it: where it is and what it takes.
type Pier struct {
	Name   string
	Rect   geometry.Rect  // metres
	Share  float64        // fraction of the wall shear
	Shear  geometry.Force // V_i; zero without a load
	Moment float64        // M_i in N·m; zero without a load
	Cut    bool           // no load path through it
}

// LeafPiers returns the leaf piers of a classic result, in its order.
func LeafPiers(r *pier.Result) []Pier {
	if r == nil {
		return nil
	}
	var out []Pier
	for _, p := range r.Piers {
		if p.Leaf {
			out = append(out, Pier{Name: p.Name, Rect: p.Rect, Share: p.Share, Shear: p.Shear, Moment: p.Moment, Cut: p.Cut})
		}
	}
	return out
}

// RatioFunc gives the governing demand/capacity ratio of a pier by name;
// ok is false when the pier has none. Pier design supplies it.
type RatioFunc func(pier string) (ratio float64, ok bool)

// WallInput is everything a wall drawing shows. The drawing computes no
// mechanics: piers, forces, ratios and the stress field come from the
// caller's basis.
type WallInput struct {
	Path string // the wall file as given ("" for the built-in demo)
	// Unsaved says the wall has edits not yet saved to Path: the title
	// block says so, as the snapshot's report heading does.
	Unsaved bool
	Wall    *geometry.Wall
	Basis   string // the model the values come from, as the title block names it
	FE      bool   // the values are the finite-element model's (docs/method.md §5)
	Piers   []Pier // leaf piers; empty for a solid wall or a wall without an answer
	// NoAnswer says why the basis has no pier values (a wall the openings
	// cut), printed on the sheet; "" when there is an answer.
	NoAnswer string
	HasLoad  bool // the wall has a shear, so Pier.Shear and Moment are filled

	Show  Show
	Ratio RatioFunc // required for Ratios; nil: the sheet says pier design is not available

	Field     *fe.Field // stress field to map over the wall, or nil
	Component Component // which component of Field

	Project  []Entry
	Warnings []string // the basis's warnings; the title block counts them
	Now      time.Time
	Version  string
}

// layout of the wall sheet (mm).
type wallSheet struct {
	sh     sheet
	sc     scale
	k      float64 // mm of paper per metre of wall
	ox, oy float64 // wall's bottom-left corner on the sheet
	ww, hh float64 // wall's size on the sheet
	sys    geometry.System

	unlabelled int // piers too small at this scale for a label
}

func (s *wallSheet) at(x, y float64) (float64, float64) { return s.ox + x*s.k, s.oy - y*s.k }

// newWallSheet lays a wall out on its sheet: the scale and where the wall
// goes.
func newWallSheet(w *geometry.Wall) *wallSheet {
	L, H := float64(w.Length), float64(w.Height)
	s := &wallSheet{sh: sheetFor(w.Units), sys: w.Units}
	ax0, ax1 := margin+gap, s.sh.W-margin-sideW-gap
	ay0, ay1 := margin+gap, s.sh.H-margin-titleH-gap
	const left, right, top, bottom = 24.0, 32.0, 20.0, 28.0
	availW, availH := ax1-ax0-left-right, ay1-ay0-top-bottom
	s.sc = chooseScale(w.Units, L, H, availW, availH)
	s.k = 1000 / s.sc.Den
	s.ww, s.hh = L*s.k, H*s.k
	s.ox = ax0 + left + (availW-s.ww)/2
	s.oy = ay0 + top + (availH-s.hh)/2 + s.hh

	return s
}

// Wall draws a wall elevation to scale as an SVG sheet.
func Wall(in WallInput) ([]byte, error) {
	w := in.Wall
	if w == nil {
		panic("drawing: Wall needs a wall")
	}
	L, H := float64(w.Length), float64(w.Height)
	if !(L > 0) || !(H > 0) || math.IsInf(L, 0) || math.IsInf(H, 0) {
		return nil, fmt.Errorf("the wall needs a positive length and height to be drawn")
	}
	s := newWallSheet(w)
	d := newDoc()
	d.open("svg", "xmlns", "http://www.w3.org/2000/svg", "version", "1.1",
		"width", num(s.sh.W)+"mm", "height", num(s.sh.H)+"mm", "viewBox", "0 0 "+num(s.sh.W)+" "+num(s.sh.H))
	title := w.Title
	d.textEl("title", "pierwise: "+orText(title, "wall elevation"))
	d.rect(0, 0, s.sh.W, s.sh.H, "fill", "#ffffff")

	d.open("g", "id", "wall")
	var stress stressMap
	if in.Field != nil && in.Component != NoField {
		stress = newStressMap(in.Field, in.Component, w)
		d.rect(s.ox, s.oy-s.hh, s.ox+s.ww, s.oy, "fill", solidFill)
		var xk, yk []float64
		for _, o := range w.Openings() {
			r := o.Rect()
			xk, yk = append(xk, r.X0, r.X1), append(yk, r.Y0, r.Y1)
		}
		d.drawField(in.Field, stress, s.at, s.k, xk, yk)
	} else {
		d.rect(s.ox, s.oy-s.hh, s.ox+s.ww, s.oy, "fill", solidFill)
		s.fillPiers(d, in)
	}
	d.open("g", "id", "openings")
	for _, o := range w.Openings() {
		r := clipRect(o.Rect(), L, H)
		x0, y0 := s.at(r.X0, r.Y1)
		x1, y1 := s.at(r.X1, r.Y0)
		d.rect(x0, y0, x1, y1, "fill", openingFill, "stroke", inkColour, "stroke-width", "0.35")
	}
	d.close("g")
	d.open("g", "id", "pier-outlines", "fill", "none", "stroke", inkColour, "stroke-width", "0.45")
	for _, p := range in.Piers {
		x0, y0 := s.at(p.Rect.X0, p.Rect.Y1)
		x1, y1 := s.at(p.Rect.X1, p.Rect.Y0)
		d.rect(x0, y0, x1, y1)
	}
	d.close("g")
	d.rect(s.ox, s.oy-s.hh, s.ox+s.ww, s.oy, "fill", "none", "stroke", inkColour, "stroke-width", "0.7")
	d.close("g")

	s.base(d, w)
	s.load(d, in)
	s.dimensions(d, w)
	s.openingTags(d, w)
	s.pierLabels(d, in)
	s.side(d, in, stress)

	file := orText(in.Path, "(built-in demo wall)")
	if in.Unsaved {
		file += " (unsaved changes: the wall as edited)"
	}
	lines := [][2]string{{"File", file}}
	if w.Active >= 0 && w.Active < len(w.Layouts) && w.Layouts[w.Active].Name != "" {
		lines = append(lines, [2]string{"Layout", w.Layouts[w.Active].Name})
	}
	lines = append(lines, [2]string{"Basis", orText(in.Basis, "classic")}, [2]string{"Showing", showing(in)})
	d.frame(s.sh, titleBlock{
		Title: title, Drawing: "Wall elevation: leaf piers, " + in.Show.String(),
		Lines: lines, Project: in.Project, Date: in.Now, Version: in.Version,
		Scale: s.sc.Name, Sheet: s.sh.Name, Warnings: len(in.Warnings),
	})
	d.close("svg")
	return d.bytes()
}

func orText(s, def string) string {
	if strings.TrimSpace(s) == "" {
		return def
	}
	return s
}

func showing(in WallInput) string {
	s := map[Show]string{Shares: "share of the wall shear per leaf pier", Forces: "pier shear V and moment M", Ratios: "demand/capacity ratio per pier"}[in.Show]
	if in.Field != nil && in.Component != NoField {
		s += "; stress map " + map[Component]string{Shear: "τxy", Vertical: "σy"}[in.Component]
	}
	return s
}

func clipRect(r geometry.Rect, L, H float64) geometry.Rect {
	return geometry.Rect{X0: math.Max(r.X0, 0), Y0: math.Max(r.Y0, 0), X1: math.Min(r.X1, L), Y1: math.Min(r.Y1, H)}
}

// paintOf returns the paint of a pier for the value shown, and whether it
// has one.
func paintOf(in WallInput, p Pier) (paint, bool) {
	if p.Cut {
		return paint{}, false
	}
	if in.Show == Ratios {
		if in.Ratio == nil {
			return paint{}, false
		}
		r, ok := in.Ratio(p.Name)
		if !ok || math.IsNaN(r) || math.IsInf(r, 0) {
			return paint{}, false
		}
		return ratioPaints[classOf(r, ratioBounds)], true
	}
	return sharePaints[classOf(p.Share, shareBounds)], true
}

// fillPiers fills each leaf pier with its class's colour and hatch.
func (s *wallSheet) fillPiers(d *doc, in WallInput) {
	d.open("g", "id", "pier-fills")
	for _, p := range in.Piers {
		x0, y0 := s.at(p.Rect.X0, p.Rect.Y1)
		x1, y1 := s.at(p.Rect.X1, p.Rect.Y0)
		pt, ok := paintOf(in, p)
		if !ok {
			fill := solidFill
			if p.Cut {
				fill = cutFill
			}
			d.rect(x0, y0, x1, y1, "fill", fill)
			continue
		}
		d.rect(x0, y0, x1, y1, "fill", pt.Fill)
		var path pathBuilder
		hatch(&path, pt, x0, y0, x1, y1)
		if !path.empty() {
			d.el("path", "d", path.String(), "fill", "none", "stroke", hatchStroke, "stroke-width", "0.15")
		}
	}
	d.close("g")
}

// base draws the fixed base: a ground line with short strokes below it.
func (s *wallSheet) base(d *doc, w *geometry.Wall) {
	var p pathBuilder
	x0, x1 := s.ox-3, s.ox+s.ww+3
	p.move(x0, s.oy)
	p.line(x1, s.oy)
	for x := x0 + 2; x <= x1; x += 2.5 {
		p.move(x, s.oy)
		p.line(x-1.8, s.oy+1.8)
	}
	d.el("path", "d", p.String(), "fill", "none", "stroke", inkColour, "stroke-width", "0.25", "id", "base")
	if w.Support == geometry.Fixed {
		// The top is held from rotating: a restraint line above it.
		var q pathBuilder
		q.move(s.ox-3, s.oy-s.hh-1.2)
		q.line(s.ox+s.ww+3, s.oy-s.hh-1.2)
		d.el("path", "d", q.String(), "fill", "none", "stroke", inkColour, "stroke-width", "0.25", "stroke-dasharray", "2 1")
	}
}

// load draws the wall's shear as an arrow toward +x at the top left.
func (s *wallSheet) load(d *doc, in WallInput) {
	y := s.oy - s.hh
	x0, x1 := s.ox-20, s.ox-1
	var p pathBuilder
	p.move(x0, y)
	p.line(x1-2.2, y)
	d.el("path", "d", p.String(), "stroke", inkColour, "stroke-width", "0.5", "fill", "none")
	var h pathBuilder
	h.move(x1, y)
	h.line(x1-2.6, y-1.1)
	h.line(x1-2.6, y+1.1)
	h.closePath()
	d.el("path", "d", h.String(), "fill", inkColour)
	label := "V (no shear given)"
	if in.Wall.Load.Shear > 0 {
		label = "V = " + geometry.FormatForce(in.Wall.Load.Shear, in.Wall.Units)
	}
	d.text(x0, y-2, 2.8, label, "start", "font-family", fontFamily, "font-weight", "bold")
}

// stations returns the sorted distinct values of v (within 1 mm of wall).
func stations(v []float64) []float64 {
	sort.Float64s(v)
	out := v[:0]
	for _, x := range v {
		if len(out) == 0 || x-out[len(out)-1] > 1e-3 {
			out = append(out, x)
		}
	}
	return out
}

// dimensions draws the dimension strings: below the wall a chain through
// every opening edge and the overall length; right of it a chain through
// every sill and head and the overall height. Every opening's and every
// pier's edges lie on these chains.
func (s *wallSheet) dimensions(d *doc, w *geometry.Wall) {
	L, H := float64(w.Length), float64(w.Height)
	xs, ys := []float64{0, L}, []float64{0, H}
	for _, o := range w.Openings() {
		r := clipRect(o.Rect(), L, H)
		xs = append(xs, r.X0, r.X1)
		ys = append(ys, r.Y0, r.Y1)
	}
	xs, ys = stations(xs), stations(ys)
	d.open("g", "id", "dimensions", "font-family", fontFamily, "fill", inkColour)
	// The overall dimension goes outside the chain, or alone in its
	// place when there is no chain (nothing between the ends).
	if len(xs) > 2 {
		s.hChain(d, xs, s.oy+10, s.oy+1.5)
	}
	s.hChain(d, []float64{0, L}, s.oy+10+10*b2f(len(xs) > 2), s.oy+1.5)
	if len(ys) > 2 {
		s.vChain(d, ys, s.ox+s.ww+10, s.ox+s.ww+1.5)
	}
	s.vChain(d, []float64{0, H}, s.ox+s.ww+10+11*b2f(len(ys) > 2), s.ox+s.ww+1.5)
	d.close("g")
	if w.Units == geometry.SI {
		d.text(s.ox+s.ww+21, s.oy+20+7.5, 2.3, "dimensions in mm", "end", "font-family", fontFamily, "font-style", "italic")
	}
}

const dimFont = 2.5

func b2f(b bool) float64 {
	if b {
		return 1
	}
	return 0
}

// hChain draws a horizontal chain of dimensions at sheet height y through
// the wall stations xs; extension lines start at from.
func (s *wallSheet) hChain(d *doc, xs []float64, y, from float64) {
	var p pathBuilder
	px := make([]float64, len(xs))
	for i, x := range xs {
		px[i], _ = s.at(x, 0)
		p.move(px[i], from)
		p.line(px[i], y+1.5)
		tick(&p, px[i], y)
	}
	p.move(px[0]-1.5, y)
	p.line(px[len(px)-1]+1.5, y)
	d.el("path", "d", p.String(), "fill", "none", "stroke", inkColour, "stroke-width", "0.18")
	// A number goes above the line when it fits its segment, else under
	// it, else (a crowded chain at a small scale) it is left out rather
	// than printed over its neighbour.
	above, below := math.Inf(-1), math.Inf(-1) // right end of the last text
	for i := 1; i < len(xs); i++ {
		t := dimText(xs[i]-xs[i-1], s.sys)
		mid := (px[i] + px[i-1]) / 2
		tw := textWidth(t, dimFont)
		switch {
		case tw <= px[i]-px[i-1]-0.6 && mid-tw/2 > above+0.8:
			d.text(mid, y-1, dimFont, t, "middle")
			above = mid + tw/2
		case mid-tw/2 > below+0.8 && mid-tw/2 > above+0.8-tw:
			d.text(mid, y+1+dimFont, dimFont, t, "middle")
			below = mid + tw/2
		}
	}
}

// vChain draws a vertical chain at sheet x through the wall stations ys;
// the text reads from the bottom up, left of the line.
func (s *wallSheet) vChain(d *doc, ys []float64, x, from float64) {
	var p pathBuilder
	py := make([]float64, len(ys))
	for i, y := range ys {
		_, py[i] = s.at(0, y)
		p.move(from, py[i])
		p.line(x+1.5, py[i])
		tick(&p, x, py[i])
	}
	p.move(x, py[0]+1.5)
	p.line(x, py[len(py)-1]-1.5)
	d.el("path", "d", p.String(), "fill", "none", "stroke", inkColour, "stroke-width", "0.18")
	// As hChain: beside the line toward the wall when the number fits,
	// else on the far side, else left out. Sheet y grows downward, so the
	// chain is walked upward and "end" is the top of the last text.
	near, far := math.Inf(1), math.Inf(1)
	for i := 1; i < len(ys); i++ {
		t := dimText(ys[i]-ys[i-1], s.sys)
		mid := (py[i] + py[i-1]) / 2
		tw := textWidth(t, dimFont)
		tx := 0.0
		switch {
		case tw <= py[i-1]-py[i]-0.6 && mid+tw/2 < near-0.8:
			tx, near = x-1, mid-tw/2
		case mid+tw/2 < far-0.8:
			tx, far = x+1+dimFont, mid-tw/2
		default:
			continue
		}
		d.text(tx, mid, dimFont, t, "middle", "transform", "rotate(-90 "+num(tx)+" "+num(mid)+")")
	}
}

// tick adds an oblique dimension tick at (x, y).
func tick(p *pathBuilder, x, y float64) {
	p.move(x-1, y+1)
	p.line(x+1, y-1)
}

// openingTags writes each opening's name and size inside it (on a white
// ground, so a tag that overflows a small opening stays legible).
func (s *wallSheet) openingTags(d *doc, w *geometry.Wall) {
	L, H := float64(w.Length), float64(w.Height)
	d.open("g", "id", "opening-tags", "font-family", fontFamily, "fill", inkColour)
	for _, o := range w.Openings() {
		r := clipRect(o.Rect(), L, H)
		cx, cy := s.at((r.X0+r.X1)/2, (r.Y0+r.Y1)/2)
		size := dimText(float64(o.Width), s.sys) + " × " + dimText(float64(o.Height), s.sys)
		name := o.Name
		if name == "" {
			name = "(opening)"
		}
		wid, hgt := (r.X1-r.X0)*s.k, (r.Y1-r.Y0)*s.k
		switch {
		case hgt >= 8 && textWidth(size, 2.3) <= wid+4 && textWidth(name, 3) <= wid:
			d.text(cx, cy-0.4, 3, name, "middle", "font-weight", "bold")
			d.text(cx, cy+3.2, 2.3, size, "middle")
		case hgt >= 3.5 && textWidth(name, 2.6) <= wid:
			d.text(cx, cy+1.1, 2.6, name, "middle", "font-weight", "bold")
		}
		// Too small at this scale for its name: the dimension chains
		// still place it.
	}
	d.close("g")
}

// pierLabels writes each leaf pier's name and value in a white box at its
// centre, moved up or down inside the pier when it would cover another.
func (s *wallSheet) pierLabels(d *doc, in WallInput) {
	type box struct{ x0, y0, x1, y1 float64 }
	var placed []box
	overlaps := func(b box) bool {
		for _, q := range placed {
			if b.x0 < q.x1 && q.x0 < b.x1 && b.y0 < q.y1 && q.y0 < b.y1 {
				return true
			}
		}
		return false
	}
	u := report.UnitsFor(s.sys)
	d.open("g", "id", "pier-labels", "font-family", fontFamily, "fill", inkColour)
	if len(in.Piers) == 0 && len(in.Wall.Openings()) == 0 {
		// A solid wall is one pier that takes the whole shear.
		cx, cy := s.ox+s.ww/2, s.oy-s.hh/2
		d.rect(cx-14, cy-4.6, cx+14, cy+4.6, "fill", "#ffffff", "stroke", inkColour, "stroke-width", "0.2")
		d.text(cx, cy-0.8, 3, "Solid wall", "middle", "font-weight", "bold")
		d.text(cx, cy+2.9, 2.5, "one pier: 100 % of V", "middle")
	}
	for _, p := range in.Piers {
		lines := pierValue(in, p, u)
		bw := textWidth(p.Name, 3)
		for _, l := range lines {
			bw = math.Max(bw, textWidth(l, 2.5))
		}
		bw += 2
		bh := 4.4 + 3.2*float64(len(lines))
		cx, cy := s.at((p.Rect.X0+p.Rect.X1)/2, (p.Rect.Y0+p.Rect.Y1)/2)
		_, top := s.at(0, p.Rect.Y1)
		_, bot := s.at(0, p.Rect.Y0)
		pw, ph := (p.Rect.X1-p.Rect.X0)*s.k, bot-top
		if bw > pw+6 || bh > ph+2 {
			// Too big for the pier: the name alone, or nothing (the
			// pier table lists every pier).
			lines = nil
			bw, bh = textWidth(p.Name, 2.6)+1.2, 4
			if bw > pw+0.5 || bh > ph+1 {
				s.unlabelled++
				continue
			}
		}
		b := box{cx - bw/2, cy - bh/2, cx + bw/2, cy + bh/2}
		ok := false
		for _, dy := range []float64{0, -1, 1, -2, 2} {
			c := box{b.x0, b.y0 + dy*(bh+0.8), b.x1, b.y1 + dy*(bh+0.8)}
			if !overlaps(c) && (dy == 0 || c.y0 >= top && c.y1 <= bot) {
				b, ok = c, true
				break
			}
		}
		if !ok {
			s.unlabelled++
			continue
		}
		placed = append(placed, b)
		d.rect(b.x0, b.y0, b.x1, b.y1, "fill", "#ffffff", "stroke", inkColour, "stroke-width", "0.2")
		if lines == nil {
			d.text((b.x0+b.x1)/2, b.y0+3, 2.6, p.Name, "middle", "font-weight", "bold")
			continue
		}
		y := b.y0 + 3.6
		d.text((b.x0+b.x1)/2, y, 3, p.Name, "middle", "font-weight", "bold")
		for _, l := range lines {
			y += 3.2
			d.text((b.x0+b.x1)/2, y, 2.5, l, "middle")
		}
	}
	d.close("g")
}

// pierValue is what a pier's label says besides its name.
func pierValue(in WallInput, p Pier, u report.Units) []string {
	if p.Cut {
		return []string{"no load path"}
	}
	switch in.Show {
	case Forces:
		if !in.HasLoad {
			return []string{report.SigPercent(p.Share)}
		}
		// Three significant figures, as every other view (docs/method.md §1).
		return []string{
			"V " + report.Sig(u.ForceOf(p.Shear)) + " " + u.Force,
			"M " + report.Sig(u.MomentOf(p.Moment)) + " " + u.Moment,
		}
	case Ratios:
		if in.Ratio == nil {
			return []string{"D/C n/a"}
		}
		if r, ok := in.Ratio(p.Name); ok {
			return []string{fmt.Sprintf("D/C %.2f", r)}
		}
		return []string{"D/C –"}
	}
	return []string{report.SigPercent(p.Share)}
}

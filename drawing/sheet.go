package drawing

import (
	"encoding/xml"
	"fmt"
	"math"
	"strconv"
	"strings"
	"time"
	"unicode/utf8"

	"pierwise/geometry"
	"pierwise/report"
)

// Caution is printed in every title block (docs/method.md §10).
const Caution = "Results support, and do not replace, the judgement of a licensed engineer; local codes govern."

// Entry is one line of the project table in the title block (project, job
// number, engineer, sheet …), in the order given.
type Entry struct {
	Key, Value string
}

// sheet is the paper: ANSI B (17 × 11 in) for US walls, ISO A3 for SI, both
// landscape, in millimetres.
type sheet struct {
	W, H float64
	Name string
}

func sheetFor(sys geometry.System) sheet {
	if sys == geometry.SI {
		return sheet{420, 297, "ISO A3"}
	}
	return sheet{431.8, 279.4, "ANSI B (17 × 11 in)"}
}

// Regions of the sheet (mm).
const (
	margin     = 10.0  // paper edge to the frame's outer line
	titleH     = 40.0  // height of the title block
	sideW      = 108.0 // width of the right-hand column (legend, table, scale)
	gap        = 6.0
	fontFamily = "DejaVu Sans, Helvetica, Arial, sans-serif"
)

// scale is a drawing scale: Den metres of wall per metre of paper.
type scale struct {
	Den  float64
	Name string
}

// usScales are the architect's scales (inches on paper per foot of wall),
// largest first; siScales the preferred metric ratios (ISO 5455).
var usScales = []scale{
	{12, `1" = 1'-0"`}, {16, `3/4" = 1'-0"`}, {24, `1/2" = 1'-0"`}, {32, `3/8" = 1'-0"`},
	{48, `1/4" = 1'-0"`}, {64, `3/16" = 1'-0"`}, {96, `1/8" = 1'-0"`}, {128, `3/32" = 1'-0"`},
	{192, `1/16" = 1'-0"`}, {384, `1/32" = 1'-0"`},
}

var siScales = []scale{
	{10, "1:10"}, {20, "1:20"}, {25, "1:25"}, {50, "1:50"}, {100, "1:100"}, {200, "1:200"},
	{250, "1:250"}, {500, "1:500"}, {1000, "1:1000"}, {2000, "1:2000"},
}

// chooseScale returns the largest standard scale at which a w × h (metres)
// object fits in availW × availH millimetres of paper, or a plain 1:N when
// none of them does.
func chooseScale(sys geometry.System, w, h, availW, availH float64) scale {
	list := usScales
	if sys == geometry.SI {
		list = siScales
	}
	for _, s := range list {
		if w*1000/s.Den <= availW && h*1000/s.Den <= availH {
			return s
		}
	}
	need := math.Max(w*1000/availW, h*1000/availH)
	p := math.Pow(10, math.Floor(math.Log10(need)))
	for _, m := range []float64{1, 2, 2.5, 5, 10} {
		if m*p >= need {
			n := m * p
			return scale{n, "1:" + strconv.FormatFloat(n, 'f', -1, 64)}
		}
	}
	return scale{10 * p, "1:" + strconv.FormatFloat(10*p, 'f', -1, 64)}
}

// textWidth estimates the width (mm) of s in a sans-serif font of the given
// size: 0.6 em per character, generous for DejaVu Sans, so labels placed by
// it do not collide in any common viewer.
func textWidth(s string, size float64) float64 {
	return 0.6 * size * float64(utf8.RuneCountInString(s))
}

// fit shortens s with an ellipsis until it is at most w mm wide.
func fit(s string, size, w float64) string {
	if textWidth(s, size) <= w {
		return s
	}
	r := []rune(s)
	n := int(w/(0.6*size)) - 1
	if n < 1 {
		return "…"
	}
	return string(r[:min(n, len(r))]) + "…"
}

// wrap breaks s into lines of at most w mm.
func wrap(s string, size, w float64) []string {
	var lines []string
	line := ""
	for _, word := range strings.Fields(s) {
		try := word
		if line != "" {
			try = line + " " + word
		}
		if textWidth(try, size) > w && line != "" {
			lines = append(lines, line)
			line = word
			continue
		}
		line = try
	}
	if line != "" {
		lines = append(lines, line)
	}
	return lines
}

// text writes a line of text at (x, y), y the baseline.
func (d *doc) text(x, y, size float64, s, anchor string, extra ...string) {
	kv := append([]string{"x", num(x), "y", num(y), "font-size", num(size), "text-anchor", anchor}, extra...)
	d.textEl("text", s, kv...)
}

// subText writes base, a subscript and the rest as one line of text.
func (d *doc) subText(x, y, size float64, base, sub, rest, anchor string) {
	d.open("text", "x", num(x), "y", num(y), "font-size", num(size), "text-anchor", anchor)
	d.token(xml.CharData(base))
	d.textEl("tspan", sub, "dy", num(0.3*size), "font-size", num(0.72*size))
	d.textEl("tspan", rest, "dy", num(-0.3*size))
	d.close("text")
}

// rect writes a rectangle given by two corners.
func (d *doc) rect(x0, y0, x1, y1 float64, kv ...string) {
	d.el("rect", append([]string{"x", num(math.Min(x0, x1)), "y", num(math.Min(y0, y1)),
		"width", num(math.Abs(x1 - x0)), "height", num(math.Abs(y1 - y0))}, kv...)...)
}

// line writes a straight line.
func (d *doc) line(x0, y0, x1, y1 float64, kv ...string) {
	d.el("line", append([]string{"x1", num(x0), "y1", num(y0), "x2", num(x1), "y2", num(y1)}, kv...)...)
}

// titleBlock is what the title block says.
type titleBlock struct {
	Title    string
	Lines    [][2]string // label, value: file, layout, basis, showing, …
	Project  []Entry
	Date     time.Time
	Version  string
	Scale    string
	Sheet    string
	Drawing  string // "Wall elevation", "Storey plan"
	Warnings int
}

// frame draws the sheet border and the title block.
func (d *doc) frame(sh sheet, tb titleBlock) {
	d.rect(margin, margin, sh.W-margin, sh.H-margin, "fill", "none", "stroke", "#000", "stroke-width", "0.5")
	x0, x1 := margin, sh.W-margin
	y0, y1 := sh.H-margin-titleH, sh.H-margin
	d.line(x0, y0, x1, y0, "stroke", "#000", "stroke-width", "0.5")
	// Four cells: title and file; basis, date, program; project; caution.
	w := x1 - x0
	c1 := x0 + 0.36*w
	c2 := c1 + 0.22*w
	c3 := c2 + 0.2*w
	for _, c := range []float64{c1, c2, c3} {
		d.line(c, y0, c, y1, "stroke", "#000", "stroke-width", "0.3")
	}
	d.open("g", "font-family", fontFamily, "fill", "#000")
	pad := 3.0
	y := y0 + 8
	title := tb.Title
	if title == "" {
		title = "(untitled)"
	}
	d.text(x0+pad, y, 5, fit(title, 5, c1-x0-2*pad), "start", "font-weight", "bold")
	y += 5.5
	d.text(x0+pad, y, 2.8, fit(tb.Drawing, 2.8, c1-x0-2*pad), "start")
	y += 4.5
	for _, l := range tb.Lines {
		d.text(x0+pad, y, 2.5, fit(l[0]+": "+l[1], 2.5, c1-x0-2*pad), "start")
		y += 3.6
	}
	y = y0 + 6
	for _, l := range [][2]string{
		{"Date", tb.Date.Format("2006-01-02 15:04 MST")},
		{"Program", report.Program(tb.Version)},
		{"Scale", tb.Scale},
		{"Sheet", tb.Sheet},
	} {
		d.text(c1+pad, y, 2.2, l[0], "start", "fill", "#555")
		y += 3.1
		d.text(c1+pad, y, 2.6, fit(l[1], 2.6, c2-c1-2*pad), "start")
		y += 4.4
	}
	y = y0 + 6
	d.text(c2+pad, y, 2.2, "Project", "start", "fill", "#555")
	y += 4
	if len(tb.Project) == 0 {
		d.text(c2+pad, y, 2.5, "(no project table given)", "start", "fill", "#777")
	}
	for _, e := range tb.Project {
		if y > y1-2 {
			break
		}
		d.text(c2+pad, y, 2.5, fit(e.Key+": "+e.Value, 2.5, c3-c2-2*pad), "start")
		y += 3.8
	}
	y = y0 + 6
	d.text(c3+pad, y, 2.2, "Caution", "start", "fill", "#555")
	y += 4.2
	for _, l := range wrap(Caution, 2.8, x1-c3-2*pad) {
		d.text(c3+pad, y, 2.8, l, "start", "font-weight", "bold")
		y += 3.8
	}
	if tb.Warnings > 0 {
		y += 1
		for _, l := range wrap(fmt.Sprintf("%d warning(s) about the method's assumptions for this layout: see the text report.", tb.Warnings), 2.4, x1-c3-2*pad) {
			d.text(c3+pad, y, 2.4, l, "start")
			y += 3.3
		}
	}
	d.close("g")
}

// scaleBar draws a graphic scale (it stays true when the drawing is printed
// at another size) starting at (x, y), at most maxW mm long.
func (d *doc) scaleBar(x, y, maxW float64, sys geometry.System, sc scale) {
	unit, unitName := float64(geometry.Foot), "ft"
	if sys == geometry.SI {
		unit, unitName = float64(geometry.Metre), "m"
	}
	perUnit := unit * 1000 / sc.Den // mm of paper per ft or m
	// The largest round step that puts four steps in maxW.
	step := 0.0
	for _, s := range []float64{1000, 500, 200, 100, 50, 25, 20, 10, 5, 4, 2, 1} {
		if 4*s*perUnit <= maxW {
			step = s
			break
		}
	}
	if step == 0 {
		step = 1
		for 4*step*perUnit > maxW {
			step /= 2
		}
	}
	seg := step * perUnit
	d.open("g", "font-family", fontFamily)
	for k := 0; k < 4; k++ {
		fill := "#000"
		if k%2 == 1 {
			fill = "#fff"
		}
		d.rect(x+float64(k)*seg, y, x+float64(k+1)*seg, y+1.6, "fill", fill, "stroke", "#000", "stroke-width", "0.2")
		d.text(x+float64(k)*seg, y+4.6, 2.2, strconv.FormatFloat(float64(k)*step, 'f', -1, 64), "middle")
	}
	d.text(x+4*seg, y+4.6, 2.2, strconv.FormatFloat(4*step, 'f', -1, 64)+" "+unitName, "middle")
	d.text(x, y-1.5, 2.4, "Scale "+sc.Name+" on "+sheetForName(sys), "start")
	d.close("g")
}

func sheetForName(sys geometry.System) string { return sheetFor(sys).Name }

// dimText formats a dimension: feet-inches for US walls (geometry's
// formatting), whole millimetres for SI walls, as metric drawings are
// dimensioned (ISO 129; the sheet says "dimensions in mm").
func dimText(l float64, sys geometry.System) string {
	if sys == geometry.SI {
		return strconv.FormatFloat(math.Round(l/float64(geometry.Millimetre)), 'f', 0, 64)
	}
	return geometry.FormatLength(geometry.Length(l), sys)
}

package tui

import (
	"fmt"
	"math"
	"strings"

	"github.com/charmbracelet/bubbles/help"
	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"pierwise/basis"
	"pierwise/design"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/report"
)

func init() {
	registerScreen(screenEntry{
		name: "pier design",
		key:  key.NewBinding(key.WithKeys("P"), key.WithHelp("P", "pier design: P–M curve of each pier")),
		open: func(c *common) (screen, tea.Cmd) { return newPierView(c), nil },
	})
}

// pierViewKeys are the keys of the pier design view. They implement
// help.KeyMap.
type pierViewKeys struct {
	Next, Prev key.Binding
	Back, Help key.Binding
}

func (k pierViewKeys) ShortHelp() []key.Binding {
	return []key.Binding{k.Help, k.Back, k.Next, k.Prev}
}

func (k pierViewKeys) FullHelp() [][]key.Binding { return [][]key.Binding{k.ShortHelp()} }

// pierView shows one pier's design at a time: its P–M interaction curve
// with the demand points of every check, its checks and what governs. It
// reads the same design the elevation shows, made afresh from the wall.
type pierView struct {
	c      *common
	keys   pierViewKeys
	help   help.Model
	w, h   int
	wall   *geometry.Wall
	res    *pier.Result
	design designState
	sel    int // index into design.res.Piers
	full   bool
	ver    int
}

func newPierView(c *common) *pierView {
	v := &pierView{c: c, help: help.New(), keys: pierViewKeys{
		Next: key.NewBinding(key.WithKeys("tab", "right", "l"), key.WithHelp("tab", "next pier")),
		Prev: key.NewBinding(key.WithKeys("shift+tab", "left", "h"), key.WithHelp("shift+tab", "previous pier")),
		Back: c.keys.Back,
		Help: c.keys.Help,
	}}
	v.help.ShortSeparator = "  "
	v.load()
	// Open on the governing pier: the one the engineer wants to see.
	if r := v.design.res; r != nil && r.Governing >= 0 {
		v.sel = r.Governing
	}
	return v
}

// load re-solves the document's wall (after an edit on another screen).
func (v *pierView) load() {
	v.wall = v.c.doc.wall
	v.ver = v.c.doc.version
	// On the editor's basis: the model's pier forces on the fe basis.
	b := basis.Solve(v.wall, v.c.basis, basis.Options{})
	v.res = b.View()
	v.design = checkDesign(v.wall, v.res)
	if r := v.design.res; r != nil && v.sel >= len(r.Piers) {
		v.sel = max(0, len(r.Piers)-1)
	}
}

func (v *pierView) setSize(w, h int) { v.w, v.h = w, h; v.help.Width = w }

func (v *pierView) update(msg tea.Msg) (screen, tea.Cmd) {
	switch msg := msg.(type) {
	case resumeMsg:
		if v.ver != v.c.doc.version {
			v.load()
		}
	case tea.KeyMsg:
		n := 0
		if v.design.res != nil {
			n = len(v.design.res.Piers)
		}
		switch {
		case key.Matches(msg, v.keys.Back):
			return v, popScreen()
		case key.Matches(msg, v.keys.Help):
			v.full = !v.full
		case key.Matches(msg, v.keys.Next) && n > 0:
			v.sel = (v.sel + 1) % n
		case key.Matches(msg, v.keys.Prev) && n > 0:
			v.sel = (v.sel - 1 + n) % n
		}
	}
	return v, nil
}

func (v *pierView) view() string {
	st := v.c.styles
	d := v.design
	title := " Pier design"
	var body []string
	switch {
	case v.wall.Design == nil:
		body = wrap("This wall has no [design] table: add [design] (code, wall_class, sds) and [reinforcement] to the wall file to check its piers.", v.w)
	case d.err != nil:
		body = append([]string{st.errText.Render("The piers could not be checked:")}, wrap(d.err.Error(), v.w)...)
	case d.res == nil || len(d.res.Piers) == 0:
		body = wrap("No pier to check: the classic method has no answer for this layout.", v.w)
	default:
		r := d.res
		p := &r.Piers[v.sel]
		title += fmt.Sprintf(" | %s (%d of %d) | %s, %s, %s", p.Name, v.sel+1, len(r.Piers), r.Code, r.Class, r.Kind)
		body = v.pierBody(r, p)
	}
	caution := wrap(report.DesignCaution, v.w)
	hint := v.help.View(v.keys)
	if v.full {
		hint = v.help.FullHelpView(v.keys.FullHelp())
	}
	bodyH := max(0, v.h-2-len(caution))
	parts := []string{
		fit(st.title.Render(padRight(truncate(title+" ", v.w), v.w)), v.w, 1),
		fit(strings.Join(body, "\n"), v.w, bodyH),
		fit(st.dim.Render(strings.Join(caution, "\n")), v.w, len(caution)),
		fit(hint, v.w, 1),
	}
	return strings.Join(parts, "\n")
}

// pierBody is the plot on the left and the pier's numbers on the right.
func (v *pierView) pierBody(r *design.Result, p *design.PierResult) []string {
	st := v.c.styles
	u := report.UnitsFor(v.wall.Units)
	sideW := 44
	if v.w >= 120 {
		sideW = 52
	}
	plotW := v.w - sideW - 2
	bodyH := max(6, v.h-4)
	plot := pmPlot(p, u, plotW, bodyH)

	L := func(x float64) string { return geometry.FormatLength(geometry.Length(x), v.wall.Units) }
	var side []string
	add := func(s ...string) { side = append(side, s...) }
	verdict := st.pass.Render("PASS")
	if !p.OK {
		verdict = st.fail.Render("FAIL")
	}
	add(st.heading.Render(p.Name)+fmt.Sprintf("  ratio %s ", report.Ratio(p.Ratio))+verdict,
		fmt.Sprintf("x %s to %s, %s high, %s", L(p.Rect.X0), L(p.Rect.X1), L(p.Rect.H()), p.Method))
	area := 0.0
	for _, b := range p.Bars {
		area += b.Area
	}
	add(fmt.Sprintf("%d bars, %.2f %s", len(p.Bars), u.AreaOf(area), u.Area))
	for _, s := range wrap("governs: "+report.PierGoverning(r, p), sideW) {
		add(st.dim.Render(s))
	}
	add("")
	head := fmt.Sprintf("%-5s %-3s %6s %5s %6s %5s %5s", "comb", "at", "P_u", "V_u", "M_u", "V/φV", "M/φM")
	add(st.key.Render(head))
	for i, c := range p.Checks {
		at := "bot"
		if c.Section == design.Top {
			at = "top"
		}
		mark := " "
		if i == p.Governing && p.Requirement < 0 {
			mark = "*"
		}
		add(fmt.Sprintf("%-5s %-3s %6.1f %5.1f %6.1f %5s %5s%s", report.CombinationLabel(r, c.Combination), at,
			u.ForceOf(c.Axial), u.ForceOf(c.Shear), u.MomentOf(c.Moment),
			report.Ratio(c.ShearRatio), report.Ratio(c.FlexureRatio), mark))
	}
	add(st.dim.Render(fmt.Sprintf("forces %s, moments %s; * governs", u.Force, u.Moment)))
	for _, q := range p.Require {
		mark := ""
		if !q.OK {
			mark = " " + st.fail.Render("FAIL")
		}
		for _, s := range wrap(fmt.Sprintf("%s: %s%s", q.Name, report.Ratio(q.Ratio), mark), sideW) {
			add(s)
		}
	}
	out := make([]string, max(len(plot), len(side)))
	for i := range out {
		left, right := "", ""
		if i < len(plot) {
			left = plot[i]
		}
		if i < len(side) {
			right = side[i]
		}
		out[i] = padRight(truncate(left, plotW), plotW) + "  " + truncate(right, sideW)
	}
	return out
}

// pmPlot draws a pier's design interaction curve (φP_n against φM_n) in
// braille dots, w × h cells with its axes and labels, and the demand point
// of every check on it: x inside the curve, ! outside it (a flexure ratio
// above 1), * the pier's governing check.
func pmPlot(p *design.PierResult, u report.Units, w, h int) []string {
	if w < 12 || h < 6 || p.Section == nil {
		return nil
	}
	curve := p.Section.Curve(24)
	demand := p.Demand()
	// Ranges, in report units, with the origin always shown.
	var mMax, pMin, pMax float64
	for _, pts := range [][]design.PMPoint{curve, demand} {
		for _, q := range pts {
			m, pp := math.Abs(u.MomentOf(q.M)), u.ForceOf(geometry.Force(q.P))
			mMax = math.Max(mMax, m)
			pMin, pMax = math.Min(pMin, pp), math.Max(pMax, pp)
		}
	}
	if mMax == 0 {
		mMax = 1
	}
	if pMax == pMin {
		pMax = pMin + 1
	}
	pad := 0.06 * (pMax - pMin)
	pMin, pMax, mMax = pMin-pad, pMax+pad, mMax*1.08
	labelW := max(len(num(pMax)), len(num(pMin))) + 1
	cw, ch := w-labelW, h-3 // cells of the canvas
	if cw < 6 || ch < 3 {
		return nil
	}
	cv := newBraille(cw, ch)
	toDot := func(m, pp float64) (int, int) {
		x := (m + mMax) / (2 * mMax) * float64(cv.dotsW-1)
		y := (pMax - pp) / (pMax - pMin) * float64(cv.dotsH-1)
		return int(math.Round(x)), int(math.Round(y))
	}
	// Axes.
	x0, y0 := toDot(0, 0)
	for y := 0; y < cv.dotsH; y += 2 {
		cv.set(x0, y)
	}
	for x := 0; x < cv.dotsW; x += 2 {
		cv.set(x, y0)
	}
	// The curve, segment by segment.
	for i := 1; i < len(curve); i++ {
		ax, ay := toDot(u.MomentOf(curve[i-1].M), u.ForceOf(geometry.Force(curve[i-1].P)))
		bx, by := toDot(u.MomentOf(curve[i].M), u.ForceOf(geometry.Force(curve[i].P)))
		cv.line(ax, ay, bx, by)
	}
	// Demand points over the dots, by cell.
	marks := map[[2]int]rune{}
	for i, c := range p.Checks {
		x, y := toDot(u.MomentOf(c.Moment), u.ForceOf(c.Axial))
		cell := [2]int{x / 2, y / 4}
		r := 'x'
		if c.FlexureRatio > 1 {
			r = '!'
		}
		if i == p.Governing && p.Requirement < 0 {
			r = '*'
		}
		if old, ok := marks[cell]; ok && (old == '*' || old == '!' && r == 'x') {
			continue
		}
		marks[cell] = r
	}
	lines := make([]string, 0, h)
	lines = append(lines, padLeft("P "+u.Force, labelW+4))
	for row := 0; row < ch; row++ {
		label := ""
		switch row {
		case 0:
			label = num(pMax)
		case ch - 1:
			label = num(pMin)
		case y0 / 4:
			label = "0"
		}
		var b strings.Builder
		b.WriteString(padLeft(label, labelW-1) + " ")
		for col := 0; col < cw; col++ {
			if r, ok := marks[[2]int{col, row}]; ok {
				b.WriteRune(r)
				continue
			}
			b.WriteRune(cv.cell(col, row))
		}
		lines = append(lines, b.String())
	}
	left, mid, right := num(-mMax), "M "+u.Moment, num(mMax)
	gap := max(1, cw-len(left)-len(right)-len([]rune(mid)))
	lines = append(lines, strings.Repeat(" ", labelW)+left+strings.Repeat(" ", gap/2)+mid+strings.Repeat(" ", gap-gap/2)+right)
	lines = append(lines, strings.Repeat(" ", labelW)+"x demand ! over * governs")
	return lines
}

// braille is a canvas of dots drawn as Unicode braille cells, two dots wide
// and four tall per cell.
type braille struct {
	w, h         int // cells
	dotsW, dotsH int
	bits         []uint8
}

func newBraille(w, h int) *braille {
	return &braille{w: w, h: h, dotsW: 2 * w, dotsH: 4 * h, bits: make([]uint8, w*h)}
}

// brailleBit is the bit of the dot at (x mod 2, y mod 4) in a braille cell.
var brailleBit = [4][2]uint8{{0x01, 0x08}, {0x02, 0x10}, {0x04, 0x20}, {0x40, 0x80}}

func (b *braille) set(x, y int) {
	if x < 0 || y < 0 || x >= b.dotsW || y >= b.dotsH {
		return
	}
	b.bits[(y/4)*b.w+x/2] |= brailleBit[y%4][x%2]
}

// line draws the dots from (x0, y0) to (x1, y1).
func (b *braille) line(x0, y0, x1, y1 int) {
	n := max(abs(x1-x0), abs(y1-y0))
	if n == 0 {
		b.set(x0, y0)
		return
	}
	for i := 0; i <= n; i++ {
		t := float64(i) / float64(n)
		b.set(int(math.Round(float64(x0)+t*float64(x1-x0))), int(math.Round(float64(y0)+t*float64(y1-y0))))
	}
}

func (b *braille) cell(col, row int) rune {
	v := b.bits[row*b.w+col]
	if v == 0 {
		return ' '
	}
	return rune(0x2800 + int(v))
}

func abs(x int) int {
	if x < 0 {
		return -x
	}
	return x
}

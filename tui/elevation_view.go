package tui

import (
	"fmt"
	"math"
	"path/filepath"
	"strconv"
	"strings"

	"github.com/charmbracelet/bubbles/key"
	"github.com/charmbracelet/lipgloss"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
	"pierwise/report"
	"pierwise/sketch"
)

// elevLayout places the parts of the elevation screen; the view and the
// mouse both use it.
type elevLayout struct {
	bodyY, bodyH int  // below the title bar, above the status and hint lines
	topH         int  // elevation and results panel
	areaW        int  // the elevation's share of the width
	sumX, sumW   int  // the results panel
	keyW         int  // the panel's label column
	hTop         bool // the height label above its scale, not beside it
	elevX, elevY int  // top-left cell of the sketch
	elevW, elevH int  // the box the sketch is fitted in
	tableY       int
	tableH       int
}

func (e *elevation) layout() elevLayout {
	var l elevLayout
	l.bodyY, l.bodyH = 1, max(0, e.height-3)
	l.sumW, l.keyW = 34, 12
	if e.width >= 120 {
		l.sumW = 42
	}
	l.areaW = e.width - l.sumW - 1
	l.sumX = l.areaW + 1
	rows := 0
	if r := e.bs.shown; r != nil {
		rows = len(r.Piers)
	}
	want := 2 + rows // header, rows, a blank line above
	l.topH = max(12, l.bodyH-want)
	l.topH = min(l.topH, l.bodyH)
	l.tableY = l.bodyY + l.topH + 1
	l.tableH = max(0, l.bodyH-l.topH-1)
	hLabel := geometry.FormatLength(e.wall().Height, e.wall().Units)
	l.elevX, l.elevY = 1, l.bodyY
	// The height label goes beside its scale (costing columns) or above it
	// (costing a row), whichever leaves the larger drawing: a long wall is
	// short of columns, a tall one of rows.
	l.elevW = max(3, l.areaW-l.elevX-(4+len(hLabel)))
	l.elevH = max(3, l.topH-2)
	// Above, two blanks part the label from the panel's heading beside it.
	topW, topH := max(3, l.areaW-l.elevX-5), max(3, l.topH-3)
	if L, H := float64(e.wall().Length), float64(e.wall().Height); L > 0 && H > 0 &&
		sketchScale(L, H, topW, topH) > sketchScale(L, H, l.elevW, l.elevH)*(1+1e-9) {
		l.hTop = true
		l.elevY++
		l.elevW, l.elevH = topW, topH
	}
	return l
}

// sketchScale is the columns per metre sketch.Elevation draws a wall of
// L × H metres at in a box of cols × rows cells (a cell is two columns tall).
func sketchScale(L, H float64, cols, rows int) float64 {
	return math.Min(float64(cols-1)/L, 2*float64(rows-1)/H)
}

func (e *elevation) grid(l elevLayout) *sketch.Grid {
	return sketch.Elevation(e.wall(), e.bs.shown, l.elevW, l.elevH)
}

func (e *elevation) view() string {
	st := e.c.styles
	l := e.layout()
	var body string
	switch e.mode {
	case modeHelp:
		body = e.page.view(e.c.styles, e.width, l.bodyH, e.wall().Units)
	case modeWarnings:
		body = e.warns.view(e.c.styles, e.width, l.bodyH, e.warnings())
	case modeForm:
		body = e.form.view(st, e.width, l.bodyH)
	default:
		top := lipgloss.JoinHorizontal(lipgloss.Top,
			fit(e.elevationView(l), l.areaW, l.topH), " ", fit(e.summaryView(l), l.sumW, l.topH))
		body = top
		if l.tableH > 0 {
			body += "\n\n" + fit(e.tableView(l), e.width, l.tableH)
		}
	}
	parts := []string{
		fit(e.titleView(), e.width, 1),
		fit(body, e.width, l.bodyH),
		fit(e.statusView(), e.width, 1),
		fit(e.hintView(), e.width, 1),
	}
	return strings.Join(parts, "\n")
}

func (e *elevation) titleView() string {
	w := e.wall()
	d := e.c.doc
	file := "no file yet"
	if d.path != "" {
		file = geometry.Visible(filepath.Base(d.path))
	}
	if d.dirty() {
		file += " [modified]"
	}
	title := geometry.Visible(w.Title)
	if title == "" {
		title = "untitled wall"
	}
	lay := fmt.Sprintf("layout %d/%d %s", w.Active+1, len(w.Layouts), quoteVisible(w.Layouts[w.Active].Name))
	step := "step " + geometry.FormatLength(e.stepLength(), w.Units)
	s := " " + file + " | " + lay + " | " + step + " | " + e.basisWord() + " | " + title + " | pierwise "
	return e.c.styles.title.Render(padRight(truncate(s, e.width), e.width))
}

// paint is a style split into the escape codes before and after its text,
// so the elevation can be drawn cell by cell without rendering each one.
type paint struct{ pre, post string }

func paintOf(s lipgloss.Style) paint {
	r := s.Render("\x01")
	i := strings.IndexByte(r, '\x01')
	if i < 0 {
		return paint{}
	}
	return paint{r[:i], r[i+1:]}
}

// elevationView draws the sketch with tints, the selection and the scales.
func (e *elevation) elevationView(l elevLayout) string {
	st := e.c.styles
	g := e.grid(l)
	if e.showRatios() {
		g = e.designGrid(l)
	}
	plain := paint{}
	wallP := paintOf(st.wall)
	openP := paintOf(st.opening)
	openLabelP := paintOf(st.opening.Bold(true))
	selP := paintOf(st.selected)
	boldP := paintOf(st.key)
	var tintP, tintLabelP [5]paint
	for i := range st.tint {
		tintP[i] = paintOf(st.tint[i])
		tintLabelP[i] = paintOf(st.tint[i].Bold(true))
	}
	level := func(p int) int {
		r := e.bs.shown
		if r == nil || p < 0 || p >= len(r.Piers) {
			return 0
		}
		if e.showRatios() {
			return e.ratioLevelOf(r.Piers[p].Name)
		}
		return tintLevel(r.Piers[p].Share)
	}

	var b strings.Builder
	margin := strings.Repeat(" ", l.elevX)
	hLabel := geometry.FormatLength(e.wall().Height, e.wall().Units)
	if l.hTop {
		// Above the scale, ending over its line.
		b.WriteString(strings.Repeat(" ", max(0, l.elevX+g.Cols+3-len(hLabel))) + hLabel + "\n")
	}
	for r := 0; r < g.Rows; r++ {
		b.WriteString(margin)
		cur := paint{}
		for c := 0; c < g.Cols; c++ {
			cell := g.Cells[r][c]
			ch := cell.Ch
			p := plain
			switch cell.Kind {
			case sketch.WallEdge:
				p = wallP
			case sketch.OpeningEdge, sketch.OpeningSpace:
				p = openP
				if cell.Opening == e.sel {
					// Doubled lines mark the selection without colour too.
					p = selP
					switch ch {
					case '-':
						ch = '='
					case '|':
						ch = '#'
					}
				}
			case sketch.OpeningLabel:
				p = openLabelP
				if cell.Opening == e.sel {
					p = selP
				}
			case sketch.PierFill:
				if e.showRatios() && level(cell.Pier) == len(ratioBounds)-1 {
					// A failing pier reads without colour too.
					ch, p = failFill, tintP[len(tintP)-1]
					if st.mono {
						p = plain
					}
				} else if st.mono {
					ch = tintTexture[level(cell.Pier)]
					// Keep a blank beside a label so it stands out of the texture.
					if g.At(c-1, r).Kind == sketch.PierLabel || g.At(c+1, r).Kind == sketch.PierLabel {
						ch = ' '
					}
				} else {
					p = tintP[level(cell.Pier)]
				}
			case sketch.PierLabel:
				if st.mono {
					p = boldP
				} else {
					p = tintLabelP[level(cell.Pier)]
				}
			}
			if p != cur {
				b.WriteString(cur.post)
				b.WriteString(p.pre)
				cur = p
			}
			b.WriteRune(ch)
		}
		b.WriteString(cur.post)
		// The height scale on the right.
		switch {
		case r == 0 || r == g.Rows-1:
			b.WriteString(" -+")
		case r == g.Rows/2 && !l.hTop:
			b.WriteString("  | " + hLabel)
		default:
			b.WriteString("  |")
		}
		b.WriteByte('\n')
	}
	// The length scale, then the selected opening's offset and width.
	w := e.wall()
	b.WriteString(margin + dimension(g.Cols, geometry.FormatLength(w.Length, w.Units)) + "\n")
	if e.sel >= 0 && e.sel < len(w.Openings()) {
		o := w.Openings()[e.sel]
		c0, c1 := g.Col(float64(o.X)), g.Col(float64(o.X+o.Width))
		line := ""
		if c0 > 0 {
			line = dimension(c0+1, geometry.FormatLength(o.X, w.Units))
			line = line[:len(line)-1]
		}
		line += dimension(c1-c0+1, geometry.FormatLength(o.Width, w.Units))
		b.WriteString(margin + line)
	}
	return b.String()
}

// dimension draws a dimension line n cells long, |--- label ---|, leaving
// the label out when it does not fit.
func dimension(n int, label string) string {
	switch {
	case n <= 0:
		return ""
	case n == 1:
		return "|"
	case n < len(label)+4:
		return "|" + strings.Repeat("-", n-2) + "|"
	}
	rest := n - 2 - len(label) - 2
	a := rest / 2
	return "|" + strings.Repeat("-", a) + " " + label + " " + strings.Repeat("-", rest-a) + "|"
}

// summaryView is the results panel: the wall's numbers and the FE check.
func (e *elevation) summaryView(l elevLayout) string {
	st := e.c.styles
	w := e.wall()
	u := report.UnitsFor(w.Units)
	var lines []string
	var extra [][2]int // lines that go first when the panel is short: first, count
	kv := func(k, v string) { lines = append(lines, l.kv(k, v)...) }
	kvExtra := func(k, v string) {
		n := len(lines)
		kv(k, v)
		extra = append(extra, [2]int{n, len(lines) - n})
	}
	switch {
	case !e.onFE():
		lines = append(lines, st.heading.Render("Results")+st.dim.Render(" (classic method)"))
	case e.bs.stale:
		lines = append(lines, st.heading.Render("Results")+st.note.Render(" fe: updating..."))
	default:
		lines = append(lines, st.heading.Render("Results")+st.dim.Render(" (finite-element)"))
	}
	if e.bs.shownErr != nil {
		lines = append(lines, st.errText.Render("No answer:"))
		lines = append(lines, wrap(e.bs.shownErr.Error(), l.sumW)...)
	} else if r := e.bs.shown; r != nil {
		if r.RigidityAbs > 0 {
			kv("rigidity", num(u.RigidityOf(r.RigidityAbs))+" "+u.Rigidity)
		} else {
			kv("rigidity", st.dim.Render("needs E (E: wall)"))
		}
		kv("relative", num(r.Rigidity)+" x E t")
		switch {
		case !r.HasLoad:
			kv("deflection", st.dim.Render("no shear given"))
		case r.DeflectionAbs > 0:
			kv("deflection", num(u.DeflectionOf(r.DeflectionAbs))+" "+u.Deflection)
		default:
			kv("deflection", st.dim.Render("needs E"))
		}
		if r.HasLoad && r.DeflectionAbs > 0 {
			d := r.Drift
			switch {
			case d.Missing != "":
				kv("drift", st.dim.Render("no verdict: "+d.Missing+" not given"))
			case d.Allowable > 0:
				verdict := st.pass.Render("PASS")
				rel := "<="
				if !d.OK {
					verdict, rel = st.fail.Render("FAIL"), ">"
				}
				kv("drift", num3(u.DeflectionOf(d.Design))+" "+rel+" "+num3(u.DeflectionOf(d.Allowable))+" "+u.Deflection+" "+verdict)
				kvExtra("", st.dim.Render(fmt.Sprintf("Cd %s, limit %s h_sx", input(w.Drift.Cd), input(w.Drift.Limit))))
			default:
				kv("drift", num3(u.DeflectionOf(d.Design))+" "+u.Deflection+st.dim.Render(" (no limit)"))
			}
		}
		if t := r.Split.Total(); t > 0 {
			kv("bend/shear", fmt.Sprintf("%.0f%% / %.0f%%", 100*r.Split.Bending/t, 100*r.Split.Shear/t))
		}
		if r.Moduli.E > 0 {
			kvExtra("E, E_v", geometry.FormatStress(r.Moduli.E, w.Units)+", "+geometry.FormatStress(r.Moduli.Ev, w.Units))
		}
		switch {
		case e.shear > 0: // opened from the storey screen
			kv("shear V", geometry.FormatForce(e.shear, w.Units)+st.dim.Render(" storey design"))
		case w.Load.Shear > 0:
			kvExtra("shear V", geometry.FormatForce(w.Load.Shear, w.Units))
		}
	}
	fe := e.feLines(l)
	// The count of warnings always shows, before the FE answer; ! lists
	// them all on a page of their own.
	ws := bySeverity(e.warnings())
	var count []string
	if len(ws) > 0 {
		worst := ws[0].Severity
		style := st.note
		if worst == pier.SeveritySerious {
			style = st.fail
		}
		count = []string{style.Render(fmt.Sprintf("! %d warning%s (%s): key !", len(ws), plural(len(ws)), worst))}
	}
	// On a short panel the inputs echoed above give way to the FE answer.
	for k := len(extra) - 1; k >= 0 && len(lines)+1+len(count)+len(fe) > l.topH; k-- {
		i, n := extra[k][0], extra[k][1]
		lines = append(lines[:i], lines[i+n:]...)
	}
	lines = append(lines, count...)
	if dl := e.designLines(l); dl != nil {
		lines = append(lines, "")
		lines = append(lines, dl...)
	}
	lines = append(lines, "")
	lines = append(lines, fe...)
	// Then the warnings themselves, most severe first, as far as they fit
	// (the ! page and the report have them all).
	for _, warn := range ws {
		lines = append(lines, "")
		lines = append(lines, wrap("! "+warn.Text, l.sumW)...)
	}
	return strings.Join(lines, "\n")
}

// kv is a line of the results panel: the label in its column, then the
// value. A value too long for its column starts closer to the label, or on
// the next line, so that no number is cut off.
func (l elevLayout) kv(k, v string) []string {
	vw := lipgloss.Width(v)
	switch {
	case l.keyW+vw <= l.sumW:
		return []string{padRight(k, l.keyW) + v}
	case lipgloss.Width(k)+1+vw <= l.sumW:
		return []string{padRight(k, l.sumW-vw) + v}
	}
	out := []string{k}
	for _, line := range wrap(v, l.sumW-2) {
		out = append(out, "  "+line)
	}
	return out
}

// feLines is the FE check's part of the results panel.
func (e *elevation) feLines(l elevLayout) []string {
	st := e.c.styles
	head := st.heading.Render("FE check") + st.dim.Render(" (plane stress)")
	f := e.fe
	stale := f.stale() && (f.res != nil || f.err != nil)
	if stale {
		// The numbers of the wall before the last edit, until the new
		// check answers: said, so that nobody copies them.
		head = st.heading.Render("FE check") + st.note.Render(" updating...")
	}
	switch {
	case !f.on:
		return []string{head, st.dim.Render("off: f turns it on")}
	case f.err != nil && stale:
		return []string{head, st.dim.Render("previous wall had no answer")}
	case f.err != nil:
		return append([]string{head, st.errText.Render("No answer:")}, wrap(f.err.Error(), l.sumW)...)
	case f.res == nil:
		return []string{head, st.dim.Render("solving...")}
	}
	r := f.res
	if e.onFE() && !stale {
		return e.classicCheckLines(l, r)
	}
	lines := []string{head}
	if stale {
		kv := func(k, v string) { lines = append(lines, l.kv(k, st.dim.Render(v))...) }
		kv("was", num(r.Rigidity)+" x E t")
		kv("mesh", fmt.Sprintf("%s %s, %d el.", geometry.FormatLength(r.Mesh, e.wall().Units), r.Element, r.Elements))
		return lines
	}
	kv := func(k, v string) { lines = append(lines, l.kv(k, v)...) }
	kv("relative", num(r.Rigidity)+" x E t")
	if e.res != nil && r.Rigidity > 0 {
		kv("classic is", classicIs(st, r.Difference))
	}
	kv("mesh", fmt.Sprintf("%s %s, %d el.", geometry.FormatLength(r.Mesh, e.wall().Units), r.Element, r.Elements))
	return lines
}

// classicIs says how the classic rigidity stands to the model's,
// (classic − FE)/FE, marked beyond fe.WarnDifference.
func classicIs(st *styles, d float64) string {
	word := "stiffer"
	if d < 0 {
		word = "softer"
	}
	text := fmt.Sprintf("%+.1f%% %s", 100*d, word)
	if math.Abs(d) > fe.WarnDifference {
		text = st.fail.Render(text + " !")
	}
	return text
}

// classicCheckLines is the check part of the panel on the fe basis: the
// results above are the model's, so the check is the classic method's
// rigidity beside it (docs/method.md §5).
func (e *elevation) classicCheckLines(l elevLayout, r *fe.Result) []string {
	st := e.c.styles
	lines := []string{st.heading.Render("Check") + st.dim.Render(" (classic method)")}
	kv := func(k, v string) { lines = append(lines, l.kv(k, v)...) }
	if e.res == nil {
		return append(lines, st.dim.Render("no answer for this layout"))
	}
	kv("relative", num(e.res.Rigidity)+" x E t")
	if r.Rigidity > 0 {
		kv("classic is", classicIs(st, r.Difference))
	}
	kv("model", fmt.Sprintf("%s %s, %d el.", geometry.FormatLength(r.Mesh, e.wall().Units), r.Element, r.Elements))
	return lines
}

// tableView is the pier table: every pier, scrolled by pgup and pgdown
// (e.rows) when they do not fit.
func (e *elevation) tableView(l elevLayout) string {
	st := e.c.styles
	r := e.bs.shown
	if e.onFE() && (r == nil || len(r.Piers) == 0) {
		return strings.Join(wrap("No pier table: the piers are those of the classic decomposition, which has no answer for this layout, or the model has not answered yet (see Results).", e.width), "\n")
	}
	if r == nil {
		return strings.Join(wrap("No pier table: the classic method has no answer for this layout (see Results). The FE check still runs.", e.width), "\n")
	}
	w := e.wall()
	u := report.UnitsFor(w.Units)
	fl := func(x float64) string { return geometry.FormatLength(geometry.Length(x), w.Units) }
	piers := r.Piers
	head := []string{"pier", "h", "L", "h/L", "support", "share", "V " + u.Force, "M " + u.Moment, "bend/shear", "FE share"}
	left := []bool{true, false, false, false, true, true, false, false, false, false}
	feShare := map[string]float64{}
	if f := e.fe.res; e.fe.on && f != nil && !e.fe.stale() && !e.onFE() {
		for _, p := range f.Piers {
			feShare[p.Name] = p.Share
		}
	}
	if len(feShare) == 0 {
		head, left = head[:9], left[:9]
	}
	if e.onFE() {
		head[8] = "" // the bending/shear split is the classic formula's
	}
	if e.width < 100 { // short headers so that every column fits 80 cells
		if !e.onFE() {
			head[8] = "b/s"
		}
		if len(head) > 9 {
			head[9] = "FE"
		}
	}
	rows := [][]string{}
	for _, p := range piers {
		name := p.Name
		if len(piers) == len(r.Piers) {
			name = strings.Repeat(" ", strings.Count(p.Name, ".")) + name
		}
		sup := p.Support.String()
		v, m, split := "", "", ""
		// Every pier carries its V and M (a parent's are those of the
		// whole pier, which its own piers share); the bending/shear split
		// is the formula's, so a leaf's only.
		if r.HasLoad && !p.Cut {
			v, m = num(u.ForceOf(p.Shear)), num(u.MomentOf(p.Moment))
		}
		if p.Leaf {
			if t := p.Parts.Total(); t > 0 {
				split = fmt.Sprintf("%.0f/%.0f", 100*p.Parts.Bending/t, 100*p.Parts.Shear/t)
			}
		}
		row := []string{name, fl(p.H()), fl(p.L()), fmt.Sprintf("%.2f", p.Ratio()), sup, "", v, m, split}
		if len(head) > 9 {
			fs := ""
			if s, ok := feShare[p.Name]; ok {
				fs = fmt.Sprintf("%.0f%%", 100*s)
			}
			row = append(row, fs)
		}
		rows = append(rows, row)
	}
	widths := make([]int, len(head))
	total := 0
	for i := range head {
		widths[i] = lipgloss.Width(head[i])
		for _, row := range rows {
			widths[i] = max(widths[i], lipgloss.Width(row[i]))
		}
		if i != 5 {
			total += widths[i] + 2
		}
	}
	// The share to three significant figures (docs/method.md §1), then
	// its bar.
	barW := max(4, min(30, e.width-total-7-1))
	widths[5] = 7 + barW
	for k, p := range piers {
		n := int(math.Round(p.Share * float64(barW)))
		rows[k][5] = fmt.Sprintf("%6s ", report.Sig(100*p.Share)+"%") + strings.Repeat("#", n) + strings.Repeat(".", barW-n)
		if e.showRatios() {
			rows[k][5] = e.ratioCell(p.Name, barW)
		}
	}
	if e.showRatios() {
		head[5], widths[5] = "D/C", 6+barW
	}
	line := func(cells []string) string {
		var b strings.Builder
		for i, c := range cells {
			if i > 0 {
				b.WriteString("  ")
			}
			if left[i] {
				b.WriteString(padRight(c, widths[i]))
			} else {
				b.WriteString(padLeft(c, widths[i]))
			}
		}
		return strings.TrimRight(b.String(), " ")
	}
	lines := []string{st.heading.Render(line(head))}
	room := l.tableH - 1 // rows below the header
	first, last := 0, len(piers)
	if len(piers) > room && room >= 2 {
		// One row says where the window is; the rest show piers from the
		// scroller's offset, clamped as the key handler clamps it.
		first = min(max(e.rows.off, 0), len(piers)-(room-1))
		last = first + room - 1
	}
	for k := first; k < last; k++ {
		text := line(rows[k])
		if !piers[k].Leaf {
			text = st.dim.Render(text)
		}
		lines = append(lines, text)
	}
	if last-first < len(piers) {
		lines = append(lines, st.dim.Render(fmt.Sprintf("piers %d–%d of %d: pgup pgdown scroll", first+1, last, len(piers))))
	}
	return strings.Join(lines, "\n")
}

func (e *elevation) statusView() string {
	st := e.c.styles
	if e.mode == modeAsk {
		return e.ask.view(st, e.width)
	}
	if e.msg != "" {
		if e.msgBad {
			return st.errText.Render("! " + e.msg)
		}
		return st.note.Render(e.msg)
	}
	w := e.wall()
	if e.sel < 0 || e.sel >= len(w.Openings()) {
		return st.dim.Render("no openings: d adds a door, w a window")
	}
	o := w.Openings()[e.sel]
	fl := func(l geometry.Length) string { return geometry.FormatLength(l, w.Units) }
	return st.key.Render(geometry.Visible(o.Name)) + fmt.Sprintf(" %s: x %s, sill %s, %s wide, %s high (%d of %d)",
		kindName(o.IsDoor()), fl(o.X), fl(o.Sill), fl(o.Width), fl(o.Height), e.sel+1, len(w.Openings()))
}

func (e *elevation) hintView() string {
	switch e.mode {
	case modeForm:
		return e.help.ShortHelpView(e.form.keys.ShortHelp())
	case modeHelp:
		return e.help.ShortHelpView([]key.Binding{e.keys.Help, e.c.keys.Back})
	}
	return e.help.ShortHelpView(e.keys.ShortHelp())
}

// keyHint renders bindings as "k action · k action".
func keyHint(st *styles, bs ...key.Binding) string {
	var parts []string
	for _, b := range bs {
		h := b.Help()
		parts = append(parts, st.key.Render(h.Key)+" "+h.Desc)
	}
	return strings.Join(parts, "  ")
}

func tintLegend(st *styles) string {
	var parts []string
	lo := 0.0
	for i, b := range tintBounds {
		label := fmt.Sprintf("%.0f-%.0f%%", 100*lo, math.Min(100, 100*b))
		// Non-breaking spaces inside a swatch and after it: wrap keeps
		// "[swatch] label" on one line and shows them as spaces.
		sample := st.tint[i].Render(nbsp + nbsp)
		if st.mono {
			sample = strings.Repeat(strings.ReplaceAll(string(tintTexture[i]), " ", nbsp), 2)
		}
		parts = append(parts, "["+sample+"]"+nbsp+label)
		lo = b
	}
	return "(" + strings.Join(parts, ", ") + ")"
}

func unitName(s geometry.System) string {
	if s == geometry.SI {
		return "metres"
	}
	return "feet and inches"
}

// num3 formats a result with three significant digits.
func num3(v float64) string { return report.Sig(v) }

// input formats a value the user typed, as typed.
func input(v float64) string { return strconv.FormatFloat(v, 'g', -1, 64) }

// num formats a method-level result to three significant figures, as the
// reports do (report.Sig, docs/method.md §1).
func num(v float64) string { return report.Sig(v) }

// wrap breaks s into lines of at most w cells at spaces.
func wrap(s string, w int) []string {
	var lines []string
	var cur string
	curW := 0
	words := strings.FieldsFunc(s, func(r rune) bool { return r == ' ' || r == '\n' || r == '\t' || r == '\r' })
	for _, word := range words {
		// The visible width: a styled word (a legend's swatch) counts its
		// cells, not the bytes of its colour codes.
		ww := lipgloss.Width(word)
		switch {
		case cur == "":
			cur, curW = word, ww
		case curW+1+ww <= w:
			cur += " " + word
			curW += 1 + ww
		default:
			lines = append(lines, strings.ReplaceAll(cur, nbsp, " "))
			cur, curW = word, ww
		}
	}
	if cur != "" {
		lines = append(lines, strings.ReplaceAll(cur, nbsp, " "))
	}
	return lines
}

// nbsp joins words that wrap keeps on one line; wrap prints it as a space.
const nbsp = "\u00a0"

func plural(n int) string {
	if n == 1 {
		return ""
	}
	return "s"
}

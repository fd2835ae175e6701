package tui

import (
	"context"
	"fmt"
	"io"
	"math"
	"strings"

	"github.com/charmbracelet/bubbles/help"
	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/x/ansi"

	"pierwise/geometry"
	"pierwise/pier/fe"
	"pierwise/report"
	"pierwise/study"
)

func init() {
	registerScreen(screenEntry{
		name: "sweep",
		key:  key.NewBinding(key.WithKeys("G"), key.WithHelp("G", "sweep an opening along the wall")),
		// The screen is pushed first and swept after, in sequence, so the
		// answer cannot reach the elevation before the sweep is on top.
		open: func(c *common) (screen, tea.Cmd) {
			s := newSweepScreen(c)
			return nil, tea.Sequence(pushScreen(s), s.start())
		},
	})
}

// sweepKeys are the keys of the sweep screen. They implement help.KeyMap.
type sweepKeys struct {
	Next, Prev  key.Binding // the opening to sweep
	Axis        key.Binding // x or y
	Step        key.Binding // cycle the step
	Left, Right key.Binding // move the cursor along the sweep
	Best        key.Binding // cursor to the best position
	Current     key.Binding // cursor to the current position
	Place       key.Binding // move the opening to the cursor position
	Snapshot    key.Binding // write the sweep table beside the wall file
	Back, Help  key.Binding
}

func newSweepKeys(c *common) sweepKeys {
	return sweepKeys{
		Next:     key.NewBinding(key.WithKeys("tab"), key.WithHelp("tab", "next opening")),
		Prev:     key.NewBinding(key.WithKeys("shift+tab"), key.WithHelp("shift+tab", "previous opening")),
		Axis:     key.NewBinding(key.WithKeys("a"), key.WithHelp("a", "axis x/y")),
		Step:     key.NewBinding(key.WithKeys("."), key.WithHelp(".", "step")),
		Left:     key.NewBinding(key.WithKeys("left", "h"), key.WithHelp("←/h", "cursor left")),
		Right:    key.NewBinding(key.WithKeys("right", "l"), key.WithHelp("→/l", "cursor right")),
		Best:     key.NewBinding(key.WithKeys("b"), key.WithHelp("b", "go to best")),
		Current:  key.NewBinding(key.WithKeys("c"), key.WithHelp("c", "go to current")),
		Place:    key.NewBinding(key.WithKeys("enter"), key.WithHelp("enter", "move the opening here")),
		Snapshot: key.NewBinding(key.WithKeys("p"), key.WithHelp("p", "write table")),
		Back:     c.keys.Back,
		Help:     c.keys.Help,
	}
}

func (k sweepKeys) ShortHelp() []key.Binding {
	cursor := key.NewBinding(key.WithKeys("left"), key.WithHelp("←→", "cursor"))
	place := key.NewBinding(key.WithKeys("enter"), key.WithHelp("enter", "move here"))
	return []key.Binding{k.Next, k.Axis, k.Step, cursor, k.Best, place, k.Snapshot, k.Back, k.Help}
}

func (k sweepKeys) FullHelp() [][]key.Binding {
	return [][]key.Binding{
		{k.Next, k.Prev, k.Axis, k.Step},
		{k.Left, k.Right, k.Best, k.Current},
		{k.Place, k.Snapshot, k.Back, k.Help},
	}
}

// sweepScreen moves one opening along the wall (study.Sweep) and plots the
// wall's relative rigidity and each pier's share against the position,
// marking the current position and the best one (lowest highest pier shear
// stress). The sweep runs in a command; answers for an older request are
// dropped.
type sweepScreen struct {
	c    *common
	keys sweepKeys
	help help.Model

	width, height int
	showHelp      bool

	opening int // index into the active layout's openings
	axis    study.Axis
	step    int // index into steps()

	id      int // of the latest request
	running bool
	pts     []study.Point
	err     error
	cursor  int // index into pts

	msg    string
	msgBad bool
}

// sweepStartMsg asks for the sweep of request id.
type sweepStartMsg struct{ id int }

type sweepDoneMsg struct {
	id  int
	pts []study.Point
	err error
}

func newSweepScreen(c *common) *sweepScreen {
	s := &sweepScreen{c: c, keys: newSweepKeys(c), help: help.New()}
	s.help.ShortSeparator = "  "
	s.step = defaultStep(c.doc.wall.Units)
	return s
}

func (s *sweepScreen) setSize(w, h int) {
	s.width, s.height = w, h
	s.help.Width = w
}

func (s *sweepScreen) wall() *geometry.Wall { return s.c.doc.wall }

func (s *sweepScreen) stepLength() geometry.Length {
	st := steps(s.wall().Units)
	return st[min(s.step, len(st)-1)]
}

func (s *sweepScreen) openingName() string {
	ops := s.wall().Openings()
	if s.opening < 0 || s.opening >= len(ops) {
		return ""
	}
	return ops[s.opening].Name
}

// start runs the sweep for the current choices in a command.
func (s *sweepScreen) start() tea.Cmd {
	ops := s.wall().Openings()
	s.id++
	if len(ops) == 0 {
		s.pts, s.err, s.running = nil, nil, false
		return nil
	}
	s.opening = min(max(s.opening, 0), len(ops)-1)
	s.running = true
	s.c.gate().stop() // whatever computes now is for an older request
	id := s.id
	return func() tea.Msg { return sweepStartMsg{id} }
}

// run sweeps for request id through the program's one background gate: a
// sweep still computing is cancelled first, so at most one is in flight
// however fast the keys are pressed (on the fe basis every position is a
// finite-element solve).
func (s *sweepScreen) run(id int) tea.Cmd {
	ops := s.wall().Openings()
	if len(ops) == 0 {
		return nil
	}
	w, name, axis, step := s.wall(), ops[s.opening].Name, s.axis, s.stepLength()
	opt := study.SweepOptions{Basis: s.c.basis, FE: fe.Options{Mesh: w.Check.Mesh, Element: w.Check.Element}}
	return s.c.gate().run(sweepStartMsg{id}, func(ctx context.Context) tea.Msg {
		pts, err := study.SweepContext(ctx, w, name, axis, step, opt)
		return sweepDoneMsg{id, pts, err}
	})
}

func (s *sweepScreen) update(msg tea.Msg) (screen, tea.Cmd) {
	switch msg := msg.(type) {
	case resumeMsg:
		return s, s.start()
	case sweepStartMsg:
		if msg.id == s.id {
			return s, s.run(msg.id)
		}
		return s, nil
	case sweepDoneMsg:
		if msg.id != s.id {
			return s, nil // stale
		}
		s.running, s.pts, s.err = false, msg.pts, msg.err
		s.cursor = max(0, study.CurrentIndex(s.pts))
	case snapshotDoneMsg:
		if msg.err != nil {
			s.msg, s.msgBad = "no table written: "+msg.err.Error(), true
		} else {
			s.msg, s.msgBad = snapshotSaid(msg.path), false
		}
	case tea.KeyMsg:
		if s.showHelp {
			s.showHelp = false
			return s, nil
		}
		s.msg = ""
		n := len(s.wall().Openings())
		k := s.keys
		switch {
		case key.Matches(msg, k.Back):
			s.c.gate().stop()
			return s, popScreen()
		case key.Matches(msg, k.Help):
			s.showHelp = true
		case key.Matches(msg, k.Next) && n > 0:
			s.opening = (s.opening + 1) % n
			return s, s.start()
		case key.Matches(msg, k.Prev) && n > 0:
			s.opening = (s.opening + n - 1) % n
			return s, s.start()
		case key.Matches(msg, k.Axis):
			s.axis = 1 - s.axis
			return s, s.start()
		case key.Matches(msg, k.Step):
			s.step = (s.step + 1) % len(steps(s.wall().Units))
			return s, s.start()
		case key.Matches(msg, k.Left):
			s.cursor = max(0, s.cursor-1)
		case key.Matches(msg, k.Right):
			s.cursor = min(max(len(s.pts)-1, 0), s.cursor+1)
		case key.Matches(msg, k.Best):
			if i := study.BestIndex(s.pts); i >= 0 {
				s.cursor = i
			}
		case key.Matches(msg, k.Current):
			if i := study.CurrentIndex(s.pts); i >= 0 {
				s.cursor = i
			}
		case key.Matches(msg, k.Place):
			return s, s.place()
		case key.Matches(msg, k.Snapshot):
			return s, s.snapshot()
		}
	}
	return s, nil
}

// place moves the opening to the cursor's position (one undoable change)
// and sweeps again from there.
func (s *sweepScreen) place() tea.Cmd {
	if s.running || s.cursor < 0 || s.cursor >= len(s.pts) || s.pts[s.cursor].Current {
		return nil
	}
	p, i := s.pts[s.cursor], s.opening
	err := s.c.doc.change(func(w *geometry.Wall) error {
		o := w.Openings()[i]
		o.X, o.Sill = p.X, p.Y
		if err := w.CheckOpening(i, o); err != nil {
			return err
		}
		w.Layouts[w.Active].Openings[i] = o
		return nil
	})
	if err != nil {
		s.msg, s.msgBad = "not moved: "+err.Error(), true
		return nil
	}
	w := s.wall()
	s.msg = fmt.Sprintf("moved %s to x %s, sill %s (u on the elevation undoes)", s.openingName(),
		geometry.FormatLength(p.X, w.Units), geometry.FormatLength(p.Y, w.Units))
	return s.start()
}

func (s *sweepScreen) snapshot() tea.Cmd {
	if s.running || s.err != nil || len(s.pts) == 0 {
		return nil
	}
	w, pts, path, now := s.wall(), s.pts, s.c.doc.path, s.c.now()
	name, axis, step, version := s.openingName(), s.axis, s.stepLength(), s.c.version
	return func() tea.Msg {
		out, err := writeSnapshot(path, "sweep-"+name+"-"+axis.String(), now, func(f io.Writer) error {
			if _, err := fmt.Fprintf(f, "%s, %s\n\n", report.Program(version), now.UTC().Format("2006-01-02 15:04 UTC")); err != nil {
				return err
			}
			return report.SweepTable(f, w, name, axis, step, pts)
		})
		return snapshotDoneMsg{out, err}
	}
}

func (s *sweepScreen) view() string {
	st := s.c.styles
	w := s.wall()
	title := " pierwise | sweep | basis " + s.c.basis.String() + " | " + geometry.Visible(w.Title) + " "
	lines := []string{st.title.Render(padRight(truncate(title, s.width), s.width))}
	if s.showHelp {
		lines = append(lines, "", st.heading.Render("Sweep an opening"), "")
		lines = append(lines, strings.Split(s.help.FullHelpView(s.keys.FullHelp()), "\n")...)
		lines = append(lines, "",
			"The opening moves step by step through every position where it fits;",
			"the wall is solved at each. Top: the wall's relative rigidity. Below:",
			"each pier's share of the wall shear (digits, see the legend). C marks",
			"the current position, B the one where the highest pier shear stress",
			"V/(L t) is lowest (* both at once), x a position the classic method",
			"cannot solve, ! one where it warns of something it does not at the",
			"current position (a thin strip between bands, a sliver pier...): its",
			"numbers are less reliable there, and it is taken as best only when",
			"every position is so marked. A series follows one physical pier,",
			"named by the openings on either side of it (end-W1: between the",
			"wall's left end and W1), whatever its number (P1, P2...) there.",
			"With a pier design ([design] in the wall file) the top plot is the",
			"wall's governing demand/capacity ratio D/C (dotted: 1.00), = under",
			"the axis marks where every pier passes, and B the lowest D/C.",
			"", "Any key closes this help.")
		return fit(strings.Join(lines, "\n"), s.width, s.height)
	}
	ops := w.Openings()
	if len(ops) == 0 {
		lines = append(lines, "", "This layout has no openings to sweep.", "", s.help.ShortHelpView(s.keys.ShortHelp()))
		return fit(strings.Join(lines, "\n"), s.width, s.height)
	}
	ctl := fmt.Sprintf(" opening %s (%d/%d)   axis %s   step %s   %d positions", s.openingName(), s.opening+1, len(ops),
		s.axis, geometry.FormatLength(s.stepLength(), w.Units), len(s.pts))
	if s.running {
		ctl += "   sweeping..."
	}
	lines = append(lines, st.heading.Render(truncate(geometry.Visible(ctl), s.width)))

	// Fixed rows: title, controls, axis, marks, axis ends, two info lines,
	// legend, message, help = 10; the plots share the rest, 2:3.
	designed := study.Designed(s.pts)
	fixed := 10
	if designed {
		fixed++ // the passes row
	}
	plotRows := max(6, s.height-fixed)
	rigRows := max(3, plotRows*2/5)
	shareRows := max(3, plotRows-rigRows)
	switch {
	case s.err != nil:
		lines = append(lines, st.errText.Render(truncate(geometry.Visible(s.err.Error()), s.width)))
	case len(s.pts) == 0 && !s.running:
		lines = append(lines, "The opening fits nowhere along this axis.")
	case len(s.pts) > 0:
		lines = append(lines, sweepPlot(st, s.pts, s.axis, w.Units, s.cursor, s.width, rigRows, shareRows, designed)...)
		lines = append(lines, s.info()...)
	}
	for len(lines) < s.height-2 {
		lines = append(lines, "")
	}
	lines = lines[:s.height-2]
	switch {
	case s.msg != "" && s.msgBad:
		lines = append(lines, st.errText.Render(truncate(geometry.Visible(s.msg), s.width)))
	case s.msg != "":
		lines = append(lines, st.note.Render(truncate(geometry.Visible(s.msg), s.width)))
	case s.weakHere() != "":
		lines = append(lines, st.errText.Render(ansi.Truncate(s.weakHere(), s.width, "…")))
	default:
		lines = append(lines, "")
	}
	lines = append(lines, s.help.ShortHelpView(s.keys.ShortHelp()))
	return fit(strings.Join(lines, "\n"), s.width, s.height)
}

// info describes the point under the cursor in two lines, and the legend.
func (s *sweepScreen) info() []string {
	w := s.wall()
	if s.cursor < 0 || s.cursor >= len(s.pts) {
		return nil
	}
	p := s.pts[s.cursor]
	where := fmt.Sprintf(" ^ x %s  ", geometry.FormatLength(p.X, w.Units))
	if s.axis == study.AlongY {
		where = fmt.Sprintf(" ^ sill %s  ", geometry.FormatLength(p.Y, w.Units))
	}
	if p.Err != nil {
		return []string{truncate(geometry.Visible(where+"no classic answer: "+p.Err.Error()), s.width), "", sweepLegend(s.pts, s.width)}
	}
	if len(p.Weak) > 0 {
		where += "! "
	}
	line1 := where
	if p.Designed {
		// The design first: it is what the engineer asks of a position.
		verdict := "FAILS"
		if p.Passes {
			verdict = "passes"
		}
		line1 += fmt.Sprintf("D/C %s %s, %s  ", report.Ratio(p.Ratio), p.RatioPier, verdict)
	}
	line1 += "rigidity " + report.Sig(p.Rigidity)
	if c := study.CurrentIndex(s.pts); c >= 0 && s.pts[c].Err == nil {
		if ch := report.ComparePct(s.pts[c].Rigidity, p.Rigidity); ch != "" {
			line1 += " (" + ch + ")"
		}
	}
	stressPier := p.StressPier
	for _, ps := range p.Piers {
		if ps.Name == p.StressPier {
			stressPier += " (" + ps.Key + ")"
		}
	}
	if p.MaxStress > 0 {
		line1 += fmt.Sprintf("  max stress %s %s", geometry.FormatStress(p.MaxStress, w.Units), stressPier)
	} else if p.StressPier != "" {
		line1 += "  max share/L " + stressPier
	}
	var sh []string
	for _, ps := range p.Piers {
		sh = append(sh, ps.Key+" "+report.Sig(100*ps.Share)+"%")
	}
	line2 := "   shares: " + strings.Join(sh, "  ")
	var marks []string
	if p.Current {
		marks = append(marks, "current")
	}
	if p.Best {
		marks = append(marks, "best")
	}
	if len(marks) > 0 {
		line1 += "  [" + strings.Join(marks, ", ") + "]"
	}
	return []string{truncate(geometry.Visible(line1), s.width), truncate(geometry.Visible(line2), s.width), sweepLegend(s.pts, s.width)}
}

// weakHere explains the ! of the position under the cursor in one line, or
// is "" when the position has no such mark.
func (s *sweepScreen) weakHere() string {
	if s.running || s.cursor < 0 || s.cursor >= len(s.pts) || len(s.pts[s.cursor].Weak) == 0 {
		return ""
	}
	return " ! warned here, not at the current position: " + strings.Join(s.pts[s.cursor].Weak, ", ")
}

// sweepMarker is the character that draws pier series i in the share plot.
func sweepMarker(i int) rune {
	const m = "123456789abcdefghijklmnopqrstuvwyz"
	return rune(m[i%len(m)])
}

func sweepLegend(pts []study.Point, width int) string {
	var parts []string
	for i, n := range study.PierSeries(pts) {
		parts = append(parts, fmt.Sprintf("%c %s", sweepMarker(i), n))
	}
	marks := " C current  B best"
	for _, p := range pts {
		if p.Err != nil {
			marks += "  x no answer"
			break
		}
	}
	for _, p := range pts {
		if len(p.Weak) > 0 {
			marks += "  ! less reliable"
			break
		}
	}
	// The marks first: they are few and always matter; the series list
	// may be cut on a narrow screen (the readout names the piers too).
	return truncate(geometry.Visible(marks+"   "+strings.Join(parts, "  ")), width)
}

// sweepPlot draws the two plots, the position axis and the marks row:
// relative rigidity as a braille line (rigRows rows) and each pier's share
// as digits (shareRows rows), against the swept position.
//
// With a pier design (designed) the top plot is the wall's governing
// demand/capacity ratio instead, with the 1.00 level dotted, and a row under
// the axis marks with = the positions where every pier passes.
func sweepPlot(st *styles, pts []study.Point, axis study.Axis, sys geometry.System, cursor, width, rigRows, shareRows int, designed bool) []string {
	const margin = 9 // y labels: "  0.4732 " then the axis line
	pw := max(10, width-margin-1)
	p0, p1 := float64(pts[0].Pos(axis)), float64(pts[len(pts)-1].Pos(axis))
	col := func(pos geometry.Length, cells int) int {
		if p1 <= p0 {
			return 0
		}
		return int(math.Round((float64(pos) - p0) / (p1 - p0) * float64(cells-1)))
	}

	// Rigidity (or the governing ratio): a braille canvas of pw×rigRows
	// cells, 2×4 dots each.
	value := func(p study.Point) float64 { return p.Rigidity }
	valid := func(p study.Point) bool { return p.Err == nil }
	if designed {
		value = func(p study.Point) float64 { return math.Min(p.Ratio, sweepRatioTop) }
		valid = func(p study.Point) bool { return p.Err == nil && p.Designed }
	}
	lo, hi := math.Inf(1), math.Inf(-1)
	for _, p := range pts {
		if valid(p) {
			lo, hi = math.Min(lo, value(p)), math.Max(hi, value(p))
		}
	}
	if math.IsInf(lo, 0) {
		lo, hi = 0, 1
	}
	if designed {
		lo, hi = 0, math.Max(hi*1.05, 1.2)
	}
	if hi-lo < 1e-9*math.Max(hi, 1e-12) {
		lo, hi = lo*0.99, hi*1.01+1e-12
	}
	dotsW, dotsH := pw*2, rigRows*4
	canvas := make([][]uint8, rigRows)
	for r := range canvas {
		canvas[r] = make([]uint8, pw)
	}
	bits := [4][2]uint8{{0x01, 0x08}, {0x02, 0x10}, {0x04, 0x20}, {0x40, 0x80}}
	set := func(x, y int) {
		if x < 0 || y < 0 || x >= dotsW || y >= dotsH {
			return
		}
		canvas[y/4][x/2] |= bits[y%4][x%2]
	}
	dot := func(p study.Point) (int, int) {
		x := col(p.Pos(axis), dotsW)
		y := int(math.Round((hi - value(p)) / (hi - lo) * float64(dotsH-1)))
		return x, y
	}
	if designed {
		// The 1.00 level, dotted: below it the piers pass.
		y := int(math.Round((hi - 1) / (hi - lo) * float64(dotsH-1)))
		for x := 0; x < dotsW; x += 3 {
			set(x, y)
		}
	}
	// Positions more than a step and a half apart have another opening
	// between them: the line breaks there.
	step := math.Inf(1)
	for i := 1; i < len(pts); i++ {
		step = math.Min(step, float64(pts[i].Pos(axis)-pts[i-1].Pos(axis)))
	}
	prevOK := false
	var px, py int
	for i, p := range pts {
		if !valid(p) {
			prevOK = false
			continue
		}
		if i > 0 && float64(p.Pos(axis)-pts[i-1].Pos(axis)) > 1.5*step {
			prevOK = false
		}
		x, y := dot(p)
		if prevOK {
			sweepLine(px, py, x, y, set)
		} else {
			set(x, y)
		}
		px, py, prevOK = x, y, true
	}

	var out []string
	ylab := func(r, rows int, top, bottom, name string) string {
		switch r {
		case 0:
			return fmt.Sprintf("%8s ", top)
		case rows - 1:
			return fmt.Sprintf("%8s ", bottom)
		case rows / 2:
			return fmt.Sprintf("%8s ", name)
		}
		return strings.Repeat(" ", margin)
	}
	curCol := col(pts[max(0, min(cursor, len(pts)-1))].Pos(axis), pw)
	for r := 0; r < rigRows; r++ {
		var b strings.Builder
		for c := 0; c < pw; c++ {
			ch := rune(0x2800 + int(canvas[r][c]))
			if canvas[r][c] == 0 {
				ch = ' '
				if c == curCol {
					ch = '.'
				}
			}
			b.WriteRune(ch)
		}
		top, bottom, name := report.Sig(hi), report.Sig(lo), "rigidity"
		if designed {
			top, bottom, name = fmt.Sprintf("%.2f", hi), "0", "D/C"
		}
		out = append(out, ylab(r, rigRows, top, bottom, name)+"|"+b.String())
	}

	// Shares: 0 to the largest share, rounded up to 10 %.
	top := 0.0
	for _, p := range pts {
		for _, ps := range p.Piers {
			top = math.Max(top, ps.Share)
		}
	}
	top = math.Max(0.1, math.Ceil(top*10-1e-9)/10)
	names := study.PierSeries(pts)
	index := map[string]int{}
	for i, n := range names {
		index[n] = i
	}
	grid := make([][]rune, shareRows)
	for r := range grid {
		grid[r] = []rune(strings.Repeat(" ", pw))
		grid[r][curCol] = '.'
	}
	for _, p := range pts {
		c := col(p.Pos(axis), pw)
		for _, ps := range p.Piers {
			r := int(math.Round((top - ps.Share) / top * float64(shareRows-1)))
			r = min(max(r, 0), shareRows-1)
			grid[r][c] = sweepMarker(index[ps.Key])
		}
	}
	for r := 0; r < shareRows; r++ {
		out = append(out, ylab(r, shareRows, fmt.Sprintf("%.0f%%", 100*top), "0%", "share")+"|"+string(grid[r]))
	}

	// The position axis with its ends, and the marks.
	axisName := "x"
	if axis == study.AlongY {
		axisName = "sill"
	}
	left := fmt.Sprintf("%s %s", axisName, geometry.FormatLength(geometry.Length(p0), sys))
	right := geometry.FormatLength(geometry.Length(p1), sys)
	line := []rune(strings.Repeat("-", pw))
	out = append(out, strings.Repeat(" ", margin)+"+"+string(line))
	marks := []rune(strings.Repeat(" ", pw))
	for _, p := range pts {
		switch {
		case p.Err != nil:
			marks[col(p.Pos(axis), pw)] = 'x'
		case len(p.Weak) > 0:
			marks[col(p.Pos(axis), pw)] = '!'
		}
	}
	if i := study.CurrentIndex(pts); i >= 0 {
		marks[col(pts[i].Pos(axis), pw)] = 'C'
	}
	if i := study.BestIndex(pts); i >= 0 {
		c := col(pts[i].Pos(axis), pw)
		if marks[c] == 'C' {
			marks[c] = '*'
		} else {
			marks[c] = 'B'
		}
	}
	if marks[curCol] == ' ' {
		marks[curCol] = '^'
	}
	ends := []rune(strings.Repeat(" ", margin+1))
	row := string(ends) + string(marks)
	out = append(out, row)
	if designed {
		pass := []rune(strings.Repeat(" ", pw))
		for _, p := range pts {
			if p.Designed && p.Passes && p.Err == nil {
				pass[col(p.Pos(axis), pw)] = '='
			}
		}
		out = append(out, fmt.Sprintf("%8s ", "passes")+" "+string(pass))
	}
	out = append(out, padRight(strings.Repeat(" ", margin+1)+left, margin+1+pw-len([]rune(right)))+right)
	return out
}

// sweepRatioTop caps the ratios the sweep plots, so one position far over
// capacity does not flatten the rest.
const sweepRatioTop = 3.0

// sweepLine draws a straight line of dots (Bresenham).
func sweepLine(x0, y0, x1, y1 int, set func(x, y int)) {
	dx, dy := sweepAbs(x1-x0), -sweepAbs(y1-y0)
	sx, sy := 1, 1
	if x0 > x1 {
		sx = -1
	}
	if y0 > y1 {
		sy = -1
	}
	e := dx + dy
	for {
		set(x0, y0)
		if x0 == x1 && y0 == y1 {
			return
		}
		e2 := 2 * e
		if e2 >= dy {
			e += dy
			x0 += sx
		}
		if e2 <= dx {
			e += dx
			y0 += sy
		}
	}
}

func sweepAbs(v int) int {
	if v < 0 {
		return -v
	}
	return v
}

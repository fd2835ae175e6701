package tui

import (
	"context"
	"fmt"
	"io"
	"strings"

	"github.com/charmbracelet/bubbles/help"
	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
	"pierwise/pier/fe"
	"pierwise/report"
	"pierwise/sketch"
	"pierwise/study"
)

func init() {
	registerScreen(screenEntry{
		name: "compare",
		key:  key.NewBinding(key.WithKeys("C"), key.WithHelp("C", "compare two layouts")),
		// Pushed first, FE check after, in sequence (see the sweep).
		open: func(c *common) (screen, tea.Cmd) {
			s := newCompareScreen(c)
			return nil, tea.Sequence(pushScreen(s), s.recompute())
		},
	})
}

// compareKeys are the keys of the comparison screen. They implement
// help.KeyMap.
type compareKeys struct {
	Side     key.Binding // switch which side the layout keys change
	Prev     key.Binding // previous layout on the chosen side
	Next     key.Binding // next layout on the chosen side
	Swap     key.Binding // swap before and after
	FE       key.Binding // the finite-element check on/off
	Edit     key.Binding // make the chosen side's layout active and go back
	Snapshot key.Binding // write the comparison report beside the wall file
	Back     key.Binding
	Help     key.Binding
}

func newCompareKeys(c *common) compareKeys {
	return compareKeys{
		Side:     key.NewBinding(key.WithKeys("tab", "shift+tab"), key.WithHelp("tab", "side")),
		Prev:     key.NewBinding(key.WithKeys("left", "h", "["), key.WithHelp("←/h", "previous layout")),
		Next:     key.NewBinding(key.WithKeys("right", "l", "]"), key.WithHelp("→/l", "next layout")),
		Swap:     key.NewBinding(key.WithKeys("s"), key.WithHelp("s", "swap")),
		FE:       key.NewBinding(key.WithKeys("f"), key.WithHelp("f", "FE check on/off")),
		Edit:     key.NewBinding(key.WithKeys("enter"), key.WithHelp("enter", "edit it")),
		Snapshot: key.NewBinding(key.WithKeys("p"), key.WithHelp("p", "write report")),
		Back:     c.keys.Back,
		Help:     c.keys.Help,
	}
}

func (k compareKeys) ShortHelp() []key.Binding {
	layouts := key.NewBinding(key.WithKeys("left"), key.WithHelp("←→", "layout"))
	return []key.Binding{k.Side, layouts, k.Swap, k.Snapshot, k.Edit, k.Back, k.Help}
}

func (k compareKeys) FullHelp() [][]key.Binding {
	return [][]key.Binding{{k.Side, k.Prev, k.Next, k.Swap}, {k.FE, k.Edit, k.Snapshot, k.Back, k.Help}}
}

// compareScreen shows two layouts of the wall side by side with their pier
// shares, and the table of what changed (package study does the matching,
// package report formats the rows; this screen only lays them out).
type compareScreen struct {
	c    *common
	keys compareKeys
	help help.Model

	width, height int
	showHelp      bool

	before, after int // layout indices
	right         bool

	cmp     *study.Comparison
	err     error
	version int // document version cmp belongs to

	feOn      bool // run the finite-element check on both sides
	feID      int  // of the latest request; older answers are dropped
	feRunning bool

	msg    string
	msgBad bool
}

// compareStartMsg asks for the FE comparison of request id.
type compareStartMsg struct{ id int }

// compareFEMsg brings a comparison with the FE check, computed in a command.
type compareFEMsg struct {
	id  int
	cmp *study.Comparison
	err error
}

// snapshotDoneMsg reports a snapshot written (or not) by a command.
type snapshotDoneMsg struct {
	path string
	err  error
}

func newCompareScreen(c *common) *compareScreen {
	s := &compareScreen{c: c, keys: newCompareKeys(c), help: help.New()}
	s.help.ShortSeparator = "  "
	// The first layout against the active one (or the next when the first
	// is active).
	w := c.doc.wall
	s.after = w.Active
	if w.Active == 0 && len(w.Layouts) > 1 {
		s.after = 1
	}
	s.right = true
	s.feOn = true
	s.recompute()
	return s
}

func (s *compareScreen) setSize(w, h int) {
	s.width, s.height = w, h
	s.help.Width = w
}

// recompute solves the two layouts of the current document with the
// classic method at once, and returns the command that adds the FE check
// (nil when it is off).
func (s *compareScreen) recompute() tea.Cmd {
	w := s.c.doc.wall
	n := len(w.Layouts)
	s.before = min(max(s.before, 0), n-1)
	s.after = min(max(s.after, 0), n-1)
	a, b := study.WithLayout(w, s.before), study.WithLayout(w, s.after)
	s.cmp, s.err = study.Compare(a, b)
	s.version = s.c.doc.version
	path := s.c.doc.path
	if s.cmp != nil {
		s.cmp.Before.Path, s.cmp.After.Path = path, path
	}
	s.feID++
	s.feRunning = false
	s.c.gate().stop() // whatever computes now is for an older request
	if !s.wantsModel() || s.err != nil {
		return nil
	}
	s.feRunning = true
	id := s.feID
	return func() tea.Msg { return compareStartMsg{id} }
}

// wantsModel reports whether the comparison needs the finite-element
// model: the check is on, or the basis is fe.
func (s *compareScreen) wantsModel() bool { return s.feOn || s.c.basis == geometry.BasisFE }

// startFE runs the FE comparison for request id through the program's
// one background gate: a check still computing is cancelled first, so at
// most one is in flight however fast the layout keys are pressed. On the
// fe basis the background answer is the comparison on the model
// (docs/method.md §5); the classic one shows until it arrives.
func (s *compareScreen) startFE(id int) tea.Cmd {
	w := s.c.doc.wall
	a, b := study.WithLayout(w, s.before), study.WithLayout(w, s.after)
	opt := study.Options{FE: s.feOn, Basis: s.c.basis, FEOptions: fe.Options{Mesh: w.Check.Mesh, Element: w.Check.Element}}
	path := s.c.doc.path
	return s.c.gate().run(compareStartMsg{id}, func(ctx context.Context) tea.Msg {
		c, err := study.CompareContext(ctx, a, b, opt)
		if c != nil {
			c.Before.Path, c.After.Path = path, path
		}
		return compareFEMsg{id, c, err}
	})
}

func (s *compareScreen) update(msg tea.Msg) (screen, tea.Cmd) {
	switch msg := msg.(type) {
	case resumeMsg:
		return s, s.recompute()
	case compareStartMsg:
		if msg.id == s.feID && s.wantsModel() {
			return s, s.startFE(msg.id)
		}
	case compareFEMsg:
		if msg.id != s.feID {
			break // a stale answer
		}
		s.feRunning = false
		if msg.err != nil {
			// The classic comparison stays; say why the FE columns are missing.
			s.msg, s.msgBad = "finite-element check failed: "+msg.err.Error(), true
		} else {
			s.cmp = msg.cmp
		}
	case snapshotDoneMsg:
		if msg.err != nil {
			s.msg, s.msgBad = "no report: "+msg.err.Error(), true
		} else {
			s.msg, s.msgBad = snapshotSaid(msg.path), false
		}
	case tea.KeyMsg:
		if s.showHelp {
			s.showHelp = false
			return s, nil
		}
		s.msg = ""
		n := len(s.c.doc.wall.Layouts)
		side := &s.before
		if s.right {
			side = &s.after
		}
		switch {
		case key.Matches(msg, s.keys.Back):
			s.c.gate().stop()
			return s, popScreen()
		case key.Matches(msg, s.keys.Help):
			s.showHelp = true
		case key.Matches(msg, s.keys.Side):
			s.right = !s.right
		case key.Matches(msg, s.keys.Prev):
			*side = (*side + n - 1) % n
			return s, s.recompute()
		case key.Matches(msg, s.keys.Next):
			*side = (*side + 1) % n
			return s, s.recompute()
		case key.Matches(msg, s.keys.Swap):
			s.before, s.after = s.after, s.before
			return s, s.recompute()
		case key.Matches(msg, s.keys.FE):
			s.feOn = !s.feOn
			return s, s.recompute()
		case key.Matches(msg, s.keys.Edit):
			i := *side
			if i != s.c.doc.wall.Active {
				_ = s.c.doc.change(func(w *geometry.Wall) error { w.Active = i; return nil })
			}
			s.c.gate().stop()
			return s, popScreen()
		case key.Matches(msg, s.keys.Snapshot):
			if s.cmp == nil {
				return s, nil
			}
			c, path, now, version := s.cmp, s.c.doc.path, s.c.now(), s.c.version
			return s, func() tea.Msg {
				out, err := writeSnapshot(path, "compare", now, func(f io.Writer) error {
					return report.CompareReport(f, c, report.CompareInfo{Now: now, Version: version})
				})
				return snapshotDoneMsg{out, err}
			}
		}
	}
	return s, nil
}

func (s *compareScreen) view() string {
	st := s.c.styles
	w := s.c.doc.wall
	var lines []string
	title := " pierwise | compare layouts | " + geometry.Visible(w.Title) + " "
	lines = append(lines, st.title.Render(padRight(truncate(title, s.width), s.width)))
	if s.showHelp {
		lines = append(lines, "", st.heading.Render("Compare layouts"), "")
		lines = append(lines, strings.Split(s.help.FullHelpView(s.keys.FullHelp()), "\n")...)
		lines = append(lines, "",
			"Piers are matched by the openings beside them: a pier of one layout is",
			"the pier of the other between the same openings (or wall ends), else",
			"the one it overlaps most. Names are given left to right in each layout",
			"and may differ. Share changes are in percentage points.",
			"", "Any key closes this help.")
		return fit(strings.Join(lines, "\n"), s.width, s.height)
	}
	if s.err != nil || s.cmp == nil {
		lines = append(lines, st.errText.Render(fmt.Sprint(s.err)))
		return fit(strings.Join(lines, "\n"), s.width, s.height)
	}
	c := s.cmp
	var diff []report.CompareRow
	for _, r := range report.CompareRows(c) {
		if r.Key != "layout" && r.Key != "openings" && r.Key != "fe_mesh" { // said elsewhere
			diff = append(diff, r)
		}
	}
	piers := report.ComparePierRows(c)
	// Rows: title, headings, elevations, diff table (+1 head), blank, pier
	// table (+1 head), message, help. The elevations take what is left,
	// up to half the screen; the pier table gives way below 5 rows of them.
	fixed := 1 + 1 + (len(diff) + 1) + 1 + 1 + 1
	pierRows := len(piers) + 1
	elevRows := s.height - fixed - pierRows
	if elevRows < 5 {
		pierRows = max(2, pierRows-(5-elevRows))
		elevRows = s.height - fixed - pierRows
	}
	elevRows = min(elevRows, max(5, s.height/2))

	// Headings: the chosen side is marked.
	half := (s.width - 3) / 2
	head := func(label string, chosen bool, idx int) string {
		t := fmt.Sprintf("%s %d/%d %q", map[bool]string{true: "before", false: "after"}[idx == 0], s.layoutIndex(idx)+1, len(w.Layouts), label)
		if chosen {
			return st.selected.Render(truncate("> "+t, half))
		}
		return st.heading.Render(truncate("  "+t, half))
	}
	lines = append(lines, padRight(head(c.Before.Layout(), !s.right, 0), half+3)+head(c.After.Layout(), s.right, 1))
	left := cmpGridLines(st, &c.Before, half, elevRows)
	right := cmpGridLines(st, &c.After, half, elevRows)
	for i := 0; i < max(len(left), len(right)); i++ {
		var l, r string
		if i < len(left) {
			l = left[i]
		}
		if i < len(right) {
			r = right[i]
		}
		lines = append(lines, padRight(l, half+3)+r)
	}
	lines = append(lines, cmpDiffLines(st, diff, s.width)...)
	lines = append(lines, "")
	lines = append(lines, cmpPierLines(st, piers, pierRows, s.width)...)
	for len(lines) < s.height-2 {
		lines = append(lines, "")
	}
	lines = lines[:s.height-2]
	switch {
	case s.msg != "" && s.msgBad:
		lines = append(lines, st.errText.Render(truncate(s.msg, s.width)))
	case s.msg != "":
		lines = append(lines, st.note.Render(truncate(s.msg, s.width)))
	case len(w.Layouts) < 2:
		lines = append(lines, st.note.Render(truncate("This wall has one layout: press esc, then n to make a variant.", s.width)))
	case s.feRunning && s.c.basis == geometry.BasisFE:
		lines = append(lines, st.note.Render(truncate("fe basis: updating... (classic numbers until the model answers)", s.width)))
	case s.feRunning:
		lines = append(lines, st.note.Render("finite-element check running..."))
	default:
		lines = append(lines, "")
	}
	lines = append(lines, s.help.ShortHelpView(s.keys.ShortHelp()))
	return fit(strings.Join(lines, "\n"), s.width, s.height)
}

func (s *compareScreen) layoutIndex(side int) int {
	if side == 0 {
		return s.before
	}
	return s.after
}

// cmpDiffLines lays out the differences table; a failing drift check is
// drawn in the failure style.
func cmpDiffLines(st *styles, rows []report.CompareRow, width int) []string {
	w := [4]int{len("Quantity"), len("before"), len("after"), len("change")}
	for _, r := range rows {
		for i, c := range []string{r.Quantity, r.Before, r.After, r.Change} {
			w[i] = max(w[i], len([]rune(c)))
		}
	}
	line := func(a, b, c, d string) string {
		return padRight(a, w[0]) + "  " + padLeft(b, w[1]) + "  " + padLeft(c, w[2]) + "  " + padLeft(d, w[3])
	}
	out := []string{st.heading.Render(truncate(line("", "before", "after", "change"), width))}
	for _, r := range rows {
		l := truncate(line(r.Quantity, r.Before, r.After, r.Change), width)
		if strings.Contains(r.Before+r.After, "EXCEEDS") {
			l = st.fail.Render(l)
		}
		out = append(out, l)
	}
	return out
}

// cmpPierLines lays out at most n lines of the pier table (heading
// included), with a share bar for the after layout.
func cmpPierLines(st *styles, rows []report.ComparePierRow, n, width int) []string {
	if len(rows) == 0 {
		return []string{st.note.Render("No pier table: the classic method has no answer for one of the layouts.")}
	}
	withFE := false
	for _, r := range rows {
		if r.FEBefore != "" || r.FEAfter != "" {
			withFE = true
		}
	}
	column := func(head string, f func(r report.ComparePierRow) string) []string {
		col := []string{head}
		for _, r := range rows {
			v := f(r)
			if v == "" {
				v = "-"
			}
			col = append(col, v)
		}
		return col
	}
	cols := [][]string{
		column("before", func(r report.ComparePierRow) string { return r.Before }),
		column("after", func(r report.ComparePierRow) string { return r.After }),
		column("share", func(r report.ComparePierRow) string { return r.ShareBefore }),
		column("share", func(r report.ComparePierRow) string { return r.ShareAfter }),
		column("change", func(r report.ComparePierRow) string { return r.Change }),
	}
	shear := [][]string{
		column("V before", func(r report.ComparePierRow) string { return r.ShearBefore }),
		column("V after", func(r report.ComparePierRow) string { return r.ShearAfter }),
	}
	feCols := [][]string{
		column("FE before", func(r report.ComparePierRow) string { return r.FEBefore }),
		column("FE after", func(r report.ComparePierRow) string { return r.FEAfter }),
	}
	colWidth := func(cs [][]string) int {
		n := 0
		for _, col := range cs {
			w := 0
			for _, c := range col {
				w = max(w, len([]rune(c)))
			}
			n += w + 2
		}
		return n
	}
	switch {
	case !withFE:
		cols = append(cols, shear...)
	case colWidth(cols)+colWidth(shear)+colWidth(feCols)+12 <= width:
		cols = append(append(cols, shear...), feCols...)
	default: // the FE shares take the place of the shear forces
		cols = append(cols, feCols...)
	}
	wid := make([]int, len(cols))
	for i, col := range cols {
		for _, c := range col {
			wid[i] = max(wid[i], len([]rune(c)))
		}
	}
	var out []string
	for k := 0; k <= len(rows); k++ {
		var b strings.Builder
		for i, col := range cols {
			if i > 0 {
				b.WriteString("  ")
			}
			if i < 2 {
				b.WriteString(padRight(col[k], wid[i]))
			} else {
				b.WriteString(padLeft(col[k], wid[i]))
			}
		}
		l := b.String()
		if k == 0 {
			out = append(out, st.heading.Render(truncate(l+"  note", width)))
			continue
		}
		r := rows[k-1]
		if r.Note != "" {
			l += "  " + r.Note
		}
		l = truncate(l, width)
		if r.Status != study.Kept {
			l = st.key.Render(l)
		}
		out = append(out, l)
	}
	if len(out) > n {
		more := len(out) - n + 1
		out = append(out[:n-1], st.note.Render(fmt.Sprintf("… %d more piers (p writes the full report)", more)))
	}
	return out
}

// cmpGridLines draws one layout's elevation in at most cols × rows cells,
// piers tinted by their share (textured in monochrome), like the
// elevation screen.
func cmpGridLines(st *styles, side *study.Side, cols, rows int) []string {
	if !side.OK() {
		rows-- // for the error line
	}
	g := sketch.Elevation(side.Wall, side.Result, cols, rows)
	var out []string
	for r := 0; r < g.Rows; r++ {
		var b strings.Builder
		for c := 0; c < g.Cols; c++ {
			cell := g.Cells[r][c]
			ch := string(cell.Ch)
			switch cell.Kind {
			case sketch.PierFill, sketch.PierLabel:
				if cell.Pier < 0 || side.Result == nil || cell.Pier >= len(side.Result.Piers) {
					b.WriteString(ch)
					continue
				}
				lvl := tintLevel(side.Result.Piers[cell.Pier].Share)
				if st.mono {
					if cell.Kind == sketch.PierFill {
						ch = string(tintTexture[lvl])
					}
					b.WriteString(ch)
				} else {
					b.WriteString(st.tint[lvl].Render(ch))
				}
			case sketch.OpeningEdge, sketch.OpeningLabel:
				b.WriteString(st.opening.Render(ch))
			default:
				b.WriteString(ch)
			}
		}
		out = append(out, b.String())
	}
	if !side.OK() {
		out = append(out, st.errText.Render(truncate("no classic answer: "+fmt.Sprint(side.Err), cols)))
	}
	return out
}

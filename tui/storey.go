package tui

import (
	"fmt"
	"math"
	"path/filepath"
	"strings"
	"unicode/utf8"

	"github.com/charmbracelet/bubbles/help"
	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"

	"pierwise/geometry"
	"pierwise/report"
	"pierwise/storey"
)

// EditStorey opens the storey screen on the storey file at path: the plan,
// the walls with their rigidities and design shears, and any wall in the
// elevation editor (enter). Edits to a wall update the storey numbers when
// its editor is closed (esc or q).
// opt.Version and opt.Program are used.
func EditStorey(path string, opt Options) error {
	m, err := newStoreyModel(path)
	if err != nil {
		return err
	}
	m.c.version = opt.Version
	all := append([]tea.ProgramOption{tea.WithAltScreen()}, opt.Program...)
	_, err = tea.NewProgram(m, all...).Run()
	return err
}

// newStoreyModel builds the root model with the storey screen as its first
// screen (common.doc stays nil: each wall has its own document).
func newStoreyModel(path string) (*root, error) {
	st, walls, err := storey.LoadFiles(path)
	if err != nil {
		return nil, err
	}
	files := make([]*wallFile, len(walls))
	for i, ref := range st.Walls {
		if ref.HasRigidity {
			continue
		}
		if files[i], err = readWallFile(ref); err != nil {
			return nil, err
		}
		walls[i] = files[i].wall
	}
	c := newCommon(nil, nil)
	s := newStoreyScreen(c, st, walls)
	for i, f := range files {
		if f != nil {
			s.docs[i].sum, s.docs[i].own = &f.sum, f.own
		}
	}
	return newRoot(c, s), nil
}

// wallFile is a storey's wall file as read: the wall in the storey's layout,
// the hash of the file's content (a save notices a change made on disk
// since, docs/method.md §11), and the layout the file itself names active
// when the storey picks another, so that saving leaves the file's active
// key as it was.
type wallFile struct {
	wall *geometry.Wall
	sum  geometry.Sum
	own  *ownActive
}

// readWallFile reads the wall file of ref; the wall and the hash come from
// the same bytes.
func readWallFile(ref storey.WallRef) (*wallFile, error) {
	data, err := geometry.ReadUserFile(ref.Path)
	if err != nil {
		return nil, err
	}
	w, err := geometry.Parse(ref.Path, data)
	if err != nil {
		return nil, err
	}
	f := &wallFile{wall: w, sum: geometry.SumOf(data)}
	if ref.Layout != "" {
		k := w.LayoutIndex(ref.Layout)
		if k < 0 {
			return nil, fmt.Errorf("%s has no layout %s", geometry.Visible(ref.Path), quoteVisible(ref.Layout))
		}
		f.own = &ownActive{name: w.Layouts[w.Active].Name, index: w.Active}
		w.Active = k
	}
	return f, nil
}

// storeyKeys are the keys of the storey screen; they implement help.KeyMap.
type storeyKeys struct {
	Up, Down key.Binding // select a wall
	Open     key.Binding // open the selected wall in the elevation editor
	Save     key.Binding // save every changed wall file
	Report   key.Binding // write the storey report beside the storey file
	Help     key.Binding
	Quit     key.Binding
}

func newStoreyKeys(c *common) storeyKeys {
	return storeyKeys{
		Up:     key.NewBinding(key.WithKeys("up", "k", "shift+tab"), key.WithHelp("↑/k", "previous wall")),
		Down:   key.NewBinding(key.WithKeys("down", "j", "tab"), key.WithHelp("↓/j", "next wall")),
		Open:   key.NewBinding(key.WithKeys("enter", "e"), key.WithHelp("enter", "edit wall")),
		Save:   key.NewBinding(key.WithKeys("s"), key.WithHelp("s", "save changed walls")),
		Report: key.NewBinding(key.WithKeys("p"), key.WithHelp("p", "write report")),
		Help:   c.keys.Help,
		Quit:   key.NewBinding(key.WithKeys("q"), key.WithHelp("q", "quit")),
	}
}

func (k storeyKeys) ShortHelp() []key.Binding {
	return []key.Binding{k.Down, k.Up, k.Open, k.Save, k.Report, k.Help, k.Quit}
}

func (k storeyKeys) FullHelp() [][]key.Binding {
	return [][]key.Binding{{k.Down, k.Up, k.Open}, {k.Save, k.Report, k.Help, k.Quit}}
}

// storeyScreen shows a storey: the plan with its walls, the centre of mass
// and the centre of rigidity, the table of walls with their rigidities and
// design shears, and the selected wall's piers. The numbers come from
// storey.Analyse; this screen computes nothing itself.
type storeyScreen struct {
	c    *common
	keys storeyKeys
	help help.Model

	width, height int
	showHelp      bool
	confirmQuit   bool

	st       *storey.Storey
	docs     []*document // one per wall; the elevation edits them
	versions []int       // document versions the analysis belongs to
	an       *storey.Analysis
	err      error

	sel    int
	msg    string
	msgBad bool

	ask         *choice      // a save question, or nil
	pending     []storeySave // the saves the question holds up
	pendingQuit bool         // quit when they are done
}

func newStoreyScreen(c *common, st *storey.Storey, walls []*geometry.Wall) *storeyScreen {
	s := &storeyScreen{c: c, keys: newStoreyKeys(c), help: help.New(), st: st}
	s.help.ShortSeparator = "  "
	for i, w := range walls {
		s.docs = append(s.docs, newDocument(w, st.Walls[i].Path))
	}
	s.analyse()
	return s
}

func (s *storeyScreen) setSize(w, h int) {
	s.width, s.height = w, h
	s.help.Width = w
}

// analyse runs the storey analysis on the documents' current walls.
func (s *storeyScreen) analyse() {
	walls := make([]*geometry.Wall, len(s.docs))
	s.versions = make([]int, len(s.docs))
	for i, d := range s.docs {
		walls[i], s.versions[i] = d.wall, d.version
	}
	s.an, s.err = storey.Analyse(s.st, walls)
}

func (s *storeyScreen) stale() bool {
	for i, d := range s.docs {
		if d.version != s.versions[i] {
			return true
		}
	}
	return false
}

func (s *storeyScreen) dirty() []string {
	var names []string
	for i, d := range s.docs {
		if d.dirty() {
			names = append(names, s.st.Walls[i].File)
		}
	}
	return names
}

func (s *storeyScreen) unsaved() bool { return len(s.dirty()) > 0 }

func (s *storeyScreen) update(msg tea.Msg) (screen, tea.Cmd) {
	switch msg := msg.(type) {
	case quitRequestMsg:
		s.showHelp = false
		s.confirmQuit = true
		return s, nil
	case storeySavedMsg:
		return s, s.saved(msg)
	case chosenMsg:
		return s, s.answered(msg)
	case cancelledMsg:
		s.ask, s.pending = nil, nil
		s.say("not saved")
		return s, nil
	case storeyReportMsg:
		if msg.err != nil {
			s.refuse("no report: %v", msg.err)
		} else {
			s.say("wrote %s", msg.path)
		}
		return s, nil
	case resumeMsg:
		if s.stale() {
			s.analyse()
			if s.err == nil {
				s.say("storey updated after the edit of %s", s.st.Walls[s.sel].File)
			}
		}
		if d, ref := s.docs[s.sel], s.st.Walls[s.sel]; d.path != ref.Path && !d.dirty() {
			s.say("saved as %s; the storey file still names %s", geometry.Visible(filepath.Base(d.path)), ref.File)
		}
		return s, nil
	case tea.KeyMsg:
		if s.showHelp {
			if key.Matches(msg, s.keys.Help, s.c.keys.Back, s.keys.Quit) {
				s.showHelp = false
			}
			return s, nil
		}
		if s.ask != nil {
			return s, s.ask.update(msg)
		}
		if s.confirmQuit {
			return s, s.answerQuit(msg)
		}
		s.msg = ""
		switch {
		case key.Matches(msg, s.keys.Quit):
			if len(s.dirty()) == 0 {
				return s, tea.Quit
			}
			s.confirmQuit = true
		case key.Matches(msg, s.keys.Help):
			s.showHelp = true
		case key.Matches(msg, s.keys.Down):
			s.sel = (s.sel + 1) % len(s.docs)
		case key.Matches(msg, s.keys.Up):
			s.sel = (s.sel + len(s.docs) - 1) % len(s.docs)
		case key.Matches(msg, s.keys.Open):
			if s.st.Walls[s.sel].HasRigidity {
				s.refuse("%s is given by its rigidity: it has no elevation to open", s.st.Walls[s.sel].Name)
				return s, nil
			}
			return s, s.open(s.sel)
		case key.Matches(msg, s.keys.Save):
			return s, s.saveAll(false)
		case key.Matches(msg, s.keys.Report):
			return s, s.writeReport()
		}
	}
	return s, nil
}

func (s *storeyScreen) answerQuit(msg tea.KeyMsg) tea.Cmd {
	switch msg.String() {
	case "s":
		s.confirmQuit = false
		return s.saveAll(true)
	case "y":
		return tea.Quit
	case "n", "esc":
		s.confirmQuit = false
	}
	return nil
}

// open pushes the elevation editor on wall i's document.
func (s *storeyScreen) open(i int) tea.Cmd { return s.openThen(i, nil) }

// openThen is open with then applied to the editor before it shows (to
// open its save-as form).
func (s *storeyScreen) openThen(i int, then func(e *elevation)) tea.Cmd {
	cc := *s.c
	cc.doc = s.docs[i]
	e := newElevation(&cc)
	if s.an != nil && s.err == nil && i < len(s.an.Walls) {
		// The wall under its storey design shear (docs/method.md §9); its
		// file's own load is left as it is.
		e.shear = geometry.Force(s.an.Walls[i].Design.Shear)
		e.resolve()
		e.say("%s under its storey design shear %s; esc or q returns to the storey", s.st.Walls[i].File, geometry.FormatForce(e.shear, s.st.Units))
	} else {
		e.say("%s: esc or q returns to the storey", s.st.Walls[i].File)
	}
	if then != nil {
		then(e)
	}
	return tea.Sequence(pushScreen(&storeyWall{e: e}), e.init())
}

// saveAll saves every changed wall in a command (no file is written inside
// update); quit closes the program when all were saved. Each save is the
// elevation editor's (save in save.go): a wall file changed on disk since
// it was read, or one whose comments the save would drop, stops the saves
// with a question.
func (s *storeyScreen) saveAll(quit bool) tea.Cmd {
	var jobs []storeySave
	for i, d := range s.docs {
		if d.dirty() {
			jobs = append(jobs, storeySave{i: i, req: saveRequest{path: d.path, wall: d.onDisk(), version: d.version, known: d.sum, replace: d.sum == nil}})
		}
	}
	if len(jobs) == 0 {
		s.say("no wall has unsaved changes")
		if quit {
			return tea.Quit
		}
		return nil
	}
	return saveWalls(jobs, quit)
}

// saveWalls saves jobs in order until one fails or asks.
func saveWalls(jobs []storeySave, quit bool) tea.Cmd {
	return func() tea.Msg {
		out := storeySavedMsg{quit: quit}
		for k, j := range jobs {
			a := save(j.req)
			if a.err != nil || a.ask != 0 {
				out.stop, out.rest = a, jobs[k:]
				break
			}
			j.sum = a.sum
			out.done = append(out.done, j)
		}
		return out
	}
}

// storeySave is one wall file to save, and its hash once saved.
type storeySave struct {
	i   int // the wall
	req saveRequest
	sum geometry.Sum
}

// storeySavedMsg is the answer of saveWalls: the walls saved, and the
// answer that stopped the saves (an error or a question) with the walls
// left, the first being the one it is about.
type storeySavedMsg struct {
	done []storeySave
	stop savedMsg
	rest []storeySave
	quit bool
}

// saved applies the answer of saveWalls.
func (s *storeyScreen) saved(msg storeySavedMsg) tea.Cmd {
	var names []string
	for _, j := range msg.done {
		d := s.docs[j.i]
		sum := j.sum
		d.saved, d.sum = j.req.version, &sum
		names = append(names, s.st.Walls[j.i].File)
	}
	if len(msg.rest) == 0 {
		s.say("saved %s", geometry.Visible(strings.Join(names, ", ")))
		if msg.quit {
			return tea.Quit
		}
		return nil
	}
	j := msg.rest[0]
	name := geometry.Visible(s.st.Walls[j.i].File)
	switch msg.stop.ask {
	case askChanged:
		s.ask = newChoice(askChanged, name+" changed on disk.",
			ans("r", "reload", "reload"), ans("o", "overwrite", "overwrite"), ans("S", "save as", "elsewhere"))
	case askComments:
		s.ask = newChoice(askComments, "Saving drops the comments of "+name+" (dotted keys, inline tables or multi-line strings).",
			ans("y", "save anyway", "save"), ans("S", "save as", "elsewhere"))
	case askReplace:
		s.ask = newChoice(askReplace, fmt.Sprintf("%s exists (%s). Replace it?", name, msg.stop.info),
			ans("y", "replace", "replace"), ans("n", "keep it", "cancel"))
	default:
		s.refuse("not saved: %s: %v", name, msg.stop.err)
		return nil
	}
	s.pending, s.pendingQuit = msg.rest, msg.quit
	return nil
}

// answered applies the answer to a save question about s.pending[0]:
// overwrite (or save anyway) and go on with the walls left; reload the wall
// from its file (its edits here stay in its undo history); save it
// elsewhere in its editor's save-as form; or stop.
func (s *storeyScreen) answered(msg chosenMsg) tea.Cmd {
	jobs, quit := s.pending, s.pendingQuit
	s.ask, s.pending = nil, nil
	if len(jobs) == 0 {
		return nil
	}
	j := jobs[0]
	name := s.st.Walls[j.i].File
	switch msg.what {
	case "overwrite":
		jobs[0].req.overwrite = true
	case "save":
		jobs[0].req.dropComments = true
	case "replace":
		jobs[0].req.replace = true
	case "reload":
		if err := s.reload(j.i); err != nil {
			s.refuse("not reloaded: %s: %v", name, err)
			return nil
		}
		s.say("reloaded %s (enter, then u, brings back the edits made here)", name)
		if len(jobs) == 1 {
			return nil
		}
		return saveWalls(jobs[1:], quit)
	case "elsewhere":
		s.sel = j.i
		s.say("save %s elsewhere; the storey file still names %s", name, name)
		return s.openThen(j.i, func(e *elevation) { e.openSaveAs(false) })
	default:
		s.say("not saved")
		return nil
	}
	return saveWalls(jobs, quit)
}

// reload reads wall i from its file again as a change of its document,
// and analyses the storey anew.
func (s *storeyScreen) reload(i int) error {
	f, err := readWallFile(s.st.Walls[i])
	if err != nil {
		return err
	}
	d := s.docs[i]
	_ = d.change(func(w *geometry.Wall) error { *w = *f.wall; return nil })
	d.saved, d.sum, d.own = d.version, &f.sum, f.own
	s.analyse()
	return nil
}

// writeReport writes the storey report of the walls as edited beside the
// storey file, in a command.
func (s *storeyScreen) writeReport() tea.Cmd {
	if s.err != nil {
		s.refuse("no report: %v", s.err)
		return nil
	}
	path := strings.TrimSuffix(s.st.Path, filepath.Ext(s.st.Path)) + ".report.txt"
	var b strings.Builder
	if err := storey.Report(&b, s.an, s.c.now(), s.c.version); err != nil {
		s.refuse("no report: %v", err)
		return nil
	}
	text := []byte(b.String())
	return func() tea.Msg { return storeyReportMsg{path, geometry.WriteFileAtomic(path, text)} }
}

type storeyReportMsg struct {
	path string
	err  error
}

// say and refuse set the message line; what they show is made visible
// (geometry.Visible): file names and errors may quote a file.
func (s *storeyScreen) say(format string, a ...any) {
	s.msg, s.msgBad = geometry.Visible(fmt.Sprintf(format, a...)), false
}

func (s *storeyScreen) refuse(format string, a ...any) {
	s.msg, s.msgBad = geometry.Visible(fmt.Sprintf(format, a...)), true
}

// storeyWall is the elevation editor opened from the storey screen: esc or
// q in the editor's normal mode return to the storey instead of quitting.
type storeyWall struct{ e *elevation }

func (w *storeyWall) setSize(width, height int) { w.e.setSize(width, height) }
func (w *storeyWall) view() string              { return w.e.view() }

func (w *storeyWall) update(msg tea.Msg) (screen, tea.Cmd) {
	if k, ok := msg.(tea.KeyMsg); ok && w.e.mode == modeNormal {
		if key.Matches(k, w.e.c.keys.Back, w.e.keys.Quit) {
			return w, popScreen()
		}
	}
	next, cmd := w.e.update(msg)
	if e, ok := next.(*elevation); ok {
		w.e = e
		return w, cmd
	}
	return next, cmd
}

// view draws the title bar, the plan beside the wall table, the selected
// wall's piers, the message line and the key hints.
func (s *storeyScreen) view() string {
	st := s.c.styles
	W, H := s.width, s.height
	title := fmt.Sprintf(" Storey: %s — %s  [%s, %s]", orText(geometry.Visible(s.st.Title), "untitled"), geometry.Visible(filepath.Base(s.st.Path)), s.st.Diaphragm, s.st.Basis)
	if n := len(s.dirty()); n > 0 {
		title += fmt.Sprintf("  [%d wall(s) changed]", n)
	}
	top := st.title.Render(padRight(truncate(title, W), W))

	var hint string
	switch {
	case s.ask != nil:
		hint = s.ask.view(st, W)
	case s.confirmQuit:
		hint = st.errText.Render(geometry.Visible("unsaved walls: " + strings.Join(s.dirty(), ", ") + " — s save and quit, y quit without saving, n stay"))
	default:
		hint = s.help.View(s.keys)
	}
	msg := ""
	if s.msg != "" {
		if s.msgBad {
			msg = st.errText.Render(s.msg)
		} else {
			msg = st.note.Render(s.msg)
		}
	}
	bodyH := H - 3
	var body string
	switch {
	case s.showHelp:
		body = s.help.FullHelpView(s.keys.FullHelp())
	case s.err != nil:
		body = st.errText.Render("The storey cannot be analysed:") + "\n" + lipgloss.NewStyle().Width(W).Render(geometry.Visible(s.err.Error())) +
			"\n\n" + st.note.Render("Open the wall again (enter) and fix it, or undo the change there (u).") + "\n\n" + s.wallList(W)
	default:
		planW := min(W*2/5, W-52)
		left := s.planView(planW, bodyH)
		right := s.tableView(W-planW-2, bodyH)
		body = lipgloss.JoinHorizontal(lipgloss.Top, fit(left, planW, bodyH), "  ", fit(right, W-planW-2, bodyH))
	}
	return strings.Join([]string{top, fit(body, W, bodyH), fit(msg, W, 1), fit(hint, W, 1)}, "\n")
}

// planView draws the plan sketch with the selected wall highlighted.
func (s *storeyScreen) planView(w, h int) string {
	st := s.c.styles
	g := storey.Plan(s.st, s.an, w, h-3)
	var b strings.Builder
	b.WriteString(st.heading.Render("Plan") + "\n")
	for _, row := range g.Cells {
		for _, c := range row {
			ch := string(c.Ch)
			switch {
			case c.Mark != 0:
				b.WriteString(st.key.Render(ch))
			case c.Wall == s.sel && c.Wall >= 0:
				b.WriteString(st.selected.Render(ch))
			case c.Wall >= 0:
				b.WriteString(st.wall.Render(ch))
			default:
				b.WriteString(st.dim.Render(ch))
			}
		}
		b.WriteString("\n")
	}
	b.WriteString(st.dim.Render(truncate("M mass  R rigidity  * both", w)))
	return b.String()
}

// tableView is the wall table, the centre of rigidity and the selected
// wall's piers under its design shear.
func (s *storeyScreen) tableView(w, h int) string {
	st := s.c.styles
	a := s.an
	u := report.UnitsFor(s.st.Units)
	d := a.Distribution
	var lines []string
	lines = append(lines, st.heading.Render("Walls")+st.dim.Render(fmt.Sprintf("  V = %s; shares of V", geometry.FormatForce(s.st.Shear, s.st.Units))))
	nameW := 4
	for _, wl := range a.Walls {
		nameW = max(nameW, len([]rune(geometry.Visible(wl.Name))))
	}
	nameW = min(nameW, max(w-40, 8))
	head := fmt.Sprintf("  %-*s %-3s %7s %8s %6s %-8s", nameW, "wall", "dir", "R rel", "design", "of V", "case")
	lines = append(lines, st.dim.Render(truncate(head, w)))
	for i, wl := range a.Walls {
		mark := " "
		if s.docs[i].dirty() {
			mark = "*"
		}
		dir := wl.Ref.Direction.String()
		if wl.Ref.Direction == storey.Angled {
			// Its angle when it fits the column (30°), else "a".
			dir = fmt.Sprintf("%g°", wl.Ref.AngleDeg)
			if utf8.RuneCountInString(dir) > 3 {
				dir = "a"
			}
		}
		rel := "  given"
		switch {
		case wl.FE != nil && s.st.Basis == geometry.BasisFE:
			rel = padLeft(report.Sig(wl.FE.Rigidity), 7)
		case wl.Unit != nil:
			rel = padLeft(report.Sig(wl.Unit.Rigidity), 7)
		}
		row := fmt.Sprintf("%c%s%-*s %-3s %s %8s %5s%% %-8s", storey.WallKey(i), mark, nameW, truncate(geometry.Visible(wl.Name), nameW), dir,
			rel, report.Sig(u.ForceOf(geometry.Force(wl.Design.Shear))),
			report.Sig(100*wl.Design.Shear/float64(s.st.Shear)), storey.CaseName(d, wl.Design.Case))
		row = truncate(row, w)
		if i == s.sel {
			row = st.selected.Render(padRight(row, w))
		}
		lines = append(lines, row)
	}
	lines = append(lines, st.dim.Render(fmt.Sprintf("forces in %s; * changed, not saved", u.Force)))
	lines = append(lines, "")
	lines = append(lines, fmt.Sprintf("centre of rigidity x_R %.2f, y_R %.2f %s", u.CoordOf(d.CenterOfRigidity[0]), u.CoordOf(d.CenterOfRigidity[1]), u.Coord))
	lines = append(lines, fmt.Sprintf("mass centre        x_M %.2f, y_M %.2f %s", u.CoordOf(float64(s.st.MassCenter[0])), u.CoordOf(float64(s.st.MassCenter[1])), u.Coord))
	for _, load := range []storey.Direction{storey.X, storey.Y} {
		var e [2]float64
		var worst storey.Torsion
		for _, c := range d.Cases {
			if c.Load != load {
				continue
			}
			e[(1-c.Sign)/2] = u.CoordOf(c.Eccentricity)
			if c.Torsion.Ratio > worst.Ratio {
				worst = c.Torsion
			}
		}
		ratio := "n/a"
		if !math.IsInf(worst.Ratio, 0) {
			ratio = fmt.Sprintf("%.2f", worst.Ratio)
		}
		line := fmt.Sprintf("along %s: e %.2f/%.2f %s; dmax/davg %s", load, e[0], e[1], u.Coord, ratio)
		if worst.Type != storey.Regular {
			line += " type " + worst.Type.String()
			if worst.Amplification > 1 {
				line += fmt.Sprintf(" A_x %.2f", worst.Amplification)
			}
			lines = append(lines, st.errText.Render(truncate(line, w)))
		} else {
			lines = append(lines, st.dim.Render(truncate(line, w)))
		}
	}
	lines = append(lines, "")
	sel := a.Walls[s.sel]
	lines = append(lines, st.heading.Render(truncate(geometry.Visible(sel.Name), w)))
	lines = append(lines, truncate(fmt.Sprintf("direct %s, design %s %s (%s)", report.Sig(u.ForceOf(geometry.Force(sel.Design.Direct))),
		report.Sig(u.ForceOf(geometry.Force(sel.Design.Shear))), u.Force, storey.CaseName(d, sel.Design.Case)), w))
	if sel.Drift.Checked {
		verdict := ""
		if sel.Drift.Allowable > 0 {
			verdict = " OK"
			if !sel.Drift.OK {
				verdict = " EXCEEDS"
			}
		}
		lines = append(lines, truncate(fmt.Sprintf("storey drift δ %s %s (%s h)%s", report.Sig(u.DeflectionOf(geometry.Length(sel.Drift.Design))), u.Deflection, report.Fraction(sel.Drift.Ratio), verdict), w))
	}
	if g := sel.Governing; g != nil {
		lines = append(lines, truncate(fmt.Sprintf("governing pier %s (%s), ratio %.2f", g.Pier, g.Check, g.Ratio), w))
	}
	leaves := sel.Piers
	switch {
	case sel.Wall == nil:
		lines = append(lines, truncate(fmt.Sprintf("given by its rigidity, %s %s", report.Grouped(u.RigidityOf(sel.Ref.Rigidity)), u.Rigidity), w))
	case sel.Loaded == nil:
		lines = append(lines, "classic method cannot solve it: no piers")
	case len(leaves) == 0:
		lines = append(lines, "solid wall: no piers")
	default:
		lines = append(lines, st.dim.Render(fmt.Sprintf("%-7s %5s %-10s %6s %8s %9s", "pier", "h/L", "support", "share", "V "+u.Force, "M "+u.Moment)))
	}
	room := h - len(lines)
	for i, p := range leaves {
		if i == room-1 && len(leaves) > room {
			lines = append(lines, st.dim.Render(fmt.Sprintf("… %d more piers (p writes the full report)", len(leaves)-i)))
			break
		}
		support := p.Support.String()
		lines = append(lines, truncate(fmt.Sprintf("%-7s %5.2f %-10s %5s%% %8s %9s", p.Name, p.Ratio(), support, report.Sig(100*p.Share),
			report.Sig(u.ForceOf(p.Shear)), report.Sig(u.MomentOf(p.Moment))), w))
	}
	return strings.Join(lines, "\n")
}

// wallList lists the walls when there are no numbers to show.
func (s *storeyScreen) wallList(w int) string {
	var lines []string
	for i, ref := range s.st.Walls {
		name := ref.File
		if ref.HasRigidity {
			name = ref.Name + ", given by rigidity"
		}
		row := fmt.Sprintf("%c %s (%s)", storey.WallKey(i), geometry.Visible(name), ref.Direction)
		if s.docs[i].dirty() {
			row += " *"
		}
		if i == s.sel {
			row = s.c.styles.selected.Render(row)
		}
		lines = append(lines, truncate(row, w))
	}
	return strings.Join(lines, "\n")
}

func orText(s, alt string) string {
	if strings.TrimSpace(s) == "" {
		return alt
	}
	return s
}

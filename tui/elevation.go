package tui

import (
	"errors"
	"fmt"
	"math"
	"path/filepath"
	"strconv"
	"strings"

	"github.com/charmbracelet/bubbles/help"
	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"pierwise/basis"
	"pierwise/drawing"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/report"
)

// elevation is the main screen: the wall drawn to scale with its piers'
// shares, the results panel and the pier table. Every edit re-solves the
// classic method at once; the FE check follows in the background.
type elevation struct {
	c    *common
	keys KeyMap
	help help.Model

	width, height int
	mode          elevationMode
	form          *form
	formApply     func(formSubmitted) formResult // answers the open form's submissions

	sel  int // selected opening of the active layout, -1 for none
	step int // index into steps()

	res      *pier.Result
	solveErr error
	version  int // document version res belongs to

	// shear, when positive, is the shear the wall is solved under instead
	// of its file's own load (the storey screen opens a wall under its
	// storey design shear); the document is not changed.
	shear geometry.Force

	msg    string
	msgBad bool

	fe feState
	bs basisState // the basis and what the elevation shows on it (basis.go)

	ask    *choice // the open question (modeAsk)
	page   *helpPage
	warns  *warnPage
	rows   scroller // the pier table's first row shown (pgup, pgdown)
	saving bool     // a save command is under way
	drag   drag

	design designState // the pier design of res (docs/method.md §8)
	ratios bool        // draw demand/capacity ratios instead of shares
}

type elevationMode int

const (
	modeNormal elevationMode = iota
	modeHelp
	modeForm
	modeAsk      // a question in the status line (choice)
	modeWarnings // every warning, most severe first (warnPage)
)

func newElevation(c *common) *elevation {
	e := &elevation{c: c, keys: newKeyMap(), help: help.New(), sel: -1}
	e.help.ShortSeparator = "  "
	e.page = &helpPage{keys: e.keys, close: []key.Binding{e.keys.Help, c.keys.Back, e.keys.Quit}}
	e.warns = &warnPage{close: []key.Binding{e.keys.Warnings, c.keys.Back, e.keys.Quit}}
	e.fe.on = true
	e.bs.basis, e.bs.file = c.doc.wall.Analysis.Basis, c.doc.wall.Analysis.Basis
	c.basis = e.bs.basis
	e.step = defaultStep(c.doc.wall.Units)
	if len(c.doc.wall.Openings()) > 0 {
		e.sel = 0
	}
	e.resolve()
	return e
}

func (e *elevation) init() tea.Cmd { return e.scheduleFE() }

func (e *elevation) setSize(w, h int) {
	e.width, e.height = w, h
	e.help.Width = w
	if e.form != nil {
		e.form.setWidth(w)
	}
}

// steps are the move and resize steps of the wall's unit system: the US list
// includes the 8 in module of concrete masonry units.
func steps(sys geometry.System) []geometry.Length {
	if sys == geometry.SI {
		return []geometry.Length{10 * geometry.Millimetre, 100 * geometry.Millimetre, 200 * geometry.Millimetre}
	}
	return []geometry.Length{geometry.Inch, 4 * geometry.Inch, 8 * geometry.Inch, geometry.Foot}
}

func defaultStep(sys geometry.System) int {
	if sys == geometry.SI {
		return 1 // 100 mm
	}
	return 3 // 1 ft
}

func (e *elevation) stepLength() geometry.Length {
	s := steps(e.wall().Units)
	return s[min(e.step, len(s)-1)]
}

func (e *elevation) wall() *geometry.Wall { return e.c.doc.wall }

// resolve re-solves the classic method for the document's wall and clamps
// the selection. It is the only place the editor asks pier for answers.
func (e *elevation) resolve() {
	w := e.wall()
	if e.shear > 0 {
		loaded := *w // shallow copy: pier.Solve reads the layouts only
		loaded.Load.Shear = e.shear
		w = &loaded
	}
	e.res, e.solveErr = pier.Solve(w)
	e.version = e.c.doc.version
	n := len(w.Openings())
	if e.sel >= n {
		e.sel = n - 1
	}
	if e.sel < 0 && n > 0 {
		e.sel = 0
	}
	e.supersede()
	e.refreshShown()
}

// say and refuse set the status line; what they show is made visible
// (geometry.Visible): names and errors may quote a file.
func (e *elevation) say(format string, a ...any) {
	e.msg, e.msgBad = geometry.Visible(fmt.Sprintf(format, a...)), false
}

func (e *elevation) refuse(format string, a ...any) {
	e.msg, e.msgBad = geometry.Visible(fmt.Sprintf(format, a...)), true
}

func (e *elevation) update(msg tea.Msg) (screen, tea.Cmd) {
	switch msg := msg.(type) {
	case feStartMsg, feDoneMsg:
		cmd, _ := e.feMessage(msg)
		return e, cmd
	case resumeMsg:
		if e.version != e.c.doc.version {
			e.resolve()
			return e, e.scheduleFE()
		}
		if e.fe.running {
			// The awaited answer went to the screen that was on top, or
			// that screen's own check cancelled it: ask again.
			e.supersede()
			return e, e.scheduleFE()
		}
		return e, nil
	case reportDrawnMsg:
		if msg.err != nil {
			e.refuse("no report: %v", msg.err)
		} else {
			// File names first, so a narrow window still shows them.
			e.say("wrote %s and its drawing .svg in %s", filepath.Base(msg.report), filepath.Dir(msg.report))
		}
		return e, nil
	case quitRequestMsg:
		e.askQuit()
		return e, nil
	case savedMsg:
		return e, e.saved(msg)
	case reloadedMsg:
		return e, e.reloaded(msg)
	case recoveryTickMsg:
		return e, e.recoveryTick(msg)
	case recoveryMsg:
		if msg.err != nil {
			e.refuse("no recovery copy: %v", msg.err)
		}
		return e, nil
	case chosenMsg:
		e.mode, e.ask = modeNormal, nil
		if msg.ask == askQuit {
			return e, e.quitAnswer(msg.what)
		}
		return e, e.answered(msg)
	case cancelledMsg:
		e.mode, e.ask = modeNormal, nil
		e.say("not saved")
		return e, nil
	case helpClosedMsg, warnClosedMsg:
		e.mode = modeNormal
		return e, nil
	case saveAsMsg:
		return e, e.requestSave(msg.path, msg.quit)
	case tea.MouseMsg:
		if e.mode == modeNormal {
			return e, e.mouse(msg)
		}
		return e, nil
	case tea.KeyMsg:
		switch e.mode {
		case modeHelp:
			l := e.layout()
			e.page.fitTo(l.bodyH, len(e.page.content(e.c.styles, e.width, e.wall().Units)))
			return e, e.page.update(msg)
		case modeWarnings:
			l := e.layout()
			e.warns.fitTo(l.bodyH, len(e.warns.content(e.c.styles, e.width, e.warnings())))
			return e, e.warns.update(msg)
		case modeForm:
			ev, cmd := e.form.update(msg)
			done, applied := e.formEvent(ev)
			if done {
				e.mode, e.form, e.formApply = modeNormal, nil, nil
				return e, tea.Batch(cmd, applied, e.afterEdit())
			}
			return e, cmd
		case modeAsk:
			return e, e.ask.update(msg)
		}
		return e, e.key(msg)
	}
	if e.mode == modeForm {
		_, cmd := e.form.update(msg)
		return e, cmd
	}
	return e, nil
}

// afterEdit re-solves when the document changed (by an edit, undo or redo).
func (e *elevation) afterEdit() tea.Cmd {
	if e.version == e.c.doc.version {
		return nil
	}
	e.resolve()
	return tea.Batch(e.scheduleFE(), e.scheduleRecovery())
}

// askQuit asks what to do with unsaved changes before quitting.
func (e *elevation) askQuit() {
	e.openChoice(newChoice(askQuit, "Unsaved changes.",
		ans("s", "save and quit", "save"), ans("y", "quit without saving", "quit"), ans("n,esc", "stay", "stay")), saveRequest{})
}

// quitAnswer applies the answer to askQuit.
func (e *elevation) quitAnswer(what string) tea.Cmd {
	switch what {
	case "save":
		return e.requestSave("", true)
	case "quit":
		// The user chose to lose the changes: no recovery copy either.
		if e.c.doc.path != "" {
			return tea.Sequence(clearRecovery(e.c.doc.path), tea.Quit)
		}
		return tea.Quit
	}
	e.msg = ""
	return nil
}

// openChoice shows a question in the status line; req is the save it is
// about, handed back with the answer.
func (e *elevation) openChoice(c *choice, req saveRequest) {
	c.req = req
	e.ask, e.mode = c, modeAsk
}

// saveAsMsg is the save-as form's file name, sent when it closes.
type saveAsMsg struct {
	path string
	quit bool
}

// key handles a key press in the normal mode: it tries each group of keys
// in turn (the program's, the opening's, the wall's and its layouts', then
// the screens other files register) and re-solves after an edit.
func (e *elevation) key(msg tea.KeyMsg) tea.Cmd {
	e.msg = ""
	for _, group := range []func(tea.KeyMsg) (tea.Cmd, bool){e.programKey, e.openingKey, e.wallKey, e.screenKey} {
		if cmd, ok := group(msg); ok {
			return tea.Batch(cmd, e.afterEdit())
		}
	}
	return nil
}

// programKey: quit, help, undo and redo, save, the FE check, the snapshot.
func (e *elevation) programKey(msg tea.KeyMsg) (tea.Cmd, bool) {
	k := e.keys
	switch {
	case key.Matches(msg, k.Quit):
		if !e.c.doc.dirty() {
			return tea.Quit, true
		}
		e.askQuit()
	case key.Matches(msg, k.Help):
		e.mode = modeHelp
	case key.Matches(msg, k.Warnings):
		if len(e.warnings()) == 0 {
			e.say("no warnings")
		} else {
			e.mode = modeWarnings
		}
	case key.Matches(msg, k.RowsUp, k.RowsDown):
		l := e.layout()
		if e.res != nil {
			e.rows.fitTo(l.tableH-1, len(e.res.Piers))
		}
		if key.Matches(msg, k.RowsUp) {
			e.rows.off = max(e.rows.off-max(1, l.tableH-2), 0)
		} else {
			e.rows.off = min(e.rows.off+max(1, l.tableH-2), e.rows.last())
		}
	case key.Matches(msg, k.Undo):
		if !e.c.doc.undoChange() {
			e.refuse("nothing to undo")
		} else {
			e.say("undone")
		}
	case key.Matches(msg, k.Redo):
		if !e.c.doc.redoChange() {
			e.refuse("nothing to redo")
		} else {
			e.say("redone")
		}
	case key.Matches(msg, k.Save):
		return e.requestSave("", false), true
	case key.Matches(msg, k.SaveAs):
		e.openSaveAs(false)
	case key.Matches(msg, k.Basis):
		return e.toggleBasis(), true
	case key.Matches(msg, k.FE) && e.onFE():
		e.refuse("the fe basis needs the model (b: classic basis)")
	case key.Matches(msg, k.FE):
		return e.toggleFE(), true
	case key.Matches(msg, k.Snapshot):
		return e.snapshot(), true
	default:
		return nil, false
	}
	return nil, true
}

// openingKey: select, move, resize, add, copy, delete and edit openings,
// and the step they move by.
func (e *elevation) openingKey(msg tea.KeyMsg) (tea.Cmd, bool) {
	k := e.keys
	d := e.stepLength()
	switch {
	case key.Matches(msg, k.Next):
		e.selectBy(1)
	case key.Matches(msg, k.Prev):
		e.selectBy(-1)
	case key.Matches(msg, k.Left):
		e.reshape("move", func(o *geometry.Opening) { o.X -= d })
	case key.Matches(msg, k.Right):
		e.reshape("move", func(o *geometry.Opening) { o.X += d })
	case key.Matches(msg, k.Up):
		e.reshape("move", func(o *geometry.Opening) { o.Sill += d })
	case key.Matches(msg, k.Down):
		e.reshape("move", func(o *geometry.Opening) { o.Sill -= d })
	case key.Matches(msg, k.Narrower):
		e.reshape("narrow", func(o *geometry.Opening) { o.Width -= d })
	case key.Matches(msg, k.Wider):
		e.reshape("widen", func(o *geometry.Opening) { o.Width += d })
	case key.Matches(msg, k.Taller):
		e.reshape("heighten", func(o *geometry.Opening) { o.Height += d })
	case key.Matches(msg, k.Shorter):
		e.reshape("shorten", func(o *geometry.Opening) { o.Height -= d })
	case key.Matches(msg, k.Step):
		e.step = (e.step + 1) % len(steps(e.wall().Units))
		e.say("step %s", geometry.FormatLength(e.stepLength(), e.wall().Units))
	case key.Matches(msg, k.AddDoor):
		e.add(true)
	case key.Matches(msg, k.AddWindow):
		e.add(false)
	case key.Matches(msg, k.Copy):
		e.duplicate()
	case key.Matches(msg, k.Delete):
		e.deleteOpening()
	case key.Matches(msg, k.EditOpening):
		e.openOpeningForm()
	default:
		return nil, false
	}
	return nil, true
}

// wallKey: the wall form and the layouts.
func (e *elevation) wallKey(msg tea.KeyMsg) (tea.Cmd, bool) {
	k := e.keys
	switch {
	case key.Matches(msg, k.EditWall):
		e.openWallForm()
	case key.Matches(msg, k.NextLayout):
		e.switchLayout(1)
	case key.Matches(msg, k.PrevLayout):
		e.switchLayout(-1)
	case key.Matches(msg, k.NewLayout):
		e.newLayout()
	case key.Matches(msg, k.RenameLayout):
		e.openRenameForm()
	case key.Matches(msg, k.DelLayout):
		e.deleteLayout()
	case key.Matches(msg, k.Ratios):
		e.toggleRatios()
	case key.Matches(msg, k.DesignForm):
		e.openDesignForm()
	default:
		return nil, false
	}
	return nil, true
}

// screenKey opens a screen another file registered (registerScreen).
func (e *elevation) screenKey(msg tea.KeyMsg) (tea.Cmd, bool) {
	for _, s := range screenEntries {
		if key.Matches(msg, s.key) {
			next, cmd := s.open(e.c)
			if next == nil {
				return cmd, true
			}
			// In sequence: the screen must be on top before the
			// answer of its first background command arrives.
			return tea.Sequence(pushScreen(next), cmd), true
		}
	}
	return nil, false
}

func (e *elevation) selectBy(d int) {
	n := len(e.wall().Openings())
	if n == 0 {
		e.refuse("no openings: d adds a door, w a window")
		return
	}
	e.sel = ((e.sel+d)%n + n) % n
}

// reshape applies f to the selected opening when the result is a valid
// opening of the wall, and says why not otherwise.
func (e *elevation) reshape(verb string, f func(o *geometry.Opening)) {
	w := e.wall()
	if e.sel < 0 || e.sel >= len(w.Openings()) {
		e.refuse("no opening selected: d adds a door, w a window")
		return
	}
	was := w.Openings()[e.sel]
	o := was
	f(&o)
	// Steps are exact in the user's units; drop the binary noise of the
	// sums so that three 1 ft steps off a 3 ft width leave zero, not 1e-16.
	for k, l := range []*geometry.Length{&o.X, &o.Sill, &o.Width, &o.Height} {
		if *l != [4]geometry.Length{was.X, was.Sill, was.Width, was.Height}[k] {
			*l = geometry.Length(math.Round(float64(*l)*1e9) / 1e9)
		}
	}
	err := e.c.doc.change(func(w *geometry.Wall) error {
		if err := w.CheckOpening(e.sel, o); err != nil {
			return err
		}
		w.Layouts[w.Active].Openings[e.sel] = o
		return nil
	})
	if err != nil {
		e.refuse("can't %s %s: %s", verb, o.Name, shortReason(err))
	}
}

// shortReason turns a validation error into a few words for the status line.
func shortReason(err error) string {
	s := err.Error()
	if i := strings.LastIndex(s, ": "); i >= 0 && i+2 < len(s) {
		s = s[i+2:]
	}
	return s
}

// newOpening is a door or window of a common size for the wall's units,
// shrunk to fit a small wall.
func newOpening(w *geometry.Wall, door bool) geometry.Opening {
	ft := geometry.Foot
	var o geometry.Opening
	switch {
	case door && w.Units == geometry.SI:
		o = geometry.Opening{Width: 0.9, Height: 2.1}
	case door:
		o = geometry.Opening{Width: 3 * ft, Height: 7 * ft}
	case w.Units == geometry.SI:
		o = geometry.Opening{Sill: 0.9, Width: 1.2, Height: 1.2}
	default:
		o = geometry.Opening{Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft}
	}
	if top := 0.8 * w.Height; o.Sill+o.Height > top {
		o.Height = top - o.Sill
		if o.Height <= 0 {
			o.Sill, o.Height = 0.2*w.Height, 0.4*w.Height
		}
	}
	o.Width = min(o.Width, 0.3*w.Length)
	o.X = 0.05 * w.Length
	o.Name = nextName(w, door)
	return o
}

// nextName is the first unused D<n> or W<n> of the active layout.
func nextName(w *geometry.Wall, door bool) string { return w.NextOpeningName(w.Active, door) }

func (e *elevation) add(door bool) {
	w := e.wall()
	o, ok := e.place(newOpening(w, door))
	if !ok {
		e.refuse("no free place for a %s: make room or edit its size (e)", kindName(door))
		return
	}
	e.insert(o)
}

// place finds where a new opening goes: in the widest solid piece with at
// least one masonry module of pier each side (8 in, 200 mm; the current
// step for concrete), on the grid of the current step
// (geometry.PlaceNew); where no piece is wide enough, anywhere it does not
// overlap another opening (FreeSpot).
func (e *elevation) place(o geometry.Opening) (geometry.Opening, bool) {
	w := e.wall()
	margin := e.stepLength()
	switch w.Material.Kind {
	case geometry.ConcreteMasonry, geometry.ClayMasonry:
		margin = 8 * geometry.Inch // the nominal module of a concrete masonry unit
		if w.Units == geometry.SI {
			margin = 200 * geometry.Millimetre
		}
	}
	if p, ok := w.PlaceNew(o, margin, e.stepLength()); ok {
		return p, true
	}
	return w.FreeSpot(o)
}

func (e *elevation) insert(o geometry.Opening) {
	err := e.c.doc.change(func(w *geometry.Wall) error {
		if err := w.CheckOpening(-1, o); err != nil {
			return err
		}
		w.Layouts[w.Active].Openings = append(w.Layouts[w.Active].Openings, o)
		return nil
	})
	if err != nil {
		e.refuse("can't add %s: %s", o.Name, shortReason(err))
		return
	}
	e.sel = len(e.wall().Openings()) - 1
	e.say("added %s %s", kindName(o.IsDoor()), o.Name)
}

func kindName(door bool) string {
	if door {
		return "door"
	}
	return "window"
}

func (e *elevation) duplicate() {
	w := e.wall()
	if e.sel < 0 || e.sel >= len(w.Openings()) {
		e.refuse("no opening selected")
		return
	}
	o := w.Openings()[e.sel]
	o.Name = nextName(w, o.IsDoor())
	o.X += o.Width
	o, ok := e.place(o)
	if !ok {
		e.refuse("no free place for a copy of %s", w.Openings()[e.sel].Name)
		return
	}
	e.insert(o)
}

func (e *elevation) deleteOpening() {
	w := e.wall()
	if e.sel < 0 || e.sel >= len(w.Openings()) {
		e.refuse("no opening selected")
		return
	}
	i := e.sel
	name := w.Openings()[i].Name
	_ = e.c.doc.change(func(w *geometry.Wall) error {
		l := &w.Layouts[w.Active]
		l.Openings = append(l.Openings[:i], l.Openings[i+1:]...)
		return nil
	})
	if i > 0 {
		e.sel = i - 1
	}
	e.say("deleted %s (u undoes)", name)
}

func (e *elevation) switchLayout(d int) {
	w := e.wall()
	n := len(w.Layouts)
	if n < 2 {
		e.refuse("only one layout: n makes a copy of it")
		return
	}
	next := ((w.Active+d)%n + n) % n
	e.c.doc.view(next)
	e.sel = 0
	e.say("layout %s", quoteVisible(e.wall().Layouts[next].Name))
}

func (e *elevation) newLayout() {
	w := e.wall()
	name := uniqueLayoutName(w, w.Layouts[w.Active].Name+" copy")
	_ = e.c.doc.change(func(w *geometry.Wall) error {
		cur := w.Layouts[w.Active]
		w.Layouts = append(w.Layouts, geometry.Layout{Name: name, Openings: append([]geometry.Opening(nil), cur.Openings...)})
		w.Active = len(w.Layouts) - 1
		return nil
	})
	e.say("new layout %q (r renames it)", name)
}

func uniqueLayoutName(w *geometry.Wall, base string) string {
	used := map[string]bool{}
	for _, l := range w.Layouts {
		used[l.Name] = true
	}
	name := base
	for i := 2; used[name]; i++ {
		name = base + " " + strconv.Itoa(i)
	}
	return name
}

func (e *elevation) deleteLayout() {
	w := e.wall()
	if len(w.Layouts) < 2 {
		e.refuse("can't delete the only layout")
		return
	}
	name := w.Layouts[w.Active].Name
	_ = e.c.doc.change(func(w *geometry.Wall) error {
		i := w.Active
		w.Layouts = append(w.Layouts[:i], w.Layouts[i+1:]...)
		w.Active = max(0, i-1)
		return nil
	})
	e.sel = 0
	e.say("deleted layout %q (u undoes)", name)
}

// snapshot writes the text report of the current layout and its SVG
// drawing next to the wall file (new, timestamped files each time), in the
// background.
func (e *elevation) snapshot() tea.Cmd {
	d := e.c.doc
	in := report.Input{Path: d.path, Wall: d.wall, Result: e.res, Err: e.solveErr, Now: e.c.now(), Version: e.c.version, Unsaved: d.dirty()}
	if e.fe.on && !e.fe.running && !e.fe.stale() {
		in.FE, in.FEErr = e.fe.res, e.fe.err
	}
	if e.onFE() {
		if e.bs.stale {
			e.refuse("no report: the finite-element model is still solving this wall; try again in a moment")
			return nil
		}
		in.Basis = &basis.Result{Basis: geometry.BasisFE, Wall: d.wall, Classic: e.res, ClassicErr: e.solveErr, FE: e.fe.res, FEErr: e.fe.err}
	}
	draw := drawing.WallInput{Path: d.path, Unsaved: in.Unsaved, Wall: d.wall, Basis: "classic strip method", Piers: drawing.LeafPiers(e.bs.shown),
		Now: in.Now, Version: e.c.version}
	for _, p := range d.wall.Project.Entries() {
		draw.Project = append(draw.Project, drawing.Entry{Key: p[0], Value: p[1]})
	}
	if e.onFE() {
		draw.Basis, draw.FE = "plane-stress finite-element model", true
	}
	if r := e.bs.shown; r != nil {
		draw.HasLoad, draw.Warnings = r.HasLoad, pier.Texts(e.res.Warnings)
		if e.onFE() {
			draw.Warnings = e.fe.res.Warnings
		}
	} else if e.bs.shownErr != nil {
		draw.NoAnswer = e.bs.shownErr.Error()
	}
	e.say("writing the report...")
	return func() tea.Msg {
		out, svg, err := writeReportAndDrawing(in, draw)
		return reportDrawnMsg{out, svg, err}
	}
}

// drag is a mouse drag of an opening: where it started, in wall
// coordinates, and the opening as it was.
type drag struct {
	on     bool
	moved  bool
	i      int
	x0, y0 float64
	was    geometry.Opening
}

// mouse selects the opening under a click and drags it by whole steps.
func (e *elevation) mouse(msg tea.MouseMsg) tea.Cmd {
	l := e.layout()
	g := e.grid(l)
	col, row := msg.X-l.elevX, msg.Y-l.elevY
	switch {
	case msg.Action == tea.MouseActionPress && msg.Button == tea.MouseButtonLeft:
		cell := g.At(col, row)
		if cell.Opening < 0 {
			return nil
		}
		e.sel, e.msg = cell.Opening, ""
		e.drag = drag{on: true, i: cell.Opening, x0: g.X(col), y0: g.Y(row), was: e.wall().Openings()[cell.Opening]}
	case msg.Action == tea.MouseActionMotion && e.drag.on:
		d := &e.drag
		if d.i >= len(e.wall().Openings()) {
			d.on = false
			return nil
		}
		step := float64(e.stepLength())
		snap := func(v float64) geometry.Length { return geometry.Length(math.Round(v/step) * step) }
		o := d.was
		o.X += snap(g.X(col) - d.x0)
		o.Sill += snap(g.Y(row) - d.y0)
		if o.X < 0 || o.Sill < 0 || o == e.wall().Openings()[d.i] {
			return nil
		}
		apply := e.c.doc.change
		if d.moved {
			apply = e.c.doc.amend
		}
		err := apply(func(w *geometry.Wall) error {
			if err := w.CheckOpening(d.i, o); err != nil {
				return err
			}
			w.Layouts[w.Active].Openings[d.i] = o
			return nil
		})
		if err != nil {
			e.refuse("can't move %s: %s", o.Name, shortReason(err))
			return nil
		}
		d.moved = true
		e.msg = ""
		return e.afterEdit()
	case msg.Action == tea.MouseActionRelease:
		e.drag = drag{}
	}
	return nil
}

var errNoName = errors.New("a name is required")

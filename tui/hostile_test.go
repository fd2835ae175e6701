package tui

import (
	"context"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/demo"
	"pierwise/geometry"
	"pierwise/pier/fe"
)

// openEditor saves w at a new file in a temporary directory and opens it as
// EditFile would (its content hashed).
func openEditor(t *testing.T, w *geometry.Wall) (*editor, string) {
	t.Helper()
	path := filepath.Join(t.TempDir(), "wall.toml")
	if err := geometry.Save(path, w); err != nil {
		t.Fatal(err)
	}
	w2, data, _, err := openFile(path)
	if err != nil {
		t.Fatal(err)
	}
	m := newModel(w2, Options{Path: path, Content: data})
	m.Update(tea.WindowSizeMsg{Width: 100, Height: 30})
	return &editor{t: t, m: m}, path
}

// Save as onto an existing file asks first; n keeps the file, y replaces it.
func TestSaveAsAsksBeforeReplacing(t *testing.T) {
	ed, _ := openEditor(t, annex())
	other := filepath.Join(t.TempDir(), "other.toml")
	three := demo.Wall()
	if err := geometry.Save(other, three); err != nil {
		t.Fatal(err)
	}
	before, _ := os.ReadFile(other)
	ed.do(runes("S"))
	ed.typeText(other)
	ed.do(keyEnter)
	e := ed.elev()
	if e.mode != modeAsk || e.ask.ask != askReplace {
		t.Fatalf("no question before replacing: mode %v, %q", e.mode, e.msg)
	}
	if v := ed.view(); !strings.Contains(v, "other.toml exists (a wall with") || !strings.Contains(v, "Replace it?") {
		t.Errorf("the question does not say what is there:\n%s", v)
	}
	ed.do(runes("n"))
	if after, _ := os.ReadFile(other); string(after) != string(before) {
		t.Fatal("n replaced the file")
	}
	ed.do(runes("S"))
	ed.typeText(other)
	ed.do(keyEnter, runes("y"))
	got, err := geometry.LoadFile(other)
	if err != nil || len(got.Layouts) != len(annex().Layouts) {
		t.Fatalf("y did not replace it: %v", err)
	}
	if ed.m.c.doc.path != other || ed.m.c.doc.dirty() {
		t.Errorf("document now %q, dirty %v", ed.m.c.doc.path, ed.m.c.doc.dirty())
	}
}

// A wall is never written over a storey file, even when asked to.
func TestSaveNeverOverAStoreyFile(t *testing.T) {
	ed, _ := openEditor(t, annex())
	st := filepath.Join(t.TempDir(), "storey.toml")
	content := "title = \"s\"\n[storey]\nshear = \"10kip\"\n\n[[wall]]\nfile = \"wall.toml\"\ndirection = \"x\"\nposition = \"0ft\"\n"
	if err := os.WriteFile(st, []byte(content), 0o644); err != nil {
		t.Fatal(err)
	}
	ed.do(runes("S"))
	ed.typeText(st)
	ed.do(keyEnter)
	if e := ed.elev(); !strings.Contains(e.msg, "storey file") {
		t.Errorf("message %q does not say why", e.msg)
	}
	ed.do(runes("y"))
	if b, _ := os.ReadFile(st); string(b) != content {
		t.Fatal("the storey file was replaced by a wall")
	}
}

// A change made on disk by another program is noticed by content before
// saving: r reloads (u brings the edits back), o overwrites.
func TestChangedOnDisk(t *testing.T) {
	ed, path := openEditor(t, annex())
	ed.do(runes("l"))
	theirs := annex()
	theirs.Title = "changed elsewhere"
	if err := geometry.Save(path, theirs); err != nil {
		t.Fatal(err)
	}
	ed.do(runes("s"))
	if e := ed.elev(); e.mode != modeAsk || e.ask.ask != askChanged {
		t.Fatalf("no question about the change on disk: %q", e.msg)
	}
	ed.do(runes("r"))
	if ed.wall().Title != "changed elsewhere" || ed.m.c.doc.dirty() {
		t.Fatalf("reload: title %q, dirty %v", ed.wall().Title, ed.m.c.doc.dirty())
	}
	ed.do(runes("u"))
	if ed.wall().Title == "changed elsewhere" {
		t.Fatal("u did not bring back the wall as edited here")
	}
	ed.do(runes("s"), runes("o"))
	got, err := geometry.LoadFile(path)
	if err != nil || got.Title == "changed elsewhere" {
		t.Fatalf("o did not overwrite: %v %q", err, got.Title)
	}
	// Saved: the next save does not ask again.
	ed.do(runes("l"), runes("s"))
	if e := ed.elev(); e.mode == modeAsk || ed.m.c.doc.dirty() {
		t.Errorf("a save after a save asked or failed: %q", e.msg)
	}
}

// Saving over a file whose comments would be lost says so first.
func TestCommentsLostAsks(t *testing.T) {
	ed, path := openEditor(t, annex())
	data, _ := os.ReadFile(path)
	odd := "# keep me\nmaterial.kind = \"concrete-masonry\"\n" + strings.Replace(string(data), "kind = \"concrete-masonry\"\n", "", 1)
	if _, err := geometry.Parse(path, []byte(odd)); err != nil {
		t.Skipf("the dotted-key variant does not parse here: %v", err)
	}
	if err := os.WriteFile(path, []byte(odd), 0o644); err != nil {
		t.Fatal(err)
	}
	w, data2, _, err := openFile(path)
	if err != nil {
		t.Fatal(err)
	}
	ed.m = newModel(w, Options{Path: path, Content: data2})
	ed.m.Update(tea.WindowSizeMsg{Width: 80, Height: 24})
	ed.do(runes("l"), runes("s"))
	if e := ed.elev(); e.mode != modeAsk || e.ask.ask != askComments {
		t.Skipf("comments were kept (mode %v, %q): nothing to ask", e.mode, e.msg)
	}
	// At 80 columns the question's text gives way to its keys.
	lines := strings.Split(ed.view(), "\n")
	if q := lines[len(lines)-2]; !strings.Contains(q, "S save as") || !strings.Contains(q, "esc cancel") {
		t.Errorf("the question's keys do not show at 80 columns:\n%s", q)
	}
	ed.do(runes("y"))
	if ed.m.c.doc.dirty() {
		t.Error("y did not save")
	}
}

// The recovery copy: written after an edit, said at the next start, removed
// by a save; a crash writes it at once.
func TestRecoveryFile(t *testing.T) {
	ed, path := openEditor(t, annex())
	ed.press(runes("l"))
	e := ed.elev()
	cmpDrain(ed.m, e.recoveryTick(recoveryTickMsg{ed.m.c.doc.version}))
	rec := recoveryPath(path)
	got, err := geometry.LoadFile(rec)
	if err != nil {
		t.Fatalf("no recovery copy: %v", err)
	}
	if !near(float64(got.Openings()[0].X), float64(ed.wall().Openings()[0].X)) {
		t.Error("the recovery copy is not the wall as edited")
	}
	if n := recoveryNotice(path); !strings.Contains(n, "wall.recover.toml") {
		t.Errorf("start notice %q", n)
	}
	ed.do(runes("s"))
	if _, err := os.Stat(rec); !os.IsNotExist(err) {
		t.Errorf("the recovery copy stays after a save: %v", err)
	}
	ed.press(runes("l"))
	if err := crashed(tea.ErrProgramPanic, ed.m.c.doc); !strings.Contains(err.Error(), "wall.recover.toml") {
		t.Errorf("crash: %v", err)
	}
	if _, err := geometry.LoadFile(rec); err != nil {
		t.Errorf("no recovery copy after a crash: %v", err)
	}
}

// Behind the "window too small" notice only quit and help act
// (regression: x deleted an opening there).
func TestTooSmallKeys(t *testing.T) {
	ed := newEditor(t, annex(), "", 60, 20)
	n := len(ed.wall().Openings())
	for _, k := range []string{"x", "l", "d", "u", "s", "q", "n"} {
		if cmd := ed.press(runes(k)); cmd != nil {
			t.Errorf("%s returned a command behind the notice", k)
		}
	}
	ed.press(tea.MouseMsg{X: 10, Y: 5, Action: tea.MouseActionPress, Button: tea.MouseButtonLeft})
	if len(ed.wall().Openings()) != n || ed.m.c.doc.dirty() {
		t.Fatal("a key changed the wall behind the notice")
	}
	ed.press(runes("?"))
	if !strings.Contains(ed.view(), "Only ctrl+c and ? act here") {
		t.Errorf("? did not explain:\n%s", ed.view())
	}
	if cmd := ed.press(tea.KeyMsg{Type: tea.KeyCtrlC}); cmd == nil || !isQuit(cmd) {
		t.Error("ctrl+c did not quit")
	}
	// With unsaved changes, a second ctrl+c quits.
	ed = newEditor(t, annex(), "", 100, 30)
	ed.press(runes("l"))
	ed.press(tea.WindowSizeMsg{Width: 40, Height: 10})
	if cmd := ed.press(tea.KeyMsg{Type: tea.KeyCtrlC}); cmd != nil {
		t.Error("ctrl+c with unsaved changes quit at once")
	}
	if !strings.Contains(ed.view(), "again quits") {
		t.Errorf("notice does not say:\n%s", ed.view())
	}
	if cmd := ed.press(tea.KeyMsg{Type: tea.KeyCtrlC}); cmd == nil || !isQuit(cmd) {
		t.Error("second ctrl+c did not quit")
	}
}

// At most one FE check computes: a start while another runs cancels it and
// waits for it to return before starting; the panel says its numbers are
// of the wall before the edit.
func TestFEOneInFlight(t *testing.T) {
	ed := newEditor(t, annex(), "", 100, 30)
	e := ed.elev()
	g := e.c.fe
	// A check that runs until cancelled.
	ctx, cancel := context.WithCancel(context.Background())
	done := make(chan struct{})
	g.cancel, g.done = cancel, done
	release := make(chan struct{}) // the old check returns only when the test says
	go func() { <-ctx.Done(); <-release; close(done) }()
	ed.press(feDoneMsg{id: e.fe.id, res: &fakeFE})
	ed.press(runes("l"))
	if !strings.Contains(ed.view(), "updating...") {
		t.Errorf("the stale answer is not marked:\n%s", ed.view())
	}
	cmd := ed.press(feStartMsg{id: e.fe.id})
	if cmd == nil {
		t.Fatal("no command")
	}
	got := make(chan tea.Msg, 1)
	go func() { got <- cmd() }()
	select {
	case m := <-got:
		t.Fatalf("a second check started while the first computed: %#v", m)
	case <-time.After(100 * time.Millisecond):
	}
	if ctx.Err() == nil {
		t.Error("the superseded check's context is not cancelled")
	}
	close(release)
	select {
	case m := <-got:
		if s, ok := m.(feStartMsg); !ok || s.id != e.fe.id {
			t.Fatalf("the waiting command answered %#v", m)
		}
	case <-time.After(5 * time.Second):
		t.Fatal("the running check was not cancelled")
	}
	if ctx.Err() == nil {
		t.Error("the superseded check's context is not cancelled")
	}
	if g.busy() {
		t.Error("still busy after the old check returned")
	}
}

// fakeFE is an invented FE answer for the panel (not a result of any wall).
var fakeFE = fe.Result{Deflection: 1 / 0.3, Rigidity: 0.3, Mesh: 6 * geometry.Inch, Elements: 4000, DOFs: 8000, Element: "qm6"}

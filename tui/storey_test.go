package tui

import (
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
	"time"

	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/x/ansi"

	"pierwise/geometry"
	"pierwise/storey"
)

// copyWorkshop copies the invented workshop storey and its walls to a
// temporary directory, so that saving in a test touches no repository file.
func copyWorkshop(t *testing.T) string {
	t.Helper()
	dir := t.TempDir()
	src := filepath.Join("..", "testdata", "storey")
	entries, err := os.ReadDir(src)
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range entries {
		data, err := os.ReadFile(filepath.Join(src, e.Name()))
		if err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(filepath.Join(dir, e.Name()), data, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	return filepath.Join(dir, "workshop.toml")
}

type storeyDriver struct {
	t *testing.T
	m *root
}

func newStoreyDriver(t *testing.T, path string, w, h int) *storeyDriver {
	t.Helper()
	m, err := newStoreyModel(path)
	if err != nil {
		t.Fatal(err)
	}
	m.c.now = func() time.Time { return time.Date(2026, 12, 1, 12, 0, 0, 0, time.UTC) }
	m.c.tick = func(time.Duration, func(time.Time) tea.Msg) tea.Cmd { return nil }
	m.Update(tea.WindowSizeMsg{Width: w, Height: h})
	return &storeyDriver{t: t, m: m}
}

// press sends msgs and runs the commands they return one after the other,
// as the bubbletea runtime would, and delivers the screen-contract answers
// (push, pop). Timers are switched off (newStoreyDriver), so every command
// the screens return here answers at once and none is skipped, however
// loaded the machine; the FE check never starts.
func (d *storeyDriver) press(msgs ...tea.Msg) {
	for _, msg := range msgs {
		_, cmd := d.m.Update(msg)
		d.run(cmd)
	}
}

func (d *storeyDriver) run(cmd tea.Cmd) {
	if cmd == nil {
		return
	}
	msg := cmd()
	switch msg := msg.(type) {
	case tea.BatchMsg:
		for _, c := range msg {
			d.run(c)
		}
	case pushScreenMsg, popScreenMsg, storeySavedMsg, storeyReportMsg, chosenMsg, cancelledMsg, savedMsg:
		_, next := d.m.Update(msg)
		d.run(next)
	default:
		// tea.Sequence answers with an unexported []tea.Cmd: run its
		// commands in order, as the runtime does.
		if v := reflect.ValueOf(msg); v.Kind() == reflect.Slice && v.Type().Elem() == reflect.TypeFor[tea.Cmd]() {
			for i := range v.Len() {
				d.run(v.Index(i).Interface().(tea.Cmd))
			}
			return
		}
		switch msg.(type) {
		case formSubmitted, saveAsMsg, reloadedMsg:
			_, next := d.m.Update(msg)
			d.run(next)
		}
	}
}

func (d *storeyDriver) screen() *storeyScreen { return d.m.stack[0].(*storeyScreen) }

func (d *storeyDriver) view() string { return ansi.Strip(d.m.View()) }

// The storey screen shows the same numbers as storey.Analyse (one way
// through: the screen computes nothing), fills the window exactly and draws
// the plan with M and R.
func TestStoreyScreenView(t *testing.T) {
	path := copyWorkshop(t)
	a, err := storey.Load(path)
	if err != nil {
		t.Fatal(err)
	}
	for _, size := range [][2]int{{80, 24}, {120, 36}} {
		d := newStoreyDriver(t, path, size[0], size[1])
		v := d.view()
		checkSize(t, v, size[0], size[1])
		for _, want := range []string{"Plan", "Walls", "centre of rigidity", "M", "R"} {
			if !strings.Contains(v, want) {
				t.Errorf("%dx%d view lacks %q:\n%s", size[0], size[1], want, v)
			}
		}
		got := d.screen().an
		for i, w := range a.Walls {
			if !relNear(got.Walls[i].Design.Shear, w.Design.Shear) {
				t.Errorf("%s: screen design shear %g, storey.Load %g", w.Name, got.Walls[i].Design.Shear, w.Design.Shear)
			}
		}
		if size[0] == 80 {
			checkGolden(t, "storey_80x24.golden", v)
		}
	}
}

func relNear(a, b float64) bool {
	d := a - b
	if d < 0 {
		d = -d
	}
	return d <= 1e-9*max(1, b, -b)
}

// Opening a wall, moving an opening and coming back re-analyses the storey
// with the edited wall; nothing is saved until asked.
func TestStoreyScreenEditWall(t *testing.T) {
	path := copyWorkshop(t)
	d := newStoreyDriver(t, path, 100, 30)
	s := d.screen()
	// Select the partition (the fifth wall) and open it.
	for i := 0; i < 4; i++ {
		d.press(runes("j"))
	}
	if s.sel != 4 {
		t.Fatalf("selected wall %d, want 4", s.sel)
	}
	before := s.an.Walls[4]
	d.press(keyEnter)
	if len(d.m.stack) != 2 {
		t.Fatalf("enter: %d screens, want the elevation on top", len(d.m.stack))
	}
	if v := d.view(); !strings.Contains(v, "D1") {
		t.Fatalf("the elevation of the partition is not shown:\n%s", v)
	}
	// Widen the door twice by a foot (the default step): the partition loses
	// solid length, so it gets less rigid and takes less of the storey shear.
	d.press(runes("L"), runes("L"))
	if !s.docs[4].dirty() {
		t.Fatal("the edit did not reach the partition's document")
	}
	d.press(keyEsc)
	if len(d.m.stack) != 1 {
		t.Fatalf("esc: %d screens, want the storey back", len(d.m.stack))
	}
	after := s.an.Walls[4]
	if !(after.Unit.Rigidity < before.Unit.Rigidity) || !(after.Design.Direct < before.Design.Direct) {
		t.Errorf("partition rigidity %.4f → %.4f, direct shear %.2f → %.2f: want both smaller after widening its door",
			before.Unit.Rigidity, after.Unit.Rigidity, before.Design.Direct, after.Design.Direct)
	}
	if v := d.view(); !strings.Contains(v, "changed") || !strings.Contains(v, "storey updated") {
		t.Errorf("the view does not show the change:\n%s", v)
	}
	// The file is untouched until s.
	a, err := storey.Load(path)
	if err != nil {
		t.Fatal(err)
	}
	if !relNear(a.Walls[4].Unit.Rigidity, before.Unit.Rigidity) {
		t.Error("the wall file changed before saving")
	}
	d.press(runes("s"))
	if a, err = storey.Load(path); err != nil {
		t.Fatal(err)
	}
	if !relNear(a.Walls[4].Unit.Rigidity, after.Unit.Rigidity) {
		t.Errorf("after s the file gives rigidity %.4f, want the edited %.4f", a.Walls[4].Unit.Rigidity, after.Unit.Rigidity)
	}
}

// A wall edited so that it no longer fits the plan: the screen says why,
// lists the walls, and recovers once the edit is undone.
func TestStoreyScreenBadEdit(t *testing.T) {
	path := copyWorkshop(t)
	d := newStoreyDriver(t, path, 80, 24)
	s := d.screen()
	if err := s.docs[4].change(func(w *geometry.Wall) error { w.Length = 30 * geometry.Foot; return nil }); err != nil {
		t.Fatal(err)
	}
	d.press(resumeMsg{})
	v := d.view()
	checkSize(t, v, 80, 24)
	if s.err == nil || !strings.Contains(v, "cannot be analysed") || !strings.Contains(v, "off the plan") {
		t.Fatalf("a partition 30 ft long from y = 30 ft on a 50 ft plan: want an error on screen:\n%s", v)
	}
	d.press(runes("p")) // no report from a storey that cannot be analysed
	if !strings.Contains(d.view(), "no report") {
		t.Errorf("p with an error: %s", d.view())
	}
	s.docs[4].undoChange()
	d.press(resumeMsg{})
	if s.err != nil || !strings.Contains(d.view(), "centre of rigidity") {
		t.Errorf("after undo: %v\n%s", s.err, d.view())
	}
}

// Ctrl+C inside a wall opened from the storey, with that wall edited and not
// saved, returns to the storey screen and asks instead of quitting.
func TestStoreyCtrlCAsksWithUnsavedWalls(t *testing.T) {
	d := newStoreyDriver(t, copyWorkshop(t), 100, 30)
	s := d.screen()
	d.press(keyEnter, runes("L"))
	if !s.docs[0].dirty() {
		t.Fatal("the edit did not reach the wall's document")
	}
	_, cmd := d.m.Update(tea.KeyMsg{Type: tea.KeyCtrlC})
	if cmd != nil {
		if _, quit := cmd().(tea.QuitMsg); quit {
			t.Fatal("ctrl+c quit with an unsaved wall")
		}
	}
	if len(d.m.stack) != 1 || !s.confirmQuit {
		t.Fatalf("ctrl+c: %d screens, asking %v; want the storey screen asking", len(d.m.stack), s.confirmQuit)
	}
	if v := d.view(); !strings.Contains(v, "unsaved walls") {
		t.Errorf("the storey screen does not ask:\n%s", v)
	}
}

// A storey file may open a wall in a layout other than the file's own active
// one (layout = "..."). Saving that wall after an edit from the storey
// screen writes the edit into the layout the storey uses and leaves the
// wall file's own active key as it was.
func TestStoreySaveKeepsFileActive(t *testing.T) {
	path := copyWorkshop(t)
	dir := filepath.Dir(path)
	appendFile(t, filepath.Join(dir, "partition.toml"), `
[[variant]]
name = "door moved"

[[variant.opening]]
name = "D1"
x = "12ft"
sill = "0"
width = "3ft"
height = "7ft"
`)
	appendFile(t, path, `layout = "door moved"`+"\n") // to the last [[wall]], the partition
	d := newStoreyDriver(t, path, 100, 30)
	s := d.screen()
	if w := s.docs[4].wall; w.Layouts[w.Active].Name != "door moved" {
		t.Fatalf("the partition opened in layout %q, want the storey's %q", w.Layouts[w.Active].Name, "door moved")
	}
	for i := 0; i < 4; i++ {
		d.press(runes("j"))
	}
	d.press(keyEnter, runes("L"), keyEsc, runes("s"))
	if s.docs[4].dirty() {
		t.Fatalf("s did not save the partition: %s", d.view())
	}
	w, err := geometry.LoadFile(filepath.Join(dir, "partition.toml"))
	if err != nil {
		t.Fatal(err)
	}
	if got := w.Layouts[w.Active].Name; got != geometry.DefaultLayout {
		t.Errorf("the saved file's active layout is %q, want its own %q", got, geometry.DefaultLayout)
	}
	// The edit (D1 one foot wider) went into the storey's layout, not the
	// file's active one.
	moved := w.Layouts[w.LayoutIndex("door moved")].Openings[0]
	own := w.Layouts[w.Active].Openings[0]
	if !near(float64(moved.Width), float64(4*geometry.Foot)) || !near(float64(own.Width), float64(3*geometry.Foot)) {
		t.Errorf("D1 width %v in %q and %v in the file's active layout; want 4 ft and 3 ft",
			moved.Width, "door moved", own.Width)
	}
	// The storey still analyses the partition in its layout after the save.
	if w := s.docs[4].wall; w.Layouts[w.Active].Name != "door moved" {
		t.Errorf("after saving, the storey screen edits layout %q, want %q", w.Layouts[w.Active].Name, "door moved")
	}
}

func appendFile(t *testing.T, path, text string) {
	t.Helper()
	f, err := os.OpenFile(path, os.O_APPEND|os.O_WRONLY, 0)
	if err != nil {
		t.Fatal(err)
	}
	if _, err := f.WriteString(text); err != nil {
		t.Fatal(err)
	}
	if err := f.Close(); err != nil {
		t.Fatal(err)
	}
}

// The storey screen with a wall given by its rigidity (the workshop copy
// with a mezzanine frame): the wall is listed as given, its panel says so,
// and enter refuses to open an elevation it does not have.
func TestStoreyScreenRigidityWall(t *testing.T) {
	dir := filepath.Dir(copyWorkshop(t))
	d := newStoreyDriver(t, filepath.Join(dir, "workshop-frame.toml"), 80, 24)
	for i := 0; i < 5; i++ {
		d.press(tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune{'j'}})
	}
	view := ansi.Strip(d.m.View())
	for _, want := range []string{"6 Mezzanine", "given by its rigidity, 1,500 kip/in", "dmax/davg", "storey drift"} {
		if !strings.Contains(view, want) {
			t.Errorf("view lacks %q:\n%s", want, view)
		}
	}
	d.press(tea.KeyMsg{Type: tea.KeyEnter})
	if view := ansi.Strip(d.m.View()); !strings.Contains(view, "no elevation to open") || !strings.Contains(view, "Storey:") {
		t.Errorf("enter on a rigidity wall:\n%s", view)
	}
}

// Opening a wall from the storey screen shows it under its storey design
// shear: the North wall of the workshop under 73.8 kip, its P1 taking
// 16.3 % of it, 12.0 kip to three figures (the storey report's numbers), while its file is
// left unchanged.
func TestStoreyOpensWallUnderDesignShear(t *testing.T) {
	d := newStoreyDriver(t, copyWorkshop(t), 80, 24)
	d.press(tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune{'j'}}, tea.KeyMsg{Type: tea.KeyEnter})
	view := d.view()
	for _, want := range []string{"under its storey design shear 73.8 kip", "12.0 "} {
		if !strings.Contains(view, want) {
			t.Errorf("view lacks %q:\n%s", want, view)
		}
	}
	if sc := d.screen(); sc.docs[1].dirty() || sc.docs[1].wall.Load.Shear != 0 {
		t.Errorf("the wall document changed: dirty %v, load %g", sc.docs[1].dirty(), float64(sc.docs[1].wall.Load.Shear))
	}
}

// editPartitionBehindTheBack widens the partition's door in the storey
// screen, then another program changes the partition's title on disk.
func editPartitionBehindTheBack(t *testing.T) (d *storeyDriver, file string, edited geometry.Length) {
	t.Helper()
	path := copyWorkshop(t)
	file = filepath.Join(filepath.Dir(path), "partition.toml")
	d = newStoreyDriver(t, path, 80, 24)
	for i := 0; i < 4; i++ {
		d.press(runes("j"))
	}
	d.press(keyEnter, runes("L"), keyEsc)
	edited = d.screen().docs[4].wall.Openings()[0].Width
	data, err := os.ReadFile(file)
	if err != nil {
		t.Fatal(err)
	}
	changed := strings.Replace(string(data), `title = "Tool room partition"`, `title = "Changed elsewhere"`, 1)
	if changed == string(data) {
		t.Fatal("the partition's title line is not in the file")
	}
	if err := os.WriteFile(file, []byte(changed), 0o644); err != nil {
		t.Fatal(err)
	}
	return d, file, edited
}

func fileHolds(t *testing.T, file, text string) bool {
	t.Helper()
	data, err := os.ReadFile(file)
	if err != nil {
		t.Fatal(err)
	}
	return strings.Contains(string(data), text)
}

// A wall file changed on disk since the storey read it: s asks (reload,
// overwrite, save elsewhere) and writes nothing; o overwrites it with the
// edited wall.
func TestStoreySaveChangedOnDiskOverwrite(t *testing.T) {
	d, file, edited := editPartitionBehindTheBack(t)
	s := d.screen()
	d.press(runes("s"))
	if v := d.view(); !strings.Contains(v, "partition.toml changed on disk.") || !strings.Contains(v, "o overwrite  S save as  esc cancel") {
		t.Fatalf("no question:\n%s", v)
	}
	if !fileHolds(t, file, "Changed elsewhere") || !s.docs[4].dirty() {
		t.Fatal("the changed file was written over before the answer")
	}
	d.press(runes("x")) // another key changes nothing
	if s.ask == nil || !fileHolds(t, file, "Changed elsewhere") {
		t.Fatal("a key other than the answers closed the question or saved")
	}
	d.press(runes("o"))
	if s.ask != nil || s.docs[4].dirty() || fileHolds(t, file, "Changed elsewhere") {
		t.Fatalf("o did not overwrite:\n%s", d.view())
	}
	w, err := geometry.LoadFile(file)
	if err != nil {
		t.Fatal(err)
	}
	if got := w.Openings()[0].Width; !near(float64(got), float64(edited)) {
		t.Errorf("the file's door is %v wide, the edited one %v", got, edited)
	}
	// The hash is the saved file's now: the next save asks nothing.
	d.press(keyEnter, runes("L"), keyEsc, runes("s"))
	if s.ask != nil || s.docs[4].dirty() {
		t.Errorf("a second save asked again:\n%s", d.view())
	}
}

// r reloads the wall from its file (the edit stays in its undo history);
// esc keeps both as they are.
func TestStoreySaveChangedOnDiskReload(t *testing.T) {
	d, file, edited := editPartitionBehindTheBack(t)
	s := d.screen()
	d.press(runes("s"), keyEsc)
	if s.ask != nil || !s.docs[4].dirty() || !fileHolds(t, file, "Changed elsewhere") {
		t.Fatal("esc did not leave the question with nothing written")
	}
	d.press(runes("s"), runes("r"))
	doc := s.docs[4]
	if s.ask != nil || doc.dirty() || doc.wall.Title != "Changed elsewhere" || !fileHolds(t, file, "Changed elsewhere") {
		t.Fatalf("r did not reload: title %q, dirty %v\n%s", doc.wall.Title, doc.dirty(), d.view())
	}
	if w := doc.wall; w.Layouts[w.Active].Name != geometry.DefaultLayout || near(float64(w.Openings()[0].Width), float64(edited)) {
		t.Error("the reloaded wall is not the file's")
	}
	if !doc.undoChange() || !near(float64(doc.wall.Openings()[0].Width), float64(edited)) {
		t.Error("undo does not bring the edit back")
	}
}

// S opens the wall's editor with the save-as form.
func TestStoreySaveChangedOnDiskElsewhere(t *testing.T) {
	d, file, _ := editPartitionBehindTheBack(t)
	d.press(runes("s"), runes("S"))
	top, ok := d.m.top().(*storeyWall)
	if !ok || top.e.mode != modeForm || !strings.Contains(d.view(), "Save as") {
		t.Fatalf("S: top %T\n%s", d.m.top(), d.view())
	}
	if !fileHolds(t, file, "Changed elsewhere") {
		t.Error("the changed file was written over")
	}
}

// The wall's own editor, opened from the storey, knows the file's hash
// too: its save asks the same question.
func TestStoreyWallEditorSaveChangedOnDisk(t *testing.T) {
	d, file, _ := editPartitionBehindTheBack(t)
	d.press(keyEnter, runes("s"))
	top, ok := d.m.top().(*storeyWall)
	if !ok || top.e.mode != modeAsk || !strings.Contains(d.view(), "changed on disk") {
		t.Fatalf("s in the wall's editor: top %T\n%s", d.m.top(), d.view())
	}
	if !fileHolds(t, file, "Changed elsewhere") {
		t.Error("the changed file was written over")
	}
}

// Saved elsewhere through the wall's save as: back on the storey, the
// screen says which file now holds the wall.
func TestStoreySaveElsewhereSays(t *testing.T) {
	d, file, _ := editPartitionBehindTheBack(t)
	other := filepath.Join(filepath.Dir(file), "partition2.toml")
	d.press(runes("s"), runes("S"), keyCtrlU, tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune(other), Paste: true}, keyEnter, keyEsc)
	if _, ok := d.m.top().(*storeyScreen); !ok {
		t.Fatalf("top %T\n%s", d.m.top(), d.view())
	}
	if v := d.view(); !strings.Contains(v, "saved as partition2.toml") || !strings.Contains(v, "still names partition.toml") {
		t.Errorf("no word of the new file:\n%s", v)
	}
	if _, err := os.Stat(other); err != nil {
		t.Error(err)
	}
	if !fileHolds(t, file, "Changed elsewhere") {
		t.Error("the changed file was written over")
	}
}

// An angled wall's row gives its angle in the direction column ("30°"),
// not a bare "a" that the screen explains nowhere.
func TestStoreyScreenAngledWall(t *testing.T) {
	dir := filepath.Dir(copyWorkshop(t))
	path := filepath.Join(dir, "workshop-frame.toml")
	appendFile(t, path, "\n[[wall]]\nname = \"Brace\"\nrigidity = \"300kip/in\"\ndirection = 30\nposition = [\"60ft\", \"20ft\"]\nlength = \"20ft\"\n")
	d := newStoreyDriver(t, path, 80, 24)
	view := ansi.Strip(d.m.View())
	if !strings.Contains(view, "7 Brace") || !strings.Contains(view, "30°") {
		t.Errorf("the angled wall's row lacks its angle:\n%s", view)
	}
}

package tui

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
	"time"

	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/x/ansi"

	"pierwise/demo"
	"pierwise/internal/testkit"
	"pierwise/report"
	"pierwise/study"
)

// cmpCommon is the shared state of a screen test: the demo wall (layouts
// "main" and "wide entrance") as if read from path, and a fixed clock.
func cmpCommon(path string) *common {
	c := newCommon(newDocument(demo.Wall(), path), nil)
	c.now = func() time.Time { return time.Date(2026, 12, 1, 23, 30, 5, 0, time.UTC) }
	return c
}

func cmpKey(s string) tea.KeyMsg {
	switch s {
	case "tab":
		return tea.KeyMsg{Type: tea.KeyTab}
	case "enter":
		return tea.KeyMsg{Type: tea.KeyEnter}
	case "esc":
		return tea.KeyMsg{Type: tea.KeyEsc}
	case "left":
		return tea.KeyMsg{Type: tea.KeyLeft}
	case "right":
		return tea.KeyMsg{Type: tea.KeyRight}
	}
	return tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune(s)}
}

func cmpGoldenView(t *testing.T, name, got string) {
	t.Helper()
	testkit.Golden(t, name, got)
}

// checkSize fails unless the view is exactly w × h cells.
func cmpCheckSize(t *testing.T, view string, w, h int) {
	t.Helper()
	lines := strings.Split(view, "\n")
	if len(lines) != h {
		t.Errorf("%d lines, want %d", len(lines), h)
	}
	for i, l := range lines {
		if n := ansi.StringWidth(l); n != w {
			t.Errorf("line %d is %d cells wide, want %d: %q", i, n, w, l)
		}
	}
}

func TestCompareScreenGolden(t *testing.T) {
	for _, size := range [][2]int{{80, 24}, {120, 36}} {
		s := newCompareScreen(cmpCommon("annex.toml"))
		s.setSize(size[0], size[1])
		// The FE numbers belong to package fe; the golden file shows the
		// classic comparison (TestCompareScreenFE covers the FE rows).
		s.update(cmpKey("f"))
		v := ansi.Strip(s.view())
		cmpCheckSize(t, v, size[0], size[1])
		cmpGoldenView(t, fmt.Sprintf("compare_%dx%d.golden", size[0], size[1]), v)
	}
}

func TestCompareScreenKeys(t *testing.T) {
	c := cmpCommon("annex.toml")
	s := newCompareScreen(c)
	s.setSize(80, 24)
	if s.before != 0 || s.after != 1 || !s.right {
		t.Fatalf("start: before %d after %d right %v", s.before, s.after, s.right)
	}
	// The numbers are those of study.Compare of the two layouts.
	w := c.doc.wall
	want, err := study.Compare(study.WithLayout(w, 0), study.WithLayout(w, 1))
	if err != nil {
		t.Fatal(err)
	}
	if d := s.cmp.After.Result.Rigidity - want.After.Result.Rigidity; d != 0 {
		t.Errorf("after rigidity differs by %g", d)
	}
	// tab, then → changes the before side; s swaps.
	s.update(cmpKey("tab"))
	s.update(cmpKey("right"))
	if s.before != 1 || s.after != 1 {
		t.Errorf("after tab →: before %d after %d", s.before, s.after)
	}
	if ch, ok := s.cmp.RigidityChange(); !ok || ch != 0 {
		t.Errorf("a layout against itself: change %g %v", ch, ok)
	}
	s.update(cmpKey("left"))
	s.update(cmpKey("s"))
	if s.before != 1 || s.after != 0 || s.cmp.Before.Layout() != "wide entrance" {
		t.Errorf("after swap: before %d after %d", s.before, s.after)
	}
	// enter makes the chosen side's layout active (undoably) and closes.
	_, cmd := s.update(cmpKey("enter"))
	if c.doc.wall.Active != 1 || !c.doc.dirty() {
		t.Errorf("enter: active %d dirty %v", c.doc.wall.Active, c.doc.dirty())
	}
	if cmd == nil {
		t.Fatal("enter: no command")
	}
	if _, ok := cmd().(popScreenMsg); !ok {
		t.Error("enter does not close the screen")
	}
	// esc closes too.
	if _, cmd := s.update(cmpKey("esc")); cmd == nil {
		t.Error("esc: no command")
	} else if _, ok := cmd().(popScreenMsg); !ok {
		t.Error("esc does not close the screen")
	}
}

func TestCompareScreenSnapshot(t *testing.T) {
	dir := t.TempDir()
	wallPath := filepath.Join(dir, "annex.toml")
	c := cmpCommon(wallPath)
	s := newCompareScreen(c)
	s.setSize(80, 24)
	var paths []string
	for i := 0; i < 2; i++ { // twice in the same second: two files
		_, cmd := s.update(cmpKey("p"))
		if cmd == nil {
			t.Fatal("p: no command")
		}
		msg := cmd()
		done, ok := msg.(snapshotDoneMsg)
		if !ok || done.err != nil {
			t.Fatalf("snapshot: %#v", msg)
		}
		s.update(msg)
		if !strings.Contains(ansi.Strip(s.view()), filepath.Base(done.path)) {
			t.Errorf("the screen does not say where the report went:\n%s", ansi.Strip(s.view()))
		}
		paths = append(paths, done.path)
	}
	if paths[0] == paths[1] {
		t.Fatalf("the second snapshot overwrote the first: %s", paths[0])
	}
	for _, p := range paths {
		if filepath.Dir(p) != dir || !strings.HasPrefix(filepath.Base(p), "annex-compare-20261201-233005") {
			t.Errorf("snapshot at %s", p)
		}
		data, err := os.ReadFile(p)
		if err != nil {
			t.Fatal(err)
		}
		text := strings.Join(strings.Fields(string(data)), " ")
		for _, want := range []string{"PIERWISE LAYOUT COMPARISON", `layout "wide entrance"`, "2026-12-01 23:30 UTC", "judgement of a licensed engineer; local codes govern"} {
			if !strings.Contains(text, want) {
				t.Errorf("%s lacks %q", p, want)
			}
		}
	}
}

func TestCompareScreenOneLayout(t *testing.T) {
	w := demo.Wall()
	w.Layouts = w.Layouts[:1]
	c := newCommon(newDocument(w, ""), nil)
	s := newCompareScreen(c)
	s.setSize(80, 24)
	v := ansi.Strip(s.view())
	cmpCheckSize(t, v, 80, 24)
	if !strings.Contains(v, "one layout") {
		t.Errorf("no hint for a wall with one layout:\n%s", v)
	}
	s.update(cmpKey("right")) // must not panic or leave the range
	if s.after != 0 {
		t.Errorf("after %d", s.after)
	}
}

// cmpDrain runs cmd and every command that follows from it, in order, as
// bubbletea would (batches and sequences alike), feeding the messages to m.
func cmpDrain(m *root, cmd tea.Cmd) {
	if cmd == nil {
		return
	}
	msg := cmd()
	if msg == nil {
		return
	}
	// tea.BatchMsg and bubbletea's sequence message are both []tea.Cmd.
	if v := reflect.ValueOf(msg); v.Kind() == reflect.Slice && v.Type().ConvertibleTo(reflect.TypeOf(tea.BatchMsg{})) {
		for _, c := range v.Convert(reflect.TypeOf(tea.BatchMsg{})).Interface().(tea.BatchMsg) {
			cmpDrain(m, c)
		}
		return
	}
	_, next := m.Update(msg)
	cmpDrain(m, next)
}

// The elevation screen opens the comparison with C (registered key).
func TestCompareOpensFromElevation(t *testing.T) {
	w := demo.Wall()
	w.Active = 1
	m := newModel(w, Options{Path: "annex.toml"})
	m.Update(tea.WindowSizeMsg{Width: 80, Height: 24})
	_, cmd := m.Update(cmpKey("C"))
	cmpDrain(m, cmd)
	s, ok := m.top().(*compareScreen)
	if !ok {
		t.Fatalf("C did not open the comparison; top is %T", m.top())
	}
	// The first layout against the active one, with the FE answer in.
	if s.before != 0 || s.after != 1 || s.feRunning || s.cmp.After.FE == nil {
		t.Errorf("before %d after %d, FE running %v", s.before, s.after, s.feRunning)
	}
	if v := ansi.Strip(m.View()); !strings.Contains(v, "compare layouts") {
		t.Errorf("view:\n%s", v)
	}
}

func TestCompareScreenFE(t *testing.T) {
	s := newCompareScreen(cmpCommon("annex.toml"))
	s.setSize(120, 36)
	cmd := s.recompute()
	if cmd == nil || !s.feRunning {
		t.Fatal("FE check not started")
	}
	stale := cmd
	_, cmd = s.update(cmpKey("s")) // swap: a new request
	s.update(stale())
	if !s.feRunning || s.cmp.Before.FE != nil {
		t.Fatal("a stale FE answer was taken")
	}
	drive(s, cmd)
	if s.feRunning || s.cmp.Before.FE == nil || s.cmp.After.FE == nil {
		t.Fatalf("no FE answer: %v %v", s.cmp.Before.FEErr, s.cmp.After.FEErr)
	}
	v := ansi.Strip(s.view())
	cmpCheckSize(t, v, 120, 36)
	for _, want := range []string{"FE relative rigidity", report.Sig(s.cmp.Before.FE.Rigidity), "FE before"} {
		if !strings.Contains(v, want) {
			t.Errorf("view lacks %q:\n%s", want, v)
		}
	}
	// f switches it off: no FE rows.
	s.update(cmpKey("f"))
	if v := ansi.Strip(s.view()); strings.Contains(v, "FE relative rigidity") {
		t.Error("FE rows with the check off")
	}
}

// An FE check that fails ends "running..." and says why; the classic
// comparison stays on screen, and a stale failure changes nothing.
func TestCompareScreenFEError(t *testing.T) {
	c := newCommon(newDocument(demo.Wall(), ""), nil)
	s := newCompareScreen(c)
	s.setSize(100, 30)
	if !s.feRunning || !strings.Contains(ansi.Strip(s.view()), "running") {
		t.Fatal("the FE check is not running at the start")
	}
	s.update(compareFEMsg{id: s.feID - 1, err: errors.New("stale")})
	if !s.feRunning {
		t.Error("a stale answer stopped the check")
	}
	s.update(compareFEMsg{id: s.feID, err: errors.New("out of memory")})
	v := ansi.Strip(s.view())
	if s.feRunning || strings.Contains(v, "running") || !strings.Contains(v, "out of memory") || s.cmp == nil {
		t.Errorf("after the FE error:\n%s", v)
	}
}

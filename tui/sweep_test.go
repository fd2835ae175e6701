package tui

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/x/ansi"

	"pierwise/demo"
	"pierwise/geometry"
	"pierwise/study"
)

// sweepRun opens the sweep screen on the cmpCommon wall and runs its
// command, as the root would.
func sweepRun(t *testing.T, c *common, w, h int) *sweepScreen {
	t.Helper()
	s := newSweepScreen(c)
	s.setSize(w, h)
	cmd := s.start()
	if cmd == nil {
		t.Fatal("no sweep command")
	}
	drive(s, cmd)
	return s
}

func TestSweepScreenGolden(t *testing.T) {
	for _, size := range [][2]int{{80, 24}, {120, 36}} {
		c := cmpCommon("annex.toml")
		s := sweepRun(t, c, size[0], size[1])
		s.update(cmpKey("tab")) // W1
		drive(s, s.start())
		v := ansi.Strip(s.view())
		cmpCheckSize(t, v, size[0], size[1])
		cmpGoldenView(t, fmt.Sprintf("sweep_%dx%d.golden", size[0], size[1]), v)
	}
}

func TestSweepScreenPlace(t *testing.T) {
	c := cmpCommon("annex.toml")
	s := sweepRun(t, c, 80, 24)
	s.update(cmpKey("tab")) // W1
	drive(s, s.start())
	want, err := study.Sweep(c.doc.wall, "W1", study.AlongX, steps(geometry.US)[defaultStep(geometry.US)])
	if err != nil {
		t.Fatal(err)
	}
	if len(s.pts) != len(want) {
		t.Fatalf("%d points, study.Sweep gives %d", len(s.pts), len(want))
	}
	s.update(cmpKey("b"))
	best := study.BestIndex(want)
	if s.cursor != best {
		t.Fatalf("b: cursor %d, best %d", s.cursor, best)
	}
	_, cmd := s.update(cmpKey("enter"))
	if cmd == nil {
		t.Fatal("enter: no sweep after the move")
	}
	if got := c.doc.wall.Openings()[1].X; got != want[best].X || !c.doc.dirty() {
		t.Errorf("W1 at %g (dirty %v), want %g", got, c.doc.dirty(), want[best].X)
	}
	drive(s, cmd)
	if cur := study.CurrentIndex(s.pts); cur < 0 || s.pts[cur].X != want[best].X {
		t.Errorf("after the move the current point is %d", cur)
	}
	// Undo on the document brings W1 back.
	if !c.doc.undoChange() || c.doc.wall.Openings()[1].X != 12*geometry.Foot {
		t.Errorf("undo: W1 at %g", c.doc.wall.Openings()[1].X)
	}
}

func TestSweepScreenStaleAndAxis(t *testing.T) {
	c := cmpCommon("annex.toml")
	s := sweepRun(t, c, 80, 24)
	first := s.start()               // request 1 (D1 along x)
	_, axis := s.update(cmpKey("a")) // request 2 (D1 along y)
	if axis == nil {
		t.Fatal("a: no sweep")
	}
	s.update(first()) // stale: dropped
	if !s.running {
		t.Error("a stale answer was taken")
	}
	drive(s, axis)
	if s.running || len(s.pts) == 0 {
		t.Fatalf("no points along y")
	}
	for _, p := range s.pts {
		if p.X != 4*geometry.Foot {
			t.Errorf("along y the left edge moved: %g", p.X)
		}
	}
	v := ansi.Strip(s.view())
	cmpCheckSize(t, v, 80, 24)
	if !strings.Contains(v, "axis y") || !strings.Contains(v, "sill") {
		t.Errorf("view along y:\n%s", v)
	}
}

func TestSweepScreenSnapshot(t *testing.T) {
	dir := t.TempDir()
	c := cmpCommon(filepath.Join(dir, "annex.toml"))
	s := sweepRun(t, c, 80, 24)
	_, cmd := s.update(cmpKey("p"))
	if cmd == nil {
		t.Fatal("p: no command")
	}
	msg := cmd().(snapshotDoneMsg)
	if msg.err != nil {
		t.Fatal(msg.err)
	}
	s.update(msg)
	if filepath.Base(msg.path) != "annex-sweep-D1-x-20261201-233005.txt" {
		t.Errorf("snapshot at %s", msg.path)
	}
	data, err := os.ReadFile(msg.path)
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"Sweep of D1 along x", "current", "best", "licensed engineer"} {
		if !strings.Contains(string(data), want) {
			t.Errorf("snapshot lacks %q:\n%s", want, data)
		}
	}
	if !strings.Contains(ansi.Strip(s.view()), "annex-sweep-D1") {
		t.Error("the screen does not say where the table went")
	}
}

func TestSweepOpensFromElevation(t *testing.T) {
	m := newModel(demo.Wall(), Options{Path: "annex.toml"})
	m.Update(tea.WindowSizeMsg{Width: 80, Height: 24})
	_, cmd := m.Update(cmpKey("G"))
	cmpDrain(m, cmd)
	s, ok := m.top().(*sweepScreen)
	if !ok {
		t.Fatalf("G did not open the sweep; top is %T", m.top())
	}
	if s.running || len(s.pts) == 0 {
		t.Errorf("the sweep did not run: running %v, %d points", s.running, len(s.pts))
	}
}

// Key repeat can deliver "lll" as one message: the root splits it, so
// each rune counts on every screen.
func TestSweepScreenRepeatedKeys(t *testing.T) {
	c := cmpCommon("annex.toml")
	s := sweepRun(t, c, 80, 24)
	m := newRoot(c, s)
	start := s.cursor
	m.Update(tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune("lll")})
	if s.cursor != min(start+3, len(s.pts)-1) {
		t.Errorf("cursor %d after lll from %d", s.cursor, start)
	}
}

// A position where the classic method warns of something it does not at the
// current position (study.Point.Weak) carries a ! in the marks row of the
// plot and in the cursor's readout, with a line that names the warning. The
// wall is the classroom of study's weak test (invented): 40 ft × 12 ft,
// three 4 ft × 4 ft windows at sill 3 ft; raising W2 to a sill of 7'-8"
// leaves an 8 in strip between its band and the others' (head 7 ft).
func TestSweepScreenMarksWeakPositions(t *testing.T) {
	ft := geometry.Foot
	w := &geometry.Wall{
		Title: "classroom", Units: geometry.US, Length: 40 * ft, Height: 12 * ft, Thickness: 7.625 * geometry.Inch,
		Support:   geometry.Cantilever,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Load:      geometry.Load{Shear: 35 * geometry.Kip},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 1, Ie: 1},
		Layouts: []geometry.Layout{{Name: geometry.DefaultLayout, Openings: []geometry.Opening{
			{Name: "W1", X: 6 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
			{Name: "W2", X: 18 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
			{Name: "W3", X: 30 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
	for _, size := range [][2]int{{80, 24}, {120, 36}} {
		sweepWeakCase(t, w, size[0], size[1])
	}
}

func sweepWeakCase(t *testing.T, w *geometry.Wall, width, height int) {
	c := newCommon(newDocument(w, "classroom.toml"), nil)
	s := newSweepScreen(c)
	s.setSize(width, height)
	s.opening, s.axis, s.step = 1, study.AlongY, 2 // W2 up and down by 8 in
	drive(s, s.start())
	want, err := study.Sweep(w, "W2", study.AlongY, 8*geometry.Inch)
	if err != nil {
		t.Fatal(err)
	}
	if len(s.pts) != len(want) {
		t.Fatalf("%d points, study.Sweep gives %d", len(s.pts), len(want))
	}
	lines := strings.Split(ansi.Strip(s.view()), "\n")
	var marks string
	for i, l := range lines {
		if strings.HasPrefix(strings.TrimSpace(l), "+---") {
			marks = lines[i+1]
		}
	}
	nWeak, weak := 0, -1
	for i, p := range want {
		if len(p.Weak) > 0 && p.Err == nil && !p.Best {
			nWeak++
			weak = i
		}
	}
	if nWeak == 0 {
		t.Fatal("study.Sweep marks no position weak: the case this test is about is gone")
	}
	if got := strings.Count(marks, "!"); got != nWeak {
		t.Errorf("%dx%d: %d ! in the marks row %q, want %d (the weak positions)", width, height, got, marks, nWeak)
	}
	// The cursor starts on the current position, which is never weak.
	if v := ansi.Strip(s.view()); strings.Contains(v, "warned here") {
		t.Errorf("%dx%d: the current position is explained as weak:\n%s", width, height, v)
	}
	for s.cursor < weak {
		s.update(cmpKey("l"))
	}
	for s.cursor > weak {
		s.update(cmpKey("h"))
	}
	v := ansi.Strip(s.view())
	cmpCheckSize(t, v, width, height)
	if !strings.Contains(v, "^ sill "+geometry.FormatLength(want[weak].Y, geometry.US)+"  ! ") {
		t.Errorf("%dx%d: the readout of sill %s lacks the !:\n%s", width, height, geometry.FormatLength(want[weak].Y, geometry.US), v)
	}
	// The explanation names the warnings (all of them when there is room).
	kinds := want[weak].Weak
	if width < 120 {
		kinds = kinds[:1]
	}
	if !strings.Contains(v, "! warned here, not at the current position: "+strings.Join(kinds, ", ")) {
		t.Errorf("%dx%d: no line names %q:\n%s", width, height, kinds, v)
	}
	if !strings.Contains(v, "! less reliable") {
		t.Errorf("%dx%d: the legend does not explain !:\n%s", width, height, v)
	}
}

// drive runs cmd and feeds its message to s, then the command that one
// gives, until none is left: what bubbletea does with one screen's chain
// of start, run and answer (no batches).
func drive(s screen, cmd tea.Cmd) {
	for cmd != nil {
		msg := cmd()
		if msg == nil {
			return
		}
		_, cmd = s.update(msg)
	}
}

package tui

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/x/exp/teatest"

	"pierwise/geometry"
)

// waitText waits until the program has drawn s.
func waitText(t *testing.T, tm *teatest.TestModel, s string) {
	t.Helper()
	teatest.WaitFor(t, tm.Output(), func(b []byte) bool { return bytes.Contains(b, []byte(s)) },
		teatest.WithDuration(5*time.Second), teatest.WithCheckInterval(10*time.Millisecond))
}

func copyWall(t *testing.T, name string) string {
	t.Helper()
	data, err := os.ReadFile(filepath.Join("..", "testdata", "walls", name))
	if err != nil {
		t.Fatal(err)
	}
	path := filepath.Join(t.TempDir(), name)
	if err := os.WriteFile(path, data, 0o644); err != nil {
		t.Fatal(err)
	}
	return path
}

// TestFlowMoveUndoSave: open a file, move its door, undo, move it again,
// save, quit; the file on disk has the door moved by one step and nothing
// else changed.
func TestFlowMoveUndoSave(t *testing.T) {
	path := copyWall(t, "door.toml")
	w, _, _, err := openFile(path)
	if err != nil {
		t.Fatal(err)
	}
	tm := teatest.NewTestModel(t, newModel(w, Options{Path: path}), teatest.WithInitialTermSize(160, 48))
	waitText(t, tm, `D1 door: x 4'-0"`) // WaitFor consumes output: one wait per frame

	tm.Send(tea.KeyMsg{Type: tea.KeyRight})
	waitText(t, tm, `D1 door: x 5'-0"`)
	tm.Type("u")
	waitText(t, tm, "undone")
	tm.Type("l")
	waitText(t, tm, "[modified]")
	tm.Type("s")
	waitText(t, tm, "saved")
	tm.Type("q") // saved: quits without asking
	tm.WaitFinished(t, teatest.WithFinalTimeout(5*time.Second))

	got, err := geometry.LoadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	want, _ := geometry.LoadFile(filepath.Join("..", "testdata", "walls", "door.toml"))
	want.Layouts[0].Openings[0].X += geometry.Foot
	if !wallsNear(got, want) {
		t.Errorf("file on disk:\n%+v\nwant:\n%+v", got, want)
	}
	m := tm.FinalModel(t).(*root)
	if m.c.doc.dirty() {
		t.Error("quit with the wall marked unsaved")
	}
}

// wallsNear compares two walls with a tolerance on every length.
func wallsNear(a, b *geometry.Wall) bool {
	const tol = 1e-9
	near := func(x, y float64) bool { return x-y < tol && y-x < tol }
	if a.Title != b.Title || a.Units != b.Units || a.Support != b.Support || a.Material != b.Material ||
		!near(float64(a.Length), float64(b.Length)) || !near(float64(a.Height), float64(b.Height)) ||
		!near(float64(a.Thickness), float64(b.Thickness)) || !near(float64(a.Load.Shear), float64(b.Load.Shear)) ||
		len(a.Layouts) != len(b.Layouts) || a.Active != b.Active {
		return false
	}
	for i := range a.Layouts {
		la, lb := a.Layouts[i], b.Layouts[i]
		if la.Name != lb.Name || len(la.Openings) != len(lb.Openings) {
			return false
		}
		for j := range la.Openings {
			oa, ob := la.Openings[j], lb.Openings[j]
			if oa.Name != ob.Name || !near(float64(oa.X), float64(ob.X)) || !near(float64(oa.Sill), float64(ob.Sill)) ||
				!near(float64(oa.Width), float64(ob.Width)) || !near(float64(oa.Height), float64(ob.Height)) {
				return false
			}
		}
	}
	return true
}

// TestFlowQuitAsks: with unsaved changes q asks; y leaves the file as it
// was on disk.
func TestFlowQuitAsks(t *testing.T) {
	path := copyWall(t, "door.toml")
	before, _ := os.ReadFile(path)
	w, _, _, _ := openFile(path)
	tm := teatest.NewTestModel(t, newModel(w, Options{Path: path}), teatest.WithInitialTermSize(80, 24))
	waitText(t, tm, "Results")
	tm.Type("w")
	waitText(t, tm, "added window W1")
	tm.Type("q")
	waitText(t, tm, "Unsaved changes")
	tm.Type("y")
	tm.WaitFinished(t, teatest.WithFinalTimeout(5*time.Second))
	after, _ := os.ReadFile(path)
	if !bytes.Equal(before, after) {
		t.Error("quitting without saving changed the file")
	}
}

// TestFlowResize: the window shrinks below the minimum and grows back.
func TestFlowResize(t *testing.T) {
	w := NewWall(geometry.SI)
	tm := teatest.NewTestModel(t, newModel(w, Options{}), teatest.WithInitialTermSize(100, 30))
	waitText(t, tm, "Results")
	tm.Send(tea.WindowSizeMsg{Width: 60, Height: 20})
	waitText(t, tm, "too small")
	tm.Send(tea.WindowSizeMsg{Width: 120, Height: 40})
	waitText(t, tm, "7.200 m")
	tm.Send(tea.KeyMsg{Type: tea.KeyCtrlC})
	tm.WaitFinished(t, teatest.WithFinalTimeout(5*time.Second))
}

// TestOpenFileCreates: a missing file is created with the plain wall, which
// reads back valid.
func TestOpenFileCreates(t *testing.T) {
	path := filepath.Join(t.TempDir(), "new.toml")
	w, _, msg, err := openFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(msg, "created") {
		t.Errorf("message %q", msg)
	}
	got, err := geometry.LoadFile(path)
	if err != nil {
		t.Fatalf("created file does not read back: %v", err)
	}
	if !wallsNear(got, w) {
		t.Errorf("created file reads back as %+v, want %+v", got, w)
	}
	if _, _, _, err := openFile(filepath.Join(t.TempDir(), "no", "dir", "x.toml")); err == nil {
		t.Error("a file in a missing directory was created")
	}
}

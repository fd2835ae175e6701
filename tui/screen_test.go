package tui

import (
	"strings"
	"testing"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
)

// fakeScreen is a screen that moves the first opening of the active layout
// one foot right when it opens and closes on esc.
type fakeScreen struct {
	c    *common
	w, h int
}

func (s *fakeScreen) update(msg tea.Msg) (screen, tea.Cmd) {
	if k, ok := msg.(tea.KeyMsg); ok && key.Matches(k, s.c.keys.Back) {
		return s, popScreen()
	}
	return s, nil
}
func (s *fakeScreen) view() string     { return fit("FAKE SCREEN", s.w, s.h) }
func (s *fakeScreen) setSize(w, h int) { s.w, s.h = w, h }

// TestScreenContract: a registered screen opens from the elevation with its
// key, gets the window size, may edit the document, and on closing the
// elevation re-solves the changed wall.
func TestScreenContract(t *testing.T) {
	saved := screenEntries
	defer func() { screenEntries = saved }()
	registerScreen(screenEntry{
		name: "fake",
		key:  key.NewBinding(key.WithKeys("Z"), key.WithHelp("Z", "fake")),
		open: func(c *common) (screen, tea.Cmd) {
			_ = c.doc.change(func(w *geometry.Wall) error {
				w.Layouts[w.Active].Openings[0].X += geometry.Foot
				return nil
			})
			return &fakeScreen{c: c}, nil
		},
	})
	ed := newEditor(t, annex(), "", 100, 30)
	var run func(cmd tea.Cmd)
	run = func(cmd tea.Cmd) {
		for cmd != nil {
			msg := cmd()
			if b, ok := msg.(tea.BatchMsg); ok {
				for _, c := range b {
					run(c)
				}
				return
			}
			cmd = ed.press(msg)
		}
	}
	run(ed.press(runes("Z")))
	if v := ed.view(); !strings.HasPrefix(v, "FAKE SCREEN") || len(strings.Split(v, "\n")) != 30 {
		t.Fatalf("registered screen not shown at the window size:\n%s", v)
	}
	run(ed.press(keyEsc))
	v := ed.view()
	if !strings.Contains(v, `D1 door: x 5'-0"`) {
		t.Errorf("elevation did not re-read the document after the screen closed:\n%s", v)
	}
	if e := ed.elev(); e.version != ed.m.c.doc.version {
		t.Error("elevation shows an old solve")
	}
}

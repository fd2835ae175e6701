package tui

import (
	"fmt"
	"strings"
	"time"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"
)

// root is the bubbletea model: it owns the window size and a stack of
// screens, and routes messages to the screen on top (see screen).
type root struct {
	c     *common
	stack []screen

	smallQuit bool // ctrl+c was pressed once below the smallest size, with unsaved changes
	smallHelp bool // ? was pressed below the smallest size: the notice lists the keys
}

func newRoot(c *common, first screen) *root {
	return &root{c: c, stack: []screen{first}}
}

func (m *root) Init() tea.Cmd {
	if i, ok := m.stack[0].(interface{ init() tea.Cmd }); ok {
		return i.init()
	}
	return nil
}

func (m *root) top() screen { return m.stack[len(m.stack)-1] }

func (m *root) Update(msg tea.Msg) (tea.Model, tea.Cmd) {
	switch msg := msg.(type) {
	case tea.WindowSizeMsg:
		m.c.width, m.c.height = msg.Width, msg.Height
		m.smallQuit, m.smallHelp = false, false
		for _, s := range m.stack {
			s.setSize(msg.Width, msg.Height)
		}
		return m, nil
	case pushScreenMsg:
		msg.s.setSize(m.c.width, m.c.height)
		m.stack = append(m.stack, msg.s)
		return m, nil
	case popScreenMsg:
		if len(m.stack) > 1 {
			m.stack = m.stack[:len(m.stack)-1]
			return m.route(resumeMsg{})
		}
		return m, nil
	case tea.MouseMsg:
		if m.small() {
			return m, nil // nothing shows where the mouse points
		}
	case tea.KeyMsg:
		if m.small() {
			return m.smallKey(msg)
		}
		if keys, ok := splitRunes(msg); ok {
			cmds := make([]tea.Cmd, len(keys))
			for i, k := range keys {
				_, cmds[i] = m.Update(k)
			}
			return m, tea.Sequence(cmds...)
		}
		if key.Matches(msg, m.c.keys.Quit) {
			if !m.unsaved() {
				return m, tea.Quit
			}
			m.stack = m.stack[:1]
			return m.route(quitRequestMsg{})
		}
	}
	return m.route(msg)
}

// small reports whether the window is below the editor's size, where the
// root draws a notice instead of the screen (before the first size is
// known nothing is drawn and keys go through).
func (m *root) small() bool {
	w, h := m.c.width, m.c.height
	return (w != 0 || h != 0) && (w < minWidth || h < minHeight)
}

// smallKey is a key pressed while the "window too small" notice shows:
// only quit and help act, since nothing else can be seen. Quit asks by a
// second press when there are unsaved changes (the recovery copy stays).
func (m *root) smallKey(msg tea.KeyMsg) (tea.Model, tea.Cmd) {
	switch {
	case key.Matches(msg, m.c.keys.Quit):
		if !m.unsaved() || m.smallQuit {
			return m, tea.Quit
		}
		m.smallQuit = true
		return m, nil
	case key.Matches(msg, m.c.keys.Help):
		m.smallHelp = !m.smallHelp
	}
	return m, nil
}

// splitRunes splits a key message that holds several typed runes (a fast
// typist or key repeat can deliver "lll" in one read) into one message per
// rune, so that each press counts: the root does this once for every screen.
// Pastes are left whole.
func splitRunes(msg tea.Msg) ([]tea.KeyMsg, bool) {
	k, ok := msg.(tea.KeyMsg)
	if !ok || k.Type != tea.KeyRunes || k.Paste || len(k.Runes) < 2 {
		return nil, false
	}
	out := make([]tea.KeyMsg, len(k.Runes))
	for i, r := range k.Runes {
		out[i] = tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune{r}, Alt: k.Alt}
	}
	return out, true
}

// unsaved reports whether the document or any open screen holds changes
// that are not saved.
func (m *root) unsaved() bool {
	if m.c.doc != nil && m.c.doc.dirty() {
		return true
	}
	for _, s := range m.stack {
		if u, ok := s.(unsavedWork); ok && u.unsaved() {
			return true
		}
	}
	return false
}

// route hands msg to the top screen. Answers of background commands that
// arrive after their screen was closed go to whatever is on top, which
// ignores messages it does not know.
func (m *root) route(msg tea.Msg) (tea.Model, tea.Cmd) {
	s, cmd := m.top().update(msg)
	m.stack[len(m.stack)-1] = s
	return m, cmd
}

func (m *root) View() string {
	w, h := m.c.width, m.c.height
	if w == 0 && h == 0 {
		return "" // no size yet
	}
	if w < minWidth || h < minHeight {
		return tooSmall(w, h, m.smallQuit, m.smallHelp)
	}
	return m.top().view()
}

// tooSmall is the notice drawn instead of a screen in a small window.
func tooSmall(w, h int, quitAsked, help bool) string {
	lines := []string{
		"Window too small:",
		fmt.Sprintf("%d×%d, pierwise needs %d×%d.", w, h, minWidth, minHeight),
		"ctrl+c quits.",
	}
	if help {
		lines = append(lines, "Only ctrl+c and ? act here;", "enlarge the window to edit.")
	}
	if quitAsked {
		lines[2] = "Unsaved changes: ctrl+c again quits without saving."
	}
	for i, l := range lines {
		if lipgloss.Width(l) > w {
			lines[i] = truncate(l, w)
		}
	}
	if len(lines) > h {
		lines = lines[:max(h, 0)]
	}
	return strings.Join(lines, "\n")
}

// newCommon builds the shared part of the screens.
func newCommon(doc *document, r *lipgloss.Renderer) *common {
	return &common{styles: newStyles(r), keys: newCommonKeys(), doc: doc, now: time.Now, tick: tea.Tick, fe: &feGate{}}
}

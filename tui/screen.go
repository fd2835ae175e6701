package tui

import (
	"time"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
)

// screen is one full-window view of the editor: the elevation, the storey,
// a comparison of layouts, a sweep. Screens are plain structs created with
// the shared *common; the root model owns the window and routes to them.
//
// The contract:
//
//   - update gets every message except tea.WindowSizeMsg (the root handles
//     it once and calls setSize) and returns the screen to keep (usually
//     itself) and a command. All work and I/O happen here or in commands that
//     capture copies of their input; tag background answers with an id and
//     drop stale ones.
//   - view draws exactly the size last given to setSize (width × height
//     cells, no more lines); it is pure: it reads fields only.
//   - setSize is called before the first view and on every resize, with the
//     whole window (there is no frame around screens). The root shows a
//     "too small" notice instead of any screen below minWidth × minHeight,
//     so a screen may assume at least that much.
//
// A screen opens another with pushScreen(next) and closes itself with
// popScreen(); the screen revealed by a pop receives a resumeMsg so it can
// re-read the document (the closed screen may have changed the wall or the
// active layout). Ctrl+C (common keys.Quit) is handled by the root: with
// unsaved changes (the document's, or those of a screen that implements
// unsavedWork) it returns to the first screen and sends it a
// quitRequestMsg, which the first screen answers by asking first. The root
// also splits a key message of several typed runes into one per rune, so
// a screen sees every press of a fast typist or of key repeat.
//
// Screens in other files join the elevation screen's keys by registering
// from init:
//
//	func init() {
//		registerScreen(screenEntry{
//			name: "compare",
//			key:  key.NewBinding(key.WithKeys("C"), key.WithHelp("C", "compare layouts")),
//			open: func(c *common) (screen, tea.Cmd) { return newCompare(c), nil },
//		})
//	}
//
// Registered keys must not clash with the elevation's own (see KeyMap); the
// elevation's keys win. A screen that edits the wall does it through
// c.doc.change so that undo, redo and the unsaved-changes mark keep working.
type screen interface {
	update(msg tea.Msg) (screen, tea.Cmd)
	view() string
	setSize(width, height int)
}

// common is what every screen shares: the window size, the styles, the keys
// every screen understands and the document being edited. doc is nil when
// the editor was started on something other than a wall.
type common struct {
	width, height int
	styles        *styles
	keys          commonKeys
	doc           *document
	now           func() time.Time // the clock; fixed in tests
	fe            *feGate          // the one finite-element check in flight
	version       string           // the program's version, for reports
	basis         geometry.Basis   // the editor's basis (the elevation's b key); the sweep and comparison follow it

	// tick is tea.Tick; tests that run commands replace it so that a timer
	// (the FE check's delay) is never mistaken for work, however slow the
	// machine.
	tick func(d time.Duration, fn func(time.Time) tea.Msg) tea.Cmd
}

// commonKeys are understood on every screen.
type commonKeys struct {
	Back key.Binding // leave the current screen (esc)
	Help key.Binding // show the full key help (?)
	Quit key.Binding // leave the program (ctrl+c), asking first with unsaved changes
}

func newCommonKeys() commonKeys {
	return commonKeys{
		Back: key.NewBinding(key.WithKeys("esc"), key.WithHelp("esc", "back")),
		Help: key.NewBinding(key.WithKeys("?"), key.WithHelp("?", "help")),
		Quit: key.NewBinding(key.WithKeys("ctrl+c"), key.WithHelp("ctrl+c", "quit")),
	}
}

// Smallest window the editor draws in; below it the root says so.
const (
	minWidth  = 80
	minHeight = 24
)

// screenEntry is a screen other files offer from the elevation screen.
type screenEntry struct {
	name string      // short name, for the help
	key  key.Binding // opens it from the elevation screen
	open func(c *common) (screen, tea.Cmd)
}

var screenEntries []screenEntry

// registerScreen adds a screen to the elevation screen's keys; call it
// from init.
func registerScreen(e screenEntry) {
	if e.open == nil || e.name == "" {
		panic("tui: registerScreen needs a name and an open function")
	}
	screenEntries = append(screenEntries, e)
}

// unsavedWork is implemented by a screen that holds unsaved changes of its
// own, beside the common document (the storey screen's walls).
type unsavedWork interface{ unsaved() bool }

// Messages of the screen contract.
type (
	pushScreenMsg  struct{ s screen }
	popScreenMsg   struct{}
	resumeMsg      struct{} // sent to the screen revealed by a pop
	quitRequestMsg struct{} // sent to the first screen on ctrl+c with unsaved changes
)

// pushScreen opens s on top of the current screen.
func pushScreen(s screen) tea.Cmd { return func() tea.Msg { return pushScreenMsg{s} } }

// popScreen closes the current screen (the first screen cannot be closed).
func popScreen() tea.Cmd { return func() tea.Msg { return popScreenMsg{} } }

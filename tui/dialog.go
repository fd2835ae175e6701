package tui

import (
	"fmt"
	"strings"

	"github.com/charmbracelet/lipgloss"
	"github.com/charmbracelet/x/ansi"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
	"pierwise/pier"
)

// A question is what a dialog asks; the parent reads the answer by it.
type question int

const (
	askQuit     question = iota + 1 // unsaved changes: save and quit, quit, stay
	askReplace                      // save as onto an existing file
	askChanged                      // the file changed on disk since it was read
	askComments                     // saving would drop the file's comments
)

// choice is a dialog of one line: a question and a few answers, each on a
// key. It is a sub-model: it changes nothing itself, it sends a chosenMsg
// with the answer (or a cancelledMsg) which the parent applies.
type choice struct {
	ask     question
	text    string
	answers []answer
	cancel  key.Binding
	req     saveRequest // the save the question is about (askReplace, askChanged, askComments)
}

// answer is one way out of a choice, on a key.
type answer struct {
	key  key.Binding
	what string // what the parent does, e.g. "replace"
}

type (
	chosenMsg struct {
		ask  question
		what string
		req  saveRequest
	}
	cancelledMsg struct{ ask question }
)

func newChoice(ask question, text string, answers ...answer) *choice {
	return &choice{ask: ask, text: text, answers: answers,
		cancel: key.NewBinding(key.WithKeys("esc"), key.WithHelp("esc", "cancel"))}
}

func ans(keys, help, what string) answer {
	return answer{key: key.NewBinding(key.WithKeys(strings.Split(keys, ",")...), key.WithHelp(strings.Split(keys, ",")[0], help)), what: what}
}

// update answers a key: the chosen answer's message, a cancel, or nothing
// (other keys are ignored while the question is open).
func (c *choice) update(msg tea.KeyMsg) tea.Cmd {
	for _, a := range c.answers {
		if key.Matches(msg, a.key) {
			m := chosenMsg{ask: c.ask, what: a.what, req: c.req}
			return func() tea.Msg { return m }
		}
	}
	if key.Matches(msg, c.cancel) {
		m := cancelledMsg{ask: c.ask}
		return func() tea.Msg { return m }
	}
	return nil
}

// view is the status line of the question in width cells: the text gives
// way (cut with an ellipsis) so that the answers' keys always show.
func (c *choice) view(st *styles, width int) string {
	bs := make([]key.Binding, 0, len(c.answers)+1)
	for _, a := range c.answers {
		bs = append(bs, a.key)
	}
	if c.ask != askQuit {
		bs = append(bs, c.cancel)
	}
	keys := keyHint(st, bs...)
	text := c.text
	if room := width - lipgloss.Width(keys) - 1; lipgloss.Width(text) > room {
		text = ansi.Truncate(text, max(room, 1), "…")
	}
	return st.errText.Render(text) + " " + keys
}

// helpPage is the full key help as a sub-model: it sends helpClosedMsg on
// ?, esc or q, and its view lists the keys it was made with. It scrolls
// (scroller) when the page is taller than the screen.
type helpPage struct {
	keys  KeyMap
	close []key.Binding
	scroller
}

type helpClosedMsg struct{}

func (h *helpPage) update(msg tea.KeyMsg) tea.Cmd {
	if key.Matches(msg, h.close...) {
		h.off = 0
		return func() tea.Msg { return helpClosedMsg{} }
	}
	h.scroll(msg)
	return nil
}

// scroller is the scrolling of a page of text taller than its box: ↑/k and
// ↓/j by a line, pgup and pgdown (and space) by a box, home and end. off is
// the first line shown; the view clamps it to the page.
type scroller struct {
	off    int
	height int // the box's rows
	n      int // the page's lines
}

// fitTo tells the scroller the size of its box and of its page, before a
// key is handed to it.
func (s *scroller) fitTo(height, n int) {
	s.height, s.n = height, n
	s.off = min(s.off, s.last())
}

// last is the largest offset: the page's end at the box's bottom.
func (s *scroller) last() int {
	if s.n <= s.height {
		return 0
	}
	return s.n - (s.height - 1)
}

var (
	scrollUp   = key.NewBinding(key.WithKeys("up", "k"), key.WithHelp("↑/k", "scroll up"))
	scrollDown = key.NewBinding(key.WithKeys("down", "j"), key.WithHelp("↓/j", "scroll down"))
	scrollPgUp = key.NewBinding(key.WithKeys("pgup", "b"), key.WithHelp("pgup", "page up"))
	scrollPgDn = key.NewBinding(key.WithKeys("pgdown", " ", "f"), key.WithHelp("pgdown", "page down"))
	scrollHome = key.NewBinding(key.WithKeys("home", "g"), key.WithHelp("home", "top"))
	scrollEnd  = key.NewBinding(key.WithKeys("end", "G"), key.WithHelp("end", "bottom"))
)

func (s *scroller) scroll(msg tea.KeyMsg) {
	page := max(1, s.height-2)
	switch {
	case key.Matches(msg, scrollUp):
		s.off--
	case key.Matches(msg, scrollDown):
		s.off++
	case key.Matches(msg, scrollPgUp):
		s.off -= page
	case key.Matches(msg, scrollPgDn):
		s.off += page
	case key.Matches(msg, scrollHome):
		s.off = 0
	case key.Matches(msg, scrollEnd):
		s.off = s.last()
	}
	s.off = max(min(s.off, s.last()), 0)
}

// window returns the lines of a page that fit height rows from the
// scroller's offset (clamped), with a last line saying where the window is
// when the page does not fit.
func (s scroller) window(st *styles, lines []string, height int) []string {
	if len(lines) <= height || height < 2 {
		return lines
	}
	rows := height - 1
	off := min(max(s.off, 0), len(lines)-rows)
	out := append([]string(nil), lines[off:off+rows]...)
	return append(out, st.dim.Render(fmt.Sprintf("lines %d–%d of %d: ↑↓ pgup pgdown home end scroll", off+1, off+rows, len(lines))))
}

// view lists every key in as many columns as fit.
func (h *helpPage) view(st *styles, width, height int, units geometry.System) string {
	return strings.Join(h.window(st, h.content(st, width, units), height), "\n")
}

// content is the whole help page, before it is fitted to the screen.
func (h *helpPage) content(st *styles, width int, units geometry.System) []string {
	var items []key.Binding
	for _, g := range h.keys.FullHelp() {
		items = append(items, g...)
	}
	kw, dw := 0, 0
	for _, b := range items {
		kw = max(kw, lipgloss.Width(b.Help().Key))
		dw = max(dw, lipgloss.Width(b.Help().Desc))
	}
	colW := kw + 1 + dw + 3
	ncol := max(1, width/colW)
	nrow := (len(items) + ncol - 1) / ncol
	lines := []string{st.heading.Render("Keys") + st.dim.Render("  (? or esc closes)"), ""}
	for r := 0; r < nrow; r++ {
		var b strings.Builder
		for c := 0; c < ncol; c++ {
			i := c*nrow + r
			if i >= len(items) {
				break
			}
			h := items[i].Help()
			b.WriteString(st.key.Render(padRight(h.Key, kw)) + " " + padRight(h.Desc, dw) + "   ")
		}
		lines = append(lines, b.String())
	}
	lines = append(lines, "")
	lines = append(lines, wrap("Elevation: piers are shaded by their share of the wall shear "+tintLegend(st)+
		". The selected opening is drawn with doubled lines (= and #), highlighted. Mouse: a click selects an opening, a drag moves it by the step. Pier table: b/s is the bending/shear split of a pier's own deflection in %, FE the share in the finite-element model; pgup and pgdown scroll it when its rows do not fit. ! lists the warnings, most severe first. Lengths in "+unitName(units)+".", width)...)
	lines = append(lines, "")
	lines = append(lines, wrap("Assumption of the classic method: "+pier.FixedPiersAssumption+" (docs/method.md §2.6)", width)...)
	return lines
}

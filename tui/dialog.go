package tui

import (
	"strings"

	"github.com/charmbracelet/lipgloss"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
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

// view is the status line of the question.
func (c *choice) view(st *styles) string {
	bs := make([]key.Binding, 0, len(c.answers)+1)
	for _, a := range c.answers {
		bs = append(bs, a.key)
	}
	if c.ask != askQuit {
		bs = append(bs, c.cancel)
	}
	return st.errText.Render(c.text) + " " + keyHint(st, bs...)
}

// helpPage is the full key help as a sub-model: it sends helpClosedMsg on
// ?, esc or q, and its view lists the keys it was made with.
type helpPage struct {
	keys  KeyMap
	close []key.Binding
}

type helpClosedMsg struct{}

func (h *helpPage) update(msg tea.KeyMsg) tea.Cmd {
	if key.Matches(msg, h.close...) {
		return func() tea.Msg { return helpClosedMsg{} }
	}
	return nil
}

// view lists every key in as many columns as fit.
func (h *helpPage) view(st *styles, width int, units geometry.System) string {
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
		". The selected opening is drawn with doubled lines (= and #), highlighted. Mouse: a click selects an opening, a drag moves it by the step. Pier table: b/s is the bending/shear split of a pier's own deflection in %, FE the share in the finite-element model. Lengths in "+unitName(units)+".", width)...)
	return strings.Join(lines, "\n")
}

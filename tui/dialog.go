package tui

import (
	"strings"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
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

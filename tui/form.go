package tui

import (
	"strconv"
	"strings"

	"github.com/charmbracelet/bubbles/key"
	"github.com/charmbracelet/bubbles/textinput"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"

	"pierwise/geometry"
)

// form is a small dialog of text fields (bubbles textinput) used to type
// exact values: an opening, the wall, a file name, a layout name. It is a
// part of the screen that opened it: its update answers formSubmitted (the
// typed values) or formCancelled, which the screen applies; errors the
// screen finds go back to the form with showErrors, beside the fields (or
// under them), and the form stays open. When the fields do not fit the
// height, the form scrolls with the focus.
type form struct {
	title  string
	fields []formField
	focus  int
	err    string // an error that belongs to no single field
	keys   formKeys
	width  int
}

// formSubmitted is the form's answer to enter: every field's value
// (trimmed) and whether it differs from the value the form opened with.
type formSubmitted struct {
	vals    []string
	changed []bool
}

// formCancelled is the form's answer to esc.
type formCancelled struct{}

type formField struct {
	label string
	hint  string // what may be typed, shown dim
	first string // the value the form opened with, as shown (geometry.Visible)
	raw   string // the value as given, which an unchanged field answers with
	input textinput.Model
	err   string
}

// formResult is submit's answer: per-field errors (index → message), an
// error for the whole form, and a command to run when the form closes.
type formResult struct {
	fields map[int]string
	err    string
	cmd    tea.Cmd
}

func (r formResult) ok() bool { return len(r.fields) == 0 && r.err == "" }

type formKeys struct {
	Next, Prev, Apply, Cancel key.Binding
}

func newFormKeys() formKeys {
	return formKeys{
		Next:   key.NewBinding(key.WithKeys("tab", "down"), key.WithHelp("tab/↓", "next field")),
		Prev:   key.NewBinding(key.WithKeys("shift+tab", "up"), key.WithHelp("shift+tab/↑", "previous field")),
		Apply:  key.NewBinding(key.WithKeys("enter"), key.WithHelp("enter", "apply")),
		Cancel: key.NewBinding(key.WithKeys("esc"), key.WithHelp("esc", "cancel")),
	}
}

func (k formKeys) ShortHelp() []key.Binding  { return []key.Binding{k.Next, k.Prev, k.Apply, k.Cancel} }
func (k formKeys) FullHelp() [][]key.Binding { return [][]key.Binding{k.ShortHelp()} }

// fieldSpec describes a field when a form is made.
type fieldSpec struct{ label, value, hint string }

func newForm(title string, specs []fieldSpec) *form {
	f := &form{title: title, keys: newFormKeys()}
	for _, s := range specs {
		in := textinput.New()
		in.Prompt = ""
		// A value from a file may hold control characters: the field shows
		// them escaped, and answers with the value as given while it is
		// not edited (a name is not changed by opening its form).
		shown := geometry.Visible(s.value)
		in.SetValue(shown)
		in.CharLimit = 200
		f.fields = append(f.fields, formField{label: s.label, hint: s.hint, first: shown, raw: s.value, input: in})
	}
	f.setFocus(0)
	return f
}

func (f *form) setFocus(i int) {
	f.fields[f.focus].input.Blur()
	f.focus = i
	f.fields[i].input.Focus()
	f.fields[i].input.CursorEnd()
}

func (f *form) setWidth(w int) {
	f.width = w
	for i := range f.fields {
		f.fields[i].input.Width = f.inputWidth()
	}
}

func (f *form) labelWidth() int {
	n := 0
	for _, fl := range f.fields {
		n = max(n, len(fl.label))
	}
	return n
}

// window returns the fields shown in rows lines: all of them when they
// fit, otherwise the first ones, scrolled just enough to show the focus.
func (f *form) window(rows int) (first, last int) {
	n := len(f.fields)
	if rows >= n || rows < 1 {
		return 0, n
	}
	first = max(0, min(f.focus-rows+1, n-rows))
	return first, first + rows
}

func (f *form) inputWidth() int { return max(12, min(30, f.width/3)) }

// update handles a message; the event is formSubmitted, formCancelled or
// nil.
func (f *form) update(msg tea.Msg) (event tea.Msg, cmd tea.Cmd) {
	if k, ok := msg.(tea.KeyMsg); ok {
		switch {
		case key.Matches(k, f.keys.Cancel):
			return formCancelled{}, nil
		case key.Matches(k, f.keys.Next):
			f.setFocus((f.focus + 1) % len(f.fields))
			return nil, nil
		case key.Matches(k, f.keys.Prev):
			f.setFocus((f.focus - 1 + len(f.fields)) % len(f.fields))
			return nil, nil
		case key.Matches(k, f.keys.Apply):
			s := formSubmitted{vals: make([]string, len(f.fields)), changed: make([]bool, len(f.fields))}
			for i, fl := range f.fields {
				s.vals[i] = strings.TrimSpace(fl.input.Value())
				s.changed[i] = s.vals[i] != strings.TrimSpace(fl.first)
				if !s.changed[i] {
					s.vals[i] = strings.TrimSpace(fl.raw)
				}
			}
			return s, nil
		}
	}
	var c tea.Cmd
	f.fields[f.focus].input, c = f.fields[f.focus].input.Update(msg)
	return nil, c
}

// showErrors puts the screen's answer to a submission on the form and
// moves the focus to the first field in error.
func (f *form) showErrors(r formResult) {
	for i := range f.fields {
		f.fields[i].err = r.fields[i]
	}
	f.err = r.err
	for i := range f.fields {
		if f.fields[i].err != "" {
			f.setFocus(i)
			break
		}
	}
}

// view draws the form in w × h cells.
func (f *form) view(st *styles, w, h int) string {
	var b strings.Builder
	b.WriteString(st.heading.Render(geometry.Visible(f.title)))
	b.WriteString("\n\n")
	lw := f.labelWidth()
	iw := f.inputWidth()
	rows := h - 4 // title, blank line, then a line for "more" and the help line
	if f.err != "" {
		rows -= 1 + len(f.err)/max(1, w)
	}
	first, last := f.window(rows)
	if first > 0 {
		b.Reset()
		b.WriteString(st.heading.Render(geometry.Visible(f.title)))
		b.WriteString(st.dim.Render("  ↑ " + strconv.Itoa(first) + " more above"))
		b.WriteString("\n\n")
	}
	for i := first; i < last; i++ {
		fl := f.fields[i]
		mark := "  "
		label := padRight(fl.label, lw)
		if i == f.focus {
			mark = "> "
			label = st.focus.Render(label)
		}
		val := fl.input.View()
		line := mark + label + "  [" + padRight(val, iw+1) + "]  "
		note := fl.hint
		if fl.err != "" {
			note = "! " + fl.err
		}
		if fl.err != "" && lipgloss.Width(line)+len(note) > w {
			// A long error goes on its own line under the field.
			b.WriteString(line + "\n")
			for _, l := range wrap(note, max(20, w-lw-4)) {
				b.WriteString(strings.Repeat(" ", lw+4) + st.errText.Render(l) + "\n")
			}
			continue
		}
		if fl.err != "" {
			line += st.errText.Render(note)
		} else {
			line += st.dim.Render(note)
		}
		b.WriteString(line)
		b.WriteString("\n")
	}
	if n := len(f.fields) - last; n > 0 {
		b.WriteString(st.dim.Render("  ↓ " + strconv.Itoa(n) + " more below (tab)"))
	}
	b.WriteString("\n")
	if f.err != "" {
		b.WriteString(st.errText.Render("! " + f.err))
		b.WriteString("\n")
	}
	b.WriteString(st.dim.Render("enter applies, esc cancels, tab/↑/↓ move between fields"))
	return fit(b.String(), w, h)
}

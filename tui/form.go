package tui

import (
	"strings"

	"github.com/charmbracelet/bubbles/key"
	"github.com/charmbracelet/bubbles/textinput"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"
)

// form is a small dialog of text fields (bubbles textinput) used to type
// exact values: an opening, the wall, a file name, a layout name. submit
// gets the typed values; when it reports errors they are shown beside the
// fields (or under them) and the form stays open.
type form struct {
	title  string
	fields []formField
	focus  int
	err    string // an error that belongs to no single field
	keys   formKeys
	width  int

	submit func(vals []string, changed []bool) formResult
}

type formField struct {
	label string
	hint  string // what may be typed, shown dim
	first string // the value the form opened with
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

func newForm(title string, specs []fieldSpec, submit func(vals []string, changed []bool) formResult) *form {
	f := &form{title: title, keys: newFormKeys(), submit: submit}
	for _, s := range specs {
		in := textinput.New()
		in.Prompt = ""
		in.SetValue(s.value)
		in.CharLimit = 200
		f.fields = append(f.fields, formField{label: s.label, hint: s.hint, first: s.value, input: in})
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

func (f *form) inputWidth() int { return max(12, min(30, f.width/3)) }

// update handles a message; done reports that the form closed (applied or
// cancelled).
func (f *form) update(msg tea.Msg) (done bool, cmd tea.Cmd) {
	if k, ok := msg.(tea.KeyMsg); ok {
		switch {
		case key.Matches(k, f.keys.Cancel):
			return true, nil
		case key.Matches(k, f.keys.Next):
			f.setFocus((f.focus + 1) % len(f.fields))
			return false, nil
		case key.Matches(k, f.keys.Prev):
			f.setFocus((f.focus - 1 + len(f.fields)) % len(f.fields))
			return false, nil
		case key.Matches(k, f.keys.Apply):
			vals := make([]string, len(f.fields))
			changed := make([]bool, len(f.fields))
			for i, fl := range f.fields {
				vals[i] = strings.TrimSpace(fl.input.Value())
				changed[i] = vals[i] != strings.TrimSpace(fl.first)
			}
			r := f.submit(vals, changed)
			for i := range f.fields {
				f.fields[i].err = r.fields[i]
			}
			f.err = r.err
			if r.ok() {
				return true, r.cmd
			}
			for i := range f.fields {
				if f.fields[i].err != "" {
					f.setFocus(i)
					break
				}
			}
			return false, nil
		}
	}
	var c tea.Cmd
	f.fields[f.focus].input, c = f.fields[f.focus].input.Update(msg)
	return false, c
}

// view draws the form in w × h cells.
func (f *form) view(st *styles, w, h int) string {
	var b strings.Builder
	b.WriteString(st.heading.Render(f.title))
	b.WriteString("\n\n")
	lw := f.labelWidth()
	iw := f.inputWidth()
	for i, fl := range f.fields {
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
	b.WriteString("\n")
	if f.err != "" {
		b.WriteString(st.errText.Render("! " + f.err))
		b.WriteString("\n")
	}
	b.WriteString(st.dim.Render("enter applies, esc cancels, tab/↑/↓ move between fields"))
	return fit(b.String(), w, h)
}

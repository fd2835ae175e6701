package tui

import (
	"cmp"
	"fmt"
	"math"
	"slices"
	"strings"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"pierwise/pier"
	"pierwise/pier/fe"
)

// warnPage lists every warning of the wall, most severe first, as a
// sub-model: it scrolls (scroller) and sends warnClosedMsg on !, esc or q.
type warnPage struct {
	close []key.Binding
	scroller
}

type warnClosedMsg struct{}

func (p *warnPage) update(msg tea.KeyMsg) tea.Cmd {
	if key.Matches(msg, p.close...) {
		p.off = 0
		return func() tea.Msg { return warnClosedMsg{} }
	}
	p.scroll(msg)
	return nil
}

// bySeverity returns the warnings most severe first, in their order within
// a severity.
func bySeverity(ws []pier.Warning) []pier.Warning {
	out := slices.Clone(ws)
	slices.SortStableFunc(out, func(a, b pier.Warning) int { return cmp.Compare(b.Severity, a.Severity) })
	return out
}

// content is the whole page: a heading, then each warning wrapped, with its
// severity and subject.
func (p *warnPage) content(st *styles, width int, ws []pier.Warning) []string {
	lines := []string{st.heading.Render("Warnings") + st.dim.Render("  most severe first (! or esc closes)"), ""}
	for _, w := range bySeverity(ws) {
		label := "[" + w.Severity.String() + "] "
		style := st.note
		if w.Severity == pier.SeveritySerious {
			style = st.fail
		}
		for i, l := range wrap(label+w.Text, width-2) {
			if i == 0 {
				l = style.Render(label) + strings.TrimPrefix(l, label)
			} else {
				l = "  " + l
			}
			lines = append(lines, l)
		}
		lines = append(lines, "")
	}
	return lines
}

func (p *warnPage) view(st *styles, width, height int, ws []pier.Warning) string {
	return strings.Join(p.window(st, p.content(st, width, ws), height), "\n")
}

// warnings are the classic result's warnings and the FE check's (as
// cautions), or none.
func (e *elevation) warnings() []pier.Warning {
	var ws []pier.Warning
	if e.onFE() {
		// The model's answer carries its own warnings (basis.go).
		if r := e.bs.shown; r != nil {
			ws = append(ws, r.Warnings...)
		}
		return ws
	}
	if e.res != nil {
		ws = append(ws, e.res.Warnings...)
	}
	if e.fe.on && e.fe.res != nil && !e.fe.stale() {
		if d := e.fe.res.Difference; e.res != nil && math.Abs(d) > fe.WarnDifference {
			ws = append(ws, pier.Warning{Kind: "finite-element difference", Severity: pier.SeverityCaution, Subject: "wall",
				Text: fmt.Sprintf("the classic method's rigidity differs from the finite-element model's by %+.0f %% (more than ±%.0f %%): the piers are not as well fixed as the method assumes; prefer the finite-element rigidity for distributing shear, or justify the difference", 100*d, 100*fe.WarnDifference)})
		}
		for _, t := range e.fe.res.Warnings {
			ws = append(ws, pier.Warning{Kind: "finite-element", Severity: pier.SeverityCaution, Subject: "wall", Text: "FE check: " + t})
		}
	}
	return ws
}

package report

import (
	"fmt"
	"io"
	"strings"
	"unicode/utf8"

	"pierwise/geometry"
)

// Width is the line width of the text reports.
const Width = 78

// Text writes the lines of a plain-text report and keeps the first write
// error, so a report is written without checking every line. The wall,
// comparison and storey reports all lay out their text through it.
type Text struct {
	out io.Writer
	err error
}

// NewText returns a Text writing to out.
func NewText(out io.Writer) *Text { return &Text{out: out} }

// Err returns the first write error.
func (w *Text) Err() error { return w.err }

// Line writes one line without trailing blanks. Control characters (from a
// title or a name in a file) are shown escaped (geometry.Visible), so a
// report never carries an escape sequence to a terminal or a printer.
func (w *Text) Line(s string) {
	if w.err != nil {
		return
	}
	_, w.err = fmt.Fprintln(w.out, geometry.Visible(strings.TrimRight(s, " ")))
}

// Blank writes an empty line.
func (w *Text) Blank() { w.Line("") }

// Title writes the report's title, underlined with '='.
func (w *Text) Title(s string) {
	w.Line(s)
	w.Line(strings.Repeat("=", utf8.RuneCountInString(s)))
}

// Section writes a blank line and a heading underlined with '-'.
func (w *Text) Section(s string) {
	w.Blank()
	w.Line(s)
	w.Line(strings.Repeat("-", min(utf8.RuneCountInString(s), Width)))
}

// KV writes "  key:  value" with the values aligned; an empty key continues
// the value above.
func (w *Text) KV(k, v string) {
	if k != "" {
		k += ":"
	}
	w.Wrapped(fmt.Sprintf("  %-12s ", k), v)
}

// Lines writes each line of block after indent.
func (w *Text) Lines(block, indent string) {
	for _, l := range strings.Split(strings.TrimRight(block, "\n"), "\n") {
		w.Line(indent + l)
	}
}

// Para writes text as it is, line by line.
func (w *Text) Para(s string) { w.Lines(s, "") }

// Wrapped writes s word-wrapped to Width after a first-line prefix, the
// following lines indented to match.
func (w *Text) Wrapped(prefix, s string) {
	pad := strings.Repeat(" ", utf8.RuneCountInString(prefix))
	cur, empty := prefix, true
	for _, word := range strings.Fields(s) {
		if !empty && utf8.RuneCountInString(cur)+1+utf8.RuneCountInString(word) > Width {
			w.Line(cur)
			cur, empty = pad, true
		}
		if !empty {
			cur += " "
		}
		cur += word
		empty = false
	}
	w.Line(cur)
}

// Close ends a report: its warnings as a list ("none" when there are
// none) under the heading the caller wrote, then the caution.
func (w *Text) Close(warnings []string) {
	if len(warnings) == 0 {
		w.Line("  none")
	}
	for _, s := range warnings {
		w.Wrapped("  - ", s)
	}
	w.Blank()
	w.Para(Caution)
}

// Table is a plain-text table with a header, a rule, and columns aligned
// left or right (Right[i]).
type Table struct {
	Head  []string
	Right []bool
	rows  [][]string
}

// Add appends a row.
func (t *Table) Add(cells ...string) { t.rows = append(t.rows, cells) }

// Write writes the table, each line after indent.
func (t *Table) Write(w *Text, indent string) {
	widths := make([]int, len(t.Head))
	for i, h := range t.Head {
		widths[i] = utf8.RuneCountInString(h)
	}
	for _, r := range t.rows {
		for i, c := range r {
			if i < len(widths) {
				widths[i] = max(widths[i], utf8.RuneCountInString(c))
			}
		}
	}
	row := func(cells []string) string {
		var b strings.Builder
		b.WriteString(indent)
		for i, c := range cells {
			if i >= len(widths) {
				break
			}
			if i > 0 {
				b.WriteString("  ")
			}
			pad := strings.Repeat(" ", widths[i]-utf8.RuneCountInString(c))
			if i < len(t.Right) && t.Right[i] {
				b.WriteString(pad + c)
			} else {
				b.WriteString(c + pad)
			}
		}
		return b.String()
	}
	w.Line(row(t.Head))
	rule := make([]string, len(widths))
	for i, n := range widths {
		rule[i] = strings.Repeat("-", n)
	}
	w.Line(row(rule))
	for _, r := range t.rows {
		w.Line(row(r))
	}
}

package report

import (
	"fmt"
	"io"
	"strings"
	"unicode/utf8"
)

// width is the report's line width.
const width = 78

// writer writes report lines and keeps the first error.
type writer struct {
	out io.Writer
	err error
}

func (w *writer) line(s string) {
	if w.err != nil {
		return
	}
	_, w.err = fmt.Fprintln(w.out, strings.TrimRight(s, " "))
}

func (w *writer) blank() { w.line("") }

func (w *writer) title(s string) {
	w.line(s)
	w.line(strings.Repeat("=", utf8.RuneCountInString(s)))
}

func (w *writer) section(s string) {
	w.blank()
	w.line(s)
	w.line(strings.Repeat("-", utf8.RuneCountInString(s)))
}

func (w *writer) kv(k, v string) {
	if k != "" {
		k += ":"
	}
	w.line(fmt.Sprintf("  %-12s %s", k, v))
}

func (w *writer) lines(block, indent string) {
	for _, l := range strings.Split(strings.TrimRight(block, "\n"), "\n") {
		w.line(indent + l)
	}
}

// para writes text as it is, line by line.
func (w *writer) para(s string) { w.lines(s, "") }

// wrapped writes s word-wrapped to the report width after a first-line prefix.
func (w *writer) wrapped(prefix, s string) {
	pad := strings.Repeat(" ", utf8.RuneCountInString(prefix))
	cur := prefix
	for _, word := range strings.Fields(s) {
		if utf8.RuneCountInString(cur)+1+utf8.RuneCountInString(word) > width && strings.TrimSpace(cur) != strings.TrimSpace(prefix) {
			w.line(cur)
			cur = pad
		}
		if cur == prefix || cur == pad {
			cur += word
		} else {
			cur += " " + word
		}
	}
	w.line(cur)
}

// table is a plain text table with columns aligned left or right.
type table struct {
	head  []string
	right []bool
	rows  [][]string
}

func (t *table) add(cells ...string) { t.rows = append(t.rows, cells) }

func (t *table) write(w *writer, indent string) {
	widths := make([]int, len(t.head))
	for i, h := range t.head {
		widths[i] = utf8.RuneCountInString(h)
	}
	for _, r := range t.rows {
		for i, c := range r {
			if n := utf8.RuneCountInString(c); i < len(widths) && n > widths[i] {
				widths[i] = n
			}
		}
	}
	row := func(cells []string) string {
		var b strings.Builder
		b.WriteString(indent)
		for i, c := range cells {
			if i > 0 {
				b.WriteString("  ")
			}
			pad := strings.Repeat(" ", widths[i]-utf8.RuneCountInString(c))
			if t.right[i] {
				b.WriteString(pad + c)
			} else {
				b.WriteString(c + pad)
			}
		}
		return b.String()
	}
	w.line(row(t.head))
	rule := make([]string, len(widths))
	for i, n := range widths {
		rule[i] = strings.Repeat("-", n)
	}
	w.line(row(rule))
	for _, r := range t.rows {
		w.line(row(r))
	}
}

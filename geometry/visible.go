package geometry

import (
	"fmt"
	"strings"
	"unicode"
	"unicode/utf8"
)

// Visible makes a string that came from a file safe to print on a
// terminal: every control character (ESC, BEL, NUL, newline, the C1 range,
// DEL) is shown as a Go escape (\x1b, \a, \x00, \n), bytes that are not
// UTF-8 as \xNN, and the bidirectional controls as \u escapes, so a title
// can neither clear the screen nor set the terminal's title. Printable text,
// accents and symbols pass unchanged. Every string from a file goes
// through it before it reaches the editor, a table, a report or an error.
func Visible(s string) string {
	clean := true
	for _, r := range s {
		if r == utf8.RuneError || needsEscape(r) {
			clean = false
			break
		}
	}
	if clean {
		return s
	}
	var b strings.Builder
	for i := 0; i < len(s); {
		r, n := utf8.DecodeRuneInString(s[i:])
		switch {
		case r == utf8.RuneError && n <= 1:
			fmt.Fprintf(&b, `\x%02x`, s[i])
		case r == '\a':
			b.WriteString(`\a`)
		case r == '\b':
			b.WriteString(`\b`)
		case r == '\t':
			b.WriteString(`\t`)
		case r == '\n':
			b.WriteString(`\n`)
		case r == '\r':
			b.WriteString(`\r`)
		case needsEscape(r) && r < 0x100:
			fmt.Fprintf(&b, `\x%02x`, r)
		case needsEscape(r):
			fmt.Fprintf(&b, `\u%04x`, r)
		default:
			b.WriteRune(r)
		}
		i += n
	}
	return b.String()
}

// VisibleLines is Visible line by line: the newlines of a message of
// several lines stay newlines, everything else is escaped.
func VisibleLines(s string) string {
	lines := strings.Split(s, "\n")
	for i, l := range lines {
		lines[i] = Visible(l)
	}
	return strings.Join(lines, "\n")
}

func needsEscape(r rune) bool {
	if unicode.IsControl(r) {
		return true
	}
	switch {
	case r >= 0x200e && r <= 0x200f, r >= 0x202a && r <= 0x202e, r >= 0x2066 && r <= 0x2069:
		return true // bidirectional controls reorder what follows
	}
	return false
}

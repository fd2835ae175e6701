package report

import (
	"fmt"
	"io"
	"strings"
	"unicode/utf8"

	"pierwise/geometry"
)

// SheetLines is the length of one sheet of a text report, its heading
// included: 60 lines, what a US Letter or an A4 page printed at 6 lines to
// the inch holds inside its margins (common practice for line-printed
// calculations). Sheets after the first begin with a form feed, so a
// printer starts a new page there.
const SheetLines = 60

// Heading is what every sheet of a report repeats at its top: the
// [project] table of the file and what the report is about.
type Heading struct {
	Project geometry.Project
	Subject string // "wall report: Library annex, east wall"
}

// headingLines is the number of lines the heading takes on every sheet.
const headingLines = 4

// lines returns the heading of sheet k of n: the project, job, engineer
// and checker, the subject with "sheet k of n" at the right margin, a rule
// and a blank line.
func (h Heading) lines(k, n int) []string {
	var parts []string
	for _, e := range h.Project.Entries() {
		parts = append(parts, e[0]+" "+geometry.Visible(e[1]))
	}
	project := strings.Join(parts, " · ")
	if project == "" {
		project = "project not given ([project] name, job, engineer, checker in the file)"
	}
	sheet := fmt.Sprintf("sheet %d of %d", k, n)
	subject := geometry.Visible(h.Subject)
	room := Width - utf8.RuneCountInString(sheet) - 2
	if utf8.RuneCountInString(subject) > room {
		subject = string([]rune(subject)[:max(room-1, 0)]) + "…"
	}
	pad := Width - utf8.RuneCountInString(subject) - utf8.RuneCountInString(sheet)
	return []string{
		clip(project, Width),
		subject + strings.Repeat(" ", max(pad, 1)) + sheet,
		strings.Repeat("-", Width),
		"",
	}
}

func clip(s string, n int) string {
	if utf8.RuneCountInString(s) <= n {
		return s
	}
	return string([]rune(s)[:n-1]) + "…"
}

// SheetBreak, a line of its own in the body given to Paginate, ends the
// sheet there: what follows begins the next sheet (one comparison of
// several per sheet, for instance).
const SheetBreak = "\f"

// Paginate writes body, the lines of a report, as sheets of SheetLines
// lines, each under the heading h with its number ("sheet 2 of 5"). A
// line that is SheetBreak starts a new sheet.
func Paginate(out io.Writer, body string, h Heading) error {
	per := SheetLines - headingLines
	var sheets [][]string
	for _, part := range strings.Split(strings.TrimRight(body, "\n"), "\n"+SheetBreak+"\n") {
		lines := strings.Split(strings.TrimRight(part, "\n"), "\n")
		for k := 0; k*per < len(lines) || k == 0; k++ {
			sheets = append(sheets, lines[k*per:min((k+1)*per, len(lines))])
		}
	}
	n := len(sheets)
	var b strings.Builder
	for k, sheet := range sheets {
		if k > 0 {
			b.WriteString("\f")
		}
		for _, l := range h.lines(k+1, n) {
			b.WriteString(strings.TrimRight(l, " ") + "\n")
		}
		for _, l := range sheet {
			b.WriteString(l + "\n")
		}
	}
	_, err := io.WriteString(out, b.String())
	return err
}

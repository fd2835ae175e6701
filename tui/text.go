package tui

import (
	"strings"

	"github.com/charmbracelet/lipgloss"
	"github.com/charmbracelet/x/ansi"
)

// truncate cuts s (which may hold escape codes) to at most w cells.
func truncate(s string, w int) string {
	if w <= 0 {
		return ""
	}
	return ansi.Truncate(s, w, "")
}

// fit makes s exactly w cells wide and h lines tall: long lines are cut,
// short ones padded, extra lines dropped, missing ones added blank.
func fit(s string, w, h int) string {
	lines := strings.Split(s, "\n")
	if len(lines) > h {
		lines = lines[:h]
	}
	for len(lines) < h {
		lines = append(lines, "")
	}
	for i, l := range lines {
		lw := lipgloss.Width(l)
		switch {
		case lw > w:
			lines[i] = truncate(l, w)
			if d := w - lipgloss.Width(lines[i]); d > 0 {
				lines[i] += strings.Repeat(" ", d)
			}
		case lw < w:
			lines[i] = l + strings.Repeat(" ", w-lw)
		}
	}
	return strings.Join(lines, "\n")
}

// padRight pads s with spaces to w cells (no cut).
func padRight(s string, w int) string {
	if d := w - lipgloss.Width(s); d > 0 {
		return s + strings.Repeat(" ", d)
	}
	return s
}

// padLeft right-aligns s in w cells (no cut).
func padLeft(s string, w int) string {
	if d := w - lipgloss.Width(s); d > 0 {
		return strings.Repeat(" ", d) + s
	}
	return s
}

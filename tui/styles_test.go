package tui

import (
	"fmt"
	"io"
	"strings"
	"testing"

	"github.com/charmbracelet/lipgloss"
	"github.com/charmbracelet/x/ansi"
	"github.com/muesli/termenv"
)

// TestMonochromeReads: without colour the piers' shares are still drawn
// (as textures), and with colour the same cells carry a background tint
// instead; the text of the labels is the same both ways.
func TestMonochromeReads(t *testing.T) {
	view := func(p termenv.Profile) string {
		r := lipgloss.NewRenderer(io.Discard)
		r.SetColorProfile(p)
		c := newCommon(newDocument(annex(), ""), r)
		e := newElevation(c)
		e.setSize(160, 48)
		return e.view()
	}
	mono, colour := view(termenv.Ascii), view(termenv.TrueColor)
	if strings.Contains(mono, "48;2;") || strings.Contains(mono, "38;2;") {
		t.Error("monochrome view has colour codes")
	}
	if !strings.Contains(colour, "48;2;") {
		t.Error("colour view has no background tint")
	}
	// P1.2.1 takes 37 % of the demo wall's shear: level 2 texture ':'.
	if !strings.Contains(ansi.Strip(mono), "::::") {
		t.Error("monochrome view has no share texture")
	}
	if strings.Contains(ansi.Strip(colour), "::::") {
		t.Error("colour view uses the monochrome texture")
	}
	for _, label := range []string{"P1.2.1 37%", "P1.1 13%", "PASS"} {
		if !strings.Contains(ansi.Strip(mono), label) || !strings.Contains(ansi.Strip(colour), label) {
			t.Errorf("%q not in both views", label)
		}
	}
}

// The five share tints stay five colours in a 256-colour terminal, light and
// dark (the 10–25 % and 25–40 % tints once mapped to one entry).
func TestTintsDistinctIn256(t *testing.T) {
	for _, dark := range []bool{false, true} {
		seen := map[string]int{}
		for i, c := range tintColors {
			hex := c.Light
			if dark {
				hex = c.Dark
			}
			got := fmt.Sprint(termenv.ANSI256.Color(hex))
			if j, dup := seen[got]; dup {
				t.Errorf("dark %v: tints %d and %d are both %s in 256 colours", dark, j, i, got)
			}
			seen[got] = i
		}
	}
}

// The help's colour legend wraps on the cells a reader sees: the colour
// codes of a swatch do not count, every line fits the width, and each
// swatch stays whole beside its label ("[  ] 0-10%" on one line), in
// colour and in monochrome.
func TestHelpLegendWraps(t *testing.T) {
	for _, p := range []termenv.Profile{termenv.TrueColor, termenv.ANSI256, termenv.Ascii} {
		r := lipgloss.NewRenderer(io.Discard)
		r.SetColorProfile(p)
		st := newStyles(r)
		page := &helpPage{keys: newKeyMap()}
		for _, width := range []int{60, 80, 120} {
			lines := page.content(st, width, 0)
			text := ansi.Strip(strings.Join(lines, "\n"))
			for _, l := range lines {
				if w := ansi.StringWidth(l); w > width {
					t.Errorf("profile %v, width %d: line of %d cells: %q", p, width, w, ansi.Strip(l))
				}
			}
			for _, want := range []string{"[  ] 0-10%", "10-25%", "25-40%", "40-60%", "60-100%"} {
				if !strings.Contains(text, want) {
					t.Errorf("profile %v, width %d: legend lacks %q whole:\n%s", p, width, want, text)
				}
			}
			if strings.Contains(text, "\u00a0") {
				t.Errorf("profile %v, width %d: a non-breaking space left in the help", p, width)
			}
		}
	}
	// A styled word counts its visible cells.
	red := lipgloss.NewStyle().Foreground(lipgloss.Color("#ff0000"))
	r := lipgloss.NewRenderer(io.Discard)
	r.SetColorProfile(termenv.TrueColor)
	word := red.Renderer(r).Render("abc")
	if got := wrap(word+" "+word+" "+word, 7); len(got) != 2 {
		t.Errorf("wrap of three styled 3-cell words at 7 cells: %d lines %q, want 2", len(got), got)
	}
}

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

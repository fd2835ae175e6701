package tui

import (
	"github.com/charmbracelet/lipgloss"
	"github.com/muesli/termenv"
)

// styles is the one place colours and emphasis are chosen. Every meaning
// carried by colour is also carried by characters or bold, so the screens
// read the same with NO_COLOR and on monochrome terminals (mono is then
// true and the elevation fills piers with a texture instead of a tint).
type styles struct {
	mono bool

	title    lipgloss.Style // the top bar
	heading  lipgloss.Style // panel headings
	dim      lipgloss.Style // secondary text, units
	key      lipgloss.Style // key names in hints
	selected lipgloss.Style // the selected opening in the elevation
	opening  lipgloss.Style // other openings' outlines
	wall     lipgloss.Style // the wall outline and scales
	pass     lipgloss.Style // a check that passes
	fail     lipgloss.Style // a check that fails
	errText  lipgloss.Style // an error or a refused edit
	note     lipgloss.Style // a neutral message
	focus    lipgloss.Style // the focused form field
	tint     [5]lipgloss.Style
}

// Share tint levels: the upper bounds of each level's share of the wall
// shear, and the texture used instead of the tint in monochrome.
var (
	tintBounds  = [5]float64{0.10, 0.25, 0.40, 0.60, 1.01}
	tintTexture = [5]rune{' ', '.', ':', 'o', 'O'}
)

// tintLevel returns the tint level of a share (0–1).
func tintLevel(share float64) int {
	for i, b := range tintBounds {
		if share < b {
			return i
		}
	}
	return len(tintBounds) - 1
}

// tintColors are the share tints, palest (least shear) first.
var tintColors = [5]lipgloss.AdaptiveColor{
	{Light: "#eeeeee", Dark: "#303030"},
	{Light: "#ffd7af", Dark: "#5f3a00"},
	{Light: "#ffaf5f", Dark: "#875f00"},
	{Light: "#ff8700", Dark: "#af5f00"},
	{Light: "#d75f00", Dark: "#d78700"},
}

func newStyles(r *lipgloss.Renderer) *styles {
	if r == nil {
		r = lipgloss.DefaultRenderer()
	}
	st := &styles{mono: r.ColorProfile() == termenv.Ascii}
	ns := r.NewStyle
	st.title = ns().Bold(true).Reverse(true)
	st.heading = ns().Bold(true).Underline(true)
	st.dim = ns().Faint(true)
	st.key = ns().Bold(true)
	st.selected = ns().Bold(true).Reverse(true)
	st.opening = ns().Foreground(lipgloss.AdaptiveColor{Light: "#1f4e9a", Dark: "#8ab4f8"})
	st.wall = ns().Bold(true)
	st.pass = ns().Bold(true).Foreground(lipgloss.AdaptiveColor{Light: "#1a7f37", Dark: "#56d364"})
	st.fail = ns().Bold(true).Foreground(lipgloss.AdaptiveColor{Light: "#b3261e", Dark: "#ff7b72"})
	st.errText = ns().Bold(true).Foreground(lipgloss.AdaptiveColor{Light: "#b3261e", Dark: "#ff7b72"})
	st.note = ns().Foreground(lipgloss.AdaptiveColor{Light: "#5a5a5a", Dark: "#b0b0b0"})
	st.focus = ns().Bold(true)
	// Warmer means more of the wall shear: from pale to deep orange. The
	// colours are entries of the xterm 256-colour palette, so a 256-colour
	// terminal shows five distinct tints too (TestTintsDistinctIn256).
	for i, c := range tintColors {
		st.tint[i] = ns().Background(c).Foreground(lipgloss.AdaptiveColor{Light: "#000000", Dark: "#ffffff"})
	}
	return st
}

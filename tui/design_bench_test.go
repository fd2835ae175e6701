package tui

import (
	"testing"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
)

// BenchmarkEditDesign is BenchmarkEdit with the pier design on and the
// ratios drawn: every key re-solves, re-checks every pier of the 20-opening
// wall and redraws at 200×60.
func BenchmarkEditDesign(b *testing.B) {
	w := wall20()
	v, _ := geometry.ParseBarSpacing("#5@32in", w.Units)
	h, _ := geometry.ParseBarSpacing("#4@16in", w.Units)
	j, _ := geometry.ParseBarCount("2#5")
	w.Reinforcement = &geometry.Reinforcement{Fy: 60 * geometry.KSI, Vertical: v, Jamb: j, Horizontal: h}
	w.Design = &geometry.Design{Class: geometry.Special, SDS: 1}
	if err := w.Validate(); err != nil {
		b.Fatal(err)
	}
	b.Run("move/200x60/mono/ratios", func(b *testing.B) {
		m := newModel(w, Options{})
		m.Update(tea.WindowSizeMsg{Width: 200, Height: 60})
		m.Update(runes("R"))
		m.Update(keyTab)
		e := m.stack[0].(*elevation)
		if !e.showRatios() {
			b.Fatalf("no ratios: %v", e.design.err)
		}
		right, left := runes("l"), runes("h")
		b.ReportAllocs()
		for i := 0; b.Loop(); i++ {
			k := right
			if i%2 == 1 {
				k = left
			}
			m.Update(k)
			_ = m.View()
		}
	})
}

package tui

import (
	"fmt"
	"testing"

	"github.com/charmbracelet/lipgloss"
	"github.com/muesli/termenv"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
)

// wall20 is an invented 100 ft × 16 ft wall with 20 openings: doors and
// windows at two sill heights, so the decomposition has nested piers.
func wall20() *geometry.Wall {
	w := NewWall(geometry.US)
	w.Length, w.Height = 100*geometry.Foot, 16*geometry.Foot
	w.Load.Shear = 60 * geometry.Kip
	ft := geometry.Foot
	var ops []geometry.Opening
	for i := range 20 {
		o := geometry.Opening{X: geometry.Length(1+5*i) * ft, Width: 2 * ft}
		switch i % 3 {
		case 0:
			o.Name, o.Sill, o.Height = nextName(&geometry.Wall{Layouts: []geometry.Layout{{Openings: ops}}}, true), 0, 7*ft
		case 1:
			o.Name, o.Sill, o.Height = nextName(&geometry.Wall{Layouts: []geometry.Layout{{Openings: ops}}}, false), 3*ft, 4*ft
		default:
			o.Name, o.Sill, o.Height = nextName(&geometry.Wall{Layouts: []geometry.Layout{{Openings: ops}}}, false), 10*ft, 3*ft
		}
		ops = append(ops, o)
	}
	w.Layouts[0].Openings = ops
	return w
}

// BenchmarkEdit is one edit as the user sees it: a key press that moves an
// opening, the classic re-solve, and the full redraw at 200×60.
func BenchmarkEdit(b *testing.B) {
	w := wall20()
	if err := w.Validate(); err != nil {
		b.Fatal(err)
	}
	for _, profile := range []termenv.Profile{termenv.Ascii, termenv.TrueColor} {
		lipgloss.SetColorProfile(profile)
		b.Run(fmt.Sprintf("move/200x60/%s", profileName(profile)), func(b *testing.B) { benchMove(b, w) })
	}
	lipgloss.SetColorProfile(termenv.Ascii)
}

func profileName(p termenv.Profile) string {
	if p == termenv.Ascii {
		return "mono"
	}
	return "colour"
}

func benchMove(b *testing.B, w *geometry.Wall) {
	{
		m := newModel(w, Options{})
		m.Update(tea.WindowSizeMsg{Width: 200, Height: 60})
		m.Update(keyTab) // select the second opening
		right, left := runes("l"), runes("h")
		if e := m.stack[0].(*elevation); e.res == nil {
			b.Fatalf("no classic answer: %v", e.solveErr)
		}
		b.ReportAllocs()
		b.ResetTimer()
		for i := 0; b.Loop(); i++ {
			k := right
			if i%2 == 1 {
				k = left
			}
			m.Update(k)
			_ = m.View()
		}
	}
}

package tui

import (
	"context"
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

// BenchmarkKeyToResultFE is a key on the fe basis as the editor does it,
// without the debounce (feDelay) that waits for the keys to settle: the
// key moves an opening (the classic re-solve, whose decomposition names
// the piers), the finite-element solve of the wall with every pier's
// forces, its answer taken in and the screen redrawn at 80×24. The wall is
// an invented 30 ft × 12 ft wall with a door and two windows at the
// default mesh. Target: under 20 ms (docs/method.md §5).
func BenchmarkKeyToResultFE(b *testing.B) {
	ft := geometry.Foot
	w := NewWall(geometry.US)
	w.Length, w.Height = 30*ft, 12*ft
	w.Load.Shear = 30 * geometry.Kip
	w.Gravity = geometry.Gravity{Dead: 15_000, Live: 6_000} // N/m
	w.Analysis.Basis = geometry.BasisFE
	w.Layouts[0].Openings = []geometry.Opening{
		{Name: "W1", X: 3 * ft, Sill: 3 * ft, Width: 5 * ft, Height: 4 * ft},
		{Name: "D1", X: 12 * ft, Width: 4 * ft, Height: 8 * ft},
		{Name: "W2", X: 21 * ft, Sill: 3 * ft, Width: 6 * ft, Height: 4 * ft},
	}
	if err := w.Validate(); err != nil {
		b.Fatal(err)
	}
	m := newModel(w, Options{})
	m.Update(tea.WindowSizeMsg{Width: 80, Height: 24})
	e := m.stack[0].(*elevation)
	if !e.onFE() || e.res == nil {
		b.Fatalf("not on the fe basis with a classic answer: %v", e.solveErr)
	}
	right, left := runes("l"), runes("h")
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		k := right
		if i%2 == 1 {
			k = left
		}
		m.Update(k)
		m.Update(runFE(e.fe.id, e.wall(), e.res)(context.Background()))
		if e.bs.stale || e.fe.res == nil {
			b.Fatalf("no current answer: %v", e.fe.err)
		}
		_ = m.View()
	}
	b.ReportMetric(float64(e.fe.res.Elements), "elements")
}

package tui

import (
	"bytes"
	"encoding/binary"
	"strings"
	"testing"
	"time"

	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/x/ansi"

	"pierwise/geometry"
)

// fuzzKeys are the keys the editor fuzzer presses: every edit, the forms
// (typed into and closed), help, layouts, undo and redo, the FE switch. Save,
// save as, snapshot and the other screens are left out: they write files or
// open screens whose commands the fuzzer does not run.
var fuzzKeys = []tea.KeyMsg{
	runes("h"), runes("j"), runes("k"), runes("l"), runes("H"), runes("J"), runes("K"), runes("L"),
	{Type: tea.KeyTab}, {Type: tea.KeyShiftTab}, runes("d"), runes("w"), runes("x"), runes("c"), runes("."),
	runes("e"), runes("E"), runes("u"), runes("U"), runes("]"), runes("["), runes("n"), runes("r"), runes("X"),
	runes("f"), runes("?"), runes("q"), {Type: tea.KeyEsc}, {Type: tea.KeyEnter}, runes("0"), runes("9"),
	runes("ft"), {Type: tea.KeyBackspace}, {Type: tea.KeyCtrlU}, runes("y"), {Type: tea.KeyCtrlC},
	runes("b"), // the basis
}

// fuzzWall is a wall made from the fuzzer's bytes: sizes from a few feet
// up, and openings kept only when the wall accepts them.
func fuzzWall(data []byte) *geometry.Wall {
	r := bytes.NewReader(data)
	next := func(lo, hi float64) float64 {
		var b uint16
		if binary.Read(r, binary.LittleEndian, &b) != nil {
			return lo
		}
		return lo + (hi-lo)*float64(b)/65535
	}
	w := NewWall(geometry.US)
	if next(0, 1) > 0.5 {
		w = NewWall(geometry.SI)
	}
	w.Length = geometry.Length(next(1, 40))
	w.Height = geometry.Length(next(1, 15))
	if next(0, 1) > 0.5 {
		w.Support = geometry.Fixed
	}
	for i := 0; i < 6 && r.Len() > 0; i++ {
		o := geometry.Opening{Name: nextName(w, false),
			X: geometry.Length(next(0, float64(w.Length))), Sill: geometry.Length(next(0, float64(w.Height))),
			Width: geometry.Length(next(0.1, float64(w.Length)/2)), Height: geometry.Length(next(0.1, float64(w.Height)/2))}
		if w.CheckOpening(-1, o) == nil {
			w.Layouts[0].Openings = append(w.Layouts[0].Openings, o)
		}
	}
	return w
}

// FuzzEditor presses random keys at random window sizes on random walls:
// the editor never panics, never shows NaN or Inf, and undoing every step
// gives back the wall it started with.
func FuzzEditor(f *testing.F) {
	f.Add([]byte{1, 2, 3, 4, 5, 6, 7, 8}, []byte{0, 3, 3, 3, 17, 18, 20, 6}, uint16(80), uint16(24))
	f.Add([]byte{200, 100, 50, 25, 0, 0, 9, 9, 9, 9, 200, 200, 30, 30}, []byte{12, 13, 14, 15, 16, 21, 22, 26, 27, 8, 10}, uint16(120), uint16(40))
	f.Add([]byte{}, []byte{16, 29, 31, 32, 28, 27, 35}, uint16(60), uint16(20))
	f.Fuzz(func(t *testing.T, wallBytes, keys []byte, width, height uint16) {
		if len(keys) > 200 {
			keys = keys[:200]
		}
		w := fuzzWall(wallBytes)
		start, err := geometry.Marshal(w)
		if err != nil {
			t.Skip()
		}
		m := newModel(w, Options{})
		m.c.tick = func(time.Duration, func(time.Time) tea.Msg) tea.Cmd { return nil }
		size := func(i int) tea.WindowSizeMsg {
			return tea.WindowSizeMsg{Width: 40 + (int(width)+i*7)%160, Height: 12 + (int(height)+i*3)%50}
		}
		m.Update(size(0))
		// press sends a key and applies the answers of the sub-models
		// (questions, help, forms): messages the screen sends itself.
		// Quitting and the commands that write or compute are not run.
		press := func(k tea.KeyMsg) {
			_, cmd := m.Update(k)
			for n := 0; cmd != nil && n < 4; n++ {
				msg := runLocal(cmd)
				if msg == nil {
					return
				}
				_, cmd = m.Update(msg)
			}
		}
		check := func(step string) {
			v := ansi.Strip(m.View())
			for _, bad := range []string{"NaN", "Inf"} {
				if strings.Contains(v, bad) {
					t.Fatalf("%s on screen after %s:\n%s", bad, step, v)
				}
			}
		}
		for i, k := range keys {
			if k == 255 {
				m.Update(size(i))
				check("a resize")
				continue
			}
			press(fuzzKeys[int(k)%len(fuzzKeys)])
			check(fuzzKeys[int(k)%len(fuzzKeys)].String())
		}
		m.Update(tea.WindowSizeMsg{Width: 100, Height: 30})
		e := m.stack[0].(*elevation)
		for i := 0; e.mode != modeNormal; i++ {
			if i > 5 {
				t.Fatalf("esc does not leave mode %v", e.mode)
			}
			press(tea.KeyMsg{Type: tea.KeyEsc})
		}
		for m.c.doc.undoChange() {
		}
		end, err := geometry.Marshal(m.c.doc.wall)
		if err != nil || !bytes.Equal(start, end) {
			t.Fatalf("undo back to the start gives another wall (%v):\n%s\nwant\n%s", err, end, start)
		}
	})
}

// runLocal runs cmd when it is one of the messages a sub-model sends its
// parent, and returns nil for anything else (saves, quits, timers, batches).
func runLocal(cmd tea.Cmd) tea.Msg {
	done := make(chan tea.Msg, 1)
	go func() { done <- cmd() }()
	select {
	case msg := <-done:
		switch msg.(type) {
		case chosenMsg, cancelledMsg, helpClosedMsg:
			return msg
		}
	case <-time.After(100 * time.Millisecond):
	}
	return nil
}

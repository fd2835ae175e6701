package tui

import (
	"context"
	"errors"
	"strings"
	"testing"
	"time"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/demo"
	"pierwise/geometry"
)

// The comparison's FE check goes through the program's one gate: a second
// request while the first computes cancels it and waits instead of starting
// a second model; the cancelled answer is dropped and the waiting request
// then runs and is taken.
func TestCompareFEOneInFlight(t *testing.T) {
	c := cmpCommon("annex.toml")
	s := newCompareScreen(c)
	s.setSize(100, 30)
	_, run1 := s.update(s.recompute()()) // request A: computing, not yet run
	g := c.gate()
	if run1 == nil || !g.busy() {
		t.Fatal("the first check did not start")
	}
	done1 := g.done
	_, start2 := s.update(cmpKey("s")) // swap: request B
	if start2 == nil {
		t.Fatal("s: no new request")
	}
	_, wait := s.update(start2())
	if wait == nil {
		t.Fatal("request B: no command")
	}
	if g.done != done1 {
		t.Fatal("a second check started while the first computed")
	}
	// Request A runs now, cancelled: it returns at once with the
	// context's error, and its answer is dropped.
	m1, ok := run1().(compareFEMsg)
	if !ok || !errors.Is(m1.err, context.Canceled) || m1.cmp != nil {
		t.Fatalf("the superseded check was not cancelled: %#v", m1)
	}
	s.update(m1)
	if !s.feRunning || s.msg != "" {
		t.Errorf("the cancelled answer was taken: running %v, message %q", s.feRunning, s.msg)
	}
	// B was waiting for A: it asks again, starts, and its answer is taken.
	_, run2 := s.update(wait())
	if run2 == nil || g.done == done1 || !g.busy() {
		t.Fatal("request B did not start after A returned")
	}
	s.update(run2())
	if s.feRunning || s.cmp.Before.FE == nil || s.cmp.After.FE == nil || g.busy() {
		t.Fatalf("request B: running %v, FE %v %v", s.feRunning, s.cmp.Before.FEErr, s.cmp.After.FEErr)
	}
	// B's answer is of the swapped layouts.
	if s.cmp.Before.Label != demo.Wall().Layouts[s.before].Name {
		t.Errorf("before is %q", s.cmp.Before.Label)
	}
}

// Leaving the comparison cancels its check.
func TestCompareBackCancels(t *testing.T) {
	c := cmpCommon("annex.toml")
	s := newCompareScreen(c)
	s.setSize(100, 30)
	_, run := s.update(s.recompute()())
	s.update(cmpKey("esc"))
	if m, ok := run().(compareFEMsg); !ok || !errors.Is(m.err, context.Canceled) {
		t.Errorf("the check ran on after esc: %#v", m)
	}
}

// The sweep goes through the same gate: keys pressed while a sweep
// computes cancel it, and only the latest runs.
func TestSweepOneInFlight(t *testing.T) {
	c := cmpCommon("annex.toml")
	s := newSweepScreen(c)
	s.setSize(80, 24)
	_, run1 := s.update(s.start()())
	g := c.gate()
	if run1 == nil || !g.busy() {
		t.Fatal("the first sweep did not start")
	}
	done1 := g.done
	var starts []tea.Cmd
	for _, k := range []string{"a", "tab", "."} {
		_, cmd := s.update(cmpKey(k))
		starts = append(starts, cmd)
	}
	var wait tea.Cmd
	for _, st := range starts {
		if _, cmd := s.update(st()); cmd != nil {
			wait = cmd // only the latest request is not dropped
		}
	}
	if wait == nil || g.done != done1 {
		t.Fatal("a second sweep started while the first computed")
	}
	m1, ok := run1().(sweepDoneMsg)
	if !ok || !errors.Is(m1.err, context.Canceled) {
		t.Fatalf("the superseded sweep was not cancelled: %#v", m1)
	}
	s.update(m1)
	if !s.running {
		t.Error("the cancelled answer was taken")
	}
	drive(s, wait)
	if s.running || s.err != nil || len(s.pts) == 0 || g.busy() {
		t.Fatalf("the latest sweep: running %v, %d points, %v", s.running, len(s.pts), s.err)
	}
	if s.axis != 1 || s.opening != 1 {
		t.Errorf("the answer is of axis %v, opening %d", s.axis, s.opening)
	}
}

// The elevation's check answer can go to a screen opened on top (or that
// screen's check cancels it): back on the elevation, the check is asked
// again instead of "updating..." staying for ever.
func TestElevationAsksAgainAfterAScreen(t *testing.T) {
	ed := newEditor(t, annex(), "", 100, 30)
	e := ed.elev()
	ed.press(runes("l")) // an edit; its delayed start is lost (never run)
	if !e.fe.running {
		t.Fatal("no check awaited after an edit")
	}
	old := e.fe.id
	// Timers fire at once from here on.
	ed.m.c.tick = func(_ time.Duration, fn func(time.Time) tea.Msg) tea.Cmd {
		return func() tea.Msg { return fn(time.Time{}) }
	}
	_, cmd := ed.m.Update(cmpKey("C"))
	cmpDrain(ed.m, cmd)
	if _, ok := ed.m.top().(*compareScreen); !ok {
		t.Fatalf("C opened %T", ed.m.top())
	}
	_, cmd = ed.m.Update(cmpKey("esc"))
	cmpDrain(ed.m, cmd)
	if ed.m.top() != screen(e) {
		t.Fatalf("esc left %T on top", ed.m.top())
	}
	if e.fe.id == old || e.fe.running || e.fe.stale() || e.fe.res == nil {
		t.Errorf("back on the elevation: id %d (was %d), running %v, stale %v, err %v", e.fe.id, old, e.fe.running, e.fe.stale(), e.fe.err)
	}
	if strings.Contains(ed.view(), "updating...") {
		t.Errorf("still updating:\n%s", ed.view())
	}
}

// An opening whose name holds an escape sequence: the sweep screen shows it
// escaped, and sends no escape of the file's to the terminal.
func TestSweepShowsNamesEscaped(t *testing.T) {
	w := demo.Wall()
	w.Active = 0
	w.Layouts[0].Openings[0].Name = "D\x1b[31m1"
	c := newCommon(newDocument(w, "annex.toml"), nil)
	s := newSweepScreen(c)
	s.setSize(100, 30)
	drive(s, s.start())
	v := s.view()
	if strings.Contains(v, "\x1b[31m1") || strings.Contains(v, "\x07") {
		t.Errorf("the file's escape reached the screen:\n%q", v)
	}
	if !strings.Contains(v, `D\x1b[31m1`) {
		t.Errorf("the name is not shown escaped:\n%s", v)
	}
}

// The opening form of an opening whose name holds control characters shows
// the name escaped, and applying the form with another field edited keeps
// the name as it was.
func TestFormKeepsAControlName(t *testing.T) {
	w := annex()
	name := "D\x1b[31m1"
	w.Layouts[w.Active].Openings[0].Name = name
	ed := newEditor(t, w, "", 100, 30)
	ed.elev().sel = 0
	ed.press(runes("e"))
	if v := ed.view(); !strings.Contains(v, `D\x1b[31m1`) || strings.Contains(v, "\x1b[31m1") {
		t.Fatalf("the form does not show the name escaped:\n%q", v)
	}
	ed.press(keyTab, keyTab, keyTab, keyCtrlU)
	ed.typeText("5ft")
	ed.do(keyEnter)
	o := ed.wall().Openings()[0]
	if o.Name != name || !near(float64(o.Width), float64(5*geometry.Foot)) {
		t.Errorf("after the form: name %q, width %v", o.Name, o.Width)
	}
}

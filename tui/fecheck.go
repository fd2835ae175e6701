package tui

import (
	"context"
	"time"

	tea "github.com/charmbracelet/bubbletea"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// feGate keeps at most one finite-element check in flight in the whole
// program (every elevation screen shares it through common): a new check
// cancels the one running through its context and starts only when that one
// has returned, so a key every few hundred milliseconds on a slow wall holds
// one model in memory, not one per key.
type feGate struct {
	cancel context.CancelFunc
	done   chan struct{} // closed when the running check returns
}

// busy reports whether a check is still computing.
func (g *feGate) busy() bool {
	if g == nil || g.done == nil {
		return false
	}
	select {
	case <-g.done:
		return false
	default:
		return true
	}
}

// stop cancels the running check, if any (it returns soon after).
func (g *feGate) stop() {
	if g != nil && g.cancel != nil {
		g.cancel()
	}
}

// feState is the finite-element check of one elevation screen: on or off,
// and its latest answer. id grows with every edit; answers tagged with an
// older id are dropped. The answer of an older wall stays shown, marked
// stale, until the new one arrives.
type feState struct {
	on      bool
	id      int
	running bool // an answer for the current id is awaited
	res     *fe.Result
	err     error
	resID   int // the id res and err belong to
}

// stale reports whether the answer shown belongs to an older wall.
func (f *feState) stale() bool { return f.resID != f.id }

// feDelay lets a burst of key presses settle before the FE check starts.
const feDelay = 250 * time.Millisecond

type (
	feStartMsg struct{ id int }
	feDoneMsg  struct {
		id  int
		res *fe.Result
		err error
	}
)

// supersede marks the shown answer stale and cancels the check running
// for an older wall.
func (e *elevation) supersede() {
	e.fe.id++
	e.fe.running = false
	e.c.fe.stop()
}

// scheduleFE starts the FE check after feDelay unless another edit comes.
func (e *elevation) scheduleFE() tea.Cmd {
	if !e.fe.on {
		return nil
	}
	id := e.fe.id
	e.fe.running = true
	return e.c.tick(feDelay, func(time.Time) tea.Msg { return feStartMsg{id} })
}

// run returns the command that computes work once no other check
// computes: while one still runs it is cancelled, and the command waits for
// it to return and answers retry, so that its screen asks again (and drops
// the retry when a newer request came meanwhile). Every screen's background
// solving goes through it (the elevation's FE check, the comparison's, the
// sweep), so the program holds one model in memory at a time. Call it only
// from update and return its command: the gate counts it as running.
func (g *feGate) run(retry tea.Msg, work func(ctx context.Context) tea.Msg) tea.Cmd {
	if g.busy() {
		g.stop()
		done := g.done
		return func() tea.Msg { <-done; return retry }
	}
	ctx, cancel := context.WithCancel(context.Background())
	done := make(chan struct{})
	g.cancel, g.done = cancel, done
	return func() tea.Msg {
		defer close(done)
		defer cancel()
		return work(ctx)
	}
}

// gate is the program's one background gate (made on first use).
func (c *common) gate() *feGate {
	if c.fe == nil {
		c.fe = &feGate{}
	}
	return c.fe
}

// startFE starts the check for id once no other check computes: while the
// superseded one winds down, a command waits for it and asks again.
func (e *elevation) startFE(id int) tea.Cmd {
	return e.c.gate().run(feStartMsg{id}, runFE(id, e.wall(), e.res))
}

// runFE solves the FE model in the background on the wall and classic
// result of this moment (both are never mutated: edits replace them).
func runFE(id int, w *geometry.Wall, classic *pier.Result) func(context.Context) tea.Msg {
	return func(ctx context.Context) tea.Msg {
		r, err := fe.SolveContext(ctx, w, classic, fe.Options{Mesh: w.Check.Mesh, Element: w.Check.Element})
		return feDoneMsg{id: id, res: r, err: err}
	}
}

// feMessage applies the FE messages; it reports whether msg was one.
func (e *elevation) feMessage(msg tea.Msg) (tea.Cmd, bool) {
	switch msg := msg.(type) {
	case feStartMsg:
		if msg.id != e.fe.id || !e.fe.on {
			return nil, true
		}
		return e.startFE(msg.id), true
	case feDoneMsg:
		if msg.id != e.fe.id {
			return nil, true // an answer for a wall that has changed since
		}
		e.fe.res, e.fe.err, e.fe.resID, e.fe.running = msg.res, msg.err, msg.id, false
		e.feAnswered(msg.id)
		return nil, true
	}
	return nil, false
}

// toggleFE switches the check on or off.
func (e *elevation) toggleFE() tea.Cmd {
	e.fe.on = !e.fe.on
	e.supersede()
	e.fe.res, e.fe.err = nil, nil
	if e.fe.on {
		e.say("finite-element check on")
		return e.scheduleFE()
	}
	e.say("finite-element check off")
	return nil
}

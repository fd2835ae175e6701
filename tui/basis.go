package tui

import (
	tea "github.com/charmbracelet/bubbletea"

	"pierwise/basis"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// basisState is the editor's basis (docs/method.md §5) and the answer the
// elevation shows on it. On the classic basis that is the classic result;
// on the fe basis it is the finite-element check's answer in the classic
// result's shape (basis.Result.View), so the sketch, the panel and the
// pier table draw either basis the same way. While the model solves the
// wall after an edit, the previous model answer is shown on the new
// wall's piers (matched by name) and marked stale: the panel says its
// numbers are updating.
type basisState struct {
	basis geometry.Basis

	shown    *pier.Result // what the elevation draws; nil with shownErr
	shownErr error        // why the basis has no answer
	stale    bool         // fe basis: shown is of the wall before the last edit, or not yet solved

	file geometry.Basis // the wall's own [analysis] basis when last seen: a change there (the wall form) is followed
	feID int            // the FE check id the latest FE answer belongs to
	last *fe.Result     // the latest FE answer, shown stale on the next wall
}

// onFE reports whether the editor is on the finite-element basis.
func (e *elevation) onFE() bool { return e.bs.basis == geometry.BasisFE }

// refreshShown recomputes what the elevation shows from the classic result
// and the latest finite-element answer. It is called after every solve.
func (e *elevation) refreshShown() {
	b := &e.bs
	// The pier design follows what is shown: the model's pier forces on
	// the fe basis (docs/method.md §8.7).
	defer func() { e.design = checkDesign(e.wall(), b.shown) }()
	if f := e.wall().Analysis.Basis; f != b.file {
		// The wall's own basis changed (an edit of the wall's settings,
		// an undo): the editor follows it; b switches the view only.
		b.file, b.basis, e.c.basis = f, f, f
		if f == geometry.BasisFE {
			e.fe.on = true // the edit's re-solve schedules the model
		}
	}
	b.shown, b.shownErr, b.stale = e.res, e.solveErr, false
	if !e.onFE() {
		return
	}
	f := e.fe.res
	answered := e.bs.feID == e.fe.id && !e.fe.running
	fresh := f != nil && answered
	switch {
	case fresh:
		r := &basis.Result{Basis: geometry.BasisFE, Wall: e.wall(), Classic: e.res, ClassicErr: e.solveErr, FE: f}
		b.shown, b.shownErr = r.View(), nil
	case e.fe.err != nil && answered:
		b.shown, b.shownErr = nil, &basis.NoAnswerError{Basis: geometry.BasisFE, Err: e.fe.err}
	default:
		// Not yet answered for this wall: the last model answer on the
		// new piers, marked stale, or the classic piers until the first.
		b.stale = true
		if e.bs.last != nil && e.res != nil {
			r := &basis.Result{Basis: geometry.BasisFE, Wall: e.wall(), Classic: e.res, FE: e.bs.last}
			b.shown = r.View()
		}
	}
	if fresh {
		e.bs.last = f
	}
}

// toggleBasis switches between the classic and the finite-element basis.
// The fe basis needs the model, so it turns the check on.
func (e *elevation) toggleBasis() tea.Cmd {
	defer func() { e.c.basis = e.bs.basis }()
	if e.onFE() {
		e.bs.basis = geometry.BasisClassic
		e.refreshShown()
		e.say("basis: classic method (b: finite-element model)")
		return nil
	}
	e.bs.basis = geometry.BasisFE
	var cmd tea.Cmd
	if !e.fe.on {
		cmd = e.toggleFE()
	}
	e.refreshShown()
	e.say("basis: finite-element model (b: classic method)")
	return cmd
}

// basisWord is the basis as the header and the panel name it.
func (e *elevation) basisWord() string {
	if e.onFE() {
		return "basis fe"
	}
	return "basis classic"
}

// feAnswered notes that the FE answer for id has arrived, and redraws.
func (e *elevation) feAnswered(id int) {
	e.bs.feID = id
	e.refreshShown()
}

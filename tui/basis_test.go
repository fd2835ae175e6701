package tui

import (
	"context"
	"strings"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
	"pierwise/study"
)

// TestBasisKey: b switches the basis; the header names it; on the fe basis
// the panel says it is updating until the model answers for this wall, then
// shows the model's rigidity and shares; an edit makes it stale again; f
// cannot turn the model off under the fe basis.
func TestBasisKey(t *testing.T) {
	ed := newEditor(t, annex(), "", 80, 24)
	e := ed.elev()
	if v := ed.view(); !strings.Contains(v, "basis classic") || !strings.Contains(v, "(classic method)") {
		t.Fatalf("classic basis not shown:\n%s", v)
	}
	ed.press(runes("b"))
	if v := ed.view(); !strings.Contains(v, "basis fe") || !strings.Contains(v, "fe: updating...") {
		t.Fatalf("fe basis before the model answers:\n%s", v)
	}
	ed.press(runFE(e.fe.id, ed.wall(), e.res)(context.Background()))
	if e.fe.res == nil {
		t.Fatalf("FE: %v", e.fe.err)
	}
	v := ed.view()
	if !strings.Contains(v, "(finite-element)") || strings.Contains(v, "updating") {
		t.Errorf("fe answer not shown as current:\n%s", v)
	}
	if want := "relative    " + num(e.fe.res.Rigidity); !strings.Contains(v, want) {
		t.Errorf("the panel lacks the model's rigidity %q:\n%s", want, v)
	}
	// Every number shown is the model's: the sketch's and the table's
	// shares are the model's leaf shares.
	for _, p := range e.fe.res.Piers {
		got, ok := findShare(e.bs.shown, p.Name)
		if !ok || got != p.Share {
			t.Errorf("%s: shown share %g, model %g", p.Name, got, p.Share)
		}
	}
	checkGolden(t, "basis_fe_80x24.golden", v)

	// An edit: the old answer is shown on the new piers, marked updating.
	ed.press(runes("l"))
	if v := ed.view(); !strings.Contains(v, "fe: updating...") || e.bs.shown == nil {
		t.Errorf("after an edit on the fe basis:\n%s", v)
	}
	ed.press(runFE(e.fe.id, ed.wall(), e.res)(context.Background()))
	if v := ed.view(); strings.Contains(v, "updating") {
		t.Errorf("still updating after the answer:\n%s", v)
	}
	ed.press(runes("f"))
	if !e.fe.on || !e.msgBad {
		t.Error("f turned the model off under the fe basis")
	}
	ed.press(runes("b"))
	if v := ed.view(); !strings.Contains(v, "basis classic") || !strings.Contains(v, "(classic method)") || e.bs.shown != e.res {
		t.Errorf("back on the classic basis:\n%s", v)
	}
}

// A wall whose file says [analysis] basis = "fe" opens on the fe basis.
func TestBasisFromWall(t *testing.T) {
	w := annex()
	w.Analysis.Basis = geometry.BasisFE
	ed := newEditor(t, w, "", 100, 30)
	if !ed.elev().onFE() || !strings.Contains(ed.view(), "basis fe") {
		t.Error("the wall's basis is not the editor's")
	}
}

func findShare(r *pier.Result, name string) (float64, bool) {
	if r == nil {
		return 0, false
	}
	for _, p := range r.Leaves() {
		if p.Name == name {
			return p.Share, true
		}
	}
	return 0, false
}

// Staggered openings: the classic method has no answer, so on the fe basis
// the panel shows the model's wall numbers and the table says why it has no
// piers (the layout of study's TestCompareFEWhereClassicFails).
func TestBasisFEStaggered(t *testing.T) {
	ft := geometry.Foot
	w := annex()
	w.Length, w.Height = 10*ft, 10*ft
	w.Layouts = []geometry.Layout{{Name: "staggered", Openings: []geometry.Opening{
		{Name: "A", X: 0, Sill: 2 * ft, Width: 6 * ft, Height: 2 * ft},
		{Name: "B", X: 4 * ft, Sill: 6 * ft, Width: 6 * ft, Height: 2 * ft},
		{Name: "C", X: 7 * ft, Sill: 4 * ft, Width: 1 * ft, Height: 2 * ft},
	}}}
	w.Active = 0
	w.Analysis.Basis = geometry.BasisFE
	ed := newEditor(t, w, "", 80, 24)
	e := ed.elev()
	if e.solveErr == nil {
		t.Fatal("the classic method solved the staggered layout")
	}
	ed.press(runFE(e.fe.id, ed.wall(), e.res)(context.Background()))
	v := ed.view()
	if e.fe.res == nil || !strings.Contains(v, "relative    "+num(e.fe.res.Rigidity)) || strings.Contains(v, "No answer") {
		t.Errorf("the model's answer is not shown:\n%s", v)
	}
	if !strings.Contains(v, "No pier table") {
		t.Errorf("the table does not say why it has no piers:\n%s", v)
	}
}

// The sweep screen follows the editor's basis: on fe each position is the
// model's answer, as study.SweepWith gives it.
func TestSweepScreenFEBasis(t *testing.T) {
	c := cmpCommon("annex.toml")
	c.basis = geometry.BasisFE
	s := sweepRun(t, c, 80, 24)
	s.update(cmpKey("tab")) // W1
	drive(s, s.start())
	w := c.doc.wall
	want, err := study.SweepWith(w, "W1", study.AlongX, steps(geometry.US)[defaultStep(geometry.US)],
		study.SweepOptions{Basis: geometry.BasisFE, FE: fe.Options{Mesh: w.Check.Mesh, Element: w.Check.Element}})
	if err != nil || s.err != nil {
		t.Fatalf("%v / %v", err, s.err)
	}
	if len(s.pts) != len(want) || len(want) == 0 {
		t.Fatalf("%d points, study.SweepWith gives %d", len(s.pts), len(want))
	}
	classic, _ := study.Sweep(w, "W1", study.AlongX, steps(geometry.US)[defaultStep(geometry.US)])
	for i := range want {
		if s.pts[i].Rigidity != want[i].Rigidity {
			t.Errorf("point %d: rigidity %g, the model %g", i, s.pts[i].Rigidity, want[i].Rigidity)
		}
		if s.pts[i].Err == nil && classic[i].Err == nil && s.pts[i].Rigidity == classic[i].Rigidity {
			t.Errorf("point %d: the classic rigidity on the fe basis", i)
		}
	}
}

// A change of the wall's own basis (as the wall form or an undo makes it)
// is followed; b alone switches the view and leaves the wall as it is.
func TestBasisFollowsTheWall(t *testing.T) {
	ed := newEditor(t, annex(), "", 100, 30)
	e := ed.elev()
	ed.press(runes("b"))
	if !e.onFE() || ed.wall().Analysis.Basis != geometry.BasisClassic || ed.m.c.doc.dirty() {
		t.Fatal("b changed the wall or did not switch the view")
	}
	ed.press(runes("b"))
	if err := ed.m.c.doc.change(func(w *geometry.Wall) error { w.Analysis.Basis = geometry.BasisFE; return nil }); err != nil {
		t.Fatal(err)
	}
	ed.elev().afterEdit()
	if !e.onFE() || !e.fe.on || ed.m.c.basis != geometry.BasisFE {
		t.Error("the wall's new basis is not followed")
	}
}

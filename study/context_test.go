package study

import (
	"context"
	"errors"
	"testing"

	"pierwise/geometry"
	"pierwise/pier/fe"
)

// A comparison or a sweep whose context is done stops with the context's
// error and no answer: the editor cancels the one the user has moved on
// from.
func TestCancelled(t *testing.T) {
	w := annex()
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	c, err := CompareContext(ctx, WithLayout(w, 0), WithLayout(w, 1), Options{FE: true, FEOptions: fe.Options{Mesh: geometry.Foot}})
	if c != nil || !errors.Is(err, context.Canceled) {
		t.Errorf("compare: %v, %v", c, err)
	}
	for _, b := range []geometry.Basis{geometry.BasisClassic, geometry.BasisFE} {
		pts, err := SweepContext(ctx, w, "W1", AlongX, 8*geometry.Inch, SweepOptions{Basis: b, FE: fe.Options{Mesh: geometry.Foot}})
		if pts != nil || !errors.Is(err, context.Canceled) {
			t.Errorf("sweep on the %v basis: %d points, %v", b, len(pts), err)
		}
	}
	// The classic comparison needs no FE and so finishes (nothing to cancel).
	if c, err := CompareContext(ctx, WithLayout(w, 0), WithLayout(w, 1), Options{}); err != nil || c == nil || !c.Before.OK() {
		t.Errorf("classic compare under a done context: %v", err)
	}
	// A live context gives the same answer as Sweep.
	a, err1 := SweepContext(context.Background(), w, "W1", AlongX, 8*geometry.Inch, SweepOptions{})
	b, err2 := Sweep(w, "W1", AlongX, 8*geometry.Inch)
	if err1 != nil || err2 != nil || len(a) != len(b) || len(a) < 3 {
		t.Fatalf("sweep: %d / %d points, %v %v", len(a), len(b), err1, err2)
	}
	for i := range a {
		if !near(a[i].Rigidity, b[i].Rigidity, 1e-12) {
			t.Errorf("point %d: rigidity %g against %g", i, a[i].Rigidity, b[i].Rigidity)
		}
	}
}

package fe

import (
	"context"
	"math/rand/v2"
	"runtime"
	"strings"
	"sync/atomic"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// countingCtx is a context that reports itself cancelled from the n-th call
// of Err on, so a test can see cancellation reached inside the solve
// without timing anything.
type countingCtx struct {
	context.Context
	calls, after atomic.Int64
}

func (c *countingCtx) Err() error {
	if c.calls.Add(1) > c.after.Load() {
		return context.Canceled
	}
	return nil
}

// SolveContext checks its context inside the assembly and inside the
// factorisation (not only before and after), and returns ctx.Err().
func TestSolveContextCancelsInside(t *testing.T) {
	w := wallFt(20, 10, geometry.Cantilever)
	opt := Options{Mesh: 1.5 * geometry.Inch, Element: ElementQ4} // 12,800 elements, 25,760 equations
	// How many checks a whole solve makes.
	full := &countingCtx{Context: context.Background()}
	full.after.Store(1 << 40)
	if _, err := SolveContext(full, w, nil, opt); err != nil {
		t.Fatal(err)
	}
	n := full.calls.Load()
	// The assembly makes ⌈12,800/1,024⌉ = 13 checks and the factorisation
	// ⌈25,760/256⌉ = 101: each cut-off inside them must stop the solve.
	if n < 1+13+100 {
		t.Fatalf("a whole solve checked its context %d times; want the assembly and the factorisation to check as they go", n)
	}
	for _, after := range []int64{1, 5, 20, n / 2, n - 2} {
		ctx := &countingCtx{Context: context.Background()}
		ctx.after.Store(after)
		res, err := SolveContext(ctx, w, nil, opt)
		if err != context.Canceled || res != nil {
			t.Errorf("cancelled after %d checks: result %v, error %v; want context.Canceled", after, res, err)
		}
		if got := ctx.calls.Load(); got != after+1 {
			t.Errorf("cancelled after %d checks, it went on for %d more", after, got-after-1)
		}
	}
	// A context already done: no work at all.
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	if _, err := SolveContext(ctx, w, nil, opt); err != context.Canceled {
		t.Errorf("done context: %v", err)
	}
}

// 2,000 random openings: refused before the mesh is built, naming the
// opening edges as the cause, with a few megabytes allocated (it used to
// build a 1.86 GB model first); the same at a 40 ft element size, where
// the element size is not the cause.
func TestTooManyOpeningsRefusedEarly(t *testing.T) {
	rng := rand.New(rand.NewPCG(20, 0))
	var ops []geometry.Opening
	for k := 0; k < 2000; k++ {
		ops = append(ops, opening("O", rng.Float64()*190, rng.Float64()*90, 0.5+rng.Float64()*5, 0.5+rng.Float64()*5))
	}
	w := wallFt(200, 100, geometry.Cantilever, ops...)
	for _, mesh := range []geometry.Length{0, 40 * geometry.Foot} {
		var before, after runtime.MemStats
		runtime.GC()
		runtime.ReadMemStats(&before)
		_, err := Solve(w, nil, Options{Mesh: mesh})
		runtime.ReadMemStats(&after)
		if err == nil || !strings.Contains(err.Error(), "too many edges") || !strings.Contains(err.Error(), "2000 openings") {
			t.Errorf("mesh %g m: error %v; want the opening edges named as the cause", float64(mesh), err)
		}
		if mb := float64(after.TotalAlloc-before.TotalAlloc) / 1e6; mb > 50 {
			t.Errorf("mesh %g m: %.0f MB allocated before refusing", float64(mesh), mb)
		}
	}
	// A plain wall with a tiny element: the element size is the cause.
	if _, err := Solve(wallFt(200, 100, geometry.Cantilever), nil, Options{Mesh: 0.5 * geometry.Inch}); err == nil || !strings.Contains(err.Error(), "larger element size") {
		t.Errorf("fine mesh: %v", err)
	}
}

// Two doors 3 µm apart: the finite-element model used to find no load path
// through the 3 µm pier; now the edges merge (docs/method.md §4), the model
// solves, and the result warns naming both doors. The classic result of
// the merged wall gives the piers.
func TestNearEdgesMerge(t *testing.T) {
	w := wallFt(20, 10, geometry.Cantilever, opening("D1", 4, 0, 3, 7), opening("D2", 7+1e-5, 0, 3, 7))
	snapped, _ := pier.SnapEdges(w)
	classic, err := pier.Solve(snapped)
	if err != nil {
		t.Fatal(err)
	}
	res, err := Solve(w, classic, Options{})
	if err != nil {
		t.Fatalf("3 µm gap: %v", err)
	}
	if len(res.Warnings) != 1 || !strings.Contains(res.Warnings[0], "D1") || !strings.Contains(res.Warnings[0], "D2") {
		t.Errorf("warnings %q, want one naming D1 and D2", res.Warnings)
	}
	// The same wall drawn with the doors touching deflects the same (D2's
	// far edge stays 3 µm further: 1e-5 covers that).
	one, err := Solve(wallFt(20, 10, geometry.Cantilever, opening("D1", 4, 0, 3, 7), opening("D2", 7, 0, 3, 7)), classic, Options{})
	if err != nil {
		t.Fatal(err)
	}
	if d := res.Deflection/one.Deflection - 1; d > 1e-5 || d < -1e-5 {
		t.Errorf("merged doors %.9g, touching doors %.9g", res.Deflection, one.Deflection)
	}
}

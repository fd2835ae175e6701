package study

import (
	"math/rand/v2"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// randomLayout places up to n random openings that fit (seeded).
func randomLayout(r *rand.Rand, w *geometry.Wall, n int) []geometry.Opening {
	c := *w
	c.Layouts = []geometry.Layout{{Name: "r"}}
	c.Active = 0
	for k := 0; k < n*10 && len(c.Layouts[0].Openings) < n; k++ {
		o := geometry.Opening{
			Width:  geometry.Length(1+r.IntN(6)) * ft,
			Height: geometry.Length(1+r.IntN(6)) * ft,
		}
		o.X = geometry.Length(r.IntN(int((w.Length-o.Width)/ft)+1)) * ft
		o.Sill = geometry.Length(r.IntN(int((w.Height-o.Height)/ft)+1)) * ft
		o.Name = string(rune('A' + len(c.Layouts[0].Openings)))
		if c.CheckOpening(-1, o) == nil {
			c.Layouts[0].Openings = append(c.Layouts[0].Openings, o)
		}
	}
	return c.Layouts[0].Openings
}

// Invariants of the pier matching over random pairs of layouts: every leaf
// pier of each side is listed once, pairs are one-to-one and overlap, and
// no pier left over on one side overlaps a pier left over on the other
// (the greedy matching would have paired them).
func TestMatchPiersRandom(t *testing.T) {
	r := rand.New(rand.NewPCG(5, 17))
	base := annex()
	tried := 0
	for iter := 0; iter < 300; iter++ {
		a, b := *base, *base
		a.Layouts = []geometry.Layout{{Name: "a", Openings: randomLayout(r, base, 1+r.IntN(4))}}
		b.Layouts = []geometry.Layout{{Name: "b", Openings: randomLayout(r, base, 1+r.IntN(4))}}
		ra, errA := pier.Solve(&a)
		rb, errB := pier.Solve(&b)
		if errA != nil || errB != nil {
			continue
		}
		tried++
		la, lb := ra.Leaves(), rb.Leaves()
		pcs := MatchPiers(la, lb)
		seenA, seenB := map[string]int{}, map[string]int{}
		var leftA, leftB []*pier.Pier
		for _, pc := range pcs {
			if pc.Before != nil {
				seenA[pc.Before.Name]++
			}
			if pc.After != nil {
				seenB[pc.After.Name]++
			}
			switch pc.Status() {
			case Kept:
				if !(pc.Overlap > 0) || pc.Overlap > 1+1e-12 || !near(pc.Overlap, overlap(pc.Before.Rect, pc.After.Rect), 1e-12) {
					t.Errorf("iter %d: pair %s/%s overlap %g", iter, pc.Before.Name, pc.After.Name, pc.Overlap)
				}
			case Vanishes:
				leftA = append(leftA, pc.Before)
			case Appears:
				leftB = append(leftB, pc.After)
			}
		}
		if len(seenA) != len(la) || len(seenB) != len(lb) {
			t.Errorf("iter %d: %d/%d and %d/%d piers listed", iter, len(seenA), len(la), len(seenB), len(lb))
		}
		for n, k := range seenA {
			if k != 1 {
				t.Errorf("iter %d: before pier %s listed %d times", iter, n, k)
			}
		}
		for n, k := range seenB {
			if k != 1 {
				t.Errorf("iter %d: after pier %s listed %d times", iter, n, k)
			}
		}
		for _, p := range leftA {
			for _, q := range leftB {
				if overlap(p.Rect, q.Rect) > 0 {
					t.Errorf("iter %d: unmatched %s and %s overlap", iter, p.Name, q.Name)
				}
			}
		}
	}
	if tried < 100 {
		t.Errorf("only %d random pairs solved", tried)
	}
}

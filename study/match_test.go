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
// pier of each side is listed once, pairs are one-to-one and share their
// bounds or overlap, and
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
		pcs := MatchPiers(&a, la, &b, lb)
		ka, kb := PierKeys(&a, la), PierKeys(&b, lb)
		keyA, keyB := map[*pier.Pier]string{}, map[*pier.Pier]string{}
		for i := range la {
			keyA[&la[i]] = ka[i]
		}
		for i := range lb {
			keyB[&lb[i]] = kb[i]
		}
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
				if !(pc.Overlap > 0 || keyA[pc.Before] == keyB[pc.After]) || pc.Overlap > 1+1e-12 || !near(pc.Overlap, overlap(pc.Before.Rect, pc.After.Rect), 1e-12) {
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

// Two doors; the first moves 6 ft right. By overlap alone the 6 ft pier
// between the doors (5–11 ft) overlaps the new end pier (0–8 ft) more
// (IoU 3/11) than the old end pier (0–2 ft) does (IoU 2/8), and was matched
// to it as "renamed". Matched by bounds, each pier keeps its neighbours.
func TestMatchPiersByBounds(t *testing.T) {
	door := func(name string, x geometry.Length) geometry.Opening {
		return geometry.Opening{Name: name, X: x, Width: 3 * ft, Height: 7 * ft}
	}
	w := &geometry.Wall{
		Units: geometry.US, Length: 20 * ft, Height: 10 * ft, Thickness: 8 * geometry.Inch,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 1, Ie: 1},
		Layouts: []geometry.Layout{
			{Name: "before", Openings: []geometry.Opening{door("D1", 2*ft), door("D2", 11*ft)}},
			{Name: "after", Openings: []geometry.Opening{door("D1", 8*ft), door("D2", 14*ft)}},
		},
	}
	c, err := Compare(WithLayout(w, 0), WithLayout(w, 1))
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]string{"end–D1": "end–D1", "D1–D2": "D1–D2", "D2–end": "D2–end"}
	if len(c.Piers) != 3 {
		t.Fatalf("%d pier changes, want 3", len(c.Piers))
	}
	for _, pc := range c.Piers {
		if pc.Status() != Kept {
			t.Fatalf("pier %v: %v, want kept", pc, pc.Status())
		}
		kb := PierBounds(c.Before.Wall, *pc.Before).String()
		ka := PierBounds(c.After.Wall, *pc.After).String()
		if want[kb] != ka {
			t.Errorf("before %s (%s) matched after %s (%s)", pc.Before.Name, kb, pc.After.Name, ka)
		}
	}
}

func TestPierKeys(t *testing.T) {
	// The nested wall of testdata: a door D1 and, in the pier right of it,
	// a window W1 (nested piers P2.1, P2.2).
	w := &geometry.Wall{
		Units: geometry.US, Length: 18 * ft, Height: 16 * ft, Thickness: 8 * geometry.Inch,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 1, Ie: 1},
		Layouts: []geometry.Layout{{Name: "n", Openings: []geometry.Opening{
			{Name: "D1", X: 4 * ft, Width: 4 * ft, Height: 8 * ft},
			{Name: "W1", X: 12 * ft, Sill: 2 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
	r, err := pier.Solve(w)
	if err != nil {
		t.Fatal(err)
	}
	got := map[string]string{}
	leaves := r.Leaves()
	for i, k := range PierKeys(w, leaves) {
		got[leaves[i].Name] = k
	}
	want := map[string]string{"P1": "end–D1", "P2.1": "D1–W1", "P2.2": "W1–end"}
	for n, k := range want {
		if got[n] != k {
			t.Errorf("%s: key %q, want %q (all %v)", n, got[n], k, got)
		}
	}
}

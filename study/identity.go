package study

import (
	"math"
	"strconv"

	"pierwise/geometry"
	"pierwise/pier"
)

// Bounds names what stands on each side of a leaf pier: the opening whose
// edge the pier's left (right) edge lies on, or "" where the pier ends at the
// wall's end. A pier keeps its bounds when an opening moves a little, while
// its name (P1, P2, … handed out left to right) may shift, so the bounds are
// what identifies the physical pier across layouts and sweep positions.
type Bounds struct {
	Left, Right string
}

// String writes the bounds as a label: "end–W1", "W1–D2", "D2–end".
func (b Bounds) String() string {
	side := func(s string) string {
		if s == "" {
			return "end"
		}
		return s
	}
	return side(b.Left) + "–" + side(b.Right)
}

// edgeTol is how close a pier's edge and an opening's edge must be to touch:
// a micrometre, as the classic decomposition cuts piers exactly at opening
// edges.
const edgeTol = 1e-6

// PierBounds finds the bounds of pier p of wall w (its active layout): on
// each side, of the openings whose edge lies on the pier's edge and that
// overlap the pier's height, the one that overlaps it most.
func PierBounds(w *geometry.Wall, p pier.Pier) Bounds {
	var b Bounds
	bestL, bestR := 0.0, 0.0
	for _, o := range w.Openings() {
		r := o.Rect()
		v := math.Min(r.Y1, p.Rect.Y1) - math.Max(r.Y0, p.Rect.Y0)
		if v <= edgeTol {
			continue
		}
		if math.Abs(r.X1-p.Rect.X0) <= edgeTol && v > bestL {
			b.Left, bestL = o.Name, v
		}
		if math.Abs(r.X0-p.Rect.X1) <= edgeTol && v > bestR {
			b.Right, bestR = o.Name, v
		}
	}
	return b
}

// PierKeys returns one identity label per pier of piers (leaf piers of one
// solved layout of w): its bounds (Bounds.String), followed by " #2", " #3"…
// on the second and later piers that share the same bounds (piers stacked
// in different bands between the same openings).
func PierKeys(w *geometry.Wall, piers []pier.Pier) []string {
	keys := make([]string, len(piers))
	seen := map[string]int{}
	for i, p := range piers {
		k := PierBounds(w, p).String()
		seen[k]++
		if n := seen[k]; n > 1 {
			k += " #" + strconv.Itoa(n)
		}
		keys[i] = k
	}
	return keys
}

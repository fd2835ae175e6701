package study

import (
	"context"
	"errors"
	"fmt"
	"math"
	"sort"

	"pierwise/basis"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// Side is one solved layout of a comparison.
type Side struct {
	Path   string         // the wall file, when there is one (set by the caller)
	Label  string         // what the user called it, e.g. "rear.toml:door moved"; the layout name by default
	Wall   *geometry.Wall // the wall with the compared layout active
	Result *pier.Result   // the classic method's answer; nil when Err is set
	Err    error          // why the classic method has no answer (*pier.CutError, *pier.StaggeredError, …)

	// The finite-element check, when Options.FE asked for it. FE may exist
	// where the classic method has none (staggered openings).
	FE    *fe.Result
	FEErr error

	// Basis is the side's answer on the comparison's basis. On the fe
	// basis Result is its View (the model's rigidity, deflection, drift
	// and shares in a classic result's shape), so that every number of
	// the comparison is the model's; Basis.Classic keeps the classic
	// answer for the check. docs/method.md §5.
	Basis *basis.Result
}

// FEShare returns the FE share of the leaf pier called name, and false when
// there is no FE answer for it.
func (s *Side) FEShare(name string) (float64, bool) {
	if s.FE == nil {
		return 0, false
	}
	for _, p := range s.FE.Piers {
		if p.Name == name {
			return p.Share, true
		}
	}
	return 0, false
}

// Layout returns the name of the side's active layout.
func (s *Side) Layout() string {
	if s.Wall == nil || s.Wall.Active < 0 || s.Wall.Active >= len(s.Wall.Layouts) {
		return ""
	}
	return s.Wall.Layouts[s.Wall.Active].Name
}

// OK reports whether the side has a classic result.
func (s *Side) OK() bool { return s.Err == nil && s.Result != nil }

// Comparison is two layouts solved and lined up: Before is the reference,
// After the alternative.
type Comparison struct {
	Before, After Side
	Piers         []PierChange // leaf piers matched by bounds, then by position (MatchPiers)
}

// Status says what happened to a pier between the two layouts.
type Status int

const (
	Kept     Status = iota // the pier is in both layouts
	Vanishes               // only in Before
	Appears                // only in After
)

func (s Status) String() string {
	switch s {
	case Vanishes:
		return "vanishes"
	case Appears:
		return "appears"
	}
	return "kept"
}

// PierChange is one leaf pier before and after. Before or After is nil when
// the pier appears or vanishes.
type PierChange struct {
	Before, After *pier.Pier
	Overlap       float64 // intersection over union of the two rectangles, 0–1
}

// Status returns whether the pier is kept, appears or vanishes.
func (p PierChange) Status() Status {
	switch {
	case p.Before == nil:
		return Appears
	case p.After == nil:
		return Vanishes
	}
	return Kept
}

// ShareChange returns the change of the pier's share of the wall shear,
// After − Before, as a fraction of the wall shear (a missing pier has no
// share).
func (p PierChange) ShareChange() float64 {
	var a, b float64
	if p.Before != nil {
		a = p.Before.Share
	}
	if p.After != nil {
		b = p.After.Share
	}
	return b - a
}

// Options choose what Compare computes beyond the classic method.
type Options struct {
	FE        bool       // also run the finite-element check on both sides
	FEOptions fe.Options // its mesh and element
	// Basis is where the compared numbers come from: the classic method
	// (default) or the finite-element model (which then runs on both
	// sides whatever FE says).
	Basis geometry.Basis
}

// Compare solves two walls, or two layouts of one wall (pass copies with
// Active set, see WithLayout), and lines them up. A layout the classic method
// cannot solve is not an error: its Side carries the error and the
// comparison says so. The error is for misuse: a nil wall or an active index
// that names no layout.
func Compare(a, b *geometry.Wall) (*Comparison, error) {
	return CompareWith(a, b, Options{})
}

// CompareWith is Compare with options.
func CompareWith(a, b *geometry.Wall, opt Options) (*Comparison, error) {
	return CompareContext(context.Background(), a, b, opt)
}

// CompareContext is CompareWith that stops when ctx is done: the
// finite-element solves run through basis.SolveContext, which looks at ctx
// inside assembly and factorisation, and the error is then ctx's. The
// editor cancels a comparison the user has moved on from.
func CompareContext(ctx context.Context, a, b *geometry.Wall, opt Options) (*Comparison, error) {
	c := &Comparison{}
	for i, w := range []*geometry.Wall{a, b} {
		side := &c.Before
		if i == 1 {
			side = &c.After
		}
		if w == nil {
			return nil, errors.New("study: compare: nil wall")
		}
		if w.Active < 0 || w.Active >= len(w.Layouts) {
			return nil, fmt.Errorf("study: compare: active layout %d of %d", w.Active, len(w.Layouts))
		}
		side.Wall = w
		side.Label = w.Layouts[w.Active].Name
		b := basis.SolveContext(ctx, w, opt.Basis, basis.Options{FE: opt.FEOptions, Check: opt.FE})
		if err := ctx.Err(); err != nil && b.FEErr != nil {
			return nil, err // the model was cut short
		}
		side.Basis = b
		side.Result, side.Err = b.View(), b.ClassicErr // the classic errors as they are, for their types
		if b.IsFE() {
			side.Err = b.Err()
		}
		if side.Err != nil {
			side.Result = nil
		}
		side.FE, side.FEErr = b.FE, b.FEErr
	}
	// The piers are the classic decomposition's on both bases: without it
	// (fe basis, staggered openings) a side has the model's wall numbers
	// but no piers to match.
	if c.Before.OK() && c.After.OK() && c.Before.Basis.Classic != nil && c.After.Basis.Classic != nil {
		c.Piers = MatchPiers(c.Before.Wall, c.Before.Result.Leaves(), c.After.Wall, c.After.Result.Leaves())
	}
	return c, nil
}

// Change returns the relative change (after − before) / before, and false
// when it is not defined (a side without an answer, or a zero before).
func Change(before, after float64) (float64, bool) {
	if before == 0 || math.IsNaN(before) || math.IsNaN(after) || math.IsInf(before, 0) || math.IsInf(after, 0) {
		return 0, false
	}
	return (after - before) / before, true
}

// FERigidityChange returns the relative change of the FE relative rigidity,
// and false when a side has no FE answer.
func (c *Comparison) FERigidityChange() (float64, bool) {
	if c.Before.FE == nil || c.After.FE == nil {
		return 0, false
	}
	return Change(c.Before.FE.Rigidity, c.After.FE.Rigidity)
}

// RigidityChange returns the relative change of the wall's relative
// rigidity, and false when a side has no answer.
func (c *Comparison) RigidityChange() (float64, bool) {
	if !c.Before.OK() || !c.After.OK() {
		return 0, false
	}
	return Change(c.Before.Result.Rigidity, c.After.Result.Rigidity)
}

// MatchPiers pairs the leaf piers of two layouts (before of wall bw, after
// of wall aw) as the same physical piers. A pier is first the pier with the
// same bounds (PierKeys: the openings, or wall ends, on either side of it),
// then, among the piers left, the one its rectangle overlaps most
// (intersection over union); each pier is used once, and a pier that shares
// neither its bounds nor any area with a pier of the other layout appears or
// vanishes. Bounds come first because overlap alone pairs a wide pier beside
// a window with a narrow one beside a door when the door moves into its
// place. The result lists the pairs and vanishing piers in the order of
// before, then the appearing piers in the order of after.
func MatchPiers(bw *geometry.Wall, before []pier.Pier, aw *geometry.Wall, after []pier.Pier) []PierChange {
	kb, ka := PierKeys(bw, before), PierKeys(aw, after)
	type cand struct {
		i, j int
		same bool
		iou  float64
	}
	var cands []cand
	for i := range before {
		for j := range after {
			iou := overlap(before[i].Rect, after[j].Rect)
			if same := kb[i] == ka[j]; same || iou > 0 {
				cands = append(cands, cand{i, j, same, iou})
			}
		}
	}
	sort.SliceStable(cands, func(x, y int) bool {
		if cands[x].same != cands[y].same {
			return cands[x].same
		}
		return cands[x].iou > cands[y].iou
	})
	pairOf := make([]int, len(before))
	iouOf := make([]float64, len(before))
	for i := range pairOf {
		pairOf[i] = -1
	}
	usedAfter := make([]bool, len(after))
	for _, c := range cands {
		if pairOf[c.i] >= 0 || usedAfter[c.j] {
			continue
		}
		pairOf[c.i], iouOf[c.i] = c.j, c.iou
		usedAfter[c.j] = true
	}
	out := make([]PierChange, 0, len(before)+len(after))
	for i := range before {
		pc := PierChange{Before: &before[i]}
		if j := pairOf[i]; j >= 0 {
			pc.After, pc.Overlap = &after[j], iouOf[i]
		}
		out = append(out, pc)
	}
	for j := range after {
		if !usedAfter[j] {
			out = append(out, PierChange{After: &after[j]})
		}
	}
	return out
}

// overlap returns the intersection over union of two rectangles; touching
// rectangles do not overlap.
func overlap(a, b geometry.Rect) float64 {
	w := math.Min(a.X1, b.X1) - math.Max(a.X0, b.X0)
	h := math.Min(a.Y1, b.Y1) - math.Max(a.Y0, b.Y0)
	if w <= 0 || h <= 0 {
		return 0
	}
	inter := w * h
	union := a.W()*a.H() + b.W()*b.H() - inter
	if union <= 0 {
		return 0
	}
	return inter / union
}

// ShearStress returns a pier's average shear stress V_i/(L_i·t) under the
// wall's load, and false when the wall has no load (or no thickness).
func ShearStress(p pier.Pier, w *geometry.Wall) (geometry.Stress, bool) {
	if w.Load.Shear <= 0 || w.Thickness <= 0 || p.L() <= 0 {
		return 0, false
	}
	return geometry.Stress(float64(p.Shear) / (p.L() * float64(w.Thickness))), true
}

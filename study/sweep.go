package study

import (
	"cmp"
	"context"
	"errors"
	"fmt"
	"math"
	"slices"
	"strconv"
	"strings"

	"pierwise/basis"
	"pierwise/design"
	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// Axis is the direction an opening moves in a sweep.
type Axis int

const (
	AlongX Axis = iota // the opening's left edge moves; sill fixed
	AlongY             // the opening's sill moves; left edge fixed
)

func (a Axis) String() string {
	if a == AlongY {
		return "y"
	}
	return "x"
}

// ParseAxis reads "x" or "y".
func ParseAxis(s string) (Axis, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "x", "":
		return AlongX, nil
	case "y":
		return AlongY, nil
	}
	return 0, fmt.Errorf("axis %q: want x or y", s)
}

// MaxPoints bounds the number of positions of one sweep, so that a tiny step
// on a long wall is an error rather than a long wait.
const MaxPoints = 5000

// PierShare is one leaf pier's share of the wall shear at a sweep position.
// Name is the pier's name at this position (names follow the position:
// P2 here may be another pier than P2 elsewhere); Key identifies the
// physical pier by the openings on either side of it (PierKeys), the same
// at every position where that pier exists.
type PierShare struct {
	Name  string
	Key   string
	Share float64 // fraction of the wall shear, 0–1
	x     float64 // the pier's middle, for ordering the series
}

// Point is the wall solved with the swept opening at one position.
type Point struct {
	X, Y     geometry.Length // the opening's left edge and sill here
	Rigidity float64         // the wall's relative rigidity (E = 1, t = 1)
	Piers    []PierShare     // leaf piers in name order

	// The leaf pier with the highest shear stress: StressIndex = share/L
	// (1/m), which ranks positions with or without a load; MaxStress =
	// V_i/(L_i·t) when the wall has a load, else zero.
	StressPier  string
	StressIndex float64
	MaxStress   geometry.Stress

	// The pier design here, when the wall has a [design] table
	// (docs/method.md §8): Designed is set when the checks were made,
	// Ratio is the wall's governing demand/capacity ratio, RatioPier the
	// pier that has it, Passes that every pier passes every check.
	Designed  bool
	Ratio     float64
	RatioPier string
	Passes    bool
	DesignErr error // the checks could not be made here

	Current bool // the opening's position in the wall as given
	// Best is the position an engineer would try first (first such point),
	// preferring points without Weak: with a pier design the lowest
	// governing ratio, else the lowest StressIndex.
	Best bool

	// Weak lists the kinds of layout warnings (pier.LayoutWarning) the
	// classic method gives here but not at the current position: a sliver
	// pier, a thin strip between bands, a shallow spandrel… Its numbers are
	// less to be trusted there.
	Weak []string

	Result *pier.Result // the full answer; nil when Err is set
	Err    error        // the classic method has no answer here
}

// Pos returns the position that moves along the axis: X or Y.
func (p Point) Pos(a Axis) geometry.Length {
	if a == AlongY {
		return p.Y
	}
	return p.X
}

// Sweep moves the opening called name along the axis in steps of step,
// through every position where it fits (Wall.CheckOpening), and solves the
// active layout at each. Positions lie on the grid through the opening's
// current position, so the current position is always one of them. Points
// come in order of increasing position. A position the classic method
// cannot solve is a point with Err set. The error is for bad arguments: an
// unknown opening, a step that is not positive or would make more than
// MaxPoints positions.
func Sweep(w *geometry.Wall, name string, axis Axis, step geometry.Length) ([]Point, error) {
	return SweepWith(w, name, axis, step, SweepOptions{})
}

// MaxFEPoints bounds a sweep on the fe basis, where every position is a
// finite-element solve (about 15 ms on a typical wall at the default mesh,
// docs/method.md §5): 100 positions take a few seconds at most.
const MaxFEPoints = 100

// SweepOptions choose the basis of a sweep.
type SweepOptions struct {
	// Basis is where each position's rigidity and shares come from: the
	// classic method (default) or the finite-element model, which solves
	// every position (at most MaxFEPoints of them).
	Basis geometry.Basis
	FE    fe.Options // the model's mesh and element on the fe basis
}

// SweepWith is Sweep on the basis of opt. On the fe basis each point's
// Result is the basis's View (the model's rigidity and shares), and a step
// that makes more than MaxFEPoints positions is refused with the smallest
// step that would do.
func SweepWith(w *geometry.Wall, name string, axis Axis, step geometry.Length, opt SweepOptions) ([]Point, error) {
	return SweepContext(context.Background(), w, name, axis, step, opt)
}

// SweepContext is SweepWith that stops when ctx is done, between positions
// and inside a position's finite-element solve, with ctx's error: the
// editor cancels a sweep the user has moved on from.
func SweepContext(ctx context.Context, w *geometry.Wall, name string, axis Axis, step geometry.Length, opt SweepOptions) ([]Point, error) {
	ops := w.Openings()
	idx := FindOpening(w, name)
	if idx < 0 {
		names := make([]string, len(ops))
		for i, o := range ops {
			names[i] = o.Name
		}
		if len(names) == 0 {
			return nil, fmt.Errorf("no opening %q: the layout has no openings", name)
		}
		return nil, fmt.Errorf("no opening %q; the openings are %s", name, strings.Join(names, ", "))
	}
	s := float64(step)
	if !(s > 0) || math.IsInf(s, 0) {
		return nil, errors.New("the sweep step must be a positive length")
	}
	o := ops[idx]
	cur, span := float64(o.X), float64(w.Length-o.Width)
	if axis == AlongY {
		cur, span = float64(o.Sill), float64(w.Height-o.Height)
	}
	if span < 0 {
		return nil, fmt.Errorf("opening %s is larger than the wall", name)
	}
	// k runs over the grid cur + k·step inside [0, span]; a tolerance of a
	// micrometre keeps the ends that floating-point rounding nudges out.
	// The count is taken in floating point before any conversion to int: a
	// tiny step (1e-18 in) makes a count beyond the range of int.
	const tol = 1e-6
	fmin := math.Ceil((-cur - tol) / s)
	fmax := math.Floor((span - cur + tol) / s)
	if n := fmax - fmin + 1; !(n <= MaxPoints) {
		count := strconv.FormatFloat(n, 'g', 3, 64)
		if n < 1e9 {
			count = strconv.Itoa(int(n))
		}
		return nil, fmt.Errorf("a step of %s makes %s positions; use a larger step (at most %d positions)",
			FormatStep(step, w.Units), count, MaxPoints)
	}
	kmin, kmax := int(fmin), int(fmax)
	if n := kmax - kmin + 1; opt.Basis == geometry.BasisFE && n > MaxFEPoints {
		return nil, fmt.Errorf("a step of %s makes %d positions, each a finite-element solve; on the fe basis a sweep has at most %d: use a step of %s or more, or the classic basis",
			FormatStep(step, w.Units), n, MaxFEPoints, FormatStep(feStep(span, w.Units), w.Units))
	}

	// One private copy of the active layout's openings, edited in place.
	work := *w
	work.Layouts = append([]geometry.Layout(nil), w.Layouts...)
	moved := append([]geometry.Opening(nil), ops...)
	work.Layouts[w.Active].Openings = moved

	var pts []Point
	for k := kmin; k <= kmax; k++ {
		if err := ctx.Err(); err != nil {
			return nil, err
		}
		pos := math.Min(math.Max(cur+float64(k)*s, 0), span)
		if k == 0 {
			pos = cur
		}
		m := o
		if axis == AlongY {
			m.Sill = geometry.Length(pos)
		} else {
			m.X = geometry.Length(pos)
		}
		if w.CheckOpening(idx, m) != nil {
			continue
		}
		moved[idx] = m
		pts = append(pts, solvePoint(ctx, &work, m, k == 0, opt))
	}
	if err := ctx.Err(); err != nil {
		return nil, err // the last position's model was cut short
	}
	markWeak(pts)
	markBest(pts)
	return pts, nil
}

// markWeak sets Weak on the points with layout warnings of a kind the
// current position does not have (all of their layout warnings when the
// current position has no answer).
func markWeak(pts []Point) {
	base := map[string]bool{}
	if i := CurrentIndex(pts); i >= 0 && pts[i].Result != nil {
		for _, w := range pts[i].Result.Warnings {
			base[w.Kind] = true
		}
	}
	for i := range pts {
		r := pts[i].Result
		if r == nil {
			continue
		}
		for _, w := range r.Warnings {
			if k := w.Kind; pier.LayoutWarning(k) && !base[k] && !slices.Contains(pts[i].Weak, k) {
				pts[i].Weak = append(pts[i].Weak, k)
			}
		}
	}
}

// FormatStep shows a sweep step to people: as geometry.FormatLength does
// (feet-inches to 1/8 in, metres to the millimetre), or in inches or
// millimetres with three significant digits when that rounding would show a
// small step as zero.
func FormatStep(step geometry.Length, sys geometry.System) string {
	s := geometry.FormatLength(step, sys)
	if step == 0 || (s != `0"` && s != "0.000 m") {
		return s
	}
	if sys == geometry.SI {
		return strconv.FormatFloat(float64(step/geometry.Millimetre), 'g', 3, 64) + " mm"
	}
	return strconv.FormatFloat(float64(step/geometry.Inch), 'g', 3, 64) + " in"
}

// FindOpening returns the index of the active layout's opening called name,
// or -1. Names match exactly first, then ignoring case (w2 finds W2), as
// layout names do.
func FindOpening(w *geometry.Wall, name string) int {
	ops := w.Openings()
	if i := slices.IndexFunc(ops, func(o geometry.Opening) bool { return o.Name == name }); i >= 0 {
		return i
	}
	return slices.IndexFunc(ops, func(o geometry.Opening) bool { return strings.EqualFold(o.Name, name) })
}

func solvePoint(ctx context.Context, w *geometry.Wall, o geometry.Opening, current bool, opt SweepOptions) Point {
	p := Point{X: o.X, Y: o.Sill, Current: current}
	var res *pier.Result
	var err error
	if opt.Basis == geometry.BasisFE {
		b := basis.SolveContext(ctx, w, opt.Basis, basis.Options{FE: opt.FE})
		if res, err = b.View(), b.Err(); err == nil && res == nil {
			err = b.ClassicErr // no classic decomposition: no piers to share
		}
	} else {
		res, err = pier.Solve(w)
	}
	if err != nil {
		p.Err = err
		return p
	}
	p.Result, p.Rigidity = res, res.Rigidity
	p.StressIndex = -1
	leaves := res.Leaves()
	keys := PierKeys(w, leaves)
	for i, lp := range leaves {
		p.Piers = append(p.Piers, PierShare{Name: lp.Name, Key: keys[i], Share: lp.Share, x: (lp.Rect.X0 + lp.Rect.X1) / 2})
		if lp.L() <= 0 {
			continue
		}
		if idx := lp.Share / lp.L(); idx > p.StressIndex {
			p.StressIndex, p.StressPier = idx, lp.Name
			p.MaxStress, _ = ShearStress(lp, w)
		}
	}
	if p.StressIndex < 0 {
		p.StressIndex = 0
	}
	if w.Design != nil {
		d, ok, err := design.CheckClassic(w, res)
		switch {
		case err != nil:
			p.DesignErr = err
		case ok:
			p.Designed, p.Ratio, p.Passes = true, d.Ratio, d.OK
			if d.Governing >= 0 {
				p.RatioPier = d.Piers[d.Governing].Name
			}
		}
	}
	return p
}

// Designed reports whether the sweep's points carry a pier design.
func Designed(pts []Point) bool {
	for _, p := range pts {
		if p.Designed {
			return true
		}
	}
	return false
}

// markBest sets Best on the first solved point with the lowest governing
// ratio when the points carry a pier design, else with the lowest
// StressIndex, among the points without Weak when there are any.
func markBest(pts []Point) {
	designed := Designed(pts)
	usable := func(p Point) bool { return p.Err == nil && (!designed || p.Designed) }
	sound := false
	for _, p := range pts {
		if usable(p) && len(p.Weak) == 0 {
			sound = true
			break
		}
	}
	score := func(p Point) float64 {
		if designed {
			return p.Ratio
		}
		return p.StressIndex
	}
	best := -1
	for i, p := range pts {
		if !usable(p) || (sound && len(p.Weak) > 0) {
			continue
		}
		// A relative tolerance keeps ties (mirror positions) on the first.
		if best < 0 || score(p) < score(pts[best])*(1-1e-9) {
			best = i
		}
	}
	if best >= 0 {
		pts[best].Best = true
	}
}

// BestIndex returns the index of the best point, or -1.
func BestIndex(pts []Point) int {
	for i, p := range pts {
		if p.Best {
			return i
		}
	}
	return -1
}

// CurrentIndex returns the index of the current position, or -1 (the
// opening's current position does not fit, e.g. the layout is invalid).
func CurrentIndex(pts []Point) int {
	for i, p := range pts {
		if p.Current {
			return i
		}
	}
	return -1
}

// PierSeries lists every physical pier of a sweep by its Key, for the
// columns of a table or the series of a plot: ordered left to right by
// where the pier stands on average over the positions where it exists.
func PierSeries(pts []Point) []string {
	sum, n := map[string]float64{}, map[string]int{}
	var keys []string
	for _, p := range pts {
		for _, ps := range p.Piers {
			if n[ps.Key] == 0 {
				keys = append(keys, ps.Key)
			}
			sum[ps.Key] += ps.x
			n[ps.Key]++
		}
	}
	slices.SortStableFunc(keys, func(a, b string) int {
		return cmp.Compare(sum[a]/float64(n[a]), sum[b]/float64(n[b]))
	})
	return keys
}

// feStep is the smallest step, a whole inch or 10 mm, that sweeps span in
// at most MaxFEPoints positions.
func feStep(span float64, sys geometry.System) geometry.Length {
	unit := float64(geometry.Inch)
	if sys == geometry.SI {
		unit = float64(10 * geometry.Millimetre)
	}
	return geometry.Length(unit * math.Ceil(span/float64(MaxFEPoints-1)/unit+1e-9))
}

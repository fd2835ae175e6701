package basis

import (
	"context"
	"errors"
	"fmt"
	"math"
	"strings"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// Parse reads a basis as the command line and the wall file spell it:
// "classic" or "fe" (case and surrounding space ignored).
func Parse(s string) (geometry.Basis, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "classic":
		return geometry.BasisClassic, nil
	case "fe":
		return geometry.BasisFE, nil
	}
	return geometry.BasisClassic, fmt.Errorf("unknown basis %q (use classic or fe)", s)
}

// Options say what Solve computes beyond the chosen basis.
type Options struct {
	// FE is the finite-element model's mesh and element (the wall's own
	// [check] settings when zero).
	FE fe.Options
	// Check also solves the finite-element model on the classic basis, so
	// that its rigidity stands beside the classic one. On the fe basis the
	// classic method always runs: it is cheap, and its decomposition names
	// the piers whose forces the model reports.
	Check bool
}

// Result is one wall layout solved on a basis. Classic and FE hold each
// model's answer or its error; the accessors give the chosen basis's
// numbers, so that nothing downstream picks a model itself.
type Result struct {
	Basis geometry.Basis
	Wall  *geometry.Wall

	Classic    *pier.Result // nil when ClassicErr is set
	ClassicErr error
	FE         *fe.Result // nil when FEErr is set or the model was not asked for
	FEErr      error
}

// Solve solves the active layout of w on basis b. It never fails as a
// whole: each model's error is kept in the Result, and Err says whether
// the chosen basis has an answer. docs/method.md §5.
func Solve(w *geometry.Wall, b geometry.Basis, opt Options) *Result {
	return SolveContext(context.Background(), w, b, opt)
}

// SolveContext is Solve that stops the finite-element solve when ctx is
// done; FEErr is then ctx.Err().
func SolveContext(ctx context.Context, w *geometry.Wall, b geometry.Basis, opt Options) *Result {
	r := &Result{Basis: b, Wall: w}
	r.Classic, r.ClassicErr = pier.Solve(w)
	if r.ClassicErr != nil {
		r.Classic = nil
	}
	if b == geometry.BasisFE || opt.Check {
		r.FE, r.FEErr = fe.SolveContext(ctx, w, r.Classic, opt.FE)
		if r.FEErr != nil {
			r.FE = nil
		}
	}
	return r
}

// NoAnswerError says that the chosen basis has no answer for a wall, and
// why (Err: a *pier.CutError, a *pier.StaggeredError, the finite-element
// model's refusal …).
type NoAnswerError struct {
	Basis geometry.Basis
	Err   error
}

func (e *NoAnswerError) Error() string {
	if e.Basis == geometry.BasisFE {
		return "the finite-element model has no answer: " + e.Err.Error()
	}
	return e.Err.Error() // the classic method's errors say what they are
}

func (e *NoAnswerError) Unwrap() error { return e.Err }

// Err returns why the chosen basis has no answer, or nil.
func (r *Result) Err() error {
	if r.Basis == geometry.BasisFE {
		if r.FEErr != nil {
			return &NoAnswerError{Basis: r.Basis, Err: r.FEErr}
		}
		if r.FE == nil {
			return &NoAnswerError{Basis: r.Basis, Err: errors.New("the model was not solved")}
		}
		return nil
	}
	if r.ClassicErr != nil {
		return &NoAnswerError{Basis: r.Basis, Err: r.ClassicErr}
	}
	return nil
}

// OK reports whether the chosen basis has an answer.
func (r *Result) OK() bool { return r.Err() == nil }

// IsFE reports whether the chosen basis is the finite-element model.
func (r *Result) IsFE() bool { return r.Basis == geometry.BasisFE }

// Deflection returns the wall's relative deflection (1/(E·t)) on the
// chosen basis, 0 without an answer.
func (r *Result) Deflection() float64 {
	switch {
	case !r.OK():
		return 0
	case r.IsFE():
		return r.FE.Deflection
	}
	return r.Classic.Deflection
}

// Rigidity returns the wall's relative rigidity (E·t) on the chosen basis,
// 0 without an answer.
func (r *Result) Rigidity() float64 {
	switch {
	case !r.OK():
		return 0
	case r.IsFE():
		return r.FE.Rigidity
	}
	return r.Classic.Rigidity
}

// RigidityAbs returns the rigidity in N/m, 0 when the material gives no E
// (or there is no answer).
func (r *Result) RigidityAbs() float64 {
	switch {
	case !r.OK():
		return 0
	case r.IsFE():
		return r.FE.RigidityAbs
	}
	return r.Classic.RigidityAbs
}

// HasLoad reports whether the wall is solved under a shear with a known E:
// DeflectionAbs and Drift are filled.
func (r *Result) HasLoad() bool {
	switch {
	case !r.OK():
		return false
	case r.IsFE():
		return r.FE.HasLoad
	}
	return r.Classic.HasLoad
}

// DeflectionAbs returns the top deflection under the wall's shear.
func (r *Result) DeflectionAbs() geometry.Length {
	if !r.HasLoad() {
		return 0
	}
	if r.IsFE() {
		return r.FE.DeflectionAbs
	}
	return r.Classic.DeflectionAbs
}

// Drift returns the drift check of the chosen basis's deflection.
func (r *Result) Drift() pier.DriftCheck {
	if !r.HasLoad() {
		return pier.DriftCheck{}
	}
	if r.IsFE() {
		return r.FE.Drift
	}
	return r.Classic.Drift
}

// Overturning returns the wall's base overturning moment under its shear,
// N·m: statics of the load alone (V·h for a cantilever, V·h/2 for a wall
// whose top is held against rotation, docs/method.md §6), the same on both
// bases. Zero without a load.
func (r *Result) Overturning() float64 {
	if r.Classic != nil {
		return r.Classic.Overturning
	}
	V := float64(r.Wall.Load.Shear)
	if !(V > 0) {
		return 0
	}
	h := float64(r.Wall.Height)
	if r.Wall.Support == geometry.Fixed {
		h /= 2
	}
	return V * h
}

// Pier is one pier (leaf or parent) on the chosen basis: where it is (from
// the classic decomposition, which defines the piers of both bases), its
// share of the wall shear and its section forces by load case.
type Pier struct {
	Name    string
	Parent  string
	Rect    geometry.Rect
	Support geometry.Support
	Leaf    bool
	Cut     bool // no load path: no share, no forces

	Share  float64        // fraction of the wall shear, 0–1
	Shear  geometry.Force // V_i under the wall's shear (zero without one)
	Moment float64        // the governing moment under the wall's shear, N·m (see Forces)
	Loads  pier.PierLoads // section forces at bottom, middle and top by load case

	// Classic is the classic method's pier of the same name (its relative
	// rigidity, bending and shear parts); nil when the classic method has
	// no answer.
	Classic *pier.Pier
}

// H, L and Ratio give the pier's height, length and h/L.
func (p Pier) H() float64     { return p.Rect.H() }
func (p Pier) L() float64     { return p.Rect.W() }
func (p Pier) Ratio() float64 { return p.Rect.H() / p.Rect.W() }

// Piers returns every pier on the chosen basis, parents before children in
// name order (the classic result's order). On the classic basis they are
// the classic piers unchanged. On the fe basis the shares and section
// forces are the model's (docs/method.md §4), and Moment is the larger in
// magnitude of the bottom and top moments, where a pier's moment peaks
// under a lateral load. Nil without an answer, and on the fe basis when
// the classic method has none (its decomposition names the piers).
func (r *Result) Piers() []Pier {
	if !r.OK() || r.Classic == nil {
		return nil
	}
	out := make([]Pier, 0, len(r.Classic.Piers))
	for i := range r.Classic.Piers {
		cp := &r.Classic.Piers[i]
		p := Pier{Name: cp.Name, Parent: cp.Parent, Rect: cp.Rect, Support: cp.Support, Leaf: cp.Leaf, Cut: cp.Cut,
			Share: cp.Share, Shear: cp.Shear, Moment: cp.Moment, Loads: cp.Loads, Classic: cp}
		if r.IsFE() {
			f, ok := r.FE.Pier(cp.Name)
			p.Share, p.Loads = 0, pier.PierLoads{}
			p.Shear, p.Moment = 0, 0
			if ok && !cp.Cut {
				p.Share, p.Loads = f.Share, f.Loads
				lat := f.Loads.Lateral
				p.Shear = lat.Middle.Shear
				p.Moment = lat.Bottom.Moment
				if math.Abs(lat.Top.Moment) > math.Abs(p.Moment) {
					p.Moment = lat.Top.Moment
				}
			}
		}
		out = append(out, p)
	}
	return out
}

// Leaves returns the leaf piers of Piers.
func (r *Result) Leaves() []Pier {
	var out []Pier
	for _, p := range r.Piers() {
		if p.Leaf {
			out = append(out, p)
		}
	}
	return out
}

// Share returns the share of the leaf pier called name on the chosen basis,
// and false when there is none.
func (r *Result) Share(name string) (float64, bool) {
	for _, p := range r.Leaves() {
		if p.Name == name && !p.Cut {
			return p.Share, true
		}
	}
	return 0, false
}

// Warnings returns the warnings of the chosen basis: the classic method's
// (its assumptions and the layout's weak points) on the classic basis, the
// model's notes on comparability on the fe basis.
func (r *Result) Warnings() []string {
	if r.IsFE() {
		if r.FE == nil {
			return nil
		}
		return r.FE.Warnings
	}
	if r.Classic == nil {
		return nil
	}
	return pier.Texts(r.Classic.Warnings)
}

// Check is the other basis's rigidity, set beside the chosen one.
type Check struct {
	Basis       geometry.Basis // the other basis
	Rigidity    float64        // its relative rigidity (E·t)
	RigidityAbs float64        // N/m, 0 without E
	// Difference is (classic − fe) / fe, the classic method's excess over
	// the finite-element rigidity, whichever basis is chosen.
	Difference float64
}

// Check returns the other basis's rigidity and the difference, and false
// when either basis has no answer (or the check was not solved).
func (r *Result) Check() (Check, bool) {
	if r.Classic == nil || r.FE == nil || !(r.FE.Rigidity > 0) || math.IsInf(r.Classic.Rigidity, 0) {
		return Check{}, false
	}
	c := Check{Difference: (r.Classic.Rigidity - r.FE.Rigidity) / r.FE.Rigidity}
	if r.IsFE() {
		c.Basis, c.Rigidity, c.RigidityAbs = geometry.BasisClassic, r.Classic.Rigidity, r.Classic.RigidityAbs
	} else {
		c.Basis, c.Rigidity, c.RigidityAbs = geometry.BasisFE, r.FE.Rigidity, r.FE.RigidityAbs
	}
	return c, true
}

// Name says the basis in words for tables and reports.
func Name(b geometry.Basis) string {
	if b == geometry.BasisFE {
		return "finite-element model"
	}
	return "classic method"
}

// View returns the chosen basis's answer in the shape of a classic result,
// for the views that draw or tabulate a *pier.Result (the elevation sketch,
// the drawings, the editor): on the classic basis the classic result
// itself; on the fe basis a copy whose wall numbers (deflection, rigidity,
// drift) and piers' shares and section forces are the model's, with no
// classic working (Steps, Split, the piers' Parts) and no classic
// warnings; each pier's Rigidity stays the classic formula's. On the fe
// basis without a classic decomposition it has the model's wall numbers and
// no piers. Nil when the chosen basis has no answer. The classic result is
// not changed.
func (r *Result) View() *pier.Result {
	if !r.OK() {
		return nil
	}
	if !r.IsFE() {
		return r.Classic
	}
	if r.Classic == nil {
		return &pier.Result{Deflection: r.FE.Deflection, Rigidity: r.FE.Rigidity, RigidityAbs: r.FE.RigidityAbs,
			HasLoad: r.Wall.Load.Shear > 0, DeflectionAbs: r.FE.DeflectionAbs, Drift: r.FE.Drift, Overturning: r.Overturning()}
	}
	v := *r.Classic
	v.Deflection, v.Rigidity, v.RigidityAbs = r.FE.Deflection, r.FE.Rigidity, r.FE.RigidityAbs
	v.DeflectionAbs, v.Drift = r.FE.DeflectionAbs, r.FE.Drift
	v.Split, v.Steps, v.Warnings = pier.Parts{}, nil, nil
	v.Piers = make([]pier.Pier, len(r.Classic.Piers))
	for i, p := range r.Piers() {
		q := r.Classic.Piers[i]
		q.Share, q.Shear, q.Moment, q.Loads = p.Share, p.Shear, p.Moment, p.Loads
		q.BandShare, q.Parts = 0, pier.Parts{} // the classic formula's, not the model's
		v.Piers[i] = q
	}
	return &v
}

package fe

import (
	"context"
	"errors"
	"fmt"
	"math"
	"strings"

	"pierwise/geometry"
	"pierwise/pier"
)

// Options choose the mesh and the element. A zero value takes the wall's own
// [check] setting (geometry.Check), and when that is zero too, the default.
type Options struct {
	Mesh    geometry.Length // maximum element size; 0 = w.Check.Mesh, then DefaultMesh
	Element string          // "q4" or "qm6"; "" = w.Check.Element, then "qm6"
}

// DefaultMesh is the maximum element size when neither Options.Mesh nor the
// wall's Check.Mesh is set: 6 in (152 mm). With qm6 and the grading toward
// opening edges, halving it changes the deflection of the example walls by
// less than 1 % (TestConvergence), and a 30 ft × 12 ft wall with a door and
// two windows (2,294 elements, 4,832 equations) solves in about 10 ms
// (BenchmarkSolve, on this project's busy 2-core machine; target 20 ms).
const DefaultMesh = 6 * geometry.Inch

// maxDefaultElements bounds the default mesh of a very large wall: the
// element size grows until the mesh has at most this many elements.
const maxDefaultElements = 8000

// maxBand bounds the band matrix (number of stored values, 8 bytes each:
// 480 MB) so that a user's very fine mesh is refused instead of exhausting
// memory or taking minutes. The 160 × 80 mesh of a 20 ft × 10 ft wall needs
// 4.3 million.
const maxBand = 60_000_000

// WarnDifference is the relative difference (classic − FE) / FE in rigidity
// beyond which the report warns that the hand method is far from the
// continuum answer for this layout. 0.25, because:
//   - the comparison's own noise is a few percent: the FE answer at the
//     default mesh is within about 2 % of its converged value on the example
//     walls, and for a solid wall the plane-stress model and the classic
//     (Timoshenko-beam) formula agree within 2.5 % for h/L 0.25 to 3
//     (TestSolidWallTimoshenko), so a difference there says nothing;
//   - the hand method overestimates nearly every wall with openings (DESIGN
//     §5: often by tens of percent; measured 23–112 % on the example walls),
//     so a threshold near zero would warn on every wall and be ignored. A
//     quarter is of the order of the stiffness uncertainty engineers already
//     accept: halving I_g (cracked-section modifiers 0.70 or 0.35, ACI 318-14
//     Table 6.6.3.1.1(a)) lowers a cantilever's rigidity by 11 % at h/L = 0.25
//     and by 40 % at h/L = 1 (DESIGN §3 formulas). Beyond it the layout, not
//     the stiffness assumption, drives the error, and the wall's share of the
//     storey shear, proportional to its rigidity (DESIGN §10), deserves a
//     second look;
//   - it separates the measured cases as an engineer would: a solid wall (0 %)
//     and a wall with two small windows (23 %) pass, a door under a deep
//     spandrel (44 %) and a row of windows (112 %) warn.
const WarnDifference = 0.25

// Result is the finite-element answer for one wall layout. Deflection and
// Rigidity are relative (E = 1, t = 1), like the classic method's.
type Result struct {
	Deflection float64         // relative top deflection, 1/(E t): multiply by V/(E t)
	Rigidity   float64         // relative rigidity 1/Deflection
	Mesh       geometry.Length // maximum element size used
	Elements   int
	DOFs       int    // free degrees of freedom (equations solved)
	Element    string // "q4" or "qm6"
	Piers      []PierShare
	Difference float64  // (classic rigidity − FE rigidity) / FE rigidity; 0 without a classic result
	Warnings   []string // where the model's answer is not comparable with the classic one

	// Known when the material gives E and the wall a thickness, as in
	// pier.Result: the model's rigidity in N/m and, under the wall's
	// shear, its top deflection and drift check.
	RigidityAbs   float64
	HasLoad       bool
	DeflectionAbs geometry.Length
	Drift         pier.DriftCheck
}

// PierShare is the fraction of the wall shear that crosses a leaf pier's
// mid-height section in the model.
type PierShare struct {
	Name  string
	Share float64
}

// Solve builds and solves the plane-stress model of the active layout of w.
// classic gives the leaf piers whose shares are measured (nil: no shares,
// no difference).
func Solve(w *geometry.Wall, classic *pier.Result, opt Options) (*Result, error) {
	kind, size, d, leaves, err := prepare(w, classic, opt)
	if err != nil {
		return nil, err
	}
	sol, err := solveWall(w, leaves, size, kind, d)
	if err != nil {
		return nil, err
	}
	r := &Result{
		Deflection: sol.deflection,
		Rigidity:   1 / sol.deflection,
		Mesh:       geometry.Length(size),
		Elements:   len(sol.md.m.elems),
		DOFs:       sol.md.neq,
		Element:    kind,
	}
	for k, p := range leaves {
		r.Piers = append(r.Piers, PierShare{Name: p.Name, Share: sol.shares[k]})
	}
	if classic != nil && classic.Rigidity > 0 && !math.IsInf(classic.Rigidity, 0) {
		r.Difference = (classic.Rigidity - r.Rigidity) / r.Rigidity
	}
	r.Warnings = topWarnings(w)
	if err := r.absolute(w); err != nil {
		return nil, err
	}
	return r, nil
}

// SolveContext is Solve that gives up when ctx is done, returning ctx.Err().
// (For now it checks ctx before and after the solve; the assembly and the
// factorisation are to check it as they go.)
func SolveContext(ctx context.Context, w *geometry.Wall, classic *pier.Result, opt Options) (*Result, error) {
	if err := ctx.Err(); err != nil {
		return nil, err
	}
	r, err := Solve(w, classic, opt)
	if cerr := ctx.Err(); cerr != nil {
		return nil, cerr
	}
	return r, err
}

// absolute fills the rigidity, deflection and drift in real units when the
// material and thickness are known: the only real numbers an engineer has
// for a layout the classic method cannot solve.
func (r *Result) absolute(w *geometry.Wall) error {
	mod, err := pier.MaterialModuliFor(w.Material, w.Units)
	E, t := float64(mod.E), float64(w.Thickness)
	if err != nil || !(E > 0) || !(t > 0) {
		return nil // relative values only, as for the classic method
	}
	r.RigidityAbs = r.Rigidity * E * t
	V := float64(w.Load.Shear)
	if !(V > 0) {
		return nil
	}
	r.HasLoad = true
	r.DeflectionAbs = geometry.Length(V / (E * t) * r.Deflection)
	r.Drift, err = pier.CheckDrift(w, r.DeflectionAbs)
	return err
}

// topWarnings warns when openings reach the top of the wall. The model
// spreads the shear over the top edge by tributary length and nothing ties
// the pier tops together, so each pier there takes the load on its own
// top: its share follows the load, not its stiffness, while the classic
// method (and a real collector or bond beam) makes the tops move together.
func topWarnings(w *geometry.Wall) []string {
	top := float64(w.Height)
	var names []string
	for _, o := range w.Openings() {
		if r := o.Rect(); r.Y1 >= top-1e-9*top {
			names = append(names, o.Name)
		}
	}
	if len(names) == 0 {
		return nil
	}
	return []string{fmt.Sprintf("openings %s reach the top of the wall: the model has no collector tying the pier tops together, so each pier takes the shear on its own top length; its pier shares and rigidity are not comparable with the classic method's for this wall", strings.Join(names, ", "))}
}

// prepare checks the arguments of Solve and returns the element, the element
// size in metres, the material and the leaf piers to measure.
func prepare(w *geometry.Wall, classic *pier.Result, opt Options) (kind string, size float64, d elasticity, leaves []pier.Pier, err error) {
	if w == nil {
		return "", 0, d, nil, errors.New("fe: no wall")
	}
	length, height := float64(w.Length), float64(w.Height)
	if !(length > 0) || !(height > 0) || math.IsInf(length, 0) || math.IsInf(height, 0) {
		return "", 0, d, nil, fmt.Errorf("the wall needs a positive length and height (got %g m × %g m)", length, height)
	}
	kind = opt.Element
	if kind == "" {
		kind = w.Check.Element
	}
	if kind == "" {
		kind = ElementQM6
	}
	if kind != ElementQ4 && kind != ElementQM6 {
		return "", 0, d, nil, fmt.Errorf("unknown finite-element type %q (want %q or %q)", kind, ElementQ4, ElementQM6)
	}
	size = float64(opt.Mesh)
	if size == 0 {
		size = float64(w.Check.Mesh)
	}
	if size < 0 || math.IsNaN(size) || math.IsInf(size, 0) {
		return "", 0, d, nil, fmt.Errorf("the mesh size must be positive (got %g m)", size)
	}
	if size == 0 {
		size = float64(DefaultMesh)
		if n := (length / size) * (height / size); n > maxDefaultElements {
			size *= math.Sqrt(n / maxDefaultElements)
		}
	}
	d, err = elasticityOf(w)
	if err != nil {
		return "", 0, d, nil, err
	}
	if classic != nil {
		for _, p := range classic.Piers {
			if p.Leaf {
				leaves = append(leaves, p)
			}
		}
	}

	return kind, size, d, leaves, nil
}

// solution is a solved model with the quantities Solve reports.
type solution struct {
	md         *model
	u          []float64
	load       []float64
	deflection float64
	shares     []float64
}

// openingRects returns the active layout's openings as rectangles.
func openingRects(w *geometry.Wall) []geometry.Rect {
	var rs []geometry.Rect
	for _, o := range w.Openings() {
		rs = append(rs, o.Rect())
	}
	return rs
}

// buildModel meshes the wall with lines through the leaf piers' edges and
// mid-heights and applies the supports of DESIGN §5.
func buildModel(w *geometry.Wall, leaves []pier.Pier, size float64, kind string, d elasticity) (*model, error) {
	length, height := float64(w.Length), float64(w.Height)
	var xk, yk []float64
	for _, p := range leaves {
		xk = append(xk, p.Rect.X0, p.Rect.X1)
		yk = append(yk, p.Rect.Y0, p.Rect.Y1, (p.Rect.Y0+p.Rect.Y1)/2)
	}
	// A lower bound of the band matrix from the uniform grid (2 equations
	// per node, a band of 2 nodes more than the shorter side), checked
	// before anything is built.
	nx, ny := math.Ceil(length/size), math.Ceil(height/size)
	if est := 2 * (nx + 1) * (ny + 1) * (2*min(nx, ny) + 3); est > maxBand {
		return nil, tooFine(w, size)
	}
	m := newMesh(length, height, openingRects(w), xk, yk, size)
	if len(m.elems) == 0 {
		return nil, errors.New("the openings leave no solid wall to model")
	}
	md := newModel(m, kind, d)
	top := m.ny
	fixedTop := w.Support == geometry.Fixed
	md.fix(func(n, c int) bool {
		j := m.nodeAt[n][1]
		return j == 0 || (fixedTop && j == top && c == 1)
	})
	if kd := md.bandwidth(); float64(md.neq)*float64(kd+1) > maxBand {
		return nil, tooFine(w, size)
	}
	return md, nil
}

func tooFine(w *geometry.Wall, size float64) error {
	el := fmt.Sprintf("%.3g in", size/float64(geometry.Inch))
	if w.Units == geometry.SI {
		el = fmt.Sprintf("%.3g mm", size/float64(geometry.Millimetre))
	}
	return fmt.Errorf("a mesh of %s is too fine for this %s × %s wall: the model would need more than %d MB; use a larger element size",
		el, geometry.FormatLength(w.Length, w.Units), geometry.FormatLength(w.Height, w.Units), maxBand*8/1_000_000)
}

// topLoad spreads V = 1 over the top nodes in proportion to each node's
// tributary length of solid top edge.
func topLoad(m *mesh) ([]float64, []int, error) {
	f := make([]float64, 2*len(m.nodeAt))
	j := m.ny - 1
	total := 0.0
	for i := 0; i < m.nx; i++ {
		if m.solid[j*m.nx+i] {
			total += m.xs[i+1] - m.xs[i]
		}
	}
	if !(total > 0) {
		return nil, nil, errors.New("the top edge of the wall is all opening: the shear has nowhere to go")
	}
	var tops []int
	for i := 0; i < m.nx; i++ {
		if !m.solid[j*m.nx+i] {
			continue
		}
		half := (m.xs[i+1] - m.xs[i]) / 2 / total
		f[2*m.nodeAtGrid(i, m.ny)] += half
		f[2*m.nodeAtGrid(i+1, m.ny)] += half
	}
	for i := 0; i <= m.nx; i++ {
		if n := m.nodeAtGrid(i, m.ny); n >= 0 {
			tops = append(tops, n)
		}
	}
	return f, tops, nil
}

func solveWall(w *geometry.Wall, leaves []pier.Pier, size float64, kind string, d elasticity) (*solution, error) {
	md, err := buildModel(w, leaves, size, kind, d)
	if err != nil {
		return nil, err
	}
	f, tops, err := topLoad(md.m)
	if err != nil {
		return nil, err
	}
	u, err := md.solve(f, nil)
	if err != nil {
		return nil, err
	}
	s := &solution{md: md, u: u, load: f}
	for _, n := range tops {
		s.deflection += u[2*n]
	}
	s.deflection /= float64(len(tops))
	if !(s.deflection > 0) || math.IsInf(s.deflection, 0) {
		return nil, errSingular
	}
	for _, p := range leaves {
		s.shares = append(s.shares, sectionShear(md, u, p.Rect))
	}
	return s, nil
}

// sectionShear returns the horizontal shear carried across the mid-height
// of rectangle r: the sum of the x-forces that the elements just below the
// section receive at their top nodes (K_e u_e), for the elements between
// r.X0 and r.X1. With V = 1 it is the pier's share.
func sectionShear(md *model, u []float64, r geometry.Rect) float64 {
	m := md.m
	jm := lineIndex(m.ys, (r.Y0+r.Y1)/2)
	i0, i1 := lineIndex(m.xs, r.X0), lineIndex(m.xs, r.X1)
	if jm < 1 || i0 < 0 || i1 < 0 {
		panic("fe: pier section is not on a mesh line")
	}
	v := 0.0
	for e, c := range m.cellOf {
		if c[1] != jm-1 || c[0] < i0 || c[0] >= i1 {
			continue
		}
		fe := md.elementForces(e, u)
		v += fe[4] + fe[6] // x-forces at the top-right and top-left nodes
	}
	return v
}

// elasticityOf returns D for the wall's material in relative units (E = 1):
// ν = E/(2 E_v) − 1 (0.25 when the moduli are not known), with the user's
// stiffness modifiers on the vertical modulus (kf) and the shear modulus (kv).
func elasticityOf(w *geometry.Wall) (elasticity, error) {
	nu := 0.25
	if mod, err := pier.MaterialModuliFor(w.Material, w.Units); err == nil && mod.E > 0 && mod.Ev > 0 {
		nu = float64(mod.E)/(2*float64(mod.Ev)) - 1
	}
	if !(nu > -1 && nu < 0.5) {
		return elasticity{}, fmt.Errorf("E_v/E = %.3g gives Poisson's ratio %.3g; a plane-stress model needs E_v/E above 1/3", 1/(2*(nu+1)), nu)
	}
	kf, kv := w.Stiffness.Flexure, w.Stiffness.Shear
	if kf == 0 {
		kf = 1
	}
	if kv == 0 {
		kv = 1
	}
	if !(kf > 0) || !(kv > 0) || kf*nu*nu >= 1 || math.IsInf(kf, 0) || math.IsInf(kv, 0) {
		return elasticity{}, fmt.Errorf("stiffness modifiers flexure = %g, shear = %g are out of range", kf, kv)
	}
	if kf == 1 && kv == 1 {
		return isotropic(1, nu), nil
	}
	return orthotropic(1, nu, kf, kv), nil
}

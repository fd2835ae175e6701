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
// less than 1 % (TestConvergence, TestDeflectionMeshIndependent), and on a
// 30 ft × 12 ft wall with a door and two windows (2,294 elements, 4,832
// equations) the classic solve and this one with every pier's forces under
// three load cases take 12–15 ms (BenchmarkKeyToResult, on this project's
// 2-core machine at a load average of 8; target 20 ms).
const DefaultMesh = 6 * geometry.Inch

// maxDefaultElements bounds the default mesh of a very large wall: the
// element size grows until the mesh has at most this many elements.
const maxDefaultElements = 8000

// maxBand bounds the band matrix (number of stored values, 8 bytes each:
// 200 MB) so that a user's very fine mesh, or a layout with thousands of
// opening edges, is refused instead of exhausting memory or taking many
// seconds (an editor may run one solve in the background at any time). It
// is checked from the mesh lines alone, before the mesh is built
// (checkSize). The 160 × 80 mesh of a 20 ft × 10 ft wall needs 4.3 million,
// the default mesh of a 30 ft × 12 ft wall with three openings 0.5 million.
const maxBand = 25_000_000

// WarnDifference is the relative difference (classic − FE) / FE in rigidity
// beyond which the report warns that the hand method is far from the
// continuum answer for this layout. 0.25, because:
//   - the comparison's own noise is a few percent: the FE answer at the
//     default mesh is within about 2 % of its converged value on the example
//     walls, and for a solid wall the plane-stress model and the classic
//     (Timoshenko-beam) formula agree within 2.5 % for h/L 0.25 to 3
//     (TestSolidWallTimoshenko), so a difference there says nothing;
//   - the hand method overestimates nearly every wall with openings (docs/method.md
//     §4: often by tens of percent; measured 23–112 % on the example walls),
//     so a threshold near zero would warn on every wall and be ignored. A
//     quarter is of the order of the stiffness uncertainty engineers already
//     accept: halving I_g (cracked-section modifiers 0.70 or 0.35, ACI 318-14
//     Table 6.6.3.1.1(a)) lowers a cantilever's rigidity by 11 % at h/L = 0.25
//     and by 40 % at h/L = 1 (docs/method.md §2 formulas). Beyond it the layout, not
//     the stiffness assumption, drives the error, and the wall's share of the
//     storey shear, proportional to its rigidity (docs/method.md §9), deserves a
//     second look;
//   - it separates the measured cases as an engineer would: a solid wall (0 %)
//     and a wall with two small windows (23 %) pass, a door under a deep
//     spandrel (44 %) and a row of windows (112 %) warn.
const WarnDifference = 0.25

// Result is the finite-element answer for one wall layout. Deflection and
// Rigidity are relative (E = 1, t = 1), like the classic method's.
type Result struct {
	// Deflection is the wall's relative deflection under V = 1, 1/(E t):
	// the work-conjugate (load-weighted) average Σ f_i u_i / V of the
	// loaded top nodes, or with the top collector the collector's
	// displacement (docs/method.md §4). Multiply by V/(E t).
	Deflection float64
	Rigidity   float64         // relative rigidity 1/Deflection
	Mesh       geometry.Length // maximum element size used
	Elements   int
	DOFs       int    // unknowns solved (the band's equations and the tied groups)
	Element    string // "q4" or "qm6"
	Piers      []PierShare
	Difference float64  // (classic rigidity − FE rigidity) / FE rigidity; 0 without a classic result
	Warnings   []string // where the model's answer is not comparable with the classic one, and merged edges

	// Notes say what the model assumed for this wall beyond docs/method.md
	// §4's defaults: the top collector (first, when Collector), the self
	// weight and its source.
	Notes []string
	// Collector is true when the top nodes' horizontal displacements are
	// tied together (openings reach the top, and the wall's analysis
	// settings do not turn the tie off).
	Collector bool

	// Forces lists every pier of the classic result passed to Solve,
	// parents and leaves, in its order, with its section forces under each
	// load case (nil without a classic result).
	Forces []PierForces
	// SelfWeight is the wall weight per face area used in the dead-load
	// case and its source (pier.SelfWeightOf).
	SelfWeight pier.SelfWeight

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

// PierForces are the model's forces in one pier of the classic
// decomposition (leaf or parent) at its bottom, middle and top sections,
// by load case, in the sign conventions of pier.Forces (docs/method.md §1,
// §6). Each is the resultant of the nodal forces that the pier's own
// elements receive along the section line (docs/method.md §4): exact for
// equilibrium.
type PierForces struct {
	Name  string
	Leaf  bool
	Rect  geometry.Rect
	Share float64 // fraction of the wall shear crossing the mid-height section
	// Loads: Lateral under the wall's shear w.Load.Shear (zero without
	// one), Dead under the dead line load and the self weight, Live under
	// the live line load.
	Loads pier.PierLoads
}

// Pier returns the forces of the pier called name, and false when the
// result has none.
func (r *Result) Pier(name string) (PierForces, bool) {
	for _, p := range r.Forces {
		if p.Name == name {
			return p, true
		}
	}
	return PierForces{}, false
}

// Solve builds and solves the plane-stress model of the active layout of w.
// classic gives the piers whose shares and forces are measured (nil: no
// shares, no forces, no difference). It is SolveContext without a
// deadline.
func Solve(w *geometry.Wall, classic *pier.Result, opt Options) (*Result, error) {
	return SolveContext(context.Background(), w, classic, opt)
}

// SolveContext is Solve that gives up when ctx is done, returning
// ctx.Err(): the assembly and the factorisation check ctx as they go
// (every 1,024 elements and every 256 equations, about a millisecond of
// work each), so a superseded solve stops promptly and frees its memory.
func SolveContext(ctx context.Context, w *geometry.Wall, classic *pier.Result, opt Options) (*Result, error) {
	if err := ctx.Err(); err != nil {
		return nil, err
	}
	w, merged := pier.SnapEdges(w)
	set, err := prepare(w, classic, opt)
	if err != nil {
		return nil, err
	}
	sol, err := solveWall(ctx, w, set)
	if err != nil {
		return nil, err
	}
	r := &Result{
		Deflection: sol.deflection,
		Rigidity:   1 / sol.deflection,
		Mesh:       geometry.Length(set.size),
		Elements:   len(sol.md.m.elems),
		DOFs:       sol.md.neq + sol.md.ntie,
		Element:    set.kind,
		Collector:  set.collector,
		Forces:     sol.forces,
		SelfWeight: set.self,
	}
	for _, p := range sol.forces {
		if p.Leaf {
			r.Piers = append(r.Piers, PierShare{Name: p.Name, Share: p.Share})
		}
	}
	if classic != nil && classic.Rigidity > 0 && !math.IsInf(classic.Rigidity, 0) {
		r.Difference = (classic.Rigidity - r.Rigidity) / r.Rigidity
	}
	r.Warnings = append(pier.Texts(merged), topWarnings(w, set.collector)...)
	r.Notes = set.notes
	if err := r.absolute(w); err != nil {
		return nil, err
	}
	return r, nil
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

// topOpenings names the openings that reach the top of the wall.
func topOpenings(w *geometry.Wall) []string {
	top := float64(w.Height)
	var names []string
	for _, o := range w.Openings() {
		if r := o.Rect(); r.Y1 >= top-1e-9*top {
			names = append(names, o.Name)
		}
	}
	return names
}

// topWarnings warns when openings reach the top of the wall and the top
// collector is off: the model spreads the shear over the top edge by
// tributary length and nothing ties the pier tops together, so each pier
// there takes the load on its own top: its share follows the load, not its
// stiffness, while the classic method (and a real collector or bond beam)
// makes the tops move together.
func topWarnings(w *geometry.Wall, collector bool) []string {
	names := topOpenings(w)
	if len(names) == 0 || collector {
		return nil
	}
	return []string{fmt.Sprintf("openings %s reach the top of the wall and the top tie is off: the model has no collector tying the pier tops together, so each pier takes the shear on its own top length; its pier shares and rigidity are not comparable with the classic method's for this wall", strings.Join(names, ", "))}
}

// setup is what Solve works from: the checked options, the material, the
// piers to measure and the loads.
type setup struct {
	kind      string
	size      float64 // element size, metres
	d         elasticity
	piers     []pier.Pier // every pier of the classic result
	collector bool        // tie the top nodes' x
	fixedTop  bool        // tie the top nodes' y (fixed-fixed wall)
	shear     float64     // V, N (0: no lateral load)
	dead      float64     // dead line load, N/m
	live      float64     // live line load, N/m
	self      pier.SelfWeight
	notes     []string
	uniform   bool // no grading toward opening edges (tests compare it)
}

// prepare checks the arguments of Solve and returns what it works from.
func prepare(w *geometry.Wall, classic *pier.Result, opt Options) (setup, error) {
	var s setup
	if w == nil {
		return s, errors.New("fe: no wall")
	}
	length, height := float64(w.Length), float64(w.Height)
	if !(length > 0) || !(height > 0) || math.IsInf(length, 0) || math.IsInf(height, 0) {
		return s, fmt.Errorf("the wall needs a positive length and height (got %g m × %g m)", length, height)
	}
	s.kind = opt.Element
	if s.kind == "" {
		s.kind = w.Check.Element
	}
	if s.kind == "" {
		s.kind = ElementQM6
	}
	if s.kind != ElementQ4 && s.kind != ElementQM6 {
		return s, fmt.Errorf("unknown finite-element type %q (want %q or %q)", s.kind, ElementQ4, ElementQM6)
	}
	s.size = float64(opt.Mesh)
	if s.size == 0 {
		s.size = float64(w.Check.Mesh)
	}
	if s.size < 0 || math.IsNaN(s.size) || math.IsInf(s.size, 0) {
		return s, fmt.Errorf("the mesh size must be positive (got %g m)", s.size)
	}
	if s.size == 0 {
		s.size = float64(DefaultMesh)
		if n := (length / s.size) * (height / s.size); n > maxDefaultElements {
			s.size *= math.Sqrt(n / maxDefaultElements)
		}
	}
	var err error
	if s.d, err = elasticityOf(w); err != nil {
		return s, err
	}
	if classic != nil {
		s.piers = classic.Piers
	}
	s.fixedTop = w.Support == geometry.Fixed
	if names := topOpenings(w); len(names) > 0 && !w.Analysis.NoTopTie {
		s.collector = true
		s.notes = append(s.notes, fmt.Sprintf("openings %s reach the top of the wall: the model ties the horizontal displacement of the top nodes together, as a bond beam or collector does, and the deflection is the collector's (docs/method.md §4)", strings.Join(names, ", ")))
	}
	finite := func(what string, v float64) error {
		if math.IsNaN(v) || math.IsInf(v, 0) || v < 0 {
			return fmt.Errorf("the %s must be a non-negative number (got %g)", what, v)
		}
		return nil
	}
	s.shear = float64(w.Load.Shear)
	s.dead, s.live = float64(w.Gravity.Dead), float64(w.Gravity.Live)
	if err := errors.Join(finite("wall shear", s.shear), finite("dead line load", s.dead), finite("live line load", s.live)); err != nil {
		return s, err
	}
	if s.self, err = pier.SelfWeightOf(w); err != nil {
		return s, err
	}
	if s.self.Weight > 0 {
		s.notes = append(s.notes, fmt.Sprintf("self weight in the dead-load case: %s", s.self.Source))
	}
	return s, nil
}

// openingRects returns the active layout's openings as rectangles.
func openingRects(w *geometry.Wall) []geometry.Rect {
	var rs []geometry.Rect
	for _, o := range w.Openings() {
		rs = append(rs, o.Rect())
	}
	return rs
}

// buildModel meshes the wall with lines through every pier's edges and
// mid-height and applies the supports and ties of docs/method.md §4. It
// judges the model's size from the mesh lines before building anything
// large.
func buildModel(w *geometry.Wall, set setup) (*model, error) {
	length, height := float64(w.Length), float64(w.Height)
	var xk, yk []float64
	for _, p := range set.piers {
		xk = append(xk, p.Rect.X0, p.Rect.X1)
		yk = append(yk, p.Rect.Y0, p.Rect.Y1, (p.Rect.Y0+p.Rect.Y1)/2)
	}
	ops := openingRects(w)
	if set.uniform {
		for _, o := range ops {
			xk, yk = append(xk, o.X0, o.X1), append(yk, o.Y0, o.Y1)
		}
	}
	xs, ys := meshLines(length, height, ops, xk, yk, set.size, !set.uniform)
	if err := checkSize(w, set.size, len(xs)-1, len(ys)-1); err != nil {
		return nil, err
	}
	m := meshOf(xs, ys, ops)
	if len(m.elems) == 0 {
		return nil, errors.New("the openings leave no solid wall to model")
	}
	if !m.connected() {
		return nil, errSingular
	}
	md := newModel(m, set.kind, set.d)
	top := m.ny
	md.constrain(func(n, c int) bool {
		return m.nodeAt[n][1] == 0
	}, func(n, c int) int {
		if m.nodeAt[n][1] != top {
			return -1
		}
		switch {
		case c == 0 && set.collector:
			return 0
		case c == 1 && set.fixedTop && set.collector:
			return 1
		case c == 1 && set.fixedTop:
			return 0
		}
		return -1
	})
	if kd := md.bandwidth(); float64(md.neq)*float64(kd+1) > maxBand {
		return nil, tooFine(w, set.size)
	}
	return md, nil
}

// checkSize refuses a model whose band matrix would exceed maxBand, from
// the numbers of grid cells alone (nx × ny): 2 equations per grid point and
// a band of about 2 (min(nx, ny) + 2). When the uniform grid of the same
// element size would fit, the opening edges are the cause and the message
// says so; otherwise the mesh is too fine for the wall.
func checkSize(w *geometry.Wall, size float64, nx, ny int) error {
	est := func(nx, ny float64) float64 { return 2 * (nx + 1) * (ny + 1) * (2*min(nx, ny) + 4) }
	if est(float64(nx), float64(ny)) <= maxBand {
		return nil
	}
	ux, uy := math.Ceil(float64(w.Length)/size), math.Ceil(float64(w.Height)/size)
	if est(ux, uy) <= maxBand {
		return fmt.Errorf("the %d openings have too many edges for the finite-element model: their edge lines make a grid of %d × %d elements, which would need about %.0f MB (the limit is %d MB); model fewer openings", len(w.Openings()), nx, ny, est(float64(nx), float64(ny))*8/1e6, maxBand*8/1_000_000)
	}
	return tooFine(w, size)
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
func topLoad(m *mesh) ([]float64, error) {
	f := make([]float64, 2*len(m.nodeAt))
	j := m.ny - 1
	total := 0.0
	for i := 0; i < m.nx; i++ {
		if m.solid[j*m.nx+i] {
			total += m.xs[i+1] - m.xs[i]
		}
	}
	if !(total > 0) {
		return nil, errors.New("the top edge of the wall is all opening: the shear has nowhere to go")
	}
	for i := 0; i < m.nx; i++ {
		if !m.solid[j*m.nx+i] {
			continue
		}
		half := (m.xs[i+1] - m.xs[i]) / 2 / total
		f[2*m.nodeAtGrid(i, m.ny)] += half
		f[2*m.nodeAtGrid(i+1, m.ny)] += half
	}
	return f, nil
}

// lineLoad is a downward line load of 1 N/m along the whole top of the
// wall. Over solid top edge each node takes its tributary length; the load
// over an opening that reaches the top (carried there by a lintel or the
// collector) goes half to the solid edge on each side of it, all of it to
// the one side when the opening reaches the wall's end: the total is the
// wall's length.
func lineLoad(m *mesh) []float64 {
	f := make([]float64, 2*len(m.nodeAt))
	j := m.ny - 1
	for i := 0; i < m.nx; {
		if m.solid[j*m.nx+i] {
			half := (m.xs[i+1] - m.xs[i]) / 2
			f[2*m.nodeAtGrid(i, m.ny)+1] -= half
			f[2*m.nodeAtGrid(i+1, m.ny)+1] -= half
			i++
			continue
		}
		k := i
		for k < m.nx && !m.solid[j*m.nx+k] {
			k++
		}
		l := m.xs[k] - m.xs[i]
		left, right := m.nodeAtGrid(i, m.ny), m.nodeAtGrid(k, m.ny)
		switch {
		case left >= 0 && right >= 0:
			f[2*left+1] -= l / 2
			f[2*right+1] -= l / 2
		case left >= 0:
			f[2*left+1] -= l
		case right >= 0:
			f[2*right+1] -= l
		}
		i = k
	}
	return f
}

// bodyLoad is a downward body force of 1 N/m² of face on every element,
// a quarter of the element's area to each of its nodes (the consistent
// load of a bilinear element on a rectangle; qm6's internal modes take no
// load, as usual for incompatible-mode elements).
func bodyLoad(m *mesh) []float64 {
	f := make([]float64, 2*len(m.nodeAt))
	for e, c := range m.cellOf {
		q := (m.xs[c[0]+1] - m.xs[c[0]]) * (m.ys[c[1]+1] - m.ys[c[1]]) / 4
		for _, n := range m.elems[e] {
			f[2*n+1] -= q
		}
	}
	return f
}

// loadCase is one solved unit load case: the displacements and the body
// force (N/m² of face, downward) its elements carry themselves.
type loadCase struct {
	u    []float64
	body float64
}

// solution is a solved model with the quantities Solve reports.
type solution struct {
	md         *model
	lateral    loadCase  // V = 1 toward +x
	line, self *loadCase // 1 N/m along the top, 1 N/m² of face; nil when not needed
	load       []float64 // the lateral nodal loads
	deflection float64
	forces     []PierForces
}

func solveWall(ctx context.Context, w *geometry.Wall, set setup) (*solution, error) {
	md, err := buildModel(w, set)
	if err != nil {
		return nil, err
	}
	f, err := topLoad(md.m)
	if err != nil {
		return nil, err
	}
	sys, err := md.factor(ctx)
	if err != nil {
		return nil, err
	}
	defer sys.close()
	u, err := sys.solve(f, nil)
	if err != nil {
		return nil, err
	}
	s := &solution{md: md, lateral: loadCase{u: u}, load: f}
	// Work-conjugate deflection: Σ f_i u_i / V with V = 1.
	for dof, v := range f {
		s.deflection += v * u[dof]
	}
	if !(s.deflection > 0) || math.IsInf(s.deflection, 0) {
		return nil, errSingular
	}
	if len(set.piers) > 0 && (set.dead > 0 || set.live > 0) {
		u, err := sys.solve(lineLoad(md.m), nil)
		if err != nil {
			return nil, err
		}
		s.line = &loadCase{u: u}
	}
	if len(set.piers) > 0 && set.self.Weight > 0 {
		u, err := sys.solve(bodyLoad(md.m), nil)
		if err != nil {
			return nil, err
		}
		s.self = &loadCase{u: u, body: 1}
	}
	for _, p := range set.piers {
		s.forces = append(s.forces, s.pierForces(p, set))
	}
	return s, nil
}

// pierForces returns the forces of pier p under each load case.
func (s *solution) pierForces(p pier.Pier, set setup) PierForces {
	r := p.Rect
	at := func(c *loadCase) [3]sectionForce {
		if c == nil {
			return [3]sectionForce{}
		}
		return [3]sectionForce{
			s.md.section(c.u, c.body, r.Y0, r.X0, r.X1, false),
			s.md.section(c.u, c.body, (r.Y0+r.Y1)/2, r.X0, r.X1, true),
			s.md.section(c.u, c.body, r.Y1, r.X0, r.X1, true),
		}
	}
	lat, line, self := at(&s.lateral), at(s.line), at(s.self)
	sections := func(parts ...scaled) pier.Sections {
		var out [3]pier.Forces
		for k := range out {
			var v, n, m float64
			for _, p := range parts {
				v += p.by * p.f[k].v
				n += p.by * p.f[k].n
				m += p.by * p.f[k].m
			}
			out[k] = pier.Forces{Shear: geometry.Force(v), Axial: geometry.Force(n), Moment: m}
		}
		return pier.Sections{Bottom: out[0], Middle: out[1], Top: out[2]}
	}
	return PierForces{
		Name: p.Name, Leaf: p.Leaf, Rect: r,
		Share: lat[1].v,
		Loads: pier.PierLoads{
			Lateral: sections(scaled{set.shear, lat}),
			Dead:    sections(scaled{set.dead, line}, scaled{float64(set.self.Weight), self}),
			Live:    sections(scaled{set.live, line}),
		},
	}
}

// scaled is a unit case's section forces times its load.
type scaled struct {
	by float64
	f  [3]sectionForce
}

// sectionForce is the resultant at a horizontal section of the forces the
// part above exerts on the part below: shear v along +x, axial n
// (compression positive), moment m about the centroid of the section's
// solid length (positive when it compresses the right end), for the unit
// load of its case.
type sectionForce struct{ v, n, m float64 }

// section integrates the nodal forces along the horizontal mesh line at y
// between x0 and x1: the forces K_e u_e − f_e that the elements on one side
// of the line (below when below, else above) receive at their nodes on the
// line, where f_e is the element's own body load (body per unit face area,
// downward). By each element's equilibrium and the nodes' equilibrium this
// is exactly the force transmitted across the line (docs/method.md §4).
func (md *model) section(u []float64, body, y, x0, x1 float64, below bool) sectionForce {
	m := md.m
	j := lineIndex(m.ys, y)
	i0, i1 := lineIndex(m.xs, x0), lineIndex(m.xs, x1)
	row := j
	if below {
		row = j - 1
	}
	if j < 0 || i0 < 0 || i1 < 0 || row < 0 || row >= m.ny {
		panic("fe: section is not on a mesh line inside the wall")
	}
	// Local nodes on the line: top (3: left, 2: right) of an element below,
	// bottom (0: left, 1: right) of one above; sign turns the forces on the
	// elements above into the forces the part above exerts on the part below.
	left, right, sign := 0, 1, -1.0
	if below {
		left, right, sign = 3, 2, 1
	}
	var fx, fy, fyx, width, wx float64
	for i := i0; i < i1; i++ {
		e := m.elemAt[row*m.nx+i]
		if e < 0 {
			continue
		}
		f := md.elementForces(e, u)
		xa, xb := m.xs[i], m.xs[i+1]
		q := body * (xb - xa) * (m.ys[row+1] - m.ys[row]) / 4 // the element's load on each node
		la, lb := sign*f[2*left], sign*f[2*right]
		ya, yb := sign*(f[2*left+1]+q), sign*(f[2*right+1]+q)
		fx += la + lb
		fy += ya + yb
		fyx += ya*xa + yb*xb
		width += xb - xa
		wx += (xb - xa) * (xa + xb) / 2
	}
	xbar := (x0 + x1) / 2
	if width > 0 {
		xbar = wx / width
	}
	n := -fy
	return sectionForce{v: fx, n: n, m: -fyx - n*xbar}
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

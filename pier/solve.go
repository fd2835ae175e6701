package pier

import (
	"errors"
	"fmt"
	"math"
	"slices"
	"strconv"
	"strings"

	"pierwise/geometry"
)

// errRange reports sizes so disproportionate that a deflection overflows.
var errRange = errors.New("pier: the wall's proportions are beyond the range the method can compute")

// tolerance is the relative tolerance (of the wall's larger dimension) for
// "touches", "reaches the top" and "spans the band": coordinates that come
// from sums of typed lengths differ by rounding only.
const tolerance = 1e-9

// opening is an opening clipped to the region being solved.
type opening struct {
	r    geometry.Rect
	name string
}

// solver holds the working of one Solve.
type solver struct {
	p      Params
	eps    float64 // absolute tolerance, metres
	thick  float64 // wall thickness, metres (0 when unknown)
	height float64 // wall height, metres
	shear  float64 // the wall's shear, N (loads)
	units  geometry.System
	ops    []opening // every opening of the active layout
	res    *Result
}

// node is a region of the decomposition (docs/method.md §2): the wall, or
// a pier with the openings inside it. Solve builds the whole tree first
// (build), then computes deflections bottom-up (compute), then writes the
// result in name order (flatten) and the forces top-down (forces.go).
type node struct {
	name  string // "wall" or the pier's name
	wall  bool   // the root: the whole wall
	pier  int    // index in Result.Piers (flatten); -1 for the wall
	rect  geometry.Rect
	sup   geometry.Support
	ops   []opening // the openings inside rect, clipped to it
	above float64   // solid over rect outside it, up to the next band of the enclosing regions
	bands []band
	rows  []row // one per band: its piers

	// cutBy names the opening that leaves the region no load path
	// (found while building); noPath is set when the region has a load
	// path around each opening but every pier of one of its bands has
	// none. Either way the region has no rigidity and no share.
	cutBy  string
	noPath bool

	d Parts // the region's relative deflection (compute)
}

// row holds the piers of one band of a region.
type row struct {
	rect    geometry.Rect // the band across the region
	sup     geometry.Support
	piers   []*node
	allCuts bool // no opening spans the band: each is a cut

	strip, piersD float64 // the strip removed and the piers restored (compute)
	sumK          float64 // Σ of the piers' rigidities (compute)
}

// dead reports whether a region carries nothing.
func (n *node) dead() bool { return n.cutBy != "" || n.noPath }

// build makes the region's subtree: its bands and their piers, named, each
// pier built in turn (docs/method.md §2.2, steps 2–3 without the arithmetic). A band with no
// pier is a *StaggeredError.
func (s *solver) build(n *node) error {
	if len(n.ops) == 0 {
		return nil // step 1
	}
	if !n.wall { // step 2 (the wall was checked by Solve)
		if op, cut := s.cutAcross(n.rect, n.ops); cut {
			n.cutBy = op
			return nil
		}
	}
	prefix := "P"
	if !n.wall {
		prefix = n.name + "."
	}
	count := 0
	n.bands = s.bands(n.ops)
	n.rows = make([]row, len(n.bands))
	for bi, b := range n.bands {
		bandSup := geometry.Fixed
		if n.sup == geometry.Cantilever && b.y1 >= n.rect.Y1-s.eps {
			bandSup = geometry.Cantilever
		}
		rw := &n.rows[bi]
		rw.rect = geometry.Rect{X0: n.rect.X0, Y0: b.y0, X1: n.rect.X1, Y1: b.y1}
		rw.sup = bandSup
		spans, allCuts := s.piersOf(n.rect, b, n.ops)
		if len(spans) == 0 {
			return &StaggeredError{Region: n.name, Y0: b.y0, Y1: b.y1, Openings: bandNames(b, n.ops), Units: s.units}
		}
		rw.allCuts = allCuts
		// The solid over this band's piers: up to the next band, or to the
		// region's top and on through what lies over the region.
		pierAbove := n.rect.Y1 + n.above - b.y1
		if bi+1 < len(n.bands) {
			pierAbove = n.bands[bi+1].y0 - b.y1
		}
		rw.piers = make([]*node, len(spans))
		for i, sp := range spans {
			count++
			c := &node{name: prefix + strconv.Itoa(count), pier: -1, rect: sp.rect, sup: bandSup, ops: sp.ops, above: pierAbove}
			if err := s.build(c); err != nil {
				return err
			}
			rw.piers[i] = c
		}
	}
	return nil
}

// compute returns the region's relative deflection (docs/method.md §2.2, steps 1, 3, 4),
// its piers' first. A region whose band has no pier with a load path is
// marked noPath.
func (s *solver) compute(n *node) (Parts, error) {
	solid := Element(n.rect.H(), n.rect.W(), n.sup, s.p)
	if len(n.ops) == 0 {
		n.d = solid
		return solid, nil
	}
	d := solid
	for bi := range n.rows {
		rw := &n.rows[bi]
		strip := Element(rw.rect.H(), n.rect.W(), rw.sup, s.p)
		d.Bending -= strip.Bending
		d.Shear -= strip.Shear
		rw.strip = strip.Total()
		var sumK float64
		for _, c := range rw.piers {
			if c.cutBy != "" {
				continue
			}
			pd, err := s.compute(c)
			if err != nil {
				return Parts{}, err
			}
			if c.noPath {
				continue
			}
			if !(pd.Total() > 0) || math.IsInf(pd.Total(), 0) {
				return Parts{}, errRange
			}
			sumK += 1 / pd.Total()
		}
		if !(sumK > 0) {
			n.noPath = true
			return Parts{}, nil
		}
		// The band's deflection 1/Σk is split into bending and shear by
		// strain energy: the band stores V²·d_band/2 = Σ V_i²·d_i/2 with
		// V_i = share_i·V and share_i = d_band/d_i, of which Σ V_i²·b_i/2 is
		// bending, so the bending fraction is Σ share_i²·b_i/d_band =
		// Σ share_i·(b_i/d_i).
		dBand := 1 / sumK
		var bendFrac float64
		for _, c := range rw.piers {
			if !c.dead() {
				bendFrac += (1 / c.d.Total() / sumK) * c.d.Bending / c.d.Total()
			}
		}
		d.Bending += dBand * bendFrac
		d.Shear += dBand * (1 - bendFrac)
		rw.piersD, rw.sumK = dBand, sumK
	}
	n.d = d
	return d, nil
}

// flatten writes the region's steps, piers and warnings in the order of
// the method's working: the solid, then for each band the strip, the
// band's piers (each followed by its own working) and the band restored.
// share is the region's fraction of the wall shear.
func (s *solver) flatten(n *node, share float64) {
	if n.cutBy != "" {
		s.warn(WarnCutPier, SeveritySerious, n.name, fmt.Sprintf("pier %s: opening %s leaves no load path through it; it is given no rigidity and no share", n.name, n.cutBy))
		return
	}
	if n.noPath {
		s.warn(WarnCutPier, SeveritySerious, n.name, fmt.Sprintf("pier %s: every pier of one of its bands is cut by its openings, which leaves no load path through it; it is given no rigidity and no share", n.name))
		return
	}
	if len(n.ops) == 0 {
		return
	}
	s.step(StepSolid, n.name, n.rect, n.sup, Element(n.rect.H(), n.rect.W(), n.sup, s.p).Total(), nil)
	parent := ""
	if !n.wall {
		parent = n.name
	}
	for bi := range n.rows {
		rw := &n.rows[bi]
		s.step(StepStrip, n.name, rw.rect, rw.sup, rw.strip, nil)
		s.spandrels(n.rect, n.bands, bi, n.name, n.ops, n.above)
		names := make([]string, len(rw.piers))
		for i, c := range rw.piers {
			p := Pier{Name: c.name, Parent: parent, Rect: c.rect, Support: rw.sup, Leaf: len(c.ops) == 0, Cut: c.dead()}
			if !p.Cut {
				p.Parts = c.d
				p.Rigidity = 1 / c.d.Total()
				p.BandShare = p.Rigidity / rw.sumK
				p.Share = p.BandShare * share
			}
			c.pier = len(s.res.Piers)
			s.res.Piers = append(s.res.Piers, p)
			names[i] = c.name
			s.flatten(c, p.Share)
		}
		s.step(StepPiers, n.name, rw.rect, rw.sup, rw.piersD, names)
		if rw.allCuts {
			s.res.Steps[len(s.res.Steps)-1].AllCuts = true
			s.warn(WarnStaggered, SeverityCaution, s.bandNames(n.bands[bi], n.ops), fmt.Sprintf("in %s no opening of %s spans the full height of their band: each is taken as a cut and the piers between them as the band's full height, a rough reading of staggered openings", where(n.name), strings.Join(bandNames(n.bands[bi], n.ops), ", ")))
		}
	}
}

func (s *solver) step(kind StepKind, region string, r geometry.Rect, sup geometry.Support, d float64, piers []string) {
	s.res.Steps = append(s.res.Steps, Step{Kind: kind, Region: region, Rect: r, Support: sup, Deflection: d, Piers: piers})
}

// Solve runs the classic method (docs/method.md §2) on the active layout of
// w. It returns a *CutError when the openings cut the wall (no load path
// from base to top), a *StaggeredError when a band has no pier, and a plain
// error for a wall it cannot solve (non-positive or non-finite sizes,
// openings outside the wall or overlapping, bad material, modifiers or
// loads). A Result never holds NaN or Inf.
func Solve(w *geometry.Wall) (*Result, error) {
	if w == nil {
		return nil, errors.New("pier: no wall")
	}
	w, merged := SnapEdges(w) // the same wall the finite-element model sees
	ops, err := checkWall(w)
	if err != nil {
		return nil, err
	}
	var mod Moduli
	if materialGiven(w.Material) {
		if mod, err = MaterialModuliFor(w.Material, w.Units); err != nil {
			return nil, err
		}
	}
	p := ParamsFor(w, mod)
	if err := p.validate(); err != nil {
		return nil, err
	}

	wall := w.Rect()
	s := &solver{
		p:      p,
		eps:    tolerance * math.Max(wall.W(), wall.H()),
		thick:  float64(w.Thickness),
		height: wall.H(),
		units:  w.Units,
		ops:    ops,
		res: &Result{
			Moduli: mod,
			// Typical layouts have about one pier per opening and a few
			// steps per band; larger ones grow the slices.
			Piers: make([]Pier, 0, len(ops)+len(ops)/2+2),
			Steps: make([]Step, 0, len(ops)/2+4),
		},
	}
	if name, cut := s.cutAcross(wall, ops); cut {
		return nil, &CutError{Region: "wall", Opening: name}
	}
	root := &node{name: "wall", wall: true, pier: -1, rect: wall, sup: w.Support, ops: ops}
	if err := s.build(root); err != nil {
		return nil, err
	}
	d, err := s.compute(root)
	if err != nil {
		return nil, err
	}
	if root.noPath {
		// cutAcross should have caught every wall without a load path;
		// this is the last guard against an infinite deflection.
		return nil, &CutError{Region: "wall", Opening: ops[0].name}
	}
	if !(d.Total() > 0) || math.IsInf(d.Total(), 0) {
		return nil, errRange
	}
	r := s.res
	r.Deflection = d.Total()
	r.Rigidity = 1 / r.Deflection
	r.Split = d
	s.flatten(root, 1)
	if len(ops) == 0 {
		// A solid wall is one pier, P1, that carries the whole shear.
		r.Piers = append(r.Piers, Pier{Name: "P1", Rect: wall, Support: w.Support, Leaf: true,
			Parts: d, Rigidity: r.Rigidity, Share: 1, BandShare: 1})
	}
	if err := s.loads(w, root); err != nil {
		return nil, err
	}
	s.assumptions(w, ops)
	s.driftNotes(w, root)
	r.Warnings = append(merged, r.Warnings...)
	if err := r.checkFinite(); err != nil {
		return nil, err
	}
	return r, nil
}

// Leaves returns the leaf piers (no opening inside) in name order. Their
// shares are the fractions of the wall shear that reach the base through
// each of them, level by level.
func (r *Result) Leaves() []Pier {
	var out []Pier
	for _, p := range r.Piers {
		if p.Leaf {
			out = append(out, p)
		}
	}
	return out
}

// band is a merged vertical projection of openings: [y0, y1] and the
// indexes of its openings.
type band struct {
	y0, y1 float64
	ops    []int
}

// bands projects the openings on the vertical axis and merges overlapping
// or touching intervals, lowest first.
func (s *solver) bands(ops []opening) []band {
	order := make([]int, len(ops))
	for i := range order {
		order[i] = i
	}
	slices.SortStableFunc(order, func(a, b int) int { return cmpFloat(ops[a].r.Y0, ops[b].r.Y0) })
	var out []band
	start := 0
	for k, i := range order {
		o := ops[i].r
		if n := len(out); n > 0 && o.Y0 <= out[n-1].y1+s.eps {
			out[n-1].y1 = math.Max(out[n-1].y1, o.Y1)
			out[n-1].ops = order[start : k+1 : k+1] // a band's openings are consecutive in order
			continue
		}
		start = k
		out = append(out, band{y0: o.Y0, y1: o.Y1, ops: order[k : k+1 : k+1]})
	}
	return out
}

// bandNames lists the names of a band's openings.
func bandNames(b band, ops []opening) []string {
	out := make([]string, len(b.ops))
	for i, k := range b.ops {
		out[i] = ops[k].name
	}
	return out
}

// span is a pier of a band: its outline and the openings inside it.
type span struct {
	rect geometry.Rect
	ops  []opening
}

// piersOf returns the piers of band b of region rect, left to right: the
// parts of the band between its cuts (the openings that span the band's
// full height, or all its openings when none does). Zero-width piers
// between touching openings are skipped.
func (s *solver) piersOf(rect geometry.Rect, b band, ops []opening) (out []span, allCuts bool) {
	spanning := func(o geometry.Rect) bool { return o.Y0 <= b.y0+s.eps && o.Y1 >= b.y1-s.eps }
	anySpans := false
	for _, k := range b.ops {
		if spanning(ops[k].r) {
			anySpans = true
			break
		}
	}
	isCut := func(o geometry.Rect) bool { return !anySpans || spanning(o) }

	cuts := make([]geometry.Rect, 0, len(b.ops))
	var inner []opening
	for _, k := range b.ops {
		if isCut(ops[k].r) {
			cuts = append(cuts, ops[k].r)
		} else {
			if inner == nil {
				inner = make([]opening, 0, len(b.ops))
			}
			inner = append(inner, ops[k])
		}
	}
	slices.SortFunc(cuts, func(a, c geometry.Rect) int { return cmpFloat(a.X0, c.X0) })

	out = make([]span, 0, len(cuts)+1)
	// Each inner opening lies in one pier, so one buffer holds them all.
	clipped := make([]opening, 0, len(inner))
	add := func(x0, x1 float64) {
		if x1-x0 <= s.eps {
			return // zero-width pier between touching openings
		}
		start := len(clipped)
		for _, o := range inner {
			if o.r.X0 < x1-s.eps && o.r.X1 > x0+s.eps {
				o.r.X0 = math.Max(o.r.X0, x0)
				o.r.X1 = math.Min(o.r.X1, x1)
				clipped = append(clipped, o)
			}
		}
		sp := span{rect: geometry.Rect{X0: x0, Y0: b.y0, X1: x1, Y1: b.y1}}
		if len(clipped) > start {
			sp.ops = clipped[start:len(clipped):len(clipped)]
		}
		out = append(out, sp)
	}
	x := rect.X0
	for _, c := range cuts {
		if c.X0 > x {
			add(x, c.X0)
		}
		x = math.Max(x, c.X1)
	}
	add(x, rect.X1)
	return out, !anySpans && len(b.ops) > 1
}

// cutAcross reports whether a chain of openings that touch one another
// (even at a corner) links the region's left end to its right end: then
// no solid path leads from the region's base to its top. It names the
// opening that completes the chain.
func (s *solver) cutAcross(rect geometry.Rect, ops []opening) (string, bool) {
	n := len(ops)
	uf := newUnionFind(n + 2)
	left, right := n, n+1
	for i, o := range ops {
		if o.r.X0 <= rect.X0+s.eps {
			uf.union(i, left)
		}
		if o.r.X1 >= rect.X1-s.eps {
			uf.union(i, right)
		}
		for j := range i {
			if s.touch(o.r, ops[j].r) {
				uf.union(i, j)
			}
		}
		if uf.find(left) == uf.find(right) {
			return o.name, true
		}
	}
	return "", false
}

// touch reports whether two closed rectangles meet (share a point).
func (s *solver) touch(a, b geometry.Rect) bool {
	return a.X0 <= b.X1+s.eps && b.X0 <= a.X1+s.eps && a.Y0 <= b.Y1+s.eps && b.Y0 <= a.Y1+s.eps
}

type unionFind []int

func newUnionFind(n int) unionFind {
	u := make(unionFind, n)
	for i := range u {
		u[i] = i
	}
	return u
}

func (u unionFind) find(i int) int {
	for u[i] != i {
		u[i] = u[u[i]]
		i = u[i]
	}
	return i
}

func (u unionFind) union(a, b int) { u[u.find(a)] = u.find(b) }

func cmpFloat(a, b float64) int {
	switch {
	case a < b:
		return -1
	case a > b:
		return 1
	}
	return 0
}

// checkWall validates what Solve needs (whether or not Validate has run)
// and returns the active layout's openings.
func checkWall(w *geometry.Wall) ([]opening, error) {
	pos := func(what string, v float64) error {
		if !(v > 0) || math.IsInf(v, 0) {
			return fmt.Errorf("pier: wall %s must be a positive length, got %g m", what, v)
		}
		return nil
	}
	if err := pos("length", float64(w.Length)); err != nil {
		return nil, err
	}
	if err := pos("height", float64(w.Height)); err != nil {
		return nil, err
	}
	if t := float64(w.Thickness); t < 0 || math.IsInf(t, 0) || math.IsNaN(t) {
		return nil, fmt.Errorf("pier: wall thickness must be a positive length, got %g m", t)
	}
	if len(w.Layouts) > 0 && (w.Active < 0 || w.Active >= len(w.Layouts)) {
		return nil, fmt.Errorf("pier: active layout %d does not exist (the wall has %d)", w.Active, len(w.Layouts))
	}
	if w.Support != geometry.Cantilever && w.Support != geometry.Fixed {
		return nil, fmt.Errorf("pier: unknown support %d", w.Support)
	}
	eps := tolerance * math.Max(float64(w.Length), float64(w.Height))
	src := w.Openings()
	ops := make([]opening, len(src))
	for i, o := range src {
		name := o.Name
		if name == "" {
			name = "#" + strconv.Itoa(i+1)
		}
		r := o.Rect()
		for _, v := range []float64{r.X0, r.Y0, r.X1, r.Y1} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				return nil, fmt.Errorf("pier: opening %s has a size or position that is not a number", name)
			}
		}
		if !(o.Width > 0) || !(o.Height > 0) {
			return nil, fmt.Errorf("pier: opening %s must have a positive width and height", name)
		}
		if r.X0 < -eps || r.Y0 < -eps || r.X1 > float64(w.Length)+eps || r.Y1 > float64(w.Height)+eps {
			return nil, fmt.Errorf("pier: opening %s is not inside the wall", name)
		}
		r.X0, r.Y0 = math.Max(r.X0, 0), math.Max(r.Y0, 0)
		r.X1, r.Y1 = math.Min(r.X1, float64(w.Length)), math.Min(r.Y1, float64(w.Height))
		ops[i] = opening{r: r, name: name}
		for j := range i {
			q := ops[j].r
			if r.X0 < q.X1-eps && q.X0 < r.X1-eps && r.Y0 < q.Y1-eps && q.Y0 < r.Y1-eps {
				return nil, fmt.Errorf("pier: openings %s and %s overlap", ops[j].name, name)
			}
		}
	}
	return ops, nil
}

// CheckDrift checks the top deflection δe of wall w under its shear against
// the wall's drift settings (docs/method.md §7): δ = Cd·δe/Ie (ASCE 7-22
// §12.8.6) against the limit times h_sx (Table 12.12-1). Without C_d or
// I_e it makes no verdict and says which is missing. The classic result and
// the finite-element check share it.
func CheckDrift(w *geometry.Wall, elastic geometry.Length) (DriftCheck, error) {
	dr := w.Drift
	cd, ie := dr.Cd, dr.Ie
	if cd < 0 || math.IsNaN(cd) || math.IsInf(cd, 0) || ie < 0 || math.IsNaN(ie) || math.IsInf(ie, 0) {
		return DriftCheck{}, fmt.Errorf("pier: drift factors Cd and Ie must be positive numbers, got %g and %g", cd, ie)
	}
	limit := dr.Limit
	if limit == 0 && dr.Preset != "" {
		pr, ok := geometry.FindDriftPreset(dr.Preset)
		if !ok {
			return DriftCheck{}, fmt.Errorf("pier: unknown drift limit preset %q", dr.Preset)
		}
		limit = pr.Limit
	}
	if !(limit >= 0) || math.IsInf(limit, 0) {
		return DriftCheck{}, fmt.Errorf("pier: the drift limit must be a positive fraction of the height, got %g", limit)
	}
	h := float64(w.Height)
	if hs := float64(dr.StoreyHeight); hs > 0 && !math.IsInf(hs, 0) {
		h = hs
	} else if hs != 0 {
		return DriftCheck{}, fmt.Errorf("pier: the storey height h_sx must be a positive length, got %g m", hs)
	}
	c := DriftCheck{
		Elastic:   elastic,
		Height:    geometry.Length(h),
		Allowable: geometry.Length(limit * h),
		OK:        true,
	}
	switch {
	case cd == 0 && ie == 0:
		c.Missing = "C_d and I_e"
	case cd == 0:
		c.Missing = "C_d"
	case ie == 0:
		c.Missing = "I_e"
	}
	if c.Missing != "" {
		return c, nil
	}
	design := cd * float64(elastic) / ie
	c.Design = geometry.Length(design)
	c.Ratio = design / h
	c.OK = limit == 0 || design <= limit*h
	return c, nil
}

// checkFinite is the last guard of the promise that a Result holds no NaN
// or Inf (extreme proportions could overflow the cubes).
func (r *Result) checkFinite() error {
	bad := false
	chk := func(vs ...float64) {
		for _, v := range vs {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				bad = true
			}
		}
	}
	chk(r.Deflection, r.Rigidity, r.Split.Bending, r.Split.Shear, r.RigidityAbs, r.Overturning,
		float64(r.DeflectionAbs), float64(r.Drift.Design), r.Drift.Ratio)
	for _, p := range r.Piers {
		chk(p.Parts.Bending, p.Parts.Shear, p.Rigidity, p.Share, p.BandShare, float64(p.Shear), p.Moment)
		for _, sec := range []Sections{p.Loads.Lateral, p.Loads.Dead, p.Loads.Live} {
			for _, f := range []Forces{sec.Bottom, sec.Middle, sec.Top} {
				chk(float64(f.Shear), float64(f.Axial), f.Moment)
			}
		}
	}
	for _, st := range r.Steps {
		chk(st.Deflection)
	}
	if bad {
		return errRange
	}
	return nil
}

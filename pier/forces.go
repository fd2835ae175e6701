package pier

import (
	"fmt"
	"math"

	"pierwise/geometry"
)

// loads fills the absolute rigidity, the pier forces under the lateral and
// gravity loads, the deflection under the load and the drift check
// (docs/method.md §6).
func (s *solver) loads(w *geometry.Wall, root *node) (err error) {
	r := s.res
	E := float64(r.Moduli.E)
	if E > 0 && s.thick > 0 {
		r.RigidityAbs = r.Rigidity * E * s.thick
	}
	V := float64(w.Load.Shear)
	if math.IsNaN(V) || math.IsInf(V, 0) || V < 0 {
		return fmt.Errorf("pier: the wall shear must be a positive force, got %g N", V)
	}
	g, err := s.gravityLoads(w)
	if err != nil {
		return err
	}
	s.gravity(root, 0, float64(w.Length), g)
	if V == 0 {
		return nil
	}
	r.HasLoad = true
	// Every pier gets the forces of its share; for a pier with openings
	// inside they are those of the pier as a whole, and its leaves carry
	// them on.
	for i := range r.Piers {
		p := &r.Piers[i]
		p.Shear = geometry.Force(p.Share * V)
		arm := p.H()
		if p.Support == geometry.Fixed {
			arm /= 2 // inflection point at mid-height
		}
		p.Moment = p.Share * V * arm
	}
	r.Overturning = V * (inflection(root.rect, w.Support) - root.rect.Y0)
	s.shear = V
	s.lateral(root, V, 0)
	if !(E > 0 && s.thick > 0) {
		return nil
	}
	r.DeflectionAbs = geometry.Length(V / (E * s.thick) * r.Deflection)
	r.Drift, err = CheckDrift(w, r.DeflectionAbs)
	return err
}

// inflection is the height at which the moment in a region of the given
// support vanishes under a shear at its top: the top of a cantilever, the
// mid-height of a fixed-fixed region.
func inflection(rect geometry.Rect, sup geometry.Support) float64 {
	if sup == geometry.Fixed {
		return (rect.Y0 + rect.Y1) / 2
	}
	return rect.Y1
}

// sectionsAt returns a pier's lateral section forces: shear V throughout,
// axial N throughout (no vertical load acts along a pier under the lateral
// load, so its axial force is the same at every height), and the moment of
// its support, V·(y_inflection − y).
func sectionsAt(rect geometry.Rect, sup geometry.Support, V, N float64) Sections {
	yi := inflection(rect, sup)
	at := func(y float64) Forces {
		return Forces{Shear: geometry.Force(V), Axial: geometry.Force(N), Moment: V * (yi - y)}
	}
	return Sections{Bottom: at(rect.Y0), Middle: at((rect.Y0 + rect.Y1) / 2), Top: at(rect.Y1)}
}

// lateral fills the lateral section forces of the piers of region n, which
// carries the shear V and the axial force N (compression positive, through
// its centre) and bends with the moment of its own support. In each band
// the piers are one section (docs/method.md §6): the region's moment at the
// band's mid-height, taken about the centroid x̄ of the piers' areas, less
// the piers' own moments there (zero for fixed-fixed piers), is carried by
// axial forces N_i = M·A_i·(x_i − x̄)/Σ A_j·(x_j − x̄)², and the region's
// own N is shared in proportion to the areas. A band of one pier has no
// couple: its pier takes N.
func (s *solver) lateral(n *node, V, N float64) {
	r := s.res
	if n.wall && len(n.ops) == 0 {
		p := &r.Piers[0]
		p.Loads.Lateral = sectionsAt(p.Rect, p.Support, V, 0)
		return
	}
	if n.dead() {
		return
	}
	yi := inflection(n.rect, n.sup)
	xc := (n.rect.X0 + n.rect.X1) / 2
	for _, rw := range n.rows {
		var sumA, sumAx float64
		for _, c := range rw.piers {
			if !c.dead() {
				sumA += c.rect.W()
				sumAx += c.rect.W() * (c.rect.X0 + c.rect.X1) / 2
			}
		}
		if !(sumA > 0) {
			continue
		}
		xbar := sumAx / sumA
		ym := (rw.rect.Y0 + rw.rect.Y1) / 2
		// The region's moment about x̄ at the band's mid-height, less what
		// the piers' own bending carries there.
		couple := V*(yi-ym) + N*(xc-xbar)
		var inertia float64
		live := 0
		for _, c := range rw.piers {
			if c.dead() {
				continue
			}
			live++
			p := &r.Piers[c.pier]
			couple -= float64(p.Shear) * (inflection(p.Rect, p.Support) - ym)
			dx := (c.rect.X0+c.rect.X1)/2 - xbar
			inertia += c.rect.W() * dx * dx
		}
		if live == 1 && math.Abs(couple) > 1e-9*s.shear*s.height {
			for _, c := range rw.piers {
				if !c.dead() {
					whose := "the wall's overturning moment"
					if !n.wall {
						whose = "the moment of pier " + n.name
					}
					s.warn(WarnOnePier, SeverityCaution, c.name, fmt.Sprintf("pier %s is the only pier of its band, so no couple of axial forces can carry %s there: it passes through %s as bending beyond the end moments the method gives it (V·h/2 fixed-fixed, V·h cantilever); check %s for the full moment at its height", c.name, whose, c.name, c.name))
				}
			}
		}
		for _, c := range rw.piers {
			if c.dead() {
				continue
			}
			p := &r.Piers[c.pier]
			Ni := N * c.rect.W() / sumA
			if live > 1 && inertia > 0 {
				Ni += couple * c.rect.W() * ((c.rect.X0+c.rect.X1)/2 - xbar) / inertia
			}
			Vi := float64(p.Shear)
			p.Loads.Lateral = sectionsAt(p.Rect, p.Support, Vi, Ni)
			s.lateral(c, Vi, Ni)
		}
	}
}

// gravityLoad is what the gravity settings of a wall come to.
type gravityLoad struct {
	dead, live float64 // line loads along the top, N/m
	self       float64 // self weight per face area, N/m²
}

// gravityLoads reads the wall's gravity settings, with the default self
// weight when none is given (SelfWeightOf; docs/method.md §6).
func (s *solver) gravityLoads(w *geometry.Wall) (gravityLoad, error) {
	g := gravityLoad{dead: float64(w.Gravity.Dead), live: float64(w.Gravity.Live)}
	for _, v := range []struct {
		what string
		v    float64
	}{{"dead load", g.dead}, {"live load", g.live}} {
		if math.IsNaN(v.v) || math.IsInf(v.v, 0) || v.v < 0 {
			return g, fmt.Errorf("pier: the %s must be zero or positive, got %g N/m", v.what, v.v)
		}
	}
	sw, err := SelfWeightOf(w)
	if err != nil {
		return g, err
	}
	g.self = float64(sw.Weight)
	return g, nil
}

// gravity fills the dead and live axial forces of the piers of region n,
// whose tributary strip is [t0, t1] (docs/method.md §6): each pier of a
// band takes the strip from the middle of the gap on its left to the
// middle of the gap on its right (a pier's width plus half of each
// adjacent opening; the whole of an opening at the region's end), the line
// loads on that width and the weight of the wall face in the strip above
// each section.
func (s *solver) gravity(n *node, t0, t1 float64, g gravityLoad) {
	r := s.res
	if n.wall && len(n.ops) == 0 {
		p := &r.Piers[0]
		p.Loads.Dead, p.Loads.Live = s.gravitySections(p.Rect, t0, t1, g)
		return
	}
	if n.dead() {
		return
	}
	for _, rw := range n.rows {
		a := t0 // the left end of the next live pier's strip
		for i, c := range rw.piers {
			if c.dead() {
				continue
			}
			b := t1
			for _, next := range rw.piers[i+1:] {
				if !next.dead() {
					b = (c.rect.X1 + next.rect.X0) / 2
					break
				}
			}
			p := &r.Piers[c.pier]
			p.Loads.Dead, p.Loads.Live = s.gravitySections(c.rect, a, b, g)
			s.gravity(c, a, b, g)
			a = b
		}
	}
}

// gravitySections returns the dead and live axial forces at the bottom,
// middle and top of a pier with the tributary strip [a, b].
func (s *solver) gravitySections(rect geometry.Rect, a, b float64, g gravityLoad) (dead, live Sections) {
	ys := [3]float64{rect.Y0, (rect.Y0 + rect.Y1) / 2, rect.Y1}
	var area [3]float64
	if g.self != 0 {
		area = s.faceAbove(a, b, ys)
	}
	line := func(w float64) geometry.Force { return geometry.Force(w * (b - a)) }
	dead.Bottom.Axial = line(g.dead) + geometry.Force(g.self*area[0])
	dead.Middle.Axial = line(g.dead) + geometry.Force(g.self*area[1])
	dead.Top.Axial = line(g.dead) + geometry.Force(g.self*area[2])
	live.Bottom.Axial, live.Middle.Axial, live.Top.Axial = line(g.live), line(g.live), line(g.live)
	return dead, live
}

// faceAbove returns the solid face area of the wall between x = a and
// x = b above each height in ys: the strip less the openings in it.
func (s *solver) faceAbove(a, b float64, ys [3]float64) (area [3]float64) {
	if b <= a {
		return area
	}
	for k, y := range ys {
		area[k] = (b - a) * math.Max(s.height-y, 0)
	}
	for _, o := range s.ops {
		if o.r.X1 <= a || o.r.X0 >= b {
			continue
		}
		dx := math.Min(b, o.r.X1) - math.Max(a, o.r.X0)
		for k, y := range ys {
			if dy := o.r.Y1 - math.Max(y, o.r.Y0); dy > 0 {
				area[k] -= dx * dy
			}
		}
	}
	for k := range area {
		area[k] = math.Max(area[k], 0)
	}
	return area
}

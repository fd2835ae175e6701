package fe

import (
	"context"
	"math"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// FuzzSolve: for any wall with up to two openings, Solve either returns an
// error or a finite positive deflection no smaller than the solid wall's
// (removing material never stiffens a wall), and the whole wall taken as
// one pier carries, at its base, the wall shear and the whole vertical load
// (statics: the line loads times the length plus the weight of the solid
// area), with every force finite.
func FuzzSolve(f *testing.F) {
	f.Add(20.0, 10.0, 4.0, 0.0, 4.0, 7.0, 12.0, 3.0, 4.0, 4.0, false)
	f.Add(18.0, 16.0, 4.0, 0.0, 4.0, 8.0, 12.0, 2.0, 4.0, 4.0, true)
	f.Add(6.0, 20.0, 0.0, 5.0, 6.0, 2.0, 1.0, 1.0, 1.0, 1.0, false)
	f.Fuzz(func(t *testing.T, l, h, x1, s1, w1, h1, x2, s2, w2, h2 float64, fixed bool) {
		for _, v := range []float64{l, h, x1, s1, w1, h1, x2, s2, w2, h2} {
			if math.IsNaN(v) || math.IsInf(v, 0) || math.Abs(v) > 100 {
				t.Skip()
			}
		}
		if l < 1 || h < 1 {
			t.Skip()
		}
		sup := geometry.Cantilever
		if fixed {
			sup = geometry.Fixed
		}
		var ops []geometry.Opening
		for _, o := range [][4]float64{{x1, s1, w1, h1}, {x2, s2, w2, h2}} {
			if o[2] > 0.25 && o[3] > 0.25 && o[0] >= 0 && o[1] >= 0 && o[0]+o[2] <= l && o[1]+o[3] <= h {
				ops = append(ops, opening("O", o[0], o[1], o[2], o[3]))
			}
		}
		opt := Options{Mesh: geometry.Length(max(l, h)/12) * ft}
		solid, err := Solve(wallFt(l, h, sup), nil, opt)
		if err != nil {
			t.Fatalf("solid %g × %g ft: %v", l, h, err)
		}
		w := wallFt(l, h, sup, ops...)
		w.Load.Shear = 10 * geometry.Kip
		w.Gravity = geometry.Gravity{Dead: 1000, Live: 500}
		res, err := Solve(w, classicOf(leaf("W", 0, 0, l, h)), opt)
		if err != nil {
			return // e.g. openings that cut the wall
		}
		p, _ := res.Pier("W")
		for _, c := range []pier.Sections{p.Loads.Lateral, p.Loads.Dead, p.Loads.Live} {
			for _, f := range []pier.Forces{c.Bottom, c.Middle, c.Top} {
				for _, v := range []float64{float64(f.Shear), float64(f.Axial), f.Moment} {
					if math.IsNaN(v) || math.IsInf(v, 0) {
						t.Fatalf("forces %+v", p.Loads)
					}
				}
			}
		}
		// The model's wall is the one with near edges merged.
		sw, _ := pier.SnapEdges(w)
		L, area := float64(w.Length), float64(w.Length)*float64(w.Height)
		for _, o := range sw.Openings() {
			area -= o.Rect().W() * o.Rect().H()
		}
		if so := sw.Openings(); len(so) == 2 {
			a, b := so[0].Rect(), so[1].Rect()
			area += max(0, min(a.X1, b.X1)-max(a.X0, b.X0)) * max(0, min(a.Y1, b.Y1)-max(a.Y0, b.Y0)) // counted twice
		}
		V, q := float64(w.Load.Shear), float64(res.SelfWeight.Weight)
		if got := float64(p.Loads.Lateral.Bottom.Shear); math.Abs(got-V) > 1e-6*V {
			t.Errorf("base shear %.9g, V %.9g", got, V)
		}
		if got, want := float64(p.Loads.Dead.Bottom.Axial), 1000*L+q*area; math.Abs(got-want) > 1e-6*want {
			t.Errorf("base dead axial %.9g, statics %.9g", got, want)
		}
		if got, want := float64(p.Loads.Live.Bottom.Axial), 500*L; math.Abs(got-want) > 1e-6*want {
			t.Errorf("base live axial %.9g, statics %.9g", got, want)
		}
		if !(res.Deflection > 0) || math.IsInf(res.Deflection, 0) || math.IsInf(res.Rigidity, 0) {
			t.Fatalf("deflection %g, rigidity %g", res.Deflection, res.Rigidity)
		}
		// With the top collector on (an opening reaches the top), compare
		// with the solid wall under the same tie: the tie itself stiffens.
		ref := solid.Deflection
		if res.Collector {
			set, err := prepare(wallFt(l, h, sup), nil, opt)
			if err != nil {
				t.Fatal(err)
			}
			set.collector = true
			s, err := solveWall(context.Background(), wallFt(l, h, sup), set)
			if err != nil {
				t.Fatal(err)
			}
			ref = s.deflection
		}
		// Meshes differ (the openings add lines), so allow discretisation slack.
		if res.Deflection < ref*0.97 {
			t.Errorf("with openings %+v the wall deflects %.6g, the solid wall %.6g", ops, res.Deflection, solid.Deflection)
		}
	})
}

package fe

import (
	"math"
	"testing"

	"pierwise/geometry"
)

// FuzzSolve: for any wall with up to two openings, Solve either returns an
// error or a finite positive deflection no smaller than the solid wall's
// (removing material never stiffens a wall).
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
		res, err := Solve(wallFt(l, h, sup, ops...), nil, opt)
		if err != nil {
			return // e.g. openings that cut the wall
		}
		if !(res.Deflection > 0) || math.IsInf(res.Deflection, 0) || math.IsInf(res.Rigidity, 0) {
			t.Fatalf("deflection %g, rigidity %g", res.Deflection, res.Rigidity)
		}
		// Meshes differ (the openings add lines), so allow discretisation slack.
		if res.Deflection < solid.Deflection*0.97 {
			t.Errorf("with openings %+v the wall deflects %.6g, the solid wall %.6g", ops, res.Deflection, solid.Deflection)
		}
	})
}

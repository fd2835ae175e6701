package pier_test

import (
	"fmt"

	"pierwise/geometry"
	"pierwise/pier"
)

// The Masonry Chronicles wall with a nested opening (docs/method.md §2): the
// published answer is 7.614 (exact arithmetic 7.607) and R = 0.131.
func ExampleSolve() {
	ft := geometry.Foot
	w := &geometry.Wall{
		Length: 18 * ft, Height: 16 * ft, Support: geometry.Cantilever,
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "D1", X: 4 * ft, Sill: 0, Width: 4 * ft, Height: 8 * ft},
			{Name: "W1", X: 12 * ft, Sill: 2 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
	r, err := pier.Solve(w)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("deflection %.3f, rigidity %.3f\n", r.Deflection, r.Rigidity)
	for _, p := range r.Piers {
		fmt.Printf("%-5s h/L %.2f  rigidity %.3f  share %.3f  leaf %v\n", p.Name, p.Ratio(), p.Rigidity, p.Share, p.Leaf)
	}
	// Output:
	// deflection 7.607, rigidity 0.131
	// P1    h/L 2.00  rigidity 0.071  share 0.254  leaf true
	// P2    h/L 0.80  rigidity 0.210  share 0.746  leaf false
	// P2.1  h/L 1.00  rigidity 0.250  share 0.580  leaf true
	// P2.2  h/L 2.00  rigidity 0.071  share 0.166  leaf true
}

// A squat cantilever pier is mostly shear.
func ExampleElement() {
	d := pier.Element(2.5, 10, geometry.Cantilever, pier.Params{})
	fmt.Printf("d = %.4f: bending %.0f %%, shear %.0f %%\n", d.Total(), 100*d.Bending/d.Total(), 100*d.Shear/d.Total())
	// Output:
	// d = 0.8125: bending 8 %, shear 92 %
}

// A door the full height of the wall cuts it in two.
func ExampleCutError() {
	ft := geometry.Foot
	w := &geometry.Wall{
		Length: 20 * ft, Height: 10 * ft,
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "W1", X: 0, Sill: 3 * ft, Width: 12 * ft, Height: 4 * ft},
			{Name: "W2", X: 12 * ft, Sill: 3 * ft, Width: 8 * ft, Height: 4 * ft},
		}}},
	}
	_, err := pier.Solve(w)
	fmt.Println(err)
	// Output:
	// opening W2 cuts the wall in two: there is no load path from its base to its top
}

// The same wall under a 10 kip shear: every pier's shear, its bottom
// moment and the axial force of the overturning (docs/method.md §6). The
// band's two piers at x = 2 ft and 13 ft carry the 120 kip·ft of
// overturning at its mid-height as ±120/11 kip.
func ExampleSolve_forces() {
	ft, kip := geometry.Foot, geometry.Kip
	w := &geometry.Wall{
		Length: 18 * ft, Height: 16 * ft, Support: geometry.Cantilever,
		Load: geometry.Load{Shear: 10 * kip},
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "D1", X: 4 * ft, Sill: 0, Width: 4 * ft, Height: 8 * ft},
			{Name: "W1", X: 12 * ft, Sill: 2 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
	r, err := pier.Solve(w)
	if err != nil {
		fmt.Println(err)
		return
	}
	kipFt := float64(kip) * float64(ft)
	fmt.Printf("overturning %.1f kip·ft\n", r.Overturning/kipFt)
	for _, p := range r.Piers {
		lat := p.Loads.Lateral
		fmt.Printf("%-5s V %5.2f kip  M bottom %6.2f kip·ft  N %6.2f kip\n", p.Name,
			float64(lat.Bottom.Shear/kip), lat.Bottom.Moment/kipFt, float64(lat.Middle.Axial/kip))
	}
	// Output:
	// overturning 160.0 kip·ft
	// P1    V  2.54 kip  M bottom  10.15 kip·ft  N -10.91 kip
	// P2    V  7.46 kip  M bottom  29.85 kip·ft  N  10.91 kip
	// P2.1  V  5.80 kip  M bottom  11.61 kip·ft  N   6.23 kip
	// P2.2  V  1.66 kip  M bottom   3.32 kip·ft  N   4.68 kip
}

package fe

import (
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// TestSpandrelThreshold is the basis of pier.SpandrelRatio
// (docs/method.md §2.6): on walls with two windows between three 4 ft
// piers (sill 3 ft; windows 3 or 6 ft wide, 4 or 6 ft tall), the classic
// method's overestimate of the rigidity against this finite-element model
// grows as the spandrel gets shallower. Taking the same wall with a
// spandrel 1.5 times the window height as the reference, a spandrel below
// SpandrelRatio (0.4 here) adds more than WarnDifference, and one of 0.75
// adds less. Measured by pierwise itself, not a published value.
func TestSpandrelThreshold(t *testing.T) {
	ft := geometry.Foot
	wall := func(ph, ow, ratio float64) *geometry.Wall {
		return &geometry.Wall{
			Length: geometry.Length(12+2*ow) * ft, Height: geometry.Length(3+ph+ratio*ph) * ft,
			Thickness: 7.625 * geometry.Inch, Support: geometry.Cantilever,
			Layouts: []geometry.Layout{{Name: "m", Openings: []geometry.Opening{
				{Name: "W1", X: 4 * ft, Sill: 3 * ft, Width: geometry.Length(ow) * ft, Height: geometry.Length(ph) * ft},
				{Name: "W2", X: geometry.Length(8+ow) * ft, Sill: 3 * ft, Width: geometry.Length(ow) * ft, Height: geometry.Length(ph) * ft},
			}}},
		}
	}
	over := func(w *geometry.Wall) float64 {
		r, err := pier.Solve(w)
		if err != nil {
			t.Fatal(err)
		}
		f, err := Solve(w, r, Options{})
		if err != nil {
			t.Fatal(err)
		}
		return 1 + f.Difference // classic / FE rigidity
	}
	for _, ph := range []float64{4, 6} {
		for _, ow := range []float64{3, 6} {
			deep := over(wall(ph, ow, 1.5))
			below := over(wall(ph, ow, 0.8*pier.SpandrelRatio))/deep - 1
			above := over(wall(ph, ow, 0.75))/deep - 1
			if below <= WarnDifference {
				t.Errorf("windows %g ft × %g ft: a spandrel %.2f times their height adds %.0f %%, want more than %.0f %%", ow, ph, 0.8*pier.SpandrelRatio, 100*below, 100*WarnDifference)
			}
			if above >= WarnDifference {
				t.Errorf("windows %g ft × %g ft: a spandrel 0.75 times their height adds %.0f %%, want less than %.0f %%", ow, ph, 100*above, 100*WarnDifference)
			}
		}
	}
}

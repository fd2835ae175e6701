package study_test

import (
	"fmt"

	"pierwise/geometry"
	"pierwise/study"
)

// A window moved from the middle of a wall to 2 ft from its end: the wall
// and its piers before and after. Invented wall; by hand (docs/method.md §2):
// solid 4(0.5)³ + 3(0.5) = 2.000, strip 0.2³ + 3(0.2) = 0.608, two 8 ft
// piers 1/(2/1.625) = 0.8125, so R = 1/2.2045 = 0.454; after, piers of
// 14 ft and 2 ft take 1.136 and 0.071 (94 % and 6 %), R = 1/2.2204 = 0.450.
func ExampleCompare() {
	ft := geometry.Foot
	w := &geometry.Wall{
		Units: geometry.US, Length: 20 * ft, Height: 10 * ft, Thickness: 8 * geometry.Inch,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 1, Ie: 1},
		Layouts: []geometry.Layout{
			{Name: "middle", Openings: []geometry.Opening{{Name: "W1", X: 8 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft}}},
			{Name: "near the end", Openings: []geometry.Opening{{Name: "W1", X: 14 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft}}},
		},
	}
	c, err := study.Compare(study.WithLayout(w, 0), study.WithLayout(w, 1))
	if err != nil {
		fmt.Println(err)
		return
	}
	ch, _ := c.RigidityChange()
	fmt.Printf("relative rigidity %.3f -> %.3f (%+.1f %%)\n", c.Before.Result.Rigidity, c.After.Result.Rigidity, 100*ch)
	for _, p := range c.Piers {
		fmt.Printf("%s %.0f%% -> %s %.0f%%\n", p.Before.Name, 100*p.Before.Share, p.After.Name, 100*p.After.Share)
	}
	// Output:
	// relative rigidity 0.454 -> 0.450 (-0.7 %)
	// P1 50% -> P1 94%
	// P2 50% -> P2 6%
}

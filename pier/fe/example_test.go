package fe_test

import (
	"fmt"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// The nested-opening wall of the Masonry Chronicles example (docs/method.md §2):
// 18 ft × 16 ft cantilever, a 4 ft × 8 ft door 4 ft from the left end and a
// 4 ft × 4 ft window with its sill at 2 ft, 12 ft from the left end.
func ExampleSolve() {
	ft := geometry.Foot
	w := &geometry.Wall{
		Length: 18 * ft, Height: 16 * ft, Thickness: 7.625 * geometry.Inch,
		Support: geometry.Cantilever,
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "D1", X: 4 * ft, Width: 4 * ft, Height: 8 * ft},
			{Name: "W1", X: 12 * ft, Sill: 2 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
	classic, err := pier.Solve(w)
	if err != nil {
		fmt.Println(err)
		return
	}
	res, err := fe.Solve(w, classic, fe.Options{})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("classic deflection %.2f, FE (%s) %.1f: the hand method is %.0f %% stiffer\n",
		classic.Deflection, res.Element, res.Deflection, 100*res.Difference)
	for _, p := range res.Piers {
		fmt.Printf("%s %.2f\n", p.Name, p.Share)
	}
	// Output:
	// classic deflection 7.61, FE (qm6) 11.1: the hand method is 46 % stiffer
	// P1 0.32
	// P2.1 0.53
	// P2.2 0.15
}

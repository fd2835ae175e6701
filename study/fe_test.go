package study

import (
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// With FE asked for, each side carries the FE answer of its layout solved
// on its own, and its shares are those of the same leaf piers.
func TestCompareWithFE(t *testing.T) {
	w := annex()
	opt := Options{FE: true, FEOptions: fe.Options{Mesh: geometry.Foot}}
	c, err := CompareWith(WithLayout(w, 0), WithLayout(w, 1), opt)
	if err != nil {
		t.Fatal(err)
	}
	for i, side := range []*Side{&c.Before, &c.After} {
		if side.FE == nil {
			t.Fatalf("side %d: no FE answer: %v", i, side.FEErr)
		}
		ind := WithLayout(w, i)
		res := mustSolve(t, ind)
		want, err := fe.Solve(ind, res, opt.FEOptions)
		if err != nil {
			t.Fatal(err)
		}
		if !near(side.FE.Rigidity, want.Rigidity, 1e-9) {
			t.Errorf("side %d: FE rigidity %g, separately %g", i, side.FE.Rigidity, want.Rigidity)
		}
		for _, p := range want.Piers {
			if got, ok := side.FEShare(p.Name); !ok || !near(got, p.Share, 1e-9) {
				t.Errorf("side %d pier %s: FE share %g %v, separately %g", i, p.Name, got, ok, p.Share)
			}
		}
	}
	if ch, ok := c.FERigidityChange(); !ok || !near(ch, c.After.FE.Rigidity/c.Before.FE.Rigidity-1, 1e-9) {
		t.Errorf("FE rigidity change %g %v", ch, ok)
	}
	// Without the option there is no FE answer.
	plain, _ := Compare(WithLayout(w, 0), WithLayout(w, 1))
	if plain.Before.FE != nil || plain.After.FE != nil {
		t.Error("FE ran without being asked")
	}
}

// Staggered openings: the classic method has no answer, the FE check does.
func TestCompareFEWhereClassicFails(t *testing.T) {
	w := &geometry.Wall{
		Units: geometry.US, Length: 10 * ft, Height: 10 * ft, Thickness: 8 * geometry.Inch,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 1, Ie: 1},
		Layouts: []geometry.Layout{
			{Name: "apart", Openings: []geometry.Opening{
				{Name: "A", X: 0, Sill: 2 * ft, Width: 5 * ft, Height: 4 * ft},
				{Name: "B", X: 5 * ft, Sill: 7 * ft, Width: 5 * ft, Height: 1 * ft},
			}},
			// A, B and C together cover the length of the band 2–8 ft, yet
			// a path of solid wall winds up between them (x 6.5 ft to
			// y 5 ft, left to x 3 ft, up to the top).
			{Name: "staggered", Openings: []geometry.Opening{
				{Name: "A", X: 0, Sill: 2 * ft, Width: 6 * ft, Height: 2 * ft},
				{Name: "B", X: 4 * ft, Sill: 6 * ft, Width: 6 * ft, Height: 2 * ft},
				{Name: "C", X: 7 * ft, Sill: 4 * ft, Width: 1 * ft, Height: 2 * ft},
			}},
		},
	}
	c, err := CompareWith(WithLayout(w, 0), WithLayout(w, 1), Options{FE: true, FEOptions: fe.Options{Mesh: 6 * geometry.Inch}})
	if err != nil {
		t.Fatal(err)
	}
	if _, ok := c.After.Err.(*pier.StaggeredError); !ok {
		t.Fatalf("after: classic error %v, want staggered", c.After.Err)
	}
	if c.After.FE == nil || !(c.After.FE.Rigidity > 0) {
		t.Fatalf("after: FE %v, %v", c.After.FE, c.After.FEErr)
	}
	if _, ok := c.FERigidityChange(); !ok {
		t.Error("no FE rigidity change")
	}
}

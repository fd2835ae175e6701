package design

import (
	"math/rand/v2"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// wall20 is an invented 102 ft wall with 20 windows 3 ft wide between 2 ft
// piers (21 piers in the window band) and the full-length pier below the
// sills: 22 leaf piers with random section forces (seeded).
func wall20(b testing.TB, kind geometry.MaterialKind, class WallClass) Input {
	rng := rand.New(rand.NewPCG(1, 0))
	w := Wall{Units: geometry.US, Length: geometry.Length(102 * foot), Height: geometry.Length(12 * foot),
		Thickness: geometry.Length(7.625 * inch), Material: geometry.Material{Kind: kind, Strength: geometry.Stress(3000 * psiU)}}
	var piers []PierInput
	f := func(scale float64) pier.Forces {
		return pier.Forces{Shear: geometry.Force(scale * kip * rng.Float64()), Axial: geometry.Force(scale * kip * rng.Float64()),
			Moment: scale * kip * foot * (rng.Float64() - 0.5)}
	}
	loads := func() pier.PierLoads {
		return pier.PierLoads{Lateral: pier.Sections{Bottom: f(10), Top: f(10)}, Dead: pier.Sections{Bottom: f(20), Top: f(20)}, Live: pier.Sections{Bottom: f(5), Top: f(5)}}
	}
	for k := 0; k < 20; k++ {
		x := float64(2+5*k) * foot
		w.Openings = append(w.Openings, geometry.Opening{X: geometry.Length(x), Sill: geometry.Length(3 * foot), Width: geometry.Length(3 * foot), Height: geometry.Length(4 * foot)})
	}
	for k := 0; k <= 20; k++ {
		x := float64(5*k) * foot
		piers = append(piers, PierInput{Name: "P", Rect: geometry.Rect{X0: x, Y0: 3 * foot, X1: x + 2*foot, Y1: 7 * foot}, Loads: loads()})
	}
	piers = append(piers, PierInput{Name: "B", Rect: geometry.Rect{X1: 102 * foot, Y1: 3 * foot}, Loads: loads()})
	r := &Reinforcement{Fy: geometry.Stress(60 * ksi), Jamb: count(b, "2#5"), Vertical: spacing(b, "#5@16in"), Horizontal: spacing(b, "#4@16in")}
	code, _ := CodeFor(kind)
	return Input{Wall: w, Reinforcement: r, Settings: Settings{Code: code, Class: class, SDS: 1, Rho: 1.3}, Piers: piers}
}

// BenchmarkCheckWall: every pier of a 20-opening wall, all combinations, both
// sections (the target is under 1 ms per wall).
func BenchmarkCheckWall(b *testing.B) {
	for _, tc := range []struct {
		name  string
		kind  geometry.MaterialKind
		class WallClass
	}{
		{"masonry-ordinary", geometry.ConcreteMasonry, Ordinary},
		{"masonry-special", geometry.ConcreteMasonry, Special},
		{"concrete-special", geometry.Concrete, Special},
	} {
		b.Run(tc.name, func(b *testing.B) {
			in := wall20(b, tc.kind, tc.class)
			b.ReportAllocs()
			for b.Loop() {
				if _, err := CheckWall(in); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
	b.Run("curve-40", func(b *testing.B) {
		in := wall20(b, geometry.ConcreteMasonry, Ordinary)
		res, _ := CheckWall(in)
		s := res.Piers[len(res.Piers)-1].Section
		b.ReportAllocs()
		for b.Loop() {
			s.Curve(40)
		}
	})
}

package pier

import (
	"fmt"
	"testing"

	"pierwise/geometry"
)

// benchWall lays out n openings (invented) in storeys of ten 10 ft bays:
// the ground storey alternates 3 ft × 7 ft doors with 4 ft × 4 ft windows
// beside them (nested piers), upper storeys have 4 ft × 4 ft windows.
func benchWall(n int) *geometry.Wall {
	const bays = 10
	storeys := (n + bays - 1) / bays
	w := &geometry.Wall{
		Length: bays * 10 * ft, Height: geometry.Length(storeys*10+2) * ft, Thickness: 7.625 * geometry.Inch,
		Material: geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Load:     geometry.Load{Shear: 60 * geometry.Kip},
		Layouts:  []geometry.Layout{{Name: "main"}},
	}
	for i := range n {
		s, b := i/bays, i%bays
		o := geometry.Opening{Name: fmt.Sprintf("O%d", i+1), X: geometry.Length(10*b+3) * ft,
			Sill: geometry.Length(10*s+3) * ft, Width: 4 * ft, Height: 4 * ft}
		if s == 0 && b%2 == 0 {
			o.Sill, o.Width, o.Height = 0, 3*ft, 7*ft
		}
		w.Layouts[0].Openings = append(w.Layouts[0].Openings, o)
	}
	return w
}

func BenchmarkSolve(b *testing.B) {
	for _, n := range []int{1, 10, 50} {
		w := benchWall(n)
		if _, err := Solve(w); err != nil {
			b.Fatal(err)
		}
		b.Run(fmt.Sprintf("openings=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Solve(w); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

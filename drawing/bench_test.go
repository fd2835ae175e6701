package drawing

import (
	"fmt"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/pier/fe"
)

// fiftyOpenings is an invented 100 ft × 24 ft wall with two rows of 25
// windows, for the benchmark.
func fiftyOpenings() *geometry.Wall {
	ft := geometry.Foot
	var ops []geometry.Opening
	for row, sill := range []geometry.Length{2 * ft, 14 * ft} {
		for i := 0; i < 25; i++ {
			ops = append(ops, geometry.Opening{Name: fmt.Sprintf("W%d", row*25+i+1),
				X: geometry.Length(1+4*i) * ft, Sill: sill, Width: 2 * ft, Height: 4 * ft})
		}
	}
	return &geometry.Wall{Title: "Fifty windows", Length: 100 * ft, Height: 24 * ft, Thickness: 7.625 * geometry.Inch,
		Material: geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Load:     geometry.Load{Shear: 100 * geometry.Kip},
		Layouts:  []geometry.Layout{{Name: "main", Openings: ops}}}
}

// BenchmarkWall: drawing a 50-opening wall with its shear stress map (the
// target is 50 ms for the drawing; "field+draw" also solves the model).
func BenchmarkWall(b *testing.B) {
	w := fiftyOpenings()
	r, err := pier.Solve(w)
	if err != nil {
		b.Fatal(err)
	}
	f, err := fe.StressField(w, r, fe.Options{})
	if err != nil {
		b.Fatal(err)
	}
	in := WallInput{Wall: w, Piers: LeafPiers(r), HasLoad: true, Field: f, Component: Shear}
	b.Run("draw", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			if _, err := Wall(in); err != nil {
				b.Fatal(err)
			}
		}
	})
	b.Run("field+draw", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			f, err := fe.StressField(w, r, fe.Options{})
			if err != nil {
				b.Fatal(err)
			}
			in.Field = f
			if _, err := Wall(in); err != nil {
				b.Fatal(err)
			}
		}
	})
	b.Run("shares", func(b *testing.B) {
		in := in
		in.Field, in.Component = nil, NoField
		b.ReportAllocs()
		for b.Loop() {
			if _, err := Wall(in); err != nil {
				b.Fatal(err)
			}
		}
	})
}

package geometry_test

import (
	"fmt"

	"pierwise/geometry"
)

func ExampleParseLength() {
	for _, s := range []string{`12'-6"`, "7.625in", "3.6", "200 mm", "12 yd"} {
		l, err := geometry.ParseLength(s, geometry.US)
		if err != nil {
			fmt.Println(err)
			continue
		}
		fmt.Printf("%-8s = %.4f m = %s\n", s, float64(l), geometry.FormatLength(l, geometry.US))
	}
	// Output:
	// 12'-6"   = 3.8100 m = 12'-6"
	// 7.625in  = 0.1937 m = 7 5/8"
	// 3.6      = 1.0973 m = 3'-7 1/4"
	// 200 mm   = 0.2000 m = 7 7/8"
	// bad length "12 yd": unknown unit "yd" (use in, ft, mm, cm or m, or feet-inches like 12'-6")
}

func ExampleParse() {
	file := `length = "20ft"
height = "10ft"
thickness = "7.625in"

[material]
strength = "2000psi"

[[opening]]
x = "2ft"
width = "4ft"
height = "7ft"

[[opening]]
x = "5ft"
sill = "3ft"
width = "4ft"
height = "4ft"
`
	_, err := geometry.Parse("shop.toml", []byte(file))
	fmt.Println(err)
	// Output:
	// shop.toml:13: opening[2]: opening W1 overlaps opening D1
}

func ExampleMarshal() {
	w := &geometry.Wall{
		Title: "Shed", Units: geometry.SI,
		Length: 6, Height: 3, Thickness: 0.19,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 12 * geometry.Megapascal},
		Load:      geometry.Load{Shear: 80 * geometry.Kilonewton},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "D1", X: 1, Width: 0.9, Height: 2.1},
		}}},
	}
	data, err := geometry.Marshal(w)
	fmt.Print(string(data), err)
	// Output:
	// title = "Shed"
	// units = "si"
	// length = "6m"
	// height = "3m"
	// thickness = "190mm"
	// support = "cantilever"
	//
	// [material]
	// kind = "concrete-masonry"
	// strength = "12MPa"
	//
	// [load]
	// shear = "80kN"
	//
	// [[opening]]
	// name = "D1"
	// x = "1m"
	// sill = "0"
	// width = "900mm"
	// height = "2.1m"
	// <nil>
}

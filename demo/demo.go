// Package demo holds the built-in demo wall that pierwise opens when it is
// started without a file. The building is invented: a one-storey branch
// library annex in reinforced concrete masonry.
package demo

import "pierwise/geometry"

// Wall returns a fresh copy of the demo wall: the east wall of the annex,
// 40 ft long and 14 ft high, with a staff door, two reading-room windows and
// a glazed entrance, and a second layout in which the entrance is widened.
func Wall() *geometry.Wall {
	ft, in := geometry.Foot, geometry.Inch
	main := []geometry.Opening{
		{Name: "D1", X: 4 * ft, Sill: 0, Width: 3 * ft, Height: 7 * ft},
		{Name: "W1", X: 12 * ft, Sill: 3 * ft, Width: 6 * ft, Height: 4 * ft},
		{Name: "W2", X: 22 * ft, Sill: 3 * ft, Width: 6 * ft, Height: 4 * ft},
		{Name: "D2", X: 31 * ft, Sill: 0, Width: 6 * ft, Height: 8 * ft},
	}
	wide := append([]geometry.Opening(nil), main...)
	wide[3] = geometry.Opening{Name: "D2", X: 30 * ft, Sill: 0, Width: 8 * ft, Height: 8 * ft}
	return &geometry.Wall{
		Title:     "Library annex, east wall (demo)",
		Project:   geometry.Project{Name: "Library annex (invented)", Job: "DEMO-01"},
		Units:     geometry.US,
		Length:    40 * ft,
		Height:    14 * ft,
		Thickness: 7.625 * in,
		Support:   geometry.Cantilever,
		Material: geometry.Material{
			Kind:     geometry.ConcreteMasonry,
			Strength: 2000 * geometry.PSI,
		},
		Load:      geometry.Load{Shear: 45 * geometry.Kip},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 3.5, Ie: 1, Preset: "masonry-other", Limit: 0.007},
		Layouts: []geometry.Layout{
			{Name: "main", Openings: main},
			{Name: "wide entrance", Openings: wide},
		},
	}
}

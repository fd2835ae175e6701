package fe

import (
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// typicalWall is a 30 ft × 12 ft wall with a door and two windows (invented
// for the benchmark), with its classic result.
func typicalWall(b *testing.B) testWall {
	w := wallFt(30, 12, geometry.Cantilever,
		opening("W1", 3, 3, 5, 4), opening("D1", 12, 0, 4, 8), opening("W2", 21, 3, 6, 4))
	classic, err := pier.Solve(w)
	if err != nil {
		b.Fatal(err)
	}
	return testWall{name: "typical", wall: w, classic: classic}
}

// BenchmarkSolve times Solve end to end (mesh, assembly, factorisation,
// three load cases, pier forces). Target: the default mesh on a typical
// wall under 20 ms; the 20 ft × 10 ft wall meshed 160 × 80 (1.5 in, q4) is
// what scripts/fe-vs-ccx.sh times against CalculiX.
func BenchmarkSolve(b *testing.B) {
	typ := typicalWall(b)
	big := wallFt(20, 10, geometry.Cantilever)
	cases := []struct {
		name string
		c    testWall
		opt  Options
	}{
		{"typical-default-qm6", typ, Options{}},
		{"typical-default-q4", typ, Options{Element: ElementQ4}},
		{"solid-20x10ft-160x80-q4", testWall{wall: big}, Options{Mesh: 1.5 * geometry.Inch, Element: ElementQ4}},
	}
	for _, c := range cases {
		b.Run(c.name, func(b *testing.B) {
			b.ReportAllocs()
			var res *Result
			for b.Loop() {
				var err error
				if res, err = Solve(c.c.wall, c.c.classic, c.opt); err != nil {
					b.Fatal(err)
				}
			}
			b.ReportMetric(float64(res.Elements), "elements")
			b.ReportMetric(float64(res.DOFs), "dofs")
		})
	}
}

// BenchmarkKeyToResult is what the editor does on a key on the
// finite-element basis: the classic decomposition (which gives the piers)
// and the finite-element solve with every pier's forces under the lateral,
// dead and live loads. Target: under 20 ms on the typical wall.
func BenchmarkKeyToResult(b *testing.B) {
	w := typicalWall(b).wall
	w.Material = geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI}
	w.Load.Shear = 30 * geometry.Kip
	w.Gravity = geometry.Gravity{Dead: 15_000, Live: 6_000} // N/m
	b.ReportAllocs()
	var res *Result
	for b.Loop() {
		classic, err := pier.Solve(w)
		if err != nil {
			b.Fatal(err)
		}
		if res, err = Solve(w, classic, Options{}); err != nil {
			b.Fatal(err)
		}
	}
	b.ReportMetric(float64(res.Elements), "elements")
	b.ReportMetric(float64(len(res.Forces)), "piers")
}

package storey

import (
	"fmt"
	"math/rand/v2"
	"path/filepath"
	"testing"

	"pierwise/geometry"
)

// BenchmarkDistribute: the distribution alone, for storeys of 6 and 60
// walls (seeded random plans).
func BenchmarkDistribute(b *testing.B) {
	for _, n := range []int{6, 60} {
		rng := rand.New(rand.NewPCG(1, 0))
		members := make([]Member, n)
		for i := range members {
			d := Direction(i % 2)
			members[i] = Member{Direction: d, Position: 30 * rng.Float64(), Rigidity: 0.1 + rng.Float64()}
		}
		a := Action{Shear: 5e5, MassCenter: [2]float64{15, 15}, Size: [2]float64{30, 30}, Accidental: 0.05}
		b.Run(map[int]string{6: "walls=6", 60: "walls=60"}[n], func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Distribute(members, a); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkAnalyse: what the storey screen does after each wall edit
// (solve five walls, distribute, solve them again under their design shears).
func BenchmarkAnalyse(b *testing.B) {
	s, walls, err := LoadFiles(filepath.Join("..", "testdata", "storey", "workshop.toml"))
	if err != nil {
		b.Fatal(err)
	}
	b.Run("workshop", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			if _, err := Analyse(s, walls); err != nil {
				b.Fatal(err)
			}
		}
	})
}

// BenchmarkAnalyseFE: storey --basis fe on a synthetic 20-wall building
// (an invented 120 ft × 80 ft plan: ten 14 ft block walls each way, 20 to
// 40 ft long with a door and a window), the finite-element solves on a
// worker pool of one per core.
func BenchmarkAnalyseFE(b *testing.B) {
	s, walls := twentyWalls()
	for _, basis := range []geometry.Basis{geometry.BasisClassic, geometry.BasisFE} {
		s.Basis = basis
		b.Run("walls=20/basis="+basis.String(), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Analyse(s, walls); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func twentyWalls() (*Storey, []*geometry.Wall) {
	s := &Storey{
		Path: "twenty.toml", Units: geometry.US, Shear: 300 * geometry.Kip,
		MassCenter: [2]geometry.Length{60 * ft, 40 * ft}, Size: [2]geometry.Length{120 * ft, 80 * ft}, Accidental: 0.05, Ie: 1,
	}
	var walls []*geometry.Wall
	for i := 0; i < 20; i++ {
		d := Direction(i % 2)
		k := geometry.Length(i / 2)
		length := (20 + 2*k) * ft
		w := blockWall("wall", length, 14*ft,
			window("D1", 3*ft, 0, 3*ft, 7*ft),
			window("W1", length-10*ft, 4*ft, 5*ft, 4*ft))
		pos := k * 8 * ft // y of an x-wall: 0 … 72 ft
		if d == Y {
			pos = k * 12 * ft // x of a y-wall: 0 … 108 ft
		}
		s.Walls = append(s.Walls, WallRef{Name: fmt.Sprintf("W%d", i+1), File: "w.toml", Direction: d, Position: pos, lines: map[string]int{}})
		walls = append(walls, w)
	}
	return s, walls
}

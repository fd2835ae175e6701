package storey

import (
	"math/rand"
	"path/filepath"
	"testing"
)

// BenchmarkDistribute: the distribution alone, for storeys of 6 and 60
// walls (seeded random plans).
func BenchmarkDistribute(b *testing.B) {
	for _, n := range []int{6, 60} {
		rng := rand.New(rand.NewSource(1))
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

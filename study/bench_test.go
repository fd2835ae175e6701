package study

import (
	"fmt"
	"testing"

	"pierwise/geometry"
)

func BenchmarkCompare(b *testing.B) {
	w := annex()
	x, y := WithLayout(w, 0), WithLayout(w, 1)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Compare(x, y); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkSweep(b *testing.B) {
	w := annex()
	for _, step := range []geometry.Length{geometry.Foot, geometry.Inch} {
		b.Run(fmt.Sprintf("W1/step=%.0fin", float64(step/geometry.Inch)), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Sweep(w, "W1", AlongX, step); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

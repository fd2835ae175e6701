package storey_test

import (
	"fmt"

	"pierwise/storey"
)

// Two parallel walls of relative rigidity 4.5 and 5.5, 90 ft apart (Taly,
// Design of Reinforced Masonry Structures, 2nd ed., Example E7.12), with one
// cross wall, and 100 kip at mid-length. Lengths are in feet here: only
// ratios of rigidities and consistent lengths matter to the distribution.
//
// By hand: x_R = 5.5·90/10 = 49.5; e = 45 − 49.5 ± 0.05·90 = 0 or −9;
// J = 4.5·49.5² + 5.5·40.5² + 3·0² = 20047.5; with e = −9 the torsional
// shears are 100·(−9)·(−49.5)·4.5/J = +10 on A and −10 on B, so A takes
// 45 + 10 = 55 and B keeps its direct 55 (torsion never relieves a wall).
func ExampleDistribute() {
	walls := []storey.Member{
		{Name: "A", Direction: storey.Y, Position: 0, Rigidity: 4.5},
		{Name: "B", Direction: storey.Y, Position: 90, Rigidity: 5.5},
		{Name: "C", Direction: storey.X, Position: 20, Rigidity: 3},
	}
	d, err := storey.Distribute(walls, storey.Action{Shear: 100, MassCenter: [2]float64{45, 20}, Size: [2]float64{90, 40}, Accidental: 0.05})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("x_R = %.1f ft\n", d.CenterOfRigidity[storey.X])
	for i, w := range walls {
		g := d.Designs[i]
		fmt.Printf("%s: direct %.1f, design %.1f (%s)\n", w.Name, g.Direct, g.Shear, storey.CaseName(d, g.Case))
	}
	// Output:
	// x_R = 49.5 ft
	// A: direct 45.0, design 55.0 (y -acc)
	// B: direct 55.0, design 55.0 (direct)
	// C: direct 100.0, design 100.0 (direct)
}

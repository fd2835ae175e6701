package design_test

import (
	"fmt"

	"pierwise/design"
	"pierwise/geometry"
	"pierwise/pier"
)

// An invented 12 ft concrete masonry wall, fully grouted, checked as one
// pier under an earthquake shear of 30 kip as a special wall: strong enough,
// but its vertical bars at 48 in are farther apart than a special wall 10 ft
// high allows (40 in).
func ExampleCheckWall() {
	v, _ := geometry.ParseBarSpacing("#5@48in", geometry.US)
	h, _ := geometry.ParseBarSpacing("#4@16in", geometry.US)
	j, _ := geometry.ParseBarCount("2#5")
	w := design.Wall{Units: geometry.US, Length: 12 * geometry.Foot, Height: 10 * geometry.Foot,
		Thickness: 7.625 * geometry.Inch, Material: geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI}}
	vu := 30 * geometry.Kip
	loads := pier.PierLoads{
		Lateral: pier.Sections{Bottom: pier.Forces{Shear: vu, Moment: float64(vu) * float64(10*geometry.Foot)}, Top: pier.Forces{Shear: vu}},
		Dead:    pier.Sections{Bottom: pier.Forces{Axial: 40 * geometry.Kip}, Top: pier.Forces{Axial: 30 * geometry.Kip}},
	}
	res, err := design.CheckWall(design.Input{
		Wall:          w,
		Reinforcement: &design.Reinforcement{Fy: 60 * geometry.KSI, Vertical: v, Jamb: j, Horizontal: h},
		Settings:      design.Settings{Code: design.TMS402, Class: design.Special, SDS: 1.0, Rho: 1.0},
		Piers:         []design.PierInput{{Name: "P1", Rect: w.Rect(), Loads: loads}},
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	p := res.Piers[0]
	c := p.GoverningCheck()
	fmt.Printf("bars at %d places\n", len(p.Bars))
	fmt.Printf("governing: %s, %s at the %s, ratio %.2f\n", res.Combinations[c.Combination].Factors(res.Kind), c.Governs, c.Section, c.Ratio())
	fmt.Printf("P_u %.1f kip, M_u %.0f kip·ft, φM_n %.0f kip·ft\n", float64(c.Axial/geometry.Kip), c.Moment/float64(geometry.Kip)/float64(geometry.Foot), c.PhiMoment/float64(geometry.Kip)/float64(geometry.Foot))
	fmt.Printf("design shear %.1f kip, φV_n %.1f kip\n", float64(c.DesignShear/geometry.Kip), float64(c.PhiShear/geometry.Kip))
	if p.Requirement >= 0 {
		r := p.Require[p.Requirement]
		fmt.Printf("fails: %s (%s), ratio %.2f\n", r.Name, r.Clause, r.Ratio)
	}
	fmt.Println("passes:", p.OK)
	// Output:
	// bars at 4 places
	// governing: 0.70D + 1.00Q_E (+x), flexure at the bottom, ratio 0.41
	// P_u 28.0 kip, M_u 300 kip·ft, φM_n 725 kip·ft
	// design shear 60.0 kip, φV_n 148.6 kip
	// fails: vertical spacing ≤ min(L/3, H/3, 48 in) (TMS 402-22 §7.3.2.6 (clause number from memory)), ratio 1.20
	// passes: false
}

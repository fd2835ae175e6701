package design

import (
	"pierwise/geometry"
	"pierwise/pier"
)

// classicLoads is the lateral load case of a leaf pier from the classic
// method's shear and moment: a cantilever pier carries V h at its base and
// nothing at its top; a fixed-fixed pier V h/2 at both ends, of opposite
// signs. No gravity.
func classicLoads(p pier.Pier) pier.PierLoads {
	v := p.Shear
	var l pier.PierLoads
	if p.Support == geometry.Cantilever {
		l.Lateral.Bottom = pier.Forces{Shear: v, Moment: float64(v) * p.H()}
		l.Lateral.Top = pier.Forces{Shear: v}
	} else {
		l.Lateral.Bottom = pier.Forces{Shear: v, Moment: float64(v) * p.H() / 2}
		l.Lateral.Top = pier.Forces{Shear: v, Moment: -float64(v) * p.H() / 2}
	}
	return l
}

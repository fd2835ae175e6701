package design

import (
	"strconv"

	"pierwise/geometry"
	"pierwise/pier"
)

// Combination is one strength-design load combination of ASCE 7-22 §2.3
// with the lateral load in one direction: factors on the dead (D), live (L)
// and lateral (Q_E or W) load cases. Lateral is signed: +1.3 is the load
// toward +x times ρ = 1.3.
type Combination struct {
	Name    string // the combination as the standard writes it, e.g. "(1.2 + 0.2S_DS)D + ρQ_E + L"
	Clause  string // e.g. "ASCE 7-22 §2.3.6, combination 6"
	Dir     int    // +1: lateral load toward +x; −1: toward −x
	Dead    float64
	Live    float64
	Lateral float64
}

// Factors writes the combination with its numbers, e.g. "1.40D + 1.30Q_E + 1.00L (−x)".
func (c Combination) Factors(kind LoadKind) string {
	q := "Q_E"
	if kind == Wind {
		q = "W"
	}
	f := func(v float64) string { return strconv.FormatFloat(v, 'f', 2, 64) }
	lat := c.Lateral
	if lat < 0 {
		lat = -lat
	}
	s := f(c.Dead) + "D + " + f(lat) + q
	if c.Live != 0 {
		s += " + " + f(c.Live) + "L"
	}
	if c.Dir < 0 {
		return s + " (−x)"
	}
	return s + " (+x)"
}

// Combinations returns the combinations a pier is checked for
// (docs/method.md §8), each with the lateral load toward +x and then −x:
//
//   - seismic, ASCE 7-22 §2.3.6 combinations 6 and 7 with E = ρQ_E ± 0.2S_DS·D
//     (§12.4.2): (1.2 + 0.2S_DS)D + ρQ_E + L and (0.9 − 0.2S_DS)D + ρQ_E;
//   - wind, ASCE 7-22 §2.3.1 combinations 4 and 5: 1.2D + 1.0W + L and
//     0.9D + 1.0W.
//
// The live load takes its full factor 1.0 (the standard's exception that
// allows 0.5L for most occupancies is not applied: conservative) and snow,
// roof live and rain loads are not among the wall's loads. Combination
// numbers are from memory of ASCE 7-22.
func Combinations(s Settings) []Combination {
	var base []Combination
	if s.Kind == Wind {
		base = []Combination{
			{Name: "1.2D + 1.0W + L", Clause: "ASCE 7-22 §2.3.1, combination 4", Dead: 1.2, Live: 1.0, Lateral: 1.0},
			{Name: "0.9D + 1.0W", Clause: "ASCE 7-22 §2.3.1, combination 5", Dead: 0.9, Lateral: 1.0},
		}
	} else {
		rho := s.Rho
		if rho == 0 {
			rho = 1
		}
		base = []Combination{
			{Name: "(1.2 + 0.2S_DS)D + ρQ_E + L", Clause: "ASCE 7-22 §2.3.6, combination 6; §12.4.2.3",
				Dead: 1.2 + 0.2*s.SDS, Live: 1.0, Lateral: rho},
			{Name: "(0.9 − 0.2S_DS)D + ρQ_E", Clause: "ASCE 7-22 §2.3.6, combination 7; §12.4.2.3",
				Dead: 0.9 - 0.2*s.SDS, Lateral: rho},
		}
	}
	out := make([]Combination, 0, 2*len(base))
	for _, c := range base {
		c.Dir = 1
		out = append(out, c)
		c.Dir, c.Lateral = -1, -c.Lateral
		out = append(out, c)
	}
	return out
}

// Apply superposes the load cases of one pier with the combination's factors.
func (c Combination) Apply(l pier.PierLoads) pier.Sections {
	f := func(d, lv, q pier.Forces) pier.Forces {
		return pier.Forces{
			Shear:  geometry.Force(c.Dead*float64(d.Shear) + c.Live*float64(lv.Shear) + c.Lateral*float64(q.Shear)),
			Axial:  geometry.Force(c.Dead*float64(d.Axial) + c.Live*float64(lv.Axial) + c.Lateral*float64(q.Axial)),
			Moment: c.Dead*d.Moment + c.Live*lv.Moment + c.Lateral*q.Moment,
		}
	}
	return pier.Sections{
		Bottom: f(l.Dead.Bottom, l.Live.Bottom, l.Lateral.Bottom),
		Middle: f(l.Dead.Middle, l.Live.Middle, l.Lateral.Middle),
		Top:    f(l.Dead.Top, l.Live.Top, l.Lateral.Top),
	}
}

package design

import "math"

// Es is the modulus of elasticity of reinforcing steel, 29,000 ksi (TMS
// 402-22 §4.2.2 and ACI 318-19 §20.2.2.2; clause numbers from memory).
const Es = 29000 * 6.894757293168361e6 // Pa

// strip is a part of the section's compression width: between u0 and u1
// (metres from the pier's left end) the section is w thick.
type strip struct{ u0, u1, w float64 }

// Section is a pier's horizontal section for strain compatibility
// (docs/method.md §8): the compression zone is a rectangular stress block of
// BlockStress over BlockDepth·c from the compressed end, bars are
// elastic–perfectly plastic at Fy, and the section carries no tension of its
// own. Moments are about the pier's mid-length.
type Section struct {
	Length float64 // pier length, m
	Bars   []Bar   // X from the pier's left end here
	Area   float64 // net area A_n (A_g for concrete), m²

	Fy          float64 // Pa
	EpsU        float64 // ε_mu or ε_cu
	BlockStress float64 // 0.80 f'm or 0.85 f'c, Pa
	BlockDepth  float64 // 0.80 or β_1
	CompBars    bool    // bars carry compression (concrete; masonry bars are unconfined)
	Concrete    bool    // φ by net tensile strain (ACI 318-19 Table 21.2.2); else φ = PhiFlex
	PhiFlex     float64 // masonry φ for flexure and axial load
	PnMax       float64 // nominal axial compression limit, N

	strips []strip
}

// state is the section at one neutral-axis depth.
type state struct {
	p, m float64 // nominal axial force (compression +) and moment magnitude toward the compressed end
	epsT float64 // net tensile strain of the extreme tension bar (tension +)
}

// at evaluates the section with compression at the right end (right) or the
// left end, neutral axis c from that end.
func (s *Section) at(c float64, right bool, fy float64, compBars bool) state {
	L := s.Length
	half := L / 2
	a := s.BlockDepth * c
	if a > L {
		a = L
	}
	var p, m float64
	for _, st := range s.strips {
		// the strip's extent measured from the compressed end
		d0, d1 := st.u0, st.u1
		if right {
			d0, d1 = L-st.u1, L-st.u0
		}
		if d0 >= a {
			continue
		}
		if d1 > a {
			d1 = a
		}
		f := s.BlockStress * st.w * (d1 - d0)
		p += f
		m += f * (half - (d0+d1)/2)
	}
	dMax := 0.0
	k := Es * s.EpsU / c // stress per unit of (c − d)
	for _, b := range s.Bars {
		d := b.X
		if right {
			d = L - b.X
		}
		if d > dMax {
			dMax = d
		}
		fs := k * (c - d)
		if fs > fy {
			fs = fy
		} else if fs < -fy {
			fs = -fy
		}
		if fs > 0 {
			if !compBars {
				continue
			}
			if d < a && s.Concrete {
				fs -= s.BlockStress // the concrete the bar displaces
			}
		}
		f := fs * b.Area
		p += f
		m += f * (half - d)
	}
	return state{p: p, m: m, epsT: s.EpsU * (dMax - c) / c}
}

// phi is the strength-reduction factor for axial load and flexure at a
// state: ACI 318-19 Table 21.2.2 (other than spiral), 0.65 at ε_t ≤ ε_ty,
// 0.90 at ε_t ≥ ε_ty + 0.003, linear between; masonry PhiFlex.
func (s *Section) phi(st state) float64 {
	if !s.Concrete {
		return s.PhiFlex
	}
	ety := s.Fy / Es
	switch {
	case st.epsT <= ety:
		return 0.65
	case st.epsT >= ety+0.003:
		return 0.90
	}
	return 0.65 + 0.25*(st.epsT-ety)/0.003
}

// Strength is the flexural strength of a section at one axial load.
type Strength struct {
	PhiM     float64 // φM_n, N·m (≥ 0)
	Mn       float64 // M_n, N·m
	Phi      float64
	C        float64 // neutral-axis depth, m
	EpsT     float64 // net tensile strain of the extreme tension bar
	Exceeded bool    // the axial load is outside the section's range: no moment strength
}

// PhiPMax returns the design axial compression limit φP_n,max and the design
// tension limit φP_nt (a positive number), N.
func (s *Section) PhiPMax() (comp, tens float64) {
	var ast float64
	for _, b := range s.Bars {
		ast += b.Area
	}
	if s.Concrete {
		return 0.65 * s.PnMax, 0.90 * s.Fy * ast
	}
	return s.PhiFlex * s.PnMax, s.PhiFlex * s.Fy * ast
}

// MomentAt returns φM_n at the factored axial load pu (compression +) with
// the compressed end at the right (a positive moment) or the left. It solves
// φ(c)·P_n(c) = pu for the neutral-axis depth c by regula falsi (Illinois)
// on a bracket that always holds a root.
func (s *Section) MomentAt(pu float64, right bool) Strength {
	return s.momentAt(pu, right, s.Fy, 1)
}

// momentAt is MomentAt with the bars' yield stress fy (1.25 f_y for probable
// strength) and a fixed φ when phiFixed > 0 is wanted (phiMode 0: the code's φ).
func (s *Section) momentAt(pu float64, right bool, fy float64, mode int) Strength {
	comp, tens := s.PhiPMax()
	if mode == 0 {
		// nominal: φ = 1 and the nominal limits
		comp = s.PnMax
		tens = tens / s.phiTension()
	}
	if pu >= comp || pu <= -tens {
		return Strength{Exceeded: true}
	}
	g := func(c float64) (float64, state, float64) {
		st := s.at(c, right, fy, s.CompBars)
		ph := 1.0
		if mode != 0 {
			ph = s.phi(st)
		}
		return ph*st.p - pu, st, ph
	}
	lo := 1e-9 * s.Length
	// At c → 0 every bar yields in tension and the block vanishes.
	var ast float64
	for _, b := range s.Bars {
		ast += b.Area
	}
	phiT := s.phiTension()
	if mode == 0 {
		phiT = 1
	}
	glo := -phiT*fy*ast - pu
	hi := s.Length / s.BlockDepth
	ghi, st, ph := g(hi)
	for i := 0; ghi < 0 && i < 60; i++ {
		lo, glo = hi, ghi
		hi *= 2
		ghi, st, ph = g(hi)
	}
	if glo > 0 || ghi < 0 {
		return Strength{Exceeded: true}
	}
	// Illinois regula falsi: a bracket [lo, hi] with g(lo) ≤ 0 ≤ g(hi).
	tol := 1e-9 * (comp + tens)
	side := 0
	c := hi
	for i := 0; i < 100; i++ {
		c = (lo*ghi - hi*glo) / (ghi - glo)
		if !(c > lo && c < hi) {
			c = (lo + hi) / 2
		}
		var gc float64
		gc, st, ph = g(c)
		if math.Abs(gc) <= tol || hi-lo <= 1e-12*s.Length {
			break
		}
		if gc < 0 {
			lo, glo = c, gc
			if side == -1 {
				ghi /= 2
			}
			side = -1
		} else {
			hi, ghi = c, gc
			if side == 1 {
				glo /= 2
			}
			side = 1
		}
	}
	mn := st.m
	if mn < 0 {
		mn = 0
	}
	return Strength{PhiM: ph * mn, Mn: mn, Phi: ph, C: c, EpsT: st.epsT}
}

// phiTension is φ for a section in pure tension.
func (s *Section) phiTension() float64 {
	if s.Concrete {
		return 0.90
	}
	return s.PhiFlex
}

// NominalMomentAt returns M_n at the nominal axial load pn, and the
// probable strength M_pr with 1.25 f_y when probable is true (φ = 1 both).
func (s *Section) NominalMomentAt(pn float64, right, probable bool) float64 {
	fy := s.Fy
	if probable {
		fy *= 1.25
	}
	st := s.momentAt(pn, right, fy, 0)
	return st.Mn
}

// PMPoint is one point of an interaction curve: axial force (compression +)
// and moment (+: compressing the pier's right end), N and N·m.
type PMPoint struct {
	P, M float64
}

// Curve returns the design interaction curve (φP_n, φM_n) of the section, n
// points per side (n ≥ 2): from pure tension up the positive-moment side to
// the compression limit and back down the negative side, a closed outline
// for plotting.
func (s *Section) Curve(n int) []PMPoint {
	if n < 2 {
		n = 2
	}
	comp, tens := s.PhiPMax()
	var pts []PMPoint
	for _, right := range []bool{true, false} {
		side := make([]PMPoint, 0, n+1)
		for i := 0; i <= n; i++ {
			p := -tens + (comp+tens)*float64(i)/float64(n)
			m := 0.0
			if i > 0 && i < n {
				m = s.MomentAt(p, right).PhiM
			}
			if !right {
				m = -m
			}
			side = append(side, PMPoint{P: p, M: m})
		}
		if !right {
			for i, j := 0, len(side)-1; i < j; i, j = i+1, j-1 {
				side[i], side[j] = side[j], side[i]
			}
			side = side[1:]
		}
		pts = append(pts, side...)
	}
	return pts
}

// Balanced returns the balanced point with the right end compressed: the
// neutral-axis depth at which the extreme tension bar just yields while
// the compressed end reaches the ultimate strain, and its nominal P and M.
func (s *Section) Balanced() (c, p, m float64) {
	dMax := 0.0
	for _, b := range s.Bars {
		if d := s.Length - b.X; d > dMax {
			dMax = d
		}
	}
	c = s.EpsU / (s.EpsU + s.Fy/Es) * dMax
	st := s.at(c, true, s.Fy, s.CompBars)
	return c, st.p, st.m
}

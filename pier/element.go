package pier

import (
	"fmt"
	"math"
	"strconv"

	"pierwise/geometry"
)

// Default element parameters (docs/method.md §2, §3): E_v = 0.4 E and gross-section
// stiffness.
const (
	DefaultG  = 0.4
	DefaultKf = 1.0
	DefaultKv = 1.0
)

// ShearForm is the form factor of a rectangular section for shear
// deflection (1.2 = 1/κ with Timoshenko's κ = 5/6).
const ShearForm = 1.2

// Params are the dimensionless parameters of the element formulas:
// G = E_v/E, Kf and Kv the stiffness modifiers of flexure (I) and shear
// (area). A zero field means its default (0.4, 1, 1), so Params{} is the
// textbook case.
type Params struct {
	G, Kf, Kv float64
}

// withDefaults replaces zero fields by their defaults.
func (p Params) withDefaults() Params {
	if p.G == 0 {
		p.G = DefaultG
	}
	if p.Kf == 0 {
		p.Kf = DefaultKf
	}
	if p.Kv == 0 {
		p.Kv = DefaultKv
	}
	return p
}

// validate says whether every parameter is positive and finite (after
// defaults).
func (p Params) validate() error {
	for _, f := range []struct {
		name string
		v    float64
	}{{"E_v/E", p.G}, {"flexure stiffness modifier", p.Kf}, {"shear stiffness modifier", p.Kv}} {
		if !(f.v > 0) || math.IsInf(f.v, 0) {
			return fmt.Errorf("pier: %s must be a positive number, got %g", f.name, f.v)
		}
	}
	return nil
}

// Element returns the relative deflection (E = 1, t = 1, V = 1) of a solid
// rectangular element of height h and length l, split into bending and
// shear (docs/method.md §2), with r = h/l:
//
//	cantilever:  d = 4·r³/kf + 1.2·r/(g·kv)
//	fixed-fixed: d =   r³/kf + 1.2·r/(g·kv)
//
// h and l must be positive; the result is then finite and positive.
func Element(h, l float64, s geometry.Support, p Params) Parts {
	p = p.withDefaults()
	r := h / l
	bend := r * r * r / p.Kf
	if s == geometry.Cantilever {
		bend *= 4
	}
	return Parts{Bending: bend, Shear: ShearForm * r / (p.G * p.Kv)}
}

// ParamsFor returns the element parameters of a wall: G from the moduli
// (0.4 when they are unknown) and the wall's stiffness modifiers (1 when
// unset).
func ParamsFor(w *geometry.Wall, m Moduli) Params {
	p := Params{G: DefaultG, Kf: DefaultKf, Kv: DefaultKv}
	if m.E > 0 && m.Ev > 0 {
		p.G = float64(m.Ev / m.E)
	}
	if w != nil {
		if w.Stiffness.Flexure != 0 {
			p.Kf = w.Stiffness.Flexure
		}
		if w.Stiffness.Shear != 0 {
			p.Kv = w.Stiffness.Shear
		}
	}
	return p
}

// Sources of the modulus rules (docs/method.md §2.1).
const (
	srcTMS     = "TMS 402-22 §4.2.2, clause number from memory"
	srcACI     = "ACI 318-19 §19.2.2.1"
	srcShearCo = "common practice: isotropic, ν = 0.25"
)

// MaterialModuli returns E and E_v of a material and where each came from,
// with the US form of the concrete rule (57,000 √f'c psi). See
// MaterialModuliFor.
func MaterialModuli(m geometry.Material) (Moduli, error) {
	return MaterialModuliFor(m, geometry.US)
}

// MaterialModuliFor returns E and E_v of a material (docs/method.md §3):
//
//   - concrete masonry E_m = 900 f'm, clay masonry E_m = 700 f'm, E_v = 0.4 E_m
//     (TMS 402-22 §4.2.2, clause number from memory; §1.8.2.2 in the 2008
//     edition);
//   - concrete E_c = 57,000 √f'c psi (US) or 4,700 √f'c MPa (SI), ACI 318-19
//     §19.2.2.1;
//     E_v = 0.4 E_c (common practice, ν = 0.25);
//   - custom: E given, E_v given or 0.4 E.
//
// A given Modulus or ShearModulus overrides the rule. The system picks the
// form of the concrete rule (the two differ by about 0.7 %).
func MaterialModuliFor(m geometry.Material, sys geometry.System) (Moduli, error) {
	bad := func(what string, v geometry.Stress) error {
		return fmt.Errorf("pier: material %s must be a positive number, got %g Pa", what, float64(v))
	}
	finiteNonNeg := func(v geometry.Stress) bool { return v >= 0 && !math.IsInf(float64(v), 0) }
	if !finiteNonNeg(m.Strength) {
		return Moduli{}, bad("strength", m.Strength)
	}
	if !finiteNonNeg(m.Modulus) {
		return Moduli{}, bad("modulus", m.Modulus)
	}
	if !finiteNonNeg(m.ShearModulus) {
		return Moduli{}, bad("shear modulus", m.ShearModulus)
	}

	var mod Moduli
	var eSrc, vSrc string
	switch {
	case m.Modulus > 0:
		mod.E = m.Modulus
		eSrc = "E given"
		vSrc = "E_v = 0.4 E (" + srcShearCo + ")"
		if m.Kind == geometry.ConcreteMasonry || m.Kind == geometry.ClayMasonry {
			vSrc = "E_v = 0.4 E (" + srcTMS + ")"
		}
	case m.Kind == geometry.Custom:
		return Moduli{}, fmt.Errorf("pier: a custom material needs its modulus E")
	case m.Strength <= 0:
		return Moduli{}, bad("strength (f'm or f'c)", m.Strength)
	case m.Kind == geometry.ConcreteMasonry:
		mod.E = 900 * m.Strength
		eSrc = "E_m = 900 f'm (" + srcTMS + ", concrete masonry)"
		vSrc = "E_v = 0.4 E_m (" + srcTMS + ")"
	case m.Kind == geometry.ClayMasonry:
		mod.E = 700 * m.Strength
		eSrc = "E_m = 700 f'm (" + srcTMS + ", clay masonry)"
		vSrc = "E_v = 0.4 E_m (" + srcTMS + ")"
	case m.Kind == geometry.Concrete:
		if sys == geometry.SI {
			mod.E = 4700 * geometry.Megapascal * geometry.Stress(math.Sqrt(float64(m.Strength/geometry.Megapascal)))
			eSrc = "E_c = 4,700 √f'c MPa (" + srcACI + ")"
		} else {
			mod.E = 57000 * geometry.PSI * geometry.Stress(math.Sqrt(float64(m.Strength/geometry.PSI)))
			eSrc = "E_c = 57,000 √f'c psi (" + srcACI + ")"
		}
		vSrc = "E_v = 0.4 E_c (" + srcShearCo + ")"
	default:
		return Moduli{}, fmt.Errorf("pier: unknown material kind %d", m.Kind)
	}
	nu := m.Poisson
	if math.IsNaN(nu) || nu < 0 || nu >= 0.5 {
		return Moduli{}, fmt.Errorf("pier: Poisson's ratio must lie from 0 to below 0.5, got %g", nu)
	}
	switch {
	case m.ShearModulus > 0:
		mod.Ev = m.ShearModulus
		vSrc = "E_v given"
	case nu > 0:
		// Isotropic elasticity: G = E/(2(1+ν)).
		mod.Ev = mod.E / geometry.Stress(2*(1+nu))
		vSrc = "E_v = E/(2(1+ν)) with ν = " + strconv.FormatFloat(nu, 'g', -1, 64) + " given"
	default:
		mod.Ev = DefaultG * mod.E
	}
	if !(mod.E > 0) || math.IsInf(float64(mod.E), 0) {
		return Moduli{}, bad("modulus", mod.E)
	}
	mod.ESource, mod.EvSource = eSrc, vSrc
	mod.Source = eSrc + "; " + vSrc
	return mod, nil
}

// materialGiven reports whether the user said anything about the
// material's stiffness; without it only relative values are computed.
func materialGiven(m geometry.Material) bool {
	return m.Strength != 0 || m.Modulus != 0 || m.ShearModulus != 0
}

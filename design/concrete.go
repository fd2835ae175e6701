package design

import (
	"math"

	"pierwise/geometry"
)

// ACI 318-19 strength-reduction factors for shear (Table 21.2.1 and §21.2.4.1).
const (
	PhiConcreteShear        = 0.75
	PhiConcreteShearSeismic = 0.60
)

// Beta1 is β_1 of ACI 318-19 Table 22.2.2.4.3: 0.85 up to f'c = 4000 psi,
// 0.05 less per 1000 psi above, not below 0.65.
func Beta1(fc geometry.Stress) float64 {
	f := psi(float64(fc))
	b := 0.85 - 0.05*(f-4000)/1000
	return math.Max(0.65, math.Min(0.85, b))
}

// AlphaC is α_c of ACI 318-19 §11.5.4.3 and §18.10.4.1: 3.0 at h_w/l_w ≤ 1.5,
// 2.0 at h_w/l_w ≥ 2.0, linear between.
func AlphaC(hwlw float64) float64 {
	switch {
	case hwlw <= 1.5:
		return 3
	case hwlw >= 2:
		return 2
	}
	return 3 - (hwlw-1.5)/0.5
}

// ShearACI is the nominal in-plane shear strength of a concrete wall, ACI
// 318-19 Eq. (11.5.4.3) and (18.10.4.1), normal-weight concrete (λ = 1), in N:
//
//	V_n = A_cv (α_c λ √f'c + ρ_t f_y) ≤ 8 A_cv √f'c  (§11.5.4.2, §18.10.4.4)
//
// with √f'c in psi and its coefficients in psi units. acv in m², fc and fy in
// Pa.
func ShearACI(acv, fc, hwlw, rhoT, fy float64) float64 {
	root := rootPsi(fc)
	vn := acv * (AlphaC(hwlw)*root + rhoT*fy)
	return math.Min(vn, 8*acv*root)
}

// concrete checks a concrete pier by ACI 318-19.
type concrete struct {
	pierBase
	sec  *Section
	acv  float64
	rhoT float64 // distributed horizontal ratio
	rhoL float64 // distributed vertical ratio
	fy   float64
	hwlw float64
}

func newConcrete(in *Input, p PierInput, bars []Bar) *concrete {
	b := newBase(in, p)
	r := in.Reinforcement
	local := localBars(bars, p.Rect.X0)
	ag := b.L * b.t
	var ast float64
	for _, x := range local {
		ast += x.Area
	}
	fy := float64(r.Fy)
	sec := &Section{
		Length: b.L, Bars: local, Area: ag, Fy: fy, EpsU: 0.003, // ACI 318-19 §22.2.2.1
		BlockStress: 0.85 * b.fc, BlockDepth: Beta1(in.Wall.Material.Strength), // §22.2.2.4.1
		CompBars: true, Concrete: true,
		// P_n,max = 0.80 P_o, P_o = 0.85 f'c (A_g − A_st) + f_y A_st
		// (ACI 318-19 Table 22.4.2.1 and §22.4.2.2).
		PnMax:  0.80 * (0.85*b.fc*(ag-ast) + fy*ast),
		strips: []strip{{0, b.L, b.t}},
	}
	c := &concrete{pierBase: b, sec: sec, acv: ag, fy: fy, hwlw: b.spanRatio()}
	n := float64(layers(in.Wall, r))
	if r.Horizontal.Spacing > 0 {
		c.rhoT = r.Horizontal.AreaPerLength() * n / b.t
	}
	if r.Vertical.Spacing > 0 {
		c.rhoL = r.Vertical.AreaPerLength() * n / b.t
	}
	return c
}

func (c *concrete) section() *Section { return c.sec }

func (c *concrete) check(k *Check, combo Combination) {
	pu, vu, mu := float64(k.Axial), float64(k.Shear), k.Moment
	st := flexure(c.sec, k, pu, mu)
	k.PhiFlexValue = st.Phi
	if st.Exceeded {
		k.PhiFlexValue = 0.65
		if pu < 0 {
			k.PhiFlexValue = 0.90
		}
	}
	vn := ShearACI(c.acv, c.fc, c.hwlw, c.rhoT, c.fy)
	phi := PhiConcreteShear
	k.DesignShear = geometry.Force(math.Abs(vu))
	if c.in.Settings.Class == Special && c.in.Settings.Kind == Seismic && vu != 0 {
		right := compRight(mu)
		if c.hwlw > 1.5 {
			// V_e = Ω_v ω_v V_u ≤ 3 V_u (ACI 318-19 §18.10.3.1), Ω_v the
			// larger of 1.5 and M_pr/M_u (Table 18.10.3.1.2), ω_v = 1.0 for
			// one storey. The amplified shear already reaches the shear at
			// the flexural strength, so φ stays 0.75 (ACI Code Case on
			// 318-19 §21.2.4.1, from memory).
			omega := 1.5
			if mu != 0 {
				omega = math.Max(omega, c.sec.NominalMomentAt(pu, right, true)/math.Abs(mu))
			}
			k.DesignShear = geometry.Force(math.Min(omega, 3) * math.Abs(vu))
		} else if mu != 0 {
			// Ω_v = 1.0 at h_wcs/l_w ≤ 1.5; φ = 0.60 where V_n is less than
			// the shear at the nominal flexural strength (§21.2.4.1).
			mn := c.sec.NominalMomentAt(pu, right, false)
			if vn < math.Abs(vu)*mn/math.Abs(mu) {
				phi = PhiConcreteShearSeismic
			}
		}
	}
	k.PhiShearValue = phi
	k.PhiShear = geometry.Force(phi * vn)
	k.ShearRatio = ratio(float64(k.DesignShear), float64(k.PhiShear))
}

// requirements are the minimum distributed reinforcement ratios of ACI
// 318-19 §11.6 (and §18.10.2.1 for special walls), checked with the largest
// design shear of the pier's checks.
func (c *concrete) requirements(checks []Check) []Requirement {
	vmax := 0.0
	for _, k := range checks {
		vmax = math.Max(vmax, float64(k.DesignShear))
	}
	root := rootPsi(c.fc)
	var minL, minT float64
	var clause string
	r := c.in.Reinforcement
	special := c.in.Settings.Class == Special
	switch {
	case special && vmax > c.acv*root:
		minL, minT, clause = 0.0025, 0.0025, "ACI 318-19 §18.10.2.1"
	case vmax <= 0.5*PhiConcreteShear*AlphaC(c.hwlw)*root*c.acv:
		// Table 11.6.1: deformed bars not larger than #5 (16 mm) with
		// f_y ≥ 60,000 psi: 0.0012 and 0.0020; other bars 0.0015 and 0.0025.
		small := r.Vertical.Size.Diameter <= 0.625*geometry.Inch+1e-6 && r.Fy >= 60*geometry.KSI-1
		minL, minT = 0.0015, 0.0025
		if small {
			minL, minT = 0.0012, 0.0020
		}
		clause = "ACI 318-19 §11.6.1, Table 11.6.1"
	default:
		// §11.6.2: ρ_t ≥ 0.0025; ρ_l ≥ 0.0025 + 0.5(2.5 − h_w/l_w)(ρ_t − 0.0025),
		// not less than 0.0025 (the relief "need not exceed the ρ_t required
		// for strength" is not taken).
		minT = 0.0025
		minL = RhoLMin(c.hwlw, c.rhoT)
		clause = "ACI 318-19 §11.6.2"
	}
	mk := func(name string, req, prov float64) Requirement {
		q := Requirement{Name: name, Clause: clause, Required: req, Provided: prov}
		if prov > 0 {
			q.Ratio = math.Min(req/prov, RatioCap)
		} else {
			q.Ratio = RatioCap
		}
		q.OK = q.Ratio <= 1+1e-9
		return q
	}
	return []Requirement{
		mk("ρ_l ≥ "+fmtG(minL), minL, c.rhoL),
		mk("ρ_t ≥ "+fmtG(minT), minT, c.rhoT),
	}
}

// RhoLMin is the minimum distributed vertical ratio of ACI 318-19 Eq.
// (11.6.2): 0.0025 + 0.5(2.5 − h_w/l_w)(ρ_t − 0.0025), not less than 0.0025.
func RhoLMin(hwlw, rhoT float64) float64 {
	return math.Max(0.0025, 0.0025+0.5*(2.5-hwlw)*(rhoT-0.0025))
}

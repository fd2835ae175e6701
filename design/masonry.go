package design

import (
	"math"

	"pierwise/geometry"
)

// TMS 402-22 strength-reduction factors (§9.1.4, clause numbers from memory).
const (
	PhiMasonryShear = 0.80 // shear
	PhiMasonryFlex  = 0.90 // reinforced masonry, flexure and axial load
	PhiMasonryPlain = 0.60 // unreinforced masonry, flexure and axial load
	// γ_g, partially grouted shear walls: 0.75 as in TMS 402-16 (clause
	// number from memory); TMS reports that the 2022 edition changed this
	// factor, to a value not yet read (docs/method.md §8.4).
	GammaPartialGrout = 0.75
)

// masonry checks a reinforced masonry pier by TMS 402-22 Chapter 9.
type masonry struct {
	pierBase
	sec   *Section
	an    float64 // net area, m²
	gamma float64 // γ_g
	avs   float64 // A_v/s of the horizontal bars, m²/m
	fy    float64
}

// masonryStrips builds the compression width of a masonry pier: the full
// thickness when fully grouted; two face shells plus the grouted cells
// (one cell module at each bar) when partially grouted.
func masonryStrips(in *Input, L, t float64, bars []Bar) ([]strip, float64) {
	r := in.Reinforcement
	if r == nil || r.Grout == FullGrout {
		return []strip{{0, L, t}}, L * t
	}
	fs := float64(r.FaceShell)
	if fs == 0 {
		fs = float64(FaceShellDefault(in.Wall.Thickness))
	}
	st := []strip{{0, L, 2 * fs}}
	area := 2 * fs * L
	for _, c := range mergeCells(bars, L, cellModule(in.Wall.Units)) {
		st = append(st, strip{c[0], c[1], t - 2*fs})
		area += (c[1] - c[0]) * (t - 2*fs)
	}
	return st, area
}

func newMasonry(in *Input, p PierInput, bars []Bar) *masonry {
	b := newBase(in, p)
	r := in.Reinforcement
	local := localBars(bars, p.Rect.X0)
	strips, an := masonryStrips(in, b.L, b.t, local)
	epsU := 0.0025 // concrete masonry (TMS 402-22 §9.3.2(c), clause number from memory)
	if in.Wall.Material.Kind == geometry.ClayMasonry {
		epsU = 0.0035 // clay masonry
	}
	sec := &Section{
		Length: b.L, Bars: local, Area: an, Fy: float64(r.Fy), EpsU: epsU,
		BlockStress: 0.80 * b.fc, BlockDepth: 0.80, CompBars: false, PhiFlex: PhiMasonryFlex,
		// P_n = 0.80[0.80 f'm (A_n − A_st) + f_y A_st] (TMS 402-22 §9.3.4.1.1,
		// clause number from memory) with the unconfined bars left out and
		// the in-plane slenderness factor taken as 1.
		PnMax:  0.80 * 0.80 * b.fc * an,
		strips: strips,
	}
	m := &masonry{pierBase: b, sec: sec, an: an, gamma: 1, fy: float64(r.Fy)}
	if r.Grout == PartialGrout {
		m.gamma = GammaPartialGrout
	}
	if r.Horizontal.Spacing > 0 {
		m.avs = r.Horizontal.AreaPerLength() * float64(layers(in.Wall, r))
	}
	return m
}

func (m *masonry) section() *Section { return m.sec }

// ShearTMS is the nominal in-plane shear strength of reinforced masonry,
// TMS 402-22 §9.3.4.1.2 (clause number from memory), in N:
//
//	V_n = (V_nm + V_ns) γ_g
//	V_nm = [4.0 − 1.75 (M_u/(V_u d_v))] A_nv √f'm + 0.25 P_u
//	V_ns = 0.5 (A_v/s) f_y d_v
//
// with M_u/(V_u d_v) positive and not above 1.0, and V_n not above
// 6 A_nv √f'm γ_g at M_u/(V_u d_v) ≤ 0.25, 4 A_nv √f'm γ_g at ≥ 1.0, linear
// between. √f'm is in psi and the coefficients are in psi units. an in m²,
// fm and fy in Pa, pu in N (compression +), dv in m, avs in m²/m.
func ShearTMS(an, fm, pu, mvd, dv, avs, fy, gamma float64) float64 {
	root := rootPsi(fm)
	vnm := (4.0-1.75*mvd)*an*root + 0.25*pu
	if vnm < 0 {
		vnm = 0
	}
	vns := 0.5 * avs * fy * dv
	vn := (vnm + vns) * gamma
	capCoef := 6.0
	switch {
	case mvd >= 1:
		capCoef = 4
	case mvd > 0.25:
		capCoef = 6 - 2*(mvd-0.25)/0.75
	}
	return math.Min(vn, capCoef*an*root*gamma)
}

func (m *masonry) check(c *Check, combo Combination) {
	pu, vu, mu := float64(c.Axial), float64(c.Shear), c.Moment
	flexure(m.sec, c, pu, mu)
	c.PhiFlexValue = PhiMasonryFlex
	dv := m.L
	vn := ShearTMS(m.an, m.fc, pu, mvd(mu, vu, dv), dv, m.avs, m.fy, m.gamma)
	c.PhiShearValue = PhiMasonryShear
	c.PhiShear = geometry.Force(PhiMasonryShear * vn)
	c.DesignShear = geometry.Force(math.Abs(vu))
	if m.in.Settings.Class == Special && m.in.Settings.Kind == Seismic && vu != 0 {
		c.DesignShear = geometry.Force(SpecialMasonryShear(vu, mu, m.sec.NominalMomentAt(pu, compRight(mu), false)))
	}
	c.ShearRatio = ratio(float64(c.DesignShear), float64(c.PhiShear))
}

// flexure fills the flexural part of check c of section sec under P_u = pu
// and M_u = mu (both codes): φM_n at P_u and the flexure ratio, or, where P_u
// lies beyond the section's axial strength, the axial ratio (AxialMode).
func flexure(sec *Section, c *Check, pu, mu float64) Strength {
	st := sec.MomentAt(pu, compRight(mu))
	c.PhiMoment = st.PhiM
	if !st.Exceeded {
		c.FlexureRatio = ratio(mu, st.PhiM)
		return st
	}
	comp, tens := sec.PhiPMax()
	if pu > 0 {
		c.FlexureRatio = ratio(pu, comp)
	} else {
		c.FlexureRatio = ratio(pu, tens)
	}
	c.Governs = AxialMode
	return st
}

// SpecialMasonryShear is the shear a special reinforced masonry shear wall is
// designed for (TMS 402-22 §7.3.2.6.1.1, clause number from memory): φV_n
// must exceed the shear at 1.25 M_n, but V_n need not exceed 2.5 V_u. It
// returns the shear to compare with φV_n: min(1.25 (M_n/M_u) V_u, 2.5 φ V_u),
// positive. With no moment the second term governs.
func SpecialMasonryShear(vu, mu, mn float64) float64 {
	vu = math.Abs(vu)
	limit := 2.5 * PhiMasonryShear * vu
	if mu == 0 || mn <= 0 {
		// No moment, or an axial load beyond the section's range (no M_n):
		// the 2.5 V_u limit governs.
		return limit
	}
	return math.Min(1.25*mn/math.Abs(mu)*vu, limit)
}

// alphaMax is the tension-strain factor α of the maximum-reinforcement rule
// of TMS 402-16 §9.3.3.2, kept as a ductility check until the printed TMS
// 402-22 is read: The Masonry Society's summaries of the 2022 edition report
// compression-controlled sections in strength design and the rule kept only
// for beams and intermediate and special walls in plane, without the φ values
// or strain limits (docs/method.md §8.4). With M_u/(V_u d_v) ≥ 1, 1.5 for ordinary, 3.0 for intermediate and
// 4.0 for special walls; below 1, 1.5 under seismic loads (R > 1.5 assumed)
// and no limit under wind. Zero means no limit.
func alphaMax(class WallClass, kind LoadKind, mvd float64) float64 {
	if mvd >= 1 {
		switch class {
		case Intermediate:
			return 3.0
		case Special:
			return 4.0
		}
		return 1.5
	}
	if kind == Wind {
		return 0
	}
	return 1.5
}

func (m *masonry) requirements(checks []Check) []Requirement {
	var req []Requirement
	// Maximum flexural tensile reinforcement, for each section and direction
	// with the axial load of D + 0.75L + 0.525Q_E.
	var worst Requirement
	var worstAlpha float64
	found := false
	for _, sec := range []SectionAt{Bottom, Top} {
		d, l, q := m.loads.Dead.Bottom, m.loads.Live.Bottom, m.loads.Lateral.Bottom
		if sec == Top {
			d, l, q = m.loads.Dead.Top, m.loads.Live.Top, m.loads.Lateral.Top
		}
		alpha := alphaMax(m.in.Settings.Class, m.in.Settings.Kind, mvd(q.Moment, float64(q.Shear), m.L))
		if alpha == 0 {
			continue
		}
		for _, dir := range []float64{1, -1} {
			p := float64(d.Axial) + 0.75*float64(l.Axial) + 0.525*dir*float64(q.Axial)
			for _, right := range []bool{true, false} {
				rr := m.maxSteel(alpha, p, right)
				if !found || rr.Ratio > worst.Ratio {
					worst, worstAlpha = rr, alpha
				}
				found = true
			}
		}
	}
	if found {
		worst.Name = "tension bars within the maximum (α = " + fmtG(worstAlpha) + ")"
		worst.Clause = "TMS 402-16 §9.3.3.2 (kept pending TMS 402-22; see docs/method.md §8)"
		req = append(req, worst)
	}
	if m.in.Settings.Class == Special {
		req = append(req, m.specialMinimum()...)
	}
	return req
}

// maxSteel checks that the tension bars do not exceed the area that keeps
// equilibrium at ε_mu in the masonry and α ε_y in the extreme tension bar,
// with the bars in compression counted (permitted by the rule).
func (m *masonry) maxSteel(alpha, p float64, right bool) Requirement {
	s := m.sec
	dMax := 0.0
	for _, b := range s.Bars {
		d := b.X
		if right {
			d = s.Length - b.X
		}
		dMax = math.Max(dMax, d)
	}
	r := Requirement{OK: true}
	if dMax == 0 {
		return r
	}
	c := s.EpsU / (s.EpsU + alpha*s.Fy/Es) * dMax
	// Split the forces at this strain state into compression and tension.
	st := s.at(c, right, s.Fy, true)
	var tens float64
	k := Es * s.EpsU / c
	for _, b := range s.Bars {
		d := b.X
		if right {
			d = s.Length - b.X
		}
		if fs := k * (c - d); fs < 0 {
			tens += math.Min(-fs, s.Fy) * b.Area
		}
	}
	comp := st.p + tens
	r.Required = comp - p // the largest tension force equilibrium allows, N
	r.Provided = tens
	switch {
	case tens == 0:
		r.Ratio = 0
	case r.Required <= 0:
		r.Ratio = RatioCap
	default:
		r.Ratio = math.Min(tens/r.Required, RatioCap)
	}
	r.OK = r.Ratio <= 1
	return r
}

// specialMinimum are the prescriptive reinforcement rules of special
// reinforced masonry shear walls (TMS 402-22 §7.3.2.6, clause number from
// memory): vertical and horizontal reinforcement each at least 0.0007 of the
// gross section and together at least 0.002, spacing not above the lesser of
// a third of the length and height of the wall and 48 in.
func (m *masonry) specialMinimum() []Requirement {
	r := m.in.Reinforcement
	t := m.t
	rv := 0.0
	if r.Vertical.Spacing > 0 {
		rv = r.Vertical.AreaPerLength() * float64(layers(m.in.Wall, r)) / t
	}
	rh := m.avs / t
	clause := "TMS 402-22 §7.3.2.6 (clause number from memory)"
	mk := func(name string, req, prov float64) Requirement {
		q := Requirement{Name: name, Clause: clause, Required: req, Provided: prov}
		if prov > 0 {
			q.Ratio = math.Min(req/prov, RatioCap)
		} else {
			q.Ratio = RatioCap
		}
		q.OK = q.Ratio <= 1
		return q
	}
	out := []Requirement{
		mk("ρ_v ≥ 0.0007", 0.0007, rv),
		mk("ρ_h ≥ 0.0007", 0.0007, rh),
		mk("ρ_v + ρ_h ≥ 0.002", 0.002, rv+rh),
	}
	smax := math.Min(math.Min(float64(m.in.Wall.Length), float64(m.in.Wall.Height))/3, float64(48*geometry.Inch))
	for _, sp := range []struct {
		name string
		s    geometry.Length
	}{{"vertical spacing", r.Vertical.Spacing}, {"horizontal spacing", r.Horizontal.Spacing}} {
		if sp.s > 0 {
			q := Requirement{Name: sp.name + " ≤ min(L/3, H/3, 48 in)", Clause: clause, Required: smax, Provided: float64(sp.s)}
			q.Ratio = math.Min(float64(sp.s)/smax, RatioCap)
			q.OK = q.Ratio <= 1
			out = append(out, q)
		}
	}
	return out
}

// unreinforced checks an unreinforced masonry pier by TMS 402-22 §9.2.
type unreinforced struct {
	pierBase
	an, sn  float64 // net area and section modulus about the pier's mid-length
	fr      float64 // modulus of rupture, Pa
	grouted bool
	sec     *Section
}

func newUnreinforced(in *Input, p PierInput) *unreinforced {
	b := newBase(in, p)
	u := &unreinforced{pierBase: b}
	grout := in.Reinforcement != nil
	full := grout && in.Reinforcement.Grout == FullGrout
	u.grouted = full
	if full || in.Wall.Material.Kind == geometry.ClayMasonry {
		u.an = b.L * b.t
	} else {
		fs := float64(FaceShellDefault(in.Wall.Thickness))
		if in.Reinforcement != nil && in.Reinforcement.FaceShell > 0 {
			fs = float64(in.Reinforcement.FaceShell)
		}
		u.an = 2 * fs * b.L
	}
	u.sn = u.an * b.L / 6 // I/c of a section of uniform width
	u.fr = float64(ModulusOfRupture(in.Wall.Material.Kind, full, in.Settings.Mortar))
	u.sec = &Section{Length: b.L, Area: u.an, PhiFlex: PhiMasonryPlain, PnMax: 0.80 * 0.80 * b.fc * u.an,
		BlockStress: 0.80 * b.fc, BlockDepth: 0.80, EpsU: 0.0025, strips: []strip{{0, b.L, u.an / b.L}}}
	return u
}

// ModulusOfRupture returns f_r for in-plane bending, tension normal to the bed
// joints, TMS 402-22 Table 9.1.9.2 (values from memory of the table): solid
// units (clay) 133/100/80/51 psi, hollow ungrouted 84/64/51/31 psi, fully
// grouted 163/158/153/145 psi, for portland cement/lime or mortar cement type
// M or S / N and masonry cement or air-entrained type M or S / N.
func ModulusOfRupture(kind geometry.MaterialKind, fullyGrouted bool, mortar Mortar) geometry.Stress {
	var row [4]float64
	switch {
	case fullyGrouted:
		row = [4]float64{163, 158, 153, 145}
	case kind == geometry.ClayMasonry:
		row = [4]float64{133, 100, 80, 51}
	default:
		row = [4]float64{84, 64, 51, 31}
	}
	return geometry.Stress(row[mortar]) * geometry.PSI
}

// ShearUnreinforced is the nominal in-plane shear strength of unreinforced
// masonry in running bond, TMS 402-22 §9.2.6 (clause number and values from
// memory), in N: the least of 3.8 A_nv √f'm, 300 A_nv, and 56 A_nv + 0.45 N_u
// (not solidly grouted) or 90 A_nv + 0.45 N_u (solidly grouted), with the
// coefficients in psi and N_u the compressive force (not below zero).
func ShearUnreinforced(anv, fm, nu float64, grouted bool) float64 {
	p := float64(geometry.PSI)
	if nu < 0 {
		nu = 0
	}
	c := 56.0
	if grouted {
		c = 90
	}
	return math.Max(0, math.Min(math.Min(3.8*anv*rootPsi(fm), 300*anv*p), c*anv*p+0.45*nu))
}

func (u *unreinforced) section() *Section { return u.sec }

func (u *unreinforced) check(c *Check, combo Combination) {
	pu, vu, mu := float64(c.Axial), float64(c.Shear), c.Moment
	// φM_n at P_u: the moment at which the extreme fibre reaches φf_r in
	// tension, or 0.80 φ f'm in compression (TMS 402-22 §9.2.2 and §9.2.4,
	// clause numbers from memory).
	ft := u.sn * (PhiMasonryPlain*u.fr + pu/u.an)
	fc := u.sn * (PhiMasonryPlain*0.80*u.fc - pu/u.an)
	c.PhiFlexValue = PhiMasonryPlain
	c.PhiMoment = math.Max(0, math.Min(ft, fc))
	// The ratio is that of the extreme fibre stresses: tension
	// (|M_u|/S_n − P_u/A_n)/(φ f_r) and compression
	// (P_u/A_n + |M_u|/S_n)/(0.80 φ f'm), the larger.
	bend := math.Abs(mu) / u.sn
	tension := (bend - pu/u.an) / (PhiMasonryPlain * u.fr)
	compression := (pu/u.an + bend) / (PhiMasonryPlain * 0.80 * u.fc)
	c.FlexureRatio = math.Min(RatioCap, math.Max(0, math.Max(tension, compression)))
	if mu == 0 && c.FlexureRatio > 0 {
		c.Governs = AxialMode
	}
	c.PhiShearValue = PhiMasonryShear
	c.PhiShear = geometry.Force(PhiMasonryShear * ShearUnreinforced(u.an, u.fc, pu, u.grouted))
	c.DesignShear = geometry.Force(math.Abs(vu))
	c.ShearRatio = ratio(vu, float64(c.PhiShear))
}

func (u *unreinforced) requirements([]Check) []Requirement { return nil }

package design

import (
	"math"
	"sort"
	"strconv"

	"pierwise/geometry"
	"pierwise/pier"
)

// SectionAt names the section of a pier a check is made at.
type SectionAt int

const (
	Bottom SectionAt = iota
	Top
)

// String returns "bottom" or "top".
func (s SectionAt) String() string {
	if s == Top {
		return "top"
	}
	return "bottom"
}

// Mode says which strength governs a check.
type Mode int

const (
	ShearMode   Mode = iota // in-plane shear
	FlexureMode             // flexure with axial load
	AxialMode               // the axial load alone is beyond the section's range
)

// String returns "shear", "flexure" or "axial".
func (m Mode) String() string {
	switch m {
	case FlexureMode:
		return "flexure"
	case AxialMode:
		return "axial"
	}
	return "shear"
}

// RatioCap bounds every demand/capacity ratio: a ratio at the cap means the
// section has no strength left for that demand (no NaN or Inf ever).
const RatioCap = 99.99

// Check is one pier checked for one combination at one section. Forces are
// the factored ones, signed as pier.Forces (axial compression +, moment +
// when it compresses the pier's right end).
type Check struct {
	Combination int // index into Result.Combinations
	Section     SectionAt

	Axial  geometry.Force // P_u
	Shear  geometry.Force // V_u as combined (signed)
	Moment float64        // M_u, N·m (signed)

	// DesignShear is the shear the strength is compared with: |V_u|, or for
	// special walls the capacity-design shear (docs/method.md §8).
	DesignShear geometry.Force

	PhiShear      geometry.Force // φV_n
	PhiMoment     float64        // φM_n at P_u, toward the moment's sign, N·m (≥ 0)
	PhiShearValue float64        // φ used for shear
	PhiFlexValue  float64        // φ used for flexure (ACI: from ε_t)

	ShearRatio   float64 // DesignShear/φV_n
	FlexureRatio float64 // |M_u|/φM_n, or the axial ratio when P_u is outside the section's range
	Governs      Mode
}

// Ratio is the larger of the two ratios.
func (c Check) Ratio() float64 { return math.Max(c.ShearRatio, c.FlexureRatio) }

// Requirement is a rule of the code on the reinforcement itself, checked once
// per pier: a minimum ratio, a maximum area, a spacing.
type Requirement struct {
	Name     string  // e.g. "ρ_t ≥ 0.0025"
	Clause   string  // e.g. "ACI 318-19 §11.6.2"
	Required float64 // the limit
	Provided float64 // what the pier has
	Ratio    float64 // ≤ 1 passes
	OK       bool
}

// PierResult is the design of one pier.
type PierResult struct {
	Name      string
	Rect      geometry.Rect
	Bars      []Bar // x from the wall's left end
	Section   *Section
	Checks    []Check
	Governing int     // index into Checks of the largest ratio
	Ratio     float64 // the governing ratio, including Requirements' ratios
	Require   []Requirement
	// Requirement is the index into Require of the requirement that sets
	// Ratio, or -1 when a check does.
	Requirement int
	OK          bool   // every check and requirement passes
	Method      string // "reinforced", "unreinforced"
}

// GoverningCheck returns the pier's governing check.
func (p *PierResult) GoverningCheck() Check { return p.Checks[p.Governing] }

// Demand returns the demand points (P_u, M_u) of every check, for plotting on
// the interaction curve.
func (p *PierResult) Demand() []PMPoint {
	pts := make([]PMPoint, len(p.Checks))
	for i, c := range p.Checks {
		pts[i] = PMPoint{P: float64(c.Axial), M: c.Moment}
	}
	return pts
}

// Result is the design of every pier of a wall.
type Result struct {
	Code         Code
	Class        WallClass
	Kind         LoadKind
	Combinations []Combination
	Piers        []PierResult
	Governing    int     // index into Piers of the largest ratio; -1 when there is no pier
	Ratio        float64 // the wall's governing ratio
	OK           bool
	Notes        []string // assumptions that applied to this wall
}

// CheckWall checks every pier of the input (docs/method.md §8). It returns the
// validation errors of the input, keyed by file key, and nothing else can
// fail: the result holds no NaN or Inf.
func CheckWall(in Input) (Result, error) {
	if errs := in.Validate(); len(errs) > 0 {
		return Result{}, errs
	}
	s := in.Settings
	res := Result{Code: s.Code, Class: s.Class, Kind: s.Kind, Combinations: Combinations(s), Governing: -1, OK: true}
	res.Piers = make([]PierResult, len(in.Piers))
	for i, p := range in.Piers {
		res.Piers[i] = checkPier(&in, p, res.Combinations)
		pr := &res.Piers[i]
		if res.Governing < 0 || pr.Ratio > res.Ratio {
			res.Governing, res.Ratio = i, pr.Ratio
		}
		res.OK = res.OK && pr.OK
	}
	res.Notes = notes(&in)
	return res, nil
}

// sign of a moment: true when it compresses the right end.
func compRight(m float64) bool { return m >= 0 }

func ratio(demand, capacity float64) float64 {
	demand = math.Abs(demand)
	if demand == 0 {
		return 0
	}
	if !(capacity > 0) {
		return RatioCap
	}
	return math.Min(demand/capacity, RatioCap)
}

func checkPier(in *Input, p PierInput, combos []Combination) PierResult {
	pr := PierResult{Name: p.Name, Rect: p.Rect, Bars: PierBars(in.Wall, p.Rect, in.Reinforcement)}
	var chk checker
	if in.Settings.Code == ACI318 {
		chk = newConcrete(in, p, pr.Bars)
		pr.Method = "reinforced"
	} else if in.Reinforcement.Reinforced() {
		chk = newMasonry(in, p, pr.Bars)
		pr.Method = "reinforced"
	} else {
		chk = newUnreinforced(in, p)
		pr.Method = "unreinforced"
	}
	pr.Section = chk.section()
	pr.Checks = make([]Check, 0, 2*len(combos))
	for ci, c := range combos {
		f := c.Apply(p.Loads)
		for _, at := range []SectionAt{Bottom, Top} {
			forces := f.Bottom
			if at == Top {
				forces = f.Top
			}
			ck := Check{Combination: ci, Section: at, Axial: forces.Axial, Shear: forces.Shear, Moment: forces.Moment}
			chk.check(&ck, c)
			switch {
			case ck.ShearRatio >= ck.FlexureRatio:
				ck.Governs = ShearMode
			case ck.Governs != AxialMode:
				ck.Governs = FlexureMode
			}
			pr.Checks = append(pr.Checks, ck)
		}
	}
	pr.Require = chk.requirements(pr.Checks)
	pr.OK = true
	for i, c := range pr.Checks {
		if i == 0 || c.Ratio() > pr.Ratio {
			pr.Governing, pr.Ratio = i, c.Ratio()
		}
	}
	pr.Requirement = -1
	for i, r := range pr.Require {
		pr.OK = pr.OK && r.OK
		if r.Ratio > pr.Ratio {
			pr.Ratio, pr.Requirement = r.Ratio, i
		}
	}
	pr.OK = pr.OK && pr.Ratio <= 1
	return pr
}

// checker is one code's checks of one pier.
type checker interface {
	section() *Section
	check(c *Check, combo Combination)
	requirements(checks []Check) []Requirement
}

// pierBase holds what every checker needs.
type pierBase struct {
	in    *Input
	p     PierInput
	L, t  float64 // pier length and wall thickness, m
	h     float64 // pier height, m
	fc    float64 // f'm or f'c, Pa
	loads pier.PierLoads
}

func newBase(in *Input, p PierInput) pierBase {
	return pierBase{in: in, p: p, L: p.Rect.W(), t: float64(in.Wall.Thickness), h: p.Rect.H(),
		fc: float64(in.Wall.Material.Strength), loads: p.Loads}
}

// localBars shifts the bars to the pier's own coordinate (from its left end).
func localBars(bars []Bar, x0 float64) []Bar {
	out := make([]Bar, len(bars))
	for i, b := range bars {
		out[i] = Bar{X: b.X - x0, Area: b.Area}
	}
	return out
}

// psi conversions: the codes' equations in psi units are evaluated with
// values converted explicitly (docs/method.md §8).
func psi(s float64) float64 { return s / float64(geometry.PSI) }

// rootPsi is √f with f in psi, as a stress in Pa: the √f'm and √f'c of the
// codes' equations, whose coefficients are in psi.
func rootPsi(f float64) float64 { return math.Sqrt(psi(f)) * float64(geometry.PSI) }

// spanRatio is h_w/l_w for a pier: the larger of the pier's and the wall's
// (ACI 318-19 §18.10.4.3, applied to both codes' uses here).
func (b *pierBase) spanRatio() float64 {
	r := b.h / b.L
	if w := float64(b.in.Wall.Height) / float64(b.in.Wall.Length); w > r {
		r = w
	}
	return r
}

// mvd is M_u/(V_u d_v), positive, not above 1 (TMS 402-22 §9.3.4.1.2); with
// no shear it is 1.
func mvd(m, v, dv float64) float64 {
	if v == 0 {
		return 1
	}
	r := math.Abs(m) / (math.Abs(v) * dv)
	return math.Min(r, 1)
}

// mergeCells returns the grouted cells (intervals of one cell module centred
// on each bar, clipped to the pier and merged) for partially grouted masonry.
func mergeCells(bars []Bar, L, module float64) [][2]float64 {
	xs := make([]float64, len(bars))
	for i, b := range bars {
		xs[i] = b.X
	}
	sort.Float64s(xs)
	var cells [][2]float64
	for _, x := range xs {
		a, b := math.Max(0, x-module/2), math.Min(L, x+module/2)
		if n := len(cells); n > 0 && a <= cells[n-1][1] {
			cells[n-1][1] = math.Max(cells[n-1][1], b)
			continue
		}
		cells = append(cells, [2]float64{a, b})
	}
	return cells
}

func notes(in *Input) []string {
	var n []string
	if in.Settings.Code == TMS402 {
		n = append(n, "Bars in compression are ignored: masonry bars are not laterally confined (TMS 402-22 §9.3.2, clause number from memory).")
		n = append(n, "Flexure uses φ = 0.90 and the maximum-reinforcement rule of TMS 402-16 §9.3.3.2: TMS 402-22 is reported to add compression-controlled sections with a smaller φ and to change γ_g, which this check does not yet apply; for a pier whose tension bars do not yield, verify φM_n against the 2022 text (docs/method.md §8).")
		if in.Reinforcement != nil && in.Reinforcement.Grout == PartialGrout {
			n = append(n, "Partially grouted: the net section is the face shells plus one grouted cell module at each bar (common practice).")
		}
	}
	n = append(n, "Out-of-plane loads and slenderness are not checked.")
	return n
}

func fmtG(v float64) string { return strconv.FormatFloat(v, 'g', 3, 64) }

package design

import (
	"math"
	"strconv"

	"pierwise/geometry"
	"pierwise/pier"
)

// Code is the design standard a wall is checked against.
type Code int

const (
	TMS402 Code = iota // TMS 402-22, strength design (masonry)
	ACI318             // ACI 318-19 (concrete)
)

// String returns the code as the file spells it.
func (c Code) String() string {
	if c == ACI318 {
		return "aci318-19"
	}
	return "tms402-22"
}

// ParseCode reads "tms402-22" or "aci318-19".
func ParseCode(s string) (Code, bool) {
	switch s {
	case "tms402-22":
		return TMS402, true
	case "aci318-19":
		return ACI318, true
	}
	return 0, false
}

// CodeFor returns the code that fits a material kind, and false for a custom
// material (which has no code).
func CodeFor(k geometry.MaterialKind) (Code, bool) {
	switch k {
	case geometry.ConcreteMasonry, geometry.ClayMasonry:
		return TMS402, true
	case geometry.Concrete:
		return ACI318, true
	}
	return 0, false
}

// WallClass is the shear-wall class of the seismic-force-resisting system
// (ASCE 7-22 Table 12.2-1): ordinary, intermediate (masonry only) or special.
type WallClass int

const (
	Ordinary WallClass = iota
	Intermediate
	Special
)

// String returns the class as the file spells it.
func (w WallClass) String() string {
	switch w {
	case Intermediate:
		return "intermediate"
	case Special:
		return "special"
	}
	return "ordinary"
}

// ParseWallClass reads "ordinary", "intermediate" or "special".
func ParseWallClass(s string) (WallClass, bool) {
	for _, w := range []WallClass{Ordinary, Intermediate, Special} {
		if w.String() == s {
			return w, true
		}
	}
	return 0, false
}

// LoadKind says what the wall's lateral load is: an earthquake effect Q_E or
// a wind effect W, both unfactored.
type LoadKind int

const (
	Seismic LoadKind = iota
	Wind
)

// String returns the kind as the file spells it.
func (k LoadKind) String() string {
	if k == Wind {
		return "wind"
	}
	return "seismic"
}

// ParseLoadKind reads "seismic" or "wind".
func ParseLoadKind(s string) (LoadKind, bool) {
	switch s {
	case "seismic":
		return Seismic, true
	case "wind":
		return Wind, true
	}
	return 0, false
}

// Grout says which cells of a masonry wall are grouted.
type Grout int

const (
	FullGrout    Grout = iota // every cell
	PartialGrout              // only the cells with vertical bars
)

// String returns the grout as the file spells it.
func (g Grout) String() string {
	if g == PartialGrout {
		return "partial"
	}
	return "full"
}

// ParseGrout reads "full" or "partial".
func ParseGrout(s string) (Grout, bool) {
	switch s {
	case "full":
		return FullGrout, true
	case "partial":
		return PartialGrout, true
	}
	return 0, false
}

// Mortar is the mortar of unreinforced masonry, which decides its modulus of
// rupture (TMS 402-22 Table 9.1.9.2).
type Mortar int

const (
	MortarMS        Mortar = iota // portland cement/lime or mortar cement, type M or S (default)
	MortarN                       // portland cement/lime or mortar cement, type N
	MasonryCementMS               // masonry cement or air-entrained portland cement/lime, type M or S
	MasonryCementN                // masonry cement or air-entrained portland cement/lime, type N
)

// Reinforcement is what the engineer drew (docs/method.md §8). A zero
// Vertical.Spacing means no uniform vertical bars, a zero Jamb.Count no jamb
// bars, a zero Horizontal.Spacing no horizontal (shear) bars. A masonry wall
// with neither vertical nor jamb bars is checked as unreinforced.
type Reinforcement struct {
	Grout      Grout
	Fy         geometry.Stress
	Vertical   geometry.BarSpacing // uniform vertical bars, laid from the wall's left end
	Jamb       geometry.BarCount   // at each wall end and each side of every opening
	Horizontal geometry.BarSpacing // shear reinforcement

	// Edge is the distance from a pier's end (a wall end or an opening's
	// side) to the centre of its jamb bars; zero takes the default
	// (EdgeDefault).
	Edge geometry.Length

	// Layers is the number of curtains of the uniform vertical and the
	// horizontal bars (each bar of Vertical and Horizontal is this many
	// bars); zero takes the default: one in masonry, two in concrete walls
	// thicker than 10 in (ACI 318-19 §11.7.2.3, clause number from memory).
	Layers int

	// FaceShell is the face-shell thickness of hollow units, used for
	// partially grouted masonry; zero takes the default (FaceShellDefault).
	FaceShell geometry.Length
}

// Reinforced reports whether any vertical bar is given.
func (r *Reinforcement) Reinforced() bool {
	return r != nil && (r.Vertical.Spacing > 0 || r.Jamb.Count > 0)
}

// Settings are the design settings of a wall.
type Settings struct {
	Code   Code
	Class  WallClass
	Kind   LoadKind
	SDS    float64 // S_DS, the design spectral acceleration at short periods (g)
	Rho    float64 // ρ, the redundancy factor (ASCE 7-22 §12.3.4); zero means 1.0
	Mortar Mortar  // for unreinforced masonry
}

// Wall is what the checks need of a wall elevation.
type Wall struct {
	Units     geometry.System
	Length    geometry.Length
	Height    geometry.Length
	Thickness geometry.Length
	Material  geometry.Material
	Openings  []geometry.Opening
}

// WallOf takes the active layout of w.
func WallOf(w *geometry.Wall) Wall {
	return Wall{Units: w.Units, Length: w.Length, Height: w.Height, Thickness: w.Thickness,
		Material: w.Material, Openings: w.Openings()}
}

// PierInput is one leaf pier to check: its outline in wall coordinates and
// its section forces under the unfactored load cases.
type PierInput struct {
	Name  string
	Rect  geometry.Rect
	Loads pier.PierLoads
}

// Input is everything the checks of one wall need.
type Input struct {
	Wall          Wall
	Reinforcement *Reinforcement // nil: unreinforced (masonry only)
	Settings      Settings
	Piers         []PierInput
}

// Sane ranges of the inputs (docs/method.md §8): outside them a value is a
// typing slip rather than a design.
var (
	FyMin  = 30 * geometry.KSI  // below Grade 40 with margin
	FyMax  = 100 * geometry.KSI // Grade 100 (ASTM A615), the highest either code admits
	SDSMax = 3.0                // g; mapped values in ASCE 7-22 stay well below
)

// Validate returns every problem with the design inputs, keyed as the wall
// file spells them ("reinforcement.fy", "design.sds"), for the file reader to
// place at a line. It never panics.
func (in *Input) Validate() geometry.ErrorList {
	var errs geometry.ErrorList
	add := func(key, msg string) { errs = append(errs, &geometry.Error{Key: key, Msg: msg}) }
	s := in.Settings
	want, ok := CodeFor(in.Wall.Material.Kind)
	switch {
	case !ok:
		add("design.code", "a custom material has no design code; give the material as concrete-masonry, clay-masonry or concrete")
	case s.Code != want:
		add("design.code", s.Code.String()+" does not fit the material; use "+want.String())
	}
	if s.Code == ACI318 && s.Class == Intermediate {
		add("design.wall_class", `concrete shear walls are "ordinary" or "special"`)
	}
	if !(s.SDS >= 0 && s.SDS <= SDSMax) {
		add("design.sds", "S_DS must be between 0 and "+strconv.FormatFloat(SDSMax, 'g', -1, 64)+" g")
	}
	if s.Rho != 0 && !(s.Rho >= 1.0 && s.Rho <= 1.3) {
		add("design.rho", "ρ must be 1.0 or 1.3 (ASCE 7-22 §12.3.4), or a value between")
	}
	if !(in.Wall.Thickness > 0) || !(in.Wall.Length > 0) || !(in.Wall.Height > 0) {
		add("thickness", "the checks need the wall's length, height and thickness")
	}
	for _, p := range in.Piers {
		r := p.Rect
		if !(r.W() > 0 && r.H() > 0) || math.IsInf(r.W(), 0) || math.IsInf(r.H(), 0) {
			add("pier "+p.Name, "a pier needs a positive width and height")
		}
	}
	if !(in.Wall.Material.Strength > 0) {
		add("material.strength", "the checks need f'm or f'c")
	}
	r := in.Reinforcement
	if r == nil {
		if s.Code == ACI318 {
			add("reinforcement", "a concrete wall needs its reinforcement (plain concrete walls are not checked)")
		}
		return errs
	}
	if r.Reinforced() || r.Horizontal.Spacing > 0 {
		if !(r.Fy >= FyMin && r.Fy <= FyMax) {
			add("reinforcement.fy", "f_y must be between 30 and 100 ksi (207 and 690 MPa)")
		}
	}
	if s.Code == ACI318 && !r.Reinforced() {
		add("reinforcement.vertical", "a concrete wall needs vertical bars (plain concrete walls are not checked)")
	}
	if r.Edge < 0 {
		add("reinforcement.edge", "the edge distance cannot be negative")
	}
	if r.Edge > 0 && 2*r.Edge >= in.Wall.Length {
		add("reinforcement.edge", "the edge distance is half the wall or more")
	}
	if r.Layers < 0 || r.Layers > 2 {
		add("reinforcement.layers", "one or two curtains of bars")
	}
	if r.FaceShell < 0 || (r.FaceShell > 0 && 2*r.FaceShell >= in.Wall.Thickness) {
		add("reinforcement.face_shell", "two face shells must be thinner than the wall")
	}
	if s.Code == ACI318 && r.Grout == PartialGrout {
		add("reinforcement.grout", "grout applies to masonry only")
	}
	return errs
}

// Rect returns the wall's outline in wall coordinates (metres).
func (w Wall) Rect() geometry.Rect {
	return geometry.Rect{X1: float64(w.Length), Y1: float64(w.Height)}
}

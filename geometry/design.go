package geometry

// The design inputs of a wall (docs/method.md §8): what the engineer drew
// ([reinforcement]) and how the piers are checked ([design], [load] kind).
// The design package computes with them; they live here because the wall
// file holds them.

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
func CodeFor(k MaterialKind) (Code, bool) {
	switch k {
	case ConcreteMasonry, ClayMasonry:
		return TMS402, true
	case Concrete:
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

// mortarNames are the file's names of the mortars, in enum order.
var mortarNames = []string{MortarMS: "ms", MortarN: "n", MasonryCementMS: "masonry-cement-ms", MasonryCementN: "masonry-cement-n"}

// String returns the mortar as the file spells it.
func (m Mortar) String() string {
	if m >= 0 && int(m) < len(mortarNames) {
		return mortarNames[m]
	}
	return mortarNames[0]
}

// ParseMortar reads "ms", "n", "masonry-cement-ms" or "masonry-cement-n".
func ParseMortar(s string) (Mortar, bool) {
	for i, n := range mortarNames {
		if n == s {
			return Mortar(i), true
		}
	}
	return 0, false
}

// Reinforcement is what the engineer drew (docs/method.md §8). A zero
// Vertical.Spacing means no uniform vertical bars, a zero Jamb.Count no jamb
// bars, a zero Horizontal.Spacing no horizontal (shear) bars. A masonry wall
// with neither vertical nor jamb bars is checked as unreinforced.
type Reinforcement struct {
	Grout      Grout
	Fy         Stress
	Vertical   BarSpacing // uniform vertical bars, laid from the wall's left end
	Jamb       BarCount   // at each wall end and each side of every opening
	Horizontal BarSpacing // shear reinforcement

	// Edge is the distance from a pier's end (a wall end or an opening's
	// side) to the centre of its jamb bars; zero takes the default
	// (design.EdgeDefault).
	Edge Length

	// Layers is the number of curtains of the uniform vertical and the
	// horizontal bars (each bar of Vertical and Horizontal is this many
	// bars); zero takes the default: one in masonry, two in concrete walls
	// thicker than 10 in (ACI 318-19 §11.7.2.3, clause number from memory).
	Layers int

	// FaceShell is the face-shell thickness of hollow units, used for
	// partially grouted masonry; zero takes the default
	// (design.FaceShellDefault).
	FaceShell Length
}

// Reinforced reports whether any vertical bar is given.
func (r *Reinforcement) Reinforced() bool {
	return r != nil && (r.Vertical.Spacing > 0 || r.Jamb.Count > 0)
}

// Design holds a wall's [design] settings; a wall with a nil Design is not
// checked. The load kind is Wall.Load.Kind.
type Design struct {
	// Code is the standard; CodeGiven is false when the file leaves it to
	// the material (CodeFor).
	Code      Code
	CodeGiven bool
	Class     WallClass
	SDS       float64 // S_DS, the design spectral acceleration at short periods (g)
	Rho       float64 // ρ, the redundancy factor (ASCE 7-22 §12.3.4); zero means 1.0
	Mortar    Mortar  // for unreinforced masonry
}

// DesignCode returns the code the wall is checked against: the one given, or
// the one of its material.
func (w *Wall) DesignCode() Code {
	if w.Design != nil && w.Design.CodeGiven {
		return w.Design.Code
	}
	c, _ := CodeFor(w.Material.Kind)
	return c
}

package geometry

import "strings"

// System is the unit system a wall is entered and reported in.
type System int

const (
	US System = iota // ft, in, kip, psi; a bare length is in feet
	SI               // m, mm, kN, MPa; a bare length is in metres
)

// Support is the rotational restraint at the top of a wall or a pier.
type Support int

const (
	Cantilever Support = iota // fixed base, free top
	Fixed                     // fixed base, top kept from rotating (fixed-fixed)
)

// MaterialKind selects how E and E_v are found from the strength.
type MaterialKind int

const (
	ConcreteMasonry MaterialKind = iota // E_m = 900 f'm (TMS 402-22 §4.2.2, clause number from memory)
	ClayMasonry                         // E_m = 700 f'm (TMS 402-22 §4.2.2, clause number from memory)
	Concrete                            // E_c = 57,000 √f'c psi (ACI 318-19 §19.2.2.1)
	Custom                              // E (and E_v) given by the user
)

// Material is what the user said about the wall's material. Zero Modulus or
// ShearModulus means "use the rule of the kind"; the pier package turns this
// into moduli and says where each one came from.
type Material struct {
	Kind         MaterialKind
	Strength     Stress // f'm for masonry, f'c for concrete; may be zero for Custom
	Modulus      Stress // E; required for Custom, an override otherwise
	ShearModulus Stress // E_v; default 0.4 E

	// Poisson is Poisson's ratio ν when the user gives it instead of E_v:
	// E_v = E/(2(1+ν)). Zero means not given; it cannot go with ShearModulus.
	Poisson float64
}

// Load is the in-plane shear at the top of the wall; zero means no load given.
type Load struct {
	Shear Force
	Kind  LoadKind // what the shear is: an earthquake or a wind effect (pier design)
}

// Stiffness holds the user's stiffness modifiers for cracking (default 1 each):
// Flexure multiplies I (kf), Shear multiplies the shear area (kv).
type Stiffness struct {
	Flexure float64
	Shear   float64
}

// Drift holds the storey-drift check settings: δ = Cd·δe/Ie against
// Limit·h_sx (docs/method.md §7). Cd and Ie have no default: zero means not
// given, and no drift verdict is made without both.
type Drift struct {
	Cd     float64 // deflection amplification factor C_d; 0 = not given
	Ie     float64 // importance factor I_e; 0 = not given
	Preset string  // name of a limit preset ("" when Limit was typed)
	Limit  float64 // allowable drift as a fraction of the storey height; 0 = no check

	// StoreyHeight is h_sx, the storey height below the level whose drift
	// is checked; 0 = the wall's height.
	StoreyHeight Length
}

// Project is the heading of a calculation package: the [project] table of
// a wall or a storey file, shown in the reports' headers. Every field is
// free text; empty means not given.
type Project struct {
	Name     string // the project
	Job      string // the job number
	Engineer string // who did the calculation
	Checker  string // who checked it
}

// Entries returns the given fields as label and value pairs, in the order
// project, job, engineer, checker.
func (p Project) Entries() [][2]string {
	var out [][2]string
	for _, e := range [][2]string{{"project", p.Name}, {"job", p.Job}, {"engineer", p.Engineer}, {"checker", p.Checker}} {
		if e[1] != "" {
			out = append(out, e)
		}
	}
	return out
}

// ProjectKeys are the keys of a [project] table, in the order written.
var ProjectKeys = []string{"name", "job", "engineer", "checker"}

// Field returns a pointer to the field that key (one of ProjectKeys) names.
func (p *Project) Field(key string) *string {
	switch key {
	case "name":
		return &p.Name
	case "job":
		return &p.Job
	case "engineer":
		return &p.Engineer
	case "checker":
		return &p.Checker
	}
	panic("geometry: unknown project key " + key)
}

// LineLoad is a force per length along the top of a wall, in N/m.
type LineLoad float64

// Gravity holds the gravity loads on a wall: line loads along its top and its
// own weight. Zero values mean "not given"; SelfWeight zero takes the default
// of the material and thickness (docs/method.md, "Gravity").
type Gravity struct {
	Dead       LineLoad // D along the top of the wall, N/m
	Live       LineLoad // L along the top of the wall, N/m
	SelfWeight Stress   // wall weight per face area, N/m² (a pressure); 0 = default
	NoSelf     bool     // true when the user set self_weight = 0 on purpose
}

// Basis names the model every downstream number comes from.
type Basis int

const (
	BasisClassic Basis = iota // the classic strip method (default)
	BasisFE                   // the plane-stress finite-element model
)

// String returns the basis as the file and the command line spell it.
func (b Basis) String() string {
	if b == BasisFE {
		return "fe"
	}
	return "classic"
}

// Analysis holds the analysis settings: the basis, and whether the
// finite-element model ties the top nodes' horizontal displacement (a bond
// beam or diaphragm collector; on unless NoTopTie).
type Analysis struct {
	Basis    Basis
	NoTopTie bool
}

// Check holds the finite-element check settings.
type Check struct {
	Mesh    Length // maximum element size; 0 = the default
	Element string // element name; "" = the default element
}

// Opening is a door or a window in the wall elevation. X is from the wall's
// left end to the opening's left edge, Sill from the wall's base to the
// opening's bottom edge.
type Opening struct {
	Name   string
	X      Length
	Sill   Length
	Width  Length
	Height Length
}

// IsDoor reports whether the opening reaches the base of the wall.
func (o Opening) IsDoor() bool { return o.Sill <= 0 }

// Rect returns the opening's outline in wall coordinates (metres).
func (o Opening) Rect() Rect {
	return Rect{X0: float64(o.X), Y0: float64(o.Sill), X1: float64(o.X + o.Width), Y1: float64(o.Sill + o.Height)}
}

// Layout is one named arrangement of the openings of a wall (a variant).
type Layout struct {
	Name     string
	Openings []Opening
}

// Wall is one wall elevation with all its layouts. The active layout is the
// one that is solved, drawn and reported.
type Wall struct {
	Title     string
	Project   Project
	Units     System
	Length    Length
	Height    Length
	Thickness Length
	Support   Support
	Material  Material
	Load      Load
	Stiffness Stiffness
	Drift     Drift
	Check     Check
	Analysis  Analysis
	Gravity   Gravity

	// Reinforcement is what the engineer drew (nil: none given) and
	// Design the pier-design settings (nil: the piers are not checked);
	// docs/method.md §8.
	Reinforcement *Reinforcement
	Design        *Design
	barText       map[string]string // bars a file gave that could not be read, by key

	Layouts []Layout // at least one; Layouts[0] holds the file's top-level openings
	Active  int      // index into Layouts
}

// Openings returns the openings of the active layout.
func (w *Wall) Openings() []Opening {
	if w.Active < 0 || w.Active >= len(w.Layouts) {
		return nil
	}
	return w.Layouts[w.Active].Openings
}

// LayoutIndex returns the index of the layout called name, or -1. Names are
// matched exactly first, then ignoring case (as FILE:LAYOUT on the command
// line and a storey's layout key are typed).
func (w *Wall) LayoutIndex(name string) int {
	for i, l := range w.Layouts {
		if l.Name == name {
			return i
		}
	}
	for i, l := range w.Layouts {
		if strings.EqualFold(l.Name, name) {
			return i
		}
	}
	return -1
}

// Rect returns the wall's outline in wall coordinates (metres).
func (w *Wall) Rect() Rect {
	return Rect{X1: float64(w.Length), Y1: float64(w.Height)}
}

// Rect is an axis-aligned rectangle in metres, X0 < X1 and Y0 < Y1.
type Rect struct {
	X0, Y0, X1, Y1 float64
}

// W and H return the width and the height.
func (r Rect) W() float64 { return r.X1 - r.X0 }
func (r Rect) H() float64 { return r.Y1 - r.Y0 }

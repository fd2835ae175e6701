package design

import (
	"math"
	"strconv"

	"pierwise/geometry"
	"pierwise/pier"
)

// The design inputs the wall file holds live in geometry (the file reads
// them); these names keep the design package's vocabulary.
type (
	Code          = geometry.Code
	WallClass     = geometry.WallClass
	LoadKind      = geometry.LoadKind
	Grout         = geometry.Grout
	Mortar        = geometry.Mortar
	Reinforcement = geometry.Reinforcement
)

const (
	TMS402          = geometry.TMS402
	ACI318          = geometry.ACI318
	Ordinary        = geometry.Ordinary
	Intermediate    = geometry.Intermediate
	Special         = geometry.Special
	Seismic         = geometry.Seismic
	Wind            = geometry.Wind
	FullGrout       = geometry.FullGrout
	PartialGrout    = geometry.PartialGrout
	MortarMS        = geometry.MortarMS
	MortarN         = geometry.MortarN
	MasonryCementMS = geometry.MasonryCementMS
	MasonryCementN  = geometry.MasonryCementN
)

// ParseCode, ParseWallClass, ParseLoadKind, ParseGrout and CodeFor are
// geometry's.
var (
	ParseCode      = geometry.ParseCode
	ParseWallClass = geometry.ParseWallClass
	ParseLoadKind  = geometry.ParseLoadKind
	ParseGrout     = geometry.ParseGrout
	CodeFor        = geometry.CodeFor
)

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

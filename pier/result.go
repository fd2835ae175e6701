package pier

import "pierwise/geometry"

// Parts is a relative deflection (E = 1, t = 1) split into its bending and
// shear terms. Total = Bending + Shear.
type Parts struct {
	Bending float64
	Shear   float64
}

// Total returns the whole relative deflection.
func (p Parts) Total() float64 { return p.Bending + p.Shear }

// Moduli are the elastic moduli used for a wall and where they came from.
type Moduli struct {
	E      geometry.Stress // E_m or E_c
	Ev     geometry.Stress // shear modulus E_v (G)
	Source string          // both sources, "ESource; EvSource", for one-line displays

	ESource  string // where E came from, e.g. "E_m = 900 f'm (TMS 402-22 §4.2.2, clause number from memory)"
	EvSource string // where E_v came from
}

// StepKind says what a decomposition step did to the running deflection.
type StepKind int

const (
	StepSolid StepKind = iota // the region as if it had no openings: d = formula
	StepStrip                 // a band's solid strip removed: d -= formula
	StepPiers                 // the band's piers restored in parallel: d += 1/Σ(1/d_i)
)

// Step is one line of the classic method's working, for the report.
type Step struct {
	Kind       StepKind
	Region     string // "wall" or the pier that contains this step, e.g. "P2"
	Rect       geometry.Rect
	Support    geometry.Support
	Deflection float64  // relative deflection this step adds or removes (always ≥ 0)
	Piers      []string // for StepPiers: the piers combined

	// AllCuts is set on a StepPiers step whose band has no opening that
	// spans its full height: every opening was taken as a cut and every
	// pier as the band's full height (docs/method.md §2.2), a conservative reading of
	// staggered openings.
	AllCuts bool
}

// Forces are the internal forces at one horizontal section of a pier, those
// that the part above the section exerts on the part below: Shear along the
// wall's lateral load (which acts toward +x at the top of the wall), Axial
// (compression positive) and Moment about the section's centroid, in N·m,
// positive when it compresses the section's right end (x1). Under a lateral
// load toward +x a cantilever's base moment is positive (docs/method.md §1).
type Forces struct {
	Shear  geometry.Force
	Axial  geometry.Force
	Moment float64
}

// Sections holds a pier's forces at its bottom, middle and top sections.
type Sections struct {
	Bottom, Middle, Top Forces
}

// PierLoads holds a pier's section forces under each unfactored load case:
// the wall's lateral shear V toward +x (zero without a load), the dead load
// (line load and self weight) and the live load. Load combinations are formed
// from these by superposition (docs/method.md §8).
type PierLoads struct {
	Lateral, Dead, Live Sections
}

// Pier is one pier of the decomposition. Shares and forces are fractions of,
// and parts of, the wall's shear.
type Pier struct {
	Name     string        // P1, P2, … ; P2.1 for a pier inside P2
	Parent   string        // "" at the top level
	Rect     geometry.Rect // metres
	Support  geometry.Support
	Leaf     bool           // no opening inside
	Parts    Parts          // the pier's own relative deflection (for a leaf: the formula)
	Rigidity float64        // relative rigidity 1/Parts.Total() (for a non-leaf, of its own decomposition)
	Share    float64        // fraction of the wall shear, 0–1
	Shear    geometry.Force // V_i = Share·V; zero without a load
	Moment   float64        // M_i in N·m: V_i·h/2 fixed-fixed, V_i·h cantilever (at the base); zero without a load

	BandShare float64 // fraction of its band's shear (Share = BandShare × parent's Share)
	Cut       bool    // openings inside leave no load path: no rigidity, no share

	// Loads are the pier's section forces under each load case
	// (docs/method.md §6): Lateral from the wall's shear (V, the moment of
	// the pier's support and the axial force of the band's overturning
	// couple), Dead and Live the axial forces of the tributary gravity
	// loads. Zero for a cut pier.
	Loads PierLoads
}

// H, L and Ratio give the pier's height, length and h/L.
func (p Pier) H() float64     { return p.Rect.H() }
func (p Pier) L() float64     { return p.Rect.W() }
func (p Pier) Ratio() float64 { return p.Rect.H() / p.Rect.W() }

// DriftCheck is the storey-drift check of the wall's top deflection
// (docs/method.md §7). Without C_d and I_e there is no design drift and no
// verdict: Missing says what is missing, Design and Ratio are zero.
type DriftCheck struct {
	Elastic   geometry.Length // δe, the top deflection under the wall's shear
	Design    geometry.Length // δ = Cd·δe/Ie; zero when Missing
	Height    geometry.Length // h_sx: [drift] storey_height, or the wall's height
	Allowable geometry.Length // Limit·h_sx; zero when no limit is set
	Ratio     float64         // δ/h_sx
	OK        bool            // δ ≤ allowable (true when no verdict is made)
	Missing   string          // "C_d", "I_e", "C_d and I_e" when not given; "" otherwise
}

// Judged reports whether the check gives a verdict: a limit is set and
// C_d and I_e are given.
func (d DriftCheck) Judged() bool { return d.Allowable > 0 && d.Missing == "" }

// Verdict is the check's verdict in words: "OK", "EXCEEDS THE LIMIT", or
// why there is none ("no verdict: C_d and I_e not given", "no limit set").
func (d DriftCheck) Verdict() string {
	switch {
	case d.Missing != "":
		return "no verdict: " + d.Missing + " not given"
	case d.Allowable <= 0:
		return "no limit set"
	case d.OK:
		return "OK"
	}
	return "EXCEEDS THE LIMIT"
}

// Result is the classic method's answer for one wall layout. The report and
// the editor are two views of it; neither recomputes anything.
type Result struct {
	Deflection float64 // relative deflection, 1/(E t)
	Rigidity   float64 // relative rigidity = 1/Deflection
	Split      Parts   // the wall's deflection split into bending and shear
	Steps      []Step
	Piers      []Pier // every pier, parents before children, in name order

	// Known when the material gives moduli (Moduli.E > 0).
	Moduli        Moduli
	RigidityAbs   float64         // N/m: Rigidity·E·t
	HasLoad       bool            // the wall has a shear load
	DeflectionAbs geometry.Length // top deflection under the load
	Drift         DriftCheck      // filled when HasLoad

	// Overturning is the wall's base overturning moment under its shear,
	// N·m: V·h for a cantilever, V·h/2 for a wall whose top is held
	// against rotation (docs/method.md §6). Zero without a load.
	Overturning float64

	Warnings []Warning // where the method's assumptions are weak, in the order found
}

// Severity says how much a warning bears on the numbers.
type Severity int

const (
	// SeverityInfo: a note on an assumption every wall of its kind
	// shares (fixed piers, a fixed top).
	SeverityInfo Severity = iota
	// SeverityCaution: an assumption is weak here; the numbers near it
	// deserve a second look (a shallow spandrel, a sliver pier).
	SeverityCaution
	// SeveritySerious: part of the wall is outside the method; its
	// numbers there are missing (a pier without a load path).
	SeveritySerious
)

// String returns the severity as a word: "info", "caution", "serious".
func (s Severity) String() string {
	switch s {
	case SeverityCaution:
		return "caution"
	case SeveritySerious:
		return "serious"
	}
	return "info"
}

// Warning is one place where the method's assumptions are weak.
type Warning struct {
	Kind     string   // one of the Warn… constants
	Severity Severity // how much it bears on the numbers
	Subject  string   // what it is about: "wall", a pier ("P2") or openings ("W1, W2")
	Text     string   // the sentence shown to the user
}

// Texts returns the texts of warnings, in order.
func Texts(warnings []Warning) []string {
	out := make([]string, len(warnings))
	for i, w := range warnings {
		out[i] = w.Text
	}
	return out
}

// Kinds of warnings (Warning.Kind).
const (
	WarnCutPier      = "pier without load path"
	WarnStaggered    = "staggered band"
	WarnSpandrel     = "shallow spandrel"
	WarnSolidBetween = "thin solid between bands"
	WarnSliver       = "sliver pier"
	WarnSlender      = "slender pier"
	WarnSlenderWall  = "slender wall"
	WarnNearEdge     = "opening near base or top"
	WarnFixedPiers   = "fixed piers" // no longer raised per wall: see FixedPiersAssumption
	WarnFixedTop     = "fixed top"
	WarnOnePier      = "one pier in its band"
	WarnMergedEdges  = "merged opening edges" // SnapEdges

	// Drift warnings (docs/method.md §7): a limit preset whose row of
	// ASCE 7-22 Table 12.12-1 does not fit the wall, a single top load on a
	// wall with openings at more than one level, gross-section stiffness,
	// a wind load under a seismic drift check.
	WarnDriftRow     = "drift limit row"
	WarnDriftStoreys = "drift over storeys"
	WarnDriftGross   = "drift on gross sections"
	WarnDriftWind    = "seismic drift under wind"
)

// FixedPiersAssumption is the method's rigid-spandrel assumption, which
// every wall with openings shares: the help and the report's assumptions
// state it once (docs/method.md §2.6) rather than a warning on every wall.
const FixedPiersAssumption = "Piers marked fixed are assumed held against rotation at top and bottom by rigid spandrels; hand methods of this kind tend to overestimate the rigidity of walls with large openings (often by tens of percent): compare with the finite-element check."

// LayoutWarning reports whether a warning kind comes from the layout of the
// openings (where they are) weakening the method's assumptions, rather than
// from the method as a whole (fixed piers, a fixed top), which every layout
// of the wall shares, or from the drift check's settings.
func LayoutWarning(kind string) bool {
	switch kind {
	case WarnFixedPiers, WarnFixedTop, WarnDriftRow, WarnDriftStoreys, WarnDriftGross, WarnDriftWind:
		return false
	}
	return true
}

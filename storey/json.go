package storey

import (
	"math"

	"pierwise/geometry"
	"pierwise/pier"
	"pierwise/report"
)

// JSON is the machine-readable form of an Analysis (pierwise storey --json).
// Coordinates are in the storey's base unit (ft or m), forces in kip or kN,
// rigidities in kip/in or kN/mm, moments in kip·ft or kN·m, as Units says.
type JSON struct {
	File             string     `json:"file"`
	Title            string     `json:"title"`
	Units            JSONUnits  `json:"units"`
	Shear            float64    `json:"shear"`
	MassCenter       [2]float64 `json:"mass_center"`
	Size             [2]float64 `json:"size"`
	Accidental       float64    `json:"accidental"`
	RigidityAbsolute bool       `json:"rigidity_absolute"` // false: relative rigidity × thickness was used
	CenterOfRigidity [2]float64 `json:"center_of_rigidity"`
	J                *float64   `json:"torsional_rigidity,omitempty"` // moment unit per radian; absent when rigidities are relative
	Cases            []JSONCase `json:"cases"`
	Walls            []JSONWall `json:"walls"`
	Warnings         []string   `json:"warnings"`

	Diaphragm string `json:"diaphragm"` // "rigid", "flexible" or "envelope"
	// Governing names the distribution that gives the walls' design shears:
	// "rigid", "flexible", or "envelope" (each wall's larger; its case says
	// which). On "flexible", cases, torsional_irregularity, the walls' rigid
	// shears and storey_drift's edges are the rigid diaphragm's, for
	// comparison only.
	Governing             string             `json:"governing"`
	Basis                 string             `json:"basis"` // "classic" or "fe"
	SDC                   string             `json:"sdc,omitempty"`
	TorsionalIrregularity []JSONIrregularity `json:"torsional_irregularity"` // one per rigid-diaphragm case
	Flexible              *JSONFlexible      `json:"flexible,omitempty"`
	StoreyDrift           *JSONStoreyDrift   `json:"storey_drift,omitempty"`
}

// JSONIrregularity is the torsional irregularity check of one case
// (ASCE 7-22 Table 12.3-1, §12.8.4.3): δ_max/δ_avg at the plan edges
// perpendicular to the load, the type ("none", "1a", "1b") and A_x. Ratio
// is null when the average displacement is not positive.
type JSONIrregularity struct {
	Case          string   `json:"case"`
	Ratio         *float64 `json:"ratio"`
	Type          string   `json:"type"`
	Amplification float64  `json:"amplification"`
}

// JSONFlexible is the flexible-diaphragm distribution: the wall lines of
// each direction with their tributary stretch and shear.
type JSONFlexible struct {
	Lines []JSONLine `json:"lines"`
}

// JSONLine is one wall line of the flexible diaphragm.
type JSONLine struct {
	Load      string     `json:"load"`
	Position  float64    `json:"position"`
	Tributary [2]float64 `json:"tributary"`
	Shear     float64    `json:"shear"`
	Walls     []string   `json:"walls"`
}

// JSONStoreyDrift is the storey drift check: C_d, I_e, the storey height,
// the limit (fraction of the height, 0 when none) and the drift at the plan
// edges in each rigid case.
type JSONStoreyDrift struct {
	Cd     float64         `json:"cd"`
	Ie     float64         `json:"ie"`
	Height float64         `json:"height"`
	Limit  float64         `json:"limit"`
	Edges  []JSONEdgeDrift `json:"edges"`
}

// JSONEdgeDrift is the drift at one plan edge in one case.
type JSONEdgeDrift struct {
	Case string `json:"case"`
	Edge string `json:"edge"`
	JSONDrift
}

// JSONUnits names the units of the numbers.
type JSONUnits struct {
	Length   string `json:"length"`
	Force    string `json:"force"`
	Rigidity string `json:"rigidity"`
	Moment   string `json:"moment"`
}

// JSONCase is one load case.
type JSONCase struct {
	Name         string  `json:"name"` // "x +acc", …
	Load         string  `json:"load"` // "x" or "y"
	Eccentricity float64 `json:"eccentricity"`
	Torque       float64 `json:"torque"`
}

// JSONDrift is a wall's drift check under its design shear: δ = Cd·δe/Ie
// (in or mm), δ/h, the allowable drift (in or mm) and whether it passes.
type JSONDrift struct {
	Design    float64 `json:"design"`
	Ratio     float64 `json:"ratio"`
	Allowable float64 `json:"allowable"`
	OK        bool    `json:"ok"`
}

// JSONWall is one wall's answer.
type JSONWall struct {
	Name             string          `json:"name"`
	File             string          `json:"file"`
	Layout           string          `json:"layout"` // the wall file's layout used
	Direction        string          `json:"direction"`
	Position         float64         `json:"position"`
	RigidityRelative float64         `json:"rigidity_relative"`
	Rigidity         *float64        `json:"rigidity,omitempty"`
	Distance         float64         `json:"distance"` // from the centre of rigidity, across the wall
	DirectShear      float64         `json:"direct_shear"`
	DesignShear      float64         `json:"design_shear"`
	GoverningCase    string          `json:"governing_case"` // a case name, or "direct"
	Cases            []JSONWallCase  `json:"cases"`
	Deflection       *float64        `json:"deflection,omitempty"` // top deflection under the design shear, in or mm
	Drift            *JSONDrift      `json:"drift,omitempty"`      // the wall file's drift check under the design shear, when it sets a limit
	Piers            []JSONPierForce `json:"piers"`
	Warnings         []string        `json:"warnings"`

	Angle           *float64       `json:"angle,omitempty"`  // degrees from +x, for a wall at an angle
	At              *[2]float64    `json:"at,omitempty"`     // a point on its line, for a wall at an angle
	RigidityGiven   bool           `json:"rigidity_given"`   // the wall is given by its rigidity, not a wall file
	RigidityClassic *float64       `json:"rigidity_classic"` // the classic method's rigidity, in the unit of "rigidity"
	RigidityFE      *float64       `json:"rigidity_fe"`      // the finite-element rigidity (fe basis)
	RigidShear      float64        `json:"rigid_shear"`      // the rigid-diaphragm design shear
	FlexibleShear   *float64       `json:"flexible_shear"`   // the flexible-diaphragm shear (flexible and envelope)
	StoreyDrift     *JSONDrift     `json:"storey_drift"`     // the storey drift at the wall (Cd, Ie and height of [storey])
	GoverningPier   *JSONGoverning `json:"governing_pier"`   // null until pier design exists
}

// JSONGoverning is a wall's governing pier under its design shear.
type JSONGoverning struct {
	Pier  string  `json:"pier"`
	Ratio float64 `json:"ratio"`
	Check string  `json:"check"`
}

// JSONWallCase is a wall's shear in one case.
type JSONWallCase struct {
	Case      string  `json:"case"`
	Direct    float64 `json:"direct"`
	Torsional float64 `json:"torsional"`
	Total     float64 `json:"total"`
}

// JSONPierForce is a leaf pier under the wall's design shear.
type JSONPierForce struct {
	Name    string  `json:"name"`
	H       float64 `json:"h"`
	L       float64 `json:"l"`
	Support string  `json:"support"`
	Share   float64 `json:"share"`
	Shear   float64 `json:"shear"`
	Moment  float64 `json:"moment"`
}

// JSON returns the machine-readable form of a.
func (a *Analysis) JSON() JSON {
	s, d := a.Storey, a.Distribution
	u := report.UnitsFor(s.Units)
	f := func(v float64) float64 { return report.Tidy(u.ForceOf(geometry.Force(v))) }
	c := func(v float64) float64 { return report.Tidy(u.CoordOf(v)) }
	j := JSON{
		File: s.Path, Title: s.Title,
		Units:            JSONUnits{Length: u.Coord, Force: u.Force, Rigidity: u.Rigidity, Moment: u.Moment},
		Shear:            f(float64(s.Shear)),
		MassCenter:       [2]float64{c(float64(s.MassCenter[0])), c(float64(s.MassCenter[1]))},
		Size:             [2]float64{c(float64(s.Size[0])), c(float64(s.Size[1]))},
		Accidental:       s.Accidental,
		RigidityAbsolute: a.Absolute,
		CenterOfRigidity: [2]float64{c(d.CenterOfRigidity[0]), c(d.CenterOfRigidity[1])},
		Warnings:         append([]string{}, a.Warnings...),
	}
	if a.Absolute {
		jv := report.Tidy(u.MomentOf(d.J))
		j.J = &jv
	}
	for _, cs := range d.Cases {
		j.Cases = append(j.Cases, JSONCase{Name: cs.Name(), Load: cs.Load.String(), Eccentricity: c(cs.Eccentricity), Torque: report.Tidy(u.MomentOf(cs.Torque))})
	}
	j.Diaphragm, j.Basis, j.SDC = s.Diaphragm.String(), s.Basis.String(), s.SDC
	j.Governing = s.Diaphragm.String() // the diaphragm chosen gives the design shears
	for _, cs := range d.Cases {
		ji := JSONIrregularity{Case: cs.Name(), Type: cs.Torsion.Type.String(), Amplification: report.Tidy(cs.Torsion.Amplification)}
		if r := cs.Torsion.Ratio; !math.IsInf(r, 0) {
			r = report.Tidy(r)
			ji.Ratio = &r
		}
		j.TorsionalIrregularity = append(j.TorsionalIrregularity, ji)
	}
	if a.Flexible != nil {
		jf := &JSONFlexible{Lines: []JSONLine{}}
		for _, lines := range a.Flexible.Lines {
			for _, ln := range lines {
				jl := JSONLine{Load: ln.Load.String(), Position: c(ln.Position), Tributary: [2]float64{c(ln.Tributary[0]), c(ln.Tributary[1])}, Shear: f(ln.Shear)}
				for _, i := range ln.Members {
					jl.Walls = append(jl.Walls, a.Walls[i].Name)
				}
				jf.Lines = append(jf.Lines, jl)
			}
		}
		j.Flexible = jf
	}
	jd := func(dr Drift) *JSONDrift {
		if !dr.Checked {
			return nil
		}
		return &JSONDrift{Design: report.Tidy(u.DeflectionOf(geometry.Length(dr.Design))), Ratio: report.Tidy(dr.Ratio), Allowable: report.Tidy(u.DeflectionOf(geometry.Length(dr.Allowable))), OK: dr.OK}
	}
	if s.Cd > 0 && a.Absolute {
		sd := &JSONStoreyDrift{Cd: s.Cd, Ie: s.Ie, Height: c(float64(s.Height)), Limit: s.DriftLimit, Edges: []JSONEdgeDrift{}}
		for _, e := range a.Edges {
			sd.Edges = append(sd.Edges, JSONEdgeDrift{Case: d.Cases[e.Case].Name(), Edge: e.Edge, JSONDrift: *jd(e.Drift)})
		}
		j.StoreyDrift = sd
	}
	for i, w := range a.Walls {
		jw := JSONWall{
			Name: w.Name, File: w.Ref.File, Direction: w.Ref.Direction.String(), Position: c(float64(w.Ref.Position)),
			Distance:    c(d.Distance[i]),
			DirectShear: f(w.Design.Direct), DesignShear: f(w.Design.Shear), GoverningCase: CaseName(d, w.Design.Case),
			Piers: []JSONPierForce{}, Warnings: []string{}, RigidityGiven: w.Ref.HasRigidity, RigidShear: f(w.Rigid.Shear),
			StoreyDrift: jd(w.Drift),
		}
		if w.Wall != nil {
			jw.Layout = w.Wall.Layouts[w.Wall.Active].Name
		}
		if w.Ref.Direction == Angled {
			ang, at := w.Ref.AngleDeg, [2]float64{c(float64(w.Ref.At[0])), c(float64(w.Ref.At[1]))}
			jw.Angle, jw.At = &ang, &at
		}
		if w.Unit != nil {
			jw.RigidityRelative = w.Unit.Rigidity
		} else if w.FE != nil {
			jw.RigidityRelative = w.FE.Rigidity
		}
		if a.Absolute {
			r := report.Tidy(u.RigidityOf(w.Rigidity))
			jw.Rigidity = &r
		}
		rig := func(r float64) *float64 {
			if !(r > 0) {
				return nil
			}
			v := report.Tidy(r)
			if a.Absolute {
				v = report.Tidy(u.RigidityOf(r))
			}
			return &v
		}
		jw.RigidityClassic = rig(w.ClassicRigidity)
		jw.RigidityFE = rig(w.FERigidity)
		if a.Flexible != nil {
			v := f(w.Flexible)
			jw.FlexibleShear = &v
		}
		for _, cs := range d.Cases {
			sh := cs.Shares[i]
			jw.Cases = append(jw.Cases, JSONWallCase{Case: cs.Name(), Direct: f(sh.Direct), Torsional: f(sh.Torsional), Total: f(sh.Total())})
		}
		if a.Absolute && w.Rigidity > 0 && w.Design.Shear > 0 {
			v := report.Tidy(u.DeflectionOf(geometry.Length(w.Design.Shear / w.Rigidity)))
			jw.Deflection = &v
		}
		if w.Loaded != nil {
			jw.Warnings = append(jw.Warnings, pier.Texts(w.Loaded.Warnings)...)
			if dr := w.Loaded.Drift; s.Basis == geometry.BasisClassic && w.Loaded.HasLoad && dr.Judged() {
				jw.Drift = &JSONDrift{Design: report.Tidy(u.DeflectionOf(dr.Design)), Ratio: report.Tidy(dr.Ratio), Allowable: report.Tidy(u.DeflectionOf(dr.Allowable)), OK: dr.OK}
			}
		}
		if w.FE != nil {
			jw.Warnings = append(jw.Warnings, w.FE.Warnings...)
		}
		if g := w.Governing; g != nil {
			jw.GoverningPier = &JSONGoverning{Pier: g.Pier, Ratio: report.Tidy(g.Ratio), Check: g.Check}
		}
		for _, p := range w.Piers {
			jw.Piers = append(jw.Piers, JSONPierForce{
				Name: p.Name, H: c(p.H()), L: c(p.L()), Support: p.Support.String(),
				Share: p.Share, Shear: f(float64(p.Shear)), Moment: report.Tidy(u.MomentOf(p.Moment)),
			})
		}
		j.Walls = append(j.Walls, jw)
	}
	return j
}

package storey

import (
	"strconv"

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
	f := func(v float64) float64 { return tidy(u.ForceOf(geometry.Force(v))) }
	c := func(v float64) float64 { return tidy(u.CoordOf(v)) }
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
		jv := tidy(u.MomentOf(d.J))
		j.J = &jv
	}
	for _, cs := range d.Cases {
		j.Cases = append(j.Cases, JSONCase{Name: cs.Name(), Load: cs.Load.String(), Eccentricity: c(cs.Eccentricity), Torque: tidy(u.MomentOf(cs.Torque))})
	}
	for i, w := range a.Walls {
		jw := JSONWall{
			Name: w.Name, File: w.Ref.File, Layout: w.Wall.Layouts[w.Wall.Active].Name, Direction: w.Ref.Direction.String(), Position: c(float64(w.Ref.Position)),
			RigidityRelative: w.Unit.Rigidity, Distance: c(d.Distance[i]),
			DirectShear: f(w.Design.Direct), DesignShear: f(w.Design.Shear), GoverningCase: CaseName(d, w.Design.Case),
			Piers: []JSONPierForce{}, Warnings: append([]string{}, pier.Texts(w.Loaded.Warnings)...),
		}
		if a.Absolute {
			r := tidy(u.RigidityOf(w.Rigidity))
			jw.Rigidity = &r
		}
		for _, cs := range d.Cases {
			sh := cs.Shares[i]
			jw.Cases = append(jw.Cases, JSONWallCase{Case: cs.Name(), Direct: f(sh.Direct), Torsional: f(sh.Torsional), Total: f(sh.Total())})
		}
		if w.Loaded.DeflectionAbs > 0 {
			v := tidy(u.DeflectionOf(w.Loaded.DeflectionAbs))
			jw.Deflection = &v
		}
		if dr := w.Loaded.Drift; w.Loaded.HasLoad && dr.Allowable > 0 {
			jw.Drift = &JSONDrift{Design: tidy(u.DeflectionOf(dr.Design)), Ratio: tidy(dr.Ratio), Allowable: tidy(u.DeflectionOf(dr.Allowable)), OK: dr.OK}
		}
		for _, p := range w.Loaded.Leaves() {
			jw.Piers = append(jw.Piers, JSONPierForce{
				Name: p.Name, H: c(p.H()), L: c(p.L()), Support: supportName(p.Support),
				Share: p.Share, Shear: f(float64(p.Shear)), Moment: tidy(u.MomentOf(p.Moment)),
			})
		}
		j.Walls = append(j.Walls, jw)
	}
	return j
}

// tidy rounds to 12 significant digits, so that 50 ft read as metres and
// converted back prints as 50, not 50.000000000000007.
func tidy(x float64) float64 {
	y, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'g', 12, 64), 64)
	return y
}

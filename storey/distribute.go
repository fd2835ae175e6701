package storey

import (
	"errors"
	"fmt"
	"math"
)

// Direction is the axis along which a wall resists shear (its own line).
type Direction int

const (
	X Direction = iota // the wall runs along x and resists shear along x
	Y                  // the wall runs along y and resists shear along y
)

func (d Direction) String() string {
	if d == Y {
		return "y"
	}
	return "x"
}

// other returns the perpendicular direction.
func (d Direction) other() Direction { return 1 - d }

// Member is one wall as the diaphragm sees it: a spring of rigidity
// Rigidity on a line. Position is the wall's line in plan: y of an x-wall, x
// of a y-wall, in metres. Rigidity may be in any unit as long as every member
// uses the same one (only ratios matter).
type Member struct {
	Name      string
	Direction Direction
	Position  float64
	Rigidity  float64
}

// Action is the storey shear and where it acts.
type Action struct {
	Shear      float64    // V in newtons, applied along x and along y in turn
	MassCenter [2]float64 // (x, y) in metres, where V acts
	Size       [2]float64 // plan dimensions (x, y) in metres
	Accidental float64    // fraction of the plan dimension perpendicular to the load
}

// Case is one load case: V along Load with eccentricity
// E = e_mass ± Accidental·(plan dimension perpendicular to the load).
type Case struct {
	Load Direction
	Sign int // +1 or -1: the sign of the accidental part

	// Eccentricity is the mass centre's distance from the centre of rigidity,
	// measured perpendicular to the load (y_m − y_R for a load along x,
	// x_m − x_R for a load along y), accidental part included; metres.
	Eccentricity float64

	// Torque is V·Eccentricity in N·m.
	Torque float64

	// Shares holds one entry per member, in member order.
	Shares []Share
}

// Name says which case this is, e.g. "x +acc".
func (c Case) Name() string {
	if c.Sign < 0 {
		return c.Load.String() + " -acc"
	}
	return c.Load.String() + " +acc"
}

// Share is one wall's shear in one case, in newtons, along the positive axis
// of the wall's own direction when V acts along the positive axis of the
// load. For a wall parallel to the load Direct = V·R/ΣR and
// Torsional = +V·e·d·R/J, so a positive torsional shear adds to the direct
// one; for a wall perpendicular to the load Direct = 0 and
// Torsional = −V·e·d·R/J. Here d is the wall's signed distance from the
// centre of rigidity (y − y_R for an x-wall, x − x_R for a y-wall).
type Share struct {
	Direct    float64
	Torsional float64
}

// Total returns Direct + Torsional.
func (s Share) Total() float64 { return s.Direct + s.Torsional }

// Design is one wall's design shear: the largest in-plane shear it takes in
// any case, never less than its direct shear (torsion is not allowed to relieve
// a wall: common practice, and the load may reverse, so |total| counts).
type Design struct {
	Direct float64 // V·R/ΣR under the load along the wall's own direction
	Shear  float64 // the design shear, ≥ Direct
	Case   int     // index into Distribution.Cases of the governing case; -1 when the direct shear alone governs
}

// Distribution is the rigid-diaphragm answer for one storey.
type Distribution struct {
	// CenterOfRigidity is (x_R, y_R) in metres: x_R from the y-walls,
	// y_R from the x-walls.
	CenterOfRigidity [2]float64

	// SumRigidity is ΣR of the walls of each direction (index X, Y).
	SumRigidity [2]float64

	// Distance is each member's signed distance d from the centre of
	// rigidity, perpendicular to its line (metres).
	Distance []float64

	// J = Σ R·d² over the walls of both directions.
	J float64

	// Accidental is the accidental eccentricity for a load along X and
	// along Y (metres): Accidental·Size[Y] and Accidental·Size[X].
	AccidentalEccentricity [2]float64

	// Cases: x +acc, x -acc, y +acc, y -acc.
	Cases []Case

	// Designs holds one entry per member.
	Designs []Design
}

// Errors Distribute returns for a storey that cannot carry the load.
var (
	ErrNoWall    = errors.New("no wall resists this direction")
	ErrTorsion   = errors.New("the walls cannot resist torsion: every wall of each direction lies on one line, so all the walls pass through one point")
	ErrRigidity  = errors.New("a wall's rigidity must be positive and finite")
	ErrPlanInput = errors.New("storey: the shear must be finite and ≥ 0, the plan size positive and the accidental fraction ≥ 0")
)

// DirectionError says that a direction has no wall.
type DirectionError struct{ Direction Direction }

func (e *DirectionError) Error() string {
	return fmt.Sprintf("no wall resists shear along %s: add a wall with direction = %q", e.Direction, e.Direction.String())
}

func (e *DirectionError) Unwrap() error { return ErrNoWall }

// Distribute shares the storey shear among the members through a rigid
// diaphragm, with torsion from the mass centre's eccentricity and the
// accidental eccentricity (ASCE 7-22 §12.8.4.2). It returns an error for a
// direction with no wall, a wall with no rigidity, or a set of walls that
// cannot resist torsion (J = 0).
func Distribute(members []Member, a Action) (*Distribution, error) {
	if !(a.Shear >= 0) || math.IsInf(a.Shear, 0) || !(a.Size[0] > 0) || !(a.Size[1] > 0) || !(a.Accidental >= 0) {
		return nil, ErrPlanInput
	}
	d := &Distribution{Distance: make([]float64, len(members)), Designs: make([]Design, len(members))}
	var moment [2]float64
	for _, m := range members {
		if !(m.Rigidity > 0) || math.IsInf(m.Rigidity, 0) {
			return nil, fmt.Errorf("wall %s: %w", m.Name, ErrRigidity)
		}
		d.SumRigidity[m.Direction] += m.Rigidity
		moment[m.Direction] += m.Rigidity * m.Position
	}
	for _, dir := range []Direction{X, Y} {
		if d.SumRigidity[dir] == 0 {
			return nil, &DirectionError{dir}
		}
	}
	// The x-walls fix y_R, the y-walls fix x_R.
	d.CenterOfRigidity[Y] = moment[X] / d.SumRigidity[X]
	d.CenterOfRigidity[X] = moment[Y] / d.SumRigidity[Y]
	for i, m := range members {
		// An x-wall's distance is along y, a y-wall's along x.
		d.Distance[i] = m.Position - d.CenterOfRigidity[m.Direction.other()]
		d.J += m.Rigidity * d.Distance[i] * d.Distance[i]
	}
	// J vanishes (to rounding) when all walls pass through one point.
	diag2 := a.Size[0]*a.Size[0] + a.Size[1]*a.Size[1]
	if !(d.J > 1e-9*(d.SumRigidity[X]+d.SumRigidity[Y])*diag2) {
		return nil, ErrTorsion
	}

	for _, load := range []Direction{X, Y} {
		across := load.other() // eccentricity is measured across the load
		e0 := a.MassCenter[across] - d.CenterOfRigidity[across]
		acc := a.Accidental * a.Size[across]
		d.AccidentalEccentricity[load] = acc
		for _, sign := range []int{+1, -1} {
			c := Case{Load: load, Sign: sign, Eccentricity: e0 + float64(sign)*acc}
			c.Torque = a.Shear * c.Eccentricity
			c.Shares = make([]Share, len(members))
			for i, m := range members {
				t := c.Torque * d.Distance[i] * m.Rigidity / d.J
				if m.Direction == load {
					c.Shares[i] = Share{Direct: a.Shear * m.Rigidity / d.SumRigidity[load], Torsional: t}
				} else {
					c.Shares[i] = Share{Torsional: -t}
				}
			}
			d.Cases = append(d.Cases, c)
		}
	}

	for i, m := range members {
		direct := a.Shear * m.Rigidity / d.SumRigidity[m.Direction]
		g := Design{Direct: direct, Shear: direct, Case: -1}
		for ci, c := range d.Cases {
			// Strictly larger, with a little slack so a case equal to the
			// direct shear (no torsion) does not claim to govern.
			if v := math.Abs(c.Shares[i].Total()); v > g.Shear*(1+1e-12) {
				g.Shear, g.Case = v, ci
			}
		}
		d.Designs[i] = g
	}
	return d, nil
}

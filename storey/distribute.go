package storey

import (
	"errors"
	"fmt"
	"math"
)

// Direction is the axis along which a wall resists shear (its own line).
type Direction int

const (
	X      Direction = iota // the wall runs along x and resists shear along x
	Y                       // the wall runs along y and resists shear along y
	Angled                  // the wall runs at Member.Angle from the x axis
)

func (d Direction) String() string {
	switch d {
	case Y:
		return "y"
	case Angled:
		return "angle"
	}
	return "x"
}

// other returns the perpendicular direction of X or Y.
func (d Direction) other() Direction {
	if d == Y {
		return X
	}
	return Y
}

// Member is one wall as the diaphragm sees it: a spring of rigidity
// Rigidity along its own line. Position is the wall's line in plan: y of an
// x-wall, x of a y-wall, in metres. An Angled wall runs at Angle (radians,
// counter-clockwise from +x) through the point At. Rigidity may be in any
// unit as long as every member uses the same one (only ratios matter to the
// shears; the displacements are in metres when it is N/m).
type Member struct {
	Name      string
	Direction Direction
	Position  float64
	Angle     float64    // Angled only
	At        [2]float64 // Angled only: a point on the wall's line (x, y)
	Rigidity  float64
}

// axis returns the unit vector along which the wall resists shear and a
// point on its line.
func (m Member) axis() (c, s float64, p [2]float64) {
	switch m.Direction {
	case Y:
		return 0, 1, [2]float64{m.Position, 0}
	case Angled:
		return math.Cos(m.Angle), math.Sin(m.Angle), m.At
	}
	return 1, 0, [2]float64{0, m.Position}
}

// row is the wall's row of the compatibility matrix about the point o: its
// elongation along its own line is c·u_x + s·u_y + arm·θ, with
// arm = s·(x − x_o) − c·(y − y_o), the moment arm of a unit force along the
// wall about o, counter-clockwise positive (docs/method.md §9).
func (m Member) row(o [2]float64) [3]float64 {
	c, s, p := m.axis()
	return [3]float64{c, s, s*(p[0]-o[0]) - c*(p[1]-o[1])}
}

// Action is the storey shear and where it acts.
type Action struct {
	Shear      float64    // V in newtons, applied along x and along y in turn
	MassCenter [2]float64 // (x, y) in metres, where V acts
	Size       [2]float64 // plan dimensions (x, y) in metres
	Accidental float64    // fraction of the plan dimension perpendicular to the load

	// Amplify is true when the seismic design category is C to F: a case
	// found torsionally irregular (Type 1a or 1b) then has its accidental
	// eccentricity multiplied by A_x (ASCE 7-22 §12.8.4.3).
	Amplify bool
}

// Irregularity is the torsional irregularity type of ASCE 7-22
// Table 12.3-1 found in one load case.
type Irregularity int

const (
	Regular Irregularity = iota // δ_max/δ_avg ≤ 1.2
	Type1a                      // 1.2 < δ_max/δ_avg ≤ 1.4: torsional irregularity
	Type1b                      // δ_max/δ_avg > 1.4: extreme torsional irregularity
)

func (t Irregularity) String() string {
	switch t {
	case Type1a:
		return "1a"
	case Type1b:
		return "1b"
	}
	return "none"
}

// Torsion is the torsional irregularity check of one load case
// (ASCE 7-22 Table 12.3-1, Types 1a and 1b; §12.8.4.3), from the diaphragm's
// displacements along the load at the two plan edges perpendicular to the
// load, computed with A_x = 1 as the standard asks.
type Torsion struct {
	Edges         [2]float64 // displacement along the load at the edge at 0 and at the plan size (metres when rigidities are N/m)
	Ratio         float64    // δ_max/δ_avg; +Inf when the average is not positive
	Type          Irregularity
	Amplification float64 // A_x = (δ_max/1.2 δ_avg)² between 1 and 3 when Action.Amplify and the case is irregular; otherwise 1
}

// Case is one load case: V along Load with eccentricity
// E = e_mass ± A_x·Accidental·(plan dimension perpendicular to the load).
type Case struct {
	Load Direction
	Sign int // +1 or -1: the sign of the accidental part

	// Eccentricity is the mass centre's distance from the centre of rigidity,
	// measured perpendicular to the load (y_m − y_R for a load along x,
	// x_m − x_R for a load along y), amplified accidental part included;
	// metres.
	Eccentricity float64

	// Torque is V·Eccentricity in N·m.
	Torque float64

	// Displacement is the diaphragm's (u_x, u_y, θ) at the centre of
	// rigidity under this case, with the amplified eccentricity: metres and
	// radians when the rigidities are N/m.
	Displacement [3]float64

	// Edges is the displacement along the load at the plan edges
	// perpendicular to it (at 0 and at the plan size) under this case as
	// solved, amplified eccentricity included: the storey drift's δe there.
	// Torsion.Edges are the same with A_x = 1.
	Edges [2]float64

	Torsion Torsion

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
// load. Direct is the wall's shear under V applied at the centre of rigidity
// (no rotation): V·R/ΣR for a wall parallel to the load in an orthogonal
// plan, 0 for a wall across it. Torsional is its shear under the torque V·e
// alone: +V·e·d·R/J for a wall parallel to the load, −V·e·d·R/J across it,
// with d the wall's signed distance from the centre of rigidity (y − y_R
// for an x-wall, x − x_R for a y-wall).
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
	Direct float64 // the largest |direct| shear: V·R/ΣR under the load along the wall's own direction
	Shear  float64 // the design shear, ≥ Direct
	Case   int     // index into Distribution.Cases of the governing case; CaseDirect or CaseFlexible
}

// Values of Design.Case that are not a rigid-diaphragm case.
const (
	CaseDirect   = -1 // the direct shear alone governs
	CaseFlexible = -2 // the flexible-diaphragm share governs (envelope)
)

// Distribution is the rigid-diaphragm answer for one storey.
type Distribution struct {
	// CenterOfRigidity is (x_R, y_R) in metres: the point where a force
	// in any direction moves the diaphragm without turning it. In an
	// orthogonal plan x_R = Σ R·x / Σ R over the y-walls and
	// y_R = Σ R·y / Σ R over the x-walls.
	CenterOfRigidity [2]float64

	// SumRigidity is the diaphragm's translational stiffness along x and
	// along y (K_xx, K_yy): ΣR of the walls of each direction in an
	// orthogonal plan.
	SumRigidity [2]float64

	// Stiffness is the diaphragm's 3×3 stiffness matrix about the centre of
	// rigidity, over (u_x, u_y, θ); it is block-diagonal there.
	Stiffness [3][3]float64

	// Distance is each member's signed distance d from the centre of
	// rigidity, perpendicular to its line (metres): y − y_R for an x-wall,
	// x − x_R for a y-wall, the moment arm s·(x − x_R) − c·(y − y_R) for an
	// angled wall.
	Distance []float64

	// J = Σ R·arm² over all walls, the torsional stiffness about the
	// centre of rigidity.
	J float64

	// AccidentalEccentricity is the accidental eccentricity for a load along X
	// and along Y (metres) before amplification: Accidental·Size[Y] and
	// Accidental·Size[X].
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
	ErrParallel  = errors.New("every wall is parallel to one line: nothing resists shear across it")
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
// diaphragm, solved as a three-degree-of-freedom stiffness problem
// (u_x, u_y, θ), with torsion from the mass centre's eccentricity and the
// accidental eccentricity (ASCE 7-22 §12.8.4.2), and checks each case for
// torsional irregularity (ASCE 7-22 Table 12.3-1, §12.8.4.3). For an
// orthogonal plan the answer is the centre-of-rigidity method's (direct
// shear V·R/ΣR plus torsional shear V·e·d·R/J). It returns an error for a
// direction with no wall, a wall with no rigidity, or a set of walls that
// cannot resist torsion (J = 0). docs/method.md §9.
func Distribute(members []Member, a Action) (*Distribution, error) {
	if !(a.Shear >= 0) || math.IsInf(a.Shear, 0) || !(a.Size[0] > 0) || !(a.Size[1] > 0) || !(a.Accidental >= 0) ||
		math.IsInf(a.Size[0], 0) || math.IsInf(a.Size[1], 0) || math.IsInf(a.Accidental, 0) {
		return nil, ErrPlanInput
	}
	d := &Distribution{Distance: make([]float64, len(members)), Designs: make([]Design, len(members))}

	// Stiffness about the plan origin: K = Σ R·aᵀa.
	var k [3][3]float64
	var sum float64
	for _, m := range members {
		if !(m.Rigidity > 0) || math.IsInf(m.Rigidity, 0) || (m.Direction == Angled && (math.IsNaN(m.Angle) || math.IsInf(m.Angle, 0))) {
			return nil, fmt.Errorf("wall %s: %w", m.Name, ErrRigidity)
		}
		addOuter(&k, m.row([2]float64{}), m.Rigidity)
		sum += m.Rigidity
	}
	tiny := 1e-12 * sum
	for _, dir := range []Direction{X, Y} {
		if !(k[dir][dir] > tiny) {
			return nil, &DirectionError{dir}
		}
	}
	if det := k[0][0]*k[1][1] - k[0][1]*k[1][0]; !(det > 1e-9*k[0][0]*k[1][1]) {
		return nil, ErrParallel
	}
	// Centre of rigidity: the point o about which K_xθ and K_yθ vanish.
	// Moving the reference to o changes each arm by −s·x_o + c·y_o, so
	//   K_xθ(o) = K_xθ − K_xy·x_o + K_xx·y_o = 0
	//   K_yθ(o) = K_yθ − K_yy·x_o + K_xy·y_o = 0
	xo, yo, ok := solve2(k[0][1], -k[0][0], k[1][1], -k[0][1], k[0][2], k[1][2])
	if !ok {
		return nil, ErrParallel
	}
	d.CenterOfRigidity = [2]float64{xo, yo}
	cr := d.CenterOfRigidity
	d.Stiffness = [3][3]float64{}
	for i, m := range members {
		r := m.row(cr)
		addOuter(&d.Stiffness, r, m.Rigidity)
		switch m.Direction {
		case X:
			d.Distance[i] = m.Position - cr[Y]
		case Y:
			d.Distance[i] = m.Position - cr[X]
		default:
			d.Distance[i] = r[2]
		}
	}
	d.SumRigidity = [2]float64{d.Stiffness[0][0], d.Stiffness[1][1]}
	d.J = d.Stiffness[2][2]
	// J vanishes (to rounding) when all walls pass through one point.
	diag2 := a.Size[0]*a.Size[0] + a.Size[1]*a.Size[1]
	if !(d.J > 1e-9*(d.SumRigidity[X]+d.SumRigidity[Y])*diag2) {
		return nil, ErrTorsion
	}

	for _, load := range []Direction{X, Y} {
		across := load.other() // eccentricity is measured across the load
		e0 := a.MassCenter[across] - cr[across]
		acc := a.Accidental * a.Size[across]
		d.AccidentalEccentricity[load] = acc
		for _, sign := range []int{+1, -1} {
			c := Case{Load: load, Sign: sign}
			// First with A_x = 1, for the irregularity check.
			d.solveCase(&c, members, a, e0+float64(sign)*acc)
			c.Torsion = d.torsion(c, a)
			if c.Torsion.Amplification > 1 {
				d.solveCase(&c, members, a, e0+float64(sign)*acc*c.Torsion.Amplification)
			}
			c.Edges = d.edges(c, a)
			d.Cases = append(d.Cases, c)
		}
	}

	for i := range members {
		g := Design{Case: CaseDirect}
		for _, c := range d.Cases {
			g.Direct = math.Max(g.Direct, math.Abs(c.Shares[i].Direct))
		}
		g.Shear = g.Direct
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

// solveCase fills the eccentricity, torque, displacements and shares of c
// for the eccentricity e (across the load, from the centre of rigidity).
// About the centre of rigidity the stiffness is block-diagonal, so the
// translation answers V and the rotation answers the torque alone.
func (d *Distribution) solveCase(c *Case, members []Member, a Action, e float64) {
	c.Eccentricity = e
	c.Torque = a.Shear * e
	var f [2]float64
	f[c.Load] = a.Shear
	// V along +x at height e above R turns the plan clockwise (−V·e); V
	// along +y at e to the right of R turns it counter-clockwise (+V·e).
	moment := c.Torque
	if c.Load == X {
		moment = -moment
	}
	K := d.Stiffness
	ux, uy, _ := solve2(K[0][0], K[0][1], K[1][0], K[1][1], f[0], f[1])
	theta := moment / d.J
	c.Displacement = [3]float64{ux, uy, theta}
	c.Shares = make([]Share, len(members))
	for i, m := range members {
		r := m.row(d.CenterOfRigidity)
		c.Shares[i] = Share{Direct: m.Rigidity * (r[0]*ux + r[1]*uy), Torsional: m.Rigidity * r[2] * theta}
	}
}

// torsion checks case c for torsional irregularity: the displacement along
// the load at the two plan edges perpendicular to it (y = 0 and y = size_y
// for a load along x), δ_max/δ_avg against 1.2 and 1.4 (ASCE 7-22
// Table 12.3-1) and A_x = (δ_max/1.2 δ_avg)² within [1, 3] (ASCE 7-22
// §12.8.4.3) when the category asks for it.
func (d *Distribution) torsion(c Case, a Action) Torsion {
	t := Torsion{Edges: d.edges(c, a)}
	hi, avg := math.Max(t.Edges[0], t.Edges[1]), (t.Edges[0]+t.Edges[1])/2
	t.Amplification = 1
	switch {
	case a.Shear == 0:
		t.Ratio = 1
	case !(avg > 0):
		t.Ratio = math.Inf(1)
	default:
		t.Ratio = hi / avg
	}
	switch {
	case t.Ratio > 1.4*(1+1e-12):
		t.Type = Type1b
	case t.Ratio > 1.2*(1+1e-12):
		t.Type = Type1a
	}
	if a.Amplify && t.Type != Regular {
		ax := 3.0
		if !math.IsInf(t.Ratio, 0) {
			ax = math.Min(3, math.Max(1, (t.Ratio/1.2)*(t.Ratio/1.2)))
		}
		t.Amplification = ax
	}
	return t
}

// edges is the plate's displacement along the load at the two plan edges
// perpendicular to it under case c as solved.
func (d *Distribution) edges(c Case, a Action) [2]float64 {
	cr := d.CenterOfRigidity
	u := c.Displacement
	var e [2]float64
	for k, edge := range []float64{0, a.Size[c.Load.other()]} {
		if c.Load == X {
			e[k] = u[0] - u[2]*(edge-cr[Y])
		} else {
			e[k] = u[1] + u[2]*(edge-cr[X])
		}
	}
	return e
}

func addOuter(k *[3][3]float64, r [3]float64, w float64) {
	for i := range 3 {
		for j := range 3 {
			k[i][j] += w * r[i] * r[j]
		}
	}
}

// solve2 solves [a b; c d]·[x y] = [e f].
func solve2(a, b, c, dd, e, f float64) (x, y float64, ok bool) {
	det := a*dd - b*c
	if det == 0 || math.IsNaN(det) {
		return 0, 0, false
	}
	return (e*dd - b*f) / det, (a*f - e*c) / det, true
}

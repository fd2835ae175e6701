package storey

import (
	"errors"
	"fmt"
	"math"
	"sort"
)

// Diaphragm is how the storey's diaphragm shares the storey shear.
type Diaphragm int

const (
	Rigid    Diaphragm = iota // by rigidity, with torsion (Distribute)
	Flexible                  // by tributary length to the wall lines (DistributeFlexible)
	Envelope                  // each wall's larger of the two (common practice)
)

func (d Diaphragm) String() string {
	switch d {
	case Flexible:
		return "flexible"
	case Envelope:
		return "envelope"
	}
	return "rigid"
}

// ParseDiaphragm reads "rigid", "flexible" or "envelope".
func ParseDiaphragm(s string) (Diaphragm, bool) {
	for _, d := range []Diaphragm{Rigid, Flexible, Envelope} {
		if s == d.String() {
			return d, true
		}
	}
	return Rigid, false
}

// Line is one wall line of a flexible diaphragm: the walls of one direction
// on one line, and the shear the diaphragm delivers to it.
type Line struct {
	Load      Direction  // the direction of the load (and of the walls)
	Position  float64    // y of a line of x-walls, x of a line of y-walls, metres
	Tributary [2]float64 // the stretch of plan whose load comes to this line (midway to the neighbours, or the plan edge)
	Shear     float64    // newtons
	Rigidity  float64    // ΣR of its walls
	Members   []int      // indices of its walls
}

// FlexibleShares is the flexible-diaphragm answer for one storey: the storey
// shear along each direction spread across the plan as the mass is, carried
// to the wall lines by simple spans between adjacent lines (the stretch
// between a plan edge and the outermost line cantilevers to that line), and
// shared within a line by rigidity. docs/method.md §9.
type FlexibleShares struct {
	Lines [2][]Line // for a load along X and along Y

	// Load is the distributed load across the plan for a load along X and
	// along Y: w(s) = Load[d][0] + Load[d][1]·s newtons per metre, s from 0
	// to the plan size across the load. Uniform when the mass centre is at
	// the plan's centre; linear with its resultant at the mass centre
	// otherwise.
	Load [2][2]float64

	Shears []float64 // one per member: its shear under the load along its own direction
}

// Errors of DistributeFlexible.
var (
	ErrFlexibleAngle = errors.New("a flexible diaphragm shares shear by wall lines along x and y; a wall at an angle has no line")
	ErrMassOutside   = errors.New("a flexible diaphragm spreads the mass linearly across the plan, which needs the mass centre within the middle third of the plan")
)

// LineError says that a direction has fewer than two wall lines, so a
// flexible diaphragm (a beam spanning between wall lines) cannot carry the
// load to the walls.
type LineError struct{ Direction Direction }

func (e *LineError) Error() string {
	return fmt.Sprintf("a flexible diaphragm needs at least two lines of %s-walls to span between; there is only one", e.Direction)
}

// DistributeFlexible shares the storey shear among the members through a
// flexible diaphragm. Accidental torsion does not apply to a flexible
// diaphragm (ASCE 7-22 §12.8.4.2 asks for it "where diaphragms are not
// flexible").
func DistributeFlexible(members []Member, a Action) (*FlexibleShares, error) {
	if !(a.Shear >= 0) || math.IsInf(a.Shear, 0) || !(a.Size[0] > 0) || !(a.Size[1] > 0) || math.IsInf(a.Size[0], 0) || math.IsInf(a.Size[1], 0) {
		return nil, ErrPlanInput
	}
	f := &FlexibleShares{Shears: make([]float64, len(members))}
	for _, m := range members {
		if m.Direction == Angled {
			return nil, fmt.Errorf("wall %s: %w", m.Name, ErrFlexibleAngle)
		}
		if !(m.Rigidity > 0) || math.IsInf(m.Rigidity, 0) {
			return nil, fmt.Errorf("wall %s: %w", m.Name, ErrRigidity)
		}
	}
	for _, load := range []Direction{X, Y} {
		across := load.other()
		L := a.Size[across]
		tol := 1e-6 * L
		// Group the walls of this direction into lines.
		var idx []int
		for i, m := range members {
			if m.Direction == load {
				idx = append(idx, i)
			}
		}
		if len(idx) == 0 {
			return nil, &DirectionError{load}
		}
		sort.SliceStable(idx, func(p, q int) bool { return members[idx[p]].Position < members[idx[q]].Position })
		var lines []Line
		for _, i := range idx {
			m := members[i]
			if n := len(lines); n > 0 && m.Position-lines[n-1].Position <= tol {
				lines[n-1].Members = append(lines[n-1].Members, i)
				lines[n-1].Rigidity += m.Rigidity
				continue
			}
			lines = append(lines, Line{Load: load, Position: m.Position, Members: []int{i}, Rigidity: m.Rigidity})
		}
		if len(lines) < 2 {
			return nil, &LineError{load}
		}
		// The load across the plan: w(s) = p + q·s with Σ = V and its
		// resultant at the mass centre; w ≥ 0 needs the mass centre within
		// the middle third.
		sm := a.MassCenter[across]
		if math.Abs(sm-L/2) > L/6*(1+1e-9) {
			return nil, ErrMassOutside
		}
		q := 12 * a.Shear * (sm - L/2) / (L * L * L)
		p := a.Shear/L - q*L/2
		f.Load[load] = [2]float64{p, q}
		w := func(s float64) float64 { return p + q*s }
		// ∫ g over [s0, s1] by Simpson's rule, exact for the quadratics here.
		integral := func(g func(float64) float64, s0, s1 float64) float64 {
			return (s1 - s0) / 6 * (g(s0) + 4*g((s0+s1)/2) + g(s1))
		}
		n := len(lines)
		lines[0].Shear += integral(w, 0, lines[0].Position)
		lines[n-1].Shear += integral(w, lines[n-1].Position, L)
		lines[0].Tributary[0], lines[n-1].Tributary[1] = 0, L
		for k := 0; k+1 < n; k++ {
			s0, s1 := lines[k].Position, lines[k+1].Position
			span := s1 - s0
			lines[k].Shear += integral(func(s float64) float64 { return w(s) * (s1 - s) / span }, s0, s1)
			lines[k+1].Shear += integral(func(s float64) float64 { return w(s) * (s - s0) / span }, s0, s1)
			lines[k].Tributary[1], lines[k+1].Tributary[0] = (s0+s1)/2, (s0+s1)/2
		}
		for _, ln := range lines {
			for _, i := range ln.Members {
				f.Shears[i] = ln.Shear * members[i].Rigidity / ln.Rigidity
			}
		}
		f.Lines[load] = lines
	}
	return f, nil
}

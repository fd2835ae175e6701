package storey

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// caseOf returns the case of d for a load along load with the accidental
// part of sign sign.
func caseOf(t *testing.T, d *Distribution, load Direction, sign int) Case {
	t.Helper()
	for _, c := range d.Cases {
		if c.Load == load && c.Sign == sign {
			return c
		}
	}
	t.Fatalf("no case %v %d", load, sign)
	return Case{}
}

// randomOrthogonal is a seeded random plan with walls along x and y only.
func randomOrthogonal(rng *rand.Rand) ([]Member, Action) {
	size := [2]float64{5 + 60*rng.Float64(), 5 + 60*rng.Float64()}
	var members []Member
	for _, dir := range []Direction{X, Y} {
		for k := 0; k < 2+rng.IntN(4); k++ {
			members = append(members, Member{Direction: dir, Position: size[dir.other()] * rng.Float64(), Rigidity: 0.01 + 5*rng.Float64()})
		}
	}
	a := Action{Shear: 1e3 + 1e6*rng.Float64(), MassCenter: [2]float64{size[0] * rng.Float64(), size[1] * rng.Float64()}, Size: size, Accidental: 0.05}
	return members, a
}

// For orthogonal plans the three-degree-of-freedom solve gives exactly the
// centre-of-rigidity method (Taly, Design of Reinforced Masonry Structures,
// 2nd ed., §7.9): x_R = Σ R·x/ΣR over the y-walls, y_R likewise,
// J = Σ R·d², direct shear V·R/ΣR and torsional shear ±V·e·d·R/J, here
// written out again independently of Distribute.
func TestStiffnessSolveEqualsCentreOfRigidity(t *testing.T) {
	rng := rand.New(rand.NewPCG(13, 0))
	for trial := 0; trial < 300; trial++ {
		members, a := randomOrthogonal(rng)
		d, err := Distribute(members, a)
		if err != nil {
			continue // walls through one point
		}
		var sumR, sumRP [2]float64
		for _, m := range members {
			sumR[m.Direction] += m.Rigidity
			sumRP[m.Direction] += m.Rigidity * m.Position
		}
		cr := [2]float64{sumRP[Y] / sumR[Y], sumRP[X] / sumR[X]}
		J := 0.0
		dist := make([]float64, len(members))
		for i, m := range members {
			dist[i] = m.Position - cr[m.Direction.other()]
			J += m.Rigidity * dist[i] * dist[i]
		}
		if !near(d.CenterOfRigidity[0], cr[0], 1e-9) || !near(d.CenterOfRigidity[1], cr[1], 1e-9) || !near(d.J, J, 1e-9) {
			t.Fatalf("trial %d: centre %v J %g, want %v and %g", trial, d.CenterOfRigidity, d.J, cr, J)
		}
		for _, c := range d.Cases {
			across := c.Load.other()
			e := a.MassCenter[across] - cr[across] + float64(c.Sign)*a.Accidental*a.Size[across]
			for i, m := range members {
				tors := a.Shear * e * dist[i] * m.Rigidity / J
				want := Share{Torsional: -tors}
				if m.Direction == c.Load {
					want = Share{Direct: a.Shear * m.Rigidity / sumR[c.Load], Torsional: tors}
				}
				got := c.Shares[i]
				if math.Abs(got.Direct-want.Direct) > 1e-9*a.Shear || math.Abs(got.Torsional-want.Torsional) > 1e-9*a.Shear {
					t.Fatalf("trial %d %s wall %d: %+v, want %+v", trial, c.Name(), i, got, want)
				}
			}
		}
	}
}

// An irregular plan with a wall at 30°, against a three-degree-of-freedom
// solve written here with gonum's mat about another reference point (the
// plan's north-east corner): K = Aᵀ·diag(R)·A, K·D = F, wall shear
// R·(A·D). Each wall's row of A is (cos α, sin α, arm) with
// arm = sin α·(x − x_o) − cos α·(y − y_o) for a point (x, y) on its line
// (statics of a rigid plate on springs; common practice).
func TestAngledWallAgainstIndependentSolve(t *testing.T) {
	const deg = math.Pi / 180
	members := []Member{
		{Name: "S", Direction: X, Position: 0, Rigidity: 4},
		{Name: "N", Direction: X, Position: 30, Rigidity: 1.5},
		{Name: "W", Direction: Y, Position: 0, Rigidity: 3},
		{Name: "C", Direction: Y, Position: 22, Rigidity: 1},
		{Name: "A30", Direction: Angled, Angle: 30 * deg, At: [2]float64{40, 20}, Rigidity: 2.5},
		{Name: "A120", Direction: Angled, Angle: 120 * deg, At: [2]float64{48, 8}, Rigidity: 0.7},
	}
	a := Action{Shear: 250e3, MassCenter: [2]float64{27, 14}, Size: [2]float64{50, 30}, Accidental: 0.05}
	d, err := Distribute(members, a)
	if err != nil {
		t.Fatal(err)
	}
	o := [2]float64{50, 30}
	A := mat.NewDense(len(members), 3, nil)
	R := mat.NewDiagDense(len(members), nil)
	for i, m := range members {
		var c, s float64
		var p [2]float64
		switch m.Direction {
		case X:
			c, s, p = 1, 0, [2]float64{0, m.Position}
		case Y:
			c, s, p = 0, 1, [2]float64{m.Position, 0}
		default:
			c, s, p = math.Cos(m.Angle), math.Sin(m.Angle), m.At
		}
		A.SetRow(i, []float64{c, s, s*(p[0]-o[0]) - c*(p[1]-o[1])})
		R.SetDiag(i, m.Rigidity)
	}
	var RA, K mat.Dense
	RA.Mul(R, A)
	K.Mul(A.T(), &RA)
	for _, c := range d.Cases {
		// The load V along x (or y) through the displaced mass centre.
		F := mat.NewVecDense(3, nil)
		if c.Load == X {
			y := a.MassCenter[1] + float64(c.Sign)*a.Accidental*a.Size[1]
			F.SetVec(0, a.Shear)
			F.SetVec(2, -a.Shear*(y-o[1]))
		} else {
			x := a.MassCenter[0] + float64(c.Sign)*a.Accidental*a.Size[0]
			F.SetVec(1, a.Shear)
			F.SetVec(2, a.Shear*(x-o[0]))
		}
		var D, e mat.VecDense
		if err := D.SolveVec(&K, F); err != nil {
			t.Fatal(err)
		}
		e.MulVec(A, &D)
		for i, m := range members {
			want := m.Rigidity * e.AtVec(i)
			if got := c.Shares[i].Total(); math.Abs(got-want) > 1e-9*a.Shear {
				t.Errorf("%s wall %s: %.6g N, independent solve %.6g N", c.Name(), m.Name, got, want)
			}
		}
		// The same rotation, whatever the reference point.
		if math.Abs(c.Displacement[2]-D.AtVec(2)) > 1e-9*math.Abs(D.AtVec(2)) {
			t.Errorf("%s: θ %g, independent %g", c.Name(), c.Displacement[2], D.AtVec(2))
		}
	}
	// The centre of rigidity is where a force turns nothing: K_xθ = K_yθ = 0.
	if k := d.Stiffness; math.Abs(k[0][2]) > 1e-9*k[2][2] || math.Abs(k[1][2]) > 1e-9*k[2][2] {
		t.Errorf("stiffness about the centre of rigidity not uncoupled: %v", k)
	}
}

// Invariants on seeded random plans, walls at any angle: the direct shears
// resolve to V along the load and nothing across it, the torsional shears
// resolve to zero, and the moment of all wall shears about the centre of
// rigidity equals the moment of the load (statics of the rigid diaphragm).
func TestRandomPlanInvariants(t *testing.T) {
	rng := rand.New(rand.NewPCG(29, 0))
	checked := 0
	for trial := 0; trial < 300; trial++ {
		size := [2]float64{5 + 60*rng.Float64(), 5 + 60*rng.Float64()}
		var members []Member
		for k := 0; k < 3+rng.IntN(6); k++ {
			m := Member{Rigidity: 0.01 + 5*rng.Float64()}
			switch rng.IntN(3) {
			case 0:
				m.Direction, m.Position = X, size[1]*rng.Float64()
			case 1:
				m.Direction, m.Position = Y, size[0]*rng.Float64()
			default:
				m.Direction, m.Angle = Angled, math.Pi*rng.Float64()
				m.At = [2]float64{size[0] * rng.Float64(), size[1] * rng.Float64()}
			}
			members = append(members, m)
		}
		a := Action{Shear: 1e3 + 1e6*rng.Float64(), MassCenter: [2]float64{size[0] * rng.Float64(), size[1] * rng.Float64()}, Size: size, Accidental: 0.05, Amplify: rng.IntN(2) == 0}
		d, err := Distribute(members, a)
		if err != nil {
			continue
		}
		checked++
		cr := d.CenterOfRigidity
		for _, c := range d.Cases {
			var direct, tors [2]float64
			moment := 0.0
			for i, m := range members {
				r := m.row(cr)
				sh := c.Shares[i]
				direct[0] += sh.Direct * r[0]
				direct[1] += sh.Direct * r[1]
				tors[0] += sh.Torsional * r[0]
				tors[1] += sh.Torsional * r[1]
				moment += sh.Total() * r[2]
			}
			want := [2]float64{}
			want[c.Load] = a.Shear
			tol := 1e-9 * a.Shear
			if math.Abs(direct[0]-want[0]) > tol || math.Abs(direct[1]-want[1]) > tol {
				t.Fatalf("trial %d %s: direct shears resolve to %v, want %v", trial, c.Name(), direct, want)
			}
			if math.Abs(tors[0]) > tol || math.Abs(tors[1]) > tol {
				t.Fatalf("trial %d %s: torsional shears resolve to %v, want 0", trial, c.Name(), tors)
			}
			wantM := c.Torque
			if c.Load == X {
				wantM = -c.Torque
			}
			if math.Abs(moment-wantM) > 1e-9*a.Shear*math.Hypot(size[0], size[1]) {
				t.Fatalf("trial %d %s: moment of the wall shears %g, want %g", trial, c.Name(), moment, wantM)
			}
			if c.Torsion.Amplification < 1 || c.Torsion.Amplification > 3 {
				t.Fatalf("trial %d %s: A_x %g outside [1, 3]", trial, c.Name(), c.Torsion.Amplification)
			}
			if !a.Amplify && c.Torsion.Amplification != 1 {
				t.Fatalf("trial %d %s: A_x %g without a category C–F", trial, c.Name(), c.Torsion.Amplification)
			}
		}
	}
	if checked < 200 {
		t.Errorf("only %d random plans could be checked", checked)
	}
}

// A plan symmetric in mass and rigidity, loaded at its centre with no
// accidental part: no torsion, equal edge displacements, δmax/δavg = 1 and
// A_x = 1 even in category D (ASCE 7-22 §12.8.4.3 applies A_x to
// irregular plans only).
func TestSymmetricPlanNoTorsionNoAmplification(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 0))
	for trial := 0; trial < 50; trial++ {
		size := [2]float64{10 + 50*rng.Float64(), 10 + 50*rng.Float64()}
		var members []Member
		for _, dir := range []Direction{X, Y} {
			L := size[dir.other()]
			for k := 0; k < 1+rng.IntN(3); k++ {
				p, r := L/2*rng.Float64(), 0.1+rng.Float64()
				members = append(members, Member{Direction: dir, Position: p, Rigidity: r}, Member{Direction: dir, Position: L - p, Rigidity: r})
			}
		}
		// A symmetric pair of angled walls (mirror images about both axes
		// through the centre: α at (x, y), the same α at (L−x, H−y)).
		alpha := math.Pi * rng.Float64()
		at := [2]float64{size[0] * rng.Float64(), size[1] * rng.Float64()}
		members = append(members,
			Member{Direction: Angled, Angle: alpha, At: at, Rigidity: 1},
			Member{Direction: Angled, Angle: alpha, At: [2]float64{size[0] - at[0], size[1] - at[1]}, Rigidity: 1})
		a := Action{Shear: 1e5, MassCenter: [2]float64{size[0] / 2, size[1] / 2}, Size: size, Accidental: 0, Amplify: true}
		d, err := Distribute(members, a)
		if err != nil {
			continue
		}
		for _, c := range d.Cases {
			for i, sh := range c.Shares {
				if math.Abs(sh.Torsional) > 1e-9*a.Shear {
					t.Fatalf("trial %d %s wall %d: torsional shear %g, want 0", trial, c.Name(), i, sh.Torsional)
				}
			}
			if !near(c.Torsion.Ratio, 1, 1e-9) || c.Torsion.Amplification != 1 || c.Torsion.Type != Regular {
				t.Fatalf("trial %d %s: ratio %g type %v A_x %g, want 1, none, 1", trial, c.Name(), c.Torsion.Ratio, c.Torsion.Type, c.Torsion.Amplification)
			}
		}
	}
}

// Torsional irregularity by hand (ASCE 7-22 Table 12.3-1 and §12.8.4.3;
// our own arithmetic). Plan 100 × 50, y-walls of R = 1 at x = 40 and 60,
// x-walls of R = 1 at y = 0 and 50, V = 100 along y at the centre,
// accidental 5 % of 100 = 5:
//
//	centre of rigidity (50, 25); J = 2·1·10² + 2·1·25² = 1450
//	u_y = 100/2 = 50; θ = V·e/J = 500/1450 = 0.344828
//	edges x = 0 and 100: 50 ∓ 0.344828·50 = 32.7586 and 67.2414
//	δmax/δavg = 67.2414/50 = 1.344828: Type 1a (above 1.2, not above 1.4)
//	A_x = (1.344828/1.2)² = 1.120690² = 1.255945
//	the amplified eccentricity 5·1.255945 = 6.279727, and the east wall
//	(x = 60, d = 10) takes 50 + 100·6.279727·10·1/1450 = 54.33085
func TestTorsionalIrregularityByHand(t *testing.T) {
	members := []Member{
		{Name: "W", Direction: Y, Position: 40, Rigidity: 1},
		{Name: "E", Direction: Y, Position: 60, Rigidity: 1},
		{Name: "S", Direction: X, Position: 0, Rigidity: 1},
		{Name: "N", Direction: X, Position: 50, Rigidity: 1},
	}
	a := Action{Shear: 100, MassCenter: [2]float64{50, 25}, Size: [2]float64{100, 50}, Accidental: 0.05}
	d, err := Distribute(members, a)
	if err != nil {
		t.Fatal(err)
	}
	c := caseOf(t, d, Y, +1)
	if !near(c.Torsion.Edges[0], 32.7586, 1e-5) || !near(c.Torsion.Edges[1], 67.2414, 1e-5) {
		t.Errorf("edges %v, want 32.7586 and 67.2414", c.Torsion.Edges)
	}
	if !near(c.Torsion.Ratio, 1.344828, 1e-6) || c.Torsion.Type != Type1a || c.Torsion.Amplification != 1 {
		t.Errorf("ratio %g type %v A_x %g, want 1.344828, 1a, 1 (no category given)", c.Torsion.Ratio, c.Torsion.Type, c.Torsion.Amplification)
	}
	a.Amplify = true // category C to F
	d, err = Distribute(members, a)
	if err != nil {
		t.Fatal(err)
	}
	c = caseOf(t, d, Y, +1)
	if !near(c.Torsion.Amplification, 1.255945, 1e-6) || !near(c.Eccentricity, 6.279727, 1e-6) {
		t.Errorf("A_x %g e %g, want 1.255945 and 6.279727", c.Torsion.Amplification, c.Eccentricity)
	}
	if got := c.Shares[1].Total(); !near(got, 54.33085, 1e-6) {
		t.Errorf("east wall %g, want 54.33085", got)
	}
	// The edges as solved, for the storey drift: θ = 627.9727/1450 =
	// 0.4330846, edges 50 ∓ 21.65423.
	if !near(c.Edges[0], 28.34577, 1e-6) || !near(c.Edges[1], 71.65423, 1e-6) {
		t.Errorf("amplified edges %v, want 28.34577 and 71.65423", c.Edges)
	}
	// The ratio itself is from A_x = 1, as §12.8.4.3 defines it.
	if !near(c.Torsion.Ratio, 1.344828, 1e-6) {
		t.Errorf("ratio after amplification %g, want the A_x = 1 value 1.344828", c.Torsion.Ratio)
	}
	// y-walls at x = 45 and 55 and x-walls of R = 0.1: J = 2·5² + 2·0.1·25²
	// = 175, θ = 500/175, edges 50 ∓ 142.857, ratio 192.857/50 = 3.857:
	// Type 1b, and A_x = (3.857/1.2)² = 10.3 is capped at 3.
	members[0].Position, members[1].Position = 45, 55
	members[2].Rigidity, members[3].Rigidity = 0.1, 0.1
	d, err = Distribute(members, a)
	if err != nil {
		t.Fatal(err)
	}
	c = caseOf(t, d, Y, +1)
	if !near(c.Torsion.Ratio, 3.857143, 1e-6) || c.Torsion.Type != Type1b || c.Torsion.Amplification != 3 {
		t.Errorf("ratio %g type %v A_x %g, want 3.857143, 1b, 3", c.Torsion.Ratio, c.Torsion.Type, c.Torsion.Amplification)
	}
}

// A flexible diaphragm by hand (tributary spans; common practice, e.g.
// Breyer et al., Design of Wood Structures, ch. 2 and 9, from memory):
// plan 100 × 60, V = 200, mass centre at the plan's centre.
//
//	load along y, w = 200/100 = 2 per unit length, y-lines at x = 0, 60, 100:
//	  x = 0: 60·2/2 = 60; x = 60: 60 + 40·2/2 = 100; x = 100: 40
//	load along x, w = 200/60, x-lines at y = 0 (walls R 1 and 3) and 40,
//	and the stretch 40–60 cantilevers to y = 40:
//	  y = 0: 40·(10/3)/2 = 66.667, shared 1:3 → 16.667 and 50
//	  y = 40: 66.667 + 20·10/3 = 133.333
//
// With the mass centre at y = 35 instead, w(s) = 5/3 + s/18 (Σ = 200,
// resultant at 35), and the line at y = 0 takes
// (1/40)·∫₀⁴⁰ w(s)(40 − s) ds = (800·5/3 + 10666.67/18)/40 = 48.148.
func TestFlexibleByHand(t *testing.T) {
	members := []Member{
		{Name: "S1", Direction: X, Position: 0, Rigidity: 1},
		{Name: "S2", Direction: X, Position: 0, Rigidity: 3},
		{Name: "N", Direction: X, Position: 40, Rigidity: 2},
		{Name: "W", Direction: Y, Position: 0, Rigidity: 1},
		{Name: "M", Direction: Y, Position: 60, Rigidity: 1},
		{Name: "E", Direction: Y, Position: 100, Rigidity: 1},
	}
	a := Action{Shear: 200, MassCenter: [2]float64{50, 30}, Size: [2]float64{100, 60}}
	f, err := DistributeFlexible(members, a)
	if err != nil {
		t.Fatal(err)
	}
	want := []float64{16.6667, 50, 133.3333, 60, 100, 40}
	for i, w := range want {
		if !near(f.Shears[i], w, 1e-5) {
			t.Errorf("wall %s: %g, want %g", members[i].Name, f.Shears[i], w)
		}
	}
	if n := len(f.Lines[X]); n != 2 || !near(f.Lines[X][0].Tributary[1], 20, 1e-12) {
		t.Errorf("x-lines %+v, want 2 with the first's tributary to 20", f.Lines[X])
	}
	a.MassCenter[1] = 35
	if f, err = DistributeFlexible(members, a); err != nil {
		t.Fatal(err)
	}
	if got := f.Lines[X][0].Shear; !near(got, 48.1481, 1e-5) {
		t.Errorf("line y = 0 with the mass at y = 35: %g, want 48.1481", got)
	}
	if got := f.Lines[X][0].Shear + f.Lines[X][1].Shear; !near(got, 200, 1e-12) {
		t.Errorf("lines sum to %g, want 200", got)
	}
	// A mass centre outside the middle third cannot be a linear load ≥ 0.
	a.MassCenter[1] = 45
	if _, err := DistributeFlexible(members, a); err != ErrMassOutside {
		t.Errorf("mass centre at 45 of 60: %v, want ErrMassOutside", err)
	}
	// One line of y-walls: nothing to span between.
	one := append(members[:3:3], Member{Name: "W", Direction: Y, Position: 30, Rigidity: 1}, Member{Name: "W2", Direction: Y, Position: 30, Rigidity: 2})
	a.MassCenter[1] = 30
	_, err = DistributeFlexible(one, a)
	if le, ok := err.(*LineError); !ok || le.Direction != Y {
		t.Errorf("one line of y-walls: %v, want a LineError for y", err)
	}
}

// Flexible invariants on seeded random plans: the lines of each direction
// take the whole storey shear, and the walls of a line share its shear in
// proportion to their rigidity.
func TestFlexibleInvariants(t *testing.T) {
	rng := rand.New(rand.NewPCG(41, 0))
	for trial := 0; trial < 200; trial++ {
		members, a := randomOrthogonal(rng)
		a.MassCenter = [2]float64{a.Size[0] * (1.0/3 + rng.Float64()/3), a.Size[1] * (1.0/3 + rng.Float64()/3)}
		f, err := DistributeFlexible(members, a)
		if _, one := err.(*LineError); one {
			continue
		}
		if err != nil {
			t.Fatal(err)
		}
		var sum [2]float64
		for i, m := range members {
			sum[m.Direction] += f.Shears[i]
			if f.Shears[i] < 0 {
				t.Fatalf("trial %d: wall %d takes %g < 0", trial, i, f.Shears[i])
			}
		}
		for _, dir := range []Direction{X, Y} {
			if !near(sum[dir], a.Shear, 1e-9) {
				t.Fatalf("trial %d: walls along %s take %g, want %g", trial, dir, sum[dir], a.Shear)
			}
			for _, ln := range f.Lines[dir] {
				for _, i := range ln.Members {
					if !near(f.Shears[i]/members[i].Rigidity, ln.Shear/ln.Rigidity, 1e-9) {
						t.Fatalf("trial %d: wall %d not shared by rigidity", trial, i)
					}
				}
			}
		}
	}
}

package storey

import (
	"errors"
	"math"
	"math/rand/v2"
	"testing"
)

func near(got, want, tol float64) bool {
	return math.Abs(got-want) <= tol*math.Max(1, math.Abs(want))
}

// Taly, Design of Reinforced Masonry Structures, 2nd ed., Example E7.12: two
// parallel walls of relative rigidity 4.5 and 5.5, 90 ft apart, put the
// centre of rigidity 49.5 ft from the first (= 5.5·90/10).
func TestCenterOfRigidityTalyE712(t *testing.T) {
	const ft = 0.3048
	members := []Member{
		{Name: "first", Direction: Y, Position: 0, Rigidity: 4.5},
		{Name: "second", Direction: Y, Position: 90 * ft, Rigidity: 5.5},
		// one x-wall so that the storey also resists the other direction
		{Name: "cross", Direction: X, Position: 10 * ft, Rigidity: 3},
	}
	d, err := Distribute(members, Action{Shear: 1000, MassCenter: [2]float64{45 * ft, 10 * ft}, Size: [2]float64{90 * ft, 20 * ft}, Accidental: 0.05})
	if err != nil {
		t.Fatal(err)
	}
	if got := d.CenterOfRigidity[X] / ft; !near(got, 49.5, 1e-12) {
		t.Errorf("x_R = %.6g ft, want 49.5 ft (Taly E7.12)", got)
	}
	if got := d.CenterOfRigidity[Y] / ft; !near(got, 10, 1e-12) {
		t.Errorf("y_R = %.6g ft, want 10 ft (the only x-wall's line)", got)
	}
}

// A plan symmetric about both axes, loaded at its centre: the centre of
// rigidity is the mass centre, so without accidental eccentricity there is no
// torsion and each wall's share is its rigidity over the direction's ΣR
// (rigid diaphragm, Taly 2nd ed. §7.9). The rigidities are relative values.
func TestSymmetricPlanNoTorsion(t *testing.T) {
	members := []Member{
		{Name: "S", Direction: X, Position: 0, Rigidity: 1},
		{Name: "S2", Direction: X, Position: 10, Rigidity: 3},
		{Name: "N2", Direction: X, Position: 40, Rigidity: 3},
		{Name: "N", Direction: X, Position: 50, Rigidity: 1},
		{Name: "W", Direction: Y, Position: 0, Rigidity: 2.5},
		{Name: "E", Direction: Y, Position: 80, Rigidity: 2.5},
	}
	const V = 120e3
	d, err := Distribute(members, Action{Shear: V, MassCenter: [2]float64{40, 25}, Size: [2]float64{80, 50}, Accidental: 0})
	if err != nil {
		t.Fatal(err)
	}
	if !near(d.CenterOfRigidity[X], 40, 1e-12) || !near(d.CenterOfRigidity[Y], 25, 1e-12) {
		t.Errorf("centre of rigidity %v, want the plan centre (40, 25)", d.CenterOfRigidity)
	}
	// ΣR along x = 1+3+3+1 = 8, along y = 5: shares 1/8, 3/8, 3/8, 1/8, 1/2, 1/2.
	want := []float64{1.0 / 8, 3.0 / 8, 3.0 / 8, 1.0 / 8, 0.5, 0.5}
	for _, c := range d.Cases {
		if math.Abs(c.Eccentricity) > 1e-12 {
			t.Errorf("%s: e = %g, want 0", c.Name(), c.Eccentricity)
		}
		for i, s := range c.Shares {
			if math.Abs(s.Torsional) > 1e-9 {
				t.Errorf("%s: wall %s torsional shear %g, want 0", c.Name(), members[i].Name, s.Torsional)
			}
			if members[i].Direction == c.Load && !near(s.Direct/V, want[i], 1e-12) {
				t.Errorf("%s: wall %s direct share %.6g, want %.6g", c.Name(), members[i].Name, s.Direct/V, want[i])
			}
		}
	}
	for i, g := range d.Designs {
		if !near(g.Shear/V, want[i], 1e-12) || g.Case != -1 {
			t.Errorf("wall %s design %.6g (case %d), want the direct share %.6g", members[i].Name, g.Shear/V, g.Case, want[i])
		}
	}

	// With the accidental eccentricity, the same plan twists both ways:
	// ASCE 7-22 §12.8.4.2, e = ±5 % of the plan dimension perpendicular to the
	// load: 0.05·50 = 2.5 for a load along x, 0.05·80 = 4 for a load along y.
	d, err = Distribute(members, Action{Shear: V, MassCenter: [2]float64{40, 25}, Size: [2]float64{80, 50}, Accidental: 0.05})
	if err != nil {
		t.Fatal(err)
	}
	wantE := map[string]float64{"x +acc": 2.5, "x -acc": -2.5, "y +acc": 4, "y -acc": -4}
	for _, c := range d.Cases {
		if !near(c.Eccentricity, wantE[c.Name()], 1e-12) {
			t.Errorf("%s: e = %g, want %g (ASCE 7-22 §12.8.4.2)", c.Name(), c.Eccentricity, wantE[c.Name()])
		}
	}
	// Each wall of the symmetric plan gains from one of the two signs.
	for i, g := range d.Designs {
		if !(g.Shear > g.Direct) || g.Case < 0 {
			t.Errorf("wall %s: accidental torsion should raise the design shear above %g, got %g", members[i].Name, g.Direct, g.Shear)
		}
	}
}

// A small plan worked by hand (our own arithmetic, rigid-diaphragm method of
// Taly 2nd ed. §7.9):
//
//	x-walls A (y = 0, R = 1), B (y = 50, R = 1) → y_R = 25
//	y-walls C (x = 0, R = 1), D (x = 100, R = 3) → x_R = 300/4 = 75
//	J = 1·25² + 1·25² + 1·75² + 3·25² = 625 + 625 + 5625 + 1875 = 8750
//	V = 100 along y at x_m = 50, no accidental part: e = 50 − 75 = −25, V·e = −2500
//	C: direct 100·1/4 = 25, torsional −2500·(−75)·1/8750 = +21.4286, total 46.4286
//	D: direct 100·3/4 = 75, torsional −2500·25·3/8750 = −21.4286, total 53.5714
//	A, B (perpendicular): −(−2500·(∓25)·1/8750) = ∓7.1429
func TestHandWorkedTorsion(t *testing.T) {
	members := []Member{
		{Name: "A", Direction: X, Position: 0, Rigidity: 1},
		{Name: "B", Direction: X, Position: 50, Rigidity: 1},
		{Name: "C", Direction: Y, Position: 0, Rigidity: 1},
		{Name: "D", Direction: Y, Position: 100, Rigidity: 3},
	}
	d, err := Distribute(members, Action{Shear: 100, MassCenter: [2]float64{50, 25}, Size: [2]float64{100, 50}})
	if err != nil {
		t.Fatal(err)
	}
	if !near(d.CenterOfRigidity[X], 75, 1e-12) || !near(d.CenterOfRigidity[Y], 25, 1e-12) {
		t.Errorf("centre of rigidity %v, want (75, 25)", d.CenterOfRigidity)
	}
	if !near(d.J, 8750, 1e-12) {
		t.Errorf("J = %g, want 8750", d.J)
	}
	var y *Case
	for i := range d.Cases {
		if d.Cases[i].Load == Y && d.Cases[i].Sign > 0 {
			y = &d.Cases[i]
		}
	}
	if !near(y.Eccentricity, -25, 1e-12) {
		t.Errorf("e = %g, want -25", y.Eccentricity)
	}
	want := []Share{{0, -7.142857}, {0, 7.142857}, {25, 21.428571}, {75, -21.428571}}
	for i, w := range want {
		s := y.Shares[i]
		if !near(s.Direct, w.Direct, 1e-6) || !near(s.Torsional, w.Torsional, 1e-6) {
			t.Errorf("wall %s: direct %.6g torsional %.6g, want %.6g %.6g", members[i].Name, s.Direct, s.Torsional, w.Direct, w.Torsional)
		}
	}
	// Torsion relieves D (75 − 21.4 = 53.6) but never below its direct shear:
	// the design shear of D stays 75 (common practice).
	if g := d.Designs[3]; !near(g.Shear, 75, 1e-12) || g.Case != -1 {
		t.Errorf("D design shear %g (case %d), want 75 from the direct shear alone", g.Shear, g.Case)
	}
	// C governs in a load-along-y case at 46.43.
	if g := d.Designs[2]; !near(g.Shear, 46.428571, 1e-6) || d.Cases[g.Case].Load != Y {
		t.Errorf("C design shear %g, want 46.4286 in a y case", g.Shear)
	}
}

// Invariants of the rigid-diaphragm distribution on seeded random plans:
// statics (ΣF along the load = V, ΣM about the centre of rigidity = V·e) and
// the definition of the centre of rigidity (Σ R·d = 0 per direction, so the
// torsional shears of one direction's walls cancel).
func TestDistributionInvariants(t *testing.T) {
	rng := rand.New(rand.NewPCG(6, 0))
	for trial := 0; trial < 200; trial++ {
		size := [2]float64{5 + 60*rng.Float64(), 5 + 60*rng.Float64()}
		var members []Member
		for _, dir := range []Direction{X, Y} {
			n := 1 + rng.IntN(4)
			for k := 0; k < n; k++ {
				members = append(members, Member{Direction: dir, Position: size[dir.other()] * rng.Float64(), Rigidity: 0.01 + 5*rng.Float64()})
			}
		}
		a := Action{Shear: 1e3 + 1e6*rng.Float64(), MassCenter: [2]float64{size[0] * rng.Float64(), size[1] * rng.Float64()}, Size: size, Accidental: 0.05}
		d, err := Distribute(members, a)
		if errors.Is(err, ErrTorsion) {
			continue
		}
		if err != nil {
			t.Fatal(err)
		}
		for _, c := range d.Cases {
			var direct, torsion [2]float64
			moment := 0.0 // counter-clockwise about the centre of rigidity
			for i, m := range members {
				s := c.Shares[i]
				direct[m.Direction] += s.Direct
				torsion[m.Direction] += s.Torsional
				if m.Direction == X {
					moment -= d.Distance[i] * s.Total() // force along +x above the centre turns clockwise
				} else {
					moment += d.Distance[i] * s.Total()
				}
			}
			if !near(direct[c.Load], a.Shear, 1e-12) || direct[c.Load.other()] != 0 {
				t.Fatalf("trial %d %s: direct shears sum to %v, want V = %g along the load", trial, c.Name(), direct, a.Shear)
			}
			for dir := range torsion {
				if math.Abs(torsion[dir]) > 1e-9*a.Shear {
					t.Fatalf("trial %d %s: torsional shears along %s sum to %g, want 0", trial, c.Name(), Direction(dir), torsion[dir])
				}
			}
			// V along +x at height e above the centre turns clockwise (−V·e);
			// V along +y at e to the right turns counter-clockwise (+V·e).
			want := c.Torque
			if c.Load == X {
				want = -c.Torque
			}
			if math.Abs(moment-want) > 1e-9*a.Shear*math.Hypot(size[0], size[1]) {
				t.Fatalf("trial %d %s: moment of the wall shears %g, want %g", trial, c.Name(), moment, want)
			}
			if !near(c.Torque, a.Shear*c.Eccentricity, 1e-12) {
				t.Fatalf("trial %d %s: torque %g, want V·e = %g", trial, c.Name(), c.Torque, a.Shear*c.Eccentricity)
			}
		}
		for i, g := range d.Designs {
			if g.Shear < g.Direct {
				t.Fatalf("trial %d: wall %d design %g below its direct shear %g", trial, i, g.Shear, g.Direct)
			}
			for _, c := range d.Cases {
				if v := math.Abs(c.Shares[i].Total()); v > g.Shear*(1+1e-9) {
					t.Fatalf("trial %d: wall %d design %g below case %s (%g)", trial, i, g.Shear, c.Name(), v)
				}
			}
		}
	}
}

func TestDistributeErrors(t *testing.T) {
	a := Action{Shear: 100, MassCenter: [2]float64{5, 5}, Size: [2]float64{10, 10}, Accidental: 0.05}
	// Only x-walls: nothing resists a load along y.
	_, err := Distribute([]Member{{Name: "a", Direction: X, Position: 0, Rigidity: 1}, {Name: "b", Direction: X, Position: 10, Rigidity: 1}}, a)
	var de *DirectionError
	if !errors.As(err, &de) || de.Direction != Y {
		t.Errorf("x-walls only: got %v, want a DirectionError for y", err)
	}
	// One x-wall and two y-walls on one line: a cross through (3, 4) cannot
	// resist torsion (J = 0).
	_, err = Distribute([]Member{
		{Name: "a", Direction: X, Position: 4, Rigidity: 1},
		{Name: "b", Direction: Y, Position: 3, Rigidity: 1},
		{Name: "c", Direction: Y, Position: 3, Rigidity: 2},
	}, a)
	if !errors.Is(err, ErrTorsion) {
		t.Errorf("walls through one point: got %v, want ErrTorsion", err)
	}
	_, err = Distribute([]Member{{Name: "a", Direction: X, Rigidity: 0}, {Name: "b", Direction: Y, Position: 1, Rigidity: 1}}, a)
	if !errors.Is(err, ErrRigidity) {
		t.Errorf("zero rigidity: got %v, want ErrRigidity", err)
	}
}

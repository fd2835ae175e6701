package study

import (
	"math"
	"strings"
	"testing"

	"pierwise/geometry"
	"pierwise/pier"
)

// place returns a deep copy of w's active layout with opening i at o.
func place(w *geometry.Wall, i int, o geometry.Opening) *geometry.Wall {
	c := *w
	c.Layouts = append([]geometry.Layout(nil), w.Layouts...)
	ops := append([]geometry.Opening(nil), w.Openings()...)
	ops[i] = o
	c.Layouts[w.Active].Openings = ops
	return &c
}

func TestSweepEqualsIndependentSolves(t *testing.T) {
	w := annex()
	for _, tc := range []struct {
		name string
		idx  int
		axis Axis
		step geometry.Length
	}{
		{"W1", 1, AlongX, 8 * geometry.Inch},
		{"W2", 2, AlongY, 4 * geometry.Inch},
		{"D1", 0, AlongX, 1 * ft},
	} {
		pts, err := Sweep(w, tc.name, tc.axis, tc.step)
		if err != nil {
			t.Fatal(err)
		}
		if len(pts) < 3 {
			t.Fatalf("%s: %d points", tc.name, len(pts))
		}
		for _, p := range pts {
			o := w.Openings()[tc.idx]
			o.X, o.Sill = p.X, p.Y
			ind := place(w, tc.idx, o)
			res, err := pier.Solve(ind)
			if (err != nil) != (p.Err != nil) {
				t.Errorf("%s at %g,%g: sweep err %v, independent err %v", tc.name, p.X, p.Y, p.Err, err)
				continue
			}
			if err != nil {
				continue
			}
			if !near(p.Rigidity, res.Rigidity, 1e-12) {
				t.Errorf("%s at %g: rigidity %g, independent %g", tc.name, p.Pos(tc.axis), p.Rigidity, res.Rigidity)
			}
			leaves := res.Leaves()
			if len(leaves) != len(p.Piers) {
				t.Errorf("%s at %g: %d piers, independent %d", tc.name, p.Pos(tc.axis), len(p.Piers), len(leaves))
				continue
			}
			maxIdx := 0.0
			for k, lp := range leaves {
				if lp.Name != p.Piers[k].Name || !near(lp.Share, p.Piers[k].Share, 1e-12) {
					t.Errorf("%s at %g: pier %s %g, independent %s %g", tc.name, p.Pos(tc.axis), p.Piers[k].Name, p.Piers[k].Share, lp.Name, lp.Share)
				}
				maxIdx = math.Max(maxIdx, lp.Share/lp.L())
				// With a load the stress is V_i/(L_i t) of the same pier.
				if lp.Name == p.StressPier {
					want := float64(lp.Shear) / (lp.L() * float64(w.Thickness))
					if !near(float64(p.MaxStress), want, 1e-12) {
						t.Errorf("%s at %g: max stress %g, want %g", tc.name, p.Pos(tc.axis), p.MaxStress, want)
					}
				}
			}
			if !near(p.StressIndex, maxIdx, 1e-12) {
				t.Errorf("%s at %g: stress index %g, want %g", tc.name, p.Pos(tc.axis), p.StressIndex, maxIdx)
			}
		}
	}
}

func TestSweepPositions(t *testing.T) {
	w := annex()
	step := 8 * geometry.Inch
	pts, err := Sweep(w, "W1", AlongX, step)
	if err != nil {
		t.Fatal(err)
	}
	o := w.Openings()[1]
	// Every grid position through the current one, inside the wall, is a
	// point exactly when the opening fits there.
	n := 0
	for k := -100; k <= 100; k++ {
		m := o
		m.X = o.X + geometry.Length(k)*step
		if m.X < -1e-9 || m.X+m.Width > w.Length+1e-9 {
			continue
		}
		if w.CheckOpening(1, m) != nil {
			continue
		}
		if n >= len(pts) || math.Abs(float64(pts[n].X-m.X)) > 1e-9 {
			t.Fatalf("point %d: want x %g, have %v", n, m.X, pts)
		}
		if pts[n].Y != o.Sill {
			t.Errorf("sill moved: %g", pts[n].Y)
		}
		n++
	}
	if n != len(pts) {
		t.Errorf("%d points, %d fitting positions", len(pts), n)
	}
	cur := CurrentIndex(pts)
	if cur < 0 || pts[cur].X != o.X {
		t.Errorf("current point %d", cur)
	}
	best := BestIndex(pts)
	if best < 0 {
		t.Fatal("no best point")
	}
	for i, p := range pts {
		if p.Err == nil && p.StressIndex < pts[best].StressIndex*(1-1e-9) {
			t.Errorf("point %d has a lower stress index %g than the best %g", i, p.StressIndex, pts[best].StressIndex)
		}
		if p.Best != (i == best) {
			t.Errorf("point %d best %v", i, p.Best)
		}
	}
	// The sweep leaves the wall as it was.
	if w.Openings()[1] != o {
		t.Error("the sweep changed the wall")
	}
}

func TestSweepMirrorSymmetry(t *testing.T) {
	// A symmetric wall with one window: the sweep of the window is
	// symmetric about the middle (a mirrored wall mirrors its shares).
	w := &geometry.Wall{
		Units: geometry.US, Length: 24 * ft, Height: 12 * ft, Thickness: 8 * geometry.Inch,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 1, Ie: 1},
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "W1", X: 10 * ft, Sill: 4 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
	pts, err := Sweep(w, "W1", AlongX, 1*ft)
	if err != nil {
		t.Fatal(err)
	}
	if len(pts) != 21 {
		t.Fatalf("%d points, want 21 (x = 0 … 20 ft)", len(pts))
	}
	for i := range pts {
		a, b := pts[i], pts[len(pts)-1-i]
		if a.Err != nil || b.Err != nil {
			t.Fatalf("errors %v %v", a.Err, b.Err)
		}
		if !near(a.Rigidity, b.Rigidity, 1e-9) || !near(a.StressIndex, b.StressIndex, 1e-9) {
			t.Errorf("x %g and its mirror: rigidity %g/%g, stress %g/%g", a.X/ft, a.Rigidity, b.Rigidity, a.StressIndex, b.StressIndex)
		}
	}
}

func TestSweepKeepsFailedPositions(t *testing.T) {
	// Window A fills the left half between 2 and 6 ft; window B (right half)
	// moves up. Where the two share a band they leave no pier (staggered) or
	// no load path (cut): those positions are points with an error.
	w := &geometry.Wall{
		Units: geometry.US, Length: 10 * ft, Height: 10 * ft, Thickness: 8 * geometry.Inch,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 1, Ie: 1},
		Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "A", X: 0, Sill: 2 * ft, Width: 5 * ft, Height: 4 * ft},
			{Name: "B", X: 5 * ft, Sill: 0, Width: 5 * ft, Height: 1 * ft},
		}}},
	}
	pts, err := Sweep(w, "B", AlongY, 1*ft)
	if err != nil {
		t.Fatal(err)
	}
	if len(pts) != 10 {
		t.Fatalf("%d points, want 10 (sill 0 … 9 ft)", len(pts))
	}
	bad := 0
	for _, p := range pts {
		overlaps := p.Y+ft >= 2*ft && p.Y <= 6*ft // touching bands merge (docs/method.md §2)
		if overlaps != (p.Err != nil) {
			t.Errorf("sill %g ft: err %v", p.Y/ft, p.Err)
		}
		if p.Err != nil {
			bad++
			if p.Best || p.Rigidity != 0 || p.Piers != nil {
				t.Errorf("failed point carries values: %+v", p)
			}
		}
	}
	if bad == 0 {
		t.Error("no failed positions")
	}
}

func TestSweepArguments(t *testing.T) {
	w := annex()
	if _, err := Sweep(w, "W9", AlongX, ft); err == nil || !strings.Contains(err.Error(), "D1, W1, W2, D2") {
		t.Errorf("unknown opening: %v", err)
	}
	for _, s := range []geometry.Length{0, -ft, geometry.Length(math.NaN()), geometry.Length(math.Inf(1))} {
		if _, err := Sweep(w, "W1", AlongX, s); err == nil {
			t.Errorf("step %g: no error", s)
		}
	}
	if _, err := Sweep(w, "W1", AlongX, geometry.Millimetre/10); err == nil {
		t.Error("0.1 mm step on a 40 ft wall: no error")
	}
	for in, want := range map[string]Axis{"x": AlongX, "Y": AlongY, " y ": AlongY} {
		if a, err := ParseAxis(in); err != nil || a != want {
			t.Errorf("ParseAxis(%q) = %v, %v", in, a, err)
		}
	}
	if _, err := ParseAxis("z"); err == nil {
		t.Error("axis z: no error")
	}
}

// Series follow the physical pier (its Key), ordered left to right by where
// it stands on average, each once.
func TestPierSeries(t *testing.T) {
	pts := []Point{
		{Piers: []PierShare{{Name: "P1", Key: "W1–end", x: 9}, {Name: "P2", Key: "end–W1", x: 1}}},
		{Piers: []PierShare{{Name: "P1", Key: "end–W1", x: 3}, {Name: "P2", Key: "W1–W2", x: 6}, {Name: "P3", Key: "W1–end", x: 9}}},
	}
	got := strings.Join(PierSeries(pts), " ")
	if want := "end–W1 W1–W2 W1–end"; got != want {
		t.Errorf("PierSeries = %q, want %q", got, want)
	}
}

// A window swept past its neighbour: the series of the pier left of the
// wall end keeps its key at every position, although its name changes.
func TestSweepFollowsPhysicalPier(t *testing.T) {
	w := &geometry.Wall{
		Units: geometry.US, Length: 24 * ft, Height: 10 * ft, Thickness: 8 * geometry.Inch,
		Material:  geometry.Material{Kind: geometry.ConcreteMasonry, Strength: 2000 * geometry.PSI},
		Stiffness: geometry.Stiffness{Flexure: 1, Shear: 1},
		Drift:     geometry.Drift{Cd: 1, Ie: 1},
		Layouts: []geometry.Layout{{Name: "a", Openings: []geometry.Opening{
			{Name: "W1", X: 4 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
			{Name: "W2", X: 14 * ft, Sill: 3 * ft, Width: 4 * ft, Height: 4 * ft},
		}}},
	}
	pts, err := Sweep(w, "W2", AlongX, 2*ft)
	if err != nil {
		t.Fatal(err)
	}
	for _, p := range pts {
		if p.Err != nil {
			continue
		}
		// The pier right of W1 and left of W2 exists only while W2 is
		// right of W1; wherever it does, its key names both.
		for _, ps := range p.Piers {
			if ps.Key == "W1–W2" && p.X <= 4*ft {
				t.Errorf("x %v: W1–W2 with W2 left of W1", p.X)
			}
		}
		var keys []string
		for _, ps := range p.Piers {
			keys = append(keys, ps.Key)
		}
		want := map[int]string{
			0:  "W1–end",              // W2 at the left end, touching W1
			10: "end–W1 W1–W2 W2–end", // W2 between W1 and the right end
			20: "end–W1 W1–W2",        // W2 at the right end
		}
		ftPos := int(math.Round(float64(p.X / ft)))
		if k, ok := want[ftPos]; ok && strings.Join(keys, " ") != k {
			t.Errorf("x %d ft: keys %v, want %s", ftPos, keys, k)
		}
	}
}

// A step so small that the number of positions overflows an int is refused
// like any step that makes too many positions, never turned into a wrong
// grid (regression: 1e-18 in printed one row, 1e-20 in said the opening
// fits nowhere).
func TestSweepTinyStepRefused(t *testing.T) {
	w := &geometry.Wall{Length: 18 * geometry.Foot, Height: 16 * geometry.Foot, Thickness: 7.625 * geometry.Inch,
		Support: geometry.Cantilever, Layouts: []geometry.Layout{{Name: "main", Openings: []geometry.Opening{
			{Name: "D1", X: 4 * geometry.Foot, Width: 4 * geometry.Foot, Height: 8 * geometry.Foot}}}}}
	for _, inches := range []float64{1e-15, 1e-18, 1e-20, 1e-300} {
		_, err := Sweep(w, "D1", AlongX, geometry.Length(inches)*geometry.Inch)
		if err == nil || !strings.Contains(err.Error(), "use a larger step") {
			t.Errorf("step %g in: %v, want the too-many-positions refusal", inches, err)
		}
	}
	if pts, err := Sweep(w, "D1", AlongX, geometry.Foot); err != nil || len(pts) != 15 {
		t.Errorf("1 ft step: %d points, %v; want 15 (x = 0 … 14 ft)", len(pts), err)
	}
}

package study

import (
	"math"
	"strings"
	"testing"

	"pierwise/basis"
	"pierwise/geometry"
)

// A sweep on the fe basis: every point is the model's answer at that
// position, a mirrored position gives the same rigidity (the door wall is
// symmetric about its middle when the door moves to x and 26 ft − x), the
// leaf shares sum to one (every band carries the whole wall shear), and a
// step that would make too many solves is refused.
func TestSweepFEBasis(t *testing.T) {
	w, err := geometry.LoadFile("../testdata/walls/door.toml")
	if err != nil {
		t.Fatal(err)
	}
	opt := SweepOptions{Basis: geometry.BasisFE}
	pts, err := SweepWith(w, "D1", AlongX, 4*ft, opt)
	if err != nil {
		t.Fatal(err)
	}
	if len(pts) != 7 { // x = 0, 4, … 24 ft; the door is 10 ft wide on a 36 ft wall
		t.Fatalf("%d points, want 7", len(pts))
	}
	for _, p := range pts {
		if p.Err != nil {
			t.Fatalf("x %g: %v", float64(p.X/ft), p.Err)
		}
		moved := WithLayout(w, w.Active)
		moved.Layouts = append([]geometry.Layout(nil), w.Layouts...)
		moved.Layouts[w.Active].Openings = []geometry.Opening{w.Openings()[0]}
		moved.Layouts[w.Active].Openings[0].X = p.X
		want := basis.Solve(moved, geometry.BasisFE, basis.Options{})
		if !near(p.Rigidity, want.Rigidity(), 1e-9) {
			t.Errorf("x %g: rigidity %g, the model alone %g", float64(p.X/ft), p.Rigidity, want.Rigidity())
		}
		sum := 0.0
		for _, s := range p.Piers {
			sum += s.Share
		}
		if !near(sum, 1, 1e-6) {
			t.Errorf("x %g: shares sum to %g", float64(p.X/ft), sum)
		}
	}
	// x = 4 ft and x = 22 ft are mirror images (36 − 10 − 4 = 22); so
	// are 0 and 26, which a 4 ft grid from 4 ft does not reach.
	sw, err := SweepWith(w, "D1", AlongX, 18*ft, opt)
	if err != nil || len(sw) != 2 {
		t.Fatalf("%d points, %v", len(sw), err)
	}
	if !near(sw[0].Rigidity, sw[1].Rigidity, 1e-6) {
		t.Errorf("mirrored positions: rigidity %g and %g", sw[0].Rigidity, sw[1].Rigidity)
	}
	_, err = SweepWith(w, "D1", AlongX, geometry.Inch, opt)
	if err == nil || !strings.Contains(err.Error(), "at most 100") || !strings.Contains(err.Error(), `4"`) {
		t.Errorf("a 1 in step on the fe basis: %v", err)
	}
	// The same step is fine on the classic basis.
	if _, err := Sweep(w, "D1", AlongX, geometry.Inch); err != nil {
		t.Errorf("classic basis, 1 in step: %v", err)
	}
	if s := feStep(26*float64(ft), geometry.US); math.Abs(float64(s/geometry.Inch)-4) > 1e-9 {
		t.Errorf("feStep 26 ft = %g in, want 4 (312 in / 99 = 3.15 in, rounded up)", float64(s/geometry.Inch))
	}
}

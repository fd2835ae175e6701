package study

import (
	"testing"

	"pierwise/design"
	"pierwise/geometry"
	"pierwise/pier"
)

// With a pier design the sweep carries the wall's governing ratio at every
// position, equal to the design package's for that layout, and Best is the
// lowest ratio among the sound positions.
func TestSweepDesign(t *testing.T) {
	w, err := geometry.LoadFile("../testdata/walls/cmu-reinforced.toml")
	if err != nil {
		t.Fatal(err)
	}
	w.Load.Shear = 50 * geometry.Kip // some positions fail, some pass
	pts, err := Sweep(w, "W1", AlongX, geometry.Foot)
	if err != nil {
		t.Fatal(err)
	}
	if !Designed(pts) {
		t.Fatal("no design on the points")
	}
	best, passes, fails := BestIndex(pts), 0, 0
	if best < 0 {
		t.Fatal("no best")
	}
	for i, p := range pts {
		if p.Err != nil || !p.Designed {
			continue
		}
		// The same ratio as checking that layout directly.
		lay := w.Clone()
		lay.Layouts[lay.Active].Openings[FindOpening(w, "W1")].X = p.X
		res, err := pier.Solve(lay)
		if err != nil {
			t.Fatal(err)
		}
		d, _, err := design.CheckClassic(lay, res)
		if err != nil {
			t.Fatal(err)
		}
		if d.Ratio-p.Ratio > 1e-12 || p.Ratio-d.Ratio > 1e-12 || d.OK != p.Passes {
			t.Errorf("x %.3f: sweep ratio %.4f ok %v, direct %.4f ok %v", float64(p.X), p.Ratio, p.Passes, d.Ratio, d.OK)
		}
		if p.Passes {
			passes++
		} else {
			fails++
		}
		if len(p.Weak) == 0 && p.Ratio < pts[best].Ratio*(1-1e-9) {
			t.Errorf("x %.3f has ratio %.4f below best %.4f (point %d)", float64(p.X), p.Ratio, pts[best].Ratio, i)
		}
	}
	t.Logf("%d positions pass, %d fail; best x = %.2f ft, ratio %.3f", passes, fails, float64(pts[best].X/geometry.Foot), pts[best].Ratio)
	if passes == 0 || fails == 0 {
		t.Errorf("want positions that pass and positions that fail at 50 kip, got %d and %d", passes, fails)
	}
	// Without [design] the old rule stays: the lowest stress index.
	w.Design, w.Reinforcement = nil, nil
	pts, _ = Sweep(w, "W1", AlongX, geometry.Foot)
	if Designed(pts) {
		t.Fatal("design without [design]")
	}
	b := BestIndex(pts)
	for _, p := range pts {
		if p.Err == nil && len(p.Weak) == 0 && p.StressIndex < pts[b].StressIndex*(1-1e-9) {
			t.Errorf("best by stress: %.4f below %.4f", p.StressIndex, pts[b].StressIndex)
		}
	}
}

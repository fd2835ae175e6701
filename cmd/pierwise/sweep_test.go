package main

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"pierwise/demo"
	"pierwise/geometry"
	"pierwise/pier"
)

func TestSweepCommandJSON(t *testing.T) {
	path := studyFile(t)
	code, out, errs := runCmd("sweep", path+":wide entrance", "--opening", "W1", "--step", "1ft", "--json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var pts []struct {
		X                float64  `json:"x"`
		Sill             float64  `json:"sill"`
		RigidityRelative *float64 `json:"rigidity_relative"`
		Piers            []struct {
			Name  string  `json:"name"`
			Share float64 `json:"share"`
		} `json:"piers"`
		Current, Best bool
		Error         string `json:"error"`
	}
	if err := json.Unmarshal([]byte(out), &pts); err != nil {
		t.Fatalf("%v\n%s", err, out)
	}
	// W1 (6 ft wide, at 12 ft) moves between D1 (ends at 7 ft) and W2
	// (starts at 22 ft): x = 7 … 16 ft in 1 ft steps.
	if len(pts) != 10 || math.Abs(pts[0].X-7) > 1e-9 || math.Abs(pts[9].X-16) > 1e-9 {
		t.Fatalf("%d points from x %v", len(pts), pts)
	}
	current, best := 0, 0
	for _, p := range pts {
		if p.Current {
			current++
			if math.Abs(p.X-12) > 1e-9 {
				t.Errorf("current at x %g, want 12", p.X)
			}
		}
		if p.Best {
			best++
		}
		// Each point equals an independent solve with W1 at x.
		w := demo.Wall()
		w.Active = 1
		w.Layouts[1].Openings[1].X = geometry.Length(p.X) * geometry.Foot
		r, err := pier.Solve(w)
		if err != nil {
			if p.Error == "" {
				t.Errorf("x %g: no error in the output, independent solve: %v", p.X, err)
			}
			continue
		}
		if p.RigidityRelative == nil || math.Abs(*p.RigidityRelative-r.Rigidity) > 1e-9*r.Rigidity {
			t.Errorf("x %g: rigidity %v, independent %g", p.X, p.RigidityRelative, r.Rigidity)
		}
		leaves := r.Leaves()
		if len(leaves) != len(p.Piers) {
			t.Fatalf("x %g: %d piers, independent %d", p.X, len(p.Piers), len(leaves))
		}
		for k, lp := range leaves {
			if lp.Name != p.Piers[k].Name || math.Abs(lp.Share-p.Piers[k].Share) > 1e-9 {
				t.Errorf("x %g: pier %+v, independent %s %g", p.X, p.Piers[k], lp.Name, lp.Share)
			}
		}
	}
	if current != 1 || best != 1 {
		t.Errorf("%d current and %d best points, want one each", current, best)
	}
}

func TestSweepCommandTable(t *testing.T) {
	path := studyFile(t)
	code, out, errs := runCmd("sweep", path, "--opening", "W2", "--axis", "y", "--step", "6in")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, want := range []string{"Sweep of W2 along y", "current", "best", "max stress (psi)", "licensed engineer"} {
		if !strings.Contains(out, want) {
			t.Errorf("%q not in\n%s", want, out)
		}
	}
	for _, tc := range []struct {
		args []string
		code int
		msg  string
	}{
		{[]string{"sweep", path}, exitUsage, "--opening"},
		{[]string{"sweep", path, "--opening", "W2", "--axis", "z"}, exitUsage, "axis"},
		{[]string{"sweep", path, "--opening", "W2", "--step", "abc"}, exitUsage, "step"},
		// A step that is not positive is a bad option value, like one that
		// does not parse: a usage error.
		{[]string{"sweep", path, "--opening", "W2", "--step", "0"}, exitUsage, "positive"},
		{[]string{"sweep", path, "--opening", "W2", "--step", "-1ft"}, exitUsage, `not "-1ft"`},
		// A tiny step is named as typed, not rounded to 0".
		{[]string{"sweep", path, "--opening", "W2", "--step", "1mm"}, exitInput, "a step of 0.0394 in makes"},
		{[]string{"sweep", path, "--opening", "W7"}, exitInput, "D1, W1, W2, D2"},
		{[]string{"sweep", path + ":nope", "--opening", "W2"}, exitInput, "wide entrance"},
	} {
		code, _, errs := runCmd(tc.args...)
		if code != tc.code || !strings.Contains(errs, tc.msg) {
			t.Errorf("%v: exit %d, %q; want %d and %q", tc.args, code, errs, tc.code, tc.msg)
		}
	}
}
